package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import javafx.event.ActionEvent;
import javafx.scene.control.MenuItem;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import org.armature.analysis.CheckResult;
import org.armature.analysis.StageChecks;
import org.armature.model.GridPoint;
import org.armature.model.HighSideDrive;
import org.armature.model.ParamKeys;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.armature.render.Selection;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The window over the real engines: readouts solved by the DC engine (same-thread executors, so
 * every edit is solved before the action returns), verdicts and edges on a hand-stepped queue that
 * a test runs when it wants them.
 */
@ExtendWith(ApplicationExtension.class)
class LiveWindowTest {

    /**
     * The window's engine warm-starts from its last solution, a fresh engine starts cold: both stop
     * inside the convergence test (check-values.md NM-6, common practice: reltol 1e-3, vntol 1 µV), so they
     * agree to a few microvolts, not bit for bit.
     */
    private static final double NM6_VOLTS = 1e-5;
    /** Current counterpart of {@link #NM6_VOLTS}: 1e-4 relative of a milliampere-scale base current. */
    private static final double NM6_AMPS = 1e-7;


    private EditorViewModel vm;
    private MainWindow window;
    private final MainWindowTest.MemoryStore store = new MainWindowTest.MemoryStore();
    private final Deque<Runnable> slow = new ArrayDeque<>();

    @Start
    void start(javafx.stage.Stage stage) {
        Analyses analyses = new Analyses(Analyses.engineVerdicts(), Analyses.engineEdges(), slow::add, 0);
        vm = new EditorViewModel(Templates.defaultStage(), store, new EngineReadouts(), Runnable::run, Runnable::run,
                analyses);
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        stage.show();
    }

    private Annotations shown() {
        return vm.annotations();
    }

    private double voltage(String net) {
        return shown().voltages().stream().filter(v -> v.net().equals(net)).findFirst()
                .orElseThrow(() -> new AssertionError("no voltage readout at " + net)).volts();
    }

    private double current(String ref, String pin) {
        return shown().currents().stream().filter(c -> c.pin().equals(new PinRef(ref, pin))).findFirst()
                .orElseThrow(() -> new AssertionError("no current readout at " + ref + "." + pin)).ampsIntoPin();
    }

    private Annotations.RelayGauge gauge() {
        return shown().gauges().get(0);
    }

    private MenuItem menuItem(String id) {
        AtomicReference<MenuItem> item = new AtomicReference<>();
        window.forEachItem(m -> {
            if (id.equals(m.getId())) {
                item.set(m);
            }
        });
        assertTrue(item.get() != null, "menu item " + id);
        return item.get();
    }

    private void runSlow(FxRobot robot) {
        robot.interact(() -> {
            while (!slow.isEmpty()) {
                slow.poll().run();
            }
        });
    }

    @Test
    @DisplayName("each template from the menu solves: voltages at its test points, a switch verdict, a coil gauge")
    void everyTemplateFromTheMenu(FxRobot robot) {
        for (StageTemplate t : StageTemplate.values()) {
            robot.interact(() -> menuItem("new-" + t.id() + "-diode").fire());
            Stage expected = Templates.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
            assertEquals(expected, vm.stage(), t.id());
            OperatingPoint op = new DcAnalysis().solve(expected);
            String sw = op.switchVerdict().orElseThrow().ref();
            assertTrue(shown().badges().stream().anyMatch(b -> b.ref().equals(sw)), t.id() + ": badge on " + sw);
            assertEquals(1, shown().gauges().size(), t.id());
            // derived: the readout is the engine's own node voltage at the switch test point
            assertEquals(op.voltage("switch"), voltage("switch"), NM6_VOLTS, t.id());
            assertTrue(vm.evaluation().status().startsWith("Converged in "), vm.evaluation().status());
            assertTrue(vm.evaluation().status().contains("largest KCL residual"));
        }
    }

