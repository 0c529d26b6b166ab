package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/**
 * The p-k root iteration of {@link FlutterWorkspace#newton} step by step against an independent
 * implementation, in Commons Math complex arithmetic with an explicit 2 x 2 inverse (Cramer's
 * rule), of nonlinear inverse iteration as stated by Ruhe ("Algorithms for the nonlinear eigenvalue
 * problem", SIAM J. Numer. Anal. 10(4), 1973, section 3) with the aerodynamics re-evaluated at the
 * current root's reduced frequency k = |Im s| b / V:
 *
 * <pre>
 *   x = F(s)^-1 F'(s) v,   s &larr; s - (u^H v)/(u^H x),   v &larr; x / (u^H x)
 *   F(s) = M s^2 + C s + K - q Q(ik),   F'(s) = 2 M s + C,   u = start vector
 * </pre>
 *
 * A heavily damped, coupled two-coordinate system is used so that every term of F and F' matters.
 */
class NewtonIterationTest {

  private static final double[][] M = {{1.5, 0.2}, {0.2, 0.8}};
  private static final double[][] C = {{6.0, -1.0}, {-1.5, 4.0}};
  private static final double[][] K = {{900.0, -120.0}, {-120.0, 400.0}};
  /** Q(ik) = Q0 + i k D + k^2 E (per pascal). */
  private static final double[][] Q0 = {{0.02, -0.01}, {0.015, 0.03}};
  private static final double[][] D = {{0.05, 0.02}, {-0.03, 0.04}};
  private static final double[][] E = {{-0.01, 0.004}, {0.002, -0.006}};
  private static final double B = 0.6;
  private static final FlightCondition FC = PkClosedFormTest.PATH.at(8);

