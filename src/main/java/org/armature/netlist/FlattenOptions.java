package org.armature.netlist;

/**
 * How a stage becomes a netlist.
 *
 * @param pinHigh drive pin state
 * @param ambientCelsius ambient temperature, °C; every device junction sits at ambient (no
 *     self-heating of semiconductors in the DC model), the relay coil starts at ambient
 * @param relayOperated initial contact state of every relay (the DC engine then makes it consistent
 *     with the coil current)
 * @param junctionGminSiemens conductance across every junction and channel; default 1e-12 S, the
 *     usual simulator value: far below any real leakage path, enough to keep reverse-biased
 *     junctions from leaving a node without a conductance
 * @param contacts relay contact resistances
 * @param regions region thresholds for the readouts
 * @param darlington internal values of a Darlington-array channel not on its part sheet
 */
public record FlattenOptions(boolean pinHigh, double ambientCelsius, boolean relayOperated,
                             double junctionGminSiemens, ContactModel contacts, RegionThresholds regions,
                             DarlingtonInternals darlington) {

    /** Default junction gmin, S. */
    public static final double DEFAULT_JUNCTION_GMIN_SIEMENS = 1e-12;

    public FlattenOptions {
        if (!Double.isFinite(ambientCelsius) || ambientCelsius <= -273.15) {
            throw new IllegalArgumentException("ambientCelsius must be finite and above absolute zero");
        }
        if (!(junctionGminSiemens >= 0) || !Double.isFinite(junctionGminSiemens)) {
            throw new IllegalArgumentException("junctionGminSiemens must be finite and ≥ 0");
        }
        if (contacts == null || regions == null || darlington == null) {
            throw new IllegalArgumentException("contacts, regions and darlington must not be null");
        }
    }

    /**
     * @param pinHigh drive pin state
     * @param ambientCelsius ambient, °C
     * @return options with every other field at its default and relays released
     */
    public static FlattenOptions of(boolean pinHigh, double ambientCelsius) {
        return new FlattenOptions(pinHigh, ambientCelsius, false, DEFAULT_JUNCTION_GMIN_SIEMENS,
                ContactModel.DEFAULT, RegionThresholds.DEFAULT, DarlingtonInternals.DEFAULT);
    }

    /** @return the same options with another pin state */
    public FlattenOptions withPinHigh(boolean high) {
        return new FlattenOptions(high, ambientCelsius, relayOperated, junctionGminSiemens, contacts, regions, darlington);
    }

    /** @return the same options at another ambient, °C */
    /**
     * @param other other options
     * @return true if they differ from these at most in the ambient
     */
    public boolean sameExceptAmbient(FlattenOptions other) {
        return pinHigh == other.pinHigh && relayOperated == other.relayOperated
                && Double.compare(junctionGminSiemens, other.junctionGminSiemens) == 0 && contacts.equals(other.contacts)
                && regions.equals(other.regions) && darlington.equals(other.darlington);
    }

    public FlattenOptions withAmbient(double celsius) {
        return new FlattenOptions(pinHigh, celsius, relayOperated, junctionGminSiemens, contacts, regions, darlington);
    }

    /** @return the same options with another initial relay state */
    public FlattenOptions withRelayOperated(boolean operated) {
        return new FlattenOptions(pinHigh, ambientCelsius, operated, junctionGminSiemens, contacts, regions, darlington);
    }
}
