package org.flexmargin.numerics;

import org.ejml.data.ZMatrixRMaj;

/**
 * Eigenvalues and eigenvectors of a general complex square matrix.
 *
 * <p>EJML's general eigen-decomposition is real-only and returns eigenvectors only for real
 * eigenvalues, while flutter matrices are complex and their mode shapes are complex. This class
 * fills that gap with the textbook algorithm (Golub &amp; Van Loan, <i>Matrix Computations</i>, 4th
 * ed., sections 7.4-7.5 and 7.6.4):
 *
 * <ol>
 *   <li>reduction to upper Hessenberg form by Householder reflections, H = Q^H A Q;
 *   <li>single-shift complex QR iteration with Wilkinson shifts and Givens rotations, deflating
 *       negligible sub-diagonal entries, to the complex Schur form T = Z^H A Z;
 *   <li>eigenvectors of the triangular T by back substitution, mapped back by Z and normalised to
 *       unit 2-norm.
 * </ol>
 *
 * <p>Cost O(n^3) with about 10 n^3 complex flops in total; intended for the small matrices of
 * modal flutter problems (n up to a few hundred). Instances are immutable and thread-safe; every
 * call allocates its own workspace.
 */
public final class ComplexEigen {

  private static final double EPS = Math.ulp(1.0);

  /** Iteration budget per eigenvalue before the decomposition is declared failed. */
  private static final int MAX_ITERATIONS_PER_EIGENVALUE = 60;

  /**
   * Decomposes a complex matrix.
   *
   * @param a square complex matrix. Not modified.
   * @return eigenvalues, unit eigenvectors and diagnostics
   * @throws ArithmeticException if the QR iteration does not converge or the input is not finite
   */
  public ComplexEigenResult decompose(ZMatrixRMaj a) {
    int n = a.numRows;
    if (a.numCols != n) {
      throw new IllegalArgumentException("matrix must be square, got " + n + " x " + a.numCols);
    }
    double[] hr = new double[n * n];
    double[] hi = new double[n * n];
    double norm = 0;
    for (int i = 0; i < n * n; i++) {
      hr[i] = a.data[2 * i];
      hi[i] = a.data[2 * i + 1];
      if (!Double.isFinite(hr[i]) || !Double.isFinite(hi[i])) {
        throw new ArithmeticException("matrix entry " + i / n + "," + i % n + " is not finite");
      }
      norm = Math.max(norm, Math.hypot(hr[i], hi[i]));
    }
    double[] zr = new double[n * n];
    double[] zi = new double[n * n];
    for (int i = 0; i < n; i++) {
      zr[i * n + i] = 1.0;
    }
    if (n == 0) {
      return new ComplexEigenResult(new double[0], new double[0], new ZMatrixRMaj(0, 0), 0, 0);
    }
    reduceToHessenberg(n, hr, hi, zr, zi);
    int iterations = schur(n, hr, hi, zr, zi, norm);
    double[] lr = new double[n];
    double[] li = new double[n];
    for (int i = 0; i < n; i++) {
      lr[i] = hr[i * n + i];
      li[i] = hi[i * n + i];
    }
    ZMatrixRMaj vectors = eigenvectors(n, hr, hi, zr, zi, norm);
    double residual = residual(a, lr, li, vectors, norm);
    return new ComplexEigenResult(lr, li, vectors, iterations, residual);
  }

