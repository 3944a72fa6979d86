package org.armature.analysis;

import static org.armature.analysis.Quantities.volts;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.armature.model.Connectivity;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Severity;
import org.armature.model.Stage;

/**
 * Recognises which of the four driver stages was drawn, from connectivity alone, and explains
 * problems in plain words. Never throws for a stage the editor can hold; returns findings.
 *
 * <p>Recognition: the first relay's coil nets are found; a switch is a part of
 * {@link PartKind#isSwitch() switch kind} whose collector / drain / output sits on one coil net
 * with its emitter or source on ground (low side), or a PNP whose collector sits on a coil net
 * whose other end is grounded (high side). A high-side PNP is "level-shifted" when its base
 * reaches the collector of a grounded-emitter NPN (through a resistor or directly), and "direct"
 * when its base reaches a logic pin.
 *
 * <p>Suppressors are the parts across the coil (one part, or two in series through a net that
 * nothing else touches), a Darlington channel's common pin returned to the coil supply (directly or
 * through one part), or a zener / TVS across a low-side switch. The polarity of a chain of
 * junctions is judged by adding up the voltage at which it would conduct in the on-state polarity
 * (forward drop {@link TopologyOptions#forwardDropVolts()} per forward junction, breakdown voltage
 * per reversed one) and comparing it with the coil supply's maximum.
 *
 * <p>Stable keys, with severities (ERROR: the stage cannot work as drawn; these do not stop the
 * solver, only {@code Validator}'s errors do):
 * <table>
 * <caption>topology finding keys</caption>
 * <tr><th>key</th><th>severity</th><th>meaning</th></tr>
 * <tr><td>{@code topology.recognised}</td><td>INFO</td><td>which stage was drawn, and the roles</td></tr>
 * <tr><td>{@code topology.not-recognised}</td><td>WARNING</td><td>no relay, or no transistor switches its coil</td></tr>
 * <tr><td>{@code topology.coil-shorted}</td><td>ERROR</td><td>both coil terminals on one net</td></tr>
 * <tr><td>{@code topology.coil-supply-missing}</td><td>ERROR</td><td>no supply rail feeds the coil (or the PNP emitter)</td></tr>
 * <tr><td>{@code topology.no-drive-pin}</td><td>WARNING</td><td>no logic pin drives the input</td></tr>
 * <tr><td>{@code topology.no-base-resistor}</td><td>WARNING</td><td>a base driven with nothing to limit its current</td></tr>
 * <tr><td>{@code topology.floating-control}</td><td>WARNING</td><td>base or gate without pull-down (PNP: pull-up)</td></tr>
 * <tr><td>{@code topology.high-side-cannot-turn-off}</td><td>ERROR</td><td>PNP driven from a pin whose high level is below the supply (CHECKS, beyond the hand calculation, 4)</td></tr>
 * <tr><td>{@code topology.coil-supply-reversed}</td><td>ERROR</td><td>the coil rail is not positive: it forward-biases the freewheeling diode</td></tr>
 * <tr><td>{@code topology.suppressor-missing}</td><td>WARNING</td><td>nothing limits the turn-off voltage (SU-0)</td></tr>
 * <tr><td>{@code topology.suppressor-reversed}</td><td>ERROR</td><td>a suppressor conducts forward when the stage turns on: a short across the supply</td></tr>
 * <tr><td>{@code topology.suppressor-conducts}</td><td>WARNING</td><td>a clamp breaks down at or below the supply's maximum in normal operation</td></tr>
 * <tr><td>{@code topology.clamp-common-miswired}</td><td>ERROR</td><td>a Darlington channel's common pin on ground or on its own output</td></tr>
 * <tr><td>{@code topology.contacts-unused}</td><td>INFO</td><td>nothing is wired to the relay contacts</td></tr>
 * <tr><td>{@code topology.contact-side-unpowered}</td><td>WARNING</td><td>contacts wired, but no supply reaches the contact circuit</td></tr>
 * </table>
 */
public final class TopologyCheck {

