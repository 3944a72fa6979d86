package org.armature.solver.timedomain;

/**
 * Locates the time at which an event function changes sign inside a step, by the Illinois variant
 * of regula falsi (M. Dowell and P. Jarratt, BIT 11, 1971): each trial time is solved for anew, the
 * bracket shrinks to the side holding the sign change, and a side kept twice has its value halved so
 * the bracket closes from both ends. The event is placed at the end of the bracket just past the
 * crossing, within the time tolerance.
 *
 * <p>Mutable and single-use: one instance per located event.
 */
public final class EventLocator {

    private final double toleranceSeconds;
    private double tLow;
    private double gLow;
    private double tHigh;
    private double gHigh;
    private int keptSide;

    /**
     * Starts from a bracket.
     *
     * @param tLowSeconds start of the step, where the function has not yet crossed
     * @param gLowValue function value there (not zero, opposite sign to {@code gHighValue})
     * @param tHighSeconds end of the step, where it has crossed
     * @param gHighValue function value there
     * @param toleranceSeconds width of bracket at which the event counts as located
     */
    public EventLocator(double tLowSeconds, double gLowValue, double tHighSeconds, double gHighValue,
                        double toleranceSeconds) {
        if (!(tHighSeconds > tLowSeconds)) {
            throw new IllegalArgumentException("tHighSeconds must exceed tLowSeconds");
        }
        if (Math.signum(gLowValue) * Math.signum(gHighValue) > 0) {
            throw new IllegalArgumentException("the bracket must hold a sign change");
        }
        this.tLow = tLowSeconds;
        this.gLow = gLowValue;
        this.tHigh = tHighSeconds;
        this.gHigh = gHighValue;
        this.toleranceSeconds = toleranceSeconds;
    }

    /** True when the bracket is narrower than the tolerance: the event lies at {@link #eventTime()}. */
    public boolean located() {
        return tHigh - tLow <= toleranceSeconds;
    }

    /** The end of the bracket just past the crossing, seconds. */
    public double eventTime() {
        return tHigh;
    }

    /** The start of the bracket, seconds. */
    public double lowTime() {
        return tLow;
    }

    /**
     * The next trial time, strictly inside the bracket and at least a quarter tolerance from its ends.
     *
     * @return seconds
     */
    public double nextTrial() {
        double t = tLow - gLow * (tHigh - tLow) / (gHigh - gLow);
        double margin = Math.min(toleranceSeconds / 4, (tHigh - tLow) / 4);
        if (!Double.isFinite(t)) {
            t = 0.5 * (tLow + tHigh);
        }
        return Math.max(tLow + margin, Math.min(tHigh - margin, t));
    }

    /**
     * Records the function value at a trial time and narrows the bracket.
     *
     * @param tSeconds the trial time
     * @param g the function value there
     */
    public void update(double tSeconds, double g) {
        boolean crossed = g == 0 || Math.signum(g) == Math.signum(gHigh);
        if (crossed) {
            tHigh = tSeconds;
            gHigh = g;
            if (keptSide == -1) {
                gLow /= 2;
            }
            keptSide = -1;
        } else {
            tLow = tSeconds;
            gLow = g;
            if (keptSide == 1) {
                gHigh /= 2;
            }
            keptSide = 1;
        }
        if (g == 0) {
            tLow = Math.max(tLow, tSeconds - toleranceSeconds);
        }
    }
}
