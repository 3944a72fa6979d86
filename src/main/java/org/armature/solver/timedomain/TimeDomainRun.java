package org.armature.solver.timedomain;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.Element;
import org.armature.netlist.Netlist;
import org.armature.netlist.NetlistBuilder;
import org.armature.netlist.StampContext;
import org.armature.solver.ConvergenceTolerances;
import org.armature.solver.DenseLu;
import org.armature.solver.NewtonOptions;
import org.armature.solver.NewtonSolver;

/**
 * The step loop of one run: DC operating point, then time points under local-truncation-error
 * control (check-values.md NM-9, NM-10), a time point on every breakpoint (drive edges, ends of armature
 * transit) with a backward-Euler restart after each (NM-7), and relay thresholds located in time by
 * {@link EventLocator} within {@link StepOptions#eventTimeToleranceSeconds()}. Moving armatures
 * ({@link ArmatureDynamics}) are solved with the circuit at every time point (staggered fixed
 * point), their gaps join the error test, and their events (leaving a stop, contact set point,
 * arrival at a stop) are located alike.
 *
 * <p>Single use: construct, {@link #run()}, read the result.
 */
final class TimeDomainRun {

    private static final String DRIVE = "drive";

    private final TimeDomainCircuit c;
    private final DriveWaveform drive;
    private final double duration;
    private final StepOptions o;
    private final StepController control;
    private final NewtonSolver newtonLow;
    private final NewtonSolver newtonHigh;
    private int newtonIterations;
    private final int n;
    private final int stateCount;
    /** States of the reactive elements; the armature gaps follow them in the state vector. */
    private final int reactiveStates;
    /** Time of the last accepted point, seconds (the start of the step being solved). */
    private double tCommitted;
    /** Length of the first step after the latest restart, seconds. */
    private double restartStep;
    /**
     * First step after an armature event (leaving a stop, contact change, arrival) as a fraction of
     * the step that reached it: 1e-3 (our choice). These events bend the waveforms (the gap's
     * acceleration or speed jumps) but do not make them jump the way a drive edge does, so the
     * restart need not fall to {@link StepOptions#firstStepSeconds()}; the error test resumes from
     * the second step after it.
     */
    static final double EVENT_RESTART_FRACTION = 1e-3;
    /**
     * First step of a run that starts without an edge, as a fraction of the largest step: 0.1 (our
     * choice). The DC operating point is a steady state, so nothing changes until the first edge;
     * the error test takes over from the second step.
     */
    static final double START_STEP_FRACTION = 0.1;
    private final ArraySolution view;
    private final TreeMap<Double, String> breakpoints = new TreeMap<>();
    private final List<TransientEvent> events = new ArrayList<>();

    private final List<Double> times = new ArrayList<>();
    private final List<double[]> samples = new ArrayList<>();
    private final List<double[]> internals = new ArrayList<>();

    private double[] x;
    /** The solution before {@link #x}, for the predictor. */
    private double[] xPrev;
    private double[] states;
    private final double[][] histTimes;
    private final double[][] histStates;
    private int histCount;
    /**
     * Largest magnitude of each state so far: the relative tolerance applies to it, so that a
     * ringing or decaying state is held to a fraction of its own amplitude, not of its momentary
     * value near a zero crossing (common practice).
     */
    private final double[] stateScale;
    private int accepted;
    private int rejected;
    /** The step just refused is tried again with backward Euler. */
    private boolean eulerRetry;
    /** The last three committed derivatives of each reactive element, newest first. */
    private double[][] derivativeHistory;
    /** Points in {@link #derivativeHistory} since the last restart. */
    private int derivativeCount;
    private boolean highNow;

