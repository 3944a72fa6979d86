package org.armature.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.armature.analysis.LineUpMetrics;
import org.armature.analysis.LineUpMetrics.Phase;
import org.armature.analysis.LineUpMetrics.PhaseResult;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.ParamKeys;
import org.armature.model.SharedPart;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.render.EdgePlot;
import org.armature.render.OverlayPlot;
import org.armature.render.Palette;
import org.armature.render.RecordingPen;
import org.armature.ui.EngineReadouts;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A shared value of a four-stage line-up changes (the four templates on one relay; the coil supply
 * alternating 12.0 V and 12.1 V, so every run sees a changed stage) until the overlaid turn-off
 * waveforms of all four are ready. The window's order after a change is: the DC readouts on the warm
 * engines, then per stage the {@link Phase#DC} figures and the {@link Phase#TURN_OFF} run, then the
 * overlay ({@link OverlayPlot}) drawn onto a recording pen. Target (issue 12): p99 ≤ 100 ms headless.
 *
 * <ul>
 *   <li>{@link #toWaveforms}: that path on one thread (the solve executor);</li>
 *   <li>{@link #toWaveformsTwoThreads}: the same with the four stages' DC figures and turn-off runs
 *       spread over a pool of two threads;</li>
 *   <li>{@link #wholeEvaluate}: before the phases, the view got nothing until every stage's whole
 *       {@link LineUpMetrics#evaluate} (both transients and the corner checks) was done;</li>
 *   <li>{@link Phases#phase}: one phase of one stage, for where the time goes.</li>
 * </ul>
 *
 * <p>Run: {@code mvn -B -o test-compile exec:exec -Dbench="LineUpWaveformsBench -f 1 -wi 1 -w 1s -i 3 -r 1s"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(1)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
public class LineUpWaveformsBench {

    private StageDocument doc;
    private final List<EngineReadouts> viewEngines = new ArrayList<>();
    private ExecutorService pool;
    private int step;

    /** The four templates in one line-up on the first one's relay, supply and pin; DC engines warmed. */
    @Setup
    public void setUp() {
        doc = fourTemplates();
        for (LineUpContext.Applied a : doc.lineUp().get().applied(doc)) {
            EngineReadouts r = new EngineReadouts();
            r.compute(a.stage());
            viewEngines.add(r);
        }
        pool = Executors.newFixedThreadPool(2);
    }

    /** Stops the pool. */
    @TearDown
    public void tearDown() {
        pool.shutdownNow();
    }

    static StageDocument fourTemplates() {
        List<Stage> stages = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            stages.add(Templates.build(t));
        }
        return new StageDocument("four", stages, java.util.Optional.of(new LineUp(List.of(0, 1, 2, 3),
                LineUpContext.of(stages.get(0)))));
    }

    static List<LineUpContext.Applied> changed(StageDocument doc, int step) {
        LineUp l = doc.lineUp().get();
        SharedPart supply = l.context().coilSupply().get().with(ParamKeys.VOLTS, 12 + 0.1 * (step & 1));
        StageDocument c = doc.withLineUp(java.util.Optional.of(l.withContext(l.context().withCoilSupply(supply))));
        return c.lineUp().get().applied(c);
    }

    /** A shared change to the overlaid turn-off waveforms of four stages, on one thread. */
    @Benchmark
    public RecordingPen toWaveforms() {
        List<LineUpContext.Applied> applied = changed(doc, step++);
        for (int i = 0; i < applied.size(); i++) {
            viewEngines.get(i).compute(applied.get(i).stage());
        }
        List<LineUpMetrics.Column> columns = new ArrayList<>();
        for (LineUpContext.Applied a : applied) {
            columns.add(LineUpMetrics.column(a, List.of(LineUpMetrics.dc(a.stage()), LineUpMetrics.turnOff(a.stage()))));
        }
        return overlay(columns);
    }

    /** The same, with the four stages' DC figures and turn-off runs on a pool of two threads. */
    @Benchmark
    public RecordingPen toWaveformsTwoThreads() throws InterruptedException, ExecutionException {
        List<LineUpContext.Applied> applied = changed(doc, step++);
        for (int i = 0; i < applied.size(); i++) {
            viewEngines.get(i).compute(applied.get(i).stage());
        }
        List<Future<LineUpMetrics.Column>> futures = new ArrayList<>();
        for (LineUpContext.Applied a : applied) {
            futures.add(pool.submit(() -> LineUpMetrics.column(a,
                    List.of(LineUpMetrics.dc(a.stage()), LineUpMetrics.turnOff(a.stage())))));
        }
        List<LineUpMetrics.Column> columns = new ArrayList<>();
        for (Future<LineUpMetrics.Column> f : futures) {
            columns.add(f.get());
        }
        return overlay(columns);
    }

    /** Before the phases: every stage's whole column (both transients, the corner checks) before the overlay. */
    @Benchmark
    public RecordingPen wholeEvaluate() {
        List<LineUpContext.Applied> applied = changed(doc, step++);
        return overlay(applied.stream().map(LineUpMetrics::evaluate).toList());
    }

    private static RecordingPen overlay(List<LineUpMetrics.Column> columns) {
        List<EdgePlot.Plot> plots = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (LineUpMetrics.Column c : columns) {
            if (c.turnOff().isPresent()) {
                plots.add(EdgePlot.of(c.stage(), c.turnOff().get()));
                names.add(c.stage().name());
            }
        }
        if (plots.size() != columns.size()) {
            throw new IllegalStateException("a turn-off run is missing: " + columns.get(0).notes());
        }
        RecordingPen pen = new RecordingPen();
        OverlayPlot.draw(pen, plots, names, 1440, 300, Palette.LIGHT);
        return pen;
    }

    /**
     * The window's situation right after a second change: the first change's corner checks still run
     * on the other thread (the analyses' executor) while the new change's DC figures and turn-off
     * runs go on the solve thread. Here a thread runs the high-side stage's checks over and over
     * (the slowest, about 80 ms each) for the whole trial.
     */
    @State(Scope.Benchmark)
    public static class ChecksBeside {
        private Thread busy;
        private volatile boolean running;

        /** Starts the checks thread. */
        @Setup(Level.Trial)
        public void start() {
            Stage pnp = changed(fourTemplates(), 0).get(StageTemplate.HIGH_SIDE_PNP.ordinal()).stage();
            running = true;
            busy = new Thread(() -> {
                while (running) {
                    LineUpMetrics.checks(pnp);
                }
            }, "checks-beside");
            busy.setDaemon(true);
            busy.start();
        }

        /** Stops it after the check under way. */
        @TearDown(Level.Trial)
        public void stop() throws InterruptedException {
            running = false;
            busy.join();
        }
    }

    /** {@link #toWaveforms} while another thread runs corner checks (the previous change's). */
    @Benchmark
    public RecordingPen toWaveformsWhileChecksRun(ChecksBeside beside) {
        return toWaveforms();
    }

    /** One phase of one template's stage in the line-up, the shared supply alternating as above. */
    @State(Scope.Benchmark)
    @BenchmarkMode(Mode.SampleTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public static class Phases {

        @Param({"LOW_SIDE_NPN", "LOW_SIDE_NMOS", "DARLINGTON_CHANNEL", "HIGH_SIDE_PNP"})
        public String template;

        @Param({"DC", "TURN_OFF", "TURN_ON", "CHECKS"})
        public String phase;

        private final Stage[] stages = new Stage[2];
        private Phase which;
        private int step;

        /** Both supply values' judged stage of the chosen template. */
        @Setup(Level.Trial)
        public void setUp() {
            StageDocument doc = fourTemplates();
            int index = StageTemplate.valueOf(template).ordinal();
            stages[0] = changed(doc, 0).get(index).stage();
            stages[1] = changed(doc, 1).get(index).stage();
            which = Phase.valueOf(phase);
        }

        /** One run of the phase. */
        @Benchmark
        public PhaseResult phase() {
            return LineUpMetrics.run(which, stages[step++ & 1]);
        }
    }
}
