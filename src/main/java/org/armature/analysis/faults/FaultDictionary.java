package org.armature.analysis.faults;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.model.Connectivity;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SolveOptions;
import org.armature.solver.SolverException;

/**
 * The simulation-before-test fault dictionary of a stage (FH-1): for the healthy stage and every
 * single fault of {@link FaultCatalog}, at both pin states, the meter reading at every probe point
 * and the symptom (relay operated, contact-side load on).
 *
 * <p>Meter loading: each reading is a solve with the meter's input resistance across the probed
 * net (FH-3), one probe at a time. The meter resistors of all probes are drawn into the stage once,
 * all but one at {@value #IDLE_METER_OHMS} Ω (10⁻¹⁵ S, below the engine's junction gmin), so that
 * moving the meter is a value edit and the engine re-solves warm without compiling again.
 */
public final class FaultDictionary {

    /** The resistance of a meter that is not connected. */
    public static final double IDLE_METER_OHMS = 1e15;

    /**
     * What the stage shows with one fault (or none) at one pin state.
     *
     * @param operated whether the relay's armature is operated
     * @param loadOn whether a contact-side load has at least half its rail across it
     * @param volts the reading at each probe, in the order of {@link #probes()}
     */
    public record State(boolean operated, boolean loadOn, double[] volts) {
    }

    /**
     * One entry: a fault (empty: healthy) and what it shows, or why it could not be solved.
     *
     * @param fault the fault, empty for the healthy stage
     * @param high the pin-high state, if solved
     * @param low the pin-low state, if solved
     * @param failure why the faulted stage has no operating point, empty when solved
     */
    public record Entry(Optional<Fault> fault, State high, State low, String failure) {
        /** {@code PART:KIND}, or {@value Fault#NONE}. */
        public String name() {
            return fault.map(Fault::id).orElse(Fault.NONE);
        }

        /** True when both pin states were solved. */
        public boolean solved() {
            return failure.isEmpty();
        }

        /** The state of one pin state. */
        public State state(boolean pinHigh) {
            return pinHigh ? high : low;
        }
    }

    private final Stage stage;
    private final Meter meter;
    private final List<Probe> probes;
    private final List<Entry> entries;

    private FaultDictionary(Stage stage, Meter meter, List<Probe> probes, List<Entry> entries) {
        this.stage = stage;
        this.meter = meter;
        this.probes = List.copyOf(probes);
        this.entries = List.copyOf(entries);
    }

    /**
     * Builds the dictionary of every single fault of the stage.
     *
     * @param stage the healthy stage
     * @param meter the meter (its input resistance loads each probed net)
     * @return the dictionary; entry 0 is the healthy stage
     */
    public static FaultDictionary build(Stage stage, Meter meter) {
        return build(stage, meter, FaultCatalog.of(stage));
    }

    /** Builds the dictionary of the given faults (entry 0 is the healthy stage). */
    public static FaultDictionary build(Stage stage, Meter meter, List<Fault> faults) {
        StageRecognition rec = StageRecognition.of(stage);
        List<Probe> probes = probes(stage, rec);
        List<Entry> entries = new ArrayList<>();
        DcAnalysis engine = new DcAnalysis();
        Metered healthyMetered = metered(stage, probes);
        entries.add(entry(engine, stage, healthyMetered, Optional.empty(), probes, meter));
        for (Fault f : faults) {
            entries.add(entry(engine, stage, healthyMetered, Optional.of(f), probes, meter));
        }
        return new FaultDictionary(stage, meter, probes, entries);
    }

    /** The probe points: every net joining two or more pins, but ground; then the coil. */
    static List<Probe> probes(Stage stage, StageRecognition rec) {
        Connectivity c = rec.connectivity();
        if (c.pinsOn(Connectivity.GROUND).isEmpty()) {
            throw new IllegalArgumentException("stage \"" + stage.name() + "\" has no ground to measure against");
        }
        PinRef ground = representative(stage, c, Connectivity.GROUND);
        List<Probe> list = new ArrayList<>();
        for (String net : c.nets()) {
            if (net.equals(Connectivity.GROUND) || c.pinsOn(net).size() < 2) {
                // a pin on its own (an unused contact) joins nothing: there is nothing to measure
                continue;
            }
            list.add(new Probe(net, representative(stage, c, net), ground));
        }
        rec.roles().ifPresent(r -> list.add(new Probe(Probe.COIL, representative(stage, c, r.coilHighNet()),
                representative(stage, c, r.coilLowNet()))));
        return list;
    }

