package org.flexmargin.flutter;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_ZDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.numerics.ComplexEigen;
import org.flexmargin.numerics.ComplexEigenResult;

/**
 * Per-thread workspace for the flutter solvers: the m x m complex flutter matrix
 * F(s) = M s^2 + C s + K - q_dyn Q(ik), its derivative at frozen aerodynamics F'(s) = 2 M s + C,
 * a complex LU solver and the start-up state matrix. Not thread-safe: one per thread.
 *
 * <p>The p-k root update is nonlinear inverse iteration (Ruhe, "Algorithms for the nonlinear
 * eigenvalue problem", SIAM J. Numer. Anal. 10(4), 1973): solve F(s) x = F'(s) v, then
 * s &larr; s - (u^H v)/(u^H x), v &larr; x/(u^H x), with the aerodynamics re-evaluated at the
 * reduced frequency of the current root at every step, so that at convergence the root satisfies
 * both det F(s) = 0 and k = Im(s) b / V (the p-k matching condition of Hassig, J. Aircraft 8(11),
 * 1971). Convergence is quadratic in s for a simple root.
 */
final class FlutterWorkspace {
  private final AeroelasticSystem sys;
  private final int n;
  private final double semichord;
  private final ZMatrixRMaj q;
  private final ZMatrixRMaj f;
  private final ZMatrixRMaj fp;
  private final ZMatrixRMaj rhs;
  private final ZMatrixRMaj x;
  private final LinearSolverDense<ZMatrixRMaj> lu;
  private final DMatrixRMaj massInverse;
  private final ComplexEigen eigen = new ComplexEigen();
  final SolveCounters counters;

  FlutterWorkspace(AeroelasticSystem sys, SolveCounters counters) {
    this.sys = sys;
    this.n = sys.size();
    this.semichord = sys.aero().referenceSemichordM();
    this.q = new ZMatrixRMaj(n, n);
    this.f = new ZMatrixRMaj(n, n);
    this.fp = new ZMatrixRMaj(n, n);
    this.rhs = new ZMatrixRMaj(n, 1);
    this.x = new ZMatrixRMaj(n, 1);
    this.lu = LinearSolverFactory_ZDRM.lu(n);
    DMatrixRMaj m = new DMatrixRMaj(n, n, true, sys.massFlat());
    this.massInverse = new DMatrixRMaj(n, n);
    if (!CommonOps_DDRM.invert(m, massInverse)) {
      throw new IllegalArgumentException("mass matrix is singular");
    }
    this.counters = counters;
  }

  /** Reduced frequency of a root: |Im s| b_ref / V. */
  double reducedFrequency(double si, FlightCondition fc) {
    return Math.abs(si) * semichord / fc.speedTasMps();
  }

  /** Assembles F(s) into f and F'(s) into fp at reduced frequency k and dynamic pressure qd. */
  private void assemble(double sr, double si, double qd, double k) {
    sys.aero().forces(k, q);
    counters.noteReducedFrequency(k);
    double s2r = sr * sr - si * si;
    double s2i = 2 * sr * si;
    double[] mm = sys.massFlat();
    double[] cc = sys.dampingFlat();
    double[] kk = sys.stiffnessFlat();
    double[] fd = f.data;
    double[] fpd = fp.data;
    double[] qdta = q.data;
    for (int idx = 0; idx < n * n; idx++) {
      double m = mm[idx];
      double c = cc[idx];
      fd[2 * idx] = m * s2r + c * sr + kk[idx] - qd * qdta[2 * idx];
      fd[2 * idx + 1] = m * s2i + c * si - qd * qdta[2 * idx + 1];
      fpd[2 * idx] = 2 * m * sr + c;
      fpd[2 * idx + 1] = 2 * m * si;
    }
  }

