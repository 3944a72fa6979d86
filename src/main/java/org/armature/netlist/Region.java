package org.armature.netlist;

import java.util.Optional;

/**
 * The operating region of a transistor (or Darlington channel) at a solution, as a part reading
 * reports it under {@link Readings#REGION}.
 */
public enum Region {
    /** Not conducting: base–emitter (or gate–source) below conduction. */
    CUTOFF("cutoff", "cut off"),
    /** Bipolar forward active: base–emitter forward, base–collector reverse. */
    ACTIVE("active", "active region"),
    /** Bipolar saturation (both junctions forward), or a MOSFET's saturation (pinch-off) region. */
    SATURATION("saturation", "saturated"),
    /** MOSFET triode (linear) region: fully on as a switch. */
    TRIODE("triode", "triode region");

    private final String key;
    private final String words;

    Region(String key, String words) {
        this.key = key;
        this.words = words;
    }

    /** The reading's text value and the JSON value ({@code cutoff}, {@code saturation}, ...). */
    public String key() {
        return key;
    }

    /** Plain words for a badge ("cut off", "saturated"). */
    public String words() {
        return words;
    }

    /** True unless cut off. */
    public boolean conducts() {
        return this != CUTOFF;
    }

    /** The region with this key. */
    public static Optional<Region> byKey(String key) {
        for (Region r : values()) {
            if (r.key.equals(key)) {
                return Optional.of(r);
            }
        }
        return Optional.empty();
    }
}
