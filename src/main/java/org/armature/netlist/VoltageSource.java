package org.armature.netlist;

import java.util.List;

/**
 * An ideal DC voltage source (a supply rail): one MNA branch, {@code v(p) − v(n) = sourceFactor·volts}.
 */
public final class VoltageSource implements Element {

    private final String label;
    private final int p;
    private final int n;
    private final int branch;
    private final double volts;

    /**
     * @param label designator for messages
     * @param p positive node
     * @param n negative node
     * @param branch branch number from {@link NetlistBuilder#allocateBranch}
     * @param volts source voltage, V, finite
     */
    public VoltageSource(String label, int p, int n, int branch, double volts) {
        if (!Double.isFinite(volts)) {
            throw new IllegalArgumentException("volts of " + label + " must be finite");
        }
        this.label = label;
        this.p = p;
        this.n = n;
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
    public List<int[]> voltageSourcePairs() {
        return List.of(new int[] {p, n});
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        s.voltageBranch(branch, p, n, ctx.sourceFactor() * volts, 0.0);
        return false;
    }
}
