package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.armature.model.HighSideDrive;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AutosaveTest {

    @TempDir
    Path dir;

    private static final StageDocument DOC = StageDocument.of(Templates.defaultStage());
    private static final StageDocument OTHER = StageDocument.of(
            Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT));

    @Test
    @DisplayName("reproduction: valves.json and valves.stage.json no longer share one autosave")
    void distinctKeys() {
        Path a = dir.resolve("valves.json");
        Path b = dir.resolve("valves.stage.json");
        Path c = dir.resolve("sub").resolve("valves.stage.json");
        assertNotEquals(Autosave.keyFor(a), Autosave.keyFor(b));
        assertNotEquals(Autosave.keyFor(b), Autosave.keyFor(c));
        assertEquals(Autosave.keyFor(b), Autosave.keyFor(dir.resolve("x").resolve("..").resolve("valves.stage.json")),
                "the same file by another spelling of its path has the same key");
        Autosave store = new Autosave(dir.resolve("recovery"));
        store.write(DOC, Optional.of(a), "s1");
        store.write(OTHER, Optional.of(b), "s1");
        List<Autosave.Recovery> pending = store.pending();
        assertEquals(2, pending.size());
        for (Autosave.Recovery r : pending) {
            StageDocument expected = r.original().orElseThrow().equals(a.toAbsolutePath()) ? DOC : OTHER;
            assertEquals(expected, store.read(r));
        }
    }

    @Test
    @DisplayName("untitled work is keyed by the window's id and offered with no original file")
    void untitled() {
        Autosave store = new Autosave(dir.resolve("r"));
        String id = Autosave.newUntitledId();
        String key = store.write(DOC, Optional.empty(), id);
        assertEquals(Autosave.untitledKey(id), key);
        Autosave.Recovery r = store.pending().get(0);
        assertEquals(Optional.empty(), r.original());
        assertEquals(Optional.empty(), r.savedAt());
        assertEquals(DOC, store.read(r));
        assertThrows(IllegalArgumentException.class, () -> Autosave.untitledKey("../x"));
    }

    @Test
    @DisplayName("the recovery folder is per user and the system property moves it")
    void folder() {
        String before = System.getProperty(Autosave.FOLDER_PROPERTY);
        try {
            System.setProperty(Autosave.FOLDER_PROPERTY, dir.resolve("elsewhere").toString());
            assertEquals(dir.resolve("elsewhere"), Autosave.userFolder());
            System.clearProperty(Autosave.FOLDER_PROPERTY);
            assertTrue(Autosave.userFolder().toString().toLowerCase().contains("armature"));
        } finally {
            if (before != null) {
                System.setProperty(Autosave.FOLDER_PROPERTY, before);
            }
        }
    }

    @Test
    @DisplayName("discard removes the autosave (after a save or when the work is thrown away)")
    void discard() throws IOException {
        Autosave store = new Autosave(dir.resolve("r"));
        Path file = dir.resolve("pump.stage.json");
        StageFiles.save(DOC, file);
        String key = store.write(OTHER, Optional.of(file), "s");
        Autosave.Recovery r = store.pending().get(0);
        assertTrue(r.savedAt().isPresent(), "the original's save time is reported beside the autosave time");
        assertTrue(store.exists(key));
        store.discard(key);
        assertFalse(store.exists(key));
        assertEquals(List.of(), store.pending());
        store.discard(key);
        try (var s = Files.list(store.folder())) {
            assertEquals(0, s.count(), "no origin file or backup is left");
        }
    }

    @Test
    @DisplayName("a broken entry in the recovery folder is left out, not a reason to fail")
    void brokenEntry() throws IOException {
        Autosave store = new Autosave(dir.resolve("r"));
        store.write(DOC, Optional.empty(), "good");
        Files.writeString(store.folder().resolve("notakey.stage.json"), "x", StandardCharsets.UTF_8);
        assertEquals(1, store.pending().size());
    }

    @Test
    @DisplayName("a save interrupted at any step, then recovery: the autosaved state comes back whole")
    void interruptedSaveThenRecovery() throws IOException {
        Autosave store = new Autosave(dir.resolve("r"));
        Path file = dir.resolve("valves.stage.json");
        StageFiles.save(DOC, file);
        store.write(OTHER, Optional.of(file), "s");
        byte[] content = StageJson.write(OTHER).getBytes(StandardCharsets.UTF_8);
        for (SafeWrite.Step step : SafeWrite.Step.values()) {
            if (step == SafeWrite.Step.CLEAN_STALE || step == SafeWrite.Step.SYNC_FOLDER) {
                continue;
            }
            SafeWrite failing = new SafeWrite(s -> {
                if (s == step) {
                    throw new IOException("Input/output error");
                }
            });
            assertThrows(StageFileException.class, () -> failing.run(file, out -> out.write(content), true));
            assertEquals(DOC, StageFiles.open(file), "old file intact after a failure at " + step);
            Autosave.Recovery r = store.pending().get(0);
            assertEquals(OTHER, store.read(r), "the unsaved work is recoverable after a failure at " + step);
        }
    }
}
