package org.armature.solver.timedomain;

/**
 * The immutable outcome of a run.
 *
 * @param waveform time points, traces and events
 * @param metrics the figures of the run
 * @param acceptedSteps accepted time points after the start
 * @param rejectedSteps steps rejected by the error test or by Newton
 * @param newtonIterations Newton iterations of the whole run
 */
public record TransientResult(Waveform waveform, TransientMetrics metrics, int acceptedSteps, int rejectedSteps,
                              int newtonIterations) {
}
