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
import java.util.Optional;
import java.util.concurrent.Callable;
import org.armature.analysis.CheckResult;
import org.armature.analysis.LineUpMetrics;
import org.armature.analysis.LineUpMetrics.Column;
import org.armature.analysis.LineUpMetrics.Metric;
import org.armature.io.StageFiles;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature compare FILE... [--stage N] [--own-context] [--json]}: stages side by side, one
 * column each, with the figures of {@link LineUpMetrics} (the numbers {@code solve},
 * {@code simulate} and {@code check} give for each stage alone) and each check's status; the best
 * value of each row is marked with {@code *}.
 *
 * <p>Which stages: with one file, its line-up, or all its stages when it has none; with several
 * files, the first stage of each, or the one {@code --stage} names in each. Every stage is judged
 * under the first file's shared context (its line-up's, else the one its first compared stage sets:
 * relay, coil supply, drive pin, contact side, ambient range), applied by role; with
 * {@code --own-context} each stage is judged as it stands. Wherever a stage's own part differed from
 * the shared one, the output says so. With {@code --json}, exactly one object:
 *
 * <pre>{@code
 * {"stages": [{"file": "a.stage.json", "stage": "...",
 *              "metrics": {"peakSwitchVoltage": V, "releaseTime": s, ..., "switchFullyOn": true},
 *              "checks": [{"id": "relay.operates", "status": "pass", ...}],
 *              "best": ["peakSwitchVoltage", ...],
 *              "differences": [{"role": "relay", "ref": "K1", "detail": "..."}]}]}
 * }</pre>
 * Metric names and units are those of {@code simulate --json} for its figures (SI, m/s for the
 * armature speed), check objects those of {@code check --json}; a figure not available is null.
 */
@Command(name = "compare", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Compare stages side by side on one relay, supply and pin: a file's line-up (or all its "
                + "stages), or the first stage of each of several files, with the figures of solve, simulate "
                + "and check and the best value of each row marked."})
