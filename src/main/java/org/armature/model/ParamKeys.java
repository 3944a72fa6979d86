package org.armature.model;

/**
 * The keys of the parts' numeric parameters ({@link ParamSpec#key()}) and choice options
 * ({@link OptionSpec#key()}), one constant per key: files and commands use the text, code uses the
 * constant. Each key says its unit in words ({@code resistanceOhms}); {@link ParamSpec#unit()} carries
 * it as a {@link org.armature.units.Unit}.
 */
public final class ParamKeys {

    private ParamKeys() {
    }

    /** {@code armatureDampingNewtonSecondsPerMetre}. */
    public static final String ARMATURE_DAMPING_NEWTON_SECONDS_PER_METRE = "armatureDampingNewtonSecondsPerMetre";
    /** {@code armatureMassGrams}. */
    public static final String ARMATURE_MASS_GRAMS = "armatureMassGrams";
    /** {@code baseResistanceOhms}. */
    public static final String BASE_RESISTANCE_OHMS = "baseResistanceOhms";
    /** {@code betaForward}. */
    public static final String BETA_FORWARD = "betaForward";
    /** {@code betaReverse}. */
    public static final String BETA_REVERSE = "betaReverse";
    /** {@code breakdownCurrentAmps}. */
    public static final String BREAKDOWN_CURRENT_AMPS = "breakdownCurrentAmps";
    /** {@code breakdownVolts}. */
    public static final String BREAKDOWN_VOLTS = "breakdownVolts";
    /** {@code capacitanceFarads}. */
    public static final String CAPACITANCE_FARADS = "capacitanceFarads";
    /** {@code channelCount}. */
    public static final String CHANNEL_COUNT = "channelCount";
    /** {@code clampResistanceOhms}. */
    public static final String CLAMP_RESISTANCE_OHMS = "clampResistanceOhms";
    /** {@code coilCapacitanceFarads}. */
    public static final String COIL_CAPACITANCE_FARADS = "coilCapacitanceFarads";
    /** {@code coilResistanceOhms}. */
    public static final String COIL_RESISTANCE_OHMS = "coilResistanceOhms";
    /** {@code coilResistanceTolerancePercent}. */
    public static final String COIL_RESISTANCE_TOLERANCE_PERCENT = "coilResistanceTolerancePercent";
    /** {@code coilThermalResistanceKelvinPerWatt}. */
    public static final String COIL_THERMAL_RESISTANCE_KELVIN_PER_WATT = "coilThermalResistanceKelvinPerWatt";
    /** {@code collectorResistanceOhms}. */
    public static final String COLLECTOR_RESISTANCE_OHMS = "collectorResistanceOhms";
    /** {@code contactRatedAmps}. */
    public static final String CONTACT_RATED_AMPS = "contactRatedAmps";
    /** {@code contactRatedVolts}. */
    public static final String CONTACT_RATED_VOLTS = "contactRatedVolts";
    /** {@code coreLossOhms}. */
    public static final String CORE_LOSS_OHMS = "coreLossOhms";
    /** {@code earlyVolts}. */
    public static final String EARLY_VOLTS = "earlyVolts";
    /** {@code emissionCoefficient}. */
    public static final String EMISSION_COEFFICIENT = "emissionCoefficient";
    /** {@code emitterResistanceOhms}. */
    public static final String EMITTER_RESISTANCE_OHMS = "emitterResistanceOhms";
    /** {@code firstBaseEmitterOhms}. */
    public static final String FIRST_BASE_EMITTER_OHMS = "firstBaseEmitterOhms";
    /** {@code forwardCurrentAmps}. */
    public static final String FORWARD_CURRENT_AMPS = "forwardCurrentAmps";
    /** {@code forwardVolts}. */
    public static final String FORWARD_VOLTS = "forwardVolts";
    /** {@code gainTempExponent}. */
    public static final String GAIN_TEMP_EXPONENT = "gainTempExponent";
    /** {@code hfeMin}. */
    public static final String HFE_MIN = "hfeMin";
    /** {@code highToleranceVolts}. */
    public static final String HIGH_TOLERANCE_VOLTS = "highToleranceVolts";
    /** {@code highVolts}. */
    public static final String HIGH_VOLTS = "highVolts";
    /** {@code icMaxAmps}. */
    public static final String IC_MAX_AMPS = "icMaxAmps";
    /** {@code idMaxAmps}. */
    public static final String ID_MAX_AMPS = "idMaxAmps";
    /** {@code inductanceAttractedHenries}. */
    public static final String INDUCTANCE_ATTRACTED_HENRIES = "inductanceAttractedHenries";
    /** {@code inductanceReleasedHenries}. */
    public static final String INDUCTANCE_RELEASED_HENRIES = "inductanceReleasedHenries";
    /** {@code inputResistanceOhms}. */
    public static final String INPUT_RESISTANCE_OHMS = "inputResistanceOhms";
    /** {@code kneeCurrentAmps}. */
    public static final String KNEE_CURRENT_AMPS = "kneeCurrentAmps";
    /** {@code lambdaPerVolt}. */
    public static final String LAMBDA_PER_VOLT = "lambdaPerVolt";
    /** {@code lowVolts}. */
    public static final String LOW_VOLTS = "lowVolts";
    /** {@code maxCurrentAmps}. */
    public static final String MAX_CURRENT_AMPS = "maxCurrentAmps";
    /** {@code mustOperateVolts}. */
    public static final String MUST_OPERATE_VOLTS = "mustOperateVolts";
    /** {@code mustReleaseVolts}. */
    public static final String MUST_RELEASE_VOLTS = "mustReleaseVolts";
    /** {@code operateTimeSeconds}. */
    public static final String OPERATE_TIME_SECONDS = "operateTimeSeconds";
    /** {@code outputResistanceOhms}. */
    public static final String OUTPUT_RESISTANCE_OHMS = "outputResistanceOhms";
    /** {@code packageCurrentLimitAmps}. */
    public static final String PACKAGE_CURRENT_LIMIT_AMPS = "packageCurrentLimitAmps";
    /** {@code peakPulsePowerWatts}. */
    public static final String PEAK_PULSE_POWER_WATTS = "peakPulsePowerWatts";
    /** {@code pinCurrentLimitAmps}. */
    public static final String PIN_CURRENT_LIMIT_AMPS = "pinCurrentLimitAmps";
    /** {@code powerRatingWatts}. */
    public static final String POWER_RATING_WATTS = "powerRatingWatts";
    /** {@code ratedVolts}. */
    public static final String RATED_VOLTS = "ratedVolts";
    /** {@code ratedWatts}. */
    public static final String RATED_WATTS = "ratedWatts";
    /** {@code rdsOnGateVolts}. */
    public static final String RDS_ON_GATE_VOLTS = "rdsOnGateVolts";
    /** {@code rdsOnOhms}. */
    public static final String RDS_ON_OHMS = "rdsOnOhms";
    /** {@code referenceTemperatureCelsius}. */
    public static final String REFERENCE_TEMPERATURE_CELSIUS = "referenceTemperatureCelsius";
    /** {@code releaseTimeSeconds}. */
    public static final String RELEASE_TIME_SECONDS = "releaseTimeSeconds";
    /** {@code resistanceOhms}. */
    public static final String RESISTANCE_OHMS = "resistanceOhms";
    /** {@code saturationCurrentAmps}. */
    public static final String SATURATION_CURRENT_AMPS = "saturationCurrentAmps";
    /** {@code secondBaseEmitterOhms}. */
    public static final String SECOND_BASE_EMITTER_OHMS = "secondBaseEmitterOhms";
    /** {@code seriesResistanceOhms}. */
    public static final String SERIES_RESISTANCE_OHMS = "seriesResistanceOhms";
    /** {@code springForceRatio}. */
    public static final String SPRING_FORCE_RATIO = "springForceRatio";
    /** {@code thermalResistanceKelvinPerWatt}. */
    public static final String THERMAL_RESISTANCE_KELVIN_PER_WATT = "thermalResistanceKelvinPerWatt";
    /** {@code thresholdTempcoVoltsPerKelvin}. */
    public static final String THRESHOLD_TEMPCO_VOLTS_PER_KELVIN = "thresholdTempcoVoltsPerKelvin";
    /** {@code thresholdVolts}. */
    public static final String THRESHOLD_VOLTS = "thresholdVolts";
    /** {@code tjMaxCelsius}. */
    public static final String TJ_MAX_CELSIUS = "tjMaxCelsius";
    /** {@code tolerancePercent}. */
    public static final String TOLERANCE_PERCENT = "tolerancePercent";
    /** {@code transconductanceAmpsPerVoltSquared}. */
    public static final String TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED = "transconductanceAmpsPerVoltSquared";
    /** {@code travelMetres}. */
    public static final String TRAVEL_METRES = "travelMetres";
    /** {@code vbeSatVolts}. */
    public static final String VBE_SAT_VOLTS = "vbeSatVolts";
    /** {@code vceSatVolts}. */
    public static final String VCE_SAT_VOLTS = "vceSatVolts";
    /** {@code vceoVolts}. */
    public static final String VCEO_VOLTS = "vceoVolts";
    /** {@code vdssVolts}. */
    public static final String VDSS_VOLTS = "vdssVolts";
    /** {@code vgsThMaxVolts}. */
    public static final String VGS_TH_MAX_VOLTS = "vgsThMaxVolts";
    /** {@code volts}. */
    public static final String VOLTS = "volts";
    /** Option {@code waveform}. */
    public static final String WAVEFORM = "waveform";
    /** Option {@code loadKind}. */
    public static final String LOAD_KIND = "loadKind";
    /** Relay or load parameter {@code contactRatedDcVolts} (contact side). */
    public static final String CONTACT_RATED_DC_VOLTS = "contactRatedDcVolts";

