package org.armature.units;

import java.util.Objects;

/**
 * Thrown by {@link EngineeringNotation#parse(String, Unit)} when a text cannot be read as a value.
 * The message is a full sentence naming the input and giving valid examples; callers key on
 * {@link #error()}{@code .kind()}, never on the wording.
 */
public final class UnitParseException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final ParseError error;

    /**
     * Creates the exception for an error.
     *
     * @param error why the text could not be read; its message becomes this exception's message
     */
    public UnitParseException(ParseError error) {
        super(Objects.requireNonNull(error, "error").message());
        this.error = error;
    }

    /** Why the text could not be read. */
    public ParseError error() {
        return error;
    }

    /** Shorthand for {@code error().kind()}. */
    public ParseErrorKind kind() {
        return error.kind();
    }
}
