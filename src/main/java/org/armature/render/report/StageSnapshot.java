package org.armature.render.report;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.analysis.BaseNetworkSizing;
import org.armature.analysis.CheckOptions;
import org.armature.analysis.CheckReport;
import org.armature.analysis.SizingResult;
import org.armature.analysis.StageChecks;
import org.armature.model.StageRoles;
import org.armature.analysis.TopologyCheck;
import org.armature.model.Finding;
import org.armature.model.Part;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.Validator;
import org.armature.render.Annotations;
import org.armature.render.Notation;
import org.armature.render.Palette;
import org.armature.render.ReadoutBuilder;
import org.armature.render.Sheet;
import org.armature.render.TitleBlock;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SolveOptions;
import org.armature.solver.SolverException;
import org.armature.solver.timedomain.EdgeRuns;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientResult;

/**
 * Everything one export shows of one stage, computed once and then only read: the operating points
 * in both pin states, the readouts of the pin state shown, and for a report the verdicts, the sizing
 * calculation and the turn-on and turn-off runs.
 *
 * <p>It is assembled here from the engines' own entry points ({@link DcAnalysis},
 * {@link StageChecks}, {@link BaseNetworkSizing}, {@link TransientAnalysis}); once the stage's
 * shared evaluation exists, {@link #evaluate} is the one place to point at it. Failures never throw:
 * a stage that cannot be solved has empty operating points and says why in {@link #solveStatus()}.
 *
 * @param documentTitle the stage file's title (may be empty)
 * @param stage the stage
 * @param date the day of the export
 * @param pinHigh the pin state whose readouts the drawing shows
 * @param high the operating point with the pin high, when solved
 * @param low the operating point with the pin low, when solved
 * @param findings validation and topology findings, and solver failures
 * @param solveStatus one sentence about the DC solve of the pin state shown
 * @param checks the verdicts, when the report asked for them and they ran
 * @param sizing the sizing calculation, when the report asked for it
 * @param turnOn the turn-on run, when it succeeded
 * @param turnOff the turn-off run, when it succeeded
 * @param edgesStatus one sentence about the runs (empty when none were asked for)
 */
