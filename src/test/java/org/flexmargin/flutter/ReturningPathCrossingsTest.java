package org.flexmargin.flutter;

import static org.flexmargin.flutter.PkClosedFormTest.B;
import static org.flexmargin.flutter.PkClosedFormTest.D;
import static org.flexmargin.flutter.PkClosedFormTest.F_HZ;
import static org.flexmargin.flutter.PkClosedFormTest.Q0;
import static org.flexmargin.flutter.PkClosedFormTest.RHO;
import static org.flexmargin.flutter.PkClosedFormTest.ZETA;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.AnalysisOptions;
import org.junit.jupiter.api.Test;

/**
 * Crossings on a path that accelerates and then decelerates at one altitude (true airspeed
 * 20 -&gt; 200 -&gt; 20 m/s, linear in the path parameter on each leg), on the uncoupled modes of
 * {@link PkClosedFormTest}: each mode's damping rises through the limit and through zero on the
 * way out and falls back through both on the way back, at the closed-form speeds (V_F = 2 c /
 * (rho b d); the limit speed solves 2 sigma + g_lim omega = 0 with the closed-form root, by Brent
 * here). Checked for the p-k and the state-space methods, for which Q(ik) = q0 + i k d is exact.
 */
class ReturningPathCrossingsTest {

  private static final double V0 = 20;
  private static final double RATE = 20;
  private static final int TURN = 9;

  private static double speed(double t) {
    return t <= TURN ? V0 + RATE * t : V0 + RATE * TURN - RATE * (t - TURN);
  }

  private static final FlightCondition BASE = PkClosedFormTest.PATH.at(0);

  private static final FlightPath OUT_AND_BACK = new FlightPath() {
    @Override
    public int gridPoints() {
      return 2 * TURN + 1;
    }

    @Override
    public FlightCondition at(double t) {
      return BASE.withSpeedTasMps(speed(t));
    }
  };

  private record Expected(int branch, CrossingKind kind, double t) {}

  /** Closed-form {sigma, omega}, unit mass (as in PkClosedFormTest). */
  private static double[] root(int mode, double v) {
    double w0 = 2 * Math.PI * F_HZ[mode];
    double c = 2 * ZETA * w0;
    double sigma = (RHO * v * B * D[mode] / 2 - c) / 2;
    return new double[] {sigma, Math.sqrt(sigma * sigma + c * sigma + w0 * w0 - 0.5 * RHO * v * v * Q0[mode])};
  }

  /** Path parameters of the speed v on the way out and on the way back. */
  private static double[] times(double v) {
    return new double[] {(v - V0) / RATE, TURN + (V0 + RATE * TURN - v) / RATE};
  }

  private static List<Expected> expected(double limitG) {
    List<Expected> list = new ArrayList<>();
    for (int j = 0; j < 2; j++) {
      int mode = j;
      double vf = 2 * (2 * ZETA * 2 * Math.PI * F_HZ[j]) / (RHO * B * D[j]);
      double vl = new BrentSolver(1e-12).solve(200, v -> {
        double[] r = root(mode, v);
        return 2 * r[0] + limitG * r[1];
      }, 20, vf);
      double[] tf = times(vf);
      double[] tl = times(vl);
      list.add(new Expected(j, CrossingKind.DAMPING_BELOW_LIMIT, tl[0]));
      list.add(new Expected(j, CrossingKind.FLUTTER_ONSET, tf[0]));
      list.add(new Expected(j, CrossingKind.FLUTTER_RECOVERY, tf[1]));
      list.add(new Expected(j, CrossingKind.DAMPING_ABOVE_LIMIT, tl[1]));
    }
    list.sort(Comparator.comparingDouble(Expected::t));
    return list;
  }

  private static void check(FlutterSolution sol) {
    List<Expected> want = expected(AnalysisOptions.defaults().dampingLimitG());
    List<FlutterCrossing> got = sol.crossings();
    assertEquals(want.size(), got.size(), got.toString());
    for (int i = 0; i < want.size(); i++) {
      Expected e = want.get(i);
      FlutterCrossing c = got.get(i);
      assertEquals(e.branch(), c.branch(), c.toString());
      assertEquals(e.kind(), c.kind(), c.toString());
      // onsets refined to the default 0.01 m/s: 0.02 m/s is 0.02 / 20 in path parameter
      assertEquals(e.t(), c.pathParameter(), 0.02 / RATE, c.toString());
      assertEquals(speed(e.t()), c.condition().speedTasMps(), 0.02, c.toString());
    }
    // the slowest onset is mode 1's (82 m/s), found on the way out
    FlutterCrossing first = sol.firstOnset().orElseThrow();
    assertEquals(0, first.branch());
    assertEquals(want.stream().filter(e -> e.kind() == CrossingKind.FLUTTER_ONSET && e.branch() == 0)
        .findFirst().orElseThrow().t(), first.pathParameter(), 0.02 / RATE);
  }

  @Test
  void pkFindsEveryCrossingOutAndBack() {
    check(new PkMethod().solve(PkClosedFormTest.system(F_HZ, Q0, D, 0.0, 5.0), OUT_AND_BACK,
        AnalysisOptions.defaults()));
  }

  @Test
  void stateSpaceFindsEveryCrossingOutAndBack() {
    check(new StateSpaceMethod().solve(PkClosedFormTest.system(F_HZ, Q0, D, 0.0, 2.0), OUT_AND_BACK,
        AnalysisOptions.defaults()));
  }
}
