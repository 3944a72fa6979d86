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
    private final double threshold;
    private double lastVgs;
    private double lastVds;
    private boolean coldGate;

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
        this.threshold = mosfet.thresholdAt(temperatureKelvin);
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
        lastVds = start.voltage(d) - start.voltage(s);
        coldGate = false;
    }

    /**
     * Cold start: the first time a Newton step takes the gate above threshold, the step is taken
     * whole instead of landing just above threshold. A gate is driven through resistors from a
     * source, so the first linear solve puts it near its final voltage; landing it at threshold
     * while the drain still sits at the supply linearises the channel far from its real current and
     * throws the drain below ground for several iterations.
     */
    @Override
    public void beginCold(Solution start) {
        begin(start);
        coldGate = true;
    }

    @Override
    public boolean stamp(Stamper st, Solution x, StampContext ctx) {
        double vgs = x.voltage(g) - x.voltage(s);
        double vds = x.voltage(d) - x.voltage(s);
        double vgsL;
        if (coldGate && vgs > threshold) {
            vgsL = vgs;
            coldGate = false;
        } else {
            vgsL = mosfet.limitGateStep(vgs, lastVgs, temperatureKelvin, gateStep);
        }
        lastVgs = vgsL;
        double vdsL = limitDrainSource(vds, lastVds);
        lastVds = vdsL;
        mosfet.evaluate(vgsL, vdsL, temperatureKelvin, eval);
        double gm = eval.gmSiemens();
        double gds = eval.gdsSiemens();
        st.transconductance(d, s, g, s, gm);
        st.conductance(d, s, gds + gminSiemens);
        double ieq = eval.drainAmps() - gm * vgsL - gds * vdsL;
        st.current(d, -ieq);
        st.current(s, ieq);
        return vgsL != vgs || vdsL != vds;
    }

    /**
     * Drain–source step limiting, the classic rule of the MOS models of the Berkeley simulation
     * work that followed Nagel (ERL M520, 1975): from a drain–source voltage of at least 3.5 V a
     * fall is stopped at 2 V and a rise at 3·v + 2 V; from below 3.5 V a rise is stopped at 4 V and
     * a fall at −0.5 V (when it starts above −0.5 V; a drain pinned there by the stop moves on freely). A channel switching on with its drain still at the supply is thus linearised
     * near the triode region instead of at a saturation current the load cannot carry (which throws
     * the drain tens of volts below ground and into the body diode).
     */
    static double limitDrainSource(double vNew, double vOld) {
        if (vOld >= VDS_HIGH_VOLTS) {
            if (vNew > vOld) {
                return Math.min(vNew, VDS_RISE_FACTOR * vOld + VDS_RISE_OFFSET_VOLTS);
            }
            return vNew < VDS_HIGH_VOLTS ? Math.max(vNew, VDS_FALL_STOP_VOLTS) : vNew;
        }
        if (vNew > vOld) {
            return Math.min(vNew, VDS_LOW_RISE_STOP_VOLTS);
        }
        // the fall stop applies from above it: a drain already below −0.5 V (the body diode
        // conducting while the coil rings below ground) moves freely, its diode limits it; stopping
        // it there again would flag every iteration as limited and never converge
        return vOld > VDS_LOW_FALL_STOP_VOLTS ? Math.max(vNew, VDS_LOW_FALL_STOP_VOLTS) : vNew;
    }

    /** Constants of {@link #limitDrainSource} (the classic values), V or dimensionless. */
    private static final double VDS_HIGH_VOLTS = 3.5;
    private static final double VDS_RISE_FACTOR = 3.0;
    private static final double VDS_RISE_OFFSET_VOLTS = 2.0;
    private static final double VDS_FALL_STOP_VOLTS = 2.0;
    private static final double VDS_LOW_RISE_STOP_VOLTS = 4.0;
    private static final double VDS_LOW_FALL_STOP_VOLTS = -0.5;
}
