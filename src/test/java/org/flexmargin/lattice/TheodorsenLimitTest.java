package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.Theodorsen;
import org.flexmargin.model.FlowSymmetry;
import org.junit.jupiter.api.Test;

/**
 * A rectangular wing oscillating in heave and pitch: the sectional lift at midspan approaches
 * Theodorsen's two-dimensional result as the aspect ratio grows.
 *
 * <p>Reference (closed form): Theodorsen, NACA Report 496 (1935), lift per unit span with
 * h positive up and pitch about mid-chord, in coefficient form per unit h/b and per radian:
 * Cl_h = pi k^2 - 2 pi i k C(k), Cl_a = pi i k + 2 pi C(k)(1 + i k / 2), C(k) from the project's
 * Bessel-function evaluation (itself checked against Theodorsen's table).
 */
class TheodorsenLimitTest {
  private static final double[] K = {0.1, 0.5, 1.0};

  /** Largest relative error over heave and pitch at each k, for full aspect ratio ar. */
  private static double[] errors(double ar, double[] ks) {
    int ns = (int) Math.round(ar); // square-ish boxes: spanwise width 0.5 chord on the half wing
    BoxLattice l = LatticeFixtures.halfWing(ar, 1, 0, 10, ns, FlowSymmetry.SYMMETRIC);
    double[] err = new double[ks.length];
    for (int m = 0; m < ks.length; m++) {
      double k = ks[m];
      Complex[] got = midspan(l, k, 10);
      Complex c = Theodorsen.value(k);
      Complex heave = new Complex(Math.PI * k * k, 0).subtract(c.multiply(new Complex(0, 2 * Math.PI * k)));
      Complex pitch = new Complex(0, Math.PI * k).add(c.multiply(new Complex(2 * Math.PI, Math.PI * k)));
      err[m] = Math.max(
          got[0].subtract(heave).abs() / heave.abs(), got[1].subtract(pitch).abs() / pitch.abs());
    }
    return err;
  }

  @Test
  void midspanSectionApproachesTheodorsen() {
    double[] low = {K[0]};
    double[] e10 = errors(10, low), e20 = errors(20, low), e40 = errors(40, K);
    for (int m = 0; m < K.length; m++) {
      String at = "k " + K[m] + ": error " + e40[m];
      // 2.5 %: ten chordwise boxes leave about 2 % in the pitch lift at k = 1 (the error of the
      // discretisation, independent of aspect ratio: measured 1.95 % at A = 40)
      assertTrue(e40[m] < 0.025, at);
    }
    // at low k the difference is three-dimensional and falls at least as fast as 1/A (lifting-line
    // theory, common practice): each doubling of A must at least halve it (measured about /3)
    assertTrue(e20[0] < 0.5 * e10[0] && e40[0] < 0.5 * e20[0],
        "k 0.1: " + e10[0] + ", " + e20[0] + ", " + e40[0]);
  }

  /** Midspan lift coefficient per unit h/b (heave) and per radian (pitch about mid-chord). */
  static Complex[] midspan(BoxLattice l, double k, int nc) {
    double b = 0.5;
    int n = l.size();
    double kbar = k / b;
    ZMatrixRMaj w = new ZMatrixRMaj(n, 2);
    for (int i = 0; i < n; i++) {
      double x = l.controlPoint(i).xM() - 0.5;
      w.set(i, 0, 0, kbar * b); // h = b: w/U = i (omega/U) h
      w.set(i, 1, -1, -kbar * x); // h = -alpha x: w/U = -alpha - i (omega/U) alpha x
    }
    PressureSolver ps = new PressureSolver(l);
    ps.factorise(kbar, 0);
    ZMatrixRMaj cp = new ZMatrixRMaj(n, 2);
    ps.solve(w, cp);
    Complex[] out = new Complex[2];
    for (int m = 0; m < 2; m++) {
      double re = 0, im = 0;
      for (int i = 0; i < nc; i++) { // the first nc boxes are the strip at the root (midspan)
        re += cp.getReal(i, m) * l.chordM(i);
        im += cp.getImag(i, m) * l.chordM(i);
      }
      out[m] = new Complex(re, im);
    }
    return out;
  }
}
