package org.armature.render;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.armature.model.StageRoles;
import org.armature.netlist.ContactState;
import org.armature.model.Connectivity;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.solver.timedomain.TransientEvent;
import org.armature.solver.timedomain.Trace;
import org.armature.solver.timedomain.Waveform;

/**
 * The edges plot: stacked strips that share one time axis (coil current, switch voltage, armature
 * travel, contact state), with the run's events as faint vertical marks and a time cursor whose
 * values are written beside it in each strip. Pure: draws onto any {@link Pen} in pen units
 * (pixels on the canvas), with no side effects besides the pen calls.
 *
 * <p>The switch voltage is not a trace of the run; it is the difference of the node voltages at
 * the switch's high and low terminals (collector–emitter, drain–source, emitter–collector of a
 * high-side PNP), taken from the run's {@code V(net)} traces with ground at 0 V.
 */
public final class EdgePlot {

    /** Left margin for the strip titles, pen units. */
    public static final double TITLE_WIDTH = 150;
    /** Right margin, pen units. */
    public static final double RIGHT_MARGIN = 14;
    /** Height of the time axis below the strips, pen units. */
    public static final double AXIS_HEIGHT = 26;
    /** Gap between strips, pen units. */
    public static final double STRIP_GAP = 8;
    /** Smallest distance between time ticks, pen units: room for a label of four digits. */
    public static final double TICK_SPACING = 44;
    /** Text size, pen units. */
    public static final double TEXT_SIZE = 11;

    private EdgePlot() {
    }

    /**
     * One strip's data.
     *
     * @param title what it shows ("coil current")
     * @param unit SI unit symbol of the values ("A"; "" for a 0/1 state)
     * @param scale factor applied for display (1e3 shows metres as mm)
     * @param displayUnit unit written on the axis after scaling ("mm")
     * @param values samples, one per time point
     * @param binary true for a 0/1 state (drawn as a step, labelled open/closed)
     * @param floor lowest value the quantity can take, in its SI unit ({@code -Infinity} for none)
     * @param ceiling highest value the quantity can take, in its SI unit ({@code +Infinity} for none)
     */
    public record Channel(String title, String unit, double scale, String displayUnit, double[] values, boolean binary,
                          double floor, double ceiling) {

        /** A channel whose quantity has no physical limits. */
        public Channel(String title, String unit, double scale, String displayUnit, double[] values, boolean binary) {
            this(title, unit, scale, displayUnit, values, binary, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        }

        public Channel {
            if (!(ceiling > floor)) {
                throw new IllegalArgumentException("channel " + title + " needs ceiling > floor");
            }
        }

        /** The value axis of this channel, in display units. */
        public PlotAxis axis() {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double v : values) {
                lo = Math.min(lo, v * scale);
                hi = Math.max(hi, v * scale);
            }
            if (values.length == 0) {
                lo = 0;
                hi = 0;
            }
            double f = scale > 0 ? floor * scale : Double.NEGATIVE_INFINITY;
            double c = scale > 0 ? ceiling * scale : Double.POSITIVE_INFINITY;
            return PlotAxis.of(lo, hi, f, c, displayUnit);
        }
    }

    /**
     * What to plot.
     *
     * @param timeSeconds time points, seconds, strictly increasing
     * @param channels strips from top to bottom
     * @param events located events of the run
     */
    public record Plot(double[] timeSeconds, List<Channel> channels, List<TransientEvent> events) {
        public Plot {
            channels = List.copyOf(channels);
            events = List.copyOf(events);
        }

        /** Value of a channel at a time, linear between samples, clamped to the run. */
        public double valueAt(Channel c, double t) {
            double[] ts = timeSeconds;
            if (ts.length == 0) {
                return Double.NaN;
            }
            if (t <= ts[0]) {
                return c.values()[0];
            }
            if (t >= ts[ts.length - 1]) {
                return c.values()[ts.length - 1];
            }
            int lo = 0;
            int hi = ts.length - 1;
            while (hi - lo > 1) {
                int mid = (lo + hi) >>> 1;
                if (ts[mid] <= t) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            if (c.binary()) {
                return c.values()[lo];
            }
            double f = (t - ts[lo]) / (ts[hi] - ts[lo]);
            return c.values()[lo] + f * (c.values()[hi] - c.values()[lo]);
        }

        /** Run length, seconds. */
        public double endSeconds() {
            return timeSeconds.length == 0 ? 0 : timeSeconds[timeSeconds.length - 1];
        }
    }

