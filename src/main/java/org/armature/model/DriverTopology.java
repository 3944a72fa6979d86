package org.armature.model;

/** The four driver stages the checks know how to judge (DESIGN.md, "Scope of the editor"). */
public enum DriverTopology {
    /** An NPN sinks the coil current to ground; base driven from the pin through a resistor. */
    LOW_SIDE_NPN("Low-side NPN"),
    /** An N-channel MOSFET sinks the coil current to ground; gate driven from the pin. */
    LOW_SIDE_NMOS("Low-side N-MOSFET"),
    /** One Darlington-array channel sinks the coil current; its clamp diode returns to a common pin. */
    DARLINGTON_CHANNEL("Darlington-array channel"),
    /** A PNP sources the coil current from the supply; base pulled down by a level shift or the pin. */
    HIGH_SIDE_PNP("High-side PNP");

    private final String title;

    DriverTopology(String title) {
        this.title = title;
    }

    /** Human title, as used in messages. */
    public String title() {
        return title;
    }

    /** The kind of part that is the switch in this stage. */
    public PartKind switchKind() {
        return switch (this) {
            case LOW_SIDE_NPN -> PartKind.NPN;
            case LOW_SIDE_NMOS -> PartKind.NMOS;
            case DARLINGTON_CHANNEL -> PartKind.DARLINGTON;
            case HIGH_SIDE_PNP -> PartKind.PNP;
        };
    }

    /** True when the switch sits between the coil and ground. */
    public boolean isLowSide() {
        return this != HIGH_SIDE_PNP;
    }
}
