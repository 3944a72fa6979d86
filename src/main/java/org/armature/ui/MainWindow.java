package org.armature.ui;

import java.io.File;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import javafx.application.Platform;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.scene.Scene;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.Slider;
import javafx.scene.control.TitledPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import javafx.stage.WindowEvent;
import org.armature.io.StageFiles;
import org.armature.model.HighSideDrive;
import org.armature.model.ParamKeys;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.render.Notation;
import org.armature.render.Palette;
import org.kordamp.ikonli.javafx.FontIcon;

/**
 * The editor window: menu bar and tool bar on top, the part palette on the left, the drawing in the
 * centre, the part sheet above the verdicts on the right, the status bar below. Built around one
 * {@link EditorViewModel}; everything here only binds and forwards.
 */
public final class MainWindow {

    /** Style sheet of the light theme (default; it prints). */
    public static final String LIGHT_CSS = "/org/armature/assets/css/light.css";
    /** The rules both themes share (their colours come from the theme sheet). */
    public static final String BASE_CSS = "/org/armature/assets/css/base.css";
    /** Style sheet of the dark theme. */
    public static final String DARK_CSS = "/org/armature/assets/css/dark.css";

    private final EditorViewModel vm;
    private final BorderPane root = new BorderPane();
    private final SchematicCanvas canvas;
    private final PartSheet sheet;
    private final VerdictsPane verdicts;
    private final PartPalette palette;
    private final EdgesPane edges;
    private final TitledPane edgesDrawer;
    private final StageTabs stageTabs;
    private final MenuBar menuBar = new MenuBar();
    private HBox toolBar;
    private final RecentFiles recent;
    private final Menu recentMenu = new Menu("Recent");
    private Scene scene;
    private boolean syncingAmbient;
    private boolean syncingSupply;
    private BooleanSupplier discardQuestion = this::askDiscard;

    /** Narrowest a tool bar slider gets, pixels: still about 3 px per volt of the supply range. */
    public static final double SLIDER_MIN_WIDTH = 90;
    /** Width of a tool bar slider when there is room, pixels. */
    public static final double SLIDER_PREF_WIDTH = 150;
    /** Share of the centre's height the open edges drawer takes, between its limits below. */
    public static final double DRAWER_SHARE = 0.36;
    /** Smallest height of the open edges drawer, pixels: four strips of about 30 px and the time axis. */
    public static final double DRAWER_MIN_HEIGHT = 170;
    /** Largest height of the open edges drawer, pixels. */
    public static final double DRAWER_MAX_HEIGHT = 300;

    /** Range of the supply slider, V: a 3.3 V rail up to a 36 V one (the stages this tool is for). */
    public static final double SUPPLY_MIN_VOLTS = 3;
    /** Range of the supply slider, V. */
    public static final double SUPPLY_MAX_VOLTS = 36;

    /** Builds the window's content around a view model. */
    public MainWindow(EditorViewModel vm, RecentFiles recent) {
        this.vm = vm;
        this.recent = recent;
        this.canvas = new SchematicCanvas(vm);
        this.sheet = new PartSheet(vm);
        this.verdicts = new VerdictsPane(vm);
        this.edges = new EdgesPane(vm);
        this.edgesDrawer = new TitledPane("Edges: turn-on and turn-off", edges);
        root.getStyleClass().add("armature-root");
        this.stageTabs = new StageTabs(vm);
        toolBar = toolBar();
        VBox top = new VBox(buildMenus(), toolBar);
        root.setTop(top);
        palette = new PartPalette(vm, Palette.LIGHT);
        palette.setPrefWidth(64);
        palette.setOnDrop(this::dropOnCanvas);
        canvas.addEventHandler(javafx.scene.input.MouseEvent.MOUSE_CLICKED, e -> {
            if (e.getButton() == javafx.scene.input.MouseButton.PRIMARY && e.getClickCount() == 2) {
                nameTestPointAt(canvas.gridX(e.getX()), canvas.gridY(e.getY()));
            }
        });
        root.setLeft(palette);
        root.setCenter(centre());
        root.setRight(rightSide());
        root.setBottom(statusBar());
    }

