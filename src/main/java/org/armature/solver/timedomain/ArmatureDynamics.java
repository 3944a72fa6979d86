package org.armature.solver.timedomain;

import org.armature.devices.MovingArmature;

/**
 * The electromechanical armature of a relay with an attracted inductance ({@link MovingArmature},
 * fitted by {@link org.armature.devices.RelayArmatureFit}), integrated with the coil.
 *
 * <p>Coupling (our choice, fitting the Norton companion of {@link TransientCoil}): the coil's
 * state is the flux linkage λ, so {@code dλ/dt = v − R·i} with {@code i = λ/L(g)} needs only the
 * coil's inductance set to L(g(n+1)) before each Newton solve; the motional EMF i·L'(g)·dg/dt is
 * then implicit in λ. The gap g and speed u are integrated by the same linear multistep formula
 * as the circuit ({@code x'(n+1) = a0·x(n+1) + history}), with the new coil current from the
 * Newton solution: a scalar Newton solve in g(n+1) of
 * {@code a0·u + hu = (S(g) − F(i, g) − c·u)/m}, {@code u = a0·g + hg}. The run repeats the
 * circuit solve and the mechanical solve (staggered fixed point) until the gap changes by less
 * than {@link #GAP_ITERATION_FRACTION} of the absolute METRES tolerance, and g takes part in the
 * truncation-error test with that tolerance class.
 *
 * <p>Phases: resting at a stop (gap fixed, no motion) until the coil current reaches the current
 * that balances the spring there (pick-up at the released stop, drop-out at the attracted stop),
 * then moving freely until the gap reaches a stop. The leaving of a stop, the crossing of the
 * contact set point and the arrival at a stop are located events of the run; at an arrival the
 * speed is reflected with the coefficient of restitution ({@link MovingArmature#applyStops}).
 */
final class ArmatureDynamics {

    /** Fixed-point test of the staggered coupling, as a fraction of the absolute METRES tolerance: 1e-2. */
    static final double GAP_ITERATION_FRACTION = 1e-2;
    /** Largest number of staggered passes per time point: 30 (a step that needs more is cut). */
    static final int MAX_COUPLING_PASSES = 30;
    /**
     * Speed below which a bounce off a stop counts as having died out, m/s: 1e-3 (our choice; it
     * would rise about 0.5 µm against a 1 m/s² deceleration, under 0.2 % of a 0.3 mm travel).
     */
    static final double REST_SPEED_METRES_PER_SECOND = 1e-3;
    /**
     * Lower bound of the gap in the mechanical solve as a fraction of the offset gi: −½ (a trial may
     * overshoot the attracted stop before the stop is located, but must keep g + gi positive).
     */
    private static final double OVERSHOOT_FRACTION_OF_OFFSET = 0.5;
    /** Relative step test of the scalar mechanical Newton solve, of the travel: 1e-12. */
    private static final double MECH_NEWTON_RELATIVE = 1e-12;
    /** Scalar Newton iterations of the mechanical solve: 30 (quadratic convergence needs about 4). */
    private static final int MECH_NEWTON_ITERATIONS = 30;

    enum Phase { RESTING_RELEASED, MOVING, RESTING_ATTRACTED }

    /** Event kinds, in the order of {@link #event(int, boolean)}. */
    static final int LEAVE_STOP = 0;
    static final int CONTACT = 1;
    static final int ATTRACTED_STOP = 2;
    static final int RELEASED_STOP = 3;
    static final int EVENT_COUNT = 4;
    /** Value of an event function that cannot fire in the present phase (negative: never crosses). */
    private static final double NO_EVENT = -1;

    final String ref;
    final TransientCoil coil;
    final int contactSlot;
    final MovingArmature model;
    Phase phase;
    boolean contactsOperated;

    // committed state and history
    double gNow;
    double gBefore;
    double dgNow;
    double uNow;
    double uBefore;
    double duNow;
    // trial state of the last solve
    double gTrial;
    double uTrial;
    double iTrial;
    private double histG;
    private double histU;

    ArmatureDynamics(String ref, TransientCoil coil, int contactSlot, MovingArmature model, boolean attracted) {
        this.ref = ref;
        this.coil = coil;
        this.contactSlot = contactSlot;
        this.model = model;
        this.phase = attracted ? Phase.RESTING_ATTRACTED : Phase.RESTING_RELEASED;
        this.contactsOperated = attracted;
        double g = attracted ? 0.0 : model.travelMetres();
        gNow = g;
        gBefore = g;
        gTrial = g;
        coil.setHenries(model.inductanceHenries(g));
    }

    /** Sets the phase consistent with a DC coil current (the hysteresis band keeps the present phase). */
    void settle(double coilAmps) {
        double i = Math.abs(coilAmps);
        boolean attracted = i >= model.pickUpAmps() || (i > model.dropOutAmps() && phase == Phase.RESTING_ATTRACTED);
        phase = attracted ? Phase.RESTING_ATTRACTED : Phase.RESTING_RELEASED;
        contactsOperated = attracted;
        double g = attracted ? 0.0 : model.travelMetres();
        gNow = g;
        gBefore = g;
        gTrial = g;
        uNow = 0;
        uBefore = 0;
        dgNow = 0;
        duNow = 0;
        coil.setHenries(model.inductanceHenries(g));
    }

