package org.armature.ui;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Executor;
import javafx.application.Platform;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.RadioButton;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import org.armature.model.Stage;
import org.armature.render.Annotations;
import org.armature.render.ExportFiles;
import org.armature.render.ExportTheme;
import org.armature.render.PngExport;
import org.armature.render.Sheet;
import org.armature.render.SvgExport;
import org.armature.render.report.DesignReport;
import org.armature.render.report.StageSnapshot;

/**
 * File ▸ Export…: one dialog for the three exports. The choices: format (SVG drawing, PNG image, PDF
 * design report), PNG size (1×, 2×, 4× or 300 dpi) and a transparent background, theme (light print
 * or dark), the pin state of the readouts, what to include (readouts, title block), and the file,
 * named after the stage and placed beside the stage file. The export itself runs off the FX thread
 * through the same headless code as {@code armature export} and reports one sentence.
 */
public final class ExportDialog {

    /** What to write. */
    public enum Format {
        /** The annotated schematic as SVG. */
        SVG("SVG drawing", "svg"),
        /** The annotated schematic as PNG. */
        PNG("PNG image", "png"),
        /** The design report as PDF. */
        PDF("PDF design report", "pdf");

        private final String title;
        private final String extension;

        Format(String title, String extension) {
            this.title = title;
            this.extension = extension;
        }

        /** The file name ending, without the dot. */
        public String extension() {
            return extension;
        }

        @Override
        public String toString() {
            return title;
        }
    }

    /** A PNG size choice. */
    public record PngSize(String label, double scale) {
        @Override
        public String toString() {
            return label;
        }
    }

    /** The PNG sizes offered; 300 dpi is 300/96 of the canvas's size. */
    public static final List<PngSize> PNG_SIZES = List.of(new PngSize("1× (screen)", 1), new PngSize("2× (sharp)", 2),
            new PngSize("4×", 4), new PngSize("300 dpi (print)", PngExport.scaleForDpi(300)));

    /**
     * Everything the dialog decided.
     *
     * @param format what to write
     * @param pngScale PNG pixels per sheet unit
     * @param transparent PNG background left transparent
     * @param theme colours of the drawing (the report is always light)
     * @param pinHigh the pin state of the readouts
     * @param readouts draw the readouts on the schematic
     * @param titleBlock draw the title block under it
     * @param file where to write
     */
    public record Choice(Format format, double pngScale, boolean transparent, ExportTheme theme, boolean pinHigh,
                         boolean readouts, boolean titleBlock, Path file) {
    }

