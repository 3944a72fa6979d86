package org.armature.solver.timedomain;

/**
 * The integration formula of the time point being solved, shared by the reactive elements of one
 * run. Written only by the run's step loop before each Newton solve; read by the elements while
 * they stamp. One instance per run, confined to the thread of that run.
 */
final class StepState {

    private IntegratorCoefficients coefficients;
    private boolean dc = true;

    /** The coefficients of the point being solved (meaningless while {@link #dc()}). */
    IntegratorCoefficients coefficients() {
        return coefficients;
    }

    /** True while the DC operating point is being solved. */
    boolean dc() {
        return dc;
    }

    void setDc() {
        dc = true;
    }

    void set(IntegratorCoefficients k) {
        coefficients = k;
        dc = false;
    }
}
