package org.armature.bench;

import java.util.concurrent.TimeUnit;
import org.armature.analysis.CheckOptions;
import org.armature.analysis.CheckReport;
import org.armature.analysis.Corners;
import org.armature.analysis.CornerPlan;
import org.armature.analysis.StageChecks;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.solver.DcAnalysis;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The checks of a template on one thread: the full corner set (every corner solved pin high and pin
 * low) plus 1,000 Monte Carlo samples, with the turn-off judged by the closed forms (the transient
 * run is timed separately by the transient engine's own benchmarks). Target: ≤ 200 ms.
 *
 * <p>Run: {@code mvn -B -o test-compile exec:exec -Dbench="ChecksBench.cornersAndMonteCarlo -f 1 -wi 2 -i 3"}
 * (the pom passes {@code -Dbench} to the JMH main class).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(1)
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 3, time = 5)
public class ChecksBench {

    /** The template checked: every template, since the target holds for any of them. */
    @Param({"LOW_SIDE_NPN", "LOW_SIDE_NMOS", "DARLINGTON_CHANNEL", "HIGH_SIDE_PNP"})
    public String template;

    private Stage stage;
    private DcAnalysis dc;
    private CheckOptions withMonteCarlo;

    /** Builds the stage and options once. */
    @Setup
    public void setUp() {
        stage = Templates.build(StageTemplate.valueOf(template));
        dc = new DcAnalysis();
        withMonteCarlo = CheckOptions.DEFAULT.withTransient(false).withMonteCarlo(1000, 1);
    }

    /** Full corner set plus 1,000 Monte Carlo samples. */
    @Benchmark
    public CheckReport cornersAndMonteCarlo() {
        return StageChecks.run(stage, withMonteCarlo, dc);
    }

    /** The corner enumeration alone (what-if stages, no solving). */
    @Benchmark
    public CornerPlan enumerateOnly() {
        return Corners.enumerate(stage);
    }
}
