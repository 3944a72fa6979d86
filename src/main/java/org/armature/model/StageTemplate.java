package org.armature.model;

import java.util.Arrays;
import java.util.Optional;

/** The four ready stages. */
public enum StageTemplate {
    /** Logic pin, base resistor and pull-down, NPN sinking the coil current. */
    LOW_SIDE_NPN("low-side-npn", "Low-side NPN"),
    /** Logic pin, gate resistor and pull-down, N-MOSFET sinking the coil current. */
    LOW_SIDE_NMOS("low-side-nmos", "Low-side N-MOSFET"),
    /** One channel of a Darlington sink array with its clamp diode to the coil supply. */
    DARLINGTON_CHANNEL("darlington-channel", "Darlington-array channel"),
    /** PNP sourcing the coil from the supply, turned on by an NPN level shift. */
    HIGH_SIDE_PNP("high-side-pnp", "High-side PNP");

    private final String id;
    private final String title;

    StageTemplate(String id, String title) {
        this.id = id;
        this.title = title;
    }

    /** Identifier used by the {@code new} command and files. */
    public String id() {
        return id;
    }

    /** Human title. */
    public String title() {
        return title;
    }

    /** The template with this identifier. */
    public static Optional<StageTemplate> byId(String id) {
        return Arrays.stream(values()).filter(t -> t.id.equals(id)).findFirst();
    }
}
