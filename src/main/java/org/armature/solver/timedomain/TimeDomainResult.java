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
 * @param maxAcceptedResidualAmps largest KCL residual over the accepted points, A
 * @param acceptedFailingKcl accepted points whose values fail the node test (0 for a sound run)
 */
record TimeDomainResult(Waveform waveform, double[][] internal, int acceptedSteps, int rejectedSteps,
                        int newtonIterations, double maxAcceptedResidualAmps, int acceptedFailingKcl) {
}
