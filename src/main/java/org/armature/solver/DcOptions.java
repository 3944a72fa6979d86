package org.armature.solver;

import org.armature.netlist.ContactModel;
import org.armature.netlist.DarlingtonInternals;
import org.armature.netlist.FlattenOptions;
import org.armature.netlist.RegionThresholds;

/**
 * Everything the DC engine can be tuned by; the defaults suit relay driver stages.
 *
 * @param newton Newton iteration limit, damping and tolerances
 * @param continuation gmin and source stepping
 * @param relayLoop coil temperature and contact consistency loop
 * @param junctionGminSiemens conductance across every junction, S (default 1e-12 S)
 * @param contacts relay contact resistances
 * @param regions region thresholds of the readouts
 * @param darlington Darlington-channel internals
 * @param linearSolver which dense LU to use
 * @param warmStart when a solve has no start guess of its own, start Newton from the last solution
 *     of the same stage topology and pin state (the live editor re-solves after each small edit);
 *     default true. False makes every such solve a cold start from 0 V, as on a fresh engine. Both
 *     reach the same operating point within the convergence tolerances (check-values.md NM-6); relay
 *     contact states never carry over into the result (only {@link SolveOptions#previousRelayOperated}
 *     does that): the last solve's contacts are only the first guess of the relay loop, kept when the
 *     coil currents show that a start with released contacts settles in the same state
 */
public record DcOptions(NewtonOptions newton, ContinuationOptions continuation, RelayLoopOptions relayLoop,
                        double junctionGminSiemens, ContactModel contacts, RegionThresholds regions,
                        DarlingtonInternals darlington, LinearSolverKind linearSolver, boolean warmStart) {

    /** The dense LU implementations. */
    public enum LinearSolverKind {
        /** {@link DenseLu}: our own, the default (faster at these sizes in the DcBench benchmark). */
        DENSE_LU,
        /** {@link EjmlLu}: EJML's LU under the same contract. */
        EJML
    }

    /** All defaults. */
    public static final DcOptions DEFAULT = new DcOptions(NewtonOptions.DEFAULT, ContinuationOptions.DEFAULT,
            RelayLoopOptions.DEFAULT, FlattenOptions.DEFAULT_JUNCTION_GMIN_SIEMENS, ContactModel.DEFAULT,
            RegionThresholds.DEFAULT, DarlingtonInternals.DEFAULT, LinearSolverKind.DENSE_LU, true);

    public DcOptions {
        if (newton == null || continuation == null || relayLoop == null || contacts == null || regions == null
                || darlington == null || linearSolver == null) {
            throw new IllegalArgumentException("DcOptions fields must not be null");
        }
    }

    /**
     * Options with warm start on (the form before {@code warmStart} existed).
     *
     * @param newton Newton settings
     * @param continuation gmin and source stepping
     * @param relayLoop relay loop
     * @param junctionGminSiemens junction gmin, S
     * @param contacts contact resistances
     * @param regions region thresholds
     * @param darlington Darlington internals
     * @param linearSolver dense LU
     */
    public DcOptions(NewtonOptions newton, ContinuationOptions continuation, RelayLoopOptions relayLoop,
                     double junctionGminSiemens, ContactModel contacts, RegionThresholds regions,
                     DarlingtonInternals darlington, LinearSolverKind linearSolver) {
        this(newton, continuation, relayLoop, junctionGminSiemens, contacts, regions, darlington, linearSolver, true);
    }

    /** @return the same options with warm start on or off */
    public DcOptions withWarmStart(boolean warm) {
        return new DcOptions(newton, continuation, relayLoop, junctionGminSiemens, contacts, regions, darlington,
                linearSolver, warm);
    }

    /** @return the same options with Darlington-channel internals */
    public DcOptions withDarlington(DarlingtonInternals d) {
        return new DcOptions(newton, continuation, relayLoop, junctionGminSiemens, contacts, regions, d, linearSolver,
                warmStart);
    }

    /** @return the same options with other Newton settings */
    public DcOptions withNewton(NewtonOptions n) {
        return new DcOptions(n, continuation, relayLoop, junctionGminSiemens, contacts, regions, darlington, linearSolver,
                warmStart);
    }

    /** @return the same options with another linear solver */
    public DcOptions withLinearSolver(LinearSolverKind kind) {
        return new DcOptions(newton, continuation, relayLoop, junctionGminSiemens, contacts, regions, darlington, kind, warmStart);
    }

    /** @return the same options with other continuation settings */
    public DcOptions withContinuation(ContinuationOptions c) {
        return new DcOptions(newton, c, relayLoop, junctionGminSiemens, contacts, regions, darlington, linearSolver,
                warmStart);
    }

    FlattenOptions flattenOptions(boolean pinHigh, double ambientCelsius) {
        return new FlattenOptions(pinHigh, ambientCelsius, false, junctionGminSiemens, contacts, regions, darlington);
    }
}
