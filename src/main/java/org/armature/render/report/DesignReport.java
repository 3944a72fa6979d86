package org.armature.render.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TimeZone;
import java.util.TreeMap;
import java.util.TreeSet;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.armature.analysis.CheckReport;
import org.armature.analysis.CheckResult;
import org.armature.analysis.CheckStatus;
import org.armature.analysis.SizingResult;
import org.armature.analysis.SizingStep;
import org.armature.analysis.Suggestion;
import org.armature.model.Connectivity;
import org.armature.model.Finding;
import org.armature.model.Severity;
import org.armature.model.TestPoint;
import org.armature.render.Affine;
import org.armature.render.Colour;
import org.armature.render.EdgePlot;
import org.armature.render.ExportTheme;
import org.armature.render.Notation;
import org.armature.render.Sheet;
import org.armature.solver.OperatingPoint;
import org.armature.solver.PartResult;
import org.armature.solver.SwitchVerdict;
import org.armature.solver.timedomain.TransientMetrics;
import org.armature.solver.timedomain.TransientResult;
import org.armature.analysis.LineUpMetrics;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * The one-file design report of a stage, as PDF (PDFBox): the safety cautions where the contact
 * side is above safety extra-low voltage, the annotated schematic as vector drawing, the operating
 * point in both pin states, the verdicts with their numbers and deciding corners, the sizing
 * calculation, and the turn-off and turn-on plots with their figures. Every page carries the
 * document title and date at the top and its number at the bottom. Fonts are embedded
 * ({@link PdfFonts}); all text is real text.
 *
 * <p>The report draws only what the {@link StageSnapshot} and the document's sections
 * ({@link Sections}) hold; it never solves. The line-up table follows the edges when the stage
 * belongs to the document's line-up, and the fault hunt section follows that when the document holds
 * a hunt on this stage ({@link FaultHuntSection}, ranked when the sections are made).
 */
public final class DesignReport {

    private static final Colour PASS = Colour.hex("#2d7a3a");
    private static final Colour WARN = Colour.hex("#a86f12");
    private static final Colour FAIL = Colour.hex("#b3261e");

    /** The closing statement: what the report is and is not. */
    public static final String CLOSING = "These are the checks that ran and the figures the engines computed; "
            + "they do not show that the design is safe. Where the contacts switch mains or other voltages above "
            + "safety extra-low voltage, local electrical codes and licensed practice decide.";

    private DesignReport() {
    }

    /**
     * The line-up the stage belongs to, for the report's table: one column per stage, judged under
     * the line-up's shared context ({@link LineUpMetrics#evaluate(org.armature.model.LineUpContext.Applied)}).
     *
     * @param names the column headings, one per column
     * @param columns the figures of each stage
     */
    public record LineUpSection(List<String> names, List<LineUpMetrics.Column> columns) {
        public LineUpSection {
            names = List.copyOf(names);
            columns = List.copyOf(columns);
        }
    }

    /**
     * The line-up section of a stage's report: present when the document holds a line-up with this
     * very stage in it. Solves every stage of the line-up under its shared context (the figures of
     * {@code compare}).
     */
    public static Optional<LineUpSection> lineUpOf(org.armature.model.StageDocument doc, org.armature.model.Stage stage) {
        if (doc.lineUp().isEmpty()) {
            return Optional.empty();
        }
        org.armature.model.LineUp l = doc.lineUp().get();
        boolean member = l.stageIndices().stream().anyMatch(i -> i < doc.stages().size() && doc.stages().get(i) == stage);
        if (!member) {
            return Optional.empty();
        }
        List<String> names = new ArrayList<>();
        List<LineUpMetrics.Column> columns = new ArrayList<>();
        for (int i : l.stageIndices()) {
            names.add(doc.stages().get(i).name());
            columns.add(LineUpMetrics.evaluate(l.context().applyTo(doc.stages().get(i))));
        }
        return Optional.of(new LineUpSection(names, columns));
    }

