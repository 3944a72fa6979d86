package org.armature.netlist;

import java.util.List;

/**
 * A linear voltage-controlled current source: {@code gm·(v(cp) − v(cn))} flows from {@code p}
 * through the element into {@code n}. Used for linear test networks and as the small-signal part
 * of device models.
 */
public final class Transconductor implements Element {

    private final String label;
    private final int p;
    private final int n;
    private final int cp;
    private final int cn;
    private final double siemens;

    /**
     * @param label name for messages
     * @param p node the current leaves
     * @param n node the current enters
     * @param cp positive controlling node
     * @param cn negative controlling node
     * @param siemens transconductance, S, finite
     */
    public Transconductor(String label, int p, int n, int cp, int cn, double siemens) {
        if (!Double.isFinite(siemens)) {
            throw new IllegalArgumentException("siemens of " + label + " must be finite");
        }
        this.label = label;
        this.p = p;
        this.n = n;
        this.cp = cp;
        this.cn = cn;
        this.siemens = siemens;
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {p, n, cp, cn};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of();
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        s.transconductance(p, n, cp, cn, siemens);
        return false;
    }
}
