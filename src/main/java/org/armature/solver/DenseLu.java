package org.armature.solver;

/**
 * In-place LU factorisation with partial (row) pivoting, Doolittle form, for the small dense MNA
 * systems of a relay stage (about 10–30 unknowns), after G. H. Golub and C. F. Van Loan, Matrix
 * Computations, algorithm 3.4.1. Allocates only in its constructor. Each elimination step updates
 * only the columns where the pivot row is nonzero, which keeps the arithmetic of the dense algorithm
 * (a zero in the pivot row leaves an entry unchanged) at the cost of the sparse MNA pattern.
 *
 * <p>Singularity test, relative not absolute: a pivot counts as zero when its magnitude is at most
 * {@code relativePivotThreshold} times the largest magnitude of the original row it came from.
 * Rows of an MNA matrix differ by many decades in scale (a 1 GΩ open contact next to a 50 mΩ closed
 * one), so a fixed absolute threshold would either miss singular rows or reject good ones.
 */
public final class DenseLu implements LinearSolver {

    /**
     * Default relative pivot threshold, 1e-13: a pivot that small relative to its row means the row
     * is a combination of the others to within a few hundred rounding errors of a double.
     */
    public static final double DEFAULT_RELATIVE_PIVOT_THRESHOLD = 1e-13;

    private final int n;
    private final double relativePivotThreshold;
    private final int[] perm;
    private final double[] rowScale;
    private final double[] work;
    /** Columns right of the pivot where the pivot row is nonzero, gathered once per elimination step. */
    private final int[] pivotRowColumns;
    private double[] lu;
    private int failed = -1;

    /**
     * @param size system size, ≥ 1
     */
    public DenseLu(int size) {
        this(size, DEFAULT_RELATIVE_PIVOT_THRESHOLD);
    }

    /**
     * @param size system size, ≥ 1
     * @param relativePivotThreshold pivot threshold relative to the row's largest magnitude, in (0, 1)
     */
    public DenseLu(int size, double relativePivotThreshold) {
        if (size < 1) {
            throw new IllegalArgumentException("size must be at least 1, was " + size);
        }
        if (!(relativePivotThreshold > 0 && relativePivotThreshold < 1)) {
            throw new IllegalArgumentException("relativePivotThreshold must be in (0, 1)");
        }
        this.n = size;
        this.relativePivotThreshold = relativePivotThreshold;
        this.perm = new int[size];
        this.rowScale = new double[size];
        this.work = new double[size];
        this.pivotRowColumns = new int[size];
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public boolean factor(double[] a) {
        lu = a;
        failed = -1;
        for (int i = 0; i < n; i++) {
            perm[i] = i;
            double m = 0.0;
            int row = i * n;
            for (int j = 0; j < n; j++) {
                m = Math.max(m, Math.abs(a[row + j]));
            }
            rowScale[i] = m;
        }
        for (int k = 0; k < n; k++) {
            int p = k;
            double best = Math.abs(a[k * n + k]);
            for (int i = k + 1; i < n; i++) {
                double v = Math.abs(a[i * n + k]);
                if (v > best) {
                    best = v;
                    p = i;
                }
            }
            if (p != k) {
                int rk = k * n;
                int rp = p * n;
                for (int j = 0; j < n; j++) {
                    double t = a[rk + j];
                    a[rk + j] = a[rp + j];
                    a[rp + j] = t;
                }
                int t = perm[k];
                perm[k] = perm[p];
                perm[p] = t;
                double s = rowScale[k];
                rowScale[k] = rowScale[p];
                rowScale[p] = s;
            }
            double pivot = a[k * n + k];
            if (!(Math.abs(pivot) > relativePivotThreshold * rowScale[k])) {
                failed = k;
                return false;
            }
            double inv = 1.0 / pivot;
            int rk = k * n;
            // MNA rows hold a handful of entries: update only the columns where the pivot row is
            // nonzero (a zero there leaves the entry as it was), the same arithmetic as the full row
            int[] cols = pivotRowColumns;
            int count = 0;
            for (int j = k + 1; j < n; j++) {
                if (a[rk + j] != 0.0) {
                    cols[count++] = j;
                }
            }
            for (int i = k + 1; i < n; i++) {
                int ri = i * n;
                double f = a[ri + k];
                if (f != 0.0) {
                    f *= inv;
                    a[ri + k] = f;
                    for (int t = 0; t < count; t++) {
                        int j = cols[t];
                        a[ri + j] -= f * a[rk + j];
                    }
                }
            }
        }
        return true;
    }

    @Override
    public int failedColumn() {
        return failed;
    }

    @Override
    public void solve(double[] b) {
        if (lu == null || failed >= 0) {
            throw new IllegalStateException("solve needs a successful factor first");
        }
        double[] a = lu;
        for (int i = 0; i < n; i++) {
            work[i] = b[perm[i]];
        }
        for (int i = 0; i < n; i++) {
            int ri = i * n;
            double s = work[i];
            for (int j = 0; j < i; j++) {
                s -= a[ri + j] * work[j];
            }
            work[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            int ri = i * n;
            double s = work[i];
            for (int j = i + 1; j < n; j++) {
                s -= a[ri + j] * work[j];
            }
            work[i] = s / a[ri + i];
        }
        System.arraycopy(work, 0, b, 0, n);
    }
}
