package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import org.armature.analysis.CheckReport;
import org.armature.model.ParamKeys;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@link Evaluations} driven by hand: the solve, analyses and publish queues are stepped in a
 * seeded random order, interleaved with new stage versions, and every evaluation published must
 * hold readouts, verdicts and edges computed from its own stage only.
 */
class EvaluationsTest {

    /** The R1 value of a stage: each source stamps it into what it returns. */
    private static double r1(Stage s) {
        return s.require("R1").value(ParamKeys.RESISTANCE_OHMS);
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    @DisplayName("an evaluation never mixes generations, whatever order the executors run in")
    void neverMixes(long seed) {
        Deque<Runnable> solves = new ArrayDeque<>();
        Deque<Runnable> slow = new ArrayDeque<>();
        Deque<Runnable> fx = new ArrayDeque<>();
        ReadoutSource readouts = st -> new ReadoutSource.Readouts(new Annotations(
                List.of(new Annotations.NodeVoltage("r1", r1(st))), List.of(), List.of(), List.of(), List.of()),
                "R1 " + r1(st));
        Analyses analyses = new Analyses(st -> new Analyses.Verdicts(Optional.<CheckReport>empty(), "R1 " + r1(st)),
                st -> new Analyses.Edges(Optional.empty(), Optional.empty(), "R1 " + r1(st)), slow::add, 0);
        List<Evaluation> published = new ArrayList<>();
        Evaluations ev = new Evaluations(readouts, analyses, solves::add, fx::add, published::add);
        SplittableRandom rnd = new SplittableRandom(seed);
        Stage base = Templates.defaultStage();
        for (int step = 0; step < 400; step++) {
            int what = rnd.nextInt(4);
            if (what == 0 && published.size() < 300) {
                // the publish thread is also where edits happen
                double r = 1000 + rnd.nextInt(1000);
                ev.submit(base.updatePart("R1", p -> p.with(ParamKeys.RESISTANCE_OHMS, r)));
            } else {
                Deque<Runnable> q = what == 1 ? solves : what == 2 ? slow : fx;
                if (!q.isEmpty()) {
                    q.poll().run();
                }
            }
        }
        while (!solves.isEmpty() || !slow.isEmpty() || !fx.isEmpty()) {
            for (Deque<Runnable> q : List.of(solves, slow, fx)) {
                if (!q.isEmpty()) {
                    q.poll().run();
                }
            }
        }
        assertFalse(published.isEmpty());
        long lastGeneration = 0;
        for (Evaluation e : published) {
            String own = "R1 " + r1(e.stage());
            e.readouts().ifPresent(r -> assertEquals(own, r.status(), "readouts of generation " + e.generation()));
            e.verdicts().ifPresent(v -> assertEquals(own, v.status(), "verdicts of generation " + e.generation()));
            e.edges().ifPresent(x -> assertEquals(own, x.status(), "edges of generation " + e.generation()));
            assertTrue(e.generation() >= lastGeneration, "generations never go back");
            lastGeneration = e.generation();
        }
        Evaluation last = published.get(published.size() - 1);
        assertEquals(ev.requestedGeneration(), last.generation(), "the newest generation is the last published");
        assertTrue(last.readoutsReady() && last.verdicts().isPresent() && last.edges().isPresent(),
                "once the queues are empty the newest evaluation is whole");
    }

    @org.junit.jupiter.api.Test
    @DisplayName("the edges run on their own executor: published while the verdicts of the same generation still wait")
    void edgesDoNotWaitForVerdicts() {
        Deque<Runnable> verdictQueue = new ArrayDeque<>();
        Deque<Runnable> edgeQueue = new ArrayDeque<>();
        ReadoutSource readouts = st -> new ReadoutSource.Readouts(new Annotations(
                List.of(), List.of(), List.of(), List.of(), List.of()), "R1 " + r1(st));
        Analyses analyses = new Analyses(st -> new Analyses.Verdicts(Optional.<CheckReport>empty(), "R1 " + r1(st)),
                st -> new Analyses.Edges(Optional.empty(), Optional.empty(), "R1 " + r1(st)), verdictQueue::add, 350,
                edgeQueue::add, 0);
        List<Evaluation> published = new ArrayList<>();
        Evaluations ev = new Evaluations(readouts, analyses, Runnable::run, Runnable::run, published::add);
        ev.submit(Templates.defaultStage());
        assertEquals(1, verdictQueue.size(), "the verdict run waits on its own executor");
        assertEquals(1, edgeQueue.size(), "the edge run is queued on the edges' executor, not behind the verdicts");
        edgeQueue.poll().run();
        Evaluation last = published.get(published.size() - 1);
        assertTrue(last.edges().isPresent(), "the edges are published");
        assertTrue(last.verdicts().isEmpty(), "while the verdicts are still pending");
        // the one-executor form keeps both on the same executor and settle time
        Analyses shared = new Analyses(Analyses.NO_VERDICTS, Analyses.NO_EDGES, Runnable::run, 7);
        assertEquals(shared.executor(), shared.edgeExecutor());
        assertEquals(7, shared.edgeSettleMillis());
    }
}