    /**
     * What a stage's report shows of its document beyond the stage itself.
     *
     * @param lineUp the line-up table, when the stage belongs to the document's line-up
     * @param faultHunt the fault hunt section, when the document holds a hunt on this stage
     */
    public record Sections(Optional<LineUpSection> lineUp, Optional<FaultHuntSection> faultHunt) {

        /** Neither a line-up nor a fault hunt. */
        public static final Sections NONE = new Sections(Optional.empty(), Optional.empty());

        public Sections {
            lineUp = lineUp == null ? Optional.empty() : lineUp;
            faultHunt = faultHunt == null ? Optional.empty() : faultHunt;
        }
    }

    /**
     * The document's sections of a stage's report: its line-up ({@link #lineUpOf}) and its fault
     * hunt ({@link FaultHuntSection#of}), each computed now. {@code stage} must be the document's own
     * stage object (as {@code doc.stages().get(i)}).
     */
    public static Sections sectionsOf(org.armature.model.StageDocument doc, org.armature.model.Stage stage) {
        return new Sections(lineUpOf(doc, stage), FaultHuntSection.of(doc, stage));
    }

    /**
     * The report of a stage of a document, as PDF bytes: the snapshot and the document's sections
     * ({@link #sectionsOf}). The one call for exports of a document's stage.
     */
    public static byte[] pdf(StageSnapshot s, org.armature.model.StageDocument doc) {
        return pdf(s, sectionsOf(doc, s.stage()));
    }

    /** The report of a snapshot evaluated with {@link StageSnapshot.Depth#REPORT}, as PDF bytes. */
    public static byte[] pdf(StageSnapshot s) {
        return pdf(s, Sections.NONE);
    }

    /** The report with the table of the line-up the stage belongs to, if any, as PDF bytes. */
    public static byte[] pdf(StageSnapshot s, Optional<LineUpSection> lineUp) {
        return pdf(s, new Sections(lineUp, Optional.empty()));
    }

    /** The report with the document's sections, as PDF bytes. */
    public static byte[] pdf(StageSnapshot s, Sections sections) {
        try (PDDocument doc = new PDDocument()) {
            write(s, doc, sections);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot assemble the report", e);
        }
    }

    /** Lays the report out into an empty document. */
    public static void write(StageSnapshot s, PDDocument doc) {
        write(s, doc, Sections.NONE);
    }

    /** Lays the report out into an empty document, with the line-up's table where one is given. */
    public static void write(StageSnapshot s, PDDocument doc, Optional<LineUpSection> lineUp) {
        write(s, doc, new Sections(lineUp, Optional.empty()));
    }

    /** Lays the report out into an empty document, with the document's sections where given. */
    public static void write(StageSnapshot s, PDDocument doc, Sections sections) {
        String title = s.documentTitle().isBlank() ? s.stage().name() : s.documentTitle();
        PDDocumentInformation info = doc.getDocumentInformation();
        info.setTitle(title + ": " + s.stage().name());
        info.setSubject("Design report of a relay driver stage");
        info.setCreator("Armature");
        Calendar when = new GregorianCalendar(TimeZone.getTimeZone(ZoneOffset.UTC));
        when.clear();
        when.set(s.date().getYear(), s.date().getMonthValue() - 1, s.date().getDayOfMonth());
        info.setCreationDate(when);
        PdfFonts fonts = new PdfFonts(doc);
        try (PdfFlow flow = new PdfFlow(doc, fonts)) {
            intro(flow, s);
            cautions(flow, s);
            schematic(flow, s);
            operatingPoint(flow, s);
            verdicts(flow, s);
            sizing(flow, s);
            edges(flow, s);
            sections.lineUp().ifPresent(l -> lineUp(flow, l));
            sections.faultHunt().ifPresent(h -> h.draw(flow));
            flow.heading("What this report is", 12);
            flow.paragraph(CLOSING, PdfFlow.BODY, false, PdfFlow.INK);
            flow.finish(title, s.date().toString(), "Design report · " + s.stage().name());
        }
    }

