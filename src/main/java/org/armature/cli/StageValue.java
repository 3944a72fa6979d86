package org.armature.cli;

import org.armature.model.ParamKeys;
import org.armature.units.Unit;

/**
 * The numeric options of {@code armature new}: each sets one parameter of the part that does a job
 * ({@link StageRole}) in the chosen template. An option whose part is missing from the template, or
 * whose part has no such parameter (a threshold voltage on an NPN), is a usage error.
 */
enum StageValue {
    SUPPLY("--supply", "VOLTS", Unit.VOLT, StageRole.SUPPLY, ParamKeys.VOLTS,
            "Coil supply rail V1, volts."),
    COIL_RATED("--coil-rated-voltage", "VOLTS", Unit.VOLT, StageRole.RELAY, ParamKeys.RATED_VOLTS,
            "Relay rated coil voltage, volts."),
    COIL_RESISTANCE("--coil-resistance", "OHMS", Unit.OHM, StageRole.RELAY, ParamKeys.COIL_RESISTANCE_OHMS,
            "Relay coil resistance at the reference temperature, ohms."),
    COIL_INDUCTANCE("--coil-inductance", "HENRIES", Unit.HENRY, StageRole.RELAY, ParamKeys.INDUCTANCE_RELEASED_HENRIES,
            "Coil inductance with the armature released, henries."),
    COIL_INDUCTANCE_ATTRACTED("--coil-inductance-attracted", "HENRIES", Unit.HENRY, StageRole.RELAY,
            ParamKeys.INDUCTANCE_ATTRACTED_HENRIES, "Coil inductance with the armature attracted, henries; 0 means constant."),
    COIL_CAPACITANCE("--coil-capacitance", "FARADS", Unit.FARAD, StageRole.RELAY, ParamKeys.COIL_CAPACITANCE_FARADS,
            "Coil self-capacitance, farads."),
    MUST_OPERATE("--must-operate", "VOLTS", Unit.VOLT, StageRole.RELAY, ParamKeys.MUST_OPERATE_VOLTS,
            "Must-operate (pick-up) coil voltage at the reference temperature, volts."),
    MUST_RELEASE("--must-release", "VOLTS", Unit.VOLT, StageRole.RELAY, ParamKeys.MUST_RELEASE_VOLTS,
            "Must-release (drop-out) coil voltage at the reference temperature, volts."),
    COIL_THERMAL("--coil-thermal-resistance", "K/W", Unit.KELVIN_PER_WATT, StageRole.RELAY,
            ParamKeys.COIL_THERMAL_RESISTANCE_KELVIN_PER_WATT, "Coil temperature rise per watt, K/W; 0 means no self-heating."),
    REFERENCE_TEMPERATURE("--reference-temperature", "°C", Unit.CELSIUS, StageRole.RELAY,
            ParamKeys.REFERENCE_TEMPERATURE_CELSIUS, "Temperature at which the coil figures hold, °C."),
    PIN_HIGH("--pin-high", "VOLTS", Unit.VOLT, StageRole.PIN, ParamKeys.HIGH_VOLTS,
            "Drive pin high level (open circuit), volts."),
    PIN_LOW("--pin-low", "VOLTS", Unit.VOLT, StageRole.PIN, ParamKeys.LOW_VOLTS,
            "Drive pin low level (open circuit), volts."),
    PIN_RESISTANCE("--pin-resistance", "OHMS", Unit.OHM, StageRole.PIN, ParamKeys.OUTPUT_RESISTANCE_OHMS,
            "Drive pin output resistance, ohms."),
    BASE_RESISTOR("--base-resistor", "OHMS", Unit.OHM, StageRole.BASE_RESISTOR, ParamKeys.RESISTANCE_OHMS,
            "Base resistor of the switch, or gate resistor of the MOSFET, ohms: R1; R4 (the PNP's) in the "
                    + "level-shift high side."),
    PULL_DOWN("--pull-down", "OHMS", Unit.OHM, StageRole.PULL_DOWN, ParamKeys.RESISTANCE_OHMS,
            "Base or gate pull-down R2, ohms (low side; the level-shift NPN's in the high side)."),
    PULL_UP("--pull-up", "OHMS", Unit.OHM, StageRole.PULL_UP, ParamKeys.RESISTANCE_OHMS,
            "PNP base-emitter pull-up, ohms (high side: R3 with level shift, R2 with direct drive)."),
    SHIFT_RESISTOR("--shift-resistor", "OHMS", Unit.OHM, StageRole.SHIFT_RESISTOR, ParamKeys.RESISTANCE_OHMS,
            "Level-shift NPN base resistor R1 (pin to Q2), ohms (high side with level shift)."),
    HFE("--hfe", "GAIN", Unit.RATIO, StageRole.SWITCH, ParamKeys.BETA_FORWARD,
            "Model forward gain βF of the switch (each transistor of a Darlington channel)."),
    HFE_MIN("--hfe-min", "GAIN", Unit.RATIO, StageRole.SWITCH, ParamKeys.HFE_MIN,
            "Datasheet minimum hFE of the switch (of the whole Darlington channel)."),
    VTH("--vth", "VOLTS", Unit.VOLT, StageRole.SWITCH, ParamKeys.THRESHOLD_VOLTS,
            "MOSFET threshold VT0 (Shichman-Hodges), volts."),
    KP("--kp", "A/V²", Unit.RATIO, StageRole.SWITCH, ParamKeys.TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED,
            "MOSFET Shichman-Hodges β (KP), A/V²: ID = β/2·(VGS − VT0)² in saturation."),
    LAMBDA("--lambda", "1/V", Unit.RATIO, StageRole.SWITCH, ParamKeys.LAMBDA_PER_VOLT,
            "MOSFET channel-length modulation λ, 1/V."),
    ZENER_VOLTAGE("--zener-voltage", "VOLTS", Unit.VOLT, StageRole.CLAMP, ParamKeys.BREAKDOWN_VOLTS,
            "Clamp voltage: the zener's VZ (diode-zener) or the TVS breakdown (tvs), volts."),
    SUPPRESSOR_RESISTANCE("--suppressor-resistance", "OHMS", Unit.OHM, StageRole.SUPPRESSOR_RESISTOR,
            ParamKeys.RESISTANCE_OHMS, "Resistor of the rc or resistor suppressor, ohms."),
    SNUBBER_CAPACITANCE("--snubber-capacitance", "FARADS", Unit.FARAD, StageRole.SNUBBER_CAPACITOR,
            ParamKeys.CAPACITANCE_FARADS, "Capacitor of the rc suppressor, farads."),
    MAX_COIL_VOLTAGE("--max-coil-voltage", "PCT", Unit.PERCENT, StageRole.RELAY, "maxCoilVoltagePercent",
            "Relay maximum allowable coil voltage, percent of rated (datasheet; typical 130)."),
    CONTACT_SUPPLY("--contact-supply", "VOLTS", Unit.VOLT, StageRole.CONTACT_SUPPLY, "volts",
            "Contact-side rail V2, volts (RMS with --contact-waveform ac)."),
    CONTACT_SUPPLY_TOLERANCE("--contact-supply-tolerance", "PCT", Unit.PERCENT, StageRole.CONTACT_SUPPLY,
            "tolerancePercent", "Contact-side rail tolerance, ±percent (the contact checks use its maximum)."),
    LOAD_RESISTANCE("--load-resistance", "OHMS", Unit.OHM, StageRole.LOAD, "resistanceOhms",
            "Load resistance when on, ohms (an AC motor or solenoid: |Z|; an LED: its resistor)."),
    LOAD_POWER("--load-power", "WATTS", Unit.WATT, StageRole.LOAD, "ratedWatts",
            "Load rated power at the contact rail, watts; without --load-resistance the resistance follows from it."),
    LOAD_INRUSH("--load-inrush", "MULTIPLE", Unit.RATIO, StageRole.LOAD, "inrushMultiple",
            "Load inrush peak ÷ steady current; 0 takes the load kind's typical value."),
    LOAD_INRUSH_TIME("--load-inrush-time", "SECONDS", Unit.SECOND, StageRole.LOAD, "inrushSeconds",
            "Time constant of the inrush decay, seconds; 0 takes the load kind's typical value."),
    LOAD_POWER_FACTOR("--load-power-factor", "COS PHI", Unit.RATIO, StageRole.LOAD, "powerFactor",
            "cos φ of an AC motor or solenoid; 0 takes the typical value."),
    LOAD_INDUCTANCE("--load-inductance", "HENRIES", Unit.HENRY, StageRole.LOAD, "inductanceHenries",
            "Inductance of a DC motor or solenoid, henries; 0 takes L/R = 2 ms per watt."),
    CONTACT_AC_CURRENT("--contact-rating-ac-current", "AMPS", Unit.AMPERE, StageRole.RELAY, "contactRatedAmps",
            "Contact current rating for AC, amperes (typical 10)."),
    CONTACT_AC_VOLTAGE("--contact-rating-ac-voltage", "VOLTS", Unit.VOLT, StageRole.RELAY, "contactRatedVolts",
            "Contact voltage rating for AC (RMS), volts (typical 250)."),
    CONTACT_DC_CURRENT("--contact-rating-dc-current", "AMPS", Unit.AMPERE, StageRole.RELAY, "contactRatedDcAmps",
            "Contact current rating for DC, amperes (typical 10)."),
    CONTACT_DC_VOLTAGE("--contact-rating-dc-voltage", "VOLTS", Unit.VOLT, StageRole.RELAY, "contactRatedDcVolts",
            "Contact voltage rating for DC, volts (typical 30)."),
    CONTACT_MAKE("--contact-make-current", "AMPS", Unit.AMPERE, StageRole.RELAY, "contactMakeAmps",
            "Contact make (inrush) rating, peak amperes (typical 30).");

    private final String optionName;
    private final String label;
    private final Unit unit;
    private final StageRole role;
    private final String key;
    private final String description;

    StageValue(String optionName, String label, Unit unit, StageRole role, String key, String description) {
        this.optionName = optionName;
        this.label = label;
        this.unit = unit;
        this.role = role;
        this.key = key;
        this.description = description;
    }

    String optionName() {
        return optionName;
    }

    String label() {
        return label;
    }

    Unit unit() {
        return unit;
    }

    StageRole role() {
        return role;
    }

    /** The parameter key set on the part (a {@link org.armature.model.PartKind} parameter). */
    String key() {
        return key;
    }

    String description() {
        return description;
    }
}
