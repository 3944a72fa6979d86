package org.armature.analysis.faults;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;

/**
 * The single faults of a stage, following from its parts and their roles, so a stage drawn by hand
 * gets its set as a template does: every part of a kind that can fail ({@link FaultKind#of}); the
 * relay whose coil the roles name first, then the switch and the parts in drawing order. Parts the
 * fault hunt itself adds ({@link FaultInjector#ADDED_PREFIX}) have none.
 */
public final class FaultCatalog {

    private FaultCatalog() {
    }

    /** Every single fault of the stage, in a fixed order. */
    public static List<Fault> of(Stage stage) {
        Optional<StageRoles> roles = StageRecognition.of(stage).roles();
        List<Part> order = new ArrayList<>();
        roles.flatMap(r -> stage.part(r.relayRef())).ifPresent(order::add);
        roles.flatMap(r -> stage.part(r.switchRef())).filter(p -> !order.contains(p)).ifPresent(order::add);
        stage.parts().stream().filter(p -> !order.contains(p)).forEach(order::add);
        List<Fault> faults = new ArrayList<>();
        for (Part p : order) {
            if (p.ref().startsWith(FaultInjector.ADDED_PREFIX)) {
                continue;
            }
            for (FaultKind k : FaultKind.of(p.kind())) {
                faults.add(new Fault(p.ref(), k));
            }
        }
        return faults;
    }

    /**
     * Reads {@code PART:KIND}.
     *
     * @param stage the stage the fault is for
     * @param text the fault as written
     * @return the fault, or a sentence listing what is valid
     */
    public static Parsed parse(Stage stage, String text) {
        int colon = text.indexOf(':');
        String refs = stage.parts().stream().filter(p -> !FaultKind.of(p.kind()).isEmpty())
                .map(Part::ref).collect(Collectors.joining(", "));
        if (colon <= 0) {
            return Parsed.error("A fault is written PART:KIND (for example R1:open); parts that can fail: " + refs + ".");
        }
        String ref = text.substring(0, colon);
        String kind = text.substring(colon + 1);
        if (kind.equals(FaultKind.TRACK_OPEN.id()) || ref.contains(".")) {
            if (!kind.equals(FaultKind.TRACK_OPEN.id())) {
                return Parsed.error("A pin (" + ref + ") can only have the fault track-open, written PART.PIN:track-open.");
            }
            if (FaultInjector.trackPin(stage, ref).isEmpty()) {
                return Parsed.error("A track open is written PART.PIN:track-open with a part of stage \"" + stage.name()
                        + "\" and one of its pins (for example R1.b); " + ref + " is not one.");
            }
            return new Parsed(Optional.of(new Fault(ref, FaultKind.TRACK_OPEN)), "");
        }
        Optional<Part> part = stage.part(ref);
        if (part.isEmpty() || FaultKind.of(part.get().kind()).isEmpty()) {
            return Parsed.error("Stage \"" + stage.name() + "\" has no part " + ref
                    + " that can fail; parts that can fail: " + refs + ".");
        }
        PartKind pk = part.get().kind();
        List<FaultKind> valid = FaultKind.of(pk);
        Optional<FaultKind> k = FaultKind.byId(kind).filter(valid::contains);
        if (k.isEmpty()) {
            return Parsed.error("Fault kind '" + kind + "' does not apply to " + ref + " (" + pk.title()
                    + "); its faults are " + valid.stream().map(FaultKind::id).collect(Collectors.joining(", ")) + ".");
        }
        return new Parsed(Optional.of(new Fault(ref, k.get())), "");
    }

    /**
     * The result of reading a fault.
     *
     * @param fault the fault, if it was valid
     * @param error the sentence saying what is valid, if it was not
     */
    public record Parsed(Optional<Fault> fault, String error) {
        static Parsed error(String sentence) {
            return new Parsed(Optional.empty(), sentence);
        }
    }
}
