package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.RadioButton;
import javafx.scene.control.TextField;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.armature.render.ExportTheme;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** File ▸ Export…: the default file, the choices it hands on, and what each choice puts in the file. */
@ExtendWith(ApplicationExtension.class)
class ExportDialogTest {

    private EditorViewModel vm;

    @Start
    void start(javafx.stage.Stage stage) {
        vm = new EditorViewModel(Templates.defaultStage(), new MainWindowTest.MemoryStore(), ReadoutSource.NONE,
                Runnable::run, Runnable::run);
    }

    @Test
    @DisplayName("the file defaults to the stage's name beside the stage file, made safe for a file name")
    void defaultFile() {
        Path stageFile = Path.of("/work/projects/greenhouse.stage.json");
        assertEquals(Path.of("/work/projects/Valve 1-2.svg"),
                ExportDialog.defaultFile(Optional.of(stageFile), "Valve 1/2", ExportDialog.Format.SVG));
        assertEquals(Path.of("/work/projects/stage.pdf"),
                ExportDialog.defaultFile(Optional.of(stageFile), " ? ", ExportDialog.Format.PDF));
        assertEquals(Path.of("").toAbsolutePath().resolve("Pump relay.png"),
                ExportDialog.defaultFile(Optional.empty(), "Pump relay", ExportDialog.Format.PNG));
        assertEquals(Path.of("/a/b.pdf"), ExportDialog.withExtension(Path.of("/a/b.svg"), ExportDialog.Format.PDF));
    }

    @Test
    @DisplayName("choosing PDF changes the file's ending, and OK hands on every choice")
    void dialogChoices(FxRobot robot) {
        AtomicReference<ExportDialog.Choice> choice = new AtomicReference<>();
        robot.interact(() -> {
            Dialog<ExportDialog.Choice> d = ExportDialog.dialog(vm);
            RadioButton pdf = (RadioButton) d.getDialogPane().lookup("#export-pdf");
            pdf.setSelected(true);
            TextField file = (TextField) d.getDialogPane().lookup("#export-file");
            assertTrue(file.getText().endsWith(vm.stage().name() + ".pdf"), file.getText());
            ButtonType export = d.getDialogPane().getButtonTypes().get(0);
            choice.set(d.getResultConverter().call(export));
        });
        ExportDialog.Choice c = choice.get();
        assertEquals(ExportDialog.Format.PDF, c.format());
        assertEquals(ExportTheme.LIGHT, c.theme());
        assertEquals(vm.stage().conditions().pinHigh(), c.pinHigh());
        assertEquals(2, c.pngScale(), 0, "2× is the default size");
    }

    @Test
    @DisplayName("'include' is honoured: no title block leaves out the stage name, no readouts the coil current")
    void includeChoices() {
        Stage stage = Templates.defaultStage();
        Path f = Path.of("x.svg");
        String full = svg(new ExportDialog.Choice(ExportDialog.Format.SVG, 1, false, ExportTheme.LIGHT, true, true, true, f));
        String bare = svg(new ExportDialog.Choice(ExportDialog.Format.SVG, 1, false, ExportTheme.LIGHT, true, false, false, f));
        assertTrue(full.contains(">" + stage.name() + "</text>"));
        assertTrue(full.contains(">coil "));
        assertFalse(bare.contains(">" + stage.name() + "</text>"));
        assertFalse(bare.contains(">coil "));
        assertTrue(bare.contains(">K1</text>"), "the drawing itself stays");
    }

    @Test
    @DisplayName("the window's PDF of a document with a fault hunt prints the hunt, as export --pdf does "
            + "(before the merge fix the dialog passed only the line-up and the section was missing)")
    void reportHoldsTheFaultHunt() throws Exception {
        org.armature.model.StageDocument doc = org.armature.io.StageFiles.open(
                Path.of("examples/solar-pump-repair.stage.json"));
        org.armature.model.FaultHunt hunt = doc.faultHunt().orElseThrow();
        Stage hunted = doc.stages().get(hunt.stageIndex());
        ExportDialog.Choice c = new ExportDialog.Choice(ExportDialog.Format.PDF, 1, false, ExportTheme.LIGHT,
                true, true, true, Path.of("x.pdf"));
        byte[] pdf = ExportDialog.render(c, doc, hunted, LocalDate.of(2026, 12, 5));
        String text;
        try (org.apache.pdfbox.pdmodel.PDDocument d = org.apache.pdfbox.Loader.loadPDF(pdf)) {
            text = new org.apache.pdfbox.text.PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
        assertTrue(text.contains("Fault hunt"), text);
        String top = org.armature.analysis.faults.SavedHunt.rank(hunted, hunt).result().candidates().get(0).name();
        assertTrue(text.contains(top), "the top candidate " + top + " in " + text);
    }

    private static String svg(ExportDialog.Choice c) {
        return new String(ExportDialog.render(c, "Bench", Templates.defaultStage(), LocalDate.of(2026, 12, 5)),
                StandardCharsets.UTF_8);
    }
}