    private static void intro(PdfFlow f, StageSnapshot s) {
        f.paragraph("Design report", 9, false, PdfFlow.MUTED);
        f.paragraph(s.stage().name(), 20, true, PdfFlow.INK);
        if (!s.stage().description().isBlank()) {
            f.paragraph(s.stage().description(), 10.5, false, PdfFlow.INK);
        }
        f.paragraph("Readouts on the schematic: " + s.conditions() + ".", PdfFlow.BODY, false, PdfFlow.MUTED);
        f.paragraph(sentence(s.solveStatus()), PdfFlow.BODY, false, PdfFlow.MUTED);
        s.checks().ifPresent(r -> {
            if (r.checks().isEmpty()) {
                // no verdict is not a pass
                f.paragraph("No check could be judged, so there is no overall verdict.", 10.5, true, FAIL);
            } else {
                f.paragraph("Overall verdict: " + r.overall().word() + " (worst of " + r.checks().size()
                        + " checks over " + r.cornerCount() + " corners).", 10.5, true, colour(r.overall()));
            }
        });
    }

    private static void cautions(PdfFlow f, StageSnapshot s) {
        List<Finding> c = s.cautions();
        if (c.isEmpty()) {
            return;
        }
        List<String> lines = new ArrayList<>();
        for (Finding x : c) {
            lines.add(x.message());
        }
        lines.add("This report lists the checks that ran; it defers to local electrical codes and licensed "
                + "practice and does not call the design safe.");
        f.gap(4);
        f.box("Safety cautions: the contact side is above safety extra-low voltage", lines, FAIL);
    }

    private static void schematic(PdfFlow f, StageSnapshot s) {
        Sheet sheet = s.sheet(ExportTheme.LIGHT.palette());
        double k = Math.min(PdfFlow.WIDTH / sheet.width(), 430 / sheet.height());
        double w = sheet.width() * k;
        double h = sheet.height() * k;
        f.need(h + 50);
        f.heading("Schematic", 13);
        f.drawing(h, pen -> {
            pen.push(Affine.translation((PdfFlow.WIDTH - w) / 2, 0).then(Affine.scaling(k)));
            sheet.draw(pen, true);
            pen.pop();
        });
    }

    private static void operatingPoint(PdfFlow f, StageSnapshot s) {
        f.heading("Operating point", 13);
        if (s.high().isEmpty() && s.low().isEmpty()) {
            f.paragraph("Not solved: " + s.solveStatus(), PdfFlow.BODY, false, FAIL);
            return;
        }
        f.paragraph("Node voltages against ground and part quantities, nominal values, ambient "
                + Notation.format(s.stage().conditions().ambientCelsius(), "°C") + ". A dash marks a pin state that "
                + "could not be solved.", PdfFlow.BODY, false, PdfFlow.MUTED);
        TreeSet<String> nets = new TreeSet<>();
        s.high().ifPresent(op -> nets.addAll(op.nodeVoltages().keySet()));
        s.low().ifPresent(op -> nets.addAll(op.nodeVoltages().keySet()));
        List<PdfFlow.Row> rows = new ArrayList<>();
        for (String net : nets) {
            rows.add(new PdfFlow.Row(List.of(netName(s, net), volts(s.high(), net), volts(s.low(), net))));
        }
        f.table(new double[] {0.5, 0.25, 0.25}, List.of("Net", "Pin high", "Pin low"), rows);

        List<PdfFlow.Row> parts = new ArrayList<>();
        Map<String, PartResult> hi = s.high().map(OperatingPoint::parts).orElse(Map.of());
        Map<String, PartResult> lo = s.low().map(OperatingPoint::parts).orElse(Map.of());
        TreeSet<String> refs = new TreeSet<>(hi.keySet());
        refs.addAll(lo.keySet());
        for (String ref : refs) {
            PartResult any = hi.containsKey(ref) ? hi.get(ref) : lo.get(ref);
            if (readings(hi.get(ref)).equals("–") && readings(lo.get(ref)).equals("–")) {
                continue; // ground symbols and the like carry no readings
            }
            parts.add(new PdfFlow.Row(List.of(ref + " (" + any.kind().title() + ")", readings(hi.get(ref)),
                    readings(lo.get(ref)))));
        }
        f.table(new double[] {0.22, 0.39, 0.39}, List.of("Part", "Pin high", "Pin low"), parts);
        List<PdfFlow.Row> sw = new ArrayList<>();
        s.high().flatMap(OperatingPoint::switchVerdict).ifPresent(v -> sw.add(verdictRow("pin high", v)));
        s.low().flatMap(OperatingPoint::switchVerdict).ifPresent(v -> sw.add(verdictRow("pin low", v)));
        if (!sw.isEmpty()) {
            f.table(new double[] {0.18, 0.82}, List.of("Switch", "Verdict"), sw);
        }
    }

