package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.armature.model.Finding;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.Validator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The demo documents in {@code examples/}: they open, validate and match their generator. */
class ExamplesTest {

    private static final Path EXAMPLES = Path.of("examples");

    static Stream<Path> exampleFiles() throws IOException {
        try (Stream<Path> s = Files.list(EXAMPLES)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    @Test
    @DisplayName("there are at least three examples and each is a generated one")
    void everyExampleIsGenerated() throws IOException {
        List<String> names = exampleFiles().map(p -> p.getFileName().toString()).toList();
        assertTrue(names.size() >= 3, names.toString());
        assertEquals(ExampleDocuments.all().keySet().stream().sorted().toList(), names);
    }

    @ParameterizedTest
    @MethodSource("exampleFiles")
    @DisplayName("every example opens and every stage validates without ERROR findings")
    void opensAndValidates(Path file) {
        StageDocument doc = StageFiles.open(file);
        for (Stage s : doc.stages()) {
            List<Finding> errors = Validator.validate(s).stream().filter(f -> f.severity() == Severity.ERROR).toList();
            assertEquals(List.of(), errors, file + " / " + s.name());
        }
        assertEquals(ExampleDocuments.all().get(file.getFileName().toString()), doc);
    }

    @ParameterizedTest
    @MethodSource("exampleFiles")
    @DisplayName("no textbook figures in examples: no 720 Ω coil, no hFE(min) left at 100")
    void noTextbookFigures(Path file) {
        for (Stage s : StageFiles.open(file).stages()) {
            for (Part p : s.parts()) {
                if (p.kind() == PartKind.RELAY) {
                    assertFalse(p.value("coilResistanceOhms") == 720, file + " " + p.ref());
                }
                if (p.kind() == PartKind.NPN || p.kind() == PartKind.PNP || p.kind() == PartKind.DARLINGTON) {
                    assertFalse(p.value("hfeMin") == 100, file + " " + s.name() + " " + p.ref());
                    assertFalse(p.value("betaForward") == 100, file + " " + s.name() + " " + p.ref());
                }
            }
        }
    }

    @Test
    @DisplayName("the pool pump's contact side is marked as mains (230 V ac-rms)")
    void poolPumpIsMains() {
        Stage s = StageFiles.open(EXAMPLES.resolve("pool-pump-timer.stage.json")).first();
        Part v2 = s.require("V2");
        assertEquals(230, v2.value("volts"), 0);
        assertEquals("ac-rms", v2.option("waveform"));
    }

    @Test
    @DisplayName("golden file: pool-pump-timer.stage.json is byte for byte what the writer produces")
    void goldenFile() throws IOException {
        String golden = Files.readString(EXAMPLES.resolve("pool-pump-timer.stage.json"), StandardCharsets.UTF_8);
        StageDocument doc = ExampleDocuments.poolPumpTimer();
        assertEquals(golden, StageJson.write(doc));
        assertEquals(doc, StageJson.parse(golden));
        Map<String, Double> relay = doc.first().require("K1").values();
        assertEquals(360.0, relay.get("coilResistanceOhms"), "example figure, our own");
    }

    @Test
    @DisplayName("the solar pump repair log holds a fault hunt that ranks, mid-way: a fault first and a next measurement left")
    void solarPumpHuntRanks() {
        StageDocument doc = StageFiles.open(EXAMPLES.resolve("solar-pump-repair.stage.json"));
        org.armature.model.FaultHunt hunt = doc.faultHunt().orElseThrow();
        org.armature.analysis.faults.SavedHunt.Ranked r =
                org.armature.analysis.faults.SavedHunt.rank(doc.stages().get(hunt.stageIndex()), hunt);
        // the demo readings were made up to fit a collector-emitter short (demo data, our own)
        assertEquals("Q1:ce-short", r.result().candidates().get(0).name());
        assertTrue(r.result().candidates().get(0).probability() < 0.99, "more than one candidate is left");
        assertTrue(r.result().next().orElseThrow().gainBits() > 0.1, "a next measurement is worth taking");
        assertTrue(doc.first().description().startsWith("Demo data"), "says it is demo data");
    }
}
