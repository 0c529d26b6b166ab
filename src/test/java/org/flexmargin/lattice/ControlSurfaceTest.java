package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.ControlSurface;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.SurfacePoint;
import org.junit.jupiter.api.Test;

/** Steady lift of hinged box groups (trailing-edge flaps) against thin-aerofoil theory. */
class ControlSurfaceTest {

  /** {lift slope per rad of alpha, lift per rad of flap} of a rectangular half wing, chord 1 m. */
  private static double[] lift(double ar, int nc, int ns, double hinge, double from, double to) {
    LiftingSurface s = new LiftingSurface("wing", new SurfacePoint(0, 0, 0), 1.0,
        new SurfacePoint(0, ar / 2, 0), 1.0, nc, ns);
    BoxLattice l = new BoxLattice(List.of(s), FlowSymmetry.SYMMETRIC);
    ControlColumns flap = ControlColumns.of(l, List.of(s), List.of(new ControlSurface("flap", "wing", hinge, from, to)));
    int n = l.size();
    ZMatrixRMaj w = new ZMatrixRMaj(n, 2);
    for (int i = 0; i < n; i++) {
      w.set(i, 0, -1.0, 0); // unit angle of attack: w/U = dh/dx = -alpha
      w.set(i, 1, flap.slopeControl()[i][0], 0);
    }
    PressureSolver ps = new PressureSolver(l);
    ps.factorise(0, 0);
    ZMatrixRMaj cp = new ZMatrixRMaj(n, 2);
    ps.solve(w, cp);
    double[] out = new double[2];
    double area = 0;
    for (int i = 0; i < n; i++) {
      out[0] += cp.getReal(i, 0) * l.areaM2(i);
      out[1] += cp.getReal(i, 1) * l.areaM2(i);
      area += l.areaM2(i);
    }
    out[0] /= area;
    out[1] /= area;
    return out;
  }

  /**
   * Thin-aerofoil theory (H. Glauert, The Elements of Aerofoil and Airscrew Theory, 1926, ch. VII;
   * also Abbott and von Doenhoff, Theory of Wing Sections, eq. 4.54, from memory): a flap of chord
   * fraction E hinged at x_h = (1 - E) c gives dcl/d delta = 2 (pi - theta_h) + 2 sin theta_h with
   * cos theta_h = 1 - 2 x_h / c, so the flap effectiveness tau = (dcl/d delta) / (2 pi).
   */
  static double glauertEffectiveness(double hingeChordFraction) {
    double th = Math.acos(1 - 2 * hingeChordFraction);
    return (2 * (Math.PI - th) + 2 * Math.sin(th)) / (2 * Math.PI);
  }

  @Test
  void fullSpanFlapOfAHighAspectRatioWingMatchesThinAerofoilTheory() {
    // Glauert's effectiveness (derived from the formula above): 0.6090 for a 25 % flap, 0.8183 for
    // a 50 % flap. A full-span flap changes the angle of zero lift uniformly along the span, so
    // lifting-line theory gives CL_delta / CL_alpha = tau at any large aspect ratio; A = 40 here.
    // The discrete loading converges only as 1/nc near the slope jump at the hinge (measured: the
    // error 5.1 %, 2.5 %, 1.1 % at 8, 16, 32 chordwise boxes), so the check is on the first-order
    // Richardson extrapolation 2 R(32) - R(16): tolerance 1 % (measured +0.3 % and +0.15 %, the
    // rest of the 3-D effect and the higher-order error), and on the error halving per doubling
    for (double hinge : new double[] {0.75, 0.5}) {
      double tau = glauertEffectiveness(hinge);
      double[] l16 = lift(40, 16, 20, hinge, 0, 1);
      double[] l32 = lift(40, 32, 20, hinge, 0, 1);
      double r16 = l16[1] / l16[0], r32 = l32[1] / l32[0];
      assertEquals(tau, 2 * r32 - r16, 0.01 * tau, "hinge " + hinge);
      double halving = (tau - r32) / (tau - r16);
      assertTrue(halving > 0.35 && halving < 0.65, "first-order convergence, hinge " + hinge + ": " + halving);
    }
    assertEquals(0.6090, glauertEffectiveness(0.75), 5e-5); // 3.8264 / 2 pi, derived
  }

  @Test
  void flapLiftFollowsTheFiniteWingTrends() {
    // Trends of lifting-surface theory (Bisplinghoff, Ashley and Halfman, Aeroelasticity, ch. 5;
    // DATCOM 6.1.4.1 from memory): the flap's lift grows with aspect ratio like the lift slope, and
    // on low-aspect-ratio wings the ratio CL_delta / CL_alpha rises above the 2-D effectiveness
    // (the flap's chordwise loading is carried further forward by the tip flow)
    double prev = 0;
    for (double ar : new double[] {2, 4, 8, 16}) {
      double[] l = lift(ar, 12, 24, 0.75, 0, 1);
      assertTrue(l[1] > prev, "flap lift grows with aspect ratio at A " + ar);
      prev = l[1];
    }
    double tau = glauertEffectiveness(0.75);
    double[] low = lift(2, 12, 24, 0.75, 0, 1);
    double lowRatio = low[1] / low[0];
    assertTrue(lowRatio > tau, "A = 2: " + lowRatio + " vs 2-D " + tau);
    // a flap over the inner half of the span carries more than half of the full flap's lift (the
    // inner sections are loaded more, elliptic-like spanwise loading) but less than all of it
    double full = lift(8, 12, 24, 0.75, 0, 1)[1];
    double inner = lift(8, 12, 24, 0.75, 0, 0.5)[1];
    double outer = lift(8, 12, 24, 0.75, 0.5, 1)[1];
    assertTrue(inner > 0.5 * full && inner < full, "inner half " + inner / full);
    // linear theory: the two halves add up to the whole (superposition, rounding only)
    assertEquals(full, inner + outer, 1e-10 * full);
  }
}
