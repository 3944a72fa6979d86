package org.armature.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.UUID;
import org.armature.model.StageDocument;

/**
 * Opens and saves stage files ({@code *.stage.json}).
 *
 * <p>Saving is atomic: the text goes to a temporary file in the target's directory, is forced to the
 * storage device ({@code fsync}), and is then moved over the target with
 * {@link StandardCopyOption#ATOMIC_MOVE}; where the file system cannot move atomically it falls back
 * to {@link StandardCopyOption#REPLACE_EXISTING}. A failed save leaves the previous file untouched and
 * removes the temporary file.
 */
public final class StageFiles {

    /** The usual ending of a stage file's name. */
    public static final String EXTENSION = ".stage.json";

    private StageFiles() {
    }

    /**
     * Reads a stage file.
     *
     * @param file path of the file
     * @return the document
     * @throws StageFileException {@code file.not-found}, {@code file.unreadable} or any parse key of
     *     {@link StageJson#parse(byte[])}; the message names the file
     */
    public static StageDocument open(Path file) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new StageFileException(StageFileException.NOT_FOUND, "There is no file " + file + ".", e);
        } catch (AccessDeniedException e) {
            throw new StageFileException(StageFileException.UNREADABLE,
                    "Cannot read " + file + ": permission denied.", e);
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNREADABLE,
                    "Cannot read " + file + ": " + reason(e) + ".", e);
        }
        try {
            return StageJson.parse(bytes);
        } catch (StageFileException e) {
            throw new StageFileException(e.key(), file.getFileName() + ": " + e.getMessage(), e);
        }
    }

    /**
     * Saves a document atomically, replacing the file if it exists.
     *
     * @param document what to save
     * @param file where; its directory must exist
     * @throws StageFileException {@code file.unwritable} with the reason
     */
    public static void save(StageDocument document, Path file) {
        writeAtomically(StageJson.write(document).getBytes(StandardCharsets.UTF_8), file);
    }

    /**
     * Writes bytes to a file atomically (temporary file, fsync, atomic move).
     *
     * @throws StageFileException {@code file.unwritable} with the reason
     */
    static void writeAtomically(byte[] content, Path file) {
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        Path temp = null;
        try {
            temp = dir.resolve("." + target.getFileName() + "." + UUID.randomUUID() + ".tmp");
            // CREATE_NEW gives the usual permissions for new files (umask); a replaced file keeps its own
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.CREATE_NEW)) {
                ByteBuffer buffer = ByteBuffer.wrap(content);
                while (buffer.hasRemaining()) {
                    ch.write(buffer);
                }
                ch.force(true);
            }
            keepPermissions(target, temp);
            move(temp, target);
            temp = null;
        } catch (AccessDeniedException e) {
            throw new StageFileException(StageFileException.UNWRITABLE,
                    "Cannot save " + file + ": permission denied.", e);
        } catch (NoSuchFileException e) {
            throw new StageFileException(StageFileException.UNWRITABLE,
                    "Cannot save " + file + ": the folder " + dir + " does not exist.", e);
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNWRITABLE,
                    "Cannot save " + file + ": " + reason(e) + ".", e);
        } finally {
            if (temp != null) {
                deleteQuietly(temp);
            }
        }
    }

    private static void keepPermissions(Path target, Path temp) throws IOException {
        if (Files.exists(target) && Files.getFileAttributeView(target, PosixFileAttributeView.class) != null) {
            Files.setPosixFilePermissions(temp, Files.getPosixFilePermissions(target));
        }
    }

    private static void move(Path temp, Path target) throws IOException {
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException | FileAlreadyExistsException e) {
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** Removes a leftover temporary file; the save has already failed and says why. */
    private static void deleteQuietly(Path temp) {
        try {
            Files.deleteIfExists(temp);
        } catch (IOException ignored) {
            // the original failure is being reported; a stray temporary file is the lesser problem
        }
    }

    /** The reason of an I/O failure in a few words. */
    static String reason(IOException e) {
        String m = e.getMessage();
        if (e instanceof FileAlreadyExistsException) {
            return "a file of that name is in the way";
        }
        return m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
    }
}
