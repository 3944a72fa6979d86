/**
 * Time-domain (transient) analysis of a relay driver stage: the edges.
 *
 * <p>Entry point {@link org.armature.solver.timedomain.TransientAnalysis#run(org.armature.model.Stage,
 * org.armature.solver.timedomain.TransientOptions)}; the result is an immutable
 * {@link org.armature.solver.timedomain.TransientResult}: a {@link org.armature.solver.timedomain.Waveform}
 * (named traces, located events) and {@link org.armature.solver.timedomain.TransientMetrics}.
 *
 * <p>Methods. Reactive elements become companion models of a linear multistep formula
 * ({@link org.armature.solver.timedomain.Companion}): backward Euler and the trapezoidal rule
 * (G. Dahlquist, "A special stability problem for linear multistep methods", BIT 3, 1963) and the
 * variable-step second-order backward differentiation formula (C. W. Gear, <i>Numerical Initial
 * Value Problems in Ordinary Differential Equations</i>, Prentice-Hall, 1971). The one-step
 * TR-BDF2 scheme (R. E. Bank, W. M. Coughran, W. Fichtner, E. H. Grosse, D. J. Rose, R. K. Smith,
 * "Transient simulation of silicon devices and circuits", IEEE Trans. CAD 4, 1985) is the
 * published alternative to the backward-Euler restart used here; it is not implemented. Each time
 * point is solved by the solver package's Newton loop on the modified nodal equations (Ho, Ruehli
 * and Brennan, IEEE Trans. CAS-22, 1975). The local truncation error is estimated from divided
 * differences of the accepted history (check-values.md NM-9) and the step follows
 * h_new = h·0.9·(tol/|E|)^(1/(p+1)) (NM-10). Every drive edge and every end of armature transit is
 * a time point, and the integration restarts with backward Euler after it, because the trapezoidal
 * rule's one-step factor tends to −1 for steps long against a time constant (NM-7). Relay pick-up
 * and drop-out are located in time by Illinois regula falsi
 * ({@link org.armature.solver.timedomain.EventLocator}).
 *
 * <p>Relay armature. With an attracted inductance above the released one, the relay is the
 * fitted electromechanical armature of {@link org.armature.devices.RelayArmatureFit} (DESIGN.md
 * "Relay model"): the coil integrates its flux linkage λ (dλ/dt = v − R·i, i = λ/L(g)) with its
 * inductance set to L(g) of the new point before each Newton solve, and the gap and speed are
 * integrated by the same multistep formula from the pull of the new coil current; circuit and
 * mechanics alternate within the time point until the gap settles to 1 % of the METRES tolerance
 * (a staggered fixed point, so the coupling adds no error beyond that), and the gap takes part in
 * the truncation-error test. Leaving a stop (the coil current at the balance current: the fitted
 * must-operate or must-release current), the contact set point and the arrival at a stop are
 * located events with a backward-Euler restart; at a stop the speed reverses with the
 * coefficient of restitution (contact bounce). Operate time, release time, the current dip at
 * pull-in and the slower release with a plain diode come out of this motion. The datasheet's
 * mass and damping are not relay-part parameters yet: the typical defaults of
 * {@link org.armature.devices.RelayArmatureDatasheet} apply. Without an attracted inductance (0
 * or not above the released value) the relay keeps the constant-inductance threshold model: the
 * armature moves at the pick-up and drop-out currents and takes the datasheet transit times, so
 * the closed forms of check-values.md hold.
 *
 * <p>Choosing the tolerances ({@link org.armature.solver.timedomain.StepOptions}): the relative
 * tolerance (default 1e-3) applies to the largest magnitude each state has reached, so a decaying or
 * ringing quantity is held to a fraction of its own amplitude. Local control bounds the error per
 * step, not the accumulated phase of a long ring: for tens of ring periods of an unsuppressed coil
 * use 1e-5 (about 1 % of the amplitude after 30 periods). Decay and release figures of suppressed
 * coils are within 0.1 % of their closed forms at the default. The Newton test is kept a thousand
 * times tighter than the error tolerance so iteration error does not pollute the estimate.
 */
package org.armature.solver.timedomain;
