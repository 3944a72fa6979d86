package org.armature.solver;

import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;

/**
 * Per-solve overrides of what the stage's {@link org.armature.model.Conditions} say.
 *
 * @param pinHigh drive pin state; empty = the stage's
 * @param ambientCelsius ambient, °C; empty = the stage's nominal ambient
 * @param start start guess (an earlier operating point of the same or a similar stage, matched by
 *     node name); empty = a cold start from 0 V
 * @param previousRelayOperated relay state before this solve, by designator (true = operated); a
 *     coil current between drop-out and pick-up keeps it. A relay not listed is taken as released
 *     (the state after power-up, when the coil current has risen from zero)
 */
public record SolveOptions(Optional<Boolean> pinHigh, OptionalDouble ambientCelsius, Optional<OperatingPoint> start,
                           Map<String, Boolean> previousRelayOperated) {

    /** No overrides. */
    public static final SolveOptions DEFAULT = new SolveOptions(Optional.empty(), OptionalDouble.empty(),
            Optional.empty(), Map.of());

    public SolveOptions {
        if (pinHigh == null || ambientCelsius == null || start == null || previousRelayOperated == null) {
            throw new IllegalArgumentException("SolveOptions fields must not be null (use empty values)");
        }
        previousRelayOperated = Map.copyOf(previousRelayOperated);
    }

    /** @return these options with the pin state set */
    public SolveOptions withPinHigh(boolean high) {
        return new SolveOptions(Optional.of(high), ambientCelsius, start, previousRelayOperated);
    }

    /** @return these options with the ambient set, °C */
    public SolveOptions withAmbient(double celsius) {
        return new SolveOptions(pinHigh, OptionalDouble.of(celsius), start, previousRelayOperated);
    }

    /** @return these options starting from an earlier operating point */
    public SolveOptions withStart(OperatingPoint op) {
        return new SolveOptions(pinHigh, ambientCelsius, Optional.of(op), previousRelayOperated);
    }

    /** @return these options with a relay's previous state set */
    public SolveOptions withPreviousRelayState(String ref, boolean operated) {
        Map<String, Boolean> m = new TreeMap<>(previousRelayOperated);
        m.put(ref, operated);
        return new SolveOptions(pinHigh, ambientCelsius, start, m);
    }

    /** @return these options with all relay states of an earlier operating point as the previous states */
    public SolveOptions withPreviousRelayStates(OperatingPoint op) {
        return new SolveOptions(pinHigh, ambientCelsius, start, op.relayOperated());
    }
}
