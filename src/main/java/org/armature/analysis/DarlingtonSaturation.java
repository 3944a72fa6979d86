package org.armature.analysis;

/**
 * Output saturation voltage of one channel of a seven-channel Darlington sink array, from the
 * class values common to such datasheets (check-values.md DA-2): typical 0.9 / 1.1 / 1.3 V and maximum
 * 1.1 / 1.3 / 1.6 V at 100 / 200 / 350 mA. Between the points the value is interpolated linearly
 * in current; below 100 mA and above 350 mA it is held at the end values (a conservative reading
 * below 100 mA, where the real drop is somewhat lower).
 */
public final class DarlingtonSaturation {

    private static final double[] CURRENT_AMPS = {0.100, 0.200, 0.350};
    private static final double[] TYPICAL_VOLTS = {0.9, 1.1, 1.3};
    private static final double[] MAXIMUM_VOLTS = {1.1, 1.3, 1.6};

    private DarlingtonSaturation() {
    }

    /** Typical VCE(sat) at an output current, volts (current in amperes, magnitude used). */
    public static double typicalVolts(double collectorAmps) {
        return interpolate(Math.abs(collectorAmps), TYPICAL_VOLTS);
    }

    /** Maximum VCE(sat) at an output current, volts (current in amperes, magnitude used). */
    public static double maximumVolts(double collectorAmps) {
        return interpolate(Math.abs(collectorAmps), MAXIMUM_VOLTS);
    }

    private static double interpolate(double amps, double[] volts) {
        if (!(amps > CURRENT_AMPS[0])) {
            return volts[0];
        }
        for (int i = 1; i < CURRENT_AMPS.length; i++) {
            if (amps <= CURRENT_AMPS[i]) {
                double t = (amps - CURRENT_AMPS[i - 1]) / (CURRENT_AMPS[i] - CURRENT_AMPS[i - 1]);
                return volts[i - 1] + t * (volts[i] - volts[i - 1]);
            }
        }
        return volts[volts.length - 1];
    }
}
