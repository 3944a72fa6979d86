package org.armature.analysis;

import org.armature.model.RoleIssue;
import org.armature.model.StageRoles;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class TopologyCheckTest {

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

    private static Set<String> problemKeys(Stage stage) {
        return TopologyCheck.check(stage).stream().filter(f -> f.severity() != Severity.INFO)
                .map(Finding::key).collect(Collectors.toSet());
    }

    private static Optional<RoleIssue> issue(Stage stage, String key) {
        return TopologyCheck.analyse(stage).issues().stream().filter(i -> i.finding().key().equals(key)).findFirst();
    }

    @ParameterizedTest
    @MethodSource("variants")
    @DisplayName("every template variant is recognised and clean but for the expected findings")
    void templatesAreRecognisedAndClean(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage stage = Fixtures.build(t, s, d);
        StageRoles roles = TopologyCheck.recognise(stage).orElseThrow();
        assertEquals(t.name(), roles.topology().name(), "topology");
        Set<String> expected = new java.util.HashSet<>();
        if (s == Suppressor.NONE) {
            expected.add("topology.suppressor-missing");
        }
        if (t == StageTemplate.HIGH_SIDE_PNP && d == HighSideDrive.DIRECT) {
            // check-values.md "beyond the hand calculation" 4: a 3.5 V pin cannot turn off a PNP on 12 V
            expected.add("topology.high-side-cannot-turn-off");
        }
        assertEquals(expected, problemKeys(stage));
        assertEquals(s == Suppressor.NONE, roles.suppressorRefs().isEmpty());
        assertEquals(List.of("V2"), roles.contactSupplyRefs());
        assertEquals(Optional.of("V1"), roles.coilSupplyRef());
        assertEquals(Optional.of("U1"), roles.drivePinRef());
        if (t == StageTemplate.HIGH_SIDE_PNP) {
            assertEquals(Optional.of(d), roles.highSideDrive());
        }
    }

    @Test
    @DisplayName("low-side NPN roles: R1 is the base resistor, R2 the pull-down, D1 the suppressor")
    void lowSideRoles() {
        StageRoles roles = TopologyCheck.recognise(Fixtures.build(StageTemplate.LOW_SIDE_NPN)).orElseThrow();
        assertEquals("Q1", roles.switchRef());
        assertEquals("K1", roles.relayRef());
        assertEquals(Optional.of("R1"), roles.inputResistorRef());
        assertEquals(Optional.of("R2"), roles.inputPullRef());
        assertEquals(List.of("D1"), roles.suppressorRefs());
        assertEquals("supply", roles.coilHighNet());
        assertEquals("switch", roles.coilLowNet());
        assertEquals("control", roles.controlNet());
    }

    @Test
    @DisplayName("high side with level shift: Q2 shifts, R3 pulls Q1 up, R4 limits Q1's base current")
    void levelShiftRoles() {
        StageRoles roles = TopologyCheck.recognise(Fixtures.build(StageTemplate.HIGH_SIDE_PNP)).orElseThrow();
        assertEquals(Optional.of("Q2"), roles.levelShiftRef());
        assertEquals("Q2", roles.inputRef());
        assertEquals(Optional.of("R3"), roles.switchPullUpRef());
        assertEquals(Optional.of("R4"), roles.switchBaseResistorRef());
        assertEquals(Optional.of("R1"), roles.inputResistorRef());
        assertEquals(Optional.of("R2"), roles.inputPullRef());
    }

    @ParameterizedTest
    @MethodSource("pullDownRemovals")
    @DisplayName("removing the pull-down (or PNP pull-up) leaves a floating base or gate, naming the transistor")
    void removedPullIsFloating(StageTemplate t, String removed, String floating) {
        Stage stage = Fixtures.build(t).withoutPart(removed);
        RoleIssue i = issue(stage, "topology.floating-control").orElseThrow();
        assertEquals(floating, i.finding().ref());
        assertEquals(Severity.WARNING, i.finding().severity());
        assertEquals(Set.of("topology.floating-control"), problemKeys(stage));
    }

    static Stream<Arguments> pullDownRemovals() {
        return Stream.of(
                Arguments.of(StageTemplate.LOW_SIDE_NPN, "R2", "Q1"),
                Arguments.of(StageTemplate.LOW_SIDE_NMOS, "R2", "Q1"),
                Arguments.of(StageTemplate.HIGH_SIDE_PNP, "R2", "Q2"),
                Arguments.of(StageTemplate.HIGH_SIDE_PNP, "R3", "Q1"));
    }

    @ParameterizedTest
    @MethodSource("diodeTemplates")
    @DisplayName("a freewheeling diode rotated by 180° conducts when the stage turns on: reversed, naming D1")
    void rotatedDiodeIsReversed(StageTemplate t) {
        Stage stage = Fixtures.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT).updatePart("D1",
                p -> p.withPlacement(p.placement().rotated(p.placement().rotationDegrees() + 180)));
        RoleIssue i = issue(stage, "topology.suppressor-reversed").orElseThrow();
        assertEquals("D1", i.finding().ref());
        assertEquals(Severity.ERROR, i.finding().severity());
        assertTrue(i.refs().contains("K1"));
        assertEquals(Set.of("topology.suppressor-reversed"), problemKeys(stage));
    }

    static Stream<StageTemplate> diodeTemplates() {
        return Stream.of(StageTemplate.LOW_SIDE_NPN, StageTemplate.LOW_SIDE_NMOS, StageTemplate.HIGH_SIDE_PNP);
    }

    @Test
    @DisplayName("diode + zener with the diode turned round: both junctions forward, reversed")
    void diodeZenerReversed() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT)
                .updatePart("D1", p -> p.withPlacement(p.placement().rotated(0)));
        assertEquals(Set.of("topology.suppressor-reversed"), problemKeys(stage));
        assertEquals(List.of("D2", "D1", "K1"), issue(stage, "topology.suppressor-reversed").orElseThrow().refs());
    }

    @Test
    @DisplayName("a 12 V zener alone across a 12 V ±10 % coil breaks down in the on state (derived: 12 V < 13.2 V)")
    void zenerBelowSupplyConducts() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN).updatePart("D1",
                p -> new Part("D1", PartKind.ZENER, java.util.Map.of("breakdownVolts", 12.0), java.util.Map.of(),
                        p.placement()));
        assertEquals(Set.of("topology.suppressor-conducts"), problemKeys(stage));
        Stage higher = stage.updatePart("D1", p -> p.with("breakdownVolts", 15));
        assertEquals(Set.of(), problemKeys(higher));
    }

    @Test
    @DisplayName("a 12 V TVS across a 12 V ±10 % coil conducts when on; the template's 24 V one does not")
    void lowTvsConducts() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN, Suppressor.TVS, HighSideDrive.LEVEL_SHIFT)
                .updatePart("D1", p -> p.with("breakdownVolts", 12));
        assertEquals(Set.of("topology.suppressor-conducts"), problemKeys(stage));
    }

    @Test
    @DisplayName("a direct-driven high side with a pin above the supply's maximum can turn off")
    void directHighSideFromHighPinIsFine() {
        Stage stage = Fixtures.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE, HighSideDrive.DIRECT)
                .updatePart("U1", p -> p.with("highVolts", 13.5));
        assertEquals(Set.of(), problemKeys(stage));
        Stage lower = stage.updatePart("U1", p -> p.with("highVolts", 12.6));
        RoleIssue i = issue(lower, "topology.high-side-cannot-turn-off").orElseThrow();
        assertEquals(List.of("Q1", "U1", "R1"), i.refs());
    }

    @Test
    @DisplayName("no coil supply: an error naming the relay")
    void coilSupplyMissing() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN).withoutPart("V1");
        RoleIssue i = issue(stage, "topology.coil-supply-missing").orElseThrow();
        assertEquals("K1", i.finding().ref());
        assertEquals(Severity.ERROR, i.finding().severity());
        Stage high = Fixtures.build(StageTemplate.HIGH_SIDE_PNP).withoutPart("V1");
        assertEquals("Q1", issue(high, "topology.coil-supply-missing").orElseThrow().finding().ref());
    }

    @Test
    @DisplayName("no contact-side supply: the contact side is unpowered, naming K1 and the load")
    void contactSideUnpowered() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN).withoutPart("V2");
        RoleIssue i = issue(stage, "topology.contact-side-unpowered").orElseThrow();
        assertEquals(List.of("K1", "E1"), i.refs());
        assertTrue(TopologyCheck.recognise(stage).orElseThrow().contactSupplyRefs().isEmpty());
    }

    @Test
    @DisplayName("contacts with nothing wired: only an INFO")
    void contactsUnused() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN).withoutPart("V2").withoutPart("E1");
        assertTrue(TopologyCheck.check(stage).stream()
                .anyMatch(f -> f.key().equals("topology.contacts-unused") && f.severity() == Severity.INFO));
        assertEquals(Set.of(), problemKeys(stage));
    }

    @Test
    @DisplayName("no relay, or no switch on the coil: not a recognised driver stage")
    void notRecognised() {
        Stage noRelay = Fixtures.build(StageTemplate.LOW_SIDE_NPN).withoutPart("K1");
        assertEquals(Set.of("topology.not-recognised"), problemKeys(noRelay));
        assertTrue(TopologyCheck.recognise(noRelay).isEmpty());
        Stage noSwitch = Fixtures.build(StageTemplate.LOW_SIDE_NPN).withoutPart("Q1");
        assertEquals(Set.of("topology.not-recognised"), problemKeys(noSwitch));
        assertEquals("K1", issue(noSwitch, "topology.not-recognised").orElseThrow().finding().ref());
    }

    @Test
    @DisplayName("no base resistor: the pin drives the base junction directly")
    void noBaseResistor() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN).withoutPart("R1").withWire(org.armature.model.Wire.of(10, 12, 14, 12));
        assertTrue(problemKeys(stage).contains("topology.no-base-resistor"), () -> problemKeys(stage).toString());
        assertEquals(List.of("Q1", "U1"), issue(stage, "topology.no-base-resistor").orElseThrow().refs());
    }

    @Test
    @DisplayName("no drive pin: a warning on the switch")
    void noDrivePin() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NMOS).withoutPart("U1");
        assertEquals("Q1", issue(stage, "topology.no-drive-pin").orElseThrow().finding().ref());
    }

    @Test
    @DisplayName("Darlington common pin on ground holds the relay on: miswired")
    void darlingtonCommonOnGround() {
        Stage base = Fixtures.build(StageTemplate.DARLINGTON_CHANNEL, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        List<org.armature.model.Wire> wires = new ArrayList<>(base.wires());
        wires.remove(org.armature.model.Wire.of(22, 10, 22, 2));
        wires.remove(org.armature.model.Wire.of(22, 2, 20, 2));
        wires.add(org.armature.model.Wire.of(22, 10, 22, 18));
        wires.add(org.armature.model.Wire.of(22, 18, 20, 18));
        Stage stage = base.withWires(wires);
        assertEquals(Set.of("topology.clamp-common-miswired"), problemKeys(stage));
    }

    static Stream<Arguments> randomEdits() {
        Random rnd = new Random(20_240_611L);
        List<Arguments> out = new ArrayList<>();
        for (int i = 0; i < 60; i++) {
            StageTemplate t = StageTemplate.values()[rnd.nextInt(StageTemplate.values().length)];
            Suppressor s = Suppressor.values()[rnd.nextInt(Suppressor.values().length)];
            HighSideDrive d = HighSideDrive.values()[rnd.nextInt(2)];
            Stage stage = Fixtures.build(t, s, d);
            int edits = 1 + rnd.nextInt(3);
            for (int e = 0; e < edits; e++) {
                Part p = stage.parts().get(rnd.nextInt(stage.parts().size()));
                stage = switch (rnd.nextInt(3)) {
                    case 0 -> stage.withoutPart(p.ref());
                    case 1 -> stage.updatePart(p.ref(), q -> q.withPlacement(q.placement().rotated(90 * rnd.nextInt(4))));
                    default -> stage.withoutWire(stage.wires().get(rnd.nextInt(stage.wires().size())));
                };
            }
            out.add(Arguments.of(i, stage));
        }
        return out.stream();
    }

    @ParameterizedTest
    @MethodSource("randomEdits")
    @DisplayName("random edits of templates: never throws; every part named exists; recognised xor not")
    void neverThrowsOnEdits(int index, Stage stage) {
        TopologyReport report = TopologyCheck.analyse(stage);
        Set<String> refs = stage.parts().stream().map(Part::ref).collect(Collectors.toSet());
        for (RoleIssue i : report.issues()) {
            assertTrue(refs.containsAll(i.refs()), () -> index + ": " + i);
            assertEquals(i.refs().isEmpty() ? "" : i.refs().get(0), i.finding().ref());
        }
        boolean recognisedInfo = report.findings().stream().anyMatch(f -> f.key().equals("topology.recognised"));
        assertEquals(report.roles().isPresent(), recognisedInfo);
    }

    @Test
    @DisplayName("a reversed coil rail (new low-side-npn --supply -24 was accepted before) is a plain-words finding: it forward-biases the freewheeling diode")
    void reversedCoilSupply() {
        // issue 10 reproducer: the solve then printed "Converged" with a negative forced beta
        Stage s = Templates.defaultStage();
        Stage reversed = s.withPart(s.require("V1").with("volts", -24));
        RoleIssue i = issue(reversed, "topology.coil-supply-reversed").orElseThrow();
        assertEquals(Severity.ERROR, i.finding().severity());
        assertTrue(i.finding().message().contains("forward-biases the freewheeling diode"), i.finding().message());
        assertTrue(!problemKeys(s).contains("topology.coil-supply-reversed"), "the positive rail raises nothing");
    }
}
