package org.armature.ui;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.armature.analysis.faults.Diagnosis;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.FaultKind;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.Priors;
import org.armature.analysis.faults.Reading;
import org.armature.analysis.faults.SavedHunt;
import org.armature.analysis.faults.Symptom;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.render.Notation;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * The window's fault hunt: the technician's symptom, meter and readings, the prior weights, the
 * candidates ranked by posterior probability and the next measurement with its expected gain in bits
 * ({@link Diagnosis#rank}, the same ranking as {@code armature diagnose}).
 *
 * <p>What is entered is the document's fault hunt ({@link EditorViewModel#faultHuntProperty()}):
 * every change is an undoable step of the stage, saved with the document and restored on open. The
 * panel is a view of it: readings are entered here ({@code NET@high=VOLTS}), or on the drawing by
 * clicking a net ({@link #offerReading}); the ranking follows the hunt through {@link SavedHunt}'s
 * reading of the meter, priors, symptom and readings. The dictionary is that of the active stage as
 * drawn with the hunt's meter, built on a background thread whenever the stage or the meter's
 * settings change; readings at probe points the stage no longer has stay in the hunt (nothing is
 * lost) and are left out of the ranking, marked in the table.
 */
public final class DiagnosisPanel extends VBox {

    /** Width of the wrapped text lines of the editor at a net, pixels. */
    private static final double EDITOR_TEXT_WIDTH = 290;

    /** Candidates listed. */
    public static final int SHOWN = 5;
    /** What the ranking says while the stage's dictionary is being built. */
    public static final String BUILDING = "Building the fault dictionary of this stage…";
    /** Where the default prior weights come from, as said under the table. */
    public static final String PRIOR_SOURCE = "Defaults: per part class and fault kind, "
            + org.armature.analysis.faults.PriorTable.SOURCE + " (see docs/fault-priors.md); the healthy stage "
            + "weighs " + (int) Priors.DEFAULT_NONE_WEIGHT + ". A weight set here replaces the table's for every part "
            + "of that kind; clear the field to go back to the table. Changed weights are saved with the document.";

    private final EditorViewModel vm;
    private final TextField entry = new TextField();
    private final ChoiceBox<String> symptom = new ChoiceBox<>();
    private final TableView<Row> table = new TableView<>();
    private final Label ranking = new Label();
    private final Label next = new Label();
    private final Label error = new Label();
    private final Label elsewhere = new Label();
    private final Label dictionaryStatus = new Label();
    private final TextField meterOhms = new TextField();
    private final TextField meterCounts = new TextField();
    private final TextField meterPercent = new TextField();
    private final TextField meterDigits = new TextField();
    private final Map<String, TextField> priorFields = new LinkedHashMap<>();
    private final ReadOnlyObjectWrapper<Optional<Diagnosis.Result>> result =
            new ReadOnlyObjectWrapper<>(this, "result", Optional.empty());
    private boolean active;
    private boolean syncing;
    /** The stage and meter of the dictionary held, and the dictionary. */
    private Stage dictionaryOf;
    private Meter dictionaryMeter;
    private FaultDictionary dictionary;
    /** The stage and meter whose dictionary is being built in the background, if any. */
    private Stage buildingFor;
    private Meter buildingMeter;
    private int builds;
    private final Executor background;

    /** The builds' own low-priority thread: a dictionary takes tens of milliseconds, never on the FX thread. */
    public static final Executor BACKGROUND = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "armature-fault-dictionary");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        return t;
    });

    /** One row of the readings table. */
    public record Row(String net, String state, String volts, String note) {
    }

    /** A panel for the view model's active stage, building its dictionaries on {@link #BACKGROUND}. */
    public DiagnosisPanel(EditorViewModel vm) {
        this(vm, BACKGROUND);
    }

    /**
     * A panel for the view model's active stage.
     *
     * @param background where the fault dictionaries are built; results come back on the FX thread
     */
    public DiagnosisPanel(EditorViewModel vm, Executor background) {
        super(6);
        this.vm = vm;
        this.background = background;
        setPadding(new Insets(6));
        entry.setId("diag-reading");
        entry.setPromptText("switch@high=11.9");
        entry.setTooltip(new Tooltip("A reading: NET@high=VOLTS or NET@low=VOLTS, or click a net on the drawing"));
        HBox.setHgrow(entry, Priority.ALWAYS);
        Button add = new Button("Add");
        add.setId("diag-add");
        add.setOnAction(e -> addReading());
        entry.setOnAction(e -> addReading());
        Button remove = new Button("Remove selected");
        remove.setId("diag-remove");
        remove.setTooltip(new Tooltip("Remove the reading selected in the table"));
        remove.setOnAction(e -> {
            Row r = table.getSelectionModel().getSelectedItem();
            if (r != null) {
                vm.removeReading(r.net(), r.state().equals("high"));
            }
        });
        Button clear = new Button("Clear readings");
        clear.setId("diag-clear");
        clear.setTooltip(new Tooltip("Remove every reading (undoable)"));
        clear.setOnAction(e -> vm.clearReadings());
        symptom.setId("diag-symptom");
        symptom.getItems().add("no symptom");
        for (Symptom s : Symptom.values()) {
            symptom.getItems().add(s.id());
        }
        symptom.setValue("no symptom");
        symptom.valueProperty().addListener((o, a, b) -> {
            if (!syncing && b != null) {
                Optional<String> word = b.equals("no symptom") ? Optional.empty() : Optional.of(b);
                if (!word.equals(vm.huntOrStart().symptom()) && !vm.setSymptom(word)) {
                    sync();
                }
            }
        });
        table.setId("diag-readings");
        Label none = new Label("No readings yet: type one above or click a net on the drawing.");
        none.setWrapText(true);
        table.setPlaceholder(none);
        table.getColumns().add(column("Point", Row::net, 90));
        table.getColumns().add(column("Pin", Row::state, 44));
        table.getColumns().add(column("Reading", Row::volts, 70));
        table.getColumns().add(column("", Row::note, 90));
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.setFixedCellSize(24);
        table.setPrefHeight(24 * 4 + 30);
        table.setMinHeight(24 * 2 + 30);
        ranking.setId("diag-ranking");
        ranking.setWrapText(true);
        next.setId("diag-next");
        next.setWrapText(true);
        error.setId("diag-error");
        error.setWrapText(true);
        error.getStyleClass().add("status-message");
        elsewhere.setId("diag-elsewhere");
        elsewhere.setWrapText(true);
        elsewhere.getStyleClass().add("status-message");
        dictionaryStatus.setId("diag-dictionary");
        dictionaryStatus.setWrapText(true);
        HBox symptomRow = new HBox(6, new Label("Symptom"), symptom);
        symptomRow.setAlignment(Pos.CENTER_LEFT);
        HBox entryRow = new HBox(4, entry, add);
        HBox tableButtons = new HBox(4, remove, clear);
        for (Label l : List.of(error, elsewhere, dictionaryStatus)) {
            // an empty message takes no room
            l.managedProperty().bind(l.textProperty().isNotEmpty());
            l.visibleProperty().bind(l.textProperty().isNotEmpty());
        }
        Label readingsTitle = bold("Readings");
        // what is found first, then what was entered, then the settings (collapsed)
        getChildren().addAll(elsewhere, symptomRow, entryRow, error, ranking, next, readingsTitle, table, tableButtons,
                meterPane(), priorsPane(), dictionaryStatus);
        vm.stageProperty().addListener((o, a, b) -> update());
        vm.faultHuntProperty().addListener((o, a, b) -> update());
        vm.activeStageProperty().addListener((o, a, b) -> update());
        ranking.setText("");
        sync();
    }

    private static TableColumn<Row, String> column(String title, java.util.function.Function<Row, String> value, double width) {
        TableColumn<Row, String> c = new TableColumn<>(title);
        c.setCellValueFactory(d -> new javafx.beans.property.ReadOnlyStringWrapper(value.apply(d.getValue())));
        c.setPrefWidth(width);
        c.setSortable(false);
        return c;
    }

    private TitledPane meterPane() {
        meterOhms.setId("diag-meter-ohms");
        meterCounts.setId("diag-meter-counts");
        meterPercent.setId("diag-meter-percent");
        meterDigits.setId("diag-meter-digits");
        meterOhms.setTooltip(new Tooltip("The meter's input resistance on its volts ranges, for example 10M or 1M; it loads each net probed"));
        meterCounts.setTooltip(new Tooltip("The display's counts, for example 4000 or 6000"));
        meterPercent.setTooltip(new Tooltip("Accuracy: percent of the reading, for example 1 or 0.5"));
        meterDigits.setTooltip(new Tooltip("Accuracy: digits of the range's last place, for example 2"));
        GridPane g = new GridPane();
        g.setHgap(6);
        g.setVgap(4);
        g.addRow(0, new Label("Input resistance"), meterOhms, new Label("Ω"));
        g.addRow(1, new Label("Counts"), meterCounts);
        g.addRow(2, new Label("Accuracy ±("), meterPercent, new Label("% +"));
        g.addRow(3, new Label(""), meterDigits, new Label("digits)"));
        for (TextField f : List.of(meterOhms, meterCounts, meterPercent, meterDigits)) {
            f.setPrefColumnCount(6);
            f.setOnAction(e -> commitMeter());
            f.focusedProperty().addListener((o, was, now) -> {
                if (!now) {
                    commitMeter();
                }
            });
        }
        Button reset = new Button("Default meter");
        reset.setId("diag-meter-reset");
        reset.setTooltip(new Tooltip("10 MΩ, 4000 counts, ±(1 % + 2 digits): a common handheld meter"));
        reset.setOnAction(e -> vm.setMeter(FaultHunt.MeterSetting.DEFAULT));
        TitledPane p = new TitledPane("Meter", new VBox(4, g, reset));
        p.setId("diag-meter-pane");
        p.setExpanded(false);
        return p;
    }

    private TitledPane priorsPane() {
        GridPane g = new GridPane();
        g.setHgap(6);
        g.setVgap(2);
        List<String> kinds = new ArrayList<>();
        kinds.add(FaultHunt.NONE);
        for (FaultKind k : FaultKind.values()) {
            kinds.add(k.id());
        }
        int row = 0;
        g.addRow(row++, bold("Fault kind"), bold("Weight"), bold("Default"));
        for (String kind : kinds) {
            TextField f = new TextField();
            f.setId("diag-prior-" + kind);
            f.setPrefColumnCount(5);
            f.setOnAction(e -> commitPrior(kind, f));
            f.focusedProperty().addListener((o, was, now) -> {
                if (!now) {
                    commitPrior(kind, f);
                }
            });
            priorFields.put(kind, f);
            g.addRow(row++, new Label(kind.equals(FaultHunt.NONE) ? "none (healthy)" : kind), f,
                    new Label(tableWeights(kind)));
        }
        Button reset = new Button("Reset to defaults");
        reset.setId("diag-priors-reset");
        reset.setOnAction(e -> vm.resetPriorWeights());
        Label source = new Label(PRIOR_SOURCE);
        source.setId("diag-priors-source");
        source.setWrapText(true);
        source.getStyleClass().add("status-message");
        TitledPane p = new TitledPane("Prior weights", new VBox(4, g, reset, source));
        p.setId("diag-priors-pane");
        p.setExpanded(false);
        p.setTooltip(new Tooltip(PRIOR_SOURCE));
        return p;
    }

    private static Label bold(String s) {
        Label l = new Label(s);
        l.setStyle("-fx-font-weight: bold");
        return l;
    }

    /**
     * The default weight of a fault kind's word: the healthy stage's for {@link FaultHunt#NONE}; NaN
     * for a fault kind, whose default is the handbook table's per part class ({@code PriorTable}).
     */
    static double defaultWeight(String kind) {
        return kind.equals(FaultHunt.NONE) ? Priors.DEFAULT.noneWeight() : Double.NaN;
    }

    /** The table's weights of a fault kind over the part classes that have it, as "a–b" or "a". */
    static String tableWeights(String kind) {
        if (kind.equals(FaultHunt.NONE)) {
            return weightText(Priors.DEFAULT_NONE_WEIGHT);
        }
        java.util.DoubleSummaryStatistics st = org.armature.analysis.faults.PriorTable.rows().stream()
                .filter(r -> r.kind().id().equals(kind))
                .mapToDouble(org.armature.analysis.faults.PriorTable.Row::weight).summaryStatistics();
        if (st.getCount() == 0) {
            return "table";
        }
        return st.getMin() == st.getMax() ? weightText(st.getMin())
                : weightText(st.getMin()) + "–" + weightText(st.getMax());
    }

    /** A weight as the pane and the undo words write it; NaN (the table's) is "table". */
    static String weightText(double w) {
        if (Double.isNaN(w)) {
            return "table";
        }
        return String.format(Locale.ROOT, "%.3g", w).replaceAll("\\.?0+$", "");
    }

    private void commitPrior(String kind, TextField f) {
        if (syncing) {
            return;
        }
        double now = vm.huntOrStart().priorWeights().getOrDefault(kind, defaultWeight(kind));
        String t = f.getText().strip();
        if (t.isEmpty() || t.equals("table")) {
            // back to the default: the table's weights (or the healthy stage's)
            error.setText("");
            if (vm.huntOrStart().priorWeights().containsKey(kind)
                    && !vm.setPriorWeight(kind, defaultWeight(kind), defaultWeight(kind))) {
                sync();
            }
            return;
        }
        double w;
        try {
            w = Double.parseDouble(t);
        } catch (NumberFormatException e) {
            w = Double.NaN;
        }
        if (!(w >= 0) || Double.isInfinite(w)) {
            error.setText("A prior weight is a number not below 0, for example 1.5; '" + t + "' for " + kind + " is not.");
            return;
        }
        error.setText("");
        if (w != now && !vm.setPriorWeight(kind, defaultWeight(kind), w)) {
            sync();
        }
    }

    private void commitMeter() {
        if (syncing) {
            return;
        }
        FaultHunt.MeterSetting was = vm.huntOrStart().meter();
        double ohms;
        int counts;
        double percent;
        double digits;
        try {
            ohms = EngineeringNotation.parse(meterOhms.getText(), Unit.OHM);
        } catch (IllegalArgumentException e) {
            error.setText("The meter's input resistance is a resistance, for example 10M or 1M; '"
                    + meterOhms.getText().strip() + "' is not.");
            return;
        }
        try {
            counts = Integer.parseInt(meterCounts.getText().strip());
        } catch (NumberFormatException e) {
            counts = -1;
        }
        if (counts < 10) {
            error.setText("The meter's counts are a whole number of at least 10, for example 4000; '"
                    + meterCounts.getText().strip() + "' is not.");
            return;
        }
        percent = number(meterPercent.getText());
        digits = number(meterDigits.getText());
        if (!(percent >= 0) || !(digits >= 0) || Double.isInfinite(percent) || Double.isInfinite(digits)) {
            error.setText("The meter's accuracy is a percent of the reading and a number of digits, neither below 0, "
                    + "for example 1 and 2; '" + meterPercent.getText().strip() + "' and '"
                    + meterDigits.getText().strip() + "' are not.");
            return;
        }
        if (!(ohms > 0)) {
            error.setText("The meter's input resistance is above 0 Ω, for example 10M; '" + meterOhms.getText().strip()
                    + "' is not.");
            return;
        }
        error.setText("");
        FaultHunt.MeterSetting m = new FaultHunt.MeterSetting(ohms, counts, percent, digits);
        if (!m.equals(was) && !vm.setMeter(m)) {
            sync();
        }
    }

    private static double number(String text) {
        try {
            return Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    /**
     * Whether the panel is shown: only a shown panel builds dictionaries (one per stage version and
     * meter, tens of milliseconds, on the background executor), so a collapsed panel costs an edit
     * nothing.
     */
    public void setActive(boolean shown) {
        active = shown;
        update();
    }

    /** True while the panel is shown (a click on a net then offers to enter a reading there). */
    public boolean isActive() {
        return active;
    }

    /**
     * The dictionary of the stage as it stands with the hunt's meter, or empty while it is being
     * built (a build is asked for then; when it arrives the panel updates itself).
     */
    private Optional<FaultDictionary> dictionary() {
        Stage now = vm.stage();
        Meter meter = SavedHunt.meter(vm.huntOrStart().meter());
        if (now == dictionaryOf && meter.equals(dictionaryMeter)) {
            return Optional.of(dictionary);
        }
        if (now != buildingFor || !meter.equals(buildingMeter)) {
            buildingFor = now;
            buildingMeter = meter;
            background.execute(() -> {
                FaultDictionary built;
                String failure = null;
                try {
                    built = FaultDictionary.build(now, meter);
                } catch (RuntimeException e) {
                    built = null;
                    failure = "No fault dictionary for this stage: " + e.getMessage();
                }
                FaultDictionary d = built;
                String why = failure;
                Platform.runLater(() -> arrived(now, meter, d, why));
            });
        }
        return Optional.empty();
    }

    private void arrived(Stage of, Meter meter, FaultDictionary d, String failure) {
        if (buildingFor == of && meter.equals(buildingMeter)) {
            buildingFor = null;
            buildingMeter = null;
        }
        if (failure != null) {
            error.setText(failure);
            return;
        }
        dictionary = d;
        dictionaryOf = of;
        dictionaryMeter = meter;
        builds++;
        update();
    }

    private void addReading() {
        Optional<FaultDictionary> d = dictionary();
        if (d.isEmpty()) {
            error.setText("The fault dictionary of this stage is still being built; add the reading again in a moment.");
            return;
        }
        try {
            Reading r = Reading.parse(d.get(), entry.getText());
            if (vm.addReading(new FaultHunt.HuntReading(r.probe(), r.pinHigh(), r.volts()))) {
                entry.clear();
                error.setText("");
            } else {
                error.setText(vm.messageProperty().get());
            }
        } catch (IllegalArgumentException e) {
            error.setText(e.getMessage());
        }
    }

    /** Puts the hunt's symptom, meter and weights into the fields (a change made elsewhere: undo, open). */
    private void sync() {
        syncing = true;
        try {
            FaultHunt h = vm.huntOrStart();
            symptom.setValue(h.symptom().orElse("no symptom"));
            FaultHunt.MeterSetting m = h.meter();
            setIfOther(meterOhms, org.armature.render.Notation.format(m.inputOhms(), "Ω"), m.inputOhms(), Unit.OHM);
            meterCounts.setText(Integer.toString(m.counts()));
            meterPercent.setText(weightText(m.percentOfReading()));
            meterDigits.setText(weightText(m.digits()));
            priorFields.forEach((kind, f) -> {
                Double changed = h.priorWeights().get(kind);
                double shown = changed != null ? changed : defaultWeight(kind);
                f.setText(Double.isNaN(shown) ? "" : weightText(shown));
                f.setPromptText("table");
                f.setStyle(changed != null ? "-fx-font-weight: bold" : "");
            });
            elsewhere.setText(vm.huntElsewhere().map(n -> "This document's fault hunt is on stage \"" + n
                    + "\"; open that stage to go on with it.").orElse(""));
            List<Row> rows = new ArrayList<>();
            for (FaultHunt.HuntReading r : h.readings()) {
                boolean known = dictionaryOf != vm.stage() || dictionary.probeIndex(r.net()) >= 0;
                rows.add(new Row(r.net(), r.pinHigh() ? "high" : "low",
                        org.armature.render.Notation.format(r.volts(), "V"), known ? "" : "not on this stage"));
            }
            if (!rows.equals(table.getItems())) {
                table.setItems(FXCollections.observableArrayList(rows));
            }
        } finally {
            syncing = false;
        }
    }

    /** Sets a field's text unless it already reads the same value (keeps "10M" as typed). */
    private static void setIfOther(TextField f, String text, double value, Unit unit) {
        try {
            if (EngineeringNotation.parse(f.getText(), unit) == value) {
                return;
            }
        } catch (IllegalArgumentException e) {
            // not a value: replaced
        }
        f.setText(text);
    }

    private void update() {
        sync();
        if (!active) {
            return;
        }
        Optional<FaultDictionary> built = dictionary();
        if (built.isEmpty()) {
            ranking.setText(BUILDING);
            next.setText("");
            dictionaryStatus.setText("");
            return;
        }
        FaultDictionary d = built.get();
        sync();
        FaultHunt h = vm.huntOrStart();
        dictionaryStatus.setText(String.format(Locale.ROOT, "Dictionary: healthy and %d single faults, both pin states, "
                        + "%d probe points; meter %s.", d.entries().size() - 1, d.probes().size(),
                org.armature.render.Notation.format(d.meter().inputOhms(), "Ω")));
        Diagnosis.Result r;
        try {
            List<FaultHunt.HuntReading> usable = h.readings().stream().filter(x -> d.probeIndex(x.net()) >= 0).toList();
            r = SavedHunt.rank(d, h.withReadings(usable)).result();
        } catch (IllegalArgumentException e) {
            ranking.setText("");
            next.setText("");
            error.setText(e.getMessage());
            return;
        }
        result.set(Optional.of(r));
        StringBuilder b = new StringBuilder();
        int n = 0;
        for (Diagnosis.Candidate c : r.candidates()) {
            if (n++ == SHOWN) {
                break;
            }
            b.append(String.format(Locale.ROOT, "%d. %s  %.1f %%", n, c.name(), 100 * c.probability()));
            for (Diagnosis.Explanation e : c.explains()) {
                // engineering notation like the drawing and diagnose ("4.08 nV", not "4.08e-09 V")
                b.append(String.format(Locale.ROOT, "%n     %s@%s expected %s, read %s", e.probe(),
                        e.pinHigh() ? "high" : "low", Notation.format(e.expectedVolts(), Unit.VOLT),
                        Notation.format(e.measuredVolts(), Unit.VOLT)));
            }
            b.append('\n');
        }
        ranking.setText(b.toString().strip());
        next.setText(r.next().map(x -> String.format(Locale.ROOT, "Next: measure %s with the pin %s (%.2f bits expected).",
                x.probe(), x.pinHigh() ? "high" : "low", x.gainBits())).orElse("No measurement left tells the candidates apart."));
    }

    /** The ranking as shown (tests). */
    public String rankingText() {
        return ranking.getText();
    }

    /** The last ranking computed, if any (tests). */
    public Optional<Diagnosis.Result> result() {
        return result.get();
    }

    /** The dictionary the ranking uses now, if built (tests). */
    public Optional<FaultDictionary> builtDictionary() {
        return vm.stage() == dictionaryOf && dictionary != null
                && SavedHunt.meter(vm.huntOrStart().meter()).equals(dictionaryMeter) ? Optional.of(dictionary) : Optional.empty();
    }

    /** How many dictionaries have arrived (tests: a meter change builds a new one). */
    public int dictionaryBuilds() {
        return builds;
    }

    // ------------------------------------------------------------------ a reading entered at a net

    /**
     * Offers to enter a reading at a net clicked on the drawing: a small editor near the click with
     * the net's name and what it is, the pin state (the stage's present one first) and the volts.
     * Enter adds the reading to the hunt (undoable; the ranking follows), Esc closes it. Text that is
     * not a number of volts is said in one sentence with an example and stays in the field.
     *
     * @param net the net's name as the drawing and {@code solve} name it
     * @param canvas the canvas to show the editor on
     * @param canvasX where the click was, in the canvas's coordinates
     * @param canvasY where the click was, in the canvas's coordinates
     * @return true when the editor was shown
     */
    public boolean offerReading(String net, SchematicCanvas canvas, double canvasX, double canvasY) {
        if (!active) {
            return false;
        }
        Stage st = vm.stage();
        String words = StageRecognition.of(st).netDescriptions().getOrDefault(net, "");
        Label title = new Label("Reading at " + net);
        title.setId("net-reading-title");
        title.setStyle("-fx-font-weight: bold");
        Label what = new Label(words);
        what.setWrapText(true);
        what.setPrefWidth(EDITOR_TEXT_WIDTH);
        what.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        ToggleGroup state = new ToggleGroup();
        ToggleButton high = new ToggleButton("pin high");
        high.setId("net-reading-high");
        ToggleButton low = new ToggleButton("pin low");
        low.setId("net-reading-low");
        high.setToggleGroup(state);
        low.setToggleGroup(state);
        (st.conditions().pinHigh() ? high : low).setSelected(true);
        TextField volts = new TextField();
        volts.setId("net-reading-volts");
        volts.setPromptText("volts, e.g. 11.9");
        volts.setPrefColumnCount(7);
        Label problem = new Label();
        problem.setId("net-reading-error");
        problem.setWrapText(true);
        problem.setPrefWidth(EDITOR_TEXT_WIDTH);
        problem.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        // a message shown or changed resizes the editor to it
        problem.textProperty().addListener((o, a, b) -> Platform.runLater(canvas::fitEditor));
        problem.getStyleClass().add("status-message");
        Label hint = new Label("Enter adds the reading · Esc closes");
        hint.getStyleClass().add("status-message");
        HBox row = new HBox(4, high, low, volts, new Label("V"));
        row.setAlignment(Pos.CENTER_LEFT);
        problem.managedProperty().bind(problem.textProperty().isNotEmpty());
        what.managedProperty().bind(what.textProperty().isNotEmpty());
        VBox box = new VBox(4, title, what, row, problem, hint);
        box.setId("net-reading-editor");
        box.setPadding(new Insets(6));
        box.setStyle("-fx-background-color: -fx-control-inner-background; -fx-border-color: -fx-box-border;"
                + " -fx-effect: dropshadow(gaussian, rgba(0,0,0,0.25), 6, 0, 0, 2);");
        Runnable commit = () -> {
            String t = volts.getText().strip();
            double v;
            try {
                v = EngineeringNotation.parse(t, Unit.VOLT, true);
            } catch (IllegalArgumentException e) {
                problem.setText("A reading is a number of volts, for example 11.9 or 250m; '" + t + "' is not.");
                return;
            }
            Optional<FaultDictionary> d = builtDictionary();
            if (d.isPresent() && d.get().probeIndex(net) < 0) {
                problem.setText("The net " + net + " is not a probe point of this stage (a net joining two or more pins);"
                        + " probe one of: " + String.join(", ", d.get().probes().stream().map(p -> p.name()).toList()) + ".");
                return;
            }
            if (vm.addReading(new FaultHunt.HuntReading(net, high.isSelected(), v))) {
                canvas.closeEditor();
            } else {
                problem.setText(vm.messageProperty().get());
            }
        };
        volts.setOnAction(e -> commit.run());
        builtDictionary().filter(d -> d.probeIndex(net) < 0).ifPresent(d -> problem.setText("The net " + net
                + " is not a probe point of this stage (a net joining two or more pins); probe one of: "
                + String.join(", ", d.probes().stream().map(p -> p.name()).toList()) + "."));
        box.addEventFilter(javafx.scene.input.KeyEvent.KEY_PRESSED, e -> {
            if (e.getCode() == KeyCode.ESCAPE) {
                canvas.closeEditor();
                e.consume();
            }
        });
        canvas.showEditor(box, canvasX, canvasY);
        volts.requestFocus();
        return true;
    }
}
