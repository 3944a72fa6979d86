package org.armature.analysis.faults;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.Connectivity;
import org.armature.model.GridPoint;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.PinSpec;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.Wire;

/**
 * Turns a stage into the same stage with faults in it. Every fault is a real change of the
 * circuit the engine solves, made on the stage itself so that the one DC engine solves it:
 * <ul>
 *   <li>a changed part value where that is the physics: an open resistor or coil is
 *   {@value #OPEN_OHMS} Ω, a shorted resistor {@value #SHORT_OHMS} Ω, a drift ×10 or ×0.1; an
 *   open base or collector lead of a bipolar transistor is its base or collector series
 *   resistance set to {@value #OPEN_OHMS} Ω; low gain is βF ÷ 10; an open MOSFET channel has its
 *   β ÷ 10⁹; a missing rail is 0 V, a sagging one 75 %; a stuck pin has both levels at one of
 *   them; a weak pin ×100 output resistance; an open coil keeps its pick-up and drop-out
 *   currents (its must-operate and must-release voltages scale with the resistance); shorted turns halve the coil resistance (half the
 *   turns need twice the current for the same ampere-turns, so the must-operate voltage stays);
 *   contacts stuck open have a must-operate voltage no coil reaches ({@value #UNREACHABLE_VOLTS} V)
 *   and welded contacts thresholds any leakage exceeds ({@value #WELD_OPERATE_VOLTS} V);</li>
 *   <li>a diode that is open or shorted becomes a resistor of {@value #OPEN_OHMS} or
 *   {@value #SHORT_OHMS} Ω on the same two pin positions; a reversed diode is turned by 180°,
 *   which swaps its anode and cathode positions;</li>
 *   <li>a short between two pins of a transistor (C–E, B–E, D–S, G–S) is a {@value #SHORT_OHMS} Ω
 *   resistor drawn between their nets ({@link #bridge}), wired outside the drawing so that it
 *   joins exactly those two nets.</li>
 * </ul>
 * The same bridge draws the meter's input resistance onto a probed net.
 */
public final class FaultInjector {

    /** An open: 1 TΩ, a million times a handheld meter's 10 MΩ input (FH-3). */
    public static final double OPEN_OHMS = 1e12;
    /** A short: 0.1 Ω, typical of a failed junction or a solder bridge (from memory). */
    public static final double SHORT_OHMS = 0.1;
    /** Must-operate voltage of contacts stuck open: far above any coil supply. */
    public static final double UNREACHABLE_VOLTS = 1e6;
    /** Must-operate voltage of welded contacts: any current, even leakage, holds them closed. */
    public static final double WELD_OPERATE_VOLTS = 1e-12;
    /** Drift factors. */
    public static final double DRIFT_UP = 10;
    /** Drift factor downwards. */
    public static final double DRIFT_DOWN = 0.1;
    /** Gain of a degraded transistor relative to its model βF. */
    public static final double GAIN_FACTOR = 0.1;
    /** A sagging rail as a fraction of nominal (a failing regulator or a loaded adapter, our choice). */
    public static final double SAG_FACTOR = 0.75;
    /** A weak pin's output resistance relative to nominal. */
    public static final double WEAK_FACTOR = 100;
    /** Designator prefix of the resistors this class adds. */
    public static final String ADDED_PREFIX = "XF";

    private FaultInjector() {
    }

    /**
     * The stage with every fault applied, in order.
     *
     * @param stage the healthy stage
     * @param faults the faults; each must be one the part can have ({@link FaultCatalog#check})
     * @return the faulted stage; {@code stage} is not modified
     * @throws IllegalArgumentException for a part the stage does not have or a kind it cannot have
     */
    public static Stage apply(Stage stage, List<Fault> faults) {
        Stage s = stage;
        for (Fault f : faults) {
            s = apply(s, f);
        }
        return s;
    }

