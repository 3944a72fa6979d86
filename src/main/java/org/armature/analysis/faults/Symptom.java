package org.armature.analysis.faults;

import java.util.Arrays;
import java.util.Optional;

/** What the technician sees the relay do. */
public enum Symptom {
    /** The relay does not operate with the pin high. */
    NO_OPERATE("no-operate"),
    /** The relay does not release with the pin low. */
    NO_RELEASE("no-release"),
    /**
     * The relay chatters: taken as a coil voltage with the pin high within ±{@value Diagnosis#CHATTER_BAND_PERCENT} %
     * of the must-operate voltage, where supply ripple or a sagging pin makes it pick up and drop out.
     */
    CHATTER("chatter");

    private final String id;

    Symptom(String id) {
        this.id = id;
    }

    /** The word the command line takes. */
    public String id() {
        return id;
    }

    /** The symptom with this word, if any. */
    public static Optional<Symptom> byId(String id) {
        return Arrays.stream(values()).filter(s -> s.id.equals(id)).findFirst();
    }
}
