package org.armature.ui;

import java.util.Optional;
import java.util.prefs.Preferences;

/**
 * The editor window's remembered layout: position and size of the window when not maximised, the
 * maximised flag, and whether the edges drawer is open. Kept in the user's preferences node of
 * {@link RecentFiles#preferences()} under keys starting {@code window.}. Pure: no JavaFX.
 *
 * @param xPixels left edge of the window, screen pixels (any finite value)
 * @param yPixels top edge of the window, screen pixels (any finite value)
 * @param widthPixels window width, pixels, at least {@link #MIN_WIDTH_PIXELS} once {@link #clamped()}
 * @param heightPixels window height, pixels, at least {@link #MIN_HEIGHT_PIXELS} once {@link #clamped()}
 * @param maximised true when the window fills the screen
 * @param edgesOpen true when the edges drawer is expanded
 */
public record WindowLayout(double xPixels, double yPixels, double widthPixels, double heightPixels, boolean maximised,
                           boolean edgesOpen) {

    /** Smallest width restored, pixels: the palette, a usable drawing and the part sheet side by side. */
    public static final double MIN_WIDTH_PIXELS = 800;
    /** Smallest height restored, pixels: menus, tool bar, drawing and status bar. */
    public static final double MIN_HEIGHT_PIXELS = 560;
    /** Largest size restored, pixels (guards against corrupt preferences). */
    public static final double MAX_SIZE_PIXELS = 16384;

    private static final String X = "window.x";
    private static final String Y = "window.y";
    private static final String WIDTH = "window.width";
    private static final String HEIGHT = "window.height";
    private static final String MAXIMISED = "window.maximised";
    private static final String EDGES = "window.edgesOpen";

    /** Checks the numbers are finite (sizes are clamped separately, so a bad stored value never throws). */
    public WindowLayout {
        if (!Double.isFinite(xPixels)) {
            throw new IllegalArgumentException("xPixels must be finite: " + xPixels);
        }
        if (!Double.isFinite(yPixels)) {
            throw new IllegalArgumentException("yPixels must be finite: " + yPixels);
        }
        if (!Double.isFinite(widthPixels)) {
            throw new IllegalArgumentException("widthPixels must be finite: " + widthPixels);
        }
        if (!Double.isFinite(heightPixels)) {
            throw new IllegalArgumentException("heightPixels must be finite: " + heightPixels);
        }
    }

    /** This layout with width and height brought into [minimum, {@link #MAX_SIZE_PIXELS}]. */
    public WindowLayout clamped() {
        return new WindowLayout(xPixels, yPixels, clamp(widthPixels, MIN_WIDTH_PIXELS),
                clamp(heightPixels, MIN_HEIGHT_PIXELS), maximised, edgesOpen);
    }

    private static double clamp(double v, double min) {
        return Math.max(min, Math.min(MAX_SIZE_PIXELS, v));
    }

    /** Writes the layout to a preferences node. */
    public void save(Preferences prefs) {
        prefs.putDouble(X, xPixels);
        prefs.putDouble(Y, yPixels);
        prefs.putDouble(WIDTH, widthPixels);
        prefs.putDouble(HEIGHT, heightPixels);
        prefs.putBoolean(MAXIMISED, maximised);
        prefs.putBoolean(EDGES, edgesOpen);
    }

    /**
     * The layout stored in a preferences node, clamped to sane sizes; empty when none was stored or
     * a stored number is not finite.
     */
    public static Optional<WindowLayout> load(Preferences prefs) {
        double x = prefs.getDouble(X, Double.NaN);
        double y = prefs.getDouble(Y, Double.NaN);
        double w = prefs.getDouble(WIDTH, Double.NaN);
        double h = prefs.getDouble(HEIGHT, Double.NaN);
        if (!(Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(w) && Double.isFinite(h))) {
            return Optional.empty();
        }
        return Optional.of(new WindowLayout(x, y, w, h, prefs.getBoolean(MAXIMISED, false),
                prefs.getBoolean(EDGES, false)).clamped());
    }
}
