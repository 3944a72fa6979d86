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
        super("solver.no-convergence", "no DC operating point after " + iterations
                + " Newton iterations (with gmin and source stepping); node " + worstNode
                + " moved most, last KCL residual " + lastResidualAmps + " A");
        this.iterations = iterations;
        this.worstNode = worstNode;
        this.lastResidualAmps = lastResidualAmps;
    }

    /** @return Newton iterations spent over all attempts */
    public int iterations() {
        return iterations;
    }

    /** @return the node or branch that moved most in the last iteration */
    public String worstNode() {
        return worstNode;
    }

    /** @return largest KCL residual of the last iterate, A (finite) */
    public double lastResidualAmps() {
        return lastResidualAmps;
    }
}
