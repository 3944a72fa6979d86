package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.armature.io.StageFiles;
import org.armature.io.StageJson;
import org.armature.model.HighSideDrive;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A table of bad command lines (issue 15): each gives its exit status (2 usage, 1 failure), exactly
 * one line on the error stream that says what was expected or what is wrong, nothing on standard
 * output, no stack trace and no "internal error". Rows marked "reproduction" printed an internal
 * error, a trace, blocked or exited 0 before the fix. The range refusals of temperatures and rails
 * are tested with their own work (issue 10).
 */
class BadCommandLinesTest {

    @TempDir
    static Path dir;

    static String good;
    static String direct;
    static String invalid;
    static String folder;
    static String missing;
    static String existing;
    static String fifo;
    static String sparse;
    static String utf16;
    static String empty;
    static String notJson;
    static String newer;
    static String hugeKind;
    static String deep;

    @BeforeAll
    static void files() throws IOException, InterruptedException {
        good = save("good.stage.json", StageDocument.of(Templates.defaultStage()));
        direct = save("direct.stage.json", StageDocument.of(
                Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE, HighSideDrive.DIRECT)));
        invalid = save("invalid.stage.json", StageDocument.of(
                Templates.defaultStage().updatePart("R1", p -> p.with("resistanceOhms", -5))));
        folder = Files.createDirectory(dir.resolve("a-folder")).toString();
        missing = dir.resolve("no-such.stage.json").toString();
        existing = good;
        Path f = dir.resolve("pipe.stage.json");
        fifo = new ProcessBuilder("mkfifo", f.toString()).start().waitFor() == 0 ? f.toString() : "/dev/zero";
        Path s = dir.resolve("sparse.stage.json");
        try (RandomAccessFile r = new RandomAccessFile(s.toFile(), "rw")) {
            r.setLength(3L << 30);
        }
        sparse = s.toString();
        String text = StageJson.write(StageDocument.of(Templates.defaultStage()));
        utf16 = write("utf16.stage.json", text.getBytes(StandardCharsets.UTF_16));
        empty = write("empty.stage.json", new byte[0]);
        notJson = write("notes.stage.json", "zone 1: valves\n".getBytes(StandardCharsets.UTF_8));
        newer = write("newer.stage.json", text.replace("\"version\": 1", "\"version\": 9").getBytes(StandardCharsets.UTF_8));
        hugeKind = write("kind.stage.json", text.replaceFirst("\"kind\": \"[a-z-]+\"",
                "\"kind\": \"" + "k".repeat(5_000_000) + "\"").getBytes(StandardCharsets.UTF_8));
        deep = write("deep.stage.json", ("{\"format\": \"armature-stage\", \"version\": 1, \"title\": "
                + "[".repeat(100_000) + "]".repeat(100_000) + "}").getBytes(StandardCharsets.UTF_8));
    }

    private static String save(String name, StageDocument d) {
        Path p = dir.resolve(name);
        StageFiles.save(d, p);
        return p.toString();
    }

    private static String write(String name, byte[] bytes) throws IOException {
        return Files.write(dir.resolve(name), bytes).toString();
    }

    private static String out(String name) {
        return dir.resolve("out").resolve(name).toString();
    }

    /** Row: what is wrong, expected status, a piece of the sentence, the arguments. */
    private static Arguments row(String what, int status, String says, String... args) {
        return Arguments.of(what, status, says, args);
    }

    static Stream<Arguments> badLines() throws IOException {
        Files.createDirectories(dir.resolve("out"));
        String npn = "low-side-npn";
        List<Arguments> rows = new ArrayList<>(List.of(
                row("no command", 2, "Name a command"),
                row("unknown command", 2, "not a command", "frobnicate"),
                row("unknown top option", 2, "--versionx", "--versionx"),
                row("solve without a file", 2, "FILE", "solve"),
                row("pin state word", 2, "high or low", "solve", good, "--pin-state", "up"),
                row("pin state missing", 2, "--pin-state", "solve", good, "--pin-state"),
                row("ambient not a number", 2, "temperature", "solve", good, "--ambient", "warm"),
                row("reproduction: --stage beyond a whole int", 2, "expected a number from 1 to 1", "solve", good,
                        "--stage", "99999999999"),
                row("--stage 0", 2, "is not in", "solve", good, "--stage", "0"),
                row("--stage negative", 2, "is not in", "solve", good, "--stage", "-3"),
                row("--stage name", 2, "is named", "solve", good, "--stage", "nope"),
                row("unknown option", 2, "--bogus", "solve", good, "--bogus"),
                row("two files", 2, "not a command or argument", "solve", good, good),
                row("reproduction: --seed abc", 2, "expected a whole number", "check", good, "--seed", "abc"),
                row("--seed fraction", 2, "expected a whole number", "check", good, "--seed", "1.5"),
                row("--seed beyond a long", 2, "expected a whole number from", "check", good, "--seed",
                        "99999999999999999999999"),
                row("--monte-carlo word", 2, "expected a whole number", "check", good, "--monte-carlo", "abc"),
                row("--monte-carlo empty", 2, "expected a whole number", "check", good, "--monte-carlo", ""),
                row("reproduction: --monte-carlo above the cap", 2, "100,000", "check", good, "--monte-carlo",
                        "100000000"),
                row("--monte-carlo negative", 2, "100,000", "check", good, "--monte-carlo", "-1"),
                row("--monte-carlo 1e9", 2, "expected a whole number", "check", good, "--monte-carlo", "1e9"),
                row("supply tolerance too wide", 2, "0 to 50", "check", good, "--supply-tolerance", "80"),
                row("supply tolerance word", 2, "percent", "check", good, "--supply-tolerance", "x"),
                row("release time word", 2, "time", "check", good, "--release-time", "soon"),
                row("ambient range reversed", 2, "must not exceed", "check", good, "--ambient-min", "40",
                        "--ambient-max", "10"),
                row("check without a file", 2, "FILE", "check", "--no-transient"),
                row("forced beta zero", 2, "positive", "size", good, "--forced-beta", "0"),
                row("forced beta word", 2, "expected a finite number", "size", good, "--forced-beta", "abc"),
                row("series unknown", 2, "E6, E12", "size", good, "--series", "E7"),
                row("reproduction: size on a direct-drive stage", 1, "Nothing to size", "size", direct),
                row("edge word", 2, "off, on or pulse", "simulate", good, "--edge", "sideways"),
                row("duration zero", 2, "longer than", "simulate", good, "--duration", "0"),
                row("duration negative", 2, "cannot be negative", "simulate", good, "--duration", "-5m"),
                row("duration word", 2, "time", "simulate", good, "--duration", "forever"),
                row("reproduction: csv into a missing folder", 2, "does not exist", "simulate", good, "--csv",
                        dir.resolve("nowhere").resolve("w.csv").toString()),
                row("reproduction: csv onto a folder", 2, "is a folder", "simulate", good, "--csv", folder),
                row("csv onto a device", 1, "special file", "simulate", good, "--duration", "2m", "--csv", "/dev/null"),
                row("new without a template", 2, "TEMPLATE", "new"),
                row("new without output", 2, "--output", "new", npn),
                row("new unknown template", 2, "low-side-npn", "new", "mid-side-npn", "-o", out("a.stage.json")),
                row("reproduction: new onto the root folder", 1, "folder", "new", npn, "-o", "/", "--force"),
                row("new onto an existing file", 1, "--force", "new", npn, "-o", existing),
                row("new into a missing folder", 1, "does not exist", "new", npn, "-o",
                        dir.resolve("nowhere").resolve("b.stage.json").toString()),
                row("new onto a folder", 1, "folder", "new", npn, "-o", folder, "--force"),
                row("bad quantity", 2, "resistance", "new", npn, "--coil-resistance", "4k7x", "-o", out("c.stage.json")),
                row("negative resistor", 2, "cannot be negative", "new", npn, "--base-resistor", "-1k", "-o",
                        out("d.stage.json")),
                row("drive on the low side", 2, "high-side-pnp", "new", npn, "--drive", "direct", "-o", out("e.stage.json")),
                row("threshold on an NPN", 2, "does not apply", "new", npn, "--vth", "2", "-o", out("f.stage.json")),
                row("suppressor word", 2, "diode", "new", npn, "--suppressor", "magic", "-o", out("g.stage.json")),
                row("release above operate", 2, "must be below", "new", npn, "--must-release", "20", "--must-operate",
                        "10", "-o", out("h.stage.json")),
                row("NaN value", 2, "finite", "new", npn, "--coil-resistance", "NaN", "-o", out("i.stage.json")),
                row("huge value", 2, "too large", "new", npn, "--coil-resistance", "1e999", "-o", out("j.stage.json")),
                row("letter code with junk", 2, "voltage", "new", npn, "--pin-high", "3V3x", "-o", out("k.stage.json")),
                row("missing file", 1, "There is no file", "solve", missing),
                row("folder as file", 1, "is a folder", "solve", folder),
                row("reproduction: /dev/zero", 1, "special file", "solve", "/dev/zero"),
                row("reproduction: check on a FIFO blocks", 1, "special file", "check", fifo),
                row("reproduction: a 3 GB sparse file", 1, "at most", "solve", sparse),
                row("UTF-16 file", 1, "not UTF-8", "solve", utf16),
                row("empty file", 1, "empty", "solve", empty),
                row("not JSON", 1, "not valid JSON", "solve", notJson),
                row("newer version", 1, "newer Armature", "check", newer),
                row("5-million-character kind", 1, "not a part kind", "solve", hugeKind),
                row("deep nesting", 1, "deeper than", "solve", deep),
                row("invalid stage checked", 1, "cannot be checked", "check", invalid, "--no-transient"),
                row("invalid stage simulated", 1, "cannot be simulated", "simulate", invalid),
                row("invalid stage solved", 1, "cannot be solved", "solve", invalid),
                row("size a missing file", 1, "There is no file", "size", missing)));
        return rows.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badLines")
    void answeredInOneSentence(String what, int status, String says, String[] args) {
        CliRun r = CliRun.of(args);
        assertEquals(status, r.status(), what + ": " + r.err());
        String err = r.err().strip();
        assertFalse(err.isEmpty(), what + ": says nothing");
        assertFalse(err.contains("\n"), what + ": one line, not " + err);
        assertTrue(err.length() <= 800, what + ": " + err.length() + " characters");
        assertTrue(err.contains(says), what + ": expected \"" + says + "\" in " + err);
        assertFalse(err.toLowerCase().contains("internal error"), what + ": " + err);
        assertTrue(r.noStackTrace(), what + ": " + err);
        assertEquals("", r.out(), what + ": nothing on standard output");
    }

    @org.junit.jupiter.api.Test
    void anyExceptionOfACommandIsOneSentence() {
        // the one failure path: engine and record exceptions are said plainly, never "internal error"
        for (Throwable t : List.<Throwable>of(new IllegalArgumentException("ambientCelsius must be finite"),
                new IllegalStateException(), new NullPointerException(), new java.io.UncheckedIOException(
                        new IOException("No space left on device")), new OutOfMemoryError("Java heap space"),
                new StackOverflowError(), new CommandFailedException("Stage \"x\" cannot be solved: R1 is 0 Ω"))) {
            String s = ArmatureCli.failureSentence(t);
            assertFalse(s.contains("\n") || s.toLowerCase().contains("internal error") || s.contains("Exception"), s);
            assertTrue(s.endsWith("."), s);
        }
    }

    @org.junit.jupiter.api.Test
    void tableHasAtLeastSixtyRows() throws IOException {
        assertTrue(badLines().count() >= 60);
    }
}
