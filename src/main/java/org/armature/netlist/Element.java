package org.armature.netlist;

import java.util.List;

/**
 * One stampable element of a netlist: a resistor, a source, a junction, a transistor, a coil.
 *
 * <p>Parameters are fixed at construction. Nonlinear elements keep the junction voltages of the
 * last iterate for Newton limiting; that memory is the only mutable state and it never affects a
 * converged answer, so an element may serve many solves but only one thread at a time.
 */
public interface Element {

    /**
     * @return designator of the part this element belongs to, with its role for composite parts,
     *     for messages (for example {@code "Q1"}, {@code "U2 Q2"}, {@code "D1 series resistance"})
     */
    String label();

    /** @return node indices of the terminals ({@link Netlist#GROUND} allowed) */
    int[] terminals();

    /**
     * @return pairs of nodes joined by a DC path through this element (for the floating-node check);
     *     a capacitor has none, a MOSFET gate none to the channel
     */
    List<int[]> conductingPairs();

    /** @return pairs of nodes whose voltage difference this element fixes (for the source-loop check) */
    default List<int[]> voltageSourcePairs() {
        return List.of();
    }

    /** @return true if the element's stamp depends on the iterate */
    default boolean isNonlinear() {
        return false;
    }

    /**
     * Resets the Newton limiting memory to the junction voltages of a start point.
     *
     * @param start the start iterate
     */
    default void begin(Solution start) {
        // linear elements have no memory
    }

    /**
     * Resets the limiting memory for a cold start (no earlier solution, usually all 0 V), after the
     * initial-junction mode of Nagel's simulator (ERL M520, 1975): like {@link #begin}, and in
     * addition a junction that a Newton step first pushes above its critical voltage is linearised
     * at that critical voltage, a typical forward voltage (the junction's current there is about
     * nVT/√2 ≈ 18 mA), instead of being crept up from 0 V by the ordinary limiting. Junctions that
     * the circuit's DC paths never forward-bias are untouched. The default is {@link #begin}.
     *
     * @param start the start iterate
     */
    default void beginCold(Solution start) {
        begin(start);
    }

    /**
     * Stamps the element linearised at the iterate {@code x}.
     *
     * @param s where to stamp
     * @param x the present iterate (not modified)
     * @param ctx analysis mode and source factor
     * @return true if junction limiting moved the linearisation point away from {@code x}; the
     *     Newton loop must not declare convergence on such an iteration
     */
    boolean stamp(Stamper s, Solution x, StampContext ctx);

    /**
     * Called once a time point (or the DC point) is accepted, so that reactive elements can keep
     * their history. Nothing to do for DC elements.
     *
     * @param x the accepted solution
     * @param ctx the context it was solved in
     */
    default void accept(Solution x, StampContext ctx) {
        // no history
    }
}