    TimeDomainRun(TimeDomainCircuit circuit, DriveWaveform drive, double durationSeconds, StepOptions options) {
        if (!(durationSeconds > 0) || !Double.isFinite(durationSeconds)) {
            throw new IllegalArgumentException("durationSeconds must be positive, was " + durationSeconds);
        }
        this.c = circuit;
        this.drive = drive;
        this.duration = durationSeconds;
        this.o = options;
        this.control = new StepController(options);
        this.n = circuit.nodeCount + circuit.branchCount;
        NewtonOptions no = new NewtonOptions(options.newtonMaxIterations(), MAX_NODE_STEP_VOLTS,
                new ConvergenceTolerances(options.newtonRelativeTolerance(), options.newtonAbsoluteVolts(),
                        options.newtonAbsoluteAmps()), DenseLu.DEFAULT_RELATIVE_PIVOT_THRESHOLD);
        this.newtonLow = new NewtonSolver(netlist(circuit, circuit.driveLow), no);
        this.newtonHigh = new NewtonSolver(netlist(circuit, circuit.driveHigh), no);
        int s = 0;
        for (Reactive r : circuit.reactives) {
            s += r.stateCount();
        }
        this.reactiveStates = s;
        s += circuit.armatures.size();
        this.stateCount = s;
        this.histTimes = new double[4][1];
        this.histStates = new double[4][s];
        this.stateScale = new double[s];
        this.view = new ArraySolution(circuit.nodeCount, new double[n], new double[0]);
    }

    /**
     * Newton damping limit at time points: the predictor (last accepted point) is close, so a large
     * update is real (a kickback of kilovolts within one step), not a runaway; 1e5 V lies above any
     * voltage a relay stage can reach.
     */
    private static final double MAX_NODE_STEP_VOLTS = 1e5;

    /** The circuit's elements with one drive level, laid out as the circuit says, for the solver's Newton loop. */
    private static Netlist netlist(TimeDomainCircuit c, List<Element> drive) {
        NetlistBuilder b = new NetlistBuilder();
        for (int i = 0; i < c.nodeCount; i++) {
            int node = b.node(c.nodeName(i));
            if (node != i) {
                throw new IllegalStateException("node layout mismatch at " + c.nodeName(i));
            }
        }
        for (int i = 0; i < c.branchCount; i++) {
            b.allocateBranch("branch " + i);
        }
        for (double s : c.initialStates) {
            b.allocateState(s);
        }
        for (Element e : c.common) {
            b.add(e);
        }
        for (Element e : drive) {
            b.add(e);
        }
        return b.build();
    }

    private boolean newton(double[] trial, StampContext ctx) {
        NewtonSolver s = highNow ? newtonHigh : newtonLow;
        System.arraycopy(trial, 0, retryStart, 0, n);
        boolean ok = s.run(trial, states, ctx, 0);
        newtonIterations += s.iterations();
        lastCtx = ctx;
        lastShunt = 0.0;
        return ok || shunted(s, trial, ctx);
    }

    /** Newton from a predicted start, with the junction limiting seeded at the last accepted point. */
    private boolean newtonPredicted(double[] trial, StampContext ctx) {
        NewtonSolver s = highNow ? newtonHigh : newtonLow;
        System.arraycopy(trial, 0, retryStart, 0, n);
        boolean ok = s.runPredicted(trial, x, states, ctx);
        newtonIterations += s.iterations();
        lastCtx = ctx;
        lastShunt = 0.0;
        if (ok) {
            return true;
        }
        System.arraycopy(x, 0, trial, 0, n);
        System.arraycopy(x, 0, retryStart, 0, n);
        return shunted(s, trial, ctx);
    }

    /**
     * The fallback of a failed time point: the same solve with {@link #FALLBACK_SHUNT_SIEMENS} from
     * every node to ground, which gives a node that only reverse-biased junctions touch (between a
     * blocking diode and a blocking zener, for example) a defined voltage (after the gmin practice of
     * check-values.md NM-5). The run without the shunt is always tried first, so converging points are
     * unchanged.
     */
    private boolean shunted(NewtonSolver s, double[] trial, StampContext ctx) {
        System.arraycopy(retryStart, 0, trial, 0, n);
        boolean ok = s.run(trial, states, ctx, FALLBACK_SHUNT_SIEMENS);
        newtonIterations += s.iterations();
        lastShunt = FALLBACK_SHUNT_SIEMENS;
        return ok;
    }

    /** The context and node shunt of the last time-point solve, for the test of the point accepted. */
    private StampContext lastCtx;
    private double lastShunt;
    /** Largest KCL residual over the accepted points, A, and how many failed the node test. */
    private double maxAcceptedResidualAmps;
    private int acceptedFailingKcl;

