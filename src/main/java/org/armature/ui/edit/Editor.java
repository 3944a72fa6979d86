package org.armature.ui.edit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeMap;
import org.armature.model.Conditions;
import org.armature.model.GridPoint;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinSpec;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.Wire;
import org.armature.render.Router;
import org.armature.render.Selection;

/**
 * The editing session of one stage, without any toolkit: the current stage, the selection and the
 * {@link History}. Every change of the stage goes through an {@link EditCommand}; the action methods
 * here only build commands (with their cascades) and execute them.
 *
 * <p>Not thread-safe: the view model calls it from one thread.
 */
public final class Editor {

    /** Offset of a paste from the copied parts, grid units. */
    public static final int PASTE_OFFSET = 2;

    private Stage stage;
    private Selection selection = Selection.EMPTY;
    private final History history = new History();

    /** A session on a stage, clean. */
    public Editor(Stage stage) {
        this.stage = stage;
    }

    /** The stage as it stands. */
    public Stage stage() {
        return stage;
    }

    /** What is selected (designators and wire indices of {@link #stage()}). */
    public Selection selection() {
        return selection;
    }

    /** The undo history. */
    public History history() {
        return history;
    }

    /** Replaces the stage (new from template, file opened): history cleared, selection emptied, clean. */
    public void load(Stage newStage) {
        stage = newStage;
        selection = Selection.EMPTY;
        history.clear();
    }

    /** Selects parts and wires; unknown designators and indices are dropped. */
    public void select(Selection s) {
        Set<String> refs = new LinkedHashSet<>();
        for (String r : s.refs()) {
            if (stage.part(r).isPresent()) {
                refs.add(r);
            }
        }
        Set<Integer> wires = new LinkedHashSet<>();
        for (int i : s.wires()) {
            if (i >= 0 && i < stage.wires().size()) {
                wires.add(i);
            }
        }
        selection = new Selection(refs, wires);
    }

    /** Executes a command and records it. */
    public void execute(EditCommand c) {
        stage = history.execute(stage, c);
        select(selection);
    }

    /** Undoes the last step; false when there was none. */
    public boolean undo() {
        Optional<Stage> s = history.undo(stage);
        s.ifPresent(v -> stage = v);
        select(selection);
        return s.isPresent();
    }

    /** Redoes the last undone step; false when there was none. */
    public boolean redo() {
        Optional<Stage> s = history.redo(stage);
        s.ifPresent(v -> stage = v);
        select(selection);
        return s.isPresent();
    }

    /** Places a new part of a kind with its defaults at a grid point and selects it; returns its designator. */
    public String place(PartKind kind, GridPoint at) {
        String ref = stage.nextRef(kind.designatorPrefix());
        execute(new EditCommand.AddPart(Part.of(ref, kind, new Placement(at, 0, false)), stage.parts().size(), List.of()));
        selection = Selection.ofPart(ref);
        return ref;
    }

