package org.armature.netlist;

import org.armature.model.ParamKeys;
import org.armature.devices.BjtParams;
import org.armature.devices.BjtPolarity;
import org.armature.devices.DiodeParams;
import org.armature.devices.MosfetParams;
import org.armature.model.Part;
import org.armature.model.PartKind;

/**
 * The one mapping from a part's datasheet values to the device model's parameters, used by the
 * netlist when it flattens a stage and by every datasheet fit that starts from a part, so the model
 * solved and the model fitted are always the same.
 */
public final class DeviceParameters {

    private DeviceParameters() {
    }

    /**
     * The bipolar model of an NPN or PNP part: unit emission coefficients, no reverse Early voltage
     * or knee, parameters stated at {@link DiodeParams#DATASHEET_TEMPERATURE_KELVIN}.
     *
     * @throws IllegalArgumentException if the part is not a bipolar transistor
     */
    public static BjtParams bjt(Part part) {
        if (part.kind() != PartKind.NPN && part.kind() != PartKind.PNP) {
            throw new IllegalArgumentException(part.ref() + " is not a bipolar transistor");
        }
        BjtPolarity polarity = part.kind() == PartKind.NPN ? BjtPolarity.NPN : BjtPolarity.PNP;
        double inf = Double.POSITIVE_INFINITY;
        return new BjtParams(polarity, part.value(ParamKeys.SATURATION_CURRENT_AMPS), part.value(ParamKeys.BETA_FORWARD),
                part.value(ParamKeys.BETA_REVERSE), 1.0, 1.0, part.value(ParamKeys.EARLY_VOLTS), inf, part.value(ParamKeys.KNEE_CURRENT_AMPS),
                inf, part.value(ParamKeys.BASE_RESISTANCE_OHMS), part.value(ParamKeys.COLLECTOR_RESISTANCE_OHMS),
                part.value(ParamKeys.EMITTER_RESISTANCE_OHMS), DiodeParams.PN_JUNCTION_TEMP_EXPONENT,
                part.value(ParamKeys.GAIN_TEMP_EXPONENT), DiodeParams.SILICON_BAND_GAP_ELECTRON_VOLTS,
                DiodeParams.DATASHEET_TEMPERATURE_KELVIN);
    }

    /**
     * The Shichman–Hodges model of an N-channel MOSFET part with its threshold tempco and the
     * default mobility exponent.
     *
     * @throws IllegalArgumentException if the part is not an N-channel MOSFET
     */
    public static MosfetParams mosfet(Part part) {
        if (part.kind() != PartKind.NMOS) {
            throw new IllegalArgumentException(part.ref() + " is not an N-channel MOSFET");
        }
        return MosfetParams.level1(part.value(ParamKeys.THRESHOLD_VOLTS), part.value(ParamKeys.TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED),
                part.value(ParamKeys.LAMBDA_PER_VOLT)).withTemperatureScaling(part.value(ParamKeys.THRESHOLD_TEMPCO_VOLTS_PER_KELVIN),
                MosfetParams.DEFAULT_MOBILITY_TEMP_EXPONENT);
    }

    /**
     * The Shockley junction with reverse breakdown of a diode or zener part (series resistance is a
     * separate element of the netlist).
     *
     * @throws IllegalArgumentException if the part is not a diode or zener
     */
    public static DiodeParams junction(Part part) {
        if (part.kind() != PartKind.DIODE && part.kind() != PartKind.ZENER) {
            throw new IllegalArgumentException(part.ref() + " is not a diode or zener");
        }
        return DiodeParams.junction(part.value(ParamKeys.SATURATION_CURRENT_AMPS), part.value(ParamKeys.EMISSION_COEFFICIENT))
                .withBreakdown(part.value(ParamKeys.BREAKDOWN_VOLTS), part.value(ParamKeys.BREAKDOWN_CURRENT_AMPS),
                        part.value(ParamKeys.EMISSION_COEFFICIENT));
    }
}
