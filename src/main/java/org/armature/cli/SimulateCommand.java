package org.armature.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.armature.io.SafeWrite;
import org.armature.io.StageFiles;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.solver.SolverException;
import org.armature.solver.timedomain.DriveWaveform;
import org.armature.solver.timedomain.StepOptions;
import org.armature.solver.timedomain.Trace;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientEvent;
import org.armature.solver.timedomain.TransientFailureException;
import org.armature.solver.timedomain.TransientMetrics;
import org.armature.solver.timedomain.TransientOptions;
import org.armature.solver.timedomain.TransientResult;
import org.armature.solver.timedomain.Waveform;
import org.armature.units.Unit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature simulate FILE [--edge off|on|pulse] [--duration S] [--json] [--csv FILE]}: the
 * edges of a stage ({@link TransientAnalysis}) from its DC operating point. The edge falls (off),
 * rises (on) at 1 ms, or for {@code pulse} rises at 1 ms and falls at half the window. With
 * {@code --json} exactly one object:
 *
 * <pre>{@code
 * {"metrics": {"peakSwitchVoltage": V, "peakCoilReverseVoltage": V, "decayToDropOutCurrent": s,
 *              "decayToZero": s, "releaseTime": s, "operateTime": s, "suppressorEnergy": J,
 *              "switchEnergy": J, "switchBreakdown": true|false, "armatureSpeedAtBreak": m/s},
 *  "events": [{"time": s, "what": "..."}], "samples": N}
 * }</pre>
 *
 * A figure that did not occur within the window (no turn-off edge, contacts never opened) is
 * {@code null}. {@code armatureSpeedAtBreak} is the armature's speed when the normally-open contacts
 * part after the turn-off edge ({@link TransientMetrics#armatureSpeedAtBreakMetresPerSecond()}).
 * {@code --csv} writes one row per time point: time, node voltages, part currents,
 * coil current, armature position and contact state, with the unit of each column in its header.
 */
@Command(name = "simulate", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Run the turn-off or turn-on edge of a stage in time and print its figures: switch "
                + "peak, decay, release and operate times, energies."})
final class SimulateCommand implements Callable<Integer> {

    /** The edge to run. */
    enum Edge { OFF, ON, PULSE }

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Stage file to simulate.")
    Path file;

    @Option(names = "--edge", paramLabel = "EDGE", converter = EdgeConverter.class,
            description = "off (default), on, or pulse (on at 1 ms, off at half the window).")
    Edge edge = Edge.OFF;

    @Option(names = "--duration", paramLabel = "S", converter = Seconds.class,
            description = "Length of the run, seconds (default 20m = 20 ms).")
    Double duration;

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of a summary.")
    boolean json;

    @Option(names = "--csv", paramLabel = "FILE", description = "Also write the waveform as CSV to FILE.")
    Path csv;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "Which stage of the file: its number from 1, or its name (default 1).")
    String stageSelector;

    @Option(names = "--fault", paramLabel = "PART:KIND",
            description = "Inject a fault before solving (repeatable), for example Q1:ce-short, D1:reversed or "
                    + "switch~supply:track-open (a track open between two nets); 'faults FILE' lists every fault "
                    + "of the stage.")
    java.util.List<String> faults;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    @Override
    public Integer call() {
        if (csv != null) {
            checkCsvTarget(spec.commandLine());
        }
        StageDocument doc = StageFiles.open(file);
        Stage stage = StageSelection.select(doc, stageSelector, file, spec.commandLine());
        StageSelection.requireValid(stage, "simulated");
        stage = FaultOptions.apply(stage, faults);
        double window = duration == null ? TransientOptions.DEFAULT_DURATION_SECONDS : duration;
        double at = TransientOptions.DEFAULT_EDGE_SECONDS;
        if (!(window > at)) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--duration must be longer than the 1 ms before the edge.");
        }
        DriveWaveform drive = switch (edge) {
            case OFF -> new DriveWaveform.TurnOff(at);
            case ON -> new DriveWaveform.TurnOn(at);
            case PULSE -> new DriveWaveform.Pulse(at, window / 2 - at);
        };
        TransientResult result;
        try {
            TransientOptions options = new TransientOptions(drive, window, StepOptions.DEFAULTS, Double.NaN);
            Stage simulated = stage;
            result = Progress.run(() -> TransientAnalysis.run(simulated, options), spec.commandLine().getErr(), "simulate",
                    org.armature.units.EngineeringNotation.format(window, Unit.SECOND) + " of the "
                            + edge.name().toLowerCase(Locale.ROOT) + " edge");
        } catch (SolverException | TransientFailureException e) {
            throw new CommandFailedException("Stage \"" + stage.name() + "\" could not be simulated: "
                    + e.getMessage(), e);
        }
        if (csv != null) {
            writeCsv(result.waveform(), csv);
        }
        PrintWriter out = spec.commandLine().getOut();
        out.print(json ? json(result) : summary(stage, result));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    /** The result as one JSON object (see the class comment). */
    static String json(TransientResult r) {
        TransientMetrics m = r.metrics();
        ObjectNode root = JSON.createObjectNode();
        ObjectNode metrics = root.putObject("metrics");
        put(metrics, "peakSwitchVoltage", m.peakSwitchVolts());
        put(metrics, "peakCoilReverseVoltage", m.peakCoilReverseVolts());
        put(metrics, "decayToDropOutCurrent", m.decayToReleaseCurrentSeconds());
        put(metrics, "decayToZero", m.decayToZeroSeconds());
        put(metrics, "releaseTime", m.releaseTimeSeconds());
        put(metrics, "operateTime", m.operateTimeSeconds());
        put(metrics, "suppressorEnergy", m.suppressorEnergyJoules());
        put(metrics, "switchEnergy", m.switchEnergyJoules());
        metrics.put("switchBreakdown", m.switchBreakdown());
        put(metrics, "armatureSpeedAtBreak", m.armatureSpeedAtBreakMetresPerSecond());
        ArrayNode events = root.putArray("events");
        for (TransientEvent e : r.waveform().events()) {
            ObjectNode o = events.addObject();
            o.put("time", e.timeSeconds());
            o.put("what", e.what());
        }
        root.put("samples", r.waveform().size());
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("JSON of a tree of plain values cannot fail", e);
        }
    }

    private static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    private static String summary(Stage stage, TransientResult r) {
        TransientMetrics m = r.metrics();
        StringBuilder b = new StringBuilder();
        b.append(stage.name()).append(System.lineSeparator());
        line(b, "peak switch voltage", m.peakSwitchVolts(), "V");
        line(b, "peak coil reverse voltage", m.peakCoilReverseVolts(), "V");
        line(b, "decay to drop-out current", m.decayToReleaseCurrentSeconds(), "s");
        line(b, "decay to zero", m.decayToZeroSeconds(), "s");
        line(b, "release time", m.releaseTimeSeconds(), "s");
        line(b, "operate time", m.operateTimeSeconds(), "s");
        line(b, "suppressor energy", m.suppressorEnergyJoules(), "J");
        line(b, "switch energy", m.switchEnergyJoules(), "J");
        b.append(String.format(Locale.ROOT, "%-28s %s%n", "switch breakdown", m.switchBreakdown() ? "yes" : "no"));
        line(b, "armature speed at break", m.armatureSpeedAtBreakMetresPerSecond(), "m/s");
        for (TransientEvent e : r.waveform().events()) {
            String subject = e.subject() == null || e.subject().isBlank() ? "" : " " + e.subject();
            b.append(String.format(Locale.ROOT, "  %12.6f s  %s%s%n", e.timeSeconds(), e.what(), subject));
        }
        b.append(String.format(Locale.ROOT, "%d time points%n", r.waveform().size()));
        for (String note : r.notes()) {
            b.append("note: ").append(note).append(System.lineSeparator());
        }
        return b.toString();
    }

    private static void line(StringBuilder b, String label, double v, String unit) {
        String value = !Double.isFinite(v) ? "—" : unit.equals("m/s")
                ? org.armature.units.EngineeringNotation.format(v, Unit.METRE) + "/s"
                : org.armature.units.EngineeringNotation.format(v, unitOf(unit));
        b.append(String.format(Locale.ROOT, "%-28s %s%n", label, value));
    }

    private static Unit unitOf(String symbol) {
        return switch (symbol) {
            case "V" -> Unit.VOLT;
            case "s" -> Unit.SECOND;
            default -> Unit.JOULE;
        };
    }

    /**
     * Writes the waveform as CSV through {@link SafeWrite} (temporary file, sync, backup
     * {@code FILE~}, atomic move): a header with units, then one row per time point.
     *
     * @throws org.armature.io.StageFileException {@code file.unwritable}; an existing file is untouched
     */
    static void writeCsv(Waveform w, Path target) {
        SafeWrite.write(target, stream -> {
            Writer out = new OutputStreamWriter(stream, StandardCharsets.UTF_8);
            StringBuilder header = new StringBuilder("time [s]");
            List<Trace> traces = w.traces();
            for (Trace t : traces) {
                header.append(',').append(t.name()).append(" [").append(t.unit()).append(']');
            }
            out.write(header.append('\n').toString());
            StringBuilder row = new StringBuilder();
            for (int i = 0; i < w.size(); i++) {
                row.setLength(0);
                row.append(w.time(i));
                for (Trace t : traces) {
                    row.append(',').append(t.value(i));
                }
                out.write(row.append('\n').toString());
            }
            out.flush();
        });
    }

    /** Refuses a CSV target that cannot be written before the run spends its time. */
    private void checkCsvTarget(CommandLine cl) {
        Path abs = csv.toAbsolutePath().normalize();
        Path dir = abs.getParent();
        if (dir == null || Files.isDirectory(abs)) {
            throw new CommandLine.ParameterException(cl, "--csv " + csv + " is a folder; expected a file name such as wave.csv.");
        }
        if (!Files.isDirectory(dir)) {
            throw new CommandLine.ParameterException(cl, "--csv " + csv + ": the folder " + dir
                    + " does not exist; expected a file in an existing folder.");
        }
    }

    /** Reads {@code --edge}. */
    static final class EdgeConverter implements CommandLine.ITypeConverter<Edge> {
        @Override
        public Edge convert(String text) {
            for (Edge e : Edge.values()) {
                if (e.name().toLowerCase(Locale.ROOT).equals(text)) {
                    return e;
                }
            }
            throw new CommandLine.TypeConversionException("'" + text + "' is not an edge; use off, on or pulse.");
        }
    }

    /** Reads a time in engineering notation. */
    static final class Seconds extends QuantityConverter {
        Seconds() {
            super(Unit.SECOND);
        }
    }
}
