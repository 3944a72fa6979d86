package org.armature.solver;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.Connectivity;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.FlattenOptions;
import org.armature.netlist.Netlist;
import org.armature.netlist.NetlistBuilder;
import org.armature.netlist.RelayHandle;
import org.armature.netlist.StampContext;

/**
 * The DC engine: the operating point of a stage by modified nodal analysis (Ho, Ruehli, Brennan,
 * IEEE Trans. Circuits Syst. CAS-22, 1975) and Newton–Raphson with junction limiting, gmin and
 * source stepping ({@link DcStrategy}), inside an outer loop that makes relay coil temperatures and
 * contact states consistent with the solution; and DC sweeps.
 *
 * <p>Compile once, solve many. The engine keeps one compiled stage per drive pin state (netlist,
 * matrix, work arrays and the last solution). A stage with the same topology (the same parts in the
 * same order with the same kinds and placements, the same wires and test points) reuses it: only
 * the parts whose values changed are re-flattened ({@link NetlistBuilder#reflatten}), and, with
 * {@link DcOptions#warmStart()}, Newton starts from the last solution instead of 0 V. A sweep
 * therefore flattens once. A cold start sets junctions the circuit forward-biases at a typical
 * forward voltage ({@link org.armature.netlist.Element#beginCold}). One instance serves one thread
 * (make one per thread); results are immutable and may be shared.
 *
 * <p>Temperatures: every semiconductor at ambient; each relay coil at ambient + coil power × its
 * {@code coilThermalResistanceKelvinPerWatt}. The coil temperature is updated inside the Newton
 * loop (a scalar Newton step on T = ambient + I²R(T)·Rθ, taking the coil as voltage-driven), so it
 * converges with the node voltages; an outer loop re-solves only when a relay's contacts change
 * state, to {@link RelayLoopOptions}.
 */
public final class DcAnalysis {

    private final DcOptions options;
    /** The compiled stage of each drive pin state: index 1 pin high, 0 pin low. */
    private final Compiled[] byPin = new Compiled[2];

    /** An engine with {@link DcOptions#DEFAULT}. */
    public DcAnalysis() {
        this(DcOptions.DEFAULT);
    }

    /** @param options engine settings */
    public DcAnalysis(DcOptions options) {
        this.options = options;
    }

    /** @return the engine settings */
    public DcOptions options() {
        return options;
    }

    /**
     * The operating point under the stage's own conditions.
     *
     * @param stage the stage
     * @return the operating point
     * @throws SingularCircuitException for a floating node, a voltage-source loop or a singular matrix
     * @throws NonConvergenceException if no operating point is found
     */
    public OperatingPoint solve(Stage stage) {
        return solve(stage, SolveOptions.DEFAULT);
    }

    /**
     * The operating point with overrides.
     *
     * @param stage the stage
     * @param solveOptions pin state, ambient, start guess, previous relay states
     * @return the operating point
     * @throws SingularCircuitException for a floating node, a voltage-source loop or a singular matrix
     * @throws NonConvergenceException if no operating point is found
     */
    public OperatingPoint solve(Stage stage, SolveOptions solveOptions) {
        boolean pinHigh = solveOptions.pinHigh().orElse(stage.conditions().pinHigh());
        double ambient = solveOptions.ambientCelsius().orElse(stage.conditions().ambientCelsius());
        Compiled c = compile(stage, options.flattenOptions(pinHigh, ambient));
        return c.solve(solveOptions, pinHigh, ambient);
    }

    /**
     * A DC sweep: one operating point per value, each started from the previous solution and with
     * the previous relay states (so a sweep up and back down shows the relay's hysteresis).
     *
     * @param stage the stage
     * @param spec what to sweep and over which values
     * @return the points, in sweep order; a point that fails carries its failure instead of a result
     */
    public DcSweep sweep(Stage stage, SweepSpec spec) {
        List<SweepPoint> points = new ArrayList<>(spec.values().size());
        SolveOptions base = spec.options();
        OperatingPoint previous = base.start().orElse(null);
        SweepVariable v = spec.variable();
        Part swept = v instanceof SweepVariable.PartParameter pp ? stage.require(pp.ref()) : null;
        String key = v instanceof SweepVariable.PartParameter pp ? pp.key() : null;
        for (double value : spec.values()) {
            Stage s = stage;
            SolveOptions o = base;
            if (swept != null) {
                s = stage.withPart(swept.with(key, value));
            } else {
                o = o.withAmbient(value);
            }
            if (previous != null) {
                o = o.withStart(previous).withPreviousRelayStates(previous);
            }
            try {
                OperatingPoint op = solve(s, o);
                points.add(SweepPoint.of(value, op));
                previous = op;
            } catch (SolverException e) {
                points.add(SweepPoint.failed(value, e));
            }
        }
        return new DcSweep(spec.variable(), points);
    }

