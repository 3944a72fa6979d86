package org.armature.render.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.armature.analysis.faults.Diagnosis;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.SavedHunt;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The fault hunt section of the design report, read back with PDFBox. Every figure checked is the
 * one {@link SavedHunt#rank} computes for the same hunt in the test (the one code path of the
 * window, {@code diagnose} and the report), printed with the report's own formatters; none is
 * typed in.
 */
class FaultHuntReportTest {

    private static final LocalDate DAY = LocalDate.of(2026, 12, 5);

    private static Stage npn;
    private static Stage nmos;
    private static FaultHunt hunt;
    private static StageDocument doc;
    private static String text;

    /**
     * A reading taken from the dictionary's own entry for a collector–emitter short of Q1 (what the
     * engine says that fault reads across the coil with the pin low), with the symptom "no-release"
     * and one prior changed: a hunt whose ranking puts a fault, not the healthy stage, on top, and
     * leaves candidates for the next measurement to split.
     */
    @BeforeAll
    static void build() throws IOException {
        npn = Templates.build(StageTemplate.LOW_SIDE_NPN);
        nmos = Templates.build(StageTemplate.LOW_SIDE_NMOS);
        FaultDictionary d = FaultDictionary.build(npn, Meter.DEFAULT);
        FaultDictionary.Entry ceShort = d.entries().stream().filter(e -> e.name().equals("Q1:ce-short")).findFirst()
                .orElseThrow();
        String coil = "coil";
        double coilLow = ceShort.low().volts()[d.probeIndex(coil)];
        hunt = FaultHunt.start(0).withSymptom(Optional.of("no-release"))
                .withReadings(List.of(new FaultHunt.HuntReading(coil, false, coilLow)))
                .withPriorWeights(Map.of("ce-short", 3.0));
        doc = new StageDocument("Bench hunt", List.of(npn, nmos)).withFaultHunt(Optional.of(hunt));
        StageSnapshot snap = StageSnapshot.evaluate(doc.title(), npn, true, StageSnapshot.Depth.REPORT, DAY);
        text = text(DesignReport.pdf(snap, doc));
    }

