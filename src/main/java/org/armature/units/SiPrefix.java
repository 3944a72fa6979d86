package org.armature.units;

/**
 * The SI prefixes Armature reads and prints, femto to tera (SI Brochure, BIPM, 9th edition, 2019,
 * table 7). That range covers everything in a relay driver stage, from junction saturation currents
 * (fA) to insulation resistances (TΩ).
 */
enum SiPrefix {
    FEMTO('f', -15),
    PICO('p', -12),
    NANO('n', -9),
    MICRO('\u00B5', -6),
    MILLI('m', -3),
    NONE(' ', 0),
    KILO('k', 3),
    MEGA('M', 6),
    GIGA('G', 9),
    TERA('T', 12);

    /** The printed letter; {@code µ} is U+00B5 MICRO SIGN. Unused for {@link #NONE}. */
    final char letter;
    /** The power of ten. */
    final int exponent;

    SiPrefix(char letter, int exponent) {
        this.letter = letter;
        this.exponent = exponent;
    }

    /** The prefix for a power of ten that is a multiple of three within range. */
    static SiPrefix forExponent(int exponent) {
        for (SiPrefix p : values()) {
            if (p.exponent == exponent) {
                return p;
            }
        }
        throw new IllegalArgumentException("no SI prefix for 10^" + exponent);
    }

    /**
     * The prefix a typed letter stands for, accepting {@code u} for micro and upper-case {@code K}
     * for kilo (common on parts lists); {@code R} is not a prefix here.
     *
     * @return the prefix, or {@link #NONE} if the letter is not a prefix
     */
    static SiPrefix forTypedLetter(char c) {
        return switch (c) {
            case 'u' -> MICRO;
            case 'K' -> KILO;
            default -> letterOf(c);
        };
    }

    private static SiPrefix letterOf(char c) {
        for (SiPrefix p : values()) {
            if (p != NONE && p.letter == c) {
                return p;
            }
        }
        return NONE;
    }

    /** The smallest prefix exponent in the table. */
    static int minExponent() {
        return FEMTO.exponent;
    }

    /** The largest prefix exponent in the table. */
    static int maxExponent() {
        return TERA.exponent;
    }
}
