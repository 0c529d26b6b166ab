package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The margin grid is built as {@link LoopMargins} and {@link MarginOptions} specify, counted
 * through the result's diagnostics: the initial logarithmic grid has ceil(decades x points per
 * decade) + 1 points; a seeding pole adds 2 x seed points per side + 1 points spaced by its |real
 * part| around its damped frequency, and its natural frequency; repeats are dropped; poles at or
 * above the seeding damping ratio, real poles and points outside the band add nothing; a constant
 * loop needs no bisection. Every count is derived beside its test from that specification.
 */
class MarginGridCountsTest {
  /** Band 1 to 10 rad/s: one decade (ln 10 / ln 10 = 1 exactly, so the point count is exact). */
  private static final double W_MIN = 1;
  private static final double W_MAX = 10;

  /** The defaults (40 points per decade, 8 seed points per side, seeding below damping 0.3), taking the extrema at the grid's samples. */
  private static final LoopMargins MARGINS = new LoopMargins(MarginOptions.defaults().withoutExtremaRefinement());

  /** L = 0.5: no crossover, no phase change, no gain change; the grid is exactly the initial and seed points. */
  private static final SisoFrequencyFunction FLAT = (w, v) -> {
    v[0] = 0.5;
    v[1] = 0.0;
  };

  private static Eigenvalues pole(double zeta, double wnRadPerS) {
    return new Eigenvalues(new double[] {-zeta * wnRadPerS}, new double[] {wnRadPerS * Math.sqrt(1 - zeta * zeta)});
  }

  private static MarginDiagnostics grid(Eigenvalues seeds) {
    return MARGINS.analyse(FLAT, W_MIN, W_MAX, seeds).diagnostics();
  }

  @Test
  void theInitialGridHasPointsPerDecadeTimesDecadesPlusOne() {
    // 1 decade x 40 per decade = 40 intervals: 41 points; a constant L adds no point and is
    // evaluated once per grid point (no root finding, no maximisation)
    MarginDiagnostics d = grid(Eigenvalues.none());
    assertEquals(41, d.initialPoints());
    assertEquals(0, d.seedPoints());
    assertEquals(0, d.refinementPoints());
    assertEquals(41, d.gridPoints());
    assertEquals(41, d.functionEvaluations());
    assertEquals(0, d.unresolvedIntervals());
    // 5 points per decade: 5 intervals, 6 points
    LoopMargins coarse = new LoopMargins(new MarginOptions(5, 10, 1.5, 200_000, 30, 0.3, 8, false));
    assertEquals(6, coarse.analyse(FLAT, W_MIN, W_MAX, Eigenvalues.none()).diagnostics().initialPoints());
  }

  @Test
  void aLightlyDampedPoleAddsSeventeenPointsAndItsNaturalFrequency() {
    // zeta = 0.05 at 3 rad/s: spacing |Re| = 0.15 rad/s, damped frequency 2.99625 rad/s; the 17
    // points 2.99625 + j 0.15 (j = -8..8) span 1.79625 to 4.19625 rad/s, all inside the band and
    // none on the initial grid (whose points are 10^(m/40) rad/s); the natural frequency
    // 3 rad/s is an 18th point (0.00375 rad/s from the damped frequency, not on the grid)
    MarginDiagnostics d = grid(pole(0.05, 3.0));
    assertEquals(18, d.seedPoints());
    assertEquals(41 + 18, d.gridPoints());
    // a conjugate pair given with its negative imaginary part seeds the same points
    Eigenvalues lower = new Eigenvalues(new double[] {-0.15}, new double[] {-3.0 * Math.sqrt(1 - 0.0025)});
    assertEquals(18, grid(lower).seedPoints());
    // a second pole, zeta = 0.1 at 5 rad/s (spacing 0.5 rad/s, damped frequency 4.975 rad/s):
    // j = -7..8 give 1.475 to 8.975 rad/s inside the band (j = -8 gives 0.975, below it), 16
    // points and the natural frequency: 18 + 17
    assertEquals(35, grid(pole(0.05, 3.0).concat(pole(0.1, 5.0))).seedPoints());
    // 3 points per side: 7 + 1
    LoopMargins few = new LoopMargins(new MarginOptions(40, 10, 1.5, 200_000, 30, 0.3, 3, false));
    assertEquals(8, few.analyse(FLAT, W_MIN, W_MAX, pole(0.05, 3.0)).diagnostics().seedPoints());
  }

