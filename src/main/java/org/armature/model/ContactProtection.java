package org.armature.model;

import java.util.Arrays;
import java.util.Optional;

/** What can protect a relay's contacts when they break an inductive load. */
public enum ContactProtection {
    /** Nothing. */
    NONE("none"),
    /** A series resistor and capacitor across the contacts. */
    RC("rc"),
    /** A varistor (drawn as a bidirectional TVS) across the contacts. */
    VARISTOR("varistor"),
    /** A freewheeling diode across a DC load, cathode on the rail side. */
    DIODE("diode");

    private final String id;

    ContactProtection(String id) {
        this.id = id;
    }

    /** The identifier used by commands. */
    public String id() {
        return id;
    }

    /** The protection with this identifier. */
    public static Optional<ContactProtection> byId(String id) {
        return Arrays.stream(values()).filter(s -> s.id.equals(id)).findFirst();
    }
}
