package org.armature.bench;

import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.netlist.FlattenOptions;
import org.armature.netlist.NetlistBuilder;
import org.armature.solver.DcAnalysis;
import org.armature.solver.DcOptions;
import org.armature.solver.DcSweep;
import org.armature.solver.DenseLu;
import org.armature.solver.EjmlLu;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SweepSpec;
import org.armature.solver.SweepVariable;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * DC engine figures, per template: the operating point from a cold start (0 V with the junction
 * preset, netlist already compiled, relay loop included), the warm re-solve after a value change
 * (the live-editing case: the engine alternates between two stages that differ by 1 % in one
 * resistor, so every call re-flattens that part and starts from the last solution), a first solve
 * on a fresh engine (flatten and topology check included), a 10,000-point supply sweep, and one
 * dense LU factor + solve of the same size, so that solve ÷ (iterations × LU) can be reported. The
 * Newton iterations of each case are printed at set-up. Run with {@code -prof gc} for the
 * allocation per solve.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class DcBench {

    /** One template stage and engines with each linear solver. */
    @State(Scope.Thread)
    public static class TemplateState {
        @Param({"low-side-npn", "low-side-nmos", "darlington-channel", "high-side-pnp"})
        public String template;

        Stage stage;
        Stage edited;
        boolean flip;
        DcAnalysis dense;
        DcAnalysis warm;
        DcAnalysis ejml;
        double[] matrix;
        double[] work;
        double[] rhs;
        double[] b;
        DenseLu lu;
        EjmlLu ejmlLu;

        @Setup(Level.Trial)
        public void setUp() {
            StageTemplate t = StageTemplate.byId(template).orElseThrow();
            stage = Templates.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
            Part res = stage.parts().stream().filter(p -> p.kind() == PartKind.RESISTOR).findFirst().orElseThrow();
            edited = stage.withPart(res.with("resistanceOhms", res.value("resistanceOhms") * 1.01));
            DcOptions cold = DcOptions.DEFAULT.withWarmStart(false);
            dense = new DcAnalysis(cold);
            warm = new DcAnalysis();
            ejml = new DcAnalysis(cold.withLinearSolver(DcOptions.LinearSolverKind.EJML));
            OperatingPoint op = dense.solve(stage);
            warm.solve(stage);
            OperatingPoint w = warm.solve(edited);
            int n = NetlistBuilder.flatten(stage, FlattenOptions.of(true, 25)).unknownCount();
            // diagonally dominant random matrix of the template's size, as an MNA matrix of that size
            Random r = new Random(42);
            matrix = new double[n * n];
            for (int i = 0; i < n; i++) {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    if (i != j && r.nextDouble() < 0.3) {
                        matrix[i * n + j] = -r.nextDouble();
                        sum += Math.abs(matrix[i * n + j]);
                    }
                }
                matrix[i * n + i] = sum + 1;
            }
            work = new double[n * n];
            rhs = new double[n];
            b = new double[n];
            for (int i = 0; i < n; i++) {
                rhs[i] = r.nextDouble();
            }
            lu = new DenseLu(n);
            ejmlLu = new EjmlLu(n);
            System.err.println("# " + template + ": " + n + " unknowns, " + op.iterations()
                    + " Newton iterations per cold operating point, " + w.iterations()
                    + " per warm re-solve after a value change");
        }
    }

    /** Operating point from a cold start (compiled netlist, 0 V), own LU. */
    @Benchmark
    public OperatingPoint operatingPointCold(TemplateState s) {
        return s.dense.solve(s.stage);
    }

    /** Warm re-solve after a value change (the live-editing case), own LU. */
    @Benchmark
    public OperatingPoint operatingPointWarm(TemplateState s) {
        s.flip = !s.flip;
        return s.warm.solve(s.flip ? s.edited : s.stage);
    }

    /** First solve on a fresh engine: flatten, topology check, cold start. */
    @Benchmark
    public OperatingPoint operatingPointFresh(TemplateState s) {
        return new DcAnalysis().solve(s.stage);
    }

    /** Operating point from a cold start, EJML LU. */
    @Benchmark
    public OperatingPoint operatingPointColdEjml(TemplateState s) {
        return s.ejml.solve(s.stage);
    }

    /** One factor and solve, own LU. */
    @Benchmark
    public double[] denseLuSolve(TemplateState s) {
        System.arraycopy(s.matrix, 0, s.work, 0, s.work.length);
        System.arraycopy(s.rhs, 0, s.b, 0, s.b.length);
        s.lu.factor(s.work);
        s.lu.solve(s.b);
        return s.b;
    }

    /** One factor and solve, EJML LU. */
    @Benchmark
    public double[] ejmlLuSolve(TemplateState s) {
        System.arraycopy(s.matrix, 0, s.work, 0, s.work.length);
        System.arraycopy(s.rhs, 0, s.b, 0, s.b.length);
        s.ejmlLu.factor(s.work);
        s.ejmlLu.solve(s.b);
        return s.b;
    }

    /** The low-side NPN stage and its sweep spec. */
    @State(Scope.Thread)
    public static class SweepState {
        Stage stage;
        DcAnalysis dc;
        SweepSpec spec;

        @Setup(Level.Trial)
        public void setUp() {
            stage = Templates.defaultStage();
            dc = new DcAnalysis();
            spec = SweepSpec.linear(SweepVariable.supplyVolts("V1"), 0, 15, 10_000);
        }
    }

    /** A 10,000-point supply sweep of the low-side NPN stage, each point started from the previous one. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public DcSweep sweep10k(SweepState s) {
        return s.dc.sweep(s.stage, s.spec);
    }
}
