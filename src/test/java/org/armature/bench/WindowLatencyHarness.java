package org.armature.bench;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.control.Slider;
import org.armature.model.HighSideDrive;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.ui.Analyses;
import org.armature.ui.ArmatureApp;
import org.armature.ui.DocumentStore;
import org.armature.ui.EditorViewModel;
import org.armature.ui.EngineReadouts;
import org.armature.ui.MainWindow;
import org.armature.ui.RecentFiles;

/**
 * Instrumented run of the real window (not a unit test; run it under a display, e.g. Xvfb):
 * for each template it moves the ambient slider and then the supply slider through 200 steps at
 * 60 steps per second, as a drag does, and times each input from the moment the slider's value
 * changes (the input event) to the end of the canvas repaint that shows readouts of that input or
 * a later one (coalesced inputs count until the newer readouts are painted), and to the
 * publication of the edges (turn-on and turn-off runs, on their own thread as in the application) of
 * that input or a later one. One untimed pass over every template comes first (JIT warm-up). Prints
 * the percentiles per template and slider.
 *
 * <p>Run: {@code mvn -B -DskipTests package test-compile}, then
 * {@code xvfb-run -a -s "-screen 0 1600x1000x24" java -cp target/armature.jar:target/test-classes
 * org.armature.bench.WindowLatencyHarness}.
 */
public final class WindowLatencyHarness {

    /** Slider steps per template and slider. */
    static final int STEPS = 200;
    /** Time between steps, ms: one per 60 Hz frame, the rate of a mouse drag. */
    static final long PACE_MILLIS = 16;

    private final Map<Long, Long> pending = new TreeMap<>();
    /** Inputs waiting for the edges (turn-on and turn-off runs) of their generation or a later one. */
    private final Map<Long, Long> pendingEdges = new TreeMap<>();
    private final List<Double> edgeMillis = Collections.synchronizedList(new ArrayList<>());
    private final List<Double> latenciesMillis = Collections.synchronizedList(new ArrayList<>());
    private final List<Double> handlingMillis = Collections.synchronizedList(new ArrayList<>());

    private WindowLatencyHarness() {
    }

