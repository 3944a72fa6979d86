package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
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
    @DisplayName("a write replaces the old file through the safe-write path, keeps a backup and leaves no temporary file (a failure at each step: io.SafeWriteTest)")
    void replaces() throws Exception {
        Path f = dir.resolve("a.svg");
        Files.writeString(f, "old");
        ExportFiles.write(f, "new".getBytes(StandardCharsets.UTF_8));
        assertEquals("new", Files.readString(f));
        assertEquals("old", Files.readString(dir.resolve("a.svg~")), "the previous version is kept beside it");
        assertEquals(2, filesIn(dir), "no temporary file is left");
    }

    @Test
    @DisplayName("a missing folder and a folder in the file's place are one sentence each")
    void badPaths() throws Exception {
        ExportFiles.ExportException missing = assertThrows(ExportFiles.ExportException.class,
                () -> ExportFiles.write(dir.resolve("no/a.pdf"), new byte[1]));
        assertTrue(missing.getMessage().contains("does not exist"), missing.getMessage());
        Files.createDirectory(dir.resolve("b.pdf"));
        ExportFiles.ExportException folder = assertThrows(ExportFiles.ExportException.class,
                () -> ExportFiles.write(dir.resolve("b.pdf"), new byte[1]));
        assertTrue(folder.getMessage().contains("is a folder"), folder.getMessage());
    }
}
