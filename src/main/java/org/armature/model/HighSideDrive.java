package org.armature.model;

import java.util.Arrays;
import java.util.Optional;

/** How the high-side PNP template is driven. */
public enum HighSideDrive {
    /** Through an NPN level shift with a base–emitter pull-up on the PNP: the standard circuit. */
    LEVEL_SHIFT("level-shift"),
    /**
     * Straight from the pin through a base resistor: the classic mistake. When the coil supply is
     * above the pin's high level the PNP cannot turn off. Kept so users can see why it fails.
     */
    DIRECT("direct");

    private final String id;

    HighSideDrive(String id) {
        this.id = id;
    }

    /** Identifier used by the {@code new} command. */
    public String id() {
        return id;
    }

    /** The variant with this identifier. */
    public static Optional<HighSideDrive> byId(String id) {
        return Arrays.stream(values()).filter(s -> s.id.equals(id)).findFirst();
    }
}
