package org.armature.solver;

/**
 * When a Newton iterate counts as converged (check-values.md NM-6, common practice): every node voltage
 * step |Δv| ≤ reltol·|v| + vntol, every branch current step |Δi| ≤ reltol·|i| + abstol, and every
 * KCL residual ≤ reltol·(sum of the magnitudes of the currents meeting there) + abstol.
 *
 * @param reltol relative tolerance, dimensionless; default 1e-3 (three significant figures, more
 *     than any datasheet value carries)
 * @param vntolVolts absolute voltage tolerance, V; default 1 µV (far below a meter's last digit)
 * @param abstolAmps absolute current tolerance, A; default 1 pA (below the junction gmin current
 *     at a volt)
 */
public record ConvergenceTolerances(double reltol, double vntolVolts, double abstolAmps) {

    /** Defaults: reltol 1e-3, vntol 1 µV, abstol 1 pA. */
    public static final ConvergenceTolerances DEFAULT = new ConvergenceTolerances(1e-3, 1e-6, 1e-12);

    public ConvergenceTolerances {
        if (!(reltol > 0 && reltol < 1)) {
            throw new IllegalArgumentException("reltol must be in (0, 1), was " + reltol);
        }
        if (!(vntolVolts > 0) || !Double.isFinite(vntolVolts)) {
            throw new IllegalArgumentException("vntolVolts must be positive and finite, was " + vntolVolts);
        }
        if (!(abstolAmps > 0) || !Double.isFinite(abstolAmps)) {
            throw new IllegalArgumentException("abstolAmps must be positive and finite, was " + abstolAmps);
        }
    }
}
