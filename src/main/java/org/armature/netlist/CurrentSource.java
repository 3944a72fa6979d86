package org.armature.netlist;

import java.util.List;

/** An ideal DC current source: {@code amps} leave node {@code from} and enter node {@code to} through the source. */
public final class CurrentSource implements Element {

    private final String label;
    private final int from;
    private final int to;
    private final double amps;

    /**
     * @param label name for messages
     * @param from node the current is drawn from
     * @param to node the current is delivered into
     * @param amps current, A, finite
     */
    public CurrentSource(String label, int from, int to, double amps) {
        if (!Double.isFinite(amps)) {
            throw new IllegalArgumentException("amps of " + label + " must be finite");
        }
        this.label = label;
        this.from = from;
        this.to = to;
        this.amps = amps;
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {from, to};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of();
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        double i = ctx.sourceFactor() * amps;
        s.current(to, i);
        s.current(from, -i);
        return false;
    }
}
