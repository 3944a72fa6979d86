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
import org.armature.analysis.BaseDriveRule;
import org.armature.analysis.BaseNetworkSizing;
import org.armature.analysis.SizingOptions;
import org.armature.analysis.SizingResult;
import org.armature.analysis.SizingStep;
import org.armature.analysis.Suggestion;
import org.armature.io.StageFiles;
import org.armature.model.Finding;
import org.armature.model.Stage;
import org.armature.units.ESeries;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature size FILE}: the sizing assistant ({@link BaseNetworkSizing}): suggested drive
 * network values and the calculation behind them. With {@code --json}, exactly one JSON object:
 *
 * <pre>{@code
 * {"stage": "...", "topology": "low-side-npn", "forcedBeta": 10, "series": "E24",
 *  "suggestions": [{"ref": "R1", "param": "resistanceOhms", "value": 430, "tolerancePercent": 5,
 *                   "role": "base resistor", "rule": "..."}],
 *  "steps": [{"label": "coil current, worst case", "formula": "...", "value": 0.0425, "unit": "A"}, ...],
 *  "findings": [{"severity": "warning", "key": "sizing....", "ref": "Q1", "message": "..."}]}
 * }</pre>
 * {@code topology} uses the ids the {@code new} command takes. A stage the assistant cannot size (a
 * high side driven straight from the pin, no switch recognised) is a failure (exit 1) whose sentence
 * says why, not an empty calculation.
 */
@Command(name = "size", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Size the base or gate network of a stage and show the calculation step by step."})
final class SizeCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Stage file to size.")
    Path file;

    @Option(names = "--forced-beta", paramLabel = "β", description = "Forced β for the base current (default 10).")
    double forcedBeta = 10;

    @Option(names = "--series", paramLabel = "SERIES", converter = SeriesConverter.class,
            description = "Preferred-value series to round to: E6, E12, E24, E48, E96 or E192 (default E24).")
    ESeries series = ESeries.E24;

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of the calculation.")
    boolean json;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "Which stage of the file: its number from 1, or its name (default 1).")
    String stageSelector;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    @Override
    public Integer call() {
        CommandLine cl = spec.commandLine();
        if (!(forcedBeta > 0) || !Double.isFinite(forcedBeta)) {
            throw new CommandLine.ParameterException(cl, "--forced-beta must be a positive number.");
        }
        Stage stage = StageSelection.select(StageFiles.open(file), stageSelector, file, cl);
        SizingOptions options = SizingOptions.DEFAULT.withBaseDrive(new BaseDriveRule.ForcedBeta(forcedBeta))
                .withSeries(series);
        SizingResult r = BaseNetworkSizing.size(stage, options);
        if (r.suggestions().isEmpty() && r.steps().isEmpty()) {
            String why = r.findings().stream().map(Finding::message).findFirst()
                    .orElse("no switch and base or gate network were recognised.");
            throw new CommandFailedException("Nothing to size in stage \"" + org.armature.model.Validator.shorten(stage.name())
                    + "\": " + why);
        }
        PrintWriter out = cl.getOut();
        out.print(json ? json(stage, r) : text(stage, r));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    private String json(Stage stage, SizingResult r) {
        ObjectNode root = JSON.createObjectNode();
        root.put("stage", stage.name());
        if (r.topology().isPresent()) {
            root.put("topology", r.topology().get().name().toLowerCase(Locale.ROOT).replace('_', '-'));
        } else {
            root.putNull("topology");
        }
        root.put("forcedBeta", forcedBeta);
        root.put("series", series.name());
        ArrayNode sug = root.putArray("suggestions");
        for (Suggestion s : r.suggestions()) {
            ObjectNode n = sug.addObject();
            n.put("ref", s.ref());
            n.put("param", s.paramKey());
            n.put("value", s.value());
            n.put(ParamKeys.TOLERANCE_PERCENT, s.tolerancePercent());
            n.put("role", s.role());
            n.put("rule", s.rule());
        }
        ArrayNode steps = root.putArray("steps");
        for (SizingStep s : r.steps()) {
            ObjectNode n = steps.addObject();
            n.put("label", s.label());
            n.put("formula", s.formula());
            if (Double.isFinite(s.value())) {
                n.put("value", s.value());
            } else {
                n.putNull("value");
            }
            n.put("unit", s.unit().symbol());
        }
        ArrayNode findings = root.putArray("findings");
        for (Finding f : r.findings()) {
            ObjectNode n = findings.addObject();
            n.put("severity", f.severity().name().toLowerCase(Locale.ROOT));
            n.put("key", f.key());
            n.put("ref", f.ref());
            n.put("message", f.message());
        }
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    private String text(Stage stage, SizingResult r) {
        StringBuilder b = new StringBuilder();
        String nl = System.lineSeparator();
        b.append("Sizing of stage \"").append(stage.name()).append("\"")
                .append(r.topology().map(t -> " (" + t.title() + ")").orElse("")).append(", forced β ")
                .append(EngineeringNotation.format(forcedBeta, Unit.RATIO)).append(", ").append(series.name())
                .append(nl).append(nl);
        if (!r.suggestions().isEmpty()) {
            b.append("Suggested values").append(nl);
            for (Suggestion s : r.suggestions()) {
                b.append(String.format(Locale.ROOT, "  %-5s %-22s %10s ±%s%n", s.ref(), s.role(),
                        EngineeringNotation.format(s.value(), Unit.OHM),
                        EngineeringNotation.format(s.tolerancePercent(), Unit.PERCENT)));
            }
            b.append(nl);
        }
        b.append("Calculation").append(nl);
        for (SizingStep s : r.steps()) {
            b.append(String.format(Locale.ROOT, "  %-48s %12s   %s%n", s.label(), s.formattedValue(), s.formula()));
        }
        if (!r.findings().isEmpty()) {
            b.append(nl).append("Findings").append(nl);
            for (Finding f : r.findings()) {
                b.append("  ").append(f.key()).append(f.ref().isEmpty() ? "" : " (" + f.ref() + ")").append(": ")
                        .append(f.message()).append(nl);
            }
        }
        return b.toString();
    }

    /** Reads an E-series name. */
    static final class SeriesConverter implements CommandLine.ITypeConverter<ESeries> {
        @Override
        public ESeries convert(String text) {
            return ESeries.fromName(text).orElseThrow(() -> new CommandLine.TypeConversionException(
                    "'" + text + "' is not a preferred-value series; use E6, E12, E24, E48, E96 or E192."));
        }
    }
}
