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
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.armature.model.StageRoles;
import org.armature.analysis.Suggestion;
import org.armature.analysis.TopologyCheck;
import org.armature.io.StageFileException;
import org.armature.model.Finding;
import org.armature.model.GridPoint;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.Validator;
import org.armature.render.Annotations;
import org.armature.render.Selection;
import org.armature.ui.edit.EditCommand;
import org.armature.ui.edit.Editor;

/**
 * The editor window's state and actions. Views bind to the read-only properties and call the action
 * methods; every document change goes through the {@link Editor}'s commands.
 *
 * <p>Readouts are computed by the {@link ReadoutSource} on the injected solve executor, through a
 * {@link LatestWins}: while one solve runs, further edits only replace the one waiting, so a slider
 * drag never builds a backlog and the FX thread never waits. The result is handed back through the
 * FX executor and dropped if the stage changed meanwhile. The verdicts and edges ({@link Analyses})
 * run the same way on their own executor, debounced. The application passes background executors
 * and {@code Platform::runLater}; tests pass same-thread or hand-stepped executors.
 */
public final class EditorViewModel {

    /** Which readouts to show (View menu toggles). */
    public enum ReadoutKind { VOLTAGES, CURRENTS, BADGES, GAUGES, MARKERS }

    private final Editor editor;
    private final DocumentStore store;
    private final ReadoutSource readouts;
    private final Executor fxExecutor;
    private final LatestWins solves;
    private final Analyses analyses;
    private final LatestWins verdictRuns;
    private final LatestWins edgeRuns;
    private StageDocument document;
    private long generation;
    private Annotations rawAnnotations = Annotations.NONE;
    private List<Finding> validation = List.of();
    private List<Finding> solveFindings = List.of();
    private Stage coilSupplyOf;
    private Optional<String> coilSupplyRef = Optional.empty();