    /** The four strips of a run of a stage: coil current, switch voltage, armature travel, contacts. */
    public static Plot of(Stage stage, Waveform w) {
        List<Channel> ch = new ArrayList<>();
        w.trace(Waveform.COIL_CURRENT).ifPresent(t -> ch.add(new Channel("coil current", "A", 1, "A", t.values(), false)));
        switchVolts(stage, w).ifPresent(v -> ch.add(new Channel("switch voltage", "V", 1, "V", v, false)));
        // travel runs from the released stop (0) to the attracted one: the axis spans stop to stop
        double travel = stage.parts().stream().filter(p -> p.kind() == PartKind.RELAY).findFirst()
                .map(p -> p.value("travelMetres")).filter(v -> v > 0).orElse(Double.POSITIVE_INFINITY);
        w.trace(Waveform.ARMATURE_POSITION).ifPresent(t -> ch.add(new Channel("armature travel", "m", 1, "m",
                t.values(), false, 0, travel)));
        w.trace(Waveform.CONTACT_STATE).ifPresent(t -> ch.add(new Channel("contacts", "", 1, "", t.values(), true)));
        return new Plot(w.time(), ch, w.events());
    }

    /** The switch voltage over the run, from its terminals' node voltages; empty without a switch. */
    public static Optional<double[]> switchVolts(Stage stage, Waveform w) {
        StageRecognition recognition = StageRecognition.of(stage);
        Optional<Part> sw = recognition.roles().map(StageRoles::switchRef).flatMap(stage::part);
        if (sw.isEmpty()) {
            return Optional.empty();
        }
        Part p = sw.get();
        String[] pins = switch (p.kind()) {
            case NPN -> new String[] {"c", "e"};
            case PNP -> new String[] {"e", "c"};
            case NMOS -> new String[] {"d", "s"};
            case DARLINGTON -> new String[] {"out", "e"};
            default -> new String[0];
        };
        if (pins.length == 0) {
            return Optional.empty();
        }
        Connectivity c = recognition.connectivity();
        Optional<double[]> hi = nodeVolts(w, c.net(p.ref(), pins[0]));
        Optional<double[]> lo = nodeVolts(w, c.net(p.ref(), pins[1]));
        if (hi.isEmpty() || lo.isEmpty()) {
            return Optional.empty();
        }
        double[] out = new double[w.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = hi.get()[i] - lo.get()[i];
        }
        return Optional.of(out);
    }

    private static Optional<double[]> nodeVolts(Waveform w, String net) {
        if (net.equals(Connectivity.GROUND)) {
            return Optional.of(new double[w.size()]);
        }
        return w.trace("V(" + net + ")").map(Trace::values);
    }