  /** Householder reduction to upper Hessenberg form, accumulating Q into z. */
  private static void reduceToHessenberg(int n, double[] hr, double[] hi, double[] zr, double[] zi) {
    double[] vr = new double[n];
    double[] vi = new double[n];
    for (int k = 0; k < n - 2; k++) {
      double xnorm = 0;
      for (int i = k + 1; i < n; i++) {
        xnorm = Math.hypot(xnorm, Math.hypot(hr[i * n + k], hi[i * n + k]));
      }
      if (xnorm == 0) {
        continue;
      }
      double x0r = hr[(k + 1) * n + k];
      double x0i = hi[(k + 1) * n + k];
      double x0abs = Math.hypot(x0r, x0i);
      double phr = x0abs == 0 ? 1.0 : x0r / x0abs;
      double phi = x0abs == 0 ? 0.0 : x0i / x0abs;
      // alpha = -phase(x0) * ||x||; v = x - alpha e1
      double alr = -phr * xnorm;
      double ali = -phi * xnorm;
      double vnorm2 = 0;
      for (int i = k + 1; i < n; i++) {
        vr[i] = hr[i * n + k];
        vi[i] = hi[i * n + k];
      }
      vr[k + 1] -= alr;
      vi[k + 1] -= ali;
      for (int i = k + 1; i < n; i++) {
        vnorm2 += vr[i] * vr[i] + vi[i] * vi[i];
      }
      if (vnorm2 == 0) {
        continue;
      }
      double scale = 2.0 / vnorm2;
      // Left: A = (I - scale v v^H) A on rows k+1..n-1, columns k..n-1
      for (int j = k; j < n; j++) {
        double sr = 0;
        double si = 0;
        for (int i = k + 1; i < n; i++) {
          double ar = hr[i * n + j];
          double ai = hi[i * n + j];
          // conj(v_i) * a_ij
          sr += vr[i] * ar + vi[i] * ai;
          si += vr[i] * ai - vi[i] * ar;
        }
        sr *= scale;
        si *= scale;
        for (int i = k + 1; i < n; i++) {
          hr[i * n + j] -= vr[i] * sr - vi[i] * si;
          hi[i * n + j] -= vr[i] * si + vi[i] * sr;
        }
      }
      // Right: A = A (I - scale v v^H) on all rows, columns k+1..n-1; same for z
      applyReflectorRight(n, n, hr, hi, vr, vi, k + 1, scale);
      applyReflectorRight(n, n, zr, zi, vr, vi, k + 1, scale);
      for (int i = k + 2; i < n; i++) {
        hr[i * n + k] = 0;
        hi[i * n + k] = 0;
      }
    }
  }

  private static void applyReflectorRight(
      int n, int rows, double[] mr, double[] mi, double[] vr, double[] vi, int from, double scale) {
    for (int r = 0; r < rows; r++) {
      double sr = 0;
      double si = 0;
      for (int j = from; j < n; j++) {
        double ar = mr[r * n + j];
        double ai = mi[r * n + j];
        // a_rj * v_j
        sr += ar * vr[j] - ai * vi[j];
        si += ar * vi[j] + ai * vr[j];
      }
      sr *= scale;
      si *= scale;
      for (int j = from; j < n; j++) {
        // subtract s * conj(v_j)
        mr[r * n + j] -= sr * vr[j] + si * vi[j];
        mi[r * n + j] -= si * vr[j] - sr * vi[j];
      }
    }
  }

