package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.armature.io.StageFiles;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** {@code armature solve}, run in process, on the templates and on the demo documents in {@code examples/}. */
class SolveCommandTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Path file;

    @BeforeEach
    void writeStage() {
        file = dir.resolve("channel.stage.json");
        Stage s = Templates.build(StageTemplate.DARLINGTON_CHANNEL, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        StageFiles.save(new StageDocument("two", List.of(s, s.withName("second"))), file);
    }

    private JsonNode solveJson(String... extra) throws Exception {
        List<String> args = new java.util.ArrayList<>(List.of("solve", file.toString(), "--json"));
        args.addAll(List.of(extra));
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, r.status(), r.err());
        assertEquals("", r.err());
        return JSON.readTree(r.out());
    }

    @Test
    @DisplayName("a stage drawn with other designators and no test points: readable net names, no n1, n2, n3, and a switch verdict"
            + " (failed before: nets n1…n9 and switch null)")
    void netsPeopleCanFind() throws Exception {
        Stage s = org.armature.model.StageDisguise.of(Templates.build(StageTemplate.LOW_SIDE_NPN), 3, 8, 8, false).stage();
        StageFiles.save(StageDocument.of(s), file);
        JsonNode j = solveJson();
        List<String> nets = new java.util.ArrayList<>();
        j.get("nodes").fieldNames().forEachRemaining(nets::add);
        for (String net : nets) {
            assertFalse(net.matches("n[0-9]+"), "numbered net " + net + " in " + nets);
            assertTrue(j.get("nets").get(net).isTextual(), net);
        }
        assertTrue(nets.containsAll(List.of("pin", "control", "switch", "supply", "contact-common", "contact-no")),
                nets.toString());
        assertTrue(j.get("nets").get("switch").asText().startsWith("coil low side at Q"), j.get("nets").toString());
        assertTrue(j.get("switch").get("fullyOn").asBoolean(), "the template's NPN saturates (see TemplatesSolveTest)");
        CliRun table = CliRun.of("solve", file.toString());
        assertTrue(table.out().contains("coil low side at Q"), table.out());
    }

    @Test
    @DisplayName("--json prints exactly one object with nodes, parts and the switch verdict")
    void jsonShape() throws Exception {
        JsonNode j = solveJson();
        assertTrue(j.isObject());
        assertTrue(j.get("converged").asBoolean());
        assertTrue(j.get("iterations").asInt() > 0);
        for (String net : List.of("pin", "control", "switch", "supply", "gnd")) {
            assertTrue(j.get("nodes").get(net).isNumber(), net);
        }
        assertEquals(12.0, j.get("nodes").get("supply").asDouble(), 1e-9, "template rail, 12 V");
        assertEquals(0.0, j.get("nodes").get("gnd").asDouble(), 0);
        JsonNode k1 = j.get("parts").get("K1");
        for (String key : List.of("coilCurrent", "coilVoltage", "coilResistance")) {
            assertTrue(k1.get(key).isNumber(), key);
        }
        assertTrue(List.of("operated", "released", "either").contains(k1.get("state").asText()));
        assertTrue(j.get("parts").get("U1").get("current").isNumber());
        assertTrue(j.get("parts").get("U2").get("region").isTextual());
        assertTrue(j.get("switch").get("fullyOn").isBoolean());
        assertTrue(j.get("switch").get("margin").isNumber());
        assertEquals("U2", j.get("switch").get("ref").asText());
    }

    static Stream<Arguments> exampleStages() {
        List<Arguments> out = new ArrayList<>();
        for (String name : List.of("greenhouse-valves", "dust-extractor-interlock", "pool-pump-timer")) {
            Path f = Path.of("examples", name + ".stage.json");
            StageDocument doc = StageFiles.open(f);
            for (int i = 0; i < doc.stages().size(); i++) {
                out.add(Arguments.of(f, i + 1, doc.stages().get(i).name()));
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0} stage {1}")
    @MethodSource("exampleStages")
    @DisplayName("every example stage solves; pin high operates the relay, pin low releases it, except the "
            + "direct-drive comparison, which cannot turn off (common practice, check-values.md item 4)")
    void examplesSolve(Path example, int stage, String name) throws Exception {
        CliRun high = CliRun.of("solve", example.toString(), "--stage", Integer.toString(stage), "--json",
                "--pin-state", "high");
        assertEquals(0, high.status(), high.err());
        JsonNode h = JSON.readTree(high.out());
        assertTrue(h.get("converged").asBoolean());
        assertEquals("operated", h.get("parts").get("K1").get("state").asText(), name);
        assertTrue(h.get("switch").get("fullyOn").asBoolean(), name);
        CliRun low = CliRun.of("solve", example.toString(), "--stage", Integer.toString(stage), "--json",
                "--pin-state", "low");
        assertEquals(0, low.status(), low.err());
        String expected = name.startsWith("Direct drive") ? "operated" : "released";
        assertEquals(expected, JSON.readTree(low.out()).get("parts").get("K1").get("state").asText(), name);
    }

    @Test
    @DisplayName("bipolar switches report region, ic, ib, vce, vbe, forcedBeta, power; MOSFETs id, vgs, vds")
    void switchQuantities() throws Exception {
        for (StageTemplate t : List.of(StageTemplate.LOW_SIDE_NPN, StageTemplate.HIGH_SIDE_PNP,
                StageTemplate.LOW_SIDE_NMOS)) {
            StageFiles.save(StageDocument.of(Templates.build(t)), file);
            JsonNode q1 = solveJson().get("parts").get("Q1");
            List<String> keys = t == StageTemplate.LOW_SIDE_NMOS
                    ? List.of("id", "vgs", "vds", "power")
                    : List.of("ic", "ib", "vce", "vbe", "forcedBeta", "power");
            for (String k : keys) {
                assertTrue(q1.get(k).isNumber(), t + " " + k);
            }
            assertTrue(q1.get("region").isTextual(), t.id());
        }
    }

    @Test
    @DisplayName("the printed numbers obey Ohm's law and KCL (derived: I = V/R at the coil; pin current = R1 current)")
    void numbersAreConsistent() throws Exception {
        JsonNode j = solveJson();
        JsonNode k1 = j.get("parts").get("K1");
        double coilCurrent = k1.get("coilCurrent").asDouble();
        assertEquals(k1.get("coilVoltage").asDouble() / k1.get("coilResistance").asDouble(), coilCurrent,
                1e-6 * coilCurrent);
        double coilVolts = j.get("nodes").get("supply").asDouble() - j.get("nodes").get("switch").asDouble();
        assertEquals(coilVolts, k1.get("coilVoltage").asDouble(), 1e-6);
        double pin = j.get("parts").get("U1").get("current").asDouble();
        assertEquals(pin, -j.get("parts").get("R1").get("current").asDouble(), 1e-9);
        assertEquals(pin, j.get("parts").get("U2").get("iin").asDouble(), 1e-9);
    }

    @Test
    @DisplayName("--pin-state low turns the switch off; --ambient is passed through")
    void overrides() throws Exception {
        JsonNode j = solveJson("--pin-state", "low", "--ambient", "60");
        assertEquals("low", j.get("pinState").asText());
        assertEquals(60.0, j.get("ambientCelsius").asDouble(), 0);
        assertEquals("released", j.get("parts").get("K1").get("state").asText());
        assertEquals(false, j.get("switch").get("fullyOn").asBoolean());
        assertEquals(0.0, j.get("switch").get("margin").asDouble(), 0, "cut off: margin 0 by definition");
    }

    @Test
    @DisplayName("--stage picks a stage by number or name")
    void stageSelection() throws Exception {
        assertEquals("second", solveJson("--stage", "2").get("stage").asText());
        assertEquals("second", solveJson("--stage", "second").get("stage").asText());
        CliRun r = CliRun.of("solve", file.toString(), "--stage", "3");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("--stage 3 is not in channel.stage.json, which holds 2 stages; expected a number from 1 to 2"), r.err());
        CliRun n = CliRun.of("solve", file.toString(), "--stage", "third");
        assertEquals(2, n.status());
        assertTrue(n.err().contains("No stage of channel.stage.json is named \"third\", which holds 2 stages"), n.err());
    }

    @Test
    @DisplayName("--ambient below copper's −234.5 °C intercept is refused with the valid range (issue 10: 'last KCL residual 0.0 A' before)")
    void ambientOutsideTheModels() {
        CliRun r = CliRun.of("solve", file.toString(), "--ambient", "-250");
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("--ambient must lie from -60 °C to 200 °C"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    @DisplayName("the table shows nodes, parts and the switch verdict")
    void table() {
        CliRun r = CliRun.of("solve", file.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith("Stage \"Darlington-array channel, diode\", pin high"), r.out());
        assertTrue(r.out().contains("Converged in "), r.out());
        assertTrue(r.out().contains("\nNodes"), r.out());
        assertTrue(r.out().contains("  supply "), r.out());
        assertTrue(r.out().contains("K1 (Relay)"), r.out());
        assertTrue(r.out().contains("Switch U2: "), r.out());
    }

    @Test
    @DisplayName("a floating gate is a solver failure: one sentence, status 1")
    void singularCircuit() {
        Stage s = Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT)
                .withoutPart("R1").withoutPart("R2");
        Path bad = dir.resolve("floating.stage.json");
        StageFiles.save(StageDocument.of(s), bad);
        CliRun r = CliRun.of("solve", bad.toString(), "--json");
        assertEquals(1, r.status(), r.out());
        assertTrue(r.err().startsWith("armature solve: Stage \"Low-side N-MOSFET, diode\" has no operating point: "),
                r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertEquals("", r.out());
        assertTrue(r.noStackTrace(), r.err());
    }

    @Test
    @DisplayName("a stage with validation errors is not solved")
    void validationErrors() {
        Stage s = Templates.build(StageTemplate.DARLINGTON_CHANNEL)
                .withPart(Part.of("U2", PartKind.RESISTOR, Placement.at(40, 40)));
        Path bad = dir.resolve("dup.stage.json");
        StageFiles.save(StageDocument.of(s.withPart(s.require("K1").with("mustReleaseVolts", 11))), bad);
        CliRun r = CliRun.of("solve", bad.toString());
        assertEquals(1, r.status());
        assertTrue(r.err().contains("cannot be solved: K1 must-release voltage"), r.err());
    }

    @Test
    @DisplayName("file errors: missing file and malformed JSON give one sentence and status 1")
    void fileErrors() throws Exception {
        CliRun missing = CliRun.of("solve", dir.resolve("none.stage.json").toString());
        assertEquals(1, missing.status());
        assertTrue(missing.err().contains("There is no file"), missing.err());
        Path broken = dir.resolve("broken.stage.json");
        Files.writeString(broken, "{\n  \"format\": \"armature-stage\",\n  \"version\" 1\n}");
        CliRun r = CliRun.of("solve", broken.toString());
        assertEquals(1, r.status());
        // derived: two spaces, "version" in columns 3-11, a space, then the 1 in column 13
        assertTrue(r.err().contains("broken.stage.json: The file is not valid JSON at line 3, column 13"), r.err());
        assertTrue(r.noStackTrace(), r.err());
    }
}
