package org.armature.ui;

import java.util.List;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import org.armature.analysis.LineUpMetrics;
import org.armature.analysis.LineUpMetrics.PhaseResult;
import org.armature.model.LineUpContext;
import org.armature.model.Stage;

/**
 * The line-up's figures in phases, each published as it finishes: every submit is a new generation,
 * published at once with nothing arrived ({@link LineUpProgress#pending}); then on the fast executor,
 * stage by stage, the {@link LineUpMetrics.Phase#DC} figures of all stages, the turn-off runs (the
 * overlaid waveforms and their figures), the turn-on runs; then each stage's corner checks and yield
 * on the slow executor, so the checks of one change (the bulk of the work) never hold up the
 * DC readouts and waveforms of the next. Each finished phase goes to the publish executor, where it
 * is added to the current progress and the whole progress handed to the sink.
 *
 * <p>A result of an older generation is dropped when it reaches the publish executor, and a job
 * whose generation is no longer the newest stops before its next phase, so a stale figure never
 * overwrites a newer one and stale work stops early. The phases are the same methods
 * {@link LineUpMetrics#evaluate} runs ({@link LineUpMetrics#dc}, {@link LineUpMetrics#turnOff},
 * {@link LineUpMetrics#turnOn(Stage, PhaseResult)}, {@link LineUpMetrics#checks}), so a complete
 * progress holds the commands' numbers.
 *
 * <p>{@link #submit} and the publish executor's work belong to one thread (the FX thread in the
 * window; tests pass hand-stepped queues). Plain Java, without the toolkit.
 */
public final class LineUpEvaluations {

    /** Runs one phase of one stage. */
    public interface PhaseRunner {
        /** {@link LineUpMetrics#dc}. */
        PhaseResult dc(Stage stage);

        /** {@link LineUpMetrics#turnOff}. */
        PhaseResult turnOff(Stage stage);

        /** {@link LineUpMetrics#turnOn(Stage, PhaseResult)}. */
        PhaseResult turnOn(Stage stage, PhaseResult turnOff);

        /** {@link LineUpMetrics#checks}. */
        PhaseResult checks(Stage stage);
    }

    /** The engines: the same phase methods as {@link LineUpMetrics#evaluate}. */
    public static final PhaseRunner ENGINE = new PhaseRunner() {
        @Override
        public PhaseResult dc(Stage stage) {
            return LineUpMetrics.dc(stage);
        }

        @Override
        public PhaseResult turnOff(Stage stage) {
            return LineUpMetrics.turnOff(stage);
        }

        @Override
        public PhaseResult turnOn(Stage stage, PhaseResult turnOff) {
            return LineUpMetrics.turnOn(stage, turnOff);
        }

        @Override
        public PhaseResult checks(Stage stage) {
            return LineUpMetrics.checks(stage);
        }
    };

    private final PhaseRunner runner;
    private final Executor fast;
    private final Executor slow;
    private final Executor publish;
    /** The newest generation; read by the workers to stop stale jobs, written by {@link #submit}. */
    private final AtomicLong generation = new AtomicLong();
    /** The newest generation's progress; touched on the publish thread only. */
    private LineUpProgress current;

    /**
     * @param runner the phases ({@link #ENGINE}, or a fake in tests)
     * @param fast runs the DC, turn-off and turn-on phases (the solve executor in the window)
     * @param slow runs the corner checks (the analyses' executor in the window)
     * @param publish adds results to the progress and calls the sink (the FX thread in the window)
     */
    public LineUpEvaluations(PhaseRunner runner, Executor fast, Executor slow, Executor publish) {
        this.runner = runner;
        this.fast = fast;
        this.slow = slow;
        this.publish = publish;
    }

    /** The newest generation submitted; 0 before the first. */
    public long generation() {
        return generation.get();
    }

    /**
     * Starts a new generation for these stages; call on the publish thread. The sink gets the pending
     * progress at once (on the calling thread), then every progress of this generation as its
     * phases arrive, never one of an older generation.
     *
     * @param failed told, on the publish executor, when a phase throws (an engine failure the
     *     phases do not turn into a note); that generation stops there
     * @return the new generation
     */
    public long submit(List<LineUpContext.Applied> stages, Consumer<LineUpProgress> sink, Consumer<String> failed) {
        long gen = generation.incrementAndGet();
        List<LineUpContext.Applied> own = List.copyOf(stages);
        current = LineUpProgress.pending(gen, own);
        sink.accept(current);
        fast.execute(() -> runFast(gen, own, sink, failed));
        return gen;
    }

    /**
     * Ends the current generation without starting another (its view closed): its jobs stop before
     * their next phase and its results are dropped. Call on the publish thread.
     */
    public void cancel() {
        generation.incrementAndGet();
        current = null;
    }

    private void runFast(long gen, List<LineUpContext.Applied> stages, Consumer<LineUpProgress> sink,
                         Consumer<String> failed) {
        try {
            for (int i = 0; i < stages.size(); i++) {
                if (stale(gen)) {
                    return;
                }
                post(gen, i, runner.dc(stages.get(i).stage()), sink);
            }
            PhaseResult[] off = new PhaseResult[stages.size()];
            for (int i = 0; i < stages.size(); i++) {
                if (stale(gen)) {
                    return;
                }
                off[i] = runner.turnOff(stages.get(i).stage());
                post(gen, i, off[i], sink);
            }
            for (int i = 0; i < stages.size(); i++) {
                if (stale(gen)) {
                    return;
                }
                post(gen, i, runner.turnOn(stages.get(i).stage(), off[i]), sink);
            }
        } catch (RuntimeException e) {
            fail(gen, e, failed);
            return;
        }
        for (int i = 0; i < stages.size(); i++) {
            int index = i;
            slow.execute(() -> {
                if (stale(gen)) {
                    return;
                }
                try {
                    post(gen, index, runner.checks(stages.get(index).stage()), sink);
                } catch (RuntimeException e) {
                    fail(gen, e, failed);
                }
            });
        }
    }

    private boolean stale(long gen) {
        return generation.get() != gen;
    }

    private void post(long gen, int index, PhaseResult result, Consumer<LineUpProgress> sink) {
        publish.execute(() -> {
            if (current == null || current.generation() != gen) {
                return; // an older change's result: the newer one's progress must not take it in
            }
            current = current.with(index, result);
            sink.accept(current);
        });
    }

    private void fail(long gen, RuntimeException e, Consumer<String> failed) {
        // an engine failure the phases do not turn into a note: said in the status line, not lost
        String words = "The line-up could not be evaluated: " + e.getMessage();
        publish.execute(() -> {
            if (current != null && current.generation() == gen) {
                failed.accept(words);
            }
        });
    }
}
