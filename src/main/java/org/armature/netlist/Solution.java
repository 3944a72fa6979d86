package org.armature.netlist;

/**
 * Read access to one iterate or solution of a netlist: node voltages, branch currents and the
 * element states (coil temperature, contact state) the solution was computed with.
 */
public interface Solution {

    /**
     * @param node node index, or {@link Netlist#GROUND}
     * @return node voltage against ground, V (0 for ground)
     */
    double voltage(int node);

    /**
     * @param branch branch number
     * @return branch current, A, flowing from the branch's positive node through it to the negative node
     */
    double branchCurrent(int branch);

    /**
     * @param slot state slot from {@link NetlistBuilder#allocateState}
     * @return the state value (unit as documented by the element that owns the slot)
     */
    double state(int slot);
}
