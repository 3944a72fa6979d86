package org.armature.solver.timedomain;

/**
 * Named tolerances and limits of the time-step control, with their defaults and the reason for
 * each.
 *
 * <p>The local truncation error E of every state (capacitor voltage, inductor current, flux
 * linkage, armature gap) must satisfy {@code |E| ≤ relativeTolerance·max(|x(n+1)|, |x(n)|) + abs},
 * where abs is the absolute tolerance of the state's unit. The next step is
 * {@code h·safetyFactor·(1/r)^(1/(p+1))} with r the largest ratio |E|/tolerance over the states
 * (check-values.md NM-10), bounded by {@link #minShrinkFactor} and {@link #maxGrowthFactor}. Tightening
 * {@link #relativeTolerance} tenfold costs about 10^(1/3) ≈ 2.2 times the steps with a second-order
 * method.
 *
 * @param method integration formula away from discontinuities; default {@link IntegrationMethod#TRAPEZOIDAL}
 *     (no numerical damping of coil ringing; each discontinuity restarts with one backward-Euler step)
 * @param relativeTolerance relative LTE tolerance, dimensionless; default 1e-3 (0.1 %: finer than any
 *     datasheet figure the results are compared with)
 * @param absoluteVoltsTolerance absolute LTE tolerance for voltages and flux linkages (V or V·s per
 *     second of scale), volts; default 1e-4 (negligible against logic and coil levels)
 * @param absoluteAmpsTolerance absolute LTE tolerance for currents, amperes; default 1e-7 (well below a
 *     small relay's 3 mA drop-out current)
 * @param absoluteMetresTolerance absolute LTE tolerance for the armature gap, metres; default 1e-8
 *     (0.003 % of a 0.3 mm travel)
 * @param safetyFactor factor on the optimal step, dimensionless in (0, 1); default 0.9 (common practice,
 *     check-values.md NM-10)
 * @param maxGrowthFactor largest ratio of a step to the one before, > 1; default 2 (keeps the variable-step
 *     formulas well conditioned)
 * @param minShrinkFactor smallest ratio of a retried step to the rejected one, in (0, 1); default 0.1
 * @param firstStepSeconds first step after the start and after every discontinuity, seconds; default 1e-9
 *     (short against every time constant of a relay stage, so the backward-Euler restart step is exact enough)
 * @param minStepSeconds smallest step before the run gives up, seconds; default 1e-15
 * @param maxStepFraction largest step as a fraction of the run's duration; default 0.01 (at least 100
 *     points per run for the plots)
 * @param eventTimeToleranceSeconds how closely a located event (pick-up, drop-out, contact change,
 *     armature at a stop) is placed in time, seconds; default 1e-7 (0.01 % of a millisecond relay time)
 * @param newtonMaxIterations Newton iterations per time point before the step is cut; default 40
 * @param newtonRelativeTolerance Newton update test, relative; default 1e-3, the DC engine's reltol
 *     (check-values.md NM-6; common practice: circuit simulators test the time points with the same reltol as the
 *     operating point). The test applies to the last update, and Newton's quadratic convergence leaves
 *     an error far below it, under the truncation error the step control accepts
 * @param newtonAbsoluteVolts Newton update test for node voltages, volts; default 1e-6 (check-values.md NM-6 vntol)
 * @param newtonAbsoluteAmps Newton update test for branch currents, amperes; default 1e-12 (check-values.md NM-6 abstol)
 * @param newtonFailureShrinkFactor step factor after a Newton failure, in (0, 1); default 0.125
 * @param maxSteps safety limit on accepted plus rejected steps; default 2,000,000
 */
