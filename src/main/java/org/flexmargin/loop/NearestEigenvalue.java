package org.flexmargin.loop;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_ZDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * The eigenvalue of a real square matrix A nearest a complex shift sigma, by shifted inverse
 * iteration: one complex LU of A - sigma I, then x &lt;- (A - sigma I)^-1 x, normalised, with the
 * eigenvalue estimate sigma + 1/mu, mu = x^H (A - sigma I)^-1 x (Wilkinson, <i>The Algebraic
 * Eigenvalue Problem</i>, 1965, ch. 9). The iteration converges to the eigenvalue that minimises
 * |lambda - sigma|, at the rate rho = |lambda_1 - sigma| / |lambda_2 - sigma| (lambda_2 the next
 * nearest), so it picks the same root as a full eigen-solve followed by a nearest-root search.
 *
 * <p>It is reported converged only when the estimate changed by at most {@value #TOLERANCE} of
 * its modulus in two successive steps within {@value #MAX_ITERATIONS} steps (so a second root
 * almost as near as the first, rho above about 0.45, is refused) and the residual
 * |A x - lambda x| is at most {@value #RESIDUAL_TOLERANCE} of the Frobenius norm of A (the
 * backward error of a full eigen-solve is of the order of the unit round-off times the norm).
 * Otherwise the caller falls back to a full eigen-decomposition. Stateless and thread-safe.
 */
public final class NearestEigenvalue {
  /** Largest number of inverse-iteration steps. */
  public static final int MAX_ITERATIONS = 40;
  /** Relative change of the estimate at which the iteration stops. */
  public static final double TOLERANCE = 1e-14;
  /** Largest accepted residual |A x - lambda x| / (|A|_F |x|). */
  public static final double RESIDUAL_TOLERANCE = 1e-12;

  private NearestEigenvalue() {}

  /**
   * Outcome of one search.
   *
   * @param real real part of the eigenvalue, 1/s (NaN when not converged)
   * @param imag imaginary part of the eigenvalue, rad/s (NaN when not converged)
   * @param iterations inverse-iteration steps taken, &gt;= 0
   * @param converged true if the estimate met both tests
   */
  public record Estimate(double real, double imag, int iterations, boolean converged) {
    /** Validates the iteration count and that a converged estimate is finite. */
    public Estimate {
      StateSpace.require(iterations >= 0, "iterations", ">= 0", String.valueOf(iterations));
      StateSpace.require(!converged || (Double.isFinite(real) && Double.isFinite(imag)), "eigenvalue",
          "finite when converged", real + ", " + imag);
    }

    private static Estimate failed(int iterations) {
      return new Estimate(Double.NaN, Double.NaN, iterations, false);
    }
  }

  /**
   * @param a real square matrix (not modified)
   * @param shiftRe real part of the shift, 1/s
   * @param shiftIm imaginary part of the shift, rad/s
   * @return the eigenvalue nearest the shift, or a not-converged estimate
   */
  public static Estimate near(DMatrixRMaj a, double shiftRe, double shiftIm) {
    StateSpace.require(a != null && a.numRows == a.numCols && a.numRows > 0, "matrix", "a non-empty square matrix",
        a == null ? "null" : a.numRows + " x " + a.numCols);
    StateSpace.require(Double.isFinite(shiftRe) && Double.isFinite(shiftIm), "shift", "finite",
        shiftRe + ", " + shiftIm);
    int n = a.numRows;
    ZMatrixRMaj m = new ZMatrixRMaj(n, n);
    double[] md = m.data;
    double norm = 0;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double v = a.get(i, j);
        norm += v * v;
        md[2 * (i * n + j)] = v;
      }
      md[2 * (i * n + i)] -= shiftRe;
      md[2 * (i * n + i) + 1] = -shiftIm;
    }
    norm = Math.sqrt(norm);
    LinearSolverDense<ZMatrixRMaj> lu = LinearSolverFactory_ZDRM.lu(n);
    // a singular factor (shift on an eigenvalue) shows as a non-finite solve below
    lu.setA(m);
    ZMatrixRMaj x = startVector(n);
    ZMatrixRMaj y = new ZMatrixRMaj(n, 1);
    double lr = Double.NaN;
    double li = Double.NaN;
    int settled = 0;
    for (int k = 1; k <= MAX_ITERATIONS; k++) {
      lu.solve(x, y);
      // mu = x^H y (x has unit norm)
      double mr = 0;
      double mi = 0;
      double yy = 0;
      double[] xd = x.data;
      double[] yd = y.data;
      for (int i = 0; i < 2 * n; i += 2) {
        mr += xd[i] * yd[i] + xd[i + 1] * yd[i + 1];
        mi += xd[i] * yd[i + 1] - xd[i + 1] * yd[i];
        yy += yd[i] * yd[i] + yd[i + 1] * yd[i + 1];
      }
      double mm = mr * mr + mi * mi;
      if (!(mm > 0) || !Double.isFinite(mm) || !Double.isFinite(yy)) {
        return Estimate.failed(k);
      }
      double nr = shiftRe + mr / mm;
      double ni = shiftIm - mi / mm;
      double change = Math.hypot(nr - lr, ni - li);
      settled = change <= TOLERANCE * Math.hypot(nr, ni) ? settled + 1 : 0;
      lr = nr;
      li = ni;
      double scale = 1 / Math.sqrt(yy);
      for (int i = 0; i < 2 * n; i++) {
        xd[i] = yd[i] * scale;
      }
      if (settled == 2) {
        return residual(a, x, lr, li) <= RESIDUAL_TOLERANCE * norm ? new Estimate(lr, li, k, true)
            : Estimate.failed(k);
      }
    }
    return Estimate.failed(MAX_ITERATIONS);
  }

  /** A fixed start vector of unit norm with no special structure (all components non-zero). */
  static ZMatrixRMaj startVector(int n) {
    ZMatrixRMaj x = new ZMatrixRMaj(n, 1);
    double sum = 0;
    for (int i = 0; i < n; i++) {
      double re = 1 + 0.5 * Math.sin(1.3 * i + 0.4);
      double im = 0.5 * Math.cos(0.7 * i + 0.1);
      x.data[2 * i] = re;
      x.data[2 * i + 1] = im;
      sum += re * re + im * im;
    }
    double s = 1 / Math.sqrt(sum);
    for (int i = 0; i < 2 * n; i++) {
      x.data[i] *= s;
    }
    return x;
  }

  /** @return |A x - lambda x| for a unit vector x */
  static double residual(DMatrixRMaj a, ZMatrixRMaj x, double lr, double li) {
    int n = a.numRows;
    double[] xd = x.data;
    double sum = 0;
    for (int i = 0; i < n; i++) {
      double rr = -(lr * xd[2 * i] - li * xd[2 * i + 1]);
      double ri = -(lr * xd[2 * i + 1] + li * xd[2 * i]);
      for (int j = 0; j < n; j++) {
        double v = a.get(i, j);
        rr += v * xd[2 * j];
        ri += v * xd[2 * j + 1];
      }
      sum += rr * rr + ri * ri;
    }
    return Math.sqrt(sum);
  }
}
