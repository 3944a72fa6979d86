package org.armature.devices;

import java.util.Objects;

/**
 * Parameters of the bipolar transistor model of {@link Bjt} (Ebers–Moll transport form with
 * Gummel–Poon base charge). Symbols follow the published models: IS, BF, BR, NF, NR, VAF, VAR,
 * IKF, IKR, XTI, XTB, Eg. Infinite Early voltages and knee currents switch those effects off.
 *
 * @param polarity NPN or PNP
 * @param saturationCurrentAmps IS, transport saturation current at Tnom, amperes, positive
 * @param betaForward BF, ideal forward current gain at Tnom, dimensionless, positive
 * @param betaReverse BR, ideal reverse current gain at Tnom, dimensionless, positive
 * @param forwardEmissionCoefficient NF, positive (1 for a good transistor)
 * @param reverseEmissionCoefficient NR, positive
 * @param forwardEarlyVolts VAF, volts, positive or infinite
 * @param reverseEarlyVolts VAR, volts, positive or infinite
 * @param forwardKneeCurrentAmps IKF, high-injection knee of the forward current, amperes, positive or infinite
 * @param reverseKneeCurrentAmps IKR, reverse knee current, amperes, positive or infinite
 * @param baseResistanceOhms RB, ohms (the solver makes the internal node)
 * @param collectorResistanceOhms RC, ohms (the solver makes the internal node)
 * @param emitterResistanceOhms RE, ohms (the solver makes the internal node)
 * @param saturationCurrentTempExponent XTI (3 usual)
 * @param betaTempExponent XTB: BF(T) = BF·(T/Tnom)^XTB, likewise BR (about 1.5 for small-signal
 *     silicon, from memory)
 * @param bandGapElectronVolts Eg, eV, positive (1.11 silicon)
 * @param nominalTemperatureKelvin Tnom, temperature at which the parameters hold, kelvin
 */
