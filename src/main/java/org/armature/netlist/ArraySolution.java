package org.armature.netlist;

/**
 * A {@link Solution} over plain arrays: the unknown vector (node voltages, then branch currents)
 * and the state slots. It does not copy: the solver points it at its working arrays, and a result
 * snapshot points it at its own copies.
 */
public final class ArraySolution implements Solution {

    private final int nodeCount;
    private double[] unknowns;
    private double[] states;

    /**
     * @param nodeCount number of non-ground nodes
     * @param unknowns node voltages followed by branch currents (not copied)
     * @param states state slots (not copied)
     */
    public ArraySolution(int nodeCount, double[] unknowns, double[] states) {
        this.nodeCount = nodeCount;
        this.unknowns = unknowns;
        this.states = states;
    }

    /**
     * Points this view at other arrays (not copied).
     *
     * @param newUnknowns node voltages then branch currents
     * @param newStates state slots
     */
    public void bind(double[] newUnknowns, double[] newStates) {
        this.unknowns = newUnknowns;
        this.states = newStates;
    }

    @Override
    public double voltage(int node) {
        return node < 0 ? 0.0 : unknowns[node];
    }

    @Override
    public double branchCurrent(int branch) {
        return unknowns[nodeCount + branch];
    }

    @Override
    public double state(int slot) {
        return states[slot];
    }
}