    @Test
    @DisplayName("typing 2k2 for R1 in the part sheet moves the base current readout to the engine's value")
    void partSheetEditChangesReadout(FxRobot robot) {
        double before = current("Q1", "b");
        robot.interact(() -> vm.select(Selection.ofPart("R1")));
        TextField f = robot.lookup("#param-resistanceOhms").queryAs(TextField.class);
        robot.interact(() -> {
            f.setText("2k2");
            f.fireEvent(new ActionEvent());
        });
        OperatingPoint direct = new DcAnalysis().solve(vm.stage());
        // derived: the same stage solved directly gives the same base current and control voltage
        assertEquals(direct.requirePart("Q1").pinCurrents().get("b"), current("Q1", "b"), NM6_AMPS);
        assertEquals(direct.voltage("control"), voltage("control"), NM6_VOLTS);
        assertTrue(current("Q1", "b") < before, "derived: a larger base resistor gives less base current");
    }

    @Test
    @DisplayName("undo and redo of several edits return to the identical documents")
    void undoRedoIdentical(FxRobot robot) {
        StageDocument original = vm.document();
        robot.interact(() -> {
            vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 4700);
            vm.setPinHigh(false);
            vm.setAmbient(50);
        });
        StageDocument edited = vm.document();
        robot.interact(() -> {
            vm.undo();
            vm.undo();
            vm.undo();
        });
        assertEquals(original, vm.document());
        assertEquals(new DcAnalysis().solve(vm.stage()).voltage("control"), voltage("control"), NM6_VOLTS);
        robot.interact(() -> {
            vm.redo();
            vm.redo();
            vm.redo();
        });
        assertEquals(edited, vm.document());
    }

    @Test
    @DisplayName("the pin toggle releases the relay and operates it again")
    void pinToggleSwitchesRelay(FxRobot robot) {
        assertTrue(gauge().operated(), "template: pin high, relay operated");
        ToggleButton pin = robot.lookup("#pin-toggle").queryAs(ToggleButton.class);
        robot.interact(pin::fire);
        assertFalse(vm.stage().conditions().pinHigh());
        assertFalse(gauge().operated(), "pin low: released");
        assertEquals(new Annotations.PartBadge("Q1", "cut off", Annotations.State.OK),
                shown().badges().stream().filter(b -> b.ref().equals("Q1")).findFirst().orElseThrow());
        robot.interact(pin::fire);
        assertTrue(gauge().operated(), "pin high again: operated");
    }

    @Test
    @DisplayName("a lone resistor has no path to ground: one plain sentence; wired to the supply and ground it solves")
    void placeAndWire(FxRobot robot) {
        AtomicReference<String> ref = new AtomicReference<>();
        robot.interact(() -> ref.set(vm.place(PartKind.RESISTOR, new GridPoint(44, 8))));
        String status = vm.evaluation().status();
        assertFalse(status.contains("Exception") || status.contains("\tat "), status);
        assertFalse(status.startsWith("Converged"), status);
        assertTrue(vm.evaluation().findings().stream().anyMatch(f -> f.key().startsWith("solver.")
                || f.severity() == org.armature.model.Severity.ERROR), vm.evaluation().findings().toString());
        robot.interact(() -> {
            String g = vm.place(PartKind.GROUND, new GridPoint(44, 14));
            GridPoint b = vm.stage().require(ref.get()).pinPoint("b");
            vm.drawWire(b, vm.stage().require(g).pinPoint("g"));
            GridPoint a = vm.stage().require(ref.get()).pinPoint("a");
            String v = vm.place(PartKind.SUPPLY, new GridPoint(44, 3));
            vm.drawWire(a, vm.stage().require(v).pinPoint("p"));
        });
        assertTrue(vm.evaluation().status().startsWith("Converged"), vm.evaluation().status());
        OperatingPoint op = new DcAnalysis().solve(vm.stage());
        double amps = op.requirePart(ref.get()).quantity("current");
        double expected = 12 / vm.stage().require(ref.get()).value(ParamKeys.RESISTANCE_OHMS);
        // derived: Ohm's law, a new supply at its default 12 V across the resistor's default value
        assertEquals(expected, Math.abs(amps), expected * 1e-6);
    }

    @Test
    @DisplayName("save and open round-trip the document and its readouts")
    void saveOpenRoundTrip(FxRobot robot) {
        Path p = Path.of("memory", "greenhouse-valve.stage.json");
        robot.interact(() -> vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 3300));
        StageDocument saved = vm.document();
        double control = voltage("control");
        robot.interact(() -> vm.saveAs(p));
        robot.interact(() -> vm.newFromTemplate(StageTemplate.LOW_SIDE_NMOS, Suppressor.TVS, HighSideDrive.LEVEL_SHIFT));
        robot.interact(() -> vm.open(p));
        assertEquals(saved, vm.document());
        assertEquals(control, voltage("control"), NM6_VOLTS);
    }

    @Test
    @DisplayName("after the checks run, the verdicts list shows every check id; clicking one selects its parts")
    void verdictsShowCheckIds(FxRobot robot) {
        runSlow(robot);
        List<String> ids = window.verdicts().checks().getItems().stream().map(CheckResult::id).toList();
        assertEquals(StageChecks.IDS.stream().filter(ids::contains).toList(), ids, "ids in the table's order");
        assertTrue(ids.containsAll(List.of("relay.operates", "relay.releases", "switch.saturated")), ids.toString());
        CheckResult sat = window.verdicts().checks().getItems().stream().filter(c -> c.id().equals("switch.saturated"))
                .findFirst().orElseThrow();
        robot.interact(() -> window.verdicts().checks().getSelectionModel().select(sat));
        assertEquals(sat.refs().stream().collect(java.util.stream.Collectors.toSet()), vm.selectionProperty().get().refs());
    }

    @Test
    @DisplayName("the edges drawer plots the run: ink on the plot canvas, and a cursor with values")
    void edgesPlotNotBlank(FxRobot robot) {
        runSlow(robot);
        robot.interact(() -> window.edgesDrawer().setExpanded(true));
        assertTrue(vm.evaluation().edgesOrNone().turnOff().isPresent(), vm.evaluation().edgesOrNone().status());
        assertTrue(window.edges().plot().isPresent());
        assertEquals(4, window.edges().plot().get().channels().size(), "coil current, switch voltage, travel, contacts");
        robot.interact(() -> window.edges().setCursorSeconds(0.005));
        AtomicReference<WritableImage> img = new AtomicReference<>();
        robot.interact(() -> img.set(window.edges().canvas().snapshot(null, null)));
        PixelReader px = img.get().getPixelReader();
        int ink = 0;
        for (int y = 0; y < (int) img.get().getHeight(); y += 2) {
            for (int x = 0; x < (int) img.get().getWidth(); x += 2) {
                if (px.getColor(x, y).getBrightness() < 0.6) {
                    ink++;
                }
            }
        }
        // derived: four traces, frames and axis text cover far more than 200 sampled pixels
        assertTrue(ink > 200, "ink pixels: " + ink);
    }

    @Test
    @DisplayName("applying the sizing assistant's proposals is one undoable step")
    void sizingApplyIsOneStep(FxRobot robot) {
        StageDocument before = vm.document();
        var proposals = SizingDialog.size(vm.stage()).suggestions();
        assertFalse(proposals.isEmpty());
        robot.interact(() -> vm.applySuggestions(proposals));
        for (var s : proposals) {
            assertEquals(s.value(), vm.stage().require(s.ref()).value(s.paramKey()), 1e-9, s.ref());
        }
        assertEquals("Undo Size base network", vm.undoLabelProperty().get());
        robot.interact(vm::undo);
        assertEquals(before, vm.document());
    }

    @Test
    @DisplayName("the supply slider sets the coil supply and the readouts follow at once")
    void supplySlider(FxRobot robot) {
        javafx.scene.control.Slider s = robot.lookup("#supply-slider").queryAs(javafx.scene.control.Slider.class);
        robot.interact(() -> s.setValue(9));
        assertEquals(9, vm.stage().require("V1").value(ParamKeys.VOLTS), 1e-9);
        assertEquals(9, voltage("supply"), 1e-6, "derived: the rail's test point reads the rail");
        robot.interact(() -> s.setValue(10));
        robot.interact(vm::undo);
        assertEquals(12, vm.stage().require("V1").value(ParamKeys.VOLTS), 1e-9, "one drag is one step");
    }

    @Test
    @DisplayName("View ▸ Readouts ▸ Node voltages off hides the voltage tags without a solve")
    void toggleHidesVoltages(FxRobot robot) {
        assertFalse(shown().voltages().isEmpty());
        robot.interact(() -> vm.showReadout(EditorViewModel.ReadoutKind.VOLTAGES, false));
        assertTrue(shown().voltages().isEmpty());
        assertFalse(shown().currents().isEmpty());
    }
}
