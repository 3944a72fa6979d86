package org.armature.units;

import java.util.List;

/**
 * The units a value in Armature can carry, with the symbol used when printing and parsing.
 *
 * <p>Each unit knows the quantity it measures (used in messages: "Cannot read … as a
 * resistance"), whether a negative value makes sense for it by default, whether SI prefixes are
 * printed with it ({@code 4.70 kΩ}, but {@code 25.0 °C} and {@code 5.00 %}), a few example inputs
 * for error messages, and the alternative spellings a user may type ({@code ohm} for {@code Ω}).
 *
 * <p>Symbols follow the SI Brochure (BIPM, 9th edition, 2019). Values inside Armature are always in
 * the coherent SI unit named here; prefixes only appear in text.
 */
public enum Unit {
    /** Volt, electric potential difference; negatives allowed. */
    VOLT("V", "voltage", true, true, "12, 3.3 V, 700m or 1.5e-3"),
    /** Ampere, electric current; negatives allowed (sign follows the reference direction). */
    AMPERE("A", "current", true, true, "16.7m, 20 mA, 1.5 A or 1e-3"),
    /** Ohm, resistance; never negative. Also read as {@code ohm} or {@code ohms}. */
    OHM("Ω", "resistance", false, true, "4k7, 22k, 0R47 or 1.5e3", "ohms", "ohm", "Ohms", "Ohm"),
    /** Siemens, conductance; never negative. */
    SIEMENS("S", "conductance", false, true, "1m, 10 µS or 1e-12"),
    /** Farad, capacitance; never negative. */
    FARAD("F", "capacitance", false, true, "100n, 4n7, 10 µF or 1e-9"),
    /** Henry, inductance; never negative. */
    HENRY("H", "inductance", false, true, "1.15, 50 mH, 500µ or 2e-3"),
    /** Second, time or duration; never negative. */
    SECOND("s", "time", false, true, "5m, 4.2 ms, 100µ or 1e-3"),
    /** Hertz, frequency; never negative. */
    HERTZ("Hz", "frequency", false, true, "50, 15.9 kHz, 1k or 1e3"),
    /** Watt, power; negatives allowed (power delivered rather than absorbed). */
    WATT("W", "power", true, true, "0.5, 625 mW, 100m or 1e-1"),
    /** Joule, energy; negatives allowed. */
    JOULE("J", "energy", true, true, "450µ, 14 mJ, 1m or 1e-3"),
    /** Newton, force; negatives allowed (sign follows the reference direction). */
    NEWTON("N", "force", true, true, "0.2, 200 mN, 1.5 or 2e-1"),
    /**
     * Metre, length or travel; never negative. A trailing {@code m} is read as the unit, so
     * {@code 0.3m} is 0.3 m and {@code 0.3 mm} is 0.3e-3 m.
     */
    METRE("m", "length", false, true, "0.3 mm, 300µ, 1.5 or 3e-4"),
    /** Gram, a moving mass; never negative. */
    GRAM("g", "mass", false, true, "1, 0.5 g, 800m or 1e-1"),
    /** Newton-second per metre, viscous damping; never negative; printed without prefixes. Also read as {@code Ns/m}. */
    NEWTON_SECOND_PER_METRE("N·s/m", "damping", false, false, "0.1, 0.05 N·s/m, 1 or 2e-1", "Ns/m"),
    /** Kelvin, absolute or difference temperature; never negative. */
    KELVIN("K", "temperature", false, true, "300, 298.15 K or 3e2"),
    /** Degree Celsius; negatives allowed; printed without prefixes. Also read as {@code degC}. */
    CELSIUS("°C", "temperature", true, false, "25, -40 °C, 85 or 125", "degC"),
    /** Kelvin per watt, thermal resistance; never negative; printed without prefixes. */
    KELVIN_PER_WATT("K/W", "thermal resistance", false, false, "200, 417 K/W or 62.5"),
    /** Volt per kelvin, a temperature coefficient of a voltage; negatives allowed; printed without prefixes. */
    VOLT_PER_KELVIN("V/K", "temperature coefficient", true, false, "-0.004, -4m V/K or -4e-3"),
    /** Reciprocal volt, a channel-length modulation coefficient; never negative; printed without prefixes. */
    PER_VOLT("1/V", "voltage coefficient", false, false, "0.01, 0.02 1/V or 1e-2"),
    /** Ampere per volt squared, a MOSFET's transconductance parameter; never negative; printed without prefixes. */
    AMPERE_PER_VOLT_SQUARED("A/V²", "transconductance parameter", false, false, "0.25, 0.2 A/V² or 2e-1", "A/V^2"),
    /** Percent (value 5 means 5 %); negatives allowed; printed without prefixes. */
    PERCENT("%", "percentage", true, false, "5, 10 %, 0.5 or 75"),
    /** Dimensionless ratio or gain (no symbol); negatives allowed; printed without prefixes. */
    RATIO("", "ratio", true, false, "100, 0.75, 1k or 1e-3");

    private final String symbol;
    private final String quantityName;
    private final boolean negativesAllowed;
    private final boolean prefixed;
    private final String examples;
    private final List<String> spellings;

    Unit(String symbol, String quantityName, boolean negativesAllowed, boolean prefixed,
            String examples, String... otherSpellings) {
        this.symbol = symbol;
        this.quantityName = quantityName;
        this.negativesAllowed = negativesAllowed;
        this.prefixed = prefixed;
        this.examples = examples;
        this.spellings = symbol.isEmpty() ? List.of() : listWith(symbol, otherSpellings);
    }

    private static List<String> listWith(String first, String... rest) {
        String[] all = new String[rest.length + 1];
        all[0] = first;
        System.arraycopy(rest, 0, all, 1, rest.length);
        return List.of(all);
    }

    /** The printed symbol, such as {@code "Ω"} or {@code "K/W"}; empty for {@link #RATIO}. */
    public String symbol() {
        return symbol;
    }

    /** The quantity in plain words, such as {@code "resistance"}, for messages and tooltips. */
    public String quantityName() {
        return quantityName;
    }

    /** The quantity with its indefinite article, such as {@code "a resistance"}. */
    public String quantityWithArticle() {
        char first = quantityName.charAt(0);
        return ("aeiou".indexOf(first) >= 0 ? "an " : "a ") + quantityName;
    }

    /** Whether a negative value is accepted by default when parsing a value of this unit. */
    public boolean negativesAllowed() {
        return negativesAllowed;
    }

    /** Whether values of this unit are printed with an SI prefix ({@code 4.70 kΩ}). */
    public boolean prefixed() {
        return prefixed;
    }

    /** Example inputs for error messages, such as {@code "4k7, 22k, 0R47 or 1.5e3"}. */
    public String examples() {
        return examples;
    }

    /**
     * Every spelling accepted as a trailing unit when parsing, the symbol first; empty for
     * {@link #RATIO}. Unmodifiable.
     */
    public List<String> spellings() {
        return spellings;
    }
}
