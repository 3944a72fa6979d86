package org.armature.solver;

import java.util.Arrays;
import org.armature.netlist.Stamper;

/**
 * The dense MNA matrix and right-hand side of one netlist (Ho, Ruehli, Brennan, IEEE Trans.
 * Circuits Syst. CAS-22, 1975), filled through {@link Stamper}. Row-major; rows and columns
 * {@code 0..nodeCount-1} are node voltages, the rest branch currents. Ground (index −1) rows and
 * columns are dropped. Reused from iteration to iteration: {@link #clear()} zeroes it.
 */
public final class MnaSystem implements Stamper {

    private final int nodes;
    private final int n;
    private final double[] a;
    private final double[] b;

    /**
     * @param nodeCount non-ground nodes
     * @param branchCount voltage-defined branches
     */
    public MnaSystem(int nodeCount, int branchCount) {
        this.nodes = nodeCount;
        this.n = nodeCount + branchCount;
        this.a = new double[n * n];
        this.b = new double[n];
    }

    /** @return number of unknowns */
    public int size() {
        return n;
    }

    /** @return number of node unknowns */
    public int nodeCount() {
        return nodes;
    }

    /** @return the matrix, row-major (live: callers may factor it in place) */
    public double[] matrix() {
        return a;
    }

    /** @return the right-hand side (live) */
    public double[] rhs() {
        return b;
    }

    /** Zeroes matrix and right-hand side. */
    public void clear() {
        Arrays.fill(a, 0.0);
        Arrays.fill(b, 0.0);
    }

    /**
     * @param row row index
     * @param col column index
     * @return matrix entry
     */
    public double get(int row, int col) {
        return a[row * n + col];
    }

    /**
     * Adds to the diagonal of every node row (gmin stepping).
     *
     * @param siemens conductance from each node to ground, S
     */
    public void addNodeShunt(double siemens) {
        for (int i = 0; i < nodes; i++) {
            a[i * n + i] += siemens;
        }
    }

    @Override
    public void conductance(int p, int q, double siemens) {
        if (p >= 0) {
            a[p * n + p] += siemens;
            if (q >= 0) {
                a[p * n + q] -= siemens;
                a[q * n + p] -= siemens;
            }
        }
        if (q >= 0) {
            a[q * n + q] += siemens;
        }
    }

    @Override
    public void transconductance(int p, int q, int cp, int cn, double siemens) {
        if (p >= 0) {
            if (cp >= 0) {
                a[p * n + cp] += siemens;
            }
            if (cn >= 0) {
                a[p * n + cn] -= siemens;
            }
        }
        if (q >= 0) {
            if (cp >= 0) {
                a[q * n + cp] -= siemens;
            }
            if (cn >= 0) {
                a[q * n + cn] += siemens;
            }
        }
    }

    @Override
    public void current(int node, double amps) {
        if (node >= 0) {
            b[node] += amps;
        }
    }

    @Override
    public void voltageBranch(int branch, int p, int q, double volts, double ohms) {
        int r = nodes + branch;
        if (p >= 0) {
            a[p * n + r] += 1.0;
            a[r * n + p] += 1.0;
        }
        if (q >= 0) {
            a[q * n + r] -= 1.0;
            a[r * n + q] -= 1.0;
        }
        a[r * n + r] -= ohms;
        b[r] += volts;
    }
}
