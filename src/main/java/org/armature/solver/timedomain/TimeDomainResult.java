package org.armature.solver.timedomain;

/**
 * The raw outcome of a run: the waveform plus the internal records the metrics are computed from.
 *
 * @param waveform the public waveform
 * @param internal per sample: coil current, coil voltage, switch voltage, switch power, suppressor
 *     power, suppressor current, coil-loss power (rows indexed by the {@link TimeDomainRun} constants)
 * @param acceptedSteps accepted time points after the start
 * @param rejectedSteps steps rejected by the error test or Newton
 * @param newtonIterations all Newton iterations including the operating point
 */
record TimeDomainResult(Waveform waveform, double[][] internal, int acceptedSteps, int rejectedSteps,
                        int newtonIterations) {
}
