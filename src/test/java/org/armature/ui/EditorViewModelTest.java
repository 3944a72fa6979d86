package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import org.armature.model.ParamKeys;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The solve seam of the view model, without the toolkit (JavaFX properties need none). */
class EditorViewModelTest {

    /** Readouts that tag the coil supply with the R1 value, so a result shows which stage it came from. */
    static final ReadoutSource MARKING = st -> new ReadoutSource.Readouts(
            new Annotations(List.of(new Annotations.NodeVoltage("supply", st.require("R1").value(ParamKeys.RESISTANCE_OHMS))),
                    List.of(), List.of(), List.of(), List.of()), "solved");

    @Test
    @DisplayName("readouts are computed on the solve executor and published through the FX executor")
    void solvesOffThread() {
        Deque<Runnable> solves = new ArrayDeque<>();
        Deque<Runnable> fx = new ArrayDeque<>();
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, MARKING, solves::add, fx::add);
        assertEquals(Annotations.NONE, vm.annotations(), "nothing before the solve ran");
        assertEquals(Evaluation.SOLVING, vm.evaluation().status());
        assertEquals(1, solves.size());
        solves.poll().run();
        assertTrue(vm.annotations().isEmpty(), "nothing before the FX thread publishes");
        fx.poll().run();
        assertEquals(1000, vm.annotations().voltages().get(0).volts(), 1e-12);
        assertEquals("solved", vm.evaluation().status());
    }

    @Test
    @DisplayName("a result of an older stage that is published after a newer edit is dropped")
    void staleResultDropped() {
        Deque<Runnable> solves = new ArrayDeque<>();
        Deque<Runnable> fx = new ArrayDeque<>();
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, MARKING, solves::add, fx::add);
        solves.poll().run();
        Runnable old = fx.poll();
        vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 2200);
        old.run();
        assertTrue(vm.annotations().isEmpty(), "the 1 kΩ result came after the 2.2 kΩ edit: dropped");
        assertEquals(vm.stage(), vm.evaluation().stage(), "the evaluation shown is of the newest stage, pending");
        solves.poll().run();
        fx.poll().run();
        assertEquals(2200, vm.annotations().voltages().get(0).volts(), 1e-12);
    }

    @Test
    @DisplayName("a drag of 50 steps while the solver is busy costs one more solve, of the latest stage")
    void dragCoalesces() {
        Deque<Runnable> solves = new ArrayDeque<>();
        Deque<Runnable> fx = new ArrayDeque<>();
        java.util.List<Double> solved = new java.util.ArrayList<>();
        ReadoutSource counting = st -> {
            solved.add(st.require("R1").value(ParamKeys.RESISTANCE_OHMS));
            return MARKING.compute(st);
        };
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, counting, solves::add, fx::add);
        for (int i = 1; i <= 50; i++) {
            vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 1000 + i);
        }
        assertEquals(1, solves.size(), "one drain task for the whole burst");
        solves.poll().run();
        assertEquals(java.util.List.of(1050.0), solved, "only the latest stage is solved");
        while (!fx.isEmpty()) {
            fx.poll().run();
        }
        assertEquals(1050, vm.annotations().voltages().get(0).volts(), 1e-12);
        assertEquals(vm.requestedGeneration(), vm.evaluation().generation());
    }

    @Test
    @DisplayName("the View toggles filter readouts without changing the document")
    void togglesFilter() {
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, MARKING, Runnable::run, Runnable::run);
        vm.showReadout(EditorViewModel.ReadoutKind.VOLTAGES, false);
        assertTrue(vm.annotations().voltages().isEmpty());
        vm.showReadout(EditorViewModel.ReadoutKind.VOLTAGES, true);
        assertEquals(1, vm.annotations().voltages().size());
        assertEquals(Templates.defaultStage(), vm.stage());
    }
}
