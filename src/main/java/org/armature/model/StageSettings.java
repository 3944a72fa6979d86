package org.armature.model;

import java.util.OptionalDouble;

/**
 * A stage's own check settings, saved with it: what the window's verdicts and the {@code check}
 * command use unless told otherwise (command-line options override them). The ambient range of the
 * corners lives in {@link Conditions} and the supply tolerance on the coil supply part
 * ({@code tolerancePercent}); these are the settings that have no other home.
 *
 * @param releaseTimeRequirementSeconds the release time the stage must meet at turn-off, s; empty
 *     for no requirement (default)
 * @param monteCarloSamples samples of the Monte Carlo yield estimate, 0 for none (default 0), at
 *     most {@link #MAX_MONTE_CARLO_SAMPLES}
 * @param monteCarloSeed seed of the Monte Carlo sampler (default 1), so a yield can be repeated
 */
public record StageSettings(OptionalDouble releaseTimeRequirementSeconds, int monteCarloSamples, long monteCarloSeed) {

    /** The most Monte Carlo samples a stage may ask for (a run of this many takes about a minute). */
    public static final int MAX_MONTE_CARLO_SAMPLES = 100_000;

    /** No release-time requirement, no Monte Carlo, seed 1. */
    public static final StageSettings DEFAULT = new StageSettings(OptionalDouble.empty(), 0, 1);

    public StageSettings {
        if (releaseTimeRequirementSeconds == null) {
            releaseTimeRequirementSeconds = OptionalDouble.empty();
        }
        if (releaseTimeRequirementSeconds.isPresent()) {
            double t = releaseTimeRequirementSeconds.getAsDouble();
            if (!(t > 0) || !Double.isFinite(t)) {
                throw new IllegalArgumentException("releaseTimeRequirementSeconds must be a positive time, was " + t);
            }
        }
        if (monteCarloSamples < 0 || monteCarloSamples > MAX_MONTE_CARLO_SAMPLES) {
            throw new IllegalArgumentException("monteCarloSamples must be from 0 to " + MAX_MONTE_CARLO_SAMPLES
                    + ", was " + monteCarloSamples);
        }
    }

    /** The same settings with another release-time requirement (empty: none). */
    public StageSettings withReleaseTimeRequirement(OptionalDouble seconds) {
        return new StageSettings(seconds, monteCarloSamples, monteCarloSeed);
    }

    /** The same settings with another Monte Carlo run. */
    public StageSettings withMonteCarlo(int samples, long seed) {
        return new StageSettings(releaseTimeRequirementSeconds, samples, seed);
    }

    /** True when every setting is its default (the file then leaves the field out). */
    public boolean isDefault() {
        return equals(DEFAULT);
    }
}
