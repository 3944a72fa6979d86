package org.armature.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.armature.model.ParamKeys;
import org.armature.analysis.CheckOptions;
import org.armature.analysis.CheckReport;
import org.armature.analysis.CheckResult;
import org.armature.analysis.StageChecks;
import org.armature.analysis.TopologyCheck;
import org.armature.analysis.YieldResult;
import org.armature.io.StageFiles;
import org.armature.model.Conditions;
import org.armature.model.Finding;
import org.armature.model.ModelRange;
import org.armature.model.Stage;
import org.armature.model.StageSettings;
import org.armature.solver.DcAnalysis;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature check FILE}: the verdicts of {@link StageChecks} over every corner, with an
 * optional seeded Monte Carlo yield. With {@code --json}, exactly one JSON object:
 *
 * <pre>{@code
 * {"stage": "...",
 *  "checks": [{"id": "relay.operates", "status": "pass|warn|fail", "value": 10.7, "limit": 12.4, "unit": "V",
 *              "corner": {"supply": 10.8, "ambient": 60, ...}, "explanation": "...", "method": "...",
 *              "refs": ["K1"]}, ...],
 *  "yield": 0.97,
 *  "monteCarlo": {"samples": 1000, "seed": 1, "passed": 970, "unsolved": 0, "culprits": {"supply": 30},
 *                 "topCulprit": "supply"},
 *  "findings": [{"severity": "warning", "key": "...", "ref": "...", "message": "..."}],
 *  "corners": 256}
 * }</pre>
 * Values are SI; a value that is not finite (an unclamped coil) is {@code null}; {@code yield} and
 * {@code monteCarlo} are {@code null} without {@code --monte-carlo}. A failing verdict is a result,
 * not a command failure: the exit status is 0 whenever the checks ran.
 */
@Command(name = "check", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Check a stage at every corner of its tolerances: relay operates and releases, switch "
                + "saturated, ratings, thermal, coil voltage and temperature, contact current, voltage, inrush and "
                + "break; optionally a Monte Carlo yield. Reports the checks that ran; it "
                + "never calls a design safe."})
