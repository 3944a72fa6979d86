package org.armature.render.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.armature.analysis.CheckResult;
import org.armature.io.StageFiles;
import org.armature.model.Finding;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.armature.render.Notation;
import org.armature.solver.OperatingPoint;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The PDF design report read back with PDFBox. */
class DesignReportTest {

    private static final LocalDate DAY = LocalDate.of(2026, 12, 5);

    private static StageSnapshot mains;
    private static byte[] mainsPdf;
    private static StageSnapshot lowVoltage;
    private static byte[] lowVoltagePdf;

    @BeforeAll
    static void build() {
        // the pool pump example switches a 230 V pump: contact side above safety extra-low voltage
        StageDocument doc = StageFiles.open(Path.of("examples/pool-pump-timer.stage.json"));
        mains = StageSnapshot.evaluate(doc.title(), doc.first(), true, StageSnapshot.Depth.REPORT, DAY);
        mainsPdf = DesignReport.pdf(mains);
        // the default template's contact side is a 24 V rail
        lowVoltage = StageSnapshot.evaluate("Bench", Templates.defaultStage(), true, StageSnapshot.Depth.REPORT, DAY);
        lowVoltagePdf = DesignReport.pdf(lowVoltage);
    }

    private static String text(byte[] pdf) throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            return new PDFTextStripper().getText(d);
        }
    }

    /** Whitespace-insensitive: table cells and wrapped lines come back with spaces or line breaks between them. */
    private static boolean holds(String text, String... words) {
        String re = String.join("\\s+", java.util.Arrays.stream(words).map(Pattern::quote).toList());
        return Pattern.compile(re).matcher(text).find();
    }

    @Test
    @DisplayName("the operating point in both pin states reads back: the switch node's voltage high and low")
    void operatingPoint() throws IOException {
        String t = text(mainsPdf);
        OperatingPoint high = mains.high().orElseThrow();
        OperatingPoint low = mains.low().orElseThrow();
        String hi = Notation.format(high.voltage("switch"), "V");
        String lo = Notation.format(low.voltage("switch"), "V");
        assertTrue(holds(t, "switch", "(test point at Q1.c)", hi, lo), "switch row: " + hi + " / " + lo + "\n" + t);
        String coil = Notation.format(Math.abs(high.quantity("K1", "coilCurrent")), "A");
        assertTrue(t.contains("coil " + coil), "the schematic's gauge text is real text: coil " + coil);
        assertTrue(holds(t, "Pin", "high", "Pin", "low"));
    }

    @Test
    @DisplayName("every check id appears with its status and its deciding corner")
    void everyCheck() throws IOException {
        String t = text(mainsPdf);
        assertFalse(mains.checks().orElseThrow().checks().isEmpty());
        for (CheckResult c : mains.checks().orElseThrow().checks()) {
            assertTrue(holds(t, c.status().word(), c.id()), c.id() + " with " + c.status().word());
        }
        assertTrue(t.contains("Deciding corner"));
    }

    @Test
    @DisplayName("a mains contact side prints every safety caution; a 24 V one prints none")
    void cautions() throws IOException {
        String t = text(mainsPdf);
        assertFalse(mains.cautions().isEmpty(), "230 V is above safety extra-low voltage (IEC 61140: 50 V AC)");
        for (Finding f : mains.cautions()) {
            String firstWords = String.join(" ", java.util.Arrays.asList(f.message().split(" ")).subList(0, 6));
            assertTrue(holds(t, firstWords.split(" ")), f.key() + ": " + firstWords);
        }
        assertTrue(t.contains("Safety cautions"));
        assertTrue(lowVoltage.cautions().isEmpty());
        assertFalse(text(lowVoltagePdf).contains("Safety cautions"));
        // it reports the checks that ran and defers to codes; it never calls the design safe
        assertTrue(holds(t, "they", "do", "not", "show", "that", "the", "design", "is", "safe."));
    }

    @Test
    @DisplayName("every page has the document title, the date and 'page n of N'; fonts are embedded")
    void pagesAndFonts() throws IOException {
        try (PDDocument d = Loader.loadPDF(mainsPdf)) {
            int n = d.getNumberOfPages();
            assertTrue(n >= 3, "schematic, tables and edges take several pages, had " + n);
            for (int i = 1; i <= n; i++) {
                PDFTextStripper s = new PDFTextStripper();
                s.setStartPage(i);
                s.setEndPage(i);
                String page = s.getText(d);
                assertTrue(page.contains("Pool pump timer"), "title on page " + i);
                assertTrue(page.contains("2026-12-05"), "date on page " + i);
                assertTrue(page.contains("page " + i + " of " + n), "number on page " + i);
            }
            for (PDPage p : d.getPages()) {
                for (var name : p.getResources().getFontNames()) {
                    PDFont f = p.getResources().getFont(name);
                    assertTrue(f.isEmbedded(), f.getName() + " embedded");
                }
            }
            assertEquals("Pool pump timer: Pump relay", d.getDocumentInformation().getTitle());
        }
    }

    @Test
    @DisplayName("a stage with no operating point gets no overall verdict rather than a pass (failed before the fix)")
    void unsolvedHasNoVerdict() throws IOException {
        // the default stage with only its first three wires: most nodes have no DC path to ground
        org.armature.model.Stage broken = Templates.defaultStage();
        broken = broken.withWires(broken.wires().subList(0, 3));
        StageSnapshot snap = StageSnapshot.evaluate("Bench", broken, true, StageSnapshot.Depth.REPORT, DAY);
        String t = text(DesignReport.pdf(snap));
        assertFalse(t.contains("Overall verdict: pass"), t);
        assertTrue(snap.checks().orElseThrow().checks().isEmpty(), "the checks cannot judge an unsolvable stage");
        assertTrue(holds(t, "No", "check", "could", "be", "judged"), t);
    }

    @Test
    @DisplayName("the sizing chain and both edges' figures are in the report")
    void sizingAndEdges() throws IOException {
        String t = text(lowVoltagePdf);
        assertTrue(t.contains("Sizing calculation"));
        assertTrue(lowVoltage.sizing().orElseThrow().steps().size() > 3);
        assertTrue(t.contains(lowVoltage.sizing().orElseThrow().steps().get(0).label()));
        assertTrue(holds(t, "release", "time", Notation.format(lowVoltage.turnOff().orElseThrow().metrics().releaseTimeSeconds(), "s")));
        assertTrue(holds(t, "operate", "time", Notation.format(lowVoltage.turnOn().orElseThrow().metrics().operateTimeSeconds(), "s")));
        assertTrue(t.contains("coil current"), "plot strip titles are text");
    }

    @Test
    @DisplayName("a stage of the document's line-up gets the line-up table, with the figures compare computes; one outside it does not")
    void lineUpTable() throws IOException {
        org.armature.model.Stage npn = Templates.build(org.armature.model.StageTemplate.LOW_SIDE_NPN);
        org.armature.model.Stage nmos = Templates.build(org.armature.model.StageTemplate.LOW_SIDE_NMOS);
        org.armature.model.Stage alone = Templates.build(org.armature.model.StageTemplate.DARLINGTON_CHANNEL);
        StageDocument doc = new StageDocument("Bench", java.util.List.of(npn, nmos, alone), java.util.Optional.of(
                new org.armature.model.LineUp(java.util.List.of(0, 1), org.armature.model.LineUpContext.of(npn))));
        java.util.Optional<DesignReport.LineUpSection> section = DesignReport.lineUpOf(doc, npn);
        assertTrue(section.isPresent());
        assertEquals(java.util.List.of(npn.name(), nmos.name()), section.get().names());
        assertTrue(DesignReport.lineUpOf(doc, alone).isEmpty(), "a stage outside the line-up gets no table");
        // the table's coil current is the one the line-up metrics compute for the NPN column (the same code as compare)
        double coil = section.get().columns().get(0).value("coilCurrent");
        assertTrue(coil > 1e-3, "the template coil conducts with the pin high (derived: supply over coil resistance)");
        StageSnapshot snap = StageSnapshot.evaluate("Bench", npn, true, StageSnapshot.Depth.REPORT, DAY);
        String t = text(DesignReport.pdf(snap, section));
        assertTrue(t.contains("Line-up"), t);
        assertTrue(holds(t, "coil", "current", "(nominal)"), "the metric rows are printed");
        assertTrue(t.contains(org.armature.analysis.LineUpMetrics.format(org.armature.analysis.LineUpMetrics.METRICS.get(0), coil)),
                "the NPN column's coil current as the table formats it");
        assertFalse(text(lowVoltagePdf).contains("Line-up"), "no line-up, no section");
    }
}
