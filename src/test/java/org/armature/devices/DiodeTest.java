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
import org.junit.jupiter.params.provider.MethodSource;

class DiodeTest {

    private static final double T300 = 300.0;

    private static DiodeParams at(double is, double n, double kelvin) {
        return DiodeParams.junction(is, n).withNominalTemperature(kelvin);
    }

    @Test
    @DisplayName("DI-2: slope 59.53 mV/decade at n = 1, 300 K (derived)")
    void slopePerDecade() {
        Diode d = new Diode(at(1e-14, 1.0, T300));
        JunctionEvaluation e = new JunctionEvaluation();
        double v1 = 0.6;
        d.evaluate(v1, T300, e);
        double i1 = e.currentAmps();
        // find the voltage carrying ten times the current: V·ln(10) step (derived)
        double v2 = v1 + 0.05953;
        d.evaluate(v2, T300, e);
        assertEquals(10.0, e.currentAmps() / i1, 10.0 * 0.0005);
    }

    @Test
    @DisplayName("DI-3: 5 V, 1 kΩ, diode 0.7 V at 1 mA with 0.1 V/decade: ID = 4.237 mA, VD = 0.762 V (Sedra & Smith)")
    void iterativeTextbookExample() {
        DiodeParams p = DiodeParams.fromForwardPointAndSlope(0.7, 1e-3, 0.1, T300);
        SeriesOperatingPoint op = Diode.seriesOperatingPoint(5.0, 1000.0, p, T300);
        assertEquals(4.237e-3, op.currentAmps(), 0.0005e-3);
        assertEquals(0.762, op.diodeVolts(), 0.001);
    }

    @Test
    @DisplayName("DI-4: 1 V, 1 kΩ, IS = 1e-15, VT = 25 mV: VD = 0.6635 V, ID = 0.3365 mA ±0.5 µA (Sedra & Smith; derived)")
    void lowVoltageSeriesCircuit() {
        double kelvin = TestPhysics.kelvinForThermalVoltage(0.025);
        SeriesOperatingPoint op = Diode.seriesOperatingPoint(1.0, 1000.0, at(1e-15, 1.0, kelvin), kelvin);
        assertEquals(0.6635, op.diodeVolts(), 0.00005);
        assertEquals(0.3365e-3, op.currentAmps(), 0.5e-6);
    }

    @Test
    @DisplayName("DI-6: 20 mA into 100 Ω ∥ diode, IS = 1e-14, VT = 25 mV, Newton with step limit: 0.697385 V, 13.0262 mA (derived)")
    void nortonFeedWithOwnLimitedNewton() {
        double kelvin = TestPhysics.kelvinForThermalVoltage(0.025);
        Diode d = new Diode(at(1e-14, 1.0, kelvin));
        JunctionEvaluation e = new JunctionEvaluation();
        double source = 20e-3;
        double g = 1.0 / 100.0;
        double v = 0.0;
        int iterations = 0;
        for (; iterations < 100; iterations++) {
            d.evaluate(v, kelvin, e);
            double residual = source - g * v - e.currentAmps();
            double proposed = v + residual / (g + e.conductanceSiemens());
            double limited = d.limitVoltage(proposed, v, kelvin);
            boolean done = Math.abs(limited - v) < 1e-13 && limited == proposed;
            v = limited;
            if (done) {
                break;
            }
        }
        d.evaluate(v, kelvin, e);
        assertTrue(iterations < 100);
        assertEquals(0.697385, v, 0.0000005);
        assertEquals(13.0262e-3, e.currentAmps(), 0.00005e-3);
        // the Thevenin equivalent through the library helper agrees (derived: 2 V behind 100 Ω)
        SeriesOperatingPoint op = Diode.seriesOperatingPoint(2.0, 100.0, d.params(), kelvin);
        assertEquals(v, op.junctionVolts(), 1e-10);
    }