    /**
     * The honest-residual test of a point about to be accepted, on the values kept
     * ({@link NewtonSolver#residualTest}), whatever path solved it.
     */
    private void testAccepted(double[] point) {
        if (lastCtx == null) {
            return;
        }
        NewtonSolver s = highNow ? newtonHigh : newtonLow;
        if (!s.residualTest(point, states, lastCtx, lastShunt)) {
            acceptedFailingKcl++;
        }
        maxAcceptedResidualAmps = Math.max(maxAcceptedResidualAmps, s.maxResidualAmps());
    }

    /**
     * Node shunt of the fallback, siemens: 1e-9 S (our choice: 12 nA at 12 V, a ten-thousandth of a
     * small relay's drop-out current, yet a million times the junctions' own minimum conductance).
     */
    static final double FALLBACK_SHUNT_SIEMENS = 1e-9;
    /** Start of the solve being attempted, for its fallback. */
    private double[] retryStart;

    TimeDomainResult run() {
        states = c.initialStates.clone();
        x = new double[n];
        xPrev = new double[n];
        retryStart = new double[n];
        derivativeHistory = new double[c.reactives.size()][3];
        highNow = drive.initialHigh();
        operatingPoint();
        for (double e : drive.edgeTimes()) {
            if (e < duration) {
                breakpoints.put(e, DRIVE);
            }
        }
        breakpoints.put(duration, "end");
        double t = 0;
        view.bind(x, states);
        for (Reactive r : c.reactives) {
            r.initialise(view);
        }
        record(0, x);
        histCount = 0;
        pushHistory(0, statesAt(x, new double[stateCount]));
        double maxStep = o.maxStepFraction() * duration;
        // the run starts from its DC operating point, a steady state: the first step may be long
        // unless an edge sits at t = 0
        double h = breakpoints.containsKey(0.0) ? o.firstStepSeconds()
                : Math.max(o.firstStepSeconds(), START_STEP_FRACTION * maxStep);
        restartStep = h;
        double hPrev = h;
        if (breakpoints.containsKey(0.0)) {
            handleBreakpoints(0);
        }
        double[] trial = new double[n];
        double[] newStates = new double[stateCount];
        double[] gOld = new double[eventCount()];
        int steps = 0;
        while (t < duration) {
            if (++steps > o.maxSteps()) {
                throw new TransientFailureException("step budget exhausted", t, h);
            }
            double tb = breakpoints.ceilingKey(Math.nextUp(t));
            double hTry = Math.min(h, maxStep);
            if (t + hTry >= tb - 0.1 * hTry) {
                hTry = tb - t;
            }
            IntegrationMethod method;
            boolean checkError;
            if (histCount < 2) {
                method = IntegrationMethod.BACKWARD_EULER;
                checkError = false;
                hTry = Math.min(hTry, restartStep);
            } else if (histCount < o.method().order() + 2) {
                method = IntegrationMethod.BACKWARD_EULER;
                checkError = true;
            } else {
                method = eulerRetry ? IntegrationMethod.BACKWARD_EULER : o.method();
                checkError = true;
            }
            eulerRetry = false;
            IntegratorCoefficients k = IntegratorCoefficients.of(method, hTry, hPrev);
            boolean predicted = predict(trial, hTry / hPrev);
            if (!solve(trial, t + hTry, k, predicted)) {
                rejected++;
                h = hTry * o.newtonFailureShrinkFactor();
                if (h < o.minStepSeconds()) {
                    throw new TransientFailureException("Newton did not converge", t, hTry);
                }
                continue;
            }
            double ratio = 0;
            if (checkError) {
                ratio = errorRatio(trial, t + hTry, k, newStates);
                if (!control.accept(ratio)) {
                    rejected++;
                    h = control.propose(hTry, ratio, method.order());
                    if (h < o.minStepSeconds()) {
                        throw new TransientFailureException("step fell below minStepSeconds", t, h);
                    }
                    continue;
                }
            }
            if (method == IntegrationMethod.TRAPEZOIDAL && unresolvedReversal(trial)) {
                // the same step again with backward Euler, which follows the fast mode instead of
                // overshooting it
                rejected++;
                eulerRetry = true;
                h = hTry;
                continue;
            }
            // relay thresholds and armature events: locate the earliest crossing inside the step
            view.bind(x, states);
            int eventTotal = gOld.length;
            for (int i = 0; i < eventTotal; i++) {
                gOld[i] = eventCommitted(i);
            }
            view.bind(trial, states);
            int crossing = -1;
            double earliest = Double.POSITIVE_INFINITY;
            for (int i = 0; i < eventTotal; i++) {
                double gNew = eventTrial(i, view);
                if (gOld[i] < 0 && gNew >= 0) {
                    double est = t + hTry * (-gOld[i]) / (gNew - gOld[i]);
                    if (est < earliest) {
                        earliest = est;
                        crossing = i;
                    }
                }
            }
            if (crossing >= 0 && hTry > o.eventTimeToleranceSeconds()) {
                view.bind(trial, states);
                EventLocator loc = new EventLocator(t, gOld[crossing], t + hTry, eventTrial(crossing, view),
                        o.eventTimeToleranceSeconds());
                double[] best = trial.clone();
                IntegratorCoefficients bestK = k;
                double[] probe = new double[n];
                int guard = 0;
                while (!loc.located() && guard++ < 60) {
                    double tt = loc.nextTrial();
                    IntegratorCoefficients kk = IntegratorCoefficients.of(method, tt - t, hPrev);
                    System.arraycopy(x, 0, probe, 0, n);
                    if (!solve(probe, tt, kk)) {
                        break;
                    }
                    view.bind(probe, states);
                    double g = eventTrial(crossing, view);
                    loc.update(tt, g);
                    if (loc.eventTime() == tt) {
                        System.arraycopy(probe, 0, best, 0, n);
                        bestK = kk;
                    }
                }
                hTry = loc.eventTime() - t;
                k = bestK;
                System.arraycopy(best, 0, trial, 0, n);
                c.step.set(k);
                if (!c.armatures.isEmpty() && !solve(trial, t + hTry, k)) {
                    // the armature states must belong to the point kept; its solve converged before
                    throw new TransientFailureException("no solution at a located armature event", t, hTry);
                }
            } else {
                crossing = -1;
            }
            // accept
            double tNew = t + hTry;
            testAccepted(trial);
            record(tNew, trial);
            statesAt(trial, newStates);
            view.bind(trial, states);
            for (Reactive r : c.reactives) {
                r.commit(view);
            }
            for (ArmatureDynamics a : c.armatures) {
                a.commit(k);
            }
            System.arraycopy(x, 0, xPrev, 0, n);
            System.arraycopy(trial, 0, x, 0, n);
            t = tNew;
            tCommitted = t;
            accepted++;
            hPrev = hTry;
            boolean ringing = ringing() && method == IntegrationMethod.TRAPEZOIDAL;
            pushHistory(t, newStates);
            if (ringing) {
                // one damped step: backward Euler at the step the control proposes, error test on
                histCount = Math.min(histCount, o.method().order() + 1);
            }
            h = checkError ? control.propose(hTry, ratio, method.order()) : hTry * o.maxGrowthFactor();
            if (crossing >= c.relays.size()) {
                int index = crossing - c.relays.size();
                ArmatureDynamics a = c.armatures.get(index / ArmatureDynamics.EVENT_COUNT);
                String what = a.handle(index % ArmatureDynamics.EVENT_COUNT);
                events.add(new TransientEvent(t, what, a.ref));
                states[a.contactSlot] = a.contactsOperated ? 1.0 : 0.0;
                restart();
                restartStep = Math.max(o.firstStepSeconds(), EVENT_RESTART_FRACTION * h);
                h = restartStep;
            } else if (crossing >= 0) {
                RelayDynamics r = c.relays.get(crossing);
                boolean wasAttracted = r.headingAttracted();
                double arrival = r.reverse(t);
                events.add(new TransientEvent(t, wasAttracted ? TransientEvent.DROP_OUT : TransientEvent.PICK_UP, r.ref));
                String key = "relay:" + crossing;
                breakpoints.values().removeIf(v -> v.equals(key));
                if (arrival <= t) {
                    arrive(crossing, t);
                    restart();
                    restartStep = o.firstStepSeconds();
                    h = restartStep;
                } else if (arrival < duration) {
                    breakpoints.put(arrival, key);
                }
            }
            if (breakpoints.containsKey(t) && t < duration) {
                handleBreakpoints(t);
                restartStep = o.firstStepSeconds();
                h = restartStep;
            }
        }
        List<Trace> traces = new ArrayList<>();
        double[] time = times.stream().mapToDouble(Double::doubleValue).toArray();
        List<String> names = traceNames();
        List<String> units = traceUnits();
        for (int j = 0; j < names.size(); j++) {
            double[] col = new double[samples.size()];
            for (int i = 0; i < col.length; i++) {
                col[i] = samples.get(i)[j];
            }
            traces.add(new Trace(names.get(j), units.get(j), col));
        }
        double[][] internal = new double[INTERNALS][samples.size()];
        for (int i = 0; i < samples.size(); i++) {
            double[] row = internals.get(i);
            for (int j = 0; j < INTERNALS; j++) {
                internal[j][i] = row[j];
            }
        }
        return new TimeDomainResult(new Waveform(time, traces, events), internal, accepted, rejected,
                newtonIterations, maxAcceptedResidualAmps, acceptedFailingKcl);
    }

