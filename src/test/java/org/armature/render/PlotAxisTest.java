package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Plot axes that mean something (issue 17). The EdgePlot tests reproduce what the window showed
 * and failed before {@link PlotAxis}: a flat trace with an axis of equal ends ("−203 nA" to
 * "−203 nA"), armature travel padded to "−24 µm", and time ticks mixing "8.00" with "10.0".
 */
class PlotAxisTest {

    private static final double NONE_LO = Double.NEGATIVE_INFINITY;
    private static final double NONE_HI = Double.POSITIVE_INFINITY;

    @Test
    @DisplayName("flat trace at −203 nA: a span from its magnitude, 0 included, ends that differ")
    void flat() {
        PlotAxis a = PlotAxis.of(-203e-9, -203e-9, NONE_LO, NONE_HI, "A");
        assertTrue(a.lo() < -203e-9 && a.hi() >= 0, a.toString());
        assertNotEquals(a.label(a.lo()), a.label(a.hi()));
        // derived: span 203 nA + 5 % headroom = 213 nA, step niceStep(213/4 nA) = 50 nA; a whole step
        // down (−250 nA) would add 17 % > ROUNDING_SHARE, so the end is rounded to 10 nA: −220 nA
        assertEquals("−220 nA", a.label(a.lo()));
        assertEquals("0 nA", a.label(a.hi()));
    }

    @Test
    @DisplayName("a trace flat at zero gets the quiet span of its unit (1 mA for a current, common practice)")
    void flatAtZero() {
        PlotAxis a = PlotAxis.of(0, 0, NONE_LO, NONE_HI, "A");
        assertEquals(0, a.lo());
        assertTrue(a.hi() >= 1e-3, a.toString());
    }

    @Test
    @DisplayName("rounding noise on a steady 5 mA counts as flat, not as a nanoamp-wide axis")
    void noiseIsFlat() {
        PlotAxis a = PlotAxis.of(5e-3 - 1e-12, 5e-3 + 1e-12, NONE_LO, NONE_HI, "A");
        assertEquals(0, a.lo(), 1e-15);
        assertTrue(a.hi() >= 5e-3 && a.hi() <= 6e-3, a.toString());
    }

    @Test
    @DisplayName("tiny trace 0 to 3 nA: its own range, one prefix for both ends")
    void tiny() {
        PlotAxis a = PlotAxis.of(0, 3e-9, NONE_LO, NONE_HI, "A");
        assertEquals(0, a.lo());
        assertTrue(a.hi() >= 3e-9 && a.hi() <= 4e-9, a.toString());
        assertTrue(a.label(a.lo()).endsWith(" nA") && a.label(a.hi()).endsWith(" nA"), a.label(a.hi()));
    }

    @Test
    @DisplayName("a small dip below zero does not cost a whole step: 30 mA with a −0.3 mA dip ends at −2 mA")
    void smallDip() {
        PlotAxis a = PlotAxis.of(-0.3e-3, 28.5e-3, NONE_LO, NONE_HI, "A");
        // derived: headroom 5 % of 28.8 mA, step niceStep(31.2/4 mA) = 10 mA; −10 mA would add 33 %,
        // so the low end is rounded to a fifth of the step (2 mA)
        assertEquals("−2 mA", a.label(a.lo()));
        assertEquals("30 mA", a.label(a.hi()));
    }

    @Test
    @DisplayName("negative-only trace −5 V to −1 V: headroom below only, the top stays at or below 0")
    void negativeOnly() {
        PlotAxis a = PlotAxis.of(-5, -1, NONE_LO, NONE_HI, "V");
        assertTrue(a.lo() < -5, a.toString());
        assertTrue(a.hi() >= -1 && a.hi() <= 0, a.toString());
    }

    @Test
    @DisplayName("step trace 0 to 12 V: starts at 0 (no negative padding), headroom above, whole steps")
    void step() {
        PlotAxis a = PlotAxis.of(0, 12, NONE_LO, NONE_HI, "V");
        assertEquals(0, a.lo());
        assertTrue(a.hi() > 12 && a.hi() <= 15, a.toString());
        assertEquals(0, Math.IEEEremainder(a.hi(), a.step()), 1e-12);
        Set<Integer> decimals = new HashSet<>();
        for (double t : a.ticks()) {
            String n = a.label(t).split(" ")[0];
            decimals.add(n.contains(".") ? n.length() - n.indexOf('.') - 1 : 0);
        }
        assertEquals(1, decimals.size(), "one format per axis");
    }

