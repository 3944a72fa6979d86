package org.armature.ui;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Consumer;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.control.TextInputControl;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.armature.model.Conditions;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageSettings;
import org.armature.render.Notation;
import org.armature.units.EngineeringNotation;
import org.armature.units.ParseResult;
import org.armature.units.Unit;

/**
 * The stage's own sheet, shown in the part sheet when nothing is selected: its name and description
 * and the settings its checks use (corner ambient range, coil supply tolerance, release-time
 * requirement, Monte Carlo samples and seed). Each field is committed with Enter or on leaving it,
 * as one undoable step of the stage; a field that cannot be read is marked and changes nothing.
 */
final class StageSheet extends VBox {

    private final EditorViewModel vm;
    private final TextField name = field("stage-name");
    private final TextArea description = new TextArea();
    private final TextField ambientMin = field("stage-ambient-min");
    private final TextField ambientMax = field("stage-ambient-max");
    private final TextField tolerance = field("stage-supply-tolerance");
    private final TextField releaseTime = field("stage-release-time");
    private final TextField samples = field("stage-mc-samples");
    private final TextField seed = field("stage-mc-seed");
    private Stage shown;

    StageSheet(EditorViewModel vm) {
        this.vm = vm;
        setSpacing(6);
        getStyleClass().add("stage-sheet");
        description.setId("stage-description");
        description.setWrapText(true);
        description.setPrefRowCount(3);
        GridPane g = new GridPane();
        g.setHgap(6);
        g.setVgap(4);
        int row = 0;
        g.addRow(row++, new Label("Name"), name);
        g.addRow(row++, new Label("Coldest ambient"), ambientMin, new Label("°C"));
        g.addRow(row++, new Label("Hottest ambient"), ambientMax, new Label("°C"));
        g.addRow(row++, new Label("Supply tolerance ±"), tolerance, new Label("%"));
        g.addRow(row++, new Label("Release time at most"), releaseTime, new Label("s"));
        g.addRow(row++, new Label("Monte Carlo samples"), samples);
        g.addRow(row++, new Label("Monte Carlo seed"), seed);
        releaseTime.setPromptText("no requirement");
        releaseTime.setTooltip(new Tooltip("The longest release time the stage may have, judged at turn-off; empty for none."));
        samples.setTooltip(new Tooltip("Samples of the yield estimate in the verdicts; 0 for none."));
        tolerance.setTooltip(new Tooltip("The coil supply's tolerance, the supply corners of the checks."));
        getChildren().addAll(g, new Label("Description"), description);
        commitOn(name, t -> vm.renameStage(t));
        commitOn(description, t -> vm.describeStage(t));
        commitOn(ambientMin, t -> ambient(ambientMin, t).ifPresent(v -> {
            Conditions c = vm.stage().conditions();
            vm.setAmbientRange(v, Math.max(v, c.ambientMaxCelsius()));
        }));
        commitOn(ambientMax, t -> ambient(ambientMax, t).ifPresent(v -> {
            Conditions c = vm.stage().conditions();
            vm.setAmbientRange(Math.min(v, c.ambientMinCelsius()), v);
        }));
        commitOn(tolerance, t -> number(tolerance, t, Unit.PERCENT).ifPresent(v -> vm.coilSupply().ifPresent(
                p -> vm.setValue(p.ref(), ParamKeys.TOLERANCE_PERCENT, v))));
        commitOn(releaseTime, t -> {
            if (t.isBlank()) {
                settings(vm.stage().settings().withReleaseTimeRequirement(OptionalDouble.empty()));
            } else {
                number(releaseTime, t, Unit.SECOND).filter(v -> v > 0).ifPresent(v -> settings(
                        vm.stage().settings().withReleaseTimeRequirement(OptionalDouble.of(v))));
            }
        });
        commitOn(samples, t -> whole(samples, t, 0, StageSettings.MAX_MONTE_CARLO_SAMPLES).ifPresent(n -> settings(
                vm.stage().settings().withMonteCarlo(n.intValue(), vm.stage().settings().monteCarloSeed()))));
        commitOn(seed, t -> whole(seed, t, Long.MIN_VALUE, Long.MAX_VALUE).ifPresent(n -> settings(
                vm.stage().settings().withMonteCarlo(vm.stage().settings().monteCarloSamples(), n))));
    }

