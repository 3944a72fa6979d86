package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.armature.devices.Bjt;
import org.armature.devices.BjtEvaluation;
import org.armature.devices.BjtParams;
import org.armature.devices.BjtPolarity;
import org.armature.devices.Diode;
import org.armature.devices.DiodeParams;
import org.armature.devices.GateStepOptions;
import org.armature.devices.JunctionEvaluation;
import org.armature.devices.Mosfet;
import org.armature.devices.MosfetEvaluation;
import org.armature.devices.MosfetParams;
import org.armature.netlist.ArraySolution;
import org.armature.netlist.BjtElement;
import org.armature.netlist.Capacitor;
import org.armature.netlist.ContactModel;
import org.armature.netlist.CurrentSource;
import org.armature.netlist.Element;
import org.armature.netlist.JunctionElement;
import org.armature.netlist.MosfetElement;
import org.armature.netlist.Netlist;
import org.armature.netlist.NortonSource;
import org.armature.netlist.RelayCoil;
import org.armature.netlist.Resistor;
import org.armature.netlist.StampContext;
import org.armature.netlist.SwitchedResistor;
import org.armature.netlist.Transconductor;
import org.armature.netlist.VoltageSource;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Each element's stamp against a small matrix derived by hand (MNA stamps, Ho, Ruehli, Brennan 1975). */
class ElementStampTest {

    private static final int G = Netlist.GROUND;
    private static final double EPS = 1e-15;

    private static MnaSystem stamp(Element e, int nodes, int branches, double[] x, double[] states, StampContext ctx) {
        MnaSystem m = new MnaSystem(nodes, branches);
        ArraySolution s = new ArraySolution(nodes, x, states);
        e.begin(s);
        e.stamp(m, s, ctx);
        return m;
    }

    private static MnaSystem stamp(Element e, int nodes, int branches, double[] x) {
        return stamp(e, nodes, branches, x, new double[2], StampContext.DC);
    }

    @Test
    @DisplayName("resistor 1 kΩ between nodes 0 and 1: [[g, −g], [−g, g]], g = 1 mS; to ground only the diagonal")
    void resistor() {
        MnaSystem m = stamp(new Resistor("R", 0, 1, 1000), 2, 0, new double[2]);
        assertArrayEquals(new double[] {1e-3, -1e-3, -1e-3, 1e-3}, m.matrix(), EPS);
        MnaSystem g = stamp(new Resistor("R", G, 1, 1000), 2, 0, new double[2]);
        assertArrayEquals(new double[] {0, 0, 0, 1e-3}, g.matrix(), EPS);
    }

    @Test
    @DisplayName("voltage source 12 V from node 0 to ground, branch 0: B = C' = [1], rhs row 1 = 12")
    void voltageSource() {
        MnaSystem m = stamp(new VoltageSource("V", 0, G, 0, 12), 1, 1, new double[2]);
        assertArrayEquals(new double[] {0, 1, 1, 0}, m.matrix(), EPS);
        assertArrayEquals(new double[] {0, 12}, m.rhs(), EPS);
        MnaSystem half = stamp(new VoltageSource("V", 0, G, 0, 12), 1, 1, new double[2], new double[0],
                StampContext.dcScaled(0.5));
        assertArrayEquals(new double[] {0, 6}, half.rhs(), EPS, "source stepping scales the source");
    }

    @Test
    @DisplayName("Norton pin 3.5 V behind 75 Ω: conductance 1/75 S, current 3.5/75 A into the node")
    void nortonSource() {
        MnaSystem m = stamp(new NortonSource("U", 0, G, 3.5, 75), 1, 0, new double[1]);
        assertArrayEquals(new double[] {1.0 / 75}, m.matrix(), EPS);
        assertArrayEquals(new double[] {3.5 / 75}, m.rhs(), EPS);
    }

    @Test
    @DisplayName("current source 1 mA from node 0 into node 1: rhs [−1 mA, +1 mA]")
    void currentSource() {
        MnaSystem m = stamp(new CurrentSource("I", 0, 1, 1e-3), 2, 0, new double[2]);
        assertArrayEquals(new double[] {-1e-3, 1e-3}, m.rhs(), EPS);
    }

    @Test
    @DisplayName("transconductance gm from node 0 to node 1 controlled by v2 − v3: ±gm in rows 0, 1, columns 2, 3")
    void transconductor() {
        MnaSystem m = stamp(new Transconductor("G", 0, 1, 2, 3, 0.5), 4, 0, new double[4]);
        double[] expected = new double[16];
        expected[2] = 0.5;
        expected[3] = -0.5;
        expected[4 + 2] = -0.5;
        expected[4 + 3] = 0.5;
        assertArrayEquals(expected, m.matrix(), EPS);
    }

    @Test
    @DisplayName("capacitor: nothing at DC (open); at a time point the transient engine's own companion takes its place")
    void capacitor() {
        Capacitor c = new Capacitor("C", 0, G, 1e-6);
        assertArrayEquals(new double[] {0}, stamp(c, 1, 0, new double[1]).matrix(), EPS);
        StampContext tr = new StampContext(StampContext.Mode.TRANSIENT, 1, 1e-3, 1e-3, 1e3);
        MnaSystem m = new MnaSystem(1, 0);
        org.junit.jupiter.api.Assertions.assertThrows(IllegalStateException.class,
                () -> c.stamp(m, new ArraySolution(1, new double[1], new double[0]), tr));
    }

