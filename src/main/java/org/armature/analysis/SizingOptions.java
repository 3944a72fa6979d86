package org.armature.analysis;

import org.armature.units.ESeries;

/**
 * The rules the sizing assistant follows, each with its default and the reason for it.
 *
 * @param baseDrive how much base current to ask for (default forced β 10, common practice BJ-15)
 * @param series the preferred-value series to round to (default E24, ±5 %, IEC 60063)
 * @param pullDownFraction the largest share of the base current a base pull-down may take at
 *     VBE(sat) (default 0.1; 0 sizes no pull-down, as textbook examples do): the pull-down is the
 *     smallest preferred value at or above VBE(sat) / (fraction · IB)
 * @param offVolts the base or gate voltage the pull-down must hold against leakage with the pin not
 *     driving (default 0.2 V, well below the about 0.5 V at which a silicon junction starts to
 *     conduct; common practice): the pull-down must not exceed offVolts / leakage
 * @param baseLeakageAmps collector–base leakage of a small-signal transistor at the hottest
 *     ambient, flowing out through the pull-down when the pin floats (default 1 µA, from memory)
 * @param gateLeakageAmps gate leakage IGSS of a small MOSFET (default 100 nA, from memory)
 * @param gateDividerLossFraction the share of the pin voltage a gate pull-down may lose across
 *     the gate resistor (default 0.01): R_pd ≥ (1 − f)/f · (R_G + Rout)
 * @param minimumGateOhms the smallest gate resistor proposed, to damp the gate loop (default
 *     10 Ω, common practice)
 * @param darlingtonVbeVolts VBE of each transistor of a Darlington channel in the input-current
 *     estimate (default 0.7 V, DA-5)
 */
public record SizingOptions(BaseDriveRule baseDrive, ESeries series, double pullDownFraction, double offVolts,
                            double baseLeakageAmps, double gateLeakageAmps, double gateDividerLossFraction,
                            double minimumGateOhms, double darlingtonVbeVolts) {

    /** The defaults named above. */
    public static final SizingOptions DEFAULT = new SizingOptions(new BaseDriveRule.ForcedBeta(10), ESeries.E24,
            0.1, 0.2, 1e-6, 1e-7, 0.01, 10, 0.7);

    public SizingOptions {
        if (baseDrive == null) {
            throw new IllegalArgumentException("baseDrive must not be null");
        }
        if (series == null) {
            throw new IllegalArgumentException("series must not be null");
        }
        if (!(pullDownFraction >= 0 && pullDownFraction < 1)) {
            throw new IllegalArgumentException("pullDownFraction must be in [0, 1)");
        }
        if (!(offVolts > 0) || !Double.isFinite(offVolts)) {
            throw new IllegalArgumentException("offVolts must be positive and finite");
        }
        if (!(baseLeakageAmps > 0) || !Double.isFinite(baseLeakageAmps)) {
            throw new IllegalArgumentException("baseLeakageAmps must be positive and finite");
        }
        if (!(gateLeakageAmps > 0) || !Double.isFinite(gateLeakageAmps)) {
            throw new IllegalArgumentException("gateLeakageAmps must be positive and finite");
        }
        if (!(gateDividerLossFraction > 0 && gateDividerLossFraction < 1)) {
            throw new IllegalArgumentException("gateDividerLossFraction must be in (0, 1)");
        }
        if (!(minimumGateOhms > 0) || !Double.isFinite(minimumGateOhms)) {
            throw new IllegalArgumentException("minimumGateOhms must be positive and finite");
        }
        if (!(darlingtonVbeVolts > 0) || !Double.isFinite(darlingtonVbeVolts)) {
            throw new IllegalArgumentException("darlingtonVbeVolts must be positive and finite");
        }
    }

    /** The same options with another base drive rule. */
    public SizingOptions withBaseDrive(BaseDriveRule rule) {
        return new SizingOptions(rule, series, pullDownFraction, offVolts, baseLeakageAmps, gateLeakageAmps,
                gateDividerLossFraction, minimumGateOhms, darlingtonVbeVolts);
    }

    /** The same options rounding to another series. */
    public SizingOptions withSeries(ESeries s) {
        return new SizingOptions(baseDrive, s, pullDownFraction, offVolts, baseLeakageAmps, gateLeakageAmps,
                gateDividerLossFraction, minimumGateOhms, darlingtonVbeVolts);
    }

    /** The same options with another pull-down share (0: no pull-down sized). */
    public SizingOptions withPullDownFraction(double f) {
        return new SizingOptions(baseDrive, series, f, offVolts, baseLeakageAmps, gateLeakageAmps,
                gateDividerLossFraction, minimumGateOhms, darlingtonVbeVolts);
    }

    /** The same options with another gate divider loss. */
    public SizingOptions withGateDividerLossFraction(double f) {
        return new SizingOptions(baseDrive, series, pullDownFraction, offVolts, baseLeakageAmps, gateLeakageAmps,
                f, minimumGateOhms, darlingtonVbeVolts);
    }
}
