package org.armature.model;

import java.util.Arrays;
import java.util.Optional;

/** The coil suppressor variants a template can be built with. */
public enum Suppressor {
    /** Nothing across the coil: the switch takes the kickback. */
    NONE("none"),
    /** A plain freewheeling diode across the coil. */
    DIODE("diode"),
    /** A diode in series with a zener: clamp at VZ + VF, faster release. */
    DIODE_ZENER("diode-zener"),
    /** A resistor and capacitor in series across the coil (snubber). */
    RC("rc"),
    /** A bidirectional TVS across the coil. */
    TVS("tvs"),
    /** A resistor across the coil. */
    RESISTOR("resistor");

    private final String id;

    Suppressor(String id) {
        this.id = id;
    }

    /** The identifier used by files and commands. */
    public String id() {
        return id;
    }

    /** The variant with this identifier. */
    public static Optional<Suppressor> byId(String id) {
        return Arrays.stream(values()).filter(s -> s.id.equals(id)).findFirst();
    }
}
