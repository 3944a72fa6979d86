package org.armature.solver;

/**
 * Settings of one Newton–Raphson run.
 *
 * @param maxIterations iteration limit of one run (one gmin or source step); default 100, several
 *     times what a relay stage needs from a cold start, so a run that hits it is really stuck
 * @param maxNodeStepVolts damping: a Newton step whose largest node change exceeds this is scaled
 *     down to it; default 50 V, above every junction swing of these stages but a brake on runaway
 *     steps from a poor linearisation (junction limiting does the fine work)
 * @param tolerances convergence test
 * @param relativePivotThreshold pivot threshold of the LU relative to its row; default
 *     {@link DenseLu#DEFAULT_RELATIVE_PIVOT_THRESHOLD}
 */
public record NewtonOptions(int maxIterations, double maxNodeStepVolts, ConvergenceTolerances tolerances,
                            double relativePivotThreshold) {

    /** Defaults: 100 iterations, 50 V step limit, NM-6 tolerances, pivot threshold 1e-13. */
    public static final NewtonOptions DEFAULT = new NewtonOptions(100, 50.0, ConvergenceTolerances.DEFAULT,
            DenseLu.DEFAULT_RELATIVE_PIVOT_THRESHOLD);

    public NewtonOptions {
        if (maxIterations < 1) {
            throw new IllegalArgumentException("maxIterations must be at least 1, was " + maxIterations);
        }
        if (!(maxNodeStepVolts > 0) || !Double.isFinite(maxNodeStepVolts)) {
            throw new IllegalArgumentException("maxNodeStepVolts must be positive and finite");
        }
        if (tolerances == null) {
            throw new IllegalArgumentException("tolerances must not be null");
        }
        if (!(relativePivotThreshold > 0 && relativePivotThreshold < 1)) {
            throw new IllegalArgumentException("relativePivotThreshold must be in (0, 1)");
        }
    }

    /** @return the same options with other tolerances */
    public NewtonOptions withTolerances(ConvergenceTolerances t) {
        return new NewtonOptions(maxIterations, maxNodeStepVolts, t, relativePivotThreshold);
    }
}
