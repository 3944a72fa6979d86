package org.armature.netlist;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.ParamKeys;
import org.armature.devices.Bjt;
import org.armature.devices.BjtParams;
import org.armature.devices.BjtPolarity;
import org.armature.devices.Diode;
import org.armature.devices.DiodeParams;
import org.armature.devices.GateStepOptions;
import org.armature.devices.Mosfet;
import org.armature.devices.MosfetParams;
import org.armature.devices.RelayThresholds;
import org.armature.model.Connectivity;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.PinSpec;
import org.armature.model.Stage;
import org.armature.units.PhysicalConstants;

/**
 * Builds a {@link Netlist}: either element by element (tests, other analyses) or by flattening a
 * {@link Stage} with {@link #flatten(Stage, FlattenOptions)}.
 *
 * <p>Flattening: one node per net of the drawing that has at least one pin (from
 * {@link Connectivity}; {@code gnd} is the reference), plus internal nodes for series
 * resistances. Per kind:
 * <ul>
 * <li>drive pin: Thevenin source (level from the pin state, output resistance) to ground, stamped
 *     as its Norton equivalent; supply: ideal voltage source to ground;</li>
 * <li>resistor, load: a resistor; capacitor: open at DC;</li>
 * <li>diode, zener: Shockley junction with breakdown plus series resistance; LED: junction fitted to
 *     its forward point; TVS: bidirectional clamp plus its dynamic resistance;</li>
 * <li>NPN, PNP: Ebers–Moll/Gummel–Poon transistor plus RB, RC, RE;</li>
 * <li>NMOS: Shichman–Hodges channel plus the body diode from source to drain;</li>
 * <li>Darlington channel: input resistor, two NPNs (the first one's emitter drives the second's
 *     base, both collectors joined and reaching the output through the output transistor's
 *     collector resistance), a resistor across each base–emitter, and the clamp diode from the
 *     output to the common pin;</li>
 * <li>relay: coil resistance between A1 and A2 at the coil temperature, contacts com–no and com–nc
 *     as small or large resistances switched by the relay state.</li>
 * </ul>
 * Every semiconductor sits at the ambient of {@link FlattenOptions}. Parameters hold at 25 °C
 * (datasheet conditions).
 */
public final class NetlistBuilder {

    /** Current at which an LED load's forward voltage is stated, amperes (typical indicator LED, 10 mA). */
    static final double LED_LOAD_FIT_AMPS = 0.010;

    private static final String GND = Connectivity.GROUND;

    /** The collections of a fresh build; empty and unused when re-flattening (then {@link #base} numbers everything). */
    private final List<String> nodeNames;
    private final Map<String, Integer> nodeByName;
    private final List<String> branchNames;
    private final List<Double> states;
    private final List<Element> elements;
    private final List<PartNetwork> parts;
    private final Map<String, Integer> netNodes;

    /** Re-flattening into an existing numbering ({@link #reflatten}); null when building afresh. */
    private final Netlist base;
    private final double[] baseStates;
    private int patchBranch;
    private int patchState;
    private int patchElement;
    private boolean grew;
    private PartNetwork patched;

    /** An empty builder. */
    public NetlistBuilder() {
        this.nodeNames = new ArrayList<>();
        this.nodeByName = new HashMap<>();
        this.branchNames = new ArrayList<>();
        this.states = new ArrayList<>();
        this.elements = new ArrayList<>();
        this.parts = new ArrayList<>();
        this.netNodes = new LinkedHashMap<>();
        netNodes.put(GND, Netlist.GROUND);
        this.base = null;
        this.baseStates = null;
    }

    /** A builder that re-flattens parts of {@code base} into its numbering, writing state values into {@code states}. */
    private NetlistBuilder(Netlist base, double[] states) {
        this.nodeNames = List.of();
        this.nodeByName = Map.of();
        this.branchNames = List.of();
        this.states = List.of();
        this.elements = List.of();
        this.parts = List.of();
        this.netNodes = Map.of();
        this.base = base;
        this.baseStates = states;
    }

