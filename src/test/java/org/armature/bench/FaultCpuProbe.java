package org.armature.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import java.util.Optional;
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

/**
 * {@link FaultBench}'s two paths timed by the measuring thread's CPU time instead of the wall clock
 * (on a machine shared with other builds the wall clock measures their load; see
 * {@link ReadoutCpuProbe}). Not a JMH benchmark.
 *
 * <p>Run: {@code mvn -B test-compile}, then {@code java -cp target/test-classes:target/classes:<deps>
 * org.armature.bench.FaultCpuProbe}.
 */
public final class FaultCpuProbe {

    private static final int WARM_UP = 15;
    private static final int SAMPLES = 10;

    private FaultCpuProbe() {
    }

    /** Prints the mean thread CPU ms of one dictionary and of one diagnosis update, per template. */
    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        for (StageTemplate t : StageTemplate.values()) {
            Stage s = Templates.build(t);
            FaultDictionary d = null;
            for (int i = 0; i < WARM_UP; i++) {
                d = FaultDictionary.build(s, Meter.DEFAULT);
            }
            long c0 = mx.getCurrentThreadCpuTime();
            for (int i = 0; i < SAMPLES; i++) {
                d = FaultDictionary.build(s, Meter.DEFAULT);
            }
            double dictionaryMs = (mx.getCurrentThreadCpuTime() - c0) / 1e6 / SAMPLES;
            List<Reading> readings = List.of(new Reading("switch", true, 11.9));
            for (int i = 0; i < 200; i++) {
                Diagnosis.rank(d, Spread.DEFAULT, Priors.DEFAULT, Optional.of(Symptom.NO_OPERATE), readings);
            }
            c0 = mx.getCurrentThreadCpuTime();
            for (int i = 0; i < 200; i++) {
                Diagnosis.rank(d, Spread.DEFAULT, Priors.DEFAULT, Optional.of(Symptom.NO_OPERATE), readings);
            }
            double rankMs = (mx.getCurrentThreadCpuTime() - c0) / 1e6 / 200;
            System.out.printf("%-20s %d faults, dictionary %.1f ms CPU, diagnosis update %.3f ms CPU%n", t,
                    d.entries().size() - 1, dictionaryMs, rankMs);
        }
    }
}
