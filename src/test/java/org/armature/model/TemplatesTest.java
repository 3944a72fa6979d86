package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class TemplatesTest {

    static Stream<Arguments> variants() {
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (Suppressor s : Suppressor.values()) {
                out.add(Arguments.of(t, s, HighSideDrive.LEVEL_SHIFT));
                if (t == StageTemplate.HIGH_SIDE_PNP) {
                    out.add(Arguments.of(t, s, HighSideDrive.DIRECT));
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest
    @MethodSource("variants")
    @DisplayName("every template variant validates without findings and names the five nets")
    void everyVariantIsCleanAndNamed(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage stage = Templates.build(t, s, d);
        List<Finding> findings = Validator.validate(stage);
        assertEquals(List.of(), findings, () -> t + " " + s + " " + d);
        Connectivity c = Connectivity.of(stage);
        for (String net : List.of("pin", "control", "switch", "supply", "gnd")) {
            assertTrue(c.nets().contains(net), net + " missing in " + t + " " + s);
        }
    }

    @Test
    @DisplayName("low-side NPN: coil between supply and collector, diode cathode on supply, anode on switch")
    void lowSideNpnTopology() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        Connectivity c = Connectivity.of(stage);
        assertEquals("supply", c.net("K1", "a1"));
        assertEquals("switch", c.net("K1", "a2"));
        assertEquals("switch", c.net("Q1", "c"));
        assertEquals("gnd", c.net("Q1", "e"));
        assertEquals("control", c.net("R1", "a"));
        assertEquals("pin", c.net("R1", "b"));
        assertEquals("control", c.net("R2", "a"));
        assertEquals("gnd", c.net("R2", "b"));
        assertEquals("supply", c.net("D1", "k"));
        assertEquals("switch", c.net("D1", "a"));
    }

    @Test
    @DisplayName("diode + zener: the zener's anode returns to the supply, cathodes meet")
    void diodeZenerSeries() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT);
        Connectivity c = Connectivity.of(stage);
        assertEquals("switch", c.net("D1", "a"));
        assertEquals(c.net("D1", "k"), c.net("D2", "k"));
        assertEquals("supply", c.net("D2", "a"));
    }

    @Test
    @DisplayName("high side: PNP emitter on supply, coil from collector to ground, level shift on the base")
    void highSideTopology() {
        Stage stage = Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        Connectivity c = Connectivity.of(stage);
        assertEquals("supply", c.net("Q1", "e"));
        assertEquals("switch", c.net("Q1", "c"));
        assertEquals("switch", c.net("K1", "a1"));
        assertEquals("gnd", c.net("K1", "a2"));
        assertEquals("control", c.net("R3", "b"));
        assertEquals("supply", c.net("R3", "a"));
        assertEquals(c.net("R4", "b"), c.net("Q2", "c"));
        assertEquals("gnd", c.net("D1", "a"));
        assertEquals("switch", c.net("D1", "k"));
    }

    @Test
    @DisplayName("Darlington channel with diode: the common pin is tied to the coil supply")
    void darlingtonClamp() {
        Stage stage = Templates.build(StageTemplate.DARLINGTON_CHANNEL, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        Connectivity c = Connectivity.of(stage);
        assertEquals("supply", c.net("U2", "com"));
        assertEquals("switch", c.net("U2", "out"));
        assertEquals("gnd", c.net("U2", "e"));
    }
}
