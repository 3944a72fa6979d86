package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** Applying a line-up's shared context to stages by role. */
class LineUpContextTest {

    @Test
    void sharedSupplyReachesEveryTemplateByRoleAndKeepsItsOwnParts() {
        LineUpContext context = LineUpContext.of(Templates.build(StageTemplate.LOW_SIDE_NPN));
        SharedPart supply = context.coilSupply().orElseThrow().with(ParamKeys.VOLTS, 13.5);
        LineUpContext changed = context.withCoilSupply(supply);
        for (StageTemplate t : StageTemplate.values()) {
            Stage own = Templates.build(t);
            StageRoles roles = StageRecognition.of(own).roles().orElseThrow();
            LineUpContext.Applied applied = changed.applyTo(own);
            Part coilSupply = applied.stage().require(roles.coilSupplyRef().orElseThrow());
            assertEquals(13.5, coilSupply.value(ParamKeys.VOLTS), t.name());
            assertEquals(own.require(roles.coilSupplyRef().get()).placement(), coilSupply.placement(), t.name());
            // the stage's own switch and wiring stay as drawn
            assertEquals(own.require(roles.switchRef()), applied.stage().require(roles.switchRef()), t.name());
            assertEquals(own.wires(), applied.stage().wires(), t.name());
            assertTrue(applied.differences().stream().anyMatch(d -> d.role().equals("coilSupply")
                    && d.detail().contains("volts")), t.name() + ": " + applied.differences());
        }
    }

    @Test
    void aStageWithAnotherRelayIsReportedNotSilentlyChanged() {
        Stage npn = Templates.build(StageTemplate.LOW_SIDE_NPN);
        String relay = StageRecognition.of(npn).roles().orElseThrow().relayRef();
        LineUpContext context = LineUpContext.of(npn);
        Stage other = npn.updatePart(relay, p -> p.with(ParamKeys.COIL_RESISTANCE_OHMS, 720));
        LineUpContext.Applied applied = context.applyTo(other);
        assertTrue(applied.relayDiffers(), applied.differences().toString());
        assertTrue(applied.differences().get(0).detail().contains("coilResistanceOhms 720 here"),
                applied.differences().toString());
        // the stored stage is untouched: applying returns a new stage
        assertEquals(720, other.require(relay).value(ParamKeys.COIL_RESISTANCE_OHMS));
        assertEquals(context.relay().orElseThrow().values(), applied.stage().require(relay).values());
        assertFalse(context.applyTo(npn).relayDiffers(), "the stage the context came from agrees with it");
    }

    @Test
    void lineUpHoldsTwoToFourDistinctStages() {
        LineUpContext c = LineUpContext.of(Templates.build(StageTemplate.LOW_SIDE_NPN));
        assertThrows(IllegalArgumentException.class, () -> new LineUp(List.of(0), c));
        assertThrows(IllegalArgumentException.class, () -> new LineUp(List.of(0, 1, 2, 3, 4), c));
        assertThrows(IllegalArgumentException.class, () -> new LineUp(List.of(1, 1), c));
        Stage s = Templates.build(StageTemplate.LOW_SIDE_NPN);
        assertThrows(IllegalArgumentException.class,
                () -> new StageDocument("", List.of(s), Optional.of(new LineUp(List.of(0, 1), c))));
    }
}
