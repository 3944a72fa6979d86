package org.armature.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import org.armature.model.StageDocument;

/**
 * Autosave and recovery in a per-user recovery folder ({@link #userFolder()}).
 *
 * <p>Each open document has a key: for a document with a file, a hash of the file's full absolute
 * path ({@link #keyFor(Path)}), so {@code valves.json} and {@code valves.stage.json}, or two
 * {@code valves.stage.json} in different folders, never share an autosave; for untitled work, an id
 * chosen when the window starts ({@link #untitledKey(String)}). The autosave of a key is two files in
 * the recovery folder: {@code KEY.stage.json} (an ordinary stage file) and {@code KEY.origin} (the
 * document's path, empty for untitled work). Both are written through {@link SafeWrite} without a
 * backup.
 *
 * <p>The window writes an autosave of unsaved work now and then; at the next start it asks
 * {@link #pending()} for autosaves left behind (a crash, a killed process) and offers each with its
 * time; after a save, or when the user discards the work, it calls {@link #discard(String)}.
 */
public final class Autosave {

    /** System property naming the recovery folder (tests and portable installations). */
    public static final String FOLDER_PROPERTY = "armature.recovery.dir";
    /** Ending of an autosave's stage file in the recovery folder. */
    public static final String SUFFIX = ".stage.json";
    /** Ending of the file naming an autosave's document. */
    public static final String ORIGIN_SUFFIX = ".origin";

    private static final String FILE_KEY_PREFIX = "f-";
    private static final String UNTITLED_KEY_PREFIX = "u-";
    /** Hex digits of the path hash kept in a key (80 bits: no collision among one user's files). */
    private static final int KEY_HEX_DIGITS = 20;
    private static final int UNTITLED_ID_CHARS = 12;
    private static final String ID_ALPHABET = "abcdefghijklmnopqrstuvwxyz0123456789";

    private final Path folder;

    /** @param folder the recovery folder; created on the first write */
    public Autosave(Path folder) {
        this.folder = folder.toAbsolutePath();
    }

    /** The recovery folder of this user (see {@link #userFolder()}). */
    public static Autosave forUser() {
        return new Autosave(userFolder());
    }

    /**
     * The per-user recovery folder: the system property {@value #FOLDER_PROPERTY} if set; else
     * {@code %LOCALAPPDATA%\Armature\Recovery} on Windows; else {@code $XDG_STATE_HOME/armature/recovery}
     * or {@code ~/.local/state/armature/recovery}.
     */
    public static Path userFolder() {
        String p = System.getProperty(FOLDER_PROPERTY);
        if (p != null && !p.isBlank()) {
            return Path.of(p);
        }
        String local = System.getenv("LOCALAPPDATA");
        if (local != null && !local.isBlank()) {
            return Path.of(local, "Armature", "Recovery");
        }
        String state = System.getenv("XDG_STATE_HOME");
        if (state != null && !state.isBlank()) {
            return Path.of(state, "armature", "recovery");
        }
        return Path.of(System.getProperty("user.home"), ".local", "state", "armature", "recovery");
    }

    /** The recovery folder. */
    public Path folder() {
        return folder;
    }

    /** The key of a document saved as {@code file}: a hash of its full, normalised absolute path. */
    public static String keyFor(Path file) {
        String full = file.toAbsolutePath().normalize().toString();
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256").digest(full.getBytes(StandardCharsets.UTF_8));
            return FILE_KEY_PREFIX + HexFormat.of().formatHex(hash).substring(0, KEY_HEX_DIGITS);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }

    /** The key of untitled work with an id from {@link #newUntitledId()}. */
    public static String untitledKey(String id) {
        if (!id.matches("[a-z0-9]{1,32}")) {
            throw new IllegalArgumentException("an untitled id is 1 to 32 lower-case letters or digits");
        }
        return UNTITLED_KEY_PREFIX + id;
    }

