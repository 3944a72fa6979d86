package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The near-linear net finder (per-row and per-column runs) against the plain definition it replaced
 * (every point on a wire joins that wire, checked wire by point: quadratic, issue 15 measured 3.6 s
 * for 20,000 wires). Random drawings on a small grid make overlaps, T-junctions, crossings without a
 * junction and zero-length wires common.
 */
class ConnectivityReferenceTest {

    static Stream<Long> seeds() {
        return IntStream.range(0, 300).mapToObj(i -> 7919L * i + 3);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    @DisplayName("random drawings: the same pins share a net as with the wire-by-point definition")
    void sameNetsAsDefinition(long seed) {
        Random r = new Random(seed);
        Stage s = randomStage(r, 2 + r.nextInt(6), r.nextInt(25), 6 + r.nextInt(10));
        Connectivity c = Connectivity.of(s);
        Map<GridPoint, GridPoint> ref = referenceRoots(s);
        List<Part> parts = s.parts();
        for (Part a : parts) {
            for (PinSpec pa : a.kind().pins()) {
                for (Part b : parts) {
                    for (PinSpec pb : b.kind().pins()) {
                        boolean expected = ref.get(a.pinPoint(pa.name())).equals(ref.get(b.pinPoint(pb.name())));
                        boolean actual = c.net(a.ref(), pa.name()).equals(c.net(b.ref(), pb.name()));
                        assertEquals(expected, actual, a.ref() + "." + pa.name() + " and " + b.ref() + "." + pb.name()
                                + " in seed " + seed);
                    }
                }
            }
        }
    }

    @Test
    @DisplayName("20,000 wires in one row and column: validation finds one net for all of them")
    void twentyThousandWires() {
        List<Wire> wires = new ArrayList<>();
        for (int i = 0; i < 10_000; i++) {
            wires.add(Wire.of(i, 0, i + 1, 0));
            wires.add(Wire.of(0, i, 0, i + 1));
        }
        Stage s = new Stage("many", "", List.of(Part.of("R1", PartKind.RESISTOR, Placement.at(10_000, 2))), wires,
                List.of(), Conditions.DEFAULT);
        Connectivity c = Connectivity.of(s);
        assertEquals(1, c.netOfWire().stream().distinct().count(), "every segment touches the next");
        assertTrue(Validator.validate(s).stream().anyMatch(f -> f.key().equals("pin.unconnected")));
    }

    private static Stage randomStage(Random r, int parts, int wires, int size) {
        List<Part> list = new ArrayList<>();
        PartKind[] kinds = {PartKind.RESISTOR, PartKind.DIODE, PartKind.NPN, PartKind.GROUND, PartKind.CAPACITOR};
        for (int i = 0; i < parts; i++) {
            list.add(new Part("X" + i, kinds[r.nextInt(kinds.length)], Map.of(), Map.of(),
                    new Placement(new GridPoint(r.nextInt(size), r.nextInt(size)), 90 * r.nextInt(4), r.nextBoolean())));
        }
        List<Wire> ws = new ArrayList<>();
        for (int i = 0; i < wires; i++) {
            int x = r.nextInt(size);
            int y = r.nextInt(size);
            int len = r.nextInt(size / 2);
            ws.add(r.nextBoolean() ? Wire.of(x, y, x + (r.nextBoolean() ? len : -len), y)
                    : Wire.of(x, y, x, y + (r.nextBoolean() ? len : -len)));
        }
        return new Stage("r", "", list, ws, List.of(), Conditions.DEFAULT);
    }

    /** The definition, quadratic: every end and pin point lying on a wire joins the wire's first end. */
    private static Map<GridPoint, GridPoint> referenceRoots(Stage s) {
        Map<GridPoint, GridPoint> parent = new LinkedHashMap<>();
        for (Part p : s.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                parent.putIfAbsent(p.pinPoint(pin.name()), p.pinPoint(pin.name()));
            }
        }
        for (Wire w : s.wires()) {
            parent.putIfAbsent(w.from(), w.from());
            parent.putIfAbsent(w.to(), w.to());
        }
        List<GridPoint> points = new ArrayList<>(parent.keySet());
        for (Wire w : s.wires()) {
            for (GridPoint p : points) {
                if (w.contains(p)) {
                    union(parent, w.from(), p);
                }
            }
        }
        GridPoint firstGround = null;
        for (Part p : s.parts()) {
            if (p.kind() == PartKind.GROUND) {
                // every ground symbol names its net "gnd": all of them are one net
                if (firstGround == null) {
                    firstGround = p.pinPoint("g");
                } else {
                    union(parent, firstGround, p.pinPoint("g"));
                }
            }
        }
        Map<GridPoint, GridPoint> roots = new HashMap<>();
        for (GridPoint p : points) {
            roots.put(p, find(parent, p));
        }
        return roots;
    }

    private static GridPoint find(Map<GridPoint, GridPoint> parent, GridPoint p) {
        while (!parent.get(p).equals(p)) {
            p = parent.get(p);
        }
        return p;
    }

    private static void union(Map<GridPoint, GridPoint> parent, GridPoint a, GridPoint b) {
        GridPoint ra = find(parent, a);
        GridPoint rb = find(parent, b);
        if (!ra.equals(rb)) {
            parent.put(rb, ra);
        }
    }
}
