package org.armature.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;
import org.armature.model.Conditions;
import org.armature.model.FaultHunt;
import org.armature.model.Part;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageSettings;
import org.armature.model.TestPoint;
import org.armature.model.Wire;
import org.armature.render.Notation;

/**
 * One user edit of a stage, with its exact inverse: {@code c.inverse().apply(c.apply(s))} equals
 * {@code s} for every stage {@code c} applies to. Commands are immutable records; applying one
 * returns a new stage and changes nothing else.
 *
 * <p>Commands that carry a {@link #mergeKey()} merge with the next command of the same key in the
 * {@link History} (consecutive drags of one part, steps of one slider), so they undo as one step.
 */
public sealed interface EditCommand permits EditCommand.AddPart, EditCommand.RemovePart, EditCommand.MovePart,
        EditCommand.SetValue, EditCommand.SetOption, EditCommand.AddWire, EditCommand.RemoveWire,
        EditCommand.SetConditions, EditCommand.SetHeader, EditCommand.SetTestPoints, EditCommand.RenamePart, EditCommand.SetHunt, EditCommand.Compound {

    /** The stage after this edit. */
    Stage apply(Stage stage);

    /** The edit that takes the result back to the stage before. */
    EditCommand inverse();

    /** The user's words for the Undo and Redo menu items ("Move Q1", "R1 resistance 1 kΩ → 1.5 kΩ"). */
    String label();

    /** Commands with equal keys that follow each other merge into one undo step; empty: never merge. */
    default Optional<String> mergeKey() {
        return Optional.empty();
    }

    /**
     * The stage's fault hunt after this edit, given the hunt before it: unchanged by every command
     * but {@link SetHunt} (and a {@link Compound} holding one). The hunt's stage index is not read
     * here; the view model sets it from the stage's place in the document.
     */
    default Optional<FaultHunt> huntAfter(Optional<FaultHunt> before) {
        return before;
    }

    /**
     * Adds a part at a position in the drawing order, with the test points anchored to it.
     *
     * @param part the part
     * @param index position in {@link Stage#parts()}, 0 to size
     * @param testPoints test points to restore, each with its position in {@link Stage#testPoints()}
     */
    record AddPart(Part part, int index, List<IndexedTestPoint> testPoints) implements EditCommand {
        public AddPart {
            testPoints = List.copyOf(testPoints);
        }

        @Override
        public Stage apply(Stage s) {
            List<Part> parts = new ArrayList<>(s.parts());
            parts.add(Math.min(index, parts.size()), part);
            List<TestPoint> tps = new ArrayList<>(s.testPoints());
            for (IndexedTestPoint t : testPoints) {
                tps.add(Math.min(t.index(), tps.size()), t.testPoint());
            }
            return new Stage(s.name(), s.description(), parts, s.wires(), tps, s.conditions(), s.settings());
        }

        @Override
        public EditCommand inverse() {
            return new RemovePart(part, index, testPoints);
        }

        @Override
        public String label() {
            return "Place " + part.ref();
        }
    }

    /**
     * Removes a part and the test points anchored to it (wires are removed by their own commands).
     *
     * @param part the part as it was
     * @param index its position in {@link Stage#parts()}
     * @param testPoints the test points it anchored, with their positions, in ascending order
     */
    record RemovePart(Part part, int index, List<IndexedTestPoint> testPoints) implements EditCommand {
        public RemovePart {
            testPoints = List.copyOf(testPoints);
        }

        /** The removal of a part as it stands in a stage. */
        public static RemovePart of(Stage s, String ref) {
            return of(s, s.require(ref));
        }

        /** The removal of this very part of a stage (with the test points anchored to its designator). */
        public static RemovePart of(Stage s, Part p) {
            String ref = p.ref();
            List<IndexedTestPoint> tps = new ArrayList<>();
            for (int i = 0; i < s.testPoints().size(); i++) {
                if (s.testPoints().get(i).ref().equals(ref)) {
                    tps.add(new IndexedTestPoint(i, s.testPoints().get(i)));
                }
            }
            return new RemovePart(p, s.parts().indexOf(p), tps);
        }

        /**
         * Removes this one part (at its index, else the first equal part) and the test points listed,
         * so that with duplicate designators (a file may have them) only the part meant goes and
         * undo puts back exactly what was there.
         */
        @Override
        public Stage apply(Stage s) {
            List<Part> parts = new ArrayList<>(s.parts());
            int at = index < parts.size() && parts.get(index).equals(part) ? index : parts.indexOf(part);
            if (at < 0) {
                return s;
            }
            parts.remove(at);
            List<TestPoint> tps = new ArrayList<>(s.testPoints());
            for (int i = testPoints.size() - 1; i >= 0; i--) {
                IndexedTestPoint t = testPoints.get(i);
                if (t.index() < tps.size() && tps.get(t.index()).equals(t.testPoint())) {
                    tps.remove(t.index());
                } else {
                    tps.remove(t.testPoint());
                }
            }
            return new Stage(s.name(), s.description(), parts, s.wires(), tps, s.conditions(), s.settings());
        }

        @Override
        public EditCommand inverse() {
            return new AddPart(part, index, testPoints);
        }

        @Override
        public String label() {
            return "Delete " + part.ref();
        }
    }

    /** A test point with its position in a stage's list. */
    record IndexedTestPoint(int index, TestPoint testPoint) {
    }

    /**
     * Moves, turns or mirrors a part.
     *
     * @param ref designator
     * @param before placement before
     * @param after placement after
     * @param verb "Move", "Rotate" or "Mirror", for the label
     */
    record MovePart(String ref, Placement before, Placement after, String verb) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            return s.updatePart(ref, p -> p.withPlacement(after));
        }

        @Override
        public EditCommand inverse() {
            return new MovePart(ref, after, before, verb);
        }

        @Override
        public String label() {
            return verb + " " + ref;
        }
    }

    /**
     * Sets one parameter of a part.
     *
     * @param ref designator
     * @param key parameter key
     * @param before the value stored before; empty when the kind's default applied
     * @param after the value stored after; empty restores the default
     * @param mergeKey merge key, for stepping through preferred values; empty for typed edits
     * @param words how the change reads in the Undo menu
     */
    record SetValue(String ref, String key, OptionalDouble before, OptionalDouble after, Optional<String> mergeKey,
                    ValueWords words) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            return s.updatePart(ref, p -> {
                TreeMap<String, Double> values = new TreeMap<>(p.values());
                if (after.isPresent()) {
                    values.put(key, after.getAsDouble());
                } else {
                    values.remove(key);
                }
                return new Part(p.ref(), p.kind(), values, p.options(), p.placement());
            });
        }

        @Override
        public EditCommand inverse() {
            return new SetValue(ref, key, after, before, mergeKey, words.reversed());
        }

        @Override
        public String label() {
            return words.text();
        }
    }

    /**
     * A value change in the user's words: "R1 resistance 1 kΩ → 1.5 kΩ".
     *
     * @param subject designator and the parameter's label in lower case ("R1 resistance")
     * @param unit the unit symbol the values are shown in
     * @param from the value in effect before (the kind's default when none was stored)
     * @param to the value in effect after
     */
    record ValueWords(String subject, String unit, double from, double to) {
        /** "R1 resistance 1 kΩ → 1.5 kΩ". */
        public String text() {
            return subject + " " + Notation.format(from, unit) + " → " + Notation.format(to, unit);
        }

        /** The words of the opposite change. */
        public ValueWords reversed() {
            return new ValueWords(subject, unit, to, from);
        }

        /** The words of this change followed by a later one of the same value. */
        public ValueWords through(ValueWords later) {
            return new ValueWords(subject, unit, from, later.to);
        }
    }

    /**
     * Sets one choice option of a part.
     *
     * @param ref designator
     * @param key option key
     * @param before the setting stored before; empty when the default applied
     * @param after the setting stored after; empty restores the default
     * @param subject designator and the option's label in lower case, for the Undo menu ("K1 coil supply")
     * @param defaultValue the setting in effect when none is stored, so the menu names it ("dc")
     *     rather than saying "default"
     */
    record SetOption(String ref, String key, Optional<String> before, Optional<String> after, String subject,
                     String defaultValue) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            return s.updatePart(ref, p -> {
                TreeMap<String, String> options = new TreeMap<>(p.options());
                if (after.isPresent()) {
                    options.put(key, after.get());
                } else {
                    options.remove(key);
                }
                return new Part(p.ref(), p.kind(), p.values(), options, p.placement());
            });
        }

        @Override
        public EditCommand inverse() {
            return new SetOption(ref, key, after, before, subject, defaultValue);
        }

        @Override
        public String label() {
            return subject + " " + before.orElse(defaultValue) + " → " + after.orElse(defaultValue);
        }
    }

    /**
     * Adds a wire segment at a position in the wire list.
     *
     * @param wire the segment
     * @param index position in {@link Stage#wires()}, 0 to size
     */
    record AddWire(Wire wire, int index) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            List<Wire> wires = new ArrayList<>(s.wires());
            wires.add(Math.min(index, wires.size()), wire);
            return s.withWires(wires);
        }

        @Override
        public EditCommand inverse() {
            return new RemoveWire(wire, index);
        }

        @Override
        public String label() {
            return "Draw wire";
        }
    }

    /**
     * Removes the wire segment at a position.
     *
     * @param wire the segment as it was
     * @param index its position in {@link Stage#wires()}
     */
    record RemoveWire(Wire wire, int index) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            List<Wire> wires = new ArrayList<>(s.wires());
            if (index < wires.size() && wires.get(index).equals(wire)) {
                wires.remove(index);
            } else {
                wires.remove(wire);
            }
            return s.withWires(wires);
        }

        @Override
        public EditCommand inverse() {
            return new AddWire(wire, index);
        }

        @Override
        public String label() {
            return "Delete wire";
        }
    }

    /**
     * Changes the operating conditions (pin state, ambient).
     *
     * @param before conditions before
     * @param after conditions after
     * @param what "pin state" or "ambient", for the label and merging
     */
    record SetConditions(Conditions before, Conditions after, String what) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            return s.withConditions(after);
        }

        @Override
        public EditCommand inverse() {
            return new SetConditions(after, before, what);
        }

        @Override
        public String label() {
            return switch (what) {
                case PIN_STATE -> "Drive pin " + level(before.pinHigh()) + " → " + level(after.pinHigh());
                case AMBIENT -> "Ambient " + Notation.format(before.ambientCelsius(), "°C") + " → "
                        + Notation.format(after.ambientCelsius(), "°C");
                case AMBIENT_RANGE -> "Ambient range " + range(before) + " → " + range(after);
                default -> "Change " + what;
            };
        }

        @Override
        public Optional<String> mergeKey() {
            return what.equals(AMBIENT) ? Optional.of("conditions:ambient") : Optional.empty();
        }

        /** {@link #what} of a pin state change. */
        public static final String PIN_STATE = "pin state";
        /** {@link #what} of a nominal ambient change (slider steps merge). */
        public static final String AMBIENT = "ambient";
        /** {@link #what} of a change of the corners' ambient range. */
        public static final String AMBIENT_RANGE = "ambient range";

        private static String level(boolean high) {
            return high ? "high" : "low";
        }

        private static String range(Conditions c) {
            return Notation.format(c.ambientMinCelsius(), "°C") + " to " + Notation.format(c.ambientMaxCelsius(), "°C");
        }
    }

    /**
     * Changes the stage's own header: name, description and check settings.
     *
     * @param before header before
     * @param after header after
     * @param label words for the menu ("Rename stage to Zone 2")
     */
    record SetHeader(Header before, Header after, String label) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            return s.withName(after.name()).withDescription(after.description()).withSettings(after.settings());
        }

        @Override
        public EditCommand inverse() {
            return new SetHeader(after, before, label);
        }
    }

    /**
     * A stage's name, description and settings.
     *
     * @param name the stage's name
     * @param description its description
     * @param settings its check settings
     */
    record Header(String name, String description, StageSettings settings) {
        /** The header of a stage. */
        public static Header of(Stage s) {
            return new Header(s.name(), s.description(), s.settings());
        }
    }

    /**
     * Gives a part another designator; the test points anchored to it follow.
     *
     * @param index the part's position in {@link Stage#parts()}
     * @param from the designator before
     * @param to the designator after
     */
    record RenamePart(int index, String from, String to) implements EditCommand {
        @Override
        public Stage apply(Stage s) {
            List<Part> parts = new ArrayList<>(s.parts());
            if (index >= parts.size() || !parts.get(index).ref().equals(from)) {
                return s;
            }
            parts.set(index, parts.get(index).withRef(to));
            boolean shared = parts.stream().anyMatch(p -> p.ref().equals(from));
            List<TestPoint> tps = s.testPoints().stream()
                    .map(t -> !shared && t.ref().equals(from) ? new TestPoint(t.net(), to, t.pin()) : t).toList();
            return new Stage(s.name(), s.description(), parts, s.wires(), tps, s.conditions(), s.settings());
        }

        @Override
        public EditCommand inverse() {
            return new RenamePart(index, to, from);
        }

        @Override
        public String label() {
            return "Rename " + from + " to " + to;
        }
    }

    /**
     * Replaces the test points (add, rename or remove one).
     *
     * @param before the list before
     * @param after the list after
     * @param label words for the menu ("Name test point base")
     */
    record SetTestPoints(List<TestPoint> before, List<TestPoint> after, String label) implements EditCommand {
        public SetTestPoints {
            before = List.copyOf(before);
            after = List.copyOf(after);
        }

        @Override
        public Stage apply(Stage s) {
            return s.withTestPoints(after);
        }

        @Override
        public EditCommand inverse() {
            return new SetTestPoints(after, before, label);
        }
    }

    /**
     * Changes the stage's fault hunt (symptom, meter, readings, prior weights); the stage itself is
     * untouched. Kept in the stage's history so that a reading entered is undone like any edit.
     *
     * @param before the hunt before (empty: none)
     * @param after the hunt after (empty: none)
     * @param label the user's words ("Add reading switch@high")
     */
    record SetHunt(Optional<FaultHunt> before, Optional<FaultHunt> after, String label) implements EditCommand {
        public SetHunt {
            if (before == null || after == null || label == null) {
                throw new IllegalArgumentException("a hunt edit needs its hunt before, after and its words");
            }
        }

        @Override
        public Stage apply(Stage s) {
            return s;
        }

        @Override
        public Optional<FaultHunt> huntAfter(Optional<FaultHunt> was) {
            return after;
        }

        @Override
        public EditCommand inverse() {
            return new SetHunt(after, before, label);
        }
    }

    /**
     * Several commands applied in order as one step (cascades: a delete with its wires, a move with
     * the wires that follow it, a paste).
     *
     * @param label words for the menu
     * @param steps the commands, applied first to last
     * @param mergeKey merge key of the whole; empty: never merges
     */
    record Compound(String label, List<EditCommand> steps, Optional<String> mergeKey) implements EditCommand {
        public Compound {
            steps = List.copyOf(steps);
        }

        /** A compound that never merges. */
        public static Compound of(String label, List<EditCommand> steps) {
            return new Compound(label, steps, Optional.empty());
        }

        @Override
        public Stage apply(Stage s) {
            Stage out = s;
            for (EditCommand c : steps) {
                out = c.apply(out);
            }
            return out;
        }

        @Override
        public Optional<FaultHunt> huntAfter(Optional<FaultHunt> before) {
            Optional<FaultHunt> out = before;
            for (EditCommand c : steps) {
                out = c.huntAfter(out);
            }
            return out;
        }

        @Override
        public EditCommand inverse() {
            List<EditCommand> inv = new ArrayList<>();
            for (int i = steps.size() - 1; i >= 0; i--) {
                inv.add(steps.get(i).inverse());
            }
            return new Compound(label, inv, mergeKey);
        }
    }

    /**
     * The words of a step made by merging {@code next} into {@code first} (a slider drag, repeated
     * arrow keys): a value or ambient change reads from the first value to the last one; others keep
     * the first step's words.
     */
    static String mergedLabel(EditCommand first, EditCommand next) {
        EditCommand a = firstLeaf(first);
        EditCommand b = lastLeaf(next);
        if (a instanceof SetValue x && b instanceof SetValue y && x.ref().equals(y.ref()) && x.key().equals(y.key())) {
            return x.words().through(y.words()).text();
        }
        if (a instanceof SetConditions x && b instanceof SetConditions y && x.what().equals(y.what())) {
            return new SetConditions(x.before(), y.after(), x.what()).label();
        }
        return first.label();
    }

    private static EditCommand firstLeaf(EditCommand c) {
        return c instanceof Compound k && !k.steps().isEmpty() ? firstLeaf(k.steps().get(0)) : c;
    }

    private static EditCommand lastLeaf(EditCommand c) {
        return c instanceof Compound k && !k.steps().isEmpty() ? lastLeaf(k.steps().get(k.steps().size() - 1)) : c;
    }
}