public record BjtParams(
        BjtPolarity polarity,
        double saturationCurrentAmps,
        double betaForward,
        double betaReverse,
        double forwardEmissionCoefficient,
        double reverseEmissionCoefficient,
        double forwardEarlyVolts,
        double reverseEarlyVolts,
        double forwardKneeCurrentAmps,
        double reverseKneeCurrentAmps,
        double baseResistanceOhms,
        double collectorResistanceOhms,
        double emitterResistanceOhms,
        double saturationCurrentTempExponent,
        double betaTempExponent,
        double bandGapElectronVolts,
        double nominalTemperatureKelvin) {

    /** Default XTB for small-signal silicon transistors (from memory; BJ-13 uses it). */
    public static final double DEFAULT_BETA_TEMP_EXPONENT = 1.5;

    /** Validates every field. */
    public BjtParams {
        Objects.requireNonNull(polarity, "polarity");
        Checks.positiveFinite(saturationCurrentAmps, "saturationCurrentAmps");
        Checks.positiveFinite(betaForward, "betaForward");
        Checks.positiveFinite(betaReverse, "betaReverse");
        Checks.positiveFinite(forwardEmissionCoefficient, "forwardEmissionCoefficient");
        Checks.positiveFinite(reverseEmissionCoefficient, "reverseEmissionCoefficient");
        Checks.positiveOrInfinite(forwardEarlyVolts, "forwardEarlyVolts");
        Checks.positiveOrInfinite(reverseEarlyVolts, "reverseEarlyVolts");
        Checks.positiveOrInfinite(forwardKneeCurrentAmps, "forwardKneeCurrentAmps");
        Checks.positiveOrInfinite(reverseKneeCurrentAmps, "reverseKneeCurrentAmps");
        Checks.nonNegativeFinite(baseResistanceOhms, "baseResistanceOhms");
        Checks.nonNegativeFinite(collectorResistanceOhms, "collectorResistanceOhms");
        Checks.nonNegativeFinite(emitterResistanceOhms, "emitterResistanceOhms");
        Checks.finite(saturationCurrentTempExponent, "saturationCurrentTempExponent");
        Checks.finite(betaTempExponent, "betaTempExponent");
        Checks.positiveFinite(bandGapElectronVolts, "bandGapElectronVolts");
        Checks.positiveFinite(nominalTemperatureKelvin, "nominalTemperatureKelvin");
    }

    /**
     * Plain Ebers–Moll transistor: NF = NR = 1, no Early effect, no high injection, no terminal
     * resistances, XTI 3, XTB 1.5, Eg 1.11 eV, parameters at 25 °C.
     *
     * @param polarity NPN or PNP
     * @param saturationCurrentAmps IS, amperes
     * @param betaForward BF
     * @param betaReverse BR
     * @return the parameters
     */
    public static BjtParams ebersMoll(BjtPolarity polarity, double saturationCurrentAmps, double betaForward,
            double betaReverse) {
        double inf = Double.POSITIVE_INFINITY;
        return new BjtParams(polarity, saturationCurrentAmps, betaForward, betaReverse, 1.0, 1.0, inf, inf, inf,
                inf, 0.0, 0.0, 0.0, DiodeParams.PN_JUNCTION_TEMP_EXPONENT, DEFAULT_BETA_TEMP_EXPONENT,
                DiodeParams.SILICON_BAND_GAP_ELECTRON_VOLTS, DiodeParams.DATASHEET_TEMPERATURE_KELVIN);
    }

    /** @return a copy with IS replaced, amperes */
    public BjtParams withSaturationCurrent(double amps) {
        return new BjtParams(polarity, amps, betaForward, betaReverse, forwardEmissionCoefficient,
                reverseEmissionCoefficient, forwardEarlyVolts, reverseEarlyVolts, forwardKneeCurrentAmps,
                reverseKneeCurrentAmps, baseResistanceOhms, collectorResistanceOhms, emitterResistanceOhms,
                saturationCurrentTempExponent, betaTempExponent, bandGapElectronVolts, nominalTemperatureKelvin);
    }

    /** @return a copy with BF replaced */
    public BjtParams withBetaForward(double beta) {
        return new BjtParams(polarity, saturationCurrentAmps, beta, betaReverse, forwardEmissionCoefficient,
                reverseEmissionCoefficient, forwardEarlyVolts, reverseEarlyVolts, forwardKneeCurrentAmps,
                reverseKneeCurrentAmps, baseResistanceOhms, collectorResistanceOhms, emitterResistanceOhms,
                saturationCurrentTempExponent, betaTempExponent, bandGapElectronVolts, nominalTemperatureKelvin);
    }

    /**
     * @param forwardVolts VAF, volts
     * @param reverseVolts VAR, volts
     * @return a copy with the Early voltages replaced
     */
    public BjtParams withEarlyVoltages(double forwardVolts, double reverseVolts) {
        return new BjtParams(polarity, saturationCurrentAmps, betaForward, betaReverse, forwardEmissionCoefficient,
                reverseEmissionCoefficient, forwardVolts, reverseVolts, forwardKneeCurrentAmps,
                reverseKneeCurrentAmps, baseResistanceOhms, collectorResistanceOhms, emitterResistanceOhms,
                saturationCurrentTempExponent, betaTempExponent, bandGapElectronVolts, nominalTemperatureKelvin);
    }

    /**
     * @param forwardAmps IKF, amperes
     * @param reverseAmps IKR, amperes
     * @return a copy with the knee currents replaced
     */
    public BjtParams withKneeCurrents(double forwardAmps, double reverseAmps) {
        return new BjtParams(polarity, saturationCurrentAmps, betaForward, betaReverse, forwardEmissionCoefficient,
                reverseEmissionCoefficient, forwardEarlyVolts, reverseEarlyVolts, forwardAmps, reverseAmps,
                baseResistanceOhms, collectorResistanceOhms, emitterResistanceOhms, saturationCurrentTempExponent,
                betaTempExponent, bandGapElectronVolts, nominalTemperatureKelvin);
    }

    /**
     * @param baseOhms RB
     * @param collectorOhms RC
     * @param emitterOhms RE
     * @return a copy with the terminal resistances replaced, ohms
     */
    public BjtParams withTerminalResistances(double baseOhms, double collectorOhms, double emitterOhms) {
        return new BjtParams(polarity, saturationCurrentAmps, betaForward, betaReverse, forwardEmissionCoefficient,
                reverseEmissionCoefficient, forwardEarlyVolts, reverseEarlyVolts, forwardKneeCurrentAmps,
                reverseKneeCurrentAmps, baseOhms, collectorOhms, emitterOhms, saturationCurrentTempExponent,
                betaTempExponent, bandGapElectronVolts, nominalTemperatureKelvin);
    }

    /**
     * @param isTempExponent XTI
     * @param betaExponent XTB
     * @param bandGapEv Eg, eV
     * @return a copy with the temperature parameters replaced
     */
    public BjtParams withTemperatureScaling(double isTempExponent, double betaExponent, double bandGapEv) {
        return new BjtParams(polarity, saturationCurrentAmps, betaForward, betaReverse, forwardEmissionCoefficient,
                reverseEmissionCoefficient, forwardEarlyVolts, reverseEarlyVolts, forwardKneeCurrentAmps,
                reverseKneeCurrentAmps, baseResistanceOhms, collectorResistanceOhms, emitterResistanceOhms,
                isTempExponent, betaExponent, bandGapEv, nominalTemperatureKelvin);
    }

    /** @return a copy whose parameters hold at the given temperature, kelvin */
    public BjtParams withNominalTemperature(double kelvin) {
        return new BjtParams(polarity, saturationCurrentAmps, betaForward, betaReverse, forwardEmissionCoefficient,
                reverseEmissionCoefficient, forwardEarlyVolts, reverseEarlyVolts, forwardKneeCurrentAmps,
                reverseKneeCurrentAmps, baseResistanceOhms, collectorResistanceOhms, emitterResistanceOhms,
                saturationCurrentTempExponent, betaTempExponent, bandGapElectronVolts, kelvin);
    }
}
