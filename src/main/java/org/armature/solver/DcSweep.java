package org.armature.solver;

import java.util.List;

/**
 * The result of a DC sweep, immutable.
 *
 * @param variable what was swept
 * @param points one point per value, in sweep order
 */
public record DcSweep(SweepVariable variable, List<SweepPoint> points) {

    public DcSweep {
        points = List.copyOf(points);
    }
}
