package org.armature.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;

/**
 * One driver circuit: pin, network, switch, relay, suppressor and contact side, with its drawing.
 *
 * <p>Immutable; each {@code with...} method returns a new stage. Designators are unique within a
 * stage (checked by {@link Validator}, not here, so a file with a duplicate still opens).
 *
 * @param name short title shown on tabs and in reports
 * @param description one or two sentences on what the stage is for
 * @param parts the parts, in drawing order
 * @param wires the wire segments
 * @param testPoints named nets anchored to pins
 * @param conditions drive state and ambient temperatures
 * @param settings the stage's own check settings (release-time requirement, Monte Carlo)
 */
public record Stage(String name, String description, List<Part> parts, List<Wire> wires,
                    List<TestPoint> testPoints, Conditions conditions, StageSettings settings) {

    public Stage {
        name = name == null ? "" : name;
        description = description == null ? "" : description;
        parts = List.copyOf(parts);
        wires = List.copyOf(wires);
        testPoints = List.copyOf(testPoints);
        if (conditions == null) {
            conditions = Conditions.DEFAULT;
        }
        if (settings == null) {
            settings = StageSettings.DEFAULT;
        }
    }

    /** A stage with the default settings. */
    public Stage(String name, String description, List<Part> parts, List<Wire> wires, List<TestPoint> testPoints,
                 Conditions conditions) {
        this(name, description, parts, wires, testPoints, conditions, StageSettings.DEFAULT);
    }

    /** The part with this designator. */
    public Optional<Part> part(String ref) {
        // a plain loop: the checks look parts up for every corner and sample
        for (Part p : parts) {
            if (p.ref().equals(ref)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    /** The part with this designator, or an exception naming it (for callers that know it exists). */
    public Part require(String ref) {
        return part(ref).orElseThrow(() -> new IllegalArgumentException("stage has no part " + ref));
    }

    /** Adds a part at the end, or replaces the part of the same designator in place. */
    public Stage withPart(Part part) {
        List<Part> list = new ArrayList<>(parts);
        boolean replaced = false;
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).ref().equals(part.ref())) {
                list.set(i, part);
                replaced = true;
                break;
            }
        }
        if (!replaced) {
            list.add(part);
        }
        return new Stage(name, description, list, wires, testPoints, conditions, settings);
    }

    /** Applies a change to one part; unchanged if there is no such part. */
    public Stage updatePart(String ref, UnaryOperator<Part> change) {
        return part(ref).map(p -> withPart(change.apply(p))).orElse(this);
    }

    /** Removes a part and the test points anchored to it (wires stay: they are drawing). */
    public Stage withoutPart(String ref) {
        List<Part> list = parts.stream().filter(p -> !p.ref().equals(ref)).toList();
        List<TestPoint> tps = testPoints.stream().filter(t -> !t.ref().equals(ref)).toList();
        return new Stage(name, description, list, wires, tps, conditions, settings);
    }

    /** Adds a wire segment. */
    public Stage withWire(Wire wire) {
        List<Wire> list = new ArrayList<>(wires);
        list.add(wire);
        return new Stage(name, description, parts, list, testPoints, conditions, settings);
    }

    /** Removes one wire segment (the first equal one). */
    public Stage withoutWire(Wire wire) {
        List<Wire> list = new ArrayList<>(wires);
        list.remove(wire);
        return new Stage(name, description, parts, list, testPoints, conditions, settings);
    }

    /** Replaces all wires. */
    public Stage withWires(List<Wire> newWires) {
        return new Stage(name, description, parts, newWires, testPoints, conditions, settings);
    }

    /** Adds or replaces (by net name) a test point. */
    public Stage withTestPoint(TestPoint tp) {
        List<TestPoint> list = new ArrayList<>(testPoints.stream().filter(t -> !t.net().equals(tp.net())).toList());
        list.add(tp);
        return new Stage(name, description, parts, wires, list, conditions, settings);
    }

    /** The same stage under other conditions. */
    public Stage withConditions(Conditions c) {
        return new Stage(name, description, parts, wires, testPoints, c, settings);
    }

    /** The same stage with another name. */
    public Stage withName(String newName) {
        return new Stage(newName, description, parts, wires, testPoints, conditions, settings);
    }

    /** The same stage with another description. */
    public Stage withDescription(String newDescription) {
        return new Stage(name, newDescription, parts, wires, testPoints, conditions, settings);
    }

    /** The same stage with other check settings. */
    public Stage withSettings(StageSettings s) {
        return new Stage(name, description, parts, wires, testPoints, conditions, s);
    }

    /** The same stage with other test points. */
    public Stage withTestPoints(List<TestPoint> newTestPoints) {
        return new Stage(name, description, parts, wires, newTestPoints, conditions, settings);
    }

    /** The first part of a kind, in drawing order. */
    public Optional<Part> firstOfKind(PartKind kind) {
        return parts.stream().filter(p -> p.kind() == kind).findFirst();
    }

    /** A designator not yet used: prefix plus the lowest free number. */
    public String nextRef(String prefix) {
        for (int i = 1; ; i++) {
            String candidate = prefix + i;
            if (part(candidate).isEmpty()) {
                return candidate;
            }
        }
    }
}