    /** Columns of the internal (metrics) record. */
    static final int COIL_I = 0;
    static final int COIL_V = 1;
    static final int SWITCH_V = 2;
    static final int SWITCH_P = 3;
    static final int SUPP_P = 4;
    static final int SUPP_I = 5;
    static final int COIL_LOSS_P = 6;
    /** Armature speed of a moving-armature relay, m/s (0 for the constant-inductance model). */
    static final int ARMATURE_SPEED = 7;
    static final int INTERNALS = 8;

    private double coilCurrentCommitted(RelayDynamics r) {
        return samples.isEmpty() ? 0 : r.coil.lambdaNow() / r.coil.henries();
    }

    private void handleBreakpoints(double t) {
        String what = breakpoints.remove(t);
        if (what == null) {
            return;
        }
        if (what.equals(DRIVE)) {
            highNow = !highNow;
                events.add(new TransientEvent(t, highNow ? TransientEvent.DRIVE_HIGH : TransientEvent.DRIVE_LOW, ""));
        } else if (what.startsWith("relay:")) {
            arrive(Integer.parseInt(what.substring(6)), t);
        }
        // a drive edge and a transit end may coincide
        if (breakpoints.containsKey(t)) {
            handleBreakpoints(t);
            return;
        }
        restart();
    }

