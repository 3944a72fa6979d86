package org.armature.solver.timedomain;

/**
 * Linear multistep formulas for the derivative of a state variable at the new time point.
 *
 * <p>Backward Euler and the trapezoidal rule are the A-stable one-step formulas of
 * G. Dahlquist, "A special stability problem for linear multistep methods", BIT 3, 1963; the
 * second-order backward differentiation formula (BDF2) is from C. W. Gear, <i>Numerical Initial
 * Value Problems in Ordinary Differential Equations</i>, Prentice-Hall, 1971. Each method gives its
 * order {@code p} (the local truncation error is {@code O(h^(p+1))}).
 *
 * <p>Choice: {@link #TRAPEZOIDAL} is the most accurate for lightly damped ringing (it does not
 * damp an undamped oscillator) but its one-step factor tends to −1 for steps long against a time
 * constant (check-values.md NM-7), so the engine restarts with {@link #BACKWARD_EULER} after each
 * discontinuity. {@link #BDF2} damps such modes (L-stable) at the price of some numerical damping
 * of real ringing.
 */
public enum IntegrationMethod {
    /** x'(n+1) ≈ (x(n+1) − x(n)) / h. Order 1, LTE h²/2·x''. */
    BACKWARD_EULER(1),
    /** x'(n+1) ≈ 2(x(n+1) − x(n)) / h − x'(n). Order 2, LTE −h³/12·x'''. */
    TRAPEZOIDAL(2),
    /** Variable-step BDF2 through x(n+1), x(n), x(n−1). Order 2, LTE −2/9·h³·x''' at equal steps. */
    BDF2(2);

    private final int order;

    IntegrationMethod(int order) {
        this.order = order;
    }

    /** Order p of the method; the local truncation error scales as h^(p+1). */
    public int order() {
        return order;
    }

    /** Number of past time points the formula needs besides the current one (BDF2: two). */
    public int pastPointsNeeded() {
        return this == BDF2 ? 2 : 1;
    }
}
