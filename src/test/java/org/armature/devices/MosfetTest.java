package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

class MosfetTest {

    private static final double T_NOM = DiodeParams.DATASHEET_TEMPERATURE_KELVIN;

    @ParameterizedTest(name = "MO-1/MO-2 (derived): β 0.2, VT0 1.5, VGS 3.3, VDS {0} V, λ {1} -> {2} mA")
    @CsvSource(textBlock = """
            0.1, 0.0,  35.000
            5.0, 0.0,  324.0
            5.0, 0.02, 356.4
            """)
    void squareLaw(double vds, double lambda, double milliamps) {
        MosfetEvaluation e = new MosfetEvaluation();
        new Mosfet(MosfetParams.level1(1.5, 0.2, lambda)).evaluate(3.3, vds, T_NOM, e);
        assertEquals(milliamps, e.drainAmps() * 1e3, 1e-9);
    }

    @Test
    @DisplayName("Cutoff: no current below threshold; continuity at the triode/saturation boundary (derived)")
    void regions() {
        Mosfet m = new Mosfet(MosfetParams.level1(1.5, 0.2, 0.02));
        MosfetEvaluation e = new MosfetEvaluation();
        m.evaluate(1.4, 5, T_NOM, e);
        assertEquals(0.0, e.drainAmps(), 0.0);
        m.evaluate(3.3, 1.8 - 1e-12, T_NOM, e);
        double below = e.drainAmps();
        m.evaluate(3.3, 1.8 + 1e-12, T_NOM, e);
        assertEquals(below, e.drainAmps(), 1e-11);
    }

    @Test
    @DisplayName("Source/drain interchange: ID(VGS, −VDS) = −ID(VGD, VDS) (symmetry of the level-1 law)")
    void interchange() {
        Mosfet m = new Mosfet(MosfetParams.level1(1.5, 0.2, 0.02));
        MosfetEvaluation e = new MosfetEvaluation();
        m.evaluate(3.3, -0.4, T_NOM, e);
        double reversed = e.drainAmps();
        m.evaluate(3.7, 0.4, T_NOM, e);
        assertEquals(-e.drainAmps(), reversed, 1e-15);
    }

    @Test
    @DisplayName("Temperature: threshold falls by the tempco, β by (T/Tnom)^−1.5 (from memory defaults)")
    void temperature() {
        Mosfet m = new Mosfet(MosfetParams.level1(1.5, 0.2, 0.0));
        assertEquals(1.5 - 0.005 * 100, m.thresholdAt(T_NOM + 100), 1e-12);
        assertEquals(0.2 * Math.pow((T_NOM + 100) / T_NOM, -1.5), m.betaAt(T_NOM + 100), 1e-12);
    }

    @Test
    @DisplayName("Fit: RDS(on) 0.05 Ω at VGS 10 V, 10 A and VGS(th) 2.0 V at 250 µA are reproduced (derived)")
    void fitFromDatasheet() {
        MosfetFit fit = MosfetFit.fit(MosfetParams.level1(1, 1, 0.01), 0.05, 10.0, 10.0, 2.0, 250e-6);
        assertTrue(fit.findings().isEmpty());
        Mosfet m = new Mosfet(fit.params().orElseThrow());
        MosfetEvaluation e = new MosfetEvaluation();
        m.evaluate(10.0, 0.5, T_NOM, e);
        assertEquals(10.0, e.drainAmps(), 1e-9);
        m.evaluate(2.0, 2.0, T_NOM, e);
        assertEquals(250e-6, e.drainAmps(), 1e-15);
    }

    @ParameterizedTest(name = "inconsistent figures -> {5}")
    @CsvSource(textBlock = """
            0.05, 2.0,  1.0,  2.5, 250e-6, mosfet.fit.rdsOnGateBelowThreshold
            1.0,  4.5,  5.0,  2.0, 250e-6, mosfet.fit.rdsOnNotTriode
            """)
    void fitFindings(double r, double vg, double ion, double vth, double ith, String key) {
        MosfetFit fit = MosfetFit.fit(MosfetParams.level1(1, 1, 0), r, vg, ion, vth, ith);
        assertTrue(fit.params().isEmpty());
        assertEquals(key, fit.findings().get(0).messageKey());
    }

    static Stream<Arguments> randomPoints() {
        Random rnd = new Random(1968L);
        return Stream.generate(() -> {
            MosfetParams p = MosfetParams.level1(0.8 + 2 * rnd.nextDouble(), 0.01 + rnd.nextDouble(),
                    0.05 * rnd.nextDouble());
            return Arguments.of(p, -1 + 12 * rnd.nextDouble(), -10 + 20 * rnd.nextDouble(),
                    230 + 170 * rnd.nextDouble());
        }).limit(60);
    }

    @ParameterizedTest(name = "[{index}] VGS {1}, VDS {2}, {3} K")
    @MethodSource("randomPoints")
    @DisplayName("gm and gds match central finite differences (derived)")
    void derivatives(MosfetParams p, double vgs, double vds, double kelvin) {
        Mosfet m = new Mosfet(p);
        MosfetEvaluation e = new MosfetEvaluation();
        MosfetEvaluation a = new MosfetEvaluation();
        MosfetEvaluation b = new MosfetEvaluation();
        double h = 1e-6;
        m.evaluate(vgs, vds, kelvin, e);
        m.evaluate(vgs + h, vds, kelvin, a);
        m.evaluate(vgs - h, vds, kelvin, b);
        assertEquals((a.drainAmps() - b.drainAmps()) / (2 * h), e.gmSiemens(), 1e-6 * (1 + Math.abs(e.gmSiemens())));
        m.evaluate(vgs, vds + h, kelvin, a);
        m.evaluate(vgs, vds - h, kelvin, b);
        assertEquals((a.drainAmps() - b.drainAmps()) / (2 * h), e.gdsSiemens(), 1e-6 * (1 + Math.abs(e.gdsSiemens())));
    }
}
