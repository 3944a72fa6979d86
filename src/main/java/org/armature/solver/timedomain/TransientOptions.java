package org.armature.solver.timedomain;

/**
 * What to run: the drive, the window and the step control.
 *
 * @param drive what the logic pin does
 * @param durationSeconds length of the run from t = 0, seconds, positive
 * @param step tolerances and limits of the step control
 * @param ambientCelsius ambient for the devices and the coil, °C; {@code NaN} takes the stage's
 *     nominal ambient
 */
public record TransientOptions(DriveWaveform drive, double durationSeconds, StepOptions step, double ambientCelsius) {

    /** Default window: 20 ms, long enough for a small relay's turn-off decay and release. */
    public static final double DEFAULT_DURATION_SECONDS = 0.020;
    /** Default time of the drive edge in a run, 1 ms: leaves the operating point visible first. */
    public static final double DEFAULT_EDGE_SECONDS = 0.001;

    public TransientOptions {
        if (drive == null) {
            throw new IllegalArgumentException("drive must not be null");
        }
        if (!(durationSeconds > 0) || !Double.isFinite(durationSeconds)) {
            throw new IllegalArgumentException("durationSeconds must be positive, was " + durationSeconds);
        }
        if (step == null) {
            throw new IllegalArgumentException("step must not be null");
        }
    }

    /** A turn-off at 1 ms in a 20 ms window with default step control and the stage's ambient. */
    public static TransientOptions turnOff() {
        return new TransientOptions(new DriveWaveform.TurnOff(DEFAULT_EDGE_SECONDS), DEFAULT_DURATION_SECONDS,
                StepOptions.DEFAULTS, Double.NaN);
    }

    /** A turn-on at 1 ms in a 20 ms window. */
    public static TransientOptions turnOn() {
        return new TransientOptions(new DriveWaveform.TurnOn(DEFAULT_EDGE_SECONDS), DEFAULT_DURATION_SECONDS,
                StepOptions.DEFAULTS, Double.NaN);
    }

    /** The same run with other step options. */
    public TransientOptions withStep(StepOptions s) {
        return new TransientOptions(drive, durationSeconds, s, ambientCelsius);
    }

    /** The same run over another window. */
    public TransientOptions withDuration(double seconds) {
        return new TransientOptions(drive, seconds, step, ambientCelsius);
    }
}
