package org.armature.analysis;

/**
 * Figures the topology check uses to judge polarity and turn-off without solving the circuit.
 *
 * @param forwardDropVolts assumed forward drop of a conducting silicon junction (default 0.7 V,
 *     common practice), used to add up a suppressor chain's conduction voltage
 * @param pnpOffMarginVolts how close (V) the base of a PNP must come to its emitter for it to be
 *     off (default 0.5 V: below about 0.5 V a silicon base–emitter junction carries negligible
 *     current, common practice)
 */
public record TopologyOptions(double forwardDropVolts, double pnpOffMarginVolts) {

    /** The defaults named above. */
    public static final TopologyOptions DEFAULT = new TopologyOptions(0.7, 0.5);

    public TopologyOptions {
        if (!(forwardDropVolts > 0 && Double.isFinite(forwardDropVolts))) {
            throw new IllegalArgumentException("forwardDropVolts must be positive and finite");
        }
        if (!(pnpOffMarginVolts >= 0 && Double.isFinite(pnpOffMarginVolts))) {
            throw new IllegalArgumentException("pnpOffMarginVolts must be non-negative and finite");
        }
    }
}
