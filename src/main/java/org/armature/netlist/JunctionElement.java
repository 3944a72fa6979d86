package org.armature.netlist;

import java.util.List;
import org.armature.devices.Diode;
import org.armature.devices.JunctionEvaluation;

/**
 * The intrinsic junction of a diode, zener, LED or TVS ({@link Diode}, Shockley 1949 with reverse
 * breakdown), linearised at the Newton iterate as a conductance in parallel with a current, with
 * the devices package's Nagel limiting (ERL M520, 1975). A fixed junction gmin is added in parallel
 * so that a reverse-biased junction never leaves a node without a conductance. The diode's series
 * resistance is a separate {@link Resistor} to an internal node.
 */
public final class JunctionElement implements Element {

    private final String label;
    private final int anode;
    private final int cathode;
    private final Diode diode;
    private final double temperatureKelvin;
    private final double gminSiemens;
    private final JunctionEvaluation eval = new JunctionEvaluation();
    private final double coldVolts;
    private double lastVolts;
    private boolean cold;

    /**
     * @param label designator for messages
     * @param anode anode node (intrinsic)
     * @param cathode cathode node
     * @param diode the device equations
     * @param temperatureKelvin junction temperature, K
     * @param gminSiemens parallel conductance across the junction, S, ≥ 0
     */
    public JunctionElement(String label, int anode, int cathode, Diode diode, double temperatureKelvin,
                           double gminSiemens) {
        this.label = label;
        this.anode = anode;
        this.cathode = cathode;
        this.diode = diode;
        this.temperatureKelvin = temperatureKelvin;
        this.gminSiemens = gminSiemens;
        this.coldVolts = diode.params().bidirectional() ? Double.POSITIVE_INFINITY
                : diode.criticalVoltageAt(temperatureKelvin);
    }

    /** @return the device */
    public Diode diode() {
        return diode;
    }

    /** @return junction temperature, K */
    public double temperatureKelvin() {
        return temperatureKelvin;
    }

    /**
     * @param x a solution
     * @return junction voltage, anode minus cathode, V
     */
    public double voltage(Solution x) {
        return x.voltage(anode) - x.voltage(cathode);
    }

    /**
     * Current at a solution, evaluated at its exact junction voltage (no limiting), gmin included.
     * Thread-safe: uses its own evaluation holder, not the one of the Newton loop.
     *
     * @param x a solution
     * @return current from anode to cathode, A
     */
    public double current(Solution x) {
        double v = voltage(x);
        JunctionEvaluation out = new JunctionEvaluation();
        diode.evaluate(v, temperatureKelvin, out);
        return out.currentAmps() + gminSiemens * v;
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {anode, cathode};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of(new int[] {anode, cathode});
    }

    @Override
    public boolean isNonlinear() {
        return true;
    }

    @Override
    public void begin(Solution start) {
        lastVolts = voltage(start);
        cold = false;
    }

    /** A bidirectional clamp has no forward junction: its cold start is {@link #begin}. */
    @Override
    public void beginCold(Solution start) {
        begin(start);
        cold = true;
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        double v = voltage(x);
        double vl;
        if (cold && v > coldVolts) {
            vl = coldVolts;
            cold = false;
        } else {
            vl = diode.limitVoltage(v, lastVolts, temperatureKelvin);
        }
        lastVolts = vl;
        diode.evaluate(vl, temperatureKelvin, eval);
        double g = eval.conductanceSiemens() + gminSiemens;
        double i = eval.currentAmps() + gminSiemens * vl;
        double ieq = i - g * vl;
        s.conductance(anode, cathode, g);
        s.current(anode, -ieq);
        s.current(cathode, ieq);
        return vl != v;
    }
}
