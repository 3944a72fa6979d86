package org.armature.io;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.security.SecureRandom;
import java.util.Locale;

/**
 * The one way the program writes a file: stage files, autosaves, CSV waveforms and exports all go
 * through {@link #write(Path, Body)}.
 *
 * <p>The steps, in order ({@link Step}):
 * <ol>
 *   <li>the target is resolved: a symbolic link is followed to the file it names (the link stays a
 *       link and the real file gets the new content); a folder, a missing folder or a special file in
 *       the target's place is refused before anything is written;</li>
 *   <li>temporary files that an earlier, interrupted write left in the folder ({@code .arm-*.tmp},
 *       not locked by a running write) are removed;</li>
 *   <li>the content goes to a new temporary file with a short name ({@value #TEMP_PREFIX} + 8
 *       characters + {@value #TEMP_SUFFIX}) in the target's folder, so a target name at the file
 *       system's length limit still saves and the final move never crosses file systems;</li>
 *   <li>the temporary file is flushed and forced to the storage device ({@code fsync}), closed, and
 *       given the permissions of the file it replaces;</li>
 *   <li>with backups on, the previous version becomes {@code FILE~} (a hard link to it, or a copy
 *       where links are not possible; one level deep, replaced at every save; skipped when the name
 *       would be too long);</li>
 *   <li>the temporary file is moved over the target atomically (a plain replacing move where the
 *       file system cannot move atomically);</li>
 *   <li>the folder is forced to the storage device so that the new name survives a power cut.</li>
 * </ol>
 * Any failure before the move leaves the old file exactly as it was and removes the temporary
 * file; the failure is a {@link StageFileException} ({@code file.unwritable}) with one sentence
 * saying why. Readers never see a partly written target.
 */
public final class SafeWrite {

    /** Start of the temporary file names. */
    public static final String TEMP_PREFIX = ".arm-";
    /** End of the temporary file names. */
    public static final String TEMP_SUFFIX = ".tmp";
    /** Added to a file's name for its one-level backup ({@code valves.stage.json~}). */
    public static final String BACKUP_SUFFIX = "~";

    /** Symbolic links followed at most, as the usual operating-system limit (40 on Linux). */
    private static final int MAX_LINK_HOPS = 40;
    private static final int TEMP_RANDOM_CHARS = 8;
    private static final String ALPHABET = "abcdefghijklmnopqrstuvwxyz0123456789";
    private static final SecureRandom RANDOM = new SecureRandom();

    /** The writer with no faults injected. */
    private static final SafeWrite PLAIN = new SafeWrite(step -> { });

    /** Writes the content of a file into the stream it is given; must not close it. */
    @FunctionalInterface
    public interface Body {
        /**
         * @param out the stream into the temporary file (buffered; closing it is harmless)
         * @throws IOException when the content cannot be written; the write then fails
         */
        void writeTo(OutputStream out) throws IOException;
    }

    /** The steps of a write, in order; tests inject a failure at each. */
    public enum Step {
        /** Removing stale temporary files of earlier, interrupted writes (failures are ignored). */
        CLEAN_STALE,
        /** Creating the temporary file. */
        CREATE_TEMP,
        /** Writing the content (the body's own failures count here too). */
        WRITE,
        /** Forcing the content to the storage device. */
        SYNC_FILE,
        /** Closing the temporary file. */
        CLOSE,
        /** Copying the old file's permissions to the temporary file. */
        PERMISSIONS,
        /** Keeping the previous version as {@code FILE~}. */
        BACKUP,
        /** Moving the temporary file over the target. */
        MOVE,
        /** Forcing the folder to the storage device. */
        SYNC_FOLDER
    }

    /** Called before each step; throwing an {@link IOException} makes that step fail (tests only). */
    @FunctionalInterface
    interface FaultInjector {
        void before(Step step) throws IOException;
    }

    private final FaultInjector faults;

    SafeWrite(FaultInjector faults) {
        this.faults = faults;
    }

    /**
     * Writes a file safely, keeping a backup of the previous version ({@code FILE~}).
     *
     * @param target the file to write; a symbolic link is followed
     * @param body writes the content
     * @throws StageFileException {@code file.unwritable} with one sentence; the old file is untouched
     */
    public static void write(Path target, Body body) {
        PLAIN.run(target, body, true);
    }