    /**
     * The drawing with the edges drawer under it: the drawer shares the centre column only, so the
     * part sheet and the verdicts keep the full height beside it; open, it takes
     * {@link #DRAWER_SHARE} of the column within its limits.
     */
    private Region centre() {
        edgesDrawer.setId("edges-drawer");
        edgesDrawer.setExpanded(false);
        BorderPane centre = new BorderPane(canvas);
        centre.setTop(stageTabs);
        centre.setBottom(edgesDrawer);
        centre.setMinSize(0, 0);
        canvas.setMinSize(0, 0);
        centre.heightProperty().addListener((o, a, b) -> edges.setPrefHeight(
                Math.max(DRAWER_MIN_HEIGHT, Math.min(DRAWER_MAX_HEIGHT, DRAWER_SHARE * b.doubleValue()))));
        edges.setPrefHeight(DRAWER_MIN_HEIGHT);
        return centre;
    }

    /**
     * A double click on a pin names the net there as a test point: the question shows the present
     * name (empty for none); a new name adds or renames it, an empty one removes it. Undoable.
     */
    private void nameTestPointAt(double gridX, double gridY) {
        var hit = org.armature.render.HitTester.at(vm.stage(), gridX, gridY,
                SchematicCanvas.HIT_PIXELS / canvas.scale());
        if (hit instanceof org.armature.render.HitTester.PinHit pin) {
            String ref = pin.pin().ref();
            String name = pin.pin().pin();
            String now = vm.stage().testPoints().stream().filter(t -> t.ref().equals(ref) && t.pin().equals(name))
                    .map(org.armature.model.TestPoint::net).findFirst().orElse("");
            testPointQuestion.apply(ref + " pin " + name, now).ifPresent(net -> vm.nameTestPoint(ref, name, net));
        }
    }

    private java.util.function.BiFunction<String, String, Optional<String>> testPointQuestion = this::askTestPoint;

    private Optional<String> askTestPoint(String where, String now) {
        javafx.scene.control.TextInputDialog d = new javafx.scene.control.TextInputDialog(now);
        d.setTitle("Test point");
        d.setHeaderText(null);
        d.setContentText("Name of the net at " + where + " (empty removes it):");
        if (window() != null) {
            d.initOwner(window());
        }
        return d.showAndWait();
    }

    /**
     * Replaces the question a double click on a pin asks (tests answer without a dialog): it gets
     * the pin ("Q1 pin b") and the present name, and returns the new name, or empty to cancel.
     */
    public void setTestPointQuestion(java.util.function.BiFunction<String, String, Optional<String>> question) {
        this.testPointQuestion = java.util.Objects.requireNonNull(question, "question");
    }

    /** Places a kind dragged from the palette where it was dropped, when that is on the drawing. */
    private void dropOnCanvas(org.armature.model.PartKind kind, javafx.geometry.Point2D scenePoint) {
        javafx.geometry.Point2D local = canvas.sceneToLocal(scenePoint);
        if (local != null && canvas.getLayoutBounds().contains(local)) {
            vm.place(kind, org.armature.render.Snap.toGrid(canvas.gridX(local.getX()), canvas.gridY(local.getY())));
            canvas.requestFocus();
        }
    }

    /** The tabs of the document's stages. */
    public StageTabs stageTabs() {
        return stageTabs;
    }

    /** The verdicts panel. */
    public VerdictsPane verdicts() {
        return verdicts;
    }

    /** The edges drawer's content. */
    public EdgesPane edges() {
        return edges;
    }

    /** The edges drawer (collapsible). */
    public TitledPane edgesDrawer() {
        return edgesDrawer;
    }

    /** A scene of the window with the light theme. */
    public Scene scene(double width, double height) {
        scene = new Scene(root, width, height);
        scene.getStylesheets().addAll(css(BASE_CSS), css(LIGHT_CSS));
        return scene;
    }

