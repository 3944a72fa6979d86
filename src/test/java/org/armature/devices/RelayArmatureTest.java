package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class RelayArmatureTest {

    // RC-13: small 12 V PCB relay, 275 Ω, about 1.15 H released / 2.29 H attracted (published
    // datasheet figure quoted in a forum); must-operate 75 % and must-release 10 % of 12 V (RC-5,
    // common practice); travel 0.3 mm and ρ = 2 (DESIGN.md, from memory).
    private static final double OHMS = 275.0;
    private static final double RATED_VOLTS = 12.0;
    private static final double PICK_UP_AMPS = 0.75 * RATED_VOLTS / OHMS;
    private static final double DROP_OUT_AMPS = 0.10 * RATED_VOLTS / OHMS;
    private static final double TRAVEL = 0.3e-3;
    private static final double STEP_SECONDS = 1e-6;

    private static RelayArmatureDatasheet smallRelay(double attractedHenries) {
        return RelayArmatureDatasheet.typical(OHMS, 1.15, attractedHenries, PICK_UP_AMPS, DROP_OUT_AMPS, TRAVEL);
    }

    private static MovingArmature fitted() {
        return RelayArmatureFit.fit(smallRelay(2.29)).moving().orElseThrow();
    }

    @Test
    @DisplayName("RC-13 figures fit with Lσ ≥ 0 and reproduce both inductances (derived: Lσ = Lr − (La − Lr)/(r − 1) ≈ 1.031 H)")
    void fitReproducesInductances() {
        RelayArmatureFit fit = RelayArmatureFit.fit(smallRelay(2.29));
        assertTrue(fit.findings().isEmpty());
        MovingArmature a = fit.moving().orElseThrow();
        assertTrue(a.leakageInductanceHenries() >= 0);
        assertEquals(1.031, a.leakageInductanceHenries(), 0.001);
        assertEquals(1.15, a.inductanceHenries(TRAVEL), 1e-12);
        assertEquals(2.29, a.inductanceHenries(0.0), 1e-12);
        assertEquals(2.0, a.springForceAttractedNewtons() / a.springForceReleasedNewtons(), 1e-12);
        assertEquals(TRAVEL / 2, a.contactSetPointMetres(), 1e-15);
    }

    @Test
    @DisplayName("Force balance at the stops gives pick-up at Ipu and drop-out at Ido within 2 % (derived)")
    void forceBalanceAtTheStops() {
        MovingArmature a = fitted();
        double pickUp = balanceCurrent(i -> a.magneticForceNewtons(i, TRAVEL) - a.springForceNewtons(TRAVEL));
        double dropOut = balanceCurrent(i -> a.magneticForceNewtons(i, 0.0) - a.springForceNewtons(0.0));
        assertEquals(PICK_UP_AMPS, pickUp, 0.02 * PICK_UP_AMPS);
        assertEquals(DROP_OUT_AMPS, dropOut, 0.02 * DROP_OUT_AMPS);
        assertEquals(PICK_UP_AMPS, a.pickUpAmps(), 1e-12);
        assertEquals(DROP_OUT_AMPS, a.dropOutAmps(), 1e-12);
    }

    private static double balanceCurrent(DoubleUnaryOperator excessPull) {
        double lo = 0.0;
        double hi = 1.0;
        for (int k = 0; k < 200; k++) {
            double mid = 0.5 * (lo + hi);
            if (excessPull.applyAsDouble(mid) > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    @DisplayName("DESIGN sanity: pick-up pull about 0.2 N for the small 12 V relay (derived: ½·Ipu²·K/(T+gi)² = 0.19 N)")
    void pickUpPull() {
        MovingArmature a = fitted();
        double pull = a.magneticForceNewtons(PICK_UP_AMPS, TRAVEL);
        assertEquals(0.19, pull, 0.01);
    }

    @Test
    @DisplayName("Inconsistent figures: L attracted 15 H against 1.15 H released gives Lσ < 0 and a finding, not an exception")
    void inconsistentInductances() {
        RelayArmatureFit fit = RelayArmatureFit.fit(smallRelay(15.0));
        assertTrue(fit.moving().isEmpty());
        assertEquals("relay.fit.leakageNegative", fit.findings().get(0).messageKey());
        assertEquals(DeviceFinding.Severity.ERROR, fit.findings().get(0).severity());
        assertTrue(fit.findings().get(0).detail().contains("attractedInductanceHenries"));
        assertEquals(PICK_UP_AMPS, fit.thresholds().pickUpAmps(), 0.0);
    }

    @Test
    @DisplayName("Attracted inductance below released is reported")
    void attractedBelowReleased() {
        RelayArmatureFit fit = RelayArmatureFit.fit(smallRelay(0.9));
        assertTrue(fit.moving().isEmpty());
        assertEquals("relay.fit.attractedBelowReleased", fit.findings().get(0).messageKey());
    }

    @Test
    @DisplayName("No attracted inductance: constant inductance, threshold model only")
    void constantInductance() {
        for (double la : new double[] {0.0, 1.15}) {
            RelayArmatureFit fit = RelayArmatureFit.fit(smallRelay(la));
            assertTrue(fit.moving().isEmpty());
            assertEquals(1.15, fit.constantInductanceHenries(), 0.0);
            assertEquals("relay.fit.constantInductance", fit.findings().get(0).messageKey());
            assertTrue(fit.thresholds().operatedAfter(false, PICK_UP_AMPS));
        }
    }

    @Test
    void validationNamesTheField() {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> RelayArmatureDatasheet.typical(OHMS, 1.15, 2.29, PICK_UP_AMPS, DROP_OUT_AMPS, -1));
        assertTrue(ex.getMessage().contains("travelMetres"));
        ex = assertThrows(IllegalArgumentException.class,
                () -> smallRelay(2.29).withSpringForceRatio(0.5));
        assertTrue(ex.getMessage().contains("springForceRatio"));
    }

    @Test
    @DisplayName("Inductance and current derivatives match central finite differences (derived)")
    void derivatives() {
        MovingArmature a = fitted();
        double h = 1e-9;
        for (double g : new double[] {0.02e-3, 0.1e-3, 0.25e-3}) {
            double fd = (a.inductanceHenries(g + h) - a.inductanceHenries(g - h)) / (2 * h);
            assertEquals(fd, a.dInductanceDGap(g), 1e-6 * Math.abs(fd));
            double lambda = 0.05;
            double fdi = (a.coilAmps(lambda, g + h) - a.coilAmps(lambda, g - h)) / (2 * h);
            assertEquals(fdi, a.dCurrentDGap(lambda, g), 1e-6 * Math.abs(fdi));
            double fdl = (a.coilAmps(lambda + 1e-7, g) - a.coilAmps(lambda - 1e-7, g)) / 2e-7;
            assertEquals(fdl, a.dCurrentDFlux(g), 1e-9 * fdl);
        }
    }

    @Test
    @DisplayName("At rest on a stop with the net force into it the armature does not move")
    void restsOnStops() {
        MovingArmature a = fitted();
        ArmatureDerivatives d = new ArmatureDerivatives();
        a.derivatives(0.0, TRAVEL, 0.0, 0.0, d);
        assertEquals(0.0, d.gapRateMetresPerSecond(), 0.0);
        assertEquals(0.0, d.accelerationMetresPerSecondSquared(), 0.0);
        double heldFlux = a.fluxLinkage(RATED_VOLTS / OHMS, 0.0);
        a.derivatives(heldFlux, 0.0, 0.0, RATED_VOLTS, d);
        assertEquals(0.0, d.accelerationMetresPerSecondSquared(), 0.0);
        assertEquals(0.0, d.fluxRateVolts(), 1e-12);
    }

    /** Fixed-step classical RK4 on (λ, g, u), stops applied after each step. */
    private static final class Rk4 {
        private final MovingArmature a;
        private final ArmatureState s;
        private final ArmatureDerivatives k = new ArmatureDerivatives();

        Rk4(MovingArmature a, ArmatureState s) {
            this.a = a;
            this.s = s;
        }

        void step(double volts, double h) {
            double l0 = s.fluxLinkageWeberTurns();
            double g0 = s.gapMetres();
            double u0 = s.velocityMetresPerSecond();
            a.derivatives(l0, g0, u0, volts, k);
            double l1 = k.fluxRateVolts();
            double g1 = k.gapRateMetresPerSecond();
            double u1 = k.accelerationMetresPerSecondSquared();
            a.derivatives(l0 + 0.5 * h * l1, g0 + 0.5 * h * g1, u0 + 0.5 * h * u1, volts, k);
            double l2 = k.fluxRateVolts();
            double g2 = k.gapRateMetresPerSecond();
            double u2 = k.accelerationMetresPerSecondSquared();
            a.derivatives(l0 + 0.5 * h * l2, g0 + 0.5 * h * g2, u0 + 0.5 * h * u2, volts, k);
            double l3 = k.fluxRateVolts();
            double g3 = k.gapRateMetresPerSecond();
            double u3 = k.accelerationMetresPerSecondSquared();
            a.derivatives(l0 + h * l3, g0 + h * g3, u0 + h * u3, volts, k);
            s.set(l0 + h / 6 * (l1 + 2 * l2 + 2 * l3 + k.fluxRateVolts()),
                    g0 + h / 6 * (g1 + 2 * g2 + 2 * g3 + k.gapRateMetresPerSecond()),
                    u0 + h / 6 * (u1 + 2 * u2 + 2 * u3 + k.accelerationMetresPerSecondSquared()));
            a.applyStops(s);
        }

        double amps() {
            return a.coilAmps(s.fluxLinkageWeberTurns(), s.gapMetres());
        }
    }

    @Test
    @DisplayName("Pull-in at constant 12 V: motion starts at Ipu, contacts operate within a few ms, the current dips at pull-in (RK4 in the test)")
    void pullInWithCurrentDip() {
        MovingArmature a = fitted();
        ArmatureState s = a.releasedAtRest();
        Rk4 rk = new Rk4(a, s);
        double motionStart = Double.NaN;
        double ampsAtMotionStart = Double.NaN;
        double contactTime = Double.NaN;
        double closedTime = Double.NaN;
        double peakBeforeClosing = 0.0;
        double minimumAfterPeak = Double.POSITIVE_INFINITY;
        int steps = (int) Math.round(60e-3 / STEP_SECONDS);
        for (int n = 1; n <= steps; n++) {
            rk.step(RATED_VOLTS, STEP_SECONDS);
            double t = n * STEP_SECONDS;
            double i = rk.amps();
            if (Double.isNaN(motionStart) && s.gapMetres() < TRAVEL) {
                motionStart = t;
                ampsAtMotionStart = i;
            }
            if (Double.isNaN(contactTime) && a.contactsOperated(s.gapMetres())) {
                contactTime = t;
            }
            if (Double.isNaN(closedTime)) {
                peakBeforeClosing = Math.max(peakBeforeClosing, i);
                if (s.gapMetres() == 0.0) {
                    closedTime = t;
                }
            }
            if (!Double.isNaN(motionStart)) {
                minimumAfterPeak = Math.min(minimumAfterPeak, i);
            }
        }
        // motion starts when the current reaches pick-up: 5.8 ms = τ·ln 4 (derived, τ = 1.15 H / 275 Ω)
        assertEquals(PICK_UP_AMPS, ampsAtMotionStart, 0.01 * PICK_UP_AMPS);
        assertEquals(1.15 / OHMS * Math.log(4.0), motionStart, 0.1e-3);
        // operate time of a few ms, most of it spent reaching pick-up (DESIGN.md sanity figures)
        assertTrue(contactTime > 3e-3 && contactTime < 12e-3, "operate time " + contactTime);
        assertTrue(motionStart / contactTime > 0.5);
        assertEquals(0.0, s.gapMetres(), 0.0);
        // the current dips at pull-in: flux is continuous while L rises (derived)
        assertTrue(minimumAfterPeak < 0.9 * peakBeforeClosing,
                "dip " + minimumAfterPeak + " against " + peakBeforeClosing);
        // and settles at V/R with the armature held, several τ = 2.29 H / 275 Ω after closing (derived)
        assertEquals(RATED_VOLTS / OHMS, rk.amps(), 0.02 * RATED_VOLTS / OHMS);
    }

    @Test
    @DisplayName("Release through a plain diode or diode + 12 V zener: the armature starts moving when the current reaches Ido, at τ·ln((I0 + Vc/R)/(Ido + Vc/R)) (derived; DESIGN: about 16–19 ms and 5 ms)")
    void releaseTimeGrowsWithPlainDiode() {
        MovingArmature a = fitted();
        double tau = 2.29 / OHMS;
        double i0 = RATED_VOLTS / OHMS;
        double plain = releaseStart(a, 0.7);
        double zener = releaseStart(a, 12.7);
        assertEquals(tau * Math.log((i0 + 0.7 / OHMS) / (DROP_OUT_AMPS + 0.7 / OHMS)), plain, 0.05e-3);
        assertEquals(tau * Math.log((i0 + 12.7 / OHMS) / (DROP_OUT_AMPS + 12.7 / OHMS)), zener, 0.05e-3);
        assertTrue(plain > 14e-3 && plain < 20e-3, "plain diode " + plain);
        assertTrue(zener > 4e-3 && zener < 6e-3, "diode + zener " + zener);
    }

    private static double releaseStart(MovingArmature a, double clampVolts) {
        ArmatureState s = new ArmatureState(a.fluxLinkage(RATED_VOLTS / OHMS, 0.0), 0.0, 0.0);
        Rk4 rk = new Rk4(a, s);
        for (int n = 1; n <= 40_000; n++) {
            double volts = rk.amps() > 0 ? -clampVolts : 0.0;
            rk.step(volts, STEP_SECONDS);
            if (s.gapMetres() > 0.0) {
                return n * STEP_SECONDS;
            }
        }
        return Double.NaN;
    }

    @Test
    @DisplayName("Restitution makes the armature bounce off the attracted stop (contact bounce)")
    void bounce() {
        MovingArmature a = RelayArmatureFit.fit(smallRelay(2.29).withMechanics(1e-3, 0.1, 0.5)).moving().orElseThrow();
        ArmatureState s = a.releasedAtRest();
        Rk4 rk = new Rk4(a, s);
        boolean closed = false;
        boolean reopened = false;
        for (int n = 1; n <= 20_000; n++) {
            rk.step(RATED_VOLTS, STEP_SECONDS);
            if (s.gapMetres() == 0.0) {
                closed = true;
            } else if (closed) {
                reopened = true;
            }
        }
        assertTrue(closed && reopened);
        assertFalse(Double.isNaN(s.gapMetres()));
    }
}
