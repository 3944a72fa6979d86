package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.OptionalDouble;
import org.armature.analysis.CheckOptions;
import org.armature.io.StageFiles;
import org.armature.model.StageDocument;
import org.armature.model.StageSettings;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code armature check} takes a stage's own settings from the file; options override them. */
class CheckSettingsTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    @DisplayName("the Monte Carlo samples and seed stored with the stage are used when no option is given")
    void storedSettingsUsed() throws Exception {
        Path file = dir.resolve("mc.stage.json");
        StageFiles.save(StageDocument.of(Templates.build(StageTemplate.DARLINGTON_CHANNEL)
                .withSettings(new StageSettings(OptionalDouble.empty(), 12, 5))), file);
        CliRun r = CliRun.of("check", file.toString(), "--json", "--no-transient");
        assertEquals(0, r.status(), r.err());
        JsonNode mc = JSON.readTree(r.out()).get("monteCarlo");
        assertEquals(12, mc.get("samples").asInt(), "samples as stored");
        assertEquals(5, mc.get("seed").asLong(), "seed as stored");
    }

    @Test
    @DisplayName("--monte-carlo and --seed override the stored settings")
    void optionsOverride() throws Exception {
        Path file = dir.resolve("mc.stage.json");
        StageFiles.save(StageDocument.of(Templates.build(StageTemplate.DARLINGTON_CHANNEL)
                .withSettings(new StageSettings(OptionalDouble.empty(), 12, 5))), file);
        CliRun r = CliRun.of("check", file.toString(), "--json", "--no-transient", "--monte-carlo", "7", "--seed", "9");
        assertEquals(0, r.status(), r.err());
        JsonNode mc = JSON.readTree(r.out()).get("monteCarlo");
        assertEquals(7, mc.get("samples").asInt());
        assertEquals(9, mc.get("seed").asLong());
    }

    @Test
    @DisplayName("a stored release-time requirement reaches the options; the command-line one wins")
    void releaseTime() {
        StageSettings s = new StageSettings(OptionalDouble.of(0.010), 0, 1);
        CheckOptions stored = CheckCommand.options(s, null, null, null);
        assertEquals(0.010, stored.releaseTimeRequirementSeconds().getAsDouble(), 0);
        assertEquals(0, stored.monteCarloSamples(), "no Monte Carlo unless asked");
        CheckOptions given = CheckCommand.options(s, null, null, 0.004);
        assertEquals(0.004, given.releaseTimeRequirementSeconds().getAsDouble(), 0);
        assertTrue(CheckCommand.options(StageSettings.DEFAULT, null, null, null).releaseTimeRequirementSeconds().isEmpty());
    }
}