  @Test
  void onlyLightlyDampedComplexPolesInsideTheBandSeed() {
    // above the seeding damping ratio 0.3: nothing
    assertEquals(0, grid(pole(0.31, 3.0)).seedPoints());
    assertEquals(0, grid(pole(0.5, 3.0)).seedPoints());
    // just below it: seeds (zeta = 0.29 at 3 rad/s: spacing 0.87 rad/s, damped frequency
    // 2.8711 rad/s; 2.8711 + j 0.87 lies inside the band for j = -2..8, 1.1311 to 9.8311 rad/s,
    // and below 1 rad/s for j = -3: 11 points and the natural frequency 3 rad/s)
    assertEquals(11 + 1, grid(pole(0.29, 3.0)).seedPoints());
    // a real pole: nothing
    assertEquals(0, grid(new Eigenvalues(new double[] {-2.0}, new double[] {0.0})).seedPoints());
    // a pole far above the band: nothing; one straddling its top edge: only the points below 10
    // rad/s (zeta = 0.01 at 10 rad/s: spacing 0.1 rad/s, damped frequency 9.9995 rad/s: j = -8..0
    // lie below 10 rad/s, 9 points; the natural frequency 10 rad/s is the band's edge, not inside)
    assertEquals(0, grid(pole(0.01, 100.0)).seedPoints());
    assertEquals(9, grid(pole(0.01, 10.0)).seedPoints());
  }

  @Test
  void anUndampedPoleSeedsAClusterAndItsRepeatIsDropped() {
    // zeta = 0: the spacing falls back to 1e-9 of the frequency, so the 17 points lie within
    // 8e-9 relative of 3 rad/s, still distinct in ln w; the natural frequency equals the damped
    // one (the j = 0 point) and is dropped as a repeat: 17 points
    MarginDiagnostics d = grid(new Eigenvalues(new double[] {0.0}, new double[] {3.0}));
    assertEquals(17, d.seedPoints());
    // the same pole given twice: every point a repeat of the first pole's
    Eigenvalues twice = new Eigenvalues(new double[] {0.0, 0.0}, new double[] {3.0, 3.0});
    assertEquals(17, grid(twice).seedPoints());
  }

  @Test
  void theGridStaysWithinItsPointCap() {
    // a narrow resonance (zeta = 0.005 at 3.3 rad/s) between grid points needs bisection; with
    // the cap at its minimum (16) and 4 points per decade over one decade (5 initial points)
    // refinement goes on until the grid holds at least 16 points; a level stops adding points at
    // the cap but still copies the rest of the level before it, so the grid ends below twice the
    // cap; and the resonance is left unresolved, where the uncapped grid resolves it
    TransferFunctionBlock resonance = new TransferFunctionBlock(new double[] {1},
        new double[] {1, 2 * 0.005 * 3.3, 3.3 * 3.3});
    SisoFrequencyFunction l = resonance::response;
    MarginOptions capped = new MarginOptions(4, 10, 1.5, 16, 30, 0.3, 8, false);
    MarginOptions free = new MarginOptions(4, 10, 1.5, 200_000, 30, 0.3, 8, false);
    MarginDiagnostics c = new LoopMargins(capped).analyse(l, 1.0, 10.0, Eigenvalues.none()).diagnostics();
    MarginDiagnostics f = new LoopMargins(free).analyse(l, 1.0, 10.0, Eigenvalues.none()).diagnostics();
    assertEquals(5, c.initialPoints());
    assertTrue(c.gridPoints() >= 16 && c.gridPoints() < 2 * 16, "capped grid " + c);
    assertTrue(f.gridPoints() > c.gridPoints(), "uncapped grid " + f);
    assertTrue(c.unresolvedIntervals() > 0, "the cap leaves intervals unresolved: " + c);
    assertEquals(0, f.unresolvedIntervals(), "uncapped: " + f);
  }
}