    private Compiled compile(Stage stage, FlattenOptions fo) {
        int slot = fo.pinHigh() ? 1 : 0;
        Compiled c = byPin[slot];
        if (c != null && c.stage == stage && c.flatten.equals(fo)) {
            return c;
        }
        boolean sameTopology = c != null && sameTopology(c.stage, stage);
        if (sameTopology && c.patch(stage, fo)) {
            return c;
        }
        Compiled other = byPin[1 - slot];
        boolean otherSame = other != null && sameTopology(other.stage, stage);
        Connectivity conn;
        if (sameTopology) {
            conn = c.connectivity;
        } else if (otherSame) {
            conn = other.connectivity;
        } else {
            conn = Connectivity.of(stage);
        }
        Netlist nl = NetlistBuilder.flatten(stage, conn, fo);
        TopologyCheck.check(nl);
        Compiled fresh = new Compiled(stage, fo, conn, nl, options);
        if (c != null && options.warmStart()) {
            fresh.seedFrom(c);
        }
        byPin[slot] = fresh;
        if (other != null && !otherSame) {
            byPin[1 - slot] = null;
        }
        return fresh;
    }

    /**
     * True if two stages flatten to the same structure up to values: the same parts in the same
     * order with the same designators, kinds and placements, the same wires and test points.
     * Allocation-free; identical lists (the common case after a value edit) are not compared.
     */
    static boolean sameTopology(Stage a, Stage b) {
        if (a == b) {
            return true;
        }
        List<Part> pa = a.parts();
        List<Part> pb = b.parts();
        if (pa.size() != pb.size()) {
            return false;
        }
        for (int i = 0; i < pa.size(); i++) {
            Part x = pa.get(i);
            Part y = pb.get(i);
            if (x != y && (x.kind() != y.kind() || !x.ref().equals(y.ref()) || !x.placement().equals(y.placement()))) {
                return false;
            }
        }
        return (a.wires() == b.wires() || a.wires().equals(b.wires()))
                && (a.testPoints() == b.testPoints() || a.testPoints().equals(b.testPoints()));
    }

    /** One compiled stage: netlist, Newton solver, strategy, work arrays and the last solution. */
    private static final class Compiled implements StateUpdater {
        Stage stage;
        FlattenOptions flatten;
        final Connectivity connectivity;
        Netlist netlist;
        final NewtonSolver newton;
        final DcStrategy strategy;
        final RelayLoopOptions relayLoop;
        final boolean warmStart;
        RelayHandle[] relays;
        final double[] x;
        final double[] states;
        final double[] lastTemp;
        final double[] lastTarget;
        final String[] contactsFrom;
        final ArraySolution view;
        /** The last converged solution and its states; valid when {@code hasLast}. */
        final double[] lastX;
        final double[] lastStates;
        boolean hasLast;
        private double ambient;
        private int[] changed;

        Compiled(Stage stage, FlattenOptions flatten, Connectivity connectivity, Netlist netlist, DcOptions options) {
            this.stage = stage;
            this.flatten = flatten;
            this.connectivity = connectivity;
            this.netlist = netlist;
            int n = Math.max(1, netlist.unknownCount());
            LinearSolver lu;
            if (options.linearSolver() == DcOptions.LinearSolverKind.EJML) {
                lu = new EjmlLu(n, options.newton().relativePivotThreshold());
            } else {
                lu = new DenseLu(n, options.newton().relativePivotThreshold());
            }
            this.newton = new NewtonSolver(netlist, options.newton(), lu);
            this.strategy = new DcStrategy(newton, options.continuation());
            this.relayLoop = options.relayLoop();
            this.warmStart = options.warmStart();
            this.relays = netlist.relays().toArray(new RelayHandle[0]);
            this.x = new double[netlist.unknownCount()];
            this.states = netlist.initialStates();
            this.lastTemp = new double[relays.length];
            this.lastTarget = new double[relays.length];
            this.contactsFrom = new String[relays.length];
            this.view = new ArraySolution(netlist.nodeCount(), x, states);
            this.lastX = new double[netlist.unknownCount()];
            this.lastStates = new double[states.length];
            this.changed = new int[stage.parts().size()];
        }