    private void arrive(int index, double t) {
        RelayDynamics r = c.relays.get(index);
        boolean attracted = r.arrive();
        states[r.contactSlot] = attracted ? 1.0 : 0.0;
        events.add(new TransientEvent(t, attracted ? TransientEvent.CONTACTS_CLOSED : TransientEvent.CONTACTS_OPEN, r.ref));
    }

    private void restart() {
        // the last accepted point stays as the only history point: values are continuous, derivatives are not
        histCount = 1;
        derivativeCount = 0;
    }

    /** The absolute error tolerance of a unit class (StepOptions). */
    private double absoluteTolerance(Reactive.Unit unit) {
        return switch (unit) {
            case VOLTS -> o.absoluteVoltsTolerance();
            case AMPS -> o.absoluteAmpsTolerance();
            case METRES -> o.absoluteMetresTolerance();
        };
    }

    private void operatingPoint() {
        c.step.setDc();
        // from the DC engine's answer when the stage came with one (its gmin and source stepping and
        // junction presets found it); hand-built circuits start from 0 V
        if (c.startGuess != null && c.startGuess.length == n) {
            System.arraycopy(c.startGuess, 0, x, 0, n);
        }
        boolean ok = newton(x, StampContext.DC);
        if (!ok) {
            // source stepping (check-values.md NM-5): bring the sources up from 10 % in ten steps
            java.util.Arrays.fill(x, 0);
            ok = true;
            for (int i = 1; i <= 10 && ok; i++) {
                ok = newton(x, StampContext.dcScaled(i / 10.0));
            }
            if (!ok) {
                throw new TransientFailureException("no DC operating point", 0, 0);
            }
        }
        // contacts consistent with the coil current; the hysteresis band keeps the initial state
        view.bind(x, states);
        for (RelayDynamics r : c.relays) {
            double i = Math.abs(r.coil.current(view));
            boolean operated = i >= r.pickUpAmps || (i > r.dropOutAmps && r.phase == RelayDynamics.Phase.OPERATED);
            r.phase = operated ? RelayDynamics.Phase.OPERATED : RelayDynamics.Phase.RELEASED;
            if (states[r.contactSlot] != (operated ? 1.0 : 0.0)) {
                states[r.contactSlot] = operated ? 1.0 : 0.0;
                if (!newton(x, StampContext.DC)) {
                    throw new TransientFailureException("no DC operating point after contact change", 0, 0);
                }
            }
        }
        for (ArmatureDynamics a : c.armatures) {
            view.bind(x, states);
            a.settle(a.coil.current(view));
            if (states[a.contactSlot] != (a.contactsOperated ? 1.0 : 0.0)) {
                states[a.contactSlot] = a.contactsOperated ? 1.0 : 0.0;
                if (!newton(x, StampContext.DC)) {
                    throw new TransientFailureException("no DC operating point after contact change", 0, 0);
                }
            }
        }
    }

