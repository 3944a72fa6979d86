package org.armature.solver.timedomain;

import java.util.List;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.Element;
import org.armature.netlist.StampContext;
import org.armature.netlist.Stamper;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * Newton–Raphson on the modified nodal equations of one time point (Ho, Ruehli and Brennan,
 * IEEE Trans. CAS-22, 1975): every element stamps its linearisation at the iterate through
 * {@link Stamper}; the dense system is solved by LU with partial pivoting; the iteration stops when
 * every update passes {@code |Δ| ≤ reltol·|x| + abstol} (CHECKS NM-6) and no element limited its
 * junction voltages.
 *
 * <p>Stand-in for the transient run until the solver package's Newton loop takes a time-step
 * context; it keeps the same element contract so the swap is local to {@link TransientAnalysis}.
 * Mutable working arrays; one instance per run and thread.
 */
final class StepNewton implements Stamper {

    private final int nodes;
    private final int size;
    private final StepOptions options;
    private final DMatrixRMaj a;
    private final DMatrixRMaj rhs;
    private final DMatrixRMaj solution;
    private final LinearSolverDense<DMatrixRMaj> lu;
    private final double[] next;
    private final ArraySolution view;
    private int iterations;

    StepNewton(int nodeCount, int branchCount, StepOptions options) {
        this.nodes = nodeCount;
        this.size = nodeCount + branchCount;
        this.options = options;
        this.a = new DMatrixRMaj(size, size);
        this.rhs = new DMatrixRMaj(size, 1);
        this.solution = new DMatrixRMaj(size, 1);
        this.lu = LinearSolverFactory_DDRM.lu(size);
        this.next = new double[size];
        this.view = new ArraySolution(nodeCount, new double[size], new double[0]);
    }

    /** Total Newton iterations so far. */
    int iterations() {
        return iterations;
    }

    /**
     * Solves one point.
     *
     * @param elements the elements to stamp
     * @param x start iterate on entry, solution on success (unchanged contents are not promised on failure)
     * @param states state slots (not modified)
     * @param ctx the stamp context
     * @return true on convergence
     */
    boolean solve(List<Element> elements, double[] x, double[] states, StampContext ctx) {
        view.bind(x, states);
        for (Element e : elements) {
            e.begin(view);
        }
        for (int it = 0; it < options.newtonMaxIterations(); it++) {
            iterations++;
            a.zero();
            rhs.zero();
            view.bind(x, states);
            boolean limited = false;
            for (Element e : elements) {
                limited |= e.stamp(this, view, ctx);
            }
            if (!lu.setA(a)) {
                return false;
            }
            lu.solve(rhs, solution);
            boolean converged = true;
            for (int i = 0; i < size; i++) {
                double v = solution.data[i];
                if (!Double.isFinite(v)) {
                    return false;
                }
                double abs = i < nodes ? options.newtonAbsoluteVolts() : options.newtonAbsoluteAmps();
                if (Math.abs(v - x[i]) > options.newtonRelativeTolerance() * Math.abs(v) + abs) {
                    converged = false;
                }
                next[i] = v;
            }
            System.arraycopy(next, 0, x, 0, size);
            if (converged && !limited && it > 0) {
                return true;
            }
        }
        return false;
    }

    @Override
    public void conductance(int p, int n, double siemens) {
        if (p >= 0) {
            a.add(p, p, siemens);
        }
        if (n >= 0) {
            a.add(n, n, siemens);
        }
        if (p >= 0 && n >= 0) {
            a.add(p, n, -siemens);
            a.add(n, p, -siemens);
        }
    }

    @Override
    public void transconductance(int p, int n, int cp, int cn, double siemens) {
        add(p, cp, siemens);
        add(p, cn, -siemens);
        add(n, cp, -siemens);
        add(n, cn, siemens);
    }

    @Override
    public void current(int node, double amps) {
        if (node >= 0) {
            rhs.data[node] += amps;
        }
    }

    @Override
    public void voltageBranch(int branch, int p, int n, double volts, double ohms) {
        int k = nodes + branch;
        add(p, k, 1);
        add(n, k, -1);
        add(k, p, 1);
        add(k, n, -1);
        a.add(k, k, -ohms);
        rhs.data[k] += volts;
    }

    private void add(int row, int col, double v) {
        if (row >= 0 && col >= 0) {
            a.add(row, col, v);
        }
    }
}
