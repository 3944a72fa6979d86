package org.armature.solver;

import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Supplier;
import org.armature.model.ParamKeys;
import org.armature.netlist.ContactState;
import org.armature.netlist.Readings;
import org.armature.netlist.Region;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.Netlist;
import org.armature.netlist.PartNetwork;
import org.armature.netlist.PartReading;
import org.armature.netlist.RelayHandle;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * An immutable DC operating point of a stage: node voltages, every part's currents, voltages,
 * power and named quantities, and the switch verdict.
 *
 * <p>The snapshot holds its own copy of the solution vector and element states; the per-part maps
 * are built from it on first access (and then kept), part by part when only some parts are asked
 * for, so a solve whose readouts nobody reads costs almost no allocation. Safe to share between
 * threads.
 *
 * <p>Every number is finite: a solve that would produce NaN or infinity throws instead.
 */
public final class OperatingPoint {

    /** A relay's contact state came from its coil current, above pick-up or below drop-out. */
    public static final String CONTACTS_FROM_COIL = "coil-current";
    /** Coil current between drop-out and pick-up: the caller's previous state was kept. */
    public static final String CONTACTS_FROM_PREVIOUS = "previous-state";
    /** Coil current between drop-out and pick-up, no previous state given: released, as after power-up. */
    public static final String CONTACTS_FROM_POWER_UP = "power-up";

    private final Netlist netlist;
    private final double[] unknowns;
    private final double[] states;
    private final boolean converged;
    private final int iterations;
    private final double maxKclResidualAmps;
    private final boolean pinHigh;
    private final double ambientCelsius;
    private final String[] contactsFrom;
    /** The switch found by the stage's roles ({@link org.armature.model.StageRecognition}); empty when none. */
    private final Optional<String> switchRef;

    private Map<String, Double> nodeVoltages;
    private Map<String, PartResult> parts;
    /** Part results built so far, by part network index; null until the first is asked for. */
    private PartResult[] built;
    /** Part readings made so far, by part network index; null until the first is asked for. */
    private PartReading[] readings;
    private Optional<SwitchVerdict> verdict;

    OperatingPoint(Netlist netlist, double[] unknowns, double[] states, boolean converged, int iterations,
                   double maxKclResidualAmps, boolean pinHigh, double ambientCelsius, String[] contactsFrom,
                   Optional<String> switchRef) {
        this.netlist = netlist;
        this.unknowns = unknowns.clone();
        this.states = states.clone();
        this.converged = converged;
        this.iterations = iterations;
        this.maxKclResidualAmps = maxKclResidualAmps;
        this.pinHigh = pinHigh;
        this.ambientCelsius = ambientCelsius;
        this.contactsFrom = contactsFrom.clone();
        this.switchRef = switchRef;
    }

    /**
     * @return true when Newton converged and the relay loop (coil temperature, contact state)
     *     settled within its tolerance; false only when the relay loop did not settle (contacts that
     *     feed their own coil, for example), never for a Newton failure (that throws)
     */
    public boolean converged() {
        return converged;
    }

    /** @return Newton iterations (linear solves) spent, over all attempts and relay-loop passes */
    public int iterations() {
        return iterations;
    }

    /** @return largest KCL residual at any node of the final solution, A */
    public double maxKclResidualAmps() {
        return maxKclResidualAmps;
    }

    /** @return the drive pin state solved */
    public boolean pinHigh() {
        return pinHigh;
    }

    /** @return the ambient solved at, °C */
    public double ambientCelsius() {
        return ambientCelsius;
    }

    /** @return voltage of every net of the drawing that has a pin, by net name, V ({@code gnd} is 0) */
    public synchronized Map<String, Double> nodeVoltages() {
        if (nodeVoltages == null) {
            Map<String, Double> m = new TreeMap<>();
            ArraySolution x = solution();
            for (Map.Entry<String, Integer> e : netlist.netNodes().entrySet()) {
                m.put(e.getKey(), x.voltage(e.getValue()));
            }
            nodeVoltages = Collections.unmodifiableMap(m);
        }
        return nodeVoltages;
    }

    /**
     * @param net a net name
     * @return its voltage, V
     * @throws IllegalArgumentException if the stage has no such net with a pin
     */
    public double voltage(String net) {
        Double v = nodeVoltages().get(net);
        if (v == null) {
            throw new IllegalArgumentException("no net " + net + "; nets are " + nodeVoltages().keySet());
        }
        return v;
    }

