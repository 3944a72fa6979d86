package org.armature.model;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
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
 * else by the role it plays in the stage ({@link StageRecognition}: {@code pin}, {@code control},
 * {@code switch}, {@code supply}, {@code contact-common}, ...), else after one of its pins
 * ({@code R5-b}). Names are stable while the drawing is unchanged and never depend on placement.
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

    /**
     * Finds the nets of a stage and gives them the names people can find on a board (see the class
     * comment). The nets of {@link StageRecognition#of(Stage)}: callers that need the roles too
     * should call that once and take its connectivity. Computed once per drawing (the recognition's
     * one-entry memo): a stage that differs from the last one asked about only in values and
     * conditions gets the same (immutable) answer.
     */
    public static Connectivity of(Stage stage) {
        return StageRecognition.of(stage).connectivity();
    }

    /** Finds the nets of a stage with their role names, without the memo. */
    static Connectivity compute(Stage stage) {
        return StageRecognition.recognise(stage).connectivity();
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


    /**
     * The same nets with names passed through {@code names}; names not in the map stay.
     *
     * @param names old name to new name; the new names must be distinct from each other and from
     *     the names that stay
     * @return the renamed connectivity
     */
    public Connectivity renamed(Map<String, String> names) {
        if (names.isEmpty()) {
            return this;
        }
        Map<PinRef, String> pins = new HashMap<>();
        netOfPin.forEach((pin, net) -> pins.put(pin, names.getOrDefault(net, net)));
        List<String> wires = netOfWire.stream().map(n -> names.getOrDefault(n, n)).toList();
        Set<String> all = new TreeSet<>();
        nets.forEach(n -> all.add(names.getOrDefault(n, n)));
        List<String> ordered = new ArrayList<>();
        ordered.add(GROUND);
        all.stream().filter(n -> !n.equals(GROUND)).forEach(ordered::add);
        return new Connectivity(pins, wires, ordered, nameConflicts);
    }

    /**
     * The nets as drawn, before role names: ground, test points, and {@code n1, n2, ...} for the
     * rest in order of each net's top-left point. {@link StageRecognition} works on these.
     */
    static Connectivity drawn(Stage stage) {
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
        joinAlongWires(stage.wires(), index, points, parent);
        Map<Integer, String> names = new HashMap<>();
        for (Part part : stage.parts()) {
            if (part.kind() == PartKind.GROUND) {
                names.put(find(parent, index.get(part.pinPoint("g"))), GROUND);
            }
        }
        Set<String> used = new HashSet<>(names.values());
        Map<String, Part> byRef = new HashMap<>();
        for (Part p : stage.parts()) {
            byRef.putIfAbsent(p.ref(), p);
        }
        List<TestPoint> conflicts = new ArrayList<>();
        for (TestPoint tp : stage.testPoints()) {
            var part = java.util.Optional.ofNullable(byRef.get(tp.ref()));
            if (part.isEmpty() || part.get().kind().pin(tp.pin()).isEmpty()) {
                conflicts.add(tp);
                continue;
            }
            int root = find(parent, index.get(part.get().pinPoint(tp.pin())));
            String existing = names.get(root);
            if (existing == null && !used.contains(tp.net())) {
                names.put(root, tp.net());
                used.add(tp.net());
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
            } while (used.contains(candidate));
            names.put(r, candidate);
            used.add(candidate);
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

    /**
     * Joins every point lying on a wire with that wire, in O(n log n) for n points and wires: per
     * row (horizontal wires) and per column (vertical wires) the wires are merged into runs of
     * overlapping or touching segments, and each point on the row or column joins the run covering
     * it (found by binary search). A zero-length wire joins only its own point.
     */
    private static void joinAlongWires(List<Wire> wires, Map<GridPoint, Integer> index, List<GridPoint> points,
                                       int[] parent) {
        Map<Integer, List<int[]>> rows = new HashMap<>();
        Map<Integer, List<int[]>> columns = new HashMap<>();
        for (Wire w : wires) {
            int a = index.get(w.from());
            if (w.from().gridY() == w.to().gridY()) {
                rows.computeIfAbsent(w.from().gridY(), k -> new ArrayList<>()).add(
                        new int[] {Math.min(w.from().gridX(), w.to().gridX()), Math.max(w.from().gridX(), w.to().gridX()), a});
            }
            if (w.from().gridX() == w.to().gridX() && !w.isPoint()) {
                columns.computeIfAbsent(w.from().gridX(), k -> new ArrayList<>()).add(
                        new int[] {Math.min(w.from().gridY(), w.to().gridY()), Math.max(w.from().gridY(), w.to().gridY()), a});
            }
        }
        Map<Integer, List<int[]>> pointsOnRow = new HashMap<>();
        Map<Integer, List<int[]>> pointsOnColumn = new HashMap<>();
        for (int i = 0; i < points.size(); i++) {
            GridPoint p = points.get(i);
            if (rows.containsKey(p.gridY())) {
                pointsOnRow.computeIfAbsent(p.gridY(), k -> new ArrayList<>()).add(new int[] {p.gridX(), i});
            }
            if (columns.containsKey(p.gridX())) {
                pointsOnColumn.computeIfAbsent(p.gridX(), k -> new ArrayList<>()).add(new int[] {p.gridY(), i});
            }
        }
        rows.forEach((y, segs) -> joinLine(segs, pointsOnRow.getOrDefault(y, List.of()), parent));
        columns.forEach((x, segs) -> joinLine(segs, pointsOnColumn.getOrDefault(x, List.of()), parent));
    }

    /** One row or column: segments {lo, hi, point} and points {position, point}. */
    private static void joinLine(List<int[]> segments, List<int[]> onLine, int[] parent) {
        segments.sort(Comparator.comparingInt((int[] s) -> s[0]));
        List<int[]> runs = new ArrayList<>(); // {lo, hi, representative point}
        for (int[] s : segments) {
            int[] last = runs.isEmpty() ? null : runs.get(runs.size() - 1);
            if (last != null && s[0] <= last[1]) {
                last[1] = Math.max(last[1], s[1]);
                union(parent, last[2], s[2]);
            } else {
                runs.add(new int[] {s[0], s[1], s[2]});
            }
        }
        for (int[] p : onLine) {
            int lo = 0;
            int hi = runs.size() - 1;
            while (lo <= hi) {
                int mid = (lo + hi) >>> 1;
                int[] r = runs.get(mid);
                if (p[0] < r[0]) {
                    hi = mid - 1;
                } else if (p[0] > r[1]) {
                    lo = mid + 1;
                } else {
                    union(parent, r[2], p[1]);
                    break;
                }
            }
        }
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
