package org.armature.netlist;

/**
 * What an element needs to know about the analysis while it stamps: the mode, the source factor
 * of source stepping, and for a transient step the time and the integration coefficient of the
 * companion models.
 *
 * @param mode DC operating point or a transient time point
 * @param sourceFactor scale of every independent source, 0 to 1 (1 except during source stepping)
 * @param timeSeconds time of the point being solved, s (0 for DC)
 * @param stepSeconds step from the last accepted point, s (0 for DC)
 * @param integrationCoefficientPerSecond α0 of the integration formula, 1/s: a capacitor's companion
 *     conductance is α0·C (backward Euler: α0 = 1/h); 0 for DC
 */
public record StampContext(Mode mode, double sourceFactor, double timeSeconds, double stepSeconds,
                           double integrationCoefficientPerSecond) {

    /** The kind of analysis being stamped. */
    public enum Mode {
        /** DC operating point: capacitors open, inductors shorted. */
        DC,
        /** A time point of a transient analysis: reactive elements stamp their companion models. */
        TRANSIENT
    }

    /** The DC operating point with sources at full value. */
    public static final StampContext DC = new StampContext(Mode.DC, 1.0, 0.0, 0.0, 0.0);

    public StampContext {
        if (mode == null) {
            throw new IllegalArgumentException("mode must not be null");
        }
        if (!(sourceFactor >= 0 && sourceFactor <= 1)) {
            throw new IllegalArgumentException("sourceFactor must be within 0..1, was " + sourceFactor);
        }
        if (!Double.isFinite(timeSeconds) || !(stepSeconds >= 0) || !Double.isFinite(stepSeconds)) {
            throw new IllegalArgumentException("timeSeconds and stepSeconds must be finite, stepSeconds ≥ 0");
        }
        if (!(integrationCoefficientPerSecond >= 0) || !Double.isFinite(integrationCoefficientPerSecond)) {
            throw new IllegalArgumentException("integrationCoefficientPerSecond must be finite and ≥ 0");
        }
    }

    /**
     * @param factor source factor, 0 to 1
     * @return the DC context with sources scaled by {@code factor}
     */
    public static StampContext dcScaled(double factor) {
        return new StampContext(Mode.DC, factor, 0.0, 0.0, 0.0);
    }

    /** @return true for a DC operating point */
    public boolean isDc() {
        return mode == Mode.DC;
    }
}