    /** A pin on the net, preferring pins of parts whose pins no fault renames (not diodes). */
    private static PinRef representative(Stage stage, Connectivity c, String net) {
        List<PinRef> pins = c.pinsOn(net);
        return pins.stream().filter(p -> stableKind(stage.require(p.ref()).kind())).findFirst().orElse(pins.get(0));
    }

    private static boolean stableKind(PartKind k) {
        return k != PartKind.DIODE && k != PartKind.ZENER && k != PartKind.TVS && k != PartKind.LED
                && k != PartKind.CAPACITOR;
    }

    /** The pin of a (possibly replaced) part in the faulted stage: a diode turned resistor keeps a, k becomes b. */
    private static PinRef inFaulted(Stage faulted, PinRef pin) {
        Part p = faulted.require(pin.ref());
        if (p.kind().pin(pin.pin()).isPresent()) {
            return pin;
        }
        return new PinRef(pin.ref(), pin.pin().equals("a") ? "a" : "b");
    }

    /** The healthy stage with the idle meters drawn in, and their designators. */
    private record Metered(Stage stage, Connectivity nets, List<String> meterRefs) {
    }

    private static Metered metered(Stage faulted, List<Probe> probes) {
        Connectivity fc = Connectivity.of(faulted);
        List<FaultInjector.Bridge> meters = new ArrayList<>();
        for (Probe p : probes) {
            PinRef plus = inFaulted(faulted, p.plus());
            PinRef minus = inFaulted(faulted, p.minus());
            meters.add(new FaultInjector.Bridge(fc.net(plus.ref(), plus.pin()), fc.net(minus.ref(), minus.pin()),
                    IDLE_METER_OHMS));
        }
        Stage measured = FaultInjector.bridgeAll(faulted, fc, meters);
        List<String> meterRefs = measured.parts().subList(faulted.parts().size(), measured.parts().size())
                .stream().map(Part::ref).toList();
        return new Metered(measured, Connectivity.of(measured), meterRefs);
    }

    /** True when the fault changed values only: same parts (designator, kind, placement) and wires. */
    private static boolean sameDrawing(Stage a, Stage b) {
        if (a.parts().size() != b.parts().size() || !a.wires().equals(b.wires())) {
            return false;
        }
        for (int i = 0; i < a.parts().size(); i++) {
            Part x = a.parts().get(i);
            Part y = b.parts().get(i);
            if (x.kind() != y.kind() || !x.ref().equals(y.ref()) || !x.placement().equals(y.placement())) {
                return false;
            }
        }
        return true;
    }

    private static Entry entry(DcAnalysis engine, Stage healthy, Metered healthyMetered, Optional<Fault> fault,
                               List<Probe> probes, Meter meter) {
        Stage faulted;
        Metered m;
        try {
            faulted = fault.map(f -> FaultInjector.apply(healthy, f)).orElse(healthy);
            if (fault.isEmpty()) {
                m = healthyMetered;
            } else if (sameDrawing(healthy, faulted)) {
                // a change of values only: the same drawing with the meters, so the engine patches its
                // compiled circuit instead of compiling a new one
                m = new Metered(FaultInjector.apply(healthyMetered.stage(), fault.get()), healthyMetered.nets(),
                        healthyMetered.meterRefs());
            } else {
                m = metered(faulted, probes);
            }
        } catch (IllegalStateException | IllegalArgumentException e) {
            if (fault.isEmpty()) {
                throw e;
            }
            // a drawing with no free route for the fault's or the meters' added resistors
            return new Entry(fault, null, null, "the fault could not be drawn into this stage: " + e.getMessage());
        }
        try {
            State high = state(engine, m.stage(), m.nets(), faulted, probes, m.meterRefs(), meter, true);
            State low = state(engine, m.stage(), m.nets(), faulted, probes, m.meterRefs(), meter, false);
            return new Entry(fault, high, low, "");
        } catch (SolverException e) {
            return new Entry(fault, null, null, e.getMessage() == null ? "no operating point" : e.getMessage());
        }
    }

