package org.armature.render;

/**
 * The colour themes of an export. {@link #LIGHT} is the print theme: the light palette on white
 * paper (a tinted background wastes toner and shows as a grey box on a white page); {@link #DARK}
 * is the window's dark palette, for slides.
 */
public enum ExportTheme {
    /** Dark ink on white paper. */
    LIGHT("light"),
    /** Light ink on a slate background. */
    DARK("dark");

    private static final Colour WHITE = new Colour(255, 255, 255, 1);

    private final String id;

    ExportTheme(String id) {
        this.id = id;
    }

    /** The word used on the command line and in the dialog ({@code light}, {@code dark}). */
    public String id() {
        return id;
    }

    /** The palette of this theme. */
    public Palette palette() {
        if (this == DARK) {
            return Palette.DARK;
        }
        Palette p = Palette.LIGHT;
        return new Palette(WHITE, p.gridMinor(), p.gridMajor(), p.ink(), p.labelInk(), p.valueInk(), p.voltage(),
                p.current(), p.ok(), p.warn(), p.fail(), p.selection(), WHITE);
    }

    /** The theme with this word, if any. */
    public static java.util.Optional<ExportTheme> byId(String word) {
        for (ExportTheme t : values()) {
            if (t.id.equals(word)) {
                return java.util.Optional.of(t);
            }
        }
        return java.util.Optional.empty();
    }
}
