package org.armature.netlist;

/**
 * Where the reported operating regions of the bipolar transistors begin (the MOSFET's regions are
 * those of the Shichman–Hodges law itself).
 *
 * @param junctionOnVolts a base–emitter junction below this (in the device's own polarity) counts
 *     as cut off; default 0.5 V (silicon junctions conduct appreciably above about 0.5 V; common practice)
 * @param saturationBaseCollectorVolts a forward base–collector bias at or above this counts as
 *     saturation; default 0.4 V, which puts the edge near VCE ≈ 0.3 V at VBE ≈ 0.7 V, the
 *     datasheet VCE(sat) class of small-signal transistors (common practice)
 */
public record RegionThresholds(double junctionOnVolts, double saturationBaseCollectorVolts) {

    /** Defaults: 0.5 V and 0.4 V. */
    public static final RegionThresholds DEFAULT = new RegionThresholds(0.5, 0.4);

    public RegionThresholds {
        if (!Double.isFinite(junctionOnVolts) || !Double.isFinite(saturationBaseCollectorVolts)) {
            throw new IllegalArgumentException("region thresholds must be finite");
        }
    }
}
