package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.loop.Eigenvalues;
import org.junit.jupiter.api.Test;

/** The margin grid is seeded at every structural mode, including one whose branch was lost. */
class ServoMarginSeedsTest {

  @Test
  void aLostBranchIsSeededAtItsNearestConvergedFrequency() {
    // mode A converged everywhere (10, 10.5, 11 Hz); mode B lost at points 1 and 2
    BranchCurve a = branch("a", new double[] {10, 10.5, 11}, new boolean[] {true, true, true});
    BranchCurve b = branch("b", new double[] {20, Double.NaN, Double.NaN}, new boolean[] {true, false, false});
    FlutterSolution ol = new FlutterSolution(FlutterMethodKind.PK, List.of(a, b), List.of(),
        new SolverDiagnostics(0, 0, 0, 0, 0, 1, 2), List.of());
    Eigenvalues s = ServoMargins.seeds(ol, 2);
    assertEquals(2, s.size(), "one seed per mode");
    // converged mode: its p-k root, zeta = 0.01 (s = -zeta w + j w sqrt(1 - zeta^2))
    assertEquals(2 * Math.PI * 11 * Math.sqrt(1 - 1e-4), s.imagAt(0), 1e-9);
    // lost mode: its frequency where it last converged, damping ratio of the seed spacing
    double w = 2 * Math.PI * 20;
    assertEquals(w, s.naturalFrequencyRadPerS(1), 1e-9);
    assertEquals(ServoMargins.LOST_MODE_SEED_DAMPING, s.dampingRatio(1), 1e-12);
  }

  @Test
  void closedLoopSeedsAreTheOscillatoryRoots() {
    ClosedLoopPoint p = new ClosedLoopPoint(0, null, List.of(new ClosedLoopRoot(-3, 0, "rigid body + loop"),
        new ClosedLoopRoot(0.01, 116.1, "fuselage_bending_2")), 4);
    Eigenvalues s = ServoMargins.closedLoopSeeds(p);
    assertEquals(1, s.size());
    assertEquals(116.1, s.imagAt(0), 0.0);
    assertTrue(s.realAt(0) > 0);
  }

  private static BranchCurve branch(String name, double[] hz, boolean[] ok) {
    int n = hz.length;
    double[] zeta = new double[n];
    java.util.Arrays.fill(zeta, 0.01);
    return new BranchCurve(name, new double[] {0, 1, 2}, new double[n], new double[n], hz, new double[n], zeta,
        new double[n], ok);
  }
}
