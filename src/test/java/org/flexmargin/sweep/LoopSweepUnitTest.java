package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.RationalFits;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;
import org.junit.jupiter.api.Test;

/**
 * Closed-loop eigenvalues and onsets of the small section of {@link LoopTestSection}: with the
 * mode uncoupled from the elevator its closed-loop root is the closed-form root of the section
 * (the loop cannot move it), and its onsets are those of the closed form; with the elevator
 * driving the mode the onset is a crossing of -1 by the exact loop.
 */
class LoopSweepUnitTest {
  private static final AnalysisOptions OPTIONS = AnalysisOptions.defaults();
  private static final LoopSpec LOOP = LoopTestSection.loop(0.1);
  private static final double W_BEND = 2 * Math.PI * LoopTestSection.FREQUENCY_HZ;

  private static ClosedLoopResult sweep(Configuration cfg) {
    return sweep(cfg, LoopTestSection.path(), OPTIONS);
  }

  private static ClosedLoopResult sweep(Configuration cfg, PlannedPath path, AnalysisOptions options) {
    ConfigurationModel m = ConfigurationModel.of(cfg);
    FlutterSolution ol = new PkMethod().solve(m.system(), path, options);
    return new ClosedLoopSweep().analyse(m, cfg, LOOP, path, ol, options);
  }

  /** Speed where the mode's g = 2 sigma / w_d reaches -0.03 (Commons Math's Brent solver on the closed form). */
  private static double dampingLimitSpeed() {
    return LoopTestSection.dampingLimitSpeedMps(LoopTestSection.FREQUENCY_HZ, LoopTestSection.DAMPING_SLOPE_M2);
  }

  private static ClosedLoopRoot nearest(ClosedLoopPoint p, double re, double im) {
    ClosedLoopRoot best = null;
    for (ClosedLoopRoot r : p.roots()) {
      if (best == null || Math.hypot(r.realPerS() - re, r.imagRadPerS() - im)
          < Math.hypot(best.realPerS() - re, best.imagRadPerS() - im)) {
        best = r;
      }
    }
    return best;
  }

