package org.armature.netlist;

import java.util.List;

/** A linear resistor between two nodes (Ohm's law). */
public final class Resistor implements Element {

    private final String label;
    private final int a;
    private final int b;
    private final double ohms;

    /**
     * @param label designator for messages
     * @param a node of end a
     * @param b node of end b
     * @param ohms resistance, Ω, positive and finite
     */
    public Resistor(String label, int a, int b, double ohms) {
        if (!(ohms > 0) || !Double.isFinite(ohms)) {
            throw new IllegalArgumentException("ohms of " + label + " must be positive and finite, was " + ohms);
        }
        this.label = label;
        this.a = a;
        this.b = b;
        this.ohms = ohms;
    }

    /** @return resistance, Ω */
    public double ohms() {
        return ohms;
    }

    /**
     * @param x a solution
     * @return current from end a to end b, A
     */
    public double current(Solution x) {
        return (x.voltage(a) - x.voltage(b)) / ohms;
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
        return List.of(new int[] {a, b});
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        s.conductance(a, b, 1.0 / ohms);
        return false;
    }
}
