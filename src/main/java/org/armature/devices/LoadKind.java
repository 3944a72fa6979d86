package org.armature.devices;

import java.util.Locale;

/**
 * What a relay's contacts switch, as far as the contacts care: how much current flows at closing
 * (inrush) and whether the load is inductive when they part.
 *
 * <p>The utilization categories are the duty names relay and control-device ratings use:
 * AC-15 / DC-13 (control of electromagnetic loads) from IEC 60947-5-1; AC-1 / DC-1 (non-inductive
 * or slightly inductive loads), AC-3 (squirrel-cage motors), AC-5b / DC-6 (incandescent lamps) from
 * IEC 60947-4-1, which relay datasheets quote beside them (category letters from memory; check-values.md
 * CT-8).
 */
public enum LoadKind {

    /** A heater or other plain resistance. */
    RESISTIVE("resistive", "AC-1", "DC-1"),
    /** An incandescent lamp: a tungsten filament, cold at closing. */
    LAMP("lamp", "AC-5b", "DC-6"),
    /** A motor: locked-rotor current at closing, inductive at break. */
    MOTOR("motor", "AC-3", "DC-3"),
    /** A solenoid, valve or contactor coil: inductive; an AC one draws more while its gap is open. */
    SOLENOID("solenoid", "AC-15", "DC-13"),
    /** A power supply's input: a capacitor charged through the source and wiring resistance. */
    CAPACITIVE("capacitive", "", ""),
    /** An LED with its series resistor. */
    LED("led", "", "");

    private final String id;
    private final String acCategory;
    private final String dcCategory;

    LoadKind(String id, String acCategory, String dcCategory) {
        this.id = id;
        this.acCategory = acCategory;
        this.dcCategory = dcCategory;
    }

    /** The identifier used in stage files ({@code loadKind} option). */
    public String id() {
        return id;
    }

    /** The utilization category for this duty on AC or DC, or "" where none fits. */
    public String category(boolean ac) {
        return ac ? acCategory : dcCategory;
    }

    /** True for the kinds whose stored magnetic energy drives the contact voltage at break. */
    public boolean inductive() {
        return this == MOTOR || this == SOLENOID;
    }

    /**
     * The kind with this identifier.
     *
     * @throws IllegalArgumentException naming the allowed identifiers when none matches
     */
    public static LoadKind of(String id) {
        for (LoadKind k : values()) {
            if (k.id.equals(id)) {
                return k;
            }
        }
        throw new IllegalArgumentException("load kind must be one of resistive, lamp, motor, solenoid, capacitive,"
                + " led, not '" + id + "'");
    }

    @Override
    public String toString() {
        return id.toLowerCase(Locale.ROOT);
    }
}
