package org.armature;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Which arguments open the window on a file and which go to the command line. */
class LauncherTest {

    @ParameterizedTest(name = "{0} -> window on a file: {1}")
    @CsvSource(textBlock = """
            examples/greenhouse-valves.stage.json, true
            My Stage.STAGE.JSON,                  true
            check,                                false
            --help,                               false
            -o.stage.json,                        false
            notes.json,                           false
            """)
    void oneStageFileOpensTheWindow(String arg, boolean window) {
        // the stage-file extension is the document format's (docs/stage-format.md)
        assertEquals(window, Launcher.opensFile(new String[] {arg}));
    }

    @ParameterizedTest(name = "solve {0}: command line")
    @CsvSource({"a.stage.json", "examples/pool-pump-timer.stage.json"})
    void aSubcommandWithAFileIsTheCommandLine(String file) {
        // two arguments are always a command (README, headless commands)
        assertEquals(false, Launcher.opensFile(new String[] {"solve", file}));
    }

    @ParameterizedTest(name = "{0}, DISPLAY={1}, WAYLAND_DISPLAY={2}, glass={3}: refused={4}")
    @CsvSource(textBlock = """
            Linux,      ,      ,      , true
            Linux,    :0,      ,      , false
            Linux,      , wayland-0,  , false
            Linux,      ,      , Monocle, false
            FreeBSD,    ,      ,      , true
            Windows 11, ,      ,      , false
            Mac OS X,   ,      ,      , false
            """)
    void noDisplayIsSaidBeforeJavaFxLoads(String os, String display, String wayland, String glass, boolean refused) {
        // reproduction: with no display the toolkit printed three log lines before the sentence
        String why = Launcher.missingDisplay(os, display, wayland, glass);
        assertEquals(refused, why != null, String.valueOf(why));
    }
}
