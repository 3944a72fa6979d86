package org.armature;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The layer rules of DEVELOPERS.md: one direction of dependency,
 * {@code units -> model -> devices -> netlist -> solver -> analysis -> io -> render -> cli -> ui},
 * no JavaFX outside {@code ui}, no console output outside {@code cli}.
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
    void coreUsesNoJavaFx() {
        ArchRule rule = noClasses().that().resideInAnyPackage(CORE)
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "org.controlsfx..", "org.kordamp..")
                .allowEmptyShould(true);
        rule.check(classes);
    }

    @Test
    void onlyCliWritesToTheConsole() {
        ArchRule rule = noClasses().that().resideOutsideOfPackages("org.armature.cli..")
                .and().doNotHaveFullyQualifiedName("org.armature.Launcher")
                .should().accessField(System.class, "out")
                .orShould().accessField(System.class, "err")
                .allowEmptyShould(true);
        rule.check(classes);
    }

    @Test
    void unitsKnowsNothingElse() {
        noClasses().that().resideInAPackage("org.armature.units..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.armature.model..", "org.armature.devices..", "org.armature.netlist..",
                        "org.armature.solver..", "org.armature.analysis..", "org.armature.io..",
                        "org.armature.render..", "org.armature.cli..", "org.armature.ui..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void modelKnowsNoEngineNorViews() {
        noClasses().that().resideInAPackage("org.armature.model..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.armature.devices..", "org.armature.netlist..", "org.armature.solver..",
                        "org.armature.analysis..", "org.armature.io..", "org.armature.render..",
                        "org.armature.cli..", "org.armature.ui..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void devicesKnowNoDocumentNorSolver() {
        noClasses().that().resideInAPackage("org.armature.devices..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.armature.model..", "org.armature.netlist..", "org.armature.solver..",
                        "org.armature.analysis..", "org.armature.io..", "org.armature.render..",
                        "org.armature.cli..", "org.armature.ui..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void engineKnowsNoViewsNorFiles() {
        noClasses().that().resideInAnyPackage("org.armature.netlist..", "org.armature.solver..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.armature.analysis..", "org.armature.io..", "org.armature.render..",
                        "org.armature.cli..", "org.armature.ui..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void analysisKnowsNoViewsNorFiles() {
        noClasses().that().resideInAPackage("org.armature.analysis..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.armature.io..", "org.armature.render..", "org.armature.cli..", "org.armature.ui..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void ioAndRenderKnowNoCliNorUi() {
        noClasses().that().resideInAnyPackage("org.armature.io..", "org.armature.render..")
                .should().dependOnClassesThat().resideInAnyPackage("org.armature.cli..", "org.armature.ui..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void cliKnowsNoUi() {
        noClasses().that().resideInAPackage("org.armature.cli..")
                .should().dependOnClassesThat().resideInAPackage("org.armature.ui..")
                .allowEmptyShould(true).check(classes);
    }
}