  private static final AeroSource FORCES = new FunctionForces(2, B, 0, Double.POSITIVE_INFINITY, (k, out) -> {
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        out.set(i, j, Q0[i][j] + k * k * E[i][j], k * D[i][j]);
      }
    }
  }, "coupled test forces");

  private static FlutterWorkspace workspace(SolveCounters counters) {
    AeroelasticSystem sys = new AeroelasticSystem(new StructuralModel(List.of("a", "b"), M, C, K), FORCES);
    return new FlutterWorkspace(sys, counters);
  }

  private static double reducedFrequency(Complex s) {
    return Math.abs(s.getImaginary()) * B / FC.speedTasMps();
  }

  private static Complex[][] f(Complex s) {
    double q = FC.dynamicPressurePa();
    double k = reducedFrequency(s);
    Complex[][] out = new Complex[2][2];
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        Complex aero = new Complex(Q0[i][j] + k * k * E[i][j], k * D[i][j]).multiply(q);
        out[i][j] = s.multiply(s).multiply(M[i][j]).add(s.multiply(C[i][j])).add(K[i][j]).subtract(aero);
      }
    }
    return out;
  }

  private static Complex[] times(Complex[][] a, Complex[] v) {
    return new Complex[] {
      a[0][0].multiply(v[0]).add(a[0][1].multiply(v[1])),
      a[1][0].multiply(v[0]).add(a[1][1].multiply(v[1]))
    };
  }

  private static Complex innerH(Complex[] u, Complex[] v) {
    return u[0].conjugate().multiply(v[0]).add(u[1].conjugate().multiply(v[1]));
  }

  /** One independent iterate: {s, v0, v1}. */
  private static Complex[] step(Complex s, Complex[] u, Complex[] v) {
    Complex[][] fs = f(s);
    Complex[][] fp = new Complex[2][2];
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        fp[i][j] = s.multiply(2 * M[i][j]).add(C[i][j]);
      }
    }
    Complex[] rhs = times(fp, v);
    Complex det = fs[0][0].multiply(fs[1][1]).subtract(fs[0][1].multiply(fs[1][0]));
    Complex[] x = {
      fs[1][1].multiply(rhs[0]).subtract(fs[0][1].multiply(rhs[1])).divide(det),
      fs[0][0].multiply(rhs[1]).subtract(fs[1][0].multiply(rhs[0])).divide(det)
    };
    Complex ux = innerH(u, x);
    Complex sNew = s.subtract(innerH(u, v).divide(ux));
    return new Complex[] {sNew, x[0].divide(ux), x[1].divide(ux)};
  }

  /** Independent iterates s_0 .. s_count from s0 and start vector u. */
  private static List<Complex> iterates(Complex s0, Complex[] u, int count) {
    List<Complex> out = new ArrayList<>();
    out.add(s0);
    Complex s = s0;
    Complex[] v = u.clone();
    for (int i = 0; i < count; i++) {
      Complex[] next = step(s, u, v);
      s = next[0];
      v = new Complex[] {next[1], next[2]};
      out.add(s);
    }
    return out;
  }

  /**
   * Start 2 % off the upper root (about -2.36 + 25.52 i 1/s), with a start vector of norm 3 and a
   * complex phase.
   */
  private static final Complex S0 = new Complex(-2.0, 25.0);
  private static final Complex[] U = {new Complex(1.8, 2.1), new Complex(-0.3, 0.9)};

  private static double[] interleaved(Complex[] u) {
    return new double[] {u[0].getReal(), u[0].getImaginary(), u[1].getReal(), u[1].getImaginary()};
  }

  @Test
  void everyIterateIsTheIndependentNonlinearInverseIterate() {
    List<Complex> ref = iterates(S0, U, 12);
    double scale = ref.get(12).abs();
    for (int m = 1; m <= 8; m++) {
      FlutterWorkspace.Root r = workspace(new SolveCounters()).newton(S0.getReal(), S0.getImaginary(),
          interleaved(U), FC, m, 0.0);
      assertEquals(m, r.iterations());
      // the same arithmetic in another order and another linear solver: agreement to a few
      // hundred rounding errors of |s| (the iteration contracts, so rounding does not grow)
      assertEquals(ref.get(m).getReal(), r.sr(), 1e-11 * scale, "Re s after " + m + " steps");
      assertEquals(ref.get(m).getImaginary(), r.si(), 1e-11 * scale, "Im s after " + m + " steps");
    }
    // the first step moves the root visibly; the iteration converges
    assertTrue(ref.get(1).subtract(S0).abs() > 0.02 * scale);
    assertTrue(ref.get(12).subtract(ref.get(11)).abs() < 1e-13 * scale);
  }

  @Test
  void theIterationStopsAtTheFirstStepBelowTheTolerance() {
    List<Complex> ref = iterates(S0, U, 8);
    // relative step sizes r_m = |s_m - s_(m-1)| / |s_m|; the iteration contracts them by one to two
    // orders of magnitude per step here (linearly, since F' leaves out the change of Q with k), so a
    // tolerance at the geometric mean of two successive ones is clear of both by a factor of three
    // or more, far beyond round-off, and must stop the iteration exactly at step m
    for (int m = 3; m <= 6; m++) {
      double rPrev = ref.get(m - 1).subtract(ref.get(m - 2)).abs() / ref.get(m - 1).abs();
      double rm = ref.get(m).subtract(ref.get(m - 1)).abs() / ref.get(m).abs();
      assertTrue(rPrev > 10 * rm, "steps " + rPrev + ", " + rm);
      double tolerance = Math.sqrt(rPrev * rm);
      SolveCounters counters = new SolveCounters();
      FlutterWorkspace.Root r = workspace(counters).newton(S0.getReal(), S0.getImaginary(), interleaved(U), FC,
          60, tolerance);
      assertTrue(r.converged());
      assertEquals(m, r.iterations(), "tolerance " + tolerance);
      assertEquals(m, counters.iterations);
      assertEquals(1, counters.rootSolves);
      assertEquals(ref.get(m).getReal(), r.sr(), 1e-11 * ref.get(m).abs());
      assertEquals(r.residual(), counters.maxResidual, 0.0);
    }
  }

  @Test
  void theResidualIsTheScaledNormOfFTimesTheVectorAtTheReturnedRoot() {
    for (int m = 1; m <= 3; m++) {
      SolveCounters counters = new SolveCounters();
      FlutterWorkspace.Root r = workspace(counters).newton(S0.getReal(), S0.getImaginary(), interleaved(U), FC,
          m, 0.0);
      assertFalse(r.converged(), "a zero tolerance is never met in " + m + " steps");
      assertEquals(0, counters.rootSolves);
      Complex s = new Complex(r.sr(), r.si());
      Complex[] v = {new Complex(r.v()[0], r.v()[1]), new Complex(r.v()[2], r.v()[3])};
      assertEquals(1.0, Math.hypot(v[0].abs(), v[1].abs()), 1e-14, "unit vector");
      Complex[][] fs = f(s);
      Complex[] fv = times(fs, v);
      double fmax = 0;
      for (Complex[] row : fs) {
        for (Complex e : row) {
          fmax = Math.max(fmax, e.abs());
        }
      }
      double expected = Math.hypot(fv[0].abs(), fv[1].abs()) / fmax;
      // a quotient of norms of a few products of O(1e3) entries: 1e-9 relative is round-off
      assertEquals(expected, r.residual(), 1e-9 * expected, "residual after " + m + " steps");
      assertTrue(expected > 1e-8, "an unconverged root has a visible residual: " + expected);
    }
  }

  @Test
  void aStartExactlyOnAnEigenvalueIsAcceptedAsIs() {
    // undamped, uncoupled, no air: F(2i) = diag(-4 + 4, -4 + 9) is exactly singular in floating
    // point, so the linear solve overflows; the start is the root (omega_1 = sqrt(4) = 2 rad/s)
    AeroSource still = new FunctionForces(2, B, 0, Double.POSITIVE_INFINITY, FunctionForces.NONE, "no forces");
    double[][] zero = new double[2][2];
    AeroelasticSystem sys = new AeroelasticSystem(new StructuralModel(List.of("a", "b"),
        new double[][] {{1, 0}, {0, 1}}, zero, new double[][] {{4, 0}, {0, 9}}), still);
    SolveCounters counters = new SolveCounters();
    FlutterWorkspace.Root r = new FlutterWorkspace(sys, counters).newton(0.0, 2.0, new double[] {1, 0, 0, 0}, FC,
        60, 1e-9);
    assertTrue(r.converged());
    assertEquals(1, r.iterations());
    assertEquals(0.0, r.sr(), 0.0);
    assertEquals(2.0, r.si(), 0.0);
    // F(2i) (1, 0) = 0 exactly
    assertEquals(0.0, r.residual(), 0.0);
    assertEquals(1.0, r.v()[0], 0.0);
  }

  @Test
  void frozenRootsCountOneEigenSolveAtTheGivenReducedFrequency() {
    SolveCounters counters = new SolveCounters();
    FlutterWorkspace ws = workspace(counters);
    ws.frozenRoots(0.3, FC);
    assertEquals(1, counters.fullEigenSolves);
    assertEquals(0.3, counters.minReducedFrequency, 0.0);
    assertEquals(0.3, counters.maxReducedFrequency, 0.0);
    ws.frozenRoots(0.7, FC);
    assertEquals(2, counters.fullEigenSolves);
    assertEquals(0.7, counters.maxReducedFrequency, 0.0);
    // Newton assembles F at the reduced frequency |Im s| b / V of the start and, for the residual,
    // of the iterate it returns
    ws.newton(S0.getReal(), S0.getImaginary(), interleaved(U), FC, 1, 0.0);
    Complex s1 = iterates(S0, U, 1).get(1);
    assertEquals(Math.min(reducedFrequency(S0), reducedFrequency(s1)), counters.minReducedFrequency, 1e-12);
  }
}