    /**
     * The node of a name, created on first use; {@code gnd} is {@link Netlist#GROUND}.
     *
     * @param name node name
     * @return node index
     */
    public int node(String name) {
        if (name.equals(GND)) {
            return Netlist.GROUND;
        }
        if (base != null) {
            int i = base.nodeIndex(name);
            if (i == Netlist.GROUND) {
                grew = true;
                return base.nodeCount();
            }
            return i;
        }
        Integer existing = nodeByName.get(name);
        if (existing != null) {
            return existing;
        }
        int index = nodeNames.size();
        nodeNames.add(name);
        nodeByName.put(name, index);
        return index;
    }

    /**
     * A node that is a net of the drawing (it appears in {@link Netlist#netNodes()}).
     *
     * @param net net name
     * @return node index
     */
    public int net(String net) {
        int n = node(net);
        if (base == null) {
            netNodes.put(net, n);
        }
        return n;
    }

    /**
     * @param owner label of the element that owns the branch, for messages
     * @return a new branch number
     */
    public int allocateBranch(String owner) {
        if (base != null) {
            return patchBranch++;
        }
        branchNames.add(owner);
        return branchNames.size() - 1;
    }

    /**
     * @param initialValue the slot's value before any solve
     * @return a new state slot
     */
    public int allocateState(double initialValue) {
        if (base != null) {
            if (patchState < baseStates.length) {
                baseStates[patchState] = initialValue;
            } else {
                grew = true;
            }
            return patchState++;
        }
        states.add(initialValue);
        return states.size() - 1;
    }

    /**
     * Adds an element that belongs to no part.
     *
     * @param e the element
     * @return this builder
     */
    public NetlistBuilder add(Element e) {
        elements.add(e);
        return this;
    }

    /** @return the netlist built so far */
    public Netlist build() {
        if (base != null) {
            throw new IllegalStateException("a re-flattening builder does not build");
        }
        double[] s = new double[states.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = states.get(i);
        }
        return new Netlist(nodeNames, branchNames, s, elements, parts, netNodes);
    }

    /**
     * Flattens a stage.
     *
     * @param stage the stage
     * @param options pin state, ambient, initial relay state and model details
     * @return the netlist
     */
    public static Netlist flatten(Stage stage, FlattenOptions options) {
        return flatten(stage, Connectivity.of(stage), options);
    }

    /**
     * Flattens a stage whose connectivity is already known.
     *
     * @param stage the stage
     * @param connectivity its nets
     * @param options pin state, ambient, initial relay state and model details
     * @return the netlist
     */
    public static Netlist flatten(Stage stage, Connectivity connectivity, FlattenOptions options) {
        NetlistBuilder b = new NetlistBuilder();
        // nets with pins, in the connectivity's order so node numbering is stable
        java.util.Set<String> used = new java.util.HashSet<>(connectivity.netOfPin().values());
        for (String net : connectivity.nets()) {
            if (used.contains(net)) {
                b.net(net);
            }
        }
        for (Part part : stage.parts()) {
            Map<String, Integer> pins = new LinkedHashMap<>();
            for (PinSpec pin : part.kind().pins()) {
                pins.put(pin.name(), b.net(connectivity.netOfPin().get(new PinRef(part.ref(), pin.name()))));
            }
            new PartFlattener(b, part, pins, options).flatten();
        }
        return b.build();
    }

