package org.armature.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import org.armature.model.ParamKeys;
import org.armature.netlist.Readings;
import org.armature.io.StageFiles;
import org.armature.model.ModelRange;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageRecognition;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.PartResult;
import org.armature.solver.SolveOptions;
import org.armature.solver.SolverException;
import org.armature.solver.SwitchVerdict;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature solve FILE}: the DC operating point of a stage of a stage file
 * ({@link DcAnalysis}), as a readable table or, with {@code --json}, as exactly one JSON object:
 *
 * <pre>{@code
 * {"stage": "...", "pinState": "high", "ambientCelsius": 25,
 *  "converged": true, "iterations": 14, "maxKclResidualAmps": 1.2e-13,
 *  "nodes": {"control": 0.78, "pin": 3.31, "supply": 12, "switch": 0.07, ...},
 *  "nets": {"control": "Q1's base (Q1.b, R1.b, R2.a)", "switch": "coil low side at Q1's collector (K1.a2, Q1.c)", ...},
 *  "parts": {"Q1": {"region": "saturation", "ic": 0.0299, "ib": 0.0025, "vce": 0.07, "vbe": 0.78,
 *                   "forcedBeta": 12, "power": 0.0041}, "K1": {...}, ...},
 *  "switch": {"ref": "Q1", "fullyOn": true, "margin": 8.1, "reason": "..."}}
 * }</pre>
 *
 * Each part lists its states (text) and quantities (numbers, SI units) under the keys of
 * {@link org.armature.netlist.PartNetwork}, sorted by key. Net names are the stage's test points
 * and, for the other nets, the names its roles give them ({@link StageRecognition}: {@code pin},
 * {@code control}, {@code switch}, {@code supply}, {@code contact-common}, ...); {@code nets} says
 * in words what each one is and which pins are on it. {@code switch} is {@code null} when no part
 * of the stage switches a relay coil.
 */
@Command(name = "solve", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Solve the DC operating point of a stage and print node voltages, part currents and "
                + "the switch verdict."})
