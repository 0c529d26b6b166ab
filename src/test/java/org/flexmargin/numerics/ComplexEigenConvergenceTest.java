package org.flexmargin.numerics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * Convergence rate, diagnostics and awkward structures of {@link ComplexEigen}, checked against
 * closed forms and against residuals computed here.
 */
class ComplexEigenConvergenceTest {

  private static final ComplexEigen EIGEN = new ComplexEigen();

  private static ZMatrixRMaj randomComplex(int n, long seed) {
    Random rnd = new Random(seed);
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a.set(i, j, rnd.nextGaussian(), rnd.nextGaussian());
      }
    }
    return a;
  }

  /** max_k ||A v_k - lambda_k v_k|| / max|A_ij|, computed independently with Commons Math. */
  private static double residual(ZMatrixRMaj a, ComplexEigenResult r) {
    int n = a.numRows;
    double norm = 0;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        norm = Math.max(norm, new Complex(a.getReal(i, j), a.getImag(i, j)).abs());
      }
    }
    ZMatrixRMaj v = r.vectors();
    double worst = 0;
    for (int k = 0; k < n; k++) {
      Complex lambda = new Complex(r.realAt(k), r.imagAt(k));
      double sum2 = 0;
      for (int i = 0; i < n; i++) {
        Complex s = Complex.ZERO;
        for (int j = 0; j < n; j++) {
          s = s.add(new Complex(a.getReal(i, j), a.getImag(i, j))
              .multiply(new Complex(v.getReal(j, k), v.getImag(j, k))));
        }
        s = s.subtract(lambda.multiply(new Complex(v.getReal(i, k), v.getImag(i, k))));
        sum2 += s.abs() * s.abs();
      }
      worst = Math.max(worst, Math.sqrt(sum2));
    }
    return worst / norm;
  }

  @Test
  void wilkinsonShiftsConvergeInAFewSweepsPerEigenvalue() {
    // Golub & Van Loan, Matrix Computations, 4th ed., 7.5.5-7.5.6: with Wilkinson shifts the
    // shifted QR iteration converges quadratically, about two sweeps per eigenvalue on general
    // matrices; small matrices need a few more. A budget of 5 sweeps per eigenvalue fails for a
    // shift that is wrong by a sign or a term, which degrades convergence to linear (tens of
    // sweeps each, with an exceptional shift every 11).
    for (int n : new int[] {6, 12, 24}) {
      for (long seed = 1; seed <= 3; seed++) {
        ComplexEigenResult r = EIGEN.decompose(randomComplex(n, 100 * n + seed));
        assertTrue(r.iterations() >= n - 1, "at least one sweep per deflation: " + r.iterations());
        assertTrue(r.iterations() <= 5 * n, "n = " + n + ": " + r.iterations() + " sweeps");
      }
    }
  }

  @Test
  void reportedResidualIsTheResidualOfTheReturnedPairs() {
    // The diagnostic must be the true relative residual (recomputed here), not a placeholder:
    // agreement to 1e-6 relative (both sums are accurate to a few ulps of ~1e-15 terms).
    for (int n : new int[] {3, 9}) {
      ZMatrixRMaj a = randomComplex(n, 77 + n);
      ComplexEigenResult r = EIGEN.decompose(a);
      double mine = residual(a, r);
      assertTrue(mine > 0 && mine < 1e-12, "residual " + mine);
      assertEquals(mine, r.relativeResidual(), 1e-6 * mine);
    }
  }

  @Test
  void zeroSubdiagonalLeadOfAColumnIsReflectedCorrectly() {
    // a(1,0) = 0 but a(2,0) != 0: the Householder vector's phase reference vanishes.
    // Checked through trace, determinant and the residual, all independent of the eigen-solver:
    // trace = 13, det = 1*(4*8 - 5*7)
    // - 2*(0*8 - 5*6) + 3*(0*7 - 4*6) = -3 + 60 - 72 = -15. Tolerance 1e-12: rounding.
    ZMatrixRMaj a = new ZMatrixRMaj(3, 3);
    double[][] m = {{1, 2, 3}, {0, 4, 5}, {6, 7, 8}};
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        a.set(i, j, m[i][j], 0);
      }
    }
    ComplexEigenResult r = EIGEN.decompose(a);
    Complex trace = Complex.ZERO;
    Complex det = Complex.ONE;
    for (int k = 0; k < 3; k++) {
      Complex l = new Complex(r.realAt(k), r.imagAt(k));
      trace = trace.add(l);
      det = det.multiply(l);
    }
    assertEquals(13.0, trace.getReal(), 1e-12);
    assertEquals(0.0, trace.getImaginary(), 1e-12);
    assertEquals(-15.0, det.getReal(), 1e-11);
    assertEquals(0.0, det.getImaginary(), 1e-11);
    assertTrue(residual(a, r) < 1e-13, "residual " + residual(a, r));
  }

  @Test
  void cyclicPermutationHasTheRootsOfUnity() {
    // Closed form: the cyclic shift of order n has the n-th roots of unity as eigenvalues. It is
    // unitary with all eigenvalues on one circle, the classic case where unshifted or badly
    // shifted QR stalls. Tolerance 1e-12: backward-stable solve of a perfectly conditioned matrix.
    for (int n : new int[] {4, 7}) {
      ZMatrixRMaj p = new ZMatrixRMaj(n, n);
      for (int i = 0; i < n; i++) {
        p.set((i + 1) % n, i, 1, 0);
      }
      ComplexEigenResult r = EIGEN.decompose(p);
      double[] angles = new double[n];
      for (int k = 0; k < n; k++) {
        assertEquals(1.0, Math.hypot(r.realAt(k), r.imagAt(k)), 1e-12);
        double t = Math.atan2(r.imagAt(k), r.realAt(k)) * n / (2 * Math.PI);
        angles[k] = ((Math.round(t) % n) + n) % n;
        assertEquals(Math.round(t), t, 1e-10);
      }
      Arrays.sort(angles);
      double[] expected = new double[n];
      for (int k = 0; k < n; k++) {
        expected[k] = k;
      }
      assertArrayEquals(expected, angles, 0.0);
      assertTrue(residual(p, r) < 1e-12);
    }
  }

  @Test
  void repeatedEigenvaluesAndAJordanBlockGiveUnitEigenvectors() {
    // diag(2, 2, 3) and the Jordan block [[1, 1], [0, 1]]: equal diagonal entries of the Schur
    // form make the back substitution divide by zero unless guarded. Closed form: eigenvalues
    // are the diagonal; the Jordan block's only eigenvector is e1.
    ZMatrixRMaj d = new ZMatrixRMaj(3, 3);
    d.set(0, 0, 2, 0);
    d.set(1, 1, 2, 0);
    d.set(2, 2, 3, 0);
    ComplexEigenResult rd = EIGEN.decompose(d);
    double[] re = rd.real();
    Arrays.sort(re);
    assertArrayEquals(new double[] {2, 2, 3}, re, 1e-15);
    for (int k = 0; k < 3; k++) {
      assertEquals(1.0, columnNorm(rd.vectors(), k), 1e-14);
    }
    assertTrue(residual(d, rd) < 1e-15);

    ZMatrixRMaj j = new ZMatrixRMaj(2, 2);
    j.set(0, 0, 1, 0);
    j.set(0, 1, 1, 0);
    j.set(1, 1, 1, 0);
    ComplexEigenResult rj = EIGEN.decompose(j);
    for (int k = 0; k < 2; k++) {
      assertEquals(1.0, rj.realAt(k), 1e-15);
      assertTrue(Double.isFinite(rj.vectors().getReal(0, k)));
      assertEquals(1.0, columnNorm(rj.vectors(), k), 1e-14);
      // along e1 to within the guard's relative size (about one ulp of the norm)
      assertEquals(1.0, Math.hypot(rj.vectors().getReal(0, k), rj.vectors().getImag(0, k)), 1e-12);
    }
  }

  private static double columnNorm(ZMatrixRMaj v, int k) {
    double s = 0;
    for (int i = 0; i < v.numRows; i++) {
      s = Math.hypot(s, Math.hypot(v.getReal(i, k), v.getImag(i, k)));
    }
    return s;
  }

  @Test
  void badInputIsRejectedWithItsPosition() {
    assertThrows(IllegalArgumentException.class, () -> EIGEN.decompose(new ZMatrixRMaj(2, 3)));
    ZMatrixRMaj a = new ZMatrixRMaj(3, 3);
    a.set(1, 2, Double.NaN, 0);
    ArithmeticException e = assertThrows(ArithmeticException.class, () -> EIGEN.decompose(a));
    assertTrue(e.getMessage().contains("1,2"), e.getMessage());
    ZMatrixRMaj b = new ZMatrixRMaj(2, 2);
    b.set(0, 1, 0, Double.POSITIVE_INFINITY);
    assertThrows(ArithmeticException.class, () -> EIGEN.decompose(b));
  }

  @Test
  void emptyMatrixHasNoEigenvalues() {
    ComplexEigenResult r = EIGEN.decompose(new ZMatrixRMaj(0, 0));
    assertEquals(0, r.size());
    assertEquals(0, r.vectors().numRows);
    assertEquals(0, r.iterations());
  }
}
