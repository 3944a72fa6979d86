package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
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
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The one write path: symbolic links, long names, stale temporary files, the backup, and a failure
 * injected before every step and inside the content (issue 15, "saves onto full, read-only and
 * vanishing disks").
 */
class SafeWriteTest {

    @TempDir
    Path dir;

    private static final StageDocument OLD = StageDocument.of(Templates.defaultStage());
    private static final StageDocument NEW = StageDocument.of(
            Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.TVS, HighSideDrive.LEVEL_SHIFT));

    private List<String> names() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    @DisplayName("reproduction: saving through a symbolic link updates the real file and keeps the link")
    void symbolicLinkTargetUpdated() throws IOException {
        Path real = dir.resolve("real.stage.json");
        StageFiles.save(OLD, real);
        Path link = Files.createSymbolicLink(dir.resolve("link.stage.json"), real.getFileName());
        StageFiles.save(NEW, link);
        assertTrue(Files.isSymbolicLink(link), "the link is still a link (it was replaced by a plain file)");
        assertEquals(NEW, StageFiles.open(real), "the real file holds the new content");
        assertEquals(OLD, StageFiles.open(SafeWrite.backupOf(real)), "the backup sits beside the real file");
    }

    @Test
    @DisplayName("reproduction: a valid 245-character file name saves (the temporary name used to add 43)")
    void longNameSaves() throws IOException {
        String name = "v".repeat(245 - StageFiles.EXTENSION.length()) + StageFiles.EXTENSION;
        assertEquals(245, name.length());
        Path file = dir.resolve(name);
        StageFiles.save(OLD, file);
        StageFiles.save(NEW, file);
        assertEquals(NEW, StageFiles.open(file));
    }

    @Test
    @DisplayName("a 255-character name (the usual limit) saves; its backup name would be too long and is skipped")
    void longestNameSavesWithoutBackup() throws IOException {
        Path file = dir.resolve("w".repeat(255));
        SafeWrite.write(file, "one".getBytes(StandardCharsets.UTF_8));
        SafeWrite.write(file, "two".getBytes(StandardCharsets.UTF_8));
        assertEquals("two", Files.readString(file));
        assertEquals(List.of(file.getFileName().toString()), names());
    }

    @Test
    @DisplayName("reproduction: temporary files left by killed saves are removed by the next save")
    void staleTemporaryFilesCleaned() throws IOException {
        Path file = dir.resolve("a.stage.json");
        Files.writeString(dir.resolve(".arm-abcd1234.tmp"), "{\"format\": \"armat");
        Files.writeString(dir.resolve(".arm-zzzz9999.tmp"), "");
        Files.writeString(dir.resolve(".arm-notours.txt"), "kept");
        StageFiles.save(OLD, file);
        assertEquals(List.of(".arm-notours.txt", "a.stage.json"), names());
    }

    @Test
    @DisplayName("the backup is one level deep: FILE~ holds the version before the last save")
    void backupOneLevel() throws IOException {
        Path file = dir.resolve("b.csv");
        SafeWrite.write(file, "1".getBytes(StandardCharsets.UTF_8));
        assertEquals(List.of("b.csv"), names(), "no backup of a file that did not exist");
        SafeWrite.write(file, "2".getBytes(StandardCharsets.UTF_8));
        SafeWrite.write(file, "3".getBytes(StandardCharsets.UTF_8));
        assertEquals("3", Files.readString(file));
        assertEquals("2", Files.readString(SafeWrite.backupOf(file)));
        assertEquals(List.of("b.csv", "b.csv~"), names());
        SafeWrite.write(file, out -> out.write('4'), false);
        assertEquals("2", Files.readString(SafeWrite.backupOf(file)), "without backup the old backup stays");
    }

    @Test
    @DisplayName("reproduction: the root folder as target is refused in one sentence (was a NullPointerException)")
    void rootRefused() {
        StageFileException e = assertThrows(StageFileException.class,
                () -> StageFiles.save(OLD, Path.of("/")));
        assertEquals(StageFileException.UNWRITABLE, e.key());
        assertTrue(e.getMessage().contains("folder"), e.getMessage());
    }

    @Test
    @DisplayName("a missing folder and a special file are refused before anything is written")
    void missingFolderAndSpecialFile() {
        StageFileException e = assertThrows(StageFileException.class,
                () -> SafeWrite.write(dir.resolve("nope").resolve("x.csv"), new byte[1]));
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
        if (Files.exists(Path.of("/dev/null"))) {
            StageFileException d = assertThrows(StageFileException.class,
                    () -> SafeWrite.write(Path.of("/dev/null"), new byte[1]));
            assertTrue(d.getMessage().contains("special file"), d.getMessage());
        }
    }

    /** Fails before one step; every other step runs. */
    private static SafeWrite failingAt(SafeWrite.Step step) {
        return new SafeWrite(s -> {
            if (s == step) {
                throw new IOException("No space left on device");
            }
        });
    }

    @ParameterizedTest
    @EnumSource(SafeWrite.Step.class)
    @DisplayName("a failure before any step never leaves a corrupt, empty or missing file in place of the old one")
    void faultAtEveryStep(SafeWrite.Step step) throws IOException {
        Path file = dir.resolve("c.stage.json");
        StageFiles.save(OLD, file);
        byte[] before = Files.readAllBytes(file);
        byte[] content = StageJson.write(NEW).getBytes(StandardCharsets.UTF_8);
        boolean afterMove = step == SafeWrite.Step.SYNC_FOLDER;
        boolean ignored = step == SafeWrite.Step.CLEAN_STALE;
        if (ignored) {
            failingAt(step).run(file, out -> out.write(content), true);
        } else {
            StageFileException e = assertThrows(StageFileException.class,
                    () -> failingAt(step).run(file, out -> out.write(content), true));
            assertEquals(StageFileException.UNWRITABLE, e.key());
            assertTrue(e.getMessage().contains("the disk is full"), e.getMessage());
            assertFalse(e.getMessage().contains("\n"), "one sentence");
        }
        byte[] now = Files.readAllBytes(file);
        if (afterMove || ignored) {
            assertArrayEquals(content, now, "the move happened: the new file is complete");
        } else {
            assertArrayEquals(before, now, "the old file is untouched at step " + step);
        }
        assertTrue(names().stream().noneMatch(SafeWrite::isTemporaryName), "no temporary file left: " + names());
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 100, 4096, 65536, 70000})
    @DisplayName("reproduction: a stream that fails part-way (a full disk) leaves the old CSV whole, not a 4,096-byte fragment")
    void failingBody(int failAfterBytes) throws IOException {
        Path file = dir.resolve("wave.csv");
        byte[] old = "time [s],coil [A]\n0,0\n".getBytes(StandardCharsets.UTF_8);
        SafeWrite.write(file, old);
        StageFileException e = assertThrows(StageFileException.class, () -> SafeWrite.write(file, out -> {
            for (int i = 0; i < 200_000; i++) {
                if (i == failAfterBytes) {
                    throw new IOException("No space left on device");
                }
                out.write('x');
            }
        }));
        assertTrue(e.getMessage().contains("disk is full"), e.getMessage());
        assertArrayEquals(old, Files.readAllBytes(file));
        assertTrue(names().stream().noneMatch(SafeWrite::isTemporaryName), names().toString());
    }

    @Test
    @DisplayName("closing the stream inside the body is harmless")
    void bodyMayClose() throws IOException {
        Path file = dir.resolve("d.txt");
        SafeWrite.write(file, (OutputStream out) -> {
            out.write("abc".getBytes(StandardCharsets.UTF_8));
            out.close();
        });
        assertEquals("abc", Files.readString(file));
    }
}
