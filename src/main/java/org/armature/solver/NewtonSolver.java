package org.armature.solver;

import java.util.List;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.Element;
import org.armature.netlist.Netlist;
import org.armature.netlist.StampContext;

/**
 * Newton–Raphson on the MNA equations of one netlist, with the devices' junction limiting (Nagel,
 * ERL M520, 1975), step damping and the convergence test of {@link ConvergenceTolerances}. The
 * transient engine reuses it for each time point: it passes a {@link StampContext} with the step
 * and the companion models stamp themselves.
 *
 * <p>Compile once, solve many: the matrix, right-hand side, LU work arrays and iterate buffers are
 * allocated in the constructor and reused by every {@link #run}; a run allocates nothing. One
 * instance serves one thread.
 *
 * <p>An iteration stamps every element at the iterate x (each nonlinear element may limit its own
 * linearisation point) and declares convergence when no element limited, the previous step passed
 * the step test and every residual r = A·x − b passes the residual test (the residual is computed
 * only once the other tests have passed, and after the last iteration for the report). Otherwise it
 * factors and solves for the next iterate.
 */
public final class NewtonSolver {

    private Netlist netlist;
    private final NewtonOptions options;
    private final LinearSolver lu;
    private final MnaSystem mna;
    private final Element[] elements;
    private final int n;
    private final int nodes;
    private final double[] next;
    private final ArraySolution view;

    private int iterations;
    private double maxResidualAmps;
    private int worstUnknown;
    private boolean singular;
    private int singularUnknown = -1;

    /**
     * @param netlist the netlist (checked by the caller with {@link DcPathCheck})
     * @param options iteration limit, damping, tolerances
     */
    public NewtonSolver(Netlist netlist, NewtonOptions options) {
        this(netlist, options, new DenseLu(Math.max(1, netlist.unknownCount()), options.relativePivotThreshold()));
    }

    /**
     * @param netlist the netlist
     * @param options iteration limit, damping, tolerances
     * @param lu linear solver of size {@code netlist.unknownCount()}
     */
    public NewtonSolver(Netlist netlist, NewtonOptions options, LinearSolver lu) {
        if (lu.size() != Math.max(1, netlist.unknownCount())) {
            throw new IllegalArgumentException("linear solver size " + lu.size() + " does not match "
                    + netlist.unknownCount() + " unknowns");
        }
        this.netlist = netlist;
        this.options = options;
        this.lu = lu;
        this.n = netlist.unknownCount();
        this.nodes = netlist.nodeCount();
        this.mna = new MnaSystem(nodes, netlist.branchCount());
        List<Element> list = netlist.elements();
        this.elements = list.toArray(new Element[0]);
        this.next = new double[n];
        this.view = new ArraySolution(nodes, next, new double[0]);
    }

    /** @return the netlist */
    public Netlist netlist() {
        return netlist;
    }

    /**
     * Points this solver at a netlist of the same shape (same unknowns and element count, as
     * {@link org.armature.netlist.NetlistBuilder#reflatten} makes after a value change), keeping the
     * matrix and work arrays.
     *
     * @param other the netlist to solve from now on
     * @throws IllegalArgumentException if its shape differs
     */
    public void rebind(Netlist other) {
        List<Element> list = other.elements();
        if (!other.sameShape(netlist) || list.size() != elements.length) {
            throw new IllegalArgumentException("rebind needs a netlist of the same shape");
        }
        for (int i = 0; i < elements.length; i++) {
            elements[i] = list.get(i);
        }
        netlist = other;
    }

    /** @return the options */
    public NewtonOptions options() {
        return options;
    }

    /**
     * Runs Newton from {@code x} until convergence or the iteration limit.
     *
     * @param x start iterate (length {@code unknownCount()}); overwritten with the last iterate
     * @param states element states (coil temperature, contacts); not modified
     * @param ctx analysis context
     * @param nodeShuntSiemens conductance from every node to ground (gmin stepping), S; 0 normally
     * @return true if converged; then {@code x} is the solution
     */
    public boolean run(double[] x, double[] states, StampContext ctx, double nodeShuntSiemens) {
        return run(x, states, ctx, nodeShuntSiemens, false, null);
    }

