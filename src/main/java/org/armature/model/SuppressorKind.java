package org.armature.model;

/**
 * What limits the coil's turn-off voltage in a drawn stage, as recognised from its connectivity
 * ({@link StageRoles#suppressorKind()}). Unlike {@link Suppressor}, which names the variants a
 * template can be built with, this names whatever was drawn.
 */
public enum SuppressorKind {
    /** Nothing: the switch takes the kickback. */
    NONE("no suppressor"),
    /** A plain freewheeling diode across the coil. */
    DIODE("freewheeling diode"),
    /** A diode in series with a zener across the coil. */
    DIODE_ZENER("diode and zener"),
    /** A zener alone across the coil. */
    ZENER("zener"),
    /** A bidirectional TVS across the coil. */
    TVS("TVS"),
    /** A resistor and a capacitor in series across the coil. */
    RC("RC snubber"),
    /** A resistor across the coil. */
    RESISTOR("resistor across the coil"),
    /** A Darlington channel's own clamp diode, its common pin on the coil supply. */
    CHANNEL_CLAMP("channel clamp diode"),
    /** A Darlington channel's clamp diode returned to the coil supply through one more part (a zener). */
    CHANNEL_CLAMP_IN_SERIES("channel clamp diode in series with a part"),
    /** A zener or TVS across a low-side switch. */
    SWITCH_CLAMP("clamp across the switch"),
    /** More than one of the above, or a chain of other parts. */
    COMBINED("several suppressors");

    private final String words;

    SuppressorKind(String words) {
        this.words = words;
    }

    /** Plain words for messages ("freewheeling diode"). */
    public String words() {
        return words;
    }
}
