package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicInteger;
import org.armature.analysis.LineUpMetrics;
import org.armature.analysis.LineUpMetrics.Column;
import org.armature.analysis.LineUpMetrics.Phase;
import org.armature.analysis.LineUpMetrics.PhaseResult;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.ParamKeys;
import org.armature.model.SharedPart;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageRecognition;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@link LineUpEvaluations}: the phased figures are {@link LineUpMetrics#evaluate}'s to the last bit,
 * and, with the fast, slow and publish queues stepped by hand, a result of an older change never
 * reaches the sink once a newer change was submitted.
 */
class LineUpEvaluationsTest {

    /** The four templates in one line-up on the first one's relay, supply and pin, at this coil supply. */
    private static List<LineUpContext.Applied> fourTemplates(double supplyVolts) {
        List<Stage> stages = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            stages.add(Templates.build(t));
        }
        LineUpContext c = LineUpContext.of(stages.get(0));
        SharedPart supply = c.coilSupply().orElseThrow().with(ParamKeys.VOLTS, supplyVolts);
        StageDocument doc = new StageDocument("four", stages,
                Optional.of(new LineUp(List.of(0, 1, 2, 3), c.withCoilSupply(supply))));
        return doc.lineUp().orElseThrow().applied(doc);
    }

    @Test
    @DisplayName("the phased evaluation of the four templates gives exactly LineUpMetrics.evaluate's columns")
    void phasedEqualsEvaluate() {
        List<LineUpContext.Applied> stages = fourTemplates(12.5);
        List<LineUpProgress> published = new ArrayList<>();
        // same-thread executors: the window's order (every DC, every turn-off, every turn-on, then the checks)
        LineUpEvaluations ev = new LineUpEvaluations(LineUpEvaluations.ENGINE, Runnable::run, Runnable::run,
                Runnable::run);
        ev.submit(stages, published::add, m -> {
            throw new AssertionError(m);
        });
        LineUpProgress last = published.get(published.size() - 1);
        assertTrue(last.complete());
        assertEquals(1 + 4 * Phase.values().length, published.size(), "the pending progress, then one per phase and stage");
        List<Column> phased = last.columns();
        for (int i = 0; i < stages.size(); i++) {
            // the reference: the commands' numbers, one stage at a time (CompareCommandTest ties evaluate to them)
            Column whole = LineUpMetrics.evaluate(stages.get(i));
            Column p = phased.get(i);
            String name = stages.get(i).stage().name();
            assertEquals(whole.values(), p.values(), name + ": every figure, bit for bit");
            assertEquals(whole.switchFullyOn(), p.switchFullyOn(), name);
            assertEquals(whole.report(), p.report(), name + ": the checks and the yield");
            assertEquals(whole.notes(), p.notes(), name);
            assertEquals(whole.phases(), p.phases(), name);
            assertTrue(whole.turnOff().isPresent() && p.turnOff().isPresent(), name + ": both ran the turn-off");
            assertArrayEquals(whole.turnOff().get().time(), p.turnOff().get().time(), name + ": the waveform's time points");
            assertEquals(whole.turnOff().get().traces(), p.turnOff().get().traces(), name + ": the waveform's traces");
            assertEquals(whole.turnOff().get().events(), p.turnOff().get().events(), name + ": its events");
        }
    }

    /** The coil supply a stage was judged at; the fake phases stamp it into every figure they give. */
    private static double supplyOf(Stage s) {
        String ref = StageRecognition.of(s).roles().orElseThrow().coilSupplyRef().orElseThrow();
        return s.require(ref).value(ParamKeys.VOLTS);
    }

    /** Phases that return the stage's supply as every figure, and count their runs. */
    private static final class StampingPhases implements LineUpEvaluations.PhaseRunner {
        final Map<Phase, AtomicInteger> runs = Map.of(Phase.DC, new AtomicInteger(), Phase.TURN_OFF,
                new AtomicInteger(), Phase.TURN_ON, new AtomicInteger(), Phase.CHECKS, new AtomicInteger());

        private PhaseResult stamp(Phase phase, Stage s) {
            runs.get(phase).incrementAndGet();
            Map<String, Double> v = new java.util.LinkedHashMap<>();
            LineUpMetrics.METRICS.stream().filter(m -> LineUpMetrics.phaseOf(m) == phase)
                    .forEach(m -> v.put(m.key(), supplyOf(s)));
            return new PhaseResult(phase, v, Optional.empty(), Optional.empty(), Optional.empty(), List.of());
        }

        @Override
        public PhaseResult dc(Stage stage) {
            return stamp(Phase.DC, stage);
        }

        @Override
        public PhaseResult turnOff(Stage stage) {
            return stamp(Phase.TURN_OFF, stage);
        }

        @Override
        public PhaseResult turnOn(Stage stage, PhaseResult turnOff) {
            return stamp(Phase.TURN_ON, stage);
        }

        @Override
        public PhaseResult checks(Stage stage) {
            return stamp(Phase.CHECKS, stage);
        }
    }

    private static void drain(Deque<Runnable> q) {
        while (!q.isEmpty()) {
            q.poll().run();
        }
    }

    @Test
    @DisplayName("an older change's late results are dropped, and its checks never start")
    void olderGenerationDropped() {
        Deque<Runnable> fast = new ArrayDeque<>();
        Deque<Runnable> slow = new ArrayDeque<>();
        Deque<Runnable> fx = new ArrayDeque<>();
        StampingPhases phases = new StampingPhases();
        LineUpEvaluations ev = new LineUpEvaluations(phases, fast::add, slow::add, fx::add);
        List<LineUpProgress> published = new ArrayList<>();
        List<LineUpContext.Applied> a = fourTemplates(12.0);
        List<LineUpContext.Applied> b = fourTemplates(13.0);

        long genA = ev.submit(a, published::add, m -> { });
        drain(fast); // A's DC, turn-off and turn-on runs finish and wait to be published; its checks are queued
        assertEquals(4, slow.size(), "one checks job per stage, queued after the turn-on runs");
        assertEquals(12, fx.size(), "three phases of four stages wait for the FX thread");
        long genB = ev.submit(b, published::add, m -> { });
        assertTrue(genB > genA);
        drain(fx); // A's results arrive late
        drain(slow); // A's checks jobs: stale, they do not run
        assertEquals(0, phases.runs.get(Phase.CHECKS).get(), "the older change's checks never ran");
        assertEquals(List.of(genA, genB), published.stream().map(LineUpProgress::generation).toList(),
                "nothing of A was published after B was submitted; only the two pending progresses");
        assertTrue(published.get(1).done().stream().allMatch(List::isEmpty), "B starts with every phase pending");

        drain(fast);
        drain(fx);
        drain(slow);
        drain(fx);
        LineUpProgress last = published.get(published.size() - 1);
        assertEquals(genB, last.generation());
        assertTrue(last.complete());
        for (Column c : last.columns()) {
            for (LineUpMetrics.Metric m : LineUpMetrics.METRICS) {
                assertEquals(13.0, c.value(m.key()), m.key() + ": every figure from B's stages");
            }
        }
    }

    @Test
    @DisplayName("the view's order: every stage's turn-off is published before any checks start")
    void turnOffBeforeChecks() {
        Deque<Runnable> fast = new ArrayDeque<>();
        Deque<Runnable> slow = new ArrayDeque<>();
        List<LineUpProgress> published = new ArrayList<>();
        LineUpEvaluations ev = new LineUpEvaluations(new StampingPhases(), fast::add, slow::add, Runnable::run);
        ev.submit(fourTemplates(12.0), published::add, m -> { });
        drain(fast);
        LineUpProgress beforeChecks = published.get(published.size() - 1);
        assertTrue(beforeChecks.hasAll(Phase.TURN_OFF) && beforeChecks.hasAll(Phase.TURN_ON));
        assertFalse(beforeChecks.hasAll(Phase.CHECKS));
        int firstOff = indexWhere(published, p -> p.hasAll(Phase.TURN_OFF));
        int firstOn = indexWhere(published, p -> p.has(0, Phase.TURN_ON));
        assertTrue(indexWhere(published, p -> p.hasAll(Phase.DC)) < firstOff);
        assertTrue(firstOff < firstOn, "the waveforms come before the operate times");
        drain(slow);
        assertTrue(published.get(published.size() - 1).complete());
    }

    private static int indexWhere(List<LineUpProgress> ps, java.util.function.Predicate<LineUpProgress> p) {
        for (int i = 0; i < ps.size(); i++) {
            if (p.test(ps.get(i))) {
                return i;
            }
        }
        throw new AssertionError("never");
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6})
    @DisplayName("whatever order the queues run in, a published progress holds only its own change's figures")
    void neverMixes(long seed) {
        Deque<Runnable> fast = new ArrayDeque<>();
        Deque<Runnable> slow = new ArrayDeque<>();
        Deque<Runnable> fx = new ArrayDeque<>();
        LineUpEvaluations ev = new LineUpEvaluations(new StampingPhases(), fast::add, slow::add, fx::add);
        List<LineUpProgress> published = new ArrayList<>();
        Map<Long, Double> supplyOfGeneration = new java.util.HashMap<>();
        SplittableRandom rnd = new SplittableRandom(seed);
        List<List<LineUpContext.Applied>> choices = List.of(fourTemplates(11.0), fourTemplates(12.0), fourTemplates(13.0));
        for (int step = 0; step < 300; step++) {
            int what = rnd.nextInt(5);
            if (what == 0) {
                int k = rnd.nextInt(choices.size());
                long g = ev.submit(choices.get(k), published::add, m -> { });
                supplyOfGeneration.put(g, 11.0 + k);
            } else {
                Deque<Runnable> q = what == 1 ? fast : what == 2 ? slow : fx;
                if (!q.isEmpty()) {
                    q.poll().run();
                }
            }
        }
        while (!fast.isEmpty() || !slow.isEmpty() || !fx.isEmpty()) {
            for (Deque<Runnable> q : List.of(fast, slow, fx)) {
                if (!q.isEmpty()) {
                    q.poll().run();
                }
            }
        }
        assertFalse(published.isEmpty());
        long lastGeneration = 0;
        for (LineUpProgress p : published) {
            assertTrue(p.generation() >= lastGeneration, "generations never go back");
            lastGeneration = p.generation();
            double own = supplyOfGeneration.get(p.generation());
            for (Column c : p.columns()) {
                for (LineUpMetrics.Metric m : LineUpMetrics.METRICS) {
                    if (!c.pending(m)) {
                        assertEquals(own, c.value(m.key()), "generation " + p.generation() + ", " + m.key());
                    }
                }
            }
        }
        LineUpProgress last = published.get(published.size() - 1);
        assertEquals(ev.generation(), last.generation());
        assertTrue(last.complete(), "the newest change finishes");
    }
}
