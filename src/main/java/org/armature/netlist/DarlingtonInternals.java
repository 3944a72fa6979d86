package org.armature.netlist;

/**
 * Values inside a Darlington-array channel that its part sheet does not carry.
 *
 * @param betaReverse βR of each transistor; default 1 (a plain Ebers–Moll default; from memory)
 * @param driverKneeCurrentAmps IKF of the input transistor Q1, A; default 0.05 A (from memory:
 *     a small driver transistor)
 * @param outputKneeCurrentAmps IKF of the output transistor Q2, A; default 0.15 A (from memory,
 *     chosen so that VCE(sat) falls in the class range of CHECKS.md DA-2 for a 500 mA channel:
 *     without high-injection roll-off the model's output VBE would stay near 0.7 V at 350 mA,
 *     while arrays show 1.3 V typical there)
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
