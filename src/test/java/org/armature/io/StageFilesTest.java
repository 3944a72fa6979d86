package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.armature.model.HighSideDrive;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StageFilesTest {

    @TempDir
    Path dir;

    private static final StageDocument DOC = StageDocument.of(Templates.defaultStage());
    private static final StageDocument OTHER = StageDocument.of(
            Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.TVS, HighSideDrive.LEVEL_SHIFT));

    private List<Path> listing() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }

    @Test
    @DisplayName("save then open gives an equal document, and saving again replaces the file")
    void saveOpenReplace() throws IOException {
        Path file = dir.resolve("a.stage.json");
        StageFiles.save(DOC, file);
        assertEquals(DOC, StageFiles.open(file));
        StageFiles.save(OTHER, file);
        assertEquals(OTHER, StageFiles.open(file));
        assertEquals(List.of(file), listing(), "no temporary file is left behind");
        assertEquals(StageJson.write(OTHER), Files.readString(file, StandardCharsets.UTF_8));
    }

    @Test
    @DisplayName("replacing a file keeps its permissions")
    void keepsPermissions() throws IOException {
        Path file = dir.resolve("p.stage.json");
        StageFiles.save(DOC, file);
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-rw----"));
        StageFiles.save(OTHER, file);
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
    }

    @Test
    @DisplayName("saving into a missing folder fails with file.unwritable and leaves nothing behind")
    void unwritable() throws IOException {
        Path file = dir.resolve("no-such-folder").resolve("a.stage.json");
        StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.save(DOC, file));
        assertEquals(StageFileException.UNWRITABLE, e.key());
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
        assertEquals(List.of(), listing());
    }

    @Test
    @DisplayName("a failed save leaves the previous file as it was")
    void failedSaveKeepsOldFile() throws IOException {
        Path file = dir.resolve("a.stage.json");
        StageFiles.save(DOC, file);
        Path blocker = dir.resolve("b.stage.json");
        Files.createDirectory(blocker);
        Files.writeString(blocker.resolve("inside"), "x");
        StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.save(OTHER, blocker));
        assertEquals(StageFileException.UNWRITABLE, e.key());
        assertEquals(DOC, StageFiles.open(file));
        assertEquals(List.of(file, blocker), listing());
    }

    @Test
    @DisplayName("opening a missing file gives file.not-found naming it")
    void notFound() {
        Path file = dir.resolve("gone.stage.json");
        StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.open(file));
        assertEquals(StageFileException.NOT_FOUND, e.key());
        assertTrue(e.getMessage().contains("gone.stage.json"), e.getMessage());
    }

    @Test
    @DisplayName("opening a folder gives file.unreadable")
    void folderIsUnreadable() {
        StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.open(dir));
        assertEquals(StageFileException.UNREADABLE, e.key());
    }

    @Test
    @DisplayName("a parse error from a file starts with the file name and keeps its key")
    void parseErrorNamesFile() throws IOException {
        Path file = dir.resolve("bad.stage.json");
        Files.writeString(file, "{\n  \"format\": \"armature-stage\",\n  \"version\": 7\n}\n");
        StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.open(file));
        assertEquals(StageFileException.NEWER_VERSION, e.key());
        assertTrue(e.getMessage().startsWith("bad.stage.json: The file was written by a newer Armature"),
                e.getMessage());
    }

    @Test
    @DisplayName("autosave sits beside the file: valves.stage.json -> valves.autosave.json")
    void autosaveName() {
        assertEquals(dir.resolve("valves.autosave.json"), Autosave.pathFor(dir.resolve("valves.stage.json")));
        assertEquals(dir.resolve("x.autosave.json"), Autosave.pathFor(dir.resolve("x.json")));
        assertEquals(dir.resolve("notes.autosave.json"), Autosave.pathFor(dir.resolve("notes")));
    }

    @Test
    @DisplayName("a newer autosave is offered for recovery; an older one is not; discard removes it")
    void recovery() throws IOException {
        Path file = dir.resolve("valves.stage.json");
        assertEquals(Optional.empty(), Autosave.find(file), "nothing at all");
        StageFiles.save(DOC, file);
        Autosave.write(OTHER, file);
        Path auto = Autosave.pathFor(file);
        Instant t0 = Instant.parse("2026-03-01T10:00:00Z");
        Files.setLastModifiedTime(file, FileTime.from(t0));
        Files.setLastModifiedTime(auto, FileTime.from(t0.plusSeconds(30)));
        Autosave.Recovery r = Autosave.find(file).orElseThrow();
        assertEquals(auto, r.autosaveFile());
        assertEquals(Optional.of(FileTime.from(t0)), r.savedAt());
        assertEquals(OTHER, StageFiles.open(r.autosaveFile()));

        Files.setLastModifiedTime(auto, FileTime.from(t0.minusSeconds(30)));
        assertEquals(Optional.empty(), Autosave.find(file), "older autosave is stale");
        Files.setLastModifiedTime(auto, FileTime.from(t0));
        assertEquals(Optional.empty(), Autosave.find(file), "same time is not newer");

        Autosave.discard(file);
        assertFalse(Files.exists(auto));
        Autosave.discard(file);
    }

    @Test
    @DisplayName("an autosave of a never-saved file is offered, with no saved time")
    void recoveryWithoutFile() {
        Path file = dir.resolve("untitled.stage.json");
        Autosave.write(DOC, file);
        Autosave.Recovery r = Autosave.find(file).orElseThrow();
        assertEquals(Optional.empty(), r.savedAt());
        assertEquals(DOC, StageFiles.open(r.autosaveFile()));
    }
}
