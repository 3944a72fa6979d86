package org.armature.solver.timedomain;

import java.util.List;
import org.armature.devices.BreakdownClamp;
import org.armature.devices.JunctionEvaluation;
import org.armature.netlist.Solution;
import org.armature.netlist.Stamper;
import org.armature.netlist.StampContext;

/**
 * Avalanche breakdown of a switch at its rating ({@link BreakdownClamp} of the devices package),
 * in parallel with the switch from its high terminal (collector, drain; a PNP's emitter) to its low
 * one, linearised at the Newton iterate with the clamp's own voltage limiting.
 */
final class SwitchClamp implements org.armature.netlist.Element {

    private final String label;
    private final int high;
    private final int low;
    private final BreakdownClamp clamp;
    private final JunctionEvaluation eval = new JunctionEvaluation();
    private double lastVolts;

    SwitchClamp(String label, int high, int low, BreakdownClamp clamp) {
        this.label = label;
        this.high = high;
        this.low = low;
        this.clamp = clamp;
    }

    double ratedVolts() {
        return clamp.ratedVolts();
    }

    /** Clamp current high → low at a solution, amperes. */
    double current(Solution x) {
        clamp.evaluate(x.voltage(high) - x.voltage(low), eval);
        return eval.currentAmps();
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {high, low};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of();
    }

    @Override
    public boolean isNonlinear() {
        return true;
    }

    @Override
    public void begin(Solution start) {
        lastVolts = start.voltage(high) - start.voltage(low);
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        double v = x.voltage(high) - x.voltage(low);
        double limited = clamp.limitVoltage(v, lastVolts);
        lastVolts = limited;
        clamp.evaluate(limited, eval);
        double g = eval.conductanceSiemens();
        double i0 = eval.currentAmps() - g * limited;
        s.conductance(high, low, g);
        s.current(high, -i0);
        s.current(low, i0);
        return limited != v;
    }
}