  @Test
  void aModeTheLoopDoesNotDriveKeepsItsClosedFormRootAndOnsets() {
    ClosedLoopResult r = sweep(LoopTestSection.configuration(0));
    assertEquals(9, r.points().size());
    for (ClosedLoopPoint p : r.points()) {
      // states: alpha, q, the mode (2), four lag states of one mode, the first-order actuator
      assertEquals(9, p.states());
      double[] s = LoopTestSection.modeRoot(p.condition().speedEasMps());
      ClosedLoopRoot bend = nearest(p, s[0], s[1]);
      // the least-squares fit holds the linear table to round-off: 1e-5 1/s of a 37.7 rad/s root
      assertEquals(s[0], bend.realPerS(), 1e-5, "at " + p.condition().speedEasMps());
      assertEquals(s[1], bend.imagRadPerS(), 1e-5);
      assertEquals("bend", bend.label());
      for (int i = 0; i < p.roots().size(); i++) {
        ClosedLoopRoot x = p.roots().get(i);
        assertTrue(x.imagRadPerS() >= 0, "only the upper half plane is listed");
        assertTrue(i == 0 || x.imagRadPerS() >= p.roots().get(i - 1).imagRadPerS(), "ascending frequency");
        double size = Math.hypot(x.realPerS(), x.imagRadPerS());
        // roots near no open-loop root: below half the first elastic frequency rigid, above the loop's
        if (x.label().equals("rigid body + loop")) {
          assertTrue(size < 0.5 * W_BEND, x.toString());
        }
        if (x.label().equals("control loop")) {
          assertTrue(size >= 0.5 * 37.69, x.toString());
        }
      }
      // the first-order actuator's root (-62.8 1/s open loop) is a loop root
      assertTrue(p.roots().stream().anyMatch(x -> x.label().equals("control loop")), p.roots().toString());
    }
    assertTrue(r.points().get(0).roots().stream().anyMatch(x -> x.label().equals("short period")));
    // the onset: total damping zero at V_F (closed form); Brent to 0.01 m/s on a grid of 10 m/s
    FlutterCrossing onset = r.crossings().stream().filter(x -> x.kind() == CrossingKind.FLUTTER_ONSET)
        .findFirst().orElseThrow();
    assertEquals(LoopTestSection.flutterSpeedMps(), onset.condition().speedEasMps(), 0.02);
    assertEquals("bend", onset.branchName());
    assertEquals(0.0, onset.thresholdG(), 0.0);
    // at the onset sigma = 0, so the frequency is the in-vacuo one (sigma ~ 1e-4 1/s there: 1e-6 Hz)
    assertEquals(LoopTestSection.FREQUENCY_HZ, onset.frequencyHz(), 1e-4);
    // the damping-limit crossing: 2 sigma + 0.03 w_d = 0 (g = 2 sigma / w_d = -0.03), the speed found
    // independently by Commons Math's Brent solver on the closed-form root
    double vLimit = dampingLimitSpeed();
    FlutterCrossing limit = r.crossings().stream().filter(x -> x.kind() == CrossingKind.DAMPING_BELOW_LIMIT)
        .findFirst().orElseThrow();
    assertEquals(vLimit, limit.condition().speedEasMps(), 0.02);
    assertEquals(-0.03, limit.thresholdG(), 0.0);
    assertEquals(LoopTestSection.FREQUENCY_HZ, limit.frequencyHz(), 0.01);
    // Brent's tolerance on the path parameter: 0.01 m/s over a 10 m/s interval
    assertEquals(0.001, limit.bracketWidth(), 1e-15);
    assertEquals(0.001, onset.bracketWidth(), 1e-15);
    assertTrue(limit.evaluations() > 1 && limit.evaluations() < 60, "evaluations " + limit.evaluations());
    assertEquals(2, r.crossings().size(), r.crossings().toString());
    assertTrue(r.crossings().get(0).pathParameter() < r.crossings().get(1).pathParameter());
    // the loop cannot reach the mode, so the exact loop has no crossing of -1 there: said, not hidden
    assertEquals(1, r.refinements().size());
    OnsetRefinement refinement = r.refinements().get(0);
    assertFalse(refinement.confirmed());
    assertEquals(onset, refinement.rational());
    // the onset root is the open-loop root itself, on the axis: the aircraft's response is singular
    assertTrue(refinement.remark().startsWith("the exact loop cannot be evaluated at the onset"), refinement.remark());
    assertTrue(Double.isNaN(refinement.residual()));
    assertEquals("closed-loop state space", r.routeOf(onset));
    assertTrue(r.warnings().stream().anyMatch(w -> w.startsWith(String.format(java.util.Locale.ROOT,
        "closed-loop flutter onset of bend at %.2f m/s EAS (rational model) not confirmed on the exact loop: ",
        onset.condition().speedEasMps()))), r.warnings().toString());
    // every refinement step tracked its one root: the full eigen-solves are the grid points'
    assertEquals(9, r.eigenSolves());
    // fitted up to k = 1.5 w_max b / V_min = 1.5 x 2 pi 6 x 0.5 / 10 = 2.827 (below the table's 4)
    assertTrue(r.fitDescription().contains("4 lag roots, k from 0 to 2.827"), r.fitDescription());
    assertTrue(r.assumptions().stream().anyMatch(a -> a.contains("Pade approximation (order 2)")));
  }

