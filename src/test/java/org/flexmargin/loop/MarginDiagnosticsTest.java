package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Grid statistics of {@link LoopMargins} against their definitions ({@link MarginDiagnostics},
 * {@link MarginOptions}), and the choice of the governing crossover of a result.
 */
class MarginDiagnosticsTest {

  /** 1/(1 + j w), evaluated directly. */
  private static final SisoFrequencyFunction LAG = (w, v) -> {
    v[0] = 1 / (1 + w * w);
    v[1] = -w / (1 + w * w);
  };

  private static MarginOptions options(double seedDamping) {
    return new MarginOptions(40, 10.0, 1.5, 200_000, 30, seedDamping, 8);
  }

  /**
   * 3.51 decades at 40 points per decade: ceil(140.4) + 1 = 142 initial points (the ceiling is
   * far from an integer, so round-off in the logarithms cannot move it).
   */
  @Test
  void initialGridHasTheStatedPointCountAndTheCountsAddUp() {
    MarginDiagnostics d = new LoopMargins(options(0.3)).analyse(LAG, 1, Math.pow(10, 3.51),
        Eigenvalues.none()).diagnostics();
    assertEquals(142, d.initialPoints());
    assertEquals(0, d.seedPoints());
    assertEquals(d.gridPoints(), d.initialPoints() + d.seedPoints() + d.refinementPoints());
  }

  /**
   * Seed pole -3 +- 4j: damping ratio exactly 3/5 = 0.6, natural frequency 5, half-bandwidth 3.
   * Seeding needs damping strictly below the option: at 0.6 nothing is added; at 0.61 the points
   * 4 + 3 j for j = -8..8 inside (1, 10^3.51) rad/s are 4, 7, ..., 28 (9 points; w = 1 is the
   * range end, not inside) plus w_n = 5: 10 points. The conjugate gives the same frequencies,
   * which are not added twice.
   */
  @Test
  void seedPointsFollowTheDampingThresholdAndTheRange() {
    Eigenvalues seeds = new Eigenvalues(new double[] {-3, -3}, new double[] {4, -4});
    MarginDiagnostics at = new LoopMargins(options(0.6)).analyse(LAG, 1, Math.pow(10, 3.51), seeds)
        .diagnostics();
    assertEquals(0, at.seedPoints());
    MarginDiagnostics below = new LoopMargins(options(0.61)).analyse(LAG, 1, Math.pow(10, 3.51),
        seeds).diagnostics();
    assertEquals(142, below.initialPoints());
    assertEquals(10, below.seedPoints());
    assertEquals(below.gridPoints(),
        below.initialPoints() + below.seedPoints() + below.refinementPoints());
    // a real pole seeds nothing
    MarginDiagnostics real = new LoopMargins(options(1.0)).analyse(LAG, 1, Math.pow(10, 3.51),
        new Eigenvalues(new double[] {-5}, new double[] {0})).diagnostics();
    assertEquals(0, real.seedPoints());
  }

  /** The governing phase margin is the crossover with the smallest |PM|, whatever its sign. */
  @Test
  void governingPhaseMarginIsTheSmallestInMagnitude() {
    GainCrossover a = new GainCrossover(1, 1 / (2 * Math.PI), -140, 40, 0.7);
    GainCrossover b = new GainCrossover(3, 3 / (2 * Math.PI), -210, -30, 1.9);
    GainCrossover c = new GainCrossover(5, 5 / (2 * Math.PI), -135, 45, 0.16);
    LoopMarginResult r = new LoopMarginResult(0.1, 10, List.of(a, b, c), List.of(),
        DiskMargin.ofAlpha(0.5, 1), new PeakGain(1, 1 / (2 * Math.PI), 2, 6.02),
        ClosedLoopStability.NOT_CHECKED, new MarginDiagnostics(1, 0, 0, 1, 0, 1));
    assertEquals(b, r.governingPhaseMargin().orElseThrow());
    assertEquals(c, r.governingDelayMargin().orElseThrow());
    assertEquals(0.16, r.delayMarginS().orElseThrow(), 0.0);
  }

  /** Angles wrap into (-pi, pi]: -pi itself maps to +pi, +pi stays, 3 pi/2 becomes -pi/2. */
  @Test
  void wrapKeepsTheHalfOpenInterval() {
    assertEquals(Math.PI, LoopMargins.wrap(-Math.PI), 0.0);
    assertEquals(Math.PI, LoopMargins.wrap(Math.PI), 0.0);
    assertEquals(-Math.PI / 2, LoopMargins.wrap(1.5 * Math.PI), 1e-15);
  }

  /**
   * Every sampled grid point is evaluated once: the gain-peak and disk-margin searches take their
   * grid values from the samples already taken, so a frequency is evaluated again only where
   * Brent's maximiser starts at a grid point (at most 8 maxima for each of the two quantities).
   * The evaluation count of the diagnostics is the number of calls made.
   */
  @Test
  void gridPointsAreEvaluatedOnceAndEveryCallIsCounted() {
    java.util.Map<Double, Integer> calls = new java.util.HashMap<>();
    SisoFrequencyFunction counted = (w, v) -> {
      calls.merge(w, 1, Integer::sum);
      LAG.response(w, v);
    };
    MarginDiagnostics d = new LoopMargins(options(0.3)).analyse(counted, 1, Math.pow(10, 3.51),
        Eigenvalues.none()).diagnostics();
    int total = calls.values().stream().mapToInt(Integer::intValue).sum();
    long repeated = calls.values().stream().filter(c -> c > 1).count();
    assertEquals(total, d.functionEvaluations());
    org.junit.jupiter.api.Assertions.assertTrue(repeated <= 16, "frequencies evaluated more than once: " + repeated);
    org.junit.jupiter.api.Assertions.assertTrue(d.gridPoints() >= 142);
  }
}
