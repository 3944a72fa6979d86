package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** How a trace whose time points lie far apart on the plot is drawn. */
class EdgePlotTest {

    /** The longest polyline drawn: the trace (axes and grid lines have two or three points). */
    private static RecordingPen.PolylineOp trace(RecordingPen pen) {
        RecordingPen.PolylineOp best = null;
        for (RecordingPen.Op op : pen.ops()) {
            if (op instanceof RecordingPen.PolylineOp l && (best == null || l.xs().length > best.xs().length)) {
                best = l;
            }
        }
        return best;
    }

    @Test
    @DisplayName("a ramp with two samples is drawn straight, not held at its first value (linear between samples)")
    void sparseSamplesRunStraight() {
        EdgePlot.Channel ramp = new EdgePlot.Channel("ramp", "V", 1, "V", new double[] {0, 0, 10}, false);
        EdgePlot.Plot plot = new EdgePlot.Plot(new double[] {0, 1e-3, 2e-3}, List.of(ramp), List.of());
        RecordingPen pen = new RecordingPen();
        EdgePlot.draw(pen, plot, 800, 200, Double.NaN, Palette.LIGHT);
        RecordingPen.PolylineOp l = trace(pen);
        double[] ys = l.ys();
        // y falls on screen as the value rises: over the ramp's half the points must keep falling
        // (a held value would leave a flat run and then a jump)
        List<Double> second = new ArrayList<>();
        for (int k = 0; k < ys.length; k++) {
            if (l.xs()[k] > l.xs()[ys.length / 2] + 5) {
                second.add(ys[k]);
            }
        }
        assertTrue(second.size() > 10, "points on the ramp: " + second.size());
        int flat = 0;
        for (int k = 1; k < second.size(); k++) {
            if (second.get(k) >= second.get(k - 1)) {
                flat++;
            }
        }
        assertEquals(0, flat, "every column on the ramp is higher than the one before");
    }
}
