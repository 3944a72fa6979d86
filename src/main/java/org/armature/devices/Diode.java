package org.armature.devices;

/**
 * Junction diode after W. Shockley, "The theory of p-n junctions in semiconductors and p-n
 * junction transistors", Bell Syst. Tech. J. 28, 1949: I = IS(T)·(e^(V/(N·VT)) − 1), plus the
 * smooth reverse-breakdown term of {@link DiodeParams}. The series resistance RS is the
 * solver's (it makes an internal node); this class gives the intrinsic junction.
 *
 * <p>Temperature: VT = kT/q; IS(T) by {@link Junctions#saturationCurrentAt}; BV(T) linear with
 * the relative tempco. All exponentials go through {@link Junctions#safeExp(double)}, so no
 * junction voltage ever yields an overflow or NaN. Instances are immutable and thread-safe;
 * {@link #evaluate} allocates nothing.
 */
public final class Diode {

    private final DiodeParams params;

    /** @param params the diode parameters */
    public Diode(DiodeParams params) {
        this.params = java.util.Objects.requireNonNull(params, "params");
    }

    /** @return the parameters */
    public DiodeParams params() {
        return params;
    }

    /**
     * @param temperatureKelvin junction temperature, kelvin
     * @return IS at that temperature, amperes
     */
    public double saturationCurrentAt(double temperatureKelvin) {
        return Junctions.saturationCurrentAt(params.saturationCurrentAmps(), temperatureKelvin,
                params.nominalTemperatureKelvin(), params.saturationCurrentTempExponent(),
                params.bandGapElectronVolts(), params.emissionCoefficient());
    }

    /**
     * @param temperatureKelvin junction temperature, kelvin
     * @return BV at that temperature, volts (infinite when breakdown is not modelled)
     */
    public double breakdownVoltsAt(double temperatureKelvin) {
        return params.breakdownVolts()
                * (1.0 + params.breakdownTempcoPerKelvin() * (temperatureKelvin - params.nominalTemperatureKelvin()));
    }

    /**
     * @param temperatureKelvin junction temperature, kelvin
     * @return the forward critical voltage nVT·ln(nVT/(√2·IS)), volts
     */
    public double criticalVoltageAt(double temperatureKelvin) {
        double nVt = params.emissionCoefficient() * Thermal.voltage(temperatureKelvin);
        return Junctions.criticalVoltage(nVt, saturationCurrentAt(temperatureKelvin));
    }

    /**
     * Junction current and conductance at one junction voltage.
     *
     * @param vJunctionVolts intrinsic junction voltage, anode minus cathode, volts
     * @param temperatureKelvin junction temperature, kelvin
     * @param out overwritten with the current (A) and dI/dV (S)
     */
    public void evaluate(double vJunctionVolts, double temperatureKelvin, JunctionEvaluation out) {
        double vt = Thermal.voltage(temperatureKelvin);
        double current = 0.0;
        double conductance = 0.0;
        if (!params.bidirectional()) {
            double nVt = params.emissionCoefficient() * vt;
            double is = saturationCurrentAt(temperatureKelvin);
            double x = vJunctionVolts / nVt;
            current = is * Junctions.safeExpm1(x);
            conductance = is * Junctions.safeExpSlope(x) / nVt;
        }
        if (params.hasBreakdown()) {
            double bv = breakdownVoltsAt(temperatureKelvin);
            double nb = params.breakdownEmissionCoefficient() * vt;
            double ibv = params.breakdownCurrentAmps();
            double xr = (-vJunctionVolts - bv) / nb;
            if (params.bidirectional()) {
                double xf = (vJunctionVolts - bv) / nb;
                current += ibv * (Junctions.safeExp(xf) - Junctions.safeExp(xr));
                conductance += ibv / nb * (Junctions.safeExpSlope(xf) + Junctions.safeExpSlope(xr));
            } else {
                current -= ibv * (Junctions.safeExp(xr) - Math.exp(-bv / nb));
                conductance += ibv / nb * Junctions.safeExpSlope(xr);
            }
        }
        out.set(current, conductance);
    }