    private static PdfFlow.Row verdictRow(String state, SwitchVerdict v) {
        return new PdfFlow.Row(List.of(state, v.ref() + ": " + v.reason()));
    }

    private static void verdicts(PdfFlow f, StageSnapshot s) {
        f.heading("Verdicts", 13);
        if (s.checks().isEmpty()) {
            f.paragraph("The checks did not run.", PdfFlow.BODY, false, FAIL);
            return;
        }
        CheckReport r = s.checks().get();
        f.paragraph("Each check is judged at its worst corner of the tolerances (" + r.cornerCount()
                + " corners, each solved with the pin high and low); the deciding corner is the one named.",
                PdfFlow.BODY, false, PdfFlow.MUTED);
        List<PdfFlow.Row> rows = new ArrayList<>();
        for (CheckResult c : r.checks()) {
            String corner = c.cornerText().isEmpty() ? "nominal" : c.cornerText();
            rows.add(new PdfFlow.Row(List.of(c.status().word(), c.id(), EngineeringNotation.format(c.value(), c.unit()),
                    EngineeringNotation.format(c.limit(), c.unit()), corner), c.explanation(), colour(c.status())));
        }
        f.table(new double[] {0.085, 0.285, 0.12, 0.12, 0.39}, List.of("Status", "Check", "Value", "Limit",
                "Deciding corner"), rows);
        List<Finding> other = r.findings().stream()
                .filter(x -> !x.key().startsWith(StageSnapshot.CAUTION_PREFIX) && x.severity() != Severity.INFO).toList();
        List<Finding> topo = s.findings().stream().filter(x -> x.severity() != Severity.INFO).toList();
        if (!other.isEmpty() || !topo.isEmpty()) {
            f.paragraph("Findings", 10.5, true, PdfFlow.INK);
            List<PdfFlow.Row> fr = new ArrayList<>();
            for (Finding x : concatDistinct(topo, other)) {
                fr.add(new PdfFlow.Row(List.of(x.severity().name().toLowerCase(Locale.ROOT), x.key()
                        + (x.ref().isEmpty() ? "" : " (" + x.ref() + ")"), x.message())));
            }
            f.table(new double[] {0.1, 0.3, 0.6}, List.of("Severity", "Key", "Message"), fr);
        }
    }

    private static List<Finding> concatDistinct(List<Finding> a, List<Finding> b) {
        List<Finding> out = new ArrayList<>(a);
        for (Finding x : b) {
            if (!out.contains(x)) {
                out.add(x);
            }
        }
        return out;
    }

