package org.armature.devices;

/**
 * Fits of the {@link Bjt} model to datasheet figures. Each fit starts from a parameter set
 * (typical values for the part class, or the user's) and replaces one parameter so that the
 * model reproduces one stated operating point exactly, with every other effect of the model
 * (Early voltage, high-injection knee, temperature) accounted for.
 */
public final class BjtFit {

    /**
     * Relative change of BF and IS at which the alternating fit stops: 1e-12, a thousand times
     * the rounding of a double, far below any datasheet's precision.
     */
    public static final double FIT_RELATIVE_TOLERANCE = 1e-12;

    private BjtFit() {
    }

    /**
     * BF such that the model's hFE = IC/IB equals the datasheet's typical hFE at the stated IC and
     * VCE. Because IC does not depend on BF, this is exact: the junction voltages for IC are
     * solved first, then BF = IF / (IC/hFE − IR/BR) with the temperature factor removed.
     *
     * @param base starting parameters (IS, VAF, IKF, BR and temperature parameters are kept)
     * @param hfe stated DC current gain, dimensionless, positive
     * @param collectorAmps IC of the statement, amperes (negative for a PNP)
     * @param vceVolts VCE of the statement, volts (negative for a PNP)
     * @param temperatureKelvin temperature of the statement, kelvin
     * @return {@code base} with BF replaced
     * @throws IllegalArgumentException if no positive BF reproduces the point
     */
    public static BjtParams betaForwardFromHfe(BjtParams base, double hfe, double collectorAmps, double vceVolts,
            double temperatureKelvin) {
        Checks.positiveFinite(hfe, "hfe");
        Bjt bjt = new Bjt(base);
        BjtJunctionSolution sol = bjt.vbeForCollectorCurrent(collectorAmps, vceVolts, temperatureKelvin,
                DeviceNewtonOptions.DEFAULTS);
        double p = base.polarity().sign();
        double vt = Thermal.voltage(temperatureKelvin);
        double is = bjt.saturationCurrentAt(temperatureKelvin);
        double iF = is * Junctions.safeExpm1(p * sol.vbeVolts() / (base.forwardEmissionCoefficient() * vt));
        double iR = is * Junctions.safeExpm1(p * sol.vbcVolts() / (base.reverseEmissionCoefficient() * vt));
        double factor = bjt.betaTemperatureFactor(temperatureKelvin);
        double forwardBase = p * collectorAmps / hfe - iR / (base.betaReverse() * factor);
        if (!(forwardBase > 0)) {
            throw new IllegalArgumentException("hfe " + hfe + " cannot be reached at the stated collectorAmps "
                    + collectorAmps + " (reverse base current dominates)");
        }
        return base.withBetaForward(iF / forwardBase / factor);
    }

    /**
     * IS such that the model has the stated VBE at the stated IC and VCE (forward active,
     * datasheet "VBE(on)").
     *
     * @param base starting parameters
     * @param vbeVolts stated VBE, volts (negative for a PNP)
     * @param collectorAmps stated IC, amperes
     * @param vceVolts stated VCE, volts
     * @param temperatureKelvin temperature of the statement, kelvin
     * @return {@code base} with IS replaced (referred to the nominal temperature)
     * @throws DeviceConvergenceException if the fit does not converge
     */
    public static BjtParams saturationCurrentFromActiveVbe(BjtParams base, double vbeVolts, double collectorAmps,
            double vceVolts, double temperatureKelvin) {
        BjtParams params = base;
        double nfVt = base.forwardEmissionCoefficient() * Thermal.voltage(temperatureKelvin);
        double p = base.polarity().sign();
        DeviceNewtonOptions options = DeviceNewtonOptions.DEFAULTS;
        double error = Double.POSITIVE_INFINITY;
        for (int k = 0; k < options.maxIterations(); k++) {
            BjtJunctionSolution sol = new Bjt(params).vbeForCollectorCurrent(collectorAmps, vceVolts,
                    temperatureKelvin, options);
            error = p * (sol.vbeVolts() - vbeVolts);
            if (Math.abs(error) <= options.voltageToleranceVolts()) {
                return params;
            }
            params = params.withSaturationCurrent(params.saturationCurrentAmps() * Math.exp(error / nfVt));
        }
        throw new DeviceConvergenceException("IS fit from VBE", options.maxIterations(), Math.abs(error));
    }

