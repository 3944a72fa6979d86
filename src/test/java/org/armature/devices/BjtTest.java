package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

class BjtTest {

    private static final double T300 = 300.0;
    private static final DeviceNewtonOptions OPTIONS = DeviceNewtonOptions.DEFAULTS;

    private static Bjt textbook(BjtPolarity polarity, double betaReverse) {
        return new Bjt(BjtParams.ebersMoll(polarity, 1e-14, 100.0, betaReverse).withNominalTemperature(T300));
    }

    @ParameterizedTest(name = "BJ-8/BJ-9 (derived): VBE = {0} V, VCE = 5 V -> IC = {1} mA, IB = {2} µA")
    @CsvSource(textBlock = """
            0.65, 0.83084, 8.3084
            0.70, 5.7475,  57.475
            """)
    void forwardActive(double vbe, double icMilliamps, double ibMicroamps) {
        BjtEvaluation e = new BjtEvaluation();
        textbook(BjtPolarity.NPN, 1.0).evaluate(vbe, vbe - 5.0, T300, e);
        assertEquals(icMilliamps, e.collectorAmps() * 1e3, icMilliamps * 1e-4);
        assertEquals(ibMicroamps, e.baseAmps() * 1e6, ibMicroamps * 1e-4);
        assertEquals(-(e.collectorAmps() + e.baseAmps()), e.emitterAmps(), 0.0);
    }

    @Test
    @DisplayName("PNP mirrors NPN: same magnitudes, opposite signs, same derivatives (derived)")
    void pnpMirrorsNpn() {
        BjtEvaluation n = new BjtEvaluation();
        BjtEvaluation p = new BjtEvaluation();
        textbook(BjtPolarity.NPN, 1.0).evaluate(0.68, -3.0, T300, n);
        textbook(BjtPolarity.PNP, 1.0).evaluate(-0.68, 3.0, T300, p);
        assertEquals(-n.collectorAmps(), p.collectorAmps(), 0.0);
        assertEquals(-n.baseAmps(), p.baseAmps(), 0.0);
        assertEquals(n.dCollectorDvbe(), p.dCollectorDvbe(), 0.0);
        assertEquals(n.dBaseDvbc(), p.dBaseDvbc(), 0.0);
    }

    @Test
    @DisplayName("BJ-10: VCE(sat) at βf 10, βF 100, βR 1, 300 K = 66.96 mV; Newton at IB 1 mA, IC 10 mA: VBE 0.71852, VBC 0.65156 V (Sedra & Smith formula; derived)")
    void saturationVoltageTextbook() {
        assertEquals(66.96e-3, Bjt.saturationVoltageClosedForm(10, 100, 1, T300), 0.005e-3);
        BjtJunctionSolution s = textbook(BjtPolarity.NPN, 1.0).junctionsForCurrents(10e-3, 1e-3, T300, OPTIONS);
        assertEquals(0.71852, s.vbeVolts(), 0.000005);
        assertEquals(0.65156, s.vbcVolts(), 0.000005);
        assertEquals(66.96e-3, s.vceVolts(), 0.005e-3);
        BjtJunctionSolution pnp = textbook(BjtPolarity.PNP, 1.0).junctionsForCurrents(-10e-3, -1e-3, T300, OPTIONS);
        assertEquals(-0.71852, pnp.vbeVolts(), 0.000005);
    }