    @Test
    @DisplayName("DI-7: 5 V, 1 kΩ, IS = 1e-14, n = 1, 300 K: VD = 0.69254 V, I = 4.3075 mA (derived)")
    void seriesCircuit300K() {
        SeriesOperatingPoint op = Diode.seriesOperatingPoint(5.0, 1000.0, at(1e-14, 1.0, T300), T300);
        assertEquals(0.69254, op.diodeVolts(), 0.000005);
        assertEquals(4.3075e-3, op.currentAmps(), 0.00005e-3);
    }

    @Test
    @DisplayName("Series resistance adds its drop to the terminal voltage (derived: VD = Vj + I·RS)")
    void seriesResistanceOnTerminals() {
        DiodeParams p = at(1e-14, 1.0, T300).withSeriesResistance(10.0);
        SeriesOperatingPoint op = Diode.seriesOperatingPoint(5.0, 990.0, p, T300);
        assertEquals(op.junctionVolts() + 10.0 * op.currentAmps(), op.diodeVolts(), 1e-12);
        assertEquals(5.0, op.diodeVolts() + 990.0 * op.currentAmps(), 1e-9);
    }

    @Test
    @DisplayName("DI-13: forward-voltage tempco at constant current about −2 mV/K (common practice)")
    void forwardVoltageTempco() {
        DiodeParams p = DiodeParams.junction(1e-14, 1.0);
        double i = 1e-3;
        double t0 = TestPhysics.kelvin(25.0);
        double v0 = voltageAtCurrent(p, i, t0);
        double v1 = voltageAtCurrent(p, i, t0 + 1.0);
        double tempco = v1 - v0;
        assertTrue(tempco < -1.5e-3 && tempco > -2.5e-3, "tempco " + tempco);
    }

    private static double voltageAtCurrent(DiodeParams p, double amps, double kelvin) {
        // a huge source behind a huge resistor is a current source (derived)
        double r = 1e9;
        return Diode.seriesOperatingPoint(amps * r, r, p, kelvin).junctionVolts();
    }

    @Test
    @DisplayName("Zener: at v = −BV the current is −IBV; zero current at zero volts (derived from the model)")
    void zenerKnee() {
        DiodeParams p = DiodeParams.junction(1e-14, 1.0).withBreakdown(5.1, 5e-3, 1.0);
        Diode d = new Diode(p);
        JunctionEvaluation e = new JunctionEvaluation();
        double t = p.nominalTemperatureKelvin();
        d.evaluate(-5.1, t, e);
        assertEquals(-5e-3, e.currentAmps(), 1e-3 * 5e-3);
        d.evaluate(0.0, t, e);
        assertEquals(0.0, e.currentAmps(), 1e-30);
        // clamp: 12 V through 1 kΩ into the zener sits just beyond 5.1 V (derived)
        SeriesOperatingPoint op = Diode.seriesOperatingPoint(-12.0, 1000.0, p, t);
        assertTrue(op.diodeVolts() < -5.1 && op.diodeVolts() > -5.3, "v " + op.diodeVolts());
    }

    @Test
    @DisplayName("Bidirectional TVS: odd current, ±IBV at ±BV, no forward conduction below BV (derived from the model)")
    void bidirectionalClamp() {
        DiodeParams p = DiodeParams.junction(1e-14, 1.0).asBidirectionalClamp(15.0, 1e-3, 2.0);
        Diode d = new Diode(p);
        JunctionEvaluation e = new JunctionEvaluation();
        double t = p.nominalTemperatureKelvin();
        d.evaluate(15.0, t, e);
        assertEquals(1e-3, e.currentAmps(), 1e-9);
        d.evaluate(-15.0, t, e);
        assertEquals(-1e-3, e.currentAmps(), 1e-9);
        d.evaluate(0.8, t, e);
        assertTrue(Math.abs(e.currentAmps()) < 1e-12);
        SeriesOperatingPoint op = Diode.seriesOperatingPoint(40.0, 100.0, p, t);
        assertTrue(op.diodeVolts() > 15.0 && op.diodeVolts() < 16.5, "v " + op.diodeVolts());
    }