    @Test
    @DisplayName("relay coil 400 Ω at 20 °C, coil at 70 °C: conductance 1/(400·(234.5+70)/(234.5+20)) (PC-7 copper law)")
    void relayCoil() {
        RelayCoil coil = new RelayCoil("K", 0, G, 400, 20, 0);
        MnaSystem m = stamp(coil, 1, 0, new double[1], new double[] {70}, StampContext.DC);
        assertArrayEquals(new double[] {1.0 / (400 * 304.5 / 254.5)}, m.matrix(), 1e-15);
    }

    @Test
    @DisplayName("contact com–no: 1/closed when operated, 1/open when released")
    void contact() {
        ContactModel cm = ContactModel.DEFAULT;
        SwitchedResistor no = new SwitchedResistor("K no", 0, G, 0, true, cm);
        assertArrayEquals(new double[] {1 / cm.closedOhms()},
                stamp(no, 1, 0, new double[1], new double[] {1}, StampContext.DC).matrix(), EPS);
        assertArrayEquals(new double[] {1 / cm.openOhms()},
                stamp(no, 1, 0, new double[1], new double[] {0}, StampContext.DC).matrix(), EPS);
    }

    @Test
    @DisplayName("junction at v: [[g, −g], [−g, g]] with g = dI/dV + gmin, rhs ∓(I − g·v)")
    void junction() {
        Diode d = new Diode(DiodeParams.junction(1e-14, 1));
        double t = 300;
        double v = 0.6;
        JunctionElement j = new JunctionElement("D", 0, 1, d, t, 1e-12);
        MnaSystem m = stamp(j, 2, 0, new double[] {v, 0});
        JunctionEvaluation e = new JunctionEvaluation();
        d.evaluate(v, t, e);
        double g = e.conductanceSiemens() + 1e-12;
        double ieq = e.currentAmps() + 1e-12 * v - g * v;
        assertArrayEquals(new double[] {g, -g, -g, g}, m.matrix(), 1e-18);
        assertArrayEquals(new double[] {-ieq, ieq}, m.rhs(), 1e-18);
    }

    @Test
    @DisplayName("BJT at (VBE, VBC): collector row [gcbe+gcbc, −gcbc, −gcbe], base row [gbbe+gbbc, −gbbc, −gbbe] plus gmin")
    void bjt() {
        Bjt q = new Bjt(BjtParams.ebersMoll(BjtPolarity.NPN, 1e-14, 100, 1).withNominalTemperature(300));
        int c = 0;
        int b = 1;
        double vb = 0.7;
        double vc = 0.2;
        // unknowns: c, b; emitter is ground
        BjtElement el = new BjtElement("Q", c, b, G, q, 300, 0.0);
        MnaSystem m = stamp(el, 2, 0, new double[] {vc, vb});
        BjtEvaluation e = new BjtEvaluation();
        q.evaluate(vb, vb - vc, 300, e);
        double gcbe = e.dCollectorDvbe();
        double gcbc = e.dCollectorDvbc();
        double gbbe = e.dBaseDvbe();
        double gbbc = e.dBaseDvbc();
        // row c: IC = gcbe·(vb − ve) + gcbc·(vb − vc) + const → d/dvc = −gcbc, d/dvb = gcbe + gcbc
        assertArrayEquals(new double[] {-gcbc, gcbe + gcbc, -gbbc, gbbe + gbbc}, m.matrix(), 1e-15);
        double icEq = e.collectorAmps() - gcbe * vb - gcbc * (vb - vc);
        double ibEq = e.baseAmps() - gbbe * vb - gbbc * (vb - vc);
        assertArrayEquals(new double[] {-icEq, -ibEq}, m.rhs(), 1e-15);
    }

    @Test
    @DisplayName("MOSFET at (VGS, VDS): drain row [gds, gm], source row mirrored, rhs ∓(ID − gm·VGS − gds·VDS)")
    void mosfet() {
        Mosfet q = new Mosfet(MosfetParams.level1(1.5, 0.2, 0.02));
        // unknowns: d, g, s
        double[] x = {0.5, 3.3, 0.1};
        MosfetElement el = new MosfetElement("Q", 0, 1, 2, q, 298.15, 0.0, GateStepOptions.DEFAULTS);
        MnaSystem m = new MnaSystem(3, 0);
        ArraySolution s = new ArraySolution(3, x, new double[0]);
        el.begin(s);
        el.stamp(m, s, StampContext.DC);
        MosfetEvaluation e = new MosfetEvaluation();
        q.evaluate(3.2, 0.4, 298.15, e);
        double gm = e.gmSiemens();
        double gds = e.gdsSiemens();
        double ieq = e.drainAmps() - gm * 3.2 - gds * 0.4;
        assertArrayEquals(new double[] {gds, gm, -gds - gm, -gds, -gm, gds + gm}, new double[] {
            m.get(0, 0), m.get(0, 1), m.get(0, 2), m.get(2, 0), m.get(2, 1), m.get(2, 2)}, 1e-15);
        assertEquals(0.0, m.get(1, 0) + m.get(1, 1) + m.get(1, 2), 0.0, "the gate row stays empty");
        assertArrayEquals(new double[] {-ieq, 0, ieq}, m.rhs(), 1e-15);
    }
}
