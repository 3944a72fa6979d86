package org.armature.solver.timedomain;

/**
 * The figures of one run. Times are measured from the last drive edge of the relevant kind (the
 * turn-off edge for the decay and release figures, the turn-on edge for the operate time);
 * {@code NaN} means the thing did not happen within the run (for example no turn-off edge, or the
 * current had not yet fallen to zero when the run ended).
 *
 * @param peakSwitchVolts largest voltage across the switch (collector–emitter, drain–source, or for
 *     the high-side PNP emitter–collector) after the turn-off edge, volts
 * @param peakCoilReverseVolts largest reverse coil voltage (A2 above A1) after the turn-off edge, volts,
 *     not negative
 * @param decayToReleaseCurrentSeconds turn-off edge to the coil current first falling to the drop-out
 *     current (must-release volts ÷ coil resistance at coil temperature), seconds
 * @param decayToZeroSeconds turn-off edge to the coil current first reaching zero, seconds
 * @param releaseTimeSeconds turn-off edge to the normally-open contact opening, seconds
 * @param operateTimeSeconds turn-on edge to the normally-open contact closing, seconds
 * @param suppressorEnergyJoules energy dissipated in the suppressor parts after the turn-off edge, joules
 * @param switchEnergyJoules energy dissipated in the switch after the turn-off edge, joules
 * @param switchBreakdown whether the switch went into avalanche (its voltage reached the rating)
 * @param peakSuppressorAmps largest current through the suppressor, amperes, not negative
 * @param coilResistiveEnergyJoules energy dissipated in the coil resistance (and core-loss resistance)
 *     after the turn-off edge, joules
 * @param storedEnergyJoules magnetic energy ½·L·I² at the turn-off edge, joules (flux-state relay:
 *     the integral of i·dλ to zero current at the attracted gap)
 * @param armatureSpeedAtBreakMetresPerSecond the armature's speed when the normally-open contacts part
 *     after the turn-off edge, metres per second, not negative: for a moving-armature relay the
 *     integrated speed at the located contact event; for a constant-inductance relay the speed of its
 *     linear transit, travel ÷ release transit time (a stand-in, as its position trace is); NaN when the
 *     contacts did not open within the run. A slow break lets a DC load's arc dwell on the contacts
 */
public record TransientMetrics(double peakSwitchVolts, double peakCoilReverseVolts, double decayToReleaseCurrentSeconds,
                               double decayToZeroSeconds, double releaseTimeSeconds, double operateTimeSeconds,
                               double suppressorEnergyJoules, double switchEnergyJoules, boolean switchBreakdown,
                               double peakSuppressorAmps, double coilResistiveEnergyJoules,
                               double storedEnergyJoules, double armatureSpeedAtBreakMetresPerSecond) {
}