    @Test
    @DisplayName("LED fitted from VF = 2.0 V at IF = 20 mA with N = 2 reproduces the point (derived)")
    void ledFit() {
        double t = TestPhysics.kelvin(25.0);
        DiodeParams p = DiodeParams.fromForwardPoint(2.0, 20e-3, 2.0, t);
        JunctionEvaluation e = new JunctionEvaluation();
        new Diode(p).evaluate(2.0, t, e);
        assertEquals(20e-3, e.currentAmps(), 20e-3 * 1e-12);
    }

    @Test
    @DisplayName("Huge junction voltages give finite current and conductance (no overflow)")
    void noOverflow() {
        Diode d = new Diode(DiodeParams.junction(1e-14, 1.0).withBreakdown(50, 1e-3, 1));
        JunctionEvaluation e = new JunctionEvaluation();
        for (double v : new double[] {1e3, 1e6, -1e3, -1e6}) {
            d.evaluate(v, 300.0, e);
            assertTrue(Double.isFinite(e.currentAmps()) && Double.isFinite(e.conductanceSiemens()));
            assertTrue(e.conductanceSiemens() > 0);
        }
    }

    @Test
    void validationNamesTheField() {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> DiodeParams.junction(-1e-14, 1.0));
        assertTrue(ex.getMessage().contains("saturationCurrentAmps"));
        ex = assertThrows(IllegalArgumentException.class, () -> DiodeParams.junction(1e-14, 0.0));
        assertTrue(ex.getMessage().contains("emissionCoefficient"));
    }

    static Stream<Arguments> randomPoints() {
        Random rnd = new Random(20240611L);
        DiodeParams[] kinds = {
            DiodeParams.junction(1e-14, 1.0),
            DiodeParams.junction(2e-9, 1.9).withBreakdown(5.6, 5e-3, 1.5).withBreakdownTempco(4e-4),
            DiodeParams.junction(1e-14, 1.0).asBidirectionalClamp(15.0, 1e-3, 2.0)
        };
        return Stream.generate(() -> {
            DiodeParams p = kinds[rnd.nextInt(kinds.length)];
            double bv = p.hasBreakdown() ? p.breakdownVolts() : 10.0;
            double v = -bv - 0.3 + rnd.nextDouble() * (bv + 1.2);
            double t = 230.0 + 170.0 * rnd.nextDouble();
            return Arguments.of(p, v, t);
        }).limit(60);
    }

    @ParameterizedTest(name = "dI/dV at {1} V, {2} K")
    @MethodSource("randomPoints")
    @DisplayName("Conductance matches a central finite difference (derived)")
    void conductanceMatchesFiniteDifference(DiodeParams p, double v, double kelvin) {
        Diode d = new Diode(p);
        JunctionEvaluation e = new JunctionEvaluation();
        double h = 1e-6;
        d.evaluate(v + h, kelvin, e);
        double ip = e.currentAmps();
        d.evaluate(v - h, kelvin, e);
        double im = e.currentAmps();
        d.evaluate(v, kelvin, e);
        double fd = (ip - im) / (2 * h);
        // rounding noise of the difference quotient: a few ulps of the current over 2h
        double noise = 8 * Math.ulp(Math.max(Math.abs(ip), Math.abs(im))) / (2 * h);
        assertEquals(fd, e.conductanceSiemens(), 1e-5 * Math.abs(fd) + noise);
    }

    @Test
    @DisplayName("limiting leaves a reverse-biased step it does not limit exactly as proposed (Nagel 1975 limits only large steps)")
    void limiterPassesSmallReverseStepsUnchanged() {
        DiodeParams p = DiodeParams.junction(1e-14, 1.0).withBreakdown(100, 1e-5, 1.0);
        Diode d = new Diode(p);
        double t = p.nominalTemperatureKelvin();
        for (double v : new double[] {-0.3, -11.999999999999998, -23.7, -99.9}) {
            assertEquals(v, d.limitVoltage(v, v + 1e-3, t), 0.0, "no rounding through the breakdown mapping at " + v);
        }
        BreakdownClamp clamp = BreakdownClamp.atRating(40.0);
        for (double v : new double[] {12.6, 13.200000000000001, 24.9}) {
            assertEquals(v, clamp.limitVoltage(v, v - 1e-3), 0.0, "no rounding through the rating offset at " + v);
        }
    }
}
