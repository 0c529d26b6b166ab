package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * Structural peak search on loops whose answer lies where a coarse grid cannot see it: a phase
 * closest to -180 deg strictly inside the band, and a resonance far narrower than the initial
 * sampling. References in closed form, solved here by plain bisection (docs/validation.md §10.4).
 */
class StructuralPeakSearchCasesTest {
  private static final double F_HZ = 5.0;
  private static final double WP = 2 * Math.PI * F_HZ;
  private static final double WZ = 1.03 * WP;
  private static final double ZETA = 0.02;
  private static final ModeFrequency MODE = new ModeFrequency("fin bending", F_HZ);

  /**
   * k (s^2 + 2 zeta wz s + wz^2)/(s^2 + 2 zeta wp s + wp^2) e^{j theta}: a mode with a zero pair 3 %
   * above it; the phase dips between the two and recovers, so its extremum is interior.
   */
  private static SisoFrequencyFunction dip(double k, double thetaDeg) {
    double c = Math.cos(Math.toRadians(thetaDeg));
    double s = Math.sin(Math.toRadians(thetaDeg));
    return (w, v) -> {
      double nr = WZ * WZ - w * w;
      double ni = 2 * ZETA * WZ * w;
      double dr = WP * WP - w * w;
      double di = 2 * ZETA * WP * w;
      double den = dr * dr + di * di;
      double re = k * (nr * dr + ni * di) / den;
      double im = k * (ni * dr - nr * di) / den;
      v[0] = re * c - im * s;
      v[1] = re * s + im * c;
    };
  }

  /** d/dw atan2(2 zeta wn w, wn^2 - w^2) = 2 zeta wn (wn^2 + w^2) / ((wn^2 - w^2)^2 + (2 zeta wn w)^2). */
  private static double slope(double wn, double w) {
    double a = wn * wn - w * w;
    double b = 2 * ZETA * wn * w;
    return 2 * ZETA * wn * (wn * wn + w * w) / (a * a + b * b);
  }