  /** Shifted QR iteration on the Hessenberg matrix to complex Schur form; returns iterations. */
  private static int schur(int n, double[] hr, double[] hi, double[] zr, double[] zi, double norm) {
    double[] cs = new double[n];
    double[] snr = new double[n];
    double[] sni = new double[n];
    int hiIdx = n - 1;
    int total = 0;
    int sinceDeflation = 0;
    double small = Math.max(norm, Double.MIN_NORMAL) * EPS;
    while (hiIdx > 0) {
      // find lo: the top of the active unreduced block
      int lo = hiIdx;
      while (lo > 0) {
        double sub = Math.hypot(hr[lo * n + lo - 1], hi[lo * n + lo - 1]);
        double diag =
            Math.hypot(hr[lo * n + lo], hi[lo * n + lo])
                + Math.hypot(hr[(lo - 1) * n + lo - 1], hi[(lo - 1) * n + lo - 1]);
        if (sub <= EPS * diag || sub <= small) {
          hr[lo * n + lo - 1] = 0;
          hi[lo * n + lo - 1] = 0;
          break;
        }
        lo--;
      }
      if (lo == hiIdx) {
        hiIdx--;
        sinceDeflation = 0;
        continue;
      }
      if (++sinceDeflation > MAX_ITERATIONS_PER_EIGENVALUE) {
        throw new ArithmeticException(
            "complex QR iteration did not converge for eigenvalue " + hiIdx + " of " + n);
      }
      total++;
      // Wilkinson shift from the trailing 2x2 block of the active window
      double mur;
      double mui;
      if (sinceDeflation % 11 == 10) {
        // exceptional shift to break cycles
        double sub = Math.hypot(hr[hiIdx * n + hiIdx - 1], hi[hiIdx * n + hiIdx - 1]);
        mur = hr[hiIdx * n + hiIdx] + 0.75 * sub;
        mui = hi[hiIdx * n + hiIdx] + 0.25 * sub;
      } else {
        double[] mu = wilkinsonShift(n, hr, hi, hiIdx);
        mur = mu[0];
        mui = mu[1];
      }
      for (int i = lo; i <= hiIdx; i++) {
        hr[i * n + i] -= mur;
        hi[i * n + i] -= mui;
      }
      for (int k = lo; k < hiIdx; k++) {
        double ar = hr[k * n + k];
        double ai = hi[k * n + k];
        double br = hr[(k + 1) * n + k];
        double bi = hi[(k + 1) * n + k];
        double aabs = Math.hypot(ar, ai);
        double babs = Math.hypot(br, bi);
        double r = Math.hypot(aabs, babs);
        double c;
        double sr;
        double si;
        if (r == 0) {
          c = 1;
          sr = 0;
          si = 0;
        } else if (aabs == 0) {
          c = 0;
          // s = conj(b)/|b| so that s*b = |b|
          sr = br / babs;
          si = -bi / babs;
        } else {
          c = aabs / r;
          // s = (a/|a|) conj(b) / r
          double pr = ar / aabs;
          double pi = ai / aabs;
          sr = (pr * br + pi * bi) / r;
          si = (pi * br - pr * bi) / r;
        }
        cs[k] = c;
        snr[k] = sr;
        sni[k] = si;
        for (int j = k; j < n; j++) {
          double xr = hr[k * n + j];
          double xi = hi[k * n + j];
          double yr = hr[(k + 1) * n + j];
          double yi = hi[(k + 1) * n + j];
          // row k:   c x + s y ; row k+1: -conj(s) x + c y
          hr[k * n + j] = c * xr + sr * yr - si * yi;
          hi[k * n + j] = c * xi + sr * yi + si * yr;
          hr[(k + 1) * n + j] = -(sr * xr + si * xi) + c * yr;
          hi[(k + 1) * n + j] = -(sr * xi - si * xr) + c * yi;
        }
      }
      for (int k = lo; k < hiIdx; k++) {
        double c = cs[k];
        double sr = snr[k];
        double si = sni[k];
        int rowEnd = Math.min(k + 2, hiIdx);
        rotateColumns(n, rowEnd + 1, hr, hi, k, c, sr, si);
        rotateColumns(n, n, zr, zi, k, c, sr, si);
      }
      for (int i = lo; i <= hiIdx; i++) {
        hr[i * n + i] += mur;
        hi[i * n + i] += mui;
      }
    }
    return total;
  }

  /** Right-multiplies columns k, k+1 of rows 0..rows-1 by G^H, G = [c s; -conj(s) c]. */
  private static void rotateColumns(
      int n, int rows, double[] mr, double[] mi, int k, double c, double sr, double si) {
    for (int i = 0; i < rows; i++) {
      double xr = mr[i * n + k];
      double xi = mi[i * n + k];
      double yr = mr[i * n + k + 1];
      double yi = mi[i * n + k + 1];
      // col k: c x + conj(s) y ; col k+1: -s x + c y
      mr[i * n + k] = c * xr + sr * yr + si * yi;
      mi[i * n + k] = c * xi + sr * yi - si * yr;
      mr[i * n + k + 1] = -(sr * xr - si * xi) + c * yr;
      mi[i * n + k + 1] = -(sr * xi + si * xr) + c * yi;
    }
  }

  /** Eigenvalue of the trailing 2x2 block closer to its last diagonal entry. */
  private static double[] wilkinsonShift(int n, double[] hr, double[] hi, int m) {
    double ar = hr[(m - 1) * n + m - 1];
    double ai = hi[(m - 1) * n + m - 1];
    double br = hr[(m - 1) * n + m];
    double bi = hi[(m - 1) * n + m];
    double cr = hr[m * n + m - 1];
    double ci = hi[m * n + m - 1];
    double dr = hr[m * n + m];
    double di = hi[m * n + m];
    // half difference h = (a - d)/2 ; disc = sqrt(h^2 + b c)
    double hr2 = 0.5 * (ar - dr);
    double hi2 = 0.5 * (ai - di);
    double pr = hr2 * hr2 - hi2 * hi2 + (br * cr - bi * ci);
    double pi = 2 * hr2 * hi2 + (br * ci + bi * cr);
    double[] sq = sqrt(pr, pi);
    // mu = d - bc/(h +/- sqrt) choosing the larger denominator (stable form)
    double d1r = hr2 + sq[0];
    double d1i = hi2 + sq[1];
    double d2r = hr2 - sq[0];
    double d2i = hi2 - sq[1];
    double denr;
    double deni;
    if (Math.hypot(d1r, d1i) >= Math.hypot(d2r, d2i)) {
      denr = d1r;
      deni = d1i;
    } else {
      denr = d2r;
      deni = d2i;
    }
    double den2 = denr * denr + deni * deni;
    if (den2 == 0) {
      return new double[] {dr, di};
    }
    double bcr = br * cr - bi * ci;
    double bci = br * ci + bi * cr;
    double qr = (bcr * denr + bci * deni) / den2;
    double qi = (bci * denr - bcr * deni) / den2;
    return new double[] {dr - qr, di - qi};
  }