    /**
     * Runs Newton from {@code x} with a cold-start junction preset and states updated in the loop.
     *
     * @param x start iterate (length {@code unknownCount()}); overwritten with the last iterate
     * @param states element states; modified only by {@code updater}
     * @param ctx analysis context
     * @param nodeShuntSiemens conductance from every node to ground (gmin stepping), S; 0 normally
     * @param coldStart true when {@code x} is no earlier solution (all 0 V): the elements begin with
     *     {@link Element#beginCold}, so junctions the circuit forward-biases start at a typical
     *     forward voltage
     * @param updater called after every iteration without junction limiting, or {@code null};
     *     convergence needs its last call to report the states settled
     * @return true if converged; then {@code x} is the solution for {@code states}
     */
    public boolean run(double[] x, double[] states, StampContext ctx, double nodeShuntSiemens, boolean coldStart,
                       StateUpdater updater) {
        view.bind(x, states);
        for (Element e : elements) {
            if (coldStart) {
                e.beginCold(view);
            } else {
                e.begin(view);
            }
        }
        return iterate(x, states, ctx, nodeShuntSiemens, updater);
    }

    /**
     * Runs Newton from a predicted iterate while the elements' limiting memory starts at an earlier
     * solution, as a time-domain step does: {@code x} holds the predictor's extrapolation and
     * {@code limitFrom} the last accepted time point, so a junction whose predicted voltage lies far
     * beyond the accepted one is limited against the accepted one (after Nagel, ERL M520, 1975, where
     * the device state of the last time point seeds the limiting).
     *
     * @param x start iterate (the prediction); overwritten with the last iterate
     * @param limitFrom the solution the limiting memory begins at (not modified), same length
     * @param states element states; not modified
     * @param ctx analysis context
     * @return true if converged; then {@code x} is the solution
     */
    public boolean runPredicted(double[] x, double[] limitFrom, double[] states, StampContext ctx) {
        view.bind(limitFrom, states);
        for (Element e : elements) {
            e.begin(view);
        }
        view.bind(x, states);
        return iterate(x, states, ctx, 0.0, null);
    }

    private boolean iterate(double[] x, double[] states, StampContext ctx, double nodeShuntSiemens,
                            StateUpdater updater) {
        ConvergenceTolerances tol = options.tolerances();
        iterations = 0;
        singular = false;
        singularUnknown = -1;
        worstUnknown = 0;
        maxResidualAmps = 0.0;
        if (n == 0) {
            return true;
        }
        boolean stepOk = false;
        boolean statesOk = updater == null;
        double[] a = mna.matrix();
        double[] b = mna.rhs();
        for (int pass = 0; pass <= options.maxIterations(); pass++) {
            mna.clear();
            boolean limited = false;
            for (Element e : elements) {
                limited |= e.stamp(mna, view, ctx);
            }
            if (nodeShuntSiemens > 0) {
                mna.addNodeShunt(nodeShuntSiemens);
            }
            // the residual decides only when everything else has passed (and is reported after the last pass)
            boolean mayConverge = !limited && stepOk && statesOk;
            if (mayConverge || pass == options.maxIterations()) {
                boolean residualOk = residual(x, a, b, tol);
                if (mayConverge && residualOk) {
                    return true;
                }
            }
            if (pass == options.maxIterations()) {
                break;
            }
            if (!lu.factor(a)) {
                singular = true;
                singularUnknown = lu.failedColumn();
                return false;
            }
            System.arraycopy(b, 0, next, 0, n);
            lu.solve(next);
            iterations++;
            stepOk = step(x, tol) && !limited;
            if (!allFinite(x)) {
                return false;
            }
            if (updater != null) {
                statesOk = !limited && updater.update(view, states);
            }
        }
        return false;
    }

