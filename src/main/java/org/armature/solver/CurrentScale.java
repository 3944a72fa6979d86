package org.armature.solver;

import org.armature.netlist.Stamper;

/**
 * The scale of each node's KCL test: the sum over the elements of the magnitude of the current each
 * element carries into the node at x (CHECKS.md NM-6, "the currents meeting there"). Each element's
 * stamp (passed through {@link #tee} alongside the Newton matrix) is evaluated at x and closed with
 * {@link #endElement}, so a junction's companion model counts as the junction's current, not as the
 * two large terms g·v and g·v − i it is stamped with (counting those let a zener in breakdown carry
 * milliamps that nothing supplied while its node passed the test).
 *
 * <p>Allocates its arrays once; one instance serves one thread.
 */
final class CurrentScale implements Stamper {

    private final int nodes;
    private final double[] current;
    private final double[] scale;
    private final int[] touched;
    private int touchedCount;
    private double[] x;

    /** @param nodes non-ground nodes */
    CurrentScale(int nodes) {
        this.nodes = nodes;
        this.current = new double[nodes];
        this.scale = new double[nodes];
        this.touched = new int[4 * Math.max(1, nodes) + 16];
    }

    /** Starts an accumulation at {@code x} (not modified), for stamps passed through {@link #tee}. */
    void begin(double[] x) {
        this.x = x;
        java.util.Arrays.fill(scale, 0.0);
        touchedCount = 0;
    }

    /** Closes one element's stamp: its current at each node it touched joins that node's scale. */
    void endElement() {
        for (int k = 0; k < touchedCount; k++) {
            int node = touched[k];
            scale[node] += Math.abs(current[node]);
            current[node] = 0.0;
        }
        touchedCount = 0;
    }

    /** @return the scale by node accumulated since {@link #begin}, A (live array) */
    double[] scale() {
        return scale;
    }

    /**
     * A stamper that stamps into {@code target} and accumulates here at once, so that one device
     * evaluation serves both the Newton matrix and the scale of its node test.
     *
     * @param target the MNA system
     * @return the combined stamper
     */
    Stamper tee(Stamper target) {
        CurrentScale self = this;
        return new Stamper() {
            @Override
            public void conductance(int a, int b, double siemens) {
                target.conductance(a, b, siemens);
                self.conductance(a, b, siemens);
            }

            @Override
            public void transconductance(int p, int n, int cp, int cn, double siemens) {
                target.transconductance(p, n, cp, cn, siemens);
                self.transconductance(p, n, cp, cn, siemens);
            }

            @Override
            public void current(int node, double amps) {
                target.current(node, amps);
                self.current(node, amps);
            }

            @Override
            public void voltageBranch(int branch, int p, int n, double volts, double ohms) {
                target.voltageBranch(branch, p, n, volts, ohms);
                self.voltageBranch(branch, p, n, volts, ohms);
            }
        };
    }

    private void add(int node, double amps) {
        if (node < 0 || node >= nodes) {
            return;
        }
        if (current[node] == 0.0 && touchedCount < touched.length) {
            touched[touchedCount++] = node;
        }
        current[node] += amps;
        if (current[node] == 0.0) {
            // keep the node listed: a later term may make it nonzero again
            current[node] = Double.MIN_VALUE;
        }
    }

    private double v(int node) {
        return node >= 0 ? x[node] : 0.0;
    }

    @Override
    public void conductance(int a, int b, double siemens) {
        double i = siemens * (v(a) - v(b));
        add(a, i);
        add(b, -i);
    }

    @Override
    public void transconductance(int p, int n, int cp, int cn, double siemens) {
        double i = siemens * (v(cp) - v(cn));
        add(p, i);
        add(n, -i);
    }

    @Override
    public void current(int node, double amps) {
        add(node, -amps);
    }

    @Override
    public void voltageBranch(int branch, int p, int n, double volts, double ohms) {
        double i = x[nodes + branch];
        add(p, i);
        add(n, -i);
    }
}
