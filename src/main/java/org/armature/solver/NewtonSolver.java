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

    /**
     * Rounding allowance of a residual sum, in units in the last place of the sum of its terms'
     * magnitudes: a row of a dozen terms loses a few ulps per addition, so 64 ulps bounds it.
     */
    private static final double ROUNDING_ULPS = 64.0;

    private Netlist netlist;
    private final NewtonOptions options;
    private final LinearSolver lu;
    private final MnaSystem mna;
    private final Element[] elements;
    private final int n;
    private final int nodes;
    private final double[] next;
    private final ArraySolution view;
    private final CurrentScale currentScale;
    /** Stamps into {@link #mna} and gathers the node-test scale in one device evaluation. */
    private final org.armature.netlist.Stamper tee;

    private int iterations;
    private boolean polishUpdateOk;
    private double maxResidualAmps;
    private int worstResidualNode;
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
        this.currentScale = new CurrentScale(nodes);
        this.tee = currentScale.tee(mna);
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
            // a pass that may converge also gathers each node's element currents for the node test
            boolean gather = stepOk && statesOk;
            if (gather) {
                currentScale.begin(x);
                for (Element e : elements) {
                    limited |= e.stamp(tee, view, ctx);
                    currentScale.endElement();
                }
            } else {
                for (Element e : elements) {
                    limited |= e.stamp(mna, view, ctx);
                }
            }
            if (nodeShuntSiemens > 0) {
                mna.addNodeShunt(nodeShuntSiemens);
            }
            // the residual decides only when everything else has passed (and is reported after the last pass)
            boolean mayConverge = !limited && stepOk && statesOk;
            if (mayConverge || pass == options.maxIterations()) {
                boolean residualOk = residual(x, a, b, tol);
                // the last word has the test with each node's own element currents as its scale
                if (mayConverge && residualOk && residual(x, a, b, tol, shunted(currentScale.scale(), x, nodeShuntSiemens))) {
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
        return residual(x, a, b, tol, null);
    }

    /** Adds a node shunt's current to each node's scale (gmin stepping, the transient fallback). */
    private double[] shunted(double[] elementScale, double[] x, double nodeShuntSiemens) {
        for (int i = 0; nodeShuntSiemens > 0 && i < nodes; i++) {
            elementScale[i] += Math.abs(nodeShuntSiemens * x[i]);
        }
        return elementScale;
    }

    private boolean residual(double[] x, double[] a, double[] b, ConvergenceTolerances tol, double[] elementScale) {
        boolean ok = true;
        double worst = 0.0;
        int worstNode = 0;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            double s = -b[i];
            double scale = Math.abs(b[i]);
            if (i < nodes) {
                double xi = x[i];
                double rowSum = 0.0;
                double terms = Math.abs(b[i]);
                // zero entries (most of a sparse MNA row) add nothing to any of the sums
                for (int j = 0; j < nodes; j++) {
                    double aij = a[row + j];
                    if (aij != 0.0) {
                        double t = aij * x[j];
                        s += t;
                        terms += Math.abs(t);
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
                        terms += Math.abs(t);
                        scale += Math.abs(t);
                    }
                }
                if (elementScale != null) {
                    scale = elementScale[i];
                }
                double r = Math.abs(s);
                if (!(r <= worst)) {
                    worst = r;
                    worstNode = i;
                }
                // the sum cannot be known better than the rounding of its terms (a 1 kΩ series node at 20 V
                // sums currents of 20 mA to a residual of picoamps)
                if (!(r <= tol.reltol() * scale + tol.abstolAmps() + ROUNDING_ULPS * Math.ulp(terms))) {
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
                if (!(Math.abs(s) <= tol.reltol() * scale + tol.vntolVolts())) {
                    ok = false;
                }
            }
        }
        maxResidualAmps = worst;
        worstResidualNode = worstNode;
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
        ConvergenceTolerances tol = options.tolerances();
        boolean updateOk = true;
        for (int i = 0; i < n; i++) {
            double allowed = tol.reltol() * Math.max(Math.abs(next[i]), Math.abs(x[i]))
                    + (i < nodes ? tol.vntolVolts() : tol.abstolAmps());
            if (!(Math.abs(next[i] - x[i]) <= allowed)) {
                updateOk = false;
            }
        }
        polishUpdateOk = updateOk;
        System.arraycopy(next, 0, x, 0, n);
        return true;
    }

    /**
     * @return true if the step of the last {@link #polish} that was taken passed the update test
     *     (|Δv| ≤ reltol·|v| + vntol, |Δi| ≤ reltol·|i| + abstol): the last update of an answer that
     *     ends with a polishing step
     */
    public boolean polishUpdateOk() {
        return polishUpdateOk;
    }

    /**
     * The one convergence test of an answer, applied to the answer itself: the elements are
     * stamped at {@code x} (their limiting memory starts at {@code x}, so the linearisation is the
     * devices' own currents there), every node's residual r = A·x − b must pass the NM-6 node test
     * (absolute plus relative to the currents meeting there) and every branch row its voltage test,
     * and the Newton step from {@code x} must pass the update test (|Δv| ≤ reltol·|v| + vntol,
     * |Δi| ≤ reltol·|i| + abstol). Afterwards {@link #maxResidualAmps()} and
     * {@link #worstResidualNode()} describe {@code x}, whatever the verdict.
     *
     * <p>Neither {@code x} nor {@code states} is modified. On return the linear solver holds the
     * factors of the Jacobian at {@code x} (when it was not singular).
     *
     * @param x the answer to test
     * @param states the element states it was solved with
     * @param ctx analysis context
     * @return true only if both tests pass, no element limits at {@code x} and everything is finite
     */
    /**
     * Stamps every element at an answer for the convergence test, with the current scale of each
     * node collected on the way.
     *
     * @return true if any element limited its junction at {@code x}
     */
    private boolean stampForTest(double[] x, double[] states, StampContext ctx) {
        view.bind(x, states);
        for (Element e : elements) {
            e.begin(view);
        }
        mna.clear();
        boolean limited = false;
        currentScale.begin(x);
        for (Element e : elements) {
            limited |= e.stamp(tee, view, ctx);
            currentScale.endElement();
        }
        return limited;
    }

    public boolean verify(double[] x, double[] states, StampContext ctx) {
        maxResidualAmps = 0.0;
        worstResidualNode = 0;
        if (n == 0) {
            return true;
        }
        if (!allFinite(x)) {
            maxResidualAmps = Double.MAX_VALUE;
            return false;
        }
        boolean limited = stampForTest(x, states, ctx);
        ConvergenceTolerances tol = options.tolerances();
        boolean residualOk = residual(x, mna.matrix(), mna.rhs(), tol, currentScale.scale());
        if (!Double.isFinite(maxResidualAmps)) {
            maxResidualAmps = Double.MAX_VALUE;
            return false;
        }
        if (!lu.factor(mna.matrix())) {
            return false;
        }
        System.arraycopy(mna.rhs(), 0, next, 0, n);
        lu.solve(next);
        boolean updateOk = true;
        for (int i = 0; i < n; i++) {
            double allowed = tol.reltol() * Math.max(Math.abs(next[i]), Math.abs(x[i]))
                    + (i < nodes ? tol.vntolVolts() : tol.abstolAmps());
            if (!(Math.abs(next[i] - x[i]) <= allowed)) {
                updateOk = false;
            }
        }
        return residualOk && updateOk && !limited;
    }

    /**
     * The node test alone at an answer ({@link #verify} without the update test), as a time-domain
     * run applies it to each point it accepts: the elements stamped at {@code x}, each node's
     * residual within reltol × its elements' own currents + abstol (+ the rounding of the sum).
     * Afterwards {@link #maxResidualAmps()} describes {@code x}.
     *
     * @param x the answer; not modified
     * @param states its element states; not modified
     * @param ctx the analysis context it was solved in
     * @param nodeShuntSiemens the node shunt it was solved with (0 normally)
     * @return true if every node passes and no element limits at {@code x}
     */
    public boolean residualTest(double[] x, double[] states, StampContext ctx, double nodeShuntSiemens) {
        maxResidualAmps = 0.0;
        worstResidualNode = 0;
        if (n == 0) {
            return true;
        }
        if (!allFinite(x)) {
            maxResidualAmps = Double.MAX_VALUE;
            return false;
        }
        boolean limited = stampForTest(x, states, ctx);
        if (nodeShuntSiemens > 0) {
            mna.addNodeShunt(nodeShuntSiemens);
        }
        double[] elementScale = shunted(currentScale.scale(), x, nodeShuntSiemens);
        boolean ok = residual(x, mna.matrix(), mna.rhs(), options.tolerances(), elementScale);
        return ok && !limited && Double.isFinite(maxResidualAmps);
    }

    /** @return the node with the largest KCL residual at the last residual evaluation */
    public int worstResidualNode() {
        return worstResidualNode;
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