    /**
     * Solves one time point. With moving armatures the circuit solve and the mechanical solve
     * alternate (staggered fixed point, see {@link ArmatureDynamics}) until every gap settles.
     */
    private boolean solve(double[] trial, double time, IntegratorCoefficients k) {
        return solve(trial, time, k, false);
    }

    /**
     * Solves one time point from {@code trial}; {@code predicted} says it holds the predictor's
     * extrapolation rather than an accepted solution (the first Newton pass then limits against the
     * last accepted point).
     */
    private boolean solve(double[] trial, double time, IntegratorCoefficients k, boolean predicted) {
        c.step.set(k);
        StampContext ctx = new StampContext(StampContext.Mode.TRANSIENT, 1.0, time, 1.0 / k.a0(), k.a0());
        if (c.armatures.isEmpty()) {
            return predicted ? newtonPredicted(trial, ctx) : newton(trial, ctx);
        }
        for (ArmatureDynamics a : c.armatures) {
            a.begin(k, time - tCommitted);
        }
        double gapTolerance = ArmatureDynamics.GAP_ITERATION_FRACTION * o.absoluteMetresTolerance();
        for (int pass = 0; pass < ArmatureDynamics.MAX_COUPLING_PASSES; pass++) {
            if (!(pass == 0 && predicted ? newtonPredicted(trial, ctx) : newton(trial, ctx))) {
                return false;
            }
            view.bind(trial, states);
            double worst = 0;
            for (ArmatureDynamics a : c.armatures) {
                worst = Math.max(worst, Math.abs(a.advance(a.coil.current(view), k)));
            }
            if (worst <= gapTolerance) {
                return true;
            }
        }
        return false;
    }

    /**
     * The Newton start of the next time point: the straight line through the last two accepted
     * points, extended by the step ratio (a first-order predictor, common practice in circuit
     * simulators); the last point alone right after a restart, where the derivative jumps.
     */
    private boolean predict(double[] trial, double stepRatio) {
        if (histCount < 2) {
            System.arraycopy(x, 0, trial, 0, n);
            return false;
        }
        for (int i = 0; i < n; i++) {
            trial[i] = x[i] + stepRatio * (x[i] - xPrev[i]);
        }
        return true;
    }
    
    private int eventCount() {
        return c.relays.size() + ArmatureDynamics.EVENT_COUNT * c.armatures.size();
    }

    /** Event function i at the committed point (view bound to it). */
    private double eventCommitted(int i) {
        if (i < c.relays.size()) {
            RelayDynamics r = c.relays.get(i);
            return r.eventFunction(coilCurrentCommitted(r));
        }
        int j = i - c.relays.size();
        return c.armatures.get(j / ArmatureDynamics.EVENT_COUNT).event(j % ArmatureDynamics.EVENT_COUNT, false);
    }

    /** Event function i at the point just solved (view bound to its solution). */
    private double eventTrial(int i, ArraySolution solved) {
        if (i < c.relays.size()) {
            RelayDynamics r = c.relays.get(i);
            return r.eventFunction(r.coil.current(solved));
        }
        int j = i - c.relays.size();
        return c.armatures.get(j / ArmatureDynamics.EVENT_COUNT).event(j % ArmatureDynamics.EVENT_COUNT, true);
    }

