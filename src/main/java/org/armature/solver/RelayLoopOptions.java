package org.armature.solver;

/**
 * The outer loop that makes relay coil temperature and contact state consistent with the solution:
 * coil temperature = ambient + coil power × coil thermal resistance, contacts operated at or above
 * pick-up, released at or below drop-out.
 *
 * @param coilTemperatureToleranceKelvin the loop stops when no coil temperature moves more than
 *     this between passes; default 0.01 K, which changes copper resistance by 4e-5 (0.39 %/K), well
 *     below the Newton reltol of 1e-3
 * @param maxPasses pass limit; default 30 (the secant update settles typical coils in 3–5 passes)
 */
public record RelayLoopOptions(double coilTemperatureToleranceKelvin, int maxPasses) {

    /** Defaults: 0.01 K, 30 passes. */
    public static final RelayLoopOptions DEFAULT = new RelayLoopOptions(0.01, 30);

    public RelayLoopOptions {
        if (!(coilTemperatureToleranceKelvin > 0) || !Double.isFinite(coilTemperatureToleranceKelvin)) {
            throw new IllegalArgumentException("coilTemperatureToleranceKelvin must be positive and finite");
        }
        if (maxPasses < 1) {
            throw new IllegalArgumentException("maxPasses must be at least 1");
        }
    }
}
