package org.armature.solver.timedomain;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.ToDoubleFunction;
import java.util.stream.IntStream;
import org.armature.model.ParamKeys;
import org.armature.netlist.Readings;
import org.armature.devices.BreakdownClamp;
import org.armature.devices.DeviceFinding;
import org.armature.devices.MovingArmature;
import org.armature.devices.RelayArmatureDatasheet;
import org.armature.devices.RelayArmatureFit;
import org.armature.model.Connectivity;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;
import org.armature.netlist.Capacitor;
import org.armature.netlist.ContactState;
import org.armature.netlist.Element;
import org.armature.netlist.FlattenOptions;
import org.armature.netlist.Netlist;
import org.armature.netlist.NetlistBuilder;
import org.armature.netlist.PartNetwork;
import org.armature.netlist.RelayCoil;
import org.armature.netlist.RelayHandle;
import org.armature.netlist.Solution;
import org.armature.netlist.Resistor;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SolveOptions;

/**
 * Turns a stage into a {@link TimeDomainCircuit}: the solver's netlist of each drive level, with the
 * reactive parts given the run's integration formula, the coil's inductance, self-capacitance and
 * core loss added, and a breakdown clamp across the switch. A relay whose attracted inductance
 * exceeds the released one gets the fitted moving armature ({@link RelayArmatureFit}); when the
 * fit reports inconsistent figures (its ERROR findings: for example an attracted inductance too
 * high for the pick-up/drop-out ratio) or none is given, the constant-inductance threshold model.
 */
final class StageCircuit {

    private StageCircuit() {
    }

    /** Kilograms per gram (the part sheet gives the armature mass in grams). */
    private static final double GRAMS_TO_KILOGRAMS = 1e-3;

    static TimeDomainCircuit build(Stage stage, double ambientCelsius, boolean initialHigh) {
        OperatingPoint op = new DcAnalysis().solve(stage,
                SolveOptions.DEFAULT.withPinHigh(initialHigh).withAmbient(ambientCelsius));
        Map<String, Boolean> operated = op.relayOperated();
        boolean anyOperated = operated.values().stream().anyMatch(Boolean::booleanValue);
        FlattenOptions fo = FlattenOptions.of(initialHigh, ambientCelsius).withRelayOperated(anyOperated);
        // one recognition for both drive levels (the geometry is the same): nets, the coil, the switch
        // and the suppressor come from the stage's roles
        StageRecognition recognition = StageRecognition.of(stage);
        Optional<StageRoles> stageRoles = recognition.roles();
        Connectivity nets = recognition.connectivity();
        Netlist here = NetlistBuilder.flatten(stage, nets, fo);
        Netlist other = otherLevel(stage, nets, fo.withPinHigh(!initialHigh), here);
        Netlist low = initialHigh ? other : here;
        Netlist high = initialHigh ? here : other;
        double[] states = here.initialStates();
        for (RelayHandle r : here.relays()) {
            states[r.contactSlot()] = ContactState.of(operated.getOrDefault(r.ref(), false)).slotValue();
            Double t = op.requirePart(r.ref()).quantities().get(Readings.COIL_TEMPERATURE);
            if (t != null) {
                states[r.temperatureSlot()] = t;
            }
        }
        TimeDomainCircuit c = new TimeDomainCircuit(here.nodeCount(), here.branchCount(), states);
        Map<String, Double> solved = op.unknownsByNodeName();
        c.startGuess = new double[here.nodeCount() + here.branchCount()];
        for (int i = 0; i < here.nodeCount(); i++) {
            c.nodeName(i, here.nodeName(i));
            c.startGuess[i] = solved.getOrDefault(here.nodeName(i), 0.0);
        }
        for (Map.Entry<String, Integer> e : here.netNodes().entrySet()) {
            if (e.getValue() >= 0) {
                c.node(e.getKey(), e.getValue());
            }
        }
        Set<Element> inParts = Collections.newSetFromMap(new IdentityHashMap<>());
        Map<String, TransientCapacitor> caps = new HashMap<>();
        TransientCoil firstCoil = null;
        PartNetwork relayNet = null;
        for (PartNetwork p : low.parts()) {
            inParts.addAll(p.elements());
            if (p.part().kind() == PartKind.DRIVE_PIN) {
                c.driveLow.addAll(p.elements());
                c.driveHigh.addAll(high.part(p.ref()).orElseThrow().elements());
                continue;
            }
            PartNetwork pHere = here.part(p.ref()).orElseThrow();
            for (Element e : pHere.elements()) {
                if (e instanceof Capacitor cap) {
                    int[] t = cap.terminals();
                    caps.put(p.ref(), c.add(new TransientCapacitor(cap.label(), t[0], t[1], cap.farads(), c.step)));
                } else if (e instanceof RelayCoil coil) {
                    TransientCoil tc = addCoil(c, p.part(), coil, states, here);
                    boolean theCoil = stageRoles.map(r -> r.relayRef().equals(p.ref())).orElse(firstCoil == null);
                    if (theCoil) {
                        firstCoil = tc;
                        relayNet = pHere;
                    }
                } else {
                    c.add(e);
                }
            }
        }
        inParts.addAll(here.parts().stream().flatMap(p -> p.elements().stream()).toList());
        for (Element e : here.elements()) {
            if (!inParts.contains(e)) {
                c.add(e);
            }
        }
        if (firstCoil != null) {
            roles(c, here, relayNet, firstCoil, caps, stageRoles);
        }
        return c;
    }

