package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.armature.model.Connectivity;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Stage;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Invariants on random stages from a seeded generator, and linear networks against a direct EJML solve. */
class InvariantsTest {

    private static final ConvergenceTolerances TOL = ConvergenceTolerances.DEFAULT;

    /** A random stage: resistor network over a few nets, a supply, a drive pin, diodes, a transistor switch. */
    static Stage randomStage(long seed) {
        Random r = new Random(seed);
        StageSketch s = new StageSketch();
        int nets = 3 + r.nextInt(4);
        List<String> names = new ArrayList<>();
        names.add("gnd");
        for (int i = 1; i <= nets; i++) {
            names.add("n" + i);
        }
        s.part("V1", PartKind.SUPPLY, "volts", 5 + 20 * r.nextDouble()).wire("V1.p", "n1");
        s.part("U1", PartKind.DRIVE_PIN, "highVolts", 3 + 2 * r.nextDouble()).wire("U1.out", "n2");
        // a chain keeps every net connected, then random extra resistors
        for (int i = 1; i <= nets; i++) {
            String ref = "R" + i;
            s.part(ref, PartKind.RESISTOR, "resistanceOhms", Math.pow(10, 2 + 3 * r.nextDouble()));
            s.wire(ref + ".a", names.get(i), ref + ".b", names.get(i - 1));
        }
        int extra = r.nextInt(4);
        for (int i = 0; i < extra; i++) {
            String ref = "RX" + i;
            s.part(ref, PartKind.RESISTOR, "resistanceOhms", Math.pow(10, 2 + 3 * r.nextDouble()));
            s.wire(ref + ".a", names.get(r.nextInt(names.size())), ref + ".b", names.get(1 + r.nextInt(nets)));
        }
        int diodes = r.nextInt(3);
        for (int i = 0; i < diodes; i++) {
            String ref = "D" + i;
            s.part(ref, PartKind.DIODE);
            s.wire(ref + ".a", names.get(1 + r.nextInt(nets)), ref + ".k", names.get(r.nextInt(names.size())));
        }
        if (r.nextBoolean()) {
            s.part("Q1", PartKind.NPN).part("RB", PartKind.RESISTOR, "resistanceOhms", 1000 + 9000 * r.nextDouble())
                    .part("RC", PartKind.RESISTOR, "resistanceOhms", 200 + 2000 * r.nextDouble())
                    .wire("RB.a", "n2", "RB.b", "base", "Q1.b", "base", "Q1.e", "gnd", "Q1.c", "coll",
                            "RC.a", "coll", "RC.b", "n1");
        }
        return s.build();
    }

    static Stream<Arguments> seeds() {
        return IntStream.range(0, 40).mapToObj(i -> Arguments.of(1000L + i));
    }

    @ParameterizedTest(name = "random stage, seed {0}: KCL at every net and power balance")
    @MethodSource("seeds")
    void kclAndPowerBalance(long seed) {
        Stage stage = randomStage(seed);
        OperatingPoint op = new DcAnalysis().solve(stage);
        Connectivity c = Connectivity.of(stage);
        HonestResidual.assertHonest(c, op, "seed " + seed);
        Map<String, Double> sum = new HashMap<>();
        Map<String, Double> scale = new HashMap<>();
        for (PartResult p : op.parts().values()) {
            for (Map.Entry<String, Double> e : p.pinCurrents().entrySet()) {
                String net = c.netOfPin().get(new PinRef(p.ref(), e.getKey()));
                sum.merge(net, e.getValue(), Double::sum);
                scale.merge(net, Math.abs(e.getValue()), Double::sum);
            }
        }
        for (Map.Entry<String, Double> e : sum.entrySet()) {
            if (!e.getKey().equals("gnd")) {
                // NM-6 residual test: reltol of the currents meeting there plus abstol (common practice)
                assertEquals(0.0, e.getValue(), TOL.reltol() * scale.get(e.getKey()) + TOL.abstolAmps(),
                        "KCL at " + e.getKey());
            }
        }
        double total = 0;
        double gross = 0;
        for (PartResult p : op.parts().values()) {
            total += p.powerWatts();
            gross += Math.abs(p.powerWatts());
        }
        // Tellegen's theorem: sum of delivered = sum of dissipated
        assertEquals(0.0, total, TOL.reltol() * gross + 1e-12, "power balance");
        assertTrue(op.maxKclResidualAmps() >= 0 && Double.isFinite(op.maxKclResidualAmps()));
    }

    @ParameterizedTest(name = "linear network, seed {0}: engine equals a direct EJML solve of the nodal equations")
    @MethodSource("seeds")
    void linearNetworkAgainstEjml(long seed) {
        Random r = new Random(seed);
        int nets = 3 + r.nextInt(6);
        StageSketch s = new StageSketch();
        double volts = 1 + 30 * r.nextDouble();
        s.part("V1", PartKind.SUPPLY, "volts", volts).wire("V1.p", "n1");
        List<double[]> resistors = new ArrayList<>();
        int k = 0;
        for (int i = 2; i <= nets; i++) {
            resistors.add(new double[] {i, r.nextInt(i), Math.pow(10, 1 + 4 * r.nextDouble())});
        }
        for (int i = 0; i < nets; i++) {
            int a = 1 + r.nextInt(nets);
            int b = r.nextInt(nets + 1);
            if (a != b) {
                resistors.add(new double[] {a, b, Math.pow(10, 1 + 4 * r.nextDouble())});
            }
        }
        for (double[] res : resistors) {
            String ref = "R" + (k++);
            s.part(ref, PartKind.RESISTOR, "resistanceOhms", res[2]);
            s.wire(ref + ".a", net((int) res[0]), ref + ".b", net((int) res[1]));
        }
        OperatingPoint op = new DcAnalysis().solve(s.build());
        // reference: nodal equations G·v = i for nets 2..nets, with net 1 held at the supply voltage
        int m = nets - 1;
        DMatrixRMaj g = new DMatrixRMaj(m, m);
        DMatrixRMaj rhs = new DMatrixRMaj(m, 1);
        for (double[] res : resistors) {
            int a = (int) res[0];
            int b = (int) res[1];
            double y = 1 / res[2];
            addBranch(g, rhs, a, b, y, volts);
            addBranch(g, rhs, b, a, y, volts);
        }
        DMatrixRMaj v = new DMatrixRMaj(m, 1);
        assertTrue(CommonOps_DDRM.solve(g, rhs, v));
        for (int i = 0; i < m; i++) {
            String name = net(i + 2);
            if (op.nodeVoltages().containsKey(name)) {
                assertEquals(v.get(i, 0), op.voltage(name), 1e-9 * volts, "net " + name + " (EJML reference)");
            }
        }
    }

    private static String net(int i) {
        return i == 0 ? "gnd" : "n" + i;
    }

    /** KCL row of net {@code a} for a conductance y to net {@code b}; net 1 is the source, net 0 ground. */
    private static void addBranch(DMatrixRMaj g, DMatrixRMaj rhs, int a, int b, double y, double volts) {
        if (a < 2) {
            return;
        }
        int row = a - 2;
        g.add(row, row, y);
        if (b >= 2) {
            g.add(row, b - 2, -y);
        } else if (b == 1) {
            rhs.add(row, 0, y * volts);
        }
    }
}
