package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ArmatureCliTest {

    @Test
    @DisplayName("--version prints 'armature 0.1.0' (the pom's version)")
    void version() {
        CliRun r = CliRun.of("--version");
        assertEquals(0, r.status());
        assertEquals("armature 0.1.0", r.out().strip());
        assertEquals("", r.err());
    }

    @Test
    @DisplayName("--help lists the subcommands")
    void help() {
        CliRun r = CliRun.of("--help");
        assertEquals(0, r.status());
        assertTrue(r.out().startsWith("Usage: armature"), r.out());
        assertTrue(r.out().contains("new "), r.out());
    }

    @Test
    @DisplayName("an unknown command is a usage error in one sentence")
    void unknownCommand() {
        CliRun r = CliRun.of("frobnicate");
        assertEquals(2, r.status());
        assertEquals("armature: 'frobnicate' is not a command or argument of armature. (see 'armature --help')",
                r.err().strip());
    }

    @Test
    @DisplayName("options without a command ask for a command")
    void noCommand() {
        CliRun r = CliRun.of("-x");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("Unknown option: '-x'"), r.err());
    }

    @Test
    @DisplayName("sentence(): one line ending in a full stop")
    void sentence() {
        assertEquals("a b.", ArmatureCli.sentence("a\n  b"));
        assertEquals("done.", ArmatureCli.sentence("done."));
    }

    private static Process launch(String... args) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cmd = new java.util.ArrayList<>(List.of(java, "-verbose:class", "-Djava.awt.headless=true",
                "-cp", System.getProperty("java.class.path"), "org.armature.Launcher"));
        cmd.addAll(List.of(args));
        return new ProcessBuilder(cmd).redirectErrorStream(false).start();
    }

    @Test
    @DisplayName("the launcher runs the command line without loading any JavaFX class")
    void launcherLoadsNoJavaFx() throws Exception {
        Process p = launch("--version");
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue());
        assertTrue(out.contains("armature 0.1.0"), out);
        assertTrue(out.contains("org.armature.cli.ArmatureCli"), "class loading is visible");
        assertFalse(out.contains("javafx."), "a JavaFX class was loaded");
    }

    @Test
    @DisplayName("with no arguments and no window class, the launcher says so and exits 1")
    void launcherWithoutWindow() throws Exception {
        assumeTrue(getClass().getClassLoader().getResource("org/armature/ui/ArmatureApp.class") == null,
                "the window class is present; this checks only the build without it");
        Process p = launch();
        p.getInputStream().readAllBytes();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(1, p.exitValue());
        assertTrue(err.contains("The window is not part of this build"), err);
        assertFalse(err.contains("\tat "), err);
    }
}
