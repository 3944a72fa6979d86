package org.armature.bench;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.armature.analysis.faults.FaultDictionary;
import org.armature.analysis.faults.Meter;
import org.armature.analysis.faults.Probe;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.render.ExportTheme;
import org.armature.render.PngExport;
import org.armature.render.SvgExport;
import org.armature.render.report.DesignReport;
import org.armature.render.report.StageSnapshot;
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
 * The exports of a template, each from the stage (evaluation included, as the command line and the
 * window do it): SVG of the sheet and PNG at 2× (target ≤ 300 ms each after warm-up), and the PDF
 * report with its checks, sizing and both transient runs (target ≤ 2 s), without and with a fault
 * hunt in the document (the hunt's ranking is computed at report time).
 *
 * <p>Run: {@code mvn -B -o test-compile exec:exec -Dbench="ExportBench -f 1 -wi 2 -w 2s -i 3 -r 2s"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Threads(1)
@Fork(1)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
public class ExportBench {

    /** Every template: the targets hold for any of them. */
    @Param({"LOW_SIDE_NPN", "LOW_SIDE_NMOS", "DARLINGTON_CHANNEL", "HIGH_SIDE_PNP"})
    public String template;

    private Stage stage;
    private StageDocument hunted;
    private final LocalDate day = LocalDate.of(2026, 12, 5);

    /** Builds the stage and its document with a fault hunt once. */
    @Setup
    public void setUp() {
        stage = Templates.build(StageTemplate.valueOf(template));
        hunted = huntedDocument(stage);
    }

    /**
     * A document of one stage holding a fault hunt on it: the symptom "no-operate" and two readings
     * with the pin high, taken from the dictionary's entry for the stage's first single fault (the
     * relay's, by {@code FaultCatalog}'s order), at the first probe point and across the coil.
     */
    public static StageDocument huntedDocument(Stage stage) {
        FaultDictionary d = FaultDictionary.build(stage, Meter.DEFAULT);
        FaultDictionary.Entry e = d.entries().get(1);
        String first = d.probes().get(0).name();
        List<FaultHunt.HuntReading> readings = new ArrayList<>();
        readings.add(new FaultHunt.HuntReading(first, true, e.high().volts()[0]));
        int coil = d.probeIndex(Probe.COIL);
        if (coil > 0) {
            readings.add(new FaultHunt.HuntReading(Probe.COIL, true, e.high().volts()[coil]));
        }
        FaultHunt hunt = FaultHunt.start(0).withSymptom(Optional.of("no-operate")).withReadings(readings);
        return StageDocument.of(stage).withFaultHunt(Optional.of(hunt));
    }

    /** Evaluate (one DC solve) and write the SVG of the sheet. */
    @Benchmark
    public String svg() {
        StageSnapshot s = StageSnapshot.evaluate("Bench", stage, true, StageSnapshot.Depth.DRAWING, day);
        return SvgExport.toSvg(s.sheet(ExportTheme.LIGHT.palette()));
    }

    /** Evaluate and encode the PNG at 2×. */
    @Benchmark
    public byte[] png2x() {
        StageSnapshot s = StageSnapshot.evaluate("Bench", stage, true, StageSnapshot.Depth.DRAWING, day);
        return PngExport.png(s.sheet(ExportTheme.LIGHT.palette()), 2, false);
    }

    /** Evaluate in full (both pin states, checks, sizing, turn-on and turn-off runs) and write the PDF. */
    @Benchmark
    public byte[] report() {
        StageSnapshot s = StageSnapshot.evaluate("Bench", stage, true, StageSnapshot.Depth.REPORT, day);
        return DesignReport.pdf(s);
    }

    /**
     * The report of a document holding a fault hunt on the stage: as {@link #report()}, plus the
     * hunt ranked at report time (the fault dictionary of every single fault in both pin states with
     * the hunt's meter, the ranking and the next measurement) and its section.
     */
    @Benchmark
    public byte[] reportWithHunt() {
        StageSnapshot s = StageSnapshot.evaluate("Bench", hunted.first(), true, StageSnapshot.Depth.REPORT, day);
        return DesignReport.pdf(s, hunted);
    }
}
