package org.cohesa;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** Keeps the computation packages pure: no database, command line or UI inside {@code org.cohesa.core}. */
@AnalyzeClasses(packages = "org.cohesa", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule coreHasNoJdbc = noClasses().that().resideInAPackage("org.cohesa.core..")
            .should().dependOnClassesThat().resideInAnyPackage("java.sql..", "javax.sql..", "org.sqlite..")
            .because("the science core is pure computation; the database lives in org.cohesa.store");

    @ArchTest
    static final ArchRule coreHasNoUi = noClasses().that().resideInAPackage("org.cohesa.core..")
            .should().dependOnClassesThat().resideInAnyPackage("javafx..", "java.awt..", "javax.swing..")
            .because("the desktop app is an edge over the core, never the other way round");

    @ArchTest
    static final ArchRule coreHasNoCommandLine = noClasses().that().resideInAPackage("org.cohesa.core..")
            .should().dependOnClassesThat().resideInAnyPackage("picocli..", "org.cohesa.cli..")
            .because("the command line is an edge over the core");

    @ArchTest
    static final ArchRule coreDoesNotReachTheEdges = noClasses().that().resideInAPackage("org.cohesa.core..")
            .should().dependOnClassesThat().resideInAnyPackage("org.cohesa.store..", "org.cohesa.desktop..")
            .because("edges depend on the core, not the reverse");

    @ArchTest
    static final ArchRule coreDoesNoFileIo = noClasses().that().resideInAPackage("org.cohesa.core..")
            .should().dependOnClassesThat().haveFullyQualifiedName("java.nio.file.Files")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileInputStream")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileOutputStream")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileWriter")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileReader")
            .because("files are read and written at the edges (store, cli, desktop)");

    @ArchTest
    static final ArchRule storeAndCliDoNotUseJavaFx = noClasses().that().resideInAnyPackage("org.cohesa.store..", "org.cohesa.cli..")
            .should().dependOnClassesThat().resideInAnyPackage("javafx..")
            .because("the command line must run on machines without a display");

    @ArchTest
    static final ArchRule cliIsNotUsedByDesktop = noClasses().that().resideInAPackage("org.cohesa.desktop..")
            .should().dependOnClassesThat().resideInAnyPackage("org.cohesa.cli..")
            .because("desktop and command line are sibling edges over the same core and store");
}
