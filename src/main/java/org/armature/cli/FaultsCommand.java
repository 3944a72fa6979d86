package org.armature.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.Spread;
import org.armature.io.StageFiles;
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
 * {@code armature faults FILE}: the fault dictionary of a stage ({@link FaultDictionary}): for the
 * healthy stage and every single fault, at both pin states, whether the relay operates and the load
 * is on, and the meter reading at every probe point; then the ambiguity groups. With {@code --json}:
 *
 * <pre>{@code
 * {"stage": "...", "meterOhms": 1e7, "meterAccuracy": "1%+2", "meterCounts": 4000, "probes": ["contact-common", ..., "coil"],
 *  "entries": [{"fault": "none", "high": {"operates": true, "loadOn": true, "readings": {"switch": 0.085, ...}},
 *               "low": {...}}, {"fault": "Q1:ce-short", ...}, ...],
 *  "ambiguityGroups": [["none", "D1:open", ...], ["Q1:ce-short"], ...]}
 * }</pre>
 */
@Command(name = "faults", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Print the fault dictionary of a stage: for every single fault and both pin states, "
                + "the relay's state and the meter reading at every probe point."})
final class FaultsCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Stage file.")
    Path file;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "Which stage of the file: its number from 1, or its name (default 1).")
    String stageSelector;

    @Mixin
    FaultOptions.MeterOptions meterOptions = new FaultOptions.MeterOptions();

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of a table.")
    boolean json;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    @Override
    public Integer call() {
        StageDocument doc = StageFiles.open(file);
        Stage stage = StageSelection.select(doc, stageSelector, file, spec.commandLine());
        Meter meter = meterOptions.apply(Meter.DEFAULT);
        StageSelection.requireValid(stage, "examined");
        FaultDictionary d = FaultDictionary.build(stage, meter);
        PrintWriter out = spec.commandLine().getOut();
        out.print(json ? json(d) : table(d));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    static String json(FaultDictionary d) {
        ObjectNode root = JSON.createObjectNode();
        root.put("stage", d.stage().name());
        root.put("meterOhms", d.meter().inputOhms());
        root.put("meterAccuracy", d.meter().accuracyText());
        root.put("meterCounts", d.meter().counts());
        ArrayNode probes = root.putArray("probes");
        d.probes().forEach(p -> probes.add(p.name()));
        ArrayNode entries = root.putArray("entries");
        for (FaultDictionary.Entry e : d.entries()) {
            ObjectNode n = entries.addObject();
            n.put("fault", e.name());
            if (!e.solved()) {
                n.put("failure", e.failure());
                continue;
            }
            for (boolean high : new boolean[] {true, false}) {
                ObjectNode s = n.putObject(high ? "high" : "low");
                FaultDictionary.State st = e.state(high);
                s.put("operates", st.operated());
                s.put("loadOn", st.loadOn());
                ObjectNode r = s.putObject("readings");
                for (int k = 0; k < d.probes().size(); k++) {
                    r.put(d.probes().get(k).name(), st.volts()[k]);
                }
            }
        }
        ArrayNode groups = root.putArray("ambiguityGroups");
        for (List<String> g : d.ambiguityGroups(Spread.DEFAULT)) {
            ArrayNode a = groups.addArray();
            g.forEach(a::add);
        }
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    static String table(FaultDictionary d) {
        StringBuilder b = new StringBuilder();
        String nl = System.lineSeparator();
        b.append("Fault dictionary of \"").append(d.stage().name()).append("\": ").append(d.entries().size() - 1)
                .append(" single faults; meter input ").append(EngineeringNotation.format(d.meter().inputOhms(), Unit.OHM))
                .append(" across each probe point (net to ground; coil: across the coil), accuracy ±(")
                .append(d.meter().accuracyText().replace("%+", " % + ")).append(" digits) on ")
                .append(d.meter().counts()).append(" counts.").append(nl);
        int width = 18;
        for (FaultDictionary.Entry e : d.entries()) {
            width = Math.max(width, e.name().length());
        }
        for (boolean high : new boolean[] {true, false}) {
            b.append(nl).append("Pin ").append(high ? "high" : "low").append(nl);
            b.append(String.format(Locale.ROOT, "  %-" + width + "s %-9s %-5s", "fault", "relay", "load"));
            d.probes().forEach(p -> b.append(String.format(Locale.ROOT, " %15s", p.name())));
            b.append(nl);
            for (FaultDictionary.Entry e : d.entries()) {
                b.append(String.format(Locale.ROOT, "  %-" + width + "s ", e.name()));
                if (!e.solved()) {
                    b.append("no operating point: ").append(e.failure()).append(nl);
                    continue;
                }
                FaultDictionary.State st = e.state(high);
                b.append(String.format(Locale.ROOT, "%-9s %-5s", st.operated() ? "operates" : "released",
                        st.loadOn() ? "on" : "off"));
                for (double v : st.volts()) {
                    b.append(String.format(Locale.ROOT, " %15s", EngineeringNotation.format(v, Unit.VOLT)));
                }
                b.append(nl);
            }
        }
        b.append(nl).append("Ambiguity groups (no probe tells them apart within the meter's and the parts' spread)")
                .append(nl);
        for (List<String> g : d.ambiguityGroups(Spread.DEFAULT)) {
            if (g.size() > 1) {
                b.append("  ").append(String.join(", ", g)).append(nl);
            }
        }
        return b.toString();
    }
}
