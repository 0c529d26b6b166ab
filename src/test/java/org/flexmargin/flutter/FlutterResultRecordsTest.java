package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.FlutterWorkspace.Root;
import org.flexmargin.model.FlutterMethodKind;
import org.junit.jupiter.api.Test;

/**
 * The small result types of the flutter solvers: crossing kinds, the g and zeta of a root, branch
 * curves, diagnostics, the first onset of a solution. Expected values follow from the definitions
 * in their Javadoc (g = 2 Re(s)/|Im(s)|, zeta = -Re(s)/|s|, f = |Im(s)|/(2 pi)).
 */
class FlutterResultRecordsTest {

  /** Sea-level standard atmosphere state (US Standard Atmosphere 1976, from memory). */
  private static FlightCondition seaLevel(double tas) {
    return new FlightCondition(0.0, 1.225, 101325.0, 288.15, 340.294, tas);
  }

  @Test
  void crossingKindFollowsTheLevelAndTheDirection() {
    assertEquals(CrossingKind.FLUTTER_ONSET, CrossingKind.of(0.0, true));
    assertEquals(CrossingKind.FLUTTER_RECOVERY, CrossingKind.of(0.0, false));
    assertEquals(CrossingKind.DAMPING_BELOW_LIMIT, CrossingKind.of(-0.03, true));
    assertEquals(CrossingKind.DAMPING_ABOVE_LIMIT, CrossingKind.of(-0.03, false));
    assertTrue(CrossingKind.FLUTTER_ONSET.isStabilityChange());
    assertTrue(CrossingKind.FLUTTER_RECOVERY.isStabilityChange());
    assertFalse(CrossingKind.DAMPING_BELOW_LIMIT.isStabilityChange());
    assertFalse(CrossingKind.DAMPING_ABOVE_LIMIT.isStabilityChange());
  }

  @Test
  void rootDampingAndFrequencyFollowTheirDefinitions() {
    // s = -3 + 4i: |s| = 5, g = 2 (-3)/4 = -1.5, zeta = 3/5, f = 4 / (2 pi)
    Root r = new Root(-3.0, 4.0, new double[] {1, 0}, 3, 1e-14, true);
    assertEquals(-1.5, r.dampingG(), 1e-15);
    assertEquals(0.6, r.dampingRatio(), 1e-15);
    assertEquals(4.0 / (2 * Math.PI), r.frequencyHz(), 1e-15);
    // crossing function 2 Re(s) - g |Im(s)|: at g = -1.5 it vanishes, as g(s) = -1.5
    assertEquals(0.0, r.crossingFunction(-1.5), 1e-15);
    assertEquals(-6.0 + 0.12, r.crossingFunction(-0.03), 1e-14);
    // the lower-half-plane conjugate has the same frequency, g and crossing function
    Root conj = new Root(-3.0, -4.0, new double[] {1, 0}, 3, 1e-14, true);
    assertEquals(-1.5, conj.dampingG(), 1e-15);
    assertEquals(4.0 / (2 * Math.PI), conj.frequencyHz(), 1e-15);
    assertEquals(-6.0 + 0.12, conj.crossingFunction(-0.03), 1e-14);
    // unstable: s = 1 + 2i, g = 1, zeta = -1/sqrt 5
    Root up = new Root(1.0, 2.0, new double[] {1, 0}, 3, 1e-14, true);
    assertEquals(1.0, up.dampingG(), 1e-15);
    assertEquals(-1 / Math.sqrt(5), up.dampingRatio(), 1e-15);
  }

  @Test
  void aNonOscillatingRootHasInfiniteGAndARootAtTheOriginNoDamping() {
    assertEquals(Double.POSITIVE_INFINITY, new Root(0.5, 0.0, new double[2], 0, 0, true).dampingG());
    assertEquals(Double.NEGATIVE_INFINITY, new Root(-0.5, 0.0, new double[2], 0, 0, true).dampingG());
    // a root at the origin is not unstable (Re s = 0 is not > 0): -infinity, never NaN from 0/0
    assertEquals(Double.NEGATIVE_INFINITY, new Root(0.0, 0.0, new double[2], 0, 0, true).dampingG());
    // real roots: zeta = -Re(s)/|s| = -sign(Re s)
    assertEquals(-1.0, new Root(0.5, 0.0, new double[2], 0, 0, true).dampingRatio(), 0.0);
    assertEquals(1.0, new Root(-0.5, 0.0, new double[2], 0, 0, true).dampingRatio(), 0.0);
    assertEquals(0.0, new Root(0.0, 0.0, new double[2], 0, 0, true).dampingRatio(), 0.0);
  }

