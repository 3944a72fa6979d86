package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Roles found from connectivity alone: every template and variant, the same stages disguised
 * (designators shuffled, everything moved, parts listed in another order, test points removed), and
 * drawings whose roles are missing or ambiguous. The expected roles are read off the templates'
 * layout in {@link Templates} by hand, not computed.
 */
class StageRecognitionTest {

    /** Every template with every suppressor; the high side with both drives. */
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

    private static StageRoles roles(Stage s) {
        return StageRecognition.of(s).roles().orElseThrow(() -> new AssertionError("not recognised: "
                + StageRecognition.of(s).findings()));
    }

    /** What each template's layout gives each role (by hand from Templates). */
    private static void assertTemplateRoles(StageTemplate t, Suppressor s, HighSideDrive d, StageRoles r,
                                            Function<String, String> ref) {
        assertEquals(ref.apply("K1"), r.relayRef());
        assertEquals(Optional.of(ref.apply("U1")), r.drivePinRef());
        assertEquals(Optional.of(ref.apply("V1")), r.coilSupplyRef());
        assertEquals(List.of(ref.apply("V2")), r.contactSupplyRefs());
        assertEquals(List.of(ref.apply("E1")), r.loadRefs());
        switch (t) {
            case LOW_SIDE_NPN, LOW_SIDE_NMOS -> {
                assertEquals(t == StageTemplate.LOW_SIDE_NPN ? DriverTopology.LOW_SIDE_NPN : DriverTopology.LOW_SIDE_NMOS,
                        r.topology());
                assertEquals(ref.apply("Q1"), r.switchRef());
                assertEquals(Optional.of(ref.apply("R1")), r.inputResistorRef());
                assertEquals(Optional.of(ref.apply("R2")), r.inputPullRef());
                assertEquals(Optional.empty(), r.levelShiftRef());
            }
            case DARLINGTON_CHANNEL -> {
                assertEquals(DriverTopology.DARLINGTON_CHANNEL, r.topology());
                assertEquals(ref.apply("U2"), r.switchRef());
                assertEquals(Optional.of(ref.apply("R1")), r.inputResistorRef());
                assertEquals(Optional.empty(), r.inputPullRef(), "the channel holds itself off");
            }
            case HIGH_SIDE_PNP -> {
                assertEquals(DriverTopology.HIGH_SIDE_PNP, r.topology());
                assertEquals(ref.apply("Q1"), r.switchRef());
                assertEquals(Optional.of(d), r.highSideDrive());
                assertEquals(Optional.of(ref.apply("R1")), r.inputResistorRef());
                assertEquals(Optional.of(ref.apply("R2")), r.inputPullRef());
                if (d == HighSideDrive.LEVEL_SHIFT) {
                    assertEquals(Optional.of(ref.apply("Q2")), r.levelShiftRef());
                    assertEquals(Optional.of(ref.apply("R3")), r.switchPullUpRef());
                    assertEquals(Optional.of(ref.apply("R4")), r.switchBaseResistorRef());
                } else {
                    assertEquals(Optional.empty(), r.levelShiftRef());
                }
            }
            default -> throw new AssertionError(t);
        }
        boolean channel = t == StageTemplate.DARLINGTON_CHANNEL;
        SuppressorKind expected = switch (s) {
            case NONE -> SuppressorKind.NONE;
            case DIODE -> channel ? SuppressorKind.CHANNEL_CLAMP : SuppressorKind.DIODE;
            case DIODE_ZENER -> channel ? SuppressorKind.CHANNEL_CLAMP_IN_SERIES : SuppressorKind.DIODE_ZENER;
            case RC -> SuppressorKind.RC;
            case TVS -> SuppressorKind.TVS;
            case RESISTOR -> SuppressorKind.RESISTOR;
        };
        assertEquals(expected, r.suppressorKind());
        assertEquals(s == Suppressor.NONE, r.suppressorRefs().isEmpty());
    }

    @ParameterizedTest(name = "{0}, {1}, {2}")
    @MethodSource("variants")
    @DisplayName("every template and variant: roles as laid out")
    void templateRoles(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage stage = Templates.build(t, s, d);
        assertTemplateRoles(t, s, d, roles(stage), Function.identity());
    }

    @ParameterizedTest(name = "{0}, {1}, {2}")
    @MethodSource("variants")
    @DisplayName("designators shuffled, drawing moved, turned and mirrored, parts reordered, test points removed: the same roles")
    void disguisedRoles(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage stage = Templates.build(t, s, d);
        for (long seed = 1; seed <= 3; seed++) {
            StageDisguise x = StageDisguise.of(stage, seed, (int) (5 * seed) - 11, 3 - (int) seed, seed != 2,
                    (int) seed, seed == 3);
            StageRoles r = roles(x.stage());
            assertTemplateRoles(t, s, d, r, x::ref);
            StageRoles o = roles(stage);
            assertEquals(o.suppressorRefs().stream().map(x::ref).sorted().toList(),
                    r.suppressorRefs().stream().sorted().toList());
        }
    }

    @ParameterizedTest(name = "{0}, {1}, {2}")
    @MethodSource("variants")
    @DisplayName("without test points the role nets get the names the templates' test points give them")
    void roleNetNamesMatchTheTemplatesTestPoints(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage stage = Templates.build(t, s, d);
        StageDisguise bare = StageDisguise.of(stage, 7, 4, 4, false);
        assertTrue(bare.stage().testPoints().isEmpty());
        Connectivity named = StageRecognition.of(bare.stage()).connectivity();
        for (TestPoint tp : stage.testPoints()) {
            assertEquals(tp.net(), named.net(bare.ref(tp.ref()), tp.pin()), tp.toString());
        }
        StageRoles r = roles(bare.stage());
        assertEquals("switch", r.switchNet());
        assertEquals("control", r.switchControlNet());
        assertEquals(Optional.of("pin"), r.pinNet());
    }

