package org.armature.analysis.faults;

import java.util.stream.Collectors;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;
import org.armature.units.UnitParseException;

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

    /**
     * Reads {@code NET@high=VOLTS} or {@code NET@low=VOLTS}.
     *
     * @param d the dictionary whose probe points are valid
     * @param text the reading as written
     * @return the reading
     * @throws IllegalArgumentException with one sentence naming what is valid
     */
    public static Reading parse(FaultDictionary d, String text) {
        String t = text.strip();
        int at = t.indexOf('@');
        int eq = t.indexOf('=', Math.max(at, 0));
        String nets = d.probes().stream().map(Probe::name).collect(Collectors.joining(", "));
        if (at <= 0 || eq < 0) {
            throw new IllegalArgumentException("A reading is written NET@high=VOLTS or NET@low=VOLTS (for example "
                    + "switch@high=11.9), not '" + t + "'.");
        }
        String net = t.substring(0, at);
        String state = t.substring(at + 1, eq);
        if (d.probeIndex(net) < 0) {
            throw new IllegalArgumentException("No probe point '" + net + "' in stage \"" + d.stage().name()
                    + "\"; valid: " + nets + ".");
        }
        if (!state.equals("high") && !state.equals("low")) {
            throw new IllegalArgumentException("The pin state of a reading is high or low, not '" + state + "'.");
        }
        try {
            return new Reading(net, state.equals("high"), EngineeringNotation.parse(t.substring(eq + 1), Unit.VOLT, true));
        } catch (UnitParseException e) {
            throw new IllegalArgumentException("A reading's value is a number of volts (for example 11.9 or 250m), not '"
                    + t.substring(eq + 1) + "'.");
        }
    }
}
