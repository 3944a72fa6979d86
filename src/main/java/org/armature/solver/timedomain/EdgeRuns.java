package org.armature.solver.timedomain;

import java.util.Optional;
import org.armature.model.Stage;
import org.armature.solver.SolverException;

/**
 * The turn-on and turn-off runs of a stage with the engine's default windows, each present when it
 * ran, and a status in words that names what did not run and why. One place for the window's edges
 * drawer and the exports.
 *
 * @param on the turn-on run, if it ran
 * @param off the turn-off run, if it ran
 * @param status "Turn-on and turn-off run", or one sentence per run that did not
 */
public record EdgeRuns(Optional<TransientResult> on, Optional<TransientResult> off, String status) {

    /** Runs both edges of a stage; a run that fails is left out and named in the status. */
    public static EdgeRuns of(Stage stage) {
        Optional<TransientResult> on = Optional.empty();
        Optional<TransientResult> off = Optional.empty();
        StringBuilder why = new StringBuilder();
        try {
            on = Optional.of(TransientAnalysis.run(stage, TransientOptions.turnOn()));
        } catch (SolverException | TransientFailureException e) {
            why.append("Turn-on not run: ").append(e.getMessage()).append(". ");
        }
        try {
            off = Optional.of(TransientAnalysis.run(stage, TransientOptions.turnOff()));
        } catch (SolverException | TransientFailureException e) {
            why.append("Turn-off not run: ").append(e.getMessage()).append(". ");
        }
        return new EdgeRuns(on, off, why.length() == 0 ? "Turn-on and turn-off run" : why.toString().strip());
    }
}