    private final ReadOnlyObjectWrapper<Stage> stage = new ReadOnlyObjectWrapper<>(this, "stage");
    private final ReadOnlyObjectWrapper<Optional<Stage>> preview = new ReadOnlyObjectWrapper<>(this, "preview", Optional.empty());
    private final ReadOnlyObjectWrapper<Selection> selection = new ReadOnlyObjectWrapper<>(this, "selection", Selection.EMPTY);
    private final ReadOnlyObjectWrapper<Annotations> annotations = new ReadOnlyObjectWrapper<>(this, "annotations", Annotations.NONE);
    private final ReadOnlyObjectWrapper<List<Finding>> findings = new ReadOnlyObjectWrapper<>(this, "findings", List.of());
    private final ReadOnlyObjectWrapper<Optional<Path>> file = new ReadOnlyObjectWrapper<>(this, "file", Optional.empty());
    private final ReadOnlyObjectWrapper<Set<ReadoutKind>> shownReadouts =
            new ReadOnlyObjectWrapper<>(this, "shownReadouts", EnumSet.allOf(ReadoutKind.class));
    private final ReadOnlyObjectWrapper<Optional<PartKind>> armedKind = new ReadOnlyObjectWrapper<>(this, "armedKind", Optional.empty());
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty");
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo");
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper(this, "canRedo");
    private final ReadOnlyStringWrapper undoLabel = new ReadOnlyStringWrapper(this, "undoLabel", "Undo");
    private final ReadOnlyStringWrapper redoLabel = new ReadOnlyStringWrapper(this, "redoLabel", "Redo");
    private final ReadOnlyStringWrapper solverStatus = new ReadOnlyStringWrapper(this, "solverStatus", "");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final javafx.beans.property.ReadOnlyLongWrapper shownGeneration =
            new javafx.beans.property.ReadOnlyLongWrapper(this, "shownGeneration", 0);
    private final ReadOnlyObjectWrapper<Analyses.Verdicts> verdicts =
            new ReadOnlyObjectWrapper<>(this, "verdicts", Analyses.Verdicts.NONE);
    private final ReadOnlyObjectWrapper<Analyses.Edges> edges = new ReadOnlyObjectWrapper<>(this, "edges", Analyses.Edges.NONE);
    private final ReadOnlyBooleanWrapper verdictsRunning = new ReadOnlyBooleanWrapper(this, "verdictsRunning");
    private final ReadOnlyBooleanWrapper edgesRunning = new ReadOnlyBooleanWrapper(this, "edgesRunning");
    private Editor.Clip clipboard = new Editor.Clip(List.of(), List.of());

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
        this.editor = new Editor(initial);
        this.store = store;
        this.readouts = readouts;
        this.fxExecutor = fxExecutor;
        this.solves = new LatestWins(solveExecutor);
        this.analyses = analyses;
        this.verdictRuns = new LatestWins(analyses.executor(), analyses.settleMillis());
        this.edgeRuns = new LatestWins(analyses.executor(), analyses.settleMillis());
        this.document = StageDocument.of(initial);
        refresh();
    }

    // ------------------------------------------------------------------ properties

    /** The stage being edited. */
    public ReadOnlyObjectProperty<Stage> stageProperty() {
        return stage.getReadOnlyProperty();
    }

    /** The stage as it stands. */
    public Stage stage() {
        return stage.get();
    }

    /** A stage to show instead of the document while a drag is in progress; empty otherwise. */
    public ReadOnlyObjectProperty<Optional<Stage>> previewProperty() {
        return preview.getReadOnlyProperty();
    }

    /** The stage the canvas shows: the drag preview if any, else the document's. */
    public Stage shownStage() {
        return preview.get().orElse(stage.get());
    }

    /** The selection. */
    public ReadOnlyObjectProperty<Selection> selectionProperty() {
        return selection.getReadOnlyProperty();
    }

    /** Readouts from the last finished solve of the present stage, filtered by the View toggles. */
    public ReadOnlyObjectProperty<Annotations> annotationsProperty() {
        return annotations.getReadOnlyProperty();
    }

    /** Validation findings of the present stage. */
    public ReadOnlyObjectProperty<List<Finding>> findingsProperty() {
        return findings.getReadOnlyProperty();
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

    /** True when the document has unsaved changes. */
    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    /** True when there is something to undo. */
    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    /** True when there is something to redo. */
    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    /** "Undo Move Q1". */
    public ReadOnlyStringProperty undoLabelProperty() {
        return undoLabel.getReadOnlyProperty();
    }

    /** "Redo Move Q1". */
    public ReadOnlyStringProperty redoLabelProperty() {
        return redoLabel.getReadOnlyProperty();
    }

    /** The solver's state line. */
    public ReadOnlyStringProperty solverStatusProperty() {
        return solverStatus.getReadOnlyProperty();
    }

    /** The last message for the user (a failed save, an export written). */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /**
     * The generation of the readouts shown: each edit (and each readout toggle) makes a new one; the
     * annotations property carries those of this generation. Latency probes compare it with
     * {@link #requestedGeneration()}.
     */
    public javafx.beans.property.ReadOnlyLongProperty shownGenerationProperty() {
        return shownGeneration.getReadOnlyProperty();
    }

    /** The generation of the last solve asked for. */
    public long requestedGeneration() {
        return generation;
    }

    /** The verdicts of the present stage (the last finished run; may lag behind edits). */
    public ReadOnlyObjectProperty<Analyses.Verdicts> verdictsProperty() {
        return verdicts.getReadOnlyProperty();
    }

    /** The edges of the present stage (the last finished run; may lag behind edits). */
    public ReadOnlyObjectProperty<Analyses.Edges> edgesProperty() {
        return edges.getReadOnlyProperty();
    }

    /** True while the checks of a newer stage are being run. */
    public ReadOnlyBooleanProperty verdictsRunningProperty() {
        return verdictsRunning.getReadOnlyProperty();
    }

    /** True while the edges of a newer stage are being run. */
    public ReadOnlyBooleanProperty edgesRunningProperty() {
        return edgesRunning.getReadOnlyProperty();
    }

    /** The file name for the title and status bar ("untitled" before the first save). */
    public String fileName() {
        return file.get().map(p -> p.getFileName().toString()).orElse("untitled");
    }

    // ------------------------------------------------------------------ document actions

    /** Replaces the document by a template variant (history cleared, untitled). */
    public void newFromTemplate(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage st = Templates.build(t, s, d);
        document = StageDocument.of(st);
        editor.load(st);
        file.set(Optional.empty());
        refresh();
    }

    /** Opens a stage file; on failure the document stays and {@link #messageProperty()} says why. */
    public boolean open(Path path) {
        try {
            StageDocument doc = store.load(path);
            document = doc;
            editor.load(doc.first());
            file.set(Optional.of(path));
            message.set("Opened " + path.getFileName());
            refresh();
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
        document = doc;
        editor.load(doc.first());
        editor.history().markUnsaved();
        file.set(path);
        message.set(note);
        refresh();
    }

    /** Saves to the present file; false when there is none yet (use {@link #saveAs}) or saving failed. */
    public boolean save() {
        return file.get().map(this::saveAs).orElse(false);
    }

    /** Saves to a file and makes it the document's file. */
    public boolean saveAs(Path path) {
        try {
            document = document.withStage(0, editor.stage());
            store.save(document, path);
            editor.history().markSaved();
            file.set(Optional.of(path));
            message.set("Saved " + path.getFileName());
            refresh();
            return true;
        } catch (StageFileException e) {
            message.set(e.getMessage());
            return false;
        }
    }

    /** The document as it would be saved now. */
    public StageDocument document() {
        return document.withStage(0, editor.stage());
    }

    // ------------------------------------------------------------------ editing actions

    /** Undoes the last step. */
    public void undo() {
        editor.undo();
        refresh();
    }

    /** Redoes the last undone step. */
    public void redo() {
        editor.redo();
        refresh();
    }

    /** Arms a palette kind: the next canvas click places it. Empty disarms. */
    public void arm(Optional<PartKind> kind) {
        armedKind.set(kind);
    }

    /** Places the armed kind (or a given kind) at a grid point. */
    public String place(PartKind kind, GridPoint at) {
        String ref = editor.place(kind, at);
        armedKind.set(Optional.empty());
        refresh();
        return ref;
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

    /** Shows another stage in place of the document (editing previews); empty ends it. */
    public void clearPreview() {
        preview.set(Optional.empty());
    }

    /** Moves the selection (drag release, arrow keys); consecutive moves of one selection merge. */
    public void moveSelection(int dx, int dy) {
        preview.set(Optional.empty());
        editor.moveSelection(dx, dy);
        refresh();
    }

    /** Rotates the selected parts a quarter turn. */
    public void rotate() {
        editor.rotateSelection();
        refresh();
    }

    /** Mirrors the selected parts. */
    public void mirror() {
        editor.mirrorSelection();
        refresh();
    }

    /** Deletes the selection with attached wires. */
    public void delete() {
        editor.deleteSelection();
        refresh();
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

    /** Pastes the last copy. */
    public void paste() {
        editor.paste(clipboard);
        refresh();
    }

    /** Draws an orthogonally routed wire. */
    public void drawWire(GridPoint from, GridPoint to) {
        editor.drawWire(from, to);
        refresh();
    }

    /** Sets a part parameter (part sheet). */
    public void setValue(String ref, String key, double value) {
        editor.setValue(ref, key, value);
        refresh();
    }

    /** Steps a parameter through the E24 series. */
    public void stepPreferred(String ref, String key, int steps) {
        editor.stepPreferred(ref, key, steps);
        refresh();
    }

    /** Sets a part option (part sheet). */
    public void setOption(String ref, String key, String value) {
        editor.setOption(ref, key, value);
        refresh();
    }

    /** Sets the drive pin state. */
    public void setPinHigh(boolean high) {
        editor.setPinHigh(high);
        refresh();
    }

    /** Sets the nominal ambient; slider drags merge into one step. */
    public void setAmbient(double celsius) {
        editor.setAmbient(celsius);
        refresh();
    }

    /**
     * The coil supply: the supply the topology check finds feeding the coil, else the first supply.
     */
    public Optional<Part> coilSupply() {
        Stage st = editor.stage();
        if (coilSupplyOf != st) {
            Optional<String> ref = TopologyCheck.recognise(st).flatMap(StageRoles::coilSupplyRef);
            coilSupplyRef = ref.or(() -> st.firstOfKind(PartKind.SUPPLY).map(Part::ref));
            coilSupplyOf = st;
        }
        return coilSupplyRef.flatMap(st::part);
    }

    /** Sets the coil supply's voltage; slider drags merge into one step. No supply: nothing. */
    public void setSupplyVolts(double volts) {
        coilSupply().ifPresent(p -> {
            editor.setValueMerging(p.ref(), "volts", volts, "supply:" + p.ref());
            refresh();
        });
    }

    /** Writes the sizing assistant's proposals back as one undoable step. */
    public void applySuggestions(List<Suggestion> suggestions) {
        List<Editor.ValueChange> changes = new ArrayList<>();
        for (Suggestion s : suggestions) {
            if (editor.stage().part(s.ref()).isPresent()) {
                changes.add(new Editor.ValueChange(s.ref(), s.paramKey(), s.value()));
            }
        }
        editor.setValues("Size base network", changes);
        refresh();
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
        editor.setValues("Fit " + ref + " to datasheet", fit.changes());
        message.set("Fitted " + ref + " to the datasheet figures");
        refresh();
        return true;
    }

    /** Executes a prepared command. */
    public void execute(EditCommand c) {
        editor.execute(c);
        refresh();
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
        annotations.set(filter(rawAnnotations, shownReadouts.get()));
    }

    /** Sets the user message (views report export results through it). */
    public void say(String text) {
        message.set(text);
    }

    // ------------------------------------------------------------------ internals

    private void refresh() {
        Stage before = stage.get();
        stage.set(editor.stage());
        selection.set(editor.selection());
        dirty.set(editor.history().isDirty());
        canUndo.set(editor.history().canUndo());
        canRedo.set(editor.history().canRedo());
        undoLabel.set(editor.history().undoLabel().map(l -> "Undo " + l).orElse("Undo"));
        redoLabel.set(editor.history().redoLabel().map(l -> "Redo " + l).orElse("Redo"));
        validation = Validator.validate(editor.stage());
        publishFindings();
        if (before == null || !before.equals(editor.stage())) {
            requestReadouts();
            requestAnalyses();
        }
    }

    private void publishFindings() {
        List<Finding> all = new ArrayList<>(validation);
        for (Finding f : solveFindings) {
            if (!all.contains(f)) {
                all.add(f);
            }
        }
        findings.set(List.copyOf(all));
    }

    private void requestReadouts() {
        long gen = ++generation;
        Stage s = editor.stage();
        if (rawAnnotations.isEmpty()) {
            solverStatus.set("Solving…");
        }
        solves.submit(() -> {
            ReadoutSource.Readouts r = readouts.compute(s);
            fxExecutor.execute(() -> {
                if (gen == generation) {
                    rawAnnotations = r.annotations();
                    solveFindings = r.findings();
                    annotations.set(filter(rawAnnotations, shownReadouts.get()));
                    solverStatus.set(r.status());
                    publishFindings();
                    shownGeneration.set(gen);
                }
            });
        });
    }

    private void requestAnalyses() {
        if (!analyses.active()) {
            return;
        }
        long gen = generation;
        Stage s = editor.stage();
        boolean solvable = validation.stream().noneMatch(f -> f.severity() == Severity.ERROR);
        verdictsRunning.set(true);
        edgesRunning.set(true);
        verdictRuns.submit(() -> {
            Analyses.Verdicts v = solvable ? analyses.verdicts().compute(s)
                    : new Analyses.Verdicts(Optional.empty(), "Not judged: the stage has errors");
            fxExecutor.execute(() -> {
                if (gen == generation) {
                    verdicts.set(v);
                    verdictsRunning.set(false);
                }
            });
        });
        edgeRuns.submit(() -> {
            Analyses.Edges e = solvable ? analyses.edges().compute(s)
                    : new Analyses.Edges(Optional.empty(), Optional.empty(), "Not run: the stage has errors");
            fxExecutor.execute(() -> {
                if (gen == generation) {
                    edges.set(e);
                    edgesRunning.set(false);
                }
            });
        });
    }

    private static Annotations filter(Annotations a, Set<ReadoutKind> shown) {
        return new Annotations(
                shown.contains(ReadoutKind.VOLTAGES) ? a.voltages() : List.of(),
                shown.contains(ReadoutKind.CURRENTS) ? a.currents() : List.of(),
                shown.contains(ReadoutKind.BADGES) ? a.badges() : List.of(),
                shown.contains(ReadoutKind.GAUGES) ? a.gauges() : List.of(),
                shown.contains(ReadoutKind.MARKERS) ? a.markers() : List.of());
    }
}
