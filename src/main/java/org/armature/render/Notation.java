package org.armature.render;

import java.util.Locale;

/**
 * Engineering notation for labels: three significant figures, an SI prefix from pico to giga and a
 * space before the unit ({@code 1 kΩ}, {@code 12 V}, {@code 29.6 mA}), as IEC 80000-1 writes
 * quantities. Percent, degrees Celsius and unitless ratios take no prefix.
 *
 * <p>Interim formatter of the render layer; the units package's engineering notation replaces it.
 */
public final class Notation {

    private static final String[] PREFIXES = {"p", "n", "µ", "m", "", "k", "M", "G"};
    private static final int UNIT_INDEX = 4;

    private Notation() {
    }

    /** The value with an SI prefix and the unit symbol, e.g. {@code format(4700, "Ω")} is {@code 4.7 kΩ}. */
    public static String format(double value, String unit) {
        if (!Double.isFinite(value)) {
            return (Double.isNaN(value) ? "—" : value > 0 ? "∞" : "−∞") + (unit.isEmpty() ? "" : " " + unit);
        }
        if (unit.isEmpty() || unit.equals("%") || unit.equals("°C")) {
            return plain(value) + (unit.isEmpty() ? "" : " " + unit);
        }
        if (value == 0) {
            return "0 " + unit;
        }
        int exp3 = (int) Math.floor(Math.log10(Math.abs(value)) / 3);
        exp3 = Math.max(-UNIT_INDEX, Math.min(PREFIXES.length - 1 - UNIT_INDEX, exp3));
        double scaled = value / Math.pow(1000, exp3);
        String digits = sig3(scaled);
        if (digits.replace("-", "").equals("1000") && exp3 + UNIT_INDEX < PREFIXES.length - 1) {
            exp3++;
            digits = sig3(value / Math.pow(1000, exp3));
        }
        return digits + " " + PREFIXES[exp3 + UNIT_INDEX] + unit;
    }

    private static String plain(double v) {
        if (Math.abs(v) >= 1000 || v == Math.rint(v)) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return sig3(v);
    }

    private static String sig3(double v) {
        double a = Math.abs(v);
        String s;
        if (a >= 99.95) {
            s = String.format(Locale.ROOT, "%.0f", v);
        } else if (a >= 9.995) {
            s = String.format(Locale.ROOT, "%.1f", v);
        } else {
            s = String.format(Locale.ROOT, "%.2f", v);
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s.equals("-0") ? "0" : s.replace('-', '−');
    }
}