    /**
     * The command that moves parts by a grid offset, with the wires attached to their pins following:
     * a wire with both ends on moved pins (or selected) moves along, a wire with one end on a moved
     * pin stretches if it stays straight, else is re-routed orthogonally from its fixed end; a moved pin
     * that touched a pin of a part staying put gets a wire to where it went.
     */
    public EditCommand moveCommand(Set<String> refs, int dx, int dy) {
        List<EditCommand> steps = new ArrayList<>();
        Set<GridPoint> movedPins = new HashSet<>();
        Stage after = stage;
        for (String ref : refs) {
            Part p = stage.require(ref);
            for (PinSpec pin : p.kind().pins()) {
                movedPins.add(p.pinPoint(pin.name()));
            }
            EditCommand m = new EditCommand.MovePart(ref, p.placement(),
                    p.placement().movedTo(p.placement().origin().plus(dx, dy)), "Move");
            steps.add(m);
            after = m.apply(after);
        }
        List<Integer> changed = new ArrayList<>();
        List<List<Wire>> replacements = new ArrayList<>();
        for (int i = 0; i < stage.wires().size(); i++) {
            Wire w = stage.wires().get(i);
            boolean selected = selection.wires().contains(i);
            boolean a = selected || movedPins.contains(w.from());
            boolean b = selected || movedPins.contains(w.to());
            if (!a && !b) {
                continue;
            }
            GridPoint from = a ? w.from().plus(dx, dy) : w.from();
            GridPoint to = b ? w.to().plus(dx, dy) : w.to();
            List<Wire> repl;
            if (from.gridX() == to.gridX() || from.gridY() == to.gridY()) {
                repl = List.of(new Wire(from, to));
            } else {
                repl = a ? reversed(Router.route(after, to, from)) : Router.route(after, from, to);
            }
            changed.add(i);
            replacements.add(repl);
        }
        for (int k = changed.size() - 1; k >= 0; k--) {
            int i = changed.get(k);
            steps.add(new EditCommand.RemoveWire(stage.wires().get(i), i));
        }
        // a moved pin that sat directly on a pin of a part staying put keeps its connection by a new wire
        Set<GridPoint> fixedPins = new HashSet<>();
        for (Part p : stage.parts()) {
            if (!refs.contains(p.ref())) {
                for (PinSpec pin : p.kind().pins()) {
                    fixedPins.add(p.pinPoint(pin.name()));
                }
            }
        }
        for (GridPoint g : movedPins) {
            if (fixedPins.contains(g)) {
                replacements.add(Router.route(after, g, g.plus(dx, dy)));
            }
        }
        int end = stage.wires().size() - changed.size();
        for (List<Wire> repl : replacements) {
            for (Wire w : repl) {
                steps.add(new EditCommand.AddWire(w, end++));
            }
        }
        String label = refs.size() == 1 ? "Move " + refs.iterator().next() : "Move " + refs.size() + " parts";
        return new EditCommand.Compound(label, steps, Optional.of("move:" + String.join(",", new java.util.TreeSet<>(refs))));
    }

    /** Moves the selected parts (and their attached wires) by a grid offset; consecutive moves merge. */
    public void moveSelection(int dx, int dy) {
        if (selection.refs().isEmpty() || (dx == 0 && dy == 0)) {
            return;
        }
        Set<String> refs = selection.refs();
        execute(moveCommand(refs, dx, dy));
        // moved wires are re-added at the end of the list, so only the parts stay selected
        selection = new Selection(refs, Set.of());
    }

    /** Turns the selected parts a quarter turn clockwise about their origins. */
    public void rotateSelection() {
        placementChange("Rotate", p -> p.rotated(p.rotationDegrees() + 90));
    }

    /** Mirrors the selected parts left-right. */
    public void mirrorSelection() {
        placementChange("Mirror", Placement::mirror);
    }

    private void placementChange(String verb, java.util.function.UnaryOperator<Placement> f) {
        List<EditCommand> steps = new ArrayList<>();
        for (String ref : selection.refs()) {
            Part p = stage.require(ref);
            steps.add(new EditCommand.MovePart(ref, p.placement(), f.apply(p.placement()), verb));
        }
        if (steps.size() == 1) {
            execute(steps.get(0));
        } else if (!steps.isEmpty()) {
            execute(EditCommand.Compound.of(verb + " " + steps.size() + " parts", steps));
        }
    }

    /** The command that deletes parts and wires; wires attached to the parts' pins go in the same step. */
    public EditCommand deleteCommand(Set<String> refs, Set<Integer> wireIndices) {
        Set<GridPoint> pins = new HashSet<>();
        for (String ref : refs) {
            Part p = stage.require(ref);
            for (PinSpec pin : p.kind().pins()) {
                pins.add(p.pinPoint(pin.name()));
            }
        }
        List<EditCommand> steps = new ArrayList<>();
        for (int i = stage.wires().size() - 1; i >= 0; i--) {
            Wire w = stage.wires().get(i);
            if (wireIndices.contains(i) || pins.contains(w.from()) || pins.contains(w.to())) {
                steps.add(new EditCommand.RemoveWire(w, i));
            }
        }
        List<Part> doomed = stage.parts().stream().filter(p -> refs.contains(p.ref()))
                .sorted(Comparator.comparingInt((Part p) -> stage.parts().indexOf(p)).reversed()).toList();
        Stage s = stage;
        for (EditCommand c : steps) {
            s = c.apply(s);
        }
        for (Part p : doomed) {
            EditCommand c = EditCommand.RemovePart.of(s, p.ref());
            steps.add(c);
            s = c.apply(s);
        }
        String label = refs.size() == 1 && wireIndices.isEmpty() ? "Delete " + refs.iterator().next() : "Delete";
        return EditCommand.Compound.of(label, steps);
    }

