package org.flexmargin.spline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.junit.jupiter.api.Test;

/** Surface and beam splines: rigid-body reproduction, interpolation, an independent library. */
class SplineTest {
  // structural grid of a tapered swept wing panel (scattered, not a lattice)
  private static final double[] GX = {0.2, 1.1, 0.6, 1.5, 1.0, 1.9, 1.4, 2.2, 0.9};
  private static final double[] GY = {0.0, 0.1, 1.0, 1.2, 2.1, 2.0, 3.0, 3.1, 1.6};
  private static final double[] TX = {0.3, 0.8, 1.7, 2.05, 1.2, 0.55};
  private static final double[] TY = {0.2, 0.7, 1.4, 2.9, 2.5, 0.05};

  @Test
  void surfaceSplineReproducesRigidHeavePitchAndRollToRounding() {
    // requirement of the method (Harder and Desmarais 1972): planes are reproduced exactly; 1e-10
    SurfaceSpline s = new SurfaceSpline(GX, GY);
    SplineMatrix w = s.to(TX, TY, false);
    SplineMatrix dwdx = s.to(TX, TY, true);
    double theta = 0.03, phi = -0.02, h0 = 0.7, x0 = 1.3;
    double[] src = new double[GX.length];
    for (int i = 0; i < GX.length; i++) {
      src[i] = h0 - theta * (GX[i] - x0) + phi * GY[i];
    }
    double[] got = w.apply(src);
    double[] slope = dwdx.apply(src);
    for (int t = 0; t < TX.length; t++) {
      assertEquals(h0 - theta * (TX[t] - x0) + phi * TY[t], got[t], 1e-10);
      assertEquals(-theta, slope[t], 1e-10);
    }
  }

  @Test
  void surfaceSplinePassesThroughItsPointsAndRefusesALine() {
    SurfaceSpline s = new SurfaceSpline(GX, GY);
    double[] src = new double[GX.length];
    for (int i = 0; i < GX.length; i++) {
      src[i] = Math.sin(GX[i]) * GY[i] * GY[i];
    }
    double[] back = s.to(GX, GY, false).apply(src);
    for (int i = 0; i < GX.length; i++) {
      assertEquals(src[i], back[i], 1e-10, "interpolation condition at point " + i);
    }
    assertThrows(IllegalArgumentException.class,
        () -> new SurfaceSpline(new double[] {0, 1, 2}, new double[] {0, 1, 2}));
  }

  @Test
  void beamSplineIsTheNaturalCubicSplineOfCommonsMath() {
    // independent library: Commons Math SplineInterpolator builds the natural cubic spline, which
    // the infinite-beam spline a0 + a1 y + sum F_i |y - y_i|^3 equals between the end stations
    double[] ys = {0, 0.8, 1.9, 3.0, 4.4, 5.0};
    double[] xs = new double[ys.length];
    double[] h = new double[ys.length];
    for (int i = 0; i < ys.length; i++) {
      h[i] = 0.01 * ys[i] * ys[i] + 0.002 * Math.pow(ys[i], 3);
    }
    PolynomialSplineFunction ref = new SplineInterpolator().interpolate(ys, h);
    BeamSpline b = new BeamSpline(xs, ys);
    double[] ty = {0.1, 0.5, 1.2, 2.7, 3.3, 4.9};
    double[] tx = new double[ty.length];
    double[] src = new double[2 * ys.length];
    System.arraycopy(h, 0, src, 0, ys.length);
    double[] got = b.to(tx, ty, false).apply(src);
    for (int t = 0; t < ty.length; t++) {
      // 1e-12: both are exact cubic splines; only rounding differs
      assertEquals(ref.value(ty[t]), got[t], 1e-12, "y " + ty[t]);
    }
  }

  @Test
  void beamSplineReproducesRigidHeaveAndPitchOnASweptAxis() {
    // swept straight axis x_a = 0.4 + 0.5 y; rigid pitch theta about x0 and heave h0 must give
    // w = h0 - theta (x - x0) and dw/dx = -theta everywhere, also beyond the end stations; 1e-10
    double[] ys = {0.0, 1.0, 2.5, 4.0, 5.0};
    double[] xs = new double[ys.length];
    for (int i = 0; i < ys.length; i++) {
      xs[i] = 0.4 + 0.5 * ys[i];
    }
    BeamSpline b = new BeamSpline(xs, ys);
    double theta = 0.05, h0 = -0.2, x0 = 0.9;
    double[] src = new double[2 * ys.length];
    for (int i = 0; i < ys.length; i++) {
      src[i] = h0 - theta * (xs[i] - x0);
      src[ys.length + i] = theta;
    }
    double[] tx = {0.0, 1.3, 2.9, 3.5, 0.7};
    double[] ty = {-0.3, 1.7, 3.3, 5.4, 0.2};
    double[] w = b.to(tx, ty, false).apply(src);
    double[] s = b.to(tx, ty, true).apply(src);
    for (int t = 0; t < tx.length; t++) {
      assertEquals(h0 - theta * (tx[t] - x0), w[t], 1e-10);
      assertEquals(-theta, s[t], 1e-10);
    }
    assertThrows(IllegalArgumentException.class,
        () -> new BeamSpline(new double[] {0, 0}, new double[] {1, 1}));
  }
}
