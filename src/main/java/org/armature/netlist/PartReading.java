package org.armature.netlist;

import java.util.Map;

/**
 * What one part does at a solution: named quantities, named states, the current into each pin and
 * the power it absorbs.
 *
 * @param quantities named values in SI units (keys per kind, see {@link PartNetwork})
 * @param states named states (for example {@code region}, {@code state})
 * @param pinCurrents current into the part at each pin, A, by pin name
 * @param powerWatts power absorbed by the part, W (negative for a source delivering power)
 */
public record PartReading(Map<String, Double> quantities, Map<String, String> states,
                          Map<String, Double> pinCurrents, double powerWatts) {

    public PartReading {
        quantities = Map.copyOf(quantities);
        states = Map.copyOf(states);
        pinCurrents = Map.copyOf(pinCurrents);
    }
}