    /**
     * Residual r = A·x − b at the stamped linearisation; records the largest node residual.
     *
     * <p>The scale of a node row is the sum of the magnitudes of the currents meeting there
     * (check-values.md NM-6), taken from the row in shifted form: Σ_j a_ij·x_j = (Σ_j a_ij)·x_i +
     * Σ_{j≠i} a_ij·(x_j − x_i) over the node columns, so a conductance between two nodes counts the
     * current through it, g·(x_j − x_i), not g times the nodes' absolute voltages (which would let a
     * junction between two 20 V nodes pass with a residual far above its own current).
     */
    private boolean residual(double[] x, double[] a, double[] b, ConvergenceTolerances tol) {
        boolean ok = true;
        double worst = 0.0;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            double s = -b[i];
            double scale = Math.abs(b[i]);
            if (i < nodes) {
                double xi = x[i];
                double rowSum = 0.0;
                // zero entries (most of a sparse MNA row) add nothing to any of the sums
                for (int j = 0; j < nodes; j++) {
                    double aij = a[row + j];
                    if (aij != 0.0) {
                        s += aij * x[j];
                        rowSum += aij;
                        if (j != i) {
                            scale += Math.abs(aij * (x[j] - xi));
                        }
                    }
                }
                scale += Math.abs(rowSum * xi);
                for (int j = nodes; j < n; j++) {
                    double aij = a[row + j];
                    if (aij != 0.0) {
                        double t = aij * x[j];
                        s += t;
                        scale += Math.abs(t);
                    }
                }
                double r = Math.abs(s);
                worst = Math.max(worst, r);
                if (r > tol.reltol() * scale + tol.abstolAmps()) {
                    ok = false;
                }
            } else {
                for (int j = 0; j < n; j++) {
                    double aij = a[row + j];
                    if (aij != 0.0) {
                        double t = aij * x[j];
                        s += t;
                        scale += Math.abs(t);
                    }
                }
                if (Math.abs(s) > tol.reltol() * scale + tol.vntolVolts()) {
                    ok = false;
                }
            }
        }
        maxResidualAmps = worst;
        return ok;
    }

    /** Takes the (damped) step from x to next, in place in x; true if the step test passed. */
    private boolean step(double[] x, ConvergenceTolerances tol) {
        double maxNode = 0.0;
        for (int i = 0; i < nodes; i++) {
            maxNode = Math.max(maxNode, Math.abs(next[i] - x[i]));
        }
        double scale = maxNode > options.maxNodeStepVolts() ? options.maxNodeStepVolts() / maxNode : 1.0;
        boolean ok = scale == 1.0;
        double worstRatio = -1.0;
        for (int i = 0; i < n; i++) {
            double delta = (next[i] - x[i]) * scale;
            double newValue = x[i] + delta;
            double allowed = tol.reltol() * Math.max(Math.abs(newValue), Math.abs(x[i]))
                    + (i < nodes ? tol.vntolVolts() : tol.abstolAmps());
            double ratio = Math.abs(delta) / allowed;
            if (ratio > 1.0) {
                ok = false;
            }
            if (ratio > worstRatio) {
                worstRatio = ratio;
                worstUnknown = i;
            }
            x[i] = newValue;
        }
        return ok;
    }

    private boolean allFinite(double[] x) {
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(x[i])) {
                return false;
            }
        }
        return true;
    }

    /**
     * One more full Newton step from a converged solution, without a convergence test: the
     * convergence test of NM-6 accepts a last step as large as reltol·|v| (20 mV on a 20 V node), and
     * Newton's quadratic convergence makes the error after one more step negligible, so the reported
     * currents agree with KCL far inside the tolerance. Skipped (x unchanged) if an element limits
     * at {@code x}, the matrix is singular or the step is not finite.
     *
     * @param x a converged solution, overwritten with the polished one
     * @param states the element states it was solved with (not modified)
     * @param ctx analysis context
     * @return true if the step was taken (one more linear solve)
     */
    public boolean polish(double[] x, double[] states, StampContext ctx) {
        if (n == 0) {
            return false;
        }
        view.bind(x, states);
        for (Element e : elements) {
            e.begin(view);
        }
        mna.clear();
        boolean limited = false;
        for (Element e : elements) {
            limited |= e.stamp(mna, view, ctx);
        }
        if (limited || !lu.factor(mna.matrix())) {
            return false;
        }
        System.arraycopy(mna.rhs(), 0, next, 0, n);
        lu.solve(next);
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(next[i])) {
                return false;
            }
        }
        System.arraycopy(next, 0, x, 0, n);
        return true;
    }

    /** @return Newton iterations (linear solves) of the last run */
    public int iterations() {
        return iterations;
    }

    /** @return largest KCL residual at the last iterate, A */
    public double maxResidualAmps() {
        return maxResidualAmps;
    }

    /** @return the unknown that moved most relative to its tolerance in the last step */
    public int worstUnknown() {
        return worstUnknown;
    }

    /** @return true if the last run stopped at a singular matrix */
    public boolean singular() {
        return singular;
    }

    /** @return the unknown whose pivot failed in the last run, or −1 */
    public int singularUnknown() {
        return singularUnknown;
    }
}
