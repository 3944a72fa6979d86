package org.armature.solver.timedomain;

import java.util.List;
import org.armature.netlist.Solution;
import org.armature.netlist.Stamper;
import org.armature.netlist.StampContext;

/**
 * A relay winding between A1 and A2: copper resistance R (at the coil temperature of the operating
 * point, held for the run: the coil's thermal time constant is minutes) in series with the
 * inductance of the present armature gap. The integrated state is the flux linkage
 * λ = L(g)·i, so that a moving armature changes the current and not the flux (Faraday's law:
 * v = R·i + dλ/dt; Fitzgerald and Kingsley, <i>Electric Machinery</i>).
 *
 * <p>Stamped in Norton form, so it needs no extra unknown: at DC a conductance 1/R (the inductance
 * is a short); at a time point {@code dλ/dt ≈ a0·λ + history} gives
 * {@code i = (v − history)/(R + a0·L)}. During one Newton solve the inductance is fixed; the
 * armature's gap is iterated around it by the run (see {@link ArmatureDynamics}).
 */
final class TransientCoil implements Reactive {

    private final String label;
    private final int a1;
    private final int a2;
    private final double ohms;
    private final double referenceHenries;
    private final StepState step;
    private double henries;
    private double lambdaNow;
    private double lambdaBefore;
    private double dLambdaNow;

    /**
     * @param referenceHenries inductance used to express the flux state as a current for the error test
     */
    TransientCoil(String label, int a1, int a2, double ohms, double henries, double referenceHenries,
                  StepState step) {
        if (!(ohms > 0) || !(henries > 0)) {
            throw new IllegalArgumentException("coil of " + label + " needs positive resistance and inductance");
        }
        this.label = label;
        this.a1 = a1;
        this.a2 = a2;
        this.ohms = ohms;
        this.henries = henries;
        this.referenceHenries = referenceHenries;
        this.step = step;
    }

    double ohms() {
        return ohms;
    }

    double henries() {
        return henries;
    }

    int a1() {
        return a1;
    }

    int a2() {
        return a2;
    }

    /** Sets the inductance of the present gap for the next solve. */
    void setHenries(double h) {
        henries = h;
    }

    double lambdaNow() {
        return lambdaNow;
    }

    private double history() {
        return step.coefficients().history(lambdaNow, lambdaBefore, dLambdaNow);
    }

    /** Coil current A1 → A2 at a solution of the point being solved, amperes. */
    double current(Solution x) {
        double v = x.voltage(a1) - x.voltage(a2);
        if (step.dc()) {
            return v / ohms;
        }
        return (v - history()) / (ohms + step.coefficients().a0() * henries);
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {a1, a2};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of(new int[] {a1, a2});
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        if (step.dc()) {
            s.conductance(a1, a2, 1 / ohms);
            return false;
        }
        double g = 1 / (ohms + step.coefficients().a0() * henries);
        double hist = history();
        s.conductance(a1, a2, g);
        s.current(a1, g * hist);
        s.current(a2, -g * hist);
        return false;
    }

    @Override
    public int stateCount() {
        return 1;
    }

    @Override
    public Unit unit(int index) {
        return Unit.AMPS;
    }

    @Override
    public void states(Solution x, double[] out, int offset) {
        out[offset] = henries * current(x) / referenceHenries;
    }

    @Override
    public void initialise(Solution x) {
        lambdaNow = henries * current(x);
        lambdaBefore = lambdaNow;
        dLambdaNow = 0;
    }

    @Override
    public void commit(Solution x) {
        double lambda = henries * current(x);
        double d = step.dc() ? 0 : step.coefficients().derivative(lambda, history());
        lambdaBefore = lambdaNow;
        lambdaNow = lambda;
        dLambdaNow = d;
    }

    @Override
    public double committedDerivative() {
        return dLambdaNow;
    }

    @Override
    public Unit derivativeUnit() {
        return Unit.VOLTS;
    }
}
