package org.armature;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The layer rules of DEVELOPERS.md: one direction of dependency,
 * {@code units -> model -> devices -> netlist -> solver -> analysis -> io -> render -> cli -> ui},
 * no cycles between packages, no JavaFX outside {@code ui} (and none in {@code ui.edit}, the
 * editor's plain-Java history), no console output outside {@code cli}.
 *
 * <p>No rule allows an empty "should": every rule names classes that exist, so a renamed package
 * makes the rule fail instead of passing over nothing.
 */
class ArchitectureTest {

    private static JavaClasses classes;

    @BeforeAll
    static void importClasses() {
        classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.armature");
    }

    private static final String[] CORE = {
        "org.armature.units..", "org.armature.model..", "org.armature.devices..", "org.armature.netlist..",
        "org.armature.solver..", "org.armature.analysis..", "org.armature.io..", "org.armature.render..",
        "org.armature.cli.."
    };

    @Test
    void everyPackageKnowsOnlyThoseToItsLeft() {
        ArchRule rule = layeredArchitecture().consideringOnlyDependenciesInLayers()
                .layer("units").definedBy("org.armature.units..")
                .layer("model").definedBy("org.armature.model..")
                .layer("devices").definedBy("org.armature.devices..")
                .layer("netlist").definedBy("org.armature.netlist..")
                .layer("solver").definedBy("org.armature.solver..")
                .layer("analysis").definedBy("org.armature.analysis..")
                .layer("io").definedBy("org.armature.io..")
                .layer("render").definedBy("org.armature.render..")
                .layer("cli").definedBy("org.armature.cli..")
                .layer("ui").definedBy("org.armature.ui..")
                .layer("launcher").definedBy("org.armature")
                .whereLayer("launcher").mayNotBeAccessedByAnyLayer()
                .whereLayer("ui").mayOnlyBeAccessedByLayers("launcher")
                .whereLayer("cli").mayOnlyBeAccessedByLayers("ui", "launcher")
                .whereLayer("render").mayOnlyBeAccessedByLayers("cli", "ui", "launcher")
                .whereLayer("io").mayOnlyBeAccessedByLayers("render", "cli", "ui", "launcher")
                .whereLayer("analysis").mayOnlyBeAccessedByLayers("io", "render", "cli", "ui", "launcher")
                .whereLayer("solver").mayOnlyBeAccessedByLayers("analysis", "io", "render", "cli", "ui", "launcher")
                .whereLayer("netlist").mayOnlyBeAccessedByLayers("solver", "analysis", "io", "render", "cli", "ui",
                        "launcher")
                .whereLayer("devices").mayOnlyBeAccessedByLayers("netlist", "solver", "analysis", "io", "render",
                        "cli", "ui", "launcher")
                .whereLayer("model").mayOnlyBeAccessedByLayers("devices", "netlist", "solver", "analysis", "io",
                        "render", "cli", "ui", "launcher")
                .because("each package knows only those to its left (DEVELOPERS.md, Architecture), so the core"
                        + " runs and is tested without the window and an engine change cannot reach into a view");
        rule.check(classes);
    }

    @Test
    void packagesFormNoCycles() {
        slices().matching("org.armature.(**)")
                .should().beFreeOfCycles()
                .because("a cycle between packages (sub-packages such as solver.timedomain and ui.edit included)"
                        + " would undo the one direction of flow")
                .check(classes);
    }

    @Test
    void devicesKnowNoDocument() {
        // the layer rule lets devices see model (to their left); DEVELOPERS.md keeps the equations
        // free of the document so that they can be checked against published figures alone
        noClasses().that().resideInAPackage("org.armature.devices..")
                .should().dependOnClassesThat().resideInAPackage("org.armature.model..")
                .because("device equations take plain numbers, never parts, so each is tested against its"
                        + " publication alone")
                .check(classes);
    }

    @Test
    void coreUsesNoJavaFx() {
        noClasses().that().resideInAnyPackage(CORE).or().haveFullyQualifiedName("org.armature.Launcher")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "org.controlsfx..", "org.kordamp..")
                .because("the core and the command line run with no display and no JavaFX toolkit (DESIGN.md)")
                .check(classes);
    }

    @Test
    void editingHistoryUsesNoJavaFx() {
        noClasses().that().resideInAPackage("org.armature.ui.edit..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "org.controlsfx..", "org.kordamp..")
                .because("edit commands and the undo history are plain Java, tested without the toolkit"
                        + " (STYLE.md, Editing)")
                .check(classes);
    }

    @Test
    void onlyCliWritesToTheConsole() {
        noClasses().that().resideOutsideOfPackages("org.armature.cli..")
                .and().doNotHaveFullyQualifiedName("org.armature.Launcher")
                .should().accessField(System.class, "out")
                .orShould().accessField(System.class, "err")
                .because("the command line owns the console; everything else reports through results and"
                        + " findings")
                .check(classes);
    }
}
