package org.armature.bench;

import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.armature.analysis.TopologyCheck;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.armature.render.Layer;
import org.armature.render.Layout;
import org.armature.render.ReadoutBuilder;
import org.armature.render.RecordingPen;
import org.armature.render.RenderOptions;
import org.armature.render.SchematicRenderer;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.ui.Analyses;
import org.armature.ui.EngineReadouts;
import org.armature.ui.Evaluation;
import org.armature.ui.Evaluations;
import org.armature.ui.edit.Editor;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The headless path of one live edit, per template: an edit command through the editor (an ambient
 * slider step, alternating 25 °C and 26 °C, merged as a drag), the DC solve, the topology check,
 * {@link ReadoutBuilder} and {@link SchematicRenderer} onto a recording pen. This is everything
 * between an input event and the canvas's draw calls except the toolkit's own painting. Target:
 * well inside the 16 ms frame at the 99th percentile (sample mode gives the percentiles).
 *
 * <p>Run: {@code mvn -B test-compile exec:exec -Dbench.args="ReadoutLatencyBench -f 1 -wi 2 -i 3"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(1)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 3, time = 3)
public class ReadoutLatencyBench {

    /** The template edited. */
    @Param({"LOW_SIDE_NPN", "LOW_SIDE_NMOS", "DARLINGTON_CHANNEL", "HIGH_SIDE_PNP"})
    public String template;

    private Editor editor;
    private DcAnalysis dc;
    private int step;
    private Editor windowEditor;
    private Evaluations evaluations;
    private Evaluation published;
    private int windowStep;
    private Layout previous = Layout.NONE;
    private Layout windowPrevious = Layout.NONE;

    /** Builds the stage and warms the engine's compiled netlist. */
    @Setup
    public void setUp() {
        Stage s = Templates.build(StageTemplate.valueOf(template), Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        editor = new Editor(s);
        dc = new DcAnalysis();
        dc.solve(s);
        windowEditor = new Editor(s);
        evaluations = new Evaluations(new EngineReadouts(), Analyses.NONE, Runnable::run, Runnable::run, e -> published = e);
        evaluations.submit(s);
    }

    /**
     * One edit to painted readouts as the canvas does it during a drag: the label layout of the last
     * repaint is handed on (labels stay where they were) and only the annotation layer is drawn,
     * since wires, parts and labels did not change (recorded draw calls).
     */
    @Benchmark
    public Layout editSolveBuildRender() {
        Annotations a = editSolveBuild();
        Stage s = editor.stage();
        previous = SchematicRenderer.layout(s, a, previous);
        RecordingPen pen = new RecordingPen();
        return SchematicRenderer.draw(s, a, RenderOptions.all().withLayers(EnumSet.of(Layer.ANNOTATIONS)), pen, previous);
    }

    /** The same edit with a fresh label layout and every layer drawn (a first paint, an export). */
    @Benchmark
    public Layout editSolveBuildRenderAll() {
        Annotations a = editSolveBuild();
        RecordingPen pen = new RecordingPen();
        return SchematicRenderer.draw(editor.stage(), a, RenderOptions.all(), pen);
    }

    private Annotations editSolveBuild() {
        editor.setAmbient(25 + (step++ & 1));
        Stage s = editor.stage();
        OperatingPoint op = dc.solve(s);
        List<Finding> findings = TopologyCheck.check(s);
        return ReadoutBuilder.build(s, op, findings);
    }

    /**
     * The same edit through the window's own path: the editor, {@link Evaluations} with same-thread
     * executors (validation, {@link EngineReadouts}: topology check and both pin states' operating
     * points), then the published evaluation drawn onto a recording pen.
     */
    @Benchmark
    public Layout editEvaluateRender() {
        windowEditor.setAmbient(25 + (windowStep++ & 1));
        evaluations.submit(windowEditor.stage());
        Evaluation e = published;
        windowPrevious = SchematicRenderer.layout(e.stage(), e.annotations(), windowPrevious);
        RecordingPen pen = new RecordingPen();
        return SchematicRenderer.draw(e.stage(), e.annotations(),
                RenderOptions.all().withLayers(EnumSet.of(Layer.ANNOTATIONS)), pen, windowPrevious);
    }
}
