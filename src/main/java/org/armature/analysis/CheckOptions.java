package org.armature.analysis;

import java.util.OptionalDouble;
import org.armature.model.StageSettings;

/**
 * Limits and margins of the checks, each with its default and where it comes from.
 *
 * @param operateMarginFraction energise at ≥ (1 + this) × must-operate (default 0.10: 110 %,
 *     RC-18)
 * @param releaseMarginFraction keep the off-state coil voltage ≤ (1 − this) × must-release
 *     (default 0.10: 90 %, RC-18)
 * @param saturationPassMargin the drive margin hFE·IB/IC (bipolar) or the switch verdict's margin
 *     (MOSFET, Darlington) that passes; between 1 and this it warns (default 2, common practice:
 *     overdrive of at least ×2 over the minimum gain)
 * @param ratingUseFraction a current or voltage passes up to this share of its rating; up to the
 *     rating it warns (default 0.8: derate to 80 %, common practice)
 * @param thermalMarginKelvin a junction passes up to Tj(max) − this; up to Tj(max) it warns
 *     (default 20 K, common practice)
 * @param forwardDropVolts forward drop of a conducting suppressor diode in the static estimates
 *     (default 0.7 V, common practice)
 * @param releaseTimeRequirementSeconds the user's release-time requirement, if any
 * @param monteCarloSamples samples for the yield estimate, 0 for none (default 0)
 * @param seed seed of the Monte Carlo sampler (default 1)
 * @param corners what the corner enumeration varies
 * @param selvAcRmsVolts contact-side AC above this is beyond safety extra-low voltage (default
 *     50 V rms, the IEC 61140 ELV band; common practice)
 * @param selvDcVolts contact-side DC above this is beyond safety extra-low voltage (default 120 V
 *     ripple-free, the IEC 61140 ELV band; common practice)
 * @param useTransient judge the turn-off (peak switch voltage, suppressor current, release time)
 *     with the transient engine at the largest-current corner (default true); false, or a run that
 *     fails, falls back to the closed forms of {@link SuppressorEstimate}, and the result says which
 */
public record CheckOptions(double operateMarginFraction, double releaseMarginFraction, double saturationPassMargin,
                           double ratingUseFraction, double thermalMarginKelvin, double forwardDropVolts,
                           OptionalDouble releaseTimeRequirementSeconds, int monteCarloSamples, long seed,
                           CornerOptions corners, double selvAcRmsVolts, double selvDcVolts,
                           boolean useTransient) {

    /** The defaults named above. */
    public static final CheckOptions DEFAULT = new CheckOptions(0.10, 0.10, 2.0, 0.8, 20, 0.7, OptionalDouble.empty(),
            0, 1, CornerOptions.DEFAULT, 50, 120, true);

    public CheckOptions {
        if (!(operateMarginFraction >= 0 && releaseMarginFraction >= 0 && releaseMarginFraction < 1)) {
            throw new IllegalArgumentException("operateMarginFraction and releaseMarginFraction must be in range");
        }
        if (!(saturationPassMargin >= 1)) {
            throw new IllegalArgumentException("saturationPassMargin must be at least 1");
        }
        if (!(ratingUseFraction > 0 && ratingUseFraction <= 1)) {
            throw new IllegalArgumentException("ratingUseFraction must be in (0, 1]");
        }
        if (!(thermalMarginKelvin >= 0) || !(forwardDropVolts > 0)) {
            throw new IllegalArgumentException("thermalMarginKelvin and forwardDropVolts must be non-negative / positive");
        }
        if (releaseTimeRequirementSeconds == null || corners == null) {
            throw new IllegalArgumentException("releaseTimeRequirementSeconds and corners must not be null");
        }
        if (monteCarloSamples < 0) {
            throw new IllegalArgumentException("monteCarloSamples must not be negative");
        }
        if (!(selvAcRmsVolts > 0 && selvDcVolts > 0)) {
            throw new IllegalArgumentException("selvAcRmsVolts and selvDcVolts must be positive");
        }
    }

    /** The same options with a Monte Carlo run of {@code samples} samples from {@code seed}. */
    public CheckOptions withMonteCarlo(int samples, long newSeed) {
        return new CheckOptions(operateMarginFraction, releaseMarginFraction, saturationPassMargin, ratingUseFraction,
                thermalMarginKelvin, forwardDropVolts, releaseTimeRequirementSeconds, samples, newSeed, corners,
                selvAcRmsVolts, selvDcVolts, useTransient);
    }

    /** The same options with the transient engine on or off for the turn-off checks. */
    public CheckOptions withTransient(boolean on) {
        return new CheckOptions(operateMarginFraction, releaseMarginFraction, saturationPassMargin, ratingUseFraction,
                thermalMarginKelvin, forwardDropVolts, releaseTimeRequirementSeconds, monteCarloSamples, seed, corners,
                selvAcRmsVolts, selvDcVolts, on);
    }

    /** The same options with another corner enumeration. */
    public CheckOptions withCorners(CornerOptions c) {
        return new CheckOptions(operateMarginFraction, releaseMarginFraction, saturationPassMargin, ratingUseFraction,
                thermalMarginKelvin, forwardDropVolts, releaseTimeRequirementSeconds, monteCarloSamples, seed, c,
                selvAcRmsVolts, selvDcVolts, useTransient);
    }

    /**
     * The same options with a stage's own settings: its release-time requirement (when it has one)
     * and its Monte Carlo run (when it asks for samples).
     */
    public CheckOptions withSettings(StageSettings settings) {
        CheckOptions o = this;
        if (settings.monteCarloSamples() > 0) {
            o = o.withMonteCarlo(settings.monteCarloSamples(), settings.monteCarloSeed());
        }
        if (settings.releaseTimeRequirementSeconds().isPresent()) {
            o = o.withReleaseTimeRequirement(settings.releaseTimeRequirementSeconds().getAsDouble());
        }
        return o;
    }

    /** The same options with a release-time requirement, seconds. */
    public CheckOptions withReleaseTimeRequirement(double seconds) {
        return new CheckOptions(operateMarginFraction, releaseMarginFraction, saturationPassMargin, ratingUseFraction,
                thermalMarginKelvin, forwardDropVolts, OptionalDouble.of(seconds), monteCarloSamples, seed, corners,
                selvAcRmsVolts, selvDcVolts, useTransient);
    }
}
