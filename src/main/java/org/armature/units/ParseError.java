package org.armature.units;

import java.io.Serializable;
import java.util.Objects;

/**
 * Why a text could not be read as a value of a unit.
 *
 * @param kind    the stable reason, to key on
 * @param input   the text as the user gave it
 * @param unit    the unit the caller expected
 * @param message a full sentence naming the input and giving examples of valid input
 */
public record ParseError(ParseErrorKind kind, String input, Unit unit, String message)
        implements Serializable {
    /** Checks that no field is null. */
    public ParseError {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(message, "message");
    }
}
