package org.armature.analysis;

import java.util.SplittableRandom;

/**
 * How a toleranced parameter is distributed between its limits in a Monte Carlo run. Levels are
 * normalised: −1 is one limit, +1 the other, 0 the middle.
 */
public enum Spread {
    /**
     * Normal, with the tolerance at three standard deviations, truncated at the limits (a part
     * marked ±5 % is taken as σ = 5/3 %: common practice for manufacturing tolerances).
     */
    NORMAL_3_SIGMA,
    /** Uniform between the limits (a range with no preferred value: ambient, gain spread). */
    UNIFORM;

    /** Standard deviations from the middle to a limit for {@link #NORMAL_3_SIGMA}. */
    public static final double SIGMAS_TO_LIMIT = 3.0;

    /** Draws a normalised level in [−1, 1]. */
    public double draw(SplittableRandom random) {
        if (this == UNIFORM) {
            return 2 * random.nextDouble() - 1;
        }
        while (true) {
            double u = gaussian(random) / SIGMAS_TO_LIMIT;
            if (u >= -1 && u <= 1) {
                return u;
            }
        }
    }

    /** Standard normal deviate (Marsaglia polar method, Marsaglia and Bray, SIAM Review 6, 1964). */
    private static double gaussian(SplittableRandom random) {
        double v1;
        double v2;
        double s;
        do {
            v1 = 2 * random.nextDouble() - 1;
            v2 = 2 * random.nextDouble() - 1;
            s = v1 * v1 + v2 * v2;
        } while (s >= 1 || s == 0);
        return v1 * Math.sqrt(-2 * Math.log(s) / s);
    }
}
