package org.armature.netlist;

import java.util.List;

/**
 * A voltage source with internal resistance, stamped as its Norton equivalent: a conductance
 * 1/R between {@code p} and {@code n} and a current V/R into {@code p} (Thevenin–Norton
 * equivalence). A logic output pin is one of these, referenced to ground.
 */
public final class NortonSource implements Element {

    private final String label;
    private final int p;
    private final int n;
    private final double volts;
    private final double ohms;

    /**
     * @param label designator for messages
     * @param p output node
     * @param n reference node
     * @param volts open-circuit voltage, V, finite
     * @param ohms internal resistance, Ω, positive
     */
    public NortonSource(String label, int p, int n, double volts, double ohms) {
        if (!Double.isFinite(volts) || !(ohms > 0) || !Double.isFinite(ohms)) {
            throw new IllegalArgumentException(label + ": volts must be finite and ohms positive");
        }
        this.label = label;
        this.p = p;
        this.n = n;
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
     * @return current sourced out of {@code p} into the circuit, A
     */
    public double currentOut(Solution x, double sourceFactor) {
        return (sourceFactor * volts - (x.voltage(p) - x.voltage(n))) / ohms;
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {p, n};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of(new int[] {p, n});
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        double g = 1.0 / ohms;
        s.conductance(p, n, g);
        double i = ctx.sourceFactor() * volts * g;
        s.current(p, i);
        s.current(n, -i);
        return false;
    }
}
