package org.armature.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What the stages of a line-up share, so that they are judged the same way: the relay (coil,
 * thresholds, inductances, armature, contacts), the coil supply with its tolerance, the drive pin,
 * the contact side (its supply and load) and the ambient range. A role left empty is not shared:
 * each stage keeps its own part there.
 *
 * <p>{@link #applyTo(Stage)} puts these settings into a stage's parts found by role
 * ({@link StageRecognition}), keeping the stage's own topology, parts, values and drawing; it never
 * changes the stored stage and reports every difference it overrode ({@link Applied#differences()}).
 *
 * @param relay the shared relay settings, if shared
 * @param coilSupply the shared coil supply (its volts and {@code tolerancePercent}), if shared
 * @param drivePin the shared drive pin (logic high level, source resistance, rating), if shared
 * @param contactSupply the shared contact-side supply, if shared
 * @param load the shared contact-side load, if shared
 * @param ambientCelsius nominal ambient, °C
 * @param ambientMinCelsius coldest ambient of the corners, °C
 * @param ambientMaxCelsius hottest ambient of the corners, °C; not below the coldest
 */
public record LineUpContext(Optional<SharedPart> relay, Optional<SharedPart> coilSupply,
                            Optional<SharedPart> drivePin, Optional<SharedPart> contactSupply,
                            Optional<SharedPart> load, double ambientCelsius, double ambientMinCelsius,
                            double ambientMaxCelsius) {

    /** Absolute zero, °C. */
    private static final double ABSOLUTE_ZERO_CELSIUS = -273.15;

    public LineUpContext {
        relay = relay == null ? Optional.empty() : relay;
        coilSupply = coilSupply == null ? Optional.empty() : coilSupply;
        drivePin = drivePin == null ? Optional.empty() : drivePin;
        contactSupply = contactSupply == null ? Optional.empty() : contactSupply;
        load = load == null ? Optional.empty() : load;
        if (!Double.isFinite(ambientCelsius) || ambientCelsius < ABSOLUTE_ZERO_CELSIUS) {
            throw new IllegalArgumentException("ambientCelsius must be a finite temperature above absolute zero");
        }
        if (!(ambientMinCelsius <= ambientMaxCelsius)) {
            throw new IllegalArgumentException("ambientMinCelsius must not exceed ambientMaxCelsius");
        }
    }

    /**
     * The context a stage sets by itself: its relay, coil supply, drive pin, first contact supply and
     * first load found by role, and its ambient range. An unrecognised stage shares only its ambient.
     */
    public static LineUpContext of(Stage stage) {
        Conditions c = stage.conditions();
        Optional<StageRoles> roles = StageRecognition.of(stage).roles();
        if (roles.isEmpty()) {
            return new LineUpContext(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                    Optional.empty(), c.ambientCelsius(), c.ambientMinCelsius(), c.ambientMaxCelsius());
        }
        StageRoles r = roles.get();
        return new LineUpContext(stage.part(r.relayRef()).map(SharedPart::of),
                r.coilSupplyRef().flatMap(stage::part).map(SharedPart::of),
                r.drivePinRef().flatMap(stage::part).map(SharedPart::of),
                r.contactSupplyRefs().stream().findFirst().flatMap(stage::part).map(SharedPart::of),
                r.loadRefs().stream().findFirst().flatMap(stage::part).map(SharedPart::of),
                c.ambientCelsius(), c.ambientMinCelsius(), c.ambientMaxCelsius());
    }

    /** A copy with another coil supply. */
    public LineUpContext withCoilSupply(SharedPart supply) {
        return new LineUpContext(relay, Optional.of(supply), drivePin, contactSupply, load, ambientCelsius,
                ambientMinCelsius, ambientMaxCelsius);
    }

    /** A copy with another relay. */
    public LineUpContext withRelay(SharedPart newRelay) {
        return new LineUpContext(Optional.of(newRelay), coilSupply, drivePin, contactSupply, load, ambientCelsius,
                ambientMinCelsius, ambientMaxCelsius);
    }

    /** A copy with another ambient range. */
    public LineUpContext withAmbient(double nominal, double min, double max) {
        return new LineUpContext(relay, coilSupply, drivePin, contactSupply, load, nominal, min, max);
    }

    /**
     * One place where a stage's own part differed from the shared settings.
     *
     * @param role which shared role ({@code relay}, {@code coilSupply}, {@code drivePin},
     *     {@code contactSupply}, {@code load}, {@code ambient}, or {@code stage} when the stage's roles
     *     could not be found)
     * @param ref the stage's part in that role (empty for ambient and stage)
     * @param detail what differed, in words
     */
    public record Difference(String role, String ref, String detail) {
    }

    /**
     * A stage as the line-up judges it.
     *
     * @param stage the stage with the shared settings in its parts
     * @param differences where its own settings differed (and were overridden for the judgement);
     *     the relay's are the ones a user must see, since the stage was drawn for another relay
     */
    public record Applied(Stage stage, List<Difference> differences) {

        public Applied {
            differences = List.copyOf(differences);
        }

        /** Whether the stage's own relay differs from the shared one. */
        public boolean relayDiffers() {
            return differences.stream().anyMatch(d -> d.role().equals("relay"));
        }
    }

    /**
     * The stage with the shared settings put into its parts found by role; the stage's topology,
     * other parts, drawing, pin state and settings stay. The stored stage is not changed.
     */
    public Applied applyTo(Stage stage) {
        List<Difference> diffs = new ArrayList<>();
        Conditions c = stage.conditions();
        if (c.ambientMinCelsius() != ambientMinCelsius || c.ambientMaxCelsius() != ambientMaxCelsius
                || c.ambientCelsius() != ambientCelsius) {
            diffs.add(new Difference("ambient", "", "ambient " + c.ambientCelsius() + " °C (" + c.ambientMinCelsius()
                    + " to " + c.ambientMaxCelsius() + " °C) here, " + ambientCelsius + " °C (" + ambientMinCelsius
                    + " to " + ambientMaxCelsius + " °C) shared"));
        }
        Stage s = stage.withConditions(new Conditions(c.pinHigh(), ambientCelsius, ambientMinCelsius, ambientMaxCelsius));
        Optional<StageRoles> roles = StageRecognition.of(stage).roles();
        if (roles.isEmpty()) {
            diffs.add(new Difference("stage", "", "the stage's relay, supply and pin could not be found from its "
                    + "wiring, so only the ambient range is shared"));
            return new Applied(s, diffs);
        }
        StageRoles r = roles.get();
        s = put(s, "relay", Optional.of(r.relayRef()), relay, diffs);
        s = put(s, "coilSupply", r.coilSupplyRef(), coilSupply, diffs);
        s = put(s, "drivePin", r.drivePinRef(), drivePin, diffs);
        for (String ref : r.contactSupplyRefs()) {
            s = put(s, "contactSupply", Optional.of(ref), contactSupply, diffs);
        }
        for (String ref : r.loadRefs()) {
            s = put(s, "load", Optional.of(ref), load, diffs);
        }
        return new Applied(s, diffs);
    }

    private static Stage put(Stage s, String role, Optional<String> ref, Optional<SharedPart> shared,
                             List<Difference> diffs) {
        if (shared.isEmpty() || ref.isEmpty()) {
            return s;
        }
        Optional<Part> part = s.part(ref.get());
        if (part.isEmpty()) {
            return s;
        }
        List<String> d = shared.get().differences(part.get());
        if (d.isEmpty()) {
            return s;
        }
        if (part.get().kind() != shared.get().kind()) {
            // another kind of part in the role: never turned into the shared kind, only reported
            diffs.add(new Difference(role, ref.get(), String.join("; ", d) + "; kept as drawn"));
            return s;
        }
        diffs.add(new Difference(role, ref.get(), String.join("; ", d)));
        return s.withPart(shared.get().applyTo(part.get()));
    }
}