    /** The stage with one fault applied. */
    public static Stage apply(Stage stage, Fault fault) {
        if (fault.kind() == FaultKind.TRACK_OPEN && fault.ref().contains(NET_JOIN)) {
            TrackBetween t = trackBetween(fault.ref()).orElseThrow(() -> new IllegalArgumentException(
                    "a track open between nets is written NET~TOWARD:track-open, not " + fault.ref()));
            return cutNet(stage, t.net(), t.toward());
        }
        if (fault.kind() == FaultKind.TRACK_OPEN) {
            PinRef pin = trackPin(stage, fault.ref()).orElseThrow(() -> new IllegalArgumentException(
                    "a track open is written PART.PIN:track-open with a pin of the stage, not " + fault.ref()));
            return cutPin(stage, pin);
        }
        Part p = stage.part(fault.ref()).orElseThrow(() -> new IllegalArgumentException(
                "stage \"" + stage.name() + "\" has no part " + fault.ref()));
        if (!FaultKind.of(p.kind()).contains(fault.kind())) {
            throw new IllegalArgumentException(p.ref() + " (" + p.kind().title() + ") cannot have the fault "
                    + fault.kind().id());
        }
        return switch (fault.kind()) {
            case OPEN -> switch (p.kind()) {
                case RESISTOR, LOAD -> stage.withPart(p.with(ParamKeys.RESISTANCE_OHMS, OPEN_OHMS));
                case NMOS -> stage.withPart(p.with(ParamKeys.TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED,
                        p.value(ParamKeys.TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED) * 1e-9));
                case DARLINGTON -> stage.withPart(p.with(ParamKeys.COLLECTOR_RESISTANCE_OHMS, OPEN_OHMS));
                case GROUND -> groundOpen(stage, p);
                default -> stage.withPart(asResistor(p, OPEN_OHMS));
            };
            case SHORT -> switch (p.kind()) {
                case RESISTOR, LOAD -> stage.withPart(p.with(ParamKeys.RESISTANCE_OHMS, SHORT_OHMS));
                default -> stage.withPart(asResistor(p, SHORT_OHMS));
            };
            case DRIFT_UP -> stage.withPart(p.with(ParamKeys.RESISTANCE_OHMS, p.value(ParamKeys.RESISTANCE_OHMS) * DRIFT_UP));
            case DRIFT_DOWN -> stage.withPart(p.with(ParamKeys.RESISTANCE_OHMS, p.value(ParamKeys.RESISTANCE_OHMS) * DRIFT_DOWN));
            case REVERSED -> stage.withPart(p.withPlacement(p.placement().rotated(p.placement().rotationDegrees() + 180)));
            case CE_SHORT -> p.kind() == PartKind.DARLINGTON
                    ? bridge(stage, new PinRef(p.ref(), "out"), new PinRef(p.ref(), "e"), SHORT_OHMS)
                    : bridge(stage, new PinRef(p.ref(), "c"), new PinRef(p.ref(), "e"), SHORT_OHMS);
            case CLAMP_OPEN -> cutPin(stage, new PinRef(p.ref(), "com"));
            case TRACK_OPEN -> throw new IllegalStateException("handled above");
            case BE_SHORT -> bridge(stage, new PinRef(p.ref(), "b"), new PinRef(p.ref(), "e"), SHORT_OHMS);
            case DS_SHORT -> bridge(stage, new PinRef(p.ref(), "d"), new PinRef(p.ref(), "s"), SHORT_OHMS);
            case GS_SHORT -> bridge(stage, new PinRef(p.ref(), "g"), new PinRef(p.ref(), "s"), SHORT_OHMS);
            case BE_OPEN -> stage.withPart(p.with(ParamKeys.BASE_RESISTANCE_OHMS, OPEN_OHMS));
            case BC_OPEN -> stage.withPart(p.with(ParamKeys.COLLECTOR_RESISTANCE_OHMS, OPEN_OHMS));
            case GAIN_LOW -> stage.withPart(p.with(ParamKeys.BETA_FORWARD,
                    Math.max(1, p.value(ParamKeys.BETA_FORWARD) * GAIN_FACTOR)));
            case COIL_OPEN -> {
                // the turns are intact, so the pick-up and drop-out currents stay: the datasheet
                // voltages, which the engine divides by the coil resistance, scale with it
                double k = OPEN_OHMS / p.value(ParamKeys.COIL_RESISTANCE_OHMS);
                yield stage.withPart(p.with(ParamKeys.COIL_RESISTANCE_OHMS, OPEN_OHMS)
                        .with(ParamKeys.MUST_OPERATE_VOLTS, p.value(ParamKeys.MUST_OPERATE_VOLTS) * k)
                        .with(ParamKeys.MUST_RELEASE_VOLTS, p.value(ParamKeys.MUST_RELEASE_VOLTS) * k));
            }
            case SHORTED_TURNS -> stage.withPart(p.with(ParamKeys.COIL_RESISTANCE_OHMS,
                    p.value(ParamKeys.COIL_RESISTANCE_OHMS) * 0.5));
            case WELDED -> stage.withPart(p.with(ParamKeys.MUST_OPERATE_VOLTS, WELD_OPERATE_VOLTS)
                    .with(ParamKeys.MUST_RELEASE_VOLTS, WELD_OPERATE_VOLTS / 10));
            case STUCK_OPEN -> stage.withPart(p.with(ParamKeys.MUST_OPERATE_VOLTS, UNREACHABLE_VOLTS));
            case STUCK_LOW -> stage.withPart(p.with(ParamKeys.HIGH_VOLTS, p.value(ParamKeys.LOW_VOLTS)));
            case STUCK_HIGH -> stage.withPart(p.with(ParamKeys.LOW_VOLTS, p.value(ParamKeys.HIGH_VOLTS)));
            case WEAK -> stage.withPart(p.with(ParamKeys.OUTPUT_RESISTANCE_OHMS,
                    p.value(ParamKeys.OUTPUT_RESISTANCE_OHMS) * WEAK_FACTOR));
            case MISSING -> stage.withPart(p.with(ParamKeys.VOLTS, 0));
            case SAG -> stage.withPart(p.with(ParamKeys.VOLTS, p.value(ParamKeys.VOLTS) * SAG_FACTOR));
        };
    }

