package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * Direction of a static crossing of the state-space model. Uncoupled modes whose divergence root
 * grows out of a lag root while the structural pair keeps oscillating ({@link
 * StateSpaceStaticNotesTest#lagSpringModes}: no branch follows that root, so only a note reports
 * it) diverge one after the other at q_D,i = omega_i^2 / q0_i (derived there). Each divergence is an
 * onset: one more real root with a positive real part after it than before, whatever the number of
 * states (odd with one mode and one lag state) and whichever divergence it is. Where the tracked
 * branch itself crosses zero (Q_ii(ik) = q0_i + i k d_i of PkClosedFormTest, strongly damped), the
 * crossing reports the divergence and no note repeats it.
 */
class StateSpaceStaticDirectionTest {

  /** Notes of a real root crossing zero, then the crossings of the branches, in words. */
  private static List<String> divergenceReports(AeroelasticSystem sys, StateSpaceMethod method, double vTo) {
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, vTo, 41));
    FlutterSolution sol = method.solve(sys, path, AnalysisOptions.defaults());
    List<String> out = new ArrayList<>();
    for (String w : sol.warnings()) {
      if (w.contains("static divergence")) {
        out.add(w);
      }
    }
    for (FlutterCrossing c : sol.crossings()) {
      out.add("branch " + c.branchName() + " " + c.kind() + " at q = "
          + String.format(Locale.ROOT, "%.6g Pa", c.condition().dynamicPressurePa()));
    }
    return out;
  }

  /** Modes diverging through their lag root ({@link StateSpaceStaticNotesTest#lagSpringModes}). */
  private static List<String> lagRootDivergences(double[] fHz, double[] q0, double[] lag, double vTo) {
    for (int i = 0; i < fHz.length; i++) {
      assertTrue(StateSpaceStaticNotesTest.oscillatesAtDivergence(fHz[i], q0[i], lag[i], PkClosedFormTest.RHO),
          "premise: mode " + i + " still oscillates at its divergence");
    }
    return divergenceReports(StateSpaceStaticNotesTest.lagSpringModes(fHz, q0, lag), new StateSpaceMethod(), vTo);
  }

  private static List<String> divergenceReports(double[] fHz, double[] q0, double[] d, int lags, double vTo) {
    AeroelasticSystem sys = PkClosedFormTest.system(fHz, q0, d, 0.001, 2.0);
    RationalFit fit = RogerApproximation.fit(sys.aero(), 1.0, lags);
    return divergenceReports(sys, new StateSpaceMethod(fit), vTo);
  }

  private static double qD(double fHz, double q0) {
    double w = 2 * Math.PI * fHz;
    return w * w / q0;
  }

  @Test
  void oneModeWithOneLagStateDivergesOnceAndItBegins() {
    double[] f = {2.0};
    double[] q0 = {0.002};
    double vd = Math.sqrt(2 * qD(2.0, 0.002) / PkClosedFormTest.RHO);
    List<String> reports = lagRootDivergences(f, q0, new double[] {-0.004}, 1.5 * vd);
    // the note alone reports it, to the six digits printed (half a unit of the sixth digit, 5e-6)
    assertEquals(1, reports.size(), reports.toString());
    assertTrue(reports.get(0).contains("static divergence begins"), reports.toString());
    assertEquals(1.0, q(reports.get(0)) / qD(2.0, 0.002), 5e-6, reports.toString());
  }

  /** The dynamic pressure a report names (Pa). */
  private static double q(String report) {
    return StateSpaceStaticNotesTest.notedPa(report);
  }

  @Test
  void theSecondOfTwoDivergencesBeginsToo() {
    double[] f = {2.0, 3.0};
    double[] q0 = {0.002, 0.003};
    double vd2 = Math.sqrt(2 * qD(3.0, 0.003) / PkClosedFormTest.RHO);
    List<String> reports = lagRootDivergences(f, q0, new double[] {-0.004, -0.006}, 1.3 * vd2);
    assertEquals(2, reports.size(), reports.toString());
    // both divergences are noted where the closed form puts them (5e-6: half a unit of the sixth
    // digit printed), and both begin
    assertEquals(1.0, q(reports.get(0)) / qD(2.0, 0.002), 5e-6, reports.toString());
    assertEquals(1.0, q(reports.get(1)) / qD(3.0, 0.003), 5e-6, reports.toString());
    assertEquals(2, reports.stream().filter(r -> r.contains("static divergence begins")).count(),
        reports.toString());
  }

  @Test
  void directionFollowsTheCountOfUnstableRealRoots() {
    assertTrue(StateSpaceMethod.direction(0, 1).startsWith("begins (the root"));
    assertTrue(StateSpaceMethod.direction(1, 2).startsWith("begins (the root"));
    assertTrue(StateSpaceMethod.direction(2, 1).startsWith("ends"));
    assertTrue(StateSpaceMethod.direction(1, 1).startsWith("begins or ends"));
  }

  @Test
  void aCrossingFollowedByATrackedRealBranchIsNotRepeatedAsANote() {
    // d = -2: the aerodynamic damping rho V b |d| / 2 (about 100 1/s near divergence) far exceeds
    // 2 sqrt(k - q q0), so the mode is overdamped, its roots real on both sides of the crossing,
    // and the tracked branch itself reports the divergence (one report, no static note)
    double vd = Math.sqrt(2 * qD(2.0, 0.002) / PkClosedFormTest.RHO);
    List<String> reports = divergenceReports(new double[] {2.0}, new double[] {0.002}, new double[] {-2.0}, 1,
        1.5 * vd);
    assertTrue(reports.stream().noneMatch(r -> r.contains("static divergence")), reports.toString());
    assertTrue(reports.stream().anyMatch(r -> Math.abs(q(r) / qD(2.0, 0.002) - 1) < 1e-4), reports.toString());
  }
}
