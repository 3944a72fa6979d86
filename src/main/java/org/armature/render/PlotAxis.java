package org.armature.render;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A value axis of a plot: ends on whole steps, a step of 1, 2 or 5 times a power of ten, and one
 * label format for every tick (one SI prefix, one number of decimals), so that an axis never reads
 * "8.00" beside "10.0" nor has two equal ends.
 *
 * <p>How the range is found ({@link #of}):
 * <ul>
 *   <li>the data are first clamped to the physical limits of the quantity (armature travel lies
 *       between its two stops; a quantity that cannot be negative has a floor of 0);</li>
 *   <li>a flat trace (no spread, or a spread below a millionth of its magnitude, which is rounding)
 *       gets a range from its magnitude: from 0 to its value; a trace flat at 0 gets
 *       {@link #quietSpan(String)} of its unit;</li>
 *   <li>5 % headroom is added on the side away from zero, never past a physical limit, then the
 *       ends are rounded out to whole steps and clamped to the limits again.</li>
 * </ul>
 *
 * @param lo lower end, in the quantity's SI unit
 * @param hi upper end, greater than {@code lo}
 * @param step distance between ticks, positive
 * @param exponent power of ten of the SI prefix every label uses (a multiple of 3)
 * @param decimals decimals every label shows
 * @param unit SI unit symbol ("A", "V", "m"; "" for none)
 */
public record PlotAxis(double lo, double hi, double step, int exponent, int decimals, String unit) {

    /** Share of the span added as headroom away from zero. */
    public static final double HEADROOM = 0.05;
    /** Spread below this share of a trace's magnitude counts as flat (numerical rounding). */
    public static final double FLAT_SHARE = 1e-6;
    /** Largest share of the span that rounding an end out to a whole step may add. */
    public static final double ROUNDING_SHARE = 0.15;
    /** Steps an axis is divided into, about. */
    public static final int TARGET_STEPS = 4;

    public PlotAxis {
        if (!(hi > lo) || !(step > 0)) {
            throw new IllegalArgumentException("axis needs hi > lo and a positive step, was " + lo + ", " + hi + ", " + step);
        }
    }

    /**
     * The axis for a trace.
     *
     * @param dataLo smallest value of the trace
     * @param dataHi largest value of the trace, not below {@code dataLo}
     * @param floor lowest value the quantity can take ({@code -Infinity} for none)
     * @param ceiling highest value the quantity can take ({@code +Infinity} for none), above floor
     * @param unit SI unit symbol
     * @return the axis
     */
    public static PlotAxis of(double dataLo, double dataHi, double floor, double ceiling, String unit) {
        double lo = clamp(dataLo, floor, ceiling);
        double hi = clamp(dataHi, floor, ceiling);
        double magnitude = Math.max(Math.abs(lo), Math.abs(hi));
        if (!(hi - lo > FLAT_SHARE * magnitude)) {
            double v = (lo + hi) / 2;
            if (magnitude > 0) {
                lo = Math.min(0, v);
                hi = Math.max(0, v);
            } else {
                lo = 0;
                hi = quietSpan(unit);
            }
            lo = clamp(lo, floor, ceiling);
            hi = clamp(hi, floor, ceiling);
            if (!(hi > lo)) {
                // a flat trace at a limit: open the span inwards
                if (hi < ceiling) {
                    hi = Double.isFinite(ceiling) ? ceiling : lo + Math.max(magnitude, quietSpan(unit));
                } else {
                    lo = Double.isFinite(floor) ? floor : hi - Math.max(magnitude, quietSpan(unit));
                }
            }
        }
        double span = hi - lo;
        if (hi > 0) {
            hi = Math.min(ceiling, hi + HEADROOM * span);
        }
        if (lo < 0) {
            lo = Math.max(floor, lo - HEADROOM * span);
        }
        double step = niceStep((hi - lo) / TARGET_STEPS);
        // the finer step: the decade of a 2 or 5 step, a fifth of a 1 step (10 mA gives 2 mA, 50 nA gives 10 nA)
        double decade = Math.pow(10, Math.floor(Math.log10(step) + 1e-9));
        double minor = step / decade < 1.5 ? decade / 5 : decade;
        double niceLo = Math.floor(lo / step + 1e-9) * step;
        double niceHi = Math.ceil(hi / step - 1e-9) * step;
        // a whole step that would add more than ROUNDING_SHARE of the span (a small dip below zero
        // rounded to a whole step down) is replaced by a tenth-of-a-decade step
        boolean fine = false;
        if (lo - niceLo > ROUNDING_SHARE * (hi - lo)) {
            niceLo = Math.floor(lo / minor + 1e-9) * minor;
            fine = true;
        }
        if (niceHi - hi > ROUNDING_SHARE * (hi - lo)) {
            niceHi = Math.ceil(hi / minor - 1e-9) * minor;
            fine = true;
        }
        niceLo = Math.max(floor, niceLo);
        niceHi = Math.min(ceiling, niceHi);
        if (!(niceHi > niceLo)) {
            niceLo = lo;
            niceHi = hi;
        }
        int exponent = engineeringExponent(Math.max(Math.abs(niceLo), Math.abs(niceHi)));
        int decimals = Math.max(0, exponent - (int) Math.floor(Math.log10(fine ? minor : step) + 1e-9));
        return new PlotAxis(niceLo, niceHi, step, exponent, Math.min(decimals, 6), unit);
    }

    /**
     * The span shown for a trace flat at zero, by unit: the smallest change worth reading on a relay
     * stage (common practice for bench readings: 1 mA, 100 mV, 10 µm); 1 for anything else.
     */
    public static double quietSpan(String unit) {
        return switch (unit) {
            case "A" -> 1e-3;
            case "V" -> 0.1;
            case "m" -> 1e-5;
            case "s" -> 1e-3;
            default -> 1;
        };
    }

    /** The label of a value in this axis's one format ("12.5 mA", "0.0 mA"). */
    public String label(double v) {
        double scaled = v / Math.pow(10, exponent);
        String number = String.format(Locale.ROOT, "%." + decimals + "f", scaled);
        if (number.matches("-0(\\.0*)?")) {
            number = number.substring(1);
        }
        number = number.replace('-', '−');
        String symbol = prefix(exponent) + unit;
        return symbol.isEmpty() ? number : number + " " + symbol;
    }

    /** The tick values from lo to hi, every step. */
    public List<Double> ticks() {
        List<Double> out = new ArrayList<>();
        int n = (int) Math.round((hi - lo) / step);
        for (int i = 0; i <= n; i++) {
            double v = lo + i * step;
            if (v <= hi + step * 1e-9) {
                out.add(Math.abs(v) < step * 1e-9 ? 0.0 : v);
            }
        }
        if (out.isEmpty() || out.get(out.size() - 1) < hi - step * 1e-9) {
            out.add(hi);
        }
        return out;
    }

    /** 1, 2 or 5 times a power of ten, nearest above {@code raw} in that series' sense. */
    public static double niceStep(double raw) {
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / p;
        return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * p;
    }

    /** The number of decimals that shows every multiple of {@code step} exactly (1, 2 or 5 × 10^k). */
    public static int decimalsFor(double step) {
        return Math.max(0, -(int) Math.floor(Math.log10(step) + 1e-9));
    }

    private static int engineeringExponent(double magnitude) {
        if (!(magnitude > 0)) {
            return 0;
        }
        int e = (int) Math.floor(Math.log10(magnitude) / 3 + 1e-9) * 3;
        return Math.max(-12, Math.min(9, e));
    }

    private static String prefix(int exponent) {
        return switch (exponent) {
            case -12 -> "p";
            case -9 -> "n";
            case -6 -> "µ";
            case -3 -> "m";
            case 3 -> "k";
            case 6 -> "M";
            case 9 -> "G";
            default -> "";
        };
    }

    private static double clamp(double v, double floor, double ceiling) {
        return Math.max(floor, Math.min(ceiling, v));
    }
}