    /**
     * A ground connection that has opened: the symbol is moved off the drawing (same designator, so
     * the stage keeps a reference even if it had only this one) and joined to the point it grounded
     * through {@value #OPEN_OHMS} Ω. A symbol whose point is still grounded through another symbol
     * changes nothing, as on the board.
     */
    private static Stage groundOpen(Stage stage, Part ground) {
        GridPoint at = ground.pinPoint("g");
        int far = 0;
        for (Part q : stage.parts()) {
            for (PinSpec pin : q.kind().pins()) {
                GridPoint g = q.pinPoint(pin.name());
                far = Math.max(far, Math.max(g.gridX(), g.gridY()));
            }
        }
        for (Wire w : stage.wires()) {
            far = Math.max(far, Math.max(Math.max(w.from().gridX(), w.from().gridY()),
                    Math.max(w.to().gridX(), w.to().gridY())));
        }
        Stage moved = stage.withPart(ground.withPlacement(Placement.at(far + 10, far + 10)));
        Connectivity c = Connectivity.of(moved);
        String net = null;
        for (Part q : moved.parts()) {
            for (PinSpec pin : q.kind().pins()) {
                if (q.pinPoint(pin.name()).equals(at)) {
                    net = c.net(q.ref(), pin.name());
                }
            }
        }
        for (int i = 0; i < moved.wires().size() && net == null; i++) {
            if (moved.wires().get(i).contains(at)) {
                net = c.netOfWire().get(i);
            }
        }
        if (net == null || net.equals(Connectivity.GROUND)) {
            return stage;
        }
        return bridgeNets(moved, c, net, Connectivity.GROUND, OPEN_OHMS);
    }

    /**
     * The pin a track open names ({@code PART.PIN}), if the stage has it.
     *
     * @param stage the stage
     * @param address {@code PART.PIN}
     * @return the pin
     */
    public static Optional<PinRef> trackPin(Stage stage, String address) {
        int dot = address.lastIndexOf('.');
        if (dot <= 0 || dot == address.length() - 1) {
            return Optional.empty();
        }
        String ref = address.substring(0, dot);
        String pin = address.substring(dot + 1);
        return stage.part(ref).filter(p -> p.kind().pins().stream().anyMatch(ps -> ps.name().equals(pin)))
                .map(p -> new PinRef(ref, pin));
    }

