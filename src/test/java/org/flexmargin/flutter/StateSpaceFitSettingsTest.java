package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * State-space flutter with the case's rational-fit settings (docs/validation.md, "Minimum-state
 * rational fit"): the settings reach the method through the options, the defaults change nothing,
 * both forms with their automatic lag counts agree with p-k within 0.3 % on every validation case
 * (the four typical sections and the Goland wing), and a deliberately poor fit is reported.
 */
class StateSpaceFitSettingsTest {

  private static final RationalFitSettings MINIMUM_STATE = new RationalFitSettings(RationalFitForm.MINIMUM_STATE,
      RationalFitSettings.AUTOMATIC, null, 0.0, Double.NaN, RationalFitSettings.DEFAULT_POINTS, FitWeighting.UNIFORM);

  private static AnalysisOptions options(RationalFitSettings s) {
    return AnalysisOptions.defaults().withMethod(FlutterMethodKind.STATE_SPACE).withRationalFit(s);
  }

  private static double onset(FlutterSolution s) {
    return s.crossings().stream().filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET)
        .mapToDouble(c -> c.condition().speedTasMps()).min().orElse(Double.NaN);
  }

  private static boolean warnsAtOnset(FlutterSolution s) {
    return s.warnings().stream().anyMatch(w -> w.contains("at the reduced frequency k = "));
  }

  @Test
  void golandWingWithEitherFormIsWithinThreeTenthsOfAPercentOfPk() {
    // The only difference between the methods is the rational fit (p-k uses Q(ik) itself, and is
    // checked against the published Goland figures in GolandWingTest), so the agreement measures the
    // fit; 0.3 % is the state-space method's target. Goland wing, 4 + 4 Ritz modes (n = 8), 40
    // strips, sea level. Roger: the defaults (4 lag roots, 32 aerodynamic states). Minimum state:
    // the automatic lag count 2 n = 16 (16 lag roots) and the settings' default uniform weighting.
    // Measured (m/s TAS): p-k 136.949, Roger -0.10 %, minimum state -0.15 % (the penalised fit).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.goland(4, 4, 40));
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 60, 240, 37));
    double pk = onset(new PkMethod().solve(sys, path, AnalysisOptions.defaults()));
    FlutterSolution roger = new StateSpaceMethod().solve(sys, path, options(RationalFitSettings.defaults()));
    FlutterSolution ms = new StateSpaceMethod().solve(sys, path, options(MINIMUM_STATE));
    String measured = "p-k " + pk + ", Roger " + onset(roger) + ", minimum state " + onset(ms);
    assertEquals(pk, onset(roger), 0.003 * pk, measured);
    assertEquals(pk, onset(ms), 0.003 * pk, measured);
    assertTrue(ms.warnings().get(0).contains("minimum-state form (Karpel), 16 lag roots"), ms.warnings().get(0));
    assertTrue(!warnsAtOnset(roger), roger.warnings().toString());
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("org.flexmargin.flutter.StateSpaceAgreementTest#cases")
  void typicalSectionsWithTheAutomaticMinimumStateFitAreWithinThreeTenthsOfAPercentOfPk(
      StateSpaceAgreementTest.Case c) {
    // As above, the automatic minimum-state lag count for n = 2 coordinates: 4 lag roots.
    // Measured: lpw -0.25 %, aft-mass +0.20 %, mass-ahead +0.25 %, heavy -0.15 %.
    AeroelasticSystem sys = ValidationCases.system(c.section());
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, c.fromMps(), c.toMps(), 41));
    double pk = onset(new PkMethod().solve(sys, path, AnalysisOptions.defaults()));
    FlutterSolution ms = new StateSpaceMethod().solve(sys, path, options(MINIMUM_STATE));
    assertEquals(pk, onset(ms), 0.003 * pk, c + ": p-k " + pk + ", minimum state " + onset(ms));
    assertTrue(!warnsAtOnset(ms), ms.warnings().toString());
  }

  @Test
  void theDefaultSettingsGiveTheResultsOfTheFixedFourLagFit() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    PlannedPath path = ValidationCases.lpwPath(3.0, 9.0, 31);
    FlutterSolution fixed = new StateSpaceMethod(4, 1.5).solve(sys, path, AnalysisOptions.defaults());
    FlutterSolution byOptions = new StateSpaceMethod().solve(sys, path, options(RationalFitSettings.defaults()));
    assertEquals(onset(fixed), onset(byOptions), 0.0);
    assertEquals(fixed.warnings(), byOptions.warnings());
    // settings given to the method win over the options'
    FlutterSolution own = new StateSpaceMethod(RationalFitSettings.defaults()).solve(sys, path, options(MINIMUM_STATE));
    assertEquals(onset(fixed), onset(own), 0.0);
  }

  @Test
  void settingsInTheOptionsChangeTheFit() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    RationalFitSettings twoLags = new RationalFitSettings(RationalFitForm.ROGER, 2, null, 0.0, 2.0, 21,
        FitWeighting.UNIFORM);
    StateSpaceMethod method = new StateSpaceMethod();
    assertEquals(2, method.fitFor(sys, options(twoLags)).lagCount());
    assertEquals(2.0, method.fitFor(sys, options(twoLags)).maxReducedFrequency(), 0.0);
    assertEquals(21, method.fitFor(sys, options(twoLags)).reducedFrequencies().length);
    assertEquals(4, method.fitFor(sys).lagCount());
    assertEquals(1.5, method.fitFor(sys).maxReducedFrequency(), 0.0);
  }

  @Test
  void aPoorFitChosenInTheSettingsIsReportedAtTheOnset() {
    // One lag root fitted over k in [0, 0.04] only, on the Lee, Price & Wong section whose flutter
    // reduced frequency is about 0.08 to 0.11: the fit extrapolates at the onset and its error there
    // exceeds 1 %; the default fit stays below 1 % (StateSpaceAgreementTest).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    PlannedPath path = ValidationCases.lpwPath(3.0, 9.0, 31);
    RationalFitSettings poor = new RationalFitSettings(RationalFitForm.ROGER, 1, null, 0.0, 0.04,
        RationalFitSettings.DEFAULT_POINTS, FitWeighting.UNIFORM);
    FlutterSolution sol = new StateSpaceMethod().solve(sys, path, options(poor));
    assertTrue(!Double.isNaN(onset(sol)), sol.warnings().toString());
    assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("at the reduced frequency k = ")
        && w.contains("exceeds 1.00 %")), sol.warnings().toString());
    assertTrue(!warnsAtOnset(new StateSpaceMethod().solve(sys, path, options(RationalFitSettings.defaults()))));
  }
}
