package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.junit.jupiter.api.Test;

class RelayContactDrawingTest {

    private static List<String> twoPointLines(Annotations a) {
        Stage st = Templates.defaultStage();
        RecordingPen pen = new RecordingPen();
        SchematicRenderer.draw(st, a, RenderOptions.all(), pen);
        List<String> out = new ArrayList<>();
        for (RecordingPen.Op op : pen.ops()) {
            if (op instanceof RecordingPen.PolylineOp l && l.xs().length == 2 && !l.closed()) {
                out.add(String.format("%.3f,%.3f,%.3f,%.3f", l.xs()[0], l.ys()[0], l.xs()[1], l.ys()[1]));
            }
        }
        return out;
    }

    @Test
    void anOperatedRelayDrawsItsBladeOnTheNormallyOpenContact() {
        Annotations released = new Annotations(List.of(), List.of(), List.of(),
                List.of(new Annotations.RelayGauge("K1", 0, 1e-3, 2e-2, false)), List.of());
        Annotations operated = new Annotations(List.of(), List.of(), List.of(),
                List.of(new Annotations.RelayGauge("K1", 3e-2, 1e-3, 2e-2, true)), List.of());
        List<String> a = twoPointLines(released);
        List<String> b = twoPointLines(operated);
        // K1 sits at grid (20, 6) unrotated; the blade pivots at (5, -0.55) in the symbol and ends
        // 0.7 left (NC side) or right (NO side) of it, 1.27 lower (derived from the symbol geometry in Symbols.relay and the PartKind.RELAY pin layout)
        String toNc = "25.000,5.450,24.300,6.720";
        String toNo = "25.000,5.450,25.700,6.720";
        assertTrue(a.contains(toNc) && !a.contains(toNo), "released blade on NC: " + a);
        assertTrue(b.contains(toNo) && !b.contains(toNc), "operated blade on NO: " + b);
    }
}
