package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.devices.Diode;
import org.armature.devices.DiodeParams;
import org.armature.netlist.JunctionElement;
import org.armature.netlist.Netlist;
import org.armature.netlist.NetlistBuilder;
import org.armature.netlist.Resistor;
import org.armature.netlist.StampContext;
import org.armature.netlist.VoltageSource;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * {@link NewtonSolver#runPredicted}: a time step's Newton start is the predictor's extrapolation,
 * while the junction limiting begins at the last accepted point, so a prediction far past a
 * junction's knee is pulled back instead of overflowing the exponential.
 */
class PredictedStartTest {

    /** 5 V through 1 kΩ into a diode (IS 1e-14 A, n = 1) at 300 K. */
    private static Netlist diodeCircuit() {
        NetlistBuilder b = new NetlistBuilder();
        int supply = b.node("supply");
        int anode = b.node("anode");
        b.add(new VoltageSource("V1", supply, Netlist.GROUND, b.allocateBranch("V1"), 5.0));
        b.add(new Resistor("R1", supply, anode, 1000));
        b.add(new JunctionElement("D1", anode, Netlist.GROUND, new Diode(DiodeParams.junction(1e-14, 1)), 300, 0.0));
        return b.build();
    }

    /** The DC operating point by the ordinary strategy: the accepted point of the tests. */
    private static double[] operatingPoint(Netlist nl, NewtonSolver newton) {
        double[] x = new double[nl.unknownCount()];
        new DcStrategy(newton, ContinuationOptions.DEFAULT).solve(x, nl.initialStates());
        return x;
    }

    @Test
    @DisplayName("a wild prediction (anode at 3 V) limited from the accepted point converges to the same solution")
    void wildPredictionConverges() {
        Netlist nl = diodeCircuit();
        NewtonSolver newton = new NewtonSolver(nl, NewtonOptions.DEFAULT);
        double[] accepted = operatingPoint(nl, newton);
        // the diode carries about (5 − 0.69) V / 1 kΩ ≈ 4.3 mA: VF ≈ VT·ln(I/IS) ≈ 0.69 V (derived, Shockley)
        int anode = 1;
        assertEquals(0.69, accepted[anode], 0.02, "Shockley, derived");
        double[] predicted = accepted.clone();
        predicted[anode] = 3.0; // e^(3/0.02585) overflows no double, but its current is absurd (1e36 A)
        boolean ok = newton.runPredicted(predicted, accepted, nl.initialStates(), StampContext.DC);
        assertTrue(ok, "converged");
        assertArrayEquals(accepted, predicted, 1e-3, "same operating point within the NM-6 step test (reltol 1e-3 of 0.69 V)");
    }

    @Test
    @DisplayName("an exact prediction needs one linear solve (the step test then passes at once)")
    void exactPredictionOneSolve() {
        Netlist nl = diodeCircuit();
        NewtonSolver newton = new NewtonSolver(nl, NewtonOptions.DEFAULT);
        double[] accepted = operatingPoint(nl, newton);
        double[] predicted = accepted.clone();
        assertTrue(newton.runPredicted(predicted, accepted, nl.initialStates(), StampContext.DC));
        assertEquals(1, newton.iterations(), "one solve, then the residual and step tests pass (NewtonSolver contract)");
    }
}