  private static BranchCurve curve(int[] lengths) {
    return new BranchCurve("b", new double[lengths[0]], new double[lengths[1]], new double[lengths[2]],
        new double[lengths[3]], new double[lengths[4]], new double[lengths[5]], new double[lengths[6]],
        new boolean[lengths[7]]);
  }

  @Test
  void branchArraysOfUnequalLengthAreRejected() {
    assertEquals(3, curve(new int[] {3, 3, 3, 3, 3, 3, 3, 3}).size());
    for (int wrong = 1; wrong < 8; wrong++) {
      int[] lengths = {3, 3, 3, 3, 3, 3, 3, 3};
      lengths[wrong] = 2;
      int w = wrong;
      assertThrows(IllegalArgumentException.class, () -> curve(lengths), "array " + w);
    }
  }

  @Test
  void branchCurveCopiesItsArraysInAndOut() {
    double[] t = {0, 1};
    double[] eas = {10, 20};
    double[] tas = {11, 21};
    double[] f = {1, 2};
    double[] g = {-0.1, -0.2};
    double[] z = {0.05, 0.1};
    double[] k = {0.3, 0.4};
    boolean[] ok = {true, false};
    BranchCurve c = new BranchCurve("mode", t, eas, tas, f, g, z, k, ok);
    for (double[] a : List.of(t, eas, tas, f, g, z, k)) {
      a[0] = 99;
    }
    ok[0] = false;
    assertArrayEquals(new double[] {0, 1}, c.pathParameter());
    assertArrayEquals(new double[] {10, 20}, c.speedEasMps());
    assertArrayEquals(new double[] {11, 21}, c.speedTasMps());
    assertArrayEquals(new double[] {1, 2}, c.frequencyHz());
    assertArrayEquals(new double[] {-0.1, -0.2}, c.dampingG());
    assertArrayEquals(new double[] {0.05, 0.1}, c.dampingRatio());
    assertArrayEquals(new double[] {0.3, 0.4}, c.reducedFrequency());
    assertArrayEquals(new boolean[] {true, false}, c.converged());
    c.dampingG()[1] = 5;
    c.converged()[0] = false;
    assertEquals(-0.2, c.dampingG()[1], 0.0);
    assertTrue(c.converged()[0]);
  }

  @Test
  void diagnosticsWithoutATroublePointAreClean() {
    SolverDiagnostics clean = new SolverDiagnostics(4, 10, 1, 0, 1e-13, 1.0, 0);
    assertTrue(Double.isNaN(clean.firstTroublePathParameter()));
    assertFalse(clean.trackingTroubled());
    assertTrue(new SolverDiagnostics(4, 10, 1, 0, 1e-13, 1.0, 0, 3.0).trackingTroubled());
  }

  @Test
  void countersKeepTheEarliestTroubleAndTheReducedFrequencyRange() {
    SolveCounters c = new SolveCounters();
    assertFalse(c.toDiagnostics().trackingTroubled());
    c.trouble(5);
    c.trouble(7);
    assertEquals(5.0, c.toDiagnostics().firstTroublePathParameter(), 0.0);
    c.trouble(2);
    assertEquals(2.0, c.toDiagnostics().firstTroublePathParameter(), 0.0);
    c.noteReducedFrequency(0.4);
    assertEquals(0.4, c.minReducedFrequency, 0.0);
    assertEquals(0.4, c.maxReducedFrequency, 0.0);
    c.noteReducedFrequency(0.1);
    c.noteReducedFrequency(0.9);
    c.noteReducedFrequency(0.5);
    assertEquals(0.1, c.minReducedFrequency, 0.0);
    assertEquals(0.9, c.maxReducedFrequency, 0.0);
    c.rootSolves = 11;
    c.iterations = 12;
    c.fullEigenSolves = 13;
    c.stepHalvings = 14;
    c.maxResidual = 1e-11;
    c.minMac = 0.85;
    c.unconverged = 16;
    SolverDiagnostics d = c.toDiagnostics();
    assertEquals(11, d.rootSolves());
    assertEquals(12, d.iterations());
    assertEquals(13, d.fullEigenSolves());
    assertEquals(14, d.stepHalvings());
    assertEquals(1e-11, d.maxRelativeResidual(), 0.0);
    assertEquals(0.85, d.minMac(), 0.0);
    assertEquals(16, d.unconvergedRoots());
  }

