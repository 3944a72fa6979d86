package org.armature.solver.timedomain;

import org.armature.netlist.PartNetwork;
import org.armature.netlist.PartReading;
import org.armature.netlist.Solution;

/**
 * The reading of one part at the point being recorded, computed once however many probes ask for
 * it (a transistor's reading evaluates its model and builds its quantity maps). The run clears it
 * before each recorded point; not thread-safe, one per run.
 */
final class ReadingMemo {

    private PartNetwork part;
    private PartReading reading;

    /** Forgets the reading: the next {@link #of} reads the part again. */
    void clear() {
        reading = null;
        part = null;
    }

    /**
     * @param p the part
     * @param x the solution being recorded
     * @return the part's reading at {@code x}, computed on the first call after {@link #clear}
     */
    PartReading of(PartNetwork p, Solution x) {
        if (reading == null || part != p) {
            reading = p.read(x);
            part = p;
        }
        return reading;
    }
}