    @ParameterizedTest(name = "{0}, {1}, {2}")
    @MethodSource("variants")
    @DisplayName("no net is left with a number: every net has a role name, a test point name or a pin name")
    void noNumberedNets(StageTemplate t, Suppressor s, HighSideDrive d) {
        StageDisguise bare = StageDisguise.of(Templates.build(t, s, d), 3, 0, 0, false);
        StageRecognition rec = StageRecognition.of(bare.stage());
        for (String net : rec.connectivity().nets()) {
            assertFalse(net.matches("n[0-9]+"), net);
            assertTrue(rec.netDescriptions().containsKey(net), net);
        }
        assertEquals("contact-common", rec.connectivity().net(bare.ref("K1"), "com"));
        assertEquals("contact-no", rec.connectivity().net(bare.ref("K1"), "no"));
    }

    @Test
    @DisplayName("a test point keeps the user's name even where a role would name the net; the role name moves aside")
    void userNamesWin() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN);
        // the user calls the base node "switch": the real switch node must not also be called "switch"
        Stage renamed = new Stage(stage.name(), "", stage.parts(), stage.wires(),
                List.of(new TestPoint("switch", "Q1", "b")), stage.conditions());
        Connectivity c = StageRecognition.of(renamed).connectivity();
        assertEquals("switch", c.net("Q1", "b"));
        assertEquals("switch-2", c.net("Q1", "c"));
        assertEquals("switch-2", roles(renamed).switchNet());
    }

    @Test
    @DisplayName("two transistors that both switch the coil: an ambiguous-switch finding naming both")
    void ambiguousSwitch() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN);
        Part q1 = stage.require("Q1");
        // a second NPN in parallel with Q1, drawn beside it and wired pin to pin
        Part q5 = Part.of("Q5", PartKind.NPN, q1.placement().movedTo(q1.placement().origin().plus(6, 0)));
        Stage two = stage.withPart(q5);
        for (String pin : List.of("b", "c", "e")) {
            two = two.withWire(new Wire(q1.pinPoint(pin), q5.pinPoint(pin)));
        }
        StageRecognition rec = StageRecognition.of(two);
        Finding f = rec.findings().stream().filter(x -> x.key().equals("topology.switch-ambiguous")).findFirst()
                .orElseThrow(() -> new AssertionError(rec.findings().toString()));
        assertTrue(f.message().contains("Q1") && f.message().contains("Q5"), f.message());
        assertTrue(f.message().contains("switch"), "names the role: " + f.message());
        assertEquals(Severity.WARNING, f.severity());
    }

    @Test
    @DisplayName("two relays, each with its own switch: an ambiguous-relay finding")
    void ambiguousRelay() {
        Stage a = Templates.build(StageTemplate.LOW_SIDE_NPN);
        StageDisguise b = StageDisguise.of(a, 11, 0, 40, false);
        List<Part> parts = new ArrayList<>(a.parts());
        parts.addAll(b.stage().parts());
        List<Wire> wires = new ArrayList<>(a.wires());
        wires.addAll(b.stage().wires());
        Stage both = new Stage("two", "", parts, wires, a.testPoints(), a.conditions());
        List<String> keys = StageRecognition.of(both).findings().stream().map(Finding::key).toList();
        assertTrue(keys.contains("topology.relay-ambiguous"), keys.toString());
    }

    @Test
    @DisplayName("no relay, or a relay nothing switches: not recognised, in words that name the missing role")
    void missingRoles() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN);
        StageRecognition noRelay = StageRecognition.of(stage.withoutPart("K1"));
        assertTrue(noRelay.roles().isEmpty());
        assertTrue(noRelay.findings().get(0).message().contains("no relay"), noRelay.findings().toString());
        StageRecognition noSwitch = StageRecognition.of(stage.withoutPart("Q1"));
        assertTrue(noSwitch.roles().isEmpty());
        Finding f = noSwitch.findings().get(0);
        assertEquals("topology.not-recognised", f.key());
        assertTrue(f.message().contains("No transistor switches K1's coil"), f.message());
        StageRecognition noSupply = StageRecognition.of(stage.withoutPart("V1"));
        assertTrue(noSupply.findings().stream().anyMatch(x -> x.key().equals("topology.coil-supply-missing")));
    }

    @Test
    @DisplayName("the recognition depends on structure only: equal for equal stages, unchanged by a value edit")
    void structureOnly() {
        Stage stage = Templates.build(StageTemplate.HIGH_SIDE_PNP);
        Stage edited = stage.updatePart("R4", p -> p.with("resistanceOhms", 3300));
        assertEquals(StageRecognition.of(stage), StageRecognition.of(edited));
    }

    @Test
    @DisplayName("net descriptions say what a net is and which pins are on it")
    void descriptions() {
        StageRecognition rec = StageRecognition.of(Templates.build(StageTemplate.LOW_SIDE_NPN));
        Map<String, String> d = rec.netDescriptions();
        assertTrue(d.get("switch").startsWith("coil low side at Q1's collector ("), d.get("switch"));
        assertTrue(d.get("switch").contains("K1.a2") && d.get("switch").contains("Q1.c"), d.get("switch"));
        assertTrue(d.get("control").startsWith("Q1's base"), d.get("control"));
        assertTrue(rec.describe("gnd").startsWith("ground ("), rec.describe("gnd"));
    }
}
