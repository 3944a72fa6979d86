package org.armature.analysis;

import java.util.Map;
import java.util.Optional;

/**
 * The Monte Carlo estimate of how many built stages work.
 *
 * @param samples number of samples drawn
 * @param seed the seed used (the same seed gives the same samples)
 * @param passed samples in which relay-operates, relay-releases and switch-saturated all held
 *     their absolute limits (margins not required)
 * @param unsolved samples the solver could not solve (counted as failures)
 * @param culpritCounts for the failing samples, how often each factor was the one contributing most
 *     to the failure (first-order attribution from the corners' main effects), by factor id
 * @param topCulprit the factor most often behind a failure, if any sample failed
 */
public record YieldResult(int samples, long seed, int passed, int unsolved, Map<String, Integer> culpritCounts,
                          Optional<String> topCulprit) {

    public YieldResult {
        culpritCounts = Map.copyOf(culpritCounts);
    }

    /** Fraction of samples that worked, 0 to 1 (1 for zero samples). */
    public double yield() {
        return samples == 0 ? 1.0 : (double) passed / samples;
    }
}
