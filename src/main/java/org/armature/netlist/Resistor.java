package org.armature.netlist;


/** A linear resistor between two nodes (Ohm's law). */
public final class Resistor extends TwoTerminalElement {

    private final double ohms;

    /**
     * @param label designator for messages
     * @param a node of end a
     * @param b node of end b
     * @param ohms resistance, Ω, positive and finite
     */
    public Resistor(String label, int a, int b, double ohms) {
        super(label, a, b);
        if (!(ohms > 0) || !Double.isFinite(ohms)) {
            throw new IllegalArgumentException("ohms of " + label + " must be positive and finite, was " + ohms);
        }
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
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        s.conductance(a, b, 1.0 / ohms);
        return false;
    }
}