    /** @return every part's result, by designator, in drawing order */
    public synchronized Map<String, PartResult> parts() {
        if (parts == null) {
            Map<String, PartResult> m = new LinkedHashMap<>();
            List<PartNetwork> all = netlist.parts();
            for (int i = 0; i < all.size(); i++) {
                m.put(all.get(i).ref(), result(i));
            }
            parts = Collections.unmodifiableMap(m);
        }
        return parts;
    }

    /**
     * One part's result; only that part is read from the solution (the checks read two or three
     * parts of each of thousands of operating points).
     *
     * @param ref a designator
     * @return that part's result
     */
    public synchronized Optional<PartResult> part(String ref) {
        if (parts != null) {
            return Optional.ofNullable(parts.get(ref));
        }
        int i = netlist.partIndex(ref);
        return i < 0 ? Optional.empty() : Optional.of(result(i));
    }

    /**
     * One named quantity of one part, read without building the part's full result.
     *
     * @param ref a designator
     * @param key a quantity key of that part's kind (as in {@link PartResult#quantities()})
     * @return the value, in the quantity's unit
     * @throws IllegalArgumentException if there is no such part or quantity
     */
    public synchronized double quantity(String ref, String key) {
        Double v = reading(index(ref)).quantities().get(key);
        if (v == null) {
            throw new IllegalArgumentException(ref + " has no quantity " + key);
        }
        return v;
    }

    /**
     * @param ref a designator
     * @return the power that part dissipates, W (as {@link PartResult#powerWatts()})
     * @throws IllegalArgumentException if there is no such part
     */
    public synchronized double powerWatts(String ref) {
        return reading(index(ref)).powerWatts();
    }

    private int index(String ref) {
        int i = netlist.partIndex(ref);
        if (i < 0) {
            throw new IllegalArgumentException("no part " + ref);
        }
        return i;
    }

    /** The reading of part network {@code index}, made on first use and kept. */
    private PartReading reading(int index) {
        if (readings == null) {
            readings = new PartReading[netlist.parts().size()];
        }
        PartReading r = readings[index];
        if (r == null) {
            r = netlist.parts().get(index).read(solution());
            readings[index] = r;
        }
        return r;
    }

    /** The result of part network {@code index}, built on first use and kept. */
    private PartResult result(int index) {
        if (built == null) {
            built = new PartResult[netlist.parts().size()];
        }
        PartResult done = built[index];
        if (done != null) {
            return done;
        }
        PartNetwork p = netlist.parts().get(index);
        ArraySolution x = solution();
        PartReading r = reading(index);
        Map<String, Double> pinV = new LinkedHashMap<>();
        for (Map.Entry<String, Integer> e : p.pinNodes().entrySet()) {
            pinV.put(e.getKey(), x.voltage(e.getValue()));
        }
        Map<String, String> st = r.states();
        if (p.relay().isPresent()) {
            st = new HashMap<>(st);
            st.put(Readings.CONTACTS_FROM, contactsFrom[netlist.relays().indexOf(p.relay().get())]);
        }
        PartResult made = new PartResult(p.ref(), p.part().kind(), pinV, r.pinCurrents(), r.powerWatts(),
                r.quantities(), st);
        built[index] = made;
        return made;
    }

    /**
     * @param ref a designator
     * @return that part's result
     * @throws IllegalArgumentException if there is no such part
     */
    public PartResult requirePart(String ref) {
        return part(ref).orElseThrow(() -> new IllegalArgumentException("no part " + ref));
    }

    /** @return the state of every relay's contacts as solved, by designator (true = operated) */
    public Map<String, Boolean> relayOperated() {
        Map<String, Boolean> m = new TreeMap<>();
        for (RelayHandle h : netlist.relays()) {
            m.put(h.ref(), ContactState.of(states[h.contactSlot()]).operated());
        }
        return m;
    }

    /**
     * @return the verdict on the switch the stage's roles name (whatever its designator, wherever it
     *     is drawn, with or without test points), empty when the stage has none
     */
    public synchronized Optional<SwitchVerdict> switchVerdict() {
        if (verdict == null) {
            verdict = computeVerdict();
        }
        return verdict;
    }

    /** @return node names and values of the solution vector, for a start guess */
    /**
     * The solution's node voltages by the netlist's node names, internal nodes included (for a
     * warm start of another engine on the same stage, such as the transient run's operating point).
     *
     * @return node name to voltage, V
     */
    public Map<String, Double> unknownsByNodeName() {
        Map<String, Double> m = new HashMap<>();
        for (int i = 0; i < netlist.nodeCount(); i++) {
            m.put(netlist.nodeName(i), unknowns[i]);
        }
        return m;
    }

    Netlist netlist() {
        return netlist;
    }

