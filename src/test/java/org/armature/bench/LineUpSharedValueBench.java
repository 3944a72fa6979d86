package org.armature.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.armature.analysis.TopologyCheck;
import org.armature.model.Finding;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.ParamKeys;
import org.armature.model.SharedPart;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.armature.render.Layout;
import org.armature.render.ReadoutBuilder;
import org.armature.render.RecordingPen;
import org.armature.render.RenderOptions;
import org.armature.render.SchematicRenderer;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A shared value of a line-up changed (the coil supply, alternating 12.0 V and 12.1 V): the shared
 * context applied to the four templates, each DC-solved, topology-checked, its readouts built
 * ({@link ReadoutBuilder}) and drawn by {@link SchematicRenderer} onto a recording pen. Everything
 * between the change and the four panes' draw calls except the toolkit's painting. Target: p99 within
 * one 16 ms frame (issue 12), next to {@link ReadoutLatencyBench}.
 *
 * <p>Run: {@code mvn -B -o test-compile exec:exec -Dbench="LineUpSharedValueBench -f 1 -wi 1 -w 1s -i 3 -r 1s"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(1)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 3, time = 3)
public class LineUpSharedValueBench {

    private StageDocument doc;
    private final List<DcAnalysis> engines = new ArrayList<>();
    private final List<org.armature.ui.EngineReadouts> viewEngines = new ArrayList<>();
    private int step;

    /** The four templates in one line-up on the first one's relay, supply and pin; engines warmed. */
    @Setup
    public void setUp() {
        List<Stage> stages = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            stages.add(Templates.build(t));
        }
        doc = new StageDocument("four", stages, java.util.Optional.of(new LineUp(List.of(0, 1, 2, 3),
                LineUpContext.of(stages.get(0)))));
        for (LineUpContext.Applied a : doc.lineUp().get().applied(doc)) {
            DcAnalysis dc = new DcAnalysis();
            dc.solve(a.stage());
            engines.add(dc);
            org.armature.ui.EngineReadouts r = new org.armature.ui.EngineReadouts();
            r.compute(a.stage());
            viewEngines.add(r);
        }
    }

    /** One shared supply change to four stages' painted readouts. */
    @Benchmark
    public List<Layout> changeSharedSupply() {
        LineUp l = doc.lineUp().get();
        SharedPart supply = l.context().coilSupply().get().with(ParamKeys.VOLTS, 12 + 0.1 * (step++ & 1));
        StageDocument changed = doc.withLineUp(java.util.Optional.of(l.withContext(l.context().withCoilSupply(supply))));
        List<Layout> out = new ArrayList<>(4);
        List<LineUpContext.Applied> applied = changed.lineUp().get().applied(changed);
        for (int i = 0; i < applied.size(); i++) {
            Stage s = applied.get(i).stage();
            OperatingPoint op = engines.get(i).solve(s);
            List<Finding> findings = TopologyCheck.check(s);
            Annotations a = ReadoutBuilder.build(s, op, findings);
            out.add(SchematicRenderer.draw(s, a, RenderOptions.all(), new RecordingPen()));
        }
        return out;
    }

    /**
     * The line-up view's own DC path for the same change ({@code EditorViewModel.lineUpReadouts}):
     * one warm {@link org.armature.ui.EngineReadouts} per stage, which also validates the stage and
     * solves the other pin state; then each stage's readouts drawn onto a recording pen. The view's
     * toolkit snapshot of the drawing is not included.
     */
    @Benchmark
    public List<Layout> changeSharedSupplyViewReadouts() {
        LineUp l = doc.lineUp().get();
        SharedPart supply = l.context().coilSupply().get().with(ParamKeys.VOLTS, 12 + 0.1 * (step++ & 1));
        StageDocument changed = doc.withLineUp(java.util.Optional.of(l.withContext(l.context().withCoilSupply(supply))));
        List<Layout> out = new ArrayList<>(4);
        List<LineUpContext.Applied> applied = changed.lineUp().get().applied(changed);
        for (int i = 0; i < applied.size(); i++) {
            Stage s = applied.get(i).stage();
            Annotations a = viewEngines.get(i).compute(s).annotations();
            out.add(SchematicRenderer.draw(s, a, RenderOptions.all(), new RecordingPen()));
        }
        return out;
    }
}