    /** The root node. */
    public BorderPane root() {
        return root;
    }

    /** The drawing. */
    public SchematicCanvas canvas() {
        return canvas;
    }

    /** The part sheet. */
    public PartSheet sheet() {
        return sheet;
    }

    /** The menu bar. */
    public MenuBar menuBar() {
        return menuBar;
    }

    /** Switches theme: style sheet and drawing palette. */
    public void setDark(boolean dark) {
        if (scene != null) {
            scene.getStylesheets().setAll(css(BASE_CSS), css(dark ? DARK_CSS : LIGHT_CSS));
        }
        canvas.setPalette(dark ? Palette.DARK : Palette.LIGHT);
        edges.setPalette(dark ? Palette.DARK : Palette.LIGHT);
        palette.setColours(dark ? Palette.DARK : Palette.LIGHT);
    }

    private static String css(String resource) {
        var url = MainWindow.class.getResource(resource);
        if (url == null) {
            throw new IllegalStateException("missing style sheet " + resource);
        }
        return url.toExternalForm();
    }

    // ------------------------------------------------------------------ menus

    private MenuBar buildMenus() {
        Menu file = new Menu("File");
        Menu fromTemplate = new Menu("New from template");
        for (StageTemplate t : StageTemplate.values()) {
            Menu m = new Menu(t.title());
            for (Suppressor s : Suppressor.values()) {
                MenuItem it = new MenuItem(suppressorTitle(s));
                it.setId("new-" + t.id() + "-" + s.id());
                it.setOnAction(e -> confirmDiscard(() -> vm.newFromTemplate(t, s, HighSideDrive.LEVEL_SHIFT)));
                m.getItems().add(it);
            }
            if (t == StageTemplate.HIGH_SIDE_PNP) {
                MenuItem direct = new MenuItem("Direct drive from the pin (does not turn off)");
                direct.setId("new-" + t.id() + "-direct");
                direct.setOnAction(e -> confirmDiscard(() -> vm.newFromTemplate(t, Suppressor.DIODE, HighSideDrive.DIRECT)));
                m.getItems().addAll(new SeparatorMenuItem(), direct);
            }
            fromTemplate.getItems().add(m);
        }
        MenuItem open = item("Open…", "Shortcut+O", e -> chooseOpen());
        MenuItem save = item("Save", "Shortcut+S", e -> save());
        MenuItem saveAs = item("Save As…", "Shortcut+Shift+S", e -> chooseSaveAs());
        refreshRecent();
        MenuItem svg = item("Export…", "Shortcut+Shift+E", e -> export());
        MenuItem png = item("Copy Drawing as Image", null, e -> vm.say(ImageExport.copyToClipboard(
                vm.document().title(), vm.stage())));
        MenuItem quit = item("Quit", "Shortcut+Q", e -> confirmDiscard(Platform::exit));
        file.getItems().addAll(fromTemplate, open, save, saveAs, recentMenu, new SeparatorMenuItem(), svg, png,
                new SeparatorMenuItem(), quit);

        Menu edit = new Menu("Edit");
        MenuItem undo = item("Undo", "Shortcut+Z", e -> vm.undo());
        undo.textProperty().bind(vm.undoLabelProperty());
        undo.disableProperty().bind(vm.canUndoProperty().not());
        MenuItem redo = item("Redo", "Shortcut+Y", e -> vm.redo());
        redo.textProperty().bind(vm.redoLabelProperty());
        redo.disableProperty().bind(vm.canRedoProperty().not());
        edit.getItems().addAll(undo, redo, new SeparatorMenuItem(),
                item("Cut", "Shortcut+X", e -> vm.cut()), item("Copy", "Shortcut+C", e -> vm.copy()),
                item("Paste", "Shortcut+V", e -> vm.paste()), item("Delete", "Delete", e -> vm.delete()),
                new SeparatorMenuItem(), item("Rotate", "R", e -> vm.rotate()), item("Mirror", "M", e -> vm.mirror()));

        Menu view = new Menu("View");
        CheckMenuItem grid = new CheckMenuItem("Grid");
        grid.setSelected(true);
        grid.setDisable(true);
        ToggleGroup theme = new ToggleGroup();
        RadioMenuItem light = new RadioMenuItem("Light theme");
        light.setToggleGroup(theme);
        light.setSelected(true);
        light.setOnAction(e -> setDark(false));
        RadioMenuItem dark = new RadioMenuItem("Dark theme");
        dark.setToggleGroup(theme);
        dark.setOnAction(e -> setDark(true));
        Menu readouts = new Menu("Readouts");
        for (EditorViewModel.ReadoutKind k : EditorViewModel.ReadoutKind.values()) {
            CheckMenuItem c = new CheckMenuItem(readoutTitle(k));
            c.setSelected(vm.shownReadoutsProperty().get().contains(k));
            c.setOnAction(e -> vm.showReadout(k, c.isSelected()));
            readouts.getItems().add(c);
        }
        view.getItems().addAll(item("Zoom in", "Shortcut+EQUALS", e -> canvas.zoomIn()),
                item("Zoom out", "Shortcut+MINUS", e -> canvas.zoomOut()), item("Fit drawing", "Shortcut+0", e -> canvas.fit()),
                new SeparatorMenuItem(), readouts, new SeparatorMenuItem(), light, dark);

        Menu tools = new Menu("Tools");
        MenuItem size = item("Size base network…", null, e -> sizeBaseNetwork());
        size.setId("menu-size-base-network");
        MenuItem showEdges = item("Show edges", "Shortcut+E", e -> edgesDrawer.setExpanded(true));
        MenuItem lineUp = item("Line-up…", null, e -> showLineUp());
        lineUp.setId("menu-line-up");
        Menu whatIf = new Menu("Line up against…");
        for (StageTemplate t : StageTemplate.values()) {
            Menu m = new Menu(t.title());
            for (Suppressor s : Suppressor.values()) {
                MenuItem it = new MenuItem(suppressorTitle(s));
                it.setId("what-if-" + t.id() + "-" + s.id());
                it.setOnAction(e -> {
                    vm.whatIfTopology(t, s, HighSideDrive.LEVEL_SHIFT);
                    showLineUp();
                });
                m.getItems().add(it);
            }
            whatIf.getItems().add(m);
        }
        Menu whatIfSuppressor = new Menu("What if: another suppressor");
        for (Suppressor s : Suppressor.values()) {
            MenuItem it = new MenuItem(suppressorTitle(s));
            it.setId("what-if-suppressor-" + s.id());
            it.setOnAction(e -> {
                if (vm.whatIfSuppressor(s)) {
                    showLineUp();
                }
            });
            whatIfSuppressor.getItems().add(it);
        }
        MenuItem whatIfValue = item("What if: another resistor value…", null, e -> WhatIfValueDialog.show(vm, window(),
                this::showLineUp));
        whatIfValue.setId("menu-what-if-value");
        tools.getItems().addAll(size, showEdges, lineUp, whatIf, whatIfSuppressor, whatIfValue);

        Menu stages = new Menu("Stage");
        stages.getItems().setAll(stageTabs.menuItems());

        Menu help = new Menu("Help");
        help.getItems().add(item("About Armature", null, e -> about()));
        menuBar.getMenus().addAll(file, edit, view, stages, tools, help);
        return menuBar;
    }

