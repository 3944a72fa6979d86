package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.armature.analysis.TopologyCheck;
import org.armature.io.StageFiles;
import org.armature.model.Connectivity;
import org.armature.model.Finding;
import org.armature.model.GridPoint;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PinRef;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.Wire;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The drawing's label guarantees, checked geometrically on every template × suppressor variant ×
 * high-side drive × pin state × theme and on the example stage files, with the readouts of a real
 * solve (issue 17). Reproduces the collisions found by trying the window: "2.46 mA" stacked on
 * "773 mV", leaders running through other labels ("2.54 mA" through "pin", "11.2 V" through
 * "control"), "4.07 mA" on a wire, the Darlington badge on the load's wire far from U2, the coil
 * gauge on the V1 wire, and "drop-out"/"pick-up" across the gauge border. This test failed on the
 * drawings before the placer treated wires, leaders and bodies as hard constraints.
 */
class LabelGeometryTest {

    /** Largest distance from a label to what it describes, grid units: "next to it" (our own bound: a little more than the pitch of the parts in the templates, 4 grid units). */
    static final double NEAR = 5.0;
    /**
     * Largest distance from a fault hunt's reading tag to its net, grid units: a net's tag with both
     * pin states read is two to three times as wide as the net's plain voltage tag, and in the most
     * crowded corner of the templates (the high-side PNP's switch net, walled in by the relay's
     * contact wiring) the nearest place that keeps every rule is 5.2 units away (our own bound, with
     * room to spare; every other rule holds for it as for any label).
     */
    static final double NEAR_READING = 7.5;
    /** Slack for comparisons of positions computed in floating point, grid units. */
    static final double EPS = 1e-6;

