package org.armature.ui;

import java.util.Optional;
import java.util.concurrent.Executor;
import org.armature.analysis.CheckOptions;
import org.armature.analysis.CheckReport;
import org.armature.analysis.StageChecks;
import org.armature.model.Stage;
import org.armature.solver.DcAnalysis;
import org.armature.solver.timedomain.EdgeRuns;
import org.armature.solver.timedomain.TransientResult;

/**
 * The slower analyses the window runs after edits settle: the corner checks (verdicts) and the
 * turn-on and turn-off runs (edges). Each runs through its own {@link LatestWins} on the given
 * executor, debounced by {@code settleMillis}, so a drag never queues a backlog of them.
 *
 * @param verdicts where verdicts come from; {@link #NO_VERDICTS} for none
 * @param edges where edges come from; {@link #NO_EDGES} for none
 * @param executor the background executor of the verdicts (low priority in the application)
 * @param settleMillis quiet time after the last edit before a verdict run starts, ms
 * @param edgeExecutor the background executor of the edges: a thread of their own in the
 *     application, so the turn-on and turn-off runs (milliseconds) never wait behind the corner
 *     checks (up to a few hundred) and follow a drag
 * @param edgeSettleMillis quiet time after the last edit before an edge run starts, ms
 */
public record Analyses(VerdictSource verdicts, EdgeSource edges, Executor executor, long settleMillis,
                       Executor edgeExecutor, long edgeSettleMillis) {

    /** Verdicts and edges on one executor with one settle time (tests, and the window without threads). */
    public Analyses(VerdictSource verdicts, EdgeSource edges, Executor executor, long settleMillis) {
        this(verdicts, edges, executor, settleMillis, executor, settleMillis);
    }

    /** Computes the verdicts of a stage (may take seconds; never on the FX thread). */
    @FunctionalInterface
    public interface VerdictSource {
        /** The check report, or empty when the stage could not be judged (then {@code why} says why). */
        Verdicts compute(Stage stage);
    }

    /** Computes the edges of a stage (may take a second; never on the FX thread). */
    @FunctionalInterface
    public interface EdgeSource {
        /** The turn-on and turn-off runs. */
        Edges compute(Stage stage);
    }

    /**
     * The verdicts of one stage.
     *
     * @param report the checks, when they ran
     * @param status one plain sentence about the run
     */
    public record Verdicts(Optional<CheckReport> report, String status) {
        /** Nothing judged yet. */
        public static final Verdicts NONE = new Verdicts(Optional.empty(), "");
    }

    /**
     * The edges of one stage.
     *
     * @param turnOn the turn-on run, when it succeeded
     * @param turnOff the turn-off run, when it succeeded
     * @param status one plain sentence about the runs
     */
    public record Edges(Optional<TransientResult> turnOn, Optional<TransientResult> turnOff, String status) {
        /** Nothing run yet. */
        public static final Edges NONE = new Edges(Optional.empty(), Optional.empty(), "");

        /** True when at least one run has a waveform. */
        public boolean hasRun() {
            return turnOn.isPresent() || turnOff.isPresent();
        }
    }

    /** No verdicts. */
    public static final VerdictSource NO_VERDICTS = stage -> Verdicts.NONE;
    /** No edges. */
    public static final EdgeSource NO_EDGES = stage -> Edges.NONE;

    /** Neither analysis; nothing is ever submitted. */
    public static final Analyses NONE = new Analyses(NO_VERDICTS, NO_EDGES, Runnable::run, 0);

    public Analyses {
        if (verdicts == null || edges == null || executor == null || settleMillis < 0 || edgeExecutor == null
                || edgeSettleMillis < 0) {
            throw new IllegalArgumentException("analyses need sources, executors and settle times ≥ 0");
        }
    }

    /** True when this runs anything. */
    public boolean active() {
        return verdicts != NO_VERDICTS || edges != NO_EDGES;
    }

    /** The corner checks over the DC and transient engines ({@link StageChecks}). */
    public static VerdictSource engineVerdicts() {
        DcAnalysis dc = new DcAnalysis();
        return stage -> {
            CheckReport r = StageChecks.run(stage, CheckOptions.DEFAULT.withSettings(stage.settings()), dc);
            return new Verdicts(Optional.of(r), r.cornerCount() + " corners judged");
        };
    }

    /** Turn-on and turn-off runs of the transient engine with its default window. */
    public static EdgeSource engineEdges() {
        return stage -> {
            EdgeRuns runs = EdgeRuns.of(stage);
            return new Edges(runs.on(), runs.off(), runs.status());
        };
    }
}
