package org.armature.render.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.Map;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.armature.render.ExportFonts;

/**
 * The embedded fonts of one PDF document: {@link ExportFonts}' DejaVu Sans, regular and bold, as
 * subset Type 0 fonts (only the glyphs used are embedded; text stays extractable through the
 * fonts' Unicode maps). Also measures text, in points, for the report's layout.
 */
public final class PdfFonts {

    private final PDFont regular;
    private final PDFont bold;
    private final double ascentPerEm;
    private final double descentPerEm;
    private final Map<Integer, Boolean> regularGlyphs = new HashMap<>();
    private final Map<Integer, Boolean> boldGlyphs = new HashMap<>();

    /** Loads both fonts into a document for embedding. */
    public PdfFonts(PDDocument doc) {
        try (InputStream r = ExportFonts.open(false); InputStream b = ExportFonts.open(true)) {
            regular = PDType0Font.load(doc, r, true);
            bold = PDType0Font.load(doc, b, true);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot embed the report font", e);
        }
        ascentPerEm = regular.getFontDescriptor().getAscent() / 1000.0;
        descentPerEm = -regular.getFontDescriptor().getDescent() / 1000.0;
    }

    /** The font of a weight. */
    public PDFont font(boolean heavy) {
        return heavy ? bold : regular;
    }

    /** The text with every character the font lacks replaced by '?'. */
    public String printable(String text, boolean heavy) {
        PDFont f = font(heavy);
        Map<Integer, Boolean> known = heavy ? boldGlyphs : regularGlyphs;
        StringBuilder sb = null;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            boolean ok = known.computeIfAbsent(cp, c -> {
                try {
                    ((PDType0Font) f).encode(new String(Character.toChars(c)));
                    return c >= 0x20;
                } catch (IOException | IllegalArgumentException e) {
                    return false;
                }
            });
            if (!ok && sb == null) {
                sb = new StringBuilder(text.substring(0, i));
            }
            if (sb != null) {
                if (ok) {
                    sb.appendCodePoint(cp);
                } else {
                    sb.append('?');
                }
            }
            i += Character.charCount(cp);
        }
        return sb == null ? text : sb.toString();
    }

    /** Width of a printable text, points. */
    public double width(String printable, double size, boolean heavy) {
        try {
            return font(heavy).getStringWidth(printable) / 1000.0 * size;
        } catch (IOException | IllegalArgumentException e) {
            return printable.length() * 0.6 * size;
        }
    }

    /** Ascent above the baseline, points. */
    public double ascent(double size) {
        return ascentPerEm * size;
    }

    /** Descent below the baseline (positive), points. */
    public double descent(double size) {
        return descentPerEm * size;
    }
}