        /**
         * Takes a stage of the same topology: re-flattens the parts whose values differ (every part
         * when the ambient differs). False if some part's structure would change.
         */
        boolean patch(Stage next, FlattenOptions fo) {
            List<Part> now = stage.parts();
            List<Part> then = next.parts();
            boolean all = !fo.equals(flatten);
            int count = 0;
            for (int i = 0; i < then.size(); i++) {
                Part a = now.get(i);
                Part b = then.get(i);
                if (all || (a != b && !a.equals(b))) {
                    changed[count++] = i;
                }
            }
            if (count > 0) {
                Optional<Netlist> patched = NetlistBuilder.reflatten(netlist, next, fo,
                        count == changed.length ? changed : Arrays.copyOf(changed, count));
                if (patched.isEmpty()) {
                    return false;
                }
                netlist = patched.get();
                newton.rebind(netlist);
                List<RelayHandle> rs = netlist.relays();
                for (int r = 0; r < relays.length; r++) {
                    relays[r] = rs.get(r);
                }
            }
            stage = next;
            flatten = fo;
            return true;
        }

        /** Takes the last solution of an earlier compiled stage, node by node name, as the warm start. */
        void seedFrom(Compiled old) {
            if (!old.hasLast) {
                return;
            }
            System.arraycopy(states, 0, lastStates, 0, states.length);
            for (int i = 0; i < old.netlist.nodeCount(); i++) {
                int j = netlist.nodeIndex(old.netlist.nodeName(i));
                if (j != Netlist.GROUND) {
                    lastX[j] = old.lastX[i];
                }
            }
            hasLast = true;
        }

        OperatingPoint solve(SolveOptions so, boolean pinHigh, double ambient) {
            this.ambient = ambient;
            boolean cold = false;
            Optional<OperatingPoint> start = so.start();
            OperatingPoint startOp = start.isPresent() ? start.get() : null;
            if (startOp != null) {
                if (!startOp.copyUnknownsInto(netlist, x)) {
                    Arrays.fill(x, 0.0);
                    Map<String, Double> byName = startOp.unknownsByNodeName();
                    for (int i = 0; i < netlist.nodeCount(); i++) {
                        x[i] = byName.getOrDefault(netlist.nodeName(i), 0.0);
                    }
                }
            } else if (warmStart && hasLast) {
                System.arraycopy(lastX, 0, x, 0, x.length);
            } else {
                Arrays.fill(x, 0.0);
                cold = true;
            }
            boolean startStates = startOp != null && startOp.sameStateLayout(netlist);
            Map<String, Boolean> previous = so.previousRelayOperated();
            for (int r = 0; r < relays.length; r++) {
                RelayHandle h = relays[r];
                int ts = h.temperatureSlot();
                // the coil temperature of a start point is only a guess: the loop settles it
                if (startStates) {
                    states[ts] = startOp.stateValue(ts);
                } else if (startOp == null && warmStart && hasLast) {
                    states[ts] = lastStates[ts];
                } else {
                    states[ts] = ambient;
                }
                Boolean prev = previous.get(h.ref());
                states[h.contactSlot()] = prev != null && prev ? 1.0 : 0.0;
            }
            int iterations = 0;
            boolean settled = false;
            StateUpdater coilHeat = relays.length > 0 ? this : null;
            hasLast = false;
            for (int pass = 0; pass < relayLoop.maxPasses(); pass++) {
                strategy.solve(x, states, cold && pass == 0, coilHeat);
                iterations += strategy.iterations();
                settled = true;
                for (int r = 0; r < relays.length; r++) {
                    settled &= updateRelay(r, pass, ambient, previous);
                }
                if (settled) {
                    break;
                }
            }
            if (newton.polish(x, states, StampContext.DC)) {
                iterations++;
            }
            System.arraycopy(x, 0, lastX, 0, x.length);
            System.arraycopy(states, 0, lastStates, 0, states.length);
            hasLast = true;
            return new OperatingPoint(netlist, x, states, settled, iterations, strategy.maxResidualAmps(), pinHigh,
                    ambient, contactsFrom);
        }

