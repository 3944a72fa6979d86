package org.armature.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.armature.io.StageFiles;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.render.ExportFiles;
import org.armature.render.ExportTheme;
import org.armature.render.PngExport;
import org.armature.render.Sheet;
import org.armature.render.SvgExport;
import org.armature.render.report.DesignReport;
import org.armature.render.report.StageSnapshot;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature export FILE [--stage N] [--svg OUT] [--png OUT [--scale N | --dpi N]] [--pdf OUT]
 * [--theme light|dark] [--pin-state high|low]}: the annotated stage as SVG and PNG (drawing and
 * title block) and the design report as PDF, without any display. Each file is written atomically
 * (temporary file beside it, then a move over it); a file that cannot be written is one sentence
 * and leaves the old file as it was. One line per file written goes to the output stream.
 */
@Command(name = "export", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Export a stage: the annotated schematic with a title block as SVG or PNG, and a one-file "
                + "design report as PDF (schematic, operating point, verdicts, sizing, edges, safety cautions, and "
                + "the line-up and fault hunt where the file holds them)."})
final class ExportCommand implements Callable<Integer> {

    /** Largest PNG scale accepted: 8× (a 4,000-pixel-wide image of the largest template). */
    static final double MAX_SCALE = 8;
    /** Largest PNG resolution accepted, dots per inch (8× of 96). */
    static final double MAX_DPI = MAX_SCALE * PngExport.CSS_DPI;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Stage file to export.")
    Path file;

    @Option(names = "--stage", paramLabel = "N|NAME",
            description = "Which stage of the file: its number from 1, or its name (default 1).")
    String stageSelector;

    @Option(names = "--svg", paramLabel = "OUT", description = "Write the annotated schematic as SVG here.")
    Path svg;

    @Option(names = "--png", paramLabel = "OUT", description = "Write the annotated schematic as PNG here.")
    Path png;

    @Option(names = "--scale", paramLabel = "N", description = "PNG scale: 1, 2 or 4 (up to 8; default 2).")
    Double scale;

    @Option(names = "--dpi", paramLabel = "N", description = "PNG resolution in dots per inch instead of a scale "
            + "(300 for print).")
    Double dpi;

    @Option(names = "--transparent", description = "PNG with a transparent background instead of the paper colour.")
    boolean transparent;

    @Option(names = "--pdf", paramLabel = "OUT", description = "Write the design report as PDF here.")
    Path pdf;

    @Option(names = "--theme", paramLabel = "THEME", converter = ThemeConverter.class,
            description = "Colours of SVG and PNG: light (print, default) or dark. The report is always light.")
    ExportTheme theme = ExportTheme.LIGHT;

    @Option(names = "--pin-state", paramLabel = "STATE", converter = Choices.Pin.class,
            description = "Pin state of the readouts on the drawing: high or low (default: as stored in the file).")
    Choices.PinState pinState;

    @Override
    public Integer call() {
        CommandLine cl = spec.commandLine();
        if (svg == null && png == null && pdf == null) {
            throw new CommandLine.ParameterException(cl, "Name at least one output: --svg OUT, --png OUT or --pdf OUT.");
        }
        if (scale != null && dpi != null) {
            throw new CommandLine.ParameterException(cl, "--scale and --dpi cannot be used together; choose one.");
        }
        if ((scale != null || dpi != null || transparent) && png == null) {
            throw new CommandLine.ParameterException(cl, "--scale, --dpi and --transparent apply to --png only.");
        }
        if (scale != null && !(scale > 0 && scale <= MAX_SCALE)) {
            throw new CommandLine.ParameterException(cl, "--scale must be a number above 0 and at most "
                    + (int) MAX_SCALE + ", for example 1, 2 or 4.");
        }
        if (dpi != null && !(dpi >= 24 && dpi <= MAX_DPI)) {
            throw new CommandLine.ParameterException(cl, "--dpi must lie from 24 to " + (int) MAX_DPI
                    + ", for example 300.");
        }
        StageDocument doc = StageFiles.open(file);
        Stage stage = StageSelection.select(doc, stageSelector, file, cl);
        boolean high = pinState != null ? pinState.isHigh() : stage.conditions().pinHigh();
        StageSnapshot snap = StageSnapshot.evaluate(doc.title(), stage, high,
                pdf != null ? StageSnapshot.Depth.REPORT : StageSnapshot.Depth.DRAWING, LocalDate.now());
        PrintWriter out = cl.getOut();
        Sheet sheet = snap.sheet(theme.palette());
        if (svg != null) {
            write(svg, SvgExport.toSvg(sheet).getBytes(java.nio.charset.StandardCharsets.UTF_8));
            out.println("Wrote " + svg + " (SVG, " + (int) sheet.width() + " × " + (int) sheet.height() + " px).");
        }
        if (png != null) {
            double k = dpi != null ? PngExport.scaleForDpi(dpi) : scale != null ? scale : 2;
            var img = PngExport.image(sheet, k, transparent);
            write(png, PngExport.encode(img, k * PngExport.CSS_DPI));
            out.println("Wrote " + png + " (PNG, " + img.getWidth() + " × " + img.getHeight() + " pixels, "
                    + String.format(Locale.ROOT, "%.0f", k * PngExport.CSS_DPI) + " dpi).");
        }
        if (pdf != null) {
            DesignReport.Sections sections = DesignReport.sectionsOf(doc, stage);
            write(pdf, DesignReport.pdf(snap, sections));
            out.println("Wrote " + pdf + " (PDF design report" + (snap.cautions().isEmpty() ? "" : ", with safety cautions")
                    + (sections.faultHunt().isPresent() ? ", with the fault hunt" : "") + ").");
        }
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    private static void write(Path target, byte[] bytes) {
        try {
            ExportFiles.write(target, bytes);
        } catch (ExportFiles.ExportException e) {
            throw new CommandFailedException(e.getMessage(), e);
        }
    }

    /** Reads {@code light} or {@code dark}. */
    static final class ThemeConverter implements CommandLine.ITypeConverter<ExportTheme> {
        @Override
        public ExportTheme convert(String text) {
            return ExportTheme.byId(text).orElseThrow(() -> new CommandLine.TypeConversionException(
                    "\"" + text + "\" is not a theme; choose light or dark"));
        }
    }
}
