package org.armature.model;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The one place where a stage's roles are found: which part is the drive pin, the base or gate
 * network, the switch, the coil, the suppressor, the coil supply and the contact side, from
 * connectivity alone (never from designators, placement or test point names), and the readable
 * names of the nets those roles explain. Readouts, the DC and transient engines, the checks, sizing
 * and the command line all read it.
 *
 * <p>Immutable, and a function of the stage's structure only (parts' kinds, designators and pins,
 * wires, test points; never values), so a caller may keep one per stage version, or per structure.
 * Finding it costs about as much as finding the nets.
 *
 * <p>Recognition: the relay whose coil a transistor switches is found; a switch is a part of
 * {@link PartKind#isSwitch() switch kind} whose collector / drain / output sits on one coil net with
 * its emitter or source on ground (low side), or a PNP whose collector sits on a coil net whose
 * other end is grounded (high side). A high-side PNP is "level-shifted" when its base reaches the
 * collector of a grounded-emitter NPN (through a resistor or directly), and "direct" when its base
 * reaches a logic pin. Suppressors are the parts across the coil (one part, or two in series through
 * a net that nothing else touches), a Darlington channel's common pin returned to the coil supply
 * (directly or through one part), or a zener / TVS across a low-side switch.
 *
 * <p>Net names: a test point's name stays as the user gave it; every other net a role explains is
 * named after it: {@code pin} (the drive pin's output), {@code control} (the switch's base, gate or
 * input), {@code switch} (its terminal on the coil), {@code supply} (the coil supply), then
 * {@code shift-base}, {@code shift-collector}, {@code coil-high}, {@code coil-low},
 * {@code suppressor-mid}, {@code clamp-common}, {@code contact-common}, {@code contact-no},
 * {@code contact-nc}, {@code contact-supply}, {@code load-return}; a net no role explains is named
 * after one of its pins ({@code R5-b}). The four first names are those the templates' test points
 * use, so a stage drawn part by part reads like the template. A name already taken gets a number
 * ({@code switch-2}).
 *
 * <p>Finding keys (structural; the checks that need values, such as a suppressor's polarity against
 * the supply, live in the analysis layer):
 * <table>
 * <caption>role finding keys</caption>
 * <tr><th>key</th><th>severity</th><th>meaning</th></tr>
 * <tr><td>{@code topology.recognised}</td><td>INFO</td><td>which stage was drawn, and the roles</td></tr>
 * <tr><td>{@code topology.not-recognised}</td><td>WARNING</td><td>no relay, or no transistor switches its coil</td></tr>
 * <tr><td>{@code topology.switch-ambiguous}</td><td>WARNING</td><td>more than one part could be the switch</td></tr>
 * <tr><td>{@code topology.relay-ambiguous}</td><td>WARNING</td><td>more than one relay has a switch</td></tr>
 * <tr><td>{@code topology.coil-shorted}</td><td>ERROR</td><td>both coil terminals on one net</td></tr>
 * <tr><td>{@code topology.coil-supply-missing}</td><td>ERROR</td><td>no supply rail feeds the coil (or the PNP emitter)</td></tr>
 * <tr><td>{@code topology.no-drive-pin}</td><td>WARNING</td><td>no logic pin drives the input</td></tr>
 * <tr><td>{@code topology.no-base-resistor}</td><td>WARNING</td><td>a base driven with nothing to limit its current</td></tr>
 * <tr><td>{@code topology.floating-control}</td><td>WARNING</td><td>base or gate without pull-down (PNP: pull-up)</td></tr>
 * <tr><td>{@code topology.suppressor-missing}</td><td>WARNING</td><td>nothing limits the turn-off voltage</td></tr>
 * <tr><td>{@code topology.clamp-common-miswired}</td><td>ERROR</td><td>a Darlington channel's common pin on ground or on its own output</td></tr>
 * <tr><td>{@code topology.contacts-unused}</td><td>INFO</td><td>nothing is wired to the relay contacts</td></tr>
 * <tr><td>{@code topology.contact-side-unpowered}</td><td>WARNING</td><td>contacts wired, but no supply reaches the contact circuit</td></tr>
 * </table>
 *
 * @param connectivity the nets, with the names described above
 * @param roles what each part does; empty when the stage is not a recognised driver stage
 * @param issues the findings, each with the parts it concerns, in a stable order
 * @param netDescriptions every net's name to plain words saying what it is ("coil low side at Q1's
 *     collector"), for the command line, the part sheet and the fault hunt
 */
public record StageRecognition(Connectivity connectivity, Optional<StageRoles> roles, List<RoleIssue> issues,
                               Map<String, String> netDescriptions) {

    /** Kinds that make up a two-terminal suppressor chain. */
    private static final Set<PartKind> CHAIN_KINDS = Set.of(PartKind.DIODE, PartKind.ZENER, PartKind.TVS,
            PartKind.RESISTOR, PartKind.CAPACITOR);

    /** Two-terminal kinds a contact circuit is traced through. */
    private static final Set<PartKind> CONTACT_PATH_KINDS = Set.of(PartKind.LOAD, PartKind.RESISTOR, PartKind.LED,
            PartKind.DIODE, PartKind.CAPACITOR);

    public StageRecognition {
        issues = List.copyOf(issues);
        netDescriptions = Collections.unmodifiableMap(new LinkedHashMap<>(netDescriptions));
    }

    /** The drawing recognised last, with its recognition (an immutable pair, swapped whole). */
    private record Memo(Stage stage, StageRecognition recognition) {
    }

    /**
     * The last drawing's recognition. The validator, the topology check, the engines, the readouts
     * and the renderer each ask about the stage on the screen, on the FX, solver and analysis
     * threads; the answer depends on the drawing only (parts' designators, kinds and placements,
     * wires, test points), so it is found once per drawing and a value edit finds none anew. One
     * entry, replaced whole through a volatile reference: thread-safe without locks, and it keeps at
     * most one stage alive.
     */
    private static volatile Memo last;

    /**
     * How many recognitions each thread computed (memo misses); read by tests and benchmarks only.
     * Per thread, so a test that runs its pipeline on its own thread is not disturbed by others.
     */
    private static final ThreadLocal<long[]> COMPUTED = ThreadLocal.withInitial(() -> new long[1]);

    /**
     * Recognises a stage, once per drawing: a stage that differs from the last one asked about only
     * in values, options and conditions gets the same (immutable) recognition.
     *
     * @param stage the stage as drawn; not modified
     * @return its roles, findings and named nets; never throws for a stage the editor can hold
     */
    public static StageRecognition of(Stage stage) {
        Memo m = last;
        if (m != null && (m.stage == stage || Connectivity.sameDrawing(m.stage, stage))) {
            return m.recognition;
        }
        StageRecognition r = recognise(stage);
        last = new Memo(stage, r);
        return r;
    }

    /**
     * The number of recognitions the calling thread has computed so far (calls of {@link #of} the
     * memo did not answer). A diagnostic, so tests and benchmarks can show that a value edit finds
     * no roles anew.
     */
    public static long computedOnThisThread() {
        return COMPUTED.get()[0];
    }

    /** Recognises a stage without the memo. */
    static StageRecognition recognise(Stage stage) {
        COMPUTED.get()[0]++;
        Connectivity drawn = Connectivity.drawn(stage);
        Finder f = new Finder(stage, drawn);
        Optional<StageRoles> roles = f.run();
        Map<String, String> rename = new HashMap<>();
        Map<String, String> descriptions = new LinkedHashMap<>();
        f.name(roles, rename, descriptions);
        Connectivity named = drawn.renamed(rename);
        return new StageRecognition(named, roles.map(r -> r.renamed(rename)), f.issues, descriptions);
    }

    /** The findings alone. */
    public List<Finding> findings() {
        return issues.stream().map(RoleIssue::finding).toList();
    }

    /** Plain words for a net, or the name itself for a net this stage does not have. */
    public String describe(String net) {
        return netDescriptions.getOrDefault(net, net);
    }

    /** One run over one stage. */
    private static final class Finder {
        private final Stage stage;
        private final Connectivity c;
        private final List<RoleIssue> issues = new ArrayList<>();
        private final Map<String, List<PinOn>> onNet = new HashMap<>();

        Finder(Stage stage, Connectivity c) {
            this.stage = stage;
            this.c = c;
            for (Part p : stage.parts()) {
                for (PinSpec pin : p.kind().pins()) {
                    onNet.computeIfAbsent(c.net(p.ref(), pin.name()), k -> new ArrayList<>()).add(new PinOn(p, pin.name()));
                }
            }
        }

        Optional<StageRoles> run() {
            List<Part> relays = stage.parts().stream().filter(p -> p.kind() == PartKind.RELAY).toList();
            if (relays.isEmpty()) {
                add(Severity.WARNING, "topology.not-recognised", "",
                        "There is no relay in the stage: not a recognised driver stage.", List.of());
                return Optional.empty();
            }
            List<Recognised> found = new ArrayList<>();
            Part shorted = null;
            for (Part k : relays) {
                String a1 = c.net(k.ref(), "a1");
                String a2 = c.net(k.ref(), "a2");
                if (a1.equals(a2)) {
                    shorted = shorted == null ? k : shorted;
                    continue;
                }
                found.addAll(switchesOf(k, a1, a2));
            }
            if (found.isEmpty()) {
                if (shorted != null) {
                    add(Severity.ERROR, "topology.coil-shorted", "a1",
                            shorted.ref() + "'s coil terminals are wired together: the coil is shorted and can never"
                                    + " operate.", List.of(shorted.ref()));
                } else {
                    Part k = relays.get(0);
                    add(Severity.WARNING, "topology.not-recognised", "",
                            "No transistor switches " + k.ref() + "'s coil to ground or from the supply: not a"
                                    + " recognised driver stage (low-side NPN, low-side N-MOSFET, Darlington channel or"
                                    + " high-side PNP).", List.of(k.ref()));
                }
                return Optional.empty();
            }
            Recognised r = found.get(0);
            List<String> sameRelay = found.stream().filter(x -> x.relay == r.relay).map(x -> x.sw.ref()).toList();
            if (sameRelay.size() > 1) {
                add(Severity.WARNING, "topology.switch-ambiguous", "",
                        "The switch is ambiguous: " + String.join(" and ", sameRelay) + " each switch " + r.relay.ref()
                                + "'s coil. " + r.sw.ref() + " is taken as the switch (the first drawn); remove or"
                                + " rewire the others to make the stage clear.", sameRelay);
            }
            List<String> otherRelays = found.stream().map(x -> x.relay.ref()).distinct().toList();
            if (otherRelays.size() > 1) {
                add(Severity.WARNING, "topology.relay-ambiguous", "",
                        "The coil is ambiguous: " + String.join(" and ", otherRelays) + " each have a switch. "
                                + r.relay.ref() + " is taken as the coil (the first drawn); a stage drives one relay.",
                        otherRelays);
            }
            Part k = r.relay;
            Optional<Part> coilSupply = coilSupply(k, r);
            Drive drive = drive(r);
            Suppressors supp = suppressors(k, r);
            ContactSide contacts = contactSide(k);
            StageRoles roles = new StageRoles(r.topology, r.highSide, k.ref(), r.sw.ref(), drive.levelShift,
                    drive.pin, drive.inputResistor, drive.inputPull, drive.switchPullUp, drive.switchBaseResistor,
                    coilSupply.map(Part::ref), List.copyOf(supp.refs), supp.kind(), supp.chains, supp.switchClamps,
                    contacts.supplies, contacts.loads, r.coilHigh, r.coilLow, drive.controlNet,
                    r.topology.isLowSide() ? r.coilLow : r.coilHigh, pinNet(r.sw, controlPin(r.sw.kind())),
                    drive.pinNet);
            issues.add(0, new RoleIssue(new Finding(Severity.INFO, "topology.recognised", r.sw.ref(), "",
                    describe(roles)), List.of(r.sw.ref(), k.ref())));
            return Optional.of(roles);
        }

        private void add(Severity severity, String key, String field, String message, List<String> refs) {
            String ref = refs.isEmpty() ? "" : refs.get(0);
            issues.add(new RoleIssue(new Finding(severity, key, ref, field, message), refs));
        }

        // ------------------------------------------------------------------ recognition

        private List<Recognised> switchesOf(Part k, String a1, String a2) {
            List<Recognised> out = new ArrayList<>();
            for (Part p : stage.parts()) {
                switch (p.kind()) {
                    case NPN, NMOS, DARLINGTON -> {
                        String out1 = pinNet(p, p.kind() == PartKind.NPN ? "c" : p.kind() == PartKind.NMOS ? "d" : "out");
                        String ref = pinNet(p, p.kind() == PartKind.NMOS ? "s" : "e");
                        if (ref.equals(Connectivity.GROUND) && (out1.equals(a1) || out1.equals(a2))) {
                            DriverTopology t = p.kind() == PartKind.NPN ? DriverTopology.LOW_SIDE_NPN
                                    : p.kind() == PartKind.NMOS ? DriverTopology.LOW_SIDE_NMOS
                                    : DriverTopology.DARLINGTON_CHANNEL;
                            out.add(new Recognised(t, k, p, out1.equals(a1) ? a2 : a1, out1));
                        }
                    }
                    case PNP -> {
                        String col = pinNet(p, "c");
                        String other = col.equals(a1) ? a2 : col.equals(a2) ? a1 : "";
                        if (other.equals(Connectivity.GROUND)) {
                            out.add(new Recognised(DriverTopology.HIGH_SIDE_PNP, k, p, col, other));
                        }
                    }
                    default -> { }
                }
            }
            return out;
        }

        private Optional<Part> coilSupply(Part k, Recognised r) {
            String feed = r.topology.isLowSide() ? r.coilHigh : pinNet(r.sw, "e");
            Optional<Part> supply = partsOn(feed).stream().map(PinOn::part)
                    .filter(p -> p.kind() == PartKind.SUPPLY).findFirst();
            if (supply.isEmpty()) {
                String who = r.topology.isLowSide() ? k.ref() + "'s coil" : r.sw.ref() + "'s emitter";
                add(Severity.ERROR, "topology.coil-supply-missing", r.topology.isLowSide() ? "" : "e",
                        "No supply rail feeds " + who + ": the coil can never be energised. Connect the coil supply"
                                + (r.topology.isLowSide() ? " to the coil's free end." : " to the PNP's emitter."),
                        r.topology.isLowSide() ? List.of(k.ref()) : List.of(r.sw.ref(), k.ref()));
            }
            return supply;
        }

        // ------------------------------------------------------------------ drive network

        private Drive drive(Recognised r) {
            Drive d = new Drive();
            if (r.topology.isLowSide()) {
                lowSideDrive(r.sw, d);
                return d;
            }
            Part pnp = r.sw;
            String base = pinNet(pnp, "b");
            String emitter = pinNet(pnp, "e");
            d.controlNet = base;
            Optional<Part> pullUp = resistorBetween(base, emitter);
            // level shift: base -> (resistor) -> collector of a grounded-emitter NPN
            for (PinOn on : partsOn(base)) {
                Part p = on.part();
                if (isGroundedNpnCollector(on)) {
                    d.levelShift = Optional.of(p.ref());
                } else if (p.kind() == PartKind.RESISTOR && !pullUp.map(u -> u.ref().equals(p.ref())).orElse(false)) {
                    String far = otherNet(p, on.pin());
                    for (PinOn f : partsOn(far)) {
                        if (isGroundedNpnCollector(f)) {
                            d.levelShift = Optional.of(f.part().ref());
                            d.switchBaseResistor = Optional.of(p.ref());
                        }
                    }
                }
            }
            if (d.levelShift.isPresent()) {
                r.highSide = Optional.of(HighSideDrive.LEVEL_SHIFT);
                d.switchPullUp = pullUp.map(Part::ref);
                if (d.switchBaseResistor.isEmpty()) {
                    add(Severity.WARNING, "topology.no-base-resistor", "b",
                            d.levelShift.get() + "'s collector drives " + pnp.ref() + "'s base directly: nothing limits"
                                    + " the base current. Fit a resistor between them.",
                            List.of(pnp.ref(), d.levelShift.get()));
                }
                if (pullUp.isEmpty()) {
                    add(Severity.WARNING, "topology.floating-control", "b",
                            pnp.ref() + "'s base has no pull-up to its emitter: while " + d.levelShift.get()
                                    + " is off the base floats and leakage can turn " + pnp.ref() + " partly on. Fit a"
                                    + " resistor from base to emitter (typical 10 kΩ).",
                            List.of(pnp.ref()));
                }
                Part shift = stage.require(d.levelShift.get());
                Drive inner = new Drive();
                lowSideDrive(shift, inner);
                d.pin = inner.pin;
                d.pinNet = inner.pinNet;
                d.inputResistor = inner.inputResistor;
                d.inputPull = inner.inputPull;
                d.controlNet = inner.controlNet;
                return d;
            }
            // direct drive: base -> (resistor) -> pin
            Optional<Part> pin = drivePinOn(base);
            Optional<Part> series = Optional.empty();
            String pinSide = base;
            if (pin.isEmpty()) {
                for (PinOn on : partsOn(base)) {
                    Part p = on.part();
                    if (p.kind() == PartKind.RESISTOR && !pullUp.map(u -> u.ref().equals(p.ref())).orElse(false)) {
                        String farNet = otherNet(p, on.pin());
                        Optional<Part> far = drivePinOn(farNet);
                        if (far.isPresent()) {
                            pin = far;
                            series = Optional.of(p);
                            pinSide = farNet;
                            break;
                        }
                    }
                }
            }
            if (pin.isEmpty()) {
                add(Severity.WARNING, "topology.no-drive-pin", "b",
                        "No logic pin drives " + pnp.ref() + "'s base, directly, through a resistor or through a"
                                + " level-shift NPN.", List.of(pnp.ref()));
                d.inputPull = pullUp.map(Part::ref);
                return d;
            }
            r.highSide = Optional.of(HighSideDrive.DIRECT);
            d.pin = pin.map(Part::ref);
            d.pinNet = Optional.of(pinSide);
            d.inputResistor = series.map(Part::ref);
            d.inputPull = pullUp.map(Part::ref);
            if (series.isEmpty()) {
                add(Severity.WARNING, "topology.no-base-resistor", "b",
                        pin.get().ref() + " drives " + pnp.ref() + "'s base directly: only the pin's output resistance"
                                + " limits the base current. Fit a base resistor.",
                        List.of(pnp.ref(), pin.get().ref()));
            }
            if (pullUp.isEmpty()) {
                add(Severity.WARNING, "topology.floating-control", "b",
                        pnp.ref() + "'s base has no pull-up to its emitter: while the pin is not driving it floats."
                                + " Fit a resistor from base to emitter (typical 10 kΩ).", List.of(pnp.ref()));
            }
            return d;
        }

        /** Drive of a transistor whose emitter or source is grounded (or a Darlington input). */
        private void lowSideDrive(Part input, Drive d) {
            String controlPin = controlPin(input.kind());
            String control = pinNet(input, controlPin);
            d.controlNet = control;
            Optional<Part> pin = drivePinOn(control);
            Optional<Part> series = Optional.empty();
            String pinNet = control;
            if (pin.isEmpty()) {
                for (PinOn on : partsOn(control)) {
                    Part p = on.part();
                    if (p.kind() == PartKind.RESISTOR) {
                        String far = otherNet(p, on.pin());
                        Optional<Part> f = drivePinOn(far);
                        if (f.isPresent()) {
                            pin = f;
                            series = Optional.of(p);
                            pinNet = far;
                            break;
                        }
                    }
                }
            }
            d.pin = pin.map(Part::ref);
            d.pinNet = pin.isPresent() ? Optional.of(pinNet) : Optional.empty();
            d.inputResistor = series.map(Part::ref);
            String word = input.kind() == PartKind.NMOS ? "gate" : input.kind() == PartKind.DARLINGTON ? "input" : "base";
            if (pin.isEmpty()) {
                add(Severity.WARNING, "topology.no-drive-pin", controlPin,
                        "No logic pin drives " + input.ref() + "'s " + word + ", directly or through a resistor.",
                        List.of(input.ref()));
            } else if (series.isEmpty() && input.kind() == PartKind.NPN) {
                add(Severity.WARNING, "topology.no-base-resistor", controlPin,
                        pin.get().ref() + " drives " + input.ref() + "'s base directly: only the pin's output resistance"
                                + " limits the base current. Fit a base resistor.",
                        List.of(input.ref(), pin.get().ref()));
            }
            if (input.kind() == PartKind.DARLINGTON) {
                return; // the channel's own base-emitter resistors hold it off
            }
            Optional<Part> pull = resistorBetween(control, Connectivity.GROUND);
            if (pull.isEmpty() && series.isPresent()) {
                pull = resistorBetween(pinNet, Connectivity.GROUND);
            }
            d.inputPull = pull.map(Part::ref);
            if (pull.isEmpty()) {
                String why = input.kind() == PartKind.NMOS
                        ? "the gate floats and keeps whatever charge it last had, so " + input.ref()
                                + " may stay on or sit half on. Fit a resistor from gate to source (typical 100 kΩ)."
                        : "the base floats and leakage can turn " + input.ref()
                                + " partly on. Fit a resistor from base to emitter (typical 10 kΩ … 100 kΩ).";
                add(Severity.WARNING, "topology.floating-control", controlPin,
                        input.ref() + "'s " + word + " has no pull-down: while the pin is not driving (reset, high"
                                + " impedance, unplugged) " + why, List.of(input.ref()));
            }
        }

        private boolean isGroundedNpnCollector(PinOn on) {
            return on.part().kind() == PartKind.NPN && on.pin().equals("c")
                    && pinNet(on.part(), "e").equals(Connectivity.GROUND);
        }

        private Optional<Part> drivePinOn(String net) {
            return partsOn(net).stream().map(PinOn::part).filter(p -> p.kind() == PartKind.DRIVE_PIN).findFirst();
        }

        private Optional<Part> resistorBetween(String netA, String netB) {
            return stage.parts().stream().filter(p -> p.kind() == PartKind.RESISTOR)
                    .filter(p -> {
                        String a = pinNet(p, "a");
                        String b = pinNet(p, "b");
                        return (a.equals(netA) && b.equals(netB)) || (a.equals(netB) && b.equals(netA));
                    }).findFirst();
        }

        // ------------------------------------------------------------------ suppressors

        private Suppressors suppressors(Part k, Recognised r) {
            Suppressors s = new Suppressors();
            List<SuppressorKind> mechanisms = new ArrayList<>();
            // chains across the coil, oriented from the on-state high end to the low end
            for (List<StageRoles.Oriented> chain : chainsBetween(r.coilHigh, r.coilLow, Set.copyOf(List.of(k.ref(), r.sw.ref())))) {
                s.chains.add(chain);
                chain.forEach(o -> s.refs.add(o.ref()));
                mechanisms.add(chainKind(chain));
            }
            if (r.topology == DriverTopology.DARLINGTON_CHANNEL) {
                darlingtonClamp(r, s, k, mechanisms);
            }
            if (r.topology.isLowSide()) {
                // a zener or TVS across the switch also limits the turn-off voltage
                for (Part p : stage.parts()) {
                    if (p.kind() != PartKind.ZENER && p.kind() != PartKind.TVS) {
                        continue;
                    }
                    Optional<StageRoles.Oriented> o = orient(p, r.coilLow, Connectivity.GROUND);
                    if (o.isPresent()) {
                        s.refs.add(p.ref());
                        s.switchClamps.add(o.get());
                        mechanisms.add(SuppressorKind.SWITCH_CLAMP);
                    }
                }
            }
            s.mechanisms = mechanisms;
            if (mechanisms.isEmpty()) {
                add(Severity.WARNING, "topology.suppressor-missing", "",
                        "Nothing limits " + k.ref() + "'s turn-off voltage: when " + r.sw.ref() + " turns off, the coil's"
                                + " inductance drives the " + (r.topology.isLowSide() ? "switch node" : "coil's upper end")
                                + " to several hundred volts, enough to destroy a small transistor. Fit a freewheeling"
                                + " diode across the coil (cathode to the " + (r.topology.isLowSide() ? "supply end"
                                : "end on " + r.sw.ref() + "'s collector") + "), or a diode + zener or a TVS for"
                                + " faster release.", List.of(k.ref(), r.sw.ref()));
            }
            return s;
        }

        private SuppressorKind chainKind(List<StageRoles.Oriented> chain) {
            Set<PartKind> kinds = new HashSet<>();
            chain.forEach(o -> kinds.add(stage.require(o.ref()).kind()));
            if (chain.size() == 1) {
                return switch (kinds.iterator().next()) {
                    case DIODE -> SuppressorKind.DIODE;
                    case ZENER -> SuppressorKind.ZENER;
                    case TVS -> SuppressorKind.TVS;
                    case RESISTOR -> SuppressorKind.RESISTOR;
                    default -> SuppressorKind.COMBINED;
                };
            }
            if (kinds.equals(Set.of(PartKind.DIODE, PartKind.ZENER))) {
                return SuppressorKind.DIODE_ZENER;
            }
            if (kinds.equals(Set.of(PartKind.RESISTOR, PartKind.CAPACITOR))) {
                return SuppressorKind.RC;
            }
            return SuppressorKind.COMBINED;
        }

        private void darlingtonClamp(Recognised r, Suppressors s, Part k, List<SuppressorKind> mechanisms) {
            String com = pinNet(r.sw, "com");
            if (com.equals(Connectivity.GROUND) || com.equals(r.coilLow)) {
                add(Severity.ERROR, "topology.clamp-common-miswired", "com",
                        r.sw.ref() + "'s clamp common pin is on " + (com.equals(Connectivity.GROUND) ? "ground" : "its own output")
                                + ": its clamp diode " + (com.equals(Connectivity.GROUND)
                                ? "conducts from the output to ground and holds " + k.ref() + " energised."
                                : "is shorted and does nothing.")
                                + " Return the common pin to the coil supply.", List.of(r.sw.ref(), k.ref()));
                if (com.equals(Connectivity.GROUND)) {
                    // it does conduct at turn-off, so the stage is not unsuppressed; say only the wiring is wrong
                    mechanisms.add(SuppressorKind.CHANNEL_CLAMP);
                }
                return;
            }
            if (com.equals(r.coilHigh)) {
                s.refs.add(r.sw.ref());
                mechanisms.add(SuppressorKind.CHANNEL_CLAMP);
                return;
            }
            // one part between the common pin and the coil supply end (a zener for faster release)
            for (List<StageRoles.Oriented> chain : chainsBetween(r.coilHigh, com, Set.copyOf(List.of(k.ref(), r.sw.ref())))) {
                if (chain.size() != 1) {
                    continue;
                }
                s.refs.add(r.sw.ref());
                s.refs.add(chain.get(0).ref());
                mechanisms.add(SuppressorKind.CHANNEL_CLAMP_IN_SERIES);
                return;
            }
        }

        /** Chains of one or two suppressor parts from net {@code from} to net {@code to}. */
        private List<List<StageRoles.Oriented>> chainsBetween(String from, String to, Set<String> exclude) {
            List<List<StageRoles.Oriented>> out = new ArrayList<>();
            for (Part p : stage.parts()) {
                if (!CHAIN_KINDS.contains(p.kind()) || exclude.contains(p.ref())) {
                    continue;
                }
                Optional<StageRoles.Oriented> direct = orient(p, from, to);
                if (direct.isPresent()) {
                    out.add(List.of(direct.get()));
                    continue;
                }
                for (PinSpec pinSpec : p.kind().pins()) {
                    String pinName = pinSpec.name();
                    if (!pinNet(p, pinName).equals(from)) {
                        continue;
                    }
                    String mid = otherNet(p, pinName);
                    List<PinOn> onMid = partsOn(mid);
                    if (mid.equals(to) || mid.equals(Connectivity.GROUND) || onMid.size() != 2) {
                        continue;
                    }
                    for (PinOn second : onMid) {
                        Part q = second.part();
                        if (q.ref().equals(p.ref()) || !CHAIN_KINDS.contains(q.kind()) || exclude.contains(q.ref())) {
                            continue;
                        }
                        if (otherNet(q, second.pin()).equals(to)) {
                            out.add(List.of(orient(p, from, mid).orElseThrow(), orient(q, mid, to).orElseThrow()));
                        }
                    }
                }
            }
            return out;
        }

        /** The part oriented from net {@code from} to net {@code to}, if it sits between them. */
        private Optional<StageRoles.Oriented> orient(Part p, String from, String to) {
            List<PinSpec> pins = p.kind().pins();
            if (pins.size() != 2) {
                return Optional.empty();
            }
            String n0 = pinNet(p, pins.get(0).name());
            String n1 = pinNet(p, pins.get(1).name());
            if (n0.equals(from) && n1.equals(to)) {
                return Optional.of(new StageRoles.Oriented(p.ref(), pins.get(0).name()));
            }
            if (n1.equals(from) && n0.equals(to)) {
                return Optional.of(new StageRoles.Oriented(p.ref(), pins.get(1).name()));
            }
            return Optional.empty();
        }

        // ------------------------------------------------------------------ contact side

        private ContactSide contactSide(Part k) {
            ContactSide side = new ContactSide();
            List<String> starts = List.of(c.net(k.ref(), "com"), c.net(k.ref(), "no"), c.net(k.ref(), "nc"));
            boolean wired = starts.stream().anyMatch(n -> partsOn(n).size() > 1 || n.equals(Connectivity.GROUND));
            if (!wired) {
                add(Severity.INFO, "topology.contacts-unused", "com",
                        "Nothing is wired to " + k.ref() + "'s contacts.", List.of(k.ref()));
                return side;
            }
            Set<String> supplies = new LinkedHashSet<>();
            Set<String> loads = new LinkedHashSet<>();
            Set<String> visited = new HashSet<>();
            Deque<String> queue = new ArrayDeque<>(starts);
            while (!queue.isEmpty()) {
                String net = queue.poll();
                if (!visited.add(net) || net.equals(Connectivity.GROUND)) {
                    continue;
                }
                boolean source = false;
                for (PinOn on : partsOn(net)) {
                    Part p = on.part();
                    if (p.kind() == PartKind.SUPPLY) {
                        supplies.add(p.ref());
                        source = true;
                    }
                }
                if (source) {
                    continue;
                }
                for (PinOn on : partsOn(net)) {
                    Part p = on.part();
                    if (CONTACT_PATH_KINDS.contains(p.kind())) {
                        if (p.kind() == PartKind.LOAD) {
                            loads.add(p.ref());
                        }
                        queue.add(otherNet(p, on.pin()));
                    }
                }
            }
            if (supplies.isEmpty()) {
                List<String> refs = new ArrayList<>(List.of(k.ref()));
                refs.addAll(loads);
                add(Severity.WARNING, "topology.contact-side-unpowered", "com",
                        k.ref() + "'s contacts " + (loads.isEmpty() ? "are wired" : "switch " + String.join(", ", loads))
                                + ", but no supply reaches the contact circuit: the load can never be powered."
                                + " Connect a supply rail to the contact common or through the load.", refs);
            }
            side.supplies = List.copyOf(supplies);
            side.loads = List.copyOf(loads);
            return side;
        }

        // ------------------------------------------------------------------ net names

        /**
         * Names every net the drawing left unnamed (see the class comment) and describes every net.
         *
         * @param roles the roles as found, with the drawn net names
         * @param rename filled with drawn name to readable name
         * @param descriptions filled with readable name to plain words, for every net
         */
        void name(Optional<StageRoles> roles, Map<String, String> rename, Map<String, String> descriptions) {
            Set<String> userNamed = new HashSet<>();
            userNamed.add(Connectivity.GROUND);
            for (TestPoint tp : stage.testPoints()) {
                if (!c.nameConflicts().contains(tp)) {
                    userNamed.add(tp.net());
                }
            }
            Set<String> taken = new HashSet<>(userNamed);
            Map<String, String> words = new LinkedHashMap<>();
            roles.ifPresent(r -> roleNames(r, words));
            // role names first (in the order above), then a pin's name for what no role explains
            Map<String, String> proposed = new LinkedHashMap<>();
            words.forEach((net, w) -> {
                if (!userNamed.contains(net)) {
                    proposed.putIfAbsent(net, w.substring(0, w.indexOf('|')));
                }
            });
            for (String net : c.nets()) {
                if (!userNamed.contains(net) && !proposed.containsKey(net)) {
                    List<PinOn> on = partsOn(net);
                    proposed.put(net, on.isEmpty() ? net : on.stream()
                            .map(p -> p.part().ref() + "-" + p.pin()).sorted().findFirst().orElseThrow());
                }
            }
            proposed.forEach((net, base) -> {
                String name = base;
                for (int i = 2; taken.contains(name); i++) {
                    name = base + "-" + i;
                }
                taken.add(name);
                rename.put(net, name);
            });
            for (String net : c.nets()) {
                String name = rename.getOrDefault(net, net);
                String w = words.get(net);
                String pins = String.join(", ", partsOn(net).stream().map(p -> p.part().ref() + "." + p.pin())
                        .sorted().toList());
                String what = net.equals(Connectivity.GROUND) ? "ground"
                        : w != null ? w.substring(w.indexOf('|') + 1)
                        : userNamed.contains(net) ? "test point" : "net";
                descriptions.put(name, pins.isEmpty() ? what : what + " (" + pins + ")");
            }
        }

        /** The nets the roles explain, drawn name to "name|plain words", most telling first. */
        private void roleNames(StageRoles r, Map<String, String> words) {
            Part sw = stage.require(r.switchRef());
            String term = switch (sw.kind()) {
                case NMOS -> "drain";
                case DARLINGTON -> "output";
                default -> "collector";
            };
            String control = switch (sw.kind()) {
                case NMOS -> "gate";
                case DARLINGTON -> "input";
                default -> "base";
            };
            r.pinNet().ifPresent(n -> words.putIfAbsent(n, "pin|drive pin output of " + r.drivePinRef().orElse("the pin")));
            words.putIfAbsent(r.switchControlNet(), "control|" + sw.ref() + "'s " + control);
            words.putIfAbsent(r.switchNet(), "switch|coil " + (r.topology().isLowSide() ? "low" : "high") + " side at "
                    + sw.ref() + "'s " + term);
            r.coilSupplyRef().ifPresent(v -> words.putIfAbsent(c.net(v, "p"), "supply|coil supply " + v));
            r.levelShiftRef().ifPresent(q -> {
                words.putIfAbsent(pinNet(stage.require(q), "b"), "shift-base|level shift " + q + "'s base");
                words.putIfAbsent(pinNet(stage.require(q), "c"), "shift-collector|level shift " + q + "'s collector");
            });
            words.putIfAbsent(r.coilHighNet(), "coil-high|" + r.relayRef() + "'s coil, high side");
            words.putIfAbsent(r.coilLowNet(), "coil-low|" + r.relayRef() + "'s coil, low side");
            for (List<StageRoles.Oriented> chain : r.coilChains()) {
                if (chain.size() == 2) {
                    Part first = stage.require(chain.get(0).ref());
                    words.putIfAbsent(otherNet(first, chain.get(0).fromPin()), "suppressor-mid|between "
                            + chain.get(0).ref() + " and " + chain.get(1).ref() + " of the suppressor");
                }
            }
            if (sw.kind() == PartKind.DARLINGTON) {
                words.putIfAbsent(pinNet(sw, "com"), "clamp-common|" + sw.ref() + "'s clamp common");
            }
            String k = r.relayRef();
            words.putIfAbsent(c.net(k, "com"), "contact-common|" + k + "'s contact common");
            words.putIfAbsent(c.net(k, "no"), "contact-no|" + k + "'s normally-open contact");
            words.putIfAbsent(c.net(k, "nc"), "contact-nc|" + k + "'s normally-closed contact");
            for (String v : r.contactSupplyRefs()) {
                words.putIfAbsent(c.net(v, "p"), "contact-supply|contact supply " + v);
            }
            for (String e : r.loadRefs()) {
                Part load = stage.require(e);
                for (PinSpec pin : load.kind().pins()) {
                    words.putIfAbsent(pinNet(load, pin.name()), "load-return|" + e + "'s return");
                }
            }
        }

        // ------------------------------------------------------------------ helpers

        private String pinNet(Part p, String pin) {
            return c.net(p.ref(), pin);
        }

        /** The net at a two-pin part's other pin. */
        private String otherNet(Part p, String pin) {
            for (PinSpec spec : p.kind().pins()) {
                if (!spec.name().equals(pin)) {
                    return pinNet(p, spec.name());
                }
            }
            return pinNet(p, pin);
        }

        private List<PinOn> partsOn(String net) {
            return onNet.getOrDefault(net, List.of());
        }

        private String describe(StageRoles roles) {
            StringBuilder sb = new StringBuilder(roles.topology().title());
            roles.highSideDrive().ifPresent(h -> sb.append(h == HighSideDrive.LEVEL_SHIFT ? " with level shift" : ", direct drive"));
            sb.append(" stage: ");
            sb.append(roles.drivePinRef().orElse("no pin")).append(" drives ").append(roles.inputRef());
            roles.inputResistorRef().ifPresent(r -> sb.append(" through ").append(r));
            roles.inputPullRef().ifPresent(r -> sb.append(" (").append(roles.topology() == DriverTopology.HIGH_SIDE_PNP
                    && roles.levelShiftRef().isEmpty() ? "pull-up " : "pull-down ").append(r).append(")"));
            roles.levelShiftRef().ifPresent(q -> sb.append(", which pulls ").append(roles.switchRef()).append("'s base down")
                    .append(roles.switchBaseResistorRef().map(r -> " through " + r).orElse("")));
            sb.append("; ").append(roles.switchRef()).append(roles.topology().isLowSide() ? " sinks " : " sources ")
                    .append(roles.relayRef()).append("'s coil current")
                    .append(roles.coilSupplyRef().map(v -> " from " + v).orElse(""));
            sb.append(roles.suppressorRefs().isEmpty() ? "; no suppressor." : "; suppressor "
                    + String.join(" + ", roles.suppressorRefs()) + " (" + roles.suppressorKind().words() + ").");
            return sb.toString();
        }
    }

    /** The base, gate or input pin of a switch-kind part. */
    static String controlPin(PartKind kind) {
        return switch (kind) {
            case NMOS -> "g";
            case DARLINGTON -> "in";
            default -> "b";
        };
    }

    /** A part's pin on a net. */
    private record PinOn(Part part, String pin) {
    }

    /** The switch as found, before the drive is traced. */
    private static final class Recognised {
        final DriverTopology topology;
        final Part relay;
        final Part sw;
        final String coilHigh;
        final String coilLow;
        Optional<HighSideDrive> highSide = Optional.empty();

        Recognised(DriverTopology topology, Part relay, Part sw, String coilHigh, String coilLow) {
            this.topology = topology;
            this.relay = relay;
            this.sw = sw;
            this.coilHigh = coilHigh;
            this.coilLow = coilLow;
        }
    }

    /** The drive network as traced. */
    private static final class Drive {
        Optional<String> levelShift = Optional.empty();
        Optional<String> pin = Optional.empty();
        Optional<String> pinNet = Optional.empty();
        Optional<String> inputResistor = Optional.empty();
        Optional<String> inputPull = Optional.empty();
        Optional<String> switchPullUp = Optional.empty();
        Optional<String> switchBaseResistor = Optional.empty();
        String controlNet = "";
    }

    /** The suppressors as found. */
    private static final class Suppressors {
        final Set<String> refs = new LinkedHashSet<>();
        final List<List<StageRoles.Oriented>> chains = new ArrayList<>();
        final List<StageRoles.Oriented> switchClamps = new ArrayList<>();
        List<SuppressorKind> mechanisms = List.of();

        SuppressorKind kind() {
            return mechanisms.isEmpty() ? SuppressorKind.NONE
                    : mechanisms.size() == 1 ? mechanisms.get(0) : SuppressorKind.COMBINED;
        }
    }

    /** The contact side as traced. */
    private static final class ContactSide {
        List<String> supplies = List.of();
        List<String> loads = List.of();
    }
}