    private static String suppressorTitle(Suppressor s) {
        return switch (s) {
            case NONE -> "No suppressor";
            case DIODE -> "Freewheeling diode";
            case DIODE_ZENER -> "Diode and zener clamp";
            case RC -> "RC snubber";
            case TVS -> "TVS across the coil";
            case RESISTOR -> "Resistor across the coil";
        };
    }

    private static String readoutTitle(EditorViewModel.ReadoutKind k) {
        return switch (k) {
            case VOLTAGES -> "Node voltages";
            case CURRENTS -> "Branch currents";
            case BADGES -> "Switch verdict";
            case GAUGES -> "Coil current gauge";
            case MARKERS -> "Finding markers";
        };
    }

    private static MenuItem item(String text, String accel, javafx.event.EventHandler<javafx.event.ActionEvent> h) {
        MenuItem m = new MenuItem(text);
        m.setId("menu-" + text.toLowerCase(Locale.ROOT).replaceAll("[^a-z]+", "-").replaceAll("-$", ""));
        if (accel != null) {
            m.setAccelerator(KeyCombination.keyCombination(accel));
        }
        m.setOnAction(h);
        return m;
    }

    private void refreshRecent() {
        recentMenu.getItems().clear();
        for (Path p : recent.list()) {
            MenuItem it = new MenuItem(p.getFileName().toString());
            it.setOnAction(e -> confirmDiscard(() -> vm.open(p)));
            recentMenu.getItems().add(it);
        }
        recentMenu.setDisable(recentMenu.getItems().isEmpty());
    }