    /**
     * IS such that the model has the stated VBE(sat) at the stated IC with IB = IC / forced
     * gain (datasheets state VBE(sat) at IC/IB = 10 or 20; check-values.md BJ-15).
     *
     * @param base starting parameters (BF should already be fitted)
     * @param vbeSatVolts stated VBE(sat), volts (negative for a PNP)
     * @param collectorAmps stated IC, amperes
     * @param forcedBeta IC/IB of the statement, below the model's hFE
     * @param temperatureKelvin temperature of the statement, kelvin
     * @return {@code base} with IS replaced (referred to the nominal temperature)
     * @throws DeviceConvergenceException if the fit does not converge
     */
    public static BjtParams saturationCurrentFromSaturatedVbe(BjtParams base, double vbeSatVolts,
            double collectorAmps, double forcedBeta, double temperatureKelvin) {
        Checks.positiveFinite(forcedBeta, "forcedBeta");
        BjtParams params = base;
        double nfVt = base.forwardEmissionCoefficient() * Thermal.voltage(temperatureKelvin);
        double p = base.polarity().sign();
        DeviceNewtonOptions options = DeviceNewtonOptions.DEFAULTS;
        double error = Double.POSITIVE_INFINITY;
        for (int k = 0; k < options.maxIterations(); k++) {
            BjtJunctionSolution sol = new Bjt(params).junctionsForCurrents(collectorAmps, collectorAmps / forcedBeta,
                    temperatureKelvin, options);
            error = p * (sol.vbeVolts() - vbeSatVolts);
            if (Math.abs(error) <= options.voltageToleranceVolts()) {
                return params;
            }
            params = params.withSaturationCurrent(params.saturationCurrentAmps() * Math.exp(error / nfVt));
        }
        throw new DeviceConvergenceException("IS fit from VBE(sat)", options.maxIterations(), Math.abs(error));
    }

    /**
     * Fits BF and IS together from hFE(typ) at one point and VBE(sat) at another: the two fits
     * are alternated until both points are reproduced (each depends weakly on the other through
     * the reverse base current).
     *
     * @param base starting parameters
     * @param hfe stated typical hFE
     * @param hfeCollectorAmps IC of the hFE statement, amperes
     * @param hfeVceVolts VCE of the hFE statement, volts
     * @param vbeSatVolts stated VBE(sat), volts
     * @param satCollectorAmps IC of the VBE(sat) statement, amperes
     * @param forcedBeta IC/IB of the VBE(sat) statement
     * @param temperatureKelvin temperature of both statements, kelvin
     * @return fitted parameters
     * @throws DeviceConvergenceException if the alternation does not settle
     */
    public static BjtParams gainAndSaturationCurrent(BjtParams base, double hfe, double hfeCollectorAmps,
            double hfeVceVolts, double vbeSatVolts, double satCollectorAmps, double forcedBeta,
            double temperatureKelvin) {
        BjtParams params = base;
        DeviceNewtonOptions options = DeviceNewtonOptions.DEFAULTS;
        double change = Double.POSITIVE_INFINITY;
        for (int k = 0; k < options.maxIterations(); k++) {
            BjtParams next = betaForwardFromHfe(params, hfe, hfeCollectorAmps, hfeVceVolts, temperatureKelvin);
            next = saturationCurrentFromSaturatedVbe(next, vbeSatVolts, satCollectorAmps, forcedBeta,
                    temperatureKelvin);
            change = Math.abs(next.betaForward() / params.betaForward() - 1.0)
                    + Math.abs(next.saturationCurrentAmps() / params.saturationCurrentAmps() - 1.0);
            params = next;
            if (change <= FIT_RELATIVE_TOLERANCE) {
                return params;
            }
        }
        throw new DeviceConvergenceException("BF and IS fit", options.maxIterations(), change);
    }
}