  /**
   * Converges one p-k root from a starting guess.
   *
   * @param s0r start real part (1/s)
   * @param s0i start imaginary part (rad/s)
   * @param v0 start vector, interleaved complex length 2n. Not modified.
   * @param fc flight condition
   * @param maxIterations iteration budget
   * @param tolerance relative tolerance on the root
   * @return the root (converged or not)
   */
  Root newton(double s0r, double s0i, double[] v0, FlightCondition fc, int maxIterations, double tolerance) {
    double qd = fc.dynamicPressurePa();
    double sr = s0r;
    double si = s0i;
    double[] u = v0.clone();
    double[] v = v0.clone();
    // normalise so that u^H v = 1
    double uu = 0;
    for (int i = 0; i < 2 * n; i++) {
      uu += u[i] * u[i];
    }
    for (int i = 0; i < 2 * n; i++) {
      v[i] /= uu;
    }
    boolean converged = false;
    int it = 0;
    while (it < maxIterations) {
      it++;
      counters.iterations++;
      double k = reducedFrequency(si, fc);
      assemble(sr, si, qd, k);
      // rhs = F'(s) v
      multiply(fp, v, rhs.data);
      if (!lu.setA(f)) {
        converged = true;
        break;
      }
      lu.solve(rhs, x);
      // u^H v and u^H x
      double uvr = 0;
      double uvi = 0;
      double uxr = 0;
      double uxi = 0;
      boolean finite = true;
      for (int i = 0; i < n; i++) {
        double ur = u[2 * i];
        double ui = u[2 * i + 1];
        double xr = x.data[2 * i];
        double xi = x.data[2 * i + 1];
        finite &= Double.isFinite(xr) && Double.isFinite(xi);
        uvr += ur * v[2 * i] + ui * v[2 * i + 1];
        uvi += ur * v[2 * i + 1] - ui * v[2 * i];
        uxr += ur * xr + ui * xi;
        uxi += ur * xi - ui * xr;
      }
      double ux2 = uxr * uxr + uxi * uxi;
      if (!finite || ux2 == 0) {
        // F(s) numerically singular: s is an eigenvalue to working precision
        converged = true;
        break;
      }
      double dr = (uvr * uxr + uvi * uxi) / ux2;
      double di = (uvi * uxr - uvr * uxi) / ux2;
      sr -= dr;
      si -= di;
      for (int i = 0; i < n; i++) {
        double xr = x.data[2 * i];
        double xi = x.data[2 * i + 1];
        v[2 * i] = (xr * uxr + xi * uxi) / ux2;
        v[2 * i + 1] = (xi * uxr - xr * uxi) / ux2;
      }
      if (!Double.isFinite(sr) || !Double.isFinite(si)) {
        break;
      }
      double scale = Math.hypot(sr, si);
      if (Math.hypot(dr, di) <= tolerance * Math.max(scale, 1e-12)) {
        converged = true;
        break;
      }
    }
    double residual = Double.NaN;
    if (Double.isFinite(sr) && Double.isFinite(si)) {
      residual = residual(sr, si, v, qd, reducedFrequency(si, fc));
    }
    normalise(v);
    if (converged) {
      counters.rootSolves++;
      counters.maxResidual = Math.max(counters.maxResidual, residual);
    }
    return new Root(sr, si, v, it, residual, converged && Double.isFinite(residual));
  }

  /** ||F(s) v|| / (max|F_ij| ||v||). */
  private double residual(double sr, double si, double[] v, double qd, double k) {
    assemble(sr, si, qd, k);
    double[] fv = new double[2 * n];
    multiply(f, v, fv);
    double fmax = 0;
    for (int idx = 0; idx < n * n; idx++) {
      fmax = Math.max(fmax, Math.hypot(f.data[2 * idx], f.data[2 * idx + 1]));
    }
    double res = 0;
    double vn = 0;
    for (int i = 0; i < 2 * n; i++) {
      res = Math.hypot(res, fv[i]);
      vn = Math.hypot(vn, v[i]);
    }
    return res / Math.max(fmax * vn, Double.MIN_NORMAL);
  }

