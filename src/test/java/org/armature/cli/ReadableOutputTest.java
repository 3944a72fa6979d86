package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.armature.io.StageFiles;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The readable output uses words and the JSON the CLI's own ids (issue 15 reproductions). */
class ReadableOutputTest {

    @TempDir
    Path dir;

    private static final Path POOL = Path.of("examples/pool-pump-timer.stage.json");

    @Test
    @DisplayName("reproduction: solve prints words, not internal keys (deliveredPower, forcedBeta, ib, contactsFrom)")
    void solveWords() {
        Path f = dir.resolve("npn.stage.json");
        StageFiles.save(StageDocument.of(Templates.defaultStage()), f);
        CliRun r = CliRun.of("solve", f.toString());
        assertEquals(0, r.status(), r.err());
        for (String key : List.of("deliveredPower", "forcedBeta", " ib ", " ic ", "contactsFrom", "coilCurrent",
                "dropOutCurrent", "coil-current")) {
            assertFalse(r.out().contains(key), key + " in\n" + r.out());
        }
        assertTrue(r.out().contains("base current"), r.out());
        assertTrue(r.out().contains("forced β"), r.out());
        assertTrue(r.out().contains("contact state set by the coil current"), r.out());
        assertNoTrailingSpaces(r.out());
    }

    @Test
    @DisplayName("reproduction: simulate has no trailing space after an event without subject ('drive high ')")
    void simulateNoTrailingSpace() {
        Path f = dir.resolve("npn.stage.json");
        StageFiles.save(StageDocument.of(Templates.defaultStage()), f);
        CliRun r = CliRun.of("simulate", f.toString(), "--edge", "pulse");
        assertEquals(0, r.status(), r.err());
        assertNoTrailingSpaces(r.out());
        assertTrue(r.out().contains("decay to drop-out current"), r.out());
        CliRun j = CliRun.of("simulate", f.toString(), "--json");
        assertTrue(j.out().contains("\"decayToDropOutCurrent\""), "JSON and text name the same figure");
    }

    @Test
    @DisplayName("reproduction: check prints the cautions first and whole channel counts ('1.00 channels')")
    void checkCautionsFirst() {
        CliRun r = CliRun.of("check", POOL.toString(), "--no-transient");
        assertEquals(0, r.status(), r.err());
        String out = r.out();
        int caution = out.indexOf("Cautions");
        int firstCheck = out.indexOf("relay.operates");
        assertTrue(caution > 0 && caution < firstCheck, out);
        assertFalse(out.contains("1.00 channels"), out);
        assertTrue(out.contains("One channel draws"), out);
        assertNoTrailingSpaces(out);
    }

    @Test
    @DisplayName("a long run notes its progress on the error stream, never on standard output")
    void progressOnErrorStream() {
        StringWriter err = new StringWriter();
        String result = Progress.run(() -> {
            try {
                Thread.sleep(300);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return "done";
        }, new PrintWriter(err), "check", "5,000 Monte Carlo samples", 20, 100);
        assertEquals("done", result);
        assertTrue(err.toString().startsWith("check: still working after"), err.toString());
        assertTrue(err.toString().contains("5,000 Monte Carlo samples"), err.toString());
        StringWriter quiet = new StringWriter();
        assertEquals(7, Progress.run(() -> 7, new PrintWriter(quiet), "check", "", 2000, 2000));
        assertEquals("", quiet.toString(), "a short run says nothing");
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> Progress.run(() -> {
            throw new IllegalStateException("x");
        }, new PrintWriter(new StringWriter()), "check", "", 2000, 2000));
        assertEquals("x", e.getMessage(), "the calculation's own failure passes through");
    }

    private static void assertNoTrailingSpaces(String text) {
        text.lines().forEach(l -> assertFalse(l.endsWith(" "), "trailing space in \"" + l + "\""));
    }
}