    private static String text(byte[] pdf) throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            return new PDFTextStripper().getText(d);
        }
    }

    /** Whitespace-insensitive: table cells and wrapped lines come back with spaces or line breaks between them. */
    private static boolean holds(String text, String... words) {
        String re = String.join("\\s+", java.util.Arrays.stream(words).map(Pattern::quote).toList());
        return Pattern.compile(re).matcher(text).find();
    }

    @Test
    @DisplayName("the section holds the readings, the top candidate with its probability and the next measurement, as SavedHunt.rank computes them")
    void sectionHoldsTheRanking() {
        SavedHunt.Ranked r = SavedHunt.rank(npn, hunt);
        Diagnosis.Candidate top = r.result().candidates().get(0);
        assertTrue(text.contains("Fault hunt"), text);
        assertTrue(holds(text, "Symptom:", "no-release"), text);
        assertTrue(holds(text, "Meter:", "input", "resistance",
                org.armature.units.EngineeringNotation.format(hunt.meter().inputOhms(), org.armature.units.Unit.OHM)
                        + ",", "4000", "counts"), text);
        for (FaultHunt.HuntReading rd : hunt.readings()) {
            assertTrue(holds(text, FaultHuntSection.pinState(rd.pinHigh()), FaultHuntSection.volts(rd.volts())),
                    "reading " + rd + " in " + text);
        }
        assertTrue(holds(text, "coil:", "across", "the", "relay", "coil,", "K1.a1", "to", "K1.a2"),
                "the probe point is named in words: " + text);
        assertTrue(holds(text, "1", top.name(), FaultHuntSection.percent(top.probability())), text);
        assertTrue(top.name().equals("Q1:ce-short") || r.dictionary().ambiguityGroups(
                        org.armature.analysis.faults.Spread.DEFAULT).stream()
                        .anyMatch(g -> g.contains("Q1:ce-short") && g.contains(top.name())),
                "a C–E short's own reading puts it (or its ambiguity group) first (DiagnosisTest's property): " + top.name());
        assertTrue(holds(text, "Why", top.name()), "the top candidate's reading-by-reading table");
        Diagnosis.Next next = r.result().next().orElseThrow();
        assertTrue(next.gainBits() > 0.1, "one reading leaves candidates to split: " + next);
        assertTrue(holds(text, "Measure", next.probe(), "with", "the", "pin", FaultHuntSection.pinState(next.pinHigh())
                + ",", "expected", "information", "gain", FaultHuntSection.bits(next.gainBits())), text);
        // defaults are per part class since the handbook table (PriorTable), so the row says so
        assertTrue(holds(text, "ce-short", "3", "per", "part", "class"), "the changed prior beside where its default comes from");
    }

    @Test
    @DisplayName("the top candidates list their readings expected against measured, with the dictionary's figures")
    void explanations() {
        SavedHunt.Ranked r = SavedHunt.rank(npn, hunt);
        for (int i = 0; i < Math.min(FaultHuntSection.EXPLAINED_CANDIDATES, r.result().candidates().size()); i++) {
            Diagnosis.Candidate c = r.result().candidates().get(i);
            for (Diagnosis.Explanation e : c.explains()) {
                assertTrue(holds(text, e.probe(), FaultHuntSection.pinState(e.pinHigh()),
                        FaultHuntSection.volts(e.expectedVolts()), FaultHuntSection.volts(e.measuredVolts())),
                        c.name() + " / " + e);
            }
        }
    }

    @Test
    @DisplayName("candidates that no probe point tells apart are named as one ambiguity group")
    void ambiguityGroups() {
        SavedHunt.Ranked r = SavedHunt.rank(npn, hunt);
        List<String> listed = r.result().candidates().stream().limit(FaultHuntSection.LISTED_CANDIDATES)
                .map(Diagnosis.Candidate::name).toList();
        boolean any = false;
        for (List<String> g : r.dictionary().ambiguityGroups(org.armature.analysis.faults.Spread.DEFAULT)) {
            if (g.size() > 1 && listed.contains(g.get(0))) {
                List<String> others = new java.util.ArrayList<>(g.subList(1, g.size()));
                for (int i = 0; i < others.size() - 1; i++) {
                    others.set(i, others.get(i) + ",");
                }
                assertTrue(holds(text, others.toArray(String[]::new)), g + " in " + text);
                any = true;
            }
        }
        assertTrue(any || r.dictionary().ambiguityGroups(org.armature.analysis.faults.Spread.DEFAULT).stream()
                .noneMatch(g -> g.size() > 1 && listed.contains(g.get(0))), "groups checked");
    }

    @Test
    @DisplayName("no section without a hunt, nor for a stage other than the hunted one")
    void noSectionElsewhere() throws IOException {
        assertTrue(FaultHuntSection.of(doc, npn).isPresent());
        assertTrue(FaultHuntSection.of(doc, nmos).isEmpty(), "the hunt is on stage 0");
        assertTrue(FaultHuntSection.of(doc.withFaultHunt(Optional.empty()), npn).isEmpty());
        // an equal copy that is not the document's own stage 0 gets none either
        Stage copy = Templates.build(StageTemplate.LOW_SIDE_NPN);
        assertEquals(npn, copy);
        assertTrue(FaultHuntSection.of(doc, copy).isEmpty());
        StageSnapshot other = StageSnapshot.evaluate(doc.title(), nmos, true, StageSnapshot.Depth.REPORT, DAY);
        assertFalse(text(DesignReport.pdf(other, doc)).contains("Fault hunt"));
        StageSnapshot plain = StageSnapshot.evaluate(doc.title(), npn, true, StageSnapshot.Depth.REPORT, DAY);
        assertFalse(text(DesignReport.pdf(plain, doc.withFaultHunt(Optional.empty()))).contains("Fault hunt"));
    }

    @Test
    @DisplayName("a hunt that cannot be ranked (a net the stage does not have) gives one sentence, and the report is still made")
    void unrankableHuntIsOneSentence() throws IOException {
        FaultHunt bad = hunt.withReadings(List.of(new FaultHunt.HuntReading("nowhere", true, 1.5)));
        StageDocument badDoc = doc.withFaultHunt(Optional.of(bad));
        FaultHuntSection section = FaultHuntSection.of(badDoc, npn).orElseThrow();
        assertTrue(section.ranked().isEmpty());
        assertTrue(section.failure().startsWith("The fault hunt cannot be ranked: no probe point 'nowhere'"),
                section.failure());
        assertTrue(section.failure().endsWith("."));
        StageSnapshot snap = StageSnapshot.evaluate(doc.title(), npn, true, StageSnapshot.Depth.REPORT, DAY);
        String t = text(DesignReport.pdf(snap, badDoc));
        assertTrue(holds(t, "The", "fault", "hunt", "cannot", "be", "ranked:", "no", "probe", "point", "'nowhere'"), t);
        assertFalse(t.contains("Next measurement"), "no ranking, no next measurement");
        assertTrue(t.contains("What this report is"), "the rest of the report follows");
    }

    @Test
    @DisplayName("an unknown word in a hunt made in code (not from a file) is said in one sentence too")
    void unknownWordIsOneSentence() {
        FaultHuntSection s = FaultHuntSection.rank(hunt.withSymptom(Optional.of("smoke")), npn);
        assertTrue(s.failure().contains("'smoke'") && s.failure().contains("no-operate"), s.failure());
        FaultHuntSection k = FaultHuntSection.rank(hunt.withPriorWeights(Map.of("melted", 1.0)), npn);
        assertTrue(k.failure().contains("'melted'") && k.failure().contains("ce-short"), k.failure());
    }

    @Test
    @DisplayName("the report's number formats: meter-like volts, percent, bits")
    void formats() {
        // four significant digits, as a 4,000-count meter shows at most (common practice, FH-4)
        assertEquals("11.87 V", FaultHuntSection.volts(11.8749));
        assertEquals("13 mV", FaultHuntSection.volts(0.013));
        assertEquals("-100 mV", FaultHuntSection.volts(-0.1));
        assertEquals("-4.889 µV", FaultHuntSection.volts(-4.8886e-6));
        assertEquals("1 V", FaultHuntSection.volts(0.99999));
        assertEquals("0 V", FaultHuntSection.volts(0));
        assertEquals("87.3 %", FaultHuntSection.percent(0.873));
        assertEquals("1.25 %", FaultHuntSection.percent(0.0125));
        assertEquals("< 0.01 %", FaultHuntSection.percent(1e-7));
        assertEquals("< 0.01 %", FaultHuntSection.percent(0), "an underflow of a tiny posterior");
        assertEquals("1.58 bits", FaultHuntSection.bits(Math.log(3) / Math.log(2)));  // derived: log2 3
    }

    @Test
    @DisplayName("every probe point measured in both pin states: the section says no measurement is left")
    void noneLeft() throws IOException {
        FaultDictionary d = FaultDictionary.build(npn, Meter.DEFAULT);
        FaultDictionary.Entry healthy = d.entries().get(0);
        List<FaultHunt.HuntReading> all = new java.util.ArrayList<>();
        for (boolean high : new boolean[] {true, false}) {
            for (int k = 0; k < d.probes().size(); k++) {
                all.add(new FaultHunt.HuntReading(d.probes().get(k).name(), high, healthy.state(high).volts()[k]));
            }
        }
        FaultHunt every = FaultHunt.start(0).withReadings(all);
        assertTrue(SavedHunt.rank(npn, every).result().next().isEmpty(), "nothing left to measure (Diagnosis)");
        StageDocument d2 = doc.withFaultHunt(Optional.of(every));
        StageSnapshot snap = StageSnapshot.evaluate(doc.title(), npn, true, StageSnapshot.Depth.REPORT, DAY);
        String t = text(DesignReport.pdf(snap, d2));
        assertTrue(holds(t, "None", "left:", "every", "probe", "point", "has", "been", "measured"), t);
        assertTrue(holds(t, "1", "none", "(healthy", "stage)"), "healthy readings rank none first (DiagnosisTest's property)");
    }

    @Test
    @DisplayName("a hunt with nothing entered yet: no readings, no reasons, and the first measurement to take")
    void emptyHunt() throws IOException {
        StageDocument d2 = doc.withFaultHunt(Optional.of(FaultHunt.start(0)));
        StageSnapshot snap = StageSnapshot.evaluate(doc.title(), npn, true, StageSnapshot.Depth.REPORT, DAY);
        String t = text(DesignReport.pdf(snap, d2));
        Diagnosis.Next next = SavedHunt.rank(npn, FaultHunt.start(0)).result().next().orElseThrow();
        assertTrue(holds(t, "Symptom:", "none", "entered."), t);
        assertTrue(holds(t, "No", "readings", "were", "entered."), t);
        assertFalse(t.contains("reading by reading"), t);
        assertTrue(holds(t, "Measure", next.probe(), "with", "the", "pin", FaultHuntSection.pinState(next.pinHigh())
                + ",", "expected", "information", "gain", FaultHuntSection.bits(next.gainBits())), t);
        assertTrue(holds(t, "The", "default", "prior", "weights", "were", "used"), t);
    }
}