    /** Deletes what is selected, with the wires attached to deleted parts, as one undo step. */
    public void deleteSelection() {
        if (selection.isEmpty()) {
            return;
        }
        EditCommand c = deleteCommand(selection.refs(), selection.wires());
        selection = Selection.EMPTY;
        execute(c);
    }

    /** Draws an orthogonally routed wire between two grid points; nothing for coinciding points. */
    public void drawWire(GridPoint from, GridPoint to) {
        List<Wire> route = Router.route(stage, from, to);
        if (route.isEmpty()) {
            return;
        }
        List<EditCommand> steps = new ArrayList<>();
        int index = stage.wires().size();
        for (Wire w : route) {
            steps.add(new EditCommand.AddWire(w, index++));
        }
        execute(steps.size() == 1 ? steps.get(0) : EditCommand.Compound.of("Draw wire", steps));
    }

    /** Sets a parameter of a part (typed in the part sheet). No step when the value is unchanged. */
    public void setValue(String ref, String key, double value) {
        Part p = stage.require(ref);
        Double old = p.values().get(key);
        if (old != null && old == value) {
            return;
        }
        execute(new EditCommand.SetValue(ref, key, old == null ? OptionalDouble.empty() : OptionalDouble.of(old),
                OptionalDouble.of(value), Optional.empty()));
    }

    /**
     * Sets a parameter as one step of a continuous gesture (a slider drag, a value drag on the
     * canvas): consecutive changes with the same merge key become one undo step.
     */
    public void setValueMerging(String ref, String key, double value, String mergeKey) {
        Part p = stage.require(ref);
        Double old = p.values().get(key);
        if (old != null && old == value) {
            return;
        }
        execute(new EditCommand.SetValue(ref, key, old == null ? OptionalDouble.empty() : OptionalDouble.of(old),
                OptionalDouble.of(value), Optional.of(mergeKey)));
    }

    /**
     * Sets several parameters as one undoable step (the sizing assistant's Apply). Values already in
     * place are left out; nothing is recorded when none changes.
     *
     * @param label words for the Undo menu
     * @param changes designator, parameter key and new value of each change
     */
    public void setValues(String label, List<ValueChange> changes) {
        List<EditCommand> steps = new ArrayList<>();
        Stage s = stage;
        for (ValueChange c : changes) {
            Part p = s.require(c.ref());
            Double old = p.values().get(c.key());
            if (old != null && old == c.value()) {
                continue;
            }
            EditCommand step = new EditCommand.SetValue(c.ref(), c.key(),
                    old == null ? OptionalDouble.empty() : OptionalDouble.of(old), OptionalDouble.of(c.value()),
                    Optional.empty());
            steps.add(step);
            s = step.apply(s);
        }
        if (!steps.isEmpty()) {
            execute(EditCommand.Compound.of(label, steps));
        }
    }

    /**
     * One parameter change of {@link #setValues}.
     *
     * @param ref designator
     * @param key parameter key
     * @param value new value, SI units
     */
    public record ValueChange(String ref, String key, double value) {
    }

    /** Steps a parameter through the E24 series; consecutive steps of one field merge. */
    public void stepPreferred(String ref, String key, int steps) {
        Part p = stage.require(ref);
        double now = p.value(key);
        if (!(now > 0)) {
            return;
        }
        double next = PreferredValues.step(now, steps);
        var spec = p.kind().param(key).orElseThrow(() -> new IllegalArgumentException(p.kind() + " has no " + key));
        if (!spec.accepts(next)) {
            return;
        }
        Double old = p.values().get(key);
        execute(new EditCommand.SetValue(ref, key, old == null ? OptionalDouble.empty() : OptionalDouble.of(old),
                OptionalDouble.of(next), Optional.of("step:" + ref + ":" + key)));
    }

