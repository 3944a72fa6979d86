package org.armature.analysis.faults;

/**
 * The spread of an expected reading about its nominal value, volts: the meter's accuracy bound
 * ({@link Meter#toleranceVolts}) combined root-sum-square with the parts' own spread, taken as a
 * share of the reading plus a fixed part (junction drops vary by tens of millivolts). The default
 * 2 % + 10 mV is our own estimate for ±5 % resistors, a ±5 % rail and junction spread, not a
 * computed figure; set it from a Monte Carlo run of the stage where that matters.
 *
 * @param partPercent parts' spread, percent of the reading
 * @param partVolts parts' spread, volts
 */
public record Spread(double partPercent, double partVolts) {

    /** 2 % of the reading + 10 mV. */
    public static final Spread DEFAULT = new Spread(2, 0.010);

    public Spread {
        if (!(partPercent >= 0) || !(partVolts >= 0)) {
            throw new IllegalArgumentException("partPercent and partVolts must not be negative");
        }
    }

    /** The standard deviation used for a reading expected at {@code volts}. */
    public double sigma(Meter meter, double volts) {
        return Math.hypot(meter.toleranceVolts(volts), partPercent / 100 * Math.abs(volts) + partVolts);
    }
}