    /** One low-priority daemon thread for exports: a report takes a second and must not hold up the window. */
    public static final Executor BACKGROUND = java.util.concurrent.Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "export");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        return t;
    });

    private ExportDialog() {
    }

    /**
     * The default file: the stage's name made safe for a file name, with the format's ending, in the
     * stage file's folder (the working folder for an unsaved stage).
     */
    public static Path defaultFile(Optional<Path> stageFile, String stageName, Format format) {
        String base = stageName.strip().replaceAll("[\\\\/:*?\"<>|\\p{Cntrl}]+", "-").replaceAll("\\s+", " ")
                .replaceAll("^[-. ]+|[-. ]+$", "");
        if (base.isEmpty() || base.equals(".") || base.equals("..")) {
            base = "stage";
        }
        Path dir = stageFile.map(Path::toAbsolutePath).map(Path::getParent).orElse(Path.of("").toAbsolutePath());
        return dir.resolve(base + "." + format.extension());
    }

    /** The same path with the format's ending in place of a known one. */
    static Path withExtension(Path file, Format format) {
        String name = file.getFileName().toString();
        for (Format f : Format.values()) {
            if (name.toLowerCase(Locale.ROOT).endsWith("." + f.extension())) {
                name = name.substring(0, name.length() - f.extension().length() - 1);
                break;
            }
        }
        return file.resolveSibling(name + "." + format.extension());
    }

    /**
     * Renders a choice to the file's bytes: headless, any thread, the same code as the command line.
     *
     * @param documentTitle the stage file's title for the title block and the report's running head
     */
    public static byte[] render(Choice c, String documentTitle, Stage stage, LocalDate date) {
        return render(c, new org.armature.model.StageDocument(documentTitle, List.of(stage), Optional.empty()), stage,
                date);
    }

    /**
     * Renders a choice for a stage of a document: the document gives the title and, for the report,
     * the line-up the stage belongs to and the fault hunt made on it.
     */
    public static byte[] render(Choice c, org.armature.model.StageDocument doc, Stage stage, LocalDate date) {
        StageSnapshot snap = StageSnapshot.evaluate(doc.title(), stage, c.pinHigh(),
                c.format() == Format.PDF ? StageSnapshot.Depth.REPORT : StageSnapshot.Depth.DRAWING, date);
        if (c.format() == Format.PDF) {
            return DesignReport.pdf(snap, DesignReport.sectionsOf(doc, stage));
        }
        Sheet sheet = snap.sheet(c.theme().palette()).withTitle(c.titleBlock());
        if (!c.readouts()) {
            sheet = sheet.withAnnotations(Annotations.NONE);
        } else {
            // the document's fault hunt on this stage: its readings tagged at their nets, as on the canvas
            int index = doc.stages().indexOf(stage);
            Optional<org.armature.model.FaultHunt> hunt = doc.faultHunt().filter(h -> h.stageIndex() == index);
            if (hunt.isPresent() && !hunt.get().readings().isEmpty()) {
                sheet = sheet.withAnnotations(sheet.annotations().withReadings(hunt.get().readings().stream()
                        .map(r -> new Annotations.MeterReading(r.net(), r.pinHigh(), r.volts())).toList()));
            }
        }
        return c.format() == Format.SVG ? SvgExport.toSvg(sheet).getBytes(StandardCharsets.UTF_8)
                : PngExport.png(sheet, c.pngScale(), c.transparent());
    }

    /**
     * Shows the dialog for the present stage; on OK runs the export on {@code background} and
     * reports through {@link EditorViewModel#say}.
     */
    public static void show(Window owner, EditorViewModel vm, Executor background) {
        Dialog<Choice> d = dialog(vm);
        if (owner != null) {
            d.initOwner(owner);
        }
        d.showAndWait().ifPresent(c -> {
            Stage stage = vm.stage();
            org.armature.model.StageDocument doc = vm.document();
            vm.say("Exporting " + c.file().getFileName() + "…");
            background.execute(() -> {
                String said;
                try {
                    ExportFiles.write(c.file(), render(c, doc, stage, LocalDate.now()));
                    said = "Exported " + c.file().getFileName() + ".";
                } catch (ExportFiles.ExportException e) {
                    said = "Export failed: " + e.getMessage();
                }
                String message = said;
                Platform.runLater(() -> vm.say(message));
            });
        });
    }

    /** The dialog itself (tests drive it without showing it). */
    public static Dialog<Choice> dialog(EditorViewModel vm) {
        Stage stage = vm.stage();
        Optional<Path> stageFile = vm.fileProperty().get();
        Dialog<Choice> d = new Dialog<>();
        d.setTitle("Export");
        d.setHeaderText("Export " + stage.name());

        ToggleGroup formats = new ToggleGroup();
        HBox formatRow = new HBox(12);
        for (Format f : Format.values()) {
            RadioButton b = new RadioButton(f.toString());
            b.setUserData(f);
            b.setToggleGroup(formats);
            b.setId("export-" + f.extension());
            formatRow.getChildren().add(b);
        }
        ComboBox<PngSize> size = new ComboBox<>();
        size.getItems().setAll(PNG_SIZES);
        size.getSelectionModel().select(1);
        size.setId("export-size");
        CheckBox transparent = new CheckBox("Transparent background");
        ComboBox<ExportTheme> theme = new ComboBox<>();
        theme.getItems().setAll(ExportTheme.values());
        theme.getSelectionModel().select(ExportTheme.LIGHT);
        theme.setId("export-theme");
        theme.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(ExportTheme t) {
                return t == null ? "" : t == ExportTheme.LIGHT ? "light (print)" : "dark";
            }

            @Override
            public ExportTheme fromString(String text) {
                return ExportTheme.byId(text.split(" ")[0]).orElse(ExportTheme.LIGHT);
            }
        });
        ComboBox<String> pin = new ComboBox<>();
        pin.getItems().setAll("pin high", "pin low");
        pin.getSelectionModel().select(stage.conditions().pinHigh() ? 0 : 1);
        CheckBox readouts = new CheckBox("Readouts on the drawing");
        readouts.setSelected(true);
        CheckBox title = new CheckBox("Title block (stage, document, date, conditions)");
        title.setSelected(true);
        TextField fileField = new TextField(defaultFile(stageFile, stage.name(), Format.SVG).toString());
        fileField.setId("export-file");
        fileField.setPrefColumnCount(36);
        HBox.setHgrow(fileField, Priority.ALWAYS);
        Button browse = new Button("Choose…");
        browse.setOnAction(e -> {
            Format f = (Format) formats.getSelectedToggle().getUserData();
            Path now = Path.of(fileField.getText().isBlank() ? "." : fileField.getText()).toAbsolutePath();
            FileChooser fc = new FileChooser();
            fc.setTitle("Export " + f);
            fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(f.toString(), "*." + f.extension()));
            File dir = now.getParent() == null ? null : now.getParent().toFile();
            if (dir != null && dir.isDirectory()) {
                fc.setInitialDirectory(dir);
            }
            fc.setInitialFileName(now.getFileName().toString());
            File chosen = fc.showSaveDialog(d.getDialogPane().getScene().getWindow());
            if (chosen != null) {
                fileField.setText(chosen.getAbsolutePath());
            }
        });
        formats.selectedToggleProperty().addListener((o, was, now) -> {
            if (now == null) {
                return;
            }
            Format f = (Format) now.getUserData();
            boolean image = f != Format.PDF;
            size.setDisable(f != Format.PNG);
            transparent.setDisable(f != Format.PNG);
            theme.setDisable(!image);
            readouts.setDisable(!image);
            title.setDisable(!image);
            if (!fileField.getText().isBlank()) {
                fileField.setText(withExtension(Path.of(fileField.getText()), f).toString());
            }
        });
        formats.selectToggle(formats.getToggles().get(0));

        GridPane g = new GridPane();
        g.setHgap(10);
        g.setVgap(8);
        g.setPadding(new Insets(10));
        int row = 0;
        g.addRow(row++, new Label("Format"), formatRow);
        g.addRow(row++, new Label("PNG size"), new HBox(10, size, transparent));
        g.addRow(row++, new Label("Theme"), theme);
        g.addRow(row++, new Label("Readouts at"), pin);
        g.addRow(row++, new Label("Include"), new HBox(12, readouts, title));
        g.addRow(row, new Label("File"), new HBox(6, fileField, browse));
        d.getDialogPane().setContent(g);
        ButtonType export = new ButtonType("Export", javafx.scene.control.ButtonBar.ButtonData.OK_DONE);
        d.getDialogPane().getButtonTypes().addAll(export, ButtonType.CANCEL);
        d.getDialogPane().lookupButton(export).disableProperty().bind(fileField.textProperty().isEmpty());
        d.setResultConverter(b -> b != export ? null : new Choice((Format) formats.getSelectedToggle().getUserData(),
                size.getValue().scale(), transparent.isSelected(), theme.getValue(),
                pin.getSelectionModel().getSelectedIndex() == 0, readouts.isSelected(), title.isSelected(),
                Path.of(fileField.getText()).toAbsolutePath()));
        return d;
    }
}
