package org.armature.solver;

import org.armature.model.Stage;

/**
 * An independent check of every operating point the DC engine returns, found through
 * {@link java.util.ServiceLoader} when the system property {@code armature.answerAudit} is
 * {@code true}. The application registers none; the test suite registers one (and surefire sets the
 * property) that
 * recomputes each answer's KCL from its own pin currents (the honest-residual invariant), so every
 * operating point any test produces is audited, whatever path (warm start, contact guess, predicted
 * start, re-flatten, stepping) produced it.
 */
public interface AnswerAudit {

    /**
     * Checks one answer; throws (an assertion error in tests) when it does not hold.
     *
     * @param stage the stage solved
     * @param answer the operating point about to be returned
     */
    void check(Stage stage, OperatingPoint answer);
}
