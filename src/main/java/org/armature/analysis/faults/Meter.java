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