  @Test
  void aModeDrivenByTheElevatorFluttersWhereTheExactLoopPassesThroughMinusOne() {
    Configuration cfg = LoopTestSection.configuration(0.02);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = LoopTestSection.path();
    ClosedLoopResult r = sweep(cfg);
    assertEquals(1, r.refinements().size(), r.refinements().toString());
    OnsetRefinement o = r.refinements().get(0);
    assertTrue(o.confirmed(), o.remark());
    FlutterCrossing exact = o.exact().orElseThrow();
    assertTrue(r.crossings().contains(exact));
    assertTrue(r.routeOf(exact).startsWith("exact frequency-domain loop"), r.routeOf(exact));
    assertTrue(r.warnings().isEmpty(), r.warnings().toString());
    // the loop moves the onset away from the open-loop V_F (61.55 m/s)
    assertTrue(Math.abs(exact.condition().speedEasMps() - LoopTestSection.flutterSpeedMps()) > 0.1);
    // 1 + L(j w) = 0 at the exact onset, L evaluated here on its own (Newton's residual 1e-9)
    double[] l = new double[2];
    ServoMargins.loopAt(m, cfg, LOOP, exact.condition()).brokenLoop().response(2 * Math.PI * exact.frequencyHz(), l);
    assertEquals(0.0, Math.hypot(1 + l[0], l[1]), 1e-8);
    // the rational model is the same loop here (linear table, no delay): both onsets agree to the
    // Brent tolerance of the rational one (0.01 m/s)
    assertEquals(exact.condition().speedEasMps(), o.rational().condition().speedEasMps(), 0.02);
    assertEquals(exact.frequencyHz(), o.rational().frequencyHz(), 1e-4);
    // and the closed-loop matrix there has a root on the axis at that frequency (Commons Math's
    // eigen-decomposition; 1e-3 1/s: d(Re s)/dV is ~0.012 1/s per m/s here, times 0.01 m/s, and more)
    RationalAerodynamics rational = RationalAerodynamics.of(RationalFits.fit(m.system().aero(), OPTIONS.rationalFit(),
        2.0));
    double[][] arr = toArray(ServoMargins.loopAt(m, cfg, LOOP, exact.condition()).closedLoop(rational).a());
    EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(arr));
    double best = Double.MAX_VALUE;
    for (int i = 0; i < arr.length; i++) {
      best = Math.min(best, Math.hypot(eig.getRealEigenvalues()[i], eig.getImagEigenvalues()[i]
          - 2 * Math.PI * exact.frequencyHz()));
    }
    assertTrue(best < 1e-3, "nearest root " + best);
  }

  @Test
  void theResultDoesNotDependOnTheNumberOfThreads() throws Exception {
    // without a damping limit only the g = 0 crossing is sought
    Configuration cfg = LoopTestSection.configuration(-0.02);
    AnalysisOptions noLimit = new AnalysisOptions(OPTIONS.method(), 0.0, OPTIONS.convergenceTolerance(),
        OPTIONS.maxIterations(), OPTIONS.onsetSpeedToleranceMps(), OPTIONS.kMethodMinReducedFrequency(),
        OPTIONS.kMethodMaxReducedFrequency(), OPTIONS.kMethodPoints());
    ForkJoinPool one = new ForkJoinPool(1);
    try {
      ClosedLoopResult single = one.submit(() -> sweep(cfg, LoopTestSection.path(), noLimit)).get();
      ClosedLoopResult several = sweep(cfg, LoopTestSection.path(), noLimit);
      assertEquals(1, several.crossings().size(), several.crossings().toString());
      assertEquals(CrossingKind.FLUTTER_ONSET, several.crossings().get(0).kind());
      assertEquals(single.points(), several.points());
      assertEquals(single.crossings(), several.crossings());
      assertEquals(single.refinements(), several.refinements());
      assertEquals(single.warnings(), several.warnings());
    } finally {
      one.shutdown();
    }
  }

  @Test
  void crossingsOfTwoModesComeInSpeedOrder() {
    // bend: limit 15.4, onset 61.5 m/s; twist: limit 18.8, onset 75.0 m/s (closed forms), so the
    // crossings of the two branches interleave along the path
    ClosedLoopResult r = sweep(LoopTestSection.twoModes());
    assertEquals(4, r.crossings().size(), r.crossings().toString());
    double twistLimit = LoopTestSection.dampingLimitSpeedMps(LoopTestSection.TWIST_HZ, LoopTestSection.TWIST_SLOPE_M2);
    double twistOnset = LoopTestSection.flutterSpeedMps(LoopTestSection.TWIST_HZ, LoopTestSection.TWIST_SLOPE_M2);
    double[] expected = {dampingLimitSpeed(), twistLimit, LoopTestSection.flutterSpeedMps(), twistOnset};
    String[] names = {"bend", "twist", "bend", "twist"};
    for (int i = 0; i < 4; i++) {
      // Brent to 0.01 m/s along the path
      assertEquals(expected[i], r.crossings().get(i).condition().speedEasMps(), 0.02, "crossing " + i);
      assertEquals(names[i], r.crossings().get(i).branchName());
    }
    // the exact-loop refinements follow the same order
    assertEquals(2, r.refinements().size());
    // each point lists its roots by frequency, then by real part (real roots share frequency 0),
    // whatever order the eigen-solver found them in; this model has several real roots (lags)
    for (ClosedLoopPoint p : r.points()) {
      List<ClosedLoopRoot> roots = p.roots();
      long real = roots.stream().filter(q -> q.imagRadPerS() == 0).count();
      assertTrue(real >= 2, "real roots at " + p.condition() + ": " + real);
      for (int i = 1; i < roots.size(); i++) {
        ClosedLoopRoot a = roots.get(i - 1);
        ClosedLoopRoot b = roots.get(i);
        assertTrue(a.imagRadPerS() < b.imagRadPerS()
            || (a.imagRadPerS() == b.imagRadPerS() && a.realPerS() <= b.realPerS()), "at " + p.condition() + ": " + roots);
      }
    }
    assertEquals("bend", r.refinements().get(0).rational().branchName());
    assertEquals("twist", r.refinements().get(1).rational().branchName());
  }

  @Test
  void anExactCrossingFarFromTheRootsFrequencyIsNotTakenForIt() {
    // gain 3 with a 0.05 s delay: the rigid loop itself goes unstable near 4.1 Hz as the speed
    // (and with it the pitch response) grows; the exact loop confirms it
    LoopSpec delayed = LoopTestSection.loop(3, 0.05);
    Configuration cfg = LoopTestSection.configuration(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = LoopTestSection.path();
    FlutterSolution ol = new PkMethod().solve(m.system(), path, OPTIONS);
    ClosedLoopResult r = new ClosedLoopSweep().analyse(m, cfg, delayed, path, ol, OPTIONS);
    OnsetRefinement loopOnset = r.refinements().stream().filter(OnsetRefinement::confirmed).findFirst().orElseThrow();
    FlutterCrossing exact = loopOnset.exact().orElseThrow();
    double[] l = new double[2];
    ServoMargins.loopAt(m, cfg, delayed, exact.condition()).brokenLoop().response(2 * Math.PI * exact.frequencyHz(), l);
    assertEquals(0.0, Math.hypot(1 + l[0], l[1]), 1e-8);
    // started 15 % off in frequency Newton finds the same crossing, which lies within 20 % of the
    // start: confirmed; started 30 % off it finds it too, but that is too far to be the same root
    FlutterCrossing x = loopOnset.rational();
    for (double factor : new double[] {0.85, 1.15, 0.7, 1.3}) {
      FlutterCrossing start = new FlutterCrossing(x.branch(), x.branchName(), x.kind(), x.pathParameter(),
          x.condition(), factor * x.frequencyHz(), 0.0, x.evaluations(), x.bracketWidth());
      OnsetRefinement o = ClosedLoopSweep.onExactLoop(m, cfg, delayed, path, start);
      if (Math.abs(factor - 1) < 0.2) {
        assertTrue(o.confirmed(), o.remark());
        assertEquals(exact.frequencyHz(), o.exact().orElseThrow().frequencyHz(), 1e-6);
        assertEquals(exact.pathParameter(), o.exact().orElseThrow().pathParameter(), 1e-6);
      } else {
        assertFalse(o.confirmed());
        assertTrue(o.remark().startsWith(String.format(java.util.Locale.ROOT, "the nearest crossing of -1 by the "
            + "exact loop is at %.3f Hz, not near the root's %.3f Hz", exact.frequencyHz(), start.frequencyHz())),
            o.remark());
      }
    }
  }

  @Test
  void anOnsetWhereTheFitIsPoorIsNamedInAWarning() {
    // the real part of the table alternates in sign from node to node (0, 0.5, -0.5, 0.5, 0 at
    // k = 0, 0.5, 1, 2, 4): no rational function with four lag roots follows that within 1 %
    double[] ks = {0, 0.5, 1, 2, 4};
    double[] wiggle = {0, 0.5, -0.5, 0.5, 0};
    double[][][] re = new double[ks.length][1][1];
    double[][][] im = new double[ks.length][1][1];
    for (int i = 0; i < ks.length; i++) {
      re[i][0][0] = wiggle[i];
      im[i][0][0] = LoopTestSection.DAMPING_SLOPE_M2 * ks[i];
    }
    Configuration smooth = LoopTestSection.configuration(0.02);
    Configuration cfg = new Configuration("wiggly", smooth.structure(), new org.flexmargin.model.GafTable(
        LoopTestSection.SEMICHORD_M, 0.0, List.of("bend"), ks, re, im), smooth.rigidBody());
    ClosedLoopResult r = sweep(cfg);
    FlutterCrossing onset = r.refinements().get(0).rational();
    assertTrue(r.warnings().stream().anyMatch(w -> w.startsWith("rational fit error") && w.contains(String.format(
        java.util.Locale.ROOT, "of the closed-loop flutter onset of %s at %.2f m/s EAS exceeds 1.00 %%",
        onset.branchName(), onset.condition().speedEasMps()))), r.warnings().toString());
  }

  @Test
  void aRealOrNearlyStillRootHasNothingToRefineOnTheExactLoop() {
    Configuration cfg = LoopTestSection.configuration(0.02);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = LoopTestSection.path();
    for (double hz : new double[] {0.0, 0.5 * ServoMargins.MIN_FREQUENCY_HZ}) {
      FlutterCrossing x = new FlutterCrossing(0, "rigid body + loop", CrossingKind.FLUTTER_ONSET, 2.5, path.at(2.5), hz,
          0.0, 3, 0.001);
      OnsetRefinement r = ClosedLoopSweep.onExactLoop(m, cfg, LOOP, path, x);
      assertFalse(r.confirmed());
      assertEquals(0, r.iterations());
      assertTrue(Double.isNaN(r.residual()));
      assertTrue(r.remark().startsWith("a real closed-loop root (no oscillation)"), r.remark());
    }
    // at the lowest analysed frequency itself Newton is tried (and finds nothing there)
    FlutterCrossing low = new FlutterCrossing(0, "rigid body + loop", CrossingKind.FLUTTER_ONSET, 2.5, path.at(2.5),
        ServoMargins.MIN_FREQUENCY_HZ, 0.0, 3, 0.001);
    OnsetRefinement tried = ClosedLoopSweep.onExactLoop(m, cfg, LOOP, path, low);
    assertFalse(tried.confirmed());
    assertTrue(tried.iterations() > 0, tried.remark());
    assertTrue(tried.remark().contains("did not converge"), tried.remark());
  }

  @Test
  void downTheSpeedsTheSameSpeedsAreARecoveryAndADampingRise() {
    // the points of the path in reverse order, 90 down to 10 m/s EAS at sea level
    List<org.flexmargin.model.SweepPoint> down = new java.util.ArrayList<>();
    for (int v = 90; v >= 10; v -= 10) {
      down.add(new org.flexmargin.model.SweepPoint(0, v, org.flexmargin.model.AirspeedKind.EQUIVALENT));
    }
    PlannedPath path = new PlannedPath(new org.flexmargin.model.PointList(down));
    ClosedLoopResult r = sweep(LoopTestSection.configuration(0), path, OPTIONS);
    assertEquals(2, r.crossings().size(), r.crossings().toString());
    FlutterCrossing recovery = r.crossings().get(0);
    assertEquals(CrossingKind.FLUTTER_RECOVERY, recovery.kind());
    assertEquals(LoopTestSection.flutterSpeedMps(), recovery.condition().speedEasMps(), 0.02);
    FlutterCrossing rise = r.crossings().get(1);
    assertEquals(CrossingKind.DAMPING_ABOVE_LIMIT, rise.kind());
    assertEquals(dampingLimitSpeed(), rise.condition().speedEasMps(), 0.02);
    assertTrue(r.warnings().stream().anyMatch(w -> w.startsWith("closed-loop flutter recovery of bend at ")),
        r.warnings().toString());
  }

  @Test
  void aRootBetweenTwoEquallyNearRootsIsTakenFromTheFullSolve() {
    // a real shift halfway along a conjugate pair is equally near both: inverse iteration cannot
    // settle, so the full eigen-solve (counted) gives the nearest root: the short period at 10 m/s,
    // checked against Commons Math's eigen-decomposition of the same matrix
    Configuration cfg = LoopTestSection.configuration(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = LoopTestSection.path();
    RationalAerodynamics rational = RationalAerodynamics.of(RationalFits.fit(m.system().aero(), OPTIONS.rationalFit(),
        2.827));
    DMatrixRMaj a = ServoMargins.loopAt(m, cfg, LOOP, path.at(0)).closedLoop(rational).a();
    EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(toArray(a)));
    double[] re = eig.getRealEigenvalues();
    double[] im = eig.getImagEigenvalues();
    int sp = -1;
    for (int i = 0; i < re.length; i++) {
      // the slow oscillatory pair: the short period (|s| < 1 1/s at 10 m/s)
      if (im[i] > 0 && Math.hypot(re[i], im[i]) < 1) {
        sp = i;
      }
    }
    assertTrue(sp >= 0);
    double[] out = new double[2];
    int[] solves = {0};
    ClosedLoopSweep.rootNear(m, cfg, LOOP, path.at(0), rational, re[sp], 0, re[sp], 0, 0.5, out, solves);
    assertEquals(1, solves[0], "one full solve");
    // round-off of two eigen-solvers on a 9 x 9 matrix
    assertEquals(re[sp], out[0], 1e-9);
    assertEquals(im[sp], Math.abs(out[1]), 1e-9);
    // a shift near one root alone is tracked without a full solve
    int[] tracked = {0};
    ClosedLoopSweep.rootNear(m, cfg, LOOP, path.at(0), rational, re[sp], im[sp] + 0.01, re[sp], im[sp] - 0.01, 0.5,
        out, tracked);
    assertEquals(0, tracked[0]);
    assertEquals(re[sp], out[0], 1e-9);
    assertEquals(im[sp], out[1], 1e-9);
    // between the short period and the mode's root (37.7 rad/s) the point at a tenth of the way is
    // nearest the short period, at nine tenths nearest the mode's root
    int bend = -1;
    for (int i = 0; i < re.length; i++) {
      if (im[i] > 30) {
        bend = i;
      }
    }
    assertTrue(bend >= 0);
    ClosedLoopSweep.rootNear(m, cfg, LOOP, path.at(0), rational, re[sp], im[sp], re[bend], im[bend], 0.1, out, tracked);
    assertEquals(re[sp], out[0], 1e-9);
    assertEquals(im[sp], out[1], 1e-9);
    ClosedLoopSweep.rootNear(m, cfg, LOOP, path.at(0), rational, re[sp], im[sp], re[bend], im[bend], 0.9, out, tracked);
    assertEquals(re[bend], out[0], 1e-9);
    assertEquals(im[bend], out[1], 1e-9);
    // along the real axis, from the fastest real root nine tenths of the way to the slowest: the
    // real root nearest that point
    double fastest = 0;
    double slowest = -Double.MAX_VALUE;
    for (int i = 0; i < re.length; i++) {
      if (im[i] == 0) {
        fastest = Math.min(fastest, re[i]);
        slowest = Math.max(slowest, re[i]);
      }
    }
    double point = fastest + 0.9 * (slowest - fastest);
    double want = fastest;
    for (int i = 0; i < re.length; i++) {
      if (im[i] == 0 && Math.abs(re[i] - point) < Math.abs(want - point)) {
        want = re[i];
      }
    }
    assertTrue(want != fastest && want != slowest, "an inner root: " + want);
    ClosedLoopSweep.rootNear(m, cfg, LOOP, path.at(0), rational, fastest, 0, slowest, 0, 0.9, out, tracked);
    assertEquals(want, out[0], 1e-9 * Math.abs(want));
    assertEquals(0, out[1], 1e-9);
  }

  private static double[][] toArray(DMatrixRMaj a) {
    double[][] arr = new double[a.numRows][a.numCols];
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        arr[i][j] = a.get(i, j);
      }
    }
    return arr;
  }

  @Test
  void theNearestEigenvalueIsPicked() {
    org.flexmargin.loop.Eigenvalues e = new org.flexmargin.loop.Eigenvalues(new double[] {-1, -0.2, -0.2, -5},
        new double[] {0, 10, -10, 3});
    double[] out = new double[2];
    ClosedLoopSweep.nearest(e, -0.3, 9, out);
    assertEquals(-0.2, out[0], 0.0);
    assertEquals(10, out[1], 0.0);
    ClosedLoopSweep.nearest(e, -4, 2, out);
    assertEquals(-5, out[0], 0.0);
    assertEquals(3, out[1], 0.0);
    // the first of two equally near roots stays
    ClosedLoopSweep.nearest(new org.flexmargin.loop.Eigenvalues(new double[] {-1, 1}, new double[] {0, 0}), 0, 0, out);
    assertEquals(-1, out[0], 0.0);
  }
}