    // ------------------------------------------------------------------ tool bar

    private static javafx.scene.control.Separator separator() {
        javafx.scene.control.Separator sep = new javafx.scene.control.Separator(Orientation.VERTICAL);
        sep.setPadding(new Insets(0, 2, 0, 2));
        return sep;
    }

    /** The tool bar (tests look its controls up). */
    public HBox toolBarRow() {
        return toolBar;
    }

    private HBox toolBar() {
        Button newB = tool("mdi2f-file-plus-outline", "New stage: low-side NPN with a freewheeling diode",
                () -> confirmDiscard(() -> vm.newFromTemplate(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT)));
        Button openB = tool("mdi2f-folder-open-outline", "Open a stage file", this::chooseOpen);
        Button saveB = tool("mdi2c-content-save-outline", "Save", this::save);
        Button undoB = tool("mdi2u-undo", "Undo", vm::undo);
        undoB.disableProperty().bind(vm.canUndoProperty().not());
        Button redoB = tool("mdi2r-redo", "Redo", vm::redo);
        redoB.disableProperty().bind(vm.canRedoProperty().not());
        Button rotB = tool("mdi2r-rotate-right", "Rotate the selection a quarter turn (R)", vm::rotate);
        Button mirB = tool("mdi2f-flip-horizontal", "Mirror the selection (M)", vm::mirror);
        Button fitB = tool("mdi2f-fit-to-page-outline", "Fit the drawing to the window", canvas::fit);
        ToggleButton pin = new ToggleButton();
        pin.setId("pin-toggle");
        pin.getStyleClass().add("pin-toggle");
        pin.setTooltip(new Tooltip("Drive pin state for the operating point"));
        Runnable syncPin = () -> {
            boolean high = vm.stage().conditions().pinHigh();
            // the click has already flipped the toggle's own state: compare the words shown, not the state
            if (pin.getGraphic() != null && pin.isSelected() == high && pin.getText().equals(high ? "Pin HIGH" : "Pin LOW")) {
                return;
            }
            pin.setSelected(high);
            pin.setText(high ? "Pin HIGH" : "Pin LOW");
            pin.setGraphic(new FontIcon(high ? "mdi2t-toggle-switch" : "mdi2t-toggle-switch-off-outline"));
        };
        syncPin.run();
        pin.setOnAction(e -> vm.setPinHigh(pin.isSelected()));
        vm.stageProperty().addListener((o, a, b) -> syncPin.run());
        Slider ambient = new Slider(-40, 85, vm.stage().conditions().ambientCelsius());
        ambient.setId("ambient-slider");
        ambient.setMajorTickUnit(25);
        ambient.setBlockIncrement(5);
        ambient.setTooltip(new Tooltip("Ambient temperature of the nominal operating point"));
        Label reading = new Label();
        reading.getStyleClass().add("reading");
        reading.setMinWidth(48);
        Runnable syncAmbient = () -> {
            syncingAmbient = true;
            ambient.setValue(vm.stage().conditions().ambientCelsius());
            reading.setText(Notation.format(vm.stage().conditions().ambientCelsius(), "°C"));
            syncingAmbient = false;
        };
        syncAmbient.run();
        ambient.valueProperty().addListener((o, a, b) -> {
            if (!syncingAmbient) {
                vm.setAmbient(Math.rint(b.doubleValue()));
            }
        });
        vm.stageProperty().addListener((o, a, b) -> syncAmbient.run());
        Label amb = new Label("Ambient", new FontIcon("mdi2t-thermometer"));
        amb.setTooltip(new Tooltip("Ambient temperature of the nominal operating point"));
        Slider supply = new Slider(SUPPLY_MIN_VOLTS, SUPPLY_MAX_VOLTS, supplyVolts());
        supply.setId("supply-slider");
        supply.setBlockIncrement(0.5);
        supply.setTooltip(new Tooltip("Coil supply voltage of the nominal operating point"));
        Label supplyReading = new Label();
        supplyReading.setId("supply-reading");
        supplyReading.getStyleClass().add("reading");
        supplyReading.setMinWidth(52);
        Runnable syncSupply = () -> {
            syncingSupply = true;
            boolean has = vm.coilSupply().isPresent();
            supply.setDisable(!has);
            supply.setValue(supplyVolts());
            supplyReading.setText(has ? Notation.format(supplyVolts(), "V") : "–");
            syncingSupply = false;
        };
        syncSupply.run();
        supply.valueProperty().addListener((o, a, b) -> {
            if (!syncingSupply) {
                vm.setSupplyVolts(Math.rint(b.doubleValue() * 10) / 10);
            }
        });
        vm.stageProperty().addListener((o, a, b) -> syncSupply.run());
        Label sup = new Label("Supply", new FontIcon("mdi2f-flash-outline"));
        sup.setTooltip(new Tooltip("Coil supply voltage of the nominal operating point"));
        Button export = tool("mdi2e-export-variant", "Export the drawing or a report", this::export);
        Button edgesB = tool("mdi2w-waveform", "Show the edges: turn-on and turn-off waveforms",
                () -> edgesDrawer.setExpanded(!edgesDrawer.isExpanded()));
        edgesB.setId("edges-button");
        // one row that never overflows into a hidden menu: buttons and words keep their full size, the
        // two sliders give up width first (down to SLIDER_MIN_WIDTH) when the window narrows
        for (Slider sl : List.of(ambient, supply)) {
            sl.setMinWidth(SLIDER_MIN_WIDTH);
            sl.setPrefWidth(SLIDER_PREF_WIDTH);
            sl.setMaxWidth(SLIDER_PREF_WIDTH);
            HBox.setHgrow(sl, Priority.SOMETIMES);
        }
        HBox bar = new HBox(newB, openB, saveB, separator(), undoB, redoB, rotB, mirB, separator(), pin, amb, ambient,
                reading, sup, supply, supplyReading, separator(), edgesB, fitB, export);
        bar.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        bar.setId("main-toolbar");
        bar.getStyleClass().add("main-toolbar");
        for (javafx.scene.Node n : bar.getChildren()) {
            if (!(n instanceof Slider) && n instanceof Region r) {
                r.setMinWidth(Region.USE_PREF_SIZE);
            }
        }
        return bar;
    }

