package org.armature.solver;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.armature.model.Connectivity;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.FlattenOptions;
import org.armature.netlist.Netlist;
import org.armature.netlist.NetlistBuilder;
import org.armature.netlist.RelayHandle;

/**
 * The DC engine: the operating point of a stage by modified nodal analysis (Ho, Ruehli, Brennan,
 * IEEE Trans. Circuits Syst. CAS-22, 1975) and Newton–Raphson with junction limiting, gmin and
 * source stepping ({@link DcStrategy}), inside an outer loop that makes relay coil temperatures and
 * contact states consistent with the solution; and DC sweeps.
 *
 * <p>Compile once, solve many: the last stage's netlist, matrix and work arrays are kept and reused
 * while the stage is the same; a stage that differs only in values reuses its connectivity. One
 * instance serves one thread (make one per thread); results are immutable and may be shared.
 *
 * <p>Temperatures: every semiconductor at ambient; each relay coil at ambient + coil power × its
 * {@code coilThermalResistanceKelvinPerWatt}, iterated to {@link RelayLoopOptions}.
 */
public final class DcAnalysis {

    private final DcOptions options;
    private Compiled cached;

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
        for (double value : spec.values()) {
            Stage s = stage;
            SolveOptions o = base;
            SweepVariable v = spec.variable();
            if (v instanceof SweepVariable.PartParameter pp) {
                Part part = stage.require(pp.ref());
                s = stage.withPart(part.with(pp.key(), value));
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
        Compiled c = cached;
        if (c != null && c.flatten.equals(fo) && (c.stage == stage || c.stage.equals(stage))) {
            return c;
        }
        Connectivity conn;
        List<Object> key = topologyKey(stage);
        if (c != null && c.topologyKey.equals(key)) {
            conn = c.connectivity;
        } else {
            conn = Connectivity.of(stage);
        }
        Netlist nl = NetlistBuilder.flatten(stage, conn, fo);
        TopologyCheck.check(nl);
        Compiled fresh = new Compiled(stage, fo, key, conn, nl, options, c);
        cached = fresh;
        return fresh;
    }

    /** What the netlist structure depends on: parts' designators, kinds and placements, wires, test points. */
    private static List<Object> topologyKey(Stage stage) {
        List<Object> key = new ArrayList<>(stage.parts().size() * 3 + 2);
        for (Part p : stage.parts()) {
            key.add(p.ref());
            key.add(p.kind());
            key.add(p.placement());
        }
        key.add(stage.wires());
        key.add(stage.testPoints());
        return key;
    }

    /** One compiled stage: netlist, Newton solver, strategy and work arrays. */
    private static final class Compiled {
        final Stage stage;
        final FlattenOptions flatten;
        final List<Object> topologyKey;
        final Connectivity connectivity;
        final Netlist netlist;
        final NewtonSolver newton;
        final DcStrategy strategy;
        final RelayLoopOptions relayLoop;
        final RelayHandle[] relays;
        final double[] x;
        final double[] states;
        final double[] lastTemp;
        final double[] lastTarget;
        final String[] contactsFrom;
        final ArraySolution view;

        Compiled(Stage stage, FlattenOptions flatten, List<Object> topologyKey, Connectivity connectivity,
                 Netlist netlist, DcOptions options, Compiled previous) {
            this.stage = stage;
            this.flatten = flatten;
            this.topologyKey = topologyKey;
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
            this.relays = netlist.relays().toArray(new RelayHandle[0]);
            this.x = new double[netlist.unknownCount()];
            this.states = netlist.initialStates();
            this.lastTemp = new double[relays.length];
            this.lastTarget = new double[relays.length];
            this.contactsFrom = new String[relays.length];
            this.view = new ArraySolution(netlist.nodeCount(), x, states);
        }

        OperatingPoint solve(SolveOptions so, boolean pinHigh, double ambient) {
            Arrays.fill(x, 0.0);
            if (so.start().isPresent()) {
                OperatingPoint start = so.start().get();
                if (!start.copyUnknownsInto(netlist, x)) {
                    Map<String, Double> byName = start.unknownsByNodeName();
                    for (int i = 0; i < netlist.nodeCount(); i++) {
                        x[i] = byName.getOrDefault(netlist.nodeName(i), 0.0);
                    }
                }
            }
            Map<String, Boolean> previous = so.previousRelayOperated();
            for (int r = 0; r < relays.length; r++) {
                RelayHandle h = relays[r];
                states[h.temperatureSlot()] = ambient;
                Boolean prev = previous.get(h.ref());
                states[h.contactSlot()] = prev != null && prev ? 1.0 : 0.0;
            }
            int iterations = 0;
            boolean settled = false;
            for (int pass = 0; pass < relayLoop.maxPasses(); pass++) {
                strategy.solve(x, states);
                iterations += strategy.iterations();
                settled = true;
                for (int r = 0; r < relays.length; r++) {
                    settled &= updateRelay(r, pass, ambient, previous);
                }
                if (settled) {
                    break;
                }
            }
            return new OperatingPoint(netlist, x, states, settled, iterations, strategy.maxResidualAmps(), pinHigh,
                    ambient, contactsFrom);
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