    /**
     * A pin cut from its net: the one wire ending at the pin is cut back to a one-step stub at its far end, so the
     * pin stands alone and the rest of the net stays joined, then the pin is joined back to the rest
     * through {@value #OPEN_OHMS} Ω (an open, and no node left floating). A pin on no other pin or
     * wire changes nothing.
     *
     * @param stage the stage
     * @param pin the pin to cut
     * @return the stage with the pin cut
     * @throws IllegalArgumentException when the pin is joined in a way one cut cannot separate
     *     (another pin on the same point, several wires meeting there, a wire passing through it)
     */
    public static Stage cutPin(Stage stage, PinRef pin) {
        Connectivity c = Connectivity.of(stage);
        String net = c.net(pin.ref(), pin.pin());
        if (c.pinsOn(net).size() <= 1) {
            return stage;
        }
        GridPoint at = stage.require(pin.ref()).pinPoint(pin.pin());
        String where = pin.ref() + "." + pin.pin();
        for (Part q : stage.parts()) {
            for (PinSpec ps : q.kind().pins()) {
                if (!(q.ref().equals(pin.ref()) && ps.name().equals(pin.pin())) && q.pinPoint(ps.name()).equals(at)) {
                    throw new IllegalArgumentException(where + " sits on " + q.ref() + "." + ps.name()
                            + " with no track between them to open.");
                }
            }
        }
        List<Wire> wires = new ArrayList<>(stage.wires());
        int hit = -1;
        for (int i = 0; i < wires.size(); i++) {
            Wire w = wires.get(i);
            if (!w.contains(at)) {
                continue;
            }
            if (!w.from().equals(at) && !w.to().equals(at) || hit >= 0) {
                throw new IllegalArgumentException("the track at " + where
                        + " is not one wire ending at the pin; draw it so, or open a track of another pin.");
            }
            hit = i;
        }
        if (hit < 0) {
            return stage;
        }
        Wire w = wires.get(hit);
        GridPoint other = w.from().equals(at) ? w.to() : w.from();
        int dx = Integer.signum(other.gridX() - at.gridX());
        int dy = Integer.signum(other.gridY() - at.gridY());
        // the break is put next to the far end, leaving a one-step stub there: the span between is
        // left free, as it was, for the meter's and the fault's own added wires to cross
        GridPoint stub = new GridPoint(other.gridX() - dx, other.gridY() - dy);
        if (stub.equals(at)) {
            wires.remove(hit);
        } else {
            wires.set(hit, new Wire(stub, other));
        }
        Stage cut = stage.withWires(wires);
        Connectivity cc = Connectivity.of(cut);
        String alone = cc.net(pin.ref(), pin.pin());
        String rest = null;
        for (PinRef q : c.pinsOn(net)) {
            if (!q.equals(pin)) {
                rest = cc.net(q.ref(), q.pin());
                if (rest.equals(alone)) {
                    throw new IllegalArgumentException("the net of " + where + " stays joined after its track is opened.");
                }
            }
        }
        return bridgeNets(cut, cc, alone, rest, OPEN_OHMS);
    }

    /** The mark between the two nets of a track open, {@code NET~TOWARD:track-open}. */
    public static final String NET_JOIN = "~";

    /**
     * The two nets of a track open written {@code NET~TOWARD}.
     *
     * @param net the net whose track is open
     * @param toward the net that the cut-off pins' parts lead to
     */
    public record TrackBetween(String net, String toward) {
        /** {@code NET~TOWARD}. */
        public String address() {
            return net + NET_JOIN + toward;
        }
    }

    /** Splits {@code NET~TOWARD} into its two names (not checked against a stage). */
    public static Optional<TrackBetween> trackBetween(String address) {
        int at = address.indexOf(NET_JOIN);
        if (at <= 0 || at == address.length() - 1 || address.indexOf(NET_JOIN, at + 1) >= 0) {
            return Optional.empty();
        }
        return Optional.of(new TrackBetween(address.substring(0, at), address.substring(at + 1)));
    }

    /**
     * The pins a track open {@code NET~TOWARD} cuts off: the pins on {@code net} of the parts that
     * also have a pin on {@code toward}. Empty if none, or if they are all of the net's pins.
     *
     * @param c the stage's nets
     * @param net the net whose track is open
     * @param toward the other net
     * @return the pins cut off, in designator order
     */
    public static List<PinRef> cutOffPins(Connectivity c, String net, String toward) {
        List<PinRef> on = c.pinsOn(net);
        java.util.Set<String> leading = new java.util.HashSet<>();
        for (PinRef p : c.pinsOn(toward)) {
            leading.add(p.ref());
        }
        List<PinRef> cut = on.stream().filter(p -> leading.contains(p.ref())).toList();
        return cut.size() == on.size() ? List.of() : cut;
    }

