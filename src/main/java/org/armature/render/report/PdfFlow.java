package org.armature.render.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.armature.render.Affine;
import org.armature.render.Box;
import org.armature.render.Colour;
import org.armature.render.Pen;
import org.armature.render.Stroke;
import org.armature.render.TextStyle;

/**
 * A top-to-bottom page flow for the report: headings, wrapped paragraphs, tables with wrapped cells
 * (the header row repeated on each page a table runs onto) and blocks drawn by a pen, each moving
 * to a new A4 page when it does not fit. Units are PDF points from the page's top-left corner.
 * Running heads and page numbers are added by {@link #finish} once the page count is known.
 */
final class PdfFlow implements AutoCloseable {

    static final double PAGE_WIDTH = PDRectangle.A4.getWidth();
    static final double PAGE_HEIGHT = PDRectangle.A4.getHeight();
    static final double MARGIN_X = 50;
    static final double TOP = 62;
    static final double BOTTOM = PAGE_HEIGHT - 58;
    static final double WIDTH = PAGE_WIDTH - 2 * MARGIN_X;

    static final double BODY = 9.5;
    static final double SMALL = 8;
    static final double LEADING = 1.3;
    static final double CELL_PAD = 3;

    static final Colour INK = Colour.hex("#1e2833");
    static final Colour MUTED = Colour.hex("#4d5866");
    static final Colour RULE = Colour.hex("#b9b4a6");
    static final Colour SHADE = Colour.hex("#efece3");

    private final PDDocument doc;
    private final PdfFonts fonts;
    private PDPageContentStream cs;
    private PdfPen pen;
    private double y;

    PdfFlow(PDDocument doc, PdfFonts fonts) {
        this.doc = doc;
        this.fonts = fonts;
        newPage();
    }

    PdfFonts fonts() {
        return fonts;
    }

    /** Space left on this page, points. */
    double remaining() {
        return BOTTOM - y;
    }

    /** Starts a new page unless {@code height} points still fit on this one. */
    void need(double height) {
        if (y + height > BOTTOM && y > TOP) {
            newPage();
        }
    }

    void gap(double points) {
        y = Math.min(BOTTOM, y + points);
    }

    void heading(String text, double size) {
        need(size * 3.2 + 40);
        gap(size * 0.6);
        pen.text(text, MARGIN_X, y, new TextStyle(size, true, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP), INK);
        y += size * LEADING;
        pen.line(MARGIN_X, y, MARGIN_X + WIDTH, y, RULE, Stroke.solid(0.6));
        y += size * 0.5;
    }

    void paragraph(String text, double size, boolean bold, Colour colour) {
        paragraph(text, size, bold, colour, 0);
    }

    void paragraph(String text, double size, boolean bold, Colour colour, double indent) {
        for (String line : wrap(text, WIDTH - indent, size, bold)) {
            need(size * LEADING);
            pen.text(line, MARGIN_X + indent, y, new TextStyle(size, bold, TextStyle.HAnchor.START,
                    TextStyle.VAnchor.TOP), colour);
            y += size * LEADING;
        }
        y += size * 0.35;
    }