  private static double[] sqrt(double re, double im) {
    double r = Math.hypot(re, im);
    if (r == 0) {
      return new double[] {0, 0};
    }
    double sr = Math.sqrt(0.5 * (r + Math.abs(re)));
    if (re >= 0) {
      return new double[] {sr, im / (2 * sr)};
    }
    return new double[] {Math.abs(im) / (2 * sr), Math.copySign(sr, im)};
  }

  /** Back substitution on the Schur form T, then V = Z Y with unit columns. */
  private static ZMatrixRMaj eigenvectors(
      int n, double[] tr, double[] ti, double[] zr, double[] zi, double norm) {
    double[] yr = new double[n];
    double[] yi = new double[n];
    double tiny = Math.max(norm, Double.MIN_NORMAL) * EPS;
    ZMatrixRMaj v = new ZMatrixRMaj(n, n);
    for (int k = 0; k < n; k++) {
      double lr = tr[k * n + k];
      double li = ti[k * n + k];
      java.util.Arrays.fill(yr, 0);
      java.util.Arrays.fill(yi, 0);
      yr[k] = 1;
      for (int i = k - 1; i >= 0; i--) {
        double sr = 0;
        double si = 0;
        for (int j = i + 1; j <= k; j++) {
          double ar = tr[i * n + j];
          double ai = ti[i * n + j];
          sr += ar * yr[j] - ai * yi[j];
          si += ar * yi[j] + ai * yr[j];
        }
        double dr = tr[i * n + i] - lr;
        double di = ti[i * n + i] - li;
        if (Math.hypot(dr, di) < tiny) {
          dr = tiny;
          di = 0;
        }
        double d2 = dr * dr + di * di;
        yr[i] = -(sr * dr + si * di) / d2;
        yi[i] = -(si * dr - sr * di) / d2;
        // rescale to avoid overflow in nearly defective cases
        double m = Math.hypot(yr[i], yi[i]);
        if (m > 1e100) {
          for (int j = i; j <= k; j++) {
            yr[j] /= m;
            yi[j] /= m;
          }
        }
      }
      double vn = 0;
      for (int r = 0; r < n; r++) {
        double sr = 0;
        double si = 0;
        for (int j = 0; j <= k; j++) {
          sr += zr[r * n + j] * yr[j] - zi[r * n + j] * yi[j];
          si += zr[r * n + j] * yi[j] + zi[r * n + j] * yr[j];
        }
        v.set(r, k, sr, si);
        vn = Math.hypot(vn, Math.hypot(sr, si));
      }
      for (int r = 0; r < n; r++) {
        v.set(r, k, v.getReal(r, k) / vn, v.getImag(r, k) / vn);
      }
    }
    return v;
  }

  /** max_k ||A v_k - lambda_k v_k|| / max(||A||_max, tiny). */
  private static double residual(ZMatrixRMaj a, double[] lr, double[] li, ZMatrixRMaj v, double norm) {
    int n = a.numRows;
    double worst = 0;
    for (int k = 0; k < n; k++) {
      double res = 0;
      for (int i = 0; i < n; i++) {
        double sr = 0;
        double si = 0;
        for (int j = 0; j < n; j++) {
          double ar = a.data[2 * (i * n + j)];
          double ai = a.data[2 * (i * n + j) + 1];
          double xr = v.getReal(j, k);
          double xi = v.getImag(j, k);
          sr += ar * xr - ai * xi;
          si += ar * xi + ai * xr;
        }
        double xr = v.getReal(i, k);
        double xi = v.getImag(i, k);
        sr -= lr[k] * xr - li[k] * xi;
        si -= lr[k] * xi + li[k] * xr;
        res = Math.hypot(res, Math.hypot(sr, si));
      }
      worst = Math.max(worst, res);
    }
    return worst / Math.max(norm, Double.MIN_NORMAL);
  }
}
