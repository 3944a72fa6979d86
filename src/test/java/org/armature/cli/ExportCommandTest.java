package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.xml.sax.InputSource;

/** {@code armature export}, run in process on the demo documents, writing into a temporary folder. */
class ExportCommandTest {

    private static final String PUMP = "examples/pool-pump-timer.stage.json";

    @TempDir
    Path dir;

    @Test
    @DisplayName("SVG, PNG and PDF in one run: each file valid, one line per file")
    void allThree() throws Exception {
        Path svg = dir.resolve("pump.svg");
        Path png = dir.resolve("pump.png");
        Path pdf = dir.resolve("pump.pdf");
        CliRun r = CliRun.of("export", PUMP, "--svg", svg.toString(), "--png", png.toString(), "--scale", "1",
                "--pdf", pdf.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals(3, r.out().strip().lines().count(), r.out());
        DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new InputSource(new StringReader(Files.readString(svg, StandardCharsets.UTF_8))));
        BufferedImage img = ImageIO.read(png.toFile());
        assertTrue(img.getWidth() > 300 && img.getHeight() > 200, img.getWidth() + " × " + img.getHeight());
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            String t = new PDFTextStripper().getText(d);
            assertTrue(t.contains("Safety cautions"), "the pump switches 230 V");
        }
        assertTrue(r.out().contains("with safety cautions"));
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(3, left.count(), "no temporary files left behind");
        }
    }

    @Test
    @DisplayName("--dpi 300 gives 300/96 of the 1× size; --pin-state low is written in the title block")
    void dpiAndPinState() throws Exception {
        Path one = dir.resolve("one.png");
        Path print = dir.resolve("print.png");
        assertEquals(0, CliRun.of("export", PUMP, "--png", one.toString(), "--scale", "1").status());
        assertEquals(0, CliRun.of("export", PUMP, "--png", print.toString(), "--dpi", "300").status());
        BufferedImage a = ImageIO.read(one.toFile());
        BufferedImage b = ImageIO.read(print.toFile());
        // 300 dpi against 96 CSS pixels per inch (derived), within the rounding up of each size
        assertEquals(a.getWidth() * 300.0 / 96, b.getWidth(), 300.0 / 96 + 1);
        Path svg = dir.resolve("low.svg");
        assertEquals(0, CliRun.of("export", PUMP, "--svg", svg.toString(), "--pin-state", "low", "--theme", "dark")
                .status());
        String text = Files.readString(svg, StandardCharsets.UTF_8);
        assertTrue(text.contains("Readouts: pin low"), "title block conditions");
    }

    @Test
    @DisplayName("a folder that does not exist is one sentence with status 1 and no stack trace")
    void badPath() {
        CliRun r = CliRun.of("export", PUMP, "--svg", dir.resolve("missing/out.svg").toString());
        assertEquals(1, r.status());
        assertTrue(r.err().contains("does not exist"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.noStackTrace(), r.err());
    }

    @Test
    @DisplayName("a failed export leaves the old file as it was")
    void oldFileKept() throws Exception {
        Path svg = dir.resolve("pump.svg");
        byte[] old = "<svg xmlns='http://www.w3.org/2000/svg'/>".getBytes(StandardCharsets.UTF_8);
        Files.write(svg, old);
        // no stage 7 in the file: the export stops before anything is written
        CliRun r = CliRun.of("export", PUMP, "--stage", "7", "--svg", svg.toString());
        assertEquals(2, r.status(), r.err());
        assertArrayEquals(old, Files.readAllBytes(svg));
        Files.createDirectory(dir.resolve("taken.svg"));
        CliRun f = CliRun.of("export", PUMP, "--svg", dir.resolve("taken.svg").toString());
        assertEquals(1, f.status());
        assertTrue(f.err().contains("is a folder"), f.err());
        assertTrue(Files.isDirectory(dir.resolve("taken.svg")));
    }

    @Test
    @DisplayName("usage errors: no output, --scale with --dpi, --scale without --png, a bad theme")
    void usage() {
        assertEquals(2, CliRun.of("export", PUMP).status());
        CliRun both = CliRun.of("export", PUMP, "--png", dir.resolve("a.png").toString(), "--scale", "2", "--dpi", "300");
        assertEquals(2, both.status());
        assertTrue(both.err().contains("choose one"), both.err());
        assertEquals(2, CliRun.of("export", PUMP, "--svg", dir.resolve("a.svg").toString(), "--scale", "2").status());
        CliRun theme = CliRun.of("export", PUMP, "--svg", dir.resolve("a.svg").toString(), "--theme", "sepia");
        assertEquals(2, theme.status());
        assertTrue(theme.err().contains("light or dark"), theme.err());
        assertEquals(2, CliRun.of("export", PUMP, "--png", dir.resolve("a.png").toString(), "--scale", "0").status());
    }

    @Test
    @DisplayName("export --pdf of a file with a fault hunt prints the hunt section with the ranking SavedHunt.rank computes")
    void faultHuntInTheReport() throws Exception {
        String file = "examples/solar-pump-repair.stage.json";
        Path pdf = dir.resolve("repair.pdf");
        CliRun r = CliRun.of("export", file, "--pdf", pdf.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("with the fault hunt"), r.out());
        org.armature.model.StageDocument doc = org.armature.io.StageFiles.open(Path.of(file));
        org.armature.model.FaultHunt hunt = doc.faultHunt().orElseThrow();
        org.armature.analysis.faults.SavedHunt.Ranked ranked =
                org.armature.analysis.faults.SavedHunt.rank(doc.stages().get(hunt.stageIndex()), hunt);
        org.armature.analysis.faults.Diagnosis.Candidate top = ranked.result().candidates().get(0);
        org.armature.analysis.faults.Diagnosis.Next next = ranked.result().next().orElseThrow();
        String t;
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            t = new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
        assertTrue(t.contains("Fault hunt"), t);
        for (org.armature.model.FaultHunt.HuntReading rd : hunt.readings()) {
            assertTrue(t.contains(org.armature.render.report.FaultHuntSection.volts(rd.volts())), rd + " in " + t);
        }
        assertTrue(t.contains("1 " + top.name() + " " + org.armature.render.report.FaultHuntSection.percent(top.probability())),
                top + " in " + t);
        assertTrue(t.contains("Measure " + next.probe() + " with the pin " + (next.pinHigh() ? "high" : "low")
                + ", expected information gain " + org.armature.render.report.FaultHuntSection.bits(next.gainBits())), t);
        // the same command on a file without a hunt has no such section
        Path plain = dir.resolve("pump.pdf");
        CliRun p = CliRun.of("export", PUMP, "--pdf", plain.toString());
        assertEquals(0, p.status(), p.err());
        assertFalse(p.out().contains("fault hunt"), p.out());
        try (PDDocument d = Loader.loadPDF(plain.toFile())) {
            assertFalse(new PDFTextStripper().getText(d).contains("Fault hunt"));
        }
    }
}