    /**
     * A track open between two named nets, {@code NET~TOWARD:track-open}: on net {@code net}, the
     * copper that joins the pins of the parts leading to net {@code toward} ({@link #cutOffPins}) to
     * the net's other pins is broken, so no current passes between the two nets through those parts,
     * while the cut-off pins stay joined to each other. In the drawing: the one stretch of wire of
     * the net (between two consecutive points where a pin or a wire end of the net sits) whose
     * removal leaves exactly those two groups is removed, and the two groups are joined back through
     * {@value #OPEN_OHMS} Ω (an open, and no node left floating). For example
     * {@code switch~supply:track-open} in a low-side stage cuts the coil and its diode off the
     * transistor's collector: neither the switch nor the coil carries current.
     *
     * @param stage the stage
     * @param net the net whose track is open (a name as {@code solve} prints it), not ground
     * @param toward the net the cut-off parts lead to
     * @return the stage with the track open
     * @throws IllegalArgumentException with one sentence: an unknown net (listing the valid ones), no
     *     part leading from one to the other, or no single stretch of track that separates them
     */
    public static Stage cutNet(Stage stage, String net, String toward) {
        Connectivity c = Connectivity.of(stage);
        List<String> valid = c.nets().stream().filter(n -> !n.equals(Connectivity.GROUND)).toList();
        for (String n : List.of(net, toward)) {
            if (!c.nets().contains(n)) {
                throw new IllegalArgumentException("Stage \"" + stage.name() + "\" has no net " + n
                        + "; a track open is written NET~TOWARD:track-open with nets " + String.join(", ", valid)
                        + " (TOWARD may also be " + Connectivity.GROUND + ").");
            }
        }
        if (net.equals(Connectivity.GROUND)) {
            throw new IllegalArgumentException("The ground net is joined by its symbols, not by one track; open a "
                    + "ground symbol instead (GND1:open), or write NET~" + Connectivity.GROUND + ":track-open.");
        }
        List<PinRef> cut = cutOffPins(c, net, toward);
        if (cut.isEmpty() || net.equals(toward)) {
            throw new IllegalArgumentException("No track of net " + net + " leads to net " + toward
                    + " apart from the rest of it: a part must join the two nets and another pin must stay on " + net + ".");
        }
        Optional<Cut> where = findCut(stage, c, net, cut);
        if (where.isEmpty()) {
            throw new IllegalArgumentException("Opening one stretch of the track of net " + net + " does not cut "
                    + cut.stream().map(p -> p.ref() + "." + p.pin()).collect(java.util.stream.Collectors.joining(", "))
                    + " off from the rest in this drawing (pins on one point, or wires in a loop).");
        }
        Stage trial = stage.withWires(without(stage.wires(), where.get().wire(), where.get().stretch()));
        Connectivity tc = Connectivity.of(trial);
        PinRef rest = c.pinsOn(net).stream().filter(p -> !cut.contains(p)).findFirst().orElseThrow();
        return bridgeNets(trial, tc, tc.net(cut.get(0).ref(), cut.get(0).pin()), tc.net(rest.ref(), rest.pin()), OPEN_OHMS);
    }

    /**
     * Where one cut separates pins from the rest of their net.
     *
     * @param wire the index of the wire in {@link Stage#wires()}
     * @param stretch the stretch of it to remove
     */
    public record Cut(int wire, Wire stretch) {
    }

    /**
     * The first stretch of the net's wires whose removal leaves exactly {@code cut} on one side and
     * the net's other pins on the other, each side still joined, found on the net alone (pins and
     * wire pieces joined as {@link Connectivity} joins them: a pin or wire end joins every wire
     * through its point and every pin on it).
     *
     * @param stage the stage
     * @param c its nets
     * @param net the net
     * @param cut the pins to cut off (not all of the net's)
     * @return the cut, empty if no single stretch makes it
     */
    public static Optional<Cut> findCut(Stage stage, Connectivity c, String net, List<PinRef> cut) {
        List<PinRef> pins = c.pinsOn(net);
        List<GridPoint> pinAt = pins.stream().map(p -> stage.require(p.ref()).pinPoint(p.pin())).toList();
        List<Integer> netWires = new ArrayList<>();
        for (int i = 0; i < stage.wires().size(); i++) {
            if (c.netOfWire().get(i).equals(net)) {
                netWires.add(i);
            }
        }
        for (int i : netWires) {
            for (Wire piece : stretches(stage, netWires, pinAt, i)) {
                List<Wire> parts = new ArrayList<>();
                for (int j : netWires) {
                    if (j != i) {
                        parts.add(stage.wires().get(j));
                    }
                }
                List<Wire> left = without(List.of(stage.wires().get(i)), 0, piece);
                parts.addAll(left);
                int[] root = joined(pinAt, parts);
                int a = root[pins.indexOf(cut.get(0))];
                int b = -1;
                boolean exact = true;
                for (int k = 0; k < pins.size() && exact; k++) {
                    boolean off = cut.contains(pins.get(k));
                    if (off) {
                        exact = root[k] == a;
                    } else if (b < 0) {
                        b = root[k];
                        exact = b != a;
                    } else {
                        exact = root[k] == b;
                    }
                }
                if (exact) {
                    return Optional.of(new Cut(i, piece));
                }
            }
        }
        return Optional.empty();
    }