    /** Starts the toolkit, runs the sweeps, prints the figures and exits. */
    public static void main(String[] args) throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        Platform.startup(started::countDown);
        started.await();
        new WindowLatencyHarness().run();
        Platform.exit();
        System.exit(0);
    }

    private void run() throws Exception {
        ExecutorService solver = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "armature-solver");
            t.setDaemon(true);
            return t;
        });
        // the edges as the application runs them: a low-priority thread of their own, its settle time
        ExecutorService edgeRunner = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "armature-edges");
            t.setDaemon(true);
            t.setPriority(Thread.MIN_PRIORITY);
            return t;
        });
        // no verdicts (they return at once, inline); the edges on their own thread as in the application
        Analyses edgesOnly = new Analyses(Analyses.NO_VERDICTS, Analyses.engineEdges(), Runnable::run, 0,
                edgeRunner, ArmatureApp.EDGE_SETTLE_MILLIS);
        EditorViewModel[] vm = new EditorViewModel[1];
        MainWindow[] w = new MainWindow[1];
        onFx(() -> {
            vm[0] = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, new EngineReadouts(), solver,
                    Platform::runLater, edgesOnly);
            vm[0].evaluationProperty().addListener((o, a, b) -> {
                if (b.edges().isPresent()) {
                    edgesPublished(b.generation());
                }
            });
            w[0] = new MainWindow(vm[0], new RecentFiles());
            javafx.stage.Stage s = new javafx.stage.Stage();
            s.setScene(w[0].scene(1560, 960));
            s.show();
            canvasHolder.canvas = w[0].canvas();
            w[0].canvas().setOnRepainted(this::painted);
        });
        Thread.sleep(1500);
        // one untimed pass over every template and slider first, so the JIT's warm-up is not charged
        // to the first template measured (the steady state of a session is what the figures describe)
        for (StageTemplate t : StageTemplate.values()) {
            onFx(() -> vm[0].newFromTemplate(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT));
            Thread.sleep(300);
            for (String id : List.of("ambient-slider", "supply-slider")) {
                Slider slider = (Slider) w[0].root().lookup("#" + id);
                sweep(vm[0], slider, slider.getValue(), id.startsWith("ambient") ? 40 : 6);
            }
        }
        System.out.println("template, slider, inputs, p50 ms, p90 ms, p99 ms, max ms (after an untimed warm-up pass)");
        for (StageTemplate t : StageTemplate.values()) {
            onFx(() -> {
                vm[0].newFromTemplate(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
                w[0].canvas().fit();
            });
            Thread.sleep(500);
            for (String id : List.of("ambient-slider", "supply-slider")) {
                Slider slider = (Slider) w[0].root().lookup("#" + id);
                double start = slider.getValue();
                double span = id.startsWith("ambient") ? 40 : 6;
                sweep(vm[0], slider, start, span);
                report(t.id(), id.replace("-slider", ""));
            }
        }
        solver.shutdownNow();
        solver.awaitTermination(1, TimeUnit.SECONDS);
    }

    private void sweep(EditorViewModel vm, Slider slider, double start, double span) throws Exception {
        latenciesMillis.clear();
        edgeMillis.clear();
        handlingMillis.clear();
        repaintMillis.clear();
        for (int i = 0; i < STEPS; i++) {
            double v = start + span * Math.sin(Math.PI * i / STEPS);
            Platform.runLater(() -> {
                long t0 = System.nanoTime();
                long before = vm.requestedGeneration();
                slider.setValue(v);
                handlingMillis.add((System.nanoTime() - t0) / 1e6);
                long gen = vm.requestedGeneration();
                if (gen != before) {
                    synchronized (pending) {
                        pending.put(gen, t0);
                        pendingEdges.put(gen, t0);
                    }
                }
            });
            Thread.sleep(PACE_MILLIS);
        }
        Thread.sleep(1000);
        synchronized (pending) {
            pending.clear();
            pendingEdges.clear();
        }
    }

    /** Edges of {@code generation} published: every input of that generation or before is followed. */
    private void edgesPublished(long generation) {
        long now = System.nanoTime();
        synchronized (pending) {
            var done = new ArrayList<Long>();
            for (Map.Entry<Long, Long> e : pendingEdges.entrySet()) {
                if (e.getKey() <= generation) {
                    edgeMillis.add((now - e.getValue()) / 1e6);
                    done.add(e.getKey());
                }
            }
            done.forEach(pendingEdges::remove);
        }
    }

    private SchematicCanvasHolder canvasHolder = new SchematicCanvasHolder();

    /** Where the harness reads the canvas's own repaint time. */
    private static final class SchematicCanvasHolder {
        org.armature.ui.SchematicCanvas canvas;
    }

    private final List<Double> repaintMillis = Collections.synchronizedList(new ArrayList<>());

    private void painted(long generation) {
        long now = System.nanoTime();
        repaintMillis.add(canvasHolder.canvas.lastRepaintNanos() / 1e6);
        synchronized (pending) {
            var done = new ArrayList<Long>();
            for (Map.Entry<Long, Long> e : pending.entrySet()) {
                if (e.getKey() <= generation) {
                    latenciesMillis.add((now - e.getValue()) / 1e6);
                    done.add(e.getKey());
                }
            }
            done.forEach(pending::remove);
        }
    }

    private void report(String template, String slider) {
        List<Double> l = new ArrayList<>(latenciesMillis);
        Collections.sort(l);
        if (l.isEmpty()) {
            System.out.println(template + ", " + slider + ", 0");
            return;
        }
        List<Double> h = new ArrayList<>(handlingMillis);
        Collections.sort(h);
        List<Double> r = new ArrayList<>(repaintMillis);
        Collections.sort(r);
        List<Double> e = new ArrayList<>(edgeMillis);
        Collections.sort(e);
        System.out.println(String.format(Locale.ROOT, "%s, %s, %d, %.2f, %.2f, %.2f, %.2f, (input handling on the FX"
                + " thread p50 %.2f ms, p99 %.2f ms; canvas repaint p50 %.2f ms, p99 %.2f ms; edges follow p50 %s ms,"
                + " p99 %s ms)", template, slider, l.size(),
                pct(l, 0.5), pct(l, 0.9), pct(l, 0.99), l.get(l.size() - 1), pct(h, 0.5), pct(h, 0.99),
                pct(r, 0.5), pct(r, 0.99), e.isEmpty() ? "-" : String.format(Locale.ROOT, "%.1f", pct(e, 0.5)),
                e.isEmpty() ? "-" : String.format(Locale.ROOT, "%.1f", pct(e, 0.99))));
    }

    private static double pct(List<Double> sorted, double p) {
        int i = (int) Math.ceil(p * sorted.size()) - 1;
        return sorted.get(Math.max(0, Math.min(sorted.size() - 1, i)));
    }

    private static void onFx(Runnable r) throws InterruptedException {
        CountDownLatch done = new CountDownLatch(1);
        Platform.runLater(() -> {
            try {
                r.run();
            } finally {
                done.countDown();
            }
        });
        done.await();
    }
}
