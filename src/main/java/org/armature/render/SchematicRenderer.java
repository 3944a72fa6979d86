package org.armature.render;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.armature.model.ParamKeys;
import org.armature.model.Connectivity;
import org.armature.model.GridPoint;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.PinSpec;
import org.armature.model.Stage;
import org.armature.model.TestPoint;
import org.armature.model.Wire;

/**
 * The one drawing of a stage and its readouts, onto any {@link Pen}: the live canvas, each pane of a
 * comparison and every export use it. It has no side effects besides the pen calls and returns the
 * {@link Layout} it used.
 *
 * <p>Layers are drawn in this fixed order, each only if {@link RenderOptions#draws(Layer)}:
 * <ol>
 *   <li>{@link Layer#GRID}: minor lines every grid unit, major lines every
 *       {@value RenderOptions#GRID_MAJOR_EVERY};</li>
 *   <li>{@link Layer#WIRES}: segments, then junction dots where three or more ends meet (a pin or a
 *       wire end counts one, a wire passing through counts two);</li>
 *   <li>{@link Layer#PARTS}: IEC 60617-style symbols, then open rings on unconnected pins;</li>
 *   <li>{@link Layer#LABELS}: designator and value beside each part;</li>
 *   <li>{@link Layer#ANNOTATIONS}: test point tags (with their net's voltage when it is shown), other
 *       node voltage tags, current arrows and tags, verdict badges, relay gauges, finding markers. Test
 *       point tags are placed with the readouts, so they are drawn with them: a view may cache
 *       everything below this layer while only readouts change.</li>
 *   <li>{@link Layer#SELECTION}: selection highlight, wires being drawn, rubber band, hovered pin.</li>
 * </ol>
 *
 * <p>Coordinates are grid units; the pen's transform maps them to its device. The label layout
 * ({@link #layout}) does not depend on the options, so every layer subset of one stage agrees.
 */
public final class SchematicRenderer {

    /** Wire line width, grid units. */
    public static final double WIRE_WIDTH = 0.075;
    /** Junction dot radius, grid units. */
    public static final double JUNCTION_RADIUS = 0.15;
    /** Designator text size, grid units. */
    public static final double DESIGNATOR_SIZE = 0.62;
    /** Value text size, grid units. */
    public static final double VALUE_SIZE = 0.54;
    /** Tag text size (test points, readouts), grid units. */
    public static final double TAG_SIZE = 0.48;
    /** Padding inside label boxes, grid units. */
    public static final double PAD = 0.1;
    /** Gap between a part body and its label, grid units. */
    public static final double GAP = 0.22;

