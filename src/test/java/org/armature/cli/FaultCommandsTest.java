package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.armature.io.StageFiles;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code faults}, {@code diagnose} and {@code --fault} of {@code solve} and {@code simulate}. */
class FaultCommandsTest {

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
        assertEquals("", r.err());
        return JSON.readTree(r.out());
    }

    @Test
    void solveWithACollectorEmitterShortPinsTheSwitchNode() throws Exception {
        JsonNode healthy = json("solve", file.toString(), "--json", "--pin-state", "low");
        JsonNode j = json("solve", file.toString(), "--json", "--pin-state", "low", "--fault", "Q1:ce-short");
        // derived: the switch node at 12 V with the pin low, healthy; 30 mA × 0.1 Ω = 3 mV shorted
        assertEquals(12, healthy.get("nodes").get("switch").asDouble(), 0.01);
        assertEquals(0.003, j.get("nodes").get("switch").asDouble(), 0.002);
    }

    @Test
    void solveAcceptsATrackOpenAtAPin() throws Exception {
        JsonNode j = json("solve", file.toString(), "--json", "--pin-state", "high", "--fault", "Q1.b:track-open");
        // derived: with its base cut off Q1 carries no collector current, so the switch node sits
        // at the 12 V supply with the pin high (healthy: near 0 V, saturated)
        assertEquals(12, j.get("nodes").get("switch").asDouble(), 0.01);
        CliRun bad = CliRun.of("solve", file.toString(), "--fault", "Q1.z:track-open");
        assertEquals(1, bad.status());
        assertTrue(bad.err().contains("PART.PIN:track-open") && bad.noStackTrace(), bad.err());
    }

    @Test
    void simulateAcceptsAFault() {
        CliRun r = CliRun.of("simulate", file.toString(), "--json", "--fault", "D1:open", "--fault", "R2:drift-x10");
        assertEquals(0, r.status(), r.err());
    }

    @Test
    void unknownPartKindOrNetIsOneSentenceListingWhatIsValid() {
        CliRun part = CliRun.of("solve", file.toString(), "--fault", "Q9:ce-short");
        assertEquals(1, part.status());
        assertTrue(part.err().contains("Q9") && part.err().contains("Q1, ") && part.noStackTrace(), part.err());
        assertEquals(1, part.err().strip().lines().count());
        CliRun kind = CliRun.of("solve", file.toString(), "--fault", "Q1:melted");
        assertTrue(kind.err().contains("ce-short, be-open, bc-open, be-short, gain-low"), kind.err());
        CliRun net = CliRun.of("diagnose", file.toString(), "--reading", "nowhere@high=3");
        assertEquals(1, net.status());
        assertTrue(net.err().contains("nowhere") && net.err().contains("switch") && net.err().contains("coil"), net.err());
        assertEquals(1, net.err().strip().lines().count());
    }

    @Test
    void faultsListsEveryFaultWithReadingsAtBothStates() throws Exception {
        JsonNode j = json("faults", file.toString(), "--json");
        List<String> names = new ArrayList<>();
        j.get("entries").forEach(e -> names.add(e.get("fault").asText()));
        assertEquals("none", names.get(0));
        assertTrue(names.containsAll(List.of("Q1:ce-short", "D1:reversed", "K1:coil-open", "U1:stuck-low", "V1:missing")));
        JsonNode none = j.get("entries").get(0);
        assertTrue(none.get("high").get("operates").asBoolean());
        assertFalse(none.get("low").get("operates").asBoolean());
        assertTrue(j.get("ambiguityGroups").size() > 1);
        CliRun table = CliRun.of("faults", file.toString());
        assertTrue(table.out().contains("Ambiguity groups"), table.out());
    }

    @Test
    void diagnoseRanksAShortedDiodeFromTwoReadings() throws Exception {
        // readings of a stage whose freewheeling diode is shorted (from the dictionary: coil near 0 V with the pin high)
        JsonNode faulted = json("solve", file.toString(), "--json", "--pin-state", "high", "--fault", "D1:short");
        double sw = faulted.get("nodes").get("switch").asDouble();
        JsonNode j = json("diagnose", file.toString(), "--json", "--symptom", "no-operate",
                "--reading", "switch@high=" + sw, "--reading", "coil@high=0.03");
        assertEquals("D1:short", j.get("candidates").get(0).get("fault").asText());
        assertTrue(j.get("candidates").get(0).get("probability").asDouble() > 0.5);
        assertEquals(2, j.get("candidates").get(0).get("explains").size());
        assertTrue(j.get("next").get("gainBits").asDouble() >= 0);
        assertTrue(List.of("high", "low").contains(j.get("next").get("state").asText()));
    }

    @Test
    void aStageDrawnByHandGetsAFaultSet() throws Exception {
        Stage s = org.armature.model.StageDisguise.of(Templates.build(StageTemplate.LOW_SIDE_NPN), 3, 8, 8, false).stage();
        StageFiles.save(StageDocument.of(s), file);
        JsonNode j = json("faults", file.toString(), "--json");
        assertTrue(j.get("entries").size() > 20);
    }
}