    /**
     * Re-flattens some parts of a stage that was flattened into {@code netlist}, keeping its node,
     * branch and state numbering, so that a value change costs one part's elements instead of a
     * whole flatten. The stage must have the same topology as the one flattened (the same parts in
     * the same order with the same kinds, pins and wires); part {@code i} of the stage is part
     * network {@code i} of the netlist.
     *
     * <p>A re-flattened part must have exactly the structure it had: the same element classes on the
     * same terminals, the same internal nodes, branches and state slots (a series resistance set to
     * zero removes an internal node, for example). Then the structural checks of the old netlist
     * still hold for the new one.
     *
     * @param netlist the netlist of the earlier flatten
     * @param stage the stage with new values
     * @param options flatten options of the new netlist (pin state and ambient may differ)
     * @param partIndices indices of the parts to re-flatten
     * @return the netlist with those parts replaced (the others shared), or empty when some part's
     *     structure would change: then flatten the stage anew
     */
    public static Optional<Netlist> reflatten(Netlist netlist, Stage stage, FlattenOptions options, int... partIndices) {
        return reflatten(netlist, stage, options, null, partIndices);
    }

    /**
     * {@link #reflatten(Netlist, Stage, FlattenOptions, int...)} that takes the part networks of a
     * donor instead of flattening them again where that gives the same result: the donor is a
     * netlist of the same numbering flattened from the same stage with options that differ at most
     * in the pin state (the DC engine's other pin state); every part whose flattening does not
     * depend on the pin state ({@link #flattensWithPinState}) and whose donor network was made from
     * an equal part is shared. Element objects are then shared by both netlists: they may be used
     * by one thread in turn (every run begins its elements afresh), not at the same time.
     *
     * @param netlist the netlist of the earlier flatten
     * @param stage the stage with new values
     * @param options flatten options of the new netlist
     * @param donor the other netlist as described, or {@code null} for none
     * @param partIndices indices of the parts to re-flatten
     * @return as {@link #reflatten(Netlist, Stage, FlattenOptions, int...)}
     */
    public static Optional<Netlist> reflatten(Netlist netlist, Stage stage, FlattenOptions options, Netlist donor,
                                              int... partIndices) {
        List<PartNetwork> old = netlist.parts();
        List<PartNetwork> given = donor != null && donor.sameShape(netlist) && donor.parts().size() == old.size()
                ? donor.parts() : null;
        if (stage.parts().size() != old.size()) {
            return Optional.empty();
        }
        PartNetwork[] replacements = new PartNetwork[old.size()];
        double[] states = netlist.initialStates();
        NetlistBuilder b = new NetlistBuilder(netlist, states);
        for (int index : partIndices) {
            if (index < 0 || index >= old.size()) {
                return Optional.empty();
            }
            Part part = stage.parts().get(index);
            PartNetwork was = old.get(index);
            if (!part.ref().equals(was.ref()) || part.kind() != was.part().kind()) {
                return Optional.empty();
            }
            if (given != null && !flattensWithPinState(part.kind())) {
                PartNetwork d = given.get(index);
                if (d.firstElement() == was.firstElement() && d.firstState() == was.firstState()
                        && (d.part() == part || d.part().equals(part)) && sameStructure(was, d)) {
                    for (int k = 0; k < d.stateCount(); k++) {
                        states[d.firstState() + k] = donor.initialState(d.firstState() + k);
                    }
                    replacements[index] = d;
                    continue;
                }
            }
            b.patchBranch = was.firstBranch();
            b.patchState = was.firstState();
            b.patchElement = was.firstElement();
            b.patched = null;
            new PartFlattener(b, part, was.pinNodes(), options).flatten();
            PartNetwork now = b.patched;
            if (b.grew || now == null || !sameStructure(was, now)) {
                return Optional.empty();
            }
            replacements[index] = now;
        }
        return Optional.of(netlist.withParts(replacements, states));
    }

    /**
     * Whether the flattening of a kind depends on the ambient of {@link FlattenOptions}: the
     * semiconductors sit at the ambient and a relay's coil starts at it; supplies, drive pins,
     * resistors, loads, capacitors and ground do not. An ambient change re-flattens only the kinds
     * for which this is true.
     *
     * @param kind a part kind
     * @return true if its elements or readings change with the ambient
     */
    public static boolean flattensWithAmbient(PartKind kind) {
        return switch (kind) {
            case GROUND, SUPPLY, DRIVE_PIN, RESISTOR, LOAD, CAPACITOR -> false;
            default -> true;
        };
    }

