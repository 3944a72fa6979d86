package org.armature.solver.timedomain;

/**
 * The immutable outcome of a run.
 *
 * @param waveform time points, traces and events
 * @param metrics the figures of the run
 * @param acceptedSteps accepted time points after the start
 * @param rejectedSteps steps rejected by the error test or by Newton
 * @param newtonIterations Newton iterations of the whole run
 * @param notes plain-language notes on how the stage was modelled (for example a relay whose
 *     datasheet figures the moving-armature fit rejected, run with constant inductance instead); empty
 *     when there is nothing to say
 * @param maxAcceptedResidualAmps largest KCL residual over the accepted time points, recomputed from
 *     the values kept, A
 * @param acceptedFailingKcl accepted time points whose kept values fail the node test of
 *     {@link org.armature.solver.ConvergenceTolerances} (0 for a sound run)
 */
public record TransientResult(Waveform waveform, TransientMetrics metrics, int acceptedSteps, int rejectedSteps,
                              int newtonIterations, java.util.List<String> notes, double maxAcceptedResidualAmps,
                              int acceptedFailingKcl) {

    /** Copies the notes. */
    public TransientResult {
        notes = java.util.List.copyOf(notes);
    }
}
