package org.armature.devices;

/**
 * Parameters of a junction diode after Shockley (Bell Syst. Tech. J. 28, 1949), with reverse
 * breakdown, so that one model serves rectifier, zener, LED and TVS diodes.
 *
 * <p>Reverse breakdown is the smooth term −IBV·[e^(−(v+BV)/(NBV·VT)) − e^(−BV/(NBV·VT))]: at
 * v = −BV the breakdown current is IBV (the datasheet's knee, for example a zener's test
 * current at its nominal voltage), and the term vanishes at v = 0.
 *
 * @param saturationCurrentAmps IS at the nominal temperature, amperes, positive
 * @param emissionCoefficient N, dimensionless, positive (1 to 2 for silicon, 2 to 4 for LEDs)
 * @param seriesResistanceOhms RS, ohms, zero or positive; the solver makes the internal node,
 *     {@link Diode#evaluate} covers the intrinsic junction only
 * @param breakdownVolts BV at the nominal temperature, volts, positive; infinite means reverse
 *     breakdown is not modelled
 * @param breakdownCurrentAmps IBV, amperes, positive: current at v = −BV
 * @param breakdownEmissionCoefficient NBV, dimensionless, positive: softness of the knee
 *     (current ×e per NBV·VT beyond BV)
 * @param breakdownTempcoPerKelvin relative tempco of BV, 1/K (BV(T) = BV·(1 + TBV·(T − Tnom)));
 *     positive for avalanche diodes above about 6 V, negative below
 * @param saturationCurrentTempExponent XTI, dimensionless (3 for a pn junction)
 * @param bandGapElectronVolts Eg, eV, positive (1.11 silicon; LEDs higher)
 * @param nominalTemperatureKelvin temperature at which the parameters hold, kelvin
 * @param bidirectional true for a symmetric clamp (bidirectional TVS): breakdown in both
 *     directions at ±BV and no forward conduction term; IS and N then only set the limiting
 */
