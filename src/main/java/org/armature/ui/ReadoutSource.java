package org.armature.ui;

import java.util.List;
import java.util.Optional;
import org.armature.model.Finding;
import org.armature.model.Stage;
import org.armature.render.Annotations;
import org.armature.solver.OperatingPoint;

/**
 * Where the readouts of a stage come from: the seam for the DC solver. The view model calls
 * {@link #compute(Stage)} on its solve executor (never on the FX thread) and publishes the result
 * on the FX thread. Implementations solve the stage's operating point and turn it into
 * {@link Annotations} (node voltages, branch currents, the switch verdict badge, the coil gauge).
 * {@link EngineReadouts} is the one over the DC engine.
 */
@FunctionalInterface
public interface ReadoutSource {

    /**
     * Readouts, a status line for the status bar and findings for the verdicts panel.
     *
     * @param annotations what to draw on the schematic
     * @param status one plain sentence ("Converged in 12 iterations, largest KCL residual 3.1 pA")
     * @param findings topology findings and solver failures, never a stack trace
     * @param pinHigh the operating point with the drive pin high, when it was solved
     * @param pinLow the operating point with the drive pin low, when it was solved
     */
    record Readouts(Annotations annotations, String status, List<Finding> findings, Optional<OperatingPoint> pinHigh,
                    Optional<OperatingPoint> pinLow) {

        public Readouts {
            if (annotations == null || status == null || pinHigh == null || pinLow == null) {
                throw new IllegalArgumentException("readouts need annotations, a status and both pin states");
            }
            findings = List.copyOf(findings);
        }

        /** Readouts with findings and no operating points (a source without an engine). */
        public Readouts(Annotations annotations, String status, List<Finding> findings) {
            this(annotations, status, findings, Optional.empty(), Optional.empty());
        }

        /** Readouts without findings. */
        public Readouts(Annotations annotations, String status) {
            this(annotations, status, List.of());
        }

        /** The operating point of one pin state, when it was solved. */
        public Optional<OperatingPoint> operatingPoint(boolean high) {
            return high ? pinHigh : pinLow;
        }
    }

    /** Computes the readouts of a stage; may take a while; must not touch the scene graph. */
    Readouts compute(Stage stage);

    /** No solver connected: no readouts, and the status bar says so. */
    ReadoutSource NONE = stage -> new Readouts(Annotations.NONE, "Solver not connected: no readouts yet");
}
