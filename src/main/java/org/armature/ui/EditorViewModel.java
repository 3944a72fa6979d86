package org.armature.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Executor;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.armature.model.ParamKeys;
import org.armature.model.StageRoles;
import org.armature.analysis.Suggestion;
import org.armature.analysis.TopologyCheck;
import org.armature.io.StageFileException;
import org.armature.model.FaultHunt;
import org.armature.model.GridPoint;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageSettings;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.armature.render.Selection;
import org.armature.ui.edit.EditCommand;
import org.armature.ui.edit.Editor;

/**
 * The editor window's state and actions. Views bind to the read-only properties and call the action
 * methods; every document change goes through an {@link Editor}'s commands.
 *
 * <p>Two kinds of state, kept apart. The <em>document state</em> changes at once with each action:
 * the stages of the document (one {@link Editor}, with its own undo history, per stage), which one
 * is active, its stage as it stands, the selection, the file, dirty and the undo labels. The
 * <em>evaluation</em> is everything computed about the active stage: one immutable
 * {@link Evaluation} per stage version, built by {@link Evaluations} on the injected executors and
 * published whole through {@link #evaluationProperty()}. The canvas, part sheet readouts, verdicts,
 * edges and exports read only evaluations, so none of them shows half of one stage version and half
 * of another.
 *
 * <p>The application passes background executors and {@code Platform::runLater}; tests pass
 * same-thread or hand-stepped executors.
 */
public final class EditorViewModel {

    /** Which readouts to show (View menu toggles). */
    public enum ReadoutKind { VOLTAGES, CURRENTS, BADGES, GAUGES, MARKERS }

    private final DocumentStore store;
    private final Evaluations evaluations;
    private final List<Editor> editors = new ArrayList<>();
    private String title = "";
    /** Where line-up figures are computed, and where they are published. */
    private final Executor solveExecutor;
    private final Executor fxExecutor;
    /** The line-up's figures in phases: DC, turn-off and turn-on on the solve executor, checks on the analyses'. */
    private final LineUpEvaluations lineUpEvaluations;
    /** The opened document's line-up, by the editors of its stages (so tab moves keep it), and its context. */
    private List<Editor> lineUpEditors = List.of();
    private Optional<org.armature.model.LineUpContext> lineUpContext = Optional.empty();
    /** Earlier shared contexts, for undoing a shared value (a change of one value applies to every stage). */
    private final java.util.ArrayDeque<org.armature.model.LineUpContext> sharedUndo = new java.util.ArrayDeque<>();
    private boolean stagesChanged;
    private Editor editor;

    private final ReadOnlyObjectWrapper<Evaluation> evaluation = new ReadOnlyObjectWrapper<>(this, "evaluation");
    private final ReadOnlyObjectWrapper<Stage> stage = new ReadOnlyObjectWrapper<>(this, "stage");
    private final ReadOnlyObjectWrapper<List<String>> stageNames = new ReadOnlyObjectWrapper<>(this, "stageNames", List.of());
    private final ReadOnlyIntegerWrapper activeStage = new ReadOnlyIntegerWrapper(this, "activeStage");
    private final ReadOnlyObjectWrapper<Optional<Stage>> preview = new ReadOnlyObjectWrapper<>(this, "preview", Optional.empty());
    private final ReadOnlyObjectWrapper<Selection> selection = new ReadOnlyObjectWrapper<>(this, "selection", Selection.EMPTY);
    private final ReadOnlyObjectWrapper<Optional<Path>> file = new ReadOnlyObjectWrapper<>(this, "file", Optional.empty());
    private final ReadOnlyObjectWrapper<Set<ReadoutKind>> shownReadouts =
            new ReadOnlyObjectWrapper<>(this, "shownReadouts", EnumSet.allOf(ReadoutKind.class));
    private final ReadOnlyObjectWrapper<Optional<PartKind>> armedKind = new ReadOnlyObjectWrapper<>(this, "armedKind", Optional.empty());
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty");
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo");
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper(this, "canRedo");
    private final ReadOnlyStringWrapper undoLabel = new ReadOnlyStringWrapper(this, "undoLabel", "Undo");
    private final ReadOnlyStringWrapper redoLabel = new ReadOnlyStringWrapper(this, "redoLabel", "Redo");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final ReadOnlyObjectWrapper<List<org.armature.analysis.faults.Fault>> faults =
            new ReadOnlyObjectWrapper<>(this, "faults", List.of());
    /** The editor the injected faults belong to; another stage made active clears them. */
    private Editor faultsFor;
    /** The document stage and the faults last submitted, and the faulted stage made of them. */
    private Stage submittedFor;
    private List<org.armature.analysis.faults.Fault> submittedFaults = List.of();
    private Stage faultedStage;
    /** The faults as the marks name them: a track open between nets on the resistor that stands for the cut. */
    private List<String> faultMarks = List.of();
    private final ReadOnlyObjectWrapper<Optional<FaultHunt>> faultHunt =
            new ReadOnlyObjectWrapper<>(this, "faultHunt", Optional.empty());
    private Editor.Clip clipboard = new Editor.Clip(List.of(), List.of());
    private Stage coilSupplyOf;
    private Optional<String> coilSupplyRef = Optional.empty();

    /**
     * @param initial the stage shown first (not from a file: the document is untitled and clean)
     * @param store stage file access
     * @param readouts where readouts come from
     * @param solveExecutor runs {@link ReadoutSource#compute}; never the FX thread in the application
     * @param fxExecutor publishes results on the FX thread ({@code Platform::runLater})
     */
    public EditorViewModel(Stage initial, DocumentStore store, ReadoutSource readouts, Executor solveExecutor,
                           Executor fxExecutor) {
        this(initial, store, readouts, solveExecutor, fxExecutor, Analyses.NONE);
    }

    /**
     * @param initial the stage shown first (untitled, clean)
     * @param store stage file access
     * @param readouts where readouts come from
     * @param solveExecutor runs {@link ReadoutSource#compute}; never the FX thread in the application
     * @param fxExecutor publishes results on the FX thread ({@code Platform::runLater})
     * @param analyses verdicts and edges, run after edits settle; {@link Analyses#NONE} for none
     */
    public EditorViewModel(Stage initial, DocumentStore store, ReadoutSource readouts, Executor solveExecutor,
                           Executor fxExecutor, Analyses analyses) {
        this.store = store;
        this.solveExecutor = solveExecutor;
        this.fxExecutor = fxExecutor;
        this.evaluations = new Evaluations(readouts, analyses, solveExecutor, fxExecutor, evaluation::set);
        this.lineUpEvaluations = new LineUpEvaluations(LineUpEvaluations.ENGINE, solveExecutor, analyses.executor(),
                fxExecutor);
        load(StageDocument.of(initial));
    }