    private double errorRatio(double[] trial, double tNew, IntegratorCoefficients k, double[] newStates) {
        statesAt(trial, newStates);
        int p = k.method().order();
        double[] ts = new double[p + 2];
        double[] vs = new double[p + 2];
        ts[0] = tNew;
        for (int j = 1; j < p + 2; j++) {
            ts[j] = histTimes[j - 1][0];
        }
        double worst = 0;
        int off = 0;
        for (Reactive r : c.reactives) {
            for (int s = 0; s < r.stateCount(); s++) {
                worst = Math.max(worst, stateRatio(off + s, r.unit(s), k, ts, vs, newStates, p));
            }
            off += r.stateCount();
        }
        for (int a = 0; a < c.armatures.size(); a++) {
            worst = Math.max(worst, stateRatio(reactiveStates + a, Reactive.Unit.METRES, k, ts, vs, newStates, p));
        }
        return worst;
    }

    private double stateRatio(int idx, Reactive.Unit unit, IntegratorCoefficients k, double[] ts, double[] vs,
                              double[] newStates, int p) {
        vs[0] = newStates[idx];
        for (int j = 1; j < p + 2; j++) {
            vs[j] = histStates[j - 1][idx];
        }
        double e = TruncationError.estimate(k, ts, vs);
        double abs = absoluteTolerance(unit);
        double scale = Math.max(stateScale[idx], Math.abs(vs[0]));
        return TruncationError.ratio(e, scale, vs[1], o.relativeTolerance(), abs);
    }

    /**
     * Whether the trapezoidal rule is ringing point to point on a mode far faster than the step (a
     * capacitor meeting a diode that has just switched on), which it never damps (check-values.md NM-7): some
     * reactive element's committed derivative (a capacitor's current, a coil's voltage) has changed
     * sign on each of the last three steps, by more than {@link #RINGING_TOLERANCE_MULTIPLE} times its
     * absolute tolerance each time. A ring the step resolves never alternates every step. Called after
     * the elements have committed the new point.
     */
    private boolean ringing() {
        boolean found = false;
        int j = 0;
        for (Reactive r : c.reactives) {
            double d = r.committedDerivative();
            double abs = RINGING_TOLERANCE_MULTIPLE * absoluteTolerance(r.derivativeUnit());
            double[] h = derivativeHistory[j++];
            double d1 = d - h[0];
            double d2 = h[0] - h[1];
            double d3 = h[1] - h[2];
            if (derivativeCount >= 3 && d1 * d2 < 0 && d2 * d3 < 0
                    && Math.abs(d1) > abs && Math.abs(d2) > abs && Math.abs(d3) > abs) {
                found = true;
            }
            h[2] = h[1];
            h[1] = h[0];
            h[0] = d;
        }
        derivativeCount++;
        return found;
    }

