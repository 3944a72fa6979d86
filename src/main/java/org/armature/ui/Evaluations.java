package org.armature.ui;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;
import org.armature.model.Finding;
import org.armature.model.Stage;
import org.armature.model.Validator;

/**
 * Builds and publishes {@link Evaluation}s: each submitted stage version becomes a new generation,
 * published at once as pending; its readouts are solved on the solve executor, its verdicts and
 * edges on the analyses' executor, and each finished part is published on the publish executor as a
 * new whole evaluation of the same generation. A part that finishes after a newer generation was
 * submitted is dropped: an evaluation never holds parts of two generations.
 *
 * <p>Readouts, verdicts and edges each run through their own {@link LatestWins}, so a burst of edits
 * costs one solve per finished solve. The publish executor is the only thread that changes the
 * current evaluation ({@code Platform::runLater} in the window; tests pass hand-stepped queues), and
 * {@link #submit} must be called on it.
 *
 * <p>Plain Java, without the toolkit.
 */
public final class Evaluations {

    private final ReadoutSource readouts;
    private final Analyses analyses;
    private final Executor publishExecutor;
    private final Consumer<Evaluation> sink;
    private final LatestWins solves;
    private final LatestWins verdictRuns;
    private final LatestWins edgeRuns;
    private long generation;
    private Evaluation current;

    /**
     * @param readouts where readouts come from
     * @param analyses verdicts and edges ({@link Analyses#NONE} for none: they are then published as
     *     ready and empty)
     * @param solveExecutor runs the readouts (never the FX thread in the application)
     * @param publishExecutor runs the merges and the sink (the FX thread in the application)
     * @param sink receives every evaluation published, on the publish executor
     */
    public Evaluations(ReadoutSource readouts, Analyses analyses, Executor solveExecutor, Executor publishExecutor,
                       Consumer<Evaluation> sink) {
        this.readouts = readouts;
        this.analyses = analyses;
        this.publishExecutor = publishExecutor;
        this.sink = sink;
        this.solves = new LatestWins(solveExecutor);
        this.verdictRuns = new LatestWins(analyses.executor(), analyses.settleMillis());
        this.edgeRuns = new LatestWins(analyses.edgeExecutor(), analyses.edgeSettleMillis());
    }

    /** The last evaluation published; empty before the first submit. */
    public Optional<Evaluation> current() {
        return Optional.ofNullable(current);
    }

    /** The generation of the last stage version submitted. */
    public long requestedGeneration() {
        return generation;
    }

    /**
     * Starts the evaluation of a stage version: validates it, publishes it as pending and queues its
     * readouts, verdicts and edges. Call on the publish thread.
     *
     * @return the new generation
     */
    public long submit(Stage stage) {
        long gen = ++generation;
        List<Finding> validation = Validator.validate(stage);
        Evaluation pending = Evaluation.pending(gen, stage, validation);
        boolean solvable = !pending.hasErrors();
        if (!analyses.active()) {
            pending = pending.withVerdicts(Analyses.Verdicts.NONE).withEdges(Analyses.Edges.NONE);
        }
        publish(pending);
        solves.submit(() -> {
            ReadoutSource.Readouts r = readouts.compute(stage);
            merge(gen, e -> e.withReadouts(r));
        });
        if (analyses.active()) {
            verdictRuns.submit(() -> {
                Analyses.Verdicts v = solvable ? analyses.verdicts().compute(stage)
                        : new Analyses.Verdicts(Optional.empty(), "Not judged: the stage has errors");
                merge(gen, e -> e.withVerdicts(v));
            });
            edgeRuns.submit(() -> {
                Analyses.Edges ed = solvable ? analyses.edges().compute(stage)
                        : new Analyses.Edges(Optional.empty(), Optional.empty(), "Not run: the stage has errors");
                merge(gen, e -> e.withEdges(ed));
            });
        }
        return gen;
    }

    /** Publishes a part of generation {@code gen} unless a newer generation was submitted meanwhile. */
    private void merge(long gen, UnaryOperator<Evaluation> part) {
        publishExecutor.execute(() -> {
            if (current != null && current.generation() == gen) {
                publish(part.apply(current));
            }
        });
    }

    private void publish(Evaluation e) {
        current = e;
        sink.accept(e);
    }
}
