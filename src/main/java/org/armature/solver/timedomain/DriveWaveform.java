package org.armature.solver.timedomain;

import java.util.ArrayList;
import java.util.List;

/**
 * What the logic pin does during a run: ideal edges between its low and high level. Each edge is a
 * discontinuity of the drive; the engine puts a time point on it and restarts the integration with
 * backward Euler just after it (check-values.md NM-7). The run starts from the DC operating point of the
 * level before the first edge.
 */
public sealed interface DriveWaveform permits DriveWaveform.TurnOn, DriveWaveform.TurnOff, DriveWaveform.Pulse,
        DriveWaveform.EdgeSequence {

    /** Pin level before the first edge (the operating point the run starts from). */
    boolean initialHigh();

    /** Edge times, seconds, strictly increasing, each toggling the level. */
    List<Double> edgeTimes();

    /**
     * Pin level at a time; at an edge time itself the level after the edge.
     *
     * @param timeSeconds time, seconds
     * @return true when high
     */
    default boolean highAt(double timeSeconds) {
        boolean high = initialHigh();
        for (double e : edgeTimes()) {
            if (timeSeconds >= e) {
                high = !high;
            } else {
                break;
            }
        }
        return high;
    }

    /** One rising edge: low before, high from {@code atSeconds} on. */
    record TurnOn(double atSeconds) implements DriveWaveform {
        public TurnOn {
            notNegative("atSeconds", atSeconds);
        }

        @Override
        public boolean initialHigh() {
            return false;
        }

        @Override
        public List<Double> edgeTimes() {
            return List.of(atSeconds);
        }
    }

    /** One falling edge: high before, low from {@code atSeconds} on. */
    record TurnOff(double atSeconds) implements DriveWaveform {
        public TurnOff {
            notNegative("atSeconds", atSeconds);
        }

        @Override
        public boolean initialHigh() {
            return true;
        }

        @Override
        public List<Double> edgeTimes() {
            return List.of(atSeconds);
        }
    }

    /** Low, high from {@code startSeconds} for {@code widthSeconds}, then low again. */
    record Pulse(double startSeconds, double widthSeconds) implements DriveWaveform {
        public Pulse {
            notNegative("startSeconds", startSeconds);
            if (!(widthSeconds > 0) || !Double.isFinite(widthSeconds)) {
                throw new IllegalArgumentException("widthSeconds must be positive, was " + widthSeconds);
            }
        }

        @Override
        public boolean initialHigh() {
            return false;
        }

        @Override
        public List<Double> edgeTimes() {
            return List.of(startSeconds, startSeconds + widthSeconds);
        }
    }

    /**
     * Any sequence of edges.
     *
     * @param initialHigh level before the first edge
     * @param edgeTimes edge times, seconds, strictly increasing, not negative
     */
    record EdgeSequence(boolean initialHigh, List<Double> edgeTimes) implements DriveWaveform {
        public EdgeSequence {
            edgeTimes = List.copyOf(edgeTimes);
            double last = Double.NEGATIVE_INFINITY;
            for (double t : edgeTimes) {
                notNegative("edgeTimes", t);
                if (!(t > last)) {
                    throw new IllegalArgumentException("edgeTimes must be strictly increasing");
                }
                last = t;
            }
        }
    }

    /**
     * Edges of this waveform strictly inside a window.
     *
     * @param fromSeconds start, exclusive
     * @param toSeconds end, exclusive
     * @return the edge times in order
     */
    default List<Double> edgesBetween(double fromSeconds, double toSeconds) {
        List<Double> out = new ArrayList<>();
        for (double e : edgeTimes()) {
            if (e > fromSeconds && e < toSeconds) {
                out.add(e);
            }
        }
        return out;
    }

    private static void notNegative(String name, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and not negative, was " + v);
        }
    }
}
