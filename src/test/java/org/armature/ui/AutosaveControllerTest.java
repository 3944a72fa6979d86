package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.armature.io.Autosave;
import org.armature.io.StageFiles;
import org.armature.model.ParamKeys;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Autosave in the window, without the toolkit: what is written, when it is removed, and recovery
 * after a crash (reproduction of issue 15: nothing in the application called the autosave API).
 */
class AutosaveControllerTest {

    @TempDir
    Path dir;

    private static final ReadoutSource NONE = st -> new ReadoutSource.Readouts(Annotations.NONE, "");

    private EditorViewModel vm() {
        return new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, NONE, r -> { }, Runnable::run);
    }

    @Test
    @DisplayName("unsaved work is autosaved; clean work is not; a save removes the autosave")
    void autosaveAndSave() {
        Autosave store = new Autosave(dir.resolve("recovery"));
        EditorViewModel vm = vm();
        AutosaveController c = new AutosaveController(vm, store);
        assertFalse(c.autosaveNow(), "nothing to keep before an edit");
        vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 2200);
        assertTrue(c.autosaveNow());
        assertTrue(store.exists(c.key()));
        Path file = dir.resolve("valves.stage.json");
        assertTrue(vm.saveAs(file));
        assertEquals(Autosave.keyFor(file), c.key(), "the key follows the file");
        assertEquals(List.of(), store.pending(), "saving removed the untitled autosave and left none for the file");
        vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 3300);
        c.autosaveNow();
        assertEquals(Optional.of(file.toAbsolutePath()), store.pending().get(0).original());
        vm.undo();
        assertFalse(vm.dirtyProperty().get());
        assertEquals(List.of(), store.pending(), "back at the saved state: the autosave goes");
    }

    @Test
    @DisplayName("after a crash the next window offers the work with its file, unsaved, and saving clears it")
    void recoveryAfterCrash() {
        Autosave store = new Autosave(dir.resolve("recovery"));
        Path file = dir.resolve("pump.stage.json");
        StageFiles.save(StageDocument.of(Templates.defaultStage()), file);
        EditorViewModel first = vm();
        AutosaveController crashed = new AutosaveController(first, store);
        assertTrue(first.open(file));
        first.setValue("R1", ParamKeys.RESISTANCE_OHMS, 4700);
        crashed.autosaveNow();
        // the process dies here: no stop(), no save

        EditorViewModel next = vm();
        AutosaveController c = new AutosaveController(next, store);
        List<Autosave.Recovery> pending = c.pending();
        assertEquals(1, pending.size());
        assertTrue(AutosaveController.question(pending.get(0)).contains("pump.stage.json"));
        assertTrue(AutosaveController.question(pending.get(0)).contains("autosaved"));
        assertTrue(c.recover(pending.get(0)));
        assertEquals(4700, next.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 0.0);
        assertTrue(next.dirtyProperty().get(), "recovered work is unsaved");
        assertEquals(Optional.of(file.toAbsolutePath()), next.fileProperty().get().map(Path::toAbsolutePath));
        assertTrue(next.save());
        assertEquals(List.of(), store.pending());
        assertEquals(4700, StageFiles.open(file).first().require("R1").value(ParamKeys.RESISTANCE_OHMS), 0.0);
    }

    @Test
    @DisplayName("untitled work recovers under the new window's id; discard and a normal close remove autosaves")
    void untitledAndDiscard() {
        Autosave store = new Autosave(dir.resolve("recovery"));
        EditorViewModel a = vm();
        AutosaveController ca = new AutosaveController(a, store);
        a.setValue("R1", ParamKeys.RESISTANCE_OHMS, 5600);
        ca.autosaveNow();
        EditorViewModel b = vm();
        AutosaveController cb = new AutosaveController(b, store);
        b.setValue("R1", ParamKeys.RESISTANCE_OHMS, 6800);
        cb.autosaveNow();

        EditorViewModel next = vm();
        AutosaveController c = new AutosaveController(next, store);
        assertEquals(2, c.pending().size());
        Autosave.Recovery newest = c.pending().get(0);
        assertTrue(c.recover(newest));
        assertEquals(1, c.pending().size(), "the recovered entry moved to this window's own key");
        c.discard(c.pending().get(0));
        assertEquals(List.of(), c.pending());
        c.stop();
        assertEquals(List.of(), store.pending(), "a normal close leaves nothing");
    }

    @Test
    @DisplayName("the start-up question: later keeps, discard removes, recover shows the work and stops asking")
    void startUpQuestion() {
        Autosave store = new Autosave(dir.resolve("recovery"));
        for (int i = 0; i < 3; i++) {
            EditorViewModel crashed = vm();
            AutosaveController c = new AutosaveController(crashed, store);
            crashed.setValue("R1", ParamKeys.RESISTANCE_OHMS, 1100 + i);
            c.autosaveNow();
        }
        EditorViewModel next = vm();
        AutosaveController c = new AutosaveController(next, store);
        java.util.List<AutosaveController.Choice> answers = new java.util.ArrayList<>(
                List.of(AutosaveController.Choice.LATER, AutosaveController.Choice.DISCARD,
                        AutosaveController.Choice.RECOVER));
        java.util.List<String> asked = new java.util.ArrayList<>();
        c.offerRecovery(r -> {
            asked.add(r.key());
            return answers.remove(0);
        });
        assertEquals(3, asked.size());
        assertTrue(next.dirtyProperty().get(), "the third was recovered");
        assertEquals(2, store.pending().size(), "the one kept for later and this window's own");
        assertTrue(store.exists(asked.get(0)), "later keeps it");
        assertFalse(store.exists(asked.get(1)), "discard removes it");
    }
}
