package org.armature.analysis;

import java.util.List;

/**
 * The factors of a stage and every corner of them (see {@link Corners#enumerate}).
 *
 * @param factors the toleranced parameters, in a stable order
 * @param corners 2^k variants; corner i has factor j at +1 when bit j of i is set, else −1
 */
public record CornerPlan(List<Factor> factors, List<Variant> corners) {

    public CornerPlan {
        factors = List.copyOf(factors);
        corners = List.copyOf(corners);
    }
}
