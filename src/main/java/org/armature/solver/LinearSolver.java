package org.armature.solver;

/**
 * A dense linear solver for the MNA system, factor once and solve. Implementations hold their work
 * arrays for one size and are for one thread.
 *
 * <p>Contract: {@link #factor} overwrites {@code a} with its factors (or leaves it in an unspecified
 * state when it fails); {@link #solve} overwrites {@code b} with the solution and needs a successful
 * {@code factor} before it. A {@code true} from {@code factor} does not prove a well-conditioned
 * answer: it only says no pivot fell below the relative threshold.
 */
public interface LinearSolver {

    /** @return the system size this solver was made for */
    int size();

    /**
     * LU-factors a square matrix with partial pivoting.
     *
     * @param a the matrix, row-major, {@code size()·size()} entries; overwritten by its factors
     * @return false if some pivot is below {@code relativePivotThreshold} times the largest
     *     magnitude in its original row (the matrix is singular to working precision)
     */
    boolean factor(double[] a);

    /**
     * @return after a failed {@link #factor}, the index of the unknown (column) whose pivot failed;
     *     −1 after a success
     */
    int failedColumn();

    /**
     * Solves A·x = b with the last factors.
     *
     * @param b right-hand side, overwritten with x
     */
    void solve(double[] b);
}
