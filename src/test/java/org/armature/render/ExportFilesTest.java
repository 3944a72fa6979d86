package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Atomic export writes: the new file whole or the old file untouched, and one sentence on failure. */
class ExportFilesTest {

    @TempDir
    Path dir;

    private long filesIn(Path d) throws Exception {
        try (Stream<Path> s = Files.list(d)) {
            return s.count();
        }
    }

    @Test
    @DisplayName("a write replaces the old file and leaves no temporary file")
    void replaces() throws Exception {
        Path f = dir.resolve("a.svg");
        Files.writeString(f, "old");
        ExportFiles.write(f, "new".getBytes(StandardCharsets.UTF_8));
        assertEquals("new", Files.readString(f));
        assertEquals(1, filesIn(dir));
    }

    @Test
    @DisplayName("a full disk at the last step is one sentence; the old file and the folder are as they were")
    void fullDisk() throws Exception {
        Path f = dir.resolve("a.png");
        byte[] old = {1, 2, 3};
        Files.write(f, old);
        ExportFiles.ExportException e = assertThrows(ExportFiles.ExportException.class,
                () -> ExportFiles.write(f, new byte[] {9, 9}, (temp, target) -> {
                    throw new FileSystemException(temp.toString(), null, "No space left on device");
                }));
        assertEquals("Cannot write " + f + ": the disk is full.", e.getMessage());
        assertArrayEquals(old, Files.readAllBytes(f));
        assertEquals(1, filesIn(dir), "the temporary file is removed");
    }

    @Test
    @DisplayName("a missing folder and a folder in the file's place are one sentence each")
    void badPaths() throws Exception {
        ExportFiles.ExportException missing = assertThrows(ExportFiles.ExportException.class,
                () -> ExportFiles.write(dir.resolve("no/a.pdf"), new byte[1]));
        assertTrue(missing.getMessage().endsWith("does not exist."), missing.getMessage());
        Files.createDirectory(dir.resolve("b.pdf"));
        ExportFiles.ExportException folder = assertThrows(ExportFiles.ExportException.class,
                () -> ExportFiles.write(dir.resolve("b.pdf"), new byte[1]));
        assertTrue(folder.getMessage().contains("is a folder"), folder.getMessage());
    }
}