  /**
   * out = a v for a complex n x n matrix and interleaved complex vectors.
   *
   * @param a matrix. Not modified.
   * @param v vector (length 2n). Not modified.
   * @param out result (length 2n). Modified.
   */
  private void multiply(ZMatrixRMaj a, double[] v, double[] out) {
    double[] d = a.data;
    for (int i = 0; i < n; i++) {
      double ar = 0;
      double ai = 0;
      for (int j = 0; j < n; j++) {
        double pr = d[2 * (i * n + j)];
        double pi = d[2 * (i * n + j) + 1];
        ar += pr * v[2 * j] - pi * v[2 * j + 1];
        ai += pr * v[2 * j + 1] + pi * v[2 * j];
      }
      out[2 * i] = ar;
      out[2 * i + 1] = ai;
    }
  }

  static void normalise(double[] v) {
    double nn = 0;
    for (double d : v) {
      nn += d * d;
    }
    nn = Math.sqrt(nn);
    if (nn > 0) {
      for (int i = 0; i < v.length; i++) {
        v[i] /= nn;
      }
    }
  }

  /**
   * All 2n roots of the flutter equation with the aerodynamics frozen at reduced frequency k:
   * eigenvalues of the first-order matrix [[0, I], [-M^-1 (K - q Q(ik)), -M^-1 C]].
   *
   * @return eigen-decomposition of the 2n x 2n state matrix
   */
  ComplexEigenResult frozenRoots(double k, FlightCondition fc) {
    sys.aero().forces(k, q);
    counters.noteReducedFrequency(k);
    double qd = fc.dynamicPressurePa();
    int m = 2 * n;
    ZMatrixRMaj a = new ZMatrixRMaj(m, m);
    double[] kk = sys.stiffnessFlat();
    double[] cc = sys.dampingFlat();
    for (int i = 0; i < n; i++) {
      a.set(i, n + i, 1, 0);
    }
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double kr = 0;
        double ki = 0;
        double c = 0;
        for (int l = 0; l < n; l++) {
          double mi = massInverse.get(i, l);
          kr += mi * (kk[l * n + j] - qd * q.data[2 * (l * n + j)]);
          ki += mi * (-qd * q.data[2 * (l * n + j) + 1]);
          c += mi * cc[l * n + j];
        }
        a.set(n + i, j, -kr, -ki);
        a.set(n + i, n + j, -c, 0);
      }
    }
    counters.fullEigenSolves++;
    return eigen.decompose(a);
  }

  /** Modal assurance criterion |a^H b|^2 / (|a|^2 |b|^2) of interleaved complex vectors. */
  static double mac(double[] a, double[] b) {
    double re = 0;
    double im = 0;
    double aa = 0;
    double bb = 0;
    for (int i = 0; i < a.length; i += 2) {
      re += a[i] * b[i] + a[i + 1] * b[i + 1];
      im += a[i] * b[i + 1] - a[i + 1] * b[i];
      aa += a[i] * a[i] + a[i + 1] * a[i + 1];
      bb += b[i] * b[i] + b[i + 1] * b[i + 1];
    }
    return (re * re + im * im) / Math.max(aa * bb, Double.MIN_NORMAL);
  }

  /** One root of the flutter equation with its (unit) vector, interleaved complex. */
  record Root(double sr, double si, double[] v, int iterations, double residual, boolean converged) {
    double frequencyHz() {
      return Math.abs(si) / (2 * Math.PI);
    }

    /** g = 2 Re(s)/Im(s), V-g convention; +/- infinity for a non-oscillating root. */
    double dampingG() {
      if (si == 0) {
        return sr > 0 ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
      }
      return 2 * sr / Math.abs(si);
    }

    double dampingRatio() {
      double mod = Math.hypot(sr, si);
      return mod == 0 ? 0 : -sr / mod;
    }

    /** Crossing function for the V-g threshold gLevel: 2 Re(s) - gLevel |Im(s)|. */
    double crossingFunction(double gLevel) {
      return 2 * sr - gLevel * Math.abs(si);
    }
  }
}
