package org.armature.solver.timedomain;

/**
 * A run could not continue: Newton failed at the smallest allowed step, or the step budget ran out.
 * Carries the time reached and the step tried.
 */
public final class TransientFailureException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final double timeSeconds;
    private final double stepSeconds;

    /**
     * @param message what failed
     * @param timeSeconds time of the last accepted point, seconds
     * @param stepSeconds the step that failed, seconds
     */
    public TransientFailureException(String message, double timeSeconds, double stepSeconds) {
        super(message + " at t = " + timeSeconds + " s (step " + stepSeconds + " s)");
        this.timeSeconds = timeSeconds;
        this.stepSeconds = stepSeconds;
    }

    /** Time of the last accepted point, seconds. */
    public double timeSeconds() {
        return timeSeconds;
    }

    /** The step that failed, seconds. */
    public double stepSeconds() {
        return stepSeconds;
    }
}
