package org.armature.devices;

/**
 * Junction voltages of a transistor found for given conditions by the helpers of {@link Bjt}.
 *
 * @param vbeVolts base–emitter voltage, volts (device polarity)
 * @param vbcVolts base–collector voltage, volts (device polarity)
 * @param iterations Newton iterations used
 */
public record BjtJunctionSolution(double vbeVolts, double vbcVolts, int iterations) {

    /** @return VCE = VBE − VBC, volts */
    public double vceVolts() {
        return vbeVolts - vbcVolts;
    }
}