    /**
     * Draws a plot.
     *
     * @param pen where to draw, in pen units
     * @param plot the data
     * @param width area width, pen units
     * @param height area height, pen units
     * @param cursorSeconds time of the cursor, seconds; NaN for none
     * @param pal colours
     */
    public static void draw(Pen pen, Plot plot, double width, double height, double cursorSeconds, Palette pal) {
        pen.fillRect(new Box(0, 0, width, height), pal.paper());
        int n = plot.channels().size();
        double x0 = TITLE_WIDTH;
        double x1 = Math.max(x0 + 10, width - RIGHT_MARGIN);
        double top = 8;
        double bottom = Math.max(top + 10, height - AXIS_HEIGHT);
        if (n == 0 || plot.timeSeconds().length < 2) {
            pen.text("No run yet", width / 2, height / 2, TextStyle.centred(TEXT_SIZE), pal.valueInk());
            return;
        }
        double t0 = plot.timeSeconds()[0];
        double t1 = plot.endSeconds();
        double stripH = (bottom - top - (n - 1) * STRIP_GAP) / n;
        TextStyle title = new TextStyle(TEXT_SIZE, true, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
        TextStyle small = new TextStyle(TEXT_SIZE * 0.85, false, TextStyle.HAnchor.END, TextStyle.VAnchor.MIDDLE);
        Stroke frame = Stroke.solid(1);
        Stroke trace = Stroke.solid(1.6);
        Stroke faint = Stroke.dashed(0.8, 3);
        // event marks behind everything
        for (TransientEvent e : plot.events()) {
            double x = x0 + (e.timeSeconds() - t0) / (t1 - t0) * (x1 - x0);
            pen.line(x, top, x, bottom, pal.gridMajor(), faint);
        }
        for (int k = 0; k < n; k++) {
            Channel c = plot.channels().get(k);
            double sy0 = top + k * (stripH + STRIP_GAP);
            double sy1 = sy0 + stripH;
            PlotAxis axis = c.binary() ? null : c.axis();
            double lo = c.binary() ? 0 : axis.lo();
            double hi = c.binary() ? 1 : axis.hi();
            Box strip = new Box(x0, sy0, x1, sy1);
            pen.fillRect(strip, pal.tagFill());
            double zeroY = mapY(0, lo, hi, sy0, sy1);
            if (zeroY > sy0 && zeroY < sy1) {
                pen.line(x0, zeroY, x1, zeroY, pal.gridMajor(), Stroke.solid(0.8));
            }
            pen.strokeRect(strip, pal.gridMajor().mix(pal.valueInk(), 0.3), frame);
            pen.text(c.title(), 8, (sy0 + sy1) / 2, title.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE),
                    pal.labelInk());
            String hiText = c.binary() ? "closed" : axis.label(hi);
            String loText = c.binary() ? "open" : axis.label(lo);
            pen.text(hiText, x0 - 6, sy0 + TEXT_SIZE * 0.6, small, pal.valueInk());
            pen.text(loText, x0 - 6, sy1 - TEXT_SIZE * 0.6, small, pal.valueInk());
            polyline(pen, plot, c, x0, x1, t0, t1, lo, hi, sy0, sy1, k == 0 ? pal.current() : k == 1 ? pal.voltage()
                    : pal.ink(), trace);
        }
        timeAxis(pen, x0, x1, bottom, t0, t1, pal);
        if (!Double.isNaN(cursorSeconds)) {
            cursor(pen, plot, cursorSeconds, x0, x1, top, bottom, stripH, t0, t1, pal);
        }
    }

    /** Time of a pen x within the plot area of a plot drawn {@code width} wide, clamped to the run. */
    public static double timeAt(Plot plot, double x, double width) {
        double x0 = TITLE_WIDTH;
        double x1 = Math.max(x0 + 10, width - RIGHT_MARGIN);
        double t0 = plot.timeSeconds().length == 0 ? 0 : plot.timeSeconds()[0];
        double t1 = plot.endSeconds();
        double f = Math.max(0, Math.min(1, (x - x0) / (x1 - x0)));
        return t0 + f * (t1 - t0);
    }

    private static double mapY(double v, double lo, double hi, double sy0, double sy1) {
        return sy1 - (v - lo) / (hi - lo) * (sy1 - sy0);
    }

    /** Draws a trace reduced to its minimum and maximum per pen unit column (fast for long runs). */
    private static void polyline(Pen pen, Plot plot, Channel c, double x0, double x1, double t0, double t1,
                                 double lo, double hi, double sy0, double sy1, Colour colour, Stroke stroke) {
        double[] ts = plot.timeSeconds();
        double[] vs = c.values();
        int columns = Math.max(2, (int) Math.ceil(x1 - x0));
        List<double[]> pts = new ArrayList<>();
        int i = 0;
        double prev = vs[0] * c.scale();
        for (int col = 0; col < columns && i < ts.length; col++) {
            double tEnd = t0 + (col + 1.0) / columns * (t1 - t0);
            double mn = Double.POSITIVE_INFINITY;
            double mx = Double.NEGATIVE_INFINITY;
            double first = Double.NaN;
            double last = Double.NaN;
            while (i < ts.length && (ts[i] <= tEnd || col == columns - 1)) {
                double v = vs[i] * c.scale();
                if (Double.isNaN(first)) {
                    first = v;
                }
                last = v;
                mn = Math.min(mn, v);
                mx = Math.max(mx, v);
                i++;
            }
            double x = x0 + (col + 0.5) / columns * (x1 - x0);
            if (Double.isNaN(first)) {
                // no sample in this column: a state holds its value, a waveform runs straight on
                // to the next sample (time points may lie many columns apart)
                double v = prev;
                if (!c.binary() && i > 0 && i < ts.length && ts[i] > ts[i - 1]) {
                    double tc = t0 + (col + 0.5) / columns * (t1 - t0);
                    double f = Math.max(0, Math.min(1, (tc - ts[i - 1]) / (ts[i] - ts[i - 1])));
                    v = (vs[i - 1] + f * (vs[i] - vs[i - 1])) * c.scale();
                }
                pts.add(new double[] {x, mapY(v, lo, hi, sy0, sy1)});
                continue;
            }
            if (c.binary()) {
                pts.add(new double[] {x, mapY(first, lo, hi, sy0, sy1)});
                if (last != first) {
                    pts.add(new double[] {x, mapY(last, lo, hi, sy0, sy1)});
                }
            } else if (mx - mn > 0) {
                boolean rising = last >= first;
                pts.add(new double[] {x, mapY(rising ? mn : mx, lo, hi, sy0, sy1)});
                pts.add(new double[] {x, mapY(rising ? mx : mn, lo, hi, sy0, sy1)});
            } else {
                pts.add(new double[] {x, mapY(first, lo, hi, sy0, sy1)});
            }
            prev = last;
        }
        if (pts.size() < 2) {
            return;
        }
        double[] xs = new double[pts.size()];
        double[] ys = new double[pts.size()];
        for (int k = 0; k < xs.length; k++) {
            xs[k] = pts.get(k)[0];
            ys[k] = pts.get(k)[1];
        }
        pen.polyline(xs, ys, colour, stroke);
    }

