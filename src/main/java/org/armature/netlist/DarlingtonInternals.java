package org.armature.netlist;

/**
 * Values inside a Darlington-array channel that its part sheet does not carry.
 *
 * @param betaReverse βR of each transistor; default 1 (a plain Ebers–Moll default; from memory)
 * @param clampSaturationCurrentAmps IS of the clamp diode from the output to the common pin; default
 *     1e-12 A (an integrated junction diode; from memory)
 * @param clampEmissionCoefficient N of the clamp diode; default 1.0
 */
public record DarlingtonInternals(double betaReverse, double clampSaturationCurrentAmps,
                                  double clampEmissionCoefficient) {

    /** Defaults: βR 1, clamp IS 1e-12 A, N 1. */
    public static final DarlingtonInternals DEFAULT = new DarlingtonInternals(1.0, 1e-12, 1.0);

    public DarlingtonInternals {
        if (!(betaReverse > 0) || !(clampSaturationCurrentAmps > 0) || !(clampEmissionCoefficient > 0)) {
            throw new IllegalArgumentException("Darlington internals must be positive");
        }
    }
}
