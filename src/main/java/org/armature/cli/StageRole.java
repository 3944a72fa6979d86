package org.armature.cli;

import java.util.Optional;
import java.util.Set;
import org.armature.model.DriverTopology;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;

/**
 * The job a part does in a stage, as {@link StageRecognition} finds it from the drawing: any
 * designators, any placement. The base or gate resistor, for example, is the resistor between the
 * pin and the switch's input in the low-side and Darlington stages and in the direct-drive high side,
 * but the one between the level-shift NPN's collector and the PNP's base in the level-shift high
 * side, where the pin drives the NPN through its own base resistor.
 */
enum StageRole {
    /** The logic drive pin. */
    PIN("drive pin"),
    /** The coil supply rail. */
    SUPPLY("coil supply"),
    /** The relay whose coil is switched. */
    RELAY("relay"),
    /** The transistor or array channel that carries the coil current. */
    SWITCH("switch"),
    /** The series resistor into the switch's base, gate or input. */
    BASE_RESISTOR("base or gate resistor"),
    /** The resistor that holds the base or gate low when the pin floats. */
    PULL_DOWN("pull-down resistor"),
    /** The PNP's base–emitter pull-up of the high-side stage. */
    PULL_UP("pull-up resistor"),
    /** The level-shift NPN's base resistor (high side, level shift). */
    SHIFT_RESISTOR("level-shift base resistor"),
    /** The zener or TVS that sets the suppressor's clamp voltage. */
    CLAMP("zener or TVS in its suppressor"),
    /** The resistor of an RC snubber or resistor suppressor. */
    SUPPRESSOR_RESISTOR("resistor in its suppressor"),
    /** The capacitor of an RC snubber. */
    SNUBBER_CAPACITOR("snubber capacitor"),
    /** The rail the relay's contacts switch. */
    CONTACT_SUPPLY("contact-side supply"),
    /** What the relay's contacts switch. */
    LOAD("contact-side load");

    private final String words;

    StageRole(String words) {
        this.words = words;
    }

    /** Plain words for the role, for error sentences ("has no pull-down resistor"). */
    String words() {
        return words;
    }

    /**
     * The designator doing this job in a stage.
     *
     * @param stage any stage
     * @param roles its roles, as {@link StageRecognition#of(Stage)} found them
     * @return the designator, or empty when the stage has no such part
     */
    Optional<String> ref(Stage stage, StageRoles roles) {
        boolean highSide = roles.topology() == DriverTopology.HIGH_SIDE_PNP;
        boolean levelShift = roles.levelShiftRef().isPresent();
        return switch (this) {
            case PIN -> roles.drivePinRef();
            case SUPPLY -> roles.coilSupplyRef();
            case RELAY -> Optional.of(roles.relayRef());
            case SWITCH -> Optional.of(roles.switchRef());
            case BASE_RESISTOR -> levelShift ? roles.switchBaseResistorRef() : roles.inputResistorRef();
            case PULL_DOWN -> highSide && !levelShift ? Optional.empty() : roles.inputPullRef();
            case PULL_UP -> levelShift ? roles.switchPullUpRef() : highSide ? roles.inputPullRef() : Optional.empty();
            case SHIFT_RESISTOR -> levelShift ? roles.inputResistorRef() : Optional.empty();
            case CLAMP -> suppressorPart(stage, roles, PartKind.ZENER, PartKind.TVS);
            case SUPPRESSOR_RESISTOR -> suppressorPart(stage, roles, PartKind.RESISTOR);
            case SNUBBER_CAPACITOR -> suppressorPart(stage, roles, PartKind.CAPACITOR);
            case CONTACT_SUPPLY -> roles.contactSupplyRefs().stream().findFirst();
            case LOAD -> roles.loadRefs().stream().findFirst();
        };
    }

    /** The first suppressor part of one of these kinds. */
    private static Optional<String> suppressorPart(Stage stage, StageRoles roles, PartKind... kinds) {
        Set<PartKind> wanted = Set.of(kinds);
        return roles.suppressorRefs().stream()
                .filter(ref -> stage.part(ref).map(p -> wanted.contains(p.kind())).orElse(false))
                .findFirst();
    }
}
