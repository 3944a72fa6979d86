package org.armature.devices;

/** Bipolar transistor polarity; PNP mirrors every junction voltage and terminal current. */
public enum BjtPolarity {
    /** n-p-n: forward active with VBE &gt; 0, collector current into the collector. */
    NPN(1.0),
    /** p-n-p: forward active with VBE &lt; 0, collector current out of the collector. */
    PNP(-1.0);

    private final double sign;

    BjtPolarity(double sign) {
        this.sign = sign;
    }

    /** @return +1 for NPN, −1 for PNP */
    public double sign() {
        return sign;
    }
}
