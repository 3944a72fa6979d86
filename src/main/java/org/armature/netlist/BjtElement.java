package org.armature.netlist;

import java.util.List;
import org.armature.devices.Bjt;
import org.armature.devices.BjtEvaluation;
import org.armature.devices.Junctions;

/**
 * The intrinsic bipolar transistor ({@link Bjt}: Ebers–Moll 1954 transport form with Gummel–Poon
 * 1970 base charge) between its intrinsic collector, base and emitter nodes, linearised at the
 * Newton iterate with the model's partial derivatives:
 * IC ≈ IC0 + ∂IC/∂VBE·ΔVBE + ∂IC/∂VBC·ΔVBC, likewise IB. Both junction voltages are limited by
 * Nagel's rule (ERL M520, 1975) in the device's own polarity. A fixed gmin sits across each
 * junction. RB, RC, RE are separate {@link Resistor}s to internal nodes.
 */
public final class BjtElement implements Element {

    private final String label;
    private final int c;
    private final int b;
    private final int e;
    private final Bjt bjt;
    private final double temperatureKelvin;
    private final double gminSiemens;
    private final double sign;
    private final double forwardNvt;
    private final double reverseNvt;
    private final double forwardCritical;
    private final double reverseCritical;
    private final BjtEvaluation eval = new BjtEvaluation();
    private double lastVbe;
    private double lastVbc;
    private boolean coldBe;
    private boolean coldBc;

    /**
     * @param label designator for messages
     * @param c intrinsic collector node
     * @param b intrinsic base node
     * @param e intrinsic emitter node
     * @param bjt the device equations
     * @param temperatureKelvin junction temperature, K
     * @param gminSiemens conductance across each junction, S, ≥ 0
     */
    public BjtElement(String label, int c, int b, int e, Bjt bjt, double temperatureKelvin, double gminSiemens) {
        this.label = label;
        this.c = c;
        this.b = b;
        this.e = e;
        this.bjt = bjt;
        this.temperatureKelvin = temperatureKelvin;
        this.gminSiemens = gminSiemens;
        this.sign = bjt.params().polarity().sign();
        double vt = Junctions.thermalVoltage(temperatureKelvin);
        double is = bjt.saturationCurrentAt(temperatureKelvin);
        this.forwardNvt = bjt.params().forwardEmissionCoefficient() * vt;
        this.reverseNvt = bjt.params().reverseEmissionCoefficient() * vt;
        this.forwardCritical = Junctions.criticalVoltage(forwardNvt, is);
        this.reverseCritical = Junctions.criticalVoltage(reverseNvt, is);
    }

    /** @return the device */
    public Bjt bjt() {
        return bjt;
    }

    /** @return junction temperature, K */
    public double temperatureKelvin() {
        return temperatureKelvin;
    }

    /**
     * @param x a solution
     * @return intrinsic VBE, V (actual polarity)
     */
    public double vbe(Solution x) {
        return x.voltage(b) - x.voltage(e);
    }

    /**
     * @param x a solution
     * @return intrinsic VBC, V (actual polarity)
     */
    public double vbc(Solution x) {
        return x.voltage(b) - x.voltage(c);
    }

    /**
     * Terminal currents at a solution, gmin included (thread-safe: uses its own evaluation holder).
     *
     * @param x a solution
     * @param out receives current into the collector, base and emitter, A (length ≥ 3)
     */
    public void terminalCurrents(Solution x, double[] out) {
        double vbe = vbe(x);
        double vbc = vbc(x);
        BjtEvaluation ev = new BjtEvaluation();
        bjt.evaluate(vbe, vbc, temperatureKelvin, ev);
        double ic = ev.collectorAmps() - gminSiemens * vbc;
        double ib = ev.baseAmps() + gminSiemens * (vbe + vbc);
        out[0] = ic;
        out[1] = ib;
        out[2] = -(ic + ib);
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {c, b, e};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of(new int[] {b, e}, new int[] {b, c});
    }

    @Override
    public boolean isNonlinear() {
        return true;
    }

    @Override
    public void begin(Solution start) {
        lastVbe = vbe(start);
        lastVbc = vbc(start);
        coldBe = false;
        coldBc = false;
    }

    @Override
    public void beginCold(Solution start) {
        begin(start);
        coldBe = true;
        coldBc = true;
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        double vbe = vbe(x);
        double vbc = vbc(x);
        double vbeL;
        if (coldBe && sign * vbe > forwardCritical) {
            vbeL = sign * forwardCritical;
            coldBe = false;
        } else {
            vbeL = sign * Junctions.limitJunction(sign * vbe, sign * lastVbe, forwardNvt, forwardCritical);
        }
        double vbcL;
        if (coldBc && sign * vbc > reverseCritical) {
            vbcL = sign * reverseCritical;
            coldBc = false;
        } else {
            vbcL = sign * Junctions.limitJunction(sign * vbc, sign * lastVbc, reverseNvt, reverseCritical);
        }
        lastVbe = vbeL;
        lastVbc = vbcL;
        bjt.evaluate(vbeL, vbcL, temperatureKelvin, eval);
        double gcbe = eval.dCollectorDvbe();
        double gcbc = eval.dCollectorDvbc();
        double gbbe = eval.dBaseDvbe();
        double gbbc = eval.dBaseDvbc();
        // collector current flows c -> e through the device, base current b -> e
        s.transconductance(c, e, b, e, gcbe);
        s.transconductance(c, e, b, c, gcbc);
        s.transconductance(b, e, b, e, gbbe);
        s.transconductance(b, e, b, c, gbbc);
        double icEq = eval.collectorAmps() - gcbe * vbeL - gcbc * vbcL;
        double ibEq = eval.baseAmps() - gbbe * vbeL - gbbc * vbcL;
        s.current(c, -icEq);
        s.current(b, -ibEq);
        s.current(e, icEq + ibEq);
        s.conductance(b, e, gminSiemens);
        s.conductance(b, c, gminSiemens);
        return vbeL != vbe || vbcL != vbc;
    }
}
