package org.armature.bench;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.armature.analysis.faults.Diagnosis;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.Priors;
import org.armature.analysis.faults.Reading;
import org.armature.analysis.faults.Spread;
import org.armature.analysis.faults.Symptom;
import org.armature.model.Stage;
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
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The fault hunt on one thread. {@code dictionary}: every single fault of a template × both pin
 * states × every probe with the meter loading it (target ≤ 100 ms). {@code diagnosisUpdate}: one
 * ranking with the next measurement after a new reading, on a built dictionary (target ≤ 20 ms).
 *
 * <p>Run: {@code mvn -B -o test-compile exec:exec -Dbench="FaultBench -f 1 -wi 1 -w 1s -i 3 -r 1s"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(1)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
public class FaultBench {

    /** Every template, since the targets hold for any of them. */
    @Param({"LOW_SIDE_NPN", "LOW_SIDE_NMOS", "DARLINGTON_CHANNEL", "HIGH_SIDE_PNP"})
    public String template;

    private Stage stage;
    private FaultDictionary dictionary;
    private List<Reading> readings;

    /** Builds the stage, its dictionary and two readings once. */
    @Setup
    public void setUp() {
        stage = Templates.build(StageTemplate.valueOf(template));
        dictionary = FaultDictionary.build(stage, Meter.DEFAULT);
        readings = List.of(new Reading("switch", true, 11.9), new Reading(dictionary.probes().get(0).name(), true, 1.0));
    }

    /** The whole dictionary of the template. */
    @Benchmark
    public FaultDictionary dictionary() {
        return FaultDictionary.build(stage, Meter.DEFAULT);
    }

    /** One diagnosis update: the ranking and the next measurement with two readings and a symptom. */
    @Benchmark
    public Diagnosis.Result diagnosisUpdate() {
        return Diagnosis.rank(dictionary, Spread.DEFAULT, Priors.DEFAULT, Optional.of(Symptom.NO_OPERATE), readings);
    }
}
