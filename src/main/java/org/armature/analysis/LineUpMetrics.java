package org.armature.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.ToDoubleFunction;
import org.armature.model.LineUpContext;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;
import org.armature.netlist.Readings;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SolveOptions;
import org.armature.solver.SolverException;
import org.armature.solver.SwitchVerdict;
import org.armature.solver.timedomain.DriveWaveform;
import org.armature.solver.timedomain.StepOptions;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientFailureException;
import org.armature.solver.timedomain.TransientMetrics;
import org.armature.solver.timedomain.TransientOptions;
import org.armature.solver.timedomain.TransientResult;
import org.armature.units.Unit;

/**
 * The figures a line-up compares, one column per stage and one row per figure, each taken from the
 * runs the commands make for a stage alone, with the same entry points and the same default
 * options: {@code solve} ({@link DcAnalysis#solve(Stage, SolveOptions)} with
 * {@link SolveOptions#DEFAULT}), {@code simulate} ({@link TransientAnalysis#run} of the default
 * 20 ms window with the turn-off edge at 1 ms, and with the turn-on edge for the operate time) and
 * {@code check} ({@link StageChecks#run(Stage, CheckOptions, DcAnalysis)} with the stage's own
 * settings and the transient engine). Nothing here computes a figure a second way: a row is a number
 * one of those runs reports.
 *
 * <p>A column is made of four {@link Phase}s, each its own method ({@link #dc}, {@link #turnOff},
 * {@link #turnOn(Stage, PhaseResult)}, {@link #checks}) and put together by {@link #column};
 * {@link #evaluate} runs the four in order, and the window runs the same methods one by one to show
 * each as it finishes, so there is one code path for the numbers.
 *
 * <p>A figure that a run did not give (no drive pin, contacts never opened, no Monte Carlo samples
 * asked for, a run that failed) is NaN and is left out of the best-value marking.
 */
public final class LineUpMetrics {

    /** Which way a figure is better. */
    public enum Better {
        /** Smaller is better (times, voltages, energies, dissipation, parts). */
        LOWER,
        /** Larger is better (margins, yield, a faster break). */
        HIGHER
    }

    /**
     * One row of the table.
     *
     * @param key the JSON name: the name {@code simulate --json} uses for its figures, else one of ours
     * @param label the row's words
     * @param unit unit of the value, SI
     * @param unitSymbol the unit's symbol as printed ({@code m/s} for the armature speed, which has no
     *     {@link Unit} of its own)
     * @param better which way is better
     * @param source which run gives it ({@code solve}, {@code simulate}, {@code simulate --edge on},
     *     {@code check})
     */
    public record Metric(String key, String label, Unit unit, String unitSymbol, Better better, String source) {
    }

    /** The rows, in table order. */
    public static final List<Metric> METRICS = List.of(
            new Metric("coilCurrent", "coil current (nominal)", Unit.AMPERE, "A", Better.HIGHER, "solve"),
            new Metric("coilVoltageWorstCorner", "coil voltage at the worst corner", Unit.VOLT, "V", Better.HIGHER,
                    "check relay.operates"),
            new Metric("operateMargin", "coil voltage ÷ must-operate limit, worst corner", Unit.RATIO, "",
                    Better.HIGHER, "check relay.operates"),
            new Metric("switchMargin", "switch margin (solve's verdict)", Unit.RATIO, "", Better.HIGHER, "solve"),
            new Metric("pinCurrent", "drive pin current", Unit.AMPERE, "A", Better.LOWER, "solve"),
            new Metric("switchPower", "switch dissipation (nominal)", Unit.WATT, "W", Better.LOWER, "solve"),
            new Metric("junctionTemperature", "switch junction temperature, worst corner", Unit.CELSIUS, "°C",
                    Better.LOWER, "check thermal.switch-junction"),
            new Metric("peakSwitchVoltage", "peak switch voltage", Unit.VOLT, "V", Better.LOWER, "simulate"),
            new Metric("decayToDropOutCurrent", "decay to drop-out current", Unit.SECOND, "s", Better.LOWER,
                    "simulate"),
            new Metric("releaseTime", "release time", Unit.SECOND, "s", Better.LOWER, "simulate"),
            new Metric("operateTime", "operate time", Unit.SECOND, "s", Better.LOWER, "simulate --edge on"),
            new Metric("suppressorEnergy", "suppressor energy", Unit.JOULE, "J", Better.LOWER, "simulate"),
            new Metric("armatureSpeedAtBreak", "armature speed at contact break", Unit.METRE, "m/s", Better.HIGHER,
                    "simulate"),
            new Metric("partsCount", "parts (ground symbols not counted)", Unit.RATIO, "", Better.LOWER, "the stage"),
            new Metric("yield", "Monte Carlo yield (stage's own samples)", Unit.RATIO, "", Better.HIGHER, "check"));

