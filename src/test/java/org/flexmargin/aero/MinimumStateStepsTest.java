package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.sweep.ConfigurationModel;
import org.junit.jupiter.api.Test;

/**
 * The reduced alternating least squares of the minimum-state fit and its stop rule
 * (docs/validation.md, "Minimum-state rational fit").
 */
class MinimumStateStepsTest {

  private static final double[] BETA = MinimumStateApproximationTest.MINIMUM_STATE_LAG_ROOTS;
  private static final double[] KS = RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS);
  private static final int N = 3;

  /** Known coefficients of the minimum-state form (A0 is 0: the steps fit Q - A0). */
  private static final class Known {
    final double[][] a1 = new double[N][N];
    final double[][] a2 = new double[N][N];
    final double[][] d = new double[N][BETA.length];
    final double[][] e = new double[BETA.length][N];

    Known(long seed) {
      Random rnd = new Random(seed);
      for (int i = 0; i < N; i++) {
        for (int j = 0; j < N; j++) {
          a1[i][j] = 2 * rnd.nextDouble() - 1;
          a2[i][j] = 2 * rnd.nextDouble() - 1;
        }
        for (int l = 0; l < BETA.length; l++) {
          d[i][l] = 2 * rnd.nextDouble() - 1;
          e[l][i] = 2 * rnd.nextDouble() - 1;
        }
      }
    }

    /** Q(ik) - A0 = A1 ik + A2 (ik)^2 + sum_l D[i][l] E[l][j] ik / (ik + beta_l), Commons Math complex. */
    Complex target(double k, int i, int j) {
      Complex p = new Complex(0, k);
      Complex q = p.multiply(a1[i][j]).add(p.multiply(p).multiply(a2[i][j]));
      for (int l = 0; l < BETA.length; l++) {
        q = q.add(p.divide(p.add(BETA[l])).multiply(d[i][l] * e[l][j]));
      }
      return q;
    }
  }

  /** The steps for data of the known form, each equation weighted by a random weight in [0.5, 2]. */
  private static MinimumStateSteps steps(Known known, long weightSeed) {
    int nk = KS.length;
    double[][] lagRe = new double[nk][BETA.length];
    double[][] lagIm = new double[nk][BETA.length];
    double[][][] tRe = new double[nk][N][N];
    double[][][] tIm = new double[nk][N][N];
    double[][][] w = new double[nk][N][N];
    Random rnd = new Random(weightSeed);
    for (int r = 0; r < nk; r++) {
      Complex p = new Complex(0, KS[r]);
      for (int l = 0; l < BETA.length; l++) {
        Complex lag = p.divide(p.add(BETA[l]));
        lagRe[r][l] = lag.getReal();
        lagIm[r][l] = lag.getImaginary();
      }
      for (int i = 0; i < N; i++) {
        for (int j = 0; j < N; j++) {
          Complex t = known.target(KS[r], i, j);
          tRe[r][i][j] = t.getReal();
          tIm[r][i][j] = t.getImaginary();
          w[r][i][j] = 0.5 + 1.5 * rnd.nextDouble();
        }
      }
    }
    return new MinimumStateSteps(KS, lagRe, lagIm, tRe, tIm, w);
  }

  @Test
  void dataOfTheMinimumStateFormAreFittedToRoundOffFromAPerturbedStart() {
    // Closed form: the data are A1 ik + A2 (ik)^2 + D (ikI - R)^-1 E ik with known A1, A2, D, E
    // (evaluated independently with Commons Math complex arithmetic), so the weighted residual's
    // minimum is 0 and the lag products D[i][l] E[l][j], A1 and A2 are the known ones (the split of
    // each product between D and E is not unique). Start: D perturbed by up to 30 % of its entries.
    // Measured: round-off (relative weighted error 9.6e-15) after 72 iterations; 1e-9 on the
    // coefficients allows for the conditioning of the lag functions (roots 0.08 to 0.9) at round-off.
    Known known = new Known(5);
    MinimumStateSteps steps = steps(known, 6);
    double[][] d = new double[N][BETA.length];
    Random rnd = new Random(7);
    for (int i = 0; i < N; i++) {
      for (int l = 0; l < BETA.length; l++) {
        d[i][l] = known.d[i][l] * (1 + 0.3 * (2 * rnd.nextDouble() - 1));
      }
    }
    double[][] e = new double[BETA.length][N];
    MinimumStateApproximation.Convergence c = MinimumStateApproximation.iterate(steps, d, e, 200);
    assertTrue(c.converged(), c.toString());
    assertTrue(c.iterations() < 200, "iterations " + c.iterations());
    assertTrue(c.weightedError() < 1e-12, "weighted error " + c.weightedError());
    double[][] a1 = new double[N][N];
    double[][] a2 = new double[N][N];
    steps.velocityAndAcceleration(d, e, a1, a2, new double[BETA.length]);
    for (int i = 0; i < N; i++) {
      for (int j = 0; j < N; j++) {
        assertEquals(known.a1[i][j], a1[i][j], 1e-9, "A1 " + i + j);
        assertEquals(known.a2[i][j], a2[i][j], 1e-9, "A2 " + i + j);
        for (int l = 0; l < BETA.length; l++) {
          assertEquals(known.d[i][l] * known.e[l][j], d[i][l] * e[l][j], 1e-9, "lag " + l + " of " + i + j);
        }
      }
    }
  }

  @Test
  void theResidualIsTheWeightedSumOfSquaresOfTheEquations() {
    // With D = 0 every lag coefficient is 0, and A1, A2 are the separate least-squares fits of the
    // imaginary parts by A1 k and the real parts by -A2 k^2: for data of the form A1 ik + A2 (ik)^2
    // alone (E = 0) these are exact, so the residual is 0 and A1, A2 are recovered; with the lag
    // part present the residual at D = 0 is below the sum of the squared weighted targets.
    Known known = new Known(8);
    for (double[] row : known.e) {
      java.util.Arrays.fill(row, 0.0);
    }
    MinimumStateSteps steps = steps(known, 9);
    double[][] d = new double[N][BETA.length];
    double[][] e = new double[BETA.length][N];
    assertEquals(0.0, steps.residual(d, e, new double[BETA.length]), 1e-26 * steps.targetSquares());
    double[][] a1 = new double[N][N];
    double[][] a2 = new double[N][N];
    steps.velocityAndAcceleration(d, e, a1, a2, new double[BETA.length]);
    for (int i = 0; i < N; i++) {
      for (int j = 0; j < N; j++) {
        assertEquals(known.a1[i][j], a1[i][j], 1e-12);
        assertEquals(known.a2[i][j], a2[i][j], 1e-12);
      }
    }
    assertTrue(steps.targetSquares() > 0);
  }

  @Test
  void aSmoothCaseStopsByTheRuleBeforeTheLimitAndSaysSo() {
    // Theodorsen typical section (n = 2) with 4 lag roots: the start from the Roger fit is already
    // at the minimum (measured: the weighted residual does not change after the first iteration), so
    // the rule stops as soon as one window has been seen: STOP_WINDOW + 1 iterations.
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    double[] ks = RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS);
    MinimumStateApproximation.Result r = MinimumStateApproximation.fitWithConvergence(data, ks,
        RogerApproximation.defaultLagRoots(1.5, 4), 0.05, FitWeighting.ELEMENT);
    MinimumStateApproximation.Convergence c = r.convergence();
    assertTrue(c.converged());
    assertEquals(MinimumStateApproximation.STOP_WINDOW + 1, c.iterations());
    assertTrue(c.lastDecrease() <= MinimumStateApproximation.STOP_RELATIVE_DECREASE, c.toString());
    double[] h = c.history();
    assertEquals(c.iterations(), h.length);
    // the weighted error is that of the last iteration, relative; a weighted fit of 0.5 % order
    assertTrue(c.weightedError() > 1e-3 && c.weightedError() < 2e-2, c.toString());
    assertTrue(r.fit().warnings().stream().noneMatch(w -> w.contains("iteration limit")), r.fit().warnings().toString());
    // each half-step cannot increase the residual (1e-12 relative for round-off)
    for (int it = 1; it < h.length; it++) {
      assertTrue(h[it] <= h[it - 1] * (1 + 1e-12), "iteration " + it);
    }
  }

  @Test
  void theIterationLimitIsReportedWithTheErrorAndItsLastDecrease() {
    // The demo's forces (8 modes, invented data) with 16 lag roots and uniform weights: measured to
    // be still falling by about 0.2 % per 10 iterations at the limit of 400.
    AnalysisCase demo = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    AeroSource data = ConfigurationModel.of(demo.configurations().get(0)).system().aero();
    double[] ks = RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS);
    MinimumStateApproximation.Result r = MinimumStateApproximation.fitWithConvergence(data, ks,
        RogerApproximation.defaultLagRoots(1.5, 16), 0.05, FitWeighting.UNIFORM);
    MinimumStateApproximation.Convergence c = r.convergence();
    assertFalse(c.converged());
    assertEquals(MinimumStateApproximation.MAX_ITERATIONS, c.iterations());
    assertTrue(c.lastDecrease() > MinimumStateApproximation.STOP_RELATIVE_DECREASE, c.toString());
    assertTrue(r.fit().warnings().stream().anyMatch(w -> w.startsWith("minimum-state fit stopped at the iteration limit 400")),
        r.fit().warnings().toString());
  }

  @Test
  void fewerIterationsThanTheWindowNeverClaimConvergence() {
    // from the unit-pattern start on exact data the residual is not yet round-off after 10
    // iterations (measured), so only the window rule could stop, and it needs 11
    Known known = new Known(3);
    MinimumStateSteps steps = steps(known, 4);
    double[][] d = new double[N][BETA.length];
    for (int l = 0; l < BETA.length; l++) {
      d[l % N][l] = 1;
    }
    MinimumStateApproximation.Convergence c = MinimumStateApproximation.iterate(steps, d, new double[BETA.length][N],
        MinimumStateApproximation.STOP_WINDOW);
    assertFalse(c.converged(), c.toString());
    assertTrue(Double.isNaN(c.lastDecrease()));
    assertEquals(MinimumStateApproximation.STOP_WINDOW, c.iterations());
  }

  @Test
  void aVanishedLagIsSolvedByTheLeastNormSolution() {
    // A column of D that is zero leaves its row of E undetermined: the normal equations are singular
    // and the least-norm solution sets that row to 0 instead of failing.
    Known known = new Known(12);
    MinimumStateSteps steps = steps(known, 13);
    double[][] d = new double[N][BETA.length];
    for (int i = 0; i < N; i++) {
      d[i][0] = known.d[i][0];
      d[i][1] = known.d[i][1];
    }
    double[][] e = new double[BETA.length][N];
    steps.solveColumns(d, e);
    for (int j = 0; j < N; j++) {
      assertEquals(0.0, e[2][j], 0.0);
      assertTrue(e[0][j] != 0);
    }
    double[][] bad = new double[N][BETA.length];
    bad[0][0] = Double.NaN;
    assertThrows(InvalidInputException.class, () -> steps.solveColumns(bad, e));
  }
}
