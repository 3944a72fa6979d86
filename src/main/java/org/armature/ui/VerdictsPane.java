package org.armature.ui;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.LinkedHashSet;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.armature.analysis.CheckReport;
import org.armature.analysis.CheckResult;
import org.armature.model.Finding;
import org.armature.render.Selection;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;
import org.kordamp.ikonli.javafx.FontIcon;

/**
 * The verdicts panel: the safety cautions first (prominent, whenever the contact side is above
 * safety extra-low voltage), then the corner checks with pass / warn / fail and their numbers
 * (value against limit with the unit, the worst corner, the explanation), then the findings of
 * validation, topology and the solver. Clicking a check selects the parts it concerns, which the
 * canvas highlights.
 */
public final class VerdictsPane extends VBox {

    /** Prefix of the safety caution finding keys. */
    public static final String CAUTION_PREFIX = "caution.";

    private final ListView<CheckResult> checks = new ListView<>();
    private final FindingsPane findings;
    private final VBox cautions = new VBox(4);
    private final Label status = new Label();
    private Analyses.Verdicts shownVerdicts = Analyses.Verdicts.NONE;
    private boolean shownRunning;
    /** Whether the cautions are shown in full; closed by default, kept across updates. */
    private boolean cautionsOpen;

    /** A panel following the view model's verdicts and findings. */
    public VerdictsPane(EditorViewModel vm) {
        getStyleClass().add("verdicts");
        setSpacing(6);
        findings = new FindingsPane(vm);
        cautions.getStyleClass().add("caution-box");
        cautions.setId("cautions");
        status.getStyleClass().add("sheet-description");
        status.setWrapText(true);
        Label placeholder = new Label("The corner checks appear here after the stage is solved.");
        placeholder.setWrapText(true);
        placeholder.getStyleClass().add("sheet-description");
        checks.setId("checks-list");
        checks.setPlaceholder(placeholder);
        checks.setPrefHeight(360);
        findings.list().setPrefHeight(120);
        // the checks list takes the height that is left, but never squeezes the findings below two rows
        findings.setMinHeight(FINDINGS_MIN_HEIGHT);
        checks.setMinHeight(FINDINGS_MIN_HEIGHT);
        checks.setCellFactory(v -> new CheckCell());
        checks.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                vm.select(new Selection(new LinkedHashSet<>(b.refs()), Set.of()));
            }
        });
        evaluated(vm.evaluation());
        vm.evaluationProperty().addListener((o, a, b) -> evaluated(b));
        VBox.setVgrow(checks, Priority.ALWAYS);
        getChildren().addAll(cautions, status, checks, findings);
    }

    /** The list of checks (tests). */
    public ListView<CheckResult> checks() {
        return checks;
    }

    /** The findings list (tests). */
    public FindingsPane findings() {
        return findings;
    }

    /** The caution box; visible only when the report carries safety cautions. */
    public VBox cautions() {
        return cautions;
    }

    /**
     * Shows the verdicts of an evaluation when they are in; while they are pending, the verdicts of
     * the last evaluation that had them stay, marked as being judged again.
     */
    private void evaluated(Evaluation e) {
        Analyses.Verdicts v = e.verdicts().orElse(shownVerdicts);
        boolean running = e.verdicts().isEmpty();
        if (v == shownVerdicts && running == shownRunning && v != Analyses.Verdicts.NONE) {
            return;
        }
        shownVerdicts = v;
        shownRunning = running;
        show(v, running);
    }

    private void show(Analyses.Verdicts v, boolean running) {
        List<CheckResult> list = v.report().map(CheckReport::checks).orElse(List.of());
        checks.getItems().setAll(list);
        List<Finding> caution = v.report().map(r -> r.findings().stream()
                .filter(f -> f.key().startsWith(CAUTION_PREFIX)).toList()).orElse(List.of());
        cautions.getChildren().clear();
        if (!caution.isEmpty()) {
            // one line that opens on click: the cautions stay in view without crowding out the checks
            javafx.scene.control.Button head = new javafx.scene.control.Button(cautionLine(caution.size(), cautionsOpen),
                    new FontIcon("mdi2f-flash-alert"));
            head.setId("cautions-toggle");
            head.getStyleClass().add("caution-title");
            head.setWrapText(true);
            head.setMaxWidth(Double.MAX_VALUE);
            head.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
            head.setTooltip(new javafx.scene.control.Tooltip("Show or hide the cautions for contacts above safety"
                    + " extra-low voltage"));
            head.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
            VBox body = new VBox(4);
            body.setId("caution-messages");
            for (Finding f : caution) {
                Label l = new Label(f.message());
                l.setWrapText(true);
                l.getStyleClass().add("caution-text");
                body.getChildren().add(l);
            }
            body.setVisible(cautionsOpen);
            body.setManaged(cautionsOpen);
            head.setOnAction(e -> {
                cautionsOpen = !cautionsOpen;
                body.setVisible(cautionsOpen);
                body.setManaged(cautionsOpen);
                head.setText(cautionLine(caution.size(), cautionsOpen));
            });
            cautions.getChildren().addAll(head, body);
        }
        cautions.setVisible(!caution.isEmpty());
        cautions.setManaged(!caution.isEmpty());
        String overall = v.report().map(r -> overallLine(r, v.status())).orElse(v.status());
        status.setText(running ? "Judging the corners…" + (overall.isEmpty() ? "" : "  (shown: " + overall + ")") : overall);
    }

    /**
     * The caution box's one line: "Contacts above SELV: 3 cautions ▸" (SELV, safety extra-low voltage,
     * the trade's word for the limit the cautions start at; short enough for the narrow pane).
     */
    static String cautionLine(int count, boolean open) {
        return "Contacts above SELV: " + count + (count == 1 ? " caution " : " cautions ") + (open ? "▾" : "▸");
    }

    /**
     * "Overall warn · 512 corners judged"; when no check has a value (a stage with no operating
     * point at its corners) there is no overall verdict to give, and the line says so.
     */
    static String overallLine(CheckReport r, String status) {
        boolean judged = r.checks().stream().anyMatch(c -> !Double.isNaN(c.value()));
        if (!judged) {
            return "Not judged: no check could be evaluated on this stage";
        }
        return "Overall " + r.overall().word() + (status.isEmpty() ? "" : " · " + status);
    }

    /** Value against limit: "10.7 V against 12.4 V". */
    static String numbers(CheckResult c) {
        if (Double.isNaN(c.value())) {
            return "not judged";
        }
        return format(c.value(), c.unit()) + " against " + format(c.limit(), c.unit());
    }

    private static String format(double v, Unit u) {
        if (u == Unit.RATIO) {
            return "×" + String.format(Locale.ROOT, "%.3g", v);
        }
        return EngineeringNotation.format(v, u);
    }

    /** Smallest height of the findings list and of the checks list, pixels: two rows. */
    static final double FINDINGS_MIN_HEIGHT = 64;

    /** Width a check cell leaves for the list's scroll bar and padding, pixels. */
    static final double CELL_INSET = 30;

    /** One check: status icon, id and numbers on the first line, corner and explanation below. */
    private static final class CheckCell extends ListCell<CheckResult> {
        @Override
        protected void updateItem(CheckResult c, boolean isEmpty) {
            super.updateItem(c, isEmpty);
            if (isEmpty || c == null) {
                setText(null);
                setGraphic(null);
                return;
            }
            String word = c.status().word();
            FontIcon icon = new FontIcon(switch (c.status()) {
                case PASS -> "mdi2c-check-circle";
                case WARN -> "mdi2a-alert";
                case FAIL -> "mdi2c-close-octagon";
            });
            icon.getStyleClass().add("verdict-" + word);
            Label id = new Label(c.id());
            id.getStyleClass().add("check-id");
            Label st = new Label(word);
            st.getStyleClass().addAll("verdict-word", "verdict-" + word);
            Region gap = new Region();
            HBox.setHgrow(gap, Priority.ALWAYS);
            Label nums = new Label(numbers(c));
            nums.getStyleClass().add("check-numbers");
            HBox top = new HBox(6, icon, id, gap, st);
            Label why = new Label(c.explanation());
            why.setWrapText(true);
            why.getStyleClass().add("check-explanation");
            VBox box = new VBox(2, top, nums, why);
            if (!c.cornerText().isEmpty()) {
                Label corner = new Label("at " + c.cornerText());
                corner.setWrapText(true);
                corner.getStyleClass().add("check-corner");
                box.getChildren().add(corner);
            }
            // as wide as the list leaves room for (its scroll bar included), never wider: words wrap
            if (getListView() != null) {
                box.prefWidthProperty().bind(getListView().widthProperty().subtract(CELL_INSET));
                box.maxWidthProperty().bind(getListView().widthProperty().subtract(CELL_INSET));
            }
            setText(null);
            setGraphic(box);
            setPrefWidth(0);
        }
    }
}