    private static void sizing(PdfFlow f, StageSnapshot s) {
        f.heading("Sizing calculation", 13);
        if (s.sizing().isEmpty()) {
            f.paragraph("The sizing assistant did not run.", PdfFlow.BODY, false, PdfFlow.MUTED);
            return;
        }
        SizingResult r = s.sizing().get();
        f.paragraph("How the drive network would be sized from the relay and the transistor's minimum gain "
                + "(default rule; the window's sizing assistant can use another). Compare the suggestions with "
                + "the values drawn.", PdfFlow.BODY, false, PdfFlow.MUTED);
        List<PdfFlow.Row> steps = new ArrayList<>();
        for (SizingStep st : r.steps()) {
            steps.add(new PdfFlow.Row(List.of(st.label(), st.formattedValue(), st.formula())));
        }
        if (!steps.isEmpty()) {
            f.table(new double[] {0.36, 0.16, 0.48}, List.of("Step", "Value", "Formula"), steps);
        }
        List<PdfFlow.Row> sug = new ArrayList<>();
        for (Suggestion x : r.suggestions()) {
            String drawn = s.stage().part(x.ref()).filter(p -> p.kind().param(x.paramKey()).isPresent())
                    .map(p -> EngineeringNotation.format(p.value(x.paramKey()), Unit.OHM)).orElse("–");
            sug.add(new PdfFlow.Row(List.of(x.ref(), x.role(), EngineeringNotation.format(x.value(), Unit.OHM) + " ±"
                    + EngineeringNotation.format(x.tolerancePercent(), Unit.PERCENT), drawn), x.rule(), null));
        }
        if (!sug.isEmpty()) {
            f.table(new double[] {0.1, 0.34, 0.3, 0.26}, List.of("Part", "Role", "Suggested", "Drawn"), sug);
        }
        for (Finding x : r.findings()) {
            f.paragraph(x.message(), PdfFlow.BODY, false, WARN);
        }
    }

    private static void edges(PdfFlow f, StageSnapshot s) {
        f.heading("Edges", 13);
        f.paragraph(s.edgesStatus(), PdfFlow.BODY, false, PdfFlow.MUTED);
        edge(f, s, "Turn-off", s.turnOff(), true);
        edge(f, s, "Turn-on", s.turnOn(), false);
    }

    private static void edge(PdfFlow f, StageSnapshot s, String name, Optional<TransientResult> run, boolean off) {
        if (run.isEmpty()) {
            return;
        }
        TransientResult r = run.get();
        EdgePlot.Plot plot = EdgePlot.of(s.stage(), r.waveform());
        double h = 70.0 * Math.max(1, plot.channels().size()) + 30;
        f.need(h + 60);
        f.paragraph(name, 11, true, PdfFlow.INK);
        f.drawing(h, pen -> EdgePlot.draw(pen, plot, PdfFlow.WIDTH, h, Double.NaN, ExportTheme.LIGHT.palette()));
        TransientMetrics m = r.metrics();
        List<PdfFlow.Row> rows = new ArrayList<>();
        if (off) {
            rows.add(row("peak switch voltage", Notation.format(m.peakSwitchVolts(), "V")));
            rows.add(row("peak coil reverse voltage", Notation.format(m.peakCoilReverseVolts(), "V")));
            rows.add(row("decay to drop-out current", seconds(m.decayToReleaseCurrentSeconds())));
            rows.add(row("decay to zero current", seconds(m.decayToZeroSeconds())));
            rows.add(row("release time", seconds(m.releaseTimeSeconds())));
            rows.add(row("suppressor energy", Notation.format(m.suppressorEnergyJoules(), "J")));
            rows.add(row("switch energy", Notation.format(m.switchEnergyJoules(), "J")));
            rows.add(row("peak suppressor current", Notation.format(m.peakSuppressorAmps(), "A")));
            rows.add(row("stored coil energy at the edge", Notation.format(m.storedEnergyJoules(), "J")));
            rows.add(row("switch breakdown", m.switchBreakdown() ? "yes: avalanche" : "no"));
        } else {
            rows.add(row("operate time", seconds(m.operateTimeSeconds())));
        }
        f.table(new double[] {0.5, 0.5}, List.of(name + " figure", "Value"), rows);
        for (String note : r.notes()) {
            f.paragraph(note, PdfFlow.SMALL, false, PdfFlow.MUTED);
        }
    }

    private static String sentence(String text) {
        String t = text.strip();
        return t.isEmpty() || t.endsWith(".") ? t : t + ".";
    }

    private static PdfFlow.Row row(String a, String b) {
        return new PdfFlow.Row(List.of(a, b));
    }