    static Stream<Arguments> drawings() throws IOException {
        List<Arguments> out = new ArrayList<>();
        List<Stage> stages = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (Suppressor s : Suppressor.values()) {
                for (HighSideDrive d : t == StageTemplate.HIGH_SIDE_PNP ? HighSideDrive.values()
                        : new HighSideDrive[] {HighSideDrive.LEVEL_SHIFT}) {
                    stages.add(Templates.build(t, s, d));
                    names.add(t.id() + "/" + s.id() + "/" + d.id());
                }
            }
        }
        try (Stream<Path> files = Files.list(Path.of("examples"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".stage.json")).sorted().toList()) {
                List<Stage> doc = StageFiles.open(f).stages();
                for (int i = 0; i < doc.size(); i++) {
                    stages.add(doc.get(i));
                    names.add(f.getFileName() + "#" + i);
                }
            }
        }
        for (int i = 0; i < stages.size(); i++) {
            for (boolean high : new boolean[] {true, false}) {
                for (Palette pal : new Palette[] {Palette.LIGHT, Palette.DARK}) {
                    Stage st = stages.get(i).withConditions(stages.get(i).conditions().withPinHigh(high));
                    out.add(Arguments.of(names.get(i) + (high ? " pin high" : " pin low")
                            + (pal == Palette.LIGHT ? " light" : " dark"), st, pal));
                }
            }
        }
        return out.stream();
    }

    static Annotations readouts(Stage st) {
        List<Finding> findings = TopologyCheck.check(st);
        OperatingPoint op = new DcAnalysis().solve(st);
        Annotations a = ReadoutBuilder.build(st, op, findings);
        // a fault hunt's meter readings at the nets of the switch and the base or gate, both pin
        // states, drawn with the solve's own tags (the window draws them so once readings are in)
        Connectivity c = Connectivity.of(st);
        List<Annotations.MeterReading> readings = new ArrayList<>();
        for (String net : List.of("switch", "control")) {
            if (!c.pinsOn(net).isEmpty()) {
                readings.add(new Annotations.MeterReading(net, true, 0.12));
                readings.add(new Annotations.MeterReading(net, false, 11.9));
            }
        }
        return a.withReadings(readings);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("drawings")
    @DisplayName("labels never overlap each other, a symbol body or a foreign wire; leaders end at their targets")
    void labelsKeepClear(String name, Stage st, Palette pal) {
        Annotations a = readouts(st);
        RecordingPen pen = new RecordingPen();
        Layout layout = SchematicRenderer.draw(st, a,
                RenderOptions.export(pal).withLayers(java.util.EnumSet.of(Layer.LABELS, Layer.ANNOTATIONS)), pen);
        List<PlacedLabel> labels = layout.labels();
        Connectivity c = Connectivity.of(st);
        List<String> problems = new ArrayList<>();
        for (int i = 0; i < labels.size(); i++) {
            PlacedLabel l = labels.get(i);
            for (int j = i + 1; j < labels.size(); j++) {
                if (l.box().intersects(labels.get(j).box())) {
                    problems.add(describe(l) + " overlaps " + describe(labels.get(j)));
                }
            }
            for (Part p : st.parts()) {
                for (Box b : PartGeometry.bodies(p)) {
                    if (b.intersects(l.box())) {
                        problems.add(describe(l) + " covers the body of " + p.ref());
                    }
                }
            }
            for (int w = 0; w < st.wires().size(); w++) {
                Wire wire = st.wires().get(w);
                if (ownWire(l, c, st, w)) {
                    continue;
                }
                if (l.box().crossedBy(wire.from().gridX(), wire.from().gridY(), wire.to().gridX(), wire.to().gridY())) {
                    problems.add(describe(l) + " covers the wire " + wire.from() + "–" + wire.to());
                }
            }
            if (l.hasLeader()) {
                checkLeader(st, c, l, labels, problems);
            }
        }
        // every text of the labels and readouts lies inside a label box (the gauge's "drop-out" and
        // "pick-up" marks used to cross its border)
        for (RecordingPen.Op op : pen.ops()) {
            if (op instanceof RecordingPen.TextOp t) {
                Box tb = t.style().box(t.text(), t.x(), t.y());
                boolean inside = labels.stream().anyMatch(l -> l.box().inflate(EPS).contains(tb));
                if (!inside) {
                    problems.add("text \"" + t.text() + "\" is drawn outside every label box");
                }
            }
        }
        assertTrue(problems.isEmpty(), name + ": " + String.join("; ", problems));
    }

    private static void checkLeader(Stage st, Connectivity c, PlacedLabel l, List<PlacedLabel> labels,
                                    List<String> problems) {
        double ax = l.anchorX();
        double ay = l.anchorY();
        if (!targetHolds(st, c, l)) {
            problems.add("the leader of " + describe(l) + " ends at (" + ax + ", " + ay + "), off its target");
        }
        if (l.box().distanceTo(ax, ay) > (l.kind() == PlacedLabel.Kind.READING ? NEAR_READING : NEAR)) {
            problems.add(describe(l) + " sits " + l.box().distanceTo(ax, ay) + " grid units from its target");
        }
        double[] q = LabelPlacer.nearestOnBox(l.box(), ax, ay);
        for (PlacedLabel o : labels) {
            if (o != l && o.box().crossedBy(ax, ay, q[0], q[1])) {
                problems.add("the leader of " + describe(l) + " runs through " + describe(o));
            }
        }
        for (Part p : st.parts()) {
            for (Box b : PartGeometry.bodies(p)) {
                if (!b.inflate(0.05).contains(ax, ay) && b.crossedBy(ax, ay, q[0], q[1])) {
                    problems.add("the leader of " + describe(l) + " runs through the body of " + p.ref());
                }
            }
        }
    }

    /** True when a label's anchor lies on what it describes. */
    private static boolean targetHolds(Stage st, Connectivity c, PlacedLabel l) {
        double ax = l.anchorX();
        double ay = l.anchorY();
        return switch (l.kind()) {
            case VOLTAGE, TEST_POINT -> onNet(st, c, l.owner(), ax, ay);
            case READING -> onNet(st, c, readingNet(l), ax, ay);
            case CURRENT -> {
                String[] pr = l.owner().split("\\.");
                String net = c.net(pr[0], pr[1]);
                yield onNet(st, c, net, ax, ay) || onOwnBody(st, pr[0], ax, ay, 1.5);
            }
            case BADGE, GAUGE, MARKER, PART -> onOwnBody(st, l.owner(), ax, ay, 0.05);
        };
    }

    private static boolean onOwnBody(Stage st, String ref, double x, double y, double slack) {
        return st.part(ref).map(p -> PartGeometry.bodies(p).stream().anyMatch(b -> b.inflate(slack).contains(x, y)))
                .orElse(false);
    }

    private static boolean onNet(Stage st, Connectivity c, String net, double x, double y) {
        for (int w = 0; w < st.wires().size(); w++) {
            Wire wire = st.wires().get(w);
            if (c.netOfWire().get(w).equals(net) && onSegment(wire, x, y)) {
                return true;
            }
        }
        for (PinRef pr : c.pinsOn(net)) {
            GridPoint g = st.require(pr.ref()).pinPoint(pr.pin());
            if (Math.hypot(g.gridX() - x, g.gridY() - y) < EPS) {
                return true;
            }
        }
        return false;
    }

    private static boolean onSegment(Wire w, double x, double y) {
        double x1 = w.from().gridX();
        double y1 = w.from().gridY();
        double x2 = w.to().gridX();
        double y2 = w.to().gridY();
        double cross = (x2 - x1) * (y - y1) - (y2 - y1) * (x - x1);
        return Math.abs(cross) < EPS && x >= Math.min(x1, x2) - EPS && x <= Math.max(x1, x2) + EPS
                && y >= Math.min(y1, y2) - EPS && y <= Math.max(y1, y2) + EPS;
    }

    /** A voltage tag may touch its own net's wires and a current tag its own pin's net; nothing else may. */
    private static boolean ownWire(PlacedLabel l, Connectivity c, Stage st, int wire) {
        String net = c.netOfWire().get(wire);
        return switch (l.kind()) {
            case VOLTAGE, TEST_POINT -> net.equals(l.owner());
            case READING -> net.equals(readingNet(l));
            case CURRENT -> {
                String[] pr = l.owner().split("\\.");
                yield net.equals(c.net(pr[0], pr[1]));
            }
            default -> false;
        };
    }

    /** The net of a reading tag (its owner). */
    private static String readingNet(PlacedLabel l) {
        return l.owner();
    }

    private static String describe(PlacedLabel l) {
        return l.kind().name().toLowerCase() + " \"" + String.join(" ", l.lines()) + "\" (" + l.owner() + ")";
    }
}
