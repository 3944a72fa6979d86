package org.armature.solver.timedomain;

/**
 * Local truncation error estimates from the accepted history, by divided differences
 * (check-values.md NM-9: BE h²/2·x'', TR −h³/12·x''', BDF2 −2/9·h³·x''' at equal steps; Dahlquist 1963,
 * Gear 1971).
 *
 * <p>The (p+1)-th derivative is estimated as {@code (p+1)!} times the divided difference through the
 * new point and the last p+1 accepted ones; this is exact for polynomials of degree p+1 and needs no
 * second solve. Pure functions; arrays are not modified.
 */
public final class TruncationError {

    private TruncationError() {
    }

    /**
     * Estimate of the k-th derivative from k+1 points by the k-th divided difference times k!.
     *
     * @param times time points, seconds, distinct, newest first; at least k+1 entries are used
     * @param values the values at those points
     * @param k derivative order, 1 to 3
     * @return the estimate, units of value per second^k
     */
    public static double derivative(double[] times, double[] values, int k) {
        if (k < 1 || k > 3) {
            throw new IllegalArgumentException("k must be 1 to 3, was " + k);
        }
        if (times.length < k + 1 || values.length < k + 1) {
            throw new IllegalArgumentException("need " + (k + 1) + " points for derivative order " + k);
        }
        double[] dd = new double[k + 1];
        System.arraycopy(values, 0, dd, 0, k + 1);
        for (int level = 1; level <= k; level++) {
            for (int i = 0; i + level <= k; i++) {
                dd[i] = (dd[i] - dd[i + 1]) / (times[i] - times[i + level]);
            }
        }
        double factorial = k == 3 ? 6 : k;
        return dd[0] * factorial;
    }

    /**
     * The LTE of one state at the new point.
     *
     * @param k the step's coefficients (method and LTE constant)
     * @param times newest first: t(n+1), t(n), ... (p+2 entries used)
     * @param values the state at those times
     * @return E, units of the state
     */
    public static double estimate(IntegratorCoefficients k, double[] times, double[] values) {
        int p = k.method().order();
        return k.lteConstant() * derivative(times, values, p + 1);
    }

    /**
     * |E| divided by its tolerance {@code rel·max(|x(n+1)|, |x(n)|) + abs}; the step is accepted when
     * the largest such ratio over the states is at most 1.
     *
     * @param error E
     * @param xNew the state at the new point
     * @param xOld the state at the last accepted point
     * @param relativeTolerance relative tolerance
     * @param absoluteTolerance absolute tolerance, units of the state
     * @return the ratio, not negative
     */
    public static double ratio(double error, double xNew, double xOld, double relativeTolerance,
                               double absoluteTolerance) {
        return Math.abs(error) / (relativeTolerance * Math.max(Math.abs(xNew), Math.abs(xOld)) + absoluteTolerance);
    }
}
