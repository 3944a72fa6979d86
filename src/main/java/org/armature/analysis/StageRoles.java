package org.armature.analysis;

import java.util.List;
import java.util.Optional;
import org.armature.model.HighSideDrive;

/**
 * What each part of a recognised driver stage does, as found by {@link TopologyCheck#recognise}.
 *
 * <p>"Input" names the transistor the logic pin drives: the switch itself for the low-side stages,
 * the level-shift NPN for a high-side PNP with level shift, the PNP for a directly driven high side.
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
 * @param contactSupplyRefs the supplies found on the contact side
 * @param coilHighNet the coil terminal's net at the higher potential when the stage is on
 * @param coilLowNet the other coil terminal's net
 * @param controlNet the input transistor's base or gate net
 * @param contactLoadRefs the loads found on the contact side, in the order traced from the contacts
 */
public record StageRoles(DriverTopology topology, Optional<HighSideDrive> highSideDrive, String relayRef,
                         String switchRef, Optional<String> levelShiftRef, Optional<String> drivePinRef,
                         Optional<String> inputResistorRef, Optional<String> inputPullRef,
                         Optional<String> switchPullUpRef, Optional<String> switchBaseResistorRef,
                         Optional<String> coilSupplyRef, List<String> suppressorRefs,
                         List<String> contactSupplyRefs, String coilHighNet, String coilLowNet,
                         String controlNet, List<String> contactLoadRefs) {

    public StageRoles {
        if (topology == null) {
            throw new IllegalArgumentException("topology must not be null");
        }
        suppressorRefs = List.copyOf(suppressorRefs);
        contactSupplyRefs = List.copyOf(contactSupplyRefs);
        contactLoadRefs = List.copyOf(contactLoadRefs);
    }

    /** The transistor the logic pin drives (switch, or level-shift NPN). */
    public String inputRef() {
        return levelShiftRef.orElse(switchRef);
    }
}
