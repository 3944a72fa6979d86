package org.armature.solver.timedomain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The immutable result of one run: the accepted time points, the named traces sampled at them and
 * the located events. Time points are strictly increasing; a drive edge and a located event each
 * lie on a time point.
 *
 * <p>Trace names: {@code "V(net)"} for node voltages (nets by their test-point or numbered names),
 * {@code "I(ref)"} for part currents (for a two-terminal part from its first to its second pin; for
 * a switch into its collector or drain), {@code "coil current"} (A1 → A2), {@code "armature position"}
 * (travel from the released stop, metres), {@code "contact state"} (1 when the normally-open contact is
 * closed).
 */
public final class Waveform {

    /** Name of the coil current trace. */
    public static final String COIL_CURRENT = "coil current";
    /** Name of the armature position trace. */
    public static final String ARMATURE_POSITION = "armature position";
    /** Name of the contact state trace. */
    public static final String CONTACT_STATE = "contact state";

    private final double[] time;
    private final Map<String, Trace> traces;
    private final List<TransientEvent> events;

    /**
     * @param timeSeconds time points, seconds, strictly increasing
     * @param traces traces, each with as many samples as there are time points
     * @param events located events in time order
     */
    public Waveform(double[] timeSeconds, List<Trace> traces, List<TransientEvent> events) {
        this.time = timeSeconds.clone();
        for (int i = 1; i < time.length; i++) {
            if (!(time[i] > time[i - 1])) {
                throw new IllegalArgumentException("timeSeconds must be strictly increasing at index " + i);
            }
        }
        Map<String, Trace> m = new LinkedHashMap<>();
        for (Trace t : traces) {
            if (t.size() != time.length) {
                throw new IllegalArgumentException("trace " + t.name() + " has " + t.size() + " samples, expected "
                        + time.length);
            }
            if (m.put(t.name(), t) != null) {
                throw new IllegalArgumentException("duplicate trace " + t.name());
            }
        }
        this.traces = Collections.unmodifiableMap(m);
        this.events = List.copyOf(events);
    }

    /** A copy of the time points, seconds. */
    public double[] time() {
        return time.clone();
    }

    /** Time of one sample, seconds. */
    public double time(int index) {
        return time[index];
    }

    /** Number of time points. */
    public int size() {
        return time.length;
    }

    /** The trace names in column order. */
    public List<String> traceNames() {
        return new ArrayList<>(traces.keySet());
    }

    /** All traces in column order. */
    public List<Trace> traces() {
        return new ArrayList<>(traces.values());
    }

    /** The trace of this name, if any. */
    public Optional<Trace> trace(String name) {
        return Optional.ofNullable(traces.get(name));
    }

    /**
     * The trace of this name.
     *
     * @throws IllegalArgumentException naming the trace if there is none
     */
    public Trace require(String name) {
        Trace t = traces.get(name);
        if (t == null) {
            throw new IllegalArgumentException("no trace " + name + "; have " + traces.keySet());
        }
        return t;
    }

    /** The located events in time order. */
    public List<TransientEvent> events() {
        return events;
    }

    /** The first event of a kind, if it happened. */
    public Optional<TransientEvent> firstEvent(String what) {
        return events.stream().filter(e -> e.what().equals(what)).findFirst();
    }

    /**
     * A trace's value at any time in the run, linearly interpolated between time points.
     *
     * @param name trace name
     * @param timeSeconds a time within the run
     * @return the interpolated value
     */
    public double valueAt(String name, double timeSeconds) {
        Trace t = require(name);
        int i = Arrays.binarySearch(time, timeSeconds);
        if (i >= 0) {
            return t.value(i);
        }
        int hi = -i - 1;
        if (hi <= 0) {
            return t.value(0);
        }
        if (hi >= time.length) {
            return t.value(time.length - 1);
        }
        double w = (timeSeconds - time[hi - 1]) / (time[hi] - time[hi - 1]);
        return t.value(hi - 1) + w * (t.value(hi) - t.value(hi - 1));
    }
}
