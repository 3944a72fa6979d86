package org.armature.devices;

/**
 * A logic output pin as a Thevenin source, V = V0 − Rout·I with I the current sourced by the
 * pin, fitted to two points of the datasheet's output-voltage table (VOH at two load currents,
 * or VOL at two sink currents with negative I). Valid only between the two fitted currents
 * (check-values.md GP-7); the pin's absolute-maximum current and its package total are separate limits.
 *
 * @param openCircuitVolts V0, volts, finite
 * @param outputResistanceOhms Rout, ohms, positive
 */
public record LogicOutputPin(double openCircuitVolts, double outputResistanceOhms) {

    /** Validates the fields. */
    public LogicOutputPin {
        Checks.finite(openCircuitVolts, "openCircuitVolts");
        Checks.positiveFinite(outputResistanceOhms, "outputResistanceOhms");
    }

    /**
     * Fit through two table points.
     *
     * @param volts1 output voltage at {@code amps1}, volts
     * @param amps1 first current sourced by the pin, amperes (negative when sinking)
     * @param volts2 output voltage at {@code amps2}, volts
     * @param amps2 second current, amperes, different from {@code amps1}
     * @return the Thevenin source
     * @throws IllegalArgumentException if the currents are equal or the voltage rises with load
     */
    public static LogicOutputPin fromTwoPoints(double volts1, double amps1, double volts2, double amps2) {
        Checks.finite(volts1, "volts1");
        Checks.finite(amps1, "amps1");
        Checks.finite(volts2, "volts2");
        Checks.finite(amps2, "amps2");
        if (amps1 == amps2) {
            throw new IllegalArgumentException("amps2 must differ from amps1: " + amps2);
        }
        double r = (volts1 - volts2) / (amps2 - amps1);
        return new LogicOutputPin(volts1 + r * amps1, r);
    }

    /**
     * @param sourcedAmps current out of the pin, amperes
     * @return pin voltage, volts
     */
    public double voltsAt(double sourcedAmps) {
        return openCircuitVolts - outputResistanceOhms * sourcedAmps;
    }

    /**
     * @param loadOhms resistance from the pin to a node held at {@code loadReturnVolts}, ohms
     * @param loadReturnVolts voltage the load returns to, volts (0 for ground)
     * @return current sourced by the pin, amperes
     */
    public double currentInto(double loadOhms, double loadReturnVolts) {
        Checks.nonNegativeFinite(loadOhms, "loadOhms");
        return (openCircuitVolts - loadReturnVolts) / (outputResistanceOhms + loadOhms);
    }
}
