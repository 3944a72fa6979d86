package org.armature.netlist;

import java.util.List;

/**
 * A linear capacitor of the DC netlist: open at DC, so it stamps nothing. It carries the
 * capacitance for the transient engine, which replaces it by its own companion element (with the
 * run's integration formula and history); stamping it at a time point is a programming error.
 */
public final class Capacitor extends TwoTerminalElement {

    private final double farads;

    /**
     * @param label designator for messages
     * @param a node of terminal 1
     * @param b node of terminal 2
     * @param farads capacitance, F, positive
     */
    public Capacitor(String label, int a, int b, double farads) {
        super(label, a, b);
        if (!(farads > 0) || !Double.isFinite(farads)) {
            throw new IllegalArgumentException("farads of " + label + " must be positive and finite");
        }
        this.farads = farads;
    }

    /** @return capacitance, F */
    public double farads() {
        return farads;
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of();
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        if (!ctx.isDc()) {
            throw new IllegalStateException("capacitor " + label + " stamped at a time point: the transient engine"
                    + " replaces it by its own companion");
        }
        return false;
    }
}
