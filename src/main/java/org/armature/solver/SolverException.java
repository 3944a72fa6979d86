package org.armature.solver;

/**
 * The solver's failures: a circuit that has no unique DC solution ({@link SingularCircuitException})
 * or a Newton iteration that found none ({@link NonConvergenceException}), or a circuit that asks the
 * models for something outside their physics ({@link ModelLimitException}). Unchecked; each carries a
 * stable message key for user-facing text.
 */
public abstract sealed class SolverException extends RuntimeException
        permits SingularCircuitException, NonConvergenceException, ModelLimitException {

    private static final long serialVersionUID = 1L;

    private final String messageKey;

    /**
     * @param messageKey stable key ({@code solver.floating-node}, ...)
     * @param message English sentence naming the nodes or parts
     */
    protected SolverException(String messageKey, String message) {
        super(message);
        this.messageKey = messageKey;
    }

    /** @return the stable message key */
    public String messageKey() {
        return messageKey;
    }
}