    /** Copies the solution vector into {@code x} when the netlist has the same shape; false otherwise. */
    boolean copyUnknownsInto(Netlist other, double[] x) {
        if (other.unknownCount() == unknowns.length && netlist.sameShape(other)) {
            System.arraycopy(unknowns, 0, x, 0, unknowns.length);
            return true;
        }
        return false;
    }

    /** @return true if this point's state slots line up with those of {@code other} */
    boolean sameStateLayout(Netlist other) {
        return other.stateCount() == states.length && netlist.sameShape(other);
    }

    /** @return the value of one state slot of the solution */
    double stateValue(int slot) {
        return states[slot];
    }

    private ArraySolution solution() {
        return new ArraySolution(netlist.nodeCount(), unknowns, states);
    }

    private Optional<SwitchVerdict> computeVerdict() {
        if (switchRef.isEmpty()) {
            return Optional.empty();
        }
        int i = netlist.partIndex(switchRef.get());
        if (i < 0) {
            return Optional.empty();
        }
        return Optional.of(verdictFor(netlist.parts().get(i).part(), result(i)));
    }

    private static String amps(double a) {
        return EngineeringNotation.format(a, Unit.AMPERE);
    }

    private static String volts(double v) {
        return EngineeringNotation.format(v, Unit.VOLT);
    }

    private static String times(double m) {
        return String.format(java.util.Locale.ROOT, "×%.2g", m);
    }

    static SwitchVerdict verdictFor(Part part, PartResult r) {
        String ref = part.ref();
        PartKind kind = part.kind();
        if (kind == PartKind.NMOS) {
            double vgs = r.quantity(Readings.VGS);
            double id = r.quantity(Readings.ID);
            if (r.region().orElse(Region.CUTOFF) == Region.CUTOFF || !(id > 0)) {
                return new SwitchVerdict(ref, false, 0.0, () -> ref + " is off: VGS " + volts(vgs) + " is below threshold.");
            }
            double thMax = part.value(ParamKeys.VGS_TH_MAX_VOLTS);
            double rdsOn = part.value(ParamKeys.RDS_ON_OHMS);
            double spec = part.value(ParamKeys.RDS_ON_GATE_VOLTS);
            double needed = (spec - thMax) + id * rdsOn / 2.0;
            if (!(spec > thMax)) {
                return new SwitchVerdict(ref, false, 0.0, () -> ref + " RDS(on) is stated at VGS " + volts(spec)
                        + ", not above VGS(th) max " + volts(thMax) + ": the datasheet guarantees no on-state.");
            }
            double available = Math.max(0.0, vgs - thMax);
            double margin = available / needed;
            boolean on = margin >= 1.0;
            Supplier<String> reason = () -> on
                    ? "fully on, " + times(margin) + " margin: gate overdrive " + volts(vgs - thMax)
                            + " over VGS(th) max against " + volts(needed) + " needed for " + amps(id)
                            + " at RDS(on) " + EngineeringNotation.format(rdsOn, Unit.OHM) + "."
                    : "not guaranteed on: gate overdrive " + volts(vgs - thMax) + " over VGS(th) max, "
                            + volts(needed) + " needed for " + amps(id) + " (RDS(on) is stated at VGS "
                            + volts(spec) + ").";
            return new SwitchVerdict(ref, on, margin, reason);
        }
        boolean darlington = kind == PartKind.DARLINGTON;
        double ic = r.quantity(Readings.IC);
        double drive = r.quantity(darlington ? Readings.IIN : Readings.IB);
        double hfeMin = part.value(ParamKeys.HFE_MIN);
        if (r.region().orElse(Region.CUTOFF) == Region.CUTOFF || !(ic > 0) || !(drive > 0)) {
            return new SwitchVerdict(ref, false, 0.0, () -> ref + " is cut off: " + (darlington ? "input" : "base")
                    + " current " + amps(Math.max(drive, 0.0)) + ", the coil is not energised.");
        }
        double margin = hfeMin * drive / ic;
        double neededDrive = ic / hfeMin;
        String driveName = darlington ? "IIN" : "IB";
        boolean on = margin >= 1.0;
        Supplier<String> reason = () -> on
                ? "saturated, " + times(margin) + " margin: hFE(min) " + String.format(java.util.Locale.ROOT, "%.4g", hfeMin)
                        + " × " + driveName + " " + amps(drive) + " ÷ IC " + amps(ic) + "."
                : "not guaranteed saturated at hFE(min): needs " + amps(neededDrive - drive) + " more " + (darlington ? "input" : "base")
                        + " current (" + driveName + " " + amps(drive) + ", IC/hFE(min) = " + amps(neededDrive) + ").";
        return new SwitchVerdict(ref, on, margin, reason);
    }
}
