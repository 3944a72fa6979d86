package org.armature.bench;

import java.util.concurrent.TimeUnit;
import org.armature.model.Connectivity;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
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
import org.openjdk.jmh.annotations.Warmup;

/**
 * What finding a stage's roles and net names costs ({@link StageRecognition#of}), against finding
 * its nets alone as before the roles existed: the price of one recognition per stage version.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@State(Scope.Thread)
public class RolesBench {

    @Param({"LOW_SIDE_NPN", "HIGH_SIDE_PNP"})
    public StageTemplate template;

    private Stage stage;

    @Setup
    public void build() {
        stage = Templates.build(template);
    }

    @Benchmark
    public StageRecognition recognise() {
        // past the one-entry memo: the benchmark measures finding the roles, not a memo hit
        return StageRecognitionAccess.recognise(stage);
    }

    @Benchmark
    public Connectivity netsAlone() {
        return StageRecognitionAccess.drawn(stage);
    }
}
