package org.armature.solver;

import org.armature.netlist.Netlist;
import org.armature.netlist.StampContext;

/**
 * One DC solve of a netlist with its fallbacks: plain Newton from the start point, then gmin
 * stepping (a shunt from every node to ground, 1e-3 S lowered by decades to 1e-12 S, then removed),
 * then source stepping (all sources ramped 0 → 100 % with an adaptive step), after Trajković,
 * "DC operating points of transistor circuits", NOLTA IEICE 2012 (check-values.md NM-5).
 *
 * <p>Reusable by the transient engine for its initial point. Allocates its work arrays once.
 * One instance serves one thread.
 */
public final class DcStrategy {

    private final NewtonSolver newton;
    private final ContinuationOptions continuation;
    private final double[] saved;
    private final double[] start;
    private int iterations;
    private double residual;
    private StateUpdater updater;

    /**
     * @param newton the Newton solver of the netlist
     * @param continuation gmin and source stepping settings
     */
    public DcStrategy(NewtonSolver newton, ContinuationOptions continuation) {
        this.newton = newton;
        this.continuation = continuation;
        int n = newton.netlist().unknownCount();
        this.saved = new double[n];
        this.start = new double[n];
    }

    /** @return Newton iterations of the last {@link #solve} */
    public int iterations() {
        return iterations;
    }

    /** @return largest KCL residual of the last solution, A */
    public double maxResidualAmps() {
        return residual;
    }

    /**
     * Solves the DC operating point.
     *
     * @param x start point, overwritten with the solution
     * @param states element states (not modified)
     * @throws SingularCircuitException if the matrix is singular even with the gmin shunt
     * @throws NonConvergenceException if every fallback fails
     */
    public void solve(double[] x, double[] states) {
        solve(x, states, false, null);
    }

    /**
     * Solves the DC operating point, with a cold-start junction preset and states updated inside
     * the Newton loop ({@link NewtonSolver#run(double[], double[], StampContext, double, boolean,
     * StateUpdater)}).
     *
     * @param x start point, overwritten with the solution
     * @param states element states, modified only by {@code updater}
     * @param coldStart true when {@code x} is no earlier solution; applies to the first, plain attempt
     * @param updater state update inside every attempt, or {@code null}
     * @throws SingularCircuitException if the matrix is singular even with the gmin shunt
     * @throws NonConvergenceException if every fallback fails
     */
    public void solve(double[] x, double[] states, boolean coldStart, StateUpdater updater) {
        this.updater = updater;
        iterations = 0;
        int n = x.length;
        System.arraycopy(x, 0, start, 0, n);
        boolean ok = newton.run(x, states, StampContext.DC, 0.0, coldStart, updater);
        iterations += newton.iterations();
        residual = finiteOr(newton.maxResidualAmps());
        if (ok) {
            return;
        }
        boolean singularPlain = newton.singular();
        int singularUnknown = newton.singularUnknown();
        // gmin stepping
        System.arraycopy(start, 0, x, 0, n);
        if (gminStepping(x, states)) {
            return;
        }
        // source stepping, from zero
        java.util.Arrays.fill(x, 0.0);
        if (sourceStepping(x, states)) {
            return;
        }
        if (singularPlain && newton.singular()) {
            throw singular(singularUnknown);
        }
        Netlist nl = newton.netlist();
        throw new NonConvergenceException(iterations, nl.unknownName(newton.worstUnknown()),
                finiteOr(newton.maxResidualAmps()));
    }

    private boolean gminStepping(double[] x, double[] states) {
        int steps = (int) Math.round(Math.log(continuation.gminStartSiemens() / continuation.gminEndSiemens())
                / Math.log(continuation.gminStepFactor()));
        double g = continuation.gminStartSiemens();
        for (int k = 0; k <= steps; k++, g /= continuation.gminStepFactor()) {
            if (!attempt(x, states, StampContext.DC, g)) {
                return false;
            }
        }
        return attempt(x, states, StampContext.DC, 0.0);
    }

    private boolean sourceStepping(double[] x, double[] states) {
        int n = x.length;
        double factor = 0.0;
        double step = continuation.sourceFirstStep();
        if (!attempt(x, states, StampContext.dcScaled(0.0), 0.0)) {
            return false;
        }
        while (factor < 1.0) {
            double target = Math.min(1.0, factor + step);
            System.arraycopy(x, 0, saved, 0, n);
            if (attempt(x, states, StampContext.dcScaled(target), 0.0)) {
                factor = target;
                step = Math.min(2.0 * step, 1.0);
            } else {
                System.arraycopy(saved, 0, x, 0, n);
                step /= 4.0;
                if (step < continuation.sourceMinStep()) {
                    return false;
                }
            }
        }
        return true;
    }

    private boolean attempt(double[] x, double[] states, StampContext ctx, double shunt) {
        boolean ok = newton.run(x, states, ctx, shunt, false, updater);
        iterations += newton.iterations();
        residual = finiteOr(newton.maxResidualAmps());
        return ok;
    }

    private SingularCircuitException singular(int unknown) {
        Netlist nl = newton.netlist();
        String name = nl.unknownName(Math.max(0, unknown));
        java.util.List<String> parts = unknown >= 0 && unknown < nl.nodeCount() ? nl.elementsAt(unknown) : java.util.List.of();
        return new SingularCircuitException(SingularCircuitException.Cause.SINGULAR_MATRIX, java.util.List.of(name), parts,
                "the circuit equations are singular at " + name + (parts.isEmpty() ? "" : " (parts there: "
                        + String.join(", ", parts) + ")") + "; look for a part connected only to itself or an ideal loop");
    }

    private static double finiteOr(double v) {
        return Double.isFinite(v) ? v : Double.MAX_VALUE;
    }
}
