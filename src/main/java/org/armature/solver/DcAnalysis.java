package org.armature.solver;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.Connectivity;
import org.armature.model.ModelRange;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.ContactState;
import org.armature.netlist.Element;
import org.armature.netlist.FlattenOptions;
import org.armature.netlist.Netlist;
import org.armature.netlist.NetlistBuilder;
import org.armature.netlist.RelayHandle;
import org.armature.netlist.StampContext;
import org.armature.netlist.SwitchedResistor;

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
 *
 * <p>Contact states: a relay without a previous state given starts released (as after power-up),
 * so a stage whose relay operates would spend a pass with released contacts. Instead the loop
 * starts from the contacts of the start point or the last solve; an answer that differs from the
 * default start is kept only when the coil currents, estimated with the contacts put back
 * (Sherman–Morrison–Woodbury on the factored Jacobian), imply the same states with a margin: a start
 * from the default would then settle in the same place. Otherwise (a self-holding contact, a coil
 * current near a threshold) the solve is redone from the default start, so the hysteresis band keeps
 * its power-up and previous-state rules exactly.
 */
public final class DcAnalysis {

    /**
     * Independent checks of every returned answer, looked up only when the system property
     * {@code armature.answerAudit} is {@code true} (surefire sets it): none in the application and in
     * the benchmarks, the honest-residual audit in the unit tests.
     */
    private static final List<AnswerAudit> AUDITS = Boolean.getBoolean("armature.answerAudit")
            ? java.util.ServiceLoader.load(AnswerAudit.class).stream().map(java.util.ServiceLoader.Provider::get).toList()
            : List.of();

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
        requireModelRange(stage, ambient);
        Compiled c = compile(stage, options.flattenOptions(pinHigh, ambient));
        OperatingPoint answer = c.solve(solveOptions, pinHigh, ambient);
        for (AnswerAudit audit : AUDITS) {
            audit.check(stage, answer);
        }
        return answer;
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

    /**
     * Refuses an ambient, or a relay reference temperature, outside the range the device laws hold
     * over ({@link ModelRange}).
     *
     * @throws ModelLimitException naming the value and the valid range
     */
    static void requireModelRange(Stage stage, double ambient) {
        if (!ModelRange.ambientInRange(ambient)) {
            throw new ModelLimitException(ModelLimitException.AMBIENT_OUT_OF_RANGE, "", ambient, "An ambient of "
                    + ambient + " °C is outside the range the copper and junction models hold over; expected "
                    + ModelRange.ambientRangeText() + ".");
        }
        for (Part p : stage.parts()) {
            if (p.kind() == org.armature.model.PartKind.RELAY) {
                double ref = p.value("referenceTemperatureCelsius");
                if (!ModelRange.ambientInRange(ref)) {
                    throw new ModelLimitException(ModelLimitException.AMBIENT_OUT_OF_RANGE, p.ref(), ref, "The reference"
                            + " temperature of " + p.ref() + " is " + ref + " °C, outside the range the copper law holds"
                            + " over; expected " + ModelRange.ambientRangeText() + ".");
                }
            }
        }
    }

    /**
     * Flattens, turning a part value the device models cannot take (a relay whose drop-out is not
     * below its pick-up, a coil without resistance) into the engine's own failure.
     */
    private static Netlist flatten(Stage stage, Connectivity conn, FlattenOptions fo) {
        try {
            return NetlistBuilder.flatten(stage, conn, fo);
        } catch (IllegalArgumentException e) {
            throw ModelLimitException.partOutsideModel(e);
        }
    }