    private double supplyVolts() {
        return vm.coilSupply().map(p -> p.value(ParamKeys.VOLTS)).orElse(12.0);
    }

    private void showLineUp() {
        var d = LineUpView.dialog(vm, Palette.LIGHT);
        if (window() != null) {
            d.initOwner(window());
        }
        d.show();
    }

    private void sizeBaseNetwork() {
        var d = SizingDialog.dialog(vm);
        if (window() != null) {
            d.initOwner(window());
        }
        d.show();
    }

    private static Button tool(String icon, String tip, Runnable action) {
        Button b = new Button();
        b.setGraphic(new FontIcon(icon));
        b.setTooltip(new Tooltip(tip));
        b.getStyleClass().add("tool-button");
        b.setOnAction(e -> action.run());
        return b;
    }

    // ------------------------------------------------------------------ right side and status

    /**
     * The part sheet above the verdicts, each collapsible. Both share the height while open; a
     * collapsed one shrinks to its title and gives the other its room. The verdicts scroll in their
     * own lists, so they sit in no scroll pane (no nested scrolling); the part sheet has one.
     */
    private Region rightSide() {
        ScrollPane sheetScroll = new ScrollPane(sheet);
        sheetScroll.setFitToWidth(true);
        sheetScroll.setPadding(new Insets(6));
        TitledPane sheetPane = new TitledPane("Part sheet", sheetScroll);
        sheetPane.setId("part-sheet-pane");
        verdicts.setPadding(new Insets(6));
        TitledPane verdictPane = new TitledPane("Verdicts", verdicts);
        verdictPane.setId("verdicts-pane");
        DiagnosisPanel diagnosis = new DiagnosisPanel(vm);
        // with the fault hunt open, a click on a net of the drawing offers to enter a reading there
        canvas.setOnNetClicked((net, x, y) -> diagnosis.offerReading(net, canvas, x, y));
        ScrollPane diagScroll = new ScrollPane(diagnosis);
        diagScroll.setFitToWidth(true);
        TitledPane diagPane = new TitledPane("Fault diagnosis", diagScroll);
        diagPane.setId("diagnosis-pane");
        diagPane.setExpanded(false);
        VBox box = new VBox(sheetPane, verdictPane, diagPane);
        Runnable share = () -> {
            for (TitledPane t : List.of(sheetPane, verdictPane, diagPane)) {
                boolean open = t.isExpanded();
                VBox.setVgrow(t, open ? Priority.ALWAYS : Priority.NEVER);
                t.setMaxHeight(open ? Double.MAX_VALUE : Region.USE_PREF_SIZE);
                t.setPrefHeight(open ? 200 : Region.USE_COMPUTED_SIZE);
                t.setMinHeight(open ? 0 : Region.USE_PREF_SIZE);
            }
        };
        share.run();
        sheetPane.expandedProperty().addListener((o, a, b) -> share.run());
        verdictPane.expandedProperty().addListener((o, a, b) -> share.run());
        diagPane.expandedProperty().addListener((o, a, b) -> {
            share.run();
            diagnosis.setActive(b);
        });
        box.setPrefWidth(330);
        box.setMinWidth(260);
        box.getStyleClass().add("right-side");
        return box;
    }