    private static void timeAxis(Pen pen, double x0, double x1, double y, double t0, double t1, Palette pal) {
        double span = (t1 - t0) * 1e3;
        // as many ticks as fit with room for their labels (about TICK_SPACING pen units apart), at most 8
        double step = PlotAxis.niceStep(span / Math.max(2, Math.min(8, Math.floor((x1 - x0) / TICK_SPACING))));
        // one format for every tick: as many decimals as the step needs ("0.5", "1.0", ... "10.0")
        String format = "%." + PlotAxis.decimalsFor(step) + "f";
        TextStyle tick = new TextStyle(TEXT_SIZE * 0.85, false, TextStyle.HAnchor.MIDDLE, TextStyle.VAnchor.TOP);
        pen.line(x0, y, x1, y, pal.valueInk(), Stroke.solid(1));
        long first = (long) Math.ceil(t0 * 1e3 / step - 1e-9);
        long last = (long) Math.floor(t1 * 1e3 / step + 1e-9);
        for (long i = first; i <= last; i++) {
            double ms = i * step;
            double x = x0 + (ms / 1e3 - t0) / (t1 - t0) * (x1 - x0);
            pen.line(x, y, x, y + 4, pal.valueInk(), Stroke.solid(1));
            pen.text(String.format(Locale.ROOT, format, Math.abs(ms) < step * 1e-9 ? 0.0 : ms), x, y + 5, tick,
                    pal.valueInk());
        }
        pen.text("time, ms", x0 - 22, y + 5, tick.anchored(TextStyle.HAnchor.END, TextStyle.VAnchor.TOP), pal.valueInk());
    }

    private static void cursor(Pen pen, Plot plot, double t, double x0, double x1, double top, double bottom,
                               double stripH, double t0, double t1, Palette pal) {
        double x = x0 + (t - t0) / (t1 - t0) * (x1 - x0);
        pen.line(x, top, x, bottom, pal.selection(), Stroke.solid(1.2));
        TextStyle tag = new TextStyle(TEXT_SIZE, true, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
        boolean leftSide = x > (x0 + x1) / 2;
        for (int k = 0; k < plot.channels().size(); k++) {
            Channel c = plot.channels().get(k);
            double v = plot.valueAt(c, t);
            String text = c.binary() ? (ContactState.of(v).operated() ? "closed" : "open") : Notation.format(v * c.scale(), c.displayUnit());
            double sy0 = top + k * (stripH + STRIP_GAP);
            double w = tag.width(text) + 8;
            double bx = leftSide ? x - 6 - w : x + 6;
            Box b = new Box(bx, sy0 + 3, bx + w, sy0 + 3 + tag.height() + 2);
            pen.fillRect(b, pal.tagFill());
            pen.strokeRect(b, pal.selection(), Stroke.solid(0.8));
            pen.text(text, bx + 4, sy0 + 4, tag, pal.selection());
        }
        String tt = Notation.format(t, "s");
        TextStyle tick = new TextStyle(TEXT_SIZE * 0.9, true, TextStyle.HAnchor.MIDDLE, TextStyle.VAnchor.TOP);
        Box b = tick.box(tt, x, bottom + 5).inflate(2);
        pen.fillRect(b, pal.selection());
        pen.text(tt, x, bottom + 5, tick, pal.tagFill());
    }

}