        /**
         * The coil temperatures inside the Newton loop: for each coil, the target
         * Tt = ambient + I²·R(T)·Rθ at the iterate, and a Newton step on g(T) = Tt − T with the coil
         * taken as voltage-driven (I = V/R(T), so that dTt/dT = −(Tt − ambient)·R'(T)/R(T)); exact
         * for a coil across a stiff supply, a damped fixed point otherwise.
         */
        @Override
        public boolean update(org.armature.netlist.Solution at, double[] st) {
            boolean ok = true;
            for (RelayHandle h : relays) {
                int ts = h.temperatureSlot();
                double t = st[ts];
                double r = h.coil().ohmsAt(t);
                double i = h.coil().current(at);
                double rise = i * i * r * h.thermalResistanceKelvinPerWatt();
                double target = ambient + rise;
                if (Math.abs(target - t) > relayLoop.coilTemperatureToleranceKelvin()) {
                    ok = false;
                    double slope = -rise * (h.coil().ohmsAt(t + 1.0) - r) / r;
                    st[ts] = Math.max(t + (target - t) / (1.0 - slope), MIN_COIL_CELSIUS);
                }
            }
            return ok;
        }

        /** Updates one relay's coil temperature (secant-accelerated fixed point) and contacts; true if settled. */
        private boolean updateRelay(int r, int pass, double ambient, Map<String, Boolean> previous) {
            RelayHandle h = relays[r];
            int ts = h.temperatureSlot();
            double t = states[ts];
            double i = h.coil().current(view);
            double target = ambient + i * i * h.coil().ohmsAt(t) * h.thermalResistanceKelvinPerWatt();
            boolean settled = Math.abs(target - t) <= relayLoop.coilTemperatureToleranceKelvin();
            if (!settled) {
                double next = target;
                if (pass > 0 && t != lastTemp[r]) {
                    double slope = (target - lastTarget[r]) / (t - lastTemp[r]);
                    slope = Math.max(-MAX_SECANT_SLOPE, Math.min(slope, MAX_FIXED_POINT_SLOPE));
                    next = t + (target - t) / (1.0 - slope);
                }
                lastTemp[r] = t;
                lastTarget[r] = target;
                states[ts] = Math.max(next, MIN_COIL_CELSIUS);
            }
            RelayHandle.State st = h.stateFor(i);
            Boolean prev = previous.get(h.ref());
            double desired;
            if (st == RelayHandle.State.OPERATED) {
                desired = 1.0;
                contactsFrom[r] = OperatingPoint.CONTACTS_FROM_COIL;
            } else if (st == RelayHandle.State.RELEASED) {
                desired = 0.0;
                contactsFrom[r] = OperatingPoint.CONTACTS_FROM_COIL;
            } else if (prev != null) {
                desired = prev ? 1.0 : 0.0;
                contactsFrom[r] = OperatingPoint.CONTACTS_FROM_PREVIOUS;
            } else {
                desired = 0.0;
                contactsFrom[r] = OperatingPoint.CONTACTS_FROM_POWER_UP;
            }
            if (desired != states[h.contactSlot()]) {
                states[h.contactSlot()] = desired;
                settled = false;
            }
            return settled;
        }
    }

    /**
     * Bounds on the secant estimate of d(target)/d(temperature) in the coil loop: a slope near 1
     * would make the update explode, so it is capped at 0.9 (then the update is at most a tenfold
     * fixed-point step); −5 bounds the over-relaxation for strongly self-limiting coils.
     */
    private static final double MAX_FIXED_POINT_SLOPE = 0.9;
    private static final double MAX_SECANT_SLOPE = 5.0;
    /** Floor of a coil temperature update, °C: just above copper's zero-resistance intercept. */
    private static final double MIN_COIL_CELSIUS = -234.0;
}
