package org.armature.analysis;


/**
 * How much base current the sizing assistant asks for.
 *
 * <p>{@link ForcedBeta}: IB = IC / βforced, independent of the transistor's gain (hard saturation:
 * βforced = 10 is common practice, BJ-15; datasheets state VCE(sat) at IC/IB = 10 or 20).
 * {@link Overdrive}: IB = k · IC / hFE(min) at the coldest ambient (k = 1 "just operates", BJ-17;
 * k = 10 is BJ-16's textbook rule).
 */
public sealed interface BaseDriveRule permits BaseDriveRule.ForcedBeta, BaseDriveRule.Overdrive {

    /** The base current asked for, amperes, given the collector current and the coldest gain. */
    double baseAmps(double collectorAmps, double hfeMinCold);

    /** The formula in words for the calculation sheet. */
    String formula();

    /**
     * IB = IC / βforced.
     *
     * @param forcedBeta βforced, positive (default 10)
     */
    record ForcedBeta(double forcedBeta) implements BaseDriveRule {
        public ForcedBeta {
            if (!(forcedBeta > 0) || !Double.isFinite(forcedBeta)) {
                throw new IllegalArgumentException("forcedBeta must be positive and finite");
            }
        }

        @Override
        public double baseAmps(double collectorAmps, double hfeMinCold) {
            return collectorAmps / forcedBeta;
        }

        @Override
        public String formula() {
            return "IB = IC / βforced, βforced = " + Quantities.ratio(forcedBeta);
        }
    }

    /**
     * IB = k · IC / hFE(min, coldest).
     *
     * @param factor k, positive (1: just enough at minimum gain)
     */
    record Overdrive(double factor) implements BaseDriveRule {
        public Overdrive {
            if (!(factor > 0) || !Double.isFinite(factor)) {
                throw new IllegalArgumentException("factor must be positive and finite");
            }
        }

        @Override
        public double baseAmps(double collectorAmps, double hfeMinCold) {
            return factor * collectorAmps / hfeMinCold;
        }

        @Override
        public String formula() {
            return "IB = k · IC / hFE(min, cold), k = " + Quantities.ratio(factor);
        }
    }

}