final class CheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Stage file to check.")
    Path file;

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of a report.")
    boolean json;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "Which stage of the file: its number from 1, or its name (default 1).")
    String stageSelector;

    @Option(names = "--supply-tolerance", paramLabel = "PCT", converter = Percent.class,
            description = "Coil supply tolerance, ± percent (default: as stored in the file).")
    Double supplyTolerance;

    @Option(names = "--ambient-min", paramLabel = "°C", converter = QuantityConverter.Celsius.class,
            description = "Coldest ambient of the corners, °C (default: as stored).")
    Double ambientMin;

    @Option(names = "--ambient-max", paramLabel = "°C", converter = QuantityConverter.Celsius.class,
            description = "Hottest ambient of the corners, °C (default: as stored).")
    Double ambientMax;

    @Option(names = "--monte-carlo", paramLabel = "N",
            description = "Monte Carlo samples for a yield estimate, at most " + MAX_MONTE_CARLO_TEXT + " (default: as stored in the file, else none).")
    Integer monteCarlo;

    @Option(names = "--seed", paramLabel = "S",
            description = "Seed of the Monte Carlo sampler (default: as stored in the file, else 1).")
    Long seed;

    @Option(names = "--release-time", paramLabel = "SECONDS", converter = Seconds.class,
            description = "Release-time requirement (for example 10m), checked at turn-off (default: as stored).")
    Double releaseTime;

    @Option(names = "--no-transient",
            description = "Judge the turn-off with the closed-form estimates instead of the transient engine.")
    boolean noTransient;

    /** The most Monte Carlo samples a check runs. */
    static final int MAX_MONTE_CARLO = 100_000;
    private static final String MAX_MONTE_CARLO_TEXT = "100,000";

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    /** Refuses an ambient option outside the range the device models hold over. */
    private static void requireModelRange(CommandLine cl, String option, Double celsius) {
        if (celsius != null && !ModelRange.ambientInRange(celsius)) {
            throw new CommandLine.ParameterException(cl, option + " must lie " + ModelRange.ambientRangeText()
                    + ", the range the copper and junction models hold over.");
        }
    }

    @Override
    public Integer call() {
        CommandLine cl = spec.commandLine();
        if (monteCarlo != null && (monteCarlo < 0 || monteCarlo > MAX_MONTE_CARLO)) {
            throw new CommandLine.ParameterException(cl, "--monte-carlo " + monteCarlo + " is outside 0 to "
                    + MAX_MONTE_CARLO_TEXT + " samples; expected at most " + MAX_MONTE_CARLO_TEXT
                    + " (about 10 s on one core), which puts a yield near 99 % within ±0.1 %.");
        }
        requireModelRange(cl, "--ambient-min", ambientMin);
        requireModelRange(cl, "--ambient-max", ambientMax);
        if (supplyTolerance != null && !(supplyTolerance >= 0 && supplyTolerance <= 50)) {
            throw new CommandLine.ParameterException(cl, "--supply-tolerance must lie from 0 to 50 %.");
        }
        Stage stage = StageSelection.select(StageFiles.open(file), stageSelector, file, cl);
        stage = withOverrides(stage, cl);
        StageSelection.requireValid(stage, "checked");
        CheckOptions chosen = options(stage.settings(), monteCarlo, seed, releaseTime)
                .withTransient(!noTransient);
        Stage checked = stage;
        CheckReport report = Progress.run(() -> StageChecks.run(checked, chosen, new DcAnalysis()), cl.getErr(),
                "check", chosen.monteCarloSamples() == 0 ? "" : String.format(Locale.ROOT, "%,d Monte Carlo samples", chosen.monteCarloSamples()));
        PrintWriter out = cl.getOut();
        out.print(json ? json(stage, report) : text(stage, report));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    /**
     * The check options of a stage's own settings, each overridden by its command-line option when
     * that was given (null: not given).
     */
    static CheckOptions options(StageSettings settings, Integer samples, Long seed, Double releaseSeconds) {
        CheckOptions o = CheckOptions.DEFAULT.withSettings(settings);
        if (samples != null || seed != null) {
            int n = samples != null ? samples : settings.monteCarloSamples();
            o = o.withMonteCarlo(n, seed != null ? seed : settings.monteCarloSeed());
        }
        if (releaseSeconds != null) {
            o = o.withReleaseTimeRequirement(releaseSeconds);
        }
        return o;
    }

    private Stage withOverrides(Stage stage, CommandLine cl) {
        Stage s = stage;
        if (supplyTolerance != null) {
            String supply = TopologyCheck.recognise(s).flatMap(r -> r.coilSupplyRef())
                    .orElseThrow(() -> new CommandFailedException("Stage \"" + stage.name()
                            + "\" has no coil supply to give a tolerance."));
            double tol = supplyTolerance;
            s = s.updatePart(supply, p -> p.with(ParamKeys.TOLERANCE_PERCENT, tol));
        }
        if (ambientMin != null || ambientMax != null) {
            Conditions c = s.conditions();
            double min = ambientMin != null ? ambientMin : c.ambientMinCelsius();
            double max = ambientMax != null ? ambientMax : c.ambientMaxCelsius();
            if (!(min <= max)) {
                throw new CommandLine.ParameterException(cl, "--ambient-min must not exceed --ambient-max.");
            }
            double nominal = Math.min(max, Math.max(min, c.ambientCelsius()));
            s = s.withConditions(new Conditions(c.pinHigh(), nominal, min, max));
        }
        return s;
    }

    /** The report as one JSON object (see the class comment). */
    static String json(Stage stage, CheckReport report) {
        ObjectNode root = JSON.createObjectNode();
        root.put("stage", stage.name());
        ArrayNode checks = root.putArray("checks");
        for (CheckResult c : report.checks()) {
            putCheck(checks, c);
        }
        if (report.yield().isPresent()) {
            YieldResult y = report.yield().get();
            root.put("yield", y.yield());
            ObjectNode mc = root.putObject("monteCarlo");
            mc.put("samples", y.samples());
            mc.put("seed", y.seed());
            mc.put("passed", y.passed());
            mc.put("unsolved", y.unsolved());
            ObjectNode culprits = mc.putObject("culprits");
            y.culpritCounts().forEach(culprits::put);
            if (y.topCulprit().isPresent()) {
                mc.put("topCulprit", y.topCulprit().get());
            } else {
                mc.putNull("topCulprit");
            }
        } else {
            root.putNull("yield");
            root.putNull("monteCarlo");
        }
        ArrayNode findings = root.putArray("findings");
        for (Finding f : report.findings()) {
            ObjectNode n = findings.addObject();
            n.put("severity", f.severity().name().toLowerCase(Locale.ROOT));
            n.put("key", f.key());
            n.put("ref", f.ref());
            n.put("message", f.message());
        }
        root.put("corners", report.cornerCount());
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    /** One check as the JSON object {@code check --json} prints (also used by {@code compare}). */
    static void putCheck(ArrayNode checks, CheckResult c) {
        ObjectNode n = checks.addObject();
        n.put("id", c.id());
        n.put("status", c.status().word());
        number(n, "value", c.value());
        number(n, "limit", c.limit());
        n.put("unit", c.unit().symbol());
        ObjectNode corner = n.putObject("corner");
        c.corner().forEach((k, v) -> number(corner, k, v));
        n.put("explanation", c.explanation());
        n.put("method", c.method());
        ArrayNode refs = n.putArray("refs");
        c.refs().forEach(refs::add);
    }

    private static void number(ObjectNode n, String key, double v) {
        if (Double.isFinite(v)) {
            n.put(key, v);
        } else {
            n.putNull(key);
        }
    }

    /** The report as readable text. */
    static String text(Stage stage, CheckReport report) {
        StringBuilder b = new StringBuilder();
        String nl = System.lineSeparator();
        b.append("Checks of stage \"").append(stage.name()).append("\" over ").append(report.cornerCount())
                .append(" corners").append(nl).append(nl);
        java.util.List<Finding> cautions = report.findings().stream().filter(CheckCommand::isCaution).toList();
        if (!cautions.isEmpty()) {
            b.append("Cautions").append(nl);
            for (Finding f : cautions) {
                b.append("  ").append(f.message()).append(nl);
            }
            b.append(nl);
        }
        for (CheckResult c : report.checks()) {
            b.append(String.format(Locale.ROOT, "  %-4s  %-26s %12s  (limit %s)%n", c.status().name(), c.id(),
                    EngineeringNotation.format(c.value(), c.unit()), EngineeringNotation.format(c.limit(), c.unit())));
            b.append("        ").append(c.explanation()).append(nl);
            if (!c.cornerText().isEmpty()) {
                b.append("        at ").append(c.cornerText()).append(nl);
            }
        }
        report.yield().ifPresent(y -> {
            b.append(nl).append("Monte Carlo: ").append(y.passed()).append(" of ").append(y.samples())
                    .append(" samples work (yield ").append(EngineeringNotation.format(100 * y.yield(), Unit.PERCENT))
                    .append(", seed ").append(y.seed()).append(")");
            y.topCulprit().ifPresent(t -> b.append("; most often behind a failure: ").append(t));
            b.append('.').append(nl);
        });
        java.util.List<Finding> others = report.findings().stream().filter(f -> !isCaution(f)).toList();
        if (!others.isEmpty()) {
            b.append(nl).append("Findings").append(nl);
            for (Finding f : others) {
                b.append("  ").append(f.severity().name().toLowerCase(Locale.ROOT)).append(' ').append(f.key())
                        .append(f.ref().isEmpty() ? "" : " (" + f.ref() + ")").append(": ").append(f.message()).append(nl);
            }
        }
        b.append(nl).append("These are the checks that ran; they do not show that the design is safe.").append(nl);
        return b.toString();
    }

    /** The safety cautions (contact side above safety extra-low voltage), printed before the checks. */
    private static boolean isCaution(Finding f) {
        return f.key().startsWith("caution.");
    }

    /** Percent, for annotated options. */
    static final class Percent extends QuantityConverter {
        Percent() {
            super(Unit.PERCENT);
        }
    }

    /** Seconds, for annotated options. */
    static final class Seconds extends QuantityConverter {
        Seconds() {
            super(Unit.SECOND);
        }
    }
}