    /** Relay or load parameter {@code contactRatedDcAmps} (contact side). */
    public static final String CONTACT_RATED_DC_AMPS = "contactRatedDcAmps";

    /** Relay or load parameter {@code contactMakeAmps} (contact side). */
    public static final String CONTACT_MAKE_AMPS = "contactMakeAmps";

    /** Relay or load parameter {@code maxCoilVoltagePercent} (contact side). */
    public static final String MAX_COIL_VOLTAGE_PERCENT = "maxCoilVoltagePercent";

    /** Relay or load parameter {@code insulationClassCelsius} (contact side). */
    public static final String INSULATION_CLASS_CELSIUS = "insulationClassCelsius";

    /** Relay or load parameter {@code minArcVolts} (contact side). */
    public static final String MIN_ARC_VOLTS = "minArcVolts";

    /** Relay or load parameter {@code minArcAmps} (contact side). */
    public static final String MIN_ARC_AMPS = "minArcAmps";

    /** Relay or load parameter {@code contactWithstandVolts} (contact side). */
    public static final String CONTACT_WITHSTAND_VOLTS = "contactWithstandVolts";

    /** Relay or load parameter {@code inrushMultiple} (contact side). */
    public static final String INRUSH_MULTIPLE = "inrushMultiple";

    /** Relay or load parameter {@code inrushSeconds} (contact side). */
    public static final String INRUSH_SECONDS = "inrushSeconds";

    /** Relay or load parameter {@code powerFactor} (contact side). */
    public static final String POWER_FACTOR = "powerFactor";

    /** Relay or load parameter {@code inductanceHenries} (contact side). */
    public static final String INDUCTANCE_HENRIES = "inductanceHenries";

    /** Relay or load parameter {@code filamentKelvin} (contact side). */
    public static final String FILAMENT_KELVIN = "filamentKelvin";

    /** Relay or load parameter {@code loopResistanceOhms} (contact side). */
    public static final String LOOP_RESISTANCE_OHMS = "loopResistanceOhms";

}