final class CompareCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0..*", arity = "1..*", paramLabel = "FILE",
            description = "Stage files: one (its line-up or all its stages) or several (one stage of each).")
    List<Path> files;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "With several files, which stage of each: its number from 1, or its name (default 1).")
    String stageSelector;

    @Option(names = "--own-context",
            description = "Judge each stage with its own relay, supply, pin and ambient instead of the first file's.")
    boolean ownContext;

    @Option(names = "--json", description = "Print exactly one JSON object (SI units) instead of a table.")
    boolean json;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    /** A stage to compare and the file it came from. */
    record Entry(Path file, Stage stage) {
    }

    @Override
    public Integer call() {
        CommandLine cl = spec.commandLine();
        if (files.size() == 1 && stageSelector != null) {
            throw new CommandLine.ParameterException(cl, "--stage picks one stage of each of several files; with one "
                    + "file, compare shows its line-up, or all its stages when it has none.");
        }
        List<Entry> entries = new ArrayList<>();
        Optional<LineUpContext> shared = Optional.empty();
        for (Path file : files) {
            StageDocument doc = StageFiles.open(file);
            if (files.size() == 1) {
                List<Integer> indices = doc.lineUp().map(LineUp::stageIndices).orElseGet(() ->
                        java.util.stream.IntStream.range(0, doc.stages().size()).boxed().toList());
                indices.forEach(i -> entries.add(new Entry(file, doc.stages().get(i))));
                shared = doc.lineUp().map(LineUp::context);
            } else {
                entries.add(new Entry(file, StageSelection.select(doc, stageSelector, file, cl)));
                if (entries.size() == 1) {
                    shared = doc.lineUp().map(LineUp::context);
                }
            }
        }
        LineUpContext context = shared.orElseGet(() -> LineUpContext.of(entries.get(0).stage()));
        List<LineUpContext.Applied> applied = entries.stream()
                .map(e -> ownContext ? new LineUpContext.Applied(e.stage(), List.of()) : context.applyTo(e.stage()))
                .toList();
        applied.forEach(a -> StageSelection.requireValid(a.stage(), "compared"));
        List<Column> columns = Progress.run(() -> applied.stream().map(a -> LineUpMetrics.evaluate(a)).toList(),
                cl.getErr(), "compare", entries.size() + " stages");
        PrintWriter out = cl.getOut();
        out.print(json ? json(entries, columns) : table(entries, columns, ownContext));
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    /** The comparison as one JSON object (see the class comment). */
    static String json(List<Entry> entries, List<Column> columns) {
        ObjectNode root = JSON.createObjectNode();
        ArrayNode stages = root.putArray("stages");
        for (int i = 0; i < columns.size(); i++) {
            Column c = columns.get(i);
            ObjectNode s = stages.addObject();
            s.put("file", entries.get(i).file().toString());
            s.put("stage", entries.get(i).stage().name());
            ObjectNode metrics = s.putObject("metrics");
            for (Metric m : LineUpMetrics.METRICS) {
                double v = c.value(m.key());
                if (Double.isFinite(v)) {
                    metrics.put(m.key(), v);
                } else {
                    metrics.putNull(m.key());
                }
            }
            if (c.switchFullyOn().isPresent()) {
                metrics.put("switchFullyOn", c.switchFullyOn().get());
            } else {
                metrics.putNull("switchFullyOn");
            }
            ArrayNode checks = s.putArray("checks");
            for (CheckResult r : c.report().checks()) {
                CheckCommand.putCheck(checks, r);
            }
            ArrayNode best = s.putArray("best");
            for (Metric m : LineUpMetrics.METRICS) {
                if (LineUpMetrics.best(m, columns).contains(i)) {
                    best.add(m.key());
                }
            }
            ArrayNode diffs = s.putArray("differences");
            for (LineUpContext.Difference d : c.differences()) {
                ObjectNode o = diffs.addObject();
                o.put("role", d.role());
                o.put("ref", d.ref());
                o.put("detail", d.detail());
            }
        }
        try {
            return JSON.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    /** Width of the row labels. */
    private static final int LABEL_WIDTH = 46;
    /** Width of a stage's column. */
    private static final int COLUMN_WIDTH = 16;

    /** The comparison as a text table, best values marked with {@code *}. */
    static String table(List<Entry> entries, List<Column> columns, boolean ownContext) {
        StringBuilder b = new StringBuilder();
        String nl = System.lineSeparator();
        for (int i = 0; i < entries.size(); i++) {
            b.append('[').append(i + 1).append("] ").append(entries.get(i).stage().name()).append(" (")
                    .append(entries.get(i).file().getFileName()).append(')').append(nl);
        }
        b.append(ownContext ? "Each stage judged with its own relay, supply, pin and ambient."
                : "All stages judged with the first file's shared relay, supply, pin, contact side and ambient.")
                .append(nl).append(nl);
        StringBuilder head = new StringBuilder(pad("", LABEL_WIDTH));
        for (int i = 0; i < columns.size(); i++) {
            head.append(padLeft("[" + (i + 1) + "]", COLUMN_WIDTH));
        }
        b.append(head.toString().stripTrailing()).append(nl);
        for (Metric m : LineUpMetrics.METRICS) {
            List<Integer> best = LineUpMetrics.best(m, columns);
            StringBuilder row = new StringBuilder(pad(m.label(), LABEL_WIDTH));
            for (int i = 0; i < columns.size(); i++) {
                row.append(padLeft(LineUpMetrics.format(m, columns.get(i).value(m.key())) + (best.contains(i) ? " *" : "  "),
                        COLUMN_WIDTH));
            }
            b.append(row.toString().stripTrailing()).append(nl);
        }
        StringBuilder verdict = new StringBuilder(pad("switch fully on (solve)", LABEL_WIDTH));
        for (Column c : columns) {
            verdict.append(padLeft(c.switchFullyOn().map(on -> on ? "yes" : "no").orElse("—") + "  ", COLUMN_WIDTH));
        }
        b.append(verdict.toString().stripTrailing()).append(nl).append(nl);
        for (String id : LineUpMetrics.checkIds(columns)) {
            List<Integer> best = LineUpMetrics.bestCheck(id, columns);
            StringBuilder row = new StringBuilder(pad("check " + id, LABEL_WIDTH));
            for (int i = 0; i < columns.size(); i++) {
                String word = columns.get(i).report().check(id).map(r -> r.status().name()).orElse("—");
                row.append(padLeft(word + (best.contains(i) ? " *" : "  "), COLUMN_WIDTH));
            }
            b.append(row.toString().stripTrailing()).append(nl);
        }
        b.append(nl).append("* best in the row.").append(nl);
        for (int i = 0; i < columns.size(); i++) {
            Column c = columns.get(i);
            for (LineUpContext.Difference d : c.differences()) {
                String what = d.role().equals("relay") ? "its own relay differs from the shared relay"
                        : "its own " + d.role() + " differs";
                b.append('[').append(i + 1).append("] ").append(what).append(d.ref().isEmpty() ? "" : " (" + d.ref() + ")")
                        .append(": ").append(d.detail()).append("; judged with the shared one.").append(nl);
            }
            for (String note : c.notes()) {
                b.append('[').append(i + 1).append("] ").append(note).append(nl);
            }
        }
        b.append("These are the checks that ran; they do not show that any design is safe.").append(nl);
        return b.toString();
    }

    private static String pad(String s, int width) {
        return s.length() >= width ? s + " " : s + " ".repeat(width - s.length());
    }

    private static String padLeft(String s, int width) {
        return s.length() >= width ? " " + s : " ".repeat(width - s.length()) + s;
    }
}
