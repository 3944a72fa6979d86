package org.armature.analysis;

import org.armature.model.ParamKeys;
import org.armature.devices.Bjt;
import org.armature.devices.BjtParams;
import org.armature.devices.BjtPolarity;
import org.armature.devices.CoilResistance;
import org.armature.devices.DiodeParams;
import org.armature.devices.LogicOutputPin;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.units.PhysicalConstants;

/**
 * The device equations the hand calculations need, taken from {@code devices} (never re-derived
 * here): copper coil resistance, the hFE temperature factor, the pin's Thevenin source.
 */
final class PartPhysics {

    private PartPhysics() {
    }

    /** Copper coil law of a relay with its resistance scaled by {@code factor} (1 − tol, 1 + tol). */
    static CoilResistance coil(Part relay, double factor) {
        return CoilResistance.copper(relay.value(ParamKeys.COIL_RESISTANCE_OHMS) * factor,
                PhysicalConstants.celsiusToKelvin(relay.value(ParamKeys.REFERENCE_TEMPERATURE_CELSIUS)));
    }

    /** Coil resistance at a temperature, with the resistance scaled by {@code factor}, ohms. */
    static double coilOhms(Part relay, double factor, double celsius) {
        return coil(relay, factor).resistanceOhms(PhysicalConstants.celsiusToKelvin(celsius));
    }

    /** A coil voltage stated at the reference temperature moved to a coil temperature (RC-7). */
    static double coilVoltsAt(Part relay, double voltsAtReference, double celsius) {
        return coil(relay, 1).scaledAtConstantCurrent(voltsAtReference, PhysicalConstants.celsiusToKelvin(celsius));
    }

    /** Mean coil temperature from a measured coil resistance (the resistance method, RC-10), °C. */
    static double coilCelsiusFromOhms(Part relay, double measuredOhms) {
        return PhysicalConstants.kelvinToCelsius(coil(relay, 1).temperatureKelvinAt(measuredOhms));
    }

    /** The hFE temperature factor (T/Tnom)^XTB of a bipolar part at a junction temperature (BJ-13). */
    static double gainFactor(Part bjt, double celsius) {
        double xtb = bjt.kind() == PartKind.DARLINGTON ? BjtParams.DEFAULT_BETA_TEMP_EXPONENT
                : bjt.value(ParamKeys.GAIN_TEMP_EXPONENT);
        BjtParams p = BjtParams.ebersMoll(bjt.kind() == PartKind.PNP ? BjtPolarity.PNP : BjtPolarity.NPN, 1e-14, 100, 1)
                .withTemperatureScaling(DiodeParams.PN_JUNCTION_TEMP_EXPONENT, xtb,
                        DiodeParams.SILICON_BAND_GAP_ELECTRON_VOLTS);
        return new Bjt(p).betaTemperatureFactor(PhysicalConstants.celsiusToKelvin(celsius));
    }

    /** The pin's high level as a Thevenin source, at its lowest (nominal minus spread) or nominal. */
    static LogicOutputPin pin(Part drivePin, boolean lowest) {
        double v0 = drivePin.value(ParamKeys.HIGH_VOLTS) - (lowest ? drivePin.value(ParamKeys.HIGH_TOLERANCE_VOLTS) : 0);
        return new LogicOutputPin(v0, drivePin.value(ParamKeys.OUTPUT_RESISTANCE_OHMS));
    }

    /** Largest coil-supply voltage, volts. */
    static double supplyMax(Part supply) {
        return Math.abs(supply.value(ParamKeys.VOLTS)) * (1 + supply.value(ParamKeys.TOLERANCE_PERCENT) / 100);
    }

    /** Smallest coil-supply voltage, volts. */
    static double supplyMin(Part supply) {
        return Math.abs(supply.value(ParamKeys.VOLTS)) * (1 - supply.value(ParamKeys.TOLERANCE_PERCENT) / 100);
    }
}