    /**
     * Whether a trapezoidal step has turned some capacitor's current from one direction to the other
     * at nearly full strength (the smaller of the two magnitudes at least
     * {@link #REVERSAL_FRACTION} of the larger, and more than {@link #RINGING_TOLERANCE_MULTIPLE}
     * absolute tolerances): the current of a mode far faster than the step (a winding capacitance
     * meeting a freewheeling diode that has just switched on), which the trapezoidal rule reflects
     * instead of following (check-values.md NM-7). A current the step resolves passes through zero gradually.
     */
    private boolean unresolvedReversal(double[] trial) {
        view.bind(trial, states);
        double abs = RINGING_TOLERANCE_MULTIPLE * absoluteTolerance(Reactive.Unit.AMPS);
        for (Reactive r : c.reactives) {
            if (r instanceof TransientCapacitor cap) {
                double before = cap.committedDerivative();
                double now = cap.current(view);
                double small = Math.min(Math.abs(before), Math.abs(now));
                if (before * now < 0 && small > abs && small >= REVERSAL_FRACTION * Math.max(Math.abs(before), Math.abs(now))) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Ratio of the two current magnitudes at which a reversal in one step counts as unresolved: 0.1 (our choice). */
    static final double REVERSAL_FRACTION = 0.1;

    /** Multiple of a state's absolute tolerance below which a change does not count as ringing: 10 (our choice). */
    static final double RINGING_TOLERANCE_MULTIPLE = 10;

    /** Pushes the states of the point just accepted, read before its commit (the coil reads its history). */
    private void pushHistory(double t, double[] stateVector) {
        double[] tRow = histTimes[3];
        double[] sRow = histStates[3];
        for (int j = 3; j > 0; j--) {
            histTimes[j] = histTimes[j - 1];
            histStates[j] = histStates[j - 1];
        }
        histTimes[0] = tRow;
        histStates[0] = sRow;
        tRow[0] = t;
        System.arraycopy(stateVector, 0, sRow, 0, stateCount);
        for (int i = 0; i < stateCount; i++) {
            stateScale[i] = Math.max(stateScale[i], Math.abs(stateVector[i]));
        }
        histCount = Math.min(4, histCount + 1);
    }

    private double[] statesAt(double[] solution, double[] out) {
        view.bind(solution, states);
        int off = 0;
        for (Reactive r : c.reactives) {
            r.states(view, out, off);
            off += r.stateCount();
        }
        for (int a = 0; a < c.armatures.size(); a++) {
            out[reactiveStates + a] = c.armatures.get(a).gTrial;
        }
        return out;
    }

    private List<String> traceNames() {
        List<String> names = new ArrayList<>();
        for (String node : c.namedNodes.keySet()) {
            names.add("V(" + node + ")");
        }
        for (Probe p : c.probes) {
            names.add(p.name());
        }
        if (c.coilCurrent != null) {
            names.add(Waveform.COIL_CURRENT);
        }
        if (!c.relays.isEmpty() || !c.armatures.isEmpty()) {
            names.add(Waveform.ARMATURE_POSITION);
            names.add(Waveform.CONTACT_STATE);
        }
        return names;
    }

    private List<String> traceUnits() {
        List<String> units = new ArrayList<>();
        for (int i = 0; i < c.namedNodes.size(); i++) {
            units.add("V");
        }
        for (Probe p : c.probes) {
            units.add(p.unit());
        }
        if (c.coilCurrent != null) {
            units.add("A");
        }
        if (!c.relays.isEmpty() || !c.armatures.isEmpty()) {
            units.add("m");
            units.add("1");
        }
        return units;
    }

    private void record(double t, double[] solution) {
        view.bind(solution, states);
        c.switchReading.clear();
        times.add(t);
        double[] row = new double[c.namedNodes.size() + c.probes.size() + (c.coilCurrent == null ? 0 : 1)
                + (c.relays.isEmpty() && c.armatures.isEmpty() ? 0 : 2)];
        int j = 0;
        for (int node : c.namedNodes.values()) {
            row[j++] = view.voltage(node);
        }
        for (Probe p : c.probes) {
            row[j++] = p.reader().applyAsDouble(view);
        }
        if (c.coilCurrent != null) {
            row[j++] = c.coilCurrent.reader().applyAsDouble(view);
        }
        if (!c.relays.isEmpty()) {
            RelayDynamics r = c.relays.get(0);
            row[j++] = r.position(t);
            row[j] = states[r.contactSlot];
        } else if (!c.armatures.isEmpty()) {
            ArmatureDynamics a = c.armatures.get(0);
            row[j++] = a.model.travelMetres() - a.gTrial;
            row[j] = states[a.contactSlot];
        }
        samples.add(row);
        double[] in = new double[INTERNALS];
        in[COIL_I] = read(c.coilCurrent);
        in[COIL_V] = read(c.coilVoltage);
        in[SWITCH_V] = read(c.switchVoltage);
        in[SWITCH_P] = read(c.switchPower);
        in[SUPP_P] = read(c.suppressorPower);
        in[SUPP_I] = read(c.suppressorCurrent);
        in[COIL_LOSS_P] = read(c.coilLossPower);
        in[ARMATURE_SPEED] = c.relays.isEmpty() && !c.armatures.isEmpty() ? Math.abs(c.armatures.get(0).uTrial) : 0;
        internals.add(in);
    }

    private double read(Probe p) {
        return p == null ? Double.NaN : p.reader().applyAsDouble(view);
    }
}
