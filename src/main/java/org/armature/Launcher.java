package org.armature;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import org.armature.cli.ArmatureCli;

/**
 * Main class of the runnable jar. With no arguments it opens the window; with one argument naming a
 * stage file ({@code *.stage.json}) it opens the window on that file; with any other arguments it
 * runs the command line ({@link ArmatureCli}) without loading a single JavaFX class, so
 * {@code --help} and {@code --version} work with no display.
 *
 * <p>The window class is found by name ({@value #WINDOW_CLASS}) so that this class, and the command
 * line, do not link against JavaFX.
 */
public final class Launcher {

    /** The JavaFX application class, started by its static {@code main(String[])}. */
    static final String WINDOW_CLASS = "org.armature.ui.ArmatureApp";

    private Launcher() {
    }

    /**
     * Opens the window (no arguments) or runs the command line and exits with its status.
     *
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        if (args.length == 0 || opensFile(args)) {
            int status = openWindow(args);
            if (status != 0) {
                System.exit(status);
            }
        } else {
            System.exit(ArmatureCli.run(args));
        }
    }

    /**
     * Whether the arguments ask for the window on a file: exactly one argument, not an option, ending
     * in the stage-file extension (a subcommand never does).
     *
     * @param args command-line arguments
     * @return true to open the window on {@code args[0]}
     */
    static boolean opensFile(String[] args) {
        return args.length == 1 && !args[0].startsWith("-")
                && args[0].toLowerCase(java.util.Locale.ROOT).endsWith(org.armature.io.StageFiles.EXTENSION);
    }

    /**
     * Why the window cannot open for want of a display, or null when one may be there. Checked
     * before JavaFX is loaded, so its toolkit prints none of its own log lines: on Linux and other
     * X11/Wayland systems a window needs {@code DISPLAY} or {@code WAYLAND_DISPLAY} (unless a
     * headless glass platform such as Monocle is chosen).
     */
    static String missingDisplay(String osName, String display, String waylandDisplay, String glassPlatform) {
        String os = osName.toLowerCase(java.util.Locale.ROOT);
        boolean x11 = !(os.startsWith("windows") || os.startsWith("mac"));
        boolean blank = (display == null || display.isBlank()) && (waylandDisplay == null || waylandDisplay.isBlank());
        if (x11 && blank && glassPlatform == null) {
            return "The window needs a display and none is available (DISPLAY is not set).";
        }
        return null;
    }

    /** Starts the window; returns 0 once it has closed, or a failure status after saying why. */
    static int openWindow(String[] args) {
        String noDisplay = missingDisplay(System.getProperty("os.name", ""), System.getenv("DISPLAY"),
                System.getenv("WAYLAND_DISPLAY"), System.getProperty("glass.platform"));
        if (noDisplay != null) {
            String hint = args.length == 1 ? " To check the file without a window: armature check " + args[0] + "." : "";
            return ArmatureCli.windowUnavailable(noDisplay + hint);
        }
        Method main;
        try {
            main = Class.forName(WINDOW_CLASS).getMethod("main", String[].class);
        } catch (ClassNotFoundException | NoSuchMethodException | LinkageError e) {
            return ArmatureCli.windowUnavailable("The window is not part of this build (" + WINDOW_CLASS
                    + " could not be loaded: " + e.getClass().getSimpleName() + ").");
        }
        try {
            main.invoke(null, (Object) args);
            return 0;
        } catch (IllegalAccessException e) {
            return ArmatureCli.windowUnavailable("The window class cannot be started (" + e.getMessage() + ").");
        } catch (InvocationTargetException e) {
            Throwable cause = e.getCause();
            return ArmatureCli.windowUnavailable("The window could not open: " + cause.getClass().getSimpleName()
                    + ": " + cause.getMessage() + ".");
        }
    }
}