    @ParameterizedTest(name = "BJ-11 (derived): βf {0}, βF {1}, βR {2} -> {3} mV")
    @CsvSource(textBlock = """
            10, 100, 0.1, 124.47
            50, 100, 0.1, 179.14
            """)
    void saturationCorners(double forced, double bf, double br, double millivolts) {
        assertEquals(millivolts, 1e3 * Bjt.saturationVoltageClosedForm(forced, bf, br, T300), 0.005);
        Bjt bjt = new Bjt(BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, bf, br).withNominalTemperature(T300));
        BjtJunctionSolution s = bjt.junctionsForCurrents(10e-3, 10e-3 / forced, T300, OPTIONS);
        assertEquals(millivolts, 1e3 * s.vceVolts(), 0.005);
    }

    @Test
    void closedFormRejectsForcedBetaAboveBeta() {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> Bjt.saturationVoltageClosedForm(120, 100, 1, T300));
        assertTrue(ex.getMessage().contains("forcedBeta"));
    }

    @ParameterizedTest(name = "BJ-13 (derived, XTB form from memory): {0} °C -> ×{1}")
    @CsvSource(textBlock = """
            -40, 0.6915
             85, 1.3166
             25, 1.0
            """)
    void hfeTemperatureFactor(double celsius, double factor) {
        Bjt bjt = new Bjt(BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 1));
        assertEquals(factor, bjt.betaTemperatureFactor(TestPhysics.kelvin(celsius)), 0.00005);
        // and the model's hFE follows it (derived: IC does not depend on BF)
        BjtEvaluation e = new BjtEvaluation();
        bjt.evaluate(0.6, -5, TestPhysics.kelvin(celsius), e);
        assertEquals(100 * factor, e.collectorAmps() / e.baseAmps(), 100 * factor * 1e-4);
    }

    @Test
    @DisplayName("BJ-14: VBE tempco at constant IC about −2 mV/K (common practice)")
    void vbeTempco() {
        Bjt bjt = new Bjt(BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 1));
        double t = TestPhysics.kelvin(25.0);
        double v0 = bjt.vbeForCollectorCurrent(1e-3, 5.0, t, OPTIONS).vbeVolts();
        double v1 = bjt.vbeForCollectorCurrent(1e-3, 5.0, t + 1.0, OPTIONS).vbeVolts();
        double tempco = v1 - v0;
        assertTrue(tempco < -1.5e-3 && tempco > -2.5e-3, "tempco " + tempco);
    }

    @Test
    @DisplayName("Early effect: IC ∝ 1 + VCB/VAF at fixed VBE (derived from q1)")
    void earlyEffect() {
        Bjt bjt = new Bjt(BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 1).withEarlyVoltages(100, Double.POSITIVE_INFINITY)
                .withNominalTemperature(T300));
        BjtEvaluation e = new BjtEvaluation();
        bjt.evaluate(0.65, 0.65 - 1.0, T300, e);
        double ic1 = e.collectorAmps();
        bjt.evaluate(0.65, 0.65 - 11.0, T300, e);
        double ic11 = e.collectorAmps();
        assertEquals((1 + 10.35 / 100) / (1 + 0.35 / 100), ic11 / ic1, 1e-6);
    }

    @Test
    @DisplayName("High injection: at IF = IKF the gain is BF·2/(1+√5) (derived from qb)")
    void highInjectionRollOff() {
        double ikf = 0.1;
        Bjt bjt = new Bjt(BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 1)
                .withKneeCurrents(ikf, Double.POSITIVE_INFINITY).withNominalTemperature(T300));
        double vt = Junctions.thermalVoltage(T300);
        double vbe = vt * Math.log(ikf / 1e-14 + 1);
        BjtEvaluation e = new BjtEvaluation();
        bjt.evaluate(vbe, vbe - 5, T300, e);
        assertEquals(100 * 2 / (1 + Math.sqrt(5)), e.collectorAmps() / e.baseAmps(), 1e-6);
        bjt.evaluate(0.55, -4.45, T300, e);
        assertTrue(e.collectorAmps() / e.baseAmps() > 99.9, "low-current gain stays at BF");
    }

    @Test
    @DisplayName("Fit: BF from hFE 200 at IC 10 mA, VCE 5 V with VAF 100 V, IKF 0.2 A reproduces hFE (derived)")
    void fitBetaFromHfe() {
        BjtParams base = BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 1).withEarlyVoltages(100, 20)
                .withKneeCurrents(0.2, 0.02);
        double t = TestPhysics.kelvin(25.0);
        BjtParams fitted = BjtFit.betaForwardFromHfe(base, 200, 10e-3, 5.0, t);
        Bjt bjt = new Bjt(fitted);
        BjtJunctionSolution s = bjt.vbeForCollectorCurrent(10e-3, 5.0, t, OPTIONS);
        BjtEvaluation e = new BjtEvaluation();
        bjt.evaluate(s.vbeVolts(), s.vbcVolts(), t, e);
        assertEquals(200, e.collectorAmps() / e.baseAmps(), 200 * 1e-9);
        assertTrue(fitted.betaForward() > 200, "BF exceeds hFE because qb > 1 at 10 mA");
    }

    @Test
    @DisplayName("Fit: BF and IS from hFE 200 at 10 mA and VBE(sat) 0.75 V at 50 mA, IC/IB = 10 reproduce both (derived)")
    void fitGainAndSaturationCurrent() {
        BjtParams base = BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 2).withEarlyVoltages(100, 20)
                .withKneeCurrents(0.2, 0.02);
        double t = TestPhysics.kelvin(25.0);
        BjtParams fitted = BjtFit.gainAndSaturationCurrent(base, 200, 10e-3, 5.0, 0.75, 50e-3, 10, t);
        Bjt bjt = new Bjt(fitted);
        BjtJunctionSolution sat = bjt.junctionsForCurrents(50e-3, 5e-3, t, OPTIONS);
        assertEquals(0.75, sat.vbeVolts(), 1e-9);
        BjtJunctionSolution act = bjt.vbeForCollectorCurrent(10e-3, 5.0, t, OPTIONS);
        BjtEvaluation e = new BjtEvaluation();
        bjt.evaluate(act.vbeVolts(), act.vbcVolts(), t, e);
        assertEquals(200, e.collectorAmps() / e.baseAmps(), 200 * 1e-8);
        // the same fit for a PNP gives the mirrored figures (derived)
        BjtParams pnp = BjtFit.gainAndSaturationCurrent(
                new BjtParams(BjtPolarity.PNP, 1e-14, 100, 2, 1, 1, 100, 20, 0.2, 0.02, 0, 0, 0, 3, 1.5, 1.11,
                        DiodeParams.DATASHEET_TEMPERATURE_KELVIN),
                200, -10e-3, -5.0, -0.75, -50e-3, 10, t);
        assertEquals(fitted.saturationCurrentAmps(), pnp.saturationCurrentAmps(), fitted.saturationCurrentAmps() * 1e-9);
        assertEquals(fitted.betaForward(), pnp.betaForward(), 1e-6);
    }

    @Test
    @DisplayName("Fit: IS from VBE(on) 0.65 V at IC 2 mA, VCE 5 V is reproduced (derived)")
    void fitSaturationCurrentFromActiveVbe() {
        double t = TestPhysics.kelvin(25.0);
        BjtParams base = BjtParams.ebersMoll(BjtPolarity.NPN, 1e-15, 150, 2).withEarlyVoltages(80, 20)
                .withKneeCurrents(0.1, 0.01);
        BjtParams fitted = BjtFit.saturationCurrentFromActiveVbe(base, 0.65, 2e-3, 5.0, t);
        assertEquals(0.65, new Bjt(fitted).vbeForCollectorCurrent(2e-3, 5.0, t, OPTIONS).vbeVolts(), 1e-9);
    }

    @Test
    void validationNamesTheField() {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, -5, 1));
        assertTrue(ex.getMessage().contains("betaForward"));
        ex = assertThrows(IllegalArgumentException.class,
                () -> BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 1).withEarlyVoltages(-3, 10));
        assertTrue(ex.getMessage().contains("forwardEarlyVolts"));
    }

    static Stream<Arguments> randomPoints() {
        Random rnd = new Random(19700501L);
        return Stream.generate(() -> {
            BjtPolarity pol = rnd.nextBoolean() ? BjtPolarity.NPN : BjtPolarity.PNP;
            BjtParams p = new BjtParams(pol, Math.pow(10, -15 + 2 * rnd.nextDouble()), 50 + 250 * rnd.nextDouble(),
                    0.5 + 5 * rnd.nextDouble(), 1 + 0.1 * rnd.nextDouble(), 1 + 0.1 * rnd.nextDouble(),
                    30 + 100 * rnd.nextDouble(), 5 + 20 * rnd.nextDouble(), 0.05 + 0.5 * rnd.nextDouble(),
                    0.005 + 0.05 * rnd.nextDouble(), 10, 1, 0.2, 3, 1.5, 1.11, 298.15);
            double s = pol.sign();
            double vbe = s * (-1.0 + 1.85 * rnd.nextDouble());
            double vbc = s * (-5.0 + 5.8 * rnd.nextDouble());
            double t = 230 + 170 * rnd.nextDouble();
            return Arguments.of(p, vbe, vbc, t);
        }).limit(80);
    }

    @ParameterizedTest(name = "[{index}] VBE {1}, VBC {2}, {3} K")
    @MethodSource("randomPoints")
    @DisplayName("Four partial derivatives match central finite differences (derived)")
    void derivativesMatchFiniteDifferences(BjtParams p, double vbe, double vbc, double kelvin) {
        Bjt bjt = new Bjt(p);
        BjtEvaluation e = new BjtEvaluation();
        BjtEvaluation plus = new BjtEvaluation();
        BjtEvaluation minus = new BjtEvaluation();
        double h = 1e-6;
        bjt.evaluate(vbe, vbc, kelvin, e);
        bjt.evaluate(vbe + h, vbc, kelvin, plus);
        bjt.evaluate(vbe - h, vbc, kelvin, minus);
        check(e.dCollectorDvbe(), plus.collectorAmps(), minus.collectorAmps(), h);
        check(e.dBaseDvbe(), plus.baseAmps(), minus.baseAmps(), h);
        bjt.evaluate(vbe, vbc + h, kelvin, plus);
        bjt.evaluate(vbe, vbc - h, kelvin, minus);
        check(e.dCollectorDvbc(), plus.collectorAmps(), minus.collectorAmps(), h);
        check(e.dBaseDvbc(), plus.baseAmps(), minus.baseAmps(), h);
    }

    private static void check(double analytic, double fPlus, double fMinus, double h) {
        double fd = (fPlus - fMinus) / (2 * h);
        double noise = 8 * Math.ulp(Math.max(Math.abs(fPlus), Math.abs(fMinus))) / (2 * h);
        assertEquals(fd, analytic, 1e-5 * Math.abs(fd) + noise);
    }
}
