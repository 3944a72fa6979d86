package org.armature.solver;

/**
 * Newton–Raphson found no operating point, even with gmin stepping and source stepping. Names the
 * unknown that moved most (relative to its tolerance) in the last iteration and the last KCL residual.
 */
public final class NonConvergenceException extends SolverException {

    private static final long serialVersionUID = 1L;

    private final int iterations;
    private final String worstNode;
    private final double lastResidualAmps;

    /**
     * @param iterations Newton iterations spent over all attempts
     * @param worstNode the node (or branch) that moved most in the last iteration
     * @param lastResidualAmps largest KCL residual of the last iterate, A
     */
    public NonConvergenceException(int iterations, String worstNode, double lastResidualAmps) {
        this(iterations, worstNode, lastResidualAmps, "no DC operating point after " + iterations
                + " Newton iterations (with gmin and source stepping); node " + worstNode
                + " moved most, last KCL residual " + lastResidualAmps + " A");
    }

    private NonConvergenceException(int iterations, String worstNode, double lastResidualAmps, String message) {
        super("solver.no-convergence", message);
        this.iterations = iterations;
        this.worstNode = worstNode;
        this.lastResidualAmps = lastResidualAmps;
    }

    /**
     * The answer the solves ended with fails the one convergence test ({@link NewtonSolver#verify}).
     *
     * @param iterations Newton iterations spent, the full solve included
     * @param node the node with the largest KCL residual at that answer
     * @param residualAmps that residual, A
     * @return the failure, naming the node and the residual
     */
    public static NonConvergenceException failedTest(int iterations, String node, double residualAmps) {
        return new NonConvergenceException(iterations, node, residualAmps, "no DC operating point passes the"
                + " convergence test after " + iterations + " Newton iterations (the full solve included): KCL residual "
                + residualAmps + " A at node " + node);
    }

    /** @return Newton iterations spent over all attempts */
    public int iterations() {
        return iterations;
    }

    /** @return the node or branch that moved most in the last iteration (or with the largest residual, for {@link #failedTest}) */
    public String worstNode() {
        return worstNode;
    }

    /** @return largest KCL residual of the last iterate, A (finite) */
    public double lastResidualAmps() {
        return lastResidualAmps;
    }
}
