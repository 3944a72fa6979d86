package org.armature.solver;

import org.armature.netlist.Solution;

/**
 * Updates element states that depend on the solution (a relay coil's temperature follows its own
 * power) inside the Newton loop, so that a state and the node voltages converge together instead of
 * in an outer loop of whole Newton solves. {@link NewtonSolver} calls it after every iteration in
 * which no junction was limited; it declares convergence only after an update that moved no state
 * by more than its tolerance.
 */
@FunctionalInterface
public interface StateUpdater {

    /**
     * @param x the present iterate, with the states it was computed with
     * @param states the state slots, updated in place
     * @return true if no state had to move by more than its tolerance (the states are consistent
     *     with {@code x}); false if some state was moved
     */
    boolean update(Solution x, double[] states);
}
