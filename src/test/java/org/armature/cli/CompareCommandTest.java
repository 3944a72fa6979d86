package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.io.StageFiles;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.ParamKeys;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code armature compare}: the numbers of solve, simulate and check, stage by stage. */
class CompareCommandTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;

    /** The four templates on the NPN template's relay, supply, pin and contact side, as one line-up. */
    private static Path lineUpFile;
    /** Each of those four stages alone in its own file. */
    private static final List<Path> alone = new ArrayList<>();
    private static List<Stage> stages;

    @BeforeAll
    static void files() {
        LineUpContext context = LineUpContext.of(Templates.build(StageTemplate.LOW_SIDE_NPN));
        stages = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            // the stage as the line-up judges it, stored as such, so that it agrees with the context
            stages.add(context.applyTo(Templates.build(t)).stage());
        }
        lineUpFile = dir.resolve("four.stage.json");
        StageFiles.save(new StageDocument("Four drivers", stages,
                Optional.of(new LineUp(List.of(0, 1, 2, 3), context))), lineUpFile);
        for (int i = 0; i < stages.size(); i++) {
            Path p = dir.resolve("alone" + i + ".stage.json");
            StageFiles.save(StageDocument.of(stages.get(i)), p);
            alone.add(p);
        }
    }

    private static JsonNode run(String... args) throws Exception {
        CliRun r = CliRun.of(args);
        assertEquals(0, r.status(), r.err());
        return JSON.readTree(r.out());
    }

    @Test
    @DisplayName("a line-up of the four templates gives, stage by stage, the numbers solve, simulate and check give alone")
    void reproducesTheCommandsStageByStage() throws Exception {
        JsonNode compared = run("compare", lineUpFile.toString(), "--json").get("stages");
        assertEquals(4, compared.size());
        for (int i = 0; i < 4; i++) {
            JsonNode col = compared.get(i);
            String name = stages.get(i).name();
            assertEquals(name, col.get("stage").asText());
            assertEquals(0, col.get("differences").size(), name + " agrees with the shared context");
            JsonNode metrics = col.get("metrics");
            String file = alone.get(i).toString();
            JsonNode off = run("simulate", file, "--json").get("metrics");
            for (String key : List.of("peakSwitchVoltage", "decayToDropOutCurrent", "releaseTime", "suppressorEnergy",
                    "armatureSpeedAtBreak")) {
                assertEquals(off.get(key), metrics.get(key), name + " " + key);
            }
            JsonNode on = run("simulate", file, "--edge", "on", "--json").get("metrics");
            assertEquals(on.get("operateTime"), metrics.get("operateTime"), name + " operateTime");
            JsonNode solved = run("solve", file, "--json");
            StageRoles roles = StageRecognition.of(stages.get(i)).roles().orElseThrow();
            assertEquals(solved.get("parts").get(roles.relayRef()).get("coilCurrent"), metrics.get("coilCurrent"), name);
            assertEquals(solved.get("parts").get(roles.drivePinRef().orElseThrow()).get("current"),
                    metrics.get("pinCurrent"), name);
            assertEquals(solved.get("switch").get("margin"), metrics.get("switchMargin"), name);
            assertEquals(solved.get("switch").get("fullyOn"), metrics.get("switchFullyOn"), name);
            JsonNode checked = run("check", file, "--json");
            assertEquals(checked.get("checks"), col.get("checks"), name + ": the same check objects");
            JsonNode operates = checked.get("checks").get(0);
            assertEquals("relay.operates", operates.get("id").asText());
            assertEquals(operates.get("value"), metrics.get("coilVoltageWorstCorner"), name);
        }
    }

    @Test
    @DisplayName("text output is the metrics table with the best value of each row marked")
    void textTable() {
        CliRun r = CliRun.of("compare", alone.get(0).toString(), alone.get(1).toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("peak switch voltage"), r.out());
        assertTrue(r.out().contains("armature speed at contact break"), r.out());
        assertTrue(r.out().contains("* best in the row."), r.out());
        assertTrue(r.out().contains("check relay.operates"), r.out());
    }

    @Test
    @DisplayName("a stage with another relay is judged on the first file's relay and reported; --own-context keeps its own")
    void otherRelayIsReported() throws Exception {
        Stage npn = stages.get(0);
        String relay = StageRecognition.of(npn).roles().orElseThrow().relayRef();
        Path other = dir.resolve("other-relay.stage.json");
        StageFiles.save(StageDocument.of(npn.updatePart(relay, p -> p.with(ParamKeys.COIL_RESISTANCE_OHMS, 720))), other);
        JsonNode shared = run("compare", alone.get(0).toString(), other.toString(), "--json").get("stages");
        JsonNode diff = shared.get(1).get("differences").get(0);
        assertEquals("relay", diff.get("role").asText());
        assertTrue(diff.get("detail").asText().contains("coilResistanceOhms 720 here"), diff.toString());
        // judged on the shared 400 Ω relay, it draws the same coil current as the first stage
        assertEquals(shared.get(0).get("metrics").get("coilCurrent"), shared.get(1).get("metrics").get("coilCurrent"));
        JsonNode own = run("compare", alone.get(0).toString(), other.toString(), "--own-context", "--json").get("stages");
        assertEquals(0, own.get(1).get("differences").size());
        // its own 720 Ω coil draws less: 400/720 by Ohm's law (derived), raised a little because the
        // 400 Ω coil heats itself more (about 0.27 W × 100 K/W ≈ 27 K at 0.0039 /K, PC-8: up to ~10 %)
        double ratio = own.get(1).get("metrics").get("coilCurrent").asDouble()
                / own.get(0).get("metrics").get("coilCurrent").asDouble();
        assertTrue(ratio > 400.0 / 720.0 && ratio < 1.1 * 400.0 / 720.0, "ratio " + ratio);
    }

    @Test
    @DisplayName("--stage with one file is a usage error in one sentence")
    void stageWithOneFile() {
        CliRun r = CliRun.of("compare", lineUpFile.toString(), "--stage", "2");
        assertEquals(2, r.status());
        assertTrue(r.err().startsWith("armature compare: --stage picks one stage of each of several files"), r.err());
        assertTrue(r.noStackTrace());
    }

    @Test
    @DisplayName("a missing file fails through the common failure path, one sentence")
    void missingFile() {
        CliRun r = CliRun.of("compare", dir.resolve("nope.stage.json").toString(), alone.get(0).toString());
        assertEquals(1, r.status());
        assertTrue(r.err().startsWith("armature compare: "), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.noStackTrace());
    }
}
