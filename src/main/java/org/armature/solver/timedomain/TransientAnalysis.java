package org.armature.solver.timedomain;

/**
 * Time-domain analysis of a relay driver stage, starting from its DC operating point.
 *
 * <p>Entry point: {@link #run(org.armature.model.Stage, TransientOptions)}. What the run contains:
 * the coil as its copper resistance at coil temperature in series with its inductance (constant,
 * or the flux-state electromechanical armature when an attracted inductance is given),
 * self-capacitance across the winding and an optional core-loss resistance; every switch with
 * avalanche breakdown at its rating (BJT C–E at VCEO, MOSFET D–S at VDSS), so an unsuppressed
 * turn-off shows the switch clamping and the energy it absorbs; the suppressor parts as drawn.
 * Relay pick-up and drop-out are located events; the contacts follow the armature.
 */
public final class TransientAnalysis {

    private TransientAnalysis() {
    }

    /**
     * Runs a stage.
     *
     * @param stage the stage (not modified)
     * @param options drive, window, step control and ambient
     * @return the waveform, events and metrics
     * @throws TransientFailureException if the run cannot continue (Newton fails at the smallest step)
     * @throws org.armature.solver.SolverException if the stage has no DC operating point, or asks the
     *     models for something outside their range ({@link org.armature.solver.ModelLimitException})
     */
    public static TransientResult run(org.armature.model.Stage stage, TransientOptions options) {
        double ambient = Double.isNaN(options.ambientCelsius()) ? stage.conditions().ambientCelsius()
                : options.ambientCelsius();
        TimeDomainCircuit c;
        try {
            c = StageCircuit.build(stage, ambient, options.drive().initialHigh());
        } catch (IllegalArgumentException e) {
            // a device model refused a part value: the engine's own failure, naming the field
            throw org.armature.solver.ModelLimitException.partOutsideModel(e);
        }
        return run(c, options.drive(), options.durationSeconds(), options.step());
    }

    /**
     * Runs a prepared circuit (hand-built circuits in tests; stages go through the public entry).
     */
    static TransientResult run(TimeDomainCircuit circuit, DriveWaveform drive, double durationSeconds,
                               StepOptions options) {
        TimeDomainResult raw = new TimeDomainRun(circuit, drive, durationSeconds, options).run();
        return new TransientResult(raw.waveform(), MetricsCalculator.compute(raw, circuit), raw.acceptedSteps(),
                raw.rejectedSteps(), raw.newtonIterations(), circuit.notes, raw.maxAcceptedResidualAmps(), raw.acceptedFailingKcl());
    }
}
