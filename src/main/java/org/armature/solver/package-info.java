/**
 * The DC engine: modified nodal analysis (Ho, Ruehli, Brennan 1975) over a
 * {@link org.armature.netlist.Netlist}, a dense LU ({@link org.armature.solver.DenseLu}, or EJML's
 * behind the same {@link org.armature.solver.LinearSolver} contract), Newton–Raphson with the
 * devices' junction limiting ({@link org.armature.solver.NewtonSolver}), gmin and source stepping
 * ({@link org.armature.solver.DcStrategy}), the relay coil-temperature and contact loop, immutable
 * {@link org.armature.solver.OperatingPoint}s and DC sweeps. Entry point:
 * {@link org.armature.solver.DcAnalysis}.
 *
 * <h2>Choosing the tolerances</h2>
 * <ul>
 * <li>{@link org.armature.solver.ConvergenceTolerances} (check-values.md NM-6): reltol 1e-3 gives three
 *     significant figures, more than any datasheet figure the stage is built from; tighten to 1e-6
 *     only to compare against a closed form to more digits (the reference-circuit tests keep the
 *     default). vntol 1 µV is below any meter; raise it to 1 mV for a fast, rough sweep. abstol 1 pA
 *     must stay below the smallest current you want to read (an off transistor's leakage is a few
 *     pA through the 1e-12 S junction gmin); do not set it below about 1e-15 A, where rounding of
 *     milliamp currents dominates.</li>
 * <li>{@link org.armature.solver.NewtonOptions}: 100 iterations per run is generous (templates need
 *     about 3–13 from a cold start and 2–6 for a warm
 *     re-solve after a value change, relay loop included); the 50 V step damping only matters for
 *     stages whose node voltages jump by more than that in one iteration (mains on the contact side).
 *     The pivot threshold is relative to each row's largest entry: 1e-13 catches rows that are
 *     combinations of others to a few hundred rounding errors and never rejects a well-scaled row,
 *     whatever its absolute size.</li>
 * <li>{@link org.armature.solver.ContinuationOptions} (NM-5): gmin from 1e-3 S to 1e-12 S by decades,
 *     then source stepping. Only used when plain Newton fails; a start above 1e-3 S hardly helps,
 *     a finer factor than 10 costs iterations without making hard stages converge.</li>
 * <li>{@link org.armature.solver.RelayLoopOptions}: 0.01 K on the coil temperature changes the
 *     copper resistance by 4e-5, below reltol. The coil temperature converges inside the Newton
 *     loop ({@link org.armature.solver.StateUpdater}); the outer loop re-solves only when contacts
 *     change state.</li>
 * <li>{@link org.armature.solver.DcOptions#warmStart()}: on by default. A value edit re-flattens only
 *     the edited part and starts Newton from the last solution of the same stage and pin state,
 *     with the last contact states as the relay loop's first guess (kept only when a start with
 *     released contacts is shown to settle the same way, ContactGuessTest);
 *     the answer equals a cold start's within the NM-6 tolerances (WarmStartTest,
 *     EngineDifferentialTest). Turn it off to make
 *     every solve independent of the engine's history, for example to compare iteration counts.</li>
 * </ul>
 *
 * <h2>One convergence test, on what is returned</h2>
 * Whatever path produced an answer (warm start, contact guess, start point, gmin or source
 * stepping), {@link org.armature.solver.NewtonSolver#verify} tests the returned node voltages and
 * branch currents themselves: each node's residual within reltol × the sum of the currents its
 * elements carry there (each element evaluated on its own, so a junction's companion terms are not
 * mistaken for current) + abstol, and the Newton step from the answer within the update test. The
 * residual an operating point reports is that one. A fast path whose answer fails is redone by the
 * full solve from 0 V; a full solve that fails throws, naming the node and its residual.
 *
 * <p>Failures are one unchecked family, {@link org.armature.solver.SolverException}: a
 * {@link org.armature.solver.SingularCircuitException} names the floating node(s) and parts or the
 * sources of a loop, a {@link org.armature.solver.NonConvergenceException} gives iterations, the
 * node with the largest residual and that residual, a {@link org.armature.solver.ModelLimitException}
 * says the stage asks the models for something outside their range (an ambient outside
 * {@link org.armature.model.ModelRange}, a coil heating past 220 °C or without a steady state, a part
 * value a device model refuses). No result ever holds NaN or infinity.
 */
package org.armature.solver;
