package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.FaultHunt;
import org.armature.model.HighSideDrive;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The fault hunt as document state of the view model, without the toolkit: what the technician
 * enters is the document's {@link FaultHunt}, each change an undoable step of the stage in the
 * user's words, the document marked modified; opening a document restores it; moving and deleting
 * stages keep its stage index right. In-memory documents only (the file format is another change).
 */
class FaultHuntDocumentTest {

    private static EditorViewModel vm(MainWindowTest.MemoryStore store) {
        return new EditorViewModel(Templates.defaultStage(), store, ReadoutSource.NONE, Runnable::run, Runnable::run);
    }

    @Test
    @DisplayName("a reading entered is the document's hunt, marks it modified, and undoes in the user's words")
    void readingIsDocumentStateAndUndoable() {
        EditorViewModel vm = vm(new MainWindowTest.MemoryStore());
        assertEquals(Optional.empty(), vm.document().faultHunt());
        assertFalse(vm.dirtyProperty().get());
        assertTrue(vm.addReading(new FaultHunt.HuntReading("switch", true, 11.9)));
        FaultHunt h = vm.document().faultHunt().orElseThrow();
        assertEquals(0, h.stageIndex());
        assertEquals(List.of(new FaultHunt.HuntReading("switch", true, 11.9)), h.readings());
        assertTrue(vm.dirtyProperty().get());
        assertEquals("Undo Add reading switch@high", vm.undoLabelProperty().get());
        // the same point and state again replaces the reading
        vm.addReading(new FaultHunt.HuntReading("switch", true, 12.0));
        assertEquals("Undo Change reading switch@high", vm.undoLabelProperty().get());
        assertEquals(12.0, vm.document().faultHunt().orElseThrow().readings().get(0).volts(), 0);
        vm.undo();
        assertEquals(11.9, vm.document().faultHunt().orElseThrow().readings().get(0).volts(), 0);
        vm.undo();
        assertEquals(Optional.empty(), vm.document().faultHunt(), "nothing entered is no hunt");
        assertFalse(vm.dirtyProperty().get());
        vm.redo();
        assertEquals(List.of(new FaultHunt.HuntReading("switch", true, 11.9)),
                vm.document().faultHunt().orElseThrow().readings());
        // the reading is drawn at its net
        assertEquals(List.of(new Annotations.MeterReading("switch", true, 11.9)), vm.annotations().readings());
    }

    @Test
    @DisplayName("symptom, meter and prior weights are kept, each an undoable step named by what changed")
    void symptomMeterAndPriors() {
        EditorViewModel vm = vm(new MainWindowTest.MemoryStore());
        vm.setSymptom(Optional.of("no-operate"));
        assertEquals("Undo Symptom no symptom → no-operate", vm.undoLabelProperty().get());
        vm.setMeter(new FaultHunt.MeterSetting(1e6, 4000, 1, 2));
        assertEquals("Undo Meter input 10 MΩ → 1 MΩ", vm.undoLabelProperty().get());
        vm.setPriorWeight("ce-short", 2.0, 5);
        assertEquals("Undo Prior weight ce-short 2 → 5", vm.undoLabelProperty().get());
        FaultHunt h = vm.document().faultHunt().orElseThrow();
        assertEquals(Optional.of("no-operate"), h.symptom());
        assertEquals(1e6, h.meter().inputOhms(), 0);
        assertEquals(Map.of("ce-short", 5.0), h.priorWeights());
        // a weight set back to its default is no change kept
        vm.setPriorWeight("ce-short", 2.0, 2.0);
        assertEquals(Map.of(), vm.document().faultHunt().orElseThrow().priorWeights());
        vm.undo();
        vm.resetPriorWeights();
        assertEquals("Undo Reset prior weights", vm.undoLabelProperty().get());
        assertEquals(Map.of(), vm.document().faultHunt().orElseThrow().priorWeights());
        vm.undo();
        assertEquals(Map.of("ce-short", 5.0), vm.document().faultHunt().orElseThrow().priorWeights());
    }

