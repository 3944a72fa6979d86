package org.armature.netlist;

import java.util.List;

/**
 * A linear capacitor. At DC it is open and stamps nothing. At a transient point it stamps the
 * backward-Euler companion model: conductance α0·C in parallel with a current α0·C·v(previous)
 * into {@code a}, where α0 = {@link StampContext#integrationCoefficientPerSecond()} and v(previous)
 * is the voltage at the last accepted point (kept by {@link #accept}). A transient engine that
 * needs another integration formula supplies its own companion element through the same
 * {@link Stamper} calls.
 */
public final class Capacitor implements Element {

    private final String label;
    private final int a;
    private final int b;
    private final double farads;
    private double previousVolts;

    /**
     * @param label designator for messages
     * @param a node of terminal 1
     * @param b node of terminal 2
     * @param farads capacitance, F, positive
     */
    public Capacitor(String label, int a, int b, double farads) {
        if (!(farads > 0) || !Double.isFinite(farads)) {
            throw new IllegalArgumentException("farads of " + label + " must be positive and finite");
        }
        this.label = label;
        this.a = a;
        this.b = b;
        this.farads = farads;
    }

    /** @return capacitance, F */
    public double farads() {
        return farads;
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {a, b};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of();
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        if (ctx.isDc()) {
            return false;
        }
        double g = ctx.integrationCoefficientPerSecond() * farads;
        s.conductance(a, b, g);
        s.current(a, g * previousVolts);
        s.current(b, -g * previousVolts);
        return false;
    }

    @Override
    public void accept(Solution x, StampContext ctx) {
        previousVolts = x.voltage(a) - x.voltage(b);
    }
}
