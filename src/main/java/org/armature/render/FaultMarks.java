package org.armature.render;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The marks of injected faults on a drawing: a badge "fault: KIND" beside each faulted part, in the
 * fail state, drawn by the renderer like every badge, so the canvas and any export of the same
 * annotations show it. Plain words of the fault kinds, one badge per part ({@code R1:open} and
 * {@code R1:drift-x10} together read "fault: open, drift-x10"); a track open at a pin
 * ({@code Q1.b:track-open}) marks its part with "track-open at b".
 */
public final class FaultMarks {

    /** The words every fault badge starts with. */
    public static final String PREFIX = "fault: ";

    private FaultMarks() {
    }

    /**
     * The annotations with a fault badge for each faulted part, before the other badges.
     *
     * @param a the readouts of the faulted stage
     * @param faults the faults as written, {@code PART:KIND} or {@code PART.PIN:track-open}
     * @return the annotations with the marks; {@code a} itself when there are no faults
     */
    public static Annotations marked(Annotations a, List<String> faults) {
        if (faults.isEmpty()) {
            return a;
        }
        Map<String, List<String>> byRef = new LinkedHashMap<>();
        for (String f : faults) {
            int colon = f.indexOf(':');
            String address = f.substring(0, colon);
            String kind = f.substring(colon + 1);
            int dot = address.lastIndexOf('.');
            String ref = dot > 0 ? address.substring(0, dot) : address;
            String words = dot > 0 ? kind + " at " + address.substring(dot + 1) : kind;
            byRef.computeIfAbsent(ref, k -> new ArrayList<>()).add(words);
        }
        List<Annotations.PartBadge> badges = new ArrayList<>();
        byRef.forEach((ref, kinds) -> badges.add(
                new Annotations.PartBadge(ref, PREFIX + String.join(", ", kinds), Annotations.State.FAIL)));
        badges.addAll(a.badges());
        return new Annotations(a.voltages(), a.currents(), badges, a.gauges(), a.markers(), a.readings());
    }
}
