package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.HashSet;
import java.util.Set;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.netlist.ContactState;
import org.armature.netlist.DeviceParameters;
import org.armature.netlist.Readings;
import org.armature.netlist.Region;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Typed keys: every reading key is one of {@link Readings}, regions and contact states are enums. */
class ReadingKeysTest {

    private static Set<String> constants() throws IllegalAccessException {
        Set<String> out = new HashSet<>();
        for (Field f : Readings.class.getFields()) {
            if (Modifier.isStatic(f.getModifiers()) && f.getType() == String.class) {
                out.add((String) f.get(null));
            }
        }
        return out;
    }

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    @DisplayName("every quantity and state a solved template reports is a Readings key; every region parses")
    void everyKeyIsAConstant(StageTemplate t) throws IllegalAccessException {
        Set<String> keys = constants();
        Stage s = Templates.build(t);
        for (boolean high : new boolean[] {true, false}) {
            OperatingPoint op = new DcAnalysis().solve(s, SolveOptions.DEFAULT.withPinHigh(high));
            for (PartResult r : op.parts().values()) {
                for (String k : r.quantities().keySet()) {
                    assertTrue(keys.contains(k), r.ref() + " quantity " + k);
                }
                for (String k : r.states().keySet()) {
                    assertTrue(keys.contains(k), r.ref() + " state " + k);
                }
                if (r.kind().isSwitch()) {
                    assertTrue(r.region().isPresent(), r.ref() + " region " + r.states());
                }
                if (r.kind() == PartKind.RELAY) {
                    String contacts = r.state(Readings.CONTACTS);
                    assertEquals(op.relayOperated().get(r.ref()) ? ContactState.OPERATED.key()
                            : ContactState.RELEASED.key(), contacts);
                }
            }
            // the template's switch is cut off with the pin low and conducts with it high
            String sw = op.switchVerdict().orElseThrow().ref();
            assertEquals(!high, op.requirePart(sw).region().orElseThrow() == Region.CUTOFF);
        }
    }

    @Test
    @DisplayName("contact slots: 1 is operated, 0 released, and back")
    void contactState() {
        for (ContactState c : ContactState.values()) {
            assertEquals(c, ContactState.of(c.slotValue()));
            assertEquals(c, ContactState.of(c.operated()));
        }
    }

    @Test
    @DisplayName("one mapping from a part to its device parameters, for the netlist and the datasheet fits")
    void deviceParameters() {
        Part q1 = Templates.build(StageTemplate.LOW_SIDE_NPN).require("Q1").with("betaForward", 321);
        assertEquals(321, DeviceParameters.bjt(q1).betaForward(), 0);
        Part m1 = Templates.build(StageTemplate.LOW_SIDE_NMOS).require("Q1").with("thresholdVolts", 1.7);
        assertEquals(1.7, DeviceParameters.mosfet(m1).thresholdVolts(), 0);
        Part r1 = Templates.build(StageTemplate.LOW_SIDE_NPN).require("R1");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DeviceParameters.bjt(r1));
        assertEquals("R1 is not a bipolar transistor", e.getMessage());
    }
}