    private static final TextStyle DESIGNATOR = new TextStyle(DESIGNATOR_SIZE, true, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
    private static final TextStyle VALUE = new TextStyle(VALUE_SIZE, false, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
    private static final TextStyle TAG = new TextStyle(TAG_SIZE, false, TextStyle.HAnchor.MIDDLE, TextStyle.VAnchor.MIDDLE);
    private static final double GAUGE_WIDTH = 5.8;
    private static final double GAUGE_HEIGHT = 1.75;
    private static final double MARKER_RADIUS = 0.27;
    private static final TextStyle BADGE_STYLE = TAG.weight(true);
    private static final TextStyle GAUGE_TITLE = new TextStyle(0.44, true, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
    private static final TextStyle GAUGE_STATE = new TextStyle(0.4, true, TextStyle.HAnchor.END, TextStyle.VAnchor.TOP);
    private static final TextStyle GAUGE_MARK = new TextStyle(0.36, false, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
    /** Extra cost of setting a badge or marker on two lines instead of one, grid units of distance. */
    private static final double WRAP_COST = 0.8;
    /** Extra cost of pointing a net's tag at a wire or pin other than its preferred point, grid units. */
    private static final double OTHER_ANCHOR_COST = 1.0;
    /** Inset of the gauge's texts and bar from its border, grid units. */
    private static final double GAUGE_INSET = 0.25;

    private SchematicRenderer() {
    }

    /**
     * Draws a stage with its readouts.
     *
     * @param stage what to draw
     * @param annotations readouts to draw over it; {@link Annotations#NONE} for none
     * @param options colours, layers, selection and previews
     * @param pen where to draw; only its drawing methods are called, its transform is left as found
     * @return the layout used (label boxes and extent)
     */
    public static Layout draw(Stage stage, Annotations annotations, RenderOptions options, Pen pen) {
        return draw(stage, annotations, options, pen, layout(stage, annotations));
    }

    /**
     * Draws a stage with its readouts using a layout computed before by {@link #layout(Stage,
     * Annotations, Layout)} for exactly this stage and these readouts (so that a view can draw its
     * layers separately, each with the same labels).
     *
     * @param stage what to draw
     * @param annotations readouts to draw over it
     * @param options colours, layers, selection and previews
     * @param pen where to draw; its transform is left as found
     * @param layout the label layout of this stage and these readouts
     * @return {@code layout}
     */
    public static Layout draw(Stage stage, Annotations annotations, RenderOptions options, Pen pen, Layout layout) {
        Palette pal = options.palette();
        if (options.draws(Layer.GRID)) {
            grid(pen, options.gridArea().orElse(layout.extent().inflate(3)), pal);
        }
        if (options.draws(Layer.WIRES)) {
            wires(pen, stage, pal);
        }
        if (options.draws(Layer.PARTS)) {
            parts(pen, stage, pal, operatedRelays(annotations));
        }
        if (options.draws(Layer.LABELS)) {
            for (PlacedLabel l : layout.labels()) {
                if (l.kind() == PlacedLabel.Kind.PART) {
                    label(pen, l, pal, annotations);
                }
            }
        }
        if (options.draws(Layer.ANNOTATIONS)) {
            currentArrows(pen, stage, annotations, pal);
            for (PlacedLabel l : layout.labels()) {
                if (l.kind() != PlacedLabel.Kind.PART) {
                    label(pen, l, pal, annotations);
                }
            }
        }
        if (options.draws(Layer.SELECTION)) {
            selection(pen, stage, options, pal);
        }
        return layout;
    }

    /** The label layout of a stage with readouts, without drawing (deterministic). */
    public static Layout layout(Stage stage, Annotations annotations) {
        return layout(stage, annotations, Layout.NONE);
    }

    /**
     * The label layout of a stage with readouts, keeping every label of {@code previous} where it was
     * when it still describes the same thing at the same anchor and still fits there without breaking
     * any rule of {@link LabelPlacer}: while only numbers change (a slider drag), labels do not jump.
     * Deterministic for equal arguments.
     *
     * @param stage what is drawn
     * @param annotations its readouts
     * @param previous the layout drawn before ({@link Layout#NONE} for a fresh layout); not modified
     * @return the layout
     */
    public static Layout layout(Stage stage, Annotations annotations, Layout previous) {
        Map<String, PlacedLabel> before = new HashMap<>();
        for (PlacedLabel l : previous.labels()) {
            before.put(l.kind() + "|" + l.owner(), l);
        }
        List<Box> bodies = new ArrayList<>();
        List<double[]> segments = new ArrayList<>();
        Box extent = null;
        for (Part p : stage.parts()) {
            for (Box b : PartGeometry.bodies(p)) {
                bodies.add(b);
            }
            Box bb = PartGeometry.bodyBounds(p);
            for (PinSpec pin : p.kind().pins()) {
                GridPoint g = p.pinPoint(pin.name());
                double[] q = LabelPlacer.nearestOnBox(bb, g.gridX(), g.gridY());
                segments.add(new double[] {g.gridX(), g.gridY(), q[0], q[1]});
            }
            if (p.kind() == PartKind.RELAY) {
                // the dashed mechanical link between coil and contacts is drawing too
                Affine f = PartGeometry.frame(p.placement());
                segments.add(new double[] {f.mapX(0.75, 0), f.mapY(0.75, 0), f.mapX(4.6, 0), f.mapY(4.6, 0)});
            }
            extent = extent == null ? PartGeometry.bounds(p) : extent.union(PartGeometry.bounds(p));
        }
        for (Wire w : stage.wires()) {
            segments.add(new double[] {w.from().gridX(), w.from().gridY(), w.to().gridX(), w.to().gridY()});
            Box wb = Box.spanning(w.from().gridX(), w.from().gridY(), w.to().gridX(), w.to().gridY());
            extent = extent == null ? wb : extent.union(wb);
        }
        if (extent == null) {
            extent = new Box(0, 0, 10, 10);
        }
        LabelPlacer placer = new LabelPlacer(inflated(bodies, 0.04), segments);
        List<PlacedLabel> partLabels = new ArrayList<>();
        for (Part p : stage.parts()) {
            partLabel(p, placer, before).ifPresent(partLabels::add);
        }
        // a greedy placer depends on its order: try a few and keep the tidiest (a previous layout, when
        // given, is kept in the first order so that nothing moves while numbers change)
        List<PlacedLabel> labels = null;
        double bestScore = Double.POSITIVE_INFINITY;
        for (List<Group> order : before.isEmpty() ? ORDERS : ORDERS.subList(0, 1)) {
            LabelPlacer trial = placer.copy();
            List<PlacedLabel> out = new ArrayList<>(partLabels);
            annotationLabels(stage, annotations, trial, out, before, order);
            double score = untidiness(out, trial);
            if (score < bestScore) {
                bestScore = score;
                labels = out;
            }
            if (score < TIDY_ENOUGH) {
                // every leader strict and none longer than TIDY_LEADER: the other orders cannot do much better
                break;
            }
        }
        for (PlacedLabel l : labels) {
            extent = extent.union(l.box());
        }
        return new Layout(labels, extent);
    }

    /** The short value line of a part ("1 kΩ", "+12 V"); empty for kinds that show none. */
    public static String valueText(Part p) {
        return switch (p.kind()) {
            case RESISTOR -> Notation.format(p.value(ParamKeys.RESISTANCE_OHMS), "Ω");
            case CAPACITOR -> Notation.format(p.value(ParamKeys.CAPACITANCE_FARADS), "F");
            case ZENER, TVS -> Notation.format(p.value(ParamKeys.BREAKDOWN_VOLTS), "V");
            case LED -> Notation.format(p.value(ParamKeys.FORWARD_VOLTS), "V");
            case DIODE, GROUND -> "";
            case NPN, PNP, DARLINGTON -> "hFE ≥ " + Notation.format(p.value(ParamKeys.HFE_MIN), "");
            case NMOS -> "VT " + Notation.format(p.value(ParamKeys.THRESHOLD_VOLTS), "V");
            case RELAY -> Notation.format(p.value(ParamKeys.RATED_VOLTS), "V") + ", " + Notation.format(p.value(ParamKeys.COIL_RESISTANCE_OHMS), "Ω");
            case LOAD -> Notation.format(p.value(ParamKeys.RATED_WATTS), "W") + " " + p.option(ParamKeys.LOAD_KIND);
            case SUPPLY -> {
                double v = p.value(ParamKeys.VOLTS);
                String sign = p.option(ParamKeys.WAVEFORM).equals("ac-rms") ? "~" : v > 0 ? "+" : "";
                yield sign + Notation.format(v, "V");
            }
            case DRIVE_PIN -> Notation.format(p.value(ParamKeys.HIGH_VOLTS), "V") + ", " + Notation.format(p.value(ParamKeys.OUTPUT_RESISTANCE_OHMS), "Ω");
        };
    }

    // ---------------------------------------------------------------- layout

    private static Optional<PlacedLabel> partLabel(Part p, LabelPlacer placer, Map<String, PlacedLabel> before) {
        if (p.kind() == PartKind.GROUND) {
            return Optional.empty();
        }
        List<String> lines = new ArrayList<>();
        lines.add(p.ref());
        String v = valueText(p);
        if (p.kind() == PartKind.RELAY) {
            // stacked so the label fits between the coil and its contact set
            lines.addAll(List.of(v.split(", ")));
        } else if (!v.isEmpty()) {
            lines.add(v);
        }
        double widest = DESIGNATOR.width(lines.get(0));
        for (int i = 1; i < lines.size(); i++) {
            widest = Math.max(widest, VALUE.width(lines.get(i)));
        }
        double w = widest + 2 * PAD;
        double h = DESIGNATOR.height() + (lines.size() - 1) * VALUE.height() + 2 * PAD;
        Box bb = PartGeometry.bodies(p).get(0);
        boolean upright = PartGeometry.isUpright(p);
        List<Box> right = List.of(
                at(bb.maxX() + GAP, bb.centreY() - h / 2, w, h),
                at(bb.maxX() + GAP, bb.minY() - h * 0.6, w, h),
                at(bb.maxX() + GAP, bb.maxY() - h * 0.4, w, h),
                at(bb.maxX() + GAP, bb.maxY() + 0.05, w, h),
                at(bb.maxX() + GAP, bb.minY() - 0.05 - h, w, h));
        List<Box> left = List.of(
                at(bb.minX() - GAP - w, bb.centreY() - h / 2, w, h),
                at(bb.minX() - GAP - w, bb.minY() - h * 0.6, w, h),
                at(bb.minX() - GAP - w, bb.maxY() - h * 0.4, w, h));
        List<Box> above = List.of(at(bb.centreX() - w / 2, bb.minY() - GAP - h, w, h),
                at(bb.minX() - GAP - w, bb.minY() - GAP - h, w, h),
                at(bb.maxX() + GAP, bb.minY() - GAP - h, w, h));
        List<Box> below = List.of(at(bb.centreX() - w / 2, bb.maxY() + GAP, w, h),
                at(bb.maxX() + GAP, bb.maxY() + GAP, w, h));
        List<Box> candidates = new ArrayList<>();
        if (upright) {
            candidates.addAll(right);
            candidates.addAll(left);
            candidates.addAll(above);
            candidates.addAll(below);
        } else {
            candidates.addAll(above);
            candidates.addAll(below);
            candidates.addAll(right);
            candidates.addAll(left);
        }
        PlacedLabel old = before.get(PlacedLabel.Kind.PART + "|" + p.ref());
        Box chosen = null;
        double ax = Double.NaN;
        double ay = Double.NaN;
        if (old != null && old.target().equals(bb)) {
            Box again = resized(old.box(), w, h, bb.centreX(), bb.centreY());
            if (!old.hasLeader() ? placer.choose(List.of(again)).isPresent()
                    : placer.tryAt(again, old.anchorX(), old.anchorY())) {
                chosen = again;
                ax = old.anchorX();
                ay = old.anchorY();
            }
        }
        if (chosen == null) {
            Optional<Box> beside = placer.choose(candidates);
            if (beside.isPresent()) {
                chosen = beside.get();
            } else {
                // no place against the body: the label moves away and keeps a leader to the body's edge
                ax = bb.maxX();
                ay = bb.centreY();
                chosen = placer.near(ax, ay, w, h);
            }
        }
        TextStyle.HAnchor align = chosen.minX() >= bb.maxX() ? TextStyle.HAnchor.START
                : chosen.maxX() <= bb.minX() ? TextStyle.HAnchor.END : TextStyle.HAnchor.MIDDLE;
        return Optional.of(new PlacedLabel(PlacedLabel.Kind.PART, p.ref(), lines, chosen, align, ax, ay,
                Annotations.State.OK, bb));
    }

    /** The kinds of readout label, placed as groups. */
    private enum Group { GAUGES, CURRENTS, BADGES, MARKERS, NETS }

    /**
     * The placing orders tried. The first places the relay gauges first (biggest, tied to one part),
     * then the current tags (one anchor each, on the arrow), the badges and markers (any side of
     * their part), and last the net tags, which may point at any wire of their net and so fit
     * wherever room is left; the others give the badges or the net tags the first choice.
     */
    private static final List<List<Group>> ORDERS = List.of(
            List.of(Group.GAUGES, Group.CURRENTS, Group.BADGES, Group.MARKERS, Group.NETS),
            List.of(Group.GAUGES, Group.BADGES, Group.MARKERS, Group.CURRENTS, Group.NETS),
            List.of(Group.GAUGES, Group.NETS, Group.CURRENTS, Group.BADGES, Group.MARKERS));

    /** Longest leader of a layout that is kept without trying the other orders, grid units. */
    private static final double TIDY_LEADER = 3.0;
    /** Untidiness below which the first order is kept: no relaxed leader, none longer than TIDY_LEADER. */
    private static final double TIDY_ENOUGH = 10 * TIDY_LEADER + 40;

    /**
     * How untidy a layout is: every placement that had to let its leader through another label
     * weighs most, then the longest leader, then the sum of leader lengths (grid units).
     */
    private static double untidiness(List<PlacedLabel> labels, LabelPlacer placer) {
        double longest = 0;
        double sum = 0;
        for (PlacedLabel l : labels) {
            if (l.hasLeader()) {
                double d = l.box().distanceTo(l.anchorX(), l.anchorY());
                longest = Math.max(longest, d);
                sum += d;
            }
        }
        return 1000.0 * placer.relaxedPlacements() + 10 * longest + sum;
    }

    private static void annotationLabels(Stage stage, Annotations a, LabelPlacer placer, List<PlacedLabel> out,
                                         Map<String, PlacedLabel> before, List<Group> order) {
        for (Group g : order) {
            switch (g) {
                case GAUGES -> gauges(stage, a, placer, out, before);
                case CURRENTS -> currents(stage, a, placer, out, before);
                case BADGES -> badges(stage, a, placer, out, before);
                case MARKERS -> markers(stage, a, placer, out, before);
                case NETS -> netTags(stage, a, placer, out, before);
                default -> throw new IllegalStateException("unknown label group " + g);
            }
        }
    }

    private static void gauges(Stage stage, Annotations a, LabelPlacer placer, List<PlacedLabel> out,
                               Map<String, PlacedLabel> before) {
        for (Annotations.RelayGauge g : a.gauges()) {
            stage.part(g.ref()).ifPresent(p -> {
                // the gauge describes the whole relay: it may sit by the coil or by the contact set
                out.add(placeAround(PlacedLabel.Kind.GAUGE, g.ref(),
                        List.of(new Shape(List.of(gaugeText(g)), gaugeWidth(g), GAUGE_HEIGHT)), PartGeometry.bodies(p),
                        TextStyle.HAnchor.START, gaugeState(g), placer, before));
            });
        }
    }

    private static void currents(Stage stage, Annotations a, LabelPlacer placer, List<PlacedLabel> out,
                                 Map<String, PlacedLabel> before) {
        for (Annotations.BranchCurrent bc : a.currents()) {
            currentArrow(stage, bc).ifPresent(arrow -> out.add(tag(PlacedLabel.Kind.CURRENT, bc.pin().toString(),
                    List.of(Notation.format(Math.abs(bc.ampsIntoPin()), "A")), "A",
                    List.of(new double[] {arrow[0], arrow[1]}), placer, before)));
        }
    }

    private static void badges(Stage stage, Annotations a, LabelPlacer placer, List<PlacedLabel> out,
                               Map<String, PlacedLabel> before) {
        for (Annotations.PartBadge badge : a.badges()) {
            stage.part(badge.ref()).ifPresent(p -> {
                List<Shape> shapes = new ArrayList<>();
                for (List<String> lines : wraps(badge.text())) {
                    double w = 0;
                    for (String line : lines) {
                        w = Math.max(w, BADGE_STYLE.width(reserved(line, "")));
                    }
                    shapes.add(new Shape(lines, w + 2 * PAD + 0.1, lines.size() * TAG.height() + 2 * PAD));
                }
                out.add(placeAround(PlacedLabel.Kind.BADGE, badge.ref(), shapes, PartGeometry.bodies(p),
                        TextStyle.HAnchor.MIDDLE, badge.state(), placer, before));
            });
        }
    }

    private static void markers(Stage stage, Annotations a, LabelPlacer placer, List<PlacedLabel> out,
                                Map<String, PlacedLabel> before) {
        for (Annotations.FindingMarker m : a.markers()) {
            stage.part(m.ref()).ifPresent(p -> {
                List<Shape> shapes = new ArrayList<>();
                for (List<String> lines : wraps(m.text())) {
                    double w = 0;
                    for (String line : lines) {
                        w = Math.max(w, BADGE_STYLE.width(line));
                    }
                    shapes.add(new Shape(lines, 2 * MARKER_RADIUS + (m.text().isEmpty() ? 0 : w + 0.15) + 2 * PAD,
                            Math.max(2 * MARKER_RADIUS, lines.size() * TAG.height()) + 2 * PAD));
                }
                out.add(placeAround(PlacedLabel.Kind.MARKER, m.ref(), shapes, PartGeometry.bodies(p),
                        TextStyle.HAnchor.START, m.state(), placer, before));
            });
        }
    }

    /** Test point names and node voltages: a test point with its net's voltage is one tag, "control 773 mV". */
    private static void netTags(Stage stage, Annotations a, LabelPlacer placer, List<PlacedLabel> out,
                                Map<String, PlacedLabel> before) {
        Map<String, Double> volts = new HashMap<>();
        for (Annotations.NodeVoltage nv : a.voltages()) {
            volts.putIfAbsent(nv.net(), nv.volts());
        }
        Set<String> shown = new HashSet<>();
        Connectivity c = Connectivity.of(stage);
        Map<String, List<String>> readings = readingRows(a);
        for (TestPoint tp : stage.testPoints()) {
            Optional<Part> part = stage.part(tp.ref());
            if (part.isEmpty() || part.get().kind().pin(tp.pin()).isEmpty()) {
                continue;
            }
            GridPoint g = part.get().pinPoint(tp.pin());
            List<double[]> anchors = netAnchors(stage, c, tp.net(), g.gridX(), g.gridY());
            if (readings.containsKey(tp.net())) {
                if (shown.add(tp.net())) {
                    out.add(readingTag(tp.net(), Optional.ofNullable(volts.get(tp.net())), readings.get(tp.net()), anchors,
                            placer, before));
                }
            } else if (volts.containsKey(tp.net()) && shown.add(tp.net())) {
                out.add(tag(PlacedLabel.Kind.VOLTAGE, tp.net(), List.of(tp.net(), Notation.format(volts.get(tp.net()), "V")),
                        "V", anchors, placer, before));
            } else {
                out.add(tag(PlacedLabel.Kind.TEST_POINT, tp.net(), List.of(tp.net()), "", anchors, placer, before));
            }
        }
        for (Annotations.NodeVoltage nv : a.voltages()) {
            if (shown.add(nv.net())) {
                netAnchor(stage, c, nv.net()).ifPresent(g -> out.add(readings.containsKey(nv.net())
                        ? readingTag(nv.net(), Optional.of(nv.volts()), readings.get(nv.net()),
                                netAnchors(stage, c, nv.net(), g[0], g[1]), placer, before)
                        : tag(PlacedLabel.Kind.VOLTAGE, nv.net(),
                        List.of(Notation.format(nv.volts(), "V")), "V", netAnchors(stage, c, nv.net(), g[0], g[1]),
                        placer, before)));
            }
        }
        // readings at nets with no tag of the solve (a net shown without its voltage)
        readings.forEach((net, rows) -> {
            if (shown.add(net)) {
                netAnchor(stage, c, net).ifPresent(g -> out.add(readingTag(net, Optional.empty(), rows,
                        netAnchors(stage, c, net, g[0], g[1]), placer, before)));
            }
        });
    }

    /** Space between the readings of both pin states on a reading tag, grid units. */
    private static final double READING_GAP = 0.35;
    /** Space for the bar between a reading tag's net and its readings, grid units. */
    private static final double READING_BAR = 0.5;

    /** The rows of the meter readings per net ("high 120 mV", then "low 11.9 V"), in the order first entered. */
    private static Map<String, List<String>> readingRows(Annotations a) {
        Map<String, String[]> byNet = new java.util.LinkedHashMap<>();
        for (Annotations.MeterReading r : a.readings()) {
            String[] rows = byNet.computeIfAbsent(r.net(), k -> new String[2]);
            int row = r.pinHigh() ? 0 : 1;
            if (rows[row] == null) {
                rows[row] = r.state() + " " + Notation.format(r.volts(), "V");
            }
        }
        Map<String, List<String>> out = new java.util.LinkedHashMap<>();
        byNet.forEach((net, rows) -> out.put(net, java.util.Arrays.stream(rows).filter(java.util.Objects::nonNull).toList()));
        return out;
    }

    /**
     * A net's tag with the fault hunt's readings: the net's name and its solved voltage (if shown),
     * then each pin state read ("high 120 mV"). One tag per net, so the readings take no place of
     * their own beside it. It is set in the first of three shapes that fits nearest (ties to the
     * first): one row ("switch 11.9 V | high 120 mV  low 11.9 V"), the readings on a second row, or a
     * row per reading; the drawing tells the shape from the box's height.
     *
     * @param volts the solved voltage of the net, if it is shown
     */
    private static PlacedLabel readingTag(String net, Optional<Double> volts, List<String> rows, List<double[]> anchors,
                                          LabelPlacer placer, Map<String, PlacedLabel> before) {
        List<String> lines = new ArrayList<>();
        lines.add(net);
        lines.add(volts.map(v -> Notation.format(v, "V")).orElse(""));
        lines.addAll(rows);
        double head = headWidth(lines);
        double widest = 0;
        double all = 0;
        for (String r : rows) {
            widest = Math.max(widest, readingWidth(r));
            all += readingWidth(r);
        }
        all += (rows.size() - 1) * READING_GAP;
        double[][] shapes = {
            {head + READING_BAR + all, 1},
            {Math.max(head, all), 2},
            {Math.max(head, widest), 1 + rows.size()},
        };
        Box target = new Box(anchors.get(0)[0], anchors.get(0)[1], anchors.get(0)[0], anchors.get(0)[1]);
        PlacedLabel old = before.get(PlacedLabel.Kind.READING + "|" + net);
        if (old != null && old.target().equals(target)) {
            for (double[] shape : shapes) {
                Box again = resized(old.box(), shape[0] + 2 * PAD + 0.24, readingHeight((int) shape[1]),
                        old.anchorX(), old.anchorY());
                if (Math.abs(old.box().height() - again.height()) < 1e-9
                        && placer.tryAt(again, old.anchorX(), old.anchorY())) {
                    return new PlacedLabel(PlacedLabel.Kind.READING, net, lines, again, TextStyle.HAnchor.START,
                            old.anchorX(), old.anchorY(), Annotations.State.OK, target);
                }
            }
        }
        LabelPlacer.Spot best = null;
        for (double[] shape : shapes) {
            LabelPlacer.Spot spot = placer.find(anchors, shape[0] + 2 * PAD + 0.24, readingHeight((int) shape[1]));
            if (best == null || best.relaxed() && !spot.relaxed()
                    || best.relaxed() == spot.relaxed() && spot.cost() < best.cost() - 1e-9) {
                best = spot;
            }
        }
        placer.take(best);
        return new PlacedLabel(PlacedLabel.Kind.READING, net, lines, best.box(), TextStyle.HAnchor.START,
                best.anchorX(), best.anchorY(), Annotations.State.OK, target);
    }

    /** Height of a reading tag of so many rows, grid units. */
    private static double readingHeight(int rows) {
        return rows * TAG.height() + 2 * PAD + 0.1;
    }

    /** Width of a reading tag's first row: the net's name, then its solved voltage if shown. */
    private static double headWidth(List<String> lines) {
        return TAG.weight(false).width(lines.get(0) + " ")
                + (lines.get(1).isEmpty() ? 0 : BADGE_STYLE.width(reserved(lines.get(1), "V")));
    }

    /** Width of one reading, "high 120 mV": the state in regular weight, the value in bold. */
    private static double readingWidth(String row) {
        int space = row.indexOf(' ');
        return TAG.weight(false).width(row.substring(0, space + 1)) + BADGE_STYLE.width(reserved(row.substring(space + 1), "V"));
    }

    /**
     * A label that describes a part, beside any side of its body (the middle of each side is an
     * anchor), where it was before if the body has not moved and the place is still free.
     */
    private static PlacedLabel placeAround(PlacedLabel.Kind kind, String owner, List<Shape> shapes, List<Box> bodies,
                                           TextStyle.HAnchor align, Annotations.State state, LabelPlacer placer,
                                           Map<String, PlacedLabel> before) {
        Box body = bodies.get(0);
        for (Box b : bodies) {
            body = body.union(b);
        }
        PlacedLabel old = before.get(kind + "|" + owner);
        if (old != null && old.target().equals(body)) {
            for (Shape shape : shapes) {
                if (shape.lines().size() == old.lines().size()) {
                    Box again = resized(old.box(), shape.w(), shape.h(), old.anchorX(), old.anchorY());
                    if (placer.tryAt(again, old.anchorX(), old.anchorY())) {
                        return new PlacedLabel(kind, owner, shape.lines(), again, align, old.anchorX(), old.anchorY(),
                                state, body);
                    }
                }
            }
        }
        List<double[]> anchors = new ArrayList<>();
        for (Box b : bodies) {
            anchors.addAll(List.of(new double[] {b.maxX(), b.centreY()}, new double[] {b.centreX(), b.minY()},
                    new double[] {b.centreX(), b.maxY()}, new double[] {b.minX(), b.centreY()}));
        }
        LabelPlacer.Spot best = null;
        Shape chosen = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int i = 0; i < shapes.size(); i++) {
            Shape shape = shapes.get(i);
            LabelPlacer.Spot spot = placer.find(anchors, shape.w(), shape.h());
            double cost = spot.cost() + i * WRAP_COST + (spot.relaxed() ? 1000 : 0);
            if (cost < bestCost) {
                best = spot;
                chosen = shape;
                bestCost = cost;
            }
        }
        placer.take(best);
        return new PlacedLabel(kind, owner, chosen.lines(), best.box(), align, best.anchorX(), best.anchorY(), state, body);
    }

    /** One way to set a label's text: its lines and the box they need. */
    private record Shape(List<String> lines, double w, double h) {
    }

    /**
     * A short text on one line, and when it has a break point, also on two: after a comma or colon
     * if there is one ("saturated," / "×6.1 margin"), else at the space nearest the middle.
     */
    static List<List<String>> wraps(String text) {
        List<List<String>> out = new ArrayList<>();
        out.add(List.of(text));
        int cut = -1;
        for (String mark : List.of(", ", ": ")) {
            int at = text.indexOf(mark);
            if (at > 0) {
                cut = at + 1;
                break;
            }
        }
        if (cut < 0) {
            int mid = text.length() / 2;
            for (int d = 0; d < mid && cut < 0; d++) {
                if (text.charAt(mid - d) == ' ') {
                    cut = mid - d;
                } else if (mid + d < text.length() && text.charAt(mid + d) == ' ') {
                    cut = mid + d;
                }
            }
        }
        if (cut > 0 && cut < text.length() - 1) {
            out.add(List.of(text.substring(0, cut).strip(), text.substring(cut).strip()));
        }
        return out;
    }

    /**
     * A tag's box: where it was before if its anchor has not moved and the place is still free, else
     * the nearest free place.
     */
    private static PlacedLabel tag(PlacedLabel.Kind kind, String owner, List<String> lines, String unit,
                                   List<double[]> anchors, LabelPlacer placer, Map<String, PlacedLabel> before) {
        double w = tagTextWidth(kind, lines, unit) + 2 * PAD + 0.1;
        double h = TAG.height() + 2 * PAD;
        Box target = new Box(anchors.get(0)[0], anchors.get(0)[1], anchors.get(0)[0], anchors.get(0)[1]);
        PlacedLabel old = before.get(kind + "|" + owner);
        if (old != null && old.target().equals(target)) {
            Box again = resized(old.box(), w, h, old.anchorX(), old.anchorY());
            if (placer.tryAt(again, old.anchorX(), old.anchorY())) {
                return new PlacedLabel(kind, owner, lines, again, TextStyle.HAnchor.MIDDLE, old.anchorX(), old.anchorY(),
                        Annotations.State.OK, target);
            }
        }
        LabelPlacer.Spot spot = placer.near(anchors, w, h);
        return new PlacedLabel(kind, owner, lines, spot.box(), TextStyle.HAnchor.MIDDLE, spot.anchorX(), spot.anchorY(),
                Annotations.State.OK, target);
    }

    /**
     * Where a net's tag may point: the preferred point first, then points every half grid unit along
     * every wire of the net and every other pin on it except ground symbols, each less preferred by
     * {@link #OTHER_ANCHOR_COST} (a voltage describes the whole net).
     */
    private static List<double[]> netAnchors(Stage stage, Connectivity c, String net, double px, double py) {
        List<double[]> out = new ArrayList<>();
        out.add(new double[] {px, py, 0});
        for (int i = 0; i < stage.wires().size(); i++) {
            Wire w = stage.wires().get(i);
            if (!w.isPoint() && c.netOfWire().get(i).equals(net)) {
                // every half grid unit along the wire, ends excluded (they are pins or other wires' ends)
                int steps = 2 * w.from().manhattan(w.to());
                for (int k = 1; k < steps; k++) {
                    double t = (double) k / steps;
                    out.add(new double[] {w.from().gridX() + t * (w.to().gridX() - w.from().gridX()),
                            w.from().gridY() + t * (w.to().gridY() - w.from().gridY()), OTHER_ANCHOR_COST});
                }
            }
        }
        for (PinRef pr : c.pinsOn(net)) {
            Optional<Part> p = stage.part(pr.ref());
            if (p.isPresent() && p.get().kind() != PartKind.GROUND) {
                GridPoint g = p.get().pinPoint(pr.pin());
                if (g.gridX() != px || g.gridY() != py) {
                    out.add(new double[] {g.gridX(), g.gridY(), OTHER_ANCHOR_COST});
                }
            }
        }
        return out;
    }

    /**
     * Width of a tag's text on one row: a name in regular weight, then a value in bold sized for its
     * widest number ({@link #reserved}); a test point's name alone in regular weight.
     */
    private static double tagTextWidth(PlacedLabel.Kind kind, List<String> lines, String unit) {
        if (kind == PlacedLabel.Kind.TEST_POINT) {
            return TAG.weight(false).width(lines.get(0));
        }
        double value = BADGE_STYLE.width(reserved(lines.get(lines.size() - 1), unit));
        return lines.size() == 1 ? value : TAG.weight(false).width(lines.get(0) + " ") + value;
    }

    /**
     * A box of a new size in place of an old one, keeping the edges that face the anchor, so that
     * a tag that grows by a digit grows away from what it points at.
     */
    static Box resized(Box old, double w, double h, double ax, double ay) {
        double minX = old.minX() >= ax ? old.minX() : old.maxX() <= ax ? old.maxX() - w : old.centreX() - w / 2;
        double minY = old.minY() >= ay ? old.minY() : old.maxY() <= ay ? old.maxY() - h : old.centreY() - h / 2;
        return new Box(minX, minY, minX + w, minY + h);
    }

    /**
     * The text a readout's box is sized for: a number of the widest form engineering notation gives
     * ("8.88 mV": three digits, point, space, prefix; a sign more when negative) where the text is shorter, so that a tag
     * keeps its size while only its number changes.
     */
    static String reserved(String text, String unit) {
        int widest = (text.startsWith("−") || text.startsWith("-") ? "−8.88 m" : "8.88 m").length() + unit.length();
        int n = text.codePointCount(0, text.length());
        return n >= widest ? text : text + "8".repeat(widest - n);
    }

    /** Gauge width: its title and state words side by side, at least {@link #GAUGE_WIDTH}. */
    private static double gaugeWidth(Annotations.RelayGauge g) {
        double words = GAUGE_TITLE.width("coil " + reserved(Notation.format(g.coilAmps(), "A"), "A")) + GAUGE_STATE.width("released");
        return Math.max(GAUGE_WIDTH, words + 2 * GAUGE_INSET + 0.4);
    }

    private static String gaugeText(Annotations.RelayGauge g) {
        return "coil " + Notation.format(g.coilAmps(), "A");
    }

    private static Annotations.State gaugeState(Annotations.RelayGauge g) {
        if (g.coilAmps() >= g.pickUpAmps()) {
            return Annotations.State.OK;
        }
        return g.coilAmps() <= g.dropOutAmps() ? Annotations.State.OK : Annotations.State.WARN;
    }

    /** Anchor of a net: its test point pin, else a non-ground pin on it, else a wire's midpoint. */
    private static Optional<double[]> netAnchor(Stage stage, Connectivity c, String net) {
        for (TestPoint tp : stage.testPoints()) {
            if (tp.net().equals(net)) {
                Optional<Part> p = stage.part(tp.ref());
                if (p.isPresent() && p.get().kind().pin(tp.pin()).isPresent()) {
                    GridPoint g = p.get().pinPoint(tp.pin());
                    return Optional.of(new double[] {g.gridX(), g.gridY()});
                }
            }
        }
        for (PinRef pr : c.pinsOn(net)) {
            Optional<Part> p = stage.part(pr.ref());
            if (p.isPresent() && p.get().kind() != PartKind.GROUND) {
                GridPoint g = p.get().pinPoint(pr.pin());
                return Optional.of(new double[] {g.gridX(), g.gridY()});
            }
        }
        for (int i = 0; i < stage.wires().size(); i++) {
            if (c.netOfWire().get(i).equals(net)) {
                Wire w = stage.wires().get(i);
                return Optional.of(new double[] {(w.from().gridX() + w.to().gridX()) / 2.0,
                        (w.from().gridY() + w.to().gridY()) / 2.0});
            }
        }
        return Optional.empty();
    }

    /**
     * Where a current arrow goes: {x, y, dx, dy} with (x, y) the arrow's middle and (dx, dy) the unit
     * direction of the current; on the wire leaving the pin, else on the pin's lead.
     */
    private static Optional<double[]> currentArrow(Stage stage, Annotations.BranchCurrent bc) {
        Optional<Part> part = stage.part(bc.pin().ref());
        if (part.isEmpty() || part.get().kind().pin(bc.pin().pin()).isEmpty()) {
            return Optional.empty();
        }
        GridPoint g = part.get().pinPoint(bc.pin().pin());
        double sign = bc.ampsIntoPin() >= 0 ? 1 : -1;
        for (Wire w : stage.wires()) {
            if (w.isPoint() || !(w.from().equals(g) || w.to().equals(g))) {
                continue;
            }
            GridPoint other = w.from().equals(g) ? w.to() : w.from();
            double len = g.manhattan(other);
            double ux = (other.gridX() - g.gridX()) / len;
            double uy = (other.gridY() - g.gridY()) / len;
            double t = Math.min(0.9, len / 2);
            // current into the pin flows from the far end towards the pin
            return Optional.of(new double[] {g.gridX() + ux * t, g.gridY() + uy * t, -ux * sign, -uy * sign});
        }
        Box bb = PartGeometry.bodyBounds(part.get());
        double[] q = LabelPlacer.nearestOnBox(bb, g.gridX(), g.gridY());
        double dx = q[0] - g.gridX();
        double dy = q[1] - g.gridY();
        double len = Math.hypot(dx, dy);
        if (len == 0) {
            return Optional.of(new double[] {g.gridX(), g.gridY(), 0, sign});
        }
        return Optional.of(new double[] {g.gridX() + dx / 2, g.gridY() + dy / 2, dx / len * sign, dy / len * sign});
    }

    private static Box at(double x, double y, double w, double h) {
        return new Box(x, y, x + w, y + h);
    }

    private static List<Box> inflated(List<Box> boxes, double d) {
        return boxes.stream().map(b -> b.inflate(d)).toList();
    }

    // ---------------------------------------------------------------- drawing

    private static void grid(Pen pen, Box area, Palette pal) {
        int x0 = (int) Math.floor(area.minX());
        int x1 = (int) Math.ceil(area.maxX());
        int y0 = (int) Math.floor(area.minY());
        int y1 = (int) Math.ceil(area.maxY());
        Stroke minor = Stroke.solid(0.03);
        Stroke major = Stroke.solid(0.045);
        for (int pass = 0; pass < 2; pass++) {
            for (int x = x0; x <= x1; x++) {
                boolean isMajor = Math.floorMod(x, RenderOptions.GRID_MAJOR_EVERY) == 0;
                if (isMajor == (pass == 1)) {
                    pen.line(x, y0, x, y1, isMajor ? pal.gridMajor() : pal.gridMinor(), isMajor ? major : minor);
                }
            }
            for (int y = y0; y <= y1; y++) {
                boolean isMajor = Math.floorMod(y, RenderOptions.GRID_MAJOR_EVERY) == 0;
                if (isMajor == (pass == 1)) {
                    pen.line(x0, y, x1, y, isMajor ? pal.gridMajor() : pal.gridMinor(), isMajor ? major : minor);
                }
            }
        }
    }

    private static void wires(Pen pen, Stage stage, Palette pal) {
        Stroke s = Stroke.solid(WIRE_WIDTH);
        for (Wire w : stage.wires()) {
            if (!w.isPoint()) {
                pen.line(w.from().gridX(), w.from().gridY(), w.to().gridX(), w.to().gridY(), pal.ink(), s);
            }
        }
        for (GridPoint j : junctions(stage)) {
            pen.fillCircle(j.gridX(), j.gridY(), JUNCTION_RADIUS, pal.ink());
        }
    }

    /**
     * Grid points where three or more connection ends meet: each pin and each wire end counts one,
     * each wire passing through the point counts two.
     */
    public static Set<GridPoint> junctions(Stage stage) {
        Map<GridPoint, Integer> ends = new HashMap<>();
        for (Part p : stage.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                ends.merge(p.pinPoint(pin.name()), 1, Integer::sum);
            }
        }
        for (Wire w : stage.wires()) {
            if (w.isPoint()) {
                continue;
            }
            ends.merge(w.from(), 1, Integer::sum);
            ends.merge(w.to(), 1, Integer::sum);
        }
        Set<GridPoint> out = new HashSet<>();
        for (Map.Entry<GridPoint, Integer> e : ends.entrySet()) {
            int n = e.getValue();
            for (Wire w : stage.wires()) {
                if (!w.isPoint() && w.contains(e.getKey()) && !w.from().equals(e.getKey()) && !w.to().equals(e.getKey())) {
                    n += 2;
                }
            }
            if (n >= 3) {
                out.add(e.getKey());
            }
        }
        return out;
    }

    /** Relays the readouts report operated: their contact sets are drawn energised. */
    private static java.util.Set<String> operatedRelays(Annotations annotations) {
        java.util.Set<String> refs = new java.util.HashSet<>();
        for (Annotations.RelayGauge g : annotations.gauges()) {
            if (g.operated()) {
                refs.add(g.ref());
            }
        }
        return refs;
    }

    private static void parts(Pen pen, Stage stage, Palette pal, java.util.Set<String> operated) {
        Map<GridPoint, Integer> use = new HashMap<>();
        for (Part p : stage.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                use.merge(p.pinPoint(pin.name()), 1, Integer::sum);
            }
        }
        for (Part p : stage.parts()) {
            pen.push(PartGeometry.frame(p.placement()));
            Symbols.draw(pen, p, pal.ink(), pal.paper(), stage.conditions().pinHigh(), operated.contains(p.ref()));
            pen.pop();
        }
        Stroke ring = Stroke.solid(0.05);
        for (Part p : stage.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                GridPoint g = p.pinPoint(pin.name());
                boolean wired = stage.wires().stream().anyMatch(w -> w.contains(g));
                if (!wired && use.get(g) < 2) {
                    pen.fillCircle(g.gridX(), g.gridY(), 0.13, pal.paper());
                    pen.circle(g.gridX(), g.gridY(), 0.13, pal.ink(), ring);
                }
            }
        }
    }

