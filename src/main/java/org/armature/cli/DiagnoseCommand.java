package org.armature.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.armature.analysis.faults.Diagnosis;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.FaultKind;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.PriorTable;
import org.armature.analysis.faults.Priors;
import org.armature.analysis.faults.Probe;
import org.armature.analysis.faults.Reading;
import org.armature.analysis.faults.SavedHunt;
import org.armature.io.StageFiles;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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

    @Mixin
    FaultOptions.MeterOptions meterOptions = new FaultOptions.MeterOptions();

    @Option(names = "--prior", paramLabel = "KIND=WEIGHT",
            description = "Change the prior weight of a fault kind (repeatable), for example ce-short=2, or of the "
                    + "healthy stage, none=5; the defaults come from published failure rates (docs/fault-priors.md).")
    List<String> priors;

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of a table.")
    boolean json;

    @Option(names = "--record", description = "Keep what was ranked (symptom, readings, meter, changed priors) as the "
            + "file's fault hunt, saved in the file (it replaces a hunt kept before), so the window and the report "
            + "(export --pdf) show it.")
    boolean record;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    @Override
    public Integer call() {
        StageDocument doc = StageFiles.open(file);
        Stage stage = StageSelection.select(doc, stageSelector, file, spec.commandLine());
        int index = 0;
        while (doc.stages().get(index) != stage) {
            index++;
        }
        StageSelection.requireValid(stage, "diagnosed");
        Diagnosed x = diagnose(doc, index, new Request(Optional.ofNullable(symptom),
                readings == null ? List.of() : readings, priors == null ? List.of() : priors, meterOptions));
        PrintWriter out = spec.commandLine().getOut();
        out.print(json ? json(x) : table(x));
        out.flush();
        if (record) {
            Optional<FaultHunt> before = doc.faultHunt();
            StageFiles.save(doc.withFaultHunt(Optional.of(x.hunt())), file);
            PrintWriter err = spec.commandLine().getErr();
            err.println("Recorded the fault hunt on stage \"" + stage.name() + "\" in " + file.getFileName()
                    + (before.isPresent() && before.get().stageIndex() != index
                    ? " (it replaces the hunt kept on stage \"" + doc.stages().get(before.get().stageIndex()).name()
                    + "\")." : "."));
            err.flush();
        }
        return CommandLine.ExitCode.OK;
    }

    /**
     * What the command line asked for.
     *
     * @param symptom the symptom's word, if given
     * @param readings the readings as written
     * @param priors the prior weights as written ({@code KIND=WEIGHT})
     * @param meter the meter options
     */
    record Request(Optional<String> symptom, List<String> readings, List<String> priors,
                   FaultOptions.MeterOptions meter) {
    }

    /**
     * A diagnosis with what it was computed from.
     *
     * @param dictionary the dictionary (with the meter used)
     * @param result the ranking
     * @param priors the priors used
     * @param savedHunt true when the document's saved fault hunt gave the symptom and readings
     * @param readingCount how many readings were ranked
     * @param hunt what was ranked, as a fault hunt the document can keep ({@code --record})
     */
    record Diagnosed(FaultDictionary dictionary, Diagnosis.Result result, Priors priors, boolean savedHunt,
                     int readingCount, FaultHunt hunt) {
    }

    /**
     * Ranks the faults of one stage of a document. With no reading and no symptom on the command line
     * and a fault hunt saved on this stage, the saved hunt is ranked ({@link SavedHunt}): its symptom,
     * readings, meter and priors, with any meter or prior option given here put over them. Otherwise
     * the command line's symptom and readings (and the default meter and priors, changed by the
     * options) are ranked, and a saved hunt is not used.
     *
     * @param doc the document
     * @param stageIndex the stage's index in the document, from 0
     * @param request the options
     * @return the ranking
     * @throws CommandFailedException with one sentence naming what is valid, for a bad word
     */
    static Diagnosed diagnose(StageDocument doc, int stageIndex, Request request) {
        Stage stage = doc.stages().get(stageIndex);
        Optional<FaultHunt> hunt = doc.faultHunt().filter(h -> h.stageIndex() == stageIndex);
        boolean useSaved = hunt.isPresent() && request.readings().isEmpty() && request.symptom().isEmpty();
        try {
            // the saved weights, then those given here over them, read by the one SavedHunt.priors
            Map<String, Double> weights = new LinkedHashMap<>(useSaved ? hunt.get().priorWeights() : Map.of());
            for (String t : request.priors()) {
                Map.Entry<String, Double> w = Priors.parseWeight(t);
                weights.put(w.getKey(), w.getValue());
            }
            Priors p = SavedHunt.priors(weights);
            Meter meter = request.meter().apply(useSaved ? SavedHunt.meter(hunt.get().meter()) : Meter.DEFAULT);
            Optional<String> s = request.symptom().isPresent() ? request.symptom()
                    : useSaved ? hunt.get().symptom() : Optional.empty();
            FaultDictionary d = FaultDictionary.build(stage, meter);
            List<FaultHunt.HuntReading> list = new ArrayList<>();
            if (useSaved) {
                list.addAll(hunt.get().readings());
            }
            for (String r : request.readings()) {
                Reading read = Reading.parse(d, r);
                list.add(new FaultHunt.HuntReading(read.probe(), read.pinHigh(), read.volts()));
            }
            // what is ranked is a hunt, ranked the one way a saved hunt is (and what --record keeps)
            FaultHunt ranked = new FaultHunt(stageIndex, s, SavedHunt.setting(meter), list, weights);
            return new Diagnosed(d, SavedHunt.rank(d, ranked).result(), p, useSaved, list.size(), ranked);
        } catch (IllegalArgumentException e) {
            throw new CommandFailedException(e.getMessage());
        }
    }

    /** Reads {@code NET@high=VOLTS} ({@link Reading#parse}); an unknown net or state is one sentence naming the valid ones. */
    static Reading parse(FaultDictionary d, String text) {
        try {
            return Reading.parse(d, text);
        } catch (IllegalArgumentException e) {
            throw new CommandFailedException(e.getMessage());
        }
    }

    static String json(Diagnosed diagnosed) {
        Diagnosis.Result r = diagnosed.result();
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
        root.put("savedHunt", diagnosed.savedHunt());
        ObjectNode pr = root.putObject("priors");
        pr.put("source", PriorTable.SOURCE);
        ObjectNode changed = pr.putObject("changed");
        if (diagnosed.priors().noneWeight() != Priors.DEFAULT_NONE_WEIGHT) {
            changed.put(Priors.NONE, diagnosed.priors().noneWeight());
        }
        for (FaultKind k : FaultKind.values()) {
            if (diagnosed.priors().kindWeights().containsKey(k)) {
                changed.put(k.id(), diagnosed.priors().kindWeights().get(k));
            }
        }
        ObjectNode m = root.putObject("meter");
        m.put("inputOhms", diagnosed.dictionary().meter().inputOhms());
        m.put("accuracy", diagnosed.dictionary().meter().accuracyText());
        m.put("counts", diagnosed.dictionary().meter().counts());
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    /** The ranking as text: candidates above 0.1 % (at least five), each with its readings. */
    static String table(Diagnosed x) {
        FaultDictionary d = x.dictionary();
        Diagnosis.Result r = x.result();
        StringBuilder b = new StringBuilder();
        String nl = System.lineSeparator();
        if (x.savedHunt()) {
            b.append("Ranking the fault hunt saved in the file (").append(x.readingCount())
                    .append(x.readingCount() == 1 ? " reading" : " readings")
                    .append("); readings or a symptom given here would replace it.").append(nl);
        }
        b.append(x.priors().isDefault() ? "Priors: " : "Priors changed: " + x.priors().describeChanges() + "; the others: ")
                .append(PriorTable.SOURCE).append('.').append(nl);
        b.append("Meter: ").append(EngineeringNotation.format(d.meter().inputOhms(), Unit.OHM)).append(" input, ±(")
                .append(d.meter().accuracyText().replace("%+", " % + ")).append(" digits) on ")
                .append(d.meter().counts()).append(" counts.").append(nl).append(nl);
        b.append("Candidates for \"").append(d.stage().name()).append("\" (posterior probability)").append(nl);
        int width = 18;
        int counted = 0;
        for (Diagnosis.Candidate c : r.candidates()) {
            if (counted >= 5 && c.probability() < 1e-3) {
                break;
            }
            counted++;
            width = Math.max(width, c.name().length());
        }
        int shown = 0;
        for (Diagnosis.Candidate c : r.candidates()) {
            if (shown >= 5 && c.probability() < 1e-3) {
                break;
            }
            shown++;
            b.append(String.format(Locale.ROOT, "  %-" + width + "s %6.1f %%%s%n", c.name(), 100 * c.probability(),
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
