package org.armature.bench;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.armature.io.StageJson;
import org.armature.model.Connectivity;
import org.armature.model.Finding;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.armature.model.Validator;
import org.armature.model.Wire;
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
 * Validation and reading of large documents (issue 15: 20,000 wires took 3.6 s to validate; the
 * nets were found wire by point). The default stage plus {@code wires} extra segments in one long
 * row and one long column. Target: linear growth, 20,000 wires validated in well under 0.1 s.
 *
 * <p>Run: {@code mvn -B -o test-compile exec:exec -Dbench="ValidationBench -f 1 -wi 2 -w 1s -i 3 -r 1s"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(1)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
public class ValidationBench {

    /** Extra wire segments. */
    @Param({"2000", "20000"})
    public int wires;

    private Stage stage;
    private byte[] file;

    /** Builds the stage and its file once. */
    @Setup
    public void setUp() {
        Stage s = Templates.defaultStage();
        List<Wire> w = new ArrayList<>(s.wires());
        for (int i = 0; i < wires / 2; i++) {
            w.add(Wire.of(100 + i, 50, 101 + i, 50));
            w.add(Wire.of(90, 60 + i, 90, 61 + i));
        }
        stage = s.withWires(w);
        file = StageJson.write(StageDocument.of(stage)).getBytes(StandardCharsets.UTF_8);
    }

    /** The nets of the stage. */
    @Benchmark
    public Connectivity connectivity() {
        return Connectivity.of(stage);
    }

    /** Every finding of the validator (nets included). */
    @Benchmark
    public List<Finding> validate() {
        return Validator.validate(stage);
    }

    /** Reading the file: UTF-8 check, JSON, mapping. */
    @Benchmark
    public StageDocument read() {
        return StageJson.parse(file);
    }
}
