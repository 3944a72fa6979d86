package org.armature.netlist;

import java.util.List;

/**
 * An ideal DC voltage source (a supply rail): one MNA branch, {@code v(a) − v(b) = sourceFactor·volts}.
 */
public final class VoltageSource extends TwoTerminalElement {

    private final int branch;
    private final double volts;

    /**
     * @param label designator for messages
     * @param a positive node
     * @param b negative node
     * @param branch branch number from {@link NetlistBuilder#allocateBranch}
     * @param volts source voltage, V, finite
     */
    public VoltageSource(String label, int a, int b, int branch, double volts) {
        super(label, a, b);
        if (!Double.isFinite(volts)) {
            throw new IllegalArgumentException("volts of " + label + " must be finite");
        }
        this.branch = branch;
        this.volts = volts;
    }

    /** @return branch number of this source */
    public int branch() {
        return branch;
    }

    /** @return full-scale voltage, V */
    public double volts() {
        return volts;
    }

    @Override
    public List<int[]> voltageSourcePairs() {
        return List.of(new int[] {a, b});
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        s.voltageBranch(branch, a, b, ctx.sourceFactor() * volts, 0.0);
        return false;
    }
}