    /** Components of pins and wire pieces of one net: the root of each pin, by index. */
    private static int[] joined(List<GridPoint> pinAt, List<Wire> pieces) {
        int n = pinAt.size() + pieces.size();
        int[] parent = new int[n];
        for (int k = 0; k < n; k++) {
            parent[k] = k;
        }
        for (int p = 0; p < pinAt.size(); p++) {
            for (int q = p + 1; q < pinAt.size(); q++) {
                if (pinAt.get(p).equals(pinAt.get(q))) {
                    union(parent, p, q);
                }
            }
            for (int w = 0; w < pieces.size(); w++) {
                if (pieces.get(w).contains(pinAt.get(p))) {
                    union(parent, p, pinAt.size() + w);
                }
            }
        }
        for (int v = 0; v < pieces.size(); v++) {
            for (int w = v + 1; w < pieces.size(); w++) {
                Wire x = pieces.get(v);
                Wire y = pieces.get(w);
                if (y.contains(x.from()) || y.contains(x.to()) || x.contains(y.from()) || x.contains(y.to())) {
                    union(parent, pinAt.size() + v, pinAt.size() + w);
                }
            }
        }
        int[] roots = new int[pinAt.size()];
        for (int p = 0; p < roots.length; p++) {
            roots[p] = find(parent, p);
        }
        return roots;
    }

    private static int find(int[] parent, int k) {
        while (parent[k] != k) {
            parent[k] = parent[parent[k]];
            k = parent[k];
        }
        return k;
    }

    private static void union(int[] parent, int a, int b) {
        parent[find(parent, a)] = find(parent, b);
    }

    /**
     * The stretches of wire {@code i}: between consecutive points of it where a pin or wire end of
     * the net sits ({@code netWires}: the net's wires by index; {@code pinAt}: its pins' points).
     */
    private static List<Wire> stretches(Stage stage, List<Integer> netWires, List<GridPoint> pinAt, int i) {
        Wire w = stage.wires().get(i);
        java.util.TreeSet<Integer> stops = new java.util.TreeSet<>();
        boolean vertical = w.from().gridX() == w.to().gridX();
        java.util.function.ToIntFunction<GridPoint> along = p -> vertical ? p.gridY() : p.gridX();
        stops.add(along.applyAsInt(w.from()));
        stops.add(along.applyAsInt(w.to()));
        for (GridPoint g : pinAt) {
            if (w.contains(g)) {
                stops.add(along.applyAsInt(g));
            }
        }
        for (int j : netWires) {
            if (j != i) {
                for (GridPoint e : List.of(stage.wires().get(j).from(), stage.wires().get(j).to())) {
                    if (w.contains(e)) {
                        stops.add(along.applyAsInt(e));
                    }
                }
            }
        }
        List<Wire> out = new ArrayList<>();
        Integer prev = null;
        for (int k : stops) {
            if (prev != null) {
                out.add(vertical ? new Wire(new GridPoint(w.from().gridX(), prev), new GridPoint(w.from().gridX(), k))
                        : new Wire(new GridPoint(prev, w.from().gridY()), new GridPoint(k, w.from().gridY())));
            }
            prev = k;
        }
        return out;
    }

    /** The wires with stretch {@code piece} taken out of wire {@code i} (what is left of it stays). */
    private static List<Wire> without(List<Wire> wires, int i, Wire piece) {
        Wire w = wires.get(i);
        boolean vertical = w.from().gridX() == w.to().gridX();
        int lo = vertical ? Math.min(w.from().gridY(), w.to().gridY()) : Math.min(w.from().gridX(), w.to().gridX());
        int hi = vertical ? Math.max(w.from().gridY(), w.to().gridY()) : Math.max(w.from().gridX(), w.to().gridX());
        int a = vertical ? Math.min(piece.from().gridY(), piece.to().gridY()) : Math.min(piece.from().gridX(), piece.to().gridX());
        int b = vertical ? Math.max(piece.from().gridY(), piece.to().gridY()) : Math.max(piece.from().gridX(), piece.to().gridX());
        int fixed = vertical ? w.from().gridX() : w.from().gridY();
        List<Wire> out = new ArrayList<>(wires.subList(0, i));
        if (a > lo) {
            out.add(vertical ? new Wire(new GridPoint(fixed, lo), new GridPoint(fixed, a))
                    : new Wire(new GridPoint(lo, fixed), new GridPoint(a, fixed)));
        }
        if (hi > b) {
            out.add(vertical ? new Wire(new GridPoint(fixed, b), new GridPoint(fixed, hi))
                    : new Wire(new GridPoint(b, fixed), new GridPoint(hi, fixed)));
        }
        out.addAll(wires.subList(i + 1, wires.size()));
        return out;
    }

    /** A two-pin part replaced by a resistor of the same designator on the same pin positions. */
    private static Part asResistor(Part p, double ohms) {
        // every two-pin kind that gets here has its pins at (0, −2) and (0, 2), as the resistor does
        return new Part(p.ref(), PartKind.RESISTOR, Map.of(ParamKeys.RESISTANCE_OHMS, ohms), Map.of(), p.placement());
    }