  private static FlutterCrossing crossing(CrossingKind kind, double tas) {
    return new FlutterCrossing(0, "m", kind, tas / 10, seaLevel(tas), 3.0, 0.0, 5, 0.01);
  }

  @Test
  void firstOnsetIsTheSlowestOnsetAndIgnoresOtherKinds() {
    List<FlutterCrossing> list = new ArrayList<>();
    list.add(crossing(CrossingKind.DAMPING_BELOW_LIMIT, 50));
    list.add(crossing(CrossingKind.FLUTTER_RECOVERY, 60));
    list.add(crossing(CrossingKind.FLUTTER_ONSET, 120));
    list.add(crossing(CrossingKind.FLUTTER_ONSET, 90));
    list.add(crossing(CrossingKind.FLUTTER_ONSET, 150));
    FlutterSolution s = new FlutterSolution(FlutterMethodKind.PK, List.of(), list,
        new SolverDiagnostics(0, 0, 0, 0, 0, 1, 0), List.of());
    assertEquals(90.0, s.firstOnset().orElseThrow().condition().speedTasMps(), 0.0);
    list.clear();
    assertEquals(5, s.crossings().size(), "the solution keeps its own copy");
    FlutterSolution none = new FlutterSolution(FlutterMethodKind.PK, List.of(),
        List.of(crossing(CrossingKind.DAMPING_BELOW_LIMIT, 50)), new SolverDiagnostics(0, 0, 0, 0, 0, 1, 0),
        List.of());
    assertTrue(none.firstOnset().isEmpty());
  }

  @Test
  void divergenceTrueAirspeedFollowsFromTheDynamicPressure() {
    // V = sqrt(2 q / rho): q = 2000 Pa at rho = 0.8 gives V = sqrt(5000)
    double[] shape = {0.6, 0.8};
    DivergenceResult r = new DivergenceResult(true, 2000.0, Math.sqrt(4000 / 1.225), shape, 1e-15, 0.0, "");
    assertEquals(Math.sqrt(5000.0), r.speedTasMps(0.8), 1e-12);
    shape[0] = 9;
    r.shape()[1] = 9;
    assertArrayEquals(new double[] {0.6, 0.8}, r.shape(), 0.0);
    DivergenceResult none = new DivergenceResult(false, Double.NaN, Double.NaN, new double[2], Double.NaN, 0, "");
    assertTrue(Double.isNaN(none.speedTasMps(0.8)));
  }

  /** A path at sea-level TAS 10 t whose density at the last grid point is scaled by a factor. */
  private static FlightPath path(double lastDensityFactor) {
    return new FlightPath() {
      @Override
      public int gridPoints() {
        return 3;
      }

      @Override
      public FlightCondition at(double t) {
        double rho = t >= 2 ? 1.225 * lastDensityFactor : 1.225;
        return new FlightCondition(0.0, rho, 101325.0, 288.15, 340.294, 10 * t);
      }
    };
  }

  @Test
  void constantDensityAllowsOnlyRoundOffDifferences() {
    assertTrue(path(1.0).constantDensity());
    // 1e-13 relative is round-off of the atmosphere model, below the 1e-12 allowance
    assertTrue(path(1 + 1e-13).constantDensity());
    // the allowance is relative to the first density: 0.9e-12 inside it, 1.1e-12 outside
    assertTrue(path(1 + 0.9e-12).constantDensity());
    assertFalse(path(1 + 1.1e-12).constantDensity());
    assertFalse(path(1 + 1e-9).constantDensity());
    assertFalse(path(1 - 1e-9).constantDensity());
  }
}
