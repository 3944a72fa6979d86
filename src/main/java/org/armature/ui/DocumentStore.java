package org.armature.ui;

import java.nio.file.Path;
import org.armature.io.StageFiles;
import org.armature.model.StageDocument;

/**
 * How the window reads and writes stage files; tests use an in-memory one. Failures are the io
 * package's {@link org.armature.io.StageFileException} with a sentence for the user.
 */
public interface DocumentStore {

    /** Reads a stage file. */
    StageDocument load(Path file);

    /** Writes a stage file atomically. */
    void save(StageDocument document, Path file);

    /** Stage files on disk through {@link StageFiles}. */
    DocumentStore FILES = new DocumentStore() {
        @Override
        public StageDocument load(Path file) {
            return StageFiles.open(file);
        }

        @Override
        public void save(StageDocument document, Path file) {
            StageFiles.save(document, file);
        }
    };
}
