package org.armature.solver;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.armature.model.Conditions;
import org.armature.model.Connectivity;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Placement;
import org.armature.model.PinSpec;
import org.armature.model.Stage;
import org.armature.model.TestPoint;
import org.armature.model.Wire;

/**
 * Test helper: builds a {@link Stage} from a list of parts and "pin on net" statements, drawing
 * wires that cannot touch each other by accident. Each part sits in its own column; each pin gets
 * a stub away from its part to a row of its own, a run to a column of its own, and a drop to its
 * net's bus row. Nets are named by test points; {@code gnd} by a ground symbol.
 */
final class StageSketch {

    private final List<Part> parts = new ArrayList<>();
    private final Map<String, String> netOfPin = new LinkedHashMap<>();
    private Conditions conditions = Conditions.DEFAULT;

    StageSketch part(String ref, PartKind kind, Object... keyValues) {
        Part p = Part.of(ref, kind, Placement.at(100 * (parts.size() + 1), 0));
        for (int i = 0; i < keyValues.length; i += 2) {
            p = p.with((String) keyValues[i], ((Number) keyValues[i + 1]).doubleValue());
        }
        parts.add(p);
        return this;
    }

    /** Connects pins to nets: "ref.pin", "net", "ref.pin", "net", ... */
    StageSketch wire(String... pinNetPairs) {
        for (int i = 0; i < pinNetPairs.length; i += 2) {
            netOfPin.put(pinNetPairs[i], pinNetPairs[i + 1]);
        }
        return this;
    }

    StageSketch conditions(Conditions c) {
        this.conditions = c;
        return this;
    }

    Stage build() {
        List<Part> all = new ArrayList<>(parts);
        boolean usesGround = netOfPin.containsValue(Connectivity.GROUND);
        if (usesGround) {
            all.add(Part.of("GNDX", PartKind.GROUND, Placement.at(100 * (parts.size() + 1), 0)));
            netOfPin.put("GNDX.g", Connectivity.GROUND);
        }
        List<Wire> wires = new ArrayList<>();
        List<TestPoint> tps = new ArrayList<>();
        List<String> nets = new ArrayList<>();
        Map<String, int[]> busExtent = new LinkedHashMap<>();
        int k = 0;
        for (Map.Entry<String, String> e : netOfPin.entrySet()) {
            String[] rp = e.getKey().split("\\.");
            Part part = all.stream().filter(p -> p.ref().equals(rp[0])).findFirst().orElseThrow();
            PinSpec spec = part.kind().pin(rp[1]).orElseThrow(() -> new IllegalArgumentException(e.getKey()));
            var pt = part.pinPoint(rp[1]);
            boolean up = part.kind().pins().stream()
                    .filter(q -> q.localX() == spec.localX())
                    .allMatch(q -> q.localY() >= spec.localY());
            int row = up ? -100 - 2 * k : 100 + 2 * k;
            int col = 20_000 + 3 * k;
            String net = e.getValue();
            if (!nets.contains(net)) {
                nets.add(net);
            }
            int busRow = 50_000 + 2 * nets.indexOf(net);
            wires.add(Wire.of(pt.gridX(), pt.gridY(), pt.gridX(), row));
            wires.add(Wire.of(pt.gridX(), row, col, row));
            wires.add(Wire.of(col, row, col, busRow));
            busExtent.merge(net, new int[] {col, col, busRow},
                    (a, b) -> new int[] {Math.min(a[0], b[0]), Math.max(a[1], b[1]), a[2]});
            if (!net.equals(Connectivity.GROUND) && tps.stream().noneMatch(t -> t.net().equals(net))) {
                tps.add(new TestPoint(net, rp[0], rp[1]));
            }
            k++;
        }
        for (int[] b : busExtent.values()) {
            wires.add(Wire.of(b[0], b[2], b[1], b[2]));
        }
        return new Stage("sketch", "", all, wires, tps, conditions);
    }
}
