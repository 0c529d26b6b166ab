package org.flexmargin.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Enforces the package layering of DEVELOPERS.md: data flows one way, libraries stay in their
 * layer, and only the command line prints or exits.
 */
class LayeringTest {
  private static JavaClasses classes;

  @BeforeAll
  static void load() {
    classes = new ClassFileImporter()
        .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
        .importPackages("org.flexmargin");
  }

  private static void onlyDependsOn(String pkg, String... allowed) {
    String[] all = new String[allowed.length + 2];
    all[0] = "org.flexmargin." + pkg + "..";
    for (int i = 0; i < allowed.length; i++) {
      all[i + 1] = "org.flexmargin." + allowed[i] + "..";
    }
    all[all.length - 1] = "java..";
    noClasses().that().resideInAPackage("org.flexmargin." + pkg + "..")
        .should().dependOnClassesThat(
            com.tngtech.archunit.base.DescribedPredicate.describe("outside the allowed layers of " + pkg,
                c -> c.getPackageName().startsWith("org.flexmargin.")
                    && !startsWithAny(c.getPackageName(), all)))
        .check(classes);
  }

  private static boolean startsWithAny(String pkg, String[] prefixes) {
    for (String p : prefixes) {
      String stem = p.substring(0, p.length() - 2);
      if (pkg.equals(stem) || pkg.startsWith(stem + ".")) {
        return true;
      }
    }
    return false;
  }

  @Test
  void modelDependsOnNothingOfOurs() {
    onlyDependsOn("model");
  }

  @Test
  void numericsDependsOnNothingOfOurs() {
    onlyDependsOn("numerics");
  }

  @Test
  void atmosphereDependsOnModelOnly() {
    onlyDependsOn("atmosphere", "model");
  }

  @Test
  void aeroAndStructureAreBelowFlutter() {
    onlyDependsOn("aero", "model", "numerics");
    onlyDependsOn("structure", "model", "numerics");
  }

  @Test
  void latticeIsBesideAero() {
    onlyDependsOn("lattice", "model", "numerics", "aero", "spline");
  }

  @Test
  void splineDependsOnNothingOfOurs() {
    onlyDependsOn("spline");
  }

  @Test
  void flutterDependsOnlyOnLowerLayers() {
    onlyDependsOn("flutter", "model", "numerics", "aero", "structure", "atmosphere");
  }

  @Test
  void loopIsGeneralLinearSystemsMachinery() {
    onlyDependsOn("loop", "model", "numerics");
  }

  @Test
  void clearanceJudgesLoopResultsAgainstTheModel() {
    onlyDependsOn("clearance", "model", "loop");
  }

  @Test
  void aseCombinesAircraftAndLoop() {
    onlyDependsOn("ase", "model", "numerics", "aero", "structure", "atmosphere", "loop");
  }

  @Test
  void sweepDependsOnlyOnLowerLayers() {
    onlyDependsOn("sweep", "model", "numerics", "aero", "lattice", "structure", "atmosphere", "flutter", "loop", "ase",
        "clearance");
  }

  @Test
  void notchDesignSitsOnTopOfTheSweep() {
    onlyDependsOn("notch", "model", "numerics", "aero", "structure", "atmosphere", "flutter", "loop", "ase",
        "clearance", "sweep");
  }

  @Test
  void simulationSitsOnTopOfTheSweep() {
    onlyDependsOn("simulate", "model", "numerics", "aero", "structure", "atmosphere", "flutter", "loop", "ase",
        "clearance", "sweep");
  }

  @Test
  void campaignsRunSamplesOfTheSweep() {
    onlyDependsOn("campaign", "model", "numerics", "aero", "lattice", "structure", "atmosphere", "flutter", "loop",
        "ase", "clearance", "sweep", "io");
  }

  @Test
  void ioReadsIntoModelOnly() {
    onlyDependsOn("io", "model", "atmosphere");
  }

  @Test
  void reportReadsOnlyResults() {
    onlyDependsOn("report", "model", "atmosphere", "flutter", "sweep", "loop", "ase", "clearance", "simulate",
        "campaign");
  }

  @Test
  void librariesStayInTheirLayers() {
    noClasses().that().resideOutsideOfPackage("org.flexmargin.cli..")
        .should().dependOnClassesThat().resideInAPackage("picocli..").check(classes);
    noClasses().that().resideOutsideOfPackages("org.flexmargin.io..", "org.flexmargin.report..")
        .should().dependOnClassesThat().resideInAPackage("com.fasterxml.jackson..").check(classes);
    noClasses().that().resideOutsideOfPackage("org.flexmargin.report..")
        .should().dependOnClassesThat().resideInAPackage("org.knowm.xchart..").check(classes);
    noClasses().that().resideOutsideOfPackage("org.flexmargin.campaign.spark..")
        .should().dependOnClassesThat().resideInAPackage("org.apache.spark..").check(classes);
  }

  @Test
  void onlyTheCommandLinePrintsOrExits() {
    noClasses().that().resideOutsideOfPackage("org.flexmargin.cli..")
        .should().accessField(System.class, "out").check(classes);
    noClasses().that().resideOutsideOfPackage("org.flexmargin.cli..")
        .should().accessField(System.class, "err").check(classes);
    noClasses().that().resideOutsideOfPackage("org.flexmargin.cli..")
        .should().callMethod(System.class, "exit", int.class).check(classes);
  }

  @Test
  void noPackageCycles() {
    slices().matching("org.flexmargin.(*)..").should().beFreeOfCycles().check(classes);
  }
}
