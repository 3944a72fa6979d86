package org.armature.solver.timedomain;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * The linear reference problem of the transient benchmark, reachable from
 * {@code org.armature.bench}: the unsuppressed coil (400 Ω, 1 H, 100 pF) ringing after turn-off, by
 * our engine and by Hipparchus' Dormand–Prince 853, with the error of each against a tight
 * Dormand–Prince solution.
 */
public final class BenchProblems {

    /** Window after the edge, seconds: about 30 ring periods. */
    public static final double RING_WINDOW_SECONDS = 2e-3;

    private BenchProblems() {
    }

    /** Coil current at the end of the window by our engine at a relative tolerance. */
    public static double oursRing(double relativeTolerance) {
        TimeDomainCircuit c = Circuits.lowSide(ReferenceIntegratorTest.R, ReferenceIntegratorTest.L,
                Circuits.Clamp.NONE, 0, ReferenceIntegratorTest.C, 0);
        double edge = ReferenceIntegratorTest.EDGE;
        TransientResult r = TransientAnalysis.run(c, new DriveWaveform.TurnOff(edge), edge + RING_WINDOW_SECONDS,
                StepOptions.DEFAULTS.withTolerance(relativeTolerance));
        Waveform w = r.waveform();
        return w.require(Waveform.COIL_CURRENT).value(w.size() - 1);
    }

    /** Coil current at the end of the window by Dormand–Prince 853 at a relative tolerance. */
    public static double hipparchusRing(double relativeTolerance) {
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-12, 1e-3, 1e-9 * relativeTolerance,
                relativeTolerance);
        return dp.integrate(new ReferenceIntegratorTest.Ring(), new ODEState(0, ReferenceIntegratorTest.ringStart()),
                RING_WINDOW_SECONDS).getPrimaryState()[0];
    }

    /** The tight reference value. */
    public static double referenceRing() {
        return hipparchusRing(1e-13);
    }
}