    /**
     * Writes a file safely.
     *
     * @param target the file to write; a symbolic link is followed
     * @param body writes the content
     * @param backup true to keep the previous version as {@code FILE~}
     * @throws StageFileException {@code file.unwritable} with one sentence; the old file is untouched
     */
    public static void write(Path target, Body body, boolean backup) {
        PLAIN.run(target, body, backup);
    }

    /** Writes bytes safely, with a backup; see {@link #write(Path, Body)}. */
    public static void write(Path target, byte[] content) {
        PLAIN.run(target, out -> out.write(content), true);
    }

    /** The backup of a file: the same name with {@value #BACKUP_SUFFIX} added. */
    public static Path backupOf(Path file) {
        return file.resolveSibling(file.getFileName() + BACKUP_SUFFIX);
    }

    /** Whether a file name is one of this class's temporary names. */
    public static boolean isTemporaryName(String name) {
        return name.startsWith(TEMP_PREFIX) && name.endsWith(TEMP_SUFFIX)
                && name.length() == TEMP_PREFIX.length() + TEMP_RANDOM_CHARS + TEMP_SUFFIX.length();
    }

    @SuppressWarnings("try") // the lock is held for the duration of the write, never read
    void run(Path requested, Body body, boolean backup) {
        Path target = resolve(requested);
        Path dir = target.getParent();
        cleanStale(dir);
        Path temp = null;
        try {
            faults.before(Step.CREATE_TEMP);
            temp = dir.resolve(TEMP_PREFIX + randomChars() + TEMP_SUFFIX);
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.CREATE_NEW);
                 FileLock lock = ch.lock()) {
                faults.before(Step.WRITE);
                OutputStream out = new KeepOpen(Channels.newOutputStream(ch));
                OutputStream buffered = new java.io.BufferedOutputStream(out, 1 << 16);
                body.writeTo(buffered);
                buffered.flush();
                faults.before(Step.SYNC_FILE);
                ch.force(true);
                faults.before(Step.CLOSE);
            }
            faults.before(Step.PERMISSIONS);
            keepPermissions(target, temp);
            if (backup && Files.isRegularFile(target)) {
                faults.before(Step.BACKUP);
                backup(target);
            }
            faults.before(Step.MOVE);
            move(temp, target);
            temp = null;
            faults.before(Step.SYNC_FOLDER);
            syncFolder(dir);
        } catch (StageFileException e) {
            throw e;
        } catch (AccessDeniedException e) {
            throw unwritable(requested, "permission denied", e);
        } catch (NoSuchFileException e) {
            throw unwritable(requested, "the folder " + dir + " does not exist", e);
        } catch (IOException | UnsupportedOperationException e) {
            throw unwritable(requested, reason(e), e);
        } finally {
            if (temp != null) {
                deleteQuietly(temp);
            }
        }
    }

    /** The real file behind a path: links followed, refused when it cannot be a file. */
    private static Path resolve(Path requested) {
        Path p = requested.toAbsolutePath().normalize();
        for (int hops = 0; Files.isSymbolicLink(p); hops++) {
            if (hops == MAX_LINK_HOPS) {
                throw unwritable(requested, "it is a chain of more than " + MAX_LINK_HOPS + " symbolic links", null);
            }
            try {
                Path link = Files.readSymbolicLink(p);
                Path parent = p.getParent();
                p = (parent == null ? link : parent.resolve(link)).toAbsolutePath().normalize();
            } catch (IOException e) {
                throw unwritable(requested, "its symbolic link cannot be read (" + reason(e) + ")", e);
            }
        }
        Path dir = p.getParent();
        if (dir == null || p.getFileName() == null) {
            throw unwritable(requested, "it is the root folder, not a file", null);
        }
        if (Files.isDirectory(p)) {
            throw unwritable(requested, "it is a folder, not a file", null);
        }
        if (Files.exists(p, LinkOption.NOFOLLOW_LINKS) && !Files.isRegularFile(p)) {
            throw unwritable(requested, "it is a special file (a device, pipe or socket), not a plain file", null);
        }
        if (!Files.isDirectory(dir)) {
            throw unwritable(requested, Files.exists(dir) ? dir + " is not a folder"
                    : "the folder " + dir + " does not exist", null);
        }
        return p;
    }

    /** Removes temporary files of interrupted writes that no running write holds locked. */
    private void cleanStale(Path dir) {
        try {
            faults.before(Step.CLEAN_STALE);
        } catch (IOException e) {
            return;
        }
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, TEMP_PREFIX + "*" + TEMP_SUFFIX)) {
            for (Path p : s) {
                if (isTemporaryName(p.getFileName().toString()) && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                    removeIfUnlocked(p);
                }
            }
        } catch (IOException | java.nio.file.DirectoryIteratorException | SecurityException e) {
            // cleaning up is a courtesy: the write itself does not depend on it
        }
    }

    private static void removeIfUnlocked(Path p) {
        boolean free;
        try (FileChannel ch = FileChannel.open(p, StandardOpenOption.WRITE)) {
            FileLock lock = ch.tryLock();
            free = lock != null;
            if (lock != null) {
                lock.release();
            }
        } catch (OverlappingFileLockException e) {
            free = false; // a write in this program holds it
        } catch (IOException e) {
            free = false;
        }
        if (free) {
            deleteQuietly(p);
        }
    }

    private static void keepPermissions(Path target, Path temp) throws IOException {
        if (Files.exists(target) && Files.getFileAttributeView(target, PosixFileAttributeView.class) != null) {
            Files.setPosixFilePermissions(temp, Files.getPosixFilePermissions(target));
        }
    }

    /** Makes {@code FILE~} the previous version; a name too long for a backup is skipped. */
    private static void backup(Path target) throws IOException {
        Path backup;
        try {
            backup = backupOf(target);
        } catch (java.nio.file.InvalidPathException e) {
            return;
        }
        try {
            Files.deleteIfExists(backup);
        } catch (FileSystemException e) {
            if (nameTooLong(e)) {
                return;
            }
            throw e;
        }
        try {
            Files.createLink(backup, target);
        } catch (UnsupportedOperationException | FileSystemException e) {
            if (e instanceof FileSystemException f && nameTooLong(f)) {
                return;
            }
            Files.copy(target, backup, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
        }
    }

    private static boolean nameTooLong(FileSystemException e) {
        String r = e.getReason();
        return r != null && r.toLowerCase(Locale.ROOT).contains("too long");
    }

    private static void move(Path temp, Path target) throws IOException {
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException | FileAlreadyExistsException e) {
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** Forces the folder's entries to disk; file systems that cannot open a folder are skipped. */
    private static void syncFolder(Path dir) throws IOException {
        if (Files.getFileAttributeView(dir, PosixFileAttributeView.class) == null) {
            return;
        }
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        }
    }

    private static String randomChars() {
        StringBuilder b = new StringBuilder(TEMP_RANDOM_CHARS);
        for (int i = 0; i < TEMP_RANDOM_CHARS; i++) {
            b.append(ALPHABET.charAt(RANDOM.nextInt(ALPHABET.length())));
        }
        return b.toString();
    }

    private static void deleteQuietly(Path temp) {
        try {
            Files.deleteIfExists(temp);
        } catch (IOException ignored) {
            // the original failure is being reported; a stray temporary file is removed by the next write
        }
    }

    private static StageFileException unwritable(Path file, String why, Throwable cause) {
        return new StageFileException(StageFileException.UNWRITABLE,
                "Cannot write " + file + ": " + why + "; the previous file, if any, is unchanged.", cause);
    }

    /** The reason of an I/O failure in a few words. */
    static String reason(Exception e) {
        if (e instanceof FileAlreadyExistsException) {
            return "a file of that name is in the way";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            String r = f.getReason();
            return r.toLowerCase(Locale.ROOT).contains("no space") ? "the disk is full" : lowerFirst(r);
        }
        String m = e.getMessage();
        if (m == null || m.isBlank()) {
            return "the file system reported " + e.getClass().getSimpleName();
        }
        return m.toLowerCase(Locale.ROOT).contains("no space") ? "the disk is full" : lowerFirst(m);
    }

    private static String lowerFirst(String s) {
        return s.isEmpty() ? s : Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }

    /** Passes writes through but never closes the channel (the writer closes it after the sync). */
    private static final class KeepOpen extends FilterOutputStream {
        KeepOpen(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
