package org.armature.ui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;
import org.armature.model.Conditions;
import org.armature.model.Part;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.TestPoint;
import org.armature.model.Wire;

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
        EditCommand.SetConditions, EditCommand.Compound {

    /** The stage after this edit. */
    Stage apply(Stage stage);

    /** The edit that takes the result back to the stage before. */
    EditCommand inverse();

    /** Short words for the Undo and Redo menu items ("Move Q1"). */
    String label();

    /** Commands with equal keys that follow each other merge into one undo step; empty: never merge. */
    default Optional<String> mergeKey() {
        return Optional.empty();
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
            Part p = s.require(ref);
            List<IndexedTestPoint> tps = new ArrayList<>();
            for (int i = 0; i < s.testPoints().size(); i++) {
                if (s.testPoints().get(i).ref().equals(ref)) {
                    tps.add(new IndexedTestPoint(i, s.testPoints().get(i)));
                }
            }
            return new RemovePart(p, s.parts().indexOf(p), tps);
        }

        @Override
        public Stage apply(Stage s) {
            return s.withoutPart(part.ref());
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
     */
    record SetValue(String ref, String key, OptionalDouble before, OptionalDouble after, Optional<String> mergeKey)
            implements EditCommand {
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
            return new SetValue(ref, key, after, before, mergeKey);
        }

        @Override
        public String label() {
            return "Change " + ref + " " + key;
        }
    }

    /**
     * Sets one choice option of a part.
     *
     * @param ref designator
     * @param key option key
     * @param before the setting stored before; empty when the default applied
     * @param after the setting stored after; empty restores the default
     */
    record SetOption(String ref, String key, Optional<String> before, Optional<String> after) implements EditCommand {
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
            return new SetOption(ref, key, after, before);
        }

        @Override
        public String label() {
            return "Change " + ref + " " + key;
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
            return "Change " + what;
        }

        @Override
        public Optional<String> mergeKey() {
            return what.equals("ambient") ? Optional.of("conditions:ambient") : Optional.empty();
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
        public EditCommand inverse() {
            List<EditCommand> inv = new ArrayList<>();
            for (int i = steps.size() - 1; i >= 0; i--) {
                inv.add(steps.get(i).inverse());
            }
            return new Compound(label, inv, mergeKey);
        }
    }
}
