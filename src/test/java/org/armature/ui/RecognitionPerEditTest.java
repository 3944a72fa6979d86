package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.ParamKeys;
import org.armature.model.StageRecognition;
import org.armature.model.Templates;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The stage's roles and nets are found once per drawing, not once per value edit: the window's
 * whole pipeline (validation, topology check, both pin states' solves, readouts, corner checks and
 * edges) runs on same-thread executors and {@link StageRecognition#computedOnThisThread()} counts
 * what was found anew. Failed before the fix: only the nets were memoized, and the topology check,
 * the readout builder, the corner checks and the edge runs each found the roles again (with the
 * memo switched off this test counts 48 recognitions for the four value edits).
 */
class RecognitionPerEditTest {

    @Test
    @DisplayName("value edits find no roles anew; a move finds them once for the whole pipeline")
    void oncePerDrawing() {
        Analyses analyses = new Analyses(Analyses.engineVerdicts(), Analyses.engineEdges(), Runnable::run, 0);
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, new EngineReadouts(),
                Runnable::run, Runnable::run, analyses);
        assertTrue(vm.evaluation().readoutsReady(), vm.evaluation().status());
        long before = StageRecognition.computedOnThisThread();
        vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 1500);
        vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 2200);
        vm.setValue("Q1", ParamKeys.HFE_MIN, 80);
        vm.setPinHigh(false);
        assertTrue(vm.evaluation().readoutsReady() && vm.evaluation().verdicts().isPresent()
                && vm.evaluation().edges().isPresent(), "every part of the evaluation ran");
        assertEquals(before, StageRecognition.computedOnThisThread(), "four value and condition edits: no recognition");

        vm.select(Selection.ofPart("R1"));
        vm.moveSelection(0, -1);
        assertTrue(vm.evaluation().readoutsReady(), vm.evaluation().status());
        assertEquals(before + 1, StageRecognition.computedOnThisThread(), "a move changes the drawing: one recognition");
        vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 1000);
        assertEquals(before + 1, StageRecognition.computedOnThisThread(), "and the next value edit none");
    }
}
