package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.model.FlutterMethodKind;
import org.junit.jupiter.api.Test;

/**
 * Labels of closed-loop roots on hand-made open-loop roots: the p-k root at s = -zeta w + j w
 * sqrt(1 - zeta^2), or the rigid short period, within 0.3 of its size; else rigid below half the
 * lowest structural frequency, the loop's own above.
 */
class LoopRootLabelUnitTest {
  /** Short-period roots far from everything below: -50 1/s twice (real). */
  private static final double[] FAR = {-50, 0, -50, 0};

  private static BranchCurve branch(String name, double hz, double zeta, boolean converged) {
    return new BranchCurve(name, new double[] {0}, new double[1], new double[1], new double[] {hz}, new double[1],
        new double[] {zeta}, new double[1], new boolean[] {converged});
  }

  private static FlutterSolution solution(BranchCurve... b) {
    return new FlutterSolution(FlutterMethodKind.PK, List.of(b), List.of(), new SolverDiagnostics(0, 0, 0, 0, 0, 1, 0),
        List.of());
  }

  @Test
  void aRootOnAHeavilyDampedStructuralRootTakesItsName() {
    // zeta = 0.8 at 6 Hz: s = w (-0.8 + 0.6 j)
    double w = 2 * Math.PI * 6;
    FlutterSolution ol = solution(branch("bend", 6, 0.8, true));
    assertEquals("bend", ClosedLoopSweep.label(-0.8 * w, 0.6 * w, ol, 0, FAR));
    // 0.2 |s| away: still that root
    assertEquals("bend", ClosedLoopSweep.label(-0.8 * w, 0.8 * w, ol, 0, FAR));
    // its mirror in the imaginary axis is 1.6 |s| away, and a root of the same |s| at zeta = 0.45
    // (s = w (-0.45 + 0.893 j)) is 0.46 |s| away: neither is near
    assertEquals("control loop", ClosedLoopSweep.label(0.8 * w, 0.6 * w, ol, 0, FAR));
    assertEquals("control loop", ClosedLoopSweep.label(-0.45 * w, Math.sqrt(1 - 0.45 * 0.45) * w, ol, 0, FAR));
    // a damping ratio beyond 0.99 is clamped there: s = w (-0.99 + 0.141 j)
    FlutterSolution over = solution(branch("bend", 6, 1.5, true));
    assertEquals("bend", ClosedLoopSweep.label(-0.99 * w, Math.sqrt(1 - 0.99 * 0.99) * w, over, 0, FAR));
  }

  @Test
  void onlyConvergedRootsAtThePointCount() {
    double w = 2 * Math.PI * 6;
    FlutterSolution lost = solution(branch("bend", 6, 0.01, false));
    // no converged root: no structural frequency, so everything is rigid + loop
    assertEquals("rigid body + loop", ClosedLoopSweep.label(-0.01 * w, w, lost, 0, FAR));
    // beyond the branch's points likewise
    FlutterSolution ok = solution(branch("bend", 6, 0.01, true));
    assertEquals("rigid body + loop", ClosedLoopSweep.label(-0.01 * w, w, ok, 1, FAR));
  }

  @Test
  void theFirstOfEquallyNearRootsKeepsTheLabel() {
    double w = 2 * Math.PI * 6;
    FlutterSolution twins = solution(branch("bend", 6, 0.1, true), branch("twin", 6, 0.1, true));
    double re = -0.1 * w;
    double im = Math.sqrt(1 - 0.01) * w;
    assertEquals("bend", ClosedLoopSweep.label(re, im, twins, 0, FAR));
    // a short period on the same spot does not take it from the structural root
    double[] sp = {re, -im, re, im};
    assertEquals("bend", ClosedLoopSweep.label(re, im, twins, 0, sp));
  }

  @Test
  void theShortPeriodIsJudgedRelativeToItsSize() {
    FlutterSolution ol = solution(branch("bend", 6, 0.01, true));
    // short period -3 +- 4j (|s| = 5), listed lower root first: a root 1 1/s away is 0.2 |s| away
    double[] sp = {-3, -4, -3, 4};
    assertEquals("short period", ClosedLoopSweep.label(-3, 5, ol, 0, sp));
    // 2 1/s away is 0.4 |s|: not the short period (|s| = 5.4 is below half of 37.7 rad/s)
    assertEquals("rigid body + loop", ClosedLoopSweep.label(-3, 6, ol, 0, sp));
    // an unstable airframe: two real roots, the second at -1 1/s
    double[] real = {2, 0, -1, 0};
    assertEquals("short period", ClosedLoopSweep.label(-1, 0.1, ol, 0, real));
  }

  @Test
  void farFromEveryOpenLoopRootTheSizeDecides() {
    // converged roots at 6 and 3 Hz, a lost one at 1 Hz: the lowest structural frequency is 3 Hz
    FlutterSolution ol = solution(branch("bend", 6, 0.01, true), branch("pitch", 3, 0.01, true),
        branch("lost", 1, 0.01, false));
    double half = 0.5 * (2 * Math.PI * 3);
    assertEquals("control loop", ClosedLoopSweep.label(0, half, ol, 0, FAR));
    assertEquals("rigid body + loop", ClosedLoopSweep.label(0, 0.99 * half, ol, 0, FAR));
    assertEquals("control loop", ClosedLoopSweep.label(-200, 0, ol, 0, FAR));
  }
}