    private Region statusBar() {
        Label solver = new Label();
        solver.setId("status-solver");
        // the status of the evaluation on the canvas: a value edit whose solve is pending keeps the
        // last status instead of flickering to "Solving…" on every slider step
        solver.setText(canvas.drawnEvaluation().status());
        vm.evaluationProperty().addListener((o, a, b) -> solver.setText(canvas.drawnEvaluation().status()));
        Label faults = new Label();
        faults.setId("status-faults");
        faults.getStyleClass().add("status-message");
        Runnable faultText = () -> faults.setText(vm.faultStatus());
        vm.faultsProperty().addListener((o, a, b) -> faultText.run());
        vm.evaluationProperty().addListener((o, a, b) -> faultText.run());
        Label message = new Label();
        message.getStyleClass().add("status-message");
        message.textProperty().bind(vm.messageProperty());
        Label name = new Label();
        name.setId("status-file");
        Runnable sync = () -> name.setText(vm.fileName() + (vm.dirtyProperty().get() ? "  ● unsaved" : ""));
        sync.run();
        vm.fileProperty().addListener((o, a, b) -> sync.run());
        vm.dirtyProperty().addListener((o, a, b) -> sync.run());
        Region spacer = new Region();
        HBox.setHgrow(spacer, Priority.ALWAYS);
        HBox bar = new HBox(16, solver, faults, message, spacer, name);
        bar.getStyleClass().add("status-bar");
        bar.setPadding(new Insets(3, 10, 3, 10));
        return bar;
    }

