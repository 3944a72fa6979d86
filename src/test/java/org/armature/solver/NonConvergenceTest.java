package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class NonConvergenceTest {

    @Test
    @DisplayName("with one Newton iteration allowed nothing converges: the exception gives iterations, node and residual")
    void reportsIterationsNodeAndResidual() {
        DcOptions starved = DcOptions.DEFAULT.withNewton(new NewtonOptions(1, 50, ConvergenceTolerances.DEFAULT,
                DenseLu.DEFAULT_RELATIVE_PIVOT_THRESHOLD));
        NonConvergenceException e = assertThrows(NonConvergenceException.class,
                () -> new DcAnalysis(starved).solve(Templates.defaultStage()));
        assertEquals("solver.no-convergence", e.messageKey());
        assertTrue(e.iterations() > 1, "plain, gmin and source attempts all counted: " + e.iterations());
        assertTrue(!e.worstNode().isEmpty() && e.getMessage().contains(e.worstNode()), e.getMessage());
        assertTrue(Double.isFinite(e.lastResidualAmps()));
    }

    @Test
    @DisplayName("tighter tolerances change the answer by less than the looser tolerance (convergence test)")
    void tolerancesAreHonoured() {
        OperatingPoint loose = new DcAnalysis().solve(Templates.defaultStage());
        OperatingPoint tight = new DcAnalysis(DcOptions.DEFAULT.withNewton(NewtonOptions.DEFAULT.withTolerances(
                new ConvergenceTolerances(1e-9, 1e-12, 1e-15)))).solve(Templates.defaultStage());
        for (String net : loose.nodeVoltages().keySet()) {
            double v = tight.voltage(net);
            // NM-6 bound on the loose solution, times 10 for the relay loop's own 0.01 K tolerance
            assertEquals(v, loose.voltage(net), 10 * (1e-3 * Math.abs(v) + 1e-6), net);
        }
    }
}
