package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javafx.event.ActionEvent;
import javafx.geometry.Point2D;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.input.MouseButton;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.render.Affine;
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
import org.testfx.util.WaitForAsyncUtils;

/**
 * The low-side NPN stage drawn part by part from the palette, as a user would, with designators
 * Q7, R9 and K3 and no test points, solved live by the DC engine.
 *
 * <p>What this side of the window controls is checked: every part placed from the palette at the
 * template's place, turned, valued and renamed through the part sheet, the wires drawn, and the
 * evaluation's operating point, coil gauge, badges (the switch verdict among them) and the voltage
 * readouts at the nets the stage's roles name equal to the template's: the roles are found from
 * connectivity alone, so no test point named "switch" is needed.
 */
@ExtendWith(ApplicationExtension.class)
class PaletteBuildTest {

    /** check-values.md NM-6 (common practice): two engines stop inside reltol 1e-3; a milliampere agrees to 1e-6 A. */
    private static final double NM6_AMPS = 1e-6;

    private EditorViewModel vm;
    private MainWindow window;

    @Start
    void start(javafx.stage.Stage stage) {
        Stage empty = new Stage("Drawn NPN channel", "", List.of(), List.of(), List.of(), null);
        vm = new EditorViewModel(empty, new MainWindowTest.MemoryStore(), new EngineReadouts(), Runnable::run,
                Runnable::run);
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        stage.show();
    }

    @Test
    @DisplayName("the low-side NPN drawn from the palette as Q7, R9, K3 solves to the template's operating point")
    void drawnStageEqualsTemplate(FxRobot robot) {
        Stage template = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        Map<String, String> wanted = Map.of("Q1", "Q7", "R1", "R9", "K1", "K3");
        Map<String, String> built = new HashMap<>();
        // someone drawing part by part holds the view: a zoom (here by ×1) stops the view following the drawing
        robot.interact(() -> window.canvas().zoomAt(1, 0, 0));
        for (Part t : template.parts()) {
            String id = "#palette-" + t.kind().name().toLowerCase(Locale.ROOT);
            robot.interact(() -> robot.lookup(id).queryAs(ToggleButton.class).fire());
            Affine v = window.canvas().view();
            double gx = t.placement().origin().gridX();
            double gy = t.placement().origin().gridY();
            Point2D screen = window.canvas().localToScreen(v.mapX(gx, gy), v.mapY(gx, gy));
            // one jump of the pointer, then a real press and release there: clickOn(point) would
            // glide there in up to 200 steps, each repainting the armed part's preview
            robot.robotContext().getMouseRobot().move(screen);
            robot.clickOn(MouseButton.PRIMARY);
            WaitForAsyncUtils.waitForFxEvents();
            Part placed = vm.stage().parts().get(vm.stage().parts().size() - 1);
            assertEquals(t.kind(), placed.kind());
            assertEquals(t.placement().origin(), placed.placement().origin(), "placed where clicked");
            robot.interact(() -> {
                vm.select(Selection.ofPart(placed.ref()));
                if (t.placement().mirrored()) {
                    vm.mirror();
                }
                for (int r = 0; r < t.placement().rotationDegrees() / 90; r++) {
                    vm.rotate();
                }
                t.values().forEach((k, x) -> vm.setValue(placed.ref(), k, x));
                t.options().forEach((k, x) -> vm.setOption(placed.ref(), k, x));
            });
            String ref = placed.ref();
            if (wanted.containsKey(t.ref())) {
                TextField f = robot.lookup("#part-ref").queryAs(TextField.class);
                robot.interact(() -> {
                    f.setText(wanted.get(t.ref()));
                    f.fireEvent(new ActionEvent());
                });
                ref = wanted.get(t.ref());
            }
            built.put(t.ref(), ref);
        }
        robot.interact(() -> template.wires().forEach(w -> vm.drawWire(w.from(), w.to())));
        Stage drawn = vm.stage();
        assertTrue(drawn.testPoints().isEmpty());
        for (Part t : template.parts()) {
            Part b = drawn.require(built.get(t.ref()));
            assertEquals(t.kind(), b.kind(), t.ref());
            assertEquals(t.placement(), b.placement(), t.ref());
            assertEquals(t.values(), b.values(), t.ref());
            assertEquals(t.options(), b.options(), t.ref());
        }
        assertEquals("Q7", built.get("Q1"));
        Evaluation e = vm.evaluation();
        assertEquals(drawn, e.stage(), "the evaluation is of the stage as drawn");
        assertTrue(e.readoutsReady() && e.status().startsWith("Converged"), e.status());
        OperatingPoint ours = e.readouts().orElseThrow().pinHigh().orElseThrow();
        OperatingPoint ref = new DcAnalysis().solve(template);
        // derived: the same circuit under other designators has the same currents
        assertEquals(ref.requirePart("Q1").pinCurrents().get("c"), ours.requirePart("Q7").pinCurrents().get("c"), NM6_AMPS);
        assertEquals(ref.requirePart("R1").pinCurrents().get("a"), ours.requirePart("R9").pinCurrents().get("a"), NM6_AMPS);
        Annotations.RelayGauge g = vm.annotations().gauges().get(0);
        Annotations.RelayGauge tg = new EngineReadouts().compute(template).annotations().gauges().get(0);
        assertEquals("K3", g.ref());
        assertEquals(tg.coilAmps(), g.coilAmps(), NM6_AMPS);
        assertEquals(tg.pickUpAmps(), g.pickUpAmps(), NM6_AMPS);
        assertEquals(tg.operated(), g.operated());
        assertEquals(tg.dropOutAmps(), g.dropOutAmps(), NM6_AMPS);

        // the switch badge and the readouts at named nets, found from connectivity alone
        Annotations ta = new EngineReadouts().compute(template).annotations();
        Annotations da = vm.annotations();
        Map<String, String> back = new HashMap<>();
        built.forEach((t, b) -> back.put(b, t));
        Map<String, Annotations.PartBadge> templateBadges = new HashMap<>();
        ta.badges().forEach(b -> templateBadges.put(b.ref(), b));
        assertEquals(ta.badges().size(), da.badges().size(), "one badge per transistor and pin, as on the template");
        for (Annotations.PartBadge b : da.badges()) {
            Annotations.PartBadge t = templateBadges.get(back.get(b.ref()));
            assertTrue(t != null, "the template has a badge for " + b.ref());
            // derived: same circuit, same verdict words ("saturated, ×… margin") and state
            assertEquals(t.text(), b.text(), b.ref());
            assertEquals(t.state(), b.state(), b.ref());
        }
        Annotations.PartBadge sw = da.badges().stream().filter(b -> b.ref().equals("Q7")).findFirst().orElseThrow();
        assertTrue(sw.text().startsWith("saturated"), "the switch badge gives the verdict: " + sw.text());
        Map<String, Double> templateVolts = new HashMap<>();
        ta.voltages().forEach(v -> templateVolts.put(v.net(), v.volts()));
        Map<String, Double> drawnVolts = new HashMap<>();
        da.voltages().forEach(v -> drawnVolts.put(v.net(), v.volts()));
        assertEquals(templateVolts.keySet(), drawnVolts.keySet(),
                "the drawn stage's nets are named as the template's test points (pin, control, switch, supply)");
        // check-values.md NM-6 (common practice): two engines' answers agree within reltol·|v| + vntol
        templateVolts.forEach((net, volts) -> assertEquals(volts, drawnVolts.get(net), 1e-3 * Math.abs(volts) + 1e-6, net));
    }
}