    /**
     * Whether the flattening of a kind depends on the drive pin state of {@link FlattenOptions}:
     * only the drive pin's own source does.
     *
     * @param kind a part kind
     * @return true if its elements or readings change with the pin state
     */
    public static boolean flattensWithPinState(PartKind kind) {
        return kind == PartKind.DRIVE_PIN;
    }

    private static boolean sameStructure(PartNetwork a, PartNetwork b) {
        if (a.branchCount() != b.branchCount() || a.stateCount() != b.stateCount()
                || a.relay().isPresent() != b.relay().isPresent()) {
            return false;
        }
        List<Element> ea = a.elements();
        List<Element> eb = b.elements();
        if (ea.size() != eb.size()) {
            return false;
        }
        for (int k = 0; k < ea.size(); k++) {
            Element x = ea.get(k);
            Element y = eb.get(k);
            if (x.getClass() != y.getClass() || !Arrays.equals(x.terminals(), y.terminals())) {
                return false;
            }
        }
        return true;
    }

    private int branchCursor() {
        return base != null ? patchBranch : branchNames.size();
    }

    private int stateCursor() {
        return base != null ? patchState : states.size();
    }

    void addPart(Part part, Map<String, Integer> pins, List<Element> els, PartNetwork.Reader reader, RelayHandle relay,
                 int firstBranch, int firstState) {
        int firstElement = base != null ? patchElement : elements.size();
        PartNetwork p = new PartNetwork(part, pins, els, reader, relay, firstElement, firstBranch,
                branchCursor() - firstBranch, firstState, stateCursor() - firstState);
        if (base != null) {
            patched = p;
            return;
        }
        parts.add(p);
        elements.addAll(p.elements());
    }

    /** Flattens one part. */
    private static final class PartFlattener {
        /**
         * The builder, until the part is added: the part's reader (a lambda over this flattener)
         * outlives the build, and must not hold the builder, whose re-flatten base would otherwise
         * keep every earlier netlist alive in a chain.
         */
        private NetlistBuilder b;
        private final Part part;
        private final Map<String, Integer> pins;
        private final FlattenOptions o;
        private final double kelvin;
        private final List<Element> els = new ArrayList<>();
        private final int firstBranch;
        private final int firstState;

        PartFlattener(NetlistBuilder b, Part part, Map<String, Integer> pins, FlattenOptions o) {
            this.b = b;
            this.firstBranch = b.branchCursor();
            this.firstState = b.stateCursor();
            this.part = part;
            this.pins = pins;
            this.o = o;
            this.kelvin = PhysicalConstants.celsiusToKelvin(o.ambientCelsius());
        }

        private String ref() {
            return part.ref();
        }

        private int pin(String name) {
            return pins.get(name);
        }

        private double v(String key) {
            return part.value(key);
        }

        /** A series resistance from a pin node to a new internal node, or the pin node itself when zero. */
        private int series(int outer, double ohms, String role) {
            if (!(ohms > 0)) {
                return outer;
            }
            int inner = b.node(ref() + "." + role);
            els.add(new Resistor(ref() + " " + role + " resistance", outer, inner, ohms));
            return inner;
        }

        private void done(PartNetwork.Reader reader, RelayHandle relay) {
            b.addPart(part, pins, els, reader, relay, firstBranch, firstState);
            b = null;
        }

