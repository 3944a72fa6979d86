package org.armature.solver.timedomain;

/**
 * The step-size rule {@code h_new = h·0.9·(tol/|E|)^(1/(p+1))} (check-values.md NM-10, common practice; the
 * exponent follows from E ∝ h^(p+1)), bounded so a step neither grows too fast nor collapses after
 * one bad estimate. Stateless apart from its options; thread-safe.
 */
public final class StepController {

    private final StepOptions options;

    /** @param options the tolerances and bounds */
    public StepController(StepOptions options) {
        this.options = options;
    }

    /**
     * Whether a step with this error ratio is accepted.
     *
     * @param errorRatio largest |E|/tolerance over the states
     * @return true when at most 1
     */
    public boolean accept(double errorRatio) {
        return errorRatio <= 1;
    }

    /**
     * The next step length (after an accepted step) or the retry length (after a rejected one).
     *
     * @param hSeconds the step just taken, seconds
     * @param errorRatio largest |E|/tolerance over the states, not negative
     * @param order order p of the formula used
     * @return the proposal, seconds, between {@code minShrinkFactor·h} and {@code maxGrowthFactor·h}
     */
    public double propose(double hSeconds, double errorRatio, int order) {
        double factor;
        if (errorRatio <= 0) {
            factor = options.maxGrowthFactor();
        } else {
            factor = options.safetyFactor() * Math.pow(errorRatio, -1.0 / (order + 1));
        }
        factor = Math.max(options.minShrinkFactor(), Math.min(options.maxGrowthFactor(), factor));
        if (errorRatio > 1) {
            factor = Math.min(factor, options.safetyFactor());
        }
        return hSeconds * factor;
    }
}
