package org.armature.devices;

/**
 * Avalanche breakdown of a switch at its rated voltage (BJT collector–emitter VCEO, MOSFET
 * drain–source V(BR)DSS), for a transient solver to put in parallel with the switch so that an
 * unsuppressed coil's kickback is clamped near the rating instead of rising to kilovolts
 * (check-values.md SU-0, SU-6). It uses the smooth breakdown form of the {@link Diode} model:
 * <pre>
 *   i(v) = IBV·[e^((v − VR)/Vs) − e^(−VR/Vs)]
 * </pre>
 * zero at v = 0, IBV at the rating VR, growing by e per softness Vs beyond it. Real parts break
 * down somewhat above their rating (the rating is a guaranteed minimum); placing the knee at the
 * rating is the conservative choice for the stress checks. The clamp conducts only for positive
 * v (collector above emitter, drain above source); the reverse direction belongs to the body
 * diode or the base–collector junction.
 *
 * @param ratedVolts VR, the switch's voltage rating, volts, positive
 * @param kneeCurrentAmps IBV, current at the rating, amperes, positive
 * @param softnessVolts Vs, voltage per e-fold of current beyond the knee, volts, positive
 */
public record BreakdownClamp(double ratedVolts, double kneeCurrentAmps, double softnessVolts) {

    /**
     * Default knee current, 1 mA: the usual test current of breakdown ratings in datasheets
     * (common practice).
     */
    public static final double DEFAULT_KNEE_CURRENT_AMPS = 1e-3;
    /**
     * Default softness as a fraction of the rating, 1 %: an ampere flows about 7 % above the
     * rating (ln 1000 ≈ 6.9 e-folds), a sharp but numerically gentle knee (our choice).
     */
    public static final double DEFAULT_SOFTNESS_FRACTION = 0.01;

    /** Validates every field. */
    public BreakdownClamp {
        Checks.positiveFinite(ratedVolts, "ratedVolts");
        Checks.positiveFinite(kneeCurrentAmps, "kneeCurrentAmps");
        Checks.positiveFinite(softnessVolts, "softnessVolts");
    }

    /**
     * Clamp with the default knee current and softness.
     *
     * @param ratedVolts the switch's voltage rating, volts
     * @return the clamp
     */
    public static BreakdownClamp atRating(double ratedVolts) {
        return new BreakdownClamp(ratedVolts, DEFAULT_KNEE_CURRENT_AMPS, DEFAULT_SOFTNESS_FRACTION * ratedVolts);
    }

    /**
     * Clamp current and conductance.
     *
     * @param volts voltage across the switch (collector–emitter or drain–source), volts
     * @param out overwritten with the current (A, into the collector or drain) and di/dv (S)
     */
    public void evaluate(double volts, JunctionEvaluation out) {
        double x = (volts - ratedVolts) / softnessVolts;
        double current = kneeCurrentAmps * (Junctions.safeExp(x) - Math.exp(-ratedVolts / softnessVolts));
        double conductance = kneeCurrentAmps * Junctions.safeExpSlope(x) / softnessVolts;
        out.set(current, conductance);
    }

    /**
     * Newton limiting for the clamp: Nagel's rule on the breakdown exponential, with the knee
     * current in place of IS and the softness in place of nVT.
     *
     * @param vNewVolts proposed switch voltage, volts
     * @param vOldVolts previous switch voltage, volts
     * @return the limited voltage, volts; exactly {@code vNewVolts} when no limiting applies
     */
    public double limitVoltage(double vNewVolts, double vOldVolts) {
        double vCrit = Junctions.criticalVoltage(softnessVolts, kneeCurrentAmps);
        double uNew = vNewVolts - ratedVolts;
        double uLimited = Junctions.limitJunction(uNew, vOldVolts - ratedVolts, softnessVolts, vCrit);
        // subtracting and adding the rating back rounds: hand back the proposal when nothing was limited
        return uLimited == uNew ? vNewVolts : ratedVolts + uLimited;
    }
}
