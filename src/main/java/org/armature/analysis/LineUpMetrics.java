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
     * One stage's column.
     *
     * @param stage the stage as judged (shared context applied, if any)
     * @param values every metric of {@link #METRICS} by key, NaN where not available
     * @param switchFullyOn solve's switch verdict; empty when no part switches a relay coil or the
     *     stage has no operating point
     * @param report the checks, exactly as {@code check} reports them
     * @param differences where the stage's own parts differed from the shared context
     * @param notes runs that failed, in words
     * @param turnOff the turn-off run's waveform (the one {@code simulate} makes), if it ran
     */
    public record Column(Stage stage, Map<String, Double> values, Optional<Boolean> switchFullyOn,
                         CheckReport report, List<LineUpContext.Difference> differences, List<String> notes,
                         Optional<org.armature.solver.timedomain.Waveform> turnOff) {

        public Column {
            values = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(values));
            differences = List.copyOf(differences);
            notes = List.copyOf(notes);
        }

        /** The value of a metric, NaN when not available. */
        public double value(String key) {
            return values.getOrDefault(key, Double.NaN);
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
     * The column of a stage with a shared context applied ({@link LineUpContext#applyTo(Stage)}).
     * Like the commands, the solve and the checks each start a fresh {@link DcAnalysis}: an engine
     * that has solved another stage starts its Newton iterations elsewhere and may land a few units in
     * the last place away, and the line-up must give the commands' numbers exactly.
     */
    public static Column evaluate(LineUpContext.Applied applied) {
        Stage stage = applied.stage();
        Map<String, Double> v = new LinkedHashMap<>();
        METRICS.forEach(m -> v.put(m.key(), Double.NaN));
        List<String> notes = new ArrayList<>();
        Optional<StageRoles> roles = StageRecognition.of(stage).roles();
        Optional<Boolean> fullyOn = Optional.empty();
        Optional<org.armature.solver.timedomain.Waveform> wave = Optional.empty();
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
        try {
            TransientResult offRun = TransientAnalysis.run(stage, turnOffOptions());
            wave = Optional.of(offRun.waveform());
            TransientMetrics off = offRun.metrics();
            v.put("peakSwitchVoltage", off.peakSwitchVolts());
            v.put("decayToDropOutCurrent", off.decayToReleaseCurrentSeconds());
            v.put("releaseTime", off.releaseTimeSeconds());
            v.put("suppressorEnergy", off.suppressorEnergyJoules());
            v.put("armatureSpeedAtBreak", off.armatureSpeedAtBreakMetresPerSecond());
            TransientResult on = TransientAnalysis.run(stage, turnOnOptions());
            v.put("operateTime", on.metrics().operateTimeSeconds());
        } catch (SolverException | TransientFailureException e) {
            notes.add("could not be simulated: " + e.getMessage());
        }
        CheckReport report = StageChecks.run(stage, CheckOptions.DEFAULT.withSettings(stage.settings()),
                new DcAnalysis());
        report.check("relay.operates").ifPresent(c -> {
            v.put("coilVoltageWorstCorner", c.value());
            v.put("operateMargin", c.limit() > 0 ? c.value() / c.limit() : Double.NaN);
        });
        report.check("thermal.switch-junction").ifPresent(c -> v.put("junctionTemperature", c.value()));
        report.yield().ifPresent(y -> v.put("yield", y.yield()));
        v.put("partsCount", (double) stage.parts().stream().filter(p -> p.kind() != PartKind.GROUND).count());
        return new Column(stage, v, fullyOn, report, applied.differences(), notes, wave);
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