    // ------------------------------------------------------------------ properties

    /**
     * The evaluation of the active stage: the newest published, whole. Its readouts, verdicts and
     * edges may each still be pending (a newer stage version was submitted and is being solved).
     */
    public ReadOnlyObjectProperty<Evaluation> evaluationProperty() {
        return evaluation.getReadOnlyProperty();
    }

    /** The evaluation shown now. */
    public Evaluation evaluation() {
        return evaluation.get();
    }

    /**
     * The annotations of the newest evaluation, filtered by the View toggles (only the validator's
     * markers while its readouts are pending).
     */
    public Annotations annotations() {
        return annotations(evaluation.get());
    }

    /**
     * The annotations of an evaluation, filtered by the View toggles; an evaluation of the faulted
     * stage carries the faults' marks ({@link org.armature.render.FaultMarks}) whatever the toggles.
     */
    public Annotations annotations(Evaluation e) {
        Annotations a = filter(e.annotations(), shownReadouts.get());
        if (faultHunt.get().isPresent() && !faultHunt.get().get().readings().isEmpty()) {
            // the hunt's readings at their nets, whatever the toggles: they are what was entered
            a = a.withReadings(faultHunt.get().get().readings().stream()
                    .map(r -> new Annotations.MeterReading(r.net(), r.pinHigh(), r.volts())).toList());
        }
        if (faultedStage != null && e.stage() == faultedStage) {
            a = org.armature.render.FaultMarks.marked(a, faultMarks);
        }
        return a;
    }

    // ------------------------------------------------------------------ fault mode

    /**
     * A stage with faults injected, and the faults as their marks name them.
     *
     * @param stage the faulted stage ({@link org.armature.analysis.faults.FaultInjector#apply(Stage, List)})
     * @param marks {@code PART:KIND} as written, and a track open between nets
     *     ({@code switch~control:track-open}, no part of its own) on the resistor the injector put in
     *     for the cut, as {@code XF1:track-open switch~control}, so the drawing marks where the cut is
     */
    record Faulted(Stage stage, List<String> marks) {
    }

    /** Injects the faults in order, as {@code FaultInjector.apply} does, noting each one's mark. */
    static Faulted inject(Stage healthy, List<org.armature.analysis.faults.Fault> faults) {
        List<String> out = new ArrayList<>();
        Stage s = healthy;
        for (org.armature.analysis.faults.Fault f : faults) {
            Stage next = org.armature.analysis.faults.FaultInjector.apply(s, f);
            if (f.ref().contains("~")) {
                java.util.Set<String> before = new java.util.HashSet<>();
                s.parts().forEach(p -> before.add(p.ref()));
                Optional<String> added = next.parts().stream().map(org.armature.model.Part::ref)
                        .filter(r -> !before.contains(r)).findFirst();
                out.add(added.map(r -> r + ":" + f.kind().id() + " " + f.ref()).orElse(f.id()));
            } else {
                out.add(f.id());
            }
            s = next;
        }
        return new Faulted(s, out);
    }

    /**
     * The faults injected into the active stage: the canvas, readouts, verdicts and edges show the
     * stage with them ({@link org.armature.analysis.faults.FaultInjector}); the document and its undo
     * history are not changed. Another stage made active clears them.
     */
    public ReadOnlyObjectProperty<List<org.armature.analysis.faults.Fault>> faultsProperty() {
        return faults.getReadOnlyProperty();
    }

    /** The single faults a part of the active stage can have (its entries of the stage's fault set). */
    public List<org.armature.analysis.faults.Fault> faultsOf(String ref) {
        return org.armature.analysis.faults.FaultCatalog.of(stage()).stream().filter(f -> f.ref().equals(ref)).toList();
    }

    /**
     * The track opens of the stage's fault set that split a net ({@code NET~TOWARD:track-open}).
     *
     * @param net the net's name as the drawing and {@code solve} write it
     */
    public List<org.armature.analysis.faults.Fault> trackFaultsOfNet(String net) {
        return org.armature.analysis.faults.FaultCatalog.of(stage()).stream()
                .filter(f -> f.kind() == org.armature.analysis.faults.FaultKind.TRACK_OPEN
                        && f.ref().startsWith(net + "~"))
                .toList();
    }

    /**
     * The track opens a part's pins can have: one per pin joined to something by a single wire
     * ending at it ({@link org.armature.analysis.faults.FaultInjector#cutPin}); a pin joined otherwise
     * has none.
     */
    public List<org.armature.analysis.faults.Fault> trackFaultsOf(String ref) {
        Stage now = stage();
        List<org.armature.analysis.faults.Fault> out = new ArrayList<>();
        now.part(ref).ifPresent(p -> {
            for (org.armature.model.PinSpec pin : p.kind().pins()) {
                org.armature.analysis.faults.Fault f = new org.armature.analysis.faults.Fault(ref + "." + pin.name(),
                        org.armature.analysis.faults.FaultKind.TRACK_OPEN);
                try {
                    if (org.armature.analysis.faults.FaultInjector.apply(now, f) != now) {
                        out.add(f);
                    }
                } catch (IllegalArgumentException | IllegalStateException e) {
                    // joined in a way one cut cannot separate: no track open offered at this pin
                }
            }
        });
        return out;
    }

    /** Injects a fault (several may be injected at once); one already injected is taken out again. */
    public void toggleFault(org.armature.analysis.faults.Fault f) {
        List<org.armature.analysis.faults.Fault> now = new ArrayList<>(faults.get());
        if (!now.remove(f)) {
            now.add(f);
        }
        faultsFor = editor;
        faults.set(List.copyOf(now));
        publishDocument();
    }

    /** Takes every injected fault out: the drawing shows the healthy stage again. */
    public void clearFaults() {
        faults.set(List.of());
        publishDocument();
    }

