package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.Collectors;
import javafx.event.ActionEvent;
import javafx.scene.control.MenuItem;
import javafx.scene.control.TextField;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.stage.WindowEvent;
import org.armature.io.StageFileException;
import org.armature.model.HighSideDrive;
import org.armature.model.ParamKeys;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.armature.render.Palette;
import org.armature.render.PartGeometry;
import org.armature.render.PlacedLabel;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

@ExtendWith(ApplicationExtension.class)
class MainWindowTest {

    /** Stage files kept in memory. */
    static final class MemoryStore implements DocumentStore {
        final Map<Path, StageDocument> files = new HashMap<>();

        @Override
        public StageDocument load(Path file) {
            StageDocument d = files.get(file);
            if (d == null) {
                throw new StageFileException(StageFileException.NOT_FOUND, "There is no file " + file + ".", null);
            }
            return d;
        }

        @Override
        public void save(StageDocument document, Path file) {
            files.put(file, document);
        }
    }

    private EditorViewModel vm;
    private MainWindow window;
    private final MemoryStore store = new MemoryStore();
    private javafx.stage.Stage fxStage;

    @Start
    void start(javafx.stage.Stage stage) {
        vm = new EditorViewModel(Templates.defaultStage(), store, ReadoutSource.NONE, Runnable::run, Runnable::run);
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        window.guardClose(stage);
        fxStage = stage;
        stage.show();
    }

    private Set<String> drawnPartLabels() {
        return window.canvas().lastLayout().labels(PlacedLabel.Kind.PART).stream().map(PlacedLabel::owner)
                .collect(Collectors.toSet());
    }

    @Test
    @DisplayName("the window opens on the default stage with its parts drawn and no file")
    void startsOnDefaultStage(FxRobot robot) {
        assertEquals(Templates.defaultStage(), vm.stage());
        assertTrue(drawnPartLabels().containsAll(Set.of("K1", "Q1", "R1", "R2", "D1", "U1", "E1")), drawnPartLabels().toString());
        assertEquals("untitled", vm.fileName());
        assertFalse(vm.dirtyProperty().get());
        assertTrue(vm.evaluation().status().startsWith("Solver not connected"));
    }

