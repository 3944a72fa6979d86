package org.armature.netlist;

/**
 * Values inside a Darlington-array channel that its part sheet does not carry.
 *
 * @param betaReverse βR of each transistor; default 1 (a plain Ebers–Moll default; from memory)
 * @param driverKneeCurrentAmps IKF of the input transistor Q1, A; default 0.05 A (from memory:
 *     a small driver transistor)
 * @param outputKneeCurrentAmps IKF of the output transistor Q2, A; default 0.15 A (from memory).
 *     Together with the channel's part-sheet typicals (IS 3e-14 A, output resistance 1.3 Ω in the
 *     joined collector lead) the model's VCE(sat) with the datasheet test input currents is
 *     0.95 / 1.12 / 1.35 V at 100 / 200 / 350 mA, near the class typicals of check-values.md DA-2
 *     (0.9 / 1.1 / 1.3 V) and inside typ..max at each current
 * @param clampSaturationCurrentAmps IS of the clamp diode from the output to the common pin; default
 *     1e-12 A (an integrated junction diode; from memory)
 * @param clampEmissionCoefficient N of the clamp diode; default 1.0
 */
public record DarlingtonInternals(double betaReverse, double driverKneeCurrentAmps, double outputKneeCurrentAmps,
                                  double clampSaturationCurrentAmps, double clampEmissionCoefficient) {

    /** Defaults: βR 1, IKF 0.05 A and 0.15 A, clamp IS 1e-12 A, N 1. */
    public static final DarlingtonInternals DEFAULT = new DarlingtonInternals(1.0, 0.05, 0.15, 1e-12, 1.0);

    public DarlingtonInternals {
        if (!(betaReverse > 0) || !(driverKneeCurrentAmps > 0) || !(outputKneeCurrentAmps > 0)
                || !(clampSaturationCurrentAmps > 0) || !(clampEmissionCoefficient > 0)) {
            throw new IllegalArgumentException("Darlington internals must be positive");
        }
    }
}
