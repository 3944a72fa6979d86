package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ValidatorTest {

    private final Stage base = Templates.defaultStage();

    @Test
    void outOfRangeValueIsAFindingNotAnException() {
        Stage s = base.updatePart("R1", p -> p.with("resistanceOhms", -5));
        List<Finding> f = Validator.validate(s);
        assertEquals(1, f.size());
        assertEquals("param.out-of-range", f.get(0).key());
        assertEquals("R1", f.get(0).ref());
        assertEquals("resistanceOhms", f.get(0).field());
        assertEquals(-5, s.require("R1").value("resistanceOhms"), 0.0, "the typed value is kept");
    }

    @Test
    void duplicateDesignatorAndBadOption() {
        Part extra = base.require("R2").withRef("R1").withPlacement(Placement.at(40, 40));
        Stage s = base.withPart(extra.withRef("R9")).withPart(extra.withRef("R9").withOption("loadKind", "x"));
        List<String> keys = Validator.validate(s).stream().map(Finding::key).toList();
        assertTrue(keys.contains("option.unknown"), keys.toString());
        assertTrue(keys.contains("pin.unconnected"), keys.toString());
    }

    @Test
    void relayReleaseAboveOperate() {
        Stage s = base.updatePart("K1", k -> k.with("mustReleaseVolts", 10));
        assertTrue(Validator.validate(s).stream().anyMatch(f -> f.key().equals("relay.release-above-operate")));
    }

    @Test
    @DisplayName("pins follow rotation and mirroring: derived from the clockwise map (x, y) -> (-y, x) on a y-down grid")
    void placementRotationMapsPins() {
        Placement p = new Placement(new GridPoint(10, 10), 90, false);
        assertEquals(new GridPoint(12, 10), p.apply(0, -2), "a at top turns to the right");
        assertEquals(new GridPoint(8, 10), p.apply(0, 2));
        assertEquals(new GridPoint(9, 10), new Placement(new GridPoint(10, 10), 0, true).apply(1, 0));
        assertEquals(new GridPoint(10, 12), new Placement(new GridPoint(10, 10), 180, false).apply(0, -2));
    }

    @Test
    void wireTJunctionConnects() {
        Stage s = new Stage("t", "", List.of(
                Part.of("R1", PartKind.RESISTOR, Placement.at(0, 2)),
                Part.of("R2", PartKind.RESISTOR, Placement.at(4, 6))),
                List.of(Wire.of(0, 4, 8, 4), Wire.of(4, 4, 4, 4)), List.of(), Conditions.DEFAULT);
        Connectivity c = Connectivity.of(s);
        assertEquals(c.net("R1", "b"), c.net("R2", "a"), "R2.a at (4,4) lies on the wire from R1.b");
    }

    @Test
    @DisplayName("an ambient below copper's −234.5 °C intercept is an error finding that says the valid range")
    void ambientOutsideTheModels() {
        Stage s = Templates.defaultStage();
        Stage cold = s.withConditions(new Conditions(true, -250, -250, 50));
        List<Finding> f = Validator.validate(cold);
        assertTrue(f.stream().anyMatch(x -> x.key().equals("conditions.ambient-out-of-range")
                && x.severity() == Severity.ERROR && x.message().contains("from -60 °C to 200 °C")), f.toString());
        assertTrue(Validator.validate(s).stream().noneMatch(x -> x.key().equals("conditions.ambient-out-of-range")));
    }
}
