package org.armature.bench;

import java.util.concurrent.TimeUnit;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.solver.timedomain.BenchProblems;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientOptions;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Speed of the transient engine: a 20 ms turn-off window of each template with a diode (target:
 * median ≤ 5 ms; the template relays have a moving armature, 1.2 H / 2.4 H), a 20 ms turn-on of the
 * default stage (armature pull-in with its located events), the unsuppressed low-side NPN (ringing into breakdown; target ≤ 20 ms), and the
 * linear ringing-coil problem by our engine and by Hipparchus' Dormand–Prince 853 at the same
 * accuracy (goal: ours ÷ theirs ≤ 2). The accuracy of both against a tight reference is printed at
 * setup. Forks, warm-up and measurement are set here because the pom passes one argument to JMH.
 */
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@State(Scope.Benchmark)
public class TransientBench {

    /**
     * Relative tolerance of our run on the linear problem: end-point error 0.7 mA over 30 ring periods
     * (measured against Dormand–Prince at 1e-13, printed at setup).
     */
    static final double OUR_TOLERANCE = 1e-5;
    /** Dormand–Prince tolerance with an end-point error no larger than ours (0.3 mA, measured alike). */
    static final double THEIR_TOLERANCE = 1e-3;

    /** The template of the diode benchmark. */
    @State(Scope.Benchmark)
    public static class Template {
        @Param({"LOW_SIDE_NPN", "LOW_SIDE_NMOS", "DARLINGTON_CHANNEL", "HIGH_SIDE_PNP"})
        public String template;

        Stage withDiode;

        @Setup(Level.Trial)
        public void setUp() {
            withDiode = Templates.build(StageTemplate.valueOf(template), Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        }
    }

    private Stage unsuppressed;
    private Stage defaultStage;

    @Setup(Level.Trial)
    public void setUp() {
        unsuppressed = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.NONE, HighSideDrive.LEVEL_SHIFT);
        defaultStage = Templates.defaultStage();
        double ref = BenchProblems.referenceRing();
        double ours = BenchProblems.oursRing(OUR_TOLERANCE);
        double theirs = BenchProblems.hipparchusRing(THEIR_TOLERANCE);
        System.err.printf("linear ring: reference %.9e A, ours (tol %.0e) error %.3e A, Dormand-Prince (tol %.0e)"
                + " error %.3e A%n", ref, OUR_TOLERANCE, Math.abs(ours - ref), THEIR_TOLERANCE, Math.abs(theirs - ref));
    }

    /** 20 ms turn-off window of the template with its diode. */
    @Benchmark
    public Object turnOffWithDiode(Template t) {
        return TransientAnalysis.run(t.withDiode, TransientOptions.turnOff());
    }

    /** 20 ms turn-off window of the unsuppressed low-side NPN. */
    @Benchmark
    public Object turnOffUnsuppressed() {
        return TransientAnalysis.run(unsuppressed, TransientOptions.turnOff());
    }

    /** 20 ms turn-on window of the default stage: the armature picks up, flies and closes. */
    @Benchmark
    public Object turnOnArmature() {
        return TransientAnalysis.run(defaultStage, TransientOptions.turnOn());
    }

    /** The linear ringing coil by our engine. */
    @Benchmark
    public double linearRingOurs() {
        return BenchProblems.oursRing(OUR_TOLERANCE);
    }

    /** The linear ringing coil by Hipparchus' Dormand–Prince 853. */
    @Benchmark
    public double linearRingHipparchus() {
        return BenchProblems.hipparchusRing(THEIR_TOLERANCE);
    }
}
