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
 * linearisation point), computes the residual r = A·x − b, and declares convergence when no element
 * limited, the previous step passed the step test and every residual passes the residual test.
 * Otherwise it factors and solves for the next iterate.
 */
public final class NewtonSolver {

    private final Netlist netlist;
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
     * @param netlist the netlist (checked by the caller with {@link TopologyCheck})
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
        ConvergenceTolerances tol = options.tolerances();
        view.bind(x, states);
        for (Element e : elements) {
            e.begin(view);
        }
        iterations = 0;
        singular = false;
        singularUnknown = -1;
        worstUnknown = 0;
        maxResidualAmps = 0.0;
        if (n == 0) {
            return true;
        }
        boolean stepOk = false;
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
            boolean residualOk = residual(x, a, b, tol);
            if (!limited && stepOk && residualOk) {
                return true;
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
        }
        return false;
    }

    /** Residual r = A·x − b at the stamped linearisation; records the largest node residual. */
    private boolean residual(double[] x, double[] a, double[] b, ConvergenceTolerances tol) {
        boolean ok = true;
        double worst = 0.0;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            double s = -b[i];
            double scale = Math.abs(b[i]);
            for (int j = 0; j < n; j++) {
                double t = a[row + j] * x[j];
                s += t;
                scale += Math.abs(t);
            }
            double r = Math.abs(s);
            if (i < nodes) {
                worst = Math.max(worst, r);
                if (r > tol.reltol() * scale + tol.abstolAmps()) {
                    ok = false;
                }
            } else if (r > tol.reltol() * scale + tol.vntolVolts()) {
                ok = false;
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
