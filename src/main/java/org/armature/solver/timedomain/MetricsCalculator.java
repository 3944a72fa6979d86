package org.armature.solver.timedomain;

import java.util.List;

/**
 * Computes {@link TransientMetrics} from a run's internal records and events. Threshold times are
 * interpolated linearly between time points; energies integrate power by the trapezoidal rule over
 * the accepted points from the turn-off edge to the end of the run.
 */
final class MetricsCalculator {

    /**
     * When the coil current never crosses zero within the run (a real diode's current only tends to
     * zero), it counts as zero once it falls to this fraction of its value at the turn-off edge.
     */
    static final double ZERO_CURRENT_FRACTION = 1e-3;

    private MetricsCalculator() {
    }

    static TransientMetrics compute(TimeDomainResult r, TimeDomainCircuit c) {
        Waveform w = r.waveform();
        double[] t = w.time();
        double[][] in = r.internal();
        double tOff = lastEvent(w.events(), TransientEvent.DRIVE_LOW, Double.NEGATIVE_INFINITY);
        double tOn = lastEvent(w.events(), TransientEvent.DRIVE_HIGH, Double.NEGATIVE_INFINITY);
        double nan = Double.NaN;
        double peakSwitch = nan;
        double peakReverse = nan;
        double toRelease = nan;
        double toZero = nan;
        double toSmall = nan;
        double release = nan;
        double suppressorEnergy = nan;
        double switchEnergy = nan;
        double coilEnergy = nan;
        double stored = nan;
        double peakSuppressor = 0;
        boolean breakdown = false;
        double breakSpeed = nan;
        for (int i = 0; i < t.length; i++) {
            double s = Math.abs(in[TimeDomainRun.SUPP_I][i]);
            if (s > peakSuppressor) {
                peakSuppressor = s;
            }
        }
        if (Double.isFinite(tOff)) {
            int start = indexOf(t, tOff);
            double i0 = in[TimeDomainRun.COIL_I][start];
            stored = 0.5 * c.storedEnergyHenries * i0 * i0;
            peakSwitch = Double.NEGATIVE_INFINITY;
            peakReverse = 0;
            suppressorEnergy = 0;
            switchEnergy = 0;
            coilEnergy = 0;
            for (int i = start; i < t.length; i++) {
                peakSwitch = Math.max(peakSwitch, in[TimeDomainRun.SWITCH_V][i]);
                peakReverse = Math.max(peakReverse, -in[TimeDomainRun.COIL_V][i]);
                if (i > start) {
                    double dt = t[i] - t[i - 1];
                    suppressorEnergy += trapezoid(in[TimeDomainRun.SUPP_P], i, dt);
                    switchEnergy += trapezoid(in[TimeDomainRun.SWITCH_P], i, dt);
                    coilEnergy += trapezoid(in[TimeDomainRun.COIL_LOSS_P], i, dt);
                    double a = Math.abs(in[TimeDomainRun.COIL_I][i - 1]);
                    double b = Math.abs(in[TimeDomainRun.COIL_I][i]);
                    if (Double.isNaN(toRelease) && a > c.dropOutAmps && b <= c.dropOutAmps) {
                        toRelease = cross(t[i - 1], a, t[i], b, c.dropOutAmps) - tOff;
                    }
                    double zero = ZERO_CURRENT_FRACTION * Math.abs(i0);
                    double signed = in[TimeDomainRun.COIL_I][i] * Math.signum(i0);
                    double prev = in[TimeDomainRun.COIL_I][i - 1] * Math.signum(i0);
                    if (Double.isNaN(toZero) && prev > 0 && signed <= 0) {
                        toZero = cross(t[i - 1], prev, t[i], signed, 0) - tOff;
                    }
                    if (Double.isNaN(toSmall) && prev > zero && signed <= zero) {
                        toSmall = cross(t[i - 1], prev, t[i], signed, zero) - tOff;
                    }
                }
            }
            if (Double.isNaN(toZero)) {
                toZero = toSmall;
            }
            breakdown = !c.clamps.isEmpty() && peakSwitch >= c.clamps.get(0).ratedVolts();
            double open = firstEventAfter(w.events(), TransientEvent.CONTACTS_OPEN, tOff);
            release = open - tOff;
            breakSpeed = speedAt(t, in[TimeDomainRun.ARMATURE_SPEED], open, c);
        }
        double operate = nan;
        if (Double.isFinite(tOn)) {
            operate = firstEventAfter(w.events(), TransientEvent.CONTACTS_CLOSED, tOn) - tOn;
        }
        return new TransientMetrics(peakSwitch, peakReverse, toRelease, toZero, release, operate, suppressorEnergy,
                switchEnergy, breakdown, peakSuppressor, coilEnergy, stored, breakSpeed);
    }

    /**
     * The armature speed at the contact-break time: the moving-armature model's integrated speed at
     * the accepted point nearest the located event (the event is a time point of the run, so this is
     * the speed there); the constant-inductance model's transit speed.
     */
    private static double speedAt(double[] t, double[] speed, double when, TimeDomainCircuit c) {
        if (!Double.isFinite(when)) {
            return Double.NaN;
        }
        if (!c.relays.isEmpty()) {
            RelayDynamics r = c.relays.get(0);
            return r.travelMetres / Math.max(r.releaseTransitSeconds, Double.MIN_NORMAL);
        }
        if (c.armatures.isEmpty()) {
            return Double.NaN;
        }
        int best = 0;
        for (int i = 0; i < t.length; i++) {
            if (Math.abs(t[i] - when) < Math.abs(t[best] - when)) {
                best = i;
            }
        }
        return speed[best];
    }

    private static double trapezoid(double[] p, int i, double dt) {
        double a = p[i - 1];
        double b = p[i];
        if (Double.isNaN(a) || Double.isNaN(b)) {
            return 0;
        }
        return 0.5 * (a + b) * dt;
    }

    private static double cross(double t0, double v0, double t1, double v1, double level) {
        if (v0 == v1) {
            return t1;
        }
        return t0 + (t1 - t0) * (v0 - level) / (v0 - v1);
    }

    private static int indexOf(double[] t, double time) {
        int best = 0;
        for (int i = 0; i < t.length; i++) {
            if (t[i] <= time) {
                best = i;
            }
        }
        return best;
    }

    private static double lastEvent(List<TransientEvent> events, String what, double fallback) {
        double found = fallback;
        for (TransientEvent e : events) {
            if (e.what().equals(what)) {
                found = e.timeSeconds();
            }
        }
        return found;
    }

    private static double firstEventAfter(List<TransientEvent> events, String what, double after) {
        for (TransientEvent e : events) {
            if (e.what().equals(what) && e.timeSeconds() >= after) {
                return e.timeSeconds();
            }
        }
        return Double.NaN;
    }
}
