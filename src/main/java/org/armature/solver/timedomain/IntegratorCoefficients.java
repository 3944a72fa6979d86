package org.armature.solver.timedomain;

/**
 * The derivative formula of one step, as coefficients of
 * {@code x'(n+1) ≈ a0·x(n+1) + a1·x(n) + a2·x(n−1) + b1·x'(n)}, together with the constant of the
 * local truncation error {@code E = lteConstant·x^(p+1)} (already multiplied by the step powers).
 *
 * <p>A companion model is this formula solved for the device law: a capacitor's
 * {@code i = C·v'} becomes a conductance {@code C·a0} in parallel with the current
 * {@code C·(a1·v(n) + a2·v(n−1) + b1·v'(n))}; an inductor's {@code v = L·i'} a resistance
 * {@code L·a0} in series with that voltage (see {@link Companion}).
 *
 * @param method the formula these coefficients belong to
 * @param a0 coefficient of the new value, 1/s, positive
 * @param a1 coefficient of the value at the last accepted point, 1/s
 * @param a2 coefficient of the value one point earlier, 1/s (zero but for BDF2)
 * @param b1 coefficient of the derivative at the last accepted point, dimensionless (−1 for the
 *     trapezoidal rule, else zero)
 * @param lteConstant local truncation error of the new value per unit (p+1)-th derivative, s^(p+1):
 *     Dahlquist's error constant times h^(p+1), signed as in check-values.md NM-9 (BE +h²/2, TR −h³/12,
 *     BDF2 −2/9·h³); step control uses only its magnitude
 */
public record IntegratorCoefficients(IntegrationMethod method, double a0, double a1, double a2, double b1,
                                     double lteConstant) {

    public IntegratorCoefficients {
        if (method == null) {
            throw new IllegalArgumentException("method must not be null");
        }
        if (!(a0 > 0) || !Double.isFinite(a0)) {
            throw new IllegalArgumentException("a0 must be positive and finite, was " + a0);
        }
    }

    /**
     * Coefficients for a step of length {@code h} after a step of length {@code hPrevious}.
     *
     * @param method the formula
     * @param hSeconds this step, seconds, positive
     * @param hPreviousSeconds the step before (used by BDF2 only), seconds, positive
     * @return the coefficients
     * @throws IllegalArgumentException if a step is not positive
     */
    public static IntegratorCoefficients of(IntegrationMethod method, double hSeconds, double hPreviousSeconds) {
        if (!(hSeconds > 0)) {
            throw new IllegalArgumentException("hSeconds must be positive, was " + hSeconds);
        }
        return switch (method) {
            case BACKWARD_EULER -> new IntegratorCoefficients(method, 1 / hSeconds, -1 / hSeconds, 0, 0,
                    hSeconds * hSeconds / 2);
            case TRAPEZOIDAL -> new IntegratorCoefficients(method, 2 / hSeconds, -2 / hSeconds, 0, -1,
                    -hSeconds * hSeconds * hSeconds / 12);
            case BDF2 -> {
                if (!(hPreviousSeconds > 0)) {
                    throw new IllegalArgumentException("hPreviousSeconds must be positive, was " + hPreviousSeconds);
                }
                double w = hSeconds / hPreviousSeconds;
                double a0 = (1 + 2 * w) / ((1 + w) * hSeconds);
                double a1 = -(1 + w) / hSeconds;
                double a2 = w * w / ((1 + w) * hSeconds);
                // derived: the formula applied to (t − t(n+1))³/6, divided by a0
                double lte = -hSeconds * hSeconds * hSeconds * (1 + w) * (1 + w) / (6 * w * (1 + 2 * w));
                yield new IntegratorCoefficients(method, a0, a1, a2, 0, lte);
            }
        };
    }

    /**
     * The history part of the derivative formula, {@code a1·x(n) + a2·x(n−1) + b1·x'(n)}.
     *
     * @param xNow value at the last accepted point
     * @param xBefore value one point earlier (ignored unless BDF2)
     * @param dxNow derivative at the last accepted point (ignored unless trapezoidal)
     * @return the history term, units of x per second
     */
    public double history(double xNow, double xBefore, double dxNow) {
        return a1 * xNow + a2 * xBefore + b1 * dxNow;
    }

    /**
     * The derivative at the new point once its value is known.
     *
     * @param xNew the new value
     * @param history {@link #history} of this step
     * @return x'(n+1), units of x per second
     */
    public double derivative(double xNew, double history) {
        return a0 * xNew + history;
    }
}
