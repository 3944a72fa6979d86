package org.armature.netlist;

/**
 * The one narrow interface through which every element writes its linearised equations into a
 * modified nodal analysis system (C.-W. Ho, A. E. Ruehli, P. A. Brennan, "The modified nodal
 * approach to network analysis", IEEE Trans. Circuits Syst. CAS-22, 1975).
 *
 * <p>Unknowns are the node voltages (nodes {@code 0..nodeCount-1}; {@link Netlist#GROUND} is the
 * reference and every call silently drops its row and column) and one current per voltage-defined
 * branch. Every call <em>adds</em> to what is already there, so elements sharing nodes simply stamp
 * in turn. A companion model of a capacitor or inductor (transient analysis) is a conductance plus
 * a current, or a branch with a series resistance: nothing else is needed.
 *
 * <p>Sign conventions: a node row sums the currents <em>leaving</em> the node through elements and
 * equals the currents injected into it by {@link #current}.
 */
public interface Stamper {

    /**
     * Adds a conductance between two nodes.
     *
     * @param a one node (or {@link Netlist#GROUND})
     * @param b the other node (or {@link Netlist#GROUND})
     * @param siemens conductance, S; may be negative for a linearised negative slope
     */
    void conductance(int a, int b, double siemens);

    /**
     * Adds a voltage-controlled current {@code siemens·(v(cp) − v(cn))} flowing from node {@code p}
     * through the element into node {@code n}.
     *
     * @param p node the controlled current leaves
     * @param n node the controlled current enters
     * @param cp positive controlling node
     * @param cn negative controlling node
     * @param siemens transconductance, S
     */
    void transconductance(int p, int n, int cp, int cn, double siemens);

    /**
     * Adds a constant current injected into a node from outside (the right-hand side).
     *
     * @param node the node (or {@link Netlist#GROUND}, ignored)
     * @param amps current into the node, A
     */
    void current(int node, double amps);

    /**
     * Adds a voltage-defined branch: {@code v(p) − v(n) − ohms·i = volts}, where the branch current
     * {@code i} (an extra unknown) flows from node {@code p} through the branch to node {@code n}.
     * A supply delivering power therefore has a negative branch current.
     *
     * @param branch branch number from {@link NetlistBuilder#allocateBranch}, 0-based
     * @param p positive node
     * @param n negative node
     * @param volts branch voltage, V
     * @param ohms series resistance in the branch equation, Ω (0 for an ideal source; an
     *     inductor's companion model uses it)
     */
    void voltageBranch(int branch, int p, int n, double volts, double ohms);
}
