package org.armature.units;

/**
 * Why a text could not be read as a value. Stable: tests and the UI key on the kind, never on the
 * wording of the message.
 */
public enum ParseErrorKind {
    /** The text is empty or only blanks. */
    EMPTY,
    /** The text is not a number, an SI-prefixed number or an IEC 60062 letter code. */
    MALFORMED,
    /** The text names a value that is not a finite number ({@code NaN}, {@code Infinity}). */
    NOT_FINITE,
    /** The number is too large or too small (non-zero but below the smallest double) to hold. */
    OUT_OF_RANGE,
    /** The number is negative where the caller allows only zero or more. */
    NEGATIVE,
    /** The text ends in the symbol of a different unit ({@code 12 V} where a current is expected). */
    UNIT_MISMATCH
}
