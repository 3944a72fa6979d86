package org.armature.units;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads and prints values the way engineers write them: {@code 4700}, {@code 1.5e-3},
 * {@code 16.7 mA}, {@code 22k}, and the resistor and capacitor letter codes of IEC 60062
 * ({@code 4k7}, {@code 0R47}, {@code 1M0}, {@code 4n7}).
 *
 * <h2>Reading</h2>
 * A text is read in this order:
 * <ol>
 *   <li>Leading and trailing blanks are dropped; the Unicode minus sign, the Greek mu, the ohm sign,
 *       the degree-Celsius sign and no-break spaces are taken as their usual equivalents.</li>
 *   <li>If the text ends in a spelling of the expected unit ({@link Unit#spellings()}), that
 *       suffix is removed. The unit always wins: for {@link Unit#METRE}, {@code 0.3m} is 0.3 m.</li>
 *   <li>What is left must be one of
 *     <ul>
 *       <li>a decimal number with optional sign and exponent, then an optional SI prefix, which may
 *           be separated by blanks: {@code -12}, {@code 1.5e3}, {@code 16.7 m}, {@code 4.7µ};</li>
 *       <li>an IEC 60062 letter code: digits, one letter standing for the decimal point and the
 *           multiplier ({@code R} for one, or an SI prefix), digits: {@code 4k7}, {@code 2R2},
 *           {@code R47}, {@code 100R}, {@code 4n7};</li>
 *       <li>the same with the unit's own letter for the decimal point, as the trade writes rails
 *           and currents: {@code 3V3}, {@code 1V8}, {@code 1A5} (volts, amperes, watts, henries,
 *           farads).</li>
 *     </ul></li>
 * </ol>
 * Prefixes are {@code f p n u µ m k M G T}; {@code m} (milli) and {@code M} (mega) differ. An
 * upper-case {@code K} directly after the digits is read as kilo, as on many parts lists
 * ({@code 22K}, {@code 4K7}), unless the expected unit is kelvin and the {@code K} ends the text.
 * {@code R} may also be typed lower-case. The value is correctly rounded from the decimal text, so
 * {@code 4n7} gives exactly the double nearest 4.7e-9 and matches {@link ESeries} values.
 *
 * <h2>Printing</h2>
 * {@link #format(double, Unit, int)} chooses the prefix that puts the mantissa in [1, 1000) after
 * rounding to the requested significant digits ({@code 16.7 mA}, {@code 4.70 kΩ}); beyond the
 * prefix range, and for units printed without prefixes outside [1e-3, 1e6), it prints an exponent
 * ({@code 1.00e-18 A}). {@link #formatLetterCode(double)} prints the compact IEC 60062 form. Every
 * printed text reads back with {@link #parse(String, Unit)} to the value within the printed
 * precision. A non-finite value prints as {@link #NOT_A_NUMBER_TEXT}, never as {@code NaN}.
 *
 * <p>Sources: IEC 60062 (marking codes for resistors and capacitors); SI Brochure, BIPM,
 * 9th edition 2019 (prefixes and symbols). This class is stateless and thread-safe.
 */
public final class EngineeringNotation {

    /** Significant digits printed when the caller does not say: 3, enough for 1 % parts. */
    public static final int DEFAULT_SIGNIFICANT_DIGITS = 3;

    /** The most significant digits a double can carry meaningfully (17). */
    public static final int MAX_SIGNIFICANT_DIGITS = 17;

    /** Printed in place of a value that is not finite (NaN or infinite): an em dash. */
    public static final String NOT_A_NUMBER_TEXT = "\u2014";

    /** Prefix-free units print plainly from 10^-3 up to below 10^6, with an exponent outside. */
    private static final int PLAIN_MIN_EXPONENT = -3;
    private static final int PLAIN_MAX_EXPONENT = 5;

    /**
     * Letter codes print {@code 0R…} down to 10^-2 ({@code 0R047}); below, a prefix letter
     * ({@code 4m7}) is shorter than a row of zeros.
     */
    private static final int ZERO_R_MIN_EXPONENT = -2;

    /** Inputs longer than this are shortened in messages so a pasted page stays readable. */
    private static final int MAX_QUOTED_INPUT_CHARS = 40;

    private static final char MICRO_SIGN = '\u00B5';

    private static final Pattern DECIMAL = Pattern.compile(
            "([+-]?)(\\d*)(?:\\.(\\d*))?(?:[eE]([+-]?\\d+))?(?:\\s*([fpnu\\u00B5mkMGT])|(K))?");

    private static final Pattern LETTER_CODE = Pattern.compile(
            "([+-]?)(\\d*)([Rrfpnu\\u00B5mkKMGT])(\\d*)");

    /** Unit letter standing for the decimal point: {@code 3V3}, {@code 1A5}, {@code 12V}. */
    private static final Pattern UNIT_LETTER_CODE = Pattern.compile("([+-]?)(\\d*)([VAWHF])(\\d*)");

    private static final Pattern NOT_FINITE_WORD = Pattern.compile(
            "[+-]?(nan|inf|infinity|\\u221E)", Pattern.CASE_INSENSITIVE);

    private EngineeringNotation() {
    }

    // ----------------------------------------------------------------------------------- reading

    /**
     * Reads a value of a unit, allowing negatives as the unit does by default
     * ({@link Unit#negativesAllowed()}).
     *
     * @param text the text as typed; not null
     * @param unit the unit expected; an optional trailing spelling of it is accepted
     * @return the value in the unit's coherent SI unit; finite, never {@code -0.0}
     * @throws UnitParseException if the text cannot be read; its kind says why
     */
    public static double parse(String text, Unit unit) {
        return tryParse(text, unit).orElseThrow();
    }

    /**
     * Reads a value of a unit, choosing whether negatives are allowed.
     *
     * @param text             the text as typed; not null
     * @param unit             the unit expected; an optional trailing spelling of it is accepted
     * @param negativesAllowed false to reject values below zero ({@code -0} reads as 0)
     * @return the value in the unit's coherent SI unit; finite, never {@code -0.0}
     * @throws UnitParseException if the text cannot be read; its kind says why
     */
    public static double parse(String text, Unit unit, boolean negativesAllowed) {
        return tryParse(text, unit, negativesAllowed).orElseThrow();
    }

    /**
     * Reads a value of a unit without throwing, allowing negatives as the unit does by default.
     *
     * @param text the text as typed; not null
     * @param unit the unit expected
     * @return the value, or the reason with a message fit for the user
     */
    public static ParseResult tryParse(String text, Unit unit) {
        Objects.requireNonNull(unit, "unit");
        return tryParse(text, unit, unit.negativesAllowed());
    }

    /**
     * Reads a value of a unit without throwing.
     *
     * @param text             the text as typed; not null
     * @param unit             the unit expected
     * @param negativesAllowed false to reject values below zero ({@code -0} reads as 0)
     * @return the value, or the reason with a message fit for the user
     */
    public static ParseResult tryParse(String text, Unit unit, boolean negativesAllowed) {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(unit, "unit");
        String normalized = normalize(text).strip();
        if (normalized.isEmpty()) {
            return failure(ParseErrorKind.EMPTY, text, unit, "");
        }
        ParseResult read = readNumber(withoutUnit(normalized, unit), text, unit);
        if (read instanceof ParseResult.Failure f && f.error().kind() == ParseErrorKind.MALFORMED) {
            return unitMismatch(normalized, text, unit).orElse(read);
        }
        if (read instanceof ParseResult.Value v && v.value() < 0 && !negativesAllowed) {
            return failure(ParseErrorKind.NEGATIVE, text, unit, "");
        }
        return read;
    }

    private static String normalize(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '\u2212' -> b.append('-');
                case '\u03BC' -> b.append(MICRO_SIGN);
                case '\u2126' -> b.append('\u03A9');
                case '\u2103' -> b.append("\u00B0C");
                case '\u00BA' -> b.append('\u00B0');
                case '\u00A0', '\u2009', '\u202F' -> b.append(' ');
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    private static String withoutUnit(String text, Unit unit) {
        for (String spelling : unit.spellings()) {
            if (text.endsWith(spelling)) {
                return text.substring(0, text.length() - spelling.length()).stripTrailing();
            }
        }
        return text;
    }

    /** Reads a number with optional prefix or a letter code; knows nothing of units or sign rules. */
    private static ParseResult readNumber(String number, String input, Unit unit) {
        if (NOT_FINITE_WORD.matcher(number).matches()) {
            return failure(ParseErrorKind.NOT_FINITE, input, unit, "");
        }
        Matcher d = DECIMAL.matcher(number);
        if (d.matches()) {
            String intDigits = d.group(2);
            String fracDigits = orEmpty(d.group(3));
            if (!intDigits.isEmpty() || !fracDigits.isEmpty()) {
                String prefix = d.group(5) != null ? d.group(5) : orEmpty(d.group(6));
                int prefixExponent = prefix.isEmpty() ? 0
                        : SiPrefix.forTypedLetter(prefix.charAt(0)).exponent;
                return decimalValue(d.group(1), intDigits, fracDigits, orEmpty(d.group(4)),
                        prefixExponent, input, unit);
            }
        }
        Matcher c = LETTER_CODE.matcher(number);
        if (c.matches() && !(c.group(2).isEmpty() && c.group(4).isEmpty())) {
            char letter = c.group(3).charAt(0);
            int exponent = (letter == 'R' || letter == 'r') ? 0
                    : SiPrefix.forTypedLetter(letter).exponent;
            return decimalValue(c.group(1), c.group(2), c.group(4), "", exponent, input, unit);
        }
        Matcher u = UNIT_LETTER_CODE.matcher(number);
        if (u.matches() && u.group(3).charAt(0) == unitLetter(unit) && !(u.group(2).isEmpty() && u.group(4).isEmpty())) {
            return decimalValue(u.group(1), u.group(2), u.group(4), "", 0, input, unit);
        }
        return failure(ParseErrorKind.MALFORMED, input, unit, "");
    }

    /**
     * The letter that stands for the decimal point in the trade's codes for this unit ({@code 3V3},
     * {@code 1A5}), or 0 where the trade writes none.
     */
    private static char unitLetter(Unit unit) {
        return switch (unit) {
            case VOLT -> 'V';
            case AMPERE -> 'A';
            case WATT -> 'W';
            case HENRY -> 'H';
            case FARAD -> 'F';
            default -> 0;
        };
    }

    private static String orEmpty(String group) {
        return group == null ? "" : group;
    }

    private static ParseResult decimalValue(String sign, String intDigits, String fracDigits,
            String exponentText, int prefixExponent, String input, Unit unit) {
        // The whole text goes through one correctly rounded conversion (no multiply by 1e-9 after),
        // and a BigInteger exponent cannot overflow however many digits were typed.
        BigInteger exponent = exponentText.isEmpty() ? BigInteger.ZERO : new BigInteger(exponentText);
        exponent = exponent.add(BigInteger.valueOf(prefixExponent));
        String decimal = (intDigits.isEmpty() ? "0" : intDigits) + "."
                + (fracDigits.isEmpty() ? "0" : fracDigits) + "e" + exponent;
        double magnitude = Double.parseDouble(decimal);
        if (Double.isInfinite(magnitude)) {
            return failure(ParseErrorKind.OUT_OF_RANGE, input, unit, "too large");
        }
        if (magnitude == 0 && hasNonZeroDigit(intDigits + fracDigits)) {
            return failure(ParseErrorKind.OUT_OF_RANGE, input, unit, "too small");
        }
        double value = "-".equals(sign) ? -magnitude : magnitude;
        return new ParseResult.Value(value == 0 ? 0.0 : value);
    }

    private static boolean hasNonZeroDigit(String digits) {
        for (int i = 0; i < digits.length(); i++) {
            if (digits.charAt(i) != '0') {
                return true;
            }
        }
        return false;
    }

    private static Optional<ParseResult> unitMismatch(String normalized, String input,
            Unit expected) {
        List<Candidate> candidates = new ArrayList<>();
        for (Unit other : Unit.values()) {
            if (other == expected) {
                continue;
            }
            for (String spelling : other.spellings()) {
                candidates.add(new Candidate(other, spelling));
            }
        }
        candidates.sort(Comparator.comparingInt((Candidate k) -> k.spelling().length()).reversed());
        for (Candidate k : candidates) {
            if (normalized.endsWith(k.spelling())) {
                String rest = normalized.substring(0, normalized.length() - k.spelling().length())
                        .stripTrailing();
                if (!rest.isEmpty() && readNumber(rest, input, k.unit()).isValid()) {
                    return Optional.of(failure(ParseErrorKind.UNIT_MISMATCH, input,
                            expected, k.unit().symbol() + " is the unit of "
                                    + k.unit().quantityName()));
                }
            }
        }
        return Optional.empty();
    }

    private record Candidate(Unit unit, String spelling) {
    }

    private static ParseResult failure(ParseErrorKind kind, String input, Unit unit, String detail) {
        return new ParseResult.Failure(new ParseError(kind, input, unit,
                message(kind, input, unit, detail)));
    }

    private static String message(ParseErrorKind kind, String input, Unit unit, String detail) {
        String examples = "such as " + unit.examples() + ".";
        String quoted = "\"" + shortened(input) + "\"";
        String head = "Cannot read " + quoted + " as " + unit.quantityWithArticle() + ": ";
        return switch (kind) {
            case EMPTY -> "Cannot read an empty field as " + unit.quantityWithArticle()
                    + ": enter a number " + examples;
            case MALFORMED -> head + "expected a number with an optional SI prefix or letter code"
                    + (unit.symbol().isEmpty() ? "" : " and an optional unit " + unit.symbol())
                    + (input.indexOf(',') >= 0
                            ? " (use a point, not a comma, as the decimal separator)" : "")
                    + ", " + examples;
            case NOT_FINITE -> head + "expected a finite number, " + examples;
            case OUT_OF_RANGE -> head + "the number is " + detail
                    + " to hold in double precision (about 4.9e-324 to 1.8e308); expected a number "
                    + examples;
            case NEGATIVE -> head + "the " + unit.quantityName()
                    + " cannot be negative here; expected zero or more, " + examples;
            case UNIT_MISMATCH -> head + detail + ", not of " + unit.quantityName()
                    + "; expected " + (unit.symbol().isEmpty() ? "a plain number"
                            : "a value in " + unit.symbol()) + ", " + examples;
        };
    }

    private static String shortened(String input) {
        return input.length() <= MAX_QUOTED_INPUT_CHARS ? input
                : input.substring(0, MAX_QUOTED_INPUT_CHARS) + "\u2026";
    }

    // ---------------------------------------------------------------------------------- printing

    /**
     * Prints a value with {@link #DEFAULT_SIGNIFICANT_DIGITS} significant digits.
     *
     * @param value the value in the unit's coherent SI unit
     * @param unit  the unit whose symbol is printed
     * @return the text, as {@link #format(double, Unit, int)} gives it
     * @see #format(double, Unit, int)
     */
    public static String format(double value, Unit unit) {
        return format(value, unit, DEFAULT_SIGNIFICANT_DIGITS);
    }

    /**
     * Prints a value in engineering notation with the unit's symbol: {@code 16.7 mA},
     * {@code 4.70 kΩ}, {@code -1.20 A}, {@code 0 V}, {@code 25.0 °C}. Units that are not
     * {@link Unit#prefixed() prefixed} print plainly between 10^-3 and 10^6.
     *
     * @param value             the value in the unit's coherent SI unit
     * @param unit              the unit whose symbol is printed
     * @param significantDigits 1 to {@link #MAX_SIGNIFICANT_DIGITS}; trailing zeros are kept
     *                          ({@code 4.70 kΩ}) so the text shows the precision
     * @return the text; {@link #NOT_A_NUMBER_TEXT} for NaN or infinity; zero prints as {@code 0}
     * @throws IllegalArgumentException if significantDigits is out of range
     */
    public static String format(double value, Unit unit, int significantDigits) {
        Objects.requireNonNull(unit, "unit");
        return format(value, unit.symbol(), unit.prefixed(), significantDigits);
    }

    /**
     * Prints a value with an SI prefix and any unit symbol, such as {@code "A"} or {@code ""}:
     * {@code format(0.0167, "A", 3)} gives {@code 16.7 mA}; with an empty symbol, {@code 16.7m}.
     *
     * @param value             the value in the coherent SI unit of the symbol
     * @param unitSymbol        printed after the prefix; not null, may be empty
     * @param significantDigits 1 to {@link #MAX_SIGNIFICANT_DIGITS}
     * @return the text; {@link #NOT_A_NUMBER_TEXT} for NaN or infinity
     * @throws IllegalArgumentException if significantDigits is out of range
     */
    public static String format(double value, String unitSymbol, int significantDigits) {
        Objects.requireNonNull(unitSymbol, "unitSymbol");
        return format(value, unitSymbol, true, significantDigits);
    }

    private static String format(double value, String symbol, boolean prefixed, int digits) {
        checkDigits(digits);
        if (!Double.isFinite(value)) {
            return NOT_A_NUMBER_TEXT;
        }
        if (value == 0) {
            return withSymbol("0", "", symbol);
        }
        BigDecimal rounded = round(value, digits);
        int e10 = decimalExponent(rounded);
        if (prefixed) {
            int groupExponent = Math.floorDiv(e10, 3) * 3;
            if (groupExponent < SiPrefix.minExponent() || groupExponent > SiPrefix.maxExponent()) {
                return withSymbol(scientific(rounded, e10, digits), "", symbol);
            }
            SiPrefix prefix = SiPrefix.forExponent(groupExponent);
            String mantissa = fixed(rounded.movePointLeft(groupExponent), digits, e10 - groupExponent);
            return withSymbol(mantissa, prefix == SiPrefix.NONE ? "" : String.valueOf(prefix.letter),
                    symbol);
        }
        if (e10 < PLAIN_MIN_EXPONENT || e10 > PLAIN_MAX_EXPONENT) {
            return withSymbol(scientific(rounded, e10, digits), "", symbol);
        }
        return withSymbol(fixed(rounded, digits, e10), "", symbol);
    }

    /**
     * Prints a value as an IEC 60062 letter code with 3 significant digits at most, trailing
     * zeros dropped: 4700 gives {@code 4k7}, 2.2 {@code 2R2}, 1e6 {@code 1M0}, 0.47 {@code 0R47},
     * 100 {@code 100R}, 1e-7 {@code 100n}.
     *
     * @param value the value in its coherent SI unit
     * @return the code, as {@link #formatLetterCode(double, int)} gives it
     * @see #formatLetterCode(double, int)
     */
    public static String formatLetterCode(double value) {
        return formatLetterCode(value, DEFAULT_SIGNIFICANT_DIGITS);
    }

    /**
     * Prints a value as an IEC 60062 letter code: the letter ({@code R} for one, or an SI prefix)
     * stands for the decimal point. A single integer digit gets a trailing {@code 0}
     * ({@code 1M0}, {@code 1k0}) so the code cannot be mistaken for a bare prefix. From 10^-2 up to
     * 1 the code is {@code 0R…} ({@code 0R047}); below, a prefix letter ({@code 4m7}, {@code 4n7}).
     * Values beyond the prefix range (below 1e-15 or from 1e15) print with an exponent.
     *
     * @param value             the value in its coherent SI unit
     * @param significantDigits the most digits kept, 1 to {@link #MAX_SIGNIFICANT_DIGITS}
     * @return the code; {@code 0R} for zero; a leading {@code -} for negatives;
     *         {@link #NOT_A_NUMBER_TEXT} for NaN or infinity
     * @throws IllegalArgumentException if significantDigits is out of range
     */
    public static String formatLetterCode(double value, int significantDigits) {
        checkDigits(significantDigits);
        if (!Double.isFinite(value)) {
            return NOT_A_NUMBER_TEXT;
        }
        if (value == 0) {
            return "0R";
        }
        BigDecimal rounded = round(value, significantDigits);
        int e10 = decimalExponent(rounded);
        int groupExponent = e10 >= ZERO_R_MIN_EXPONENT && e10 < 0 ? 0 : Math.floorDiv(e10, 3) * 3;
        if (groupExponent < SiPrefix.minExponent() || groupExponent > SiPrefix.maxExponent()) {
            return scientific(rounded, e10, significantDigits);
        }
        char letter = groupExponent == 0 ? 'R' : SiPrefix.forExponent(groupExponent).letter;
        String plain = rounded.abs().movePointLeft(groupExponent).stripTrailingZeros().toPlainString();
        int point = plain.indexOf('.');
        String code;
        if (point >= 0) {
            code = plain.substring(0, point) + letter + plain.substring(point + 1);
        } else {
            code = plain + letter + (plain.length() == 1 ? "0" : "");
        }
        return (rounded.signum() < 0 ? "-" : "") + code;
    }

    private static void checkDigits(int significantDigits) {
        if (significantDigits < 1 || significantDigits > MAX_SIGNIFICANT_DIGITS) {
            throw new IllegalArgumentException("significantDigits must be 1 to "
                    + MAX_SIGNIFICANT_DIGITS + ", was " + significantDigits);
        }
    }

    /** Rounds the exact binary value half away from zero, as people round printed figures. */
    private static BigDecimal round(double value, int digits) {
        return new BigDecimal(value).round(new MathContext(digits, RoundingMode.HALF_UP));
    }

    /** The power of ten of the leading digit: 4.70E+3 gives 3. */
    private static int decimalExponent(BigDecimal nonZero) {
        return nonZero.precision() - nonZero.scale() - 1;
    }

    /** Prints with exactly enough decimals to show {@code digits} significant digits. */
    private static String fixed(BigDecimal value, int digits, int leadingExponent) {
        int decimals = Math.max(0, digits - 1 - leadingExponent);
        return value.setScale(decimals, RoundingMode.UNNECESSARY).toPlainString();
    }

    private static String scientific(BigDecimal rounded, int e10, int digits) {
        return fixed(rounded.movePointLeft(e10), digits, 0) + "e" + e10;
    }

    private static String withSymbol(String number, String prefix, String symbol) {
        String suffix = prefix + symbol;
        return suffix.isEmpty() ? number : number + (symbol.isEmpty() ? "" : " ") + suffix;
    }
}
