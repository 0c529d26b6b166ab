package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/**
 * The closed-loop eigenvalues use the case's rational-fit settings: the fit they name follows the
 * settings, the onsets refined on the exact loop do not depend on the fit, and a poor fit at a
 * rational onset is reported.
 */
class ClosedLoopFitSettingsTest {

  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  private static ClosedLoopResult run(RationalFitSettings s) {
    Configuration cfg = DEMO.configurations().get(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 40, 110, 8));
    AnalysisOptions options = DEMO.options().withRationalFit(s);
    FlutterSolution ol = new PkMethod().solve(m.system(), path, options);
    return new ClosedLoopSweep().analyse(m, cfg, DEMO.loop(), path, ol, options);
  }

  private static double exactOnset(ClosedLoopResult r) {
    return r.crossings().stream().filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET && c.thresholdG() == 0.0)
        .mapToDouble(c -> c.condition().speedEasMps()).min().orElseThrow();
  }

  @Test
  void theFitFollowsTheSettingsAndTheExactOnsetDoesNot() {
    ClosedLoopResult roger = run(RationalFitSettings.defaults());
    RationalFitSettings ms = new RationalFitSettings(RationalFitForm.MINIMUM_STATE, RationalFitSettings.AUTOMATIC,
        null, 0.0, Double.NaN, RationalFitSettings.DEFAULT_POINTS, FitWeighting.UNIFORM);
    ClosedLoopResult karpel = run(ms);
    assertTrue(roger.fitDescription().startsWith("Roger approximation, 4 lag roots, k from 0 to "),
        roger.fitDescription());
    int n = ConfigurationModel.of(DEMO.configurations().get(0)).system().size();
    assertTrue(karpel.fitDescription().startsWith("minimum-state (Karpel) approximation, " + 2 * n + " lag roots"),
        karpel.fitDescription());
    // the exact-loop onset is a root of 1 + L(jw) with the exact forces, refined to 1e-7 in the path
    // parameter: the fit only seeds it (0.01 m/s allows for Newton's stopping tolerance)
    assertEquals(exactOnset(roger), exactOnset(karpel), 0.01);
  }

  @Test
  void aPoorFitAtAClosedLoopOnsetIsReported() {
    // One lag root over k in [0, 1] (worst element error about 11 %): the rational onset of the
    // demo's fuselage bending moves by a few m/s and the fit is several per cent off at its reduced
    // frequency (about 0.6), so the warning is given; the onset refined on the exact loop is the
    // default fit's all the same. The default four-lag fit is within 1 % at its onsets.
    RationalFitSettings poor = new RationalFitSettings(RationalFitForm.ROGER, 1, null, 0.0, 1.0,
        RationalFitSettings.DEFAULT_POINTS, FitWeighting.UNIFORM);
    ClosedLoopResult r = run(poor);
    ClosedLoopResult good = run(RationalFitSettings.defaults());
    FlutterCrossing rational = r.refinements().get(0).rational();
    assertTrue(r.warnings().stream().anyMatch(w -> w.startsWith("rational fit error ")
        && w.contains("of the closed-loop flutter onset of " + rational.branchName()) && w.contains("exceeds 1.00 %")),
        rational + " " + r.warnings());
    assertTrue(good.warnings().stream().noneMatch(w -> w.startsWith("rational fit error ")), good.warnings().toString());
    assertEquals(exactOnset(good), exactOnset(r), 0.01);
  }
}
