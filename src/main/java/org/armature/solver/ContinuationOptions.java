package org.armature.solver;

/**
 * The fallbacks when plain Newton fails (Trajković, "DC operating points of transistor circuits",
 * NOLTA IEICE 2012; check-values.md NM-5): gmin stepping, a conductance from every node to ground
 * lowered decade by decade, then source stepping, every independent source ramped from 0 to 100 %.
 *
 * @param gminStartSiemens first shunt conductance, S; default 1e-3 S (stronger than any junction
 *     a relay stage holds below a milliamp, so the first step is nearly linear)
 * @param gminEndSiemens last shunt before the final unshunted solve, S; default 1e-12 S
 * @param gminStepFactor ratio between shunt steps; default 10 (one decade)
 * @param sourceFirstStep first source-factor increment; default 0.1
 * @param sourceMinStep smallest increment before source stepping gives up; default 1e-4
 */
public record ContinuationOptions(double gminStartSiemens, double gminEndSiemens, double gminStepFactor,
                                  double sourceFirstStep, double sourceMinStep) {

    /** Defaults: 1e-3 S down to 1e-12 S by decades; source steps from 0.1 down to 1e-4. */
    public static final ContinuationOptions DEFAULT = new ContinuationOptions(1e-3, 1e-12, 10.0, 0.1, 1e-4);

    public ContinuationOptions {
        if (!(gminStartSiemens > 0) || !(gminEndSiemens > 0) || !(gminEndSiemens <= gminStartSiemens)) {
            throw new IllegalArgumentException("gmin range must be positive with gminEndSiemens ≤ gminStartSiemens");
        }
        if (!(gminStepFactor > 1) || !Double.isFinite(gminStepFactor)) {
            throw new IllegalArgumentException("gminStepFactor must be above 1");
        }
        if (!(sourceFirstStep > 0 && sourceFirstStep <= 1) || !(sourceMinStep > 0 && sourceMinStep <= sourceFirstStep)) {
            throw new IllegalArgumentException("source steps must satisfy 0 < sourceMinStep ≤ sourceFirstStep ≤ 1");
        }
    }
}