    /**
     * The stage with a resistor added between the nets of two pins, drawn to the right of and below
     * everything else: from a pin point of each net a horizontal wire to the resistor's own column,
     * then down to the resistor lying on a row of its own. A point is chosen on each net so that no
     * wire of the bridge passes through a pin or wire end of another net; the result is checked: the
     * stage's nets stay as they were, and the resistor's ends sit on the two nets.
     *
     * @param stage the stage
     * @param a a pin on the first net
     * @param b a pin on the second net
     * @param ohms the resistance
     * @return the stage with the resistor (designator {@value #ADDED_PREFIX}n) and its wires
     * @throws IllegalStateException if no such route exists (a drawing with every point taken)
     */
    public static Stage bridge(Stage stage, PinRef a, PinRef b, double ohms) {
        Connectivity c = Connectivity.of(stage);
        String netA = c.net(a.ref(), a.pin());
        String netB = c.net(b.ref(), b.pin());
        return bridgeNets(stage, c, netA, netB, ohms);
    }

    /** The stage with a resistor added between two nets by name (see {@link #bridge}). */
    public static Stage bridgeNets(Stage stage, Connectivity c, String netA, String netB, double ohms) {
        return bridgeAll(stage, c, List.of(new Bridge(netA, netB, ohms)));
    }

    /**
     * A resistor to add between two nets.
     *
     * @param netA first net (a name of the connectivity passed with it)
     * @param netB second net
     * @param ohms resistance
     */
    public record Bridge(String netA, String netB, double ohms) {
    }

    /**
     * The stage with several resistors added (see {@link #bridge}), each in a lane of its own, all
     * routed with one connectivity; they are named {@value #ADDED_PREFIX}n in order.
     *
     * @param stage the stage
     * @param c its connectivity
     * @param bridges the resistors
     * @return the stage with them
     * @throws IllegalStateException if a net has no free route
     */
    public static Stage bridgeAll(Stage stage, Connectivity c, List<Bridge> bridges) {
        Map<GridPoint, String> taken = occupied(stage, c);
        int maxX = Integer.MIN_VALUE;
        int maxY = Integer.MIN_VALUE;
        for (GridPoint p : taken.keySet()) {
            maxX = Math.max(maxX, p.gridX());
            maxY = Math.max(maxY, p.gridY());
        }
        int minY = Integer.MAX_VALUE;
        for (GridPoint p : taken.keySet()) {
            minY = Math.min(minY, p.gridY());
        }
        int rowY = maxY + 4;
        List<Wire> added = new ArrayList<>();
        List<Wire> verticals = new ArrayList<>();
        Stage s = stage;
        for (int i = 0; i < bridges.size(); i++) {
            Bridge br = bridges.get(i);
            int laneX = maxX + 4 + 8 * i;
            int ya = route(taken, c, stage, br.netA(), laneX, minY - 4 - 4 * i, rowY + 4 + 4 * i, added)
                    .orElseThrow(() -> new IllegalStateException("no free route from net " + br.netA()));
            int yb = route(taken, c, stage, br.netB(), laneX + 4, minY - 6 - 4 * i, rowY + 6 + 4 * i, added)
                    .orElseThrow(() -> new IllegalStateException("no free route from net " + br.netB()));
            verticals.add(new Wire(new GridPoint(laneX, ya), new GridPoint(laneX, rowY)));
            verticals.add(new Wire(new GridPoint(laneX + 4, yb), new GridPoint(laneX + 4, rowY)));
            // rotated 270°: pin a at origin − (2, 0), pin b at origin + (2, 0)
            s = s.withPart(new Part(s.nextRef(ADDED_PREFIX), PartKind.RESISTOR,
                    Map.of(ParamKeys.RESISTANCE_OHMS, br.ohms()), Map.of(),
                    new Placement(new GridPoint(laneX + 2, rowY), 270, false)));
        }
        List<Wire> wires = new ArrayList<>(stage.wires());
        wires.addAll(added);
        wires.addAll(verticals);
        return s.withWires(wires);
    }

