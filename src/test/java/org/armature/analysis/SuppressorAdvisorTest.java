package org.armature.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.armature.model.Finding;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SuppressorAdvisorTest {

    private static final SuppressorAdvisor.Options CLOSED = SuppressorAdvisor.Options.DEFAULT.withTransient(false);

    @ParameterizedTest(name = "Vc {0} V, Rs {1} Ω: {2} ms to 10 %")
    @CsvSource(textBlock = """
            0,   0,   5.756
            0.7, 0,   4.749
            0,   400, 2.878
            """)
    @DisplayName("SU-7, SU-10 (derived): 12 V, 400 Ω, 1 H, I0 30 mA decaying to 10 %")
    void closedForms(double clampVolts, double seriesOhms, double millis) {
        SuppressorEstimate e = new SuppressorEstimate("test", clampVolts, seriesOhms, List.of());
        assertEquals(millis * 1e-3, e.decaySeconds(400, 1, 0.030, 0.003), 0.001e-3);
    }

    @Test
    @DisplayName("SU-10 (derived): a 400 Ω resistor across the coil puts 12 V on it at 30 mA; switch sees 24 V")
    void resistorPeak() {
        SuppressorEstimate e = new SuppressorEstimate("400 Ω", 0, 400, List.of());
        assertEquals(24, e.peakSwitchVolts(12, 0.030), 1e-12);
    }

    @Test
    @DisplayName("no clamp: the closed form does not apply (SU-0)")
    void noClamp() {
        SuppressorEstimate e = new SuppressorEstimate("none", Double.POSITIVE_INFINITY, 0, List.of());
        assertEquals(Double.POSITIVE_INFINITY, e.decaySeconds(400, 1, 0.03, 0.003));
        assertTrue(!e.clamps());
    }

    @Test
    @DisplayName("ranking, closed form: clamps above the supply release fastest, the plain diode is slowest (SU-12, SU-16)")
    void ranking() {
        SuppressorAdvisor.Ranking r = SuppressorAdvisor.rank(Templates.build(StageTemplate.LOW_SIDE_NPN),
                CLOSED.withReleaseRequirement(0.006));
        List<Suppressor> order = r.ranked().stream().map(SuppressorAdvisor.Candidate::suppressor).toList();
        assertEquals(Suppressor.DIODE, order.get(order.size() - 1));
        assertTrue(order.indexOf(Suppressor.DIODE_ZENER) < order.indexOf(Suppressor.DIODE));
        // SU-15: a zener about the supply voltage, 12 V on a 12 V rail
        assertEquals(12, r.proposedZenerVolts(), 1e-12);
        // smallest E24 breakdown at or above 1.1 × 13.2 V = 14.52 V
        assertEquals(15, r.proposedTvsVolts(), 1e-12);
        SuppressorAdvisor.Candidate diode = r.ranked().get(order.size() - 1);
        assertEquals(13.2 + 0.7, diode.peakSwitchVolts(), 1e-9);       // VS,max + VF
        assertEquals(false, diode.meetsRequirement().orElseThrow());
        assertTrue(r.ranked().stream().allMatch(c -> c.method().startsWith("closed form")));
    }

    @Test
    @DisplayName("a 30 V switch leaves 10.8 V of clamp: the zener drops to 10 V and no TVS fits")
    void lowRating() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN).updatePart("Q1", p -> p.with("vceoVolts", 30));
        SuppressorAdvisor.Ranking r = SuppressorAdvisor.rank(stage, CLOSED);
        assertEquals(10, r.proposedZenerVolts(), 1e-12);           // E24 below 0.8·30 − 13.2 − 0.7 = 10.1 V
        assertTrue(Double.isNaN(r.proposedTvsVolts()));
        assertTrue(r.findings().stream().map(Finding::key).anyMatch("suppressor.no-tvs-fits"::equals));
        // a coil-value resistor puts about 2·VS,max on the switch (30.6 V > 24 V): ranked last, beyond rating
        SuppressorAdvisor.Candidate last = r.ranked().get(r.ranked().size() - 1);
        assertEquals(Suppressor.RESISTOR, last.suppressor());
        assertTrue(!last.withinRating());
        assertTrue(r.ranked().subList(0, r.ranked().size() - 1).stream().allMatch(SuppressorAdvisor.Candidate::withinRating));
    }

    @Test
    @DisplayName("with the transient engine: the plain diode's release time and peak, and the method named")
    void transientDiode() {
        SuppressorAdvisor.Ranking r = SuppressorAdvisor.rank(Templates.build(StageTemplate.LOW_SIDE_NPN),
                SuppressorAdvisor.Options.DEFAULT.withCandidates(List.of(Suppressor.DIODE)));
        SuppressorAdvisor.Candidate c = r.ranked().get(0);
        assertTrue(c.method().startsWith("transient engine"), c.method());
        assertEquals(13.2 + 0.8, c.peakSwitchVolts(), 0.4);        // derived: VS,max plus about one diode drop
        assertTrue(c.releaseSeconds() > 0.004 && c.releaseSeconds() < 0.03, () -> c.toString());
    }

    @Test
    @DisplayName("unrecognised stage: nothing ranked, one finding")
    void unrecognised() {
        SuppressorAdvisor.Ranking r = SuppressorAdvisor.rank(Templates.build(StageTemplate.LOW_SIDE_NPN).withoutPart("K1"));
        assertTrue(r.ranked().isEmpty());
        assertEquals("suppressor.not-recognised", r.findings().get(0).key());
    }
}
