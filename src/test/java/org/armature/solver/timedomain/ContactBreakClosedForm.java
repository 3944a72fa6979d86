package org.armature.solver.timedomain;

/**
 * The closed form of an RL break through a series RC across the contacts (derived, check-values.md CT-10),
 * for the tests.
 */
public final class ContactBreakClosedForm {

    private ContactBreakClosedForm() {
    }

    /**
     * Peak contact voltage of the series R–L–C loop after parting: v_C(t) = V + e^(−αt)·(A·cos ωd·t +
     * B·sin ωd·t), A = −V, B = (I0/C − α·V)/ωd, α = (R + Rs)/(2L), I0 = V/R; the contact voltage is
     * v_C + Rs·C·dv_C/dt, maximised on a fine grid over one ring period (underdamped loops only).
     */
    public static double peak(double v, double r, double l, double rs, double c) {
        double i0 = v / r;
        double alpha = (r + rs) / (2 * l);
        double wd = Math.sqrt(1 / (l * c) - alpha * alpha);
        double a = -v;
        double b = (i0 / c - alpha * v) / wd;
        double best = 0;
        double period = 2 * Math.PI / wd;
        for (int k = 0; k <= 200_000; k++) {
            double t = period * k / 200_000.0;
            double e = Math.exp(-alpha * t);
            double vc = v + e * (a * Math.cos(wd * t) + b * Math.sin(wd * t));
            double dvc = e * ((-alpha * a + wd * b) * Math.cos(wd * t) + (-alpha * b - wd * a) * Math.sin(wd * t));
            best = Math.max(best, vc + rs * c * dvc);
        }
        return best;
    }
}