    private static void currentArrows(Pen pen, Stage stage, Annotations a, Palette pal) {
        for (Annotations.BranchCurrent bc : a.currents()) {
            currentArrow(stage, bc).ifPresent(v -> {
                double half = 0.28;
                Symbols.arrowHead(pen, v[0] + v[2] * half, v[1] + v[3] * half, v[0] - v[2] * half, v[1] - v[3] * half,
                        pal.current(), 0.42);
            });
        }
    }

    private static void label(Pen pen, PlacedLabel l, Palette pal, Annotations a) {
        Box b = l.box();
        switch (l.kind()) {
            case PART -> {
                leader(pen, l, pal.valueInk(), false);
                double x = switch (l.align()) {
                    case START -> b.minX() + PAD;
                    case END -> b.maxX() - PAD;
                    case MIDDLE -> b.centreX();
                };
                double y = b.minY() + PAD;
                pen.text(l.lines().get(0), x, y, DESIGNATOR.anchored(l.align(), TextStyle.VAnchor.TOP), pal.labelInk());
                for (int i = 1; i < l.lines().size(); i++) {
                    pen.text(l.lines().get(i), x, y + DESIGNATOR.height() + (i - 1) * VALUE.height(),
                            VALUE.anchored(l.align(), TextStyle.VAnchor.TOP), pal.valueInk());
                }
            }
            case TEST_POINT -> {
                leader(pen, l, pal.valueInk(), true);
                Box inner = b.inflate(-0.04);
                pen.fillRect(inner, pal.tagFill());
                pen.strokeRect(inner, pal.valueInk(), new Stroke(0.035, List.of(0.12, 0.08)));
                pen.text(l.lines().get(0), b.centreX(), b.centreY(), TAG.weight(false), pal.valueInk());
            }
            case VOLTAGE, CURRENT -> {
                Colour accent = l.kind() == PlacedLabel.Kind.VOLTAGE ? pal.voltage() : pal.current();
                leader(pen, l, accent, l.kind() == PlacedLabel.Kind.VOLTAGE);
                Box inner = b.inflate(-0.04);
                pen.fillRect(inner, pal.tagFill());
                pen.strokeRect(inner, accent, Stroke.solid(0.045));
                if (l.lines().size() == 1) {
                    pen.text(l.lines().get(0), b.centreX(), b.centreY(), BADGE_STYLE, accent);
                } else {
                    // "control 773 mV": the test point's name, then the value, centred as one row
                    String name = l.lines().get(0) + " ";
                    String value = l.lines().get(1);
                    double nw = TAG.weight(false).width(name);
                    double x = b.centreX() - (nw + BADGE_STYLE.width(value)) / 2;
                    pen.text(l.lines().get(0), x, b.centreY(), TAG.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE),
                            pal.valueInk());
                    pen.text(value, x + nw, b.centreY(),
                            BADGE_STYLE.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE), accent);
                }
            }
            case BADGE -> {
                Colour accent = pal.of(l.state());
                Box inner = b.inflate(-0.04);
                pen.fillRect(inner, pal.tagFill().mix(accent, 0.14));
                leader(pen, l, accent, false);
                pen.strokeRect(inner, accent, Stroke.solid(0.05));
                double top = b.centreY() - (l.lines().size() - 1) * TAG.height() / 2;
                for (int i = 0; i < l.lines().size(); i++) {
                    pen.text(l.lines().get(i), b.centreX(), top + i * TAG.height(), BADGE_STYLE, accent);
                }
            }
            case READING -> {
                // the net's tag with the meter readings: measured, not computed, so the readings are in
                // the drawing's own ink and a double border sets the tag apart
                leader(pen, l, pal.voltage(), true);
                Box inner = b.inflate(-0.04);
                pen.fillRect(inner, pal.tagFill());
                pen.strokeRect(inner, pal.labelInk(), Stroke.solid(0.045));
                pen.strokeRect(inner.inflate(-0.07), pal.labelInk(), Stroke.solid(0.02));
                int shapeRows = (int) Math.round((b.height() - 2 * PAD - 0.1) / TAG.height());
                double x = b.minX() + PAD + 0.12;
                double y = b.centreY() - (shapeRows - 1) * TAG.height() / 2;
                String name = l.lines().get(0) + " ";
                pen.text(l.lines().get(0), x, y, TAG.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE),
                        pal.valueInk());
                if (!l.lines().get(1).isEmpty()) {
                    pen.text(l.lines().get(1), x + TAG.weight(false).width(name), y,
                            BADGE_STYLE.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE), pal.voltage());
                }
                double at;
                if (shapeRows == 1) {
                    at = x + headWidth(l.lines());
                    pen.line(at + READING_BAR / 2, b.minY() + 0.16, at + READING_BAR / 2, b.maxY() - 0.16, pal.labelInk(),
                            Stroke.solid(0.03));
                    at += READING_BAR;
                } else {
                    at = x;
                    y += TAG.height();
                }
                for (int i = 2; i < l.lines().size(); i++) {
                    String row = l.lines().get(i);
                    int space = row.indexOf(' ');
                    String state = row.substring(0, space + 1);
                    pen.text(state.strip(), at, y, TAG.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE),
                            pal.valueInk());
                    pen.text(row.substring(space + 1), at + TAG.weight(false).width(state), y,
                            BADGE_STYLE.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE), pal.labelInk());
                    if (shapeRows > 2) {
                        y += TAG.height();
                    } else {
                        at += readingWidth(row) + READING_GAP;
                    }
                }
            }
            case GAUGE -> gauge(pen, l, pal, a);
            case MARKER -> {
                Colour accent = pal.of(l.state());
                leader(pen, l, accent, false);
                double cx = b.minX() + PAD + MARKER_RADIUS;
                double cy = b.centreY();
                pen.fillCircle(cx, cy, MARKER_RADIUS, accent);
                pen.text("!", cx, cy, TextStyle.centred(0.42).weight(true), pal.tagFill());
                double top = cy - (l.lines().size() - 1) * TAG.height() / 2;
                for (int i = 0; i < l.lines().size(); i++) {
                    if (!l.lines().get(i).isEmpty()) {
                        pen.text(l.lines().get(i), cx + MARKER_RADIUS + 0.12, top + i * TAG.height(),
                                TAG.anchored(TextStyle.HAnchor.START, TextStyle.VAnchor.MIDDLE).weight(true), accent);
                    }
                }
            }
            default -> throw new IllegalStateException("unknown label kind " + l.kind());
        }
    }

    private static void leader(Pen pen, PlacedLabel l, Colour colour, boolean dot) {
        if (!l.hasLeader()) {
            return;
        }
        double[] q = LabelPlacer.nearestOnBox(l.box(), l.anchorX(), l.anchorY());
        if (Math.hypot(q[0] - l.anchorX(), q[1] - l.anchorY()) > 0.2) {
            pen.line(l.anchorX(), l.anchorY(), q[0], q[1], colour, Stroke.solid(0.03));
        }
        if (dot) {
            pen.fillCircle(l.anchorX(), l.anchorY(), 0.08, colour);
        }
    }

    private static void gauge(Pen pen, PlacedLabel l, Palette pal, Annotations a) {
        Optional<Annotations.RelayGauge> found = a.gauges().stream().filter(g -> g.ref().equals(l.owner())).findFirst();
        if (found.isEmpty()) {
            return;
        }
        Annotations.RelayGauge g = found.get();
        Box b = l.box();
        Box inner = b.inflate(-0.04);
        leader(pen, l, pal.valueInk(), false);
        pen.fillRect(inner, pal.tagFill());
        pen.strokeRect(inner, pal.valueInk(), Stroke.solid(0.03));
        double x0 = b.minX() + GAUGE_INSET + 0.05;
        double x1 = b.maxX() - GAUGE_INSET - 0.05;
        double full = Math.max(g.pickUpAmps() * 1.35, g.coilAmps() * 1.1);
        double ty = b.minY() + 0.95;
        pen.text(gaugeText(g), b.minX() + GAUGE_INSET, b.minY() + 0.1, GAUGE_TITLE, pal.current());
        pen.text(g.operated() ? "operated" : "released", b.maxX() - GAUGE_INSET, b.minY() + 0.12, GAUGE_STATE,
                g.operated() ? pal.ok() : pal.valueInk());
        double xd = x0 + (x1 - x0) * g.dropOutAmps() / full;
        double xp = x0 + (x1 - x0) * g.pickUpAmps() / full;
        double xc = x0 + (x1 - x0) * Math.min(1, g.coilAmps() / full);
        pen.line(x0, ty, x1, ty, pal.valueInk(), Stroke.solid(0.05));
        pen.line(xp, ty, x1, ty, pal.ok(), Stroke.solid(0.14));
        pen.line(x0, ty, xd, ty, pal.tagFill().mix(pal.valueInk(), 0.45), Stroke.solid(0.14));
        pen.line(xd, ty - 0.2, xd, ty + 0.2, pal.valueInk(), Stroke.solid(0.05));
        pen.line(xp, ty - 0.2, xp, ty + 0.2, pal.valueInk(), Stroke.solid(0.05));
        // the mark names sit under their ticks, kept inside the border and apart from each other
        double ly = ty + 0.28;
        double left = b.minX() + GAUGE_INSET;
        double right = b.maxX() - GAUGE_INSET;
        double wd = GAUGE_MARK.width("drop-out");
        double wp = GAUGE_MARK.width("pick-up");
        double dropX = Math.max(left, Math.min(xd - wd / 2, right - wd - wp - 0.15));
        double pickX = Math.min(right - wp, Math.max(xp - wp / 2, dropX + wd + 0.15));
        pen.text("drop-out", dropX, ly, GAUGE_MARK, pal.valueInk());
        pen.text("pick-up", pickX, ly, GAUGE_MARK, pal.valueInk());
        pen.fillPolygon(new double[] {xc, xc - 0.17, xc + 0.17}, new double[] {ty - 0.02, ty - 0.34, ty - 0.34}, pal.current());
    }

    private static void selection(Pen pen, Stage stage, RenderOptions o, Palette pal) {
        Colour sel = pal.selection();
        for (int i : o.selection().wires()) {
            if (i >= 0 && i < stage.wires().size()) {
                Wire w = stage.wires().get(i);
                pen.line(w.from().gridX(), w.from().gridY(), w.to().gridX(), w.to().gridY(), sel.withAlpha(0.45),
                        Stroke.solid(0.24));
            }
        }
        for (String ref : o.selection().refs()) {
            stage.part(ref).ifPresent(p -> {
                Box b = PartGeometry.bounds(p).inflate(0.3);
                pen.fillRect(b, sel.withAlpha(0.07));
                pen.strokeRect(b, sel, Stroke.dashed(0.05, 0.2));
            });
        }
        Stroke preview = Stroke.solid(WIRE_WIDTH * 1.2);
        for (Wire w : o.previewWires()) {
            pen.line(w.from().gridX(), w.from().gridY(), w.to().gridX(), w.to().gridY(), sel, preview);
            pen.fillCircle(w.to().gridX(), w.to().gridY(), 0.1, sel);
        }
        o.rubberBand().ifPresent(b -> {
            pen.fillRect(b, sel.withAlpha(0.08));
            pen.strokeRect(b, sel, Stroke.dashed(0.04, 0.16));
        });
        o.hoverPin().ifPresent(g -> pen.circle(g.gridX(), g.gridY(), 0.32, sel, Stroke.solid(0.06)));
    }

    /** Label of a layer list for logs and tests ("grid, wires"). */
    static String names(Set<Layer> layers) {
        return String.join(", ", layers.stream().map(l -> l.name().toLowerCase(Locale.ROOT)).sorted().toList());
    }
}