    /** Kinds that make up a two-terminal suppressor chain. */
    private static final Set<PartKind> CHAIN_KINDS = Set.of(PartKind.DIODE, PartKind.ZENER, PartKind.TVS,
            PartKind.RESISTOR, PartKind.CAPACITOR);

    /** Two-terminal kinds a contact circuit is traced through. */
    private static final Set<PartKind> CONTACT_PATH_KINDS = Set.of(PartKind.LOAD, PartKind.RESISTOR, PartKind.LED,
            PartKind.DIODE, PartKind.CAPACITOR);

    private TopologyCheck() {
    }

    /** The findings for a stage with the default {@link TopologyOptions}. */
    public static List<Finding> check(Stage stage) {
        return analyse(stage, TopologyOptions.DEFAULT).findings();
    }

    /** The recognised roles, if the stage is one of the four driver stages. */
    public static Optional<StageRoles> recognise(Stage stage) {
        return analyse(stage, TopologyOptions.DEFAULT).roles();
    }

    /** Roles and findings with the default options. */
    public static TopologyReport analyse(Stage stage) {
        return analyse(stage, TopologyOptions.DEFAULT);
    }

    /**
     * Roles and findings, each finding with every part it concerns.
     *
     * @param stage the stage as drawn; not modified
     * @param options the figures used to judge polarity and turn-off
     */
    public static TopologyReport analyse(Stage stage, TopologyOptions options) {
        return new Analysis(stage, options).run();
    }

    /** One run over one stage. */
    private static final class Analysis {
        private final Stage stage;
        private final TopologyOptions options;
        private final Connectivity c;
        private final List<TopologyIssue> issues = new ArrayList<>();

        Analysis(Stage stage, TopologyOptions options) {
            this.stage = stage;
            this.options = options;
            this.c = Connectivity.of(stage);
        }

        TopologyReport run() {
            Optional<Part> relay = stage.firstOfKind(PartKind.RELAY);
            if (relay.isEmpty()) {
                add(Severity.WARNING, "topology.not-recognised", "",
                        "There is no relay in the stage: not a recognised driver stage.", List.of());
                return report(Optional.empty());
            }
            Part k = relay.get();
            String a1 = c.net(k.ref(), "a1");
            String a2 = c.net(k.ref(), "a2");
            if (a1.equals(a2)) {
                add(Severity.ERROR, "topology.coil-shorted", "a1",
                        k.ref() + "'s coil terminals are wired together: the coil is shorted and can never operate.",
                        List.of(k.ref()));
                return report(Optional.empty());
            }
            Optional<Recognised> found = findSwitch(a1, a2);
            if (found.isEmpty()) {
                add(Severity.WARNING, "topology.not-recognised", "",
                        "No transistor switches " + k.ref() + "'s coil to ground or from the supply: not a recognised"
                                + " driver stage (low-side NPN, low-side N-MOSFET, Darlington channel or high-side PNP).",
                        List.of(k.ref()));
                return report(Optional.empty());
            }
            Recognised r = found.get();
            Optional<Part> coilSupply = coilSupply(k, r);
            double supplyMax = coilSupply.map(v -> supplyMaxVolts(v)).orElse(Double.NaN);
            Drive drive = drive(r, coilSupply, supplyMax);
            List<String> suppressors = suppressors(k, r, supplyMax);
            List<String> contactSupplies = contactSide(k);
            StageRoles roles = new StageRoles(r.topology, r.highSide, k.ref(), r.sw.ref(), drive.levelShift,
                    drive.pin, drive.inputResistor, drive.inputPull, drive.switchPullUp, drive.switchBaseResistor,
                    coilSupply.map(Part::ref), suppressors, contactSupplies, r.coilHigh, r.coilLow,
                    drive.controlNet);
            issues.add(0, new TopologyIssue(new Finding(Severity.INFO, "topology.recognised", r.sw.ref(), "",
                    describe(roles)), List.of(r.sw.ref(), k.ref())));
            return report(Optional.of(roles));
        }

        private TopologyReport report(Optional<StageRoles> roles) {
            return new TopologyReport(roles, issues);
        }