        void flatten() {
            switch (part.kind()) {
                case GROUND -> done(x -> new PartReading(Map.of(), Map.of(), Map.of("g", 0.0), 0.0), null);
                case SUPPLY -> supply();
                case DRIVE_PIN -> drivePin();
                case RESISTOR -> resistor();
                case LOAD -> load();
                case CAPACITOR -> capacitor();
                case DIODE, ZENER -> diode(junctionParams());
                case LED -> diode(DiodeParams.fromForwardPoint(v(ParamKeys.FORWARD_VOLTS), v(ParamKeys.FORWARD_CURRENT_AMPS),
                        v(ParamKeys.EMISSION_COEFFICIENT), DiodeParams.DATASHEET_TEMPERATURE_KELVIN));
                case TVS -> tvs();
                case NPN -> bjt(BjtPolarity.NPN);
                case PNP -> bjt(BjtPolarity.PNP);
                case NMOS -> nmos();
                case DARLINGTON -> darlington();
                case RELAY -> relay();
                default -> throw new IllegalStateException("no netlist model for " + part.kind());
            }
        }

        private void supply() {
            int p = pin("p");
            int branch = b.allocateBranch(ref());
            VoltageSource src = new VoltageSource(ref(), p, Netlist.GROUND, branch, v(ParamKeys.VOLTS));
            els.add(src);
            done(x -> {
                double sourced = -x.branchCurrent(branch);
                double volts = x.voltage(p);
                return new PartReading(Map.of(Readings.CURRENT, sourced, Readings.VOLTS, volts, Readings.DELIVERED_POWER, volts * sourced),
                        Map.of(), Map.of("p", -sourced), -volts * sourced);
            }, null);
        }

        private void drivePin() {
            int out = pin("out");
            double level = o.pinHigh() ? v(ParamKeys.HIGH_VOLTS) : v(ParamKeys.LOW_VOLTS);
            NortonSource src = new NortonSource(ref(), out, Netlist.GROUND, level, v(ParamKeys.OUTPUT_RESISTANCE_OHMS));
            els.add(src);
            done(x -> {
                double i = src.currentOut(x, 1.0);
                double volts = x.voltage(out);
                return new PartReading(Map.of(Readings.CURRENT, i, Readings.VOLTS, volts, Readings.DELIVERED_POWER, volts * i),
                        Map.of(), Map.of("out", -i), -volts * i);
            }, null);
        }

        private void resistor() {
            int a = pin("a");
            int bb = pin("b");
            Resistor r = new Resistor(ref(), a, bb, v(ParamKeys.RESISTANCE_OHMS));
            els.add(r);
            done(x -> twoTerminal(x, a, bb, r.current(x), "a", "b"), null);
        }

        /**
         * A contact-side load: its steady resistance, or for an LED load the series resistor and an LED
         * fitted through its forward voltage at {@value #LED_LOAD_FIT_AMPS} A (emission coefficient 2,
         * typical indicator LED) at the datasheet temperature, so that the load stays independent of the
         * ambient like the other loads.
         */
        private void load() {
            if (!"led".equals(part.option("loadKind"))) {
                resistor();
                return;
            }
            int a = pin("a");
            int bb = pin("b");
            int ai = series(a, v("resistanceOhms"), "resistor");
            DiodeParams led = DiodeParams.fromForwardPoint(v("forwardVolts"), LED_LOAD_FIT_AMPS, 2.0,
                    DiodeParams.DATASHEET_TEMPERATURE_KELVIN);
            JunctionElement j = new JunctionElement(ref(), ai, bb, new Diode(led), DiodeParams.DATASHEET_TEMPERATURE_KELVIN,
                    o.junctionGminSiemens());
            els.add(j);
            done(x -> twoTerminal(x, a, bb, j.current(x), "a", "b"), null);
        }

        private void capacitor() {
            int a = pin("a");
            int bb = pin("b");
            els.add(new Capacitor(ref(), a, bb, v(ParamKeys.CAPACITANCE_FARADS)));
            done(x -> twoTerminal(x, a, bb, 0.0, "a", "b"), null);
        }

        private DiodeParams junctionParams() {
            return DeviceParameters.junction(part);
        }

