package org.armature.netlist;

/**
 * The position of a relay's contacts as the engines hold it in a state slot: 1 operated, 0
 * released. The slot only ever holds those two values; {@link #of(double)} is the one place that
 * turns a slot back into a state.
 */
public enum ContactState {
    /** Armature released: the normally-closed contact is made. */
    RELEASED("released", 0.0),
    /** Armature attracted: the normally-open contact is made. */
    OPERATED("operated", 1.0);

    private final String key;
    private final double slotValue;

    ContactState(String key, double slotValue) {
        this.key = key;
        this.slotValue = slotValue;
    }

    /** The reading's text value ({@code operated}, {@code released}). */
    public String key() {
        return key;
    }

    /** The value written into a contact state slot. */
    public double slotValue() {
        return slotValue;
    }

    /** True when operated. */
    public boolean operated() {
        return this == OPERATED;
    }

    /** The state for a boolean "operated". */
    public static ContactState of(boolean operated) {
        return operated ? OPERATED : RELEASED;
    }

    /**
     * The state a slot holds. Slots hold exactly 0 or 1; the midpoint only guards against a value
     * carried through arithmetic (an interpolated start, for example).
     */
    public static ContactState of(double slot) {
        return slot > 0.5 ? OPERATED : RELEASED;
    }
}