    /**
     * The runs a column is made of, in the order the window publishes them after a change: the
     * operating point (milliseconds), the turn-off run with its waveform, the turn-on run, then the
     * corner checks and the yield (the slow part: 14 to 82 ms per template stage at the median, LineUpWaveformsBench).
     */
    public enum Phase {
        /** {@code solve}: coil current, switch verdict and margin, pin current, switch dissipation; parts count. */
        DC,
        /** {@code simulate}: the turn-off waveform, peak switch voltage, decay, release, suppressor energy, armature speed. */
        TURN_OFF,
        /** {@code simulate --edge on}: the operate time. */
        TURN_ON,
        /** {@code check}: worst-corner coil voltage and margin, junction temperature, yield, every check. */
        CHECKS
    }

    /** Which phase gives each metric, by key. */
    private static final Map<String, Phase> PHASE_OF = Map.ofEntries(
            Map.entry("coilCurrent", Phase.DC), Map.entry("switchMargin", Phase.DC), Map.entry("pinCurrent", Phase.DC),
            Map.entry("switchPower", Phase.DC), Map.entry("partsCount", Phase.DC),
            Map.entry("peakSwitchVoltage", Phase.TURN_OFF), Map.entry("decayToDropOutCurrent", Phase.TURN_OFF),
            Map.entry("releaseTime", Phase.TURN_OFF), Map.entry("suppressorEnergy", Phase.TURN_OFF),
            Map.entry("armatureSpeedAtBreak", Phase.TURN_OFF), Map.entry("operateTime", Phase.TURN_ON),
            Map.entry("coilVoltageWorstCorner", Phase.CHECKS), Map.entry("operateMargin", Phase.CHECKS),
            Map.entry("junctionTemperature", Phase.CHECKS), Map.entry("yield", Phase.CHECKS));

    /** The phase whose run gives a metric. */
    public static Phase phaseOf(Metric metric) {
        Phase p = PHASE_OF.get(metric.key());
        if (p == null) {
            throw new IllegalArgumentException("no phase gives the metric " + metric.key());
        }
        return p;
    }

    /**
     * What one phase gave for one stage: its own metrics only (a metric of another phase is absent),
     * and whatever else that run reports.
     *
     * @param phase which run
     * @param values the metrics of this phase by key, NaN where the run did not give one
     * @param switchFullyOn solve's switch verdict ({@link Phase#DC} only)
     * @param turnOff the turn-off waveform ({@link Phase#TURN_OFF} only, when it ran)
     * @param report the checks ({@link Phase#CHECKS} only)
     * @param notes the run's failure, in words, if it failed
     */
    public record PhaseResult(Phase phase, Map<String, Double> values, Optional<Boolean> switchFullyOn,
                              Optional<org.armature.solver.timedomain.Waveform> turnOff,
                              Optional<CheckReport> report, List<String> notes) {

        public PhaseResult {
            values = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(values));
            notes = List.copyOf(notes);
        }

