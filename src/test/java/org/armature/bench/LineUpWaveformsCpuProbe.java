package org.armature.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;

/**
 * {@link LineUpWaveformsBench#toWaveforms} (a shared change to the overlaid turn-off waveforms of the
 * four templates, on one thread) timed by the measuring thread's CPU time as well as the wall clock:
 * on a machine shared with other builds the wall-clock percentiles include the time the thread waited
 * for a core, the CPU time is the work of one change. Not a JMH benchmark (JMH has no CPU-time mode);
 * the wall-clock figures of record stay the JMH ones.
 *
 * <p>Run: {@code mvn -B -o test-compile}, then {@code java -cp target/test-classes:target/classes:<test
 * classpath> org.armature.bench.LineUpWaveformsCpuProbe} (the test classpath from
 * {@code mvn -B -o dependency:build-classpath -Dmdep.outputFile=cp.txt -Dmdep.includeScope=test}).
 */
public final class LineUpWaveformsCpuProbe {

    private static final int WARM_UP = 600;
    private static final int SAMPLES = 1500;

    private LineUpWaveformsCpuProbe() {
    }

    /** Prints p50, p90, p99 and the largest of CPU ms and wall ms per change. */
    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        LineUpWaveformsBench b = new LineUpWaveformsBench();
        b.setUp();
        double[] cpu = new double[SAMPLES];
        double[] wall = new double[SAMPLES];
        try {
            for (int i = 0; i < WARM_UP + SAMPLES; i++) {
                long start = mx.getCurrentThreadCpuTime();
                long startWall = System.nanoTime();
                if (b.toWaveforms() == null) {
                    throw new IllegalStateException("no overlay");
                }
                long used = mx.getCurrentThreadCpuTime() - start;
                long usedWall = System.nanoTime() - startWall;
                if (i >= WARM_UP) {
                    cpu[i - WARM_UP] = used / 1e6;
                    wall[i - WARM_UP] = usedWall / 1e6;
                }
            }
        } finally {
            b.tearDown();
        }
        print("CPU ", cpu);
        print("wall", wall);
    }

    private static void print(String what, double[] ms) {
        Arrays.sort(ms);
        System.out.printf(Locale.ROOT, "toWaveforms %s p50 %6.2f  p90 %6.2f  p99 %6.2f  max %6.2f ms (%d changes)%n",
                what, ms[SAMPLES / 2], ms[SAMPLES * 9 / 10], ms[SAMPLES * 99 / 100], ms[SAMPLES - 1], SAMPLES);
    }
}
