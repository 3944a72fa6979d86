package org.armature.cli;

import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;

/**
 * The job a part does in a template stage, and which designator does it in each template (see
 * {@link Templates}): the base or gate resistor is R1 in the low-side and Darlington stages and in
 * the direct-drive high side, but R4 in the level-shift high side, where the pin drives R1 into the
 * NPN Q2.
 */
enum StageRole {
    /** The logic drive pin, U1. */
    PIN("drive pin"),
    /** The coil supply rail, V1. */
    SUPPLY("coil supply"),
    /** The relay, K1. */
    RELAY("relay"),
    /** The transistor or array channel that carries the coil current: Q1, or U2 for the Darlington. */
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
     * The designator doing this job in a template stage.
     *
     * @param stage the stage as built by {@link Templates#build(StageTemplate, Suppressor, HighSideDrive)}
     * @return the designator, or empty when the template has no such part
     */
    Optional<String> ref(StageTemplate template, Suppressor suppressor, HighSideDrive drive, Stage stage) {
        boolean levelShift = template == StageTemplate.HIGH_SIDE_PNP && drive == HighSideDrive.LEVEL_SHIFT;
        boolean direct = template == StageTemplate.HIGH_SIDE_PNP && drive == HighSideDrive.DIRECT;
        boolean lowSide = template == StageTemplate.LOW_SIDE_NPN || template == StageTemplate.LOW_SIDE_NMOS;
        return switch (this) {
            case PIN -> Optional.of("U1");
            case SUPPLY -> Optional.of("V1");
            case RELAY -> Optional.of("K1");
            case SWITCH -> Optional.of(template == StageTemplate.DARLINGTON_CHANNEL ? "U2" : "Q1");
            case BASE_RESISTOR -> Optional.of(levelShift ? "R4" : "R1");
            case PULL_DOWN -> lowSide || levelShift ? Optional.of("R2") : Optional.empty();
            case PULL_UP -> levelShift ? Optional.of("R3") : direct ? Optional.of("R2") : Optional.empty();
            case SHIFT_RESISTOR -> levelShift ? Optional.of("R1") : Optional.empty();
            case CLAMP -> suppressorPart(template, suppressor, drive, stage, PartKind.ZENER, PartKind.TVS);
            case SUPPRESSOR_RESISTOR -> suppressorPart(template, suppressor, drive, stage, PartKind.RESISTOR);
            case SNUBBER_CAPACITOR -> suppressorPart(template, suppressor, drive, stage, PartKind.CAPACITOR);
            case CONTACT_SUPPLY -> Optional.of("V2");
            case LOAD -> Optional.of("E1");
        };
    }

    /** A part the suppressor variant adds to the template: present with it, absent without it. */
    private static Optional<String> suppressorPart(StageTemplate template, Suppressor suppressor, HighSideDrive drive,
                                                   Stage stage, PartKind... kinds) {
        Set<String> bare = Templates.build(template, Suppressor.NONE, drive).parts().stream()
                .map(Part::ref).collect(Collectors.toSet());
        Set<PartKind> wanted = Set.of(kinds);
        return stage.parts().stream()
                .filter(p -> !bare.contains(p.ref()) && wanted.contains(p.kind()))
                .map(Part::ref)
                .findFirst();
    }
}
