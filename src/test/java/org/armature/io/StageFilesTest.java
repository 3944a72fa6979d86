package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
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
        assertEquals(List.of(file, SafeWrite.backupOf(file)), listing(),
                "no temporary file is left behind; the previous version is the backup");
        assertEquals(StageJson.write(DOC), Files.readString(SafeWrite.backupOf(file), StandardCharsets.UTF_8));
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
        assertTrue(e.getMessage().contains("is a folder"), e.getMessage());
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
}