        private void diode(DiodeParams params) {
            int a = pin("a");
            int k = pin("k");
            double rs = part.kind().param(ParamKeys.SERIES_RESISTANCE_OHMS).isPresent() ? v(ParamKeys.SERIES_RESISTANCE_OHMS) : 0.0;
            int ai = series(a, rs, "series");
            JunctionElement j = new JunctionElement(ref(), ai, k, new Diode(params), kelvin, o.junctionGminSiemens());
            els.add(j);
            done(x -> twoTerminal(x, a, k, j.current(x), "a", "k"), null);
        }

        private void tvs() {
            int a = pin("a");
            int bb = pin("b");
            int ai = series(a, v(ParamKeys.CLAMP_RESISTANCE_OHMS), "clamp");
            DiodeParams params = DiodeParams.junction(TVS_LIMITING_SATURATION_AMPS, 1.0)
                    .asBidirectionalClamp(v(ParamKeys.BREAKDOWN_VOLTS), v(ParamKeys.BREAKDOWN_CURRENT_AMPS), 1.0);
            JunctionElement j = new JunctionElement(ref(), ai, bb, new Diode(params), kelvin, o.junctionGminSiemens());
            els.add(j);
            done(x -> twoTerminal(x, a, bb, j.current(x), "a", "b"), null);
        }

        private PartReading twoTerminal(Solution x, int a, int bb, double current, String pa, String pb) {
            double volts = x.voltage(a) - x.voltage(bb);
            return new PartReading(Map.of(Readings.CURRENT, current, Readings.VOLTAGE, volts, Readings.POWER, volts * current),
                    Map.of(), Map.of(pa, current, pb, -current), volts * current);
        }

        private void bjt(BjtPolarity polarity) {
            BjtParams params = DeviceParameters.bjt(part);
            int c = pin("c");
            int bb = pin("b");
            int e = pin("e");
            int ci = series(c, params.collectorResistanceOhms(), "c'");
            int bi = series(bb, params.baseResistanceOhms(), "b'");
            int ei = series(e, params.emitterResistanceOhms(), "e'");
            BjtElement q = new BjtElement(ref(), ci, bi, ei, new Bjt(params), kelvin, o.junctionGminSiemens());
            els.add(q);
            double sign = polarity.sign();
            RegionThresholds rt = o.regions();
            done(x -> {
                double[] i = new double[3];
                q.terminalCurrents(x, i);
                double ic = sign * i[0];
                double ib = sign * i[1];
                double vce = sign * (x.voltage(c) - x.voltage(e));
                double vbe = sign * (x.voltage(bb) - x.voltage(e));
                double power = x.voltage(c) * i[0] + x.voltage(bb) * i[1] + x.voltage(e) * i[2];
                Region region = bipolarRegion(sign * q.vbe(x), sign * q.vbc(x), rt);
                Map<String, Double> qs = new HashMap<>();
                qs.put(Readings.IC, ic);
                qs.put(Readings.IB, ib);
                qs.put(Readings.VCE, vce);
                qs.put(Readings.VBE, vbe);
                qs.put(Readings.FORCED_BETA, ib > 0 ? ic / ib : 0.0);
                qs.put(Readings.POWER, power);
                return new PartReading(qs, Map.of(Readings.REGION, region.key()), Map.of("c", i[0], "b", i[1], "e", i[2]), power);
            }, null);
        }

