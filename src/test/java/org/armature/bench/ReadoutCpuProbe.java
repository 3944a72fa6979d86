package org.armature.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;

/**
 * The two paths of {@link ReadoutLatencyBench} timed by the CPU time of the measuring thread
 * instead of the wall clock: on a machine shared with other builds the wall-clock percentiles
 * measure the other builds' load (a preempted thread's wait counts), the thread's CPU time measures
 * the work of one edit. Not a JMH benchmark (JMH has no CPU-time mode); the wall-clock figures stay
 * the JMH ones.
 *
 * <p>Run: {@code mvn -B test-compile}, then {@code java -cp target/test-classes:target/classes:<deps>
 * org.armature.bench.ReadoutCpuProbe} (or through {@code exec:exec} with this class as main).
 */
public final class ReadoutCpuProbe {

    private static final int WARM_UP = 1500;
    private static final int SAMPLES = 3000;

    private ReadoutCpuProbe() {
    }

    /** Prints p50, p90, p99 of thread CPU ms per edit, per template and path. */
    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        for (String t : new String[] {"LOW_SIDE_NPN", "LOW_SIDE_NMOS", "DARLINGTON_CHANNEL", "HIGH_SIDE_PNP"}) {
            ReadoutLatencyBench b = new ReadoutLatencyBench();
            b.template = t;
            b.setUp();
            for (int path = 0; path < 2; path++) {
                double[] ms = new double[SAMPLES];
                for (int i = 0; i < WARM_UP + SAMPLES; i++) {
                    long start = mx.getCurrentThreadCpuTime();
                    Object sink = path == 0 ? b.editSolveBuildRender() : b.editEvaluateRender();
                    long used = mx.getCurrentThreadCpuTime() - start;
                    if (sink == null) {
                        throw new IllegalStateException("no layout");
                    }
                    if (i >= WARM_UP) {
                        ms[i - WARM_UP] = used / 1e6;
                    }
                }
                Arrays.sort(ms);
                System.out.printf(Locale.ROOT, "%-20s %-22s p50 %6.2f  p90 %6.2f  p99 %6.2f ms CPU%n", t,
                        path == 0 ? "editSolveBuildRender" : "editEvaluateRender", ms[SAMPLES / 2],
                        ms[SAMPLES * 9 / 10], ms[SAMPLES * 99 / 100]);
            }
        }
    }
}