    private static String seconds(double v) {
        return Double.isNaN(v) ? "not within the run" : Notation.format(v, "s");
    }

    private static String netName(StageSnapshot s, String net) {
        List<String> tps = new ArrayList<>();
        for (TestPoint tp : s.stage().testPoints()) {
            if (tp.net().equals(net)) {
                tps.add("test point at " + tp.ref() + "." + tp.pin());
            }
        }
        if (!tps.isEmpty() || net.equals(Connectivity.GROUND)) {
            return tps.isEmpty() ? net : net + " (" + String.join(", ", tps) + ")";
        }
        // an unnamed net reads by what it joins
        List<String> pins = Connectivity.of(s.stage()).pinsOn(net).stream().map(p -> p.ref() + "." + p.pin()).toList();
        return pins.isEmpty() ? net : net + " (" + String.join(", ", pins) + ")";
    }

    private static String volts(Optional<OperatingPoint> op, String net) {
        return op.map(o -> o.nodeVoltages().get(net)).map(v -> Notation.format(v, "V")).orElse("–");
    }

    /** A part's states and quantities in one cell: "region saturation, ib 2.99 mA, ic 28.5 mA, ...". */
    private static String readings(PartResult r) {
        if (r == null) {
            return "–";
        }
        List<String> out = new ArrayList<>();
        new TreeMap<>(r.states()).forEach((k, v) -> out.add(k + " " + v));
        new TreeMap<>(r.quantities()).forEach((k, v) -> out.add(k + " " + EngineeringNotation.format(v, unitOf(k))));
        return out.isEmpty() ? "–" : String.join(", ", out);
    }

    /** The unit of a part quantity by its key (keys of {@link org.armature.netlist.PartNetwork}). */
    static Unit unitOf(String key) {
        String k = key.toLowerCase(Locale.ROOT);
        if (k.equals("ic") || k.equals("ib") || k.equals("id") || k.equals("iin") || k.endsWith("current")) {
            return Unit.AMPERE;
        }
        if (k.endsWith("temperature")) {
            return Unit.CELSIUS;
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
        return Unit.RATIO;
    }

    private static Colour colour(CheckStatus status) {
        return switch (status) {
            case PASS -> PASS;
            case WARN -> WARN;
            case FAIL -> FAIL;
        };
    }

    private static void lineUp(PdfFlow f, LineUpSection l) {
        f.heading("Line-up", 13);
        f.paragraph("The stages of the document's line-up side by side, each judged under the shared relay, supply, "
                + "pin and ambient range; a star marks the best value of a row.", PdfFlow.BODY, false, PdfFlow.MUTED);
        int n = l.columns().size();
        double[] fractions = new double[n + 1];
        fractions[0] = 0.32;
        for (int i = 1; i <= n; i++) {
            fractions[i] = 0.68 / n;
        }
        List<String> header = new ArrayList<>();
        header.add("Figure");
        header.addAll(l.names());
        List<PdfFlow.Row> rows = new ArrayList<>();
        for (LineUpMetrics.Metric m : LineUpMetrics.METRICS) {
            List<Integer> best = LineUpMetrics.best(m, l.columns());
            List<String> cells = new ArrayList<>();
            cells.add(m.label());
            for (int i = 0; i < n; i++) {
                cells.add(LineUpMetrics.format(m, l.columns().get(i).value(m.key())) + (best.contains(i) ? " *" : ""));
            }
            rows.add(new PdfFlow.Row(cells));
        }
        for (String id : LineUpMetrics.checkIds(l.columns())) {
            List<Integer> best = LineUpMetrics.bestCheck(id, l.columns());
            List<String> cells = new ArrayList<>();
            cells.add(id);
            for (int i = 0; i < n; i++) {
                cells.add(l.columns().get(i).report().check(id).map(r -> r.status().word()).orElse("\u2014")
                        + (best.contains(i) ? " *" : ""));
            }
            rows.add(new PdfFlow.Row(cells));
        }
        f.table(fractions, header, rows);
    }
}
