package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.notch.DesignedNotch;
import org.junit.jupiter.api.Test;

/**
 * The notch width users see is the usual -3 dB width: the distance between the two frequencies
 * where |N(j omega)| = 1/sqrt 2, found here independently by Commons Math's Brent solver on the
 * filter's own frequency response, and compared with the closed form 2 f_c sqrt(zeta_p^2 - 2
 * zeta_z^2) (derived in {@link NotchFilter#minus3DbWidthHz}).
 */
class NotchWidthTest {
  private static final double TWO_PI = 2 * Math.PI;

  /** |N|^2 - 1/2 at f Hz. */
  private static double excess(NotchFilter n, double fHz) {
    double[] reIm = new double[2];
    n.response(TWO_PI * fHz, reIm);
    return reIm[0] * reIm[0] + reIm[1] * reIm[1] - 0.5;
  }

  private static double brentWidthHz(NotchFilter n) {
    BrentSolver brent = new BrentSolver(1e-13, 1e-13);
    double fc = n.centreFrequencyHz();
    double lower = brent.solve(200, f -> excess(n, f), 1e-6 * fc, fc);
    double upper = brent.solve(200, f -> excess(n, f), fc, 1e3 * fc);
    return upper - lower;
  }

  @Test
  void minus3DbWidthMatchesTheResponseFoundByBrent() {
    // deep and shallow notches over a range of centres and dampings (invented filter values)
    double[][] cases = {{15, 0.01, 0.5}, {7.4, 0.02, 0.14}, {18.6, 0.05, 0.22}, {100, 0.0, 0.3}, {3, 0.2, 0.3}};
    for (double[] c : cases) {
      NotchFilter n = new NotchFilter(c[0], c[1], c[2]);
      // tolerance: Brent's absolute tolerance 1e-13 Hz on each edge, against widths of 0.1 to 60 Hz
      assertEquals(brentWidthHz(n), n.minus3DbWidthHz(), 1e-9 * c[0], "notch " + c[0] + " Hz");
    }
  }

  @Test
  void noMinus3DbWidthForANotchShallowerThan3Db() {
    // depth 20 log10(0.3/0.4) = -2.5 dB: the gain never reaches -3 dB
    assertTrue(Double.isNaN(new NotchFilter(10, 0.3, 0.4).minus3DbWidthHz()));
  }

  @Test
  void theHalfDepthWidthIsAbout4point5TimesNarrowerAt26Db() {
    // depth 26 dB: zeta_z/zeta_p = 10^(-26/20) = 0.0501; ratio sqrt(zeta_p^2 - 2 zeta_z^2)/sqrt(zeta_z zeta_p)
    // = sqrt((1 - 2 r^2)/r) = 4.45 (derived)
    NotchFilter n = NotchFilter.fromDepthAndWidth(12, 26, 1.0);
    assertEquals(1.0, n.widthHz(), 1e-12);
    assertEquals(4.455, n.minus3DbWidthHz() / n.widthHz(), 1e-3);
    DesignedNotch d = DesignedNotch.of(n);
    assertEquals(n.minus3DbWidthHz(), d.minus3DbWidthHz(), 0.0);
    assertEquals(n.widthHz(), d.halfDepthWidthHz(), 0.0);
  }
}