        private void nmos() {
            MosfetParams params = DeviceParameters.mosfet(part);
            int d = pin("d");
            int g = pin("g");
            int s = pin("s");
            Mosfet device = new Mosfet(params);
            MosfetElement m = new MosfetElement(ref(), d, g, s, device, kelvin, o.junctionGminSiemens(),
                    GateStepOptions.DEFAULTS);
            JunctionElement body = new JunctionElement(ref() + " body diode", s, d, new Diode(params.bodyDiode()),
                    kelvin, o.junctionGminSiemens());
            els.add(m);
            els.add(body);
            double threshold = device.thresholdAt(kelvin);
            done(x -> {
                double id = m.drainCurrent(x) - body.current(x);
                double vgs = x.voltage(g) - x.voltage(s);
                double vds = x.voltage(d) - x.voltage(s);
                double power = vds * id;
                Region region = vgs <= threshold ? Region.CUTOFF
                        : (Math.abs(vds) < vgs - threshold ? Region.TRIODE : Region.SATURATION);
                return new PartReading(Map.of(Readings.ID, id, Readings.VGS, vgs, Readings.VDS, vds, Readings.POWER, power),
                        Map.of(Readings.REGION, region.key()), Map.of("d", id, "g", 0.0, "s", -id), power);
            }, null);
        }

        private void darlington() {
            int in = pin("in");
            int out = pin("out");
            int com = pin("com");
            int e = pin("e");
            DarlingtonInternals di = o.darlington();
            BjtParams tp = BjtParams.ebersMoll(BjtPolarity.NPN, v(ParamKeys.SATURATION_CURRENT_AMPS), v(ParamKeys.BETA_FORWARD),
                    di.betaReverse());
            BjtParams tp1 = tp.withKneeCurrents(di.driverKneeCurrentAmps(), Double.POSITIVE_INFINITY);
            BjtParams tp2 = tp.withKneeCurrents(di.outputKneeCurrentAmps(), Double.POSITIVE_INFINITY);
            int b1 = b.node(ref() + ".b1");
            int b2 = b.node(ref() + ".b2");
            els.add(new Resistor(ref() + " input resistor", in, b1, v(ParamKeys.INPUT_RESISTANCE_OHMS)));
            els.add(new Resistor(ref() + " Q1 base-emitter resistor", b1, b2, v(ParamKeys.FIRST_BASE_EMITTER_OHMS)));
            els.add(new Resistor(ref() + " Q2 base-emitter resistor", b2, e, v(ParamKeys.SECOND_BASE_EMITTER_OHMS)));
            // the output resistance is the collector lead both transistors share (joined collectors
            // behind it): VCE(sat) = IC·R + VCE(sat) of Q1 + VBE of Q2, the shape of array datasheets
            int c2 = series(out, v(ParamKeys.COLLECTOR_RESISTANCE_OHMS), "c2");
            BjtElement q1 = new BjtElement(ref() + " Q1", c2, b1, b2, new Bjt(tp1), kelvin, o.junctionGminSiemens());
            BjtElement q2 = new BjtElement(ref() + " Q2", c2, b2, e, new Bjt(tp2), kelvin, o.junctionGminSiemens());
            JunctionElement clamp = new JunctionElement(ref() + " clamp diode", out, com,
                    new Diode(DiodeParams.junction(di.clampSaturationCurrentAmps(), di.clampEmissionCoefficient())),
                    kelvin, o.junctionGminSiemens());
            els.add(q1);
            els.add(q2);
            els.add(clamp);
            double rin = v(ParamKeys.INPUT_RESISTANCE_OHMS);
            RegionThresholds rt = o.regions();
            done(x -> {
                double iin = (x.voltage(in) - x.voltage(b1)) / rin;
                double iclamp = clamp.current(x);
                double[] i1 = new double[3];
                double[] i2 = new double[3];
                q1.terminalCurrents(x, i1);
                q2.terminalCurrents(x, i2);
                double ic = i1[0] + i2[0] + iclamp;
                double ie = -(iin + ic - iclamp);
                double vce = x.voltage(out) - x.voltage(e);
                double vin = x.voltage(in) - x.voltage(e);
                double power = x.voltage(in) * iin + x.voltage(out) * ic + x.voltage(com) * (-iclamp) + x.voltage(e) * ie;
                Region region;
                if (q2.vbe(x) < rt.junctionOnVolts()) {
                    region = Region.CUTOFF;
                } else if (q1.vbc(x) >= rt.saturationBaseCollectorVolts()) {
                    region = Region.SATURATION;
                } else {
                    region = Region.ACTIVE;
                }
                return new PartReading(Map.of(Readings.IC, ic, Readings.IIN, iin, Readings.VCE, vce, Readings.VIN, vin, Readings.POWER, power),
                        Map.of(Readings.REGION, region.key()), Map.of("in", iin, "out", ic, "com", -iclamp, "e", ie), power);
            }, null);
        }

