package org.armature.analysis.faults;

/**
 * A handheld digital meter on its DC volts ranges: input resistance, display counts and accuracy
 * ±(percent of reading + digits). Ranges are counts × 10^k digits (a 4,000-count meter: 400 mV,
 * 4 V, 40 V, 400 V, ...), the lowest one that shows the reading.
 *
 * @param inputOhms input resistance, ohms (default 10 MΩ, FH-3)
 * @param counts display counts (default 4,000)
 * @param percentOfReading accuracy, percent of reading (default 1 %)
 * @param digits accuracy, digits of the range's last place (default 2; FH-4)
 */
public record Meter(double inputOhms, int counts, double percentOfReading, double digits) {

    /** ±(1 % + 2 digits), 4,000 counts, 10 MΩ (FH-3, FH-4, common practice). */
    public static final Meter DEFAULT = new Meter(10e6, 4000, 1, 2);

    public Meter {
        if (!(inputOhms > 0) || Double.isInfinite(inputOhms)) {
            throw new IllegalArgumentException("inputOhms must be positive and finite, was " + inputOhms);
        }
        if (counts < 10) {
            throw new IllegalArgumentException("counts must be at least 10, was " + counts);
        }
        if (!(percentOfReading >= 0) || !(digits >= 0)) {
            throw new IllegalArgumentException("percentOfReading and digits must not be negative");
        }
    }

    /** The same meter with another input resistance. */
    public Meter withInputOhms(double ohms) {
        return new Meter(ohms, counts, percentOfReading, digits);
    }

    /** The same meter with another accuracy, ±(percent of reading + digits). */
    public Meter withAccuracy(double percent, double newDigits) {
        return new Meter(inputOhms, counts, percent, newDigits);
    }

    /** The same meter with another number of display counts. */
    public Meter withCounts(int newCounts) {
        return new Meter(inputOhms, newCounts, percentOfReading, digits);
    }

    /** The accuracy as written on a meter's sheet and read by {@link #withAccuracy(String)}: {@code 1%+2}. */
    public String accuracyText() {
        return plain(percentOfReading) + "%+" + plain(digits);
    }

    private static String plain(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    /**
     * The same meter with the accuracy written {@code PCT%+DIGITS} ({@code 1%+2}, {@code 0.5%+3};
     * spaces allowed), as meter sheets state it.
     *
     * @param text the accuracy as written
     * @return the changed meter
     * @throws IllegalArgumentException with one sentence and an example, for anything else
     */
    public Meter withAccuracy(String text) {
        String t = text.replace(" ", "");
        int pct = t.indexOf("%+");
        double percent = Double.NaN;
        double d = Double.NaN;
        if (pct > 0 && t.matches("[0-9.]+%\\+[0-9.]+")) {
            try {
                percent = Double.parseDouble(t.substring(0, pct));
                d = Double.parseDouble(t.substring(pct + 2));
            } catch (NumberFormatException e) {
                percent = Double.NaN;
            }
        }
        if (!(percent >= 0 && percent < 100) || !(d >= 0) || Double.isInfinite(d)) {
            throw new IllegalArgumentException("A meter's accuracy is written PERCENT%+DIGITS, percent of the reading "
                    + "plus digits of the last place (for example 1%+2 or 0.5%+3), not '" + text + "'.");
        }
        return withAccuracy(percent, d);
    }

    /**
     * The same meter with the display counts written as a whole number ({@code 4000}, {@code 6000}).
     *
     * @param text the counts as written
     * @return the changed meter
     * @throws IllegalArgumentException with one sentence and an example, for anything else
     */
    public Meter withCounts(String text) {
        String t = text.strip();
        long n = -1;
        if (t.matches("[0-9]{1,9}")) {
            n = Long.parseLong(t);
        }
        if (n < 10) {
            throw new IllegalArgumentException("A meter's display counts are a whole number of at least 10 "
                    + "(for example 4000 or 6000), not '" + text + "'.");
        }
        return withCounts((int) n);
    }

    /** The value of one digit on the range that shows {@code volts}, volts. */
    public double digitVolts(double volts) {
        double d = 1e-4;
        while (counts * d <= Math.abs(volts) && d < 1e6) {
            d *= 10;
        }
        return d;
    }

    /** The accuracy bound of a reading, volts: percent of |reading| plus the digits. */
    public double toleranceVolts(double volts) {
        return percentOfReading / 100 * Math.abs(volts) + digits * digitVolts(volts);
    }
}
