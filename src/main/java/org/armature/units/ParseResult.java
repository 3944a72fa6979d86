package org.armature.units;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The outcome of {@link EngineeringNotation#tryParse(String, Unit)}: either a value or a reason.
 * Lets an input field validate every keystroke without exceptions:
 *
 * <pre>{@code
 * ParseResult r = EngineeringNotation.tryParse(field.getText(), Unit.OHM);
 * if (r instanceof ParseResult.Failure f) showError(f.error().message());
 * }</pre>
 */
public sealed interface ParseResult permits ParseResult.Value, ParseResult.Failure {

    /**
     * A successfully read value.
     *
     * @param value the value in the unit's coherent SI unit; finite, never {@code -0.0}
     */
    record Value(double value) implements ParseResult {
        /** Checks that the value is finite. */
        public Value {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("value must be finite, was " + value);
            }
        }
    }

    /**
     * A text that could not be read.
     *
     * @param error why, with a message fit to show the user
     */
    record Failure(ParseError error) implements ParseResult {
        /** Checks that the error is present. */
        public Failure {
            Objects.requireNonNull(error, "error");
        }
    }

    /** True for a {@link Value}. */
    default boolean isValid() {
        return this instanceof Value;
    }

    /** The value, or empty for a failure. */
    default OptionalDouble valueIfValid() {
        return this instanceof Value v ? OptionalDouble.of(v.value()) : OptionalDouble.empty();
    }

    /** The error, or empty for a value. */
    default Optional<ParseError> errorIfFailed() {
        return this instanceof Failure f ? Optional.of(f.error()) : Optional.empty();
    }

    /**
     * The value, or throws for a failure.
     *
     * @throws UnitParseException carrying the error, for a failure
     */
    default double orElseThrow() {
        if (this instanceof Failure f) {
            throw new UnitParseException(f.error());
        }
        return ((Value) this).value();
    }
}
