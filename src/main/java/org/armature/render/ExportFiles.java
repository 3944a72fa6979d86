package org.armature.render;

import java.nio.file.Path;
import org.armature.io.SafeWrite;
import org.armature.io.StageFileException;

/**
 * Writes export files through the one safe-write path of {@code io} ({@link SafeWrite}): a short
 * temporary name in the target's folder, flushed and synced, the previous version kept as
 * {@code FILE~}, an atomic move and a sync of the folder. A bad path or a full disk leaves the old
 * file untouched and becomes one sentence ({@link ExportException}).
 */
public final class ExportFiles {

    private ExportFiles() {
    }

    /** An export that could not be written; the message is one sentence for the user. */
    public static final class ExportException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        ExportException(String message, Throwable cause) {
            super(message, cause);
        }
    }

    /**
     * Writes bytes to a file, replacing it atomically.
     *
     * @throws ExportException when the folder is missing or unwritable, or the device is full
     */
    public static void write(Path file, byte[] content) {
        try {
            SafeWrite.write(file, content);
        } catch (StageFileException e) {
            throw new ExportException(e.getMessage(), e);
        }
    }
}
