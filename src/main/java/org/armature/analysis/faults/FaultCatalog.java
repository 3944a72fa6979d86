package org.armature.analysis.faults;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.armature.model.Connectivity;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;

/**
 * The single faults of a stage, following from its parts and their roles, so a stage drawn by hand
 * gets its set as a template does: every part of a kind that can fail ({@link FaultKind#of}); the
 * relay whose coil the roles name first, then the switch and the parts in drawing order. Parts the
 * fault hunt itself adds ({@link FaultInjector#ADDED_PREFIX}) have none. Then the track opens
 * between two named nets ({@link FaultInjector#cutNet}): for every net but ground that joins two or
 * more pins, and every other net some of its parts lead to, the track open {@code NET~TOWARD} that
 * one cut of the drawing makes; of several that cut off the same pins, only the first is listed
 * (TOWARD taken from the nets joining two or more pins, then ground, then single pins, each in the
 * order of {@link Connectivity#nets()}).
 */
public final class FaultCatalog {

    private FaultCatalog() {
    }

    /** Every single fault of the stage, in a fixed order. */
    public static List<Fault> of(Stage stage) {
        StageRecognition rec = StageRecognition.of(stage);
        Optional<StageRoles> roles = rec.roles();
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
        faults.addAll(trackOpens(stage, rec.connectivity()));
        return faults;
    }

    /**
     * Nets drawn with more wires than this get no track opens in the set (the search for a cut is
     * quadratic in the wires per stretch tried); such a track can still be opened by name.
     */
    public static final int MAX_TRACK_WIRES = 64;

    /** The track opens between two named nets that one cut of the drawing makes, one per split. */
    public static List<Fault> trackOpens(Stage stage) {
        return trackOpens(stage, Connectivity.of(stage));
    }

    /** The same, with the stage's nets already found. */
    static List<Fault> trackOpens(Stage stage, Connectivity c) {
        List<Fault> out = new ArrayList<>();
        Map<String, Integer> wiresOf = new HashMap<>();
        c.netOfWire().forEach(n -> wiresOf.merge(n, 1, Integer::sum));
        for (String net : c.nets()) {
            if (net.equals(Connectivity.GROUND) || c.pinsOn(net).size() < 2
                    || wiresOf.getOrDefault(net, 0) > MAX_TRACK_WIRES) {
                continue;
            }
            java.util.Set<java.util.Set<PinRef>> seen = new java.util.HashSet<>();
            for (String toward : towardOrder(c)) {
                if (toward.equals(net)) {
                    continue;
                }
                List<PinRef> cut = FaultInjector.cutOffPins(c, net, toward);
                if (cut.isEmpty()) {
                    continue;
                }
                java.util.Set<PinRef> side = new java.util.HashSet<>(cut);
                java.util.Set<PinRef> other = new java.util.HashSet<>(c.pinsOn(net));
                other.removeAll(side);
                if (seen.contains(side) || seen.contains(other)) {
                    continue;
                }
                seen.add(side);
                if (FaultInjector.findCut(stage, c, net, cut).isEmpty()) {
                    // no single stretch of this drawing's track separates them: not a fault of this stage
                    continue;
                }
                out.add(new Fault(new FaultInjector.TrackBetween(net, toward).address(), FaultKind.TRACK_OPEN));
            }
        }
        return out;
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
        if (ref.contains(FaultInjector.NET_JOIN)) {
            return parseBetween(stage, ref, kind);
        }
        if (kind.equals(FaultKind.TRACK_OPEN.id()) || ref.contains(".")) {
            if (!kind.equals(FaultKind.TRACK_OPEN.id())) {
                return Parsed.error("A pin (" + ref + ") can only have the fault track-open, written PART.PIN:track-open.");
            }
            if (FaultInjector.trackPin(stage, ref).isEmpty()) {
                return Parsed.error("A track open is written NET~TOWARD:track-open (for example "
                        + example(stage) + ") or PART.PIN:track-open with a part of stage \"" + stage.name()
                        + "\" and one of its pins (for example R1.b); " + ref + " is neither.");
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
     * The nets a track open may lead toward, in the order the catalog names them: nets joining two
     * or more pins, then ground, then single pins (an unused contact), so that a split is named by
     * the net most readable on the board.
     */
    private static List<String> towardOrder(Connectivity c) {
        List<String> order = new ArrayList<>();
        c.nets().stream().filter(n -> !n.equals(Connectivity.GROUND) && c.pinsOn(n).size() >= 2).forEach(order::add);
        order.add(Connectivity.GROUND);
        c.nets().stream().filter(n -> !order.contains(n)).forEach(order::add);
        return order;
    }

    /** A track open between nets of the stage, for messages. */
    private static String example(Stage stage) {
        return trackOpens(stage).stream().findFirst().map(Fault::id).orElse("switch~supply:track-open");
    }

    private static Parsed parseBetween(Stage stage, String ref, String kind) {
        Optional<FaultInjector.TrackBetween> t = FaultInjector.trackBetween(ref);
        if (!kind.equals(FaultKind.TRACK_OPEN.id()) || t.isEmpty()) {
            return Parsed.error("Two nets joined by ~ can only have the fault track-open, written NET~TOWARD:track-open "
                    + "(for example " + example(stage) + "), not " + ref + ":" + kind + ".");
        }
        try {
            FaultInjector.cutNet(stage, t.get().net(), t.get().toward());
        } catch (IllegalArgumentException e) {
            return Parsed.error(e.getMessage());
        }
        return new Parsed(Optional.of(new Fault(ref, FaultKind.TRACK_OPEN)), "");
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