    /** Prepares a step: the history terms of g and u and the gap predictor; sets the coil's L. */
    void begin(IntegratorCoefficients k, double h) {
        histG = k.history(gNow, gBefore, dgNow);
        histU = k.history(uNow, uBefore, duNow);
        // second-order predictor from the committed speed and acceleration (the first coupling pass
        // then starts close to the answer)
        gTrial = phase == Phase.MOVING ? gNow + h * uNow + 0.5 * h * h * duNow : gNow;
        uTrial = phase == Phase.MOVING ? uNow + h * duNow : 0;
        coil.setHenries(model.inductanceHenries(gTrial));
    }

    /**
     * Mechanical solve for a new coil current; sets the coil's inductance for the next pass.
     *
     * @return the change of the gap against the previous pass, metres
     */
    double advance(double coilAmps, IntegratorCoefficients k) {
        iTrial = coilAmps;
        if (phase != Phase.MOVING) {
            return 0;
        }
        double m = model.massKilograms();
        double c = model.dampingNewtonSecondsPerMetre();
        double a0 = k.a0();
        double kk = model.gapPermeanceHenryMetres();
        double springSlope = (model.springForceReleasedNewtons() - model.springForceAttractedNewtons())
                / model.travelMetres();
        double g = gTrial;
        for (int it = 0; it < MECH_NEWTON_ITERATIONS; it++) {
            double u = a0 * g + histG;
            double d = g + model.gapOffsetMetres();
            double pull = 0.5 * coilAmps * coilAmps * kk / (d * d);
            double spring = model.springForceAttractedNewtons() + springSlope * g;
            double f = m * (a0 * u + histU) - spring + pull + c * u;
            double df = m * a0 * a0 - springSlope - coilAmps * coilAmps * kk / (d * d * d) + c * a0;
            double dg = f / df;
            g = Math.max(g - dg, -OVERSHOOT_FRACTION_OF_OFFSET * model.gapOffsetMetres());
            if (Math.abs(dg) <= MECH_NEWTON_RELATIVE * model.travelMetres()) {
                break;
            }
        }
        double change = g - gTrial;
        gTrial = g;
        uTrial = a0 * g + histG;
        coil.setHenries(model.inductanceHenries(g));
        return change;
    }

    /**
     * Event function k, negative before the event and not negative once it happened.
     *
     * @param kind one of the event constants
     * @param trial true for the state of the last solve, false for the committed state
     */
    double event(int kind, boolean trial) {
        double g = trial ? gTrial : gNow;
        double i = Math.abs(trial ? iTrial : coil.lambdaNow() / model.inductanceHenries(gNow));
        return switch (kind) {
            case LEAVE_STOP -> switch (phase) {
                case RESTING_RELEASED -> i - model.pickUpAmps();
                case RESTING_ATTRACTED -> model.dropOutAmps() - i;
                case MOVING -> NO_EVENT;
            };
            case CONTACT -> phase != Phase.MOVING ? NO_EVENT
                    : contactsOperated ? (g - model.contactSetPointMetres()) / model.travelMetres()
                    : (model.contactSetPointMetres() - g) / model.travelMetres();
            case ATTRACTED_STOP -> phase == Phase.MOVING ? -g / model.travelMetres() : NO_EVENT;
            case RELEASED_STOP -> phase == Phase.MOVING ? (g - model.travelMetres()) / model.travelMetres() : NO_EVENT;
            default -> throw new IllegalArgumentException("event kind " + kind);
        };
    }

    /** Makes the trial state the committed one. */
    void commit(IntegratorCoefficients k) {
        gBefore = gNow;
        uBefore = uNow;
        if (phase == Phase.MOVING) {
            dgNow = k.derivative(gTrial, histG);
            duNow = k.derivative(uTrial, histU);
        } else {
            dgNow = 0;
            duNow = 0;
        }
        gNow = gTrial;
        uNow = uTrial;
    }

    /**
     * Handles an event located at the committed point.
     *
     * @return the {@link TransientEvent} key, or {@code ""} for none
     */
    String handle(int kind) {
        switch (kind) {
            case LEAVE_STOP -> {
                boolean fromAttracted = phase == Phase.RESTING_ATTRACTED;
                phase = Phase.MOVING;
                return fromAttracted ? TransientEvent.DROP_OUT : TransientEvent.PICK_UP;
            }
            case CONTACT -> {
                contactsOperated = !contactsOperated;
                return contactsOperated ? TransientEvent.CONTACTS_CLOSED : TransientEvent.CONTACTS_OPEN;
            }
            case ATTRACTED_STOP, RELEASED_STOP -> {
                boolean attracted = kind == ATTRACTED_STOP;
                double stop = attracted ? 0.0 : model.travelMetres();
                double u = -model.restitution() * uNow;
                gNow = stop;
                gBefore = stop;
                gTrial = stop;
                // rests when the net force pushes into the stop and the bounce is negligible
                double net = model.springForceNewtons(stop) - model.magneticForceNewtons(iTrial, stop);
                boolean pushedIn = attracted ? net <= 0 : net >= 0;
                if (pushedIn && Math.abs(u) < REST_SPEED_METRES_PER_SECOND) {
                    phase = attracted ? Phase.RESTING_ATTRACTED : Phase.RESTING_RELEASED;
                    u = 0;
                }
                uNow = u;
                uBefore = u;
                dgNow = u;
                duNow = 0;
                coil.setHenries(model.inductanceHenries(stop));
                return attracted ? TransientEvent.ATTRACTED : TransientEvent.RELEASED;
            }
            default -> throw new IllegalArgumentException("event kind " + kind);
        }
    }

    /** Travel from the released stop of the committed state, metres. */
    double position() {
        return model.travelMetres() - gNow;
    }
}