    /** Every pin point and wire end of the drawing with its net. */
    private static Map<GridPoint, String> occupied(Stage stage, Connectivity c) {
        Map<GridPoint, String> taken = new HashMap<>();
        for (Part p : stage.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                taken.put(p.pinPoint(pin.name()), c.net(p.ref(), pin.name()));
            }
        }
        for (int i = 0; i < stage.wires().size(); i++) {
            Wire w = stage.wires().get(i);
            taken.put(w.from(), c.netOfWire().get(i));
            taken.put(w.to(), c.netOfWire().get(i));
        }
        return taken;
    }

    /**
     * Routes from a point of {@code net} to the lane column {@code laneX}: straight right along the
     * point's row, or else up to a row of its own above the drawing ({@code topY}), or down to one
     * below it ({@code bottomY}), and right along that row. A route must not pass through a pin or wire end of another net (an end there would join
     * it). Adds the wires, marks their ends taken, and returns the row at which the route meets the
     * lane. Empty if no point of the net has a clear route.
     */
    private static Optional<Integer> route(Map<GridPoint, String> taken, Connectivity c, Stage stage, String net,
                                           int laneX, int topY, int bottomY, List<Wire> added) {
        List<GridPoint> candidates = new ArrayList<>();
        for (PinRef pin : c.pinsOn(net)) {
            candidates.add(stage.require(pin.ref()).pinPoint(pin.pin()));
        }
        for (int i = 0; i < stage.wires().size(); i++) {
            if (c.netOfWire().get(i).equals(net)) {
                Wire w = stage.wires().get(i);
                int x0 = Math.min(w.from().gridX(), w.to().gridX());
                int x1 = Math.max(w.from().gridX(), w.to().gridX());
                int y0 = Math.min(w.from().gridY(), w.to().gridY());
                int y1 = Math.max(w.from().gridY(), w.to().gridY());
                for (int x = x0; x <= x1; x++) {
                    for (int y = y0; y <= y1; y++) {
                        candidates.add(new GridPoint(x, y));
                    }
                }
            }
        }
        for (GridPoint p : candidates) {
            GridPoint end = new GridPoint(laneX, p.gridY());
            if (clear(taken, net, p, end)) {
                added.add(new Wire(p, end));
                taken.put(end, net);
                return Optional.of(p.gridY());
            }
        }
        for (int y : new int[] {topY, bottomY}) {
            for (GridPoint p : candidates) {
                GridPoint corner = new GridPoint(p.gridX(), y);
                GridPoint end = new GridPoint(laneX, y);
                if (clear(taken, net, p, corner) && clear(taken, net, corner, end)) {
                    added.add(new Wire(p, corner));
                    added.add(new Wire(corner, end));
                    taken.put(corner, net);
                    taken.put(end, net);
                    return Optional.of(y);
                }
            }
        }
        // a point boxed in above and below by other nets (a pin cut off by a track open): a short
        // step sideways first, to a column that is clear up or down
        for (int y : new int[] {topY, bottomY}) {
            for (GridPoint p : candidates) {
                for (int step = 1; step <= SIDESTEP_LIMIT; step++) {
                    for (int sign : new int[] {-1, 1}) {
                        GridPoint side = new GridPoint(p.gridX() + sign * step, p.gridY());
                        GridPoint corner = new GridPoint(side.gridX(), y);
                        GridPoint end = new GridPoint(laneX, y);
                        if (!taken.containsKey(side) && !onWire(stage, c, net, added, side)
                                && clear(taken, net, p, side) && clear(taken, net, side, corner)
                                && clear(taken, net, corner, end)) {
                            added.add(new Wire(p, side));
                            added.add(new Wire(side, corner));
                            added.add(new Wire(corner, end));
                            taken.put(side, net);
                            taken.put(corner, net);
                            taken.put(end, net);
                            return Optional.of(y);
                        }
                    }
                }
            }
        }
        return Optional.empty();
    }

    /** How far a route may step sideways before it turns up or down, grid steps. */
    private static final int SIDESTEP_LIMIT = 3;

    /** True when the point lies on a wire of another net, or on any wire added so far (an end there would join it). */
    private static boolean onWire(Stage stage, Connectivity c, String net, List<Wire> added, GridPoint q) {
        for (int i = 0; i < stage.wires().size(); i++) {
            if (!c.netOfWire().get(i).equals(net) && stage.wires().get(i).contains(q)) {
                return true;
            }
        }
        for (Wire w : added) {
            if (w.contains(q)) {
                return true;
            }
        }
        return false;
    }

    /** True when no taken point of another net lies on the segment from {@code p} to {@code q}, {@code p} excluded. */
    private static boolean clear(Map<GridPoint, String> taken, String net, GridPoint p, GridPoint q) {
        Wire seg = new Wire(p, q);
        for (Map.Entry<GridPoint, String> e : taken.entrySet()) {
            if (!e.getValue().equals(net) && !e.getKey().equals(p) && seg.contains(e.getKey())) {
                return false;
            }
        }
        return true;
    }
}