    /** Brings the fields up to the stage; a field whose value did not change keeps what is typed in it. */
    void update() {
        Stage s = vm.stage();
        Stage was = shown;
        shown = s;
        set(name, was == null ? null : was.name(), s.name());
        set(description, was == null ? null : was.description(), s.description());
        set(ambientMin, was == null ? null : celsius(was.conditions().ambientMinCelsius()), celsius(s.conditions().ambientMinCelsius()));
        set(ambientMax, was == null ? null : celsius(was.conditions().ambientMaxCelsius()), celsius(s.conditions().ambientMaxCelsius()));
        Optional<Part> supply = vm.coilSupply();
        tolerance.setDisable(supply.isEmpty());
        set(tolerance, null, supply.map(p -> Notation.format(p.value(ParamKeys.TOLERANCE_PERCENT), "%")).orElse(""));
        set(releaseTime, null, s.settings().releaseTimeRequirementSeconds().isPresent()
                ? Notation.format(s.settings().releaseTimeRequirementSeconds().getAsDouble(), "s") : "");
        set(samples, null, Integer.toString(s.settings().monteCarloSamples()));
        set(seed, null, Long.toString(s.settings().monteCarloSeed()));
    }

    private static String celsius(double v) {
        return Notation.format(v, "°C");
    }

    private static void set(TextInputControl f, String before, String now) {
        if ((before == null || !before.equals(now) || !f.isFocused()) && !now.equals(f.getText())) {
            f.setText(now);
            f.getStyleClass().remove(PartSheet.INVALID);
        }
    }

    private void settings(StageSettings s) {
        vm.setStageSettings(s);
    }

    private static TextField field(String id) {
        TextField f = new TextField();
        f.setId(id);
        f.getStyleClass().add("param-field");
        f.setPrefColumnCount(8);
        return f;
    }

    private void commitOn(TextInputControl f, Consumer<String> commit) {
        Runnable run = () -> {
            commit.accept(f.getText());
            update();
        };
        if (f instanceof TextField t) {
            t.setOnAction(e -> run.run());
        }
        f.focusedProperty().addListener((o, was, now) -> {
            if (was && !now) {
                run.run();
            }
        });
    }

    /** An ambient temperature inside the range the models hold over; anything else is refused where it is typed. */
    private Optional<Double> ambient(TextInputControl f, String text) {
        Optional<Double> v = number(f, text, Unit.CELSIUS);
        if (v.isPresent() && !org.armature.model.ModelRange.ambientInRange(v.get())) {
            String why = "An ambient of " + text.strip() + " is not taken: expected a value "
                    + org.armature.model.ModelRange.ambientRangeText()
                    + ", the range the copper and junction models hold over.";
            mark(f, why);
            vm.say(why);
            return Optional.empty();
        }
        return v;
    }

    private static Optional<Double> number(TextInputControl f, String text, Unit unit) {
        ParseResult r = EngineeringNotation.tryParse(text, unit, true);
        if (r instanceof ParseResult.Value v && Double.isFinite(v.value())) {
            mark(f, null);
            return Optional.of(v.value());
        }
        mark(f, r instanceof ParseResult.Failure fail ? fail.error().message() : "Expected a number.");
        return Optional.empty();
    }

    private static Optional<Long> whole(TextInputControl f, String text, long min, long max) {
        try {
            long n = Long.parseLong(text.strip());
            if (n >= min && n <= max) {
                mark(f, null);
                return Optional.of(n);
            }
        } catch (NumberFormatException e) {
            // falls through to the message below
        }
        mark(f, "Expected a whole number" + (min == 0 ? " from 0 to " + max : "") + ".");
        return Optional.empty();
    }

    private static void mark(TextInputControl f, String problem) {
        if (problem == null) {
            f.getStyleClass().remove(PartSheet.INVALID);
            f.setTooltip(null);
        } else {
            if (!f.getStyleClass().contains(PartSheet.INVALID)) {
                f.getStyleClass().add(PartSheet.INVALID);
            }
            f.setTooltip(new Tooltip(problem));
        }
    }
}