    /**
     * The netlist of the other drive level: the first one with only the drive pins flattened anew
     * (the rest is shared), or a whole flatten when a pin's structure would change.
     */
    private static Netlist otherLevel(Stage stage, Connectivity nets, FlattenOptions fo,
                                      Netlist here) {
        int[] pins = IntStream.range(0, stage.parts().size())
                .filter(i -> stage.parts().get(i).kind() == PartKind.DRIVE_PIN).toArray();
        return NetlistBuilder.reflatten(here, stage, fo, pins).orElseGet(() -> NetlistBuilder.flatten(stage, nets, fo));
    }

    private static TransientCoil addCoil(TimeDomainCircuit c, Part relay, RelayCoil coil, double[] states,
                                         Netlist net) {
        int a1 = coil.terminals()[0];
        int a2 = coil.terminals()[1];
        double ohms = coil.ohmsAt(states[coil.temperatureSlot()]);
        double rRef = relay.value(ParamKeys.COIL_RESISTANCE_OHMS);
        double lRel = relay.value(ParamKeys.INDUCTANCE_RELEASED_HENRIES);
        RelayHandle handle = net.relays().stream().filter(h -> h.ref().equals(relay.ref())).findFirst().orElseThrow();
        boolean operated = ContactState.of(states[handle.contactSlot()]).operated();
        TransientCoil tc = c.add(new TransientCoil(relay.ref(), a1, a2, ohms, lRel, lRel, c.step));
        double cap = relay.value(ParamKeys.COIL_CAPACITANCE_FARADS);
        if (cap > 0) {
            c.add(new TransientCapacitor(relay.ref() + " self-capacitance", a1, a2, cap, c.step));
        }
        double core = relay.value(ParamKeys.CORE_LOSS_OHMS);
        if (core > 0) {
            c.add(new Resistor(relay.ref() + " core loss", a1, a2, core));
        }
        double pickUp = handle.pickUpAmps();
        double dropOut = handle.dropOutAmps();
        Optional<MovingArmature> moving = Optional.empty();
        if (relay.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES) > lRel && dropOut < pickUp) {
            RelayArmatureFit fit = RelayArmatureFit.fit(armatureDatasheet(relay, ohms, pickUp, dropOut));
            moving = fit.moving();
            if (moving.isEmpty()) {
                for (DeviceFinding f : fit.findings()) {
                    if (f.severity() == DeviceFinding.Severity.ERROR) {
                        c.notes.add(relay.ref() + ": no moving armature, constant inductance instead: " + f.detail());
                    }
                }
            }
        }
        if (moving.isPresent()) {
            MovingArmature m = moving.get();
            tc.setHenries(m.inductanceHenries(operated ? 0.0 : m.travelMetres()));
            c.armatures.add(new ArmatureDynamics(relay.ref(), tc, handle.contactSlot(), m, operated));
            return tc;
        }
        double tau = lRel / rRef;
        double rated = relay.value(ParamKeys.RATED_VOLTS) / rRef;
        double rise = pickUp < rated ? tau * Math.log(rated / (rated - pickUp)) : 0;
        double operateTransit = Math.max(0, relay.value(ParamKeys.OPERATE_TIME_SECONDS) - rise);
        double releaseTransit = relay.value(ParamKeys.RELEASE_TIME_SECONDS);
        c.relays.add(new RelayDynamics(relay.ref(), tc, handle.contactSlot(), pickUp, dropOut, operateTransit,
                releaseTransit, relay.value(ParamKeys.TRAVEL_METRES), operated));
        return tc;
    }

    /**
     * The fit's inputs from the relay part: the coil resistance at the coil temperature of the
     * operating point, the pick-up and drop-out currents (must-operate and must-release voltages
     * over the reference resistance: the armature responds to ampere-turns), both inductances,
     * travel and spring ratio; mass, damping and contact set point take the typical defaults of
     * {@link RelayArmatureDatasheet}, no bounce.
     */
    static RelayArmatureDatasheet armatureDatasheet(Part relay, double coilOhms, double pickUpAmps,
                                                    double dropOutAmps) {
        return RelayArmatureDatasheet.typical(coilOhms, relay.value(ParamKeys.INDUCTANCE_RELEASED_HENRIES),
                        relay.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES), pickUpAmps, dropOutAmps, relay.value(ParamKeys.TRAVEL_METRES))
                .withSpringForceRatio(relay.value(ParamKeys.SPRING_FORCE_RATIO))
                .withMechanics(GRAMS_TO_KILOGRAMS * relay.value(ParamKeys.ARMATURE_MASS_GRAMS),
                        relay.value(ParamKeys.ARMATURE_DAMPING_NEWTON_SECONDS_PER_METRE), 0.0);
    }

    /** Part whose pins are the switch's high and low terminals, with the rating of its breakdown. */
    private record SwitchPins(String high, String low, String rating) {
    }

    private static SwitchPins switchPins(PartKind k) {
        return switch (k) {
            case NPN -> new SwitchPins("c", "e", ParamKeys.VCEO_VOLTS);
            case PNP -> new SwitchPins("e", "c", ParamKeys.VCEO_VOLTS);
            case NMOS -> new SwitchPins("d", "s", ParamKeys.VDSS_VOLTS);
            case DARLINGTON -> new SwitchPins("out", "e", ParamKeys.VCEO_VOLTS);
            default -> throw new IllegalArgumentException("not a switch: " + k);
        };
    }

    private static void roles(TimeDomainCircuit c, Netlist net, PartNetwork relay, TransientCoil coil,
                              Map<String, TransientCapacitor> caps, Optional<StageRoles> stageRoles) {
        int a1 = coil.a1();
        int a2 = coil.a2();
        double ohms = coil.ohms();
        double core = relay.part().value(ParamKeys.CORE_LOSS_OHMS);
        Probe channelClamp = null;
        Probe channelClampPower = null;
        c.coilRef = relay.ref();
        c.coilCurrent = new Probe(Waveform.COIL_CURRENT, "A", coil::current);
        c.coilVoltage = new Probe("coil voltage", "V", x -> x.voltage(a1) - x.voltage(a2));
        c.coilLossPower = new Probe("coil loss", "W", x -> {
            double i = coil.current(x);
            double v = x.voltage(a1) - x.voltage(a2);
            return ohms * i * i + (core > 0 ? v * v / core : 0);
        });
        c.dropOutAmps = c.relays.isEmpty() ? c.armatures.get(0).model.dropOutAmps() : c.relays.get(0).dropOutAmps;
        // the inductance of the initial gap (attracted when the run starts operated)
        c.storedEnergyHenries = coil.henries();
        // the switch that carries the coil current, as the stage's roles name it
        PartNetwork sw = stageRoles.flatMap(r -> net.part(r.switchRef())).orElse(null);
        if (sw != null) {
            SwitchPins pins = switchPins(sw.part().kind());
            int hi = sw.pinNodes().get(pins.high());
            int lo = sw.pinNodes().get(pins.low());
            SwitchClamp clamp = c.add(new SwitchClamp(sw.ref() + " breakdown", hi, lo,
                    BreakdownClamp.atRating(sw.part().value(pins.rating()))));
            PartNetwork swFinal = sw;
            c.switchRef = sw.ref();
            c.switchVoltage = new Probe("switch voltage", "V", x -> x.voltage(hi) - x.voltage(lo));
            ReadingMemo memo = c.switchReading;
            if (sw.part().kind() == PartKind.DARLINGTON) {
                // the channel's clamp diode to its common pin is the suppressor when that pin goes to
                // the coil's supply: its power counts as suppressor power, not switch power
                int com = sw.pinNodes().get("com");
                ToDoubleFunction<Solution> iClamp =
                        x -> -memo.of(swFinal, x).pinCurrents().get("com");
                c.switchPower = new Probe("switch power", "W",
                        x -> memo.of(swFinal, x).powerWatts() - (x.voltage(hi) - x.voltage(com)) * iClamp.applyAsDouble(x)
                                + (x.voltage(hi) - x.voltage(lo)) * clamp.current(x));
                channelClamp = new Probe("channel clamp current", "A", iClamp);
                channelClampPower = new Probe("", "W", x -> (x.voltage(hi) - x.voltage(com)) * iClamp.applyAsDouble(x));
            } else {
                c.switchPower = new Probe("switch power", "W",
                        x -> memo.of(swFinal, x).powerWatts() + (x.voltage(hi) - x.voltage(lo)) * clamp.current(x));
            }
            c.probes.add(new Probe("I(" + sw.ref() + ")", "A",
                    x -> memo.of(swFinal, x).pinCurrents().get(pins.high()) + clamp.current(x)));
        }
        List<PartNetwork> chain = suppressorParts(net, stageRoles);
        List<Probe> powers = new ArrayList<>();
        if (channelClampPower != null) {
            powers.add(channelClampPower);
        }
        for (PartNetwork p : chain) {
            List<Integer> nodes = List.copyOf(p.pinNodes().values());
            int pa = nodes.get(0);
            int pb = nodes.get(1);
            ToDoubleFunction<Solution> i = twoTerminalCurrent(p, caps);
            powers.add(new Probe("", "W", x -> (x.voltage(pa) - x.voltage(pb)) * i.applyAsDouble(x)));
        }
        if (!chain.isEmpty() || channelClamp != null) {
            c.suppressorPower = new Probe("suppressor power", "W", x -> {
                double sum = 0;
                for (Probe pr : powers) {
                    sum += pr.reader().applyAsDouble(x);
                }
                return sum;
            });
            c.suppressorCurrent = chain.isEmpty() ? channelClamp
                    : new Probe("suppressor current", "A", twoTerminalCurrent(chain.get(0), caps));
        }
        // part currents of two-terminal parts, first pin to second
        for (PartNetwork p : net.parts()) {
            PartKind k = p.part().kind();
            if (k == PartKind.RESISTOR || k == PartKind.DIODE || k == PartKind.ZENER || k == PartKind.TVS
                    || k == PartKind.LED || k == PartKind.LOAD || k == PartKind.CAPACITOR) {
                c.probes.add(new Probe("I(" + p.ref() + ")", "A", twoTerminalCurrent(p, caps)));
            }
        }
    }

    /**
     * Current from the first pin to the second of a two-terminal part, read straight from its
     * element (a resistor, or the junction of a diode whose series resistance carries the same
     * current); a full {@link PartNetwork#read} for anything else. Part readings build maps, and
     * at every time point that cost more than the solve.
     */
    private static ToDoubleFunction<Solution> twoTerminalCurrent(
            PartNetwork p, Map<String, TransientCapacitor> caps) {
        TransientCapacitor cap = caps.get(p.ref());
        if (cap != null) {
            return cap::current;
        }
        List<Element> els = p.elements();
        for (Element e : els) {
            if (e instanceof org.armature.netlist.JunctionElement j && j.terminals()[0] != j.terminals()[1]) {
                int first = p.pinNodes().get(p.part().kind().pins().get(0).name());
                // the junction's anode is on the first pin's side for a diode, zener, LED and TVS
                boolean forward = j.terminals()[0] == first || els.size() > 1;
                return forward ? j::current : x -> -j.current(x);
            }
        }
        if (els.size() == 1 && els.get(0) instanceof Resistor r) {
            boolean forward = r.terminals()[0] == p.pinNodes().get(p.part().kind().pins().get(0).name());
            return forward ? r::current : x -> -r.current(x);
        }
        String pin = p.part().kind().pins().get(0).name();
        return x -> p.read(x).pinCurrents().get(pin);
    }

    /** The parts of the suppressor chains across the coil, as the stage's roles name them, each once. */
    static List<PartNetwork> suppressorParts(Netlist net, Optional<StageRoles> stageRoles) {
        List<PartNetwork> out = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (List<StageRoles.Oriented> chain : stageRoles.map(StageRoles::coilChains).orElse(List.of())) {
            for (StageRoles.Oriented o : chain) {
                if (seen.add(o.ref())) {
                    net.part(o.ref()).ifPresent(out::add);
                }
            }
        }
        return out;
    }
}