    @Test
    @DisplayName("File ▸ New from template ▸ Low-side N-MOSFET ▸ Freewheeling diode replaces the stage")
    void newFromTemplateMenu(FxRobot robot) {
        AtomicReference<MenuItem> item = new AtomicReference<>();
        window.forEachItem(m -> {
            if ("new-low-side-nmos-diode".equals(m.getId())) {
                item.set(m);
            }
        });
        robot.interact(() -> item.get().fire());
        assertEquals(Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT), vm.stage());
        assertTrue(drawnPartLabels().contains("Q1"));
        assertEquals(100_000, vm.stage().require("R2").value(ParamKeys.RESISTANCE_OHMS), 1e-9, "template: 100 kΩ gate pull-down");
    }

    @Test
    @DisplayName("typing 2k2 in R1's part sheet sets 2200 Ω as one step; undo restores the identical document")
    void partSheetEditUndo(FxRobot robot) {
        Stage before = vm.stage();
        robot.interact(() -> vm.select(Selection.ofPart("R1")));
        TextField f = robot.lookup("#param-resistanceOhms").queryAs(TextField.class);
        assertEquals("1 kΩ", f.getText());
        robot.interact(() -> {
            f.setText("2k2");
            f.fireEvent(new ActionEvent());
        });
        assertEquals(2200, vm.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9, "IEC 60062 letter code 2k2 = 2.2 kΩ");
        assertTrue(vm.dirtyProperty().get());
        robot.interact(vm::undo);
        assertEquals(before, vm.stage());
        assertFalse(vm.dirtyProperty().get());
    }

    @Test
    @DisplayName("text that is not a resistance is refused on the field and changes nothing")
    void invalidFieldRefused(FxRobot robot) {
        robot.interact(() -> vm.select(Selection.ofPart("R1")));
        TextField f = robot.lookup("#param-resistanceOhms").queryAs(TextField.class);
        robot.interact(() -> {
            f.setText("12 volts");
            f.fireEvent(new ActionEvent());
        });
        assertTrue(f.getStyleClass().contains(PartSheet.INVALID));
        assertEquals(Templates.defaultStage(), vm.stage());
    }

    @Test
    @DisplayName("clicking R1 on the canvas selects it and fills the part sheet")
    void clickSelects(FxRobot robot) {
        var r1 = PartGeometry.bodyBounds(vm.stage().require("R1"));
        SchematicCanvas c = window.canvas();
        var v = c.view();
        var screen = c.localToScreen(v.mapX(r1.centreX(), r1.centreY()), v.mapY(r1.centreX(), r1.centreY()));
        robot.clickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(Selection.ofPart("R1"), vm.selectionProperty().get());
        assertEquals("R1", window.sheet().shownRef().orElse(""));
    }

    @Test
    @DisplayName("save marks the document clean and open brings it back")
    void saveAndOpen(FxRobot robot) {
        Path p = Path.of("memory", "bench.stage.json");
        robot.interact(() -> vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 4700));
        robot.interact(() -> vm.saveAs(p));
        assertFalse(vm.dirtyProperty().get());
        assertEquals("bench.stage.json", vm.fileName());
        robot.interact(() -> vm.newFromTemplate(StageTemplate.HIGH_SIDE_PNP, Suppressor.TVS, HighSideDrive.LEVEL_SHIFT));
        robot.interact(() -> vm.open(p));
        assertEquals(4700, vm.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9);
        java.util.concurrent.atomic.AtomicBoolean opened = new java.util.concurrent.atomic.AtomicBoolean(true);
        robot.interact(() -> opened.set(vm.open(Path.of("memory", "missing.stage.json"))));
        assertFalse(opened.get());
        assertTrue(vm.messageProperty().get().contains("missing"));
    }

    @Test
    @DisplayName("a PNG rendering of the default stage is not blank: thousands of dark ink pixels on light paper")
    void snapshotNotBlank(FxRobot robot) {
        AtomicReference<WritableImage> img = new AtomicReference<>();
        robot.interact(() -> img.set(ImageExport.render(Templates.defaultStage(), Annotations.NONE, Palette.LIGHT, 1)));
        PixelReader px = img.get().getPixelReader();
        int dark = 0;
        int light = 0;
        for (int y = 0; y < (int) img.get().getHeight(); y++) {
            for (int x = 0; x < (int) img.get().getWidth(); x++) {
                double b = px.getColor(x, y).getBrightness();
                if (b < 0.4) {
                    dark++;
                } else if (b > 0.9) {
                    light++;
                }
            }
        }
        // derived: about 30 wire and symbol strokes of 2 px over 40-100 px each give well over 2000 ink pixels
        assertTrue(dark > 2000, "dark pixels: " + dark);
        assertTrue(light > dark * 5, "paper dominates: light " + light + ", dark " + dark);
    }

    @Test
    @DisplayName("the live canvas's drawing layer holds ink after start-up")
    void canvasLayerNotBlank(FxRobot robot) {
        AtomicReference<WritableImage> img = new AtomicReference<>();
        robot.interact(() -> img.set(window.canvas().drawingLayer().snapshot(null, null)));
        PixelReader px = img.get().getPixelReader();
        int ink = 0;
        for (int y = 0; y < (int) img.get().getHeight(); y += 2) {
            for (int x = 0; x < (int) img.get().getWidth(); x += 2) {
                var c = px.getColor(x, y);
                if (c.getOpacity() > 0.5 && c.getBrightness() < 0.4) {
                    ink++;
                }
            }
        }
        assertTrue(ink > 300, "ink samples: " + ink);
    }

    @Test
    @DisplayName("the close button with unsaved changes asks; cancel keeps the window open, discard lets it close")
    void closeButtonAsksBeforeDiscarding(FxRobot robot) {
        int[] asked = {0};
        boolean[] answer = {false};
        robot.interact(() -> window.setDiscardQuestion(() -> {
            asked[0]++;
            return answer[0];
        }));
        // clean document: no question, the close goes ahead
        AtomicReference<WindowEvent> clean = new AtomicReference<>();
        robot.interact(() -> {
            clean.set(new WindowEvent(fxStage, WindowEvent.WINDOW_CLOSE_REQUEST));
            assertTrue(window.handleCloseRequest(clean.get()));
        });
        assertEquals(0, asked[0]);
        assertFalse(clean.get().isConsumed());
        robot.interact(() -> vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 2200));
        assertTrue(vm.dirtyProperty().get());
        // dirty and cancelled: the request is consumed, the window stays
        robot.interact(() -> fxStage.fireEvent(new WindowEvent(fxStage, WindowEvent.WINDOW_CLOSE_REQUEST)));
        assertEquals(1, asked[0]);
        assertTrue(fxStage.isShowing());
        AtomicReference<WindowEvent> cancelled = new AtomicReference<>();
        robot.interact(() -> {
            cancelled.set(new WindowEvent(fxStage, WindowEvent.WINDOW_CLOSE_REQUEST));
            assertFalse(window.handleCloseRequest(cancelled.get()));
        });
        assertTrue(cancelled.get().isConsumed());
        // dirty and discarded: the request passes
        answer[0] = true;
        AtomicReference<WindowEvent> discarded = new AtomicReference<>();
        robot.interact(() -> {
            discarded.set(new WindowEvent(fxStage, WindowEvent.WINDOW_CLOSE_REQUEST));
            assertTrue(window.handleCloseRequest(discarded.get()));
        });
        assertFalse(discarded.get().isConsumed());
        assertEquals(3, asked[0]);
    }

    @Test
    @DisplayName("the drive pin's datasheet section fits GP-7 (VOH 2.9 V at 8 mA, 2.0 V at 20 mA: 75 Ω, 3.5 V; "
            + "derived from a typical 3.3 V microcontroller output table) as one step; bad input is marked")
    void datasheetSectionFitsPin(FxRobot robot) {
        robot.interact(() -> {
            vm.setValue("U1", ParamKeys.HIGH_VOLTS, 5);
            vm.setValue("U1", ParamKeys.OUTPUT_RESISTANCE_OHMS, 40);
            vm.select(Selection.ofPart("U1"));
        });
        StageDocument before = vm.document();
        javafx.scene.control.TitledPane pane = robot.lookup("#datasheet-pane").queryAs(javafx.scene.control.TitledPane.class);
        TextField i2 = robot.lookup("#fit-voh2-i").queryAs(TextField.class);
        robot.interact(() -> {
            pane.setExpanded(true);
            i2.setText("20 mQ");
        });
        assertTrue(i2.getStyleClass().contains(PartSheet.INVALID));
        robot.interact(() -> robot.lookup("#datasheet-apply").queryButton().fire());
        assertEquals(before, vm.document(), "nothing applied while a figure is bad");
        robot.interact(() -> {
            robot.lookup("#fit-voh1").queryAs(TextField.class).setText("2.9");
            robot.lookup("#fit-voh1-i").queryAs(TextField.class).setText("8m");
            robot.lookup("#fit-voh2").queryAs(TextField.class).setText("2.0 V");
            i2.setText("20m");
        });
        assertFalse(i2.getStyleClass().contains(PartSheet.INVALID));
        robot.interact(() -> robot.lookup("#datasheet-apply").queryButton().fire());
        assertEquals(75, vm.stage().require("U1").value(ParamKeys.OUTPUT_RESISTANCE_OHMS), 1e-9, "GP-7");
        assertEquals(3.5, vm.stage().require("U1").value(ParamKeys.HIGH_VOLTS), 1e-9, "GP-7");
        robot.interact(vm::undo);
        assertEquals(before, vm.document());
    }
}
