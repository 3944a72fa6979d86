package org.armature.render;

import java.util.List;
import java.util.Optional;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * The turn-off edges of several stages on one time axis: one strip each for coil current, switch
 * voltage and armature travel, one colour per stage, with a legend. Pure: draws onto any
 * {@link Pen} in pen units, no side effects besides the pen calls. Each stage's run keeps its own
 * time points; all share the axis from the earliest start to the latest end.
 */
public final class OverlayPlot {

    /** The strips, by the titles of {@link EdgePlot#of}. */
    public static final List<String> STRIPS = List.of("coil current", "switch voltage", "armature travel");

    /** One colour per stage, in column order (our own choice: four hues that stay apart in print). */
    public static final List<Colour> SERIES = List.of(Colour.hex("#1f5fa8"), Colour.hex("#c0392b"),
            Colour.hex("#2e8b57"), Colour.hex("#8e44ad"));

    private static final double LEGEND_HEIGHT = 20;
    private static final double TITLE_WIDTH = EdgePlot.TITLE_WIDTH;
    private static final double TEXT_SIZE = EdgePlot.TEXT_SIZE;

    private OverlayPlot() {
    }

    /**
     * Draws the plots of the stages.
     *
     * @param plots one per stage ({@link EdgePlot#of}), at most {@link #SERIES} many
     * @param names the legend's names, one per plot
     */
    public static void draw(Pen pen, List<EdgePlot.Plot> plots, List<String> names, double width, double height,
                            Palette pal) {
        pen.fillRect(new Box(0, 0, width, height), pal.paper());
        double t0 = Double.POSITIVE_INFINITY;
        double t1 = Double.NEGATIVE_INFINITY;
        for (EdgePlot.Plot p : plots) {
            if (p.timeSeconds().length > 1) {
                t0 = Math.min(t0, p.timeSeconds()[0]);
                t1 = Math.max(t1, p.endSeconds());
            }
        }
        TextStyle label = new TextStyle(TEXT_SIZE, false, TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE);
        if (!(t1 > t0)) {
            pen.text("No runs yet", width / 2, height / 2, TextStyle.centred(TEXT_SIZE), pal.valueInk());
            return;
        }
        double lx = TITLE_WIDTH;
        for (int s = 0; s < plots.size() && s < SERIES.size(); s++) {
            pen.line(lx, LEGEND_HEIGHT / 2, lx + 18, LEGEND_HEIGHT / 2, SERIES.get(s), Stroke.solid(2));
            String name = s < names.size() ? names.get(s) : "stage " + (s + 1);
            pen.text(name, lx + 24, LEGEND_HEIGHT / 2, label, pal.labelInk());
            lx += 40 + name.length() * TEXT_SIZE * 0.55;
        }
        double x0 = TITLE_WIDTH;
        double x1 = Math.max(x0 + 10, width - EdgePlot.RIGHT_MARGIN);
        double top = LEGEND_HEIGHT + 6;
        double bottom = Math.max(top + 10, height - EdgePlot.AXIS_HEIGHT);
        int n = STRIPS.size();
        double stripH = (bottom - top - (n - 1) * EdgePlot.STRIP_GAP) / n;
        TextStyle title = new TextStyle(TEXT_SIZE, true, TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE);
        TextStyle small = new TextStyle(TEXT_SIZE * 0.85, false, TextStyle.HAnchor.END, TextStyle.VAnchor.MIDDLE);
        for (int k = 0; k < n; k++) {
            String strip = STRIPS.get(k);
            double sy0 = top + k * (stripH + EdgePlot.STRIP_GAP);
            double sy1 = sy0 + stripH;
            double lo = 0;
            double hi = Double.NEGATIVE_INFINITY;
            String unit = "";
            for (EdgePlot.Plot p : plots) {
                Optional<EdgePlot.Channel> c = channel(p, strip);
                if (c.isPresent()) {
                    unit = c.get().displayUnit();
                    for (double v : c.get().values()) {
                        if (Double.isFinite(v)) {
                            lo = Math.min(lo, v);
                            hi = Math.max(hi, v);
                        }
                    }
                }
            }
            if (!(hi > lo)) {
                hi = lo + 1;
            }
            hi += 0.08 * (hi - lo);
            Box box = new Box(x0, sy0, x1, sy1);
            pen.fillRect(box, pal.tagFill());
            pen.strokeRect(box, pal.gridMajor().mix(pal.valueInk(), 0.3), Stroke.solid(1));
            pen.text(strip, 8, (sy0 + sy1) / 2, title, pal.labelInk());
            pen.text(axis(hi, unit), x0 - 6, sy0 + TEXT_SIZE * 0.6, small, pal.valueInk());
            pen.text(axis(lo, unit), x0 - 6, sy1 - TEXT_SIZE * 0.6, small, pal.valueInk());
            for (int s = 0; s < plots.size() && s < SERIES.size(); s++) {
                EdgePlot.Plot p = plots.get(s);
                Optional<EdgePlot.Channel> c = channel(p, strip);
                if (c.isEmpty()) {
                    continue;
                }
                double[] t = p.timeSeconds();
                double[] v = c.get().values();
                double[] xs = new double[t.length];
                double[] ys = new double[t.length];
                for (int i = 0; i < t.length; i++) {
                    xs[i] = x0 + (t[i] - t0) / (t1 - t0) * (x1 - x0);
                    double y = Double.isFinite(v[i]) ? v[i] : 0;
                    ys[i] = sy1 - (y - lo) / (hi - lo) * (sy1 - sy0);
                }
                pen.polyline(xs, ys, SERIES.get(s), Stroke.solid(1.4));
            }
        }
        TextStyle axisText = new TextStyle(TEXT_SIZE * 0.85, false, TextStyle.HAnchor.MIDDLE, TextStyle.VAnchor.TOP);
        pen.line(x0, bottom, x1, bottom, pal.ink(), Stroke.solid(1));
        for (int i = 0; i <= 4; i++) {
            double t = t0 + (t1 - t0) * i / 4;
            double x = x0 + (x1 - x0) * i / 4;
            pen.line(x, bottom, x, bottom + 4, pal.ink(), Stroke.solid(1));
            pen.text(EngineeringNotation.format(t, Unit.SECOND), x, bottom + 6, axisText, pal.valueInk());
        }
    }

    private static Optional<EdgePlot.Channel> channel(EdgePlot.Plot p, String title) {
        return p.channels().stream().filter(c -> c.title().equals(title)).findFirst();
    }

    private static String axis(double v, String unit) {
        Optional<Unit> u = java.util.Arrays.stream(Unit.values()).filter(x -> x.symbol().equals(unit)).findFirst();
        return u.map(x -> EngineeringNotation.format(v, x)).orElse(String.format(java.util.Locale.ROOT, "%.3g", v));
    }
}
