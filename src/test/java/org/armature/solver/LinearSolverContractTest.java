package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.function.IntFunction;
import java.util.stream.Stream;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** The {@link LinearSolver} contract, for both implementations, against EJML's general solve as reference. */
class LinearSolverContractTest {

    static Stream<Arguments> solvers() {
        IntFunction<LinearSolver> own = DenseLu::new;
        IntFunction<LinearSolver> ejml = EjmlLu::new;
        return Stream.of(Arguments.of("DenseLu", own), Arguments.of("EjmlLu", ejml));
    }

    @ParameterizedTest(name = "{0} solves random systems like the reference")
    @MethodSource("solvers")
    void solvesLikeReference(String name, IntFunction<LinearSolver> make) {
        Random r = new Random(7);
        for (int trial = 0; trial < 50; trial++) {
            int n = 1 + r.nextInt(30);
            double[] a = new double[n * n];
            double[] b = new double[n];
            for (int i = 0; i < a.length; i++) {
                // entries over twelve decades, as in an MNA matrix with 1 GΩ and 50 mΩ side by side
                a[i] = r.nextGaussian() * Math.pow(10, r.nextInt(12) - 9);
            }
            for (int i = 0; i < n; i++) {
                b[i] = r.nextGaussian();
            }
            DMatrixRMaj ra = new DMatrixRMaj(n, n, true, a.clone());
            DMatrixRMaj rb = new DMatrixRMaj(n, 1, true, b.clone());
            DMatrixRMaj rx = new DMatrixRMaj(n, 1);
            assertTrue(CommonOps_DDRM.solve(ra, rb, rx));
            LinearSolver s = make.apply(n);
            double[] a2 = a.clone();
            double[] x = b.clone();
            assertTrue(s.factor(a2), name + " trial " + trial);
            assertEquals(-1, s.failedColumn());
            s.solve(x);
            // compare through the residual: |A·x − b| relative to |A|·|x|, the backward error
            for (int i = 0; i < n; i++) {
                double sum = -b[i];
                double scale = Math.abs(b[i]);
                for (int j = 0; j < n; j++) {
                    sum += a[i * n + j] * x[j];
                    scale += Math.abs(a[i * n + j] * x[j]);
                }
                assertEquals(0.0, sum, 1e-10 * scale, name + " residual row " + i);
            }
            double[] ref = rx.data;
            double norm = 0;
            for (double v : ref) {
                norm = Math.max(norm, Math.abs(v));
            }
            for (int i = 0; i < n; i++) {
                assertEquals(ref[i], x[i], 1e-6 * norm + 1e-12, name + " against EJML CommonOps_DDRM.solve");
            }
        }
    }

    @ParameterizedTest(name = "{0} reports a singular matrix whatever its scale (relative pivot test)")
    @MethodSource("solvers")
    void singularAtAnyScale(String name, IntFunction<LinearSolver> make) {
        for (double scale : new double[] {1e-12, 1, 1e12}) {
            double[] a = {1 * scale, 2 * scale, 2 * scale, 4 * scale};
            LinearSolver s = make.apply(2);
            assertFalse(s.factor(a), name + " at scale " + scale);
            assertEquals(1, s.failedColumn());
            assertThrows(IllegalStateException.class, () -> s.solve(new double[2]));
        }
    }

    @ParameterizedTest(name = "{0} accepts a tiny but regular row (gmin-only node) next to a large one")
    @MethodSource("solvers")
    void tinyRegularRow(String name, IntFunction<LinearSolver> make) {
        double[] a = {1e-12, 0, 0, 100};
        double[] b = {1e-12, 100};
        LinearSolver s = make.apply(2);
        assertTrue(s.factor(a));
        s.solve(b);
        assertArrayEquals(new double[] {1, 1}, b, 1e-12);
    }
}
