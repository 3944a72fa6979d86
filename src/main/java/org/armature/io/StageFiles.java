package org.armature.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;
import org.armature.model.StageDocument;

/**
 * Opens and saves stage files ({@code *.stage.json}).
 *
 * <p>Saving goes through {@link SafeWrite}: a temporary file in the target's folder, forced to the
 * storage device, a backup of the previous version ({@code FILE~}), an atomic move and a sync of the
 * folder. A failed save leaves the previous file untouched and removes the temporary file.
 */
public final class StageFiles {

    /** The usual ending of a stage file's name. */
    public static final String EXTENSION = ".stage.json";

    private StageFiles() {
    }

    /**
     * The largest stage file read, in bytes (8 MiB). A stage of a few dozen parts is 5–20 KB; the
     * cap is checked before reading, so a huge or endless file is refused at once.
     */
    public static final long MAX_FILE_BYTES = 8L << 20;

    /**
     * Reads a stage file. Only regular files are read (a folder, a pipe or a device is refused
     * without being opened), and only up to {@link #MAX_FILE_BYTES}.
     *
     * @param file path of the file
     * @return the document
     * @throws StageFileException {@code file.not-found}, {@code file.unreadable} or any parse key of
     *     {@link StageJson#parse(byte[])}; the message names the file
     */
    public static StageDocument open(Path file) {
        byte[] bytes = readBounded(file);
        try {
            return StageJson.parse(bytes);
        } catch (StageFileException e) {
            throw new StageFileException(e.key(), file.getFileName() + ": " + e.getMessage(), e);
        }
    }

    /** The bytes of a regular file of at most {@link #MAX_FILE_BYTES}. */
    static byte[] readBounded(Path file) {
        try {
            if (!Files.exists(file)) {
                throw new StageFileException(StageFileException.NOT_FOUND, "There is no file " + file + ".");
            }
            if (Files.isDirectory(file)) {
                throw new StageFileException(StageFileException.UNREADABLE,
                        file + " is a folder; expected a stage file (*.stage.json).");
            }
            if (!Files.isRegularFile(file)) {
                throw new StageFileException(StageFileException.UNREADABLE,
                        file + " is a special file (a device, pipe or socket); expected a plain stage file.");
            }
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                throw tooLarge(file, size);
            }
            try (InputStream in = Files.newInputStream(file)) {
                byte[] bytes = in.readNBytes((int) MAX_FILE_BYTES + 1);
                if (bytes.length > MAX_FILE_BYTES) {
                    throw tooLarge(file, bytes.length);
                }
                return bytes;
            }
        } catch (AccessDeniedException e) {
            throw new StageFileException(StageFileException.UNREADABLE,
                    "Cannot read " + file + ": permission denied.", e);
        } catch (NoSuchFileException e) {
            throw new StageFileException(StageFileException.NOT_FOUND, "There is no file " + file + ".", e);
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNREADABLE,
                    "Cannot read " + file + ": " + reason(e) + ".", e);
        }
    }

    private static StageFileException tooLarge(Path file, long size) {
        return new StageFileException(StageFileException.UNREADABLE, String.format(Locale.ROOT,
                "%s is %,d bytes; a stage file is at most %,d bytes (8 MiB).", file, size, MAX_FILE_BYTES));
    }

    /**
     * Saves a document through {@link SafeWrite}: temporary file, sync, backup {@code FILE~}, atomic
     * move, folder sync. A symbolic link's target is updated.
     *
     * @param document what to save
     * @param file where; its folder must exist
     * @throws StageFileException {@code file.unwritable} with the reason; the old file is untouched
     */
    public static void save(StageDocument document, Path file) {
        byte[] content = StageJson.write(document).getBytes(StandardCharsets.UTF_8);
        SafeWrite.write(file, out -> out.write(content), true);
    }

    /** Writes bytes safely without a backup (autosaves). */
    static void writeAtomically(byte[] content, Path file) {
        SafeWrite.write(file, out -> out.write(content), false);
    }

    /** The reason of an I/O failure in a few words. */
    static String reason(IOException e) {
        return SafeWrite.reason(e);
    }
}
