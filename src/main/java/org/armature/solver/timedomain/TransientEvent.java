package org.armature.solver.timedomain;

/**
 * Something that happened at a located instant of a run.
 *
 * @param timeSeconds when, seconds from the start of the run
 * @param what a stable key (see the constants), for example {@code "pick-up"}
 * @param subject designator of the part concerned ({@code "K1"}, {@code "Q1"}), or {@code ""} for the drive
 */
public record TransientEvent(double timeSeconds, String what, String subject) {

    /** The drive pin went high. */
    public static final String DRIVE_HIGH = "drive high";
    /** The drive pin went low. */
    public static final String DRIVE_LOW = "drive low";
    /**
     * The armature left its released position: the coil current reached pick-up (with a moving
     * armature, the current whose pull balances the spring at the released stop).
     */
    public static final String PICK_UP = "pick-up";
    /** The armature left its attracted position (constant inductance: the coil current fell to drop-out). */
    public static final String DROP_OUT = "drop-out";
    /** The armature reached its attracted stop. */
    public static final String ATTRACTED = "armature attracted";
    /** The armature reached its released stop. */
    public static final String RELEASED = "armature released";
    /** The normally-open contact closed. */
    public static final String CONTACTS_CLOSED = "contacts closed";
    /** The normally-open contact opened. */
    public static final String CONTACTS_OPEN = "contacts open";
    /** The switch entered avalanche breakdown. */
    public static final String SWITCH_BREAKDOWN = "switch breakdown";

    public TransientEvent {
        if (!Double.isFinite(timeSeconds)) {
            throw new IllegalArgumentException("timeSeconds must be finite");
        }
        if (what == null || what.isBlank()) {
            throw new IllegalArgumentException("what must not be blank");
        }
        subject = subject == null ? "" : subject;
    }
}
