package org.armature.devices;

import java.util.Objects;

/**
 * Parameters of the N-channel enhancement MOSFET of {@link Mosfet} (Shichman–Hodges, level 1).
 *
 * @param thresholdVolts VT0 at Tnom, volts, finite (positive for enhancement)
 * @param transconductanceAmpsPerVoltSquared β (KP·W/L), A/V², positive: ID = β/2·(VGS − VT0)² in
 *     saturation
 * @param channelLengthModulationPerVolt λ, 1/V, zero or positive
 * @param thresholdTempcoVoltsPerKelvin dVT0/dT, V/K; about −5 mV/K for power MOSFETs (from memory)
 * @param mobilityTempExponent β(T) = β·(T/Tnom)^exponent; −1.5 for lattice-scattering-limited
 *     mobility (from memory)
 * @param nominalTemperatureKelvin Tnom, kelvin
 * @param bodyDiode the source-to-drain body diode (anode at source), which the solver adds as a
 *     {@link Diode}
 */
public record MosfetParams(
        double thresholdVolts,
        double transconductanceAmpsPerVoltSquared,
        double channelLengthModulationPerVolt,
        double thresholdTempcoVoltsPerKelvin,
        double mobilityTempExponent,
        double nominalTemperatureKelvin,
        DiodeParams bodyDiode) {

    /** Default threshold tempco, V/K (from memory: power MOSFET datasheets show −4 to −7 mV/K). */
    public static final double DEFAULT_THRESHOLD_TEMPCO_VOLTS_PER_KELVIN = -5e-3;
    /** Default mobility exponent (from memory: lattice scattering, μ ∝ T^−1.5). */
    public static final double DEFAULT_MOBILITY_TEMP_EXPONENT = -1.5;
    /** Default body-diode saturation current, amperes (typical of small power MOSFETs, from memory). */
    public static final double DEFAULT_BODY_DIODE_SATURATION_AMPS = 1e-12;

    /** Validates every field. */
    public MosfetParams {
        Checks.finite(thresholdVolts, "thresholdVolts");
        Checks.positiveFinite(transconductanceAmpsPerVoltSquared, "transconductanceAmpsPerVoltSquared");
        Checks.nonNegativeFinite(channelLengthModulationPerVolt, "channelLengthModulationPerVolt");
        Checks.finite(thresholdTempcoVoltsPerKelvin, "thresholdTempcoVoltsPerKelvin");
        Checks.finite(mobilityTempExponent, "mobilityTempExponent");
        Checks.positiveFinite(nominalTemperatureKelvin, "nominalTemperatureKelvin");
        Objects.requireNonNull(bodyDiode, "bodyDiode");
    }

    /**
     * Level-1 parameters with default temperature behaviour and body diode, at 25 °C.
     *
     * @param thresholdVolts VT0, volts
     * @param betaAmpsPerVoltSquared β, A/V²
     * @param lambdaPerVolt λ, 1/V
     * @return the parameters
     */
    public static MosfetParams level1(double thresholdVolts, double betaAmpsPerVoltSquared, double lambdaPerVolt) {
        return new MosfetParams(thresholdVolts, betaAmpsPerVoltSquared, lambdaPerVolt,
                DEFAULT_THRESHOLD_TEMPCO_VOLTS_PER_KELVIN, DEFAULT_MOBILITY_TEMP_EXPONENT,
                DiodeParams.DATASHEET_TEMPERATURE_KELVIN,
                DiodeParams.junction(DEFAULT_BODY_DIODE_SATURATION_AMPS, 1.0));
    }

    /** @return a copy with VT0 and β replaced */
    public MosfetParams withThresholdAndBeta(double volts, double betaAmpsPerVoltSquared) {
        return new MosfetParams(volts, betaAmpsPerVoltSquared, channelLengthModulationPerVolt,
                thresholdTempcoVoltsPerKelvin, mobilityTempExponent, nominalTemperatureKelvin, bodyDiode);
    }

    /** @return a copy whose parameters hold at the given temperature, kelvin */
    public MosfetParams withNominalTemperature(double kelvin) {
        return new MosfetParams(thresholdVolts, transconductanceAmpsPerVoltSquared, channelLengthModulationPerVolt,
                thresholdTempcoVoltsPerKelvin, mobilityTempExponent, kelvin, bodyDiode);
    }

    /** @return a copy with the given threshold tempco (V/K) and mobility exponent */
    public MosfetParams withTemperatureScaling(double tempcoVoltsPerKelvin, double mobilityExponent) {
        return new MosfetParams(thresholdVolts, transconductanceAmpsPerVoltSquared, channelLengthModulationPerVolt,
                tempcoVoltsPerKelvin, mobilityExponent, nominalTemperatureKelvin, bodyDiode);
    }
}