        private void add(Severity severity, String key, String field, String message, List<String> refs) {
            String ref = refs.isEmpty() ? "" : refs.get(0);
            issues.add(new TopologyIssue(new Finding(severity, key, ref, field, message), refs));
        }

        // ------------------------------------------------------------------ recognition

        private Optional<Recognised> findSwitch(String a1, String a2) {
            for (Part p : stage.parts()) {
                if (!p.kind().isSwitch()) {
                    continue;
                }
                switch (p.kind()) {
                    case NPN, NMOS, DARLINGTON -> {
                        String out = pinNet(p, p.kind() == PartKind.NPN ? "c" : p.kind() == PartKind.NMOS ? "d" : "out");
                        String ref = pinNet(p, p.kind() == PartKind.NMOS ? "s" : "e");
                        if (ref.equals(Connectivity.GROUND) && (out.equals(a1) || out.equals(a2))) {
                            DriverTopology t = p.kind() == PartKind.NPN ? DriverTopology.LOW_SIDE_NPN
                                    : p.kind() == PartKind.NMOS ? DriverTopology.LOW_SIDE_NMOS
                                    : DriverTopology.DARLINGTON_CHANNEL;
                            return Optional.of(new Recognised(t, p, out.equals(a1) ? a2 : a1, out, Optional.empty()));
                        }
                    }
                    case PNP -> {
                        String col = pinNet(p, "c");
                        String other = col.equals(a1) ? a2 : col.equals(a2) ? a1 : "";
                        if (other.equals(Connectivity.GROUND)) {
                            return Optional.of(new Recognised(DriverTopology.HIGH_SIDE_PNP, p, col, other,
                                    Optional.empty()));
                        }
                    }
                    default -> { }
                }
            }
            return Optional.empty();
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
            } else if (!(supply.get().value("volts") > 0)) {
                Part v = supply.get();
                add(Severity.ERROR, "topology.coil-supply-reversed", "volts",
                        "Coil supply " + v.ref() + " is " + volts(v.value("volts")) + ": these stages switch a positive coil"
                                + " rail, and a reversed one forward-biases the freewheeling diode across " + k.ref()
                                + "'s coil (a short through the diode) while the switch cannot control the relay."
                                + " Make " + v.ref() + " positive.",
                        List.of(v.ref(), k.ref()));
            }
            return supply;
        }

        // ------------------------------------------------------------------ drive network