    private static State state(DcAnalysis engine, Stage measured, Connectivity mc, Stage faulted, List<Probe> probes,
                               List<String> meterRefs, Meter meter, boolean pinHigh) {
        SolveOptions o = SolveOptions.DEFAULT.withPinHigh(pinHigh);
        OperatingPoint idle = engine.solve(measured, o);
        boolean operated = idle.relayOperated().values().stream().anyMatch(b -> b);
        boolean loadOn = false;
        for (Part p : faulted.parts()) {
            if (p.kind() == PartKind.LOAD) {
                double across = Math.abs(idle.voltage(mc.net(p.ref(), "a")) - idle.voltage(mc.net(p.ref(), "b")));
                double rail = faulted.parts().stream().filter(q -> q.kind() == PartKind.SUPPLY)
                        .mapToDouble(q -> Math.abs(q.value(ParamKeys.VOLTS))).max().orElse(0);
                loadOn |= across > 0.5 * rail && across > 0;
            }
        }
        double[] volts = new double[probes.size()];
        for (int i = 0; i < probes.size(); i++) {
            Part m = measured.require(meterRefs.get(i));
            Stage probed = measured.withPart(m.with(ParamKeys.RESISTANCE_OHMS, meter.inputOhms()));
            OperatingPoint op = engine.solve(probed, o.withStart(idle).withPreviousRelayStates(idle));
            PinRef plus = inFaulted(faulted, probes.get(i).plus());
            PinRef minus = inFaulted(faulted, probes.get(i).minus());
            volts[i] = op.voltage(mc.net(plus.ref(), plus.pin())) - op.voltage(mc.net(minus.ref(), minus.pin()));
        }
        return new State(operated, loadOn, volts);
    }

    /** The healthy stage. */
    public Stage stage() {
        return stage;
    }

    /** The meter the readings were computed for. */
    public Meter meter() {
        return meter;
    }

    /** The probe points, in the order of every {@link State#volts()}. */
    public List<Probe> probes() {
        return probes;
    }

    /** The index of a probe by name, or −1. */
    public int probeIndex(String name) {
        for (int i = 0; i < probes.size(); i++) {
            if (probes.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    /** The entries: the healthy stage first, then each fault. */
    public List<Entry> entries() {
        return entries;
    }

    /**
     * Groups of solved entries that no probe tells apart: the same symptom in both states and every
     * reading within the combined spread ({@link Spread#sigma}) of the other, ×2.
     */
    public List<List<String>> ambiguityGroups(Spread spread) {
        List<List<String>> groups = new ArrayList<>();
        boolean[] used = new boolean[entries.size()];
        for (int i = 0; i < entries.size(); i++) {
            if (used[i] || !entries.get(i).solved()) {
                continue;
            }
            List<String> g = new ArrayList<>();
            g.add(entries.get(i).name());
            used[i] = true;
            for (int j = i + 1; j < entries.size(); j++) {
                if (!used[j] && entries.get(j).solved() && alike(entries.get(i), entries.get(j), spread)) {
                    g.add(entries.get(j).name());
                    used[j] = true;
                }
            }
            groups.add(g);
        }
        return groups;
    }

    boolean alike(Entry a, Entry b, Spread spread) {
        return alike(a, b, spread, true);
    }

    /**
     * True when no probe tells the two entries apart: every reading within twice their combined
     * spread, and, if {@code relayState}, the same relay state in both pin states.
     */
    boolean alike(Entry a, Entry b, Spread spread, boolean relayState) {
        for (boolean high : new boolean[] {true, false}) {
            State sa = a.state(high);
            State sb = b.state(high);
            if (relayState && sa.operated() != sb.operated()) {
                return false;
            }
            for (int k = 0; k < probes.size(); k++) {
                double s = Math.hypot(spread.sigma(meter, sa.volts()[k]), spread.sigma(meter, sb.volts()[k]));
                if (Math.abs(sa.volts()[k] - sb.volts()[k]) > 2 * s) {
                    return false;
                }
            }
        }
        return true;
    }

    /** The roles of the healthy stage, if recognised. */
    public Optional<StageRoles> roles() {
        return StageRecognition.of(stage).roles();
    }
}
