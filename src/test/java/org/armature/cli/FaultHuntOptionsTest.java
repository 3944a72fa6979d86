package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.analysis.faults.SavedHunt;
import org.armature.io.StageFiles;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code --prior}, {@code --meter-accuracy}, {@code --meter-counts}, track opens between nets, and a saved hunt. */
class FaultHuntOptionsTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Path file;

    @BeforeEach
    void writeStage() {
        file = dir.resolve("npn.stage.json");
        StageFiles.save(StageDocument.of(Templates.build(StageTemplate.LOW_SIDE_NPN)), file);
    }

    private JsonNode json(String... args) throws Exception {
        CliRun r = CliRun.of(args);
        assertEquals(0, r.status(), r.err());
        return JSON.readTree(r.out());
    }

    private static double probability(JsonNode j, String fault) {
        for (JsonNode c : j.get("candidates")) {
            if (c.get("fault").asText().equals(fault)) {
                return c.get("probability").asDouble();
            }
        }
        throw new AssertionError("no candidate " + fault);
    }

    @Test
    void priorsChangeTheOddsAndAreNamedInTheOutput() throws Exception {
        JsonNode a = json("diagnose", file.toString(), "--json", "--prior", "ce-short=2", "--prior", "open=1");
        JsonNode b = json("diagnose", file.toString(), "--json", "--prior", "ce-short=4", "--prior", "open=1");
        // derived: no readings, so posterior odds = prior odds: 2 : 1, then 4 : 1
        assertEquals(2, probability(a, "Q1:ce-short") / probability(a, "R1:open"), 1e-9);
        assertEquals(4, probability(b, "Q1:ce-short") / probability(b, "R1:open"), 1e-9);
        assertEquals(2, a.get("priors").get("changed").get("ce-short").asDouble());
        assertTrue(a.get("priors").get("source").asText().contains("MIL-HDBK-217F"));
        CliRun text = CliRun.of("diagnose", file.toString(), "--prior", "none=5");
        assertTrue(text.out().contains("Priors changed: none=5; the others: MIL-HDBK-217F"), text.out());
        CliRun plain = CliRun.of("diagnose", file.toString());
        assertTrue(plain.out().startsWith("Priors: MIL-HDBK-217F Notice 2"), plain.out());
    }

    @Test
    void badOptionValuesAreOneSentence() {
        CliRun kind = CliRun.of("diagnose", file.toString(), "--prior", "melted=2");
        assertEquals(1, kind.status());
        assertTrue(kind.err().contains("melted") && kind.err().contains("none, open, short") && kind.noStackTrace(),
                kind.err());
        assertEquals(1, kind.err().strip().lines().count());
        CliRun weight = CliRun.of("diagnose", file.toString(), "--prior", "open=-2");
        assertTrue(weight.err().contains("not below 0") && weight.err().contains("ce-short"), weight.err());
        CliRun acc = CliRun.of("faults", file.toString(), "--meter-accuracy", "2 percent");
        assertEquals(1, acc.status());
        assertTrue(acc.err().contains("for example 1%+2 or 0.5%+3") && acc.noStackTrace(), acc.err());
        CliRun counts = CliRun.of("diagnose", file.toString(), "--meter-counts", "lots");
        assertTrue(counts.err().contains("for example 4000 or 6000"), counts.err());
        CliRun net = CliRun.of("solve", file.toString(), "--fault", "switch~nowhere:track-open");
        assertEquals(1, net.status());
        assertTrue(net.err().contains("contact-common, contact-nc, contact-no, control, pin, supply, switch")
                && net.noStackTrace(), net.err());
        assertEquals(1, net.err().strip().lines().count());
    }

    @Test
    void aWiderMeterToleranceMergesAmbiguityGroups() throws Exception {
        JsonNode fine = json("faults", file.toString(), "--json");
        JsonNode coarse = json("faults", file.toString(), "--json", "--meter-accuracy", "20%+50", "--meter-counts", "2000");
        assertEquals("1%+2", fine.get("meterAccuracy").asText());
        assertEquals("20%+50", coarse.get("meterAccuracy").asText());
        assertEquals(2000, coarse.get("meterCounts").asInt());
        assertTrue(coarse.get("ambiguityGroups").size() < fine.get("ambiguityGroups").size());
        CliRun table = CliRun.of("diagnose", file.toString(), "--meter-accuracy", "0.5%+3", "--meter-counts", "6000");
        assertTrue(table.out().contains("±(0.5 % + 3 digits) on 6000 counts"), table.out());
    }

    @Test
    void trackOpensBetweenNetsAreInTheDictionaryAndInSolve() throws Exception {
        JsonNode faults = json("faults", file.toString(), "--json");
        boolean listed = false;
        for (JsonNode e : faults.get("entries")) {
            listed |= e.get("fault").asText().equals("control~switch:track-open");
        }
        assertTrue(listed);
        JsonNode j = json("solve", file.toString(), "--json", "--pin-state", "high", "--fault", "switch~supply:track-open");
        // derived: the coil is cut off the collector: no coil current, the relay stays released
        assertTrue(Math.abs(j.get("parts").get("K1").get("coilCurrent").asDouble()) < 1e-6);
        assertEquals("released", j.get("parts").get("K1").get("state").asText());
        CliRun sim = CliRun.of("simulate", file.toString(), "--json", "--fault", "switch~supply:track-open");
        assertEquals(0, sim.status(), sim.err());
    }

    private static FaultHunt hunt(Stage stage) {
        // a hunt on a stage whose freewheeling diode is shorted: the coil reads near 0 V with the pin high
        return FaultHunt.start(0).withSymptom(Optional.of("no-operate"))
                .withReadings(List.of(new FaultHunt.HuntReading("coil", true, 0.003)))
                .withPriorWeights(Map.of("none", 2.0));
    }

    @Test
    void aSavedHuntIsRankedWhenNoReadingIsGivenAndReplacedWhenOneIs() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN);
        StageDocument doc = StageDocument.of(stage).withFaultHunt(Optional.of(hunt(stage)));
        DiagnoseCommand.Diagnosed saved = DiagnoseCommand.diagnose(doc, 0, new DiagnoseCommand.Request(
                Optional.empty(), List.of(), List.of(), new FaultOptions.MeterOptions()));
        assertTrue(saved.savedHunt());
        assertEquals(1, saved.readingCount());
        SavedHunt.Ranked byHand = SavedHunt.rank(stage, hunt(stage));
        assertEquals(byHand.result().candidates().get(0).name(), saved.result().candidates().get(0).name());
        assertEquals(byHand.result().candidates().get(0).probability(), saved.result().candidates().get(0).probability(),
                1e-12);
        assertEquals(2.0, saved.priors().noneWeight());
        assertTrue(DiagnoseCommand.table(saved).startsWith("Ranking the fault hunt saved in the file (1 reading)"));
        assertTrue(DiagnoseCommand.json(saved).contains("\"savedHunt\" : true"));
        // a prior given here goes over the saved ones
        DiagnoseCommand.Diagnosed over = DiagnoseCommand.diagnose(doc, 0, new DiagnoseCommand.Request(
                Optional.empty(), List.of(), List.of("none=7"), new FaultOptions.MeterOptions()));
        assertTrue(over.savedHunt());
        assertEquals(7.0, over.priors().noneWeight());
        // readings given replace the hunt
        DiagnoseCommand.Diagnosed given = DiagnoseCommand.diagnose(doc, 0, new DiagnoseCommand.Request(
                Optional.empty(), List.of("switch@high=12"), List.of(), new FaultOptions.MeterOptions()));
        assertFalse(given.savedHunt());
        assertEquals(1, given.readingCount());
        assertEquals(org.armature.analysis.faults.Priors.DEFAULT, given.priors());
        // a hunt saved on another stage is not used for this one
        StageDocument two = new StageDocument("two", List.of(stage, Templates.build(StageTemplate.LOW_SIDE_NMOS)),
                Optional.empty(), Optional.of(hunt(stage).onStage(1)));
        assertFalse(DiagnoseCommand.diagnose(two, 0, new DiagnoseCommand.Request(Optional.empty(), List.of(), List.of(),
                new FaultOptions.MeterOptions())).savedHunt());
        // a bad word in the saved hunt is one sentence
        StageDocument bad = StageDocument.of(stage).withFaultHunt(Optional.of(FaultHunt.start(0)
                .withPriorWeights(Map.of("melted", 1.0))));
        CommandFailedException e = assertThrows(CommandFailedException.class, () -> DiagnoseCommand.diagnose(bad, 0,
                new DiagnoseCommand.Request(Optional.empty(), List.of(), List.of(), new FaultOptions.MeterOptions())));
        assertTrue(e.getMessage().contains("ce-short"), e.getMessage());
    }

    @Test
    void recordKeepsWhatWasRankedAsTheFilesHuntAndTheSavedHuntRanksTheSame() throws Exception {
        CliRun r = CliRun.of("diagnose", file.toString(), "--json", "--symptom", "no-operate",
                "--reading", "switch@high=12", "--prior", "none=5", "--meter-resistance", "1M", "--record");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.err().startsWith("Recorded the fault hunt on stage"), r.err());
        JsonNode first = JSON.readTree(r.out());
        FaultHunt kept = StageFiles.open(file).faultHunt().orElseThrow();
        assertEquals(0, kept.stageIndex());
        assertEquals(Optional.of("no-operate"), kept.symptom());
        assertEquals(List.of(new FaultHunt.HuntReading("switch", true, 12)), kept.readings());
        assertEquals(Map.of("none", 5.0), kept.priorWeights());
        assertEquals(1e6, kept.meter().inputOhms());
        // ranked again from the file alone: the same candidates with the same probabilities
        JsonNode again = json("diagnose", file.toString(), "--json");
        assertTrue(again.get("savedHunt").asBoolean(), again.toString());
        assertEquals(first.get("candidates").size(), again.get("candidates").size());
        for (int i = 0; i < first.get("candidates").size(); i++) {
            assertEquals(first.get("candidates").get(i).get("fault").asText(),
                    again.get("candidates").get(i).get("fault").asText());
            assertEquals(first.get("candidates").get(i).get("probability").asDouble(),
                    again.get("candidates").get(i).get("probability").asDouble(), 1e-12);
        }
        // and the report prints it
        Path pdf = dir.resolve("repair.pdf");
        CliRun export = CliRun.of("export", file.toString(), "--pdf", pdf.toString());
        assertEquals(0, export.status(), export.err());
        assertTrue(export.out().contains("with the fault hunt"), export.out());
    }

    @Test
    void withoutRecordTheFileIsNotWritten() throws Exception {
        byte[] before = java.nio.file.Files.readAllBytes(file);
        json("diagnose", file.toString(), "--json", "--reading", "switch@high=12");
        assertTrue(java.util.Arrays.equals(before, java.nio.file.Files.readAllBytes(file)));
    }
}
