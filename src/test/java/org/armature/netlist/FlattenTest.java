package org.armature.netlist;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.armature.model.HighSideDrive;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class FlattenTest {

    private static List<String> labels(Netlist nl, String ref) {
        return nl.part(ref).orElseThrow().elements().stream().map(Element::label).toList();
    }

    @Test
    @DisplayName("a Darlington channel becomes input resistor, two base–emitter resistors, two NPNs, collector resistance, clamp diode")
    void darlingtonChannel() {
        Netlist nl = NetlistBuilder.flatten(Templates.build(StageTemplate.DARLINGTON_CHANNEL),
                FlattenOptions.of(true, 25));
        assertEquals(List.of("U2 input resistor", "U2 Q1 base-emitter resistor", "U2 Q2 base-emitter resistor",
                "U2 c2 resistance", "U2 Q1", "U2 Q2", "U2 clamp diode"), labels(nl, "U2"));
    }

    @Test
    @DisplayName("a relay becomes its coil, the com–no and com–nc contacts and the coil–contact insulation, with two state slots")
    void relay() {
        Netlist nl = NetlistBuilder.flatten(Templates.defaultStage(), FlattenOptions.of(true, 25));
        assertEquals(List.of("K1", "K1 contact com-no", "K1 contact com-nc", "K1 coil-contact insulation"),
                labels(nl, "K1"));
        assertEquals(2, nl.stateCount());
        RelayHandle h = nl.relays().get(0);
        assertEquals(9.0 / 400, h.pickUpAmps(), 1e-15, "must-operate volts / coil ohms");
        assertEquals(RelayHandle.State.EITHER, h.stateFor(0.01));
    }

    @Test
    @DisplayName("an N-MOSFET brings its body diode; an NPN its base, collector and emitter resistances as internal nodes")
    void transistors() {
        Netlist mos = NetlistBuilder.flatten(Templates.build(StageTemplate.LOW_SIDE_NMOS), FlattenOptions.of(true, 25));
        assertEquals(List.of("Q1", "Q1 body diode"), labels(mos, "Q1"));
        Netlist npn = NetlistBuilder.flatten(Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE,
                HighSideDrive.LEVEL_SHIFT), FlattenOptions.of(true, 25));
        assertEquals(List.of("Q1 c' resistance", "Q1 b' resistance", "Q1 e' resistance", "Q1"), labels(npn, "Q1"));
        assertTrue(npn.netNodes().containsKey("switch"));
        assertEquals(Netlist.GROUND, (int) npn.netNodes().get("gnd"));
    }

    @Test
    @DisplayName("re-flattening a changed value keeps the numbering and shares the unchanged parts' elements")
    void reflattenValue() {
        org.armature.model.Stage s = Templates.defaultStage();
        FlattenOptions fo = FlattenOptions.of(true, 25);
        Netlist nl = NetlistBuilder.flatten(s, fo);
        int v1 = indexOf(s, "V1");
        org.armature.model.Stage changed = s.withPart(s.require("V1").with("volts", 9.0));
        Netlist re = NetlistBuilder.reflatten(nl, changed, fo, v1).orElseThrow();
        assertTrue(re.sameShape(nl));
        assertEquals(9.0, ((VoltageSource) re.part("V1").orElseThrow().elements().get(0)).volts(), 0.0);
        assertEquals(nl.elements().size(), re.elements().size());
        assertTrue(re.part("K1").orElseThrow().elements().get(0) == nl.part("K1").orElseThrow().elements().get(0),
                "an unchanged part keeps its elements");
    }

    @Test
    @DisplayName("re-flattening refuses a change of structure (a series resistance set to 0 removes a node)")
    void reflattenStructure() {
        org.armature.model.Stage s = Templates.defaultStage();
        FlattenOptions fo = FlattenOptions.of(true, 25);
        Netlist nl = NetlistBuilder.flatten(s, fo);
        org.armature.model.Part q = s.parts().stream().filter(p -> p.kind() == org.armature.model.PartKind.NPN)
                .findFirst().orElseThrow();
        org.armature.model.Stage changed = s.withPart(q.with("baseResistanceOhms", 0.0));
        assertTrue(NetlistBuilder.reflatten(nl, changed, fo, indexOf(s, q.ref())).isEmpty());
    }

    private static int indexOf(org.armature.model.Stage s, String ref) {
        for (int i = 0; i < s.parts().size(); i++) {
            if (s.parts().get(i).ref().equals(ref)) {
                return i;
            }
        }
        throw new IllegalArgumentException(ref);
    }
}