    /** Sets a choice option of a part. */
    public void setOption(String ref, String key, String value) {
        Part p = stage.require(ref);
        String old = p.options().get(key);
        if (value.equals(old)) {
            return;
        }
        execute(new EditCommand.SetOption(ref, key, Optional.ofNullable(old), Optional.of(value)));
    }

    /** Sets the drive pin state. */
    public void setPinHigh(boolean high) {
        Conditions c = stage.conditions();
        if (c.pinHigh() != high) {
            execute(new EditCommand.SetConditions(c, c.withPinHigh(high), "pin state"));
        }
    }

    /** Sets the nominal ambient; consecutive changes merge (a slider drag is one step). */
    public void setAmbient(double celsius) {
        Conditions c = stage.conditions();
        if (c.ambientCelsius() != celsius) {
            execute(new EditCommand.SetConditions(c, c.withAmbient(celsius), "ambient"));
        }
    }

    /** What Copy puts on the clipboard: selected parts, and wires selected or lying between their pins. */
    public Clip copy() {
        List<Part> parts = stage.parts().stream().filter(p -> selection.refs().contains(p.ref())).toList();
        Set<GridPoint> pins = new HashSet<>();
        for (Part p : parts) {
            for (PinSpec pin : p.kind().pins()) {
                pins.add(p.pinPoint(pin.name()));
            }
        }
        List<Wire> wires = new ArrayList<>();
        for (int i = 0; i < stage.wires().size(); i++) {
            Wire w = stage.wires().get(i);
            if (selection.wires().contains(i) || (pins.contains(w.from()) && pins.contains(w.to()))) {
                wires.add(w);
            }
        }
        return new Clip(parts, wires);
    }

    /** Pastes a clip offset by {@value #PASTE_OFFSET} units with fresh designators, as one step, and selects it. */
    public void paste(Clip clip) {
        if (clip.parts().isEmpty() && clip.wires().isEmpty()) {
            return;
        }
        List<EditCommand> steps = new ArrayList<>();
        Stage s = stage;
        Set<String> refs = new LinkedHashSet<>();
        for (Part p : clip.parts()) {
            String ref = s.nextRef(p.kind().designatorPrefix());
            Part copy = p.withRef(ref).withPlacement(p.placement().movedTo(p.placement().origin().plus(PASTE_OFFSET, PASTE_OFFSET)));
            EditCommand c = new EditCommand.AddPart(copy, s.parts().size(), List.of());
            steps.add(c);
            s = c.apply(s);
            refs.add(ref);
        }
        Set<Integer> wires = new LinkedHashSet<>();
        for (Wire w : clip.wires()) {
            EditCommand c = new EditCommand.AddWire(new Wire(w.from().plus(PASTE_OFFSET, PASTE_OFFSET),
                    w.to().plus(PASTE_OFFSET, PASTE_OFFSET)), s.wires().size());
            wires.add(s.wires().size());
            steps.add(c);
            s = c.apply(s);
        }
        execute(EditCommand.Compound.of("Paste", steps));
        selection = new Selection(refs, wires);
    }

    /** Copied parts and wires. */
    public record Clip(List<Part> parts, List<Wire> wires) {
        public Clip {
            parts = List.copyOf(parts);
            wires = List.copyOf(wires);
        }
    }

    private static List<Wire> reversed(List<Wire> route) {
        List<Wire> out = new ArrayList<>();
        for (int i = route.size() - 1; i >= 0; i--) {
            out.add(new Wire(route.get(i).to(), route.get(i).from()));
        }
        return out;
    }

    /** Parameter values of a part including defaults, by key, for views. */
    public static Map<String, Double> effectiveValues(Part p) {
        Map<String, Double> out = new TreeMap<>();
        p.kind().params().forEach(spec -> out.put(spec.key(), p.value(spec.key())));
        return out;
    }
}