        private Drive drive(Recognised r, Optional<Part> coilSupply, double supplyMax) {
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
                d.inputResistor = inner.inputResistor;
                d.inputPull = inner.inputPull;
                d.controlNet = inner.controlNet;
                return d;
            }
            // direct drive: base -> (resistor) -> pin
            Optional<Part> pin = drivePinOn(base);
            Optional<Part> series = Optional.empty();
            if (pin.isEmpty()) {
                for (PinOn on : partsOn(base)) {
                    Part p = on.part();
                    if (p.kind() == PartKind.RESISTOR && !pullUp.map(u -> u.ref().equals(p.ref())).orElse(false)) {
                        Optional<Part> far = drivePinOn(otherNet(p, on.pin()));
                        if (far.isPresent()) {
                            pin = far;
                            series = Optional.of(p);
                            break;
                        }
                    }
                }
            }
            if (pin.isEmpty()) {
                add(Severity.WARNING, "topology.no-drive-pin", "b",
                        "No logic pin drives " + pnp.ref() + "'s base, directly, through a resistor or through a"
                                + " level-shift NPN.", List.of(pnp.ref()));
                d.switchPullUp = pullUp.map(Part::ref);
                return d;
            }
            r.highSide = Optional.of(HighSideDrive.DIRECT);
            d.pin = pin.map(Part::ref);
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
            if (coilSupply.isPresent()) {
                double high = pin.get().value("highVolts");
                double needed = supplyMax - options.pnpOffMarginVolts();
                if (high < needed) {
                    List<String> refs = new ArrayList<>(List.of(pnp.ref(), pin.get().ref()));
                    series.ifPresent(s -> refs.add(s.ref()));
                    add(Severity.ERROR, "topology.high-side-cannot-turn-off", "b",
                            pnp.ref() + " (PNP, emitter on " + coilSupply.get().ref() + " at up to " + volts(supplyMax)
                                    + ") is driven straight from " + pin.get().ref() + ", whose high level is only "
                                    + volts(high) + ": the base can never rise to within "
                                    + volts(options.pnpOffMarginVolts()) + " of the emitter, so " + pnp.ref()
                                    + " cannot turn off, and current flows from the base"
                                    + series.map(s -> " through " + s.ref()).orElse("")
                                    + " into the pin's protection diode. Use an NPN level shift with a base–emitter"
                                    + " pull-up on " + pnp.ref() + ".", refs);
                }
            }
            return d;
        }

        /** Drive of a transistor whose emitter or source is grounded (or a Darlington input). */
        private void lowSideDrive(Part input, Drive d) {
            String controlPin = switch (input.kind()) {
                case NMOS -> "g";
                case DARLINGTON -> "in";
                default -> "b";
            };
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

        private List<String> suppressors(Part k, Recognised r, double supplyMax) {
            Set<String> found = new LinkedHashSet<>();
            boolean seen = false;
            // chains across the coil, oriented from the on-state high end to the low end
            for (List<Oriented> chain : chainsBetween(r.coilHigh, r.coilLow, Set.of(k.ref(), r.sw.ref()))) {
                seen = true;
                chain.forEach(o -> found.add(o.part.ref()));
                judgeChain(chain, supplyMax, k, r, true);
            }
            if (r.topology == DriverTopology.DARLINGTON_CHANNEL) {
                seen |= darlingtonClamp(r, found, supplyMax, k);
            }
            if (r.topology.isLowSide()) {
                // a zener or TVS across the switch also limits the turn-off voltage
                for (Part p : stage.parts()) {
                    if (p.kind() != PartKind.ZENER && p.kind() != PartKind.TVS) {
                        continue;
                    }
                    Optional<Oriented> o = orient(p, r.coilLow, Connectivity.GROUND);
                    if (o.isPresent()) {
                        seen = true;
                        found.add(p.ref());
                        judgeSwitchClamp(o.get(), supplyMax, r, k);
                    }
                }
            }
            if (!seen) {
                add(Severity.WARNING, "topology.suppressor-missing", "",
                        "Nothing limits " + k.ref() + "'s turn-off voltage: when " + r.sw.ref() + " turns off, the coil's"
                                + " inductance drives the " + (r.topology.isLowSide() ? "switch node" : "coil's upper end")
                                + " to several hundred volts, enough to destroy a small transistor. Fit a freewheeling"
                                + " diode across the coil (cathode to the " + (r.topology.isLowSide() ? "supply end"
                                : "end on " + r.sw.ref() + "'s collector") + "), or a diode + zener or a TVS for"
                                + " faster release.", List.of(k.ref(), r.sw.ref()));
            }
            return List.copyOf(found);
        }

        private boolean darlingtonClamp(Recognised r, Set<String> found, double supplyMax, Part k) {
            String com = pinNet(r.sw, "com");
            if (com.equals(Connectivity.GROUND) || com.equals(r.coilLow)) {
                add(Severity.ERROR, "topology.clamp-common-miswired", "com",
                        r.sw.ref() + "'s clamp common pin is on " + (com.equals(Connectivity.GROUND) ? "ground" : "its own output")
                                + ": its clamp diode " + (com.equals(Connectivity.GROUND)
                                ? "conducts from the output to ground and holds " + k.ref() + " energised."
                                : "is shorted and does nothing.")
                                + " Return the common pin to the coil supply.", List.of(r.sw.ref(), k.ref()));
                return com.equals(Connectivity.GROUND);
            }
            if (com.equals(r.coilHigh)) {
                found.add(r.sw.ref());
                return true;
            }
            // one part between the common pin and the coil supply end (a zener for faster release)
            for (List<Oriented> chain : chainsBetween(r.coilHigh, com, Set.of(k.ref(), r.sw.ref()))) {
                if (chain.size() != 1) {
                    continue;
                }
                found.add(r.sw.ref());
                found.add(chain.get(0).part.ref());
                // the internal diode blocks in the on state, so only the turn-off clamp voltage matters
                return true;
            }
            return false;
        }

        /** Chains of one or two suppressor parts from net {@code from} to net {@code to}. */
        private List<List<Oriented>> chainsBetween(String from, String to, Set<String> exclude) {
            List<List<Oriented>> out = new ArrayList<>();
            for (Part p : stage.parts()) {
                if (!CHAIN_KINDS.contains(p.kind()) || exclude.contains(p.ref())) {
                    continue;
                }
                Optional<Oriented> direct = orient(p, from, to);
                if (direct.isPresent()) {
                    out.add(List.of(direct.get()));
                    continue;
                }
                for (String pinName : List.of("a", "b", "k")) {
                    if (p.kind().pin(pinName).isEmpty() || !pinNet(p, pinName).equals(from)) {
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
        private Optional<Oriented> orient(Part p, String from, String to) {
            List<String> pins = p.kind().pins().stream().map(s -> s.name()).toList();
            if (pins.size() != 2) {
                return Optional.empty();
            }
            String n0 = pinNet(p, pins.get(0));
            String n1 = pinNet(p, pins.get(1));
            if (n0.equals(from) && n1.equals(to)) {
                return Optional.of(new Oriented(p, pins.get(0)));
            }
            if (n1.equals(from) && n0.equals(to)) {
                return Optional.of(new Oriented(p, pins.get(1)));
            }
            return Optional.empty();
        }

        /** Judges a chain across the coil in the on-state polarity (from the high end to the low end). */
        private void judgeChain(List<Oriented> chain, double supplyMax, Part k, Recognised r, boolean acrossCoil) {
            if (chain.stream().anyMatch(o -> !isJunction(o.part))) {
                return; // a resistor or capacitor in the chain: a load across the coil, never a short
            }
            double conduct = 0;
            boolean allForward = true;
            for (Oriented o : chain) {
                boolean forward = isForward(o);
                allForward &= forward;
                conduct += forward ? options.forwardDropVolts() : o.part.value("breakdownVolts");
            }
            if (Double.isNaN(supplyMax) || conduct > supplyMax) {
                return;
            }
            List<String> refs = new ArrayList<>(chain.stream().map(o -> o.part.ref()).toList());
            refs.add(k.ref());
            if (allForward) {
                Oriented first = chain.get(0);
                add(Severity.ERROR, "topology.suppressor-reversed", "",
                        names(chain) + " conduct" + (chain.size() == 1 ? "s" : "") + " forward as soon as " + r.sw.ref()
                                + " turns on: " + (chain.size() == 1 ? "it is" : "they are") + " the wrong way round"
                                + " and short the coil supply through " + r.sw.ref() + ". Turn "
                                + first.part.ref() + " so its cathode faces the " + (acrossCoil ? "coil's supply end" : "supply") + ".",
                        refs);
            } else {
                add(Severity.WARNING, "topology.suppressor-conducts", "",
                        names(chain) + " would conduct at about " + volts(conduct) + ", not above the coil supply's maximum "
                                + volts(supplyMax) + ": " + (chain.size() == 1 ? "it draws" : "they draw")
                                + " current whenever " + r.sw.ref() + " is on. Choose a breakdown voltage above the"
                                + " supply's maximum.", refs);
            }
        }

        /** Judges a zener or TVS from the switch node to ground (off state: it sees the supply). */
        private void judgeSwitchClamp(Oriented o, double supplyMax, Recognised r, Part k) {
            if (Double.isNaN(supplyMax)) {
                return;
            }
            boolean forward = isForward(o);
            if (forward) {
                add(Severity.ERROR, "topology.suppressor-reversed", "",
                        o.part.ref() + " across " + r.sw.ref() + " conducts forward whenever " + r.sw.ref() + " is off: it"
                                + " holds " + k.ref() + " energised. Turn it so its cathode faces the switch node.",
                        List.of(o.part.ref(), r.sw.ref(), k.ref()));
            } else if (o.part.value("breakdownVolts") <= supplyMax) {
                add(Severity.WARNING, "topology.suppressor-conducts", "",
                        o.part.ref() + " across " + r.sw.ref() + " breaks down at " + volts(o.part.value("breakdownVolts"))
                                + ", not above the coil supply's maximum " + volts(supplyMax) + ": it energises "
                                + k.ref() + " while " + r.sw.ref() + " is off. Choose a breakdown voltage above the"
                                + " supply's maximum.", List.of(o.part.ref(), r.sw.ref(), k.ref()));
            }
        }

        private static boolean isJunction(Part p) {
            return p.kind() == PartKind.DIODE || p.kind() == PartKind.ZENER || p.kind() == PartKind.TVS;
        }

        /** True when the part conducts forward from its "from" pin: a diode or zener entered at its anode. */
        private static boolean isForward(Oriented o) {
            return (o.part.kind() == PartKind.DIODE || o.part.kind() == PartKind.ZENER) && o.fromPin.equals("a");
        }

        private static String names(List<Oriented> chain) {
            return String.join(" and ", chain.stream().map(o -> o.part.ref()).toList());
        }

        // ------------------------------------------------------------------ contact side

        private List<String> contactSide(Part k) {
            List<String> starts = List.of(c.net(k.ref(), "com"), c.net(k.ref(), "no"), c.net(k.ref(), "nc"));
            boolean wired = starts.stream().anyMatch(n -> partsOn(n).size() > 1 || n.equals(Connectivity.GROUND));
            if (!wired) {
                add(Severity.INFO, "topology.contacts-unused", "com",
                        "Nothing is wired to " + k.ref() + "'s contacts.", List.of(k.ref()));
                return List.of();
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
            return List.copyOf(supplies);
        }

        // ------------------------------------------------------------------ helpers

        private String pinNet(Part p, String pin) {
            return c.net(p.ref(), pin);
        }

        /** The net at a two-pin part's other pin. */
        private String otherNet(Part p, String pin) {
            for (var spec : p.kind().pins()) {
                if (!spec.name().equals(pin)) {
                    return pinNet(p, spec.name());
                }
            }
            return pinNet(p, pin);
        }

        private List<PinOn> partsOn(String net) {
            List<PinOn> out = new ArrayList<>();
            for (PinRef ref : c.pinsOn(net)) {
                stage.part(ref.ref()).ifPresent(p -> out.add(new PinOn(p, ref.pin())));
            }
            return out;
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
                    + String.join(" + ", roles.suppressorRefs()) + ".");
            return sb.toString();
        }
    }

    private static double supplyMaxVolts(Part supply) {
        return Math.abs(supply.value("volts")) * (1 + supply.value("tolerancePercent") / 100);
    }


    /** A part's pin on a net. */
    private record PinOn(Part part, String pin) {
    }

    /** A two-pin part entered at {@code fromPin}. */
    private record Oriented(Part part, String fromPin) {
    }

    /** The switch as found, before the drive is traced. */
    private static final class Recognised {
        final DriverTopology topology;
        final Part sw;
        final String coilHigh;
        final String coilLow;
        Optional<HighSideDrive> highSide;

        Recognised(DriverTopology topology, Part sw, String coilHigh, String coilLow, Optional<HighSideDrive> highSide) {
            this.topology = topology;
            this.sw = sw;
            this.coilHigh = coilHigh;
            this.coilLow = coilLow;
            this.highSide = highSide;
        }
    }

    /** The drive network as traced. */
    private static final class Drive {
        Optional<String> levelShift = Optional.empty();
        Optional<String> pin = Optional.empty();
        Optional<String> inputResistor = Optional.empty();
        Optional<String> inputPull = Optional.empty();
        Optional<String> switchPullUp = Optional.empty();
        Optional<String> switchBaseResistor = Optional.empty();
        String controlNet = "";
    }
}
