package org.armature.analysis.faults;

/**
 * One single fault: a part and what went wrong with it, written {@code PART:KIND}.
 *
 * @param ref the part's designator
 * @param kind the fault
 */
public record Fault(String ref, FaultKind kind) {

    /** The healthy stage's candidate name in rankings. */
    public static final String NONE = "none";

    public Fault {
        if (ref == null || ref.isBlank() || kind == null) {
            throw new IllegalArgumentException("a fault needs a part designator and a kind");
        }
    }

    /** {@code PART:KIND}. */
    public String id() {
        return ref + ":" + kind.id();
    }

    @Override
    public String toString() {
        return id();
    }
}
