package org.armature.netlist;


/**
 * A voltage source with internal resistance, stamped as its Norton equivalent: a conductance
 * 1/R between {@code a} and {@code b} and a current V/R into {@code a} (Thevenin–Norton
 * equivalence). A logic output pin is one of these, referenced to ground.
 */
public final class NortonSource extends TwoTerminalElement {

    private final double volts;
    private final double ohms;

    /**
     * @param label designator for messages
     * @param a output node
     * @param b reference node
     * @param volts open-circuit voltage, V, finite
     * @param ohms internal resistance, Ω, positive
     */
    public NortonSource(String label, int a, int b, double volts, double ohms) {
        super(label, a, b);
        if (!Double.isFinite(volts) || !(ohms > 0) || !Double.isFinite(ohms)) {
            throw new IllegalArgumentException(label + ": volts must be finite and ohms positive");
        }
        this.volts = volts;
        this.ohms = ohms;
    }

    /** @return open-circuit voltage at full scale, V */
    public double volts() {
        return volts;
    }

    /** @return internal resistance, Ω */
    public double ohms() {
        return ohms;
    }

    /**
     * @param x a solution
     * @param sourceFactor the source factor it was solved with
     * @return current sourced out of {@code a} into the circuit, A
     */
    public double currentOut(Solution x, double sourceFactor) {
        return (sourceFactor * volts - (x.voltage(a) - x.voltage(b))) / ohms;
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        double g = 1.0 / ohms;
        s.conductance(a, b, g);
        double i = ctx.sourceFactor() * volts * g;
        s.current(a, i);
        s.current(b, -i);
        return false;
    }
}
