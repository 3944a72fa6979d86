package org.armature.solver;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.armature.netlist.Readings;
import org.armature.netlist.Region;
import org.armature.model.PartKind;

/**
 * One part at an operating point: voltage and current at each pin, absorbed power and the named
 * quantities and states of its kind (keys listed in {@link org.armature.netlist.PartNetwork}).
 *
 * @param ref designator
 * @param kind part kind
 * @param pinVoltages voltage of each pin against ground, V, in the kind's pin order
 * @param pinCurrents current into the part at each pin, A
 * @param powerWatts power absorbed, W (negative for a source delivering power)
 * @param quantities named values, SI units
 * @param states named states ({@code region}, {@code state}, {@code contacts}, {@code contactsFrom})
 */
public record PartResult(String ref, PartKind kind, Map<String, Double> pinVoltages,
                         Map<String, Double> pinCurrents, double powerWatts, Map<String, Double> quantities,
                         Map<String, String> states) {

    public PartResult {
        pinVoltages = Collections.unmodifiableMap(new LinkedHashMap<>(pinVoltages));
        pinCurrents = Map.copyOf(pinCurrents);
        quantities = Map.copyOf(quantities);
        states = Map.copyOf(states);
    }

    /**
     * @param key a quantity key
     * @return its value
     * @throws IllegalArgumentException if this part has no such quantity
     */
    public double quantity(String key) {
        Double v = quantities.get(key);
        if (v == null) {
            throw new IllegalArgumentException(ref + " has no quantity " + key + "; it has " + quantities.keySet());
        }
        return v;
    }

    /**
     * @return the transistor's region ({@link Readings#REGION}); empty for a part that has none
     */
    public Optional<Region> region() {
        String key = states.get(Readings.REGION);
        return key == null ? Optional.empty() : Region.byKey(key);
    }

    /**
     * @param key a state key
     * @return its value
     * @throws IllegalArgumentException if this part has no such state
     */
    public String state(String key) {
        String v = states.get(key);
        if (v == null) {
            throw new IllegalArgumentException(ref + " has no state " + key + "; it has " + states.keySet());
        }
        return v;
    }
}