final class SolveCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Stage file to solve.")
    Path file;

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of a table.")
    boolean json;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "Which stage of the file: its number from 1, or its name (default 1).")
    String stageSelector;

    @Option(names = "--fault", paramLabel = "PART:KIND",
            description = "Inject a fault before solving (repeatable), for example Q1:ce-short, D1:reversed or "
                    + "switch~supply:track-open (a track open between two nets); 'faults FILE' lists every fault "
                    + "of the stage.")
    java.util.List<String> faults;

    @Option(names = "--pin-state", paramLabel = "STATE", converter = Choices.Pin.class,
            description = "Drive pin state to solve: high or low (default: as stored in the file).")
    Choices.PinState pinState;

    @Option(names = "--ambient", paramLabel = "°C", converter = QuantityConverter.Celsius.class,
            description = "Ambient temperature, °C (default: as stored in the file).")
    Double ambient;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    @Override
    public Integer call() {
        StageDocument doc = StageFiles.open(file);
        Stage stage = StageSelection.select(doc, stageSelector, file, spec.commandLine());
        StageSelection.requireValid(stage, "solved");
        stage = FaultOptions.apply(stage, faults);
        SolveOptions options = SolveOptions.DEFAULT;
        if (pinState != null) {
            options = options.withPinHigh(pinState.isHigh());
        }
        if (ambient != null) {
            if (!ModelRange.ambientInRange(ambient)) {
                throw new CommandLine.ParameterException(spec.commandLine(), "--ambient must lie "
                        + ModelRange.ambientRangeText() + ", the range the copper and junction models hold over.");
            }
            options = options.withAmbient(ambient);
        }
        OperatingPoint op;
        try {
            op = new DcAnalysis().solve(stage, options);
        } catch (SolverException e) {
            throw new CommandFailedException("Stage \"" + stage.name() + "\" has no operating point: "
                    + e.getMessage(), e);
        }
        PrintWriter out = spec.commandLine().getOut();
        StageRecognition recognition = StageRecognition.of(stage);
        out.print(json ? json(stage, recognition, op) : table(stage, recognition, op));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    /** The operating point as one JSON object (see the class comment). */
    static String json(Stage stage, StageRecognition recognition, OperatingPoint op) {
        ObjectNode root = JSON.createObjectNode();
        root.put("stage", stage.name());
        root.put("pinState", op.pinHigh() ? "high" : "low");
        root.put("ambientCelsius", op.ambientCelsius());
        root.put("converged", op.converged());
        root.put("iterations", op.iterations());
        root.put("maxKclResidualAmps", op.maxKclResidualAmps());
        ObjectNode nodes = root.putObject("nodes");
        op.nodeVoltages().forEach(nodes::put);
        ObjectNode nets = root.putObject("nets");
        op.nodeVoltages().keySet().forEach(n -> nets.put(n, recognition.describe(n)));
        ObjectNode parts = root.putObject("parts");
        for (PartResult r : op.parts().values()) {
            ObjectNode p = parts.putObject(r.ref());
            new TreeMap<>(r.states()).forEach(p::put);
            new TreeMap<>(r.quantities()).forEach(p::put);
        }
        Optional<SwitchVerdict> v = op.switchVerdict();
        if (v.isPresent()) {
            ObjectNode s = root.putObject("switch");
            s.put("ref", v.get().ref());
            s.put("fullyOn", v.get().fullyOn());
            s.put("margin", v.get().margin());
            s.put("reason", v.get().reason());
        } else {
            root.putNull("switch");
        }
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    /** The operating point as a readable table. */
    static String table(Stage stage, StageRecognition recognition, OperatingPoint op) {
        StringBuilder b = new StringBuilder();
        String nl = System.lineSeparator();
        b.append("Stage \"").append(stage.name()).append("\", pin ").append(op.pinHigh() ? "high" : "low")
                .append(", ambient ").append(EngineeringNotation.format(op.ambientCelsius(), Unit.CELSIUS)).append(nl);
        b.append(op.converged() ? "Converged" : "Relay loop did not settle").append(" in ").append(op.iterations())
                .append(" iterations; largest KCL residual ")
                .append(EngineeringNotation.format(op.maxKclResidualAmps(), Unit.AMPERE)).append('.').append(nl);
        b.append(nl).append("Nodes").append(nl);
        for (Map.Entry<String, Double> e : op.nodeVoltages().entrySet()) {
            b.append(String.format(Locale.ROOT, "  %-16s %12s   %s%n", e.getKey(),
                    EngineeringNotation.format(e.getValue(), Unit.VOLT), recognition.describe(e.getKey())));
        }
        b.append(nl).append("Parts").append(nl);
        for (PartResult r : op.parts().values()) {
            if (r.quantities().isEmpty() && r.states().isEmpty()) {
                continue;
            }
            StringBuilder line = new StringBuilder("  ").append(r.ref()).append(" (").append(r.kind().title())
                    .append(')');
            new TreeMap<>(r.states()).forEach((k, v) -> line.append(", ").append(PartWords.state(k, v)));
            b.append(line).append(nl);
            java.util.List<String> values = new java.util.ArrayList<>();
            new TreeMap<>(r.quantities()).forEach((k, v) -> values.add(PartWords.label(k) + " "
                    + EngineeringNotation.format(v, PartWords.unit(k))));
            if (!values.isEmpty()) {
                b.append("      ").append(String.join("; ", values)).append(nl);
            }
        }
        Optional<SwitchVerdict> v = op.switchVerdict();
        b.append(nl).append("Switch ");
        b.append(v.map(s -> s.ref() + ": " + s.reason()).orElse("none: no part switches a relay coil.")).append(nl);
        return b.toString();
    }

    /** The unit of a part quantity, by its key (see {@link org.armature.netlist.PartNetwork}). */
    static Unit unitOf(String key) {
        String k = key.toLowerCase(Locale.ROOT);
        if (k.equals(Readings.IC) || k.equals(Readings.IB) || k.equals(Readings.ID) || k.equals(Readings.IIN) || k.endsWith("current")) {
            return Unit.AMPERE;
        }
        if (k.startsWith("v") || k.endsWith("voltage") || k.endsWith("volts")) {
            return Unit.VOLT;
        }
        if (k.endsWith("power")) {
            return Unit.WATT;
        }
        if (k.endsWith("resistance")) {
            return Unit.OHM;
        }
        if (k.endsWith("temperature")) {
            return Unit.CELSIUS;
        }
        return Unit.RATIO;
    }
}
