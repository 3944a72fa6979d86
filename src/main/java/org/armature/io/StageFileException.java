package org.armature.io;

/**
 * A stage file could not be read or written: malformed JSON, a file that is not a stage file, a
 * newer format version, a missing or mistyped field, an unknown part kind, or an I/O failure.
 *
 * <p>The message is one plain sentence for the user (it names the file position or the JSON path of
 * the problem); {@link #key()} is stable for tests and translations. Values that are merely out of
 * range or parameters a part kind does not know are not errors here: they are kept and reported by
 * {@link org.armature.model.Validator}.
 */
public final class StageFileException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** The JSON text is not well formed; the message gives line and column. */
    public static final String MALFORMED_JSON = "json.malformed";
    /** The {@code format} field is missing or is not {@value StageJson#FORMAT}. */
    public static final String UNKNOWN_FORMAT = "format.unknown";
    /** The {@code version} field is not a version this program knows. */
    public static final String UNKNOWN_VERSION = "version.unknown";
    /** The file was written by a newer program (a higher format version). */
    public static final String NEWER_VERSION = "version.newer";
    /** A required field is absent. */
    public static final String MISSING_FIELD = "field.missing";
    /** A field holds the wrong JSON type (text where a number belongs, and so on). */
    public static final String WRONG_TYPE = "field.wrong-type";
    /** A field the format does not define (often a misspelling). */
    public static final String UNKNOWN_FIELD = "field.unknown";
    /** A field of the right type holds a value the document cannot take (a diagonal wire, 45°). */
    public static final String INVALID_VALUE = "field.invalid";
    /** A part's {@code kind} names no part kind. */
    public static final String UNKNOWN_KIND = "part.unknown-kind";
    /** The file does not exist. */
    public static final String NOT_FOUND = "file.not-found";
    /** The file exists but could not be read. */
    public static final String UNREADABLE = "file.unreadable";
    /** The file could not be written. */
    public static final String UNWRITABLE = "file.unwritable";

    private final String key;

    /**
     * @param key stable message key, one of the constants of this class
     * @param message one sentence for the user
     */
    public StageFileException(String key, String message) {
        super(message);
        this.key = key;
    }

    /**
     * @param key stable message key, one of the constants of this class
     * @param message one sentence for the user
     * @param cause the underlying failure, kept for diagnosis
     */
    public StageFileException(String key, String message, Throwable cause) {
        super(message, cause);
        this.key = key;
    }

    /** The stable message key, e.g. {@code field.missing}. */
    public String key() {
        return key;
    }
}