    // ------------------------------------------------------------------ dialogs

    private Window window() {
        return root.getScene() == null ? null : root.getScene().getWindow();
    }

    private FileChooser chooser(String title) {
        FileChooser fc = new FileChooser();
        fc.setTitle(title);
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Stage files", "*" + StageFiles.EXTENSION));
        return fc;
    }

    /**
     * Adds a file opened outside the menus (the command line) to the recent-files list.
     *
     * @param path the file opened
     */
    public void rememberRecent(Path path) {
        recent.add(path);
        refreshRecent();
    }

    private void chooseOpen() {
        confirmDiscard(() -> {
            File f = chooser("Open stage file").showOpenDialog(window());
            if (f != null && vm.open(f.toPath())) {
                recent.add(f.toPath());
                refreshRecent();
            }
        });
    }

    private void save() {
        if (vm.fileProperty().get().isEmpty()) {
            chooseSaveAs();
        } else {
            vm.save();
        }
    }

    private void chooseSaveAs() {
        FileChooser fc = chooser("Save stage file");
        fc.setInitialFileName("stage" + StageFiles.EXTENSION);
        File f = fc.showSaveDialog(window());
        if (f != null) {
            Path p = f.getName().endsWith(StageFiles.EXTENSION) ? f.toPath() : Path.of(f.getPath() + StageFiles.EXTENSION);
            if (vm.saveAs(p)) {
                recent.add(p);
                refreshRecent();
            }
        }
    }

    private void export() {
        ExportDialog.show(window(), vm, ExportDialog.BACKGROUND);
    }

    private void confirmDiscard(Runnable then) {
        if (mayDiscard()) {
            then.run();
        }
    }

    /**
     * True when the document may be dropped: it has no unsaved changes, the window is not shown, or
     * the user agrees to discard them (the question the Quit menu asks).
     */
    private boolean mayDiscard() {
        return !vm.dirtyProperty().get() || window() == null || discardQuestion.getAsBoolean();
    }

    private boolean askDiscard() {
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "The stage has unsaved changes. Discard them?",
                ButtonType.CANCEL, ButtonType.OK);
        a.setHeaderText(null);
        a.initOwner(window());
        Optional<ButtonType> r = a.showAndWait();
        return r.isPresent() && r.get() == ButtonType.OK;
    }

    /**
     * Replaces the "discard unsaved changes?" question (tests answer it without a dialog); the
     * supplier returns true for discard. The default shows a confirmation dialog.
     */
    public void setDiscardQuestion(BooleanSupplier question) {
        this.discardQuestion = java.util.Objects.requireNonNull(question, "question");
    }

    /**
     * Handles a window close request (the title-bar close button): with unsaved changes it asks the
     * same question as Quit, and a cancel consumes the event so the window stays open.
     *
     * @param event the close request
     * @return true when the window may close
     */
    public boolean handleCloseRequest(WindowEvent event) {
        boolean close = mayDiscard();
        if (!close) {
            event.consume();
        }
        return close;
    }

    /** Guards a stage's close button with {@link #handleCloseRequest(WindowEvent)}. */
    public void guardClose(javafx.stage.Stage stage) {
        stage.setOnCloseRequest(this::handleCloseRequest);
    }

    private void about() {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.setTitle("About Armature");
        a.setHeaderText("Armature 0.1");
        a.setContentText("A sandbox for relay driver stages: logic pin, transistor, relay coil and suppressor.\n"
                + "It reports the checks it ran; it never claims a design is safe.");
        a.initOwner(window());
        a.show();
    }

    /** Runs an action for each menu item, depth first (tests look items up by id). */
    public void forEachItem(Consumer<MenuItem> action) {
        for (Menu m : menuBar.getMenus()) {
            walk(m, action);
        }
    }

    private static void walk(MenuItem item, Consumer<MenuItem> action) {
        action.accept(item);
        if (item instanceof Menu m) {
            for (MenuItem c : m.getItems()) {
                walk(c, action);
            }
        }
    }
}
