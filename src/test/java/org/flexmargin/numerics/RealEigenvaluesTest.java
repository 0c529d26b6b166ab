package org.flexmargin.numerics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.ejml.data.Complex_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Eigenvalues of dense real matrices against two independent libraries (EJML's and Commons
 * Math's general eigen-decompositions) on seeded random matrices, and against closed forms:
 * companion matrices of polynomials with chosen roots, Jordan blocks (perturbation bound),
 * exactly scaled symmetric matrices, triangular and zero matrices.
 */
class RealEigenvaluesTest {
  private static final double EPS = Math.ulp(1.0);

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 3, 4, 5, 8, 13, 30, 60, 135, 300})
  void randomMatricesAgreeWithEjml(int n) {
    DMatrixRMaj a = gaussian(n, 1000L + n);
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    EigenDecomposition_F64<DMatrixRMaj> ej = DecompositionFactory_DDRM.eig(n, false);
    assertTrue(ej.decompose(a.copy()));
    double[] re = new double[n];
    double[] im = new double[n];
    for (int i = 0; i < n; i++) {
      Complex_F64 ev = ej.getEigenvalue(i);
      re[i] = ev.real;
      im[i] = ev.imaginary;
    }
    assertTrue(r.converged());
    assertEquals(n, r.size());
    // Both solvers are backward stable: perturbation ~ n eps ||A|| (||A||_2 ~ 2 sqrt(n) for
    // unit Gaussian entries), i.e. below 1e-11 at n = 300; eigenvalue condition numbers of
    // random Gaussian matrices stay below ~1e3. 1e-8 leaves a wide margin over both.
    assertTrue(EigenvalueMatch.maxDistance(r, re, im) < 1e-8,
        "distance " + EigenvalueMatch.maxDistance(r, re, im));
  }

  @ParameterizedTest
  @ValueSource(ints = {30, 135, 300})
  void randomMatricesNeedAboutTwoSweepsPerEigenvalue(int n) {
    // Golub & Van Loan, Matrix Computations (sec. 7.5.6, from memory): on average about two
    // Francis sweeps per deflated 1 x 1 or 2 x 2 block; n blocks at most. A bound of 3 n sweeps
    // fails if a wrong shift turns the quadratic convergence into linear convergence.
    RealEigenvaluesResult r = RealEigenvalues.of(gaussian(n, 4000L + n));
    assertTrue(r.converged());
    assertTrue(r.iterations() <= 3 * n, r.iterations() + " sweeps for order " + n);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 3, 6, 17, 40, 100})
  void randomMatricesAgreeWithCommonsMath(int n) {
    DMatrixRMaj a = gaussian(n, 77L * n);
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    EigenDecomposition cm = new EigenDecomposition(new Array2DRowRealMatrix(rows(a)));
    // same basis as the EJML comparison
    double d = EigenvalueMatch.maxDistance(r, cm.getRealEigenvalues(), cm.getImagEigenvalues());
    assertTrue(d < 1e-8, "distance " + d);
  }

  @ParameterizedTest
  @ValueSource(ints = {7, 30, 135})
  void complexEigenvaluesComeInExactConjugatePairsPositiveFirstAndSumToTheTrace(int n) {
    DMatrixRMaj a = gaussian(n, 5L * n);
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    double[] re = r.real();
    double[] im = r.imag();
    int pairs = 0;
    double sum = 0;
    double trace = 0;
    for (int i = 0; i < n; i++) {
      sum += re[i];
      trace += a.get(i, i);
      if (im[i] > 0) {
        assertEquals(re[i], re[i + 1], 0.0);
        assertEquals(-im[i], im[i + 1], 0.0);
        pairs++;
        i++;
        sum += re[i];
        trace += a.get(i, i);
      } else {
        assertEquals(0.0, im[i], 0.0, "a real eigenvalue at " + i);
      }
    }
    assertTrue(pairs > 0, "a random matrix of order " + n + " has complex eigenvalues");
    // trace = sum of eigenvalues; round-off of n additions of O(sqrt n) terms, n eps ||A|| scale
    assertEquals(trace, sum, 1e-11 * n);
  }

  @Test
  void companionMatrixOfAPolynomialWithIntegerRootsGivesTheRoots() {
    // (x-1)(x-2)(x-3)(x-4)(x-5) = x^5 - 15x^4 + 85x^3 - 225x^2 + 274x - 120 (expanded by hand;
    // integer coefficients are exact in double). Roots 1..5.
    RealEigenvaluesResult r = RealEigenvalues.of(companion(-15, 85, -225, 274, -120));
    // backward error ~ eps ||C|| ~ 300 eps; root sensitivities |p'(k)|^-1 * sum |c_i k^i| are
    // below 1e3 for these roots, so errors stay below ~1e-10
    assertTrue(EigenvalueMatch.maxDistance(r, new double[] {1, 2, 3, 4, 5}, new double[5]) < 1e-9);
  }

  @Test
  void companionMatrixWithComplexRootsGivesTheRoots() {
    // (x^2 + 2x + 5)(x^2 - x + 0.5)(x + 3): roots -1 +- 2i, 0.5 +- 0.5i, -3.
    // (x^2 + 2x + 5)(x^2 - x + 0.5) = x^4 + x^3 + 3.5x^2 - 4x + 2.5;
    // times (x + 3) = x^5 + 4x^4 + 6.5x^3 + 6.5x^2 - 9.5x + 7.5 (exact binary fractions).
    RealEigenvaluesResult r = RealEigenvalues.of(companion(4, 6.5, 6.5, -9.5, 7.5));
    double[] re = {-1, -1, 0.5, 0.5, -3};
    double[] im = {2, -2, 0.5, -0.5, 0};
    // well separated roots of a degree-5 polynomial with coefficients below 10: ~1e-14 errors
    assertTrue(EigenvalueMatch.maxDistance(r, re, im) < 1e-12);
  }

  @ParameterizedTest
  @ValueSource(ints = {4, 6, 9})
  void cyclicPermutationNeedsTheExceptionalShiftAndGivesTheRootsOfUnity(int n) {
    // Companion matrix of x^n - 1: a cyclic permutation. Its eigenvalues are the n-th roots of
    // unity exp(2 pi i k / n). It is orthogonal, so a QR step with the standard (zero) shifts
    // reproduces it and only the exceptional shift breaks the cycle.
    double[] coefficients = new double[n];
    coefficients[n - 1] = -1;
    DMatrixRMaj c = companion(coefficients);
    double[] re = new double[n];
    double[] im = new double[n];
    for (int k = 0; k < n; k++) {
      re[k] = Math.cos(2 * Math.PI * k / n);
      im[k] = Math.sin(2 * Math.PI * k / n);
    }
    RealEigenvaluesResult r = RealEigenvalues.of(c);
    assertTrue(r.converged());
    assertTrue(r.iterations() >= RealEigenvalues.EXCEPTIONAL_PERIOD, "iterations " + r.iterations());
    // normal matrix: eigenvalues perturbed by at most the backward error, ~n eps
    assertTrue(EigenvalueMatch.maxDistance(r, re, im) < 1e-12);
    // without reaching the exceptional shift the iteration makes no progress
    RealEigenvaluesResult stalled =
        new RealEigenvalues(RealEigenvalues.EXCEPTIONAL_PERIOD - 1).solve(c);
    assertFalse(stalled.converged());
  }

  @ParameterizedTest
  @ValueSource(ints = {2, 3, 4})
  void jordanBlockEigenvaluesStayWithinThePerturbationBound(int k) {
    // J = lambda I + N (k x k Jordan block, lambda = 2) hidden by an orthogonal similarity
    // A = Q (J (+) D) Q^T with a well separated diagonal D. A perturbation of size delta moves a
    // defective eigenvalue of a k-block by about delta^(1/k) (Golub & Van Loan, Matrix
    // Computations, 4th ed., sec. 7.2.2); delta = backward error ~ n eps ||A||.
    int n = k + 3;
    DMatrixRMaj j = new DMatrixRMaj(n, n);
    for (int i = 0; i < k; i++) {
      j.set(i, i, 2.0);
      if (i + 1 < k) {
        j.set(i, i + 1, 1.0);
      }
    }
    j.set(k, k, -1.0);
    j.set(k + 1, k + 1, 5.0);
    j.set(k + 2, k + 2, 9.0);
    DMatrixRMaj a = orthogonalSimilarity(j, 31L * k);
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    double delta = n * EPS * 10;
    double bound = 10 * Math.pow(delta, 1.0 / k);
    double meanRe = 0;
    double meanIm = 0;
    int near = 0;
    for (int i = 0; i < n; i++) {
      double d = Math.hypot(r.real()[i] - 2.0, r.imag()[i]);
      if (d < 0.5) {
        assertTrue(d < bound, "eigenvalue " + i + " at distance " + d + ", bound " + bound);
        meanRe += r.real()[i];
        meanIm += r.imag()[i];
        near++;
      }
    }
    assertEquals(k, near);
    // the mean of the cluster is well conditioned (trace of the invariant subspace): ~delta
    assertEquals(2.0, meanRe / k, 1e-12);
    assertEquals(0.0, meanIm / k, 1e-12);
    double[] others = {-1, 5, 9};
    for (double e : others) {
      double best = Double.MAX_VALUE;
      for (int i = 0; i < n; i++) {
        best = Math.min(best, Math.hypot(r.real()[i] - e, r.imag()[i]));
      }
      // simple, well separated eigenvalues of a nearly normal matrix: ~delta
      assertTrue(best < 1e-12, "eigenvalue " + e + " missed by " + best);
    }
  }

  @Test
  void repeatedNonDefectiveEigenvaluesOfASymmetricMatrixAreAccurate() {
    // Q diag(1, 1, 1, 4, 4, -2) Q^T is symmetric: eigenvalue perturbation <= backward error
    // (Weyl), ~ n eps ||A|| ~ 1e-14 even for the repeated ones.
    double[] d = {1, 1, 1, 4, 4, -2};
    DMatrixRMaj a = orthogonalSimilarity(diagonal(d), 99L);
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    assertTrue(EigenvalueMatch.maxDistance(r, d, new double[d.length]) < 1e-13);
  }

  @Test
  void badlyScaledMatrixIsBalancedAndKeepsItsEigenvaluesAccurate() {
    // A = D S D^-1 with S = Q diag(1..8) Q^T symmetric and D = diag(2^(7i)), i = 0..7. Powers
    // of two make A an exact similarity of S in floating point, so its eigenvalues are those of
    // S (within ~n eps of 1..8, Weyl). The entries of A are scaled by up to 2^(+-49): without
    // balancing the backward error eps ||A|| ~ 2^49 eps ~ 0.1 would ruin them.
    int n = 8;
    double[] d = new double[n];
    for (int i = 0; i < n; i++) {
      d[i] = i + 1;
    }
    DMatrixRMaj s = orthogonalSimilarity(diagonal(d), 4242L);
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a.set(i, j, Math.scalb(s.get(i, j), 7 * (i - j)));
      }
    }
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    assertTrue(EigenvalueMatch.maxDistance(r, d, new double[n]) < 1e-12,
        "distance " + EigenvalueMatch.maxDistance(r, d, new double[n]));
  }

  @ParameterizedTest
  @ValueSource(doubles = {1e-6, 1e-9})
  void twoNearlyRepeatedPairsInAStronglyNonNormalMatrixConverge(double delta) {
    // A = S T S^-1, T upper triangular with diagonal (-30, -15, -30 + delta, -15 + delta) and
    // entries ~100 above it: two copies of a pair of distinct real eigenvalues, as the lag
    // states of aerodynamic approximations produce. Two distinct real shifts cannot separate the
    // copies; the iteration must still converge.
    double[] diag = {-30, -15, -30 + delta, -15 + delta};
    Random rnd = new Random(0);
    DMatrixRMaj t = diagonal(diag);
    for (int i = 0; i < 4; i++) {
      for (int j = i + 1; j < 4; j++) {
        t.set(i, j, 100 * rnd.nextGaussian());
      }
    }
    DMatrixRMaj sim = CommonOps_DDRM.identity(4);
    for (int i = 0; i < 16; i++) {
      sim.data[i] += 0.5 * rnd.nextGaussian();
    }
    DMatrixRMaj inv = sim.copy();
    assertTrue(CommonOps_DDRM.invert(inv));
    DMatrixRMaj a = new DMatrixRMaj(4, 4);
    CommonOps_DDRM.mult(sim, CommonOps_DDRM.mult(t, inv, null), a);
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    assertTrue(r.converged());
    // each copy: a nearly defective pair moves by about sqrt(perturbation x coupling),
    // sqrt(4 eps * 165 * 100) ~ 4e-6 (Golub & Van Loan sec. 7.2.2); the pair's mean is well
    // conditioned (~eps ||A|| cond(S)^2 ~ 1e-12)
    for (double centre : new double[] {-30 + delta / 2, -15 + delta / 2}) {
      double sum = 0;
      int near = 0;
      for (int i = 0; i < 4; i++) {
        double d = Math.hypot(r.real()[i] - centre, r.imag()[i]);
        if (d < 1) {
          assertTrue(d < 1e-4, "distance " + d);
          sum += r.real()[i];
          near++;
        }
      }
      assertEquals(2, near);
      assertEquals(centre, sum / 2, 1e-9);
    }
  }

  @Test
  void negligibleSubDiagonalFollowsTheNeighbourAndTheEigenvaluePerturbationTests() {
    // hqr test: |c| <= eps (|a| + |d|) = 2.2e-16 * 45 = 1.0e-14
    assertTrue(RealEigenvalues.negligible(9e-15, -15, 100, -30, 1e3));
    assertFalse(RealEigenvalues.negligible(1.1e-14, -15, 100, -30, 1e3));
    // Ahues-Tisseur: |c| = 1e-13 <= eps ||H|| = 2.2e-13 and |b c| = 5e-15 <= eps |d| |a - d|
    // = 2.2e-16 * 30 * 15 = 9.9e-14: negligible although above the hqr test
    assertTrue(RealEigenvalues.negligible(1e-13, -15, 0.05, -30, 1e3));
    // ... but not with a large mirror entry (|b c| = 1e-12 > 9.9e-14)
    assertFalse(RealEigenvalues.negligible(1e-13, -15, 10, -30, 1e3));
    // ... nor when the entry is above round-off of the matrix norm (eps * 100 = 2.2e-14)
    assertFalse(RealEigenvalues.negligible(1e-13, -15, 0.05, -30, 100));
    // nearly equal neighbours a = -30, d = -30.1: hqr bound eps * 60.1 = 1.3e-14 < |c| = 2e-14;
    // |b c| against eps |d| |a - d| = 2.2e-16 * 30.1 * 0.1 = 6.7e-16: b = 0.01 passes, b = 1 not
    assertTrue(RealEigenvalues.negligible(2e-14, -30, 0.01, -30.1, 1e3));
    assertFalse(RealEigenvalues.negligible(2e-14, -30, 1, -30.1, 1e3));
    // zero diagonal neighbours: measured against the matrix norm instead
    assertTrue(RealEigenvalues.negligible(1e-20, 0, 1, 0, 1));
    assertFalse(RealEigenvalues.negligible(1e-10, 0, 1, 0, 1));
  }

  @Test
  void upperTriangularInputGivesItsDiagonalExactlyWithoutIterating() {
    double[] diag = {3, -1, 2, 5, 0.25, -7};
    DMatrixRMaj a = diagonal(diag);
    Random rnd = new Random(8);
    for (int i = 0; i < diag.length; i++) {
      for (int j = i + 1; j < diag.length; j++) {
        a.set(i, j, rnd.nextGaussian() * 10);
      }
    }
    RealEigenvaluesResult r = RealEigenvalues.of(a);
    assertTrue(r.converged());
    assertEquals(0, r.iterations());
    // nothing to reduce: the eigenvalues are the diagonal entries themselves, bit for bit
    assertArrayEquals(diag, r.real(), 0.0);
    assertArrayEquals(new double[diag.length], r.imag(), 0.0);
  }

  @Test
  void zeroMatrixAndEmptyMatrix() {
    RealEigenvaluesResult r = RealEigenvalues.of(new DMatrixRMaj(5, 5));
    assertTrue(r.converged());
    assertEquals(0, r.iterations());
    assertArrayEquals(new double[5], r.real(), 0.0);
    assertArrayEquals(new double[5], r.imag(), 0.0);
    RealEigenvaluesResult empty = RealEigenvalues.of(new DMatrixRMaj(0, 0));
    assertTrue(empty.converged());
    assertEquals(0, empty.size());
  }

  @Test
  void twoByTwoBlocksFollowTheQuadraticFormula() {
    // [[1, 2], [3, 4]]: lambda^2 - 5 lambda - 2 = 0, lambda = (5 +- sqrt(33)) / 2
    RealEigenvaluesResult r = RealEigenvalues.of(matrix(new double[][] {{1, 2}, {3, 4}}));
    double s = Math.sqrt(33);
    assertTrue(EigenvalueMatch.maxDistance(r, new double[] {(5 + s) / 2, (5 - s) / 2},
        new double[2]) < 1e-14);
    // [[1, -5], [2, 3]]: lambda^2 - 4 lambda + 13 = 0, lambda = 2 +- 3i, positive first
    RealEigenvaluesResult c = RealEigenvalues.of(matrix(new double[][] {{1, -5}, {2, 3}}));
    assertEquals(2.0, c.real()[0], 1e-14);
    assertEquals(3.0, c.imag()[0], 1e-14);
    assertEquals(2.0, c.real()[1], 1e-14);
    assertEquals(-3.0, c.imag()[1], 1e-14);
    // [[1, 0], [1, 1]]: a double root 1 with a non-zero sub-diagonal, exactly
    RealEigenvaluesResult dbl = RealEigenvalues.of(matrix(new double[][] {{1, 0}, {1, 1}}));
    assertArrayEquals(new double[] {1, 1}, dbl.real(), 0.0);
    assertArrayEquals(new double[] {0, 0}, dbl.imag(), 0.0);
    // 1e200 (1 +- i): p^2 + bc would overflow without scaling the block first
    RealEigenvaluesResult big =
        RealEigenvalues.of(matrix(new double[][] {{1e200, 1e200}, {-1e200, 1e200}}));
    assertEquals(1e200, big.real()[0], 1e186);
    assertEquals(1e200, big.imag()[0], 1e186);
    assertEquals(-1e200, big.imag()[1], 1e186);
  }

  @Test
  void aReusedSolverGivesBitIdenticalResultsAndLeavesTheInputAlone() {
    DMatrixRMaj a = gaussian(40, 1L);
    DMatrixRMaj copy = a.copy();
    RealEigenvalues solver = new RealEigenvalues();
    RealEigenvaluesResult first = solver.solve(a);
    solver.solve(gaussian(60, 2L));
    solver.solve(gaussian(7, 3L));
    RealEigenvaluesResult again = solver.solve(a);
    assertArrayEquals(first.real(), again.real(), 0.0);
    assertArrayEquals(first.imag(), again.imag(), 0.0);
    assertEquals(first.iterations(), again.iterations());
    assertArrayEquals(copy.data, a.data, 0.0);
    RealEigenvaluesResult flat = new RealEigenvalues().solve(40, a.data);
    assertArrayEquals(first.real(), flat.real(), 0.0);
  }

  @Test
  void anExhaustedIterationBudgetIsReportedNotHidden() {
    DMatrixRMaj a = gaussian(6, 11L);
    RealEigenvaluesResult none = new RealEigenvalues(0).solve(a);
    assertFalse(none.converged());
    assertEquals(0, none.iterations());
    for (int i = 0; i < 6; i++) {
      assertTrue(Double.isNaN(none.real()[i]) && Double.isNaN(none.imag()[i]));
    }
    RealEigenvaluesResult few = new RealEigenvalues(2).solve(a);
    assertFalse(few.converged());
    assertEquals(2, few.iterations());
    // the unreached eigenvalues are NaN, the ones deflated before the budget ran out are kept
    assertTrue(Double.isNaN(few.real()[0]));
  }

  @Test
  void nonFiniteOrMalformedInputIsRejected() {
    DMatrixRMaj a = gaussian(3, 4L);
    a.set(1, 2, Double.NaN);
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> RealEigenvalues.of(a));
    assertTrue(e.getMessage().contains("(1, 2)") && e.getMessage().contains("NaN"),
        e.getMessage());
    a.set(1, 2, 0);
    a.set(2, 0, Double.NEGATIVE_INFINITY);
    e = assertThrows(IllegalArgumentException.class, () -> RealEigenvalues.of(a));
    assertTrue(e.getMessage().contains("(2, 0)") && e.getMessage().contains("Infinity"),
        e.getMessage());
    e = assertThrows(IllegalArgumentException.class,
        () -> RealEigenvalues.of(new DMatrixRMaj(2, 3)));
    assertTrue(e.getMessage().contains("2 x 3"), e.getMessage());
    assertThrows(IllegalArgumentException.class,
        () -> new RealEigenvalues().solve(3, new double[8]));
    assertThrows(IllegalArgumentException.class,
        () -> new RealEigenvalues().solve(-1, new double[0]));
    assertThrows(IllegalArgumentException.class, () -> new RealEigenvalues(-1));
  }

  @Test
  void resultRecordValidatesAndCopies() {
    double[] re = {1, 2};
    double[] im = {0, 0};
    RealEigenvaluesResult r = new RealEigenvaluesResult(re, im, 3, true);
    re[0] = 9;
    assertEquals(1.0, r.real()[0], 0.0);
    r.real()[1] = 9;
    r.imag()[1] = 9;
    assertEquals(2.0, r.real()[1], 0.0);
    assertEquals(0.0, r.imag()[1], 0.0);
    assertEquals(2, r.size());
    assertThrows(IllegalArgumentException.class,
        () -> new RealEigenvaluesResult(new double[2], new double[1], 0, true));
    assertThrows(IllegalArgumentException.class,
        () -> new RealEigenvaluesResult(null, new double[1], 0, true));
    assertThrows(IllegalArgumentException.class,
        () -> new RealEigenvaluesResult(new double[1], null, 0, true));
    assertThrows(IllegalArgumentException.class,
        () -> new RealEigenvaluesResult(new double[1], new double[1], -1, true));
  }

  // -------------------------------------------------------------------------------------------

  static DMatrixRMaj gaussian(int n, long seed) {
    Random rnd = new Random(seed);
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    for (int i = 0; i < n * n; i++) {
      a.data[i] = rnd.nextGaussian();
    }
    return a;
  }

  /** Companion matrix of x^n + c[0] x^(n-1) + ... + c[n-1]: first row -c, ones below. */
  static DMatrixRMaj companion(double... c) {
    int n = c.length;
    DMatrixRMaj m = new DMatrixRMaj(n, n);
    for (int j = 0; j < n; j++) {
      m.set(0, j, -c[j]);
    }
    for (int i = 1; i < n; i++) {
      m.set(i, i - 1, 1.0);
    }
    return m;
  }

  static DMatrixRMaj diagonal(double[] d) {
    DMatrixRMaj m = new DMatrixRMaj(d.length, d.length);
    for (int i = 0; i < d.length; i++) {
      m.set(i, i, d[i]);
    }
    return m;
  }

  static DMatrixRMaj matrix(double[][] rows) {
    return new DMatrixRMaj(rows);
  }

  /** Q M Q^T with Q a product of two Householder reflectors from seeded random vectors. */
  static DMatrixRMaj orthogonalSimilarity(DMatrixRMaj m, long seed) {
    int n = m.numRows;
    Random rnd = new Random(seed);
    DMatrixRMaj q = DMatrixRMaj.wrap(n, n, new double[n * n]);
    for (int i = 0; i < n; i++) {
      q.set(i, i, 1.0);
    }
    for (int r = 0; r < 2; r++) {
      double[] v = new double[n];
      double vv = 0;
      for (int i = 0; i < n; i++) {
        v[i] = rnd.nextGaussian();
        vv += v[i] * v[i];
      }
      DMatrixRMaj next = new DMatrixRMaj(n, n);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          // (I - 2 v v^T / v^T v) q
          double s = 0;
          for (int l = 0; l < n; l++) {
            s += ((i == l ? 1.0 : 0.0) - 2 * v[i] * v[l] / vv) * q.get(l, j);
          }
          next.set(i, j, s);
        }
      }
      q = next;
    }
    DMatrixRMaj out = new DMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double s = 0;
        for (int k = 0; k < n; k++) {
          for (int l = 0; l < n; l++) {
            s += q.get(i, k) * m.get(k, l) * q.get(j, l);
          }
        }
        out.set(i, j, s);
      }
    }
    return out;
  }

  static double[][] rows(DMatrixRMaj a) {
    double[][] r = new double[a.numRows][a.numCols];
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        r[i][j] = a.get(i, j);
      }
    }
    return r;
  }
}