    /**
     * Newton voltage limiting for this junction: Nagel's rule on the forward exponential and,
     * mirrored about −BV (or ±BV for a bidirectional clamp), on the breakdown exponential, whose
     * knee current IBV plays the part of IS there.
     *
     * @param vNewVolts proposed junction voltage, volts
     * @param vOldVolts previous junction voltage, volts
     * @param temperatureKelvin junction temperature, kelvin
     * @return the limited junction voltage, volts; exactly {@code vNewVolts} when no limiting applies
     */
    public double limitVoltage(double vNewVolts, double vOldVolts, double temperatureKelvin) {
        double vt = Thermal.voltage(temperatureKelvin);
        if (!params.bidirectional() && vNewVolts >= 0) {
            double nVt = params.emissionCoefficient() * vt;
            double vCrit = Junctions.criticalVoltage(nVt, saturationCurrentAt(temperatureKelvin));
            return Junctions.limitJunction(vNewVolts, vOldVolts, nVt, vCrit);
        }
        if (!params.hasBreakdown()) {
            return vNewVolts;
        }
        double bv = breakdownVoltsAt(temperatureKelvin);
        double nb = params.breakdownEmissionCoefficient() * vt;
        double vCrit = Junctions.criticalVoltage(nb, params.breakdownCurrentAmps());
        double sign = vNewVolts >= 0 ? 1.0 : -1.0;
        double uNew = sign * vNewVolts - bv;
        double uOld = sign * vOldVolts - bv;
        double uLimited = Junctions.limitJunction(uNew, uOld, nb, vCrit);
        // mapping through (±v − BV) and back rounds: hand back the proposal itself when nothing was limited
        return uLimited == uNew ? vNewVolts : sign * (uLimited + bv);
    }

    /**
     * Operating point of this diode in series with a resistor across a voltage source, solved
     * by junction-limited Newton with {@link DeviceNewtonOptions#DEFAULTS}. The diode's own RS is
     * added to {@code seriesOhms}. A parallel (Norton) feed is its Thevenin equivalent.
     *
     * @param sourceVolts source voltage across resistor plus diode (anode side positive), volts
     * @param seriesOhms external series resistance, ohms, zero or positive
     * @param params the diode
     * @param temperatureKelvin junction temperature, kelvin
     * @return the operating point
     * @throws DeviceConvergenceException if Newton does not converge
     */
    public static SeriesOperatingPoint seriesOperatingPoint(double sourceVolts, double seriesOhms,
            DiodeParams params, double temperatureKelvin) {
        return seriesOperatingPoint(sourceVolts, seriesOhms, params, temperatureKelvin, DeviceNewtonOptions.DEFAULTS);
    }

    /**
     * As {@link #seriesOperatingPoint(double, double, DiodeParams, double)} with explicit options.
     *
     * @param sourceVolts source voltage, volts
     * @param seriesOhms external series resistance, ohms
     * @param params the diode
     * @param temperatureKelvin junction temperature, kelvin
     * @param options iteration limit and voltage tolerance
     * @return the operating point
     * @throws DeviceConvergenceException if Newton does not converge
     */
    public static SeriesOperatingPoint seriesOperatingPoint(double sourceVolts, double seriesOhms,
            DiodeParams params, double temperatureKelvin, DeviceNewtonOptions options) {
        Checks.finite(sourceVolts, "sourceVolts");
        Checks.nonNegativeFinite(seriesOhms, "seriesOhms");
        Thermal.requireKelvin(temperatureKelvin, "temperatureKelvin");
        Diode diode = new Diode(params);
        JunctionEvaluation eval = new JunctionEvaluation();
        double r = seriesOhms + params.seriesResistanceOhms();
        if (r == 0.0) {
            diode.evaluate(sourceVolts, temperatureKelvin, eval);
            return new SeriesOperatingPoint(sourceVolts, sourceVolts, eval.currentAmps(), 0);
        }
        double v = 0.0;
        double step = Double.POSITIVE_INFINITY;
        for (int k = 1; k <= options.maxIterations(); k++) {
            diode.evaluate(v, temperatureKelvin, eval);
            double residual = (sourceVolts - v) / r - eval.currentAmps();
            double proposed = v + residual / (1.0 / r + eval.conductanceSiemens());
            double limited = diode.limitVoltage(proposed, v, temperatureKelvin);
            step = Math.abs(limited - v);
            v = limited;
            if (step <= options.voltageToleranceVolts() && limited == proposed) {
                diode.evaluate(v, temperatureKelvin, eval);
                double i = eval.currentAmps();
                return new SeriesOperatingPoint(v, v + i * params.seriesResistanceOhms(), i, k);
            }
        }
        throw new DeviceConvergenceException("diode series operating point", options.maxIterations(), step);
    }
}