    @Test
    @DisplayName("opening a document restores its hunt on its stage; moving and deleting stages keep the index right")
    void openMoveDelete() {
        MainWindowTest.MemoryStore store = new MainWindowTest.MemoryStore();
        FaultHunt saved = FaultHunt.start(1).withSymptom(Optional.of("no-release"))
                .withReadings(List.of(new FaultHunt.HuntReading("control", false, 0.02)))
                .withPriorWeights(Map.of("none", 3.0));
        StageDocument doc = new StageDocument("bench", List.of(Templates.defaultStage(),
                Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT).withName("second")),
                Optional.empty(), Optional.of(saved));
        Path file = Path.of("bench.stage.json");
        store.files.put(file, doc);
        EditorViewModel vm = vm(store);
        assertTrue(vm.open(file));
        assertEquals(Optional.of(saved), vm.document().faultHunt(), "opened as saved");
        assertFalse(vm.dirtyProperty().get());
        // the first stage is active: its pane is empty and says where the hunt is
        assertEquals(Optional.empty(), vm.faultHuntProperty().get());
        assertEquals(Optional.of("second"), vm.huntElsewhere());
        assertFalse(vm.addReading(new FaultHunt.HuntReading("switch", true, 1)), "one hunt per document");
        assertTrue(vm.messageProperty().get().contains("\"second\""), vm.messageProperty().get());
        vm.selectStage(1);
        assertEquals(Optional.of(saved), vm.faultHuntProperty().get());
        // moved to the front: the hunt's index follows its stage
        vm.moveStage(-1);
        assertEquals(0, vm.document().faultHunt().orElseThrow().stageIndex());
        assertEquals("second", vm.document().stages().get(0).name());
        vm.moveStage(1);
        assertEquals(1, vm.document().faultHunt().orElseThrow().stageIndex());
        // the other stage deleted: the hunt moves down to index 0
        vm.selectStage(0);
        assertTrue(vm.deleteStage());
        assertEquals(0, vm.document().faultHunt().orElseThrow().stageIndex());
        assertEquals(saved.readings(), vm.document().faultHunt().orElseThrow().readings());
        // the hunted stage deleted (after another is added): the hunt goes with it, and says so
        vm.duplicateStage();
        vm.selectStage(0);
        assertTrue(vm.deleteStage());
        assertTrue(vm.messageProperty().get().contains("fault hunt"), vm.messageProperty().get());
        assertEquals(Optional.empty(), vm.document().faultHunt());
        // and brought back with its stage, at its place
        assertTrue(vm.restoreDeletedStage());
        assertEquals(0, vm.document().faultHunt().orElseThrow().stageIndex());
        assertEquals("second", vm.document().stages().get(0).name());
        assertEquals(saved.readings(), vm.document().faultHunt().orElseThrow().readings());
        assertTrue(vm.restoreDeletedStage(), "the first deleted stage comes back too");
        assertEquals(3, vm.document().stages().size());
        assertFalse(vm.restoreDeletedStage());
    }

    @Test
    @DisplayName("an SVG export of the hunted stage tags the readings at their net; another stage's export does not")
    void exportDrawsTheReadings() {
        EditorViewModel vm = vm(new MainWindowTest.MemoryStore());
        vm.addReading(new FaultHunt.HuntReading("switch", true, 11.9));
        StageDocument doc = vm.document();
        ExportDialog.Choice c = new ExportDialog.Choice(ExportDialog.Format.SVG, 1, false,
                org.armature.render.ExportTheme.LIGHT, true, true, true, Path.of("x.svg"));
        String svg = new String(ExportDialog.render(c, doc, doc.stages().get(0), java.time.LocalDate.of(2026, 12, 5)),
                java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(svg.contains("11.9 V"), "the reading's value is drawn");
        StageDocument without = doc.withFaultHunt(Optional.empty());
        String plain = new String(ExportDialog.render(c, without, without.stages().get(0),
                java.time.LocalDate.of(2026, 12, 5)), java.nio.charset.StandardCharsets.UTF_8);
        assertFalse(plain.contains("11.9 V"), "no hunt, no reading tag");
    }
}
