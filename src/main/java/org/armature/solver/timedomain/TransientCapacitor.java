package org.armature.solver.timedomain;

import java.util.List;
import org.armature.netlist.Solution;
import org.armature.netlist.Stamper;
import org.armature.netlist.StampContext;
import org.armature.netlist.TwoTerminalElement;

/**
 * A linear capacitor with the run's integration formula: open at DC, at a time point the Norton
 * companion of {@link Companion#capacitor} (trapezoidal, backward Euler or BDF2). State: its voltage
 * v(a) − v(b).
 */
final class TransientCapacitor extends TwoTerminalElement implements Reactive {

    private final double farads;
    private final StepState step;
    private double vNow;
    private double vBefore;
    private double iNow;

    TransientCapacitor(String label, int a, int b, double farads, StepState step) {
        super(label, a, b);
        if (!(farads > 0) || !Double.isFinite(farads)) {
            throw new IllegalArgumentException("farads of " + label + " must be positive and finite");
        }
        this.farads = farads;
        this.step = step;
    }

    double farads() {
        return farads;
    }

    /** Current from a through the capacitor to b at a solution of the point being solved, amperes. */
    double current(Solution x) {
        if (step.dc()) {
            return 0;
        }
        IntegratorCoefficients k = step.coefficients();
        double v = x.voltage(a) - x.voltage(b);
        return farads * k.derivative(v, k.history(vNow, vBefore, iNow / farads));
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of();
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        if (step.dc()) {
            return false;
        }
        Companion.Norton n = Companion.capacitor(farads, step.coefficients(), vNow, vBefore, iNow);
        s.conductance(a, b, n.conductanceSiemens());
        s.current(a, -n.currentAmps());
        s.current(b, n.currentAmps());
        return false;
    }

    @Override
    public int stateCount() {
        return 1;
    }

    @Override
    public Unit unit(int index) {
        return Unit.VOLTS;
    }

    @Override
    public void states(Solution x, double[] out, int offset) {
        out[offset] = x.voltage(a) - x.voltage(b);
    }

    @Override
    public void initialise(Solution x) {
        vNow = x.voltage(a) - x.voltage(b);
        vBefore = vNow;
        iNow = 0;
    }

    @Override
    public void commit(Solution x) {
        double i = current(x);
        vBefore = vNow;
        vNow = x.voltage(a) - x.voltage(b);
        iNow = i;
    }

    @Override
    public double committedDerivative() {
        return iNow;
    }

    @Override
    public Unit derivativeUnit() {
        return Unit.AMPS;
    }
}
