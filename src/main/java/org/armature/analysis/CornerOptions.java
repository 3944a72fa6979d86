package org.armature.analysis;

/**
 * What the corner enumeration varies.
 *
 * @param vbeSpreadVolts ± spread of a bipolar transistor's VBE at a given current between samples
 *     (default 30 mV, from memory), applied as IS·exp(∓ΔV/VT) at 25 °C
 * @param maxCorners the largest full factorial allowed with every resistor as its own factor
 *     (default 1024); above it the resistors are grouped into one "weak drive / strong drive"
 *     factor (series resistors up while pull resistors go down)
 * @param includeResistors whether resistor tolerances are varied at all (default true)
 */
public record CornerOptions(double vbeSpreadVolts, int maxCorners, boolean includeResistors) {

    /** The defaults named above. */
    public static final CornerOptions DEFAULT = new CornerOptions(0.030, 1024, true);

    public CornerOptions {
        if (!(vbeSpreadVolts >= 0) || !Double.isFinite(vbeSpreadVolts)) {
            throw new IllegalArgumentException("vbeSpreadVolts must be zero or positive and finite");
        }
        if (maxCorners < 64) {
            throw new IllegalArgumentException("maxCorners must be at least 64");
        }
    }
}
