package org.armature.ui;

import org.armature.model.Stage;
import org.armature.render.Annotations;

/**
 * Where the readouts of a stage come from: the seam for the DC solver. The view model calls
 * {@link #compute(Stage)} on its solve executor (never on the FX thread) and publishes the result
 * on the FX thread. Implementations solve the stage's operating point and turn it into
 * {@link Annotations} (node voltages, branch currents, the switch verdict badge, the coil gauge).
 */
@FunctionalInterface
public interface ReadoutSource {

    /** Readouts and a status line for the status bar. */
    record Readouts(Annotations annotations, String status) {
    }

    /** Computes the readouts of a stage; may take a while; must not touch the scene graph. */
    Readouts compute(Stage stage);

    /** No solver connected: no readouts, and the status bar says so. */
    ReadoutSource NONE = stage -> new Readouts(Annotations.NONE, "Solver not connected: no readouts yet");
}