public record DiodeParams(
        double saturationCurrentAmps,
        double emissionCoefficient,
        double seriesResistanceOhms,
        double breakdownVolts,
        double breakdownCurrentAmps,
        double breakdownEmissionCoefficient,
        double breakdownTempcoPerKelvin,
        double saturationCurrentTempExponent,
        double bandGapElectronVolts,
        double nominalTemperatureKelvin,
        boolean bidirectional) {

    /** Datasheet reference temperature, 25 °C, in kelvin. */
    public static final double DATASHEET_TEMPERATURE_KELVIN = 298.15;
    /** Silicon band gap used by the temperature scaling, eV (usual simulator value). */
    public static final double SILICON_BAND_GAP_ELECTRON_VOLTS = 1.11;
    /** XTI of a pn junction diode (usual simulator default). */
    public static final double PN_JUNCTION_TEMP_EXPONENT = 3.0;
    /** Default knee current when breakdown is not modelled, amperes (1 mA, a typical zener test current scale). */
    public static final double DEFAULT_BREAKDOWN_CURRENT_AMPS = 1e-3;

    /** Validates every field. */
    public DiodeParams {
        Checks.positiveFinite(saturationCurrentAmps, "saturationCurrentAmps");
        Checks.positiveFinite(emissionCoefficient, "emissionCoefficient");
        Checks.nonNegativeFinite(seriesResistanceOhms, "seriesResistanceOhms");
        Checks.positiveOrInfinite(breakdownVolts, "breakdownVolts");
        Checks.positiveFinite(breakdownCurrentAmps, "breakdownCurrentAmps");
        Checks.positiveFinite(breakdownEmissionCoefficient, "breakdownEmissionCoefficient");
        Checks.finite(breakdownTempcoPerKelvin, "breakdownTempcoPerKelvin");
        Checks.finite(saturationCurrentTempExponent, "saturationCurrentTempExponent");
        Checks.positiveFinite(bandGapElectronVolts, "bandGapElectronVolts");
        Checks.positiveFinite(nominalTemperatureKelvin, "nominalTemperatureKelvin");
        if (bidirectional && Double.isInfinite(breakdownVolts)) {
            throw new IllegalArgumentException("breakdownVolts must be finite for a bidirectional clamp");
        }
    }

    /**
     * A silicon junction without breakdown, no series resistance, parameters at 25 °C.
     *
     * @param saturationCurrentAmps IS, amperes
     * @param emissionCoefficient N
     * @return the parameters
     */
    public static DiodeParams junction(double saturationCurrentAmps, double emissionCoefficient) {
        return new DiodeParams(saturationCurrentAmps, emissionCoefficient, 0.0, Double.POSITIVE_INFINITY,
                DEFAULT_BREAKDOWN_CURRENT_AMPS, 1.0, 0.0, PN_JUNCTION_TEMP_EXPONENT,
                SILICON_BAND_GAP_ELECTRON_VOLTS, DATASHEET_TEMPERATURE_KELVIN, false);
    }

    /**
     * Fits IS so that the diode carries {@code forwardAmps} at {@code forwardVolts} (junction
     * voltage, series resistance excluded) with the given N, for example an LED from its
     * datasheet VF at IF: IS = IF / (e^(VF/(N·VT)) − 1).
     *
     * @param forwardVolts forward voltage, volts, positive
     * @param forwardAmps forward current, amperes, positive
     * @param emissionCoefficient N
     * @param temperatureKelvin temperature of the datasheet point; it becomes the nominal temperature
     * @return junction parameters without breakdown
     */
    public static DiodeParams fromForwardPoint(double forwardVolts, double forwardAmps,
            double emissionCoefficient, double temperatureKelvin) {
        Checks.positiveFinite(forwardVolts, "forwardVolts");
        Checks.positiveFinite(forwardAmps, "forwardAmps");
        Checks.positiveFinite(emissionCoefficient, "emissionCoefficient");
        Thermal.requireKelvin(temperatureKelvin, "temperatureKelvin");
        double nVt = emissionCoefficient * Thermal.voltage(temperatureKelvin);
        double is = forwardAmps / Math.expm1(forwardVolts / nVt);
        return junction(is, emissionCoefficient).withNominalTemperature(temperatureKelvin);
    }

    /**
     * Fits N and IS from one forward point and the slope in volts per decade of current
     * (N = slope / (VT·ln 10)), as in the textbook "0.7 V at 1 mA, 0.1 V/decade" description.
     *
     * @param forwardVolts forward voltage at {@code forwardAmps}, volts
     * @param forwardAmps forward current, amperes
     * @param voltsPerDecade forward-voltage increase per tenfold current, volts, positive
     * @param temperatureKelvin temperature of the description; it becomes the nominal temperature
     * @return junction parameters without breakdown
     */
    public static DiodeParams fromForwardPointAndSlope(double forwardVolts, double forwardAmps,
            double voltsPerDecade, double temperatureKelvin) {
        Checks.positiveFinite(voltsPerDecade, "voltsPerDecade");
        Thermal.requireKelvin(temperatureKelvin, "temperatureKelvin");
        double n = voltsPerDecade / (Thermal.voltage(temperatureKelvin) * Math.log(10.0));
        return fromForwardPoint(forwardVolts, forwardAmps, n, temperatureKelvin);
    }

    /** @return a copy with the given series resistance, ohms */
    public DiodeParams withSeriesResistance(double ohms) {
        return new DiodeParams(saturationCurrentAmps, emissionCoefficient, ohms, breakdownVolts,
                breakdownCurrentAmps, breakdownEmissionCoefficient, breakdownTempcoPerKelvin,
                saturationCurrentTempExponent, bandGapElectronVolts, nominalTemperatureKelvin, bidirectional);
    }

    /**
     * @param volts BV, volts
     * @param kneeAmps IBV, amperes
     * @param kneeEmissionCoefficient NBV
     * @return a copy with reverse breakdown (one direction)
     */
    public DiodeParams withBreakdown(double volts, double kneeAmps, double kneeEmissionCoefficient) {
        return new DiodeParams(saturationCurrentAmps, emissionCoefficient, seriesResistanceOhms, volts,
                kneeAmps, kneeEmissionCoefficient, breakdownTempcoPerKelvin, saturationCurrentTempExponent,
                bandGapElectronVolts, nominalTemperatureKelvin, false);
    }

    /**
     * @param volts clamp voltage magnitude BV, volts
     * @param kneeAmps current at ±BV, amperes
     * @param kneeEmissionCoefficient NBV
     * @return a copy as a symmetric (bidirectional TVS) clamp
     */
    public DiodeParams asBidirectionalClamp(double volts, double kneeAmps, double kneeEmissionCoefficient) {
        return new DiodeParams(saturationCurrentAmps, emissionCoefficient, seriesResistanceOhms, volts,
                kneeAmps, kneeEmissionCoefficient, breakdownTempcoPerKelvin, saturationCurrentTempExponent,
                bandGapElectronVolts, nominalTemperatureKelvin, true);
    }

    /** @return a copy with the given relative tempco of BV, 1/K */
    public DiodeParams withBreakdownTempco(double perKelvin) {
        return new DiodeParams(saturationCurrentAmps, emissionCoefficient, seriesResistanceOhms, breakdownVolts,
                breakdownCurrentAmps, breakdownEmissionCoefficient, perKelvin, saturationCurrentTempExponent,
                bandGapElectronVolts, nominalTemperatureKelvin, bidirectional);
    }

    /** @return a copy whose parameters hold at the given temperature, kelvin */
    public DiodeParams withNominalTemperature(double kelvin) {
        return new DiodeParams(saturationCurrentAmps, emissionCoefficient, seriesResistanceOhms, breakdownVolts,
                breakdownCurrentAmps, breakdownEmissionCoefficient, breakdownTempcoPerKelvin,
                saturationCurrentTempExponent, bandGapElectronVolts, kelvin, bidirectional);
    }

    /** @return a copy with the given XTI and Eg (eV) */
    public DiodeParams withTemperatureScaling(double tempExponent, double bandGapEv) {
        return new DiodeParams(saturationCurrentAmps, emissionCoefficient, seriesResistanceOhms, breakdownVolts,
                breakdownCurrentAmps, breakdownEmissionCoefficient, breakdownTempcoPerKelvin, tempExponent,
                bandGapEv, nominalTemperatureKelvin, bidirectional);
    }

    /** @return true when reverse breakdown is modelled */
    public boolean hasBreakdown() {
        return Double.isFinite(breakdownVolts);
    }
}
