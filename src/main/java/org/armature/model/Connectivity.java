package org.armature.model;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * The nets of a stage, found from the drawing.
 *
 * <p>A pin or wire end connects to every wire segment passing through its grid point and to every
 * pin at the same point. A net is named by a ground symbol ({@value #GROUND}), else by a test point,
 * else numbered {@code n1, n2, ...} in order of the net's top-left point, so names are stable while
 * the drawing is unchanged.
 *
 * @param netOfPin the net name of every pin of every part
 * @param netOfWire the net name of each wire, by index in {@link Stage#wires()}
 * @param nets all net names, ground first
 * @param nameConflicts test points that could not name their net because it already had a name
 */
public record Connectivity(Map<PinRef, String> netOfPin, List<String> netOfWire, List<String> nets,
                           List<TestPoint> nameConflicts) {

    /** The name of the reference net. */
    public static final String GROUND = "gnd";

    public Connectivity {
        netOfPin = Map.copyOf(netOfPin);
        netOfWire = List.copyOf(netOfWire);
        nets = List.copyOf(nets);
        nameConflicts = List.copyOf(nameConflicts);
    }

    /** The net of a pin; {@code null}-free: throws for a pin the stage does not have. */
    public String net(String ref, String pin) {
        String n = netOfPin.get(new PinRef(ref, pin));
        if (n == null) {
            throw new IllegalArgumentException("no pin " + ref + "." + pin + " in this stage");
        }
        return n;
    }

    /** The pins on a net, in designator order. */
    public List<PinRef> pinsOn(String net) {
        return netOfPin.entrySet().stream()
                .filter(e -> e.getValue().equals(net))
                .map(Map.Entry::getKey)
                .sorted(Comparator.comparing(PinRef::ref).thenComparing(PinRef::pin))
                .toList();
    }

    /** The drawing whose nets were found last, with them (an immutable pair, swapped whole). */
    private record Memo(Stage stage, Connectivity nets) {
    }

    /**
     * The last drawing's nets. The validator, the topology check, the engine and the renderer each
     * ask for the nets of the stage on the screen, on the FX and the solver threads; the answer
     * depends on the drawing only (parts' designators, kinds and placements, wires, test points), so
     * it is found once per drawing and a value edit finds none anew. One entry, replaced whole
     * through a volatile reference: thread-safe without locks, and it keeps at most one stage alive.
     */
    private static volatile Memo last;

    /**
     * Finds the nets of a stage. Computed once per drawing: a stage that differs from the last one
     * asked about only in values and conditions gets the same (immutable) answer.
     */
    public static Connectivity of(Stage stage) {
        Memo m = last;
        if (m != null && (m.stage == stage || sameDrawing(m.stage, stage))) {
            return m.nets;
        }
        Connectivity c = compute(stage);
        last = new Memo(stage, c);
        return c;
    }

    /** True when two stages have the same nets: same parts (designator, kind, placement) in order, wires, test points. */
    static boolean sameDrawing(Stage a, Stage b) {
        if (a.parts() != b.parts()) {
            if (a.parts().size() != b.parts().size()) {
                return false;
            }
            for (int i = 0; i < a.parts().size(); i++) {
                Part pa = a.parts().get(i);
                Part pb = b.parts().get(i);
                if (pa != pb && (pa.kind() != pb.kind() || !pa.ref().equals(pb.ref())
                        || !pa.placement().equals(pb.placement()))) {
                    return false;
                }
            }
        }
        return a.wires().equals(b.wires()) && a.testPoints().equals(b.testPoints());
    }

    /** Finds the nets of a stage, without the memo. */
    static Connectivity compute(Stage stage) {
        Map<GridPoint, Integer> index = new LinkedHashMap<>();
        List<GridPoint> points = new ArrayList<>();
        for (Part part : stage.parts()) {
            for (PinSpec pin : part.kind().pins()) {
                add(index, points, part.pinPoint(pin.name()));
            }
        }
        for (Wire w : stage.wires()) {
            add(index, points, w.from());
            add(index, points, w.to());
        }
        int[] parent = new int[points.size()];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        for (Wire w : stage.wires()) {
            int a = index.get(w.from());
            for (int i = 0; i < points.size(); i++) {
                if (w.contains(points.get(i))) {
                    union(parent, a, i);
                }
            }
        }
        Map<Integer, String> names = new HashMap<>();
        for (Part part : stage.parts()) {
            if (part.kind() == PartKind.GROUND) {
                names.put(find(parent, index.get(part.pinPoint("g"))), GROUND);
            }
        }
        List<TestPoint> conflicts = new ArrayList<>();
        for (TestPoint tp : stage.testPoints()) {
            var part = stage.part(tp.ref());
            if (part.isEmpty() || part.get().kind().pin(tp.pin()).isEmpty()) {
                conflicts.add(tp);
                continue;
            }
            int root = find(parent, index.get(part.get().pinPoint(tp.pin())));
            String existing = names.get(root);
            if (existing == null && !names.containsValue(tp.net())) {
                names.put(root, tp.net());
            } else if (existing == null || !existing.equals(tp.net())) {
                conflicts.add(tp);
            }
        }
        // number the unnamed nets by their top-left point
        Map<Integer, GridPoint> topLeft = new HashMap<>();
        for (int i = 0; i < points.size(); i++) {
            int r = find(parent, i);
            GridPoint p = points.get(i);
            topLeft.merge(r, p, (x, y) -> compare(x, y) <= 0 ? x : y);
        }
        List<Integer> unnamed = topLeft.keySet().stream().filter(r -> !names.containsKey(r))
                .sorted((a, b) -> compare(topLeft.get(a), topLeft.get(b))).toList();
        int counter = 1;
        for (Integer r : unnamed) {
            String candidate;
            do {
                candidate = "n" + counter++;
            } while (names.containsValue(candidate));
            names.put(r, candidate);
        }
        Map<PinRef, String> netOfPin = new HashMap<>();
        for (Part part : stage.parts()) {
            for (PinSpec pin : part.kind().pins()) {
                netOfPin.put(new PinRef(part.ref(), pin.name()),
                        names.get(find(parent, index.get(part.pinPoint(pin.name())))));
            }
        }
        List<String> netOfWire = new ArrayList<>();
        for (Wire w : stage.wires()) {
            netOfWire.add(names.get(find(parent, index.get(w.from()))));
        }
        Set<String> all = new TreeSet<>(names.values());
        List<String> nets = new ArrayList<>();
        nets.add(GROUND);
        all.stream().filter(n -> !n.equals(GROUND)).forEach(nets::add);
        return new Connectivity(netOfPin, netOfWire, nets, conflicts);
    }

    private static int compare(GridPoint a, GridPoint b) {
        int c = Integer.compare(a.gridY(), b.gridY());
        return c != 0 ? c : Integer.compare(a.gridX(), b.gridX());
    }

    private static void add(Map<GridPoint, Integer> index, List<GridPoint> points, GridPoint p) {
        if (!index.containsKey(p)) {
            index.put(p, points.size());
            points.add(p);
        }
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static void union(int[] parent, int a, int b) {
        int ra = find(parent, a);
        int rb = find(parent, b);
        if (ra != rb) {
            parent[rb] = ra;
        }
    }
}
