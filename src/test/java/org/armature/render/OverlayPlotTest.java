package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientOptions;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Turn-off edges of several stages on one time axis. */
class OverlayPlotTest {

    @Test
    @DisplayName("two stages: three strips, one trace per stage in each in its own colour, a legend naming both")
    void twoStagesOverlaid() {
        Stage d = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        Stage z = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT);
        List<EdgePlot.Plot> plots = List.of(
                EdgePlot.of(d, TransientAnalysis.run(d, TransientOptions.turnOff()).waveform()),
                EdgePlot.of(z, TransientAnalysis.run(z, TransientOptions.turnOff()).waveform()));
        RecordingPen pen = new RecordingPen();
        OverlayPlot.draw(pen, plots, List.of("diode", "diode + zener"), 800, 300, Palette.LIGHT);
        assertTrue(pen.texts().containsAll(List.of("diode", "diode + zener", "coil current", "switch voltage",
                "armature travel")), pen.texts().toString());
        for (int s = 0; s < 2; s++) {
            Colour c = OverlayPlot.SERIES.get(s);
            int points = plots.get(s).timeSeconds().length;
            long traces = pen.ops().stream().filter(o -> o instanceof RecordingPen.PolylineOp p && p.colour().equals(c)
                    && p.xs().length == points).count();
            // one trace per strip, every time point of the stage's own run (the legend swatch has two points)
            assertEquals(3, traces, "stage " + s);
        }
    }
}
