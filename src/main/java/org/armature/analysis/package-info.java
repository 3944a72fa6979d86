/**
 * Judging a stage: the topology check, the sizing assistant, corner and Monte Carlo runs, the
 * checks with their verdicts, and the suppressor ranking.
 *
 * <p>Entry points, each returning immutable results and never throwing for bad user data:
 * <ul>
 * <li>{@link org.armature.analysis.TopologyCheck#check} / {@link org.armature.analysis.TopologyCheck#analyse}:
 *     which of the four driver stages was drawn ({@link org.armature.model.StageRoles}, found by
 *     {@link org.armature.model.StageRecognition} from connectivity alone) and the problems with
 *     stable {@code topology.*} keys, including those that need the parts' values;</li>
 * <li>{@link org.armature.analysis.BaseNetworkSizing#size}: the drive network values and the
 *     calculation as {@link org.armature.analysis.SizingStep}s, with the rules of
 *     {@link org.armature.analysis.SizingOptions};</li>
 * <li>{@link org.armature.analysis.Corners}: the toleranced parameters as
 *     {@link org.armature.analysis.Factor}s, every corner and seeded Monte Carlo samples, each a
 *     what-if copy of the document ({@link org.armature.analysis.Variant}); the solver never knows
 *     about corners;</li>
 * <li>{@link org.armature.analysis.StageChecks#run}: every check at its worst corner with the DC
 *     engine (and the transient engine for the turn-off and the contact break), the coil and contact
 *     checks of {@code ContactChecks}, the yield, and the safety cautions; ids in the table of
 *     {@link org.armature.analysis.StageChecks};</li>
 * <li>{@link org.armature.analysis.SuppressorAdvisor#rank}: suppressors by release time and peak
 *     switch voltage, with zener and TVS voltages proposed;
 *     {@link org.armature.analysis.SuppressorAdvisor#contactProtection}: contact protection for an
 *     inductive load, sized by the rules of thumb and checked by re-running the break.</li>
 * </ul>
 *
 * <p>Device equations (copper coil law, gain temperature factor, the pin's Thevenin source) come
 * from {@code devices}; operating points and waveforms from {@code solver}. Hand calculations here
 * are the ones an engineer writes down, and each cites its check-values.md label.
 */
package org.armature.analysis;
