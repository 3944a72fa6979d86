package org.armature.devices;

/**
 * Operating point of one diode fed from a voltage source through a resistor, from
 * {@link Diode#seriesOperatingPoint(double, double, DiodeParams, double)}.
 *
 * @param junctionVolts intrinsic junction voltage, volts
 * @param diodeVolts terminal voltage of the diode including its series resistance, volts
 * @param currentAmps loop current, amperes, anode to cathode
 * @param iterations Newton iterations used
 */
public record SeriesOperatingPoint(double junctionVolts, double diodeVolts, double currentAmps, int iterations) {
}
