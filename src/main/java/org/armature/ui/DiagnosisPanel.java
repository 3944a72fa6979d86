package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import javafx.application.Platform;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.armature.analysis.faults.Diagnosis;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.Priors;
import org.armature.analysis.faults.Reading;
import org.armature.analysis.faults.Spread;
import org.armature.analysis.faults.Symptom;
import org.armature.model.Stage;

/**
 * A small fault diagnosis panel: the technician types readings {@code NET@high=VOLTS} or
 * {@code NET@low=VOLTS} (net names as the drawing's readouts and {@code solve} name them, and
 * {@code coil} across the coil), picks the symptom if any, and sees the candidates ranked by
 * posterior probability and the next measurement with its expected gain in bits
 * ({@link Diagnosis#rank}, the same ranking as {@code armature diagnose}). The dictionary is that of
 * the active stage as drawn (healthy, whatever faults fault mode has injected), with the default
 * meter, spread and priors; it is built again when the stage changes, and readings at probe points
 * the new stage does not have are dropped.
 */
public final class DiagnosisPanel extends VBox {

    /** Candidates listed. */
    public static final int SHOWN = 5;
    /** What the ranking says while the stage's dictionary is being built. */
    public static final String BUILDING = "Building the fault dictionary of this stage…";

    private final EditorViewModel vm;
    private final TextField entry = new TextField();
    private final ChoiceBox<String> symptom = new ChoiceBox<>();
    private final Label readingsLabel = new Label();
    private final Label ranking = new Label();
    private final Label next = new Label();
    private final Label error = new Label();
    private final List<Reading> readings = new ArrayList<>();
    private boolean active;
    private Stage dictionaryOf;
    private FaultDictionary dictionary;
    /** The stage whose dictionary is being built in the background, if any. */
    private Stage buildingFor;
    private final Executor background;

    /** The builds' own low-priority thread: a dictionary takes tens of milliseconds, never on the FX thread. */
    public static final Executor BACKGROUND = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "armature-fault-dictionary");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        return t;
    });

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
        HBox.setHgrow(entry, Priority.ALWAYS);
        Button add = new Button("Add reading");
        add.setId("diag-add");
        add.setOnAction(e -> addReading());
        entry.setOnAction(e -> addReading());
        Button clear = new Button("Clear");
        clear.setId("diag-clear");
        clear.setOnAction(e -> {
            readings.clear();
            update();
        });
        symptom.setId("diag-symptom");
        symptom.getItems().add("no symptom");
        for (Symptom s : Symptom.values()) {
            symptom.getItems().add(s.id());
        }
        symptom.setValue("no symptom");
        symptom.valueProperty().addListener((o, a, b) -> update());
        readingsLabel.setId("diag-readings");
        readingsLabel.setWrapText(true);
        ranking.setId("diag-ranking");
        ranking.setWrapText(true);
        next.setId("diag-next");
        next.setWrapText(true);
        error.setId("diag-error");
        error.setWrapText(true);
        error.getStyleClass().add("status-message");
        getChildren().addAll(new HBox(6, entry, add, clear), new HBox(6, new Label("Symptom"), symptom),
                readingsLabel, error, ranking, next);
        vm.stageProperty().addListener((o, a, b) -> update());
        ranking.setText("");
    }

    /**
     * Whether the panel is shown: only a shown panel builds dictionaries (one per stage version,
     * tens of milliseconds, on the background executor), so a collapsed panel costs an edit nothing.
     */
    public void setActive(boolean shown) {
        active = shown;
        update();
    }

    /**
     * The dictionary of the stage as it stands, or empty while it is being built (a build is asked
     * for then; when it arrives the panel updates itself).
     */
    private Optional<FaultDictionary> dictionary() {
        Stage now = vm.stage();
        if (now == dictionaryOf) {
            return Optional.of(dictionary);
        }
        if (now != buildingFor) {
            buildingFor = now;
            background.execute(() -> {
                FaultDictionary built;
                String failure = null;
                try {
                    built = FaultDictionary.build(now, Meter.DEFAULT);
                } catch (RuntimeException e) {
                    built = null;
                    failure = "No fault dictionary for this stage: " + e.getMessage();
                }
                FaultDictionary d = built;
                String why = failure;
                Platform.runLater(() -> arrived(now, d, why));
            });
        }
        return Optional.empty();
    }

    private void arrived(Stage of, FaultDictionary d, String failure) {
        if (buildingFor == of) {
            buildingFor = null;
        }
        if (failure != null) {
            error.setText(failure);
            return;
        }
        dictionary = d;
        dictionaryOf = of;
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
            readings.removeIf(x -> x.probe().equals(r.probe()) && x.pinHigh() == r.pinHigh());
            readings.add(r);
            entry.clear();
            error.setText("");
        } catch (IllegalArgumentException e) {
            error.setText(e.getMessage());
        }
        update();
    }

    private void update() {
        if (!active) {
            return;
        }
        Optional<FaultDictionary> built = dictionary();
        if (built.isEmpty()) {
            ranking.setText(BUILDING);
            next.setText("");
            return;
        }
        FaultDictionary d = built.get();
        readings.removeIf(r -> d.probeIndex(r.probe()) < 0);
        readingsLabel.setText(readings.isEmpty() ? "No readings yet." : "Readings: " + String.join(", ",
                readings.stream().map(r -> String.format(Locale.ROOT, "%s@%s=%.3g V", r.probe(),
                        r.pinHigh() ? "high" : "low", r.volts())).toList()));
        Optional<Symptom> s = Symptom.byId(symptom.getValue());
        Diagnosis.Result result = Diagnosis.rank(d, Spread.DEFAULT, Priors.DEFAULT, s, readings);
        StringBuilder b = new StringBuilder();
        int n = 0;
        for (Diagnosis.Candidate c : result.candidates()) {
            if (n++ == SHOWN) {
                break;
            }
            b.append(String.format(Locale.ROOT, "%d. %s  %.1f %%", n, c.name(), 100 * c.probability()));
            for (Diagnosis.Explanation e : c.explains()) {
                b.append(String.format(Locale.ROOT, "%n     %s@%s expected %.3g V, measured %.3g V", e.probe(),
                        e.pinHigh() ? "high" : "low", e.expectedVolts(), e.measuredVolts()));
            }
            b.append('\n');
        }
        ranking.setText(b.toString().strip());
        next.setText(result.next().map(x -> String.format(Locale.ROOT, "Next: measure %s with the pin %s (%.2f bits expected).",
                x.probe(), x.pinHigh() ? "high" : "low", x.gainBits())).orElse("No measurement left tells the candidates apart."));
    }

    /** The ranking as shown (tests). */
    public String rankingText() {
        return ranking.getText();
    }
}