public record StepOptions(IntegrationMethod method, double relativeTolerance, double absoluteVoltsTolerance,
                          double absoluteAmpsTolerance, double absoluteMetresTolerance, double safetyFactor,
                          double maxGrowthFactor, double minShrinkFactor, double firstStepSeconds,
                          double minStepSeconds, double maxStepFraction, double eventTimeToleranceSeconds,
                          int newtonMaxIterations, double newtonRelativeTolerance, double newtonAbsoluteVolts,
                          double newtonAbsoluteAmps, double newtonFailureShrinkFactor, int maxSteps) {

    /** The defaults listed above. */
    public static final StepOptions DEFAULTS = new StepOptions(IntegrationMethod.TRAPEZOIDAL, 1e-3, 1e-4, 1e-7, 1e-8,
            0.9, 2.0, 0.1, 1e-9, 1e-15, 0.01, 1e-7, 40, 1e-3, 1e-6, 1e-12, 0.125, 2_000_000);

    public StepOptions {
        if (method == null) {
            throw new IllegalArgumentException("method must not be null");
        }
        positive("relativeTolerance", relativeTolerance);
        positive("absoluteVoltsTolerance", absoluteVoltsTolerance);
        positive("absoluteAmpsTolerance", absoluteAmpsTolerance);
        positive("absoluteMetresTolerance", absoluteMetresTolerance);
        if (!(safetyFactor > 0 && safetyFactor < 1)) {
            throw new IllegalArgumentException("safetyFactor must lie in (0, 1), was " + safetyFactor);
        }
        if (!(maxGrowthFactor > 1) || !Double.isFinite(maxGrowthFactor)) {
            throw new IllegalArgumentException("maxGrowthFactor must exceed 1, was " + maxGrowthFactor);
        }
        if (!(minShrinkFactor > 0 && minShrinkFactor < 1)) {
            throw new IllegalArgumentException("minShrinkFactor must lie in (0, 1), was " + minShrinkFactor);
        }
        positive("firstStepSeconds", firstStepSeconds);
        positive("minStepSeconds", minStepSeconds);
        if (!(minStepSeconds <= firstStepSeconds)) {
            throw new IllegalArgumentException("minStepSeconds must not exceed firstStepSeconds");
        }
        if (!(maxStepFraction > 0 && maxStepFraction <= 1)) {
            throw new IllegalArgumentException("maxStepFraction must lie in (0, 1], was " + maxStepFraction);
        }
        positive("eventTimeToleranceSeconds", eventTimeToleranceSeconds);
        if (newtonMaxIterations < 2) {
            throw new IllegalArgumentException("newtonMaxIterations must be at least 2, was " + newtonMaxIterations);
        }
        positive("newtonRelativeTolerance", newtonRelativeTolerance);
        positive("newtonAbsoluteVolts", newtonAbsoluteVolts);
        positive("newtonAbsoluteAmps", newtonAbsoluteAmps);
        if (!(newtonFailureShrinkFactor > 0 && newtonFailureShrinkFactor < 1)) {
            throw new IllegalArgumentException("newtonFailureShrinkFactor must lie in (0, 1), was "
                    + newtonFailureShrinkFactor);
        }
        if (maxSteps < 10) {
            throw new IllegalArgumentException("maxSteps must be at least 10, was " + maxSteps);
        }
    }

    /** These options with another relative tolerance (the absolute ones scaled alike). */
    public StepOptions withTolerance(double relative) {
        double s = relative / relativeTolerance;
        return new StepOptions(method, relative, absoluteVoltsTolerance * s, absoluteAmpsTolerance * s,
                absoluteMetresTolerance * s, safetyFactor, maxGrowthFactor, minShrinkFactor, firstStepSeconds,
                minStepSeconds, maxStepFraction, eventTimeToleranceSeconds, newtonMaxIterations,
                Math.min(newtonRelativeTolerance, relative * 1e-3), newtonAbsoluteVolts, newtonAbsoluteAmps,
                newtonFailureShrinkFactor, maxSteps);
    }

    /** These options with another integration formula. */
    public StepOptions withMethod(IntegrationMethod m) {
        return new StepOptions(m, relativeTolerance, absoluteVoltsTolerance, absoluteAmpsTolerance,
                absoluteMetresTolerance, safetyFactor, maxGrowthFactor, minShrinkFactor, firstStepSeconds,
                minStepSeconds, maxStepFraction, eventTimeToleranceSeconds, newtonMaxIterations,
                newtonRelativeTolerance, newtonAbsoluteVolts, newtonAbsoluteAmps, newtonFailureShrinkFactor,
                maxSteps);
    }

    private static void positive(String name, double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be positive and finite, was " + v);
        }
    }
}