    private Compiled compile(Stage stage, FlattenOptions fo) {
        int slot = fo.pinHigh() ? 1 : 0;
        Compiled c = byPin[slot];
        if (c != null && c.stage == stage && c.flatten.equals(fo)) {
            return c;
        }
        boolean sameTopology = c != null && sameTopology(c.stage, stage);
        Compiled other = byPin[1 - slot];
        // the other pin state compiled this very stage: its part networks serve where the pin does not matter
        Netlist donor = other != null && other.stage == stage && other.flatten.equals(fo.withPinHigh(other.flatten.pinHigh()))
                ? other.netlist : null;
        if (sameTopology && c.patch(stage, fo, donor)) {
            return c;
        }
        boolean otherSame = other != null && sameTopology(other.stage, stage);
        // nets and roles depend on the structure only: found once per topology
        StageRecognition conn;
        if (sameTopology) {
            conn = c.recognition;
        } else if (otherSame) {
            conn = other.recognition;
        } else {
            conn = StageRecognition.of(stage);
        }
        Netlist nl = flatten(stage, conn.connectivity(), fo);
        DcPathCheck.check(nl);
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
        /** Nets and roles of the stage's structure; the switch of every operating point comes from here. */
        final StageRecognition recognition;
        final Optional<String> switchRef;
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
        private boolean settled;
        /** True when the answer in {@link #x} ends with a polishing Newton step. */
        private boolean polished;
        /** The linear solver of {@link #newton}: after a polish step it holds the factors at the solution. */
        private final LinearSolver lu;
        /** Each relay's contact state of a start without a guess: the caller's previous state, else released. */
        private final double[] defaultContacts;
        /** The start point and coil temperatures, kept to redo a solve whose contact guess is not confirmed. */
        private final double[] startX;
        private final double[] startTemps;
        /** The start of a relay-loop pass, kept to redo it without the in-Newton coil update. */
        private final double[] passX;
        private final double[] passStates;
        /** Every relay contact element of the netlist (refreshed when a part is re-flattened). */
        private final SwitchedResistor[] contacts;
        /** Work of the contact check: flipped contacts' nodes and conductance changes, J⁻¹·u, the small system. */
        private final int[] flipA;
        private final int[] flipB;
        private final double[] flipSiemens;
        private final double[][] flipResponse;
        private final double[] small;
        private final double[] smallRhs;
        private final double[] delta;
        private final ArraySolution deltaView;

        Compiled(Stage stage, FlattenOptions flatten, StageRecognition recognition, Netlist netlist, DcOptions options) {
            this.stage = stage;
            this.flatten = flatten;
            this.recognition = recognition;
            this.switchRef = recognition.roles().map(StageRoles::switchRef);
            this.netlist = netlist;
            int n = Math.max(1, netlist.unknownCount());
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
            this.defaultContacts = new double[relays.length];
            this.startX = new double[netlist.unknownCount()];
            this.startTemps = new double[states.length];
            this.passX = new double[netlist.unknownCount()];
            this.passStates = new double[states.length];
            int m = 0;
            for (Element e : netlist.elements()) {
                if (e instanceof SwitchedResistor) {
                    m++;
                }
            }
            this.contacts = new SwitchedResistor[m];
            refreshContacts();
            this.flipA = new int[m];
            this.flipB = new int[m];
            this.flipSiemens = new double[m];
            this.flipResponse = new double[m][netlist.unknownCount()];
            this.small = new double[m * m];
            this.smallRhs = new double[m];
            this.delta = new double[netlist.unknownCount()];
            this.deltaView = new ArraySolution(netlist.nodeCount(), delta, states);
        }

        private void refreshContacts() {
            int m = 0;
            for (Element e : netlist.elements()) {
                if (e instanceof SwitchedResistor sr) {
                    contacts[m++] = sr;
                }
            }
        }

        /**
         * Takes a stage of the same topology: re-flattens the parts whose values differ (when only
         * the ambient differs, also every part whose flattening depends on it,
         * {@link NetlistBuilder#flattensWithAmbient}; every part when other options differ), taking
         * the part networks of {@code donor} (the other pin state's netlist of the same stage, or
         * null) where the pin state does not matter. False if some part's structure would change.
         */
        boolean patch(Stage next, FlattenOptions fo, Netlist donor) {
            List<Part> now = stage.parts();
            List<Part> then = next.parts();
            boolean all = !fo.equals(flatten);
            boolean ambientOnly = all && fo.sameExceptAmbient(flatten);
            int count = 0;
            for (int i = 0; i < then.size(); i++) {
                Part a = now.get(i);
                Part b = then.get(i);
                boolean byOptions = all && (!ambientOnly || NetlistBuilder.flattensWithAmbient(b.kind()));
                if (byOptions || (a != b && !a.equals(b))) {
                    changed[count++] = i;
                }
            }
            if (count > 0) {
                Optional<Netlist> patched;
                try {
                    patched = NetlistBuilder.reflatten(netlist, next, fo, donor,
                            count == changed.length ? changed : Arrays.copyOf(changed, count));
                } catch (IllegalArgumentException e) {
                    throw ModelLimitException.partOutsideModel(e);
                }
                if (patched.isEmpty()) {
                    return false;
                }
                netlist = patched.get();
                newton.rebind(netlist);
                List<RelayHandle> rs = netlist.relays();
                for (int r = 0; r < relays.length; r++) {
                    relays[r] = rs.get(r);
                }
                refreshContacts();
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
            boolean guessed = false;
            for (int r = 0; r < relays.length; r++) {
                RelayHandle h = relays[r];
                int ts = h.temperatureSlot();
                int cs = h.contactSlot();
                // the coil temperature of a start point is only a guess: the loop settles it
                if (startStates) {
                    states[ts] = startOp.stateValue(ts);
                } else if (startOp == null && warmStart && hasLast) {
                    states[ts] = lastStates[ts];
                } else {
                    states[ts] = ambient;
                }
                Boolean prev = previous.get(h.ref());
                defaultContacts[r] = prev != null && prev ? 1.0 : 0.0;
                // without a previous state, the contacts of the start point (or of the last solve) are a
                // first guess only: a result that differs from the default start is confirmed below
                double guess = defaultContacts[r];
                if (prev == null && startStates) {
                    guess = ContactState.of(startOp.stateValue(cs)).slotValue();
                } else if (prev == null && startOp == null && warmStart && hasLast) {
                    guess = ContactState.of(lastStates[cs]).slotValue();
                }
                states[cs] = guess;
                guessed |= guess != defaultContacts[r];
            }
            hasLast = false;
            polished = false;
            boolean fast = !cold || guessed;
            int iterations = 0;
            boolean verified = false;
            try {
                iterations += fastOrFull(guessed, cold, previous);
                verified = verify();
            } catch (NonConvergenceException | SingularCircuitException e) {
                if (!fast) {
                    throw coilLimitOr(e);
                }
            }
            if (!verified && fast) {
                // the fast path gave no answer that passes the test: the full solve from 0 V decides
                Arrays.fill(x, 0.0);
                for (int r = 0; r < relays.length; r++) {
                    states[relays[r].temperatureSlot()] = ambient;
                    states[relays[r].contactSlot()] = defaultContacts[r];
                }
                try {
                    iterations += relayLoop(true, previous);
                    polished = newton.polish(x, states, StampContext.DC);
                    if (polished) {
                        iterations++;
                    }
                } catch (NonConvergenceException | SingularCircuitException e) {
                    throw coilLimitOr(e);
                }
                verified = verify();
            }
            checkCoilLimits();
            if (!verified) {
                throw NonConvergenceException.failedTest(iterations, netlist.unknownName(newton.worstResidualNode()),
                        newton.maxResidualAmps());
            }
            System.arraycopy(x, 0, lastX, 0, x.length);
            System.arraycopy(states, 0, lastStates, 0, states.length);
            hasLast = true;
            return new OperatingPoint(netlist, x, states, settled, iterations, newton.maxResidualAmps(), pinHigh,
                    ambient, contactsFrom, switchRef);
        }

        /**
         * The solve from the prepared start: with a contact guess, the relay loop from the guess,
         * kept only when the low-rank check confirms it, else the relay loop from the default
         * contacts; then one polishing Newton step.
         *
         * @return Newton iterations spent
         */
        private int fastOrFull(boolean guessed, boolean cold, Map<String, Boolean> previous) {
            int iterations = 0;
            boolean confirmed = false;
            if (guessed) {
                System.arraycopy(x, 0, startX, 0, x.length);
                System.arraycopy(states, 0, startTemps, 0, states.length);
                try {
                    iterations += relayLoop(cold, previous);
                    polished = newton.polish(x, states, StampContext.DC);
                    if (polished) {
                        iterations++;
                    }
                    confirmed = settled && (atDefaultContacts() || polished && defaultStartAgrees(previous));
                } catch (SolverException e) {
                    // the guessed contact state did not solve; the default start below decides
                    confirmed = false;
                }
                if (!confirmed) {
                    System.arraycopy(startX, 0, x, 0, x.length);
                    System.arraycopy(startTemps, 0, states, 0, states.length);
                    for (int r = 0; r < relays.length; r++) {
                        states[relays[r].contactSlot()] = defaultContacts[r];
                    }
                }
            }
            if (!confirmed) {
                iterations += relayLoop(cold, previous);
                polished = newton.polish(x, states, StampContext.DC);
                if (polished) {
                    iterations++;
                }
            }
            return iterations;
        }

        /**
         * The one convergence test, on what is about to be returned ({@link NewtonSolver#verify}):
         * node residuals and the update test at {@code x}, with every coil temperature settled there.
         * Sets the residual the result reports.
         */
        private boolean verify() {
            // after a polishing step the update test is that step's (the last update of the answer), and only
            // the node test remains to be done at the answer; otherwise the full test takes its own step
            boolean ok = polished ? newton.polishUpdateOk() && newton.residualTest(x, states, StampContext.DC, 0.0)
                    : newton.verify(x, states, StampContext.DC);
            for (RelayHandle h : relays) {
                double t = states[h.temperatureSlot()];
                double target = ambient + square(h.coil().current(view)) * h.coil().ohmsAt(t)
                        * h.thermalResistanceKelvinPerWatt();
                // the relay loop settles to its tolerance at a Newton answer whose coil current may sit reltol
                // from the polished one (the rise goes with the square of it): twice each
                double allowed = 2 * relayLoop.coilTemperatureToleranceKelvin()
                        + 4 * newton.options().tolerances().reltol() * Math.abs(target - ambient);
                ok &= Math.abs(target - t) <= allowed;
            }
            return ok;
        }

        private static double square(double v) {
            return v * v;
        }

        /** Throws the coil finding when a coil ran past the insulation limit. */
        private void checkCoilLimits() {
            for (RelayHandle h : relays) {
                double t = states[h.temperatureSlot()];
                if (!(t <= ModelRange.COIL_INSULATION_LIMIT_CELSIUS)) {
                    throw coilTooHot(h.ref(), t);
                }
            }
        }

        /** The coil finding in place of a failure when a coil temperature passed the limit, else the failure. */
        private SolverException coilLimitOr(SolverException e) {
            for (RelayHandle h : relays) {
                double t = states[h.temperatureSlot()];
                if (!(t <= ModelRange.COIL_INSULATION_LIMIT_CELSIUS)) {
                    return coilTooHot(h.ref(), t);
                }
            }
            return e;
        }

        private ModelLimitException coilTooHot(String ref, double celsius) {
            String reached = Double.isFinite(celsius) && celsius < MAX_COIL_CELSIUS
                    ? "reaches " + Math.round(celsius) + " °C"
                    : "has no steady state (it passes " + Math.round(MAX_COIL_CELSIUS) + " °C)";
            return new ModelLimitException(ModelLimitException.COIL_TOO_HOT, ref, celsius, "The coil of " + ref
                    + " heats itself past every insulation class: its winding " + reached + " at "
                    + ambient + " °C ambient, above the " + Math.round(ModelRange.COIL_INSULATION_LIMIT_CELSIUS)
                    + " °C of the hottest class (IEC 60085); check the coil voltage, the supply polarity and the coil's"
                    + " thermal resistance.");
        }

        /**
         * The relay loop from the contact states in {@code states}: solve, update each coil
         * temperature and contact state, re-solve until they settle; sets {@link #settled}.
         *
         * @return Newton iterations spent
         */
        private int relayLoop(boolean cold, Map<String, Boolean> previous) {
            int iterations = 0;
            settled = false;
            StateUpdater coilHeat = relays.length > 0 ? this : null;
            for (int pass = 0; pass < relayLoop.maxPasses(); pass++) {
                if (coilHeat == null) {
                    strategy.solve(x, states, cold && pass == 0, null);
                } else {
                    System.arraycopy(x, 0, passX, 0, x.length);
                    System.arraycopy(states, 0, passStates, 0, states.length);
                    try {
                        strategy.solve(x, states, cold && pass == 0, coilHeat);
                    } catch (NonConvergenceException e) {
                        // the coil temperature inside Newton can cycle with a soft coil drive (a switch with a
                        // large output conductance); the passes below then settle it as a plain fixed point
                        iterations += strategy.iterations();
                        coilHeat = null;
                        System.arraycopy(passX, 0, x, 0, x.length);
                        System.arraycopy(passStates, 0, states, 0, states.length);
                        strategy.solve(x, states, cold && pass == 0, null);
                    }
                }
                iterations += strategy.iterations();
                settled = true;
                for (int r = 0; r < relays.length; r++) {
                    settled &= updateRelay(r, pass, ambient, previous);
                }
                if (settled) {
                    break;
                }
            }
            return iterations;
        }

        /** @return true if every relay's contacts are in the state a start without a guess begins with */
        private boolean atDefaultContacts() {
            for (int r = 0; r < relays.length; r++) {
                if (states[relays[r].contactSlot()] != defaultContacts[r]) {
                    return false;
                }
            }
            return true;
        }

        /**
         * Whether a start from the default contact states would settle where the guess did. That
         * start solves first with the default contacts, then moves each relay to the state its coil
         * current implies; so it ends at this solution exactly when, with every contact put back to
         * its default, each coil current still implies the state solved here. The change of the coil
         * currents is estimated by the linear response at the solution: the contacts are
         * resistances, so putting them back is a low-rank change ΔG = U·D·Uᵀ of the factored
         * Jacobian J, and the Newton step from the solution is δ = −J⁻¹U·(D⁻¹ + UᵀJ⁻¹U)⁻¹·Uᵀx
         * (Sherman–Morrison–Woodbury; Golub and Van Loan, Matrix Computations, 2.1.4). A coil current
         * counts as unchanged in its implied state only when that state holds over
         * ±({@link #CONTACT_CHECK_SAFETY}·|Δi| + the current tolerance of the solve).
         *
         * @return true if confirmed; false when unsure (then the caller solves from the default start)
         */
        private boolean defaultStartAgrees(Map<String, Boolean> previous) {
            int n = x.length;
            int m = 0;
            for (SwitchedResistor c : contacts) {
                int slot = c.stateSlot();
                double now = states[slot];
                double back = defaultContactsOfSlot(slot);
                if (now == back) {
                    continue;
                }
                double change = 1.0 / c.ohms(ContactState.of(back).operated()) - 1.0 / c.ohms(ContactState.of(now).operated());
                if (change == 0.0) {
                    continue;
                }
                flipA[m] = c.nodeA();
                flipB[m] = c.nodeB();
                flipSiemens[m] = change;
                double[] z = flipResponse[m];
                Arrays.fill(z, 0.0);
                if (flipA[m] >= 0) {
                    z[flipA[m]] = 1.0;
                }
                if (flipB[m] >= 0) {
                    z[flipB[m]] -= 1.0;
                }
                lu.solve(z);
                m++;
            }
            // the small system (D⁻¹ + UᵀZ)·c = Uᵀx, Z = J⁻¹U
            for (int e = 0; e < m; e++) {
                for (int f = 0; f < m; f++) {
                    double[] z = flipResponse[f];
                    small[e * m + f] = (e == f ? 1.0 / flipSiemens[e] : 0.0) + at(z, flipA[e]) - at(z, flipB[e]);
                }
                smallRhs[e] = at(x, flipA[e]) - at(x, flipB[e]);
            }
            if (!solveSmall(m)) {
                return false;
            }
            Arrays.fill(delta, 0.0);
            for (int f = 0; f < m; f++) {
                double cf = smallRhs[f];
                double[] z = flipResponse[f];
                for (int i = 0; i < n; i++) {
                    delta[i] -= z[i] * cf;
                }
            }
            deltaView.bind(delta, states);
            ConvergenceTolerances tol = newton.options().tolerances();
            for (int r = 0; r < relays.length; r++) {
                RelayHandle h = relays[r];
                double i = Math.abs(h.coil().current(view));
                double di = Math.abs(h.coil().current(deltaView));
                if (!Double.isFinite(di)) {
                    return false;
                }
                double spread = CONTACT_CHECK_SAFETY * di + tol.reltol() * i + tol.abstolAmps();
                double solved = states[h.contactSlot()];
                Boolean prev = previous.get(h.ref());
                if (implied(h, i - spread, prev) != solved || implied(h, i + spread, prev) != solved) {
                    return false;
                }
            }
            return true;
        }

        private double defaultContactsOfSlot(int slot) {
            for (int r = 0; r < relays.length; r++) {
                if (relays[r].contactSlot() == slot) {
                    return defaultContacts[r];
                }
            }
            return states[slot];
        }

        /** The contact state (1 operated, 0 released) a coil current implies, as {@link #updateRelay} decides it. */
        private static double implied(RelayHandle h, double coilAmps, Boolean prev) {
            RelayHandle.State st = h.stateFor(Math.max(0.0, coilAmps));
            if (st == RelayHandle.State.OPERATED) {
                return 1.0;
            }
            if (st == RelayHandle.State.RELEASED) {
                return 0.0;
            }
            return prev != null && prev ? 1.0 : 0.0;
        }

        private static double at(double[] v, int node) {
            return node >= 0 ? v[node] : 0.0;
        }

        /** Gaussian elimination with partial pivoting of the m × m contact system, in place; false if singular. */
        private boolean solveSmall(int m) {
            double[] a = small;
            double[] b = smallRhs;
            for (int k = 0; k < m; k++) {
                int p = k;
                for (int i = k + 1; i < m; i++) {
                    if (Math.abs(a[i * m + k]) > Math.abs(a[p * m + k])) {
                        p = i;
                    }
                }
                if (p != k) {
                    for (int j = 0; j < m; j++) {
                        double t = a[k * m + j];
                        a[k * m + j] = a[p * m + j];
                        a[p * m + j] = t;
                    }
                    double t = b[k];
                    b[k] = b[p];
                    b[p] = t;
                }
                double pivot = a[k * m + k];
                if (!(pivot != 0.0) || !Double.isFinite(pivot)) {
                    return false;
                }
                for (int i = k + 1; i < m; i++) {
                    double f = a[i * m + k] / pivot;
                    for (int j = k; j < m; j++) {
                        a[i * m + j] -= f * a[k * m + j];
                    }
                    b[i] -= f * b[k];
                }
            }
            for (int i = m - 1; i >= 0; i--) {
                double sum = b[i];
                for (int j = i + 1; j < m; j++) {
                    sum -= a[i * m + j] * b[j];
                }
                b[i] = sum / a[i * m + i];
                if (!Double.isFinite(b[i])) {
                    return false;
                }
            }
            return true;
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
                    st[ts] = Math.min(Math.max(t + (target - t) / (1.0 - slope), MIN_COIL_CELSIUS), MAX_COIL_CELSIUS);
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
                states[ts] = Math.min(Math.max(next, MIN_COIL_CELSIUS), MAX_COIL_CELSIUS);
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
    /**
     * Safety factor on the linear estimate of how much a coil current changes when the contacts go
     * back to their default state: the estimate is one Newton step from the solution, whose error is
     * second order in that (small) change, so ten times the change bounds it with room to spare.
     */
    private static final double CONTACT_CHECK_SAFETY = 10.0;
    private static final double MAX_SECANT_SLOPE = 5.0;
    /** Floor of a coil temperature update, °C: just above copper's zero-resistance intercept. */
    private static final double MIN_COIL_CELSIUS = -234.0;
    /**
     * Ceiling of a coil temperature update, °C: far above the insulation limit
     * ({@link ModelRange#COIL_INSULATION_LIMIT_CELSIUS}), so a coil pinned here has no steady state
     * worth the name, while the numbers stay finite for the finding.
     */
    private static final double MAX_COIL_CELSIUS = 5000.0;
}