    /** A boxed block of lines (the safety cautions): a bold title and wrapped paragraphs, shaded. */
    void box(String title, List<String> lines, Colour edge) {
        double inner = WIDTH - 16;
        List<List<String>> wrapped = new ArrayList<>();
        double h = BODY * 1.15 * LEADING + 10;
        for (String l : lines) {
            List<String> w = wrap(l, inner - 10, BODY, false);
            wrapped.add(w);
            h += w.size() * BODY * LEADING + 3;
        }
        need(Math.min(h, BOTTOM - TOP));
        Box b = new Box(MARGIN_X, y, MARGIN_X + WIDTH, y + h);
        pen.fillRect(b, SHADE);
        pen.strokeRect(b, edge, Stroke.solid(1.2));
        double yy = y + 6;
        pen.text(title, MARGIN_X + 8, yy, new TextStyle(BODY * 1.15, true, TextStyle.HAnchor.START,
                TextStyle.VAnchor.TOP), edge);
        yy += BODY * 1.15 * LEADING + 2;
        TextStyle body = new TextStyle(BODY, false, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
        for (List<String> w : wrapped) {
            for (int i = 0; i < w.size(); i++) {
                if (i == 0) {
                    pen.text("•", MARGIN_X + 9, yy, body, INK);
                }
                pen.text(w.get(i), MARGIN_X + 18, yy, body, INK);
                yy += BODY * LEADING;
            }
            yy += 3;
        }
        y += h + 8;
    }

    /**
     * A table. {@code fractions} are the column widths as shares of the text width; a row whose
     * {@code note} is not empty gets a full-width line of small text under it.
     */
    void table(double[] fractions, List<String> header, List<Row> rows) {
        double[] widths = new double[fractions.length];
        for (int i = 0; i < widths.length; i++) {
            widths[i] = fractions[i] * WIDTH;
        }
        headerRow(widths, header);
        boolean shade = false;
        for (Row r : rows) {
            List<List<String>> cells = new ArrayList<>();
            int lines = 1;
            for (int i = 0; i < widths.length; i++) {
                String text = i < r.cells().size() ? r.cells().get(i) : "";
                List<String> w = wrap(text, widths[i] - 2 * CELL_PAD, BODY, false);
                cells.add(w);
                lines = Math.max(lines, w.size());
            }
            List<String> note = r.note().isEmpty() ? List.of() : wrap(r.note(), WIDTH - 2 * CELL_PAD - 10, SMALL, false);
            double h = lines * BODY * LEADING + 2 * CELL_PAD + note.size() * SMALL * LEADING;
            if (y + h > BOTTOM) {
                newPage();
                headerRow(widths, header);
            }
            if (shade) {
                pen.fillRect(new Box(MARGIN_X, y, MARGIN_X + WIDTH, y + h), SHADE);
            }
            shade = !shade;
            double x = MARGIN_X;
            for (int i = 0; i < widths.length; i++) {
                double yy = y + CELL_PAD;
                Colour c = i == 0 && r.firstColour() != null ? r.firstColour() : INK;
                boolean bold = i == 0 && r.firstColour() != null;
                for (String l : cells.get(i)) {
                    pen.text(l, x + CELL_PAD, yy, new TextStyle(BODY, bold, TextStyle.HAnchor.START,
                            TextStyle.VAnchor.TOP), c);
                    yy += BODY * LEADING;
                }
                x += widths[i];
            }
            double ny = y + CELL_PAD + lines * BODY * LEADING;
            for (String l : note) {
                pen.text(l, MARGIN_X + CELL_PAD + 10, ny, new TextStyle(SMALL, false, TextStyle.HAnchor.START,
                        TextStyle.VAnchor.TOP), MUTED);
                ny += SMALL * LEADING;
            }
            y += h;
        }
        pen.line(MARGIN_X, y, MARGIN_X + WIDTH, y, RULE, Stroke.solid(0.6));
        y += BODY * 0.8;
    }

    /** One table row; {@code firstColour} non-null sets the first cell bold in that colour. */
    record Row(List<String> cells, String note, Colour firstColour) {
        Row(List<String> cells) {
            this(cells, "", null);
        }
    }

    /** A drawing of {@code height} points over the full text width; the pen's units are points. */
    void drawing(double height, java.util.function.Consumer<Pen> draw) {
        need(height);
        pen.push(Affine.translation(MARGIN_X, y));
        draw.accept(pen);
        pen.pop();
        y += height + 6;
    }

    /** Writes the running head (document title, date) and foot (page n of N) on every page. */
    void finish(String head, String date, String foot) {
        close();
        int n = doc.getNumberOfPages();
        for (int i = 0; i < n; i++) {
            PDPage page = doc.getPage(i);
            try (PDPageContentStream s = new PDPageContentStream(doc, page, PDPageContentStream.AppendMode.APPEND,
                    true, true)) {
                PdfPen p = new PdfPen(s, PAGE_HEIGHT, fonts, Affine.IDENTITY);
                TextStyle small = new TextStyle(SMALL, false, TextStyle.HAnchor.START, TextStyle.VAnchor.BASELINE);
                p.text(head, MARGIN_X, 38, small, MUTED);
                p.text(date, MARGIN_X + WIDTH, 38, small.anchored(TextStyle.HAnchor.END, TextStyle.VAnchor.BASELINE), MUTED);
                p.line(MARGIN_X, 43, MARGIN_X + WIDTH, 43, RULE, Stroke.solid(0.5));
                p.line(MARGIN_X, PAGE_HEIGHT - 44, MARGIN_X + WIDTH, PAGE_HEIGHT - 44, RULE, Stroke.solid(0.5));
                p.text(foot, MARGIN_X, PAGE_HEIGHT - 32, small, MUTED);
                p.text("page " + (i + 1) + " of " + n, MARGIN_X + WIDTH, PAGE_HEIGHT - 32,
                        small.anchored(TextStyle.HAnchor.END, TextStyle.VAnchor.BASELINE), MUTED);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    @Override
    public void close() {
        if (cs != null) {
            try {
                cs.close();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } finally {
                cs = null;
            }
        }
    }

    /** Greedy word wrap by the font's widths; a word longer than the line is cut. */
    List<String> wrap(String text, double width, double size, boolean bold) {
        List<String> out = new ArrayList<>();
        for (String para : fonts.printable(text, bold).split("\n", -1)) {
            StringBuilder line = new StringBuilder();
            for (String word : para.split(" ")) {
                String candidate = line.length() == 0 ? word : line + " " + word;
                if (fonts.width(candidate, size, bold) <= width || line.length() == 0 && fits(word, width, size, bold)) {
                    line.setLength(0);
                    line.append(candidate);
                } else if (line.length() == 0) {
                    cut(word, width, size, bold, out, line);
                } else {
                    out.add(line.toString());
                    line.setLength(0);
                    if (fits(word, width, size, bold)) {
                        line.append(word);
                    } else {
                        cut(word, width, size, bold, out, line);
                    }
                }
            }
            out.add(line.toString());
        }
        return out;
    }

    private boolean fits(String word, double width, double size, boolean bold) {
        return fonts.width(word, size, bold) <= width;
    }

    private void cut(String word, double width, double size, boolean bold, List<String> out, StringBuilder line) {
        String rest = word;
        while (!fits(rest, width, size, bold) && rest.length() > 1) {
            int k = rest.length() - 1;
            while (k > 1 && !fits(rest.substring(0, k), width, size, bold)) {
                k--;
            }
            out.add(rest.substring(0, k));
            rest = rest.substring(k);
        }
        line.append(rest);
    }

    private void headerRow(double[] widths, List<String> header) {
        double h = BODY * LEADING + 2 * CELL_PAD;
        need(h + 3 * BODY * LEADING);
        double x = MARGIN_X;
        TextStyle bold = new TextStyle(BODY, true, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
        for (int i = 0; i < widths.length; i++) {
            pen.text(i < header.size() ? header.get(i) : "", x + CELL_PAD, y + CELL_PAD, bold, INK);
            x += widths[i];
        }
        y += h;
        pen.line(MARGIN_X, y, MARGIN_X + WIDTH, y, INK, Stroke.solid(0.8));
    }

    private void newPage() {
        close();
        PDPage page = new PDPage(PDRectangle.A4);
        doc.addPage(page);
        try {
            cs = new PDPageContentStream(doc, page);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        pen = new PdfPen(cs, PAGE_HEIGHT, fonts, Affine.IDENTITY);
        y = TOP;
    }
}