        private void relay() {
            int a1 = pin("a1");
            int a2 = pin("a2");
            int com = pin("com");
            int no = pin("no");
            int nc = pin("nc");
            double rRef = v(ParamKeys.COIL_RESISTANCE_OHMS);
            int tempSlot = b.allocateState(o.ambientCelsius());
            int contactSlot = b.allocateState(o.relayOperated() ? 1.0 : 0.0);
            RelayCoil coil = new RelayCoil(ref(), a1, a2, rRef, v(ParamKeys.REFERENCE_TEMPERATURE_CELSIUS), tempSlot);
            SwitchedResistor toNo = new SwitchedResistor(ref() + " contact com-no", com, no, contactSlot, true, o.contacts());
            SwitchedResistor toNc = new SwitchedResistor(ref() + " contact com-nc", com, nc, contactSlot, false, o.contacts());
            Resistor insulation = new Resistor(ref() + " coil-contact insulation", com, a2, o.contacts().insulationOhms());
            els.add(coil);
            els.add(toNo);
            els.add(toNc);
            els.add(insulation);
            RelayHandle handle = new RelayHandle(ref(), coil, tempSlot, contactSlot,
                    v(ParamKeys.COIL_THERMAL_RESISTANCE_KELVIN_PER_WATT),
                    RelayThresholds.fromVolts(v(ParamKeys.MUST_OPERATE_VOLTS), v(ParamKeys.MUST_RELEASE_VOLTS), rRef));
            done(x -> {
                double coilT = x.state(tempSlot);
                double i = coil.current(x);
                double vCoil = x.voltage(a1) - x.voltage(a2);
                double iNo = toNo.current(x);
                double iNc = toNc.current(x);
                double iIns = insulation.current(x);
                double power = vCoil * i + (x.voltage(com) - x.voltage(no)) * iNo + (x.voltage(com) - x.voltage(nc)) * iNc
                        + (x.voltage(com) - x.voltage(a2)) * iIns;
                Map<String, Double> qs = new HashMap<>();
                qs.put(Readings.COIL_CURRENT, i);
                qs.put(Readings.COIL_VOLTAGE, vCoil);
                qs.put(Readings.COIL_RESISTANCE, coil.ohmsAt(coilT));
                qs.put(Readings.COIL_TEMPERATURE, coilT);
                qs.put(Readings.PICK_UP_CURRENT, handle.pickUpAmps());
                qs.put(Readings.DROP_OUT_CURRENT, handle.dropOutAmps());
                qs.put(Readings.POWER, power);
                String contacts = ContactState.of(x.state(contactSlot)).key();
                return new PartReading(qs, Map.of(Readings.STATE, handle.stateFor(i).key(), Readings.CONTACTS, contacts),
                        Map.of("a1", i, "a2", -i - iIns, "com", iNo + iNc + iIns, "no", -iNo, "nc", -iNc), power);
            }, handle);
        }
    }

    /**
     * IS given to a TVS clamp; a bidirectional clamp has no forward term, IS only scales the Newton
     * limiting (1e-12 A, a silicon junction; from memory).
     */
    private static final double TVS_LIMITING_SATURATION_AMPS = 1e-12;

    static Region bipolarRegion(double vbe, double vbc, RegionThresholds rt) {
        if (vbe < rt.junctionOnVolts()) {
            return Region.CUTOFF;
        }
        if (vbc >= rt.saturationBaseCollectorVolts()) {
            return Region.SATURATION;
        }
        return Region.ACTIVE;
    }
}
