package org.armature.units;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The IEC 60063 series of preferred numbers for resistors and capacitors, with selection of the
 * preferred value below, above or nearest a computed value.
 *
 * <p>The tables are stored as published, not computed: E24 departs from the rounded geometric
 * series 10^(i/24) in eight places (27, 30, 33, 36, 39, 43, 47, 82 where the formula gives 26, 29,
 * 32, 35, 38, 42, 46, 83), and E192 has 920 where the formula gives 919. E48 and E96 equal
 * round(100·10^(i/n)) throughout. Each series carries the tolerance IEC 60063 associates with it.
 *
 * <p>A preferred value is mantissa × 10^k for a stored mantissa (two digits for E6 to E24, three
 * for E48 to E192) and any integer k; it is returned as the double nearest that decimal, the same
 * double {@link EngineeringNotation#parse(String, Unit)} gives for its text, so {@code 4k7} is a
 * member of E12. A value within {@link #MATCH_RELATIVE_TOLERANCE} of a preferred value counts as
 * equal to it, so a value computed as 0.0047 × 1e6 still rounds down to 4700 and not to 3900.
 *
 * <p>Source: IEC 60063:2015, Preferred number series for resistors and capacitors.
 */
public enum ESeries {
    /** 6 values per decade, tolerance ±20 %. */
    E6(20.0, new int[] {
            10, 15, 22, 33, 47, 68}),
    /** 12 values per decade, tolerance ±10 %. */
    E12(10.0, new int[] {
            10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82}),
    /** 24 values per decade, tolerance ±5 %. */
    E24(5.0, new int[] {
            10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43,
            47, 51, 56, 62, 68, 75, 82, 91}),
    /** 48 values per decade, tolerance ±2 %. */
    E48(2.0, new int[] {
            100, 105, 110, 115, 121, 127, 133, 140, 147, 154, 162, 169, 178, 187, 196, 205,
            215, 226, 237, 249, 261, 274, 287, 301, 316, 332, 348, 365, 383, 402, 422, 442,
            464, 487, 511, 536, 562, 590, 619, 649, 681, 715, 750, 787, 825, 866, 909, 953}),
    /** 96 values per decade, tolerance ±1 %. */
    E96(1.0, new int[] {
            100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143,
            147, 150, 154, 158, 162, 165, 169, 174, 178, 182, 187, 191, 196, 200, 205, 210,
            215, 221, 226, 232, 237, 243, 249, 255, 261, 267, 274, 280, 287, 294, 301, 309,
            316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442, 453,
            464, 475, 487, 499, 511, 523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665,
            681, 698, 715, 732, 750, 768, 787, 806, 825, 845, 866, 887, 909, 931, 953, 976}),
    /** 192 values per decade, tolerance ±0.5 % (IEC 60063 also pairs it with ±0.25 % and ±0.1 %). */
    E192(0.5, new int[] {
            100, 101, 102, 104, 105, 106, 107, 109, 110, 111, 113, 114, 115, 117, 118, 120,
            121, 123, 124, 126, 127, 129, 130, 132, 133, 135, 137, 138, 140, 142, 143, 145,
            147, 149, 150, 152, 154, 156, 158, 160, 162, 164, 165, 167, 169, 172, 174, 176,
            178, 180, 182, 184, 187, 189, 191, 193, 196, 198, 200, 203, 205, 208, 210, 213,
            215, 218, 221, 223, 226, 229, 232, 234, 237, 240, 243, 246, 249, 252, 255, 258,
            261, 264, 267, 271, 274, 277, 280, 284, 287, 291, 294, 298, 301, 305, 309, 312,
            316, 320, 324, 328, 332, 336, 340, 344, 348, 352, 357, 361, 365, 370, 374, 379,
            383, 388, 392, 397, 402, 407, 412, 417, 422, 427, 432, 437, 442, 448, 453, 459,
            464, 470, 475, 481, 487, 493, 499, 505, 511, 517, 523, 530, 536, 542, 549, 556,
            562, 569, 576, 583, 590, 597, 604, 612, 619, 626, 634, 642, 649, 657, 665, 673,
            681, 690, 698, 706, 715, 723, 732, 741, 750, 759, 768, 777, 787, 796, 806, 816,
            825, 835, 845, 856, 866, 876, 887, 898, 909, 920, 931, 942, 953, 965, 976, 988});

    /**
     * Relative distance within which a value is taken as equal to a preferred value: 1e-12, a few
     * thousand units in the last place, enough to absorb rounding from a handful of arithmetic steps
     * and far below any part tolerance (0.1 % = 1e-3).
     */
    public static final double MATCH_RELATIVE_TOLERANCE = 1e-12;

    /** Smallest value accepted by the selection methods, 1e-300, well clear of subnormals. */
    public static final double MIN_SUPPORTED_VALUE = 1e-300;

    /** Largest value accepted by the selection methods, 1e300, well clear of overflow. */
    public static final double MAX_SUPPORTED_VALUE = 1e300;

    /** Decades searched either side of the value's own, covering log10 rounding at the edges. */
    private static final int DECADE_MARGIN = 2;

    /** Powers of ten exactly representable as doubles, 10^0 to 10^22. */
    private static final double[] EXACT_POWERS_OF_TEN = {
            1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15,
            1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    private final double tolerancePercent;
    private final int[] mantissas;
    private final int significantDigits;

    ESeries(double tolerancePercent, int[] mantissas) {
        this.tolerancePercent = tolerancePercent;
        this.mantissas = mantissas;
        this.significantDigits = String.valueOf(mantissas[0]).length();
    }

    /** Values per decade: 6, 12, 24, 48, 96 or 192. */
    public int size() {
        return mantissas.length;
    }

    /** Digits of each stored mantissa: 2 for E6 to E24, 3 for E48 to E192. */
    public int significantDigits() {
        return significantDigits;
    }

    /**
     * The stored mantissas of one decade in rising order, such as 10, 12, 15 … 82 for E12, or
     * 100 … 988 for E192. Unmodifiable.
     */
    public List<Integer> mantissas() {
        return Arrays.stream(mantissas).boxed().collect(Collectors.toUnmodifiableList());
    }

    /** The tolerance IEC 60063 pairs with this series, in percent: 20, 10, 5, 2, 1 or 0.5. */
    public double tolerancePercent() {
        return tolerancePercent;
    }

    /** The tolerance as a fraction: 0.2 for E6 down to 0.005 for E192. */
    public double toleranceFraction() {
        return tolerancePercent / 100;
    }

    /**
     * The largest preferred value not above the value; a value within
     * {@link #MATCH_RELATIVE_TOLERANCE} of a preferred value gives that value.
     *
     * @param value positive, from {@link #MIN_SUPPORTED_VALUE} to {@link #MAX_SUPPORTED_VALUE}
     * @return the preferred value, as the double nearest its decimal
     * @throws IllegalArgumentException if the value is out of the supported range or not finite
     */
    public double roundDown(double value) {
        double limit = checked(value) * (1 + MATCH_RELATIVE_TOLERANCE);
        double best = 0;
        for (double p : candidates(value)) {
            if (p <= limit) {
                best = p;
            }
        }
        return found(best, value);
    }

    /**
     * The smallest preferred value not below the value; a value within
     * {@link #MATCH_RELATIVE_TOLERANCE} of a preferred value gives that value.
     *
     * @param value positive, from {@link #MIN_SUPPORTED_VALUE} to {@link #MAX_SUPPORTED_VALUE}
     * @return the preferred value, as the double nearest its decimal
     * @throws IllegalArgumentException if the value is out of the supported range or not finite
     */
    public double roundUp(double value) {
        double limit = checked(value) * (1 - MATCH_RELATIVE_TOLERANCE);
        for (double p : candidates(value)) {
            if (p >= limit) {
                return p;
            }
        }
        throw new IllegalStateException("no preferred value above " + value);
    }

    /**
     * The preferred value nearest the value on a logarithmic scale (smallest ratio), which is
     * how tolerance bands are spaced; a value exactly at the geometric mean of two neighbours goes
     * to the larger.
     *
     * @param value positive, from {@link #MIN_SUPPORTED_VALUE} to {@link #MAX_SUPPORTED_VALUE}
     * @return the preferred value, as the double nearest its decimal
     * @throws IllegalArgumentException if the value is out of the supported range or not finite
     */
    public double nearest(double value) {
        double below = roundDown(value);
        double above = roundUp(value);
        if (below == above) {
            return below;
        }
        return Math.log(value / below) < Math.log(above / value) ? below : above;
    }

    /**
     * The next preferred value above the value, crossing into the next decade after the last
     * mantissa (8k2 steps to 10k in E12). A preferred value (within
     * {@link #MATCH_RELATIVE_TOLERANCE}) steps to its successor; any other value to the
     * preferred value just above it. Used for arrow-key stepping.
     *
     * @param value positive, from {@link #MIN_SUPPORTED_VALUE} to {@link #MAX_SUPPORTED_VALUE}
     * @return the preferred value, as the double nearest its decimal
     * @throws IllegalArgumentException if the value is out of the supported range or not finite
     */
    public double next(double value) {
        double limit = checked(value) * (1 + MATCH_RELATIVE_TOLERANCE);
        for (double p : candidates(value)) {
            if (p > limit) {
                return p;
            }
        }
        throw new IllegalStateException("no preferred value above " + value);
    }

    /**
     * The preferred value below the value, crossing into the decade below after the first
     * mantissa (10k steps to 8k2 in E12); the mirror of {@link #next(double)}.
     *
     * @param value positive, from {@link #MIN_SUPPORTED_VALUE} to {@link #MAX_SUPPORTED_VALUE}
     * @return the preferred value, as the double nearest its decimal
     * @throws IllegalArgumentException if the value is out of the supported range or not finite
     */
    public double previous(double value) {
        double limit = checked(value) * (1 - MATCH_RELATIVE_TOLERANCE);
        double best = 0;
        for (double p : candidates(value)) {
            if (p < limit) {
                best = p;
            }
        }
        return found(best, value);
    }

    /**
     * Whether the value is a preferred value of this series, within
     * {@link #MATCH_RELATIVE_TOLERANCE}.
     *
     * @param value any double; non-positive, non-finite or out-of-range values are not members
     * @return true for a member
     */
    public boolean contains(double value) {
        if (!(value >= MIN_SUPPORTED_VALUE && value <= MAX_SUPPORTED_VALUE)) {
            return false;
        }
        double nearest = nearest(value);
        return Math.abs(nearest - value) <= MATCH_RELATIVE_TOLERANCE * value;
    }

    /**
     * The series of a name such as {@code "E12"} or {@code "e96"}; blanks around are ignored.
     *
     * @param name the name; not null
     * @return the series, or empty for an unknown name
     */
    public static Optional<ESeries> fromName(String name) {
        String key = name.strip().toUpperCase(Locale.ROOT);
        for (ESeries s : values()) {
            if (s.name().equals(key)) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    /**
     * The series of a name such as {@code "E12"}.
     *
     * @param name the name; not null
     * @return the series
     * @throws IllegalArgumentException naming the input and the valid names, for an unknown name
     */
    public static ESeries parse(String name) {
        return fromName(name).orElseThrow(() -> new IllegalArgumentException(
                "Unknown preferred-value series \"" + name + "\": expected one of "
                        + Arrays.stream(values()).map(Enum::name).collect(Collectors.joining(", "))
                        + "."));
    }

    private static double checked(double value) {
        if (!(value >= MIN_SUPPORTED_VALUE && value <= MAX_SUPPORTED_VALUE)) {
            throw new IllegalArgumentException("value must be a positive number from "
                    + MIN_SUPPORTED_VALUE + " to " + MAX_SUPPORTED_VALUE + ", was " + value);
        }
        return value;
    }

    private static double found(double preferred, double value) {
        if (preferred == 0) {
            throw new IllegalStateException("no preferred value below " + value);
        }
        return preferred;
    }

    /** The preferred values of the decades around the value's own, in rising order. */
    private List<Double> candidates(double value) {
        int ownExponent = (int) Math.floor(Math.log10(value)) - (significantDigits - 1);
        List<Double> all = new ArrayList<>(mantissas.length * (2 * DECADE_MARGIN + 1));
        for (int k = ownExponent - DECADE_MARGIN; k <= ownExponent + DECADE_MARGIN; k++) {
            for (int m : mantissas) {
                all.add(preferred(m, k));
            }
        }
        return all;
    }

    /** The double nearest m × 10^k: one correctly rounded operation on exact operands. */
    private static double preferred(int mantissa, int k) {
        if (k >= 0 && k < EXACT_POWERS_OF_TEN.length) {
            return mantissa * EXACT_POWERS_OF_TEN[k];
        }
        if (k < 0 && -k < EXACT_POWERS_OF_TEN.length) {
            return mantissa / EXACT_POWERS_OF_TEN[-k];
        }
        return Double.parseDouble(mantissa + "e" + k);
    }
}