public record StageSnapshot(String documentTitle, Stage stage, LocalDate date, boolean pinHigh,
                            Optional<OperatingPoint> high, Optional<OperatingPoint> low, List<Finding> findings,
                            String solveStatus, Optional<CheckReport> checks, Optional<SizingResult> sizing,
                            Optional<TransientResult> turnOn, Optional<TransientResult> turnOff, String edgesStatus) {

    /** Prefix of the safety caution finding keys of the checks. */
    public static final String CAUTION_PREFIX = "caution.";

    /** How much to compute. */
    public enum Depth {
        /** The operating point of the pin state shown: enough for an image. */
        DRAWING,
        /** Both pin states, the verdicts, the sizing calculation and the edges: a report. */
        REPORT
    }

    public StageSnapshot {
        if (documentTitle == null || stage == null || date == null) {
            throw new IllegalArgumentException("a snapshot needs a title (may be empty), a stage and a date");
        }
        findings = List.copyOf(findings);
    }

    /**
     * Evaluates a stage for an export.
     *
     * @param documentTitle the stage file's title
     * @param stage the stage as it is to be shown
     * @param pinHigh the pin state the drawing's readouts show
     * @param depth how much to compute
     * @param date the day written on the export
     */
    public static StageSnapshot evaluate(String documentTitle, Stage stage, boolean pinHigh, Depth depth,
                                         LocalDate date) {
        List<Finding> findings = new ArrayList<>();
        List<Finding> invalid = Validator.validate(stage).stream().filter(f -> f.severity() == Severity.ERROR).toList();
        if (!invalid.isEmpty()) {
            findings.addAll(invalid);
            return new StageSnapshot(documentTitle, stage, date, pinHigh, Optional.empty(), Optional.empty(), findings,
                    "Not solved: " + invalid.get(0).message(), Optional.empty(), Optional.empty(), Optional.empty(),
                    Optional.empty(), "");
        }
        findings.addAll(TopologyCheck.check(stage));
        DcAnalysis dc = new DcAnalysis();
        Optional<OperatingPoint> high = Optional.empty();
        Optional<OperatingPoint> low = Optional.empty();
        String status;
        try {
            OperatingPoint shown = dc.solve(stage, SolveOptions.DEFAULT.withPinHigh(pinHigh));
            status = "Solved: converged in " + shown.iterations() + " iterations, largest KCL residual "
                    + Notation.format(shown.maxKclResidualAmps(), "A") + ".";
            if (pinHigh) {
                high = Optional.of(shown);
            } else {
                low = Optional.of(shown);
            }
        } catch (SolverException e) {
            status = "No operating point with the pin " + (pinHigh ? "high" : "low") + ": " + e.getMessage();
            findings.add(0, new Finding(Severity.ERROR, e.messageKey(), "", "", status));
        }
        if (depth == Depth.DRAWING) {
            return new StageSnapshot(documentTitle, stage, date, pinHigh, high, low, findings, status, Optional.empty(),
                    Optional.empty(), Optional.empty(), Optional.empty(), "");
        }
        try {
            OperatingPoint other = dc.solve(stage, SolveOptions.DEFAULT.withPinHigh(!pinHigh));
            if (pinHigh) {
                low = Optional.of(other);
            } else {
                high = Optional.of(other);
            }
        } catch (SolverException e) {
            findings.add(new Finding(Severity.ERROR, e.messageKey(), "", "",
                    "No operating point with the pin " + (pinHigh ? "low" : "high") + ": " + e.getMessage()));
        }
        CheckReport report = StageChecks.run(stage, CheckOptions.DEFAULT, dc);
        SizingResult sizing = BaseNetworkSizing.size(stage);
        EdgeRuns runs = EdgeRuns.of(stage);
        String edges = runs.status().endsWith(".") ? runs.status() : runs.status() + ".";
        return new StageSnapshot(documentTitle, stage, date, pinHigh, high, low, findings, status, Optional.of(report),
                Optional.of(sizing), runs.on(), runs.off(), edges);
    }

    /** The operating point of the pin state shown, when solved. */
    public Optional<OperatingPoint> shown() {
        return pinHigh ? high : low;
    }

    /** The readouts of the pin state shown (only finding markers when it was not solved). */
    public Annotations annotations() {
        return shown().map(op -> ReadoutBuilder.build(stage, op, findings))
                .orElseGet(() -> ReadoutBuilder.markersOnly(stage, findings));
    }

    /** The safety cautions of the checks (contact side above safety extra-low voltage); empty without. */
    public List<Finding> cautions() {
        return checks.map(r -> r.findings().stream().filter(f -> f.key().startsWith(CAUTION_PREFIX)).toList())
                .orElse(List.of());
    }

    /**
     * The conditions of the readouts in words: pin state, ambient, coil supply, corner. The readouts
     * are the nominal stage (no corner); a corner appears in the verdicts, each with its own.
     */
    public String conditions() {
        List<String> parts = new ArrayList<>();
        parts.add("pin " + (pinHigh ? "high" : "low"));
        double ambient = shown().map(OperatingPoint::ambientCelsius).orElse(stage.conditions().ambientCelsius());
        parts.add("ambient " + Notation.format(ambient, "°C"));
        supply().ifPresent(parts::add);
        parts.add("nominal values, no corner");
        return String.join(" · ", parts);
    }

    /** The title block of this snapshot's sheet. */
    public TitleBlock titleBlock() {
        return new TitleBlock(stage.name(), documentTitle, date.toString(), conditions());
    }

    /** The sheet (annotated drawing and title block) in a palette. */
    public Sheet sheet(Palette palette) {
        return new Sheet(stage, annotations(), titleBlock(), palette);
    }

    /** The coil supply in words ("coil supply 12 V ±5 %"), when the stage has one. */
    private Optional<String> supply() {
        Optional<Part> p = TopologyCheck.recognise(stage).flatMap(StageRoles::coilSupplyRef).flatMap(stage::part);
        return p.map(s -> {
            String v = "coil supply " + Notation.format(s.value("volts"), "V");
            double tol = s.kind().param("tolerancePercent").isPresent() ? s.value("tolerancePercent") : 0;
            return tol > 0 ? v + " ±" + Notation.format(tol, "%") : v;
        });
    }
}
