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
import org.armature.model.OptionSpec;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinSpec;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageSettings;
import org.armature.model.TestPoint;
import org.armature.model.Wire;
import org.armature.render.Box;
import org.armature.render.Notation;
import org.armature.render.PartGeometry;
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
    /** The fault hunt made on this stage, changed only through {@link EditCommand.SetHunt} after the start. */
    private Optional<org.armature.model.FaultHunt> hunt = Optional.empty();

    /** A session on a stage, clean. */
    public Editor(Stage stage) {
        this.stage = stage;
    }

    /** A session on a stage with the fault hunt it was opened with, clean. */
    public Editor(Stage stage, Optional<org.armature.model.FaultHunt> hunt) {
        this.stage = stage;
        this.hunt = hunt;
    }

    /** The fault hunt made on this stage, if any (its stage index is whatever it was last given). */
    public Optional<org.armature.model.FaultHunt> hunt() {
        return hunt;
    }

    /**
     * Changes the fault hunt as one undoable step in the user's words; nothing when it is unchanged.
     *
     * @param after the hunt after (empty: none)
     * @param label the words of the step ("Add reading switch@high")
     */
    public void setHunt(Optional<org.armature.model.FaultHunt> after, String label) {
        if (!after.equals(hunt)) {
            execute(new EditCommand.SetHunt(hunt, after, label));
        }
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
        hunt = Optional.empty();
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
        hunt = c.huntAfter(hunt);
        select(selection);
    }

    /** Undoes the last step; false when there was none. */
    public boolean undo() {
        Optional<EditCommand> c = history.nextUndo();
        c.ifPresent(x -> hunt = x.inverse().huntAfter(hunt));
        Optional<Stage> s = history.undo(stage);
        s.ifPresent(v -> stage = v);
        select(selection);
        return s.isPresent();
    }

    /** Redoes the last undone step; false when there was none. */
    public boolean redo() {
        Optional<EditCommand> c = history.nextRedo();
        c.ifPresent(x -> hunt = x.huntAfter(hunt));
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
        // one part per designator: the first in drawing order (a file may hold two parts of one designator)
        List<Part> doomed = new ArrayList<>();
        for (String ref : refs) {
            doomed.add(stage.require(ref));
        }
        doomed.sort(Comparator.comparingInt((Part p) -> stage.parts().indexOf(p)).reversed());
        Stage s = stage;
        for (EditCommand c : steps) {
            s = c.apply(s);
        }
        for (Part p : doomed) {
            EditCommand c = EditCommand.RemovePart.of(s, p);
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
        execute(setValueCommand(p, key, value, Optional.empty()));
    }

    /** The command that sets one value of a part, with its words for the Undo menu. */
    static EditCommand.SetValue setValueCommand(Part p, String key, double value, Optional<String> mergeKey) {
        Double old = p.values().get(key);
        String subject = p.ref() + " " + p.kind().param(key).map(s -> s.label().toLowerCase(java.util.Locale.ROOT)).orElse(key);
        String unit = p.kind().param(key).map(s -> s.unitSymbol()).orElse("");
        return new EditCommand.SetValue(p.ref(), key, old == null ? OptionalDouble.empty() : OptionalDouble.of(old),
                OptionalDouble.of(value), mergeKey, new EditCommand.ValueWords(subject, unit, p.value(key), value));
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
        execute(setValueCommand(p, key, value, Optional.of(mergeKey)));
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
            EditCommand step = setValueCommand(p, c.key(), c.value(), Optional.empty());
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
        execute(setValueCommand(p, key, next, Optional.of("step:" + ref + ":" + key)));
    }

    /** Sets a choice option of a part. */
    public void setOption(String ref, String key, String value) {
        Part p = stage.require(ref);
        String old = p.options().get(key);
        if (value.equals(old)) {
            return;
        }
        Optional<OptionSpec> spec = p.kind().options().stream().filter(o -> o.key().equals(key)).findFirst();
        String subject = ref + " " + spec.map(o -> o.label().toLowerCase(java.util.Locale.ROOT)).orElse(key);
        execute(new EditCommand.SetOption(ref, key, Optional.ofNullable(old), Optional.of(value), subject,
                spec.map(OptionSpec::defaultValue).orElse("none")));
    }

    /** Sets the drive pin state. */
    public void setPinHigh(boolean high) {
        Conditions c = stage.conditions();
        if (c.pinHigh() != high) {
            execute(new EditCommand.SetConditions(c, c.withPinHigh(high), EditCommand.SetConditions.PIN_STATE));
        }
    }

    /** Sets the nominal ambient; consecutive changes merge (a slider drag is one step). */
    public void setAmbient(double celsius) {
        Conditions c = stage.conditions();
        if (c.ambientCelsius() != celsius) {
            execute(new EditCommand.SetConditions(c, c.withAmbient(celsius), EditCommand.SetConditions.AMBIENT));
        }
    }

    /** Sets the corners' ambient range (the nominal ambient is kept inside it). */
    public void setAmbientRange(double minCelsius, double maxCelsius) {
        Conditions c = stage.conditions();
        if (!(minCelsius <= maxCelsius) || (c.ambientMinCelsius() == minCelsius && c.ambientMaxCelsius() == maxCelsius)) {
            return;
        }
        double nominal = Math.min(maxCelsius, Math.max(minCelsius, c.ambientCelsius()));
        execute(new EditCommand.SetConditions(c, new Conditions(c.pinHigh(), nominal, minCelsius, maxCelsius),
                EditCommand.SetConditions.AMBIENT_RANGE));
    }

    /**
     * Gives a part another designator (its test points follow) and keeps it selected.
     *
     * @throws IllegalArgumentException when the designator is blank or taken by another part
     */
    public void renamePart(String ref, String newRef) {
        String to = newRef.strip();
        Part p = stage.require(ref);
        if (to.equals(ref)) {
            return;
        }
        if (to.isEmpty() || !to.matches("[A-Za-z][A-Za-z0-9_]*")) {
            throw new IllegalArgumentException("A designator is a letter followed by letters, digits or _ (K1, Q7, R12).");
        }
        if (stage.part(to).isPresent()) {
            throw new IllegalArgumentException("The designator " + to + " is already used.");
        }
        boolean selected = selection.refs().contains(ref);
        execute(new EditCommand.RenamePart(stage.parts().indexOf(p), ref, to));
        if (selected) {
            Set<String> refs = new LinkedHashSet<>(selection.refs());
            refs.add(to);
            select(new Selection(refs, selection.wires()));
        }
    }

    /** Renames the stage; nothing for an unchanged or blank name. */
    public void rename(String name) {
        String n = name.strip();
        if (n.isEmpty() || n.equals(stage.name())) {
            return;
        }
        EditCommand.Header h = EditCommand.Header.of(stage);
        execute(new EditCommand.SetHeader(h, new EditCommand.Header(n, h.description(), h.settings()),
                "Rename stage to " + n));
    }

    /** Changes the stage's description. */
    public void describe(String description) {
        String d = description.strip();
        if (d.equals(stage.description())) {
            return;
        }
        EditCommand.Header h = EditCommand.Header.of(stage);
        execute(new EditCommand.SetHeader(h, new EditCommand.Header(h.name(), d, h.settings()), "Change stage description"));
    }

    /**
     * Changes the stage's check settings; the Undo menu names what changed, from the old figure to
     * the new ("Monte Carlo samples 0 → 500").
     */
    public void setSettings(StageSettings settings) {
        StageSettings was = stage.settings();
        if (settings.equals(was)) {
            return;
        }
        EditCommand.Header h = EditCommand.Header.of(stage);
        execute(new EditCommand.SetHeader(h, new EditCommand.Header(h.name(), h.description(), settings),
                settingsWords(was, settings)));
    }

    /** What changed between two settings, in the words of the stage sheet. */
    static String settingsWords(StageSettings was, StageSettings now) {
        List<String> parts = new ArrayList<>();
        if (!was.releaseTimeRequirementSeconds().equals(now.releaseTimeRequirementSeconds())) {
            parts.add("Release-time requirement " + seconds(was.releaseTimeRequirementSeconds()) + " → "
                    + seconds(now.releaseTimeRequirementSeconds()));
        }
        if (was.monteCarloSamples() != now.monteCarloSamples()) {
            parts.add("Monte Carlo samples " + was.monteCarloSamples() + " → " + now.monteCarloSamples());
        }
        if (was.monteCarloSeed() != now.monteCarloSeed()) {
            parts.add("Monte Carlo seed " + was.monteCarloSeed() + " → " + now.monteCarloSeed());
        }
        return parts.isEmpty() ? "Change stage settings" : String.join(", ", parts);
    }

    private static String seconds(OptionalDouble s) {
        return s.isPresent() ? Notation.format(s.getAsDouble(), "s") : "none";
    }

    /**
     * Names the net at a part's pin: adds a test point there, or renames the one already anchored
     * to that pin. A net name used by another test point moves here.
     *
     * @throws IllegalArgumentException when the name is not a net name (the message says what is expected)
     */
    public void nameTestPoint(String ref, String pin, String net) {
        stage.require(ref);
        TestPoint tp = new TestPoint(net, ref, pin);
        List<TestPoint> after = new ArrayList<>();
        Optional<TestPoint> old = Optional.empty();
        for (TestPoint t : stage.testPoints()) {
            if (t.ref().equals(ref) && t.pin().equals(pin)) {
                old = Optional.of(t);
                after.add(tp);
            } else if (!t.net().equals(net)) {
                after.add(t);
            }
        }
        if (old.isEmpty()) {
            after.add(tp);
        }
        if (after.equals(stage.testPoints())) {
            return;
        }
        String label = old.map(t -> "Rename test point " + t.net() + " to " + net).orElse("Add test point " + net);
        execute(new EditCommand.SetTestPoints(stage.testPoints(), after, label));
    }

    /** Removes the test point of a net name; nothing when there is none. */
    public void removeTestPoint(String net) {
        List<TestPoint> after = stage.testPoints().stream().filter(t -> !t.net().equals(net)).toList();
        if (after.size() != stage.testPoints().size()) {
            execute(new EditCommand.SetTestPoints(stage.testPoints(), after, "Remove test point " + net));
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

    /**
     * Pastes a clip with fresh designators, as one step, and selects it. The copy goes
     * {@value #PASTE_OFFSET} units right and down of the original, or further along that diagonal
     * until none of its pins or wire points touches a pin or wire of the stage and no body overlaps
     * another: a paste never joins a net by landing on it.
     */
    public void paste(Clip clip) {
        if (clip.parts().isEmpty() && clip.wires().isEmpty()) {
            return;
        }
        int offset = freePasteOffset(clip);
        List<EditCommand> steps = new ArrayList<>();
        Stage s = stage;
        Set<String> refs = new LinkedHashSet<>();
        for (Part p : clip.parts()) {
            String ref = s.nextRef(p.kind().designatorPrefix());
            Part copy = p.withRef(ref).withPlacement(p.placement().movedTo(p.placement().origin().plus(offset, offset)));
            EditCommand c = new EditCommand.AddPart(copy, s.parts().size(), List.of());
            steps.add(c);
            s = c.apply(s);
            refs.add(ref);
        }
        Set<Integer> wires = new LinkedHashSet<>();
        for (Wire w : clip.wires()) {
            EditCommand c = new EditCommand.AddWire(new Wire(w.from().plus(offset, offset),
                    w.to().plus(offset, offset)), s.wires().size());
            wires.add(s.wires().size());
            steps.add(c);
            s = c.apply(s);
        }
        execute(EditCommand.Compound.of("Paste", steps));
        selection = new Selection(refs, wires);
    }

    /** Most diagonal steps tried before a paste settles below and right of everything. */
    private static final int PASTE_TRIES = 64;

    /** The smallest diagonal offset (a multiple of {@value #PASTE_OFFSET}) at which a clip touches nothing. */
    private int freePasteOffset(Clip clip) {
        Set<GridPoint> taken = new HashSet<>();
        List<Box> bodies = new ArrayList<>();
        for (Part p : stage.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                taken.add(p.pinPoint(pin.name()));
            }
            bodies.addAll(PartGeometry.bodies(p));
        }
        for (Wire w : stage.wires()) {
            taken.addAll(points(w));
        }
        for (int k = 1; k <= PASTE_TRIES; k++) {
            int d = k * PASTE_OFFSET;
            if (fits(clip, d, taken, bodies)) {
                return d;
            }
        }
        return (PASTE_TRIES + 1) * PASTE_OFFSET;
    }

    private static boolean fits(Clip clip, int d, Set<GridPoint> taken, List<Box> bodies) {
        for (Part p : clip.parts()) {
            Part moved = p.withPlacement(p.placement().movedTo(p.placement().origin().plus(d, d)));
            for (PinSpec pin : moved.kind().pins()) {
                if (taken.contains(moved.pinPoint(pin.name()))) {
                    return false;
                }
            }
            for (Box b : PartGeometry.bodies(moved)) {
                if (bodies.stream().anyMatch(b::intersects)) {
                    return false;
                }
            }
        }
        for (Wire w : clip.wires()) {
            for (GridPoint g : points(new Wire(w.from().plus(d, d), w.to().plus(d, d)))) {
                if (taken.contains(g)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** The grid points a straight wire passes through, ends included. */
    private static List<GridPoint> points(Wire w) {
        List<GridPoint> out = new ArrayList<>();
        int dx = Integer.signum(w.to().gridX() - w.from().gridX());
        int dy = Integer.signum(w.to().gridY() - w.from().gridY());
        GridPoint g = w.from();
        out.add(g);
        while (!g.equals(w.to()) && (dx != 0 || dy != 0)) {
            g = g.plus(dx, dy);
            out.add(g);
        }
        return out;
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
