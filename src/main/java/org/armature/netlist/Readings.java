package org.armature.netlist;

/**
 * The keys of the quantities and states a part reading reports ({@link PartReading#quantities()},
 * {@link PartReading#states()}), one constant per key so that no reader spells them again. Values
 * are SI units; the key says which (currents in A, voltages in V, power in W, temperatures in °C).
 */
public final class Readings {

    private Readings() {
    }

    // ------------------------------------------------------------------ quantities

    /** Current through a two-terminal part (first pin to second), a supply or a pin, A. */
    public static final String CURRENT = "current";
    /** Voltage across a two-terminal part (first pin minus second), V. */
    public static final String VOLTAGE = "voltage";
    /** Power a part dissipates, W. */
    public static final String POWER = "power";
    /** A supply's voltage, V. */
    public static final String VOLTS = "volts";
    /** Power a supply delivers, W. */
    public static final String DELIVERED_POWER = "deliveredPower";
    /** Collector (or Darlington output) current, A. */
    public static final String IC = "ic";
    /** Base current, A. */
    public static final String IB = "ib";
    /** Collector–emitter (or output–emitter) voltage, V. */
    public static final String VCE = "vce";
    /** Base–emitter voltage, V. */
    public static final String VBE = "vbe";
    /** IC ÷ IB, dimensionless. */
    public static final String FORCED_BETA = "forcedBeta";
    /** Drain current, A. */
    public static final String ID = "id";
    /** Gate–source voltage, V. */
    public static final String VGS = "vgs";
    /** Drain–source voltage, V. */
    public static final String VDS = "vds";
    /** Darlington channel input current, A. */
    public static final String IIN = "iin";
    /** Darlington channel input voltage, V. */
    public static final String VIN = "vin";
    /** Relay coil current, A1 to A2, A. */
    public static final String COIL_CURRENT = "coilCurrent";
    /** Relay coil voltage, A1 minus A2, V. */
    public static final String COIL_VOLTAGE = "coilVoltage";
    /** Relay coil resistance at its temperature, Ω. */
    public static final String COIL_RESISTANCE = "coilResistance";
    /** Relay coil temperature, °C. */
    public static final String COIL_TEMPERATURE = "coilTemperature";
    /** Relay pick-up current, A. */
    public static final String PICK_UP_CURRENT = "pickUpCurrent";
    /** Relay drop-out current, A. */
    public static final String DROP_OUT_CURRENT = "dropOutCurrent";

    // ------------------------------------------------------------------ states

    /** A transistor's region: a {@link Region#key()}. */
    public static final String REGION = "region";
    /** A relay's armature state implied by its coil current: a {@link RelayHandle.State#key()}. */
    public static final String STATE = "state";
    /** A relay's contacts as solved: a {@link ContactState#key()}. */
    public static final String CONTACTS = "contacts";
    /** Where a relay's contact state came from (the DC engine's relay loop). */
    public static final String CONTACTS_FROM = "contactsFrom";
}
