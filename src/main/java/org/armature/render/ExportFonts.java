package org.armature.render;

import java.awt.Font;
import java.awt.FontFormatException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The typeface of every export: DejaVu Sans, regular and bold, shipped inside the application
 * (Bitstream Vera licence, which allows redistribution with the software; the licence text lies
 * beside the font files). One typeface for PNG, SVG and PDF makes the three look alike on any
 * machine, and gives the glyphs the readouts need (Ω, µ, ×, °, −, β).
 */
public final class ExportFonts {

    /** Family name written into SVG text; viewers without the font fall back to their sans-serif. */
    public static final String FAMILY = "DejaVu Sans";

    private static final String DIR = "/org/armature/render/fonts/";
    private static final String REGULAR_FILE = "DejaVuSans.ttf";
    private static final String BOLD_FILE = "DejaVuSans-Bold.ttf";

    private static volatile Font regular;
    private static volatile Font bold;

    private ExportFonts() {
    }

    /** The bytes of the regular or bold font file; a new stream each call, closed by the caller. */
    public static InputStream open(boolean heavy) {
        String name = heavy ? BOLD_FILE : REGULAR_FILE;
        InputStream in = ExportFonts.class.getResourceAsStream(DIR + name);
        if (in == null) {
            throw new IllegalStateException("the export font " + name + " is missing from the application");
        }
        return in;
    }

    /** The Java2D font at size 1 (derive the size with {@link Font#deriveFont(float)}). */
    public static Font awt(boolean heavy) {
        Font f = heavy ? bold : regular;
        if (f == null) {
            synchronized (ExportFonts.class) {
                f = heavy ? bold : regular;
                if (f == null) {
                    f = load(heavy);
                    if (heavy) {
                        bold = f;
                    } else {
                        regular = f;
                    }
                }
            }
        }
        return f;
    }

    private static Font load(boolean heavy) {
        try (InputStream in = open(heavy)) {
            return Font.createFont(Font.TRUETYPE_FONT, in).deriveFont(1f);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the export font", e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("the export font is damaged", e);
        }
    }
}
