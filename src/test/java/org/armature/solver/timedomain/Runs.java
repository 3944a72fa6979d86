package org.armature.solver.timedomain;

import org.armature.model.Stage;
import org.armature.solver.HonestResidual;

/**
 * The transient tests' way into {@link TransientAnalysis}: every run they make is checked with the
 * shared honest-residual assertion on each accepted time point ({@link HonestResidual}).
 */
final class Runs {

    private Runs() {
    }

    static TransientResult run(Stage stage, TransientOptions options) {
        return HonestResidual.assertHonest(TransientAnalysis.run(stage, options), stage.name());
    }

    static TransientResult run(TimeDomainCircuit circuit, DriveWaveform drive, double durationSeconds,
                               StepOptions options) {
        return HonestResidual.assertHonest(TransientAnalysis.run(circuit, drive, durationSeconds, options),
                "hand-built circuit");
    }
}
