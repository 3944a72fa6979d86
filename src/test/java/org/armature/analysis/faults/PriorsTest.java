package org.armature.analysis.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The default priors' table and the user's weights. */
class PriorsTest {

    private static FaultDictionary npn;

    @BeforeAll
    static void build() {
        npn = FaultDictionary.build(Templates.build(StageTemplate.LOW_SIDE_NPN), Meter.DEFAULT);
    }

    private static double p(Diagnosis.Result r, String name) {
        return r.candidates().stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow().probability();
    }

    @Test
    void doublingAKindsWeightDoublesItsPriorOddsAgainstAnother() {
        // derived: with no reading and no symptom every likelihood is 1, so the posterior odds of two
        // candidates are their prior odds; doubling one weight doubles them
        Priors two = Priors.DEFAULT.parse("ce-short=2").parse("open=3");
        Priors four = two.parse("ce-short=4");
        Diagnosis.Result a = Diagnosis.rank(npn, Spread.DEFAULT, two, Optional.empty(), List.of());
        Diagnosis.Result b = Diagnosis.rank(npn, Spread.DEFAULT, four, Optional.empty(), List.of());
        assertEquals(2.0 / 3.0, p(a, "Q1:ce-short") / p(a, "R1:open"), 1e-12);
        assertEquals(2 * p(a, "Q1:ce-short") / p(a, "R1:open"), p(b, "Q1:ce-short") / p(b, "R1:open"), 1e-12);
    }

    @Test
    void aChangedPriorChangesTheRankingOfCandidatesWithTheSameLikelihood() {
        // R1:open and control~pin:track-open read alike (the base resistor cut off either way):
        // the table weighs the open resistor more (3.7 FIT × 59 % against 0.5); a large track-open
        // weight puts the track first
        FaultDictionary.Entry e = npn.entries().stream().filter(x -> x.name().equals("R1:open")).findFirst().orElseThrow();
        List<Reading> r = List.of(new Reading("control", true, e.high().volts()[npn.probeIndex("control")]),
                new Reading("pin", true, e.high().volts()[npn.probeIndex("pin")]));
        Diagnosis.Result before = Diagnosis.rank(npn, Spread.DEFAULT, Priors.DEFAULT, Optional.empty(), r);
        assertTrue(p(before, "R1:open") > p(before, "control~pin:track-open"));
        Diagnosis.Result after = Diagnosis.rank(npn, Spread.DEFAULT, Priors.DEFAULT.parse("track-open=100"),
                Optional.empty(), r);
        assertTrue(p(after, "control~pin:track-open") > p(after, "R1:open"));
    }

    @Test
    void defaultWeightsAreTheClassRateTimesTheModeShare() {
        Stage s = Templates.build(StageTemplate.LOW_SIDE_NPN);
        // derived from the table's figures (MIL-HDBK-217F N2 λb and FMD-97 shares, as recalled from memory)
        assertEquals(3.7 * 0.59, Priors.DEFAULT.weight(s, Optional.of(new Fault("R1", FaultKind.OPEN))), 1e-12);
        assertEquals(3.8 * 0.49, Priors.DEFAULT.weight(s, Optional.of(new Fault("D1", FaultKind.SHORT))), 1e-12);
        assertEquals(0.74 * 0.73 / 2, Priors.DEFAULT.weight(s, Optional.of(new Fault("Q1", FaultKind.CE_SHORT))), 1e-12);
        assertEquals(PriorTable.NONE_WEIGHT, Priors.DEFAULT.weight(s, Optional.empty()));
        // a user's weight replaces the table's for every part of the kind
        assertEquals(2.0, Priors.DEFAULT.parse("open=2").weight(s, Optional.of(new Fault("R1", FaultKind.OPEN))));
        assertEquals(2.0, Priors.DEFAULT.parse("open=2").weight(s, Optional.of(new Fault("GND1", FaultKind.OPEN))));
        // every row names its source
        for (PriorTable.Row row : PriorTable.rows()) {
            assertTrue(row.weight() > 0 && !row.basis().isBlank(), row.toString());
        }
        for (PartKind k : PartKind.values()) {
            for (FaultKind f : FaultKind.of(k)) {
                assertTrue(PriorTable.weight(Optional.of(k), f) > 0);
            }
        }
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            melted=2   | No fault kind 'melted'
            open       | A prior is written KIND=WEIGHT
            open=-1    | A prior weight is a number not below 0
            open=lots  | A prior weight is a number not below 0
            =2         | A prior is written KIND=WEIGHT
            """)
    void badWeightsAreOneSentenceListingTheKinds(String text, String start) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Priors.DEFAULT.parse(text));
        assertTrue(e.getMessage().startsWith(start), e.getMessage());
        assertTrue(e.getMessage().contains("none, open, short, drift-x10") && e.getMessage().contains("ce-short")
                && e.getMessage().contains("track-open, coil-open"), e.getMessage());
        assertEquals(1, e.getMessage().lines().count());
    }

    @Test
    void theChangesAreDescribedAsWritten() {
        Priors p = Priors.DEFAULT.parse("none=5").parse("ce-short=2.5");
        assertEquals("none=5, ce-short=2.5", p.describeChanges());
        assertTrue(Priors.DEFAULT.isDefault());
        assertTrue(!p.isDefault());
        assertEquals(p, SavedHunt.priors(java.util.Map.of("none", 5.0, "ce-short", 2.5)));
    }

    @Test
    void theDocumentedTableIsTheOneInTheCode() throws java.io.IOException {
        // docs/fault-priors.md prints PriorTable: every row's kind, basis and weight on one line
        List<String> lines = java.nio.file.Files.readAllLines(java.nio.file.Path.of("docs", "fault-priors.md"));
        for (PriorTable.Row row : PriorTable.rows()) {
            String w = String.format(java.util.Locale.ROOT, "%.3g", row.weight()).replaceAll("\\.?0+$", "");
            assertTrue(lines.stream().anyMatch(l -> l.contains("`" + row.kind().id() + "`") && l.contains(row.basis())
                    && l.contains("| " + w + " |")), "not in docs/fault-priors.md: " + row);
        }
    }
}
