package org.armature.solver;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.decomposition.lu.LUDecompositionAlt_DDRM;

/**
 * The {@link LinearSolver} contract over EJML's dense LU with partial pivoting
 * ({@code LUDecompositionAlt_DDRM}, a Crout form; P. Abeles, EJML). The same relative pivot test
 * as {@link DenseLu} is applied to EJML's U diagonal, against the largest magnitude of each
 * original row. Kept as the alternative the benchmark compares against.
 */
public final class EjmlLu implements LinearSolver {

    private final int n;
    private final double relativePivotThreshold;
    private final DMatrixRMaj matrix;
    private final DMatrixRMaj rhs;
    private final LUDecompositionAlt_DDRM lu = new LUDecompositionAlt_DDRM();
    private final double[] rowScale;
    private int failed = -1;

    /** @param size system size, ≥ 1 */
    public EjmlLu(int size) {
        this(size, DenseLu.DEFAULT_RELATIVE_PIVOT_THRESHOLD);
    }

    /**
     * @param size system size, ≥ 1
     * @param relativePivotThreshold pivot threshold relative to the row's largest magnitude, in (0, 1)
     */
    public EjmlLu(int size, double relativePivotThreshold) {
        if (size < 1) {
            throw new IllegalArgumentException("size must be at least 1, was " + size);
        }
        this.n = size;
        this.relativePivotThreshold = relativePivotThreshold;
        this.matrix = new DMatrixRMaj(size, size);
        this.rhs = new DMatrixRMaj(size, 1);
        this.rowScale = new double[size];
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public boolean factor(double[] a) {
        failed = -1;
        for (int i = 0; i < n; i++) {
            double m = 0.0;
            for (int j = 0; j < n; j++) {
                m = Math.max(m, Math.abs(a[i * n + j]));
            }
            rowScale[i] = m;
        }
        System.arraycopy(a, 0, matrix.data, 0, n * n);
        if (!lu.decompose(matrix)) {
            failed = 0;
            return false;
        }
        int[] pivot = lu.getPivot();
        double[] f = lu.getLU().data;
        for (int k = 0; k < n; k++) {
            if (!(Math.abs(f[k * n + k]) > relativePivotThreshold * rowScale[pivot[k]])) {
                failed = k;
                return false;
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
        if (failed >= 0) {
            throw new IllegalStateException("solve needs a successful factor first");
        }
        System.arraycopy(b, 0, rhs.data, 0, n);
        lu._solveVectorInternal(rhs.data);
        System.arraycopy(rhs.data, 0, b, 0, n);
    }
}
