package org.armature.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Optional;
import org.armature.model.StageDocument;

/**
 * Autosave and recovery: the editor writes the open document now and then to
 * {@code <name>.autosave.json} beside its stage file ({@code valves.stage.json} autosaves to
 * {@code valves.autosave.json}); on open it asks {@link #find(Path)} whether an autosave newer than
 * the file exists and offers to recover it. After a successful save the editor calls
 * {@link #discard(Path)}.
 *
 * <p>The autosave is an ordinary stage file (same format), written atomically like any save.
 */
public final class Autosave {

    /** Ending of an autosave file's name. */
    public static final String SUFFIX = ".autosave.json";

    private Autosave() {
    }

    /**
     * A newer autosave found beside a stage file.
     *
     * @param autosaveFile the autosave to recover from (open it with {@link StageFiles#open(Path)})
     * @param autosavedAt when it was written
     * @param savedAt when the stage file was last saved; empty if it does not exist
     */
    public record Recovery(Path autosaveFile, FileTime autosavedAt, Optional<FileTime> savedAt) {
    }

    /**
     * The autosave path for a stage file: its name without {@code .stage.json} (or {@code .json})
     * plus {@value #SUFFIX}, in the same directory.
     */
    public static Path pathFor(Path stageFile) {
        String name = stageFile.getFileName().toString();
        String base;
        if (name.endsWith(StageFiles.EXTENSION)) {
            base = name.substring(0, name.length() - StageFiles.EXTENSION.length());
        } else if (name.endsWith(".json")) {
            base = name.substring(0, name.length() - ".json".length());
        } else {
            base = name;
        }
        return stageFile.resolveSibling(base + SUFFIX);
    }

    /**
     * Writes the autosave for a stage file (atomically).
     *
     * @throws StageFileException {@code file.unwritable}
     */
    public static void write(StageDocument document, Path stageFile) {
        StageFiles.writeAtomically(StageJson.write(document).getBytes(StandardCharsets.UTF_8), pathFor(stageFile));
    }

    /**
     * The autosave to offer on open: present when the autosave exists and is strictly newer than the
     * stage file, or the stage file does not exist.
     *
     * @throws StageFileException {@code file.unreadable} when the file times cannot be read
     */
    public static Optional<Recovery> find(Path stageFile) {
        Path auto = pathFor(stageFile);
        try {
            if (!Files.exists(auto)) {
                return Optional.empty();
            }
            FileTime autoTime = Files.getLastModifiedTime(auto);
            if (!Files.exists(stageFile)) {
                return Optional.of(new Recovery(auto, autoTime, Optional.empty()));
            }
            FileTime fileTime = Files.getLastModifiedTime(stageFile);
            return autoTime.compareTo(fileTime) > 0
                    ? Optional.of(new Recovery(auto, autoTime, Optional.of(fileTime)))
                    : Optional.empty();
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNREADABLE,
                    "Cannot check for an autosave of " + stageFile + ": " + StageFiles.reason(e) + ".", e);
        }
    }

    /**
     * Removes the autosave of a stage file, if there is one.
     *
     * @throws StageFileException {@code file.unwritable}
     */
    public static void discard(Path stageFile) {
        try {
            Files.deleteIfExists(pathFor(stageFile));
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNWRITABLE,
                    "Cannot remove the autosave of " + stageFile + ": " + StageFiles.reason(e) + ".", e);
        }
    }
}
