package org.armature.netlist;

import java.util.List;

/**
 * What every two-terminal element shares: its designator and its two nodes, {@code a} and
 * {@code b}. By default the element conducts between them (a DC path for the topology check); an
 * element that does not (a capacitor) overrides {@link #conductingPairs()}.
 */
public abstract class TwoTerminalElement implements Element {

    /** Designator for messages. */
    protected final String label;
    /** Node of terminal a (the positive or first end). */
    protected final int a;
    /** Node of terminal b. */
    protected final int b;

    /**
     * @param label designator for messages
     * @param a node of terminal a
     * @param b node of terminal b
     */
    protected TwoTerminalElement(String label, int a, int b) {
        this.label = label;
        this.a = a;
        this.b = b;
    }

    @Override
    public final String label() {
        return label;
    }

    @Override
    public final int[] terminals() {
        return new int[] {a, b};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of(new int[] {a, b});
    }
}
