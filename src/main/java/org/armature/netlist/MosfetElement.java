package org.armature.netlist;

import java.util.List;
import org.armature.devices.GateStepOptions;
import org.armature.devices.Mosfet;
import org.armature.devices.MosfetEvaluation;

/**
 * The channel of an N-channel MOSFET ({@link Mosfet}: Shichman–Hodges, IEEE J. Solid-State Circuits
 * SC-3, 1968) linearised at the Newton iterate: ID ≈ ID0 + gm·ΔVGS + gds·ΔVDS, with the devices
 * package's gate-step limiting on VGS. The gate draws no current, so a gate with no other DC path
 * is a floating node. A fixed gmin sits across drain–source. The body diode is a separate
 * {@link JunctionElement}.
 */
public final class MosfetElement implements Element {

    private final String label;
    private final int d;
    private final int g;
    private final int s;
    private final Mosfet mosfet;
    private final double temperatureKelvin;
    private final double gminSiemens;
    private final GateStepOptions gateStep;
    private final MosfetEvaluation eval = new MosfetEvaluation();
    private double lastVgs;

    /**
     * @param label designator for messages
     * @param d drain node
     * @param g gate node
     * @param s source node
     * @param mosfet the device equations
     * @param temperatureKelvin junction temperature, K
     * @param gminSiemens conductance across drain–source, S, ≥ 0
     * @param gateStep Newton step limits on VGS
     */
    public MosfetElement(String label, int d, int g, int s, Mosfet mosfet, double temperatureKelvin,
                         double gminSiemens, GateStepOptions gateStep) {
        this.label = label;
        this.d = d;
        this.g = g;
        this.s = s;
        this.mosfet = mosfet;
        this.temperatureKelvin = temperatureKelvin;
        this.gminSiemens = gminSiemens;
        this.gateStep = gateStep;
    }

    /** @return the device */
    public Mosfet mosfet() {
        return mosfet;
    }

    /** @return junction temperature, K */
    public double temperatureKelvin() {
        return temperatureKelvin;
    }

    /**
     * Channel current at a solution, gmin included (thread-safe: uses its own evaluation holder).
     *
     * @param x a solution
     * @return current into the drain through the channel, A
     */
    public double drainCurrent(Solution x) {
        double vgs = x.voltage(g) - x.voltage(s);
        double vds = x.voltage(d) - x.voltage(s);
        MosfetEvaluation ev = new MosfetEvaluation();
        mosfet.evaluate(vgs, vds, temperatureKelvin, ev);
        return ev.drainAmps() + gminSiemens * vds;
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {d, g, s};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of(new int[] {d, s});
    }

    @Override
    public boolean isNonlinear() {
        return true;
    }

    @Override
    public void begin(Solution start) {
        lastVgs = start.voltage(g) - start.voltage(s);
    }

    @Override
    public boolean stamp(Stamper st, Solution x, StampContext ctx) {
        double vgs = x.voltage(g) - x.voltage(s);
        double vds = x.voltage(d) - x.voltage(s);
        double vgsL = mosfet.limitGateStep(vgs, lastVgs, temperatureKelvin, gateStep);
        lastVgs = vgsL;
        mosfet.evaluate(vgsL, vds, temperatureKelvin, eval);
        double gm = eval.gmSiemens();
        double gds = eval.gdsSiemens();
        st.transconductance(d, s, g, s, gm);
        st.conductance(d, s, gds + gminSiemens);
        double ieq = eval.drainAmps() - gm * vgsL - gds * vds;
        st.current(d, -ieq);
        st.current(s, ieq);
        return vgsL != vgs;
    }
}