    /** A fresh id for untitled work (random, 12 characters). */
    public static String newUntitledId() {
        SecureRandom r = new SecureRandom();
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < UNTITLED_ID_CHARS; i++) {
            b.append(ID_ALPHABET.charAt(r.nextInt(ID_ALPHABET.length())));
        }
        return b.toString();
    }

    /** The key for a document: its file's key, or the untitled key. */
    public static String keyFor(Optional<Path> file, String untitledId) {
        return file.map(Autosave::keyFor).orElseGet(() -> untitledKey(untitledId));
    }

    /**
     * An autosave left in the recovery folder.
     *
     * @param key the document's key
     * @param original the document's file; empty for untitled work
     * @param autosavedAt when the autosave was written
     * @param savedAt when the original file was last saved; empty if it has none or it is gone
     * @param autosaveFile the autosave's stage file (read it with {@link Autosave#read(Recovery)})
     */
    public record Recovery(String key, Optional<Path> original, FileTime autosavedAt, Optional<FileTime> savedAt,
                           Path autosaveFile) {
    }

    /**
     * Writes the autosave of a document.
     *
     * @param document the unsaved work
     * @param file the document's file, empty for untitled work
     * @param untitledId the window's id for untitled work
     * @return the key written
     * @throws StageFileException {@code file.unwritable} with the reason
     */
    public String write(StageDocument document, Optional<Path> file, String untitledId) {
        String key = keyFor(file, untitledId);
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNWRITABLE,
                    "Cannot create the recovery folder " + folder + ": " + SafeWrite.reason(e) + ".", e);
        }
        String origin = file.map(p -> p.toAbsolutePath().normalize().toString()).orElse("");
        SafeWrite.write(folder.resolve(key + ORIGIN_SUFFIX), out -> out.write(origin.getBytes(StandardCharsets.UTF_8)),
                false);
        byte[] content = StageJson.write(document).getBytes(StandardCharsets.UTF_8);
        SafeWrite.write(folder.resolve(key + SUFFIX), out -> out.write(content), false);
        return key;
    }

    /**
     * The autosaves in the folder, newest first. An unreadable entry is left out (it is not a
     * reason to refuse to start).
     */
    public List<Recovery> pending() {
        List<Recovery> out = new ArrayList<>();
        if (!Files.isDirectory(folder)) {
            return out;
        }
        try (DirectoryStream<Path> s = Files.newDirectoryStream(folder, "*" + SUFFIX)) {
            for (Path p : s) {
                String name = p.getFileName().toString();
                String key = name.substring(0, name.length() - SUFFIX.length());
                if (key.startsWith(FILE_KEY_PREFIX) || key.startsWith(UNTITLED_KEY_PREFIX)) {
                    recovery(key, p).ifPresent(out::add);
                }
            }
        } catch (IOException e) {
            return out;
        }
        out.sort(Comparator.comparing(Recovery::autosavedAt).reversed());
        return out;
    }

    private Optional<Recovery> recovery(String key, Path autosave) {
        try {
            FileTime at = Files.getLastModifiedTime(autosave);
            Path originFile = folder.resolve(key + ORIGIN_SUFFIX);
            Optional<Path> original = Optional.empty();
            if (Files.isRegularFile(originFile)) {
                String text = Files.readString(originFile, StandardCharsets.UTF_8).strip();
                if (!text.isEmpty()) {
                    original = Optional.of(Path.of(text));
                }
            }
            Optional<FileTime> savedAt = original.filter(Files::isRegularFile).map(p -> {
                try {
                    return Files.getLastModifiedTime(p);
                } catch (IOException e) {
                    return null;
                }
            });
            return Optional.of(new Recovery(key, original, at, savedAt, autosave));
        } catch (IOException | InvalidPathException e) {
            return Optional.empty();
        }
    }

    /**
     * Reads an autosave.
     *
     * @throws StageFileException as {@link StageFiles#open(Path)}
     */
    public StageDocument read(Recovery r) {
        return StageFiles.open(r.autosaveFile());
    }

    /**
     * Removes the autosave of a key, if there is one.
     *
     * @throws StageFileException {@code file.unwritable}
     */
    public void discard(String key) {
        try {
            Files.deleteIfExists(folder.resolve(key + SUFFIX));
            Files.deleteIfExists(folder.resolve(key + ORIGIN_SUFFIX));
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNWRITABLE,
                    "Cannot remove the autosave " + key + " in " + folder + ": " + SafeWrite.reason(e) + ".", e);
        }
    }

    /** Whether an autosave of this key exists. */
    public boolean exists(String key) {
        return Files.isRegularFile(folder.resolve(key + SUFFIX));
    }
}
