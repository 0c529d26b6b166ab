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
 * Direction of a static crossing of the state-space model: uncoupled modes with Q_ii(ik) = q0_i +
 * i k d_i (PkClosedFormTest; d_i < 0 is an aerodynamic damping, so no mode flutters) diverge one
 * after the other at q_D,i = k_i / q0_i = omega_i^2 / q0_i (unit generalized mass, derived: the
 * stiffness k_i - q q0_i vanishes). Each divergence is an onset: one more real root with a positive
 * real part after it than before, whatever the number of states (odd with one mode and one lag
 * state) and whichever divergence it is.
 */
class StateSpaceStaticDirectionTest {

  private static List<String> divergenceReports(double[] fHz, double[] q0, int lags, double vTo) {
    return divergenceReports(fHz, q0, negative(fHz.length), lags, vTo);
  }

  private static List<String> divergenceReports(double[] fHz, double[] q0, double[] d, int lags, double vTo) {
    AeroelasticSystem sys = PkClosedFormTest.system(fHz, q0, d, 0.001, 2.0);
    RationalFit fit = RogerApproximation.fit(sys.aero(), 1.0, lags);
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, vTo, 41));
    FlutterSolution sol = new StateSpaceMethod(fit).solve(sys, path, AnalysisOptions.defaults());
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

  private static double[] negative(int n) {
    double[] d = new double[n];
    java.util.Arrays.fill(d, -0.02);
    return d;
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
    List<String> reports = divergenceReports(f, q0, 1, 1.5 * vd);
    assertTrue(reports.stream().anyMatch(r -> Math.abs(q(r) / qD(2.0, 0.002) - 1) < 1e-4), reports.toString());
    assertTrue(reports.stream().noneMatch(r -> r.contains("ends")), reports.toString());
  }

  /** The dynamic pressure a report names. */
  private static double q(String report) {
    java.util.regex.Matcher m = java.util.regex.Pattern.compile("q = ([0-9.e+]+) Pa").matcher(report);
    return m.find() ? Double.parseDouble(m.group(1)) : Double.NaN;
  }

  @Test
  void theSecondOfTwoDivergencesBeginsToo() {
    double[] f = {2.0, 3.0};
    double[] q0 = {0.002, 0.003};
    double vd2 = Math.sqrt(2 * qD(3.0, 0.003) / PkClosedFormTest.RHO);
    List<String> reports = divergenceReports(f, q0, 2, 1.3 * vd2);
    assertTrue(reports.size() >= 2, reports.toString());
    assertTrue(reports.stream().noneMatch(r -> r.contains("ends")), reports.toString());
    // both divergences are found where the closed form puts them (5e-5: the crossing refinement)
    for (double qd : new double[] {qD(2.0, 0.002), qD(3.0, 0.003)}) {
      assertTrue(reports.stream().anyMatch(r -> Math.abs(q(r) / qd - 1) < 5e-5), qd + " in " + reports);
    }
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
