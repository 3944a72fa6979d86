package org.armature.render;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.UUID;

/**
 * Writes export files atomically: the bytes go to a temporary file in the target's folder, are
 * forced to the device, and the temporary file is then moved over the target (an atomic move where
 * the file system has one). A bad path or a full disk leaves the old file untouched, removes the
 * temporary file and becomes one sentence ({@link ExportException}).
 *
 * <p>This is the export side's own small copy of the stage files' safe save; when the shared safe
 * write of {@code io} lands, {@link #write} can call it instead without any caller changing.
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
        write(file, content, ExportFiles::moveOver);
    }

    /** The last step of a write: put the finished temporary file in the target's place. */
    @FunctionalInterface
    interface Replace {
        void replace(Path temp, Path target) throws IOException;
    }

    /** {@link #write(Path, byte[])} with the last step given (tests make it fail as a full disk would). */
    static void write(Path file, byte[] content, Replace replace) {
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        if (dir == null || Files.isDirectory(target)) {
            throw new ExportException("Cannot write " + file + ": it is a folder, not a file name.", null);
        }
        Path temp = null;
        try {
            temp = dir.resolve("." + target.getFileName() + "." + UUID.randomUUID() + ".tmp");
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.CREATE_NEW)) {
                ByteBuffer buffer = ByteBuffer.wrap(content);
                while (buffer.hasRemaining()) {
                    ch.write(buffer);
                }
                ch.force(true);
            }
            replace.replace(temp, target);
            temp = null;
        } catch (AccessDeniedException e) {
            throw new ExportException("Cannot write " + file + ": permission denied.", e);
        } catch (NoSuchFileException e) {
            throw new ExportException("Cannot write " + file + ": the folder " + dir + " does not exist.", e);
        } catch (IOException e) {
            throw new ExportException("Cannot write " + file + ": " + reason(e) + ".", e);
        } finally {
            if (temp != null) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // the write already failed and says so; a stray temporary file is the lesser harm
                }
            }
        }
    }

    private static void moveOver(Path temp, Path target) throws IOException {
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static String reason(IOException e) {
        String m = e instanceof FileSystemException f && f.getReason() != null ? f.getReason() : e.getMessage();
        if (m == null || m.isBlank()) {
            return e.getClass().getSimpleName();
        }
        return m.toLowerCase(java.util.Locale.ROOT).contains("no space") ? "the disk is full" : m.strip();
    }
}
