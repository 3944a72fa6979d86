package org.armature.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.Locale;
import java.util.function.Supplier;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.render.ExportTheme;
import org.armature.render.PngExport;
import org.armature.render.SvgExport;
import org.armature.render.report.DesignReport;
import org.armature.render.report.StageSnapshot;

/**
 * A recorded harness beside {@link ExportBench} for a shared machine: the same three exports per
 * template, after warm-up, reporting the median wall time and the median CPU time of the thread
 * per export. On a machine whose load average is many times its core count the wall time mostly
 * measures waiting for a core; the thread's CPU time is what the export costs.
 *
 * <p>Run: {@code mvn -B -o test-compile}, then
 * {@code java -cp target/test-classes:target/classes:<runtime classpath> org.armature.bench.ExportCpuHarness}.
 */
public final class ExportCpuHarness {

    private static final int WARM_UP = 15;
    private static final int RUNS = 21;

    private ExportCpuHarness() {
    }

    /**
     * Prints one line per template and export. With the argument {@code reports}, only the report
     * without and with a fault hunt in the document ({@link ExportBench#huntedDocument}).
     */
    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        LocalDate day = LocalDate.of(2026, 12, 5);
        boolean reportsOnly = Arrays.asList(args).contains("reports");
        for (StageTemplate t : StageTemplate.values()) {
            Stage stage = Templates.build(t);
            if (!reportsOnly) {
                measure(mx, t + " svg", () -> SvgExport.toSvg(StageSnapshot.evaluate("Bench", stage, true,
                        StageSnapshot.Depth.DRAWING, day).sheet(ExportTheme.LIGHT.palette())));
                measure(mx, t + " png 2x", () -> PngExport.png(StageSnapshot.evaluate("Bench", stage, true,
                        StageSnapshot.Depth.DRAWING, day).sheet(ExportTheme.LIGHT.palette()), 2, false));
            }
            measure(mx, t + " report", () -> DesignReport.pdf(StageSnapshot.evaluate("Bench", stage, true,
                    StageSnapshot.Depth.REPORT, day)));
            StageDocument hunted = ExportBench.huntedDocument(stage);
            measure(mx, t + " report+hunt", () -> DesignReport.pdf(StageSnapshot.evaluate("Bench", hunted.first(),
                    true, StageSnapshot.Depth.REPORT, day), hunted));
        }
    }

    private static void measure(ThreadMXBean mx, String name, Supplier<Object> op) {
        for (int i = 0; i < WARM_UP; i++) {
            op.get();
        }
        double[] wall = new double[RUNS];
        double[] cpu = new double[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long c0 = mx.getCurrentThreadCpuTime();
            long w0 = System.nanoTime();
            op.get();
            wall[i] = (System.nanoTime() - w0) / 1e6;
            cpu[i] = (mx.getCurrentThreadCpuTime() - c0) / 1e6;
        }
        Arrays.sort(wall);
        Arrays.sort(cpu);
        System.out.printf(Locale.ROOT, "%-28s wall median %7.1f ms   thread CPU median %7.1f ms%n", name,
                wall[RUNS / 2], cpu[RUNS / 2]);
    }
}
