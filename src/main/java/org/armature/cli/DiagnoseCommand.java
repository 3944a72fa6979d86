package org.armature.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.armature.analysis.faults.Diagnosis;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.Priors;
import org.armature.analysis.faults.Probe;
import org.armature.analysis.faults.Reading;
import org.armature.analysis.faults.Spread;
import org.armature.analysis.faults.Symptom;
import org.armature.io.StageFiles;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature diagnose FILE}: ranks the single faults of a stage by posterior probability given
 * the symptom and the readings ({@link Diagnosis}), and names the next measurement. With
 * {@code --json}:
 *
 * <pre>{@code
 * {"candidates": [{"fault": "D1:short", "probability": 0.93, "symptomExplained": true,
 *                  "explains": [{"net": "switch", "state": "high", "expectedVolts": 11.97,
 *                                "measuredVolts": 11.9, "sigmaVolts": 0.27}]}, ...],
 *  "next": {"net": "control", "state": "high", "gainBits": 1.2}}
 * }</pre>
 * The healthy stage is the candidate {@code none}; {@code next} is {@code null} when every probe
 * point is measured.
 */
@Command(name = "diagnose", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Rank the likely failed parts of a stage from the symptom and meter readings, and name "
                + "the measurement to take next."})
final class DiagnoseCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Stage file.")
    Path file;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "Which stage of the file: its number from 1, or its name (default 1).")
    String stageSelector;

    @Option(names = "--symptom", paramLabel = "SYMPTOM",
            description = "What the relay does: no-operate, no-release or chatter.")
    String symptom;

    @Option(names = "--reading", paramLabel = "NET@STATE=VOLTS",
            description = "A meter reading (repeatable): a net as 'solve' names it, or 'coil' across the coil; "
                    + "the pin state high or low; the volts shown, for example switch@high=11.9.")
    List<String> readings;

    @Option(names = "--meter-resistance", paramLabel = "OHMS", converter = QuantityConverter.Ohms.class,
            description = "The meter's input resistance (default 10M).")
    Double meterOhms;

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of a table.")
    boolean json;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    @Override
    public Integer call() {
        Optional<Symptom> s = Optional.empty();
        if (symptom != null) {
            s = Optional.of(Symptom.byId(symptom).orElseThrow(() -> new CommandFailedException(
                    "Unknown symptom '" + symptom + "'; expected no-operate, no-release or chatter.")));
        }
        StageDocument doc = StageFiles.open(file);
        Stage stage = StageSelection.select(doc, stageSelector, file, spec.commandLine());
        StageSelection.requireValid(stage, "diagnosed");
        Meter meter = meterOhms == null ? Meter.DEFAULT : Meter.DEFAULT.withInputOhms(meterOhms);
        FaultDictionary d = FaultDictionary.build(stage, meter);
        List<Reading> list = new ArrayList<>();
        for (String r : readings == null ? List.<String>of() : readings) {
            list.add(parse(d, r));
        }
        Diagnosis.Result result = Diagnosis.rank(d, Spread.DEFAULT, Priors.DEFAULT, s, list);
        PrintWriter out = spec.commandLine().getOut();
        out.print(json ? json(result) : table(d, result));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    /** Reads {@code NET@high=VOLTS} ({@link Reading#parse}); an unknown net or state is one sentence naming the valid ones. */
    static Reading parse(FaultDictionary d, String text) {
        try {
            return Reading.parse(d, text);
        } catch (IllegalArgumentException e) {
            throw new CommandFailedException(e.getMessage());
        }
    }

    static String json(Diagnosis.Result r) {
        ObjectNode root = JSON.createObjectNode();
        ArrayNode cands = root.putArray("candidates");
        for (Diagnosis.Candidate c : r.candidates()) {
            ObjectNode n = cands.addObject();
            n.put("fault", c.name());
            n.put("probability", c.probability());
            n.put("symptomExplained", c.symptomExplained());
            ArrayNode ex = n.putArray("explains");
            for (Diagnosis.Explanation e : c.explains()) {
                ObjectNode x = ex.addObject();
                x.put("net", e.probe());
                x.put("state", e.pinHigh() ? "high" : "low");
                x.put("expectedVolts", e.expectedVolts());
                x.put("measuredVolts", e.measuredVolts());
                x.put("sigmaVolts", e.sigmaVolts());
            }
        }
        if (r.next().isPresent()) {
            ObjectNode n = root.putObject("next");
            n.put("net", r.next().get().probe());
            n.put("state", r.next().get().pinHigh() ? "high" : "low");
            n.put("gainBits", r.next().get().gainBits());
        } else {
            root.putNull("next");
        }
        ArrayNode unsolved = root.putArray("unsolved");
        r.unsolved().forEach(unsolved::add);
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    /** The ranking as text: candidates above 0.1 % (at least five), each with its readings. */
    static String table(FaultDictionary d, Diagnosis.Result r) {
        StringBuilder b = new StringBuilder();
        String nl = System.lineSeparator();
        b.append("Candidates for \"").append(d.stage().name()).append("\" (posterior probability)").append(nl);
        int shown = 0;
        for (Diagnosis.Candidate c : r.candidates()) {
            if (shown >= 5 && c.probability() < 1e-3) {
                break;
            }
            shown++;
            b.append(String.format(Locale.ROOT, "  %-18s %6.1f %%%s%n", c.name(), 100 * c.probability(),
                    c.symptomExplained() ? "" : "  (does not show the symptom)"));
            for (Diagnosis.Explanation e : c.explains()) {
                b.append(String.format(Locale.ROOT, "      %s, pin %s: expected %s, measured %s (%+.1f σ)%n",
                        e.probe(), e.pinHigh() ? "high" : "low", EngineeringNotation.format(e.expectedVolts(), Unit.VOLT),
                        EngineeringNotation.format(e.measuredVolts(), Unit.VOLT), e.zScore()));
            }
        }
        b.append(nl);
        b.append(r.next().map(n -> String.format(Locale.ROOT, "Next: measure %s with the pin %s (%.2f bits expected).",
                n.probe().equals(Probe.COIL) ? "across the coil" : n.probe() + " to ground", n.pinHigh() ? "high" : "low",
                n.gainBits())).orElse("Every probe point is measured.")).append(nl);
        if (!r.unsolved().isEmpty()) {
            b.append("Not ranked (no operating point): ").append(String.join(", ", r.unsolved())).append(nl);
        }
        return b.toString();
    }
}