    /** "Faults injected: R1:open" for the status line; empty with none. */
    public String faultStatus() {
        return faults.get().isEmpty() ? "" : "Faults injected: " + faults.get().stream()
                .map(org.armature.analysis.faults.Fault::id).collect(java.util.stream.Collectors.joining(", "))
                + " (the drawing shows the faulted stage; the document is unchanged)";
    }

    /** The faults still valid for the stage as it stands (a deleted part takes its faults with it). */
    private List<org.armature.analysis.faults.Fault> validFaults(Stage now) {
        if (faultsFor != editor && !faults.get().isEmpty()) {
            faults.set(List.of());
        }
        List<org.armature.analysis.faults.Fault> set = org.armature.analysis.faults.FaultCatalog.of(now);
        List<org.armature.analysis.faults.Fault> valid = faults.get().stream()
                .filter(f -> set.contains(f) || f.kind() == org.armature.analysis.faults.FaultKind.TRACK_OPEN
                        && org.armature.analysis.faults.FaultInjector.trackPin(now, f.ref()).isPresent())
                .toList();
        if (!valid.equals(faults.get())) {
            faults.set(valid);
        }
        return valid;
    }

    // ------------------------------------------------------------------ fault hunt (document state)

    /**
     * The fault hunt of the active stage (symptom, meter, readings, changed prior weights), its stage
     * index that of the active stage; empty when none was entered on it. It is document state: kept
     * in the stage's undo history, saved with the document ({@link #document()}), restored on open.
     */
    public ReadOnlyObjectProperty<Optional<FaultHunt>> faultHuntProperty() {
        return faultHunt.getReadOnlyProperty();
    }

    /** The active stage's hunt, or an empty one on it (no symptom, default meter, no readings). */
    public FaultHunt huntOrStart() {
        return faultHunt.get().orElse(FaultHunt.start(editors.indexOf(editor)));
    }

    /**
     * The name of another stage of the document holding the fault hunt, if the hunt is not on the
     * active stage (a document keeps one hunt).
     */
    public Optional<String> huntElsewhere() {
        return editors.stream().filter(e -> e != editor && e.hunt().isPresent()).findFirst().map(e -> e.stage().name());
    }

    /**
     * Changes the active stage's fault hunt as one undoable step of that stage, in the user's words.
     * A hunt left with nothing entered is no hunt. While another stage holds the document's hunt
     * nothing changes and the message says where it is.
     *
     * @param change the new hunt made from the present one (or an empty one on this stage)
     * @param label the words for the Undo menu ("Add reading switch@high")
     * @return true when the change was made (or changed nothing)
     */
    public boolean changeHunt(java.util.function.UnaryOperator<FaultHunt> change, String label) {
        Optional<String> other = huntElsewhere();
        if (other.isPresent()) {
            message.set("This document's fault hunt is on stage \"" + other.get()
                    + "\"; open that stage to go on with it, or clear its hunt there to hunt on this one.");
            return false;
        }
        int index = editors.indexOf(editor);
        FaultHunt after = change.apply(huntOrStart()).onStage(index);
        Optional<FaultHunt> next = after.equals(FaultHunt.start(index)) ? Optional.empty() : Optional.of(after);
        edit(() -> editor.setHunt(next, label));
        return true;
    }

    /** Adds a reading (one taken before at the same point and pin state is replaced), undoably. */
    public boolean addReading(FaultHunt.HuntReading r) {
        String at = r.net() + "@" + (r.pinHigh() ? "high" : "low");
        boolean again = huntOrStart().readings().stream()
                .anyMatch(x -> x.net().equals(r.net()) && x.pinHigh() == r.pinHigh());
        return changeHunt(h -> {
            List<FaultHunt.HuntReading> list = new ArrayList<>(h.readings());
            int i = indexOf(list, r.net(), r.pinHigh());
            if (i >= 0) {
                list.set(i, r);
            } else {
                list.add(r);
            }
            return h.withReadings(list);
        }, (again ? "Change reading " : "Add reading ") + at);
    }

    /** Removes the reading at a point and pin state, undoably. */
    public boolean removeReading(String net, boolean pinHigh) {
        return changeHunt(h -> {
            List<FaultHunt.HuntReading> list = new ArrayList<>(h.readings());
            int i = indexOf(list, net, pinHigh);
            if (i >= 0) {
                list.remove(i);
            }
            return h.withReadings(list);
        }, "Remove reading " + net + "@" + (pinHigh ? "high" : "low"));
    }

    /** Removes every reading, undoably. */
    public boolean clearReadings() {
        return changeHunt(h -> h.withReadings(List.of()), "Clear readings");
    }

    /** Sets the symptom seen (empty: none), undoably. */
    public boolean setSymptom(Optional<String> symptom) {
        String from = huntOrStart().symptom().orElse("no symptom");
        return changeHunt(h -> h.withSymptom(symptom), "Symptom " + from + " → " + symptom.orElse("no symptom"));
    }

    /** Sets the meter the readings are taken with, undoably, named by what changed. */
    public boolean setMeter(FaultHunt.MeterSetting meter) {
        return changeHunt(h -> h.withMeter(meter), meterWords(huntOrStart().meter(), meter));
    }

    /**
     * Sets one fault kind's prior weight ({@link FaultHunt#NONE} for the healthy stage), undoably;
     * a weight equal to the default is no change kept.
     *
     * @param kind the fault kind's word
     * @param defaultWeight its default weight
     * @param weight the new weight, not negative
     */
    public boolean setPriorWeight(String kind, double defaultWeight, double weight) {
        double from = huntOrStart().priorWeights().getOrDefault(kind, defaultWeight);
        return changeHunt(h -> {
            java.util.Map<String, Double> m = new java.util.LinkedHashMap<>(h.priorWeights());
            if (weight == defaultWeight || Double.isNaN(weight)) {
                m.remove(kind);
            } else {
                m.put(kind, weight);
            }
            return h.withPriorWeights(m);
        }, "Prior weight " + kind + " " + weightText(from) + " → " + weightText(weight));
    }

    /** Puts every prior weight back to its default, undoably. */
    public boolean resetPriorWeights() {
        return changeHunt(h -> h.withPriorWeights(java.util.Map.of()), "Reset prior weights");
    }

