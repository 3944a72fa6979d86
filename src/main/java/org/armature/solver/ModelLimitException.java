package org.armature.solver;

/**
 * The circuit asks the models for something outside their own physics: an ambient outside the
 * range the copper and junction laws hold over, or a relay coil whose self-heating has no steady
 * state below the hottest insulation class ({@link org.armature.model.ModelRange}). The answer is
 * this finding, not an operating point: the message names the part (or the condition) and the
 * value reached and says the valid range.
 */
public final class ModelLimitException extends SolverException {

    private static final long serialVersionUID = 1L;

    /** Key: the ambient is outside the range the models hold over. */
    public static final String AMBIENT_OUT_OF_RANGE = "solver.ambient-out-of-range";
    /** Key: a coil's self-heating has no steady state below the insulation limit. */
    public static final String COIL_TOO_HOT = "solver.coil-no-steady-state";

    /** Key: a part value the device model cannot take (drop-out not below pick-up, for example). */
    public static final String PART_OUTSIDE_MODEL = "solver.part-outside-model";

    private final String partRef;
    private final double valueReached;

    /**
     * @param messageKey {@link #AMBIENT_OUT_OF_RANGE}, {@link #COIL_TOO_HOT} or {@link #PART_OUTSIDE_MODEL}
     * @param partRef the part concerned, or "" for a condition of the whole stage
     * @param valueReached the temperature reached or asked for, °C (NaN for a part value)
     * @param message one sentence naming the part and the value, and the valid range
     */
    public ModelLimitException(String messageKey, String partRef, double valueReached, String message) {
        super(messageKey, message);
        this.partRef = partRef;
        this.valueReached = valueReached;
    }

    /**
     * The engine's own failure for a part value a device model's constructor refused (its invariant
     * check names the field).
     *
     * @param e the refusal
     * @return the failure, key {@link #PART_OUTSIDE_MODEL}
     */
    public static ModelLimitException partOutsideModel(IllegalArgumentException e) {
        return new ModelLimitException(PART_OUTSIDE_MODEL, "", Double.NaN,
                "A part value is outside what its model can take (" + e.getMessage() + "); correct the value the"
                        + " document check names.");
    }

    /** @return the part concerned, or "" for the ambient */
    public String partRef() {
        return partRef;
    }

    /** @return the temperature reached or asked for, °C */
    public double valueReached() {
        return valueReached;
    }
}
