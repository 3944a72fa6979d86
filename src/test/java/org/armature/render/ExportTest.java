package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.render.report.StageSnapshot;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SwitchVerdict;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/** SVG and PNG exports of the annotated sheet: valid files holding the engine's figures where the canvas puts them. */
class ExportTest {

    private static final LocalDate DAY = LocalDate.of(2026, 12, 5);

    static Stream<Arguments> templates() {
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            out.add(Arguments.of(t.id(), Templates.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT)));
        }
        return out.stream();
    }

    static StageSnapshot snapshot(Stage stage, boolean pinHigh) {
        return StageSnapshot.evaluate("Greenhouse valves", stage, pinHigh, StageSnapshot.Depth.DRAWING, DAY);
    }

    /** One {@code <text>} element of the SVG: its content, its start-of-baseline position and its size as shown. */
    record SvgText(String text, double x, double y, double size) {
    }

    static List<SvgText> svgTexts(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
        NodeList nodes = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        List<SvgText> out = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            Element e = (Element) nodes.item(i);
            double x = Double.parseDouble(e.getAttribute("x"));
            double y = Double.parseDouble(e.getAttribute("y"));
            java.util.regex.Matcher fs = java.util.regex.Pattern.compile("font-size:\\s*([0-9.]+)px")
                    .matcher(e.getAttribute("style"));
            double size = fs.find() ? Double.parseDouble(fs.group(1)) : Double.NaN;
            // apply the transforms of the element and its groups, innermost first (JFreeSVG writes matrix(...))
            for (org.w3c.dom.Node n = e; n instanceof Element el; n = n.getParentNode()) {
                String t = el.getAttribute("transform");
                if (!t.isEmpty()) {
                    String[] m = t.replaceAll("^matrix\\(|\\)$", "").split("[ ,]+");
                    assertEquals(6, m.length, "a matrix transform: " + t);
                    double[] v = java.util.Arrays.stream(m).mapToDouble(Double::parseDouble).toArray();
                    size *= Math.sqrt(Math.abs(v[0] * v[3] - v[1] * v[2]));
                    double nx = v[0] * x + v[2] * y + v[4];
                    double ny = v[1] * x + v[3] * y + v[5];
                    x = nx;
                    y = ny;
                }
            }
            out.add(new SvgText(e.getTextContent(), x, y, size));
        }
        return out;
    }

    /** The texts the canvas path draws for the sheet's stage, in sheet units (the canvas at zoom 1). */
    static List<RecordingPen.TextOp> canvasTexts(Sheet sheet) {
        RecordingPen pen = new RecordingPen();
        pen.push(sheet.drawingTransform());
        SchematicRenderer.draw(sheet.stage(), sheet.annotations(), sheet.renderOptions(), pen);
        pen.pop();
        return pen.ops().stream().filter(o -> o instanceof RecordingPen.TextOp).map(o -> (RecordingPen.TextOp) o)
                .toList();
    }

    /** Asserts that the SVG holds {@code text} as a text element placed where the canvas draws it. */
    static void placedLikeCanvas(String text, List<SvgText> svg, List<RecordingPen.TextOp> canvas) {
        List<RecordingPen.TextOp> drawn = canvas.stream().filter(t -> t.text().equals(text)).toList();
        assertEquals(1, drawn.size(), "the canvas draws \"" + text + "\" once");
        List<SvgText> found = svg.stream().filter(t -> t.text().equals(text)).toList();
        assertEquals(1, found.size(), "the SVG holds \"" + text + "\" once as text");
        RecordingPen.TextOp c = drawn.get(0);
        // the SVG gives the start of the baseline; it must lie in the box the canvas text occupies
        // (estimated box, which is wider than the real text; 2 px slack for the font's ascent)
        Box box = c.style().box(text, c.x(), c.y()).inflate(2);
        SvgText s = found.get(0);
        assertTrue(box.contains(s.x(), s.y()), "\"" + text + "\" at (" + s.x() + ", " + s.y() + ") lies outside the canvas's "
                + box);
        // and at the canvas's size: JFreeSVG writes whole-pixel font sizes, which made badges outgrow their
        // tags until the pen scaled such text (this check failed before that fix)
        assertEquals(c.style().size(), s.size(), 1e-3, "size of \"" + text + "\"");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("templates")
    @DisplayName("SVG parses as XML and holds the engine's coil current and switch verdict where the canvas draws them")
    void svgHoldsEngineFiguresInPlace(String name, Stage stage) throws Exception {
        StageSnapshot snap = snapshot(stage, true);
        OperatingPoint op = snap.shown().orElseThrow();
        Sheet sheet = snap.sheet(ExportTheme.LIGHT.palette());
        String svg = SvgExport.toSvg(sheet);
        List<SvgText> texts = svgTexts(svg);
        List<RecordingPen.TextOp> canvas = canvasTexts(sheet);

        // the coil current straight from the engine's part result, written as the gauge writes it
        double coilAmps = Math.abs(op.quantity("K1", "coilCurrent"));
        assertTrue(coilAmps > 1e-3, "the template's coil conducts with the pin high (derived: supply over coil resistance)");
        placedLikeCanvas("coil " + Notation.format(coilAmps, "A"), texts, canvas);

        // the switch verdict from the engine: fully on with its margin to two figures
        SwitchVerdict v = op.switchVerdict().orElseThrow();
        assertTrue(v.fullyOn(), "each template is sized to switch fully on at nominal values");
        String words = (stage.part(v.ref()).orElseThrow().kind() == org.armature.model.PartKind.NMOS
                ? "fully on, ×" : "saturated, ×") + String.format(Locale.ROOT, "%.2g", v.margin()) + " margin";
        // the placer may set a badge on one line or wrap it after its comma ("saturated," / "×9.4 margin")
        List<String> lines = SchematicRenderer.wraps(words).stream()
                .filter(l -> l.stream().allMatch(t -> canvas.stream().anyMatch(c -> c.text().equals(t))))
                .findFirst().orElseThrow(() -> new AssertionError("the canvas draws \"" + words + "\" on one line or two"));
        for (String line : lines) {
            placedLikeCanvas(line, texts, canvas);
        }

        // the title block names the stage, the document, the date and the conditions
        List<String> all = texts.stream().map(SvgText::text).toList();
        assertTrue(all.contains(stage.name()));
        assertTrue(all.contains("Greenhouse valves"));
        assertTrue(all.contains("2026-12-05"));
        assertTrue(all.stream().anyMatch(t -> t.startsWith("Readouts: pin high · ambient 25 °C · coil supply")), all.toString());
        assertFalse(svg.contains("<!DOCTYPE"), "no DTD for readers to fetch");
    }

    @Test
    @DisplayName("with the pin low the SVG says so and shows the switch cut off")
    void pinLowConditions() throws Exception {
        Stage stage = Templates.defaultStage();
        List<String> all = svgTexts(SvgExport.toSvg(snapshot(stage, false).sheet(ExportTheme.LIGHT.palette())))
                .stream().map(SvgText::text).toList();
        assertTrue(all.stream().anyMatch(t -> t.startsWith("Readouts: pin low")), all.toString());
        assertTrue(all.contains("cut off"), all.toString());
    }

    @Test
    @DisplayName("the light export theme is dark ink on white paper; the dark theme keeps the dark paper")
    void themes() {
        String light = SvgExport.toSvg(snapshot(Templates.defaultStage(), true).sheet(ExportTheme.LIGHT.palette()));
        String dark = SvgExport.toSvg(snapshot(Templates.defaultStage(), true).sheet(ExportTheme.DARK.palette()));
        assertTrue(light.contains("fill:rgb(255,255,255)"), "white paper");
        Colour paper = Palette.DARK.paper();
        assertTrue(dark.contains("fill:rgb(" + paper.red() + "," + paper.green() + "," + paper.blue() + ")"), "dark paper");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("templates")
    @DisplayName("PNG at 1× and 2× has the sheet's size (2× twice 1× within a pixel) and ink inside the drawing")
    void pngSizesAndInk(String name, Stage stage) throws Exception {
        Sheet sheet = snapshot(stage, true).sheet(ExportTheme.LIGHT.palette());
        BufferedImage one = ImageIO.read(new ByteArrayInputStream(PngExport.png(sheet, 1, false)));
        BufferedImage two = ImageIO.read(new ByteArrayInputStream(PngExport.png(sheet, 2, false)));
        BufferedImage four = PngExport.image(sheet, 4, true);
        assertEquals(Math.ceil(sheet.width()), one.getWidth());
        assertEquals(Math.ceil(sheet.height()), one.getHeight());
        assertTrue(Math.abs(two.getWidth() - 2 * one.getWidth()) <= 1, two.getWidth() + " vs " + one.getWidth());
        assertTrue(Math.abs(two.getHeight() - 2 * one.getHeight()) <= 1, two.getHeight() + " vs " + one.getHeight());
        assertEquals((int) Math.ceil(sheet.width() * 4), four.getWidth());
        for (var entry : List.of(new Object[] {one, 1.0}, new Object[] {two, 2.0}, new Object[] {four, 4.0})) {
            BufferedImage img = (BufferedImage) entry[0];
            double k = (double) entry[1];
            Box d = sheet.drawingBox();
            int ink = inkPixels(img, (int) (d.minX() * k), (int) (d.minY() * k), (int) (d.maxX() * k),
                    (int) (d.maxY() * k), img == four);
            // a template has dozens of symbols: at least 1 % of the drawing's area is ink (common practice floor
            // for "not blank"; the default stage measures about 6 %)
            double area = (d.width() * k) * (d.height() * k);
            assertTrue(ink > 0.01 * area, "ink " + ink + " of " + area + " pixels at " + k + "×");
        }
    }

    @Test
    @DisplayName("300 dpi gives a scale of 3.125 and records the resolution in the file")
    void dpi() throws Exception {
        Sheet sheet = snapshot(Templates.defaultStage(), true).sheet(ExportTheme.LIGHT.palette());
        double k = PngExport.scaleForDpi(300);
        assertEquals(3.125, k, 1e-12, "300 / 96 (CSS pixels per inch), derived");
        byte[] png = PngExport.png(sheet, k, false);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        assertEquals((int) Math.ceil(sheet.width() * k), img.getWidth());
        // pHYs: 300 dpi is 11,811 pixels per metre (300 / 0.0254, derived)
        int at = indexOf(png, "pHYs".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        assertTrue(at > 0, "the PNG has a pHYs chunk");
        int ppm = ((png[at + 4] & 0xff) << 24) | ((png[at + 5] & 0xff) << 16) | ((png[at + 6] & 0xff) << 8) | (png[at + 7] & 0xff);
        assertEquals(11811, ppm, 1);
    }

    @Test
    @DisplayName("canvas and SVG export draw the same operations for the same evaluation")
    void oneCodePath() {
        StageSnapshot snap = snapshot(Templates.defaultStage(), true);
        Sheet sheet = snap.sheet(ExportTheme.LIGHT.palette());
        // the canvas path: the call SchematicCanvas makes for its drawing layer (options built as it
        // builds them: every option of all(), its palette, the drawing layers, a visible area, no selection)
        RecordingPen canvas = new RecordingPen();
        RenderOptions canvasOptions = RenderOptions.all().withPalette(sheet.palette())
                .withLayers(java.util.EnumSet.of(Layer.WIRES, Layer.PARTS, Layer.LABELS, Layer.ANNOTATIONS))
                .withGridArea(new Box(-20, -20, 60, 60)).withSelection(Selection.EMPTY);
        SchematicRenderer.draw(sheet.stage(), sheet.annotations(), canvasOptions, canvas);
        // the SVG export's drawing, recorded through the same call SvgExport makes, mapped back to grid units
        RecordingPen export = new RecordingPen();
        sheet.draw(export, true);
        Affine back = sheet.drawingTransform().inverse();
        List<RecordingPen.Op> ops = export.ops();
        List<RecordingPen.Op> expected = canvas.ops();
        assertTrue(ops.size() > expected.size(), "the sheet adds paper and a title block");
        // op 0 is the paper; the drawing follows, then the title block
        for (int i = 0; i < expected.size(); i++) {
            assertSameOp(expected.get(i), ops.get(i + 1), back, sheet.drawingTransform().scale(), i);
        }
        List<String> rest = ops.subList(expected.size() + 1, ops.size()).stream()
                .filter(o -> o instanceof RecordingPen.TextOp).map(o -> ((RecordingPen.TextOp) o).text()).toList();
        assertTrue(rest.contains(snap.stage().name()), rest.toString());
    }

    private static void assertSameOp(RecordingPen.Op want, RecordingPen.Op got, Affine back, double scale, int i) {
        assertEquals(want.getClass(), got.getClass(), "op " + i);
        double tol = 1e-9;
        if (want instanceof RecordingPen.TextOp w && got instanceof RecordingPen.TextOp g) {
            assertEquals(w.text(), g.text(), "op " + i);
            assertEquals(w.x(), back.mapX(g.x(), g.y()), tol, "op " + i);
            assertEquals(w.y(), back.mapY(g.x(), g.y()), tol, "op " + i);
            assertEquals(w.style().size(), g.style().size() / scale, tol, "op " + i);
            assertEquals(w.colour(), g.colour(), "op " + i);
        } else if (want instanceof RecordingPen.PolylineOp w && got instanceof RecordingPen.PolylineOp g) {
            assertPoints(w.xs(), w.ys(), g.xs(), g.ys(), back, i);
            assertEquals(w.colour(), g.colour(), "op " + i);
            assertEquals(w.stroke().width(), g.stroke().width() / scale, tol, "op " + i);
            assertEquals(w.closed(), g.closed(), "op " + i);
        } else if (want instanceof RecordingPen.FillOp w && got instanceof RecordingPen.FillOp g) {
            assertPoints(w.xs(), w.ys(), g.xs(), g.ys(), back, i);
            assertEquals(w.colour(), g.colour(), "op " + i);
        } else if (want instanceof RecordingPen.CircleOp w && got instanceof RecordingPen.CircleOp g) {
            assertEquals(w.cx(), back.mapX(g.cx(), g.cy()), tol, "op " + i);
            assertEquals(w.cy(), back.mapY(g.cx(), g.cy()), tol, "op " + i);
            assertEquals(w.r(), g.r() / scale, tol, "op " + i);
            assertEquals(w.filled(), g.filled(), "op " + i);
        }
    }

    private static void assertPoints(double[] wx, double[] wy, double[] gx, double[] gy, Affine back, int i) {
        assertEquals(wx.length, gx.length, "op " + i);
        for (int k = 0; k < wx.length; k++) {
            assertEquals(wx[k], back.mapX(gx[k], gy[k]), 1e-9, "op " + i);
            assertEquals(wy[k], back.mapY(gx[k], gy[k]), 1e-9, "op " + i);
        }
    }

    /** Pixels inside the rectangle that differ clearly from white paper (or, transparent, that are opaque). */
    static int inkPixels(BufferedImage img, int x0, int y0, int x1, int y1, boolean transparent) {
        int n = 0;
        for (int y = Math.max(0, y0); y < Math.min(img.getHeight(), y1); y++) {
            for (int x = Math.max(0, x0); x < Math.min(img.getWidth(), x1); x++) {
                int argb = img.getRGB(x, y);
                int a = argb >>> 24;
                int lum = ((argb >> 16) & 0xff) + ((argb >> 8) & 0xff) + (argb & 0xff);
                if (transparent ? a > 128 : a > 128 && lum < 3 * 200) {
                    n++;
                }
            }
        }
        return n;
    }

    private static int indexOf(byte[] hay, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= hay.length; i++) {
            for (int j = 0; j < needle.length; j++) {
                if (hay[i + j] != needle[j]) {
                    continue outer;
                }
            }
            return i + needle.length;
        }
        return -1;
    }
}
