/**
 * Published device equations as pure, allocation-free functions for a nodal solver to wrap into
 * modified-nodal-analysis stamps. This package knows nothing of the document model, the netlist
 * or the solver: every nonlinear device gives its currents <em>and</em> their partial derivatives
 * at given intrinsic terminal voltages and a junction temperature in kelvin, written into a
 * caller-owned holder ({@link org.armature.devices.JunctionEvaluation},
 * {@link org.armature.devices.BjtEvaluation}, {@link org.armature.devices.MosfetEvaluation},
 * {@link org.armature.devices.ArmatureDerivatives}) so the Newton loop allocates nothing.
 * Series and terminal resistances are kept in the parameter records; the solver makes the
 * internal nodes.
 *
 * <h2>Models</h2>
 * <ul>
 *   <li>{@link org.armature.devices.Diode}: W. Shockley, "The theory of p-n junctions in
 *       semiconductors and p-n junction transistors", Bell Syst. Tech. J. 28, 1949, with a
 *       smooth reverse-breakdown term (knee current IBV at BV) so one model serves rectifier,
 *       zener, LED and TVS (bidirectional: a symmetric clamp), and the usual temperature
 *       scaling of IS (XTI, Eg).</li>
 *   <li>{@link org.armature.devices.Bjt}: J. J. Ebers and J. L. Moll, "Large-signal behavior of
 *       junction transistors", Proc. IRE 42, 1954 (transport form), with the normalised base
 *       charge of H. K. Gummel and H. C. Poon, "An integral charge control model of bipolar
 *       transistors", Bell Syst. Tech. J. 49, 1970, for the Early effect and high-injection gain
 *       roll-off; βF(T) = βF·(T/Tnom)^XTB. {@link org.armature.devices.BjtFit} fits βF and IS to
 *       datasheet hFE and VBE(sat).</li>
 *   <li>{@link org.armature.devices.Mosfet}: H. Shichman and D. A. Hodges, "Modeling and
 *       simulation of insulated-gate field-effect transistor switching circuits", IEEE J.
 *       Solid-State Circuits SC-3, 1968 (level 1, with λ and source/drain interchange);
 *       {@link org.armature.devices.MosfetFit} fits β and VT0 to RDS(on) and VGS(th).</li>
 *   <li>{@link org.armature.devices.BreakdownClamp}: avalanche of a switch at its voltage rating,
 *       in the diode's breakdown form.</li>
 *   <li>{@link org.armature.devices.CoilResistance}: copper winding resistance (IEC 60028
 *       intercept −234.5 °C), pick-up and drop-out at temperature, closed-form self-heating;
 *       {@link org.armature.devices.RelayThresholds}: pick-up/drop-out with hysteresis.</li>
 *   <li>{@link org.armature.devices.MovingArmature}: lumped magnetic circuit with a gap-dependent
 *       inductance L(g) = Lσ + K/(g + gi), co-energy pull ½·i²·K/(g + gi)² against a linear
 *       spring, flux linkage as the coil state (standard electromechanics, e.g. A. E. Fitzgerald
 *       and C. Kingsley, <i>Electric Machinery</i>, from memory); fitted to the datasheet's
 *       inductances and pick-up/drop-out currents by {@link org.armature.devices.RelayArmatureFit}.
 *       Default moving mass (1 g) is from memory and damping (0.1 N·s/m) our choice; both are
 *       meant to be adjusted to the datasheet's operate and release times.</li>
 *   <li>{@link org.armature.devices.LogicOutputPin}: a logic output as a Thevenin source fitted
 *       to two rows of the datasheet's output table.</li>
 * </ul>
 *
 * <h2>Newton aids</h2>
 * {@link org.armature.devices.Junctions#limitJunction} is the pn-junction voltage limiting of
 * L. W. Nagel, "SPICE2: A Computer Program to Simulate Semiconductor Circuits", UC Berkeley ERL
 * memo M520, 1975, with vcrit = nVT·ln(nVT/(√2·IS)); {@link org.armature.devices.Diode#limitVoltage}
 * also applies it, mirrored, to the breakdown exponential. MOSFET gate steps are bounded by a rule
 * of our own ({@link org.armature.devices.Junctions#limitGateStep}). Exponentials continue
 * linearly above e^80 ({@link org.armature.devices.Junctions#safeExp}), so no iterate overflows.
 * The small closed problems solved here (one diode and a resistor, BJT junctions for given
 * currents, fits) use {@link org.armature.devices.DeviceNewtonOptions} and throw
 * {@link org.armature.devices.DeviceConvergenceException} if they fail; fits with contradictory
 * figures return {@link org.armature.devices.DeviceFinding}s instead.
 *
 * <h2>Conventions</h2>
 * SI units throughout; temperatures in kelvin (names say {@code temperatureKelvin}); parameters
 * hold at their {@code nominalTemperatureKelvin} (default 25 °C, the datasheet reference).
 * Currents flow into the named terminal (diode: anode to cathode). Thermal voltage kT/q with the
 * exact SI 2019 constants of {@link org.armature.units.PhysicalConstants}.
 */
package org.armature.devices;