        /** True when the run itself failed (a note says why). */
        public boolean failed() {
            return !notes.isEmpty();
        }
    }

    /**
     * One stage's column.
     *
     * @param stage the stage as judged (shared context applied, if any)
     * @param values every metric of {@link #METRICS} by key, NaN where not available (or its phase is
     *     not done yet)
     * @param switchFullyOn solve's switch verdict; empty when no part switches a relay coil or the
     *     stage has no operating point
     * @param report the checks, exactly as {@code check} reports them (empty until {@link Phase#CHECKS}
     *     is done)
     * @param differences where the stage's own parts differed from the shared context
     * @param notes runs that failed, in words
     * @param turnOff the turn-off run's waveform (the one {@code simulate} makes), if it ran
     * @param phases the phases done; {@link #evaluate} gives all of them, the window's evaluation
     *     ({@link #column}) those that have arrived
     */
    public record Column(Stage stage, Map<String, Double> values, Optional<Boolean> switchFullyOn,
                         CheckReport report, List<LineUpContext.Difference> differences, List<String> notes,
                         Optional<org.armature.solver.timedomain.Waveform> turnOff, java.util.Set<Phase> phases) {

        public Column {
            values = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(values));
            differences = List.copyOf(differences);
            notes = List.copyOf(notes);
            phases = phases.isEmpty() ? java.util.Collections.unmodifiableSet(java.util.EnumSet.noneOf(Phase.class))
                    : java.util.Collections.unmodifiableSet(java.util.EnumSet.copyOf(phases));
        }

        /** A finished column: every phase done. */
        public Column(Stage stage, Map<String, Double> values, Optional<Boolean> switchFullyOn, CheckReport report,
                      List<LineUpContext.Difference> differences, List<String> notes,
                      Optional<org.armature.solver.timedomain.Waveform> turnOff) {
            this(stage, values, switchFullyOn, report, differences, notes, turnOff,
                    java.util.EnumSet.allOf(Phase.class));
        }

        /** The value of a metric, NaN when not available. */
        public double value(String key) {
            return values.getOrDefault(key, Double.NaN);
        }

        /** True when the phase that gives this metric has not arrived yet. */
        public boolean pending(Metric metric) {
            return !phases.contains(phaseOf(metric));
        }
    }

    private LineUpMetrics() {
    }

    /** The turn-off run {@code simulate} makes by default. */
    public static TransientOptions turnOffOptions() {
        return new TransientOptions(new DriveWaveform.TurnOff(TransientOptions.DEFAULT_EDGE_SECONDS),
                TransientOptions.DEFAULT_DURATION_SECONDS, StepOptions.DEFAULTS, Double.NaN);
    }

    /** The turn-on run of {@code simulate --edge on}. */
    public static TransientOptions turnOnOptions() {
        return new TransientOptions(new DriveWaveform.TurnOn(TransientOptions.DEFAULT_EDGE_SECONDS),
                TransientOptions.DEFAULT_DURATION_SECONDS, StepOptions.DEFAULTS, Double.NaN);
    }

    /**
     * The column of one stage as it stands (no shared context).
     *
     * @param stage a stage without validation errors
     */
    public static Column evaluate(Stage stage) {
        return evaluate(new LineUpContext.Applied(stage, List.of()));
    }

    /**
     * The column of a stage with a shared context applied ({@link LineUpContext#applyTo(Stage)}): the
     * four phases in order ({@link #dc}, {@link #turnOff}, {@link #turnOn}, {@link #checks}) put
     * together by {@link #column}, the same methods the window runs one by one. Like the commands,
     * the solve and the checks each start a fresh {@link DcAnalysis}: an engine that has solved
     * another stage starts its Newton iterations elsewhere and may land a few units in the last place
     * away, and the line-up must give the commands' numbers exactly.
     */
    public static Column evaluate(LineUpContext.Applied applied) {
        Stage stage = applied.stage();
        PhaseResult dc = dc(stage);
        PhaseResult off = turnOff(stage);
        PhaseResult on = turnOn(stage, off);
        return column(applied, List.of(dc, off, on, checks(stage)));
    }

    /**
     * Runs one phase of a stage; {@link Phase#TURN_ON} runs regardless of the turn-off (use
     * {@link #turnOn(Stage, PhaseResult)} to skip it after a failed turn-off, as {@link #evaluate} does).
     */
    public static PhaseResult run(Phase phase, Stage stage) {
        return switch (phase) {
            case DC -> dc(stage);
            case TURN_OFF -> turnOff(stage);
            case TURN_ON -> turnOn(stage);
            case CHECKS -> checks(stage);
        };
    }

    /** {@link Phase#DC}: {@code solve} on a fresh engine with the default options, and the parts count. */
    public static PhaseResult dc(Stage stage) {
        Map<String, Double> v = nanValues(Phase.DC);
        List<String> notes = new ArrayList<>();
        Optional<Boolean> fullyOn = Optional.empty();
        Optional<StageRoles> roles = StageRecognition.of(stage).roles();
        try {
            OperatingPoint op = new DcAnalysis().solve(stage, SolveOptions.DEFAULT);
            Optional<SwitchVerdict> verdict = op.switchVerdict();
            if (verdict.isPresent()) {
                fullyOn = Optional.of(verdict.get().fullyOn());
                v.put("switchMargin", verdict.get().margin());
                v.put("switchPower", op.powerWatts(verdict.get().ref()));
            }
            if (roles.isPresent()) {
                v.put("coilCurrent", op.quantity(roles.get().relayRef(), Readings.COIL_CURRENT));
                roles.get().drivePinRef().ifPresent(pin -> v.put("pinCurrent", op.quantity(pin, Readings.CURRENT)));
            }
        } catch (SolverException e) {
            notes.add("no operating point: " + e.getMessage());
        }
        v.put("partsCount", (double) stage.parts().stream().filter(p -> p.kind() != PartKind.GROUND).count());
        return new PhaseResult(Phase.DC, v, fullyOn, Optional.empty(), Optional.empty(), notes);
    }

    /** {@link Phase#TURN_OFF}: the default turn-off run of {@code simulate}, with its waveform. */
    public static PhaseResult turnOff(Stage stage) {
        Map<String, Double> v = nanValues(Phase.TURN_OFF);
        try {
            TransientResult offRun = TransientAnalysis.run(stage, turnOffOptions());
            TransientMetrics off = offRun.metrics();
            v.put("peakSwitchVoltage", off.peakSwitchVolts());
            v.put("decayToDropOutCurrent", off.decayToReleaseCurrentSeconds());
            v.put("releaseTime", off.releaseTimeSeconds());
            v.put("suppressorEnergy", off.suppressorEnergyJoules());
            v.put("armatureSpeedAtBreak", off.armatureSpeedAtBreakMetresPerSecond());
            return new PhaseResult(Phase.TURN_OFF, v, Optional.empty(), Optional.of(offRun.waveform()),
                    Optional.empty(), List.of());
        } catch (SolverException | TransientFailureException e) {
            return new PhaseResult(Phase.TURN_OFF, v, Optional.empty(), Optional.empty(), Optional.empty(),
                    List.of("could not be simulated: " + e.getMessage()));
        }
    }

    /** {@link Phase#TURN_ON}: the turn-on run of {@code simulate --edge on}, for the operate time. */
    public static PhaseResult turnOn(Stage stage) {
        Map<String, Double> v = nanValues(Phase.TURN_ON);
        try {
            v.put("operateTime", TransientAnalysis.run(stage, turnOnOptions()).metrics().operateTimeSeconds());
            return new PhaseResult(Phase.TURN_ON, v, Optional.empty(), Optional.empty(), Optional.empty(), List.of());
        } catch (SolverException | TransientFailureException e) {
            return new PhaseResult(Phase.TURN_ON, v, Optional.empty(), Optional.empty(), Optional.empty(),
                    List.of("could not be simulated: " + e.getMessage()));
        }
    }

    /**
     * {@link Phase#TURN_ON} after the turn-off: not run when the turn-off could not be simulated (both
     * start from the same stage and fail the same way; one note says so), otherwise {@link #turnOn(Stage)}.
     */
    public static PhaseResult turnOn(Stage stage, PhaseResult turnOff) {
        if (turnOff.phase() != Phase.TURN_OFF) {
            throw new IllegalArgumentException("expected the turn-off phase, was " + turnOff.phase());
        }
        return turnOff.failed()
                ? new PhaseResult(Phase.TURN_ON, nanValues(Phase.TURN_ON), Optional.empty(), Optional.empty(),
                        Optional.empty(), List.of())
                : turnOn(stage);
    }

    /** {@link Phase#CHECKS}: {@code check} with the stage's own settings on a fresh engine. */
    public static PhaseResult checks(Stage stage) {
        Map<String, Double> v = nanValues(Phase.CHECKS);
        CheckReport report = StageChecks.run(stage, CheckOptions.DEFAULT.withSettings(stage.settings()),
                new DcAnalysis());
        report.check("relay.operates").ifPresent(c -> {
            v.put("coilVoltageWorstCorner", c.value());
            v.put("operateMargin", c.limit() > 0 ? c.value() / c.limit() : Double.NaN);
        });
        report.check("thermal.switch-junction").ifPresent(c -> v.put("junctionTemperature", c.value()));
        report.yield().ifPresent(y -> v.put("yield", y.yield()));
        return new PhaseResult(Phase.CHECKS, v, Optional.empty(), Optional.empty(), Optional.of(report), List.of());
    }

    /**
     * A column from the phases done so far (any order, each at most once): their metrics, NaN for the
     * rest; an empty check report until {@link Phase#CHECKS} is in; notes in phase order.
     *
     * @throws IllegalArgumentException if a phase is given twice
     */
    public static Column column(LineUpContext.Applied applied, List<PhaseResult> done) {
        Map<String, Double> v = new LinkedHashMap<>();
        METRICS.forEach(m -> v.put(m.key(), Double.NaN));
        java.util.EnumMap<Phase, PhaseResult> by = new java.util.EnumMap<>(Phase.class);
        for (PhaseResult r : done) {
            if (by.put(r.phase(), r) != null) {
                throw new IllegalArgumentException("the phase " + r.phase() + " is given twice");
            }
        }
        List<String> notes = new ArrayList<>();
        Optional<Boolean> fullyOn = Optional.empty();
        Optional<org.armature.solver.timedomain.Waveform> wave = Optional.empty();
        CheckReport report = new CheckReport(List.of(), Optional.empty(), List.of(), 0);
        for (PhaseResult r : by.values()) {
            v.putAll(r.values());
            notes.addAll(r.notes());
            if (r.switchFullyOn().isPresent()) {
                fullyOn = r.switchFullyOn();
            }
            if (r.turnOff().isPresent()) {
                wave = r.turnOff();
            }
            if (r.report().isPresent()) {
                report = r.report().get();
            }
        }
        return new Column(applied.stage(), v, fullyOn, report, applied.differences(), notes, wave, by.keySet());
    }

    private static Map<String, Double> nanValues(Phase phase) {
        Map<String, Double> v = new LinkedHashMap<>();
        for (Metric m : METRICS) {
            if (phaseOf(m) == phase) {
                v.put(m.key(), Double.NaN);
            }
        }
        return v;
    }

    /**
     * The columns holding the best value of a row (all of them on a tie); empty when fewer than two
     * columns have a value.
     */
    public static List<Integer> best(Metric metric, List<Column> columns) {
        return bestOf(columns, c -> c.value(metric.key()), metric.better());
    }

    /** The columns with the best status of a check (pass over warn over fail); empty if no column ran it. */
    public static List<Integer> bestCheck(String checkId, List<Column> columns) {
        return bestOf(columns, c -> c.report().check(checkId).map(r -> (double) r.status().ordinal())
                .orElse(Double.NaN), Better.LOWER);
    }

    private static List<Integer> bestOf(List<Column> columns, ToDoubleFunction<Column> value, Better better) {
        double best = Double.NaN;
        int counted = 0;
        for (Column c : columns) {
            double x = value.applyAsDouble(c);
            if (Double.isNaN(x)) {
                continue;
            }
            counted++;
            if (Double.isNaN(best) || (better == Better.LOWER ? x < best : x > best)) {
                best = x;
            }
        }
        List<Integer> out = new ArrayList<>();
        if (counted < 2) {
            return out;
        }
        for (int i = 0; i < columns.size(); i++) {
            if (Double.compare(value.applyAsDouble(columns.get(i)), best) == 0) {
                out.add(i);
            }
        }
        return out;
    }

    /**
     * The table as tab-separated text for a spreadsheet: a header row (figure, unit, one column per
     * stage), one row per figure and per check, best values followed by {@code " *"}; numbers in SI
     * units with a dot, empty where not available; lines end in {@code \n}.
     *
     * @param names the column headings, one per column
     */
    public static String tabSeparated(List<String> names, List<Column> columns) {
        StringBuilder b = new StringBuilder("figure\tunit");
        for (String n : names) {
            b.append('\t').append(n.replace('\t', ' ').replace('\n', ' '));
        }
        b.append('\n');
        for (Metric m : METRICS) {
            List<Integer> best = best(m, columns);
            b.append(m.label()).append('\t').append(m.unitSymbol());
            for (int i = 0; i < columns.size(); i++) {
                double v = columns.get(i).value(m.key());
                b.append('\t').append(Double.isFinite(v) ? Double.toString(v) : "").append(best.contains(i) ? " *" : "");
            }
            b.append('\n');
        }
        for (String id : checkIds(columns)) {
            List<Integer> best = bestCheck(id, columns);
            b.append("check ").append(id).append('\t');
            for (int i = 0; i < columns.size(); i++) {
                b.append('\t').append(columns.get(i).report().check(id).map(r -> r.status().word()).orElse(""))
                        .append(best.contains(i) ? " *" : "");
            }
            b.append('\n');
        }
        return b.toString();
    }

    /** The check ids any column reports, in the order of {@link StageChecks#IDS}, then others. */
    public static List<String> checkIds(List<Column> columns) {
        List<String> ids = new ArrayList<>();
        for (String id : StageChecks.IDS) {
            if (columns.stream().anyMatch(c -> c.report().check(id).isPresent())) {
                ids.add(id);
            }
        }
        for (Column c : columns) {
            for (CheckResult r : c.report().checks()) {
                if (!ids.contains(r.id())) {
                    ids.add(r.id());
                }
            }
        }
        return ids;
    }

    /**
     * One figure as the table prints it: engineering notation with the metric's unit, a whole number
     * of parts, the yield in percent, the armature speed in m/s; a dash where it is not available.
     */
    public static String format(Metric m, double v) {
        if (!Double.isFinite(v)) {
            return "\u2014";
        }
        if (m.key().equals("partsCount")) {
            return Long.toString(Math.round(v));
        }
        if (m.key().equals("yield")) {
            return org.armature.units.EngineeringNotation.format(100 * v, Unit.PERCENT);
        }
        if (m.unitSymbol().equals("m/s")) {
            return org.armature.units.EngineeringNotation.format(v, Unit.METRE) + "/s";
        }
        return org.armature.units.EngineeringNotation.format(v, m.unit());
    }
}