    @Test
    @DisplayName("a quantity with limits stays inside them: travel −3 nm (rounding) to 300 µm within stop to stop")
    void limits() {
        PlotAxis a = PlotAxis.of(-3e-9, 300e-6, 0, 300e-6, "m");
        assertEquals(0, a.lo());
        assertEquals(300e-6, a.hi(), 1e-18);
        assertEquals("0 µm", a.label(a.lo()));
        assertEquals("300 µm", a.label(a.hi()));
    }

    // ------------------------------------------------------------------ as drawn

    private static List<String> axisLabels(EdgePlot.Plot plot) {
        RecordingPen pen = new RecordingPen();
        EdgePlot.draw(pen, plot, 800, 300, Double.NaN, Palette.LIGHT);
        List<String> out = new ArrayList<>();
        for (RecordingPen.Op op : pen.ops()) {
            if (op instanceof RecordingPen.TextOp t && t.style().hAnchor() == TextStyle.HAnchor.END
                    && Math.abs(t.x() - (EdgePlot.TITLE_WIDTH - 6)) < 1e-9) {
                out.add(t.text());
            }
        }
        return out;
    }

    private static List<String> timeTicks(EdgePlot.Plot plot) {
        RecordingPen pen = new RecordingPen();
        EdgePlot.draw(pen, plot, 800, 300, Double.NaN, Palette.LIGHT);
        List<String> out = new ArrayList<>();
        for (RecordingPen.Op op : pen.ops()) {
            if (op instanceof RecordingPen.TextOp t && t.style().hAnchor() == TextStyle.HAnchor.MIDDLE
                    && t.style().vAnchor() == TextStyle.VAnchor.TOP && t.text().matches("[0-9.]+")) {
                out.add(t.text());
            }
        }
        return out;
    }

    private static double[] times(int n, double end) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = end * i / (n - 1);
        }
        return t;
    }

    @Test
    @DisplayName("drawn: a flat coil current at −203 nA has two different axis labels (failed before: equal ends)")
    void drawnFlat() {
        double[] v = new double[50];
        java.util.Arrays.fill(v, -203e-9);
        EdgePlot.Plot plot = new EdgePlot.Plot(times(50, 20e-3),
                List.of(new EdgePlot.Channel("coil current", "A", 1, "A", v, false)), List.of());
        List<String> labels = axisLabels(plot);
        assertEquals(2, labels.size(), labels.toString());
        assertNotEquals(labels.get(0), labels.get(1));
        assertTrue(labels.contains("0 nA"), labels.toString());
    }

    @Test
    @DisplayName("drawn: armature travel never shows a negative end (failed before: −24 µm)")
    void drawnTravel() {
        double[] v = new double[50];
        for (int i = 0; i < v.length; i++) {
            v[i] = i < 20 ? -1e-10 : 300e-6;
        }
        EdgePlot.Plot plot = new EdgePlot.Plot(times(50, 20e-3),
                List.of(new EdgePlot.Channel("armature travel", "m", 1, "m", v, false, 0, 300e-6)), List.of());
        List<String> labels = axisLabels(plot);
        assertFalse(labels.stream().anyMatch(s -> s.startsWith("−") || s.startsWith("-")), labels.toString());
        assertEquals(List.of("300 µm", "0 µm"), labels);
    }

    @Test
    @DisplayName("drawn: time ticks of a 20 ms run share one format (failed before: 8.00 beside 10.0)")
    void drawnTimeTicks() {
        double[] v = new double[50];
        EdgePlot.Plot plot = new EdgePlot.Plot(times(50, 20e-3),
                List.of(new EdgePlot.Channel("coil current", "A", 1, "A", v, false)), List.of());
        List<String> ticks = timeTicks(plot);
        assertTrue(ticks.size() >= 5, ticks.toString());
        Set<Integer> decimals = new HashSet<>();
        for (String t : ticks) {
            decimals.add(t.contains(".") ? t.length() - t.indexOf('.') - 1 : 0);
        }
        assertEquals(1, decimals.size(), ticks.toString());
        assertTrue(ticks.contains("10") && ticks.contains("8"), ticks.toString());
    }
}
