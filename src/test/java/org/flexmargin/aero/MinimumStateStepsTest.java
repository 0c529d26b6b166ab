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
    // Measured: round-off after 8 iterations (plain alternating least squares needed 72);
    // Newton's convergence on a zero residual is quadratic, so 20 is generous. 1e-9 on the
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
    assertTrue(c.iterations() <= 20, "iterations " + c.iterations());
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
  void newtonsGradientAndHessianAreTheDerivativesOfTheResidual() {
    // Independent check by central differences: the gradient written is half that of the residual S
    // (central difference of residual() over 4 h), the Hessian half that of S (central difference of
    // the gradient over 2 h), at D and E away from the minimum so that the second-order term
    // (M c - h) at (D[i][l], E[l][j]) is not zero. S is a polynomial of degree 4 in the parameters,
    // so with h = 1e-5 the truncation error (h^2 times a third derivative over 6) is of order 1e-10
    // and the round-off (eps S / h) too; 1e-7 of the largest entry is a wide margin that still
    // catches any missing or misplaced term (each of order 1e-2 or more).
    Known known = new Known(21);
    MinimumStateSteps steps = steps(known, 22);
    int nl = BETA.length;
    int size = 2 * N * nl;
    double[][][] start = perturbed(known, 23, 0.3);
    double[][] d = start[0];
    double[][] e = start[1];
    double[] hessian = new double[size * size];
    double[] gradient = new double[size];
    steps.newton(d, e, hessian, gradient, new double[nl], new double[nl]);
    double h = 1e-5;
    double[] plus = new double[size];
    double[] minus = new double[size];
    double[] scratch = new double[size * size];
    double largestG = 0;
    double largestH = 0;
    for (int p = 0; p < size; p++) {
      largestG = Math.max(largestG, Math.abs(gradient[p]));
      for (int q = 0; q < size; q++) {
        largestH = Math.max(largestH, Math.abs(hessian[p * size + q]));
      }
    }
    assertTrue(largestG > 1e-2 && largestH > 1e-2);
    for (int p = 0; p < size; p++) {
      shift(d, e, p, h);
      double sPlus = steps.residual(d, e, new double[nl]);
      steps.newton(d, e, scratch, plus, new double[nl], new double[nl]);
      shift(d, e, p, -2 * h);
      double sMinus = steps.residual(d, e, new double[nl]);
      steps.newton(d, e, scratch, minus, new double[nl], new double[nl]);
      shift(d, e, p, h);
      assertEquals((sPlus - sMinus) / (4 * h), gradient[p], 1e-7 * largestG, "gradient " + p);
      for (int q = 0; q < size; q++) {
        assertEquals((plus[q] - minus[q]) / (2 * h), hessian[q * size + p], 1e-7 * largestH, "hessian " + q + ", " + p);
      }
    }
  }

  /** Adds h to parameter p in the ordering of {@link MinimumStateSteps#newton}. */
  private static void shift(double[][] d, double[][] e, int p, double h) {
    int nl = BETA.length;
    if (p < N * nl) {
      d[p / nl][p % nl] += h;
    } else {
      e[(p - N * nl) / N][(p - N * nl) % N] += h;
    }
  }

  @Test
  void theNewtonStepSolvesTheDampedPenalisedEquations() {
    // Independent: the first call's step is delta = -(H + mu I + lambda0 diag(H + mu I))^-1 (g + mu x)
    // with lambda0 = INITIAL_DAMPING times 4^k, H and g half the Hessian and gradient of S (checked against
    // central differences above), x the parameters; solved here by Commons Math's Cholesky decomposition.
    // A trial is taken when it lowers the penalised residual F, else the damping grows fourfold.
    // mu = 1e-3 keeps the penalised minimum near the known one and still makes the ridge terms
    // count far above the tolerance.
    // 1e-9 of the largest step entry: two solutions of the same system of condition about 1e6.
    Known known = new Known(31);
    MinimumStateSteps steps = steps(known, 32);
    int nl = BETA.length;
    int size = 2 * N * nl;
    double[][][] start = perturbed(known, 33, 0.02);
    double[][] d = start[0];
    double[][] e = start[1];
    double mu = 1e-3;
    double[] hessian = new double[size * size];
    double[] gradient = new double[size];
    steps.newton(d, e, hessian, gradient, new double[nl], new double[nl]);
    double current = steps.residual(d, e, new double[nl]) + mu * MinimumStateLevenbergMarquardt.squares(d, e);
    // the damping grows fourfold per trial until a trial lowers F: find that trial independently
    double[] delta = null;
    for (int k = 0; k < MinimumStateLevenbergMarquardt.TRIALS && delta == null; k++) {
      double lambda = MinimumStateLevenbergMarquardt.INITIAL_DAMPING * Math.pow(4, k);
      double[][] a = new double[size][size];
      double[] b = new double[size];
      for (int p = 0; p < size; p++) {
        for (int q = 0; q < size; q++) {
          a[p][q] = hessian[p * size + q] + (p == q ? mu : 0.0);
        }
        a[p][p] *= 1 + lambda;
        b[p] = -gradient[p] - mu * (p < N * nl ? d[p / nl][p % nl] : e[(p - N * nl) / N][(p - N * nl) % N]);
      }
      // a trial whose matrix is not positive definite is skipped (the Hessian need not be)
      double[] trial;
      try {
        trial = new org.apache.commons.math3.linear.CholeskyDecomposition(
            new org.apache.commons.math3.linear.Array2DRowRealMatrix(a)).getSolver()
            .solve(new org.apache.commons.math3.linear.ArrayRealVector(b)).toArray();
      } catch (org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException notDefinite) {
        continue;
      }
      double[][] dt = new double[N][nl];
      double[][] et = new double[nl][N];
      for (int p = 0; p < size; p++) {
        shift(dt, et, p, trial[p] + (p < N * nl ? d[p / nl][p % nl] : e[(p - N * nl) / N][(p - N * nl) % N]));
      }
      if (steps.residual(dt, et, new double[nl]) + mu * MinimumStateLevenbergMarquardt.squares(dt, et) < current) {
        delta = trial;
      }
    }
    double[][] dStep = new double[N][];
    double[][] eStep = new double[nl][];
    for (int i = 0; i < N; i++) {
      dStep[i] = d[i].clone();
    }
    for (int l = 0; l < nl; l++) {
      eStep[l] = e[l].clone();
    }
    double f = new MinimumStateLevenbergMarquardt(steps).improve(dStep, eStep, current, mu);
    assertTrue(f < current, f + " from " + current);
    double largest = 0;
    for (double v : delta) {
      largest = Math.max(largest, Math.abs(v));
    }
    for (int p = 0; p < size; p++) {
      double moved = p < N * nl ? dStep[p / nl][p % nl] - d[p / nl][p % nl]
          : eStep[(p - N * nl) / N][(p - N * nl) % N] - e[(p - N * nl) / N][(p - N * nl) % N];
      assertEquals(delta[p], moved, 1e-9 * largest, "parameter " + p);
    }
    // the value returned is the penalised residual where the step went (sum of squares by hand)
    double squares = 0;
    for (double[][] m : new double[][][] {dStep, eStep}) {
      for (double[] row : m) {
        for (double v : row) {
          squares += v * v;
        }
      }
    }
    assertEquals(steps.residual(dStep, eStep, new double[nl]) + mu * squares, f, 1e-12 * current);
  }

  @Test
  void dataWithoutUnsteadyPartAreFittedByZeroLagTermsAtOnce() {
    // Q(ik) = A0 at every k: the weighted residual is zero from the start, the Newton step finds
    // nothing to lower (its matrix is zero and every trial fails), and only the round-off rule can
    // stop, after one iteration, with a weighted error of 0 and the lag, velocity and acceleration
    // matrices exactly zero (closed form).
    int n = 3;
    double[][][] a = new double[BETA.length + 3][n][n];
    Random rnd = new Random(41);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a[0][i][j] = 2 * rnd.nextDouble() - 1;
      }
    }
    RogerApproximationTest.RogerFormData data = new RogerApproximationTest.RogerFormData(a, BETA);
    MinimumStateApproximation.Result r = MinimumStateApproximation.fitWithConvergence(data, KS, BETA, 0.05,
        FitWeighting.ELEMENT);
    MinimumStateApproximation.Convergence c = r.convergence();
    assertTrue(c.converged(), c.toString());
    assertEquals(1, c.iterations());
    assertEquals(0.0, c.weightedError(), 0.0);
    for (int m = 1; m < BETA.length + 3; m++) {
      for (double[] row : r.fit().matrix(m)) {
        for (double v : row) {
          assertEquals(0.0, v, 0.0, "matrix " + m);
        }
      }
    }
  }

  @Test
  void aNewtonCallThatCannotLowerTheGivenValueLeavesDAndEAlone() {
    // contract: when no trial lowers F below the value given (here one far below the true F at D
    // and E, so none can), the call returns that value and D and E are untouched
    Known known = new Known(51);
    MinimumStateSteps steps = steps(known, 52);
    int nl = BETA.length;
    double[][] d = new double[N][nl];
    double[][] e = new double[nl][N];
    for (int i = 0; i < N; i++) {
      for (int l = 0; l < nl; l++) {
        d[i][l] = known.d[i][l] + 0.1;
        e[l][i] = known.e[l][i] - 0.1;
      }
    }
    double f = steps.residual(d, e, new double[nl]);
    assertTrue(f > 0);
    double given = 1e-6 * f;
    double[][] d0 = MinimumStateStepsTest.copy(d);
    double[][] e0 = MinimumStateStepsTest.copy(e);
    assertEquals(given, new MinimumStateLevenbergMarquardt(steps).improve(d, e, given, 0.0), 0.0);
    assertTrue(java.util.Arrays.deepEquals(d0, d) && java.util.Arrays.deepEquals(e0, e));
  }

  private static double[][] copy(double[][] m) {
    double[][] c = new double[m.length][];
    for (int i = 0; i < m.length; i++) {
      c[i] = m[i].clone();
    }
    return c;
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
    // Theodorsen typical section (n = 2) with 4 lag roots: one strip makes every lag matrix of rank
    // one, so the start from the Roger fit is already at the unpenalised minimum and only the ridge
    // moves it; the rule must stop long before the limit (measured: 40 iterations; a quarter of the
    // limit allows for the linear start while the damping of the Newton steps falls).
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    double[] ks = RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS);
    MinimumStateApproximation.Result r = MinimumStateApproximation.fitWithConvergence(data, ks,
        RogerApproximation.defaultLagRoots(1.5, 4), 0.05, FitWeighting.ELEMENT);
    MinimumStateApproximation.Convergence c = r.convergence();
    assertTrue(c.converged());
    assertTrue(c.iterations() < MinimumStateApproximation.MAX_ITERATIONS / 4, c.toString());
    assertTrue(c.lastDecrease() >= 0 && c.lastDecrease() <= MinimumStateApproximation.STOP_RELATIVE_DECREASE,
        c.toString());
    double[] h = c.history();
    assertEquals(c.iterations(), h.length);
    // a weighted fit of 0.5 % order
    assertTrue(c.weightedError() > 1e-3 && c.weightedError() < 2e-2, c.toString());
    assertTrue(r.fit().warnings().stream().noneMatch(w -> w.contains("iteration limit")), r.fit().warnings().toString());
  }

  @Test
  void theDemoAndTheGolandWingConvergeWithBoundedLagTerms() {
    // The automatic minimum-state settings (2 n = 16 lag roots over k in [0, 1.5], uniform weights)
    // on the demo's strip-theory forces and on the Goland wing (8 modes each). Without the ridge the
    // least squares has no minimum: neighbouring lag terms grow and cancel (measured with plain
    // alternating least squares: lag entries 40 times the largest entry of A0..A2 after 400
    // iterations, 900 times after 36 000, still falling), and the fit stopped at the limit. With it
    // the fit must converge before the limit, say nothing of the limit, and keep every lag matrix
    // within a few times the size of the data: a lag entry ten times the largest |Q_ij(ik)| can only
    // be cancelling a neighbour, as no single lag term contributes more than its entry at any k.
    for (String file : new String[] {"mode-tables/demo/demo-case.json", "mode-tables/validation/goland-wing.json"}) {
      AeroSource data = ConfigurationModel.of(CaseReader.read(Path.of(file)).configurations().get(0)).system().aero();
      double[] ks = RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS);
      MinimumStateApproximation.Result r = MinimumStateApproximation.fitWithConvergence(data, ks,
          RogerApproximation.defaultLagRoots(1.5, 16), 0.05, FitWeighting.UNIFORM);
      MinimumStateApproximation.Convergence c = r.convergence();
      assertTrue(c.converged(), file + " " + c);
      assertTrue(c.lastDecrease() <= MinimumStateApproximation.STOP_RELATIVE_DECREASE, file + " " + c);
      assertTrue(r.fit().warnings().stream().noneMatch(w -> w.contains("iteration limit")), r.fit().warnings().toString());
      double largestData = 0;
      org.ejml.data.ZMatrixRMaj q = new org.ejml.data.ZMatrixRMaj(data.size(), data.size());
      for (double k : ks) {
        data.forces(k, q);
        for (int i = 0; i < data.size(); i++) {
          for (int j = 0; j < data.size(); j++) {
            largestData = Math.max(largestData, Math.hypot(q.getReal(i, j), q.getImag(i, j)));
          }
        }
      }
      for (int l = 0; l < 16; l++) {
        for (double[] row : r.fit().matrix(l + 3)) {
          for (double v : row) {
            assertTrue(Math.abs(v) < 10 * largestData, file + " lag " + l + ": " + v + " against data " + largestData);
          }
        }
      }
    }
  }

  @Test
  void aFitStoppedByTheLimitSaysSoWithTheErrorAndItsLastDecrease() {
    // The demo's forces with 16 lag roots are far from converged after 20 iterations (the iterates
    // are still crossing the plateaus of the start: measured decrease about 1e-3 per iteration), so
    // a limit of 20 must stop them and the fit must say so.
    AnalysisCase demo = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    AeroSource data = ConfigurationModel.of(demo.configurations().get(0)).system().aero();
    double[] ks = RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS);
    MinimumStateApproximation.Result r = MinimumStateApproximation.fitWithConvergence(data, ks,
        RogerApproximation.defaultLagRoots(1.5, 16), 0.05, FitWeighting.UNIFORM, 20);
    MinimumStateApproximation.Convergence c = r.convergence();
    assertFalse(c.converged());
    assertEquals(20, c.iterations());
    assertTrue(c.lastDecrease() > MinimumStateApproximation.STOP_RELATIVE_DECREASE, c.toString());
    String expected = String.format(java.util.Locale.ROOT,
        "minimum-state fit stopped at the iteration limit 20: weighted fit error %.3g still falling by %.3g "
            + "relative in the last iteration", c.weightedError(), c.lastDecrease());
    assertTrue(r.fit().warnings().contains(expected), r.fit().warnings().toString());
  }

  @Test
  void oneIterationFromAPoorStartDoesNotClaimConvergence() {
    // from the unit-pattern start on exact data one iteration lowers the residual but not to
    // round-off (measured), so neither rule may claim convergence
    Known known = new Known(3);
    MinimumStateSteps steps = steps(known, 4);
    double[][] d = new double[N][BETA.length];
    for (int l = 0; l < BETA.length; l++) {
      d[l % N][l] = 1;
    }
    MinimumStateApproximation.Convergence c = MinimumStateApproximation.iterate(steps, d, new double[BETA.length][N], 1);
    assertFalse(c.converged(), c.toString());
    assertTrue(c.lastDecrease() > MinimumStateApproximation.STOP_RELATIVE_DECREASE, c.toString());
    assertEquals(1, c.iterations());
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

  /**
   * @return {D, E}: the known D and E, each entry moved by a seeded uniform amount within
   *     +-{@code amplitude}
   */
  private static double[][][] perturbed(Known known, long seed, double amplitude) {
    int nl = BETA.length;
    double[][] d = new double[N][nl];
    double[][] e = new double[nl][N];
    Random rnd = new Random(seed);
    for (int i = 0; i < N; i++) {
      for (int l = 0; l < nl; l++) {
        d[i][l] = known.d[i][l] + amplitude * (2 * rnd.nextDouble() - 1);
        e[l][i] = known.e[l][i] + amplitude * (2 * rnd.nextDouble() - 1);
      }
    }
    return new double[][][] {d, e};
  }
}
