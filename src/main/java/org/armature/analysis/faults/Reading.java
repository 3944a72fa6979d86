package org.armature.analysis.faults;

/**
 * One meter reading as the technician took it.
 *
 * @param probe the probe's name ({@link Probe#name()})
 * @param pinHigh the drive pin's state during the reading
 * @param volts the value shown, volts
 */
public record Reading(String probe, boolean pinHigh, double volts) {

    public Reading {
        if (probe == null || probe.isBlank()) {
            throw new IllegalArgumentException("a reading needs a probe point");
        }
        if (!Double.isFinite(volts)) {
            throw new IllegalArgumentException("a reading must be a finite number of volts, was " + volts);
        }
    }
}
