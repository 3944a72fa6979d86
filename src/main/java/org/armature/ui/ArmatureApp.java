package org.armature.ui;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.geometry.Rectangle2D;
import javafx.stage.Screen;
import javafx.stage.Stage;
import org.armature.io.Autosave;
import org.armature.model.Templates;

/**
 * The desktop application: opens the editor window on the default example stage, with no file, or
 * on the stage file given as its one parameter (when it cannot be read, the default stage stays and
 * the status line says why).
 * Readouts are computed by the DC engine on one background thread and published on the FX thread;
 * the checks and edges run on a second, low-priority thread once edits settle. Unsaved work is
 * autosaved and offered for recovery at the next start ({@link AutosaveController}).
 */
public final class ArmatureApp extends Application {

    /** Quiet time after the last edit before the checks and edges run again, ms. */
    public static final long ANALYSIS_SETTLE_MILLIS = 350;
    /**
     * Quiet time before the turn-on and turn-off runs start, ms: short, so the edges follow a drag
     * (the two runs take a few milliseconds each on their own thread).
     */
    public static final long EDGE_SETTLE_MILLIS = 16;

    /** System property choosing the theme at start-up: {@code dark} or anything else for light. */
    public static final String THEME_PROPERTY = "armature.theme";
    /** System property that opens the edges drawer at start-up when {@code true}. */
    public static final String EDGES_PROPERTY = "armature.edges";

    private ExecutorService solver;
    private ExecutorService analyses;
    private ExecutorService edgeRunner;
    private Stage primary;
    private MainWindow window;
    private AutosaveController autosave;

    /** Starts the JavaFX application (the jar's launcher calls this by reflection). */
    public static void main(String[] args) {
        launch(ArmatureApp.class, args);
    }

    @Override
    public void start(Stage primary) {
        this.primary = primary;
        solver = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "armature-solver");
            t.setDaemon(true);
            return t;
        });
        analyses = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "armature-analyses");
            t.setDaemon(true);
            t.setPriority(Thread.MIN_PRIORITY);
            return t;
        });
        edgeRunner = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "armature-edges");
            t.setDaemon(true);
            t.setPriority(Thread.MIN_PRIORITY);
            return t;
        });
        Analyses slow = new Analyses(Analyses.engineVerdicts(), Analyses.engineEdges(), analyses,
                ANALYSIS_SETTLE_MILLIS, edgeRunner, EDGE_SETTLE_MILLIS);
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, new EngineReadouts(),
                solver, Platform::runLater, slow);
        MainWindow w = new MainWindow(vm, new RecentFiles());
        this.window = w;
        // the first window fits the screen (down to 1024×700), later ones restore their stored layout
        Rectangle2D screen = Screen.getPrimary().getVisualBounds();
        primary.setScene(w.scene(Math.min(1560, screen.getWidth()), Math.min(960, screen.getHeight())));
        w.guardClose(primary);
        Runnable title = () -> primary.setTitle("Armature — " + vm.fileName() + (vm.dirtyProperty().get() ? " ●" : ""));
        title.run();
        vm.fileProperty().addListener((o, a, b) -> title.run());
        vm.dirtyProperty().addListener((o, a, b) -> title.run());
        // start-up options for looking at the window (screenshots, demonstrations)
        if ("dark".equals(System.getProperty(THEME_PROPERTY))) {
            w.setDark(true);
        }
        restoreLayout(primary, w);
        if (Boolean.getBoolean(EDGES_PROPERTY)) {
            w.edgesDrawer().setExpanded(true);
        }
        // a stage file named on the command line (the launcher passes it through)
        List<String> raw = getParameters() == null ? List.of() : getParameters().getRaw();
        if (raw.size() == 1) {
            Path path = Path.of(raw.get(0));
            if (vm.open(path)) {
                w.rememberRecent(path);
            }
        }
        autosave = new AutosaveController(vm, Autosave.forUser());
        autosave.start(primary);
        primary.show();
        Platform.runLater(w.canvas()::fit);
        Platform.runLater(() -> autosave.offerRecovery(primary));
    }

    private static void restoreLayout(Stage stage, MainWindow w) {
        WindowLayout.load(RecentFiles.preferences()).ifPresent(l -> {
            Rectangle2D wanted = new Rectangle2D(l.xPixels(), l.yPixels(), l.widthPixels(), l.heightPixels());
            // a position on a screen that is no longer attached is dropped: the window is centred
            if (!Screen.getScreensForRectangle(wanted).isEmpty()) {
                stage.setX(l.xPixels());
                stage.setY(l.yPixels());
            }
            stage.setWidth(l.widthPixels());
            stage.setHeight(l.heightPixels());
            stage.setMaximized(l.maximised());
            w.edgesDrawer().setExpanded(l.edgesOpen());
        });
    }

    private void saveLayout() {
        if (primary == null || window == null) {
            return;
        }
        boolean max = primary.isMaximized();
        boolean edges = window.edgesDrawer().isExpanded();
        WindowLayout now = new WindowLayout(primary.getX(), primary.getY(), primary.getWidth(), primary.getHeight(),
                max, edges);
        // a maximised window keeps the normal bounds saved before, so un-maximising restores them
        WindowLayout layout = max ? WindowLayout.load(RecentFiles.preferences())
                .map(l -> new WindowLayout(l.xPixels(), l.yPixels(), l.widthPixels(), l.heightPixels(), true, edges))
                .orElse(now) : now;
        if (Double.isFinite(primary.getX()) && Double.isFinite(primary.getWidth())) {
            layout.clamped().save(RecentFiles.preferences());
        }
    }

    @Override
    public void stop() {
        saveLayout();
        if (autosave != null) {
            autosave.stop();
        }
        if (solver != null) {
            solver.shutdownNow();
        }
        if (edgeRunner != null) {
            edgeRunner.shutdownNow();
        }
        if (analyses != null) {
            analyses.shutdownNow();
        }
    }
}
