package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.FlowSymmetry;
import org.junit.jupiter.api.Test;

/**
 * A rectangular wing of low aspect ratio oscillating in heave and pitch: the whole wing's lift
 * approaches slender-wing theory as the aspect ratio falls (the high-aspect-ratio limit, Theodorsen's
 * section, is {@link TheodorsenLimitTest}).
 *
 * <p>Reference: slender-wing theory (R. T. Jones, NACA Report 835, 1946, for the steady wing; its
 * unsteady form in Ashley and Landahl, <i>Aerodynamics of Wings and Bodies</i>, 1965, ch. 6, from
 * memory). Derivation for a rectangle of chord c and semi-span s: each cross-section is a flat
 * plate of width 2 s moving with the upwash w_a(x, t) = dh/dt + U dh/dx, whose apparent mass per
 * unit length is rho pi s^2, so the lift per unit length is l(x) = -rho pi D(s^2 w_a) with
 * D = d/dt + U d/dx. The span jumps from 0 to s at the leading edge and stays s, so the lift is
 * L = -rho pi s^2 [int_0^c dw_a/dt dx + U w_a(c)]. With nu = omega c / U, A = 2 s / c, S = 2 s c
 * and CL = L / (q S):
 * <ul>
 *   <li>heave h = h0 e^{i omega t} (up): CL = (pi A / 2) (nu^2 - i nu) per unit h0 / c;
 *   <li>pitch alpha about x0 (h = -alpha (x - x0)): CL = (pi A / 2) [1 + i nu (2 - x0/c) - nu^2 (1/2
 *       - x0/c)] per radian.
 * </ul>
 * The theory neglects the Kutta condition's effect over a length of order s at the trailing edge,
 * so the lattice must approach it with an error of order A: halving A must roughly halve the
 * difference.
 */
class SlenderWingLimitTest {
  private static final double PITCH_AXIS = 0.5;

  /** Lattice CL per unit h0/c (heave) and per radian (pitch about PITCH_AXIS), chord 1 m. */
  private static Complex[] lift(double ar, double nu) {
    BoxLattice l = LatticeFixtures.halfWing(ar, 1, 0, 16, 32, FlowSymmetry.SYMMETRIC);
    int n = l.size();
    ZMatrixRMaj w = new ZMatrixRMaj(n, 2);
    for (int i = 0; i < n; i++) {
      double x = l.controlPoint(i).xM();
      w.set(i, 0, 0, nu); // h = c: w/U = dh/dx + i (omega/U) h = i nu
      w.set(i, 1, -1, -nu * (x - PITCH_AXIS)); // h = -alpha (x - x0)
    }
    PressureSolver ps = new PressureSolver(l);
    ps.factorise(nu, 0);
    ZMatrixRMaj cp = new ZMatrixRMaj(n, 2);
    ps.solve(w, cp);
    Complex[] out = new Complex[2];
    for (int m = 0; m < 2; m++) {
      out[m] = LatticeFixtures.liftCoefficient(l, cp, m);
    }
    return out;
  }

  /** Largest relative difference from slender-wing theory over heave and pitch. */
  private static double difference(double ar, double nu) {
    Complex[] got = lift(ar, nu);
    double f = Math.PI * ar / 2;
    Complex heave = new Complex(f * nu * nu, -f * nu);
    Complex pitch = new Complex(f * (1 - nu * nu * (0.5 - PITCH_AXIS)), f * nu * (2 - PITCH_AXIS));
    return Math.max(got[0].subtract(heave).abs() / heave.abs(), got[1].subtract(pitch).abs() / pitch.abs());
  }

  @Test
  void liftApproachesSlenderWingTheoryAsTheAspectRatioFalls() {
    for (double nu : new double[] {0.5, 1.0}) {
      double e1 = difference(0.5, nu), e2 = difference(0.25, nu), e3 = difference(0.125, nu);
      String at = "nu " + nu + ": differences at A = 0.5, 0.25, 0.125: " + e1 + ", " + e2 + ", " + e3;
      // order A: each halving of A must cut the difference to at most 0.6 of it (measured 0.5)
      assertTrue(e2 < 0.6 * e1 && e3 < 0.6 * e2, at);
      // at A = 1/8 within 6 % (measured 3.5 % at nu = 0.5, 5 % at nu = 1: order A with a factor
      // of about 0.3 to 0.4, as the trailing-edge region's share of the chord)
      assertTrue(e3 < 0.06, at);
    }
  }
}
