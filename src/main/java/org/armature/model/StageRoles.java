package org.armature.model;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * What each part of a recognised driver stage does, found from connectivity alone by
 * {@link StageRecognition#of(Stage)}: never from designators, placement or test point names.
 *
 * <p>"Input" names the transistor the logic pin drives: the switch itself for the low-side stages,
 * the level-shift NPN for a high-side PNP with level shift, the PNP for a directly driven high side.
 * Net names are those of {@link StageRecognition#connectivity()} (test point names where the user
 * gave them, otherwise the readable names of {@link StageRecognition}).
 *
 * @param topology which of the four stages was drawn
 * @param highSideDrive how a high-side PNP is driven; empty for the low-side stages
 * @param relayRef the relay whose coil is switched
 * @param switchRef the transistor (or Darlington channel) carrying the coil current
 * @param levelShiftRef the level-shift NPN of a high-side stage, if any
 * @param drivePinRef the logic pin driving the input, if one was found
 * @param inputResistorRef the series resistor between pin and input (base or gate resistor), if any
 * @param inputPullRef the resistor holding the input off (pull-down to ground, for a direct
 *     high side the pull-up to the emitter), if any
 * @param switchPullUpRef the PNP's base–emitter pull-up of a level-shifted high side, if any
 * @param switchBaseResistorRef the resistor between level-shift collector and PNP base, if any
 * @param coilSupplyRef the supply feeding the coil, if any
 * @param suppressorRefs the parts limiting the coil's turn-off voltage (for a Darlington channel
 *     with its own clamp diode in use, the channel itself)
 * @param suppressorKind what kind of suppressor those parts make
 * @param coilChains the chains of one or two parts across the coil, each oriented from the coil's
 *     on-state high end to its low end
 * @param switchClamps zeners or TVSs across a low-side switch, oriented from the switch node to ground
 * @param contactSupplyRefs the supplies found on the contact side
 * @param loadRefs the loads the contacts switch
 * @param coilHighNet the coil terminal's net at the higher potential when the stage is on
 * @param coilLowNet the other coil terminal's net
 * @param controlNet the input transistor's base or gate net
 * @param switchNet the switch's terminal on the coil (collector, drain or channel output)
 * @param switchControlNet the switch's own base, gate or channel input
 * @param pinNet the drive pin's output net, if a pin was found
 */
public record StageRoles(DriverTopology topology, Optional<HighSideDrive> highSideDrive, String relayRef,
                         String switchRef, Optional<String> levelShiftRef, Optional<String> drivePinRef,
                         Optional<String> inputResistorRef, Optional<String> inputPullRef,
                         Optional<String> switchPullUpRef, Optional<String> switchBaseResistorRef,
                         Optional<String> coilSupplyRef, List<String> suppressorRefs, SuppressorKind suppressorKind,
                         List<List<Oriented>> coilChains, List<Oriented> switchClamps,
                         List<String> contactSupplyRefs, List<String> loadRefs, String coilHighNet,
                         String coilLowNet, String controlNet, String switchNet, String switchControlNet,
                         Optional<String> pinNet) {

    /**
     * A two-pin part entered at one of its pins.
     *
     * @param ref the part's designator
     * @param fromPin the pin on the side the chain is entered from
     */
    public record Oriented(String ref, String fromPin) {
    }

    public StageRoles {
        if (topology == null || suppressorKind == null) {
            throw new IllegalArgumentException("topology and suppressorKind must not be null");
        }
        suppressorRefs = List.copyOf(suppressorRefs);
        coilChains = coilChains.stream().map(List::copyOf).toList();
        switchClamps = List.copyOf(switchClamps);
        contactSupplyRefs = List.copyOf(contactSupplyRefs);
        loadRefs = List.copyOf(loadRefs);
    }

    /** The transistor the logic pin drives (switch, or level-shift NPN). */
    public String inputRef() {
        return levelShiftRef.orElse(switchRef);
    }

    /** The kind of part the switch is. */
    public PartKind switchKind() {
        return topology.switchKind();
    }

    /** The same roles with every net name passed through {@code names} (names not in it stay). */
    StageRoles renamed(Map<String, String> names) {
        return new StageRoles(topology, highSideDrive, relayRef, switchRef, levelShiftRef, drivePinRef,
                inputResistorRef, inputPullRef, switchPullUpRef, switchBaseResistorRef, coilSupplyRef,
                suppressorRefs, suppressorKind, coilChains, switchClamps, contactSupplyRefs, loadRefs,
                names.getOrDefault(coilHighNet, coilHighNet), names.getOrDefault(coilLowNet, coilLowNet),
                names.getOrDefault(controlNet, controlNet), names.getOrDefault(switchNet, switchNet),
                names.getOrDefault(switchControlNet, switchControlNet),
                pinNet.map(n -> names.getOrDefault(n, n)));
    }
}