    private static int indexOf(List<FaultHunt.HuntReading> list, String net, boolean pinHigh) {
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).net().equals(net) && list.get(i).pinHigh() == pinHigh) {
                return i;
            }
        }
        return -1;
    }

    private static String weightText(double w) {
        return DiagnosisPanel.weightText(w);
    }

    /** "Meter input 10 MΩ → 1 MΩ", "Meter 4000 → 6000 counts", "Meter accuracy ±(1 % + 2 digits) → ±(0.5 % + 2 digits)". */
    static String meterWords(FaultHunt.MeterSetting a, FaultHunt.MeterSetting b) {
        List<String> parts = new ArrayList<>();
        if (a.inputOhms() != b.inputOhms()) {
            parts.add("input " + org.armature.render.Notation.format(a.inputOhms(), "Ω") + " → "
                    + org.armature.render.Notation.format(b.inputOhms(), "Ω"));
        }
        if (a.counts() != b.counts()) {
            parts.add(a.counts() + " → " + b.counts() + " counts");
        }
        if (a.percentOfReading() != b.percentOfReading() || a.digits() != b.digits()) {
            parts.add("accuracy " + accuracyText(a) + " → " + accuracyText(b));
        }
        return "Meter " + (parts.isEmpty() ? "unchanged" : String.join(", ", parts));
    }

    /** "±(1 % + 2 digits)". */
    public static String accuracyText(FaultHunt.MeterSetting m) {
        return "±(" + weightText(m.percentOfReading()) + " % + " + weightText(m.digits()) + " digits)";
    }

    /** The stage being edited (document state: changes with each action, before it is solved). */
    public ReadOnlyObjectProperty<Stage> stageProperty() {
        return stage.getReadOnlyProperty();
    }

    /** The stage as it stands. */
    public Stage stage() {
        return stage.get();
    }

    /** The names of the document's stages, in tab order. */
    public ReadOnlyObjectProperty<List<String>> stageNamesProperty() {
        return stageNames.getReadOnlyProperty();
    }

    /** Which stage of the document is being edited (index into {@link #stageNamesProperty()}). */
    public ReadOnlyIntegerProperty activeStageProperty() {
        return activeStage.getReadOnlyProperty();
    }

    /** A stage to show instead of the document while a drag is in progress; empty otherwise. */
    public ReadOnlyObjectProperty<Optional<Stage>> previewProperty() {
        return preview.getReadOnlyProperty();
    }

    /** The selection. */
    public ReadOnlyObjectProperty<Selection> selectionProperty() {
        return selection.getReadOnlyProperty();
    }

    /** The file the document came from or was saved to. */
    public ReadOnlyObjectProperty<Optional<Path>> fileProperty() {
        return file.getReadOnlyProperty();
    }

    /** Which readouts are shown. */
    public ReadOnlyObjectProperty<Set<ReadoutKind>> shownReadoutsProperty() {
        return shownReadouts.getReadOnlyProperty();
    }

    /** The palette kind waiting to be placed by the next click on the canvas. */
    public ReadOnlyObjectProperty<Optional<PartKind>> armedKindProperty() {
        return armedKind.getReadOnlyProperty();
    }

    /** True when the document has unsaved changes (in any stage, or in the list of stages). */
    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    /** True when the active stage has something to undo. */
    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    /** True when the active stage has something to redo. */
    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    /** "Undo R1 resistance 1 kΩ → 1.5 kΩ". */
    public ReadOnlyStringProperty undoLabelProperty() {
        return undoLabel.getReadOnlyProperty();
    }

    /** "Redo Move Q1". */
    public ReadOnlyStringProperty redoLabelProperty() {
        return redoLabel.getReadOnlyProperty();
    }

    /**
     * The last message for the user (a failed save, an export written). The next edit of the
     * document clears it, so it never describes a state that has moved on.
     */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** The generation of the last stage version submitted for evaluation (latency probes). */
    public long requestedGeneration() {
        return evaluations.requestedGeneration();
    }

    /** The file name for the title and status bar ("untitled" before the first save). */
    public String fileName() {
        return file.get().map(p -> p.getFileName().toString()).orElse("untitled");
    }

    // ------------------------------------------------------------------ document actions

    /** Replaces the document by a template variant (history cleared, untitled). */
    public void newFromTemplate(StageTemplate t, Suppressor s, HighSideDrive d) {
        load(StageDocument.of(Templates.build(t, s, d)));
        file.set(Optional.empty());
        message.set("");
        publishDocument();
    }

    /** Opens a stage file; on failure the document stays and {@link #messageProperty()} says why. */
    public boolean open(Path path) {
        try {
            StageDocument doc = store.load(path);
            load(doc);
            file.set(Optional.of(path));
            message.set("Opened " + path.getFileName()
                    + (doc.stages().size() > 1 ? " (" + doc.stages().size() + " stages)" : ""));
            publishDocument();
            return true;
        } catch (StageFileException e) {
            message.set(e.getMessage());
            return false;
        }
    }

    /**
     * Shows recovered work (an autosave): the document with its file, unsaved until the user saves
     * (history cleared, dirty).
     *
     * @param doc the recovered document
     * @param path the file it belongs to; empty for untitled work
     * @param note what {@link #messageProperty()} says
     */
    public void restore(StageDocument doc, Optional<Path> path, String note) {
        load(doc);
        editors.forEach(e -> e.history().markUnsaved());
        file.set(path);
        message.set(note);
        publishDocument();
    }

    /** Saves to the present file; false when there is none yet (use {@link #saveAs}) or saving failed. */
    public boolean save() {
        return file.get().map(this::saveAs).orElse(false);
    }

    /** Saves to a file and makes it the document's file. */
    public boolean saveAs(Path path) {
        try {
            store.save(document(), path);
            editors.forEach(e -> e.history().markSaved());
            stagesChanged = false;
            file.set(Optional.of(path));
            publishDocument();
            message.set("Saved " + path.getFileName());
            return true;
        } catch (StageFileException e) {
            message.set(e.getMessage());
            return false;
        }
    }

    /**
     * The stages a line-up view shows, as they are judged: the document's line-up with its shared
     * context applied; without one, the first {@value org.armature.model.LineUp#MAX_STAGES} stages
     * under the context the first of them sets. Empty when the document has a single stage.
     */
    public List<org.armature.model.LineUpContext.Applied> lineUpStages() {
        StageDocument doc = document();
        if (doc.lineUp().isPresent()) {
            return doc.lineUp().get().applied(doc);
        }
        if (doc.stages().size() < org.armature.model.LineUp.MIN_STAGES) {
            return List.of();
        }
        List<Stage> stages = doc.stages().subList(0, Math.min(doc.stages().size(), org.armature.model.LineUp.MAX_STAGES));
        org.armature.model.LineUpContext context = org.armature.model.LineUpContext.of(stages.get(0));
        return stages.stream().map(context::applyTo).toList();
    }

    /**
     * Computes the line-up's figures in phases ({@link LineUpEvaluations}) and hands every step to
     * {@code progress} on the FX executor: at once the pending progress (nothing arrived), then the DC
     * figures of every stage, the turn-off runs with their waveforms (a few milliseconds each,
     * {@code LineUpWaveformsBench}), the turn-on runs, all on the solve executor; then each stage's
     * corner checks and yield on the analyses' executor (tens of milliseconds per stage, the bulk of the work). A newer call
     * makes the older one's results drop, so the view never shows a figure from before the change it
     * shows. A failure is said in {@link #messageProperty()}.
     *
     * @return the new evaluation's generation ({@link LineUpProgress#generation()})
     */
    public long evaluateLineUp(List<org.armature.model.LineUpContext.Applied> stages,
                               java.util.function.Consumer<LineUpProgress> progress) {
        return lineUpEvaluations.submit(stages, progress, message::set);
    }

    /** Drops the line-up evaluation under way (the view closed): its remaining phases do not run. */
    public void stopLineUpEvaluation() {
        lineUpEvaluations.cancel();
    }

    /**
     * The DC readouts of the line-up's stages on the solve executor, one warm engine per stage
     * ({@code sources}, same order and size as {@code stages}, used from that executor only), handed
     * to {@code done} on the FX executor. This is the fast path after a shared value changes: a few
     * milliseconds for four stages ({@code LineUpSharedValueBench}); the figures and waveforms of
     * {@link #evaluateLineUp} follow separately.
     */
    public void lineUpReadouts(List<org.armature.model.LineUpContext.Applied> stages, List<ReadoutSource> sources,
                               java.util.function.Consumer<List<ReadoutSource.Readouts>> done) {
        if (stages.size() != sources.size()) {
            throw new IllegalArgumentException("one readout source per stage is needed");
        }
        solveExecutor.execute(() -> {
            List<ReadoutSource.Readouts> out = new ArrayList<>();
            for (int i = 0; i < stages.size(); i++) {
                out.add(sources.get(i).compute(stages.get(i).stage()));
            }
            fxExecutor.execute(() -> done.accept(out));
        });
    }

    /** The document as it would be saved now: every stage as it stands, in tab order. */
    public StageDocument document() {
        List<Integer> indices = lineUpEditors.stream().map(editors::indexOf).filter(i -> i >= 0).toList();
        Optional<org.armature.model.LineUp> lineUp = lineUpContext.isPresent()
                && indices.size() >= org.armature.model.LineUp.MIN_STAGES
                ? Optional.of(new org.armature.model.LineUp(indices, lineUpContext.get())) : Optional.empty();
        // one hunt per document: the active stage's if it has one, else the first stage's that has
        Optional<FaultHunt> hunt = (editor.hunt().isPresent() ? Optional.of(editor)
                : editors.stream().filter(e -> e.hunt().isPresent()).findFirst())
                .map(e -> e.hunt().get().onStage(editors.indexOf(e)));
        return new StageDocument(title, editors.stream().map(Editor::stage).toList(), lineUp, hunt);
    }

    // ------------------------------------------------------------------ stages of the document

    /** Makes another stage of the document the one edited; its own selection and undo history come with it. */
    public void selectStage(int index) {
        if (index < 0 || index >= editors.size() || editors.get(index) == editor) {
            return;
        }
        editor = editors.get(index);
        preview.set(Optional.empty());
        armedKind.set(Optional.empty());
        publishDocument();
    }

    /** Adds a stage from a template after the active one and opens it. */
    public void addStage(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage st = Templates.build(t, s, d);
        insertStage(st.withName(freeName(st.name())));
    }

    /**
     * What-if in one action: adds a stage of another topology (a template with this suppressor and
     * drive) on the active stage's relay, supply, pin and contact side, puts both into the line-up
     * (the active stage's line-up when it is in one with room, else a new line-up of the two) and
     * opens the new stage. The new stage is stored with the shared settings in its parts.
     */
    public void whatIfTopology(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage st = Templates.build(t, s, d);
        whatIf(context -> context.applyTo(st).stage().withName(freeName(st.name())));
    }

    /**
     * What-if in one action: adds a copy of the active stage with one value changed (another
     * resistor value, say), named after the change, and puts both into the line-up as
     * {@link #whatIfTopology} does.
     */
    public void whatIfValue(String ref, String key, double value) {
        Stage base = editor.stage();
        Stage changed = base.updatePart(ref, p -> p.with(key, value));
        String label = base.name() + " (" + ref + " " + org.armature.render.Notation.format(value,
                base.part(ref).flatMap(p -> p.kind().param(key)).map(sp -> sp.unit().symbol()).orElse("")) + ")";
        whatIf(context -> changed.withName(freeName(label)));
    }

    /**
     * What-if in one action: the active stage's topology rebuilt with another suppressor, keeping the
     * stage's own values (and conditions) wherever the rebuilt stage has the same part (designator
     * and kind) outside the suppressors, put into the line-up as {@link #whatIfTopology} does. The
     * topology is recognised from the wiring; an unrecognised stage is said in the message.
     *
     * @return false (with a message) when the stage's topology could not be recognised
     */
    public boolean whatIfSuppressor(Suppressor suppressor) {
        Stage base = editor.stage();
        Optional<StageRoles> roles = org.armature.model.StageRecognition.of(base).roles();
        if (roles.isEmpty()) {
            message.set("Another suppressor needs a stage whose switch, relay and supply are recognised from its wiring.");
            return false;
        }
        StageTemplate t = StageTemplate.valueOf(roles.get().topology().name());
        Stage built = Templates.build(t, suppressor, roles.get().highSideDrive().orElse(HighSideDrive.LEVEL_SHIFT));
        java.util.Set<String> suppressors = new java.util.HashSet<>(roles.get().suppressorRefs());
        org.armature.model.StageRecognition.of(built).roles().ifPresent(r -> suppressors.addAll(r.suppressorRefs()));
        Stage st = built.withConditions(base.conditions());
        for (Part p : built.parts()) {
            Optional<Part> own = base.part(p.ref());
            if (own.isPresent() && own.get().kind() == p.kind() && !suppressors.contains(p.ref())) {
                st = st.withPart(new Part(p.ref(), p.kind(), own.get().values(), own.get().options(), p.placement()));
            }
        }
        String label = base.name() + " (" + suppressor.id() + ")";
        Stage changed = st;
        whatIf(context -> changed.withName(freeName(label)));
        return true;
    }

    /**
     * Changes one shared value of the document's line-up (for example the coil supply's volts): every
     * stage of the line-up is judged with it from now on; the stored stages stay as drawn. Undone by
     * {@link #undoSharedValue()}.
     *
     * @param role {@code coilSupply}, {@code relay}, {@code drivePin}, {@code contactSupply} or {@code load}
     * @return false (with a message) when there is no line-up or it does not share that role
     */
    public boolean setSharedValue(String role, String key, double value) {
        if (lineUpContext.isEmpty()) {
            message.set("The document has no line-up; line stages up first (Tools ▸ Line up against…).");
            return false;
        }
        org.armature.model.LineUpContext c = lineUpContext.get();
        Optional<org.armature.model.SharedPart> part = switch (role) {
            case "relay" -> c.relay();
            case "coilSupply" -> c.coilSupply();
            case "drivePin" -> c.drivePin();
            case "contactSupply" -> c.contactSupply();
            case "load" -> c.load();
            default -> Optional.empty();
        };
        if (part.isEmpty()) {
            message.set("The line-up shares no " + role + ".");
            return false;
        }
        org.armature.model.SharedPart changed = part.get().with(key, value);
        org.armature.model.LineUpContext next = new org.armature.model.LineUpContext(
                role.equals("relay") ? Optional.of(changed) : c.relay(),
                role.equals("coilSupply") ? Optional.of(changed) : c.coilSupply(),
                role.equals("drivePin") ? Optional.of(changed) : c.drivePin(),
                role.equals("contactSupply") ? Optional.of(changed) : c.contactSupply(),
                role.equals("load") ? Optional.of(changed) : c.load(),
                c.ambientCelsius(), c.ambientMinCelsius(), c.ambientMaxCelsius());
        return setSharedContext(next);
    }

    /** The line-up's shared context, if the document has a line-up. */
    public Optional<org.armature.model.LineUpContext> sharedContext() {
        return lineUpContext;
    }

    /**
     * Replaces the line-up's whole shared context in one step (several shared values changed at
     * once: the relay's coil figures, the supply and its tolerance, the pin, the ambient range);
     * every stage is judged with it from now on. One {@link #undoSharedValue()} restores the previous
     * context.
     *
     * @return false (with a message) when there is no line-up; true also when nothing changed
     */
    public boolean setSharedContext(org.armature.model.LineUpContext next) {
        if (lineUpContext.isEmpty()) {
            message.set("The document has no line-up; line stages up first (Tools ▸ Line up against…).");
            return false;
        }
        if (next.equals(lineUpContext.get())) {
            return true;
        }
        sharedUndo.push(lineUpContext.get());
        lineUpContext = Optional.of(next);
        stagesChanged = true;
        publishDocument();
        return true;
    }

    /** Undoes the last {@link #setSharedValue}; false when there is none. */
    public boolean undoSharedValue() {
        if (sharedUndo.isEmpty()) {
            return false;
        }
        lineUpContext = Optional.of(sharedUndo.pop());
        stagesChanged = true;
        publishDocument();
        return true;
    }

    private void whatIf(java.util.function.Function<org.armature.model.LineUpContext, Stage> make) {
        Editor from = editor;
        boolean inLineUp = lineUpContext.isPresent() && lineUpEditors.contains(from)
                && lineUpEditors.size() < org.armature.model.LineUp.MAX_STAGES;
        org.armature.model.LineUpContext context = inLineUp ? lineUpContext.get()
                : org.armature.model.LineUpContext.of(from.stage());
        insertStage(make.apply(context));
        List<Editor> members = new ArrayList<>(inLineUp ? lineUpEditors : List.of(from));
        members.add(editor);
        lineUpEditors = List.copyOf(members);
        lineUpContext = Optional.of(context);
        message.set("Line-up: " + String.join(", ", members.stream().map(e -> e.stage().name()).toList()));
    }

    /** Adds a copy of the active stage after it ("… (copy)") and opens it. */
    public void duplicateStage() {
        insertStage(editor.stage().withName(freeName(editor.stage().name() + " (copy)")));
    }

    /**
     * Moves the active stage one place earlier (-1) or later (+1) in the tab order; nothing at the
     * ends.
     */
    public void moveStage(int delta) {
        int i = editors.indexOf(editor);
        int j = i + delta;
        if (delta == 0 || j < 0 || j >= editors.size()) {
            return;
        }
        editors.remove(i);
        editors.add(j, editor);
        stagesChanged = true;
        message.set("");
        publishDocument();
    }

    /** Deletes the active stage; the last stage of a document cannot be deleted (the message says so). */
    public boolean deleteStage() {
        if (editors.size() == 1) {
            message.set("A document keeps at least one stage; add another before deleting this one.");
            return false;
        }
        int i = editors.indexOf(editor);
        String name = editor.stage().name();
        boolean hunted = editor.hunt().isPresent();
        deleted.push(new DeletedStage(editor, i));
        editors.remove(i);
        editor = editors.get(Math.min(i, editors.size() - 1));
        stagesChanged = true;
        publishDocument();
        message.set("Deleted stage " + name + (hunted ? " and the fault hunt made on it" : "")
                + " (Stage ▸ Restore deleted stage brings it back)");
        return true;
    }

    /** A stage deleted from the document, with its editor (history, selection, fault hunt) and place. */
    private record DeletedStage(Editor editor, int index) {
    }

    /** Stages deleted since the document was opened, the last on top. */
    private final java.util.ArrayDeque<DeletedStage> deleted = new java.util.ArrayDeque<>();

    /**
     * Puts the stage deleted last back where it was, with its undo history, its place in the
     * line-up and the fault hunt made on it, and opens it. Nothing (and the message says so) when no
     * stage was deleted.
     *
     * @return true when a stage was restored
     */
    public boolean restoreDeletedStage() {
        DeletedStage d = deleted.poll();
        if (d == null) {
            message.set("No stage was deleted since the document was opened.");
            return false;
        }
        editors.add(Math.min(d.index(), editors.size()), d.editor());
        editor = d.editor();
        stagesChanged = true;
        preview.set(Optional.empty());
        publishDocument();
        message.set("Restored stage " + editor.stage().name()
                + (editor.hunt().isPresent() ? " and the fault hunt made on it" : ""));
        return true;
    }

    /** Renames the active stage (an undoable step of that stage). */
    public void renameStage(String name) {
        edit(() -> editor.rename(name));
    }

    /** Changes the active stage's description (an undoable step of that stage). */
    public void describeStage(String description) {
        edit(() -> editor.describe(description));
    }

    /** Changes the active stage's own check settings (an undoable step of that stage, named by what changed). */
    public void setStageSettings(StageSettings settings) {
        edit(() -> editor.setSettings(settings));
    }

    /** Sets the active stage's corner ambient range. */
    public void setAmbientRange(double minCelsius, double maxCelsius) {
        edit(() -> editor.setAmbientRange(minCelsius, maxCelsius));
    }

    private void insertStage(Stage st) {
        int at = editors.indexOf(editor) + 1;
        Editor e = new Editor(st);
        editors.add(at, e);
        editor = e;
        stagesChanged = true;
        message.set("");
        publishDocument();
    }

    private String freeName(String base) {
        List<String> names = editors.stream().map(e -> e.stage().name()).toList();
        if (!names.contains(base)) {
            return base;
        }
        for (int k = 2; ; k++) {
            String candidate = base + " " + k;
            if (!names.contains(candidate)) {
                return candidate;
            }
        }
    }

    // ------------------------------------------------------------------ editing actions

    /** Undoes the last step of the active stage. */
    public void undo() {
        edit(editor::undo);
    }

    /** Redoes the last undone step of the active stage. */
    public void redo() {
        edit(editor::redo);
    }

    /** Arms a palette kind: the next canvas click places it. Empty disarms. */
    public void arm(Optional<PartKind> kind) {
        armedKind.set(kind);
    }

    /** Places a kind at a grid point (a click with the kind armed, or a drag from the palette). */
    public String place(PartKind kind, GridPoint at) {
        String[] ref = new String[1];
        edit(() -> ref[0] = editor.place(kind, at));
        armedKind.set(Optional.empty());
        return ref[0];
    }

    /** Selects parts and wires. */
    public void select(Selection s) {
        editor.select(s);
        selection.set(editor.selection());
    }

    /** Shows the selection moved by an offset without recording it (during a drag). */
    public void previewMove(int dx, int dy) {
        if (editor.selection().refs().isEmpty()) {
            return;
        }
        preview.set(dx == 0 && dy == 0 ? Optional.empty()
                : Optional.of(editor.moveCommand(editor.selection().refs(), dx, dy).apply(editor.stage())));
    }

    /** Ends a drag preview. */
    public void clearPreview() {
        preview.set(Optional.empty());
    }

    /** Moves the selection (drag release, arrow keys); consecutive moves of one selection merge. */
    public void moveSelection(int dx, int dy) {
        preview.set(Optional.empty());
        edit(() -> editor.moveSelection(dx, dy));
    }

    /** Rotates the selected parts a quarter turn. */
    public void rotate() {
        edit(editor::rotateSelection);
    }

    /** Mirrors the selected parts. */
    public void mirror() {
        edit(editor::mirrorSelection);
    }

    /** Deletes the selection with attached wires. */
    public void delete() {
        edit(editor::deleteSelection);
    }

    /** Copies the selection. */
    public void copy() {
        clipboard = editor.copy();
    }

    /** Copies and deletes the selection. */
    public void cut() {
        copy();
        delete();
    }

    /** Pastes the last copy where it touches nothing of the stage. */
    public void paste() {
        edit(() -> editor.paste(clipboard));
    }

    /** Draws an orthogonally routed wire. */
    public void drawWire(GridPoint from, GridPoint to) {
        edit(() -> editor.drawWire(from, to));
    }

    /** Sets a part parameter (part sheet). */
    public void setValue(String ref, String key, double value) {
        edit(() -> editor.setValue(ref, key, value));
    }

    /** Steps a parameter through the E24 series; consecutive steps of one field are one undo step. */
    public void stepPreferred(String ref, String key, int steps) {
        edit(() -> editor.stepPreferred(ref, key, steps));
    }

    /** Sets a part option (part sheet). */
    public void setOption(String ref, String key, String value) {
        edit(() -> editor.setOption(ref, key, value));
    }

    /** Sets the drive pin state. */
    public void setPinHigh(boolean high) {
        edit(() -> editor.setPinHigh(high));
    }

    /** Sets the nominal ambient; slider drags merge into one step. */
    public void setAmbient(double celsius) {
        edit(() -> editor.setAmbient(celsius));
    }

    /**
     * Names the net at a part's pin as a test point (adds one, or renames the one there), undoably.
     * A name that is not a net name changes nothing and the message says what is expected.
     *
     * @return true when the name was taken
     */
    public boolean nameTestPoint(String ref, String pin, String net) {
        String n = net.strip();
        if (n.isEmpty()) {
            edit(() -> editor.stage().testPoints().stream().filter(t -> t.ref().equals(ref) && t.pin().equals(pin))
                    .findFirst().ifPresent(t -> editor.removeTestPoint(t.net())));
            return true;
        }
        if (!n.matches("[A-Za-z][A-Za-z0-9_\\-]*")) {
            message.set("A test point name starts with a letter and uses letters, digits, _ or -; \"" + n
                    + "\" does not.");
            return false;
        }
        edit(() -> editor.nameTestPoint(ref, pin, n));
        return true;
    }

    /**
     * Gives a part another designator, undoably. A designator that is not one, or is taken, changes
     * nothing and the message says why.
     *
     * @return true when the part was renamed
     */
    public boolean renamePart(String ref, String newRef) {
        try {
            edit(() -> editor.renamePart(ref, newRef));
            return true;
        } catch (IllegalArgumentException e) {
            message.set(e.getMessage());
            return false;
        }
    }

    /** Removes the test point of a net name, undoably. */
    public void removeTestPoint(String net) {
        edit(() -> editor.removeTestPoint(net));
    }

    /**
     * The coil supply: the supply the topology check finds feeding the coil, else the first supply.
     */
    public Optional<Part> coilSupply() {
        Stage st = editor.stage();
        if (coilSupplyOf != st) {
            // the toolbar asks on every stage change; recognise once per stage version
            Optional<String> ref = TopologyCheck.recognise(st).flatMap(StageRoles::coilSupplyRef);
            coilSupplyRef = ref.or(() -> st.firstOfKind(PartKind.SUPPLY).map(Part::ref));
            coilSupplyOf = st;
        }
        return coilSupplyRef.flatMap(st::part);
    }

    /** Sets the coil supply's voltage; slider drags merge into one step. No supply: nothing. */
    public void setSupplyVolts(double volts) {
        coilSupply().ifPresent(p -> edit(() -> editor.setValueMerging(p.ref(), ParamKeys.VOLTS, volts, "supply:" + p.ref())));
    }

    /** Writes the sizing assistant's proposals back as one undoable step. */
    public void applySuggestions(List<Suggestion> suggestions) {
        List<Editor.ValueChange> changes = new ArrayList<>();
        for (Suggestion s : suggestions) {
            if (editor.stage().part(s.ref()).isPresent()) {
                changes.add(new Editor.ValueChange(s.ref(), s.paramKey(), s.value()));
            }
        }
        edit(() -> editor.setValues("Size base network", changes));
    }

    /**
     * Writes a datasheet fit's parameters as one undoable step ("Fit Q1 to datasheet"). A refused fit
     * changes nothing and says why in {@link #messageProperty()}.
     *
     * @return true when the fit was applied
     */
    public boolean applyDatasheetFit(String ref, DatasheetFit.Result fit) {
        if (!fit.fitted() || editor.stage().part(ref).isEmpty()) {
            message.set(fit.problem().orElse("There is no part " + ref + "."));
            return false;
        }
        edit(() -> editor.setValues("Fit " + ref + " to datasheet", fit.changes()));
        message.set("Fitted " + ref + " to the datasheet figures");
        return true;
    }

    /** Executes a prepared command. */
    public void execute(EditCommand c) {
        edit(() -> editor.execute(c));
    }

    /** Shows or hides one kind of readout. */
    public void showReadout(ReadoutKind kind, boolean show) {
        EnumSet<ReadoutKind> s = EnumSet.noneOf(ReadoutKind.class);
        s.addAll(shownReadouts.get());
        if (show) {
            s.add(kind);
        } else {
            s.remove(kind);
        }
        shownReadouts.set(Set.copyOf(s));
    }

    /** Sets the user message (views report export results through it). */
    public void say(String text) {
        message.set(text);
    }

    // ------------------------------------------------------------------ internals

    private void load(StageDocument doc) {
        editors.clear();
        for (int i = 0; i < doc.stages().size(); i++) {
            int index = i;
            editors.add(new Editor(doc.stages().get(i), doc.faultHunt().filter(h -> h.stageIndex() == index)));
        }
        editor = editors.get(0);
        title = doc.title();
        lineUpEditors = doc.lineUp().map(l -> l.stageIndices().stream().map(editors::get).toList()).orElse(List.of());
        lineUpContext = doc.lineUp().map(org.armature.model.LineUp::context);
        sharedUndo.clear();
        deleted.clear();
        stagesChanged = false;
        preview.set(Optional.empty());
        publishDocument();
    }

    /**
     * Runs an edit of the active stage and publishes the document state; a changed stage is
     * submitted for evaluation. Any message about an earlier state is cleared first.
     */
    private void edit(Runnable action) {
        Stage before = editor.stage();
        action.run();
        if (!before.equals(editor.stage())) {
            message.set("");
        }
        publishDocument();
    }

    private void publishDocument() {
        Stage now = editor.stage();
        List<String> names = editors.stream().map(e -> e.stage().name()).toList();
        if (!names.equals(stageNames.get())) {
            stageNames.set(names);
        }
        activeStage.set(editors.indexOf(editor));
        Optional<FaultHunt> h = editor.hunt().map(x -> x.onStage(editors.indexOf(editor)));
        if (!h.equals(faultHunt.get())) {
            faultHunt.set(h);
        }
        Stage was = stage.get();
        stage.set(now);
        selection.set(editor.selection());
        dirty.set(stagesChanged || editors.stream().anyMatch(e -> e.history().isDirty()));
        canUndo.set(editor.history().canUndo());
        canRedo.set(editor.history().canRedo());
        undoLabel.set(editor.history().undoLabel().map(l -> "Undo " + l).orElse("Undo"));
        redoLabel.set(editor.history().redoLabel().map(l -> "Redo " + l).orElse("Redo"));
        Evaluation shown = evaluation.get();
        List<org.armature.analysis.faults.Fault> valid = validFaults(now);
        if (was != now || shown == null || submittedFor != now || !valid.equals(submittedFaults)
                || valid.isEmpty() && shown.stage() != now) {
            Stage evaluated = now;
            faultedStage = null;
            if (!valid.isEmpty()) {
                try {
                    Faulted f = inject(now, valid);
                    evaluated = f.stage();
                    faultedStage = evaluated;
                    faultMarks = f.marks();
                } catch (IllegalArgumentException | IllegalStateException ex) {
                    message.set("The faults could not be injected: " + ex.getMessage());
                    valid = List.of();
                    faults.set(valid);
                }
            }
            submittedFor = now;
            submittedFaults = valid;
            evaluations.submit(evaluated);
        }
    }

    private static Annotations filter(Annotations a, Set<ReadoutKind> shown) {
        if (shown.size() == ReadoutKind.values().length) {
            return a;
        }
        return new Annotations(
                shown.contains(ReadoutKind.VOLTAGES) ? a.voltages() : List.of(),
                shown.contains(ReadoutKind.CURRENTS) ? a.currents() : List.of(),
                shown.contains(ReadoutKind.BADGES) ? a.badges() : List.of(),
                shown.contains(ReadoutKind.GAUGES) ? a.gauges() : List.of(),
                shown.contains(ReadoutKind.MARKERS) ? a.markers() : List.of(), a.readings());
    }
}
