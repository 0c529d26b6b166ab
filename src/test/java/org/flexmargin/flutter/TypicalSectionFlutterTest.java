package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * Flutter of the Lee, Price &amp; Wong typical section with exact Theodorsen aerodynamics, by the
 * p-k and k methods.
 */
class TypicalSectionFlutterTest {

  // docs/validation.md §5.1 [derived]: exact Theodorsen, k method and p-k with continuation:
  // U* = U/(b omega_alpha) = 6.2566, omega/omega_alpha = 0.5233. The paper's 6.2851 uses the
  // Jones two-lag approximation of Theodorsen's function (Lee, Price & Wong, Prog. Aerosp. Sci. 35,
  // 1999; from memory).
  private static final double U_STAR_FLUTTER = 6.2566;
  private static final double FREQ_RATIO_FLUTTER = 0.5233;

  @Test
  void pkFindsTheFlutterSpeedOfTheLpwSection() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    PlannedPath path = ValidationCases.lpwPath(2.0, 8.0, 31);
    FlutterSolution sol = new PkMethod().solve(sys, path, AnalysisOptions.defaults());
    List<FlutterCrossing> onsets = sol.crossings().stream()
        .filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET).toList();
    assertEquals(1, onsets.size(), "one flutter onset expected, got " + sol.crossings());
    FlutterCrossing c = onsets.get(0);
    double uStar = c.condition().speedTasMps() / ValidationCases.LPW_OMEGA_ALPHA;
    double ratio = 2 * Math.PI * c.frequencyHz() / ValidationCases.LPW_OMEGA_ALPHA;
    // 1e-3 relative: the reference has 5 significant digits; the onset is refined to 0.01 m/s
    assertEquals(U_STAR_FLUTTER, uStar, 1e-3 * U_STAR_FLUTTER);
    // 2e-3 relative on frequency: 4 significant digits in the reference
    assertEquals(FREQ_RATIO_FLUTTER, ratio, 2e-3 * FREQ_RATIO_FLUTTER);
    assertEquals(0, sol.diagnostics().unconvergedRoots());
    // the coupled mode shapes turn along the sweep (MAC below 1) and every accepted step is clean
    // (MAC at least 0.8, PkMethod documentation)
    double mac = sol.diagnostics().minMac();
    assertTrue(mac >= 0.8 && mac < 1 - 1e-6, "lowest step MAC " + mac);
  }

  @Test
  void trackingIsIndependentOfTheGridDensity() {
    // Mode-tracking regression: coarse steps must not jump branches (docs/validation.md §5.1, tracking pitfall).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    double coarse = onset(sys, ValidationCases.lpwPath(2.0, 8.0, 7));
    double fine = onset(sys, ValidationCases.lpwPath(2.0, 8.0, 121));
    // both refined to 0.01 m/s on a ~393 m/s onset: agree to 1e-4 relative
    assertEquals(fine, coarse, 1e-4 * fine);
  }

  @Test
  void kMethodZeroDampingPointCoincidesWithPk() {
    // Property: at g = 0 the k-method equation and the p-k equation are the same equation, so
    // the two methods must agree at flutter (Hassig 1971; Bisplinghoff, Ashley & Halfman §9.6).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    PlannedPath path = ValidationCases.lpwPath(2.0, 8.0, 31);
    AnalysisOptions options = AnalysisOptions.defaults();
    double pk = onset(sys, path);
    FlutterSolution k = new KMethod().solve(sys, path, options.withMethod(FlutterMethodKind.K));
    FlutterCrossing kOnset = k.crossings().stream()
        .filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET).findFirst().orElseThrow();
    // 1e-5 relative: both refined far below that; the equations coincide exactly at g = 0
    assertEquals(pk, kOnset.condition().speedTasMps(), 1e-5 * pk);
    double uStar = kOnset.condition().speedTasMps() / ValidationCases.LPW_OMEGA_ALPHA;
    assertEquals(U_STAR_FLUTTER, uStar, 1e-3 * U_STAR_FLUTTER);
    assertFalse(k.warnings().isEmpty(), "k method must warn that its damping is artificial");
  }

  @Test
  void dampingCurvesAreStableBelowAndUnstableAboveFlutter() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    FlutterSolution sol = new PkMethod().solve(sys, ValidationCases.lpwPath(2.0, 8.0, 31),
        AnalysisOptions.defaults());
    double[] eas = sol.branches().get(0).speedTasMps();
    boolean anyUnstable = false;
    for (BranchCurve b : sol.branches()) {
      double[] g = b.dampingG();
      for (int i = 0; i < g.length; i++) {
        if (eas[i] / ValidationCases.LPW_OMEGA_ALPHA < 6.2) {
          assertTrue(g[i] < 1e-9, b.name() + " unstable below flutter at point " + i);
        }
        anyUnstable |= g[i] > 0;
      }
    }
    assertTrue(anyUnstable);
  }

  private static double onset(AeroelasticSystem sys, PlannedPath path) {
    return new PkMethod().solve(sys, path, AnalysisOptions.defaults()).crossings().stream()
        .filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET)
        .findFirst().orElseThrow().condition().speedTasMps();
  }
}
