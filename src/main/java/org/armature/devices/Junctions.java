package org.armature.devices;

/**
 * Numerical helpers shared by the junction devices: Newton voltage limiting of pn junctions
 * (L. W. Nagel, "SPICE2: A Computer Program to Simulate Semiconductor Circuits", UC Berkeley
 * ERL memo M520, 1975), a gate-step limiter of our own for MOSFETs, an overflow-safe exponential
 * and the temperature scaling of a junction saturation current.
 *
 * <p>All methods are pure, static and allocation-free.
 */
public final class Junctions {

    /**
     * Argument above which {@link #safeExp(double)} continues linearly instead of exponentially.
     * e^80 ≈ 5.5e34: with any realistic saturation current (≥ 1e-20 A) the current at the cap is
     * far beyond any circuit current, so the cap changes nothing physical, while linear growth
     * beyond it keeps every product finite (no overflow, no NaN) for any Newton iterate.
     */
    public static final double EXP_ARGUMENT_CAP = 80.0;

    private static final double EXP_AT_CAP = Math.exp(EXP_ARGUMENT_CAP);
    private static final double SQRT_TWO = Math.sqrt(2.0);

    private Junctions() {
    }

    /**
     * Overflow-safe exponential: e^x for x ≤ {@link #EXP_ARGUMENT_CAP}, and above it the tangent
     * line e^cap·(1 + x − cap). Continuous with a continuous first derivative.
     *
     * @param x argument (dimensionless); NaN gives NaN
     * @return e^x or its linear continuation; finite for every |x| below about 1e270 (junction
     *     arguments v/(N·VT) stay below 1e9 for any voltage a circuit can reach)
     */
    public static double safeExp(double x) {
        if (x <= EXP_ARGUMENT_CAP) {
            return Math.exp(x);
        }
        return EXP_AT_CAP * (1.0 + (x - EXP_ARGUMENT_CAP));
    }

    /**
     * {@link #safeExp(double)} minus one, accurate near x = 0 (uses {@link Math#expm1}), so a
     * junction current IS·(e^x − 1) keeps full relative precision at small bias.
     *
     * @param x argument (dimensionless)
     * @return safeExp(x) − 1
     */
    public static double safeExpm1(double x) {
        if (x <= EXP_ARGUMENT_CAP) {
            return Math.expm1(x);
        }
        return safeExp(x) - 1.0;
    }

    /**
     * Derivative of {@link #safeExp(double)}: e^x up to the cap, the constant e^cap above it.
     *
     * @param x argument (dimensionless)
     * @return d safeExp / dx
     */
    public static double safeExpSlope(double x) {
        return x <= EXP_ARGUMENT_CAP ? Math.exp(x) : EXP_AT_CAP;
    }

    /**
     * Critical voltage of a junction, vcrit = nVT·ln(nVT / (√2·IS)): the voltage at which the
     * exponential's curvature makes unlimited Newton steps unsafe (Nagel 1975).
     *
     * @param nVtVolts emission coefficient times thermal voltage, volts, positive
     * @param saturationCurrentAmps junction saturation current, amperes, positive
     * @return the critical voltage, volts
     */
    public static double criticalVoltage(double nVtVolts, double saturationCurrentAmps) {
        return nVtVolts * Math.log(nVtVolts / (SQRT_TWO * saturationCurrentAmps));
    }

    /**
     * Nagel's pn-junction voltage limiting (ERL M520, 1975). A proposed junction voltage above
     * vcrit that differs from the previous iterate by more than 2·nVT is replaced by the voltage
     * that gives the current the linearised exponential predicted, so the junction current never
     * grows by more than a modest factor per iteration.
     *
     * @param vNewVolts junction voltage proposed by the Newton step, volts
     * @param vOldVolts junction voltage of the previous iterate, volts
     * @param nVtVolts emission coefficient times thermal voltage, volts, positive
     * @param vCritVolts critical voltage from {@link #criticalVoltage(double, double)}, volts
     * @return the limited voltage (equal to {@code vNewVolts} when no limiting applies)
     */
    public static double limitJunction(double vNewVolts, double vOldVolts, double nVtVolts,
            double vCritVolts) {
        if (vNewVolts > vCritVolts && Math.abs(vNewVolts - vOldVolts) > 2.0 * nVtVolts) {
            if (vOldVolts > 0) {
                double arg = 1.0 + (vNewVolts - vOldVolts) / nVtVolts;
                return arg > 0 ? vOldVolts + nVtVolts * Math.log(arg) : vCritVolts;
            }
            return nVtVolts * Math.log(vNewVolts / nVtVolts);
        }
        return vNewVolts;
    }

    /**
     * Limits one Newton step of a MOSFET gate–source voltage (our own rule, in the spirit of
     * the gate limiting used by circuit simulators since the 1970s): the step is at most
     * {@code minimumStepVolts + overdriveStepFactor·|vOld − VT|}, and a gate leaving cutoff first
     * lands at most {@code thresholdLandingVolts} above the threshold.
     *
     * @param vNewVolts proposed gate–source voltage, volts
     * @param vOldVolts previous gate–source voltage, volts
     * @param thresholdVolts threshold voltage at the present temperature, volts
     * @param options step limits
     * @return the limited gate–source voltage, volts
     */
    public static double limitGateStep(double vNewVolts, double vOldVolts, double thresholdVolts,
            GateStepOptions options) {
        double maxStep = options.minimumStepVolts()
                + options.overdriveStepFactor() * Math.abs(vOldVolts - thresholdVolts);
        double delta = vNewVolts - vOldVolts;
        double limited = Math.abs(delta) > maxStep ? vOldVolts + Math.copySign(maxStep, delta) : vNewVolts;
        double landing = thresholdVolts + options.thresholdLandingVolts();
        if (vOldVolts < thresholdVolts && limited > landing) {
            limited = landing;
        }
        return limited;
    }

    /**
     * Temperature scaling of a junction saturation current:
     * IS(T) = IS·(T/Tnom)^(XTI/N)·exp[(Eg / (N·VT(T)))·(T/Tnom − 1)], the usual form derived
     * from the intrinsic carrier density (Eg in electron-volts; Eg/VT is then dimensionless).
     *
     * @param saturationCurrentAmps IS at the nominal temperature, amperes
     * @param temperatureKelvin junction temperature, kelvin
     * @param nominalTemperatureKelvin temperature at which IS is given, kelvin
     * @param tempExponent XTI (3 for a pn junction diode, also the BJT default)
     * @param bandGapElectronVolts Eg, electron-volts (1.11 for silicon)
     * @param emissionCoefficient N that divides the exponent (1 for the BJT transport current)
     * @return IS(T), amperes
     */
    public static double saturationCurrentAt(double saturationCurrentAmps, double temperatureKelvin,
            double nominalTemperatureKelvin, double tempExponent, double bandGapElectronVolts,
            double emissionCoefficient) {
        double ratio = temperatureKelvin / nominalTemperatureKelvin;
        double vt = Thermal.voltage(temperatureKelvin);
        return saturationCurrentAmps * Math.pow(ratio, tempExponent / emissionCoefficient)
                * Math.exp(bandGapElectronVolts / (emissionCoefficient * vt) * (ratio - 1.0));
    }

    /**
     * Thermal voltage kT/q with the exact SI 2019 constants.
     *
     * @param temperatureKelvin absolute temperature, kelvin
     * @return thermal voltage, volts (25.852 mV at 300 K)
     */
    public static double thermalVoltage(double temperatureKelvin) {
        return Thermal.voltage(temperatureKelvin);
    }
}