  /** Frequency of the most negative phase of the pole-zero pair: zero- and pole-slopes equal. */
  private static double dipFrequency() {
    double lo = WP;
    double hi = WZ;
    for (int i = 0; i < 200; i++) {
      double mid = 0.5 * (lo + hi);
      // below the extremum the pole's phase falls faster than the zero's rises
      if (slope(WZ, mid) - slope(WP, mid) < 0) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }

  private static double phaseDeg(double w, double thetaDeg) {
    return Math.toDegrees(Math.atan2(2 * ZETA * WZ * w, WZ * WZ - w * w)
        - Math.atan2(2 * ZETA * WP * w, WP * WP - w * w)) + thetaDeg;
  }

  @Test
  void phaseClosestToMinus180InsideTheBandIsFoundAndFailsTheMode() {
    // k = 2: |L| >= +0.33 dB over the whole band (above the -6 dB limit everywhere); theta = -80 deg
    // puts the dip 27.07 deg from -180 at r = 1.0149, while both band edges are ~95 deg away
    double wd = dipFrequency();
    double expected = 180 + phaseDeg(wd, -80);
    assertTrue(expected > 20 && expected < 35 && wd > 1.01 * WP && wd < 1.02 * WP, "premise " + expected);
    StructuralModeAssessment a = StructuralPeakSearch.assess(MODE, dip(2, -80), -6, 60, 0.1);
    assertEquals(StructuralStabilisation.FAILED, a.status());
    // Brent minimisation of a smooth minimum: value to round-off (1e-9 deg), location only to
    // ~sqrt(eps) relative because the minimum is flat (1e-6 relative)
    assertEquals(expected, a.phaseDistanceDeg(), 1e-9);
    assertEquals(wd / (2 * Math.PI), a.phaseDistanceFrequencyHz(), 1e-6 * F_HZ);
  }

  @Test
  void theSameInteriorMinimumAboveTheMarginIsPhaseStabilised() {
    double wd = dipFrequency();
    double expected = 180 + phaseDeg(wd, 0);
    StructuralModeAssessment a = StructuralPeakSearch.assess(MODE, dip(2, 0), -6, 60, 0.1);
    assertTrue(expected > 100 && expected < 110, "premise " + expected);
    assertEquals(StructuralStabilisation.PHASE_STABILISED, a.status());
    assertEquals(expected, a.phaseDistanceDeg(), 1e-9);
  }

  @Test
  void aResonanceMuchNarrowerThanTheSamplingIsResolved() {
    // zeta = 1e-4 at 5.123 Hz: half-power width 2e-4 relative, 15 times narrower than the initial
    // spacing (0.2/64 in ln w). Closed form (Thomson, Theory of Vibration): peak k/(2 zeta
    // sqrt(1 - zeta^2)) at w = wn sqrt(1 - 2 zeta^2). k = 1e-4 puts the peak at -6.02 dB.
    double fn = 5.123;
    double wn = 2 * Math.PI * fn;
    double z = 1e-4;
    double k = 1e-4;
    SisoFrequencyFunction l = (w, v) -> {
      double re = wn * wn - w * w;
      double im = 2 * z * wn * w;
      double d = re * re + im * im;
      v[0] = k * wn * wn * re / d;
      v[1] = -k * wn * wn * im / d;
    };
    StructuralModeAssessment a = StructuralPeakSearch.assess(MODE, l, -6, 60, 0.1);
    double peakDb = 20 * Math.log10(k / (2 * z * Math.sqrt(1 - z * z)));
    // value exact to round-off of the refined maximum; location to 1e-7 relative (flat top)
    assertEquals(peakDb, a.peakDb(), 1e-7);
    assertEquals(fn * Math.sqrt(1 - 2 * z * z), a.peakFrequencyHz(), 1e-7 * fn);
    assertEquals(StructuralStabilisation.GAIN_STABILISED, a.status());
    assertTrue(a.evaluations() > 66 && a.evaluations() < 20_000, "evaluations " + a.evaluations());
  }

  @Test
  void wrapKeepsAnglesInTheHalfOpenInterval() {
    assertEquals(180.0, StructuralPeakSearch.wrapDeg(180.0), 0.0);
    assertEquals(180.0, StructuralPeakSearch.wrapDeg(-180.0), 0.0);
    assertEquals(180.0, StructuralPeakSearch.wrapDeg(540.0), 0.0);
    assertEquals(-179.0, StructuralPeakSearch.wrapDeg(181.0), 1e-12);
    assertEquals(179.0, StructuralPeakSearch.wrapDeg(-181.0), 1e-12);
    assertEquals(-10.0, StructuralPeakSearch.wrapDeg(350.0), 1e-12);
    assertEquals(10.0, StructuralPeakSearch.wrapDeg(10.0), 0.0);
  }

  @Test
  void missingOrNonFiniteInputsAreRejectedWithTheField() {
    SisoFrequencyFunction ok = dip(1, 0);
    InvalidInputException m = assertThrows(InvalidInputException.class,
        () -> StructuralPeakSearch.assess(null, ok, -6, 60, 0.1));
    assertTrue(m.getMessage().contains("structural_mode"), m.getMessage());
    assertThrows(InvalidInputException.class, () -> StructuralPeakSearch.assess(MODE, null, -6, 60, 0.1));
    SisoFrequencyFunction nan = (w, v) -> {
      v[0] = w > WP ? Double.NaN : 1.0;
      v[1] = 0.0;
    };
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> StructuralPeakSearch.assess(MODE, nan, -6, 60, 0.1));
    assertTrue(e.getMessage().contains("loop_response") && e.getMessage().contains("a finite response"),
        e.getMessage());
    SisoFrequencyFunction inf = (w, v) -> {
      v[0] = 1.0;
      v[1] = w > WP ? Double.POSITIVE_INFINITY : 0.0;
    };
    assertThrows(InvalidInputException.class, () -> StructuralPeakSearch.assess(MODE, inf, -6, 60, 0.1));
  }
}
