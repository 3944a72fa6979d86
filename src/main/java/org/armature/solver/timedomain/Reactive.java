package org.armature.solver.timedomain;

import org.armature.netlist.Element;
import org.armature.netlist.Solution;

/**
 * An element with state variables integrated in time: it stamps its companion model from the
 * {@link StepState} of its run, reports its states for the truncation-error test and keeps its own
 * history, which changes only in {@link #commit}.
 */
interface Reactive extends Element {

    /** The unit classes of the states, for the absolute tolerances. */
    enum Unit { VOLTS, AMPS, METRES }

    /** Number of states. */
    int stateCount();

    /** Unit class of a state. */
    Unit unit(int index);

    /**
     * The states at a solution of the point being solved.
     *
     * @param x the solution (not modified)
     * @param out written at {@code offset .. offset + stateCount() − 1}
     * @param offset first index to write
     */
    void states(Solution x, double[] out, int offset);

    /**
     * Takes the DC operating point as the initial history (derivatives zero).
     *
     * @param x the operating point
     */
    void initialise(Solution x);

    /**
     * Makes the solution of the point just solved the newest history point.
     *
     * @param x the accepted solution
     */
    void commit(Solution x);

    /**
     * The derivative of the state as the integration formula last committed it (a capacitor's
     * current, a coil's dλ/dt in volts): the trapezoidal rule's undamped ringing shows first here.
     *
     * @return the committed derivative, in {@link #derivativeUnit()}
     */
    double committedDerivative();

    /** @return the unit class of {@link #committedDerivative()} */
    Unit derivativeUnit();
}
