package org.flexmargin.aero;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.InvalidInputException;

/**
 * A rational function approximation of the generalized aerodynamic forces in Roger's form (K. L.
 * Roger, "Airplane math modeling methods for active control design", AGARD-CP-228, 1977, title from
 * memory; survey in
 * Tiffany &amp; Adams, NASA TP-2776, 1988):
 *
 * <pre>
 *   Q(p) = A_0 + A_1 p + A_2 p^2 + sum_{l=1..nL} A_{l+2} p / (p + beta_l),   p = s b_ref / V
 * </pre>
 *
 * with real n x n matrices A<sub>m</sub> and real positive lag roots &beta;<sub>l</sub>
 * (dimensionless, in reduced-frequency units). On the imaginary axis p = ik this is an {@link
 * AeroSource} like any other, so a fit can stand in for its data in every solver; off the axis it
 * continues Q(ik) analytically to any Laplace variable ({@link #evaluateLaplace}), which is what
 * the state-space model of the aeroelastic equations needs.
 *
 * <p>Built by {@link RogerApproximation#fit}. The record is immutable: arrays are copied in and out
 * (the hot evaluation methods read the fields directly and allocate nothing).
 *
 * @param referenceSemichordM b<sub>ref</sub> (m) of the reduced frequency and of p
 * @param lagRoots &beta;<sub>1..nL</sub>, positive, finite and distinct (dimensionless)
 * @param coefficients A<sub>0</sub> .. A<sub>nL+2</sub>, nL + 3 real n x n matrices (units of
 *     Q: m<sup>2</sup> per unit coordinate for strip theory)
 * @param reducedFrequencies the reduced frequencies the fit was made at, increasing, &ge; 0
 * @param error fit error per element on those frequencies
 * @param errorThreshold relative error above which the fit is flagged (dimensionless, &gt; 0)
 * @param warnings fit quality and data-range remarks, in words (empty when none)
 * @param sourceDescription one-line description of the data that were fitted
 * @param form how the fit was made, in words: {@link #ROGER} or {@link #MINIMUM_STATE} (the
 *     minimum-state fit is held in Roger's form, its lag matrices of rank one, checked on
 *     construction; {@link #lagRealisation()} gives it one lag state per lag root)
 */
public record RationalFit(
    double referenceSemichordM,
    double[] lagRoots,
    double[][][] coefficients,
    double[] reducedFrequencies,
    FitError error,
    double errorThreshold,
    List<String> warnings,
    String sourceDescription,
    String form) implements AeroSource {

  /** {@link #form()} of a least-squares fit of Roger's form. */
  public static final String ROGER = "Roger form";
  /** {@link #form()} of Karpel's minimum-state fit. */
  public static final String MINIMUM_STATE = "minimum-state form (Karpel)";

  /** Validates and copies. */
  public RationalFit {
    if (!(referenceSemichordM > 0) || Double.isInfinite(referenceSemichordM)) {
      throw new InvalidInputException("rational_fit.reference_semichord_m", "a finite value > 0",
          String.valueOf(referenceSemichordM));
    }
    lagRoots = checkedLagRoots("rational_fit.lag_roots", lagRoots);
    if (coefficients == null || coefficients.length != lagRoots.length + 3) {
      throw new InvalidInputException("rational_fit.coefficients",
          (lagRoots.length + 3) + " matrices (A0, A1, A2 and one per lag root)",
          coefficients == null ? "none" : coefficients.length + " matrices");
    }
    int n = coefficients[0] == null ? 0 : coefficients[0].length;
    if (n == 0) {
      throw new InvalidInputException("rational_fit.coefficients[0]", "a non-empty square matrix", "none");
    }
    double[][][] copy = new double[coefficients.length][n][];
    for (int m = 0; m < coefficients.length; m++) {
      if (coefficients[m] == null || coefficients[m].length != n) {
        throw new InvalidInputException("rational_fit.coefficients[" + m + "]", n + " x " + n + " matrix",
            coefficients[m] == null ? "none" : coefficients[m].length + " rows");
      }
      for (int i = 0; i < n; i++) {
        double[] row = coefficients[m][i];
        if (row == null || row.length != n) {
          throw new InvalidInputException("rational_fit.coefficients[" + m + "][" + i + "]", n + " entries",
              row == null ? "none" : String.valueOf(row.length));
        }
        for (int j = 0; j < n; j++) {
          if (!Double.isFinite(row[j])) {
            throw new InvalidInputException("rational_fit.coefficients[" + m + "][" + i + "][" + j + "]",
                "a finite value", String.valueOf(row[j]));
          }
        }
        copy[m][i] = row.clone();
      }
    }
    coefficients = copy;
    if (reducedFrequencies == null || reducedFrequencies.length == 0) {
      throw new InvalidInputException("rational_fit.reduced_frequencies", "at least one value", "none");
    }
    reducedFrequencies = reducedFrequencies.clone();
    for (int i = 0; i < reducedFrequencies.length; i++) {
      double k = reducedFrequencies[i];
      if (!(k >= 0) || Double.isInfinite(k) || (i > 0 && !(k > reducedFrequencies[i - 1]))) {
        throw new InvalidInputException("rational_fit.reduced_frequencies[" + i + "]",
            "a finite value >= 0 above the previous one", String.valueOf(k));
      }
    }
    if (error == null || error.relativeError().length != n) {
      throw new InvalidInputException("rational_fit.error", "errors of a " + n + " x " + n + " fit",
          error == null ? "none" : "another size");
    }
    if (!(errorThreshold > 0)) {
      throw new InvalidInputException("rational_fit.error_threshold", "a value > 0", String.valueOf(errorThreshold));
    }
    if (warnings == null) {
      throw new InvalidInputException("rational_fit.warnings", "a list (may be empty)", "none");
    }
    warnings = List.copyOf(warnings);
    if (sourceDescription == null) {
      sourceDescription = "";
    }
    if (form == null) {
      form = ROGER;
    }
    for (int l = 0; MINIMUM_STATE.equals(form) && l < lagRoots.length; l++) {
      double[][] a = coefficients[l + 3];
      double[][] f = rankOne(a);
      double largest = 0;
      double residual = 0;
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          largest = Math.max(largest, Math.abs(a[i][j]));
          residual = Math.max(residual, Math.abs(a[i][j] - f[0][i] * f[1][j]));
        }
      }
      if (residual > RANK_ONE_TOLERANCE * largest) {
        throw new InvalidInputException("rational_fit.coefficients[" + (l + 3) + "]",
            "a matrix of rank one (a lag matrix of the minimum-state form)",
            String.format(Locale.ROOT, "a rank-one residual of %.3g of its largest entry", residual / largest));
      }
    }
  }

  /**
   * Largest entry of A - d e<sup>T</sup>, relative to the largest of A, for a lag matrix of a
   * {@link #MINIMUM_STATE} fit: products d<sub>i</sub> e<sub>j</sub> refactored in double precision
   * agree to a few units of round-off (1e-16) times n, so 1e-9 leaves a wide margin and still
   * rejects any matrix that is not of rank one.
   */
  static final double RANK_ONE_TOLERANCE = 1e-9;

  /**
   * Checks lag roots: non-empty is not required (nL = 0 is the quasi-steady fit), every root
   * positive and finite, all distinct.
   */
  static double[] checkedLagRoots(String path, double[] lags) {
    if (lags == null) {
      throw new InvalidInputException(path, "a list of lag roots (may be empty)", "none");
    }
    double[] c = lags.clone();
    for (int l = 0; l < c.length; l++) {
      if (!(c[l] > 0) || Double.isInfinite(c[l])) {
        throw new InvalidInputException(path + "[" + l + "]", "a finite value > 0", String.valueOf(c[l]));
      }
      for (int m = 0; m < l; m++) {
        if (Math.abs(c[m] - c[l]) <= 1e-6 * Math.max(c[m], c[l])) {
          throw new InvalidInputException(path + "[" + l + "]",
              "a value distinct from lag_roots[" + m + "] = " + c[m], String.valueOf(c[l]));
        }
      }
    }
    return c;
  }

  /** @return number of lag roots nL */
  public int lagCount() {
    return lagRoots.length;
  }

  /**
   * @param l lag index, 0-based (the lag root &beta;<sub>l+1</sub> of the formula)
   * @return the lag root (dimensionless)
   */
  public double lagRoot(int l) {
    return lagRoots[l];
  }

  /**
   * Rank-one factors d e<sup>T</sup> of a lag matrix, exact when it has rank one (as every lag
   * matrix of a {@link #MINIMUM_STATE} fit, to {@value #RANK_ONE_TOLERANCE} of its largest entry):
   * e is its largest row scaled to unit length, d = A e.
   *
   * @param l lag index, 0-based
   * @return {d, e}, two vectors of length n (d in units of Q, e dimensionless); both zero for a
   *     zero matrix
   */
  public double[][] rankOneLag(int l) {
    return rankOne(coefficients[l + 3]);
  }

  /** {d, e} of {@link #rankOneLag} for a square matrix. */
  private static double[][] rankOne(double[][] a) {
    int n = a.length;
    int best = 0;
    double bestNorm = 0;
    for (int i = 0; i < n; i++) {
      double norm = 0;
      for (double v : a[i]) {
        norm += v * v;
      }
      if (norm > bestNorm) {
        bestNorm = norm;
        best = i;
      }
    }
    double[] e = new double[n];
    double[] d = new double[n];
    double scale = Math.sqrt(bestNorm);
    for (int j = 0; j < n && scale > 0; j++) {
      e[j] = a[best][j] / scale;
    }
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        d[i] += a[i][j] * e[j];
      }
    }
    return new double[][] {d, e};
  }

  /**
   * The lag terms as aerodynamic states ({@link LagRealisation}): for a {@link #MINIMUM_STATE} fit
   * one state per lag root, E<sub>l</sub> = e<sub>l</sub><sup>T</sup> and D<sub>l</sub> =
   * d<sub>l</sub> of {@link #rankOneLag}; for Roger's form n states per lag root, E<sub>l</sub> = I
   * and D<sub>l</sub> = A<sub>l+3</sub>.
   *
   * @return the realisation (a new immutable object)
   */
  public LagRealisation lagRealisation() {
    int nl = lagRoots.length;
    if (MINIMUM_STATE.equals(form) && nl > 0) {
      double[][] d = new double[nl][];
      double[][] e = new double[nl][];
      for (int l = 0; l < nl; l++) {
        double[][] f = rankOneLag(l);
        d[l] = f[0];
        e[l] = f[1];
      }
      return LagRealisation.rankOne(lagRoots, d, e);
    }
    return LagRealisation.roger(size(), lagRoots, Arrays.copyOfRange(coefficients, 3, 3 + nl));
  }

  /**
   * @param m 0 for A<sub>0</sub>, 1 for A<sub>1</sub>, 2 for A<sub>2</sub>, l + 3 for the
   *     matrix of lag root l (0-based)
   * @return a copy of coefficient matrix A<sub>m</sub> (units of Q)
   */
  public double[][] matrix(int m) {
    double[][] a = coefficients[m];
    double[][] c = new double[a.length][];
    for (int i = 0; i < a.length; i++) {
      c[i] = a[i].clone();
    }
    return c;
  }

  /**
   * @param m matrix index as in {@link #matrix(int)}
   * @param i row
   * @param j column
   * @return entry (i, j) of A<sub>m</sub>
   */
  public double coefficient(int m, int i, int j) {
    return coefficients[m][i][j];
  }

  @Override
  public double[] lagRoots() {
    return lagRoots.clone();
  }

  @Override
  public double[][][] coefficients() {
    double[][][] c = new double[coefficients.length][][];
    for (int m = 0; m < c.length; m++) {
      c[m] = matrix(m);
    }
    return c;
  }

  @Override
  public double[] reducedFrequencies() {
    return reducedFrequencies.clone();
  }

  /** @return true when the worst relative fit error exceeds {@link #errorThreshold()} */
  public boolean exceedsErrorThreshold() {
    return error.worstRelativeError() > errorThreshold;
  }

  @Override
  public int size() {
    return coefficients[0].length;
  }

  /** @return 0: the fit holds its steady value exactly */
  @Override
  public double minReducedFrequency() {
    return 0.0;
  }

  /** @return the highest fitted reduced frequency; above it the fit extrapolates */
  @Override
  public double maxReducedFrequency() {
    return reducedFrequencies[reducedFrequencies.length - 1];
  }

  /**
   * Writes the fitted Q(ik) into {@code out}: identical to {@link #evaluate}. Above {@link
   * #maxReducedFrequency()} the rational form is extrapolated (no clamping); the caller flags it.
   */
  @Override
  public void forces(double reducedFrequency, ZMatrixRMaj out) {
    evaluate(reducedFrequency, out);
  }

  /**
   * Writes the fitted Q(ik) = A0 - k^2 A2 + sum_l A_{l+2} k^2/(k^2 + beta_l^2) + i (k A1 + sum_l
   * A_{l+2} k beta_l/(k^2 + beta_l^2)).
   *
   * @param reducedFrequency k &ge; 0, finite
   * @param out the result, reshaped to n x n. Modified.
   * @throws IllegalArgumentException if k is negative, infinite or NaN
   */
  public void evaluate(double reducedFrequency, ZMatrixRMaj out) {
    if (!(reducedFrequency >= 0) || Double.isInfinite(reducedFrequency)) {
      throw new IllegalArgumentException(
          "reduced frequency must be finite and >= 0, found " + reducedFrequency);
    }
    evaluateLaplace(0.0, reducedFrequency, out);
  }

  /**
   * Writes Q(p) at a complex non-dimensional Laplace variable p = s b_ref / V (analytic
   * continuation of the fit off the imaginary axis).
   *
   * @param pReal Re p (dimensionless)
   * @param pImag Im p (dimensionless)
   * @param out the result, reshaped to n x n. Modified.
   * @throws IllegalArgumentException if p is not finite or is a pole (p = -beta_l)
   */
  public void evaluateLaplace(double pReal, double pImag, ZMatrixRMaj out) {
    if (!Double.isFinite(pReal) || !Double.isFinite(pImag)) {
      throw new IllegalArgumentException("p must be finite, found " + pReal + " + " + pImag + " i");
    }
    int n = size();
    out.reshape(n, n);
    double[] d = out.data;
    double p2r = pReal * pReal - pImag * pImag;
    double p2i = 2 * pReal * pImag;
    double[][] a0 = coefficients[0];
    double[][] a1 = coefficients[1];
    double[][] a2 = coefficients[2];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        int idx = 2 * (i * n + j);
        d[idx] = a0[i][j] + pReal * a1[i][j] + p2r * a2[i][j];
        d[idx + 1] = pImag * a1[i][j] + p2i * a2[i][j];
      }
    }
    for (int l = 0; l < lagRoots.length; l++) {
      double beta = lagRoots[l];
      // p / (p + beta) = (x^2 + beta x + y^2 + i beta y) / ((x + beta)^2 + y^2)
      double den = (pReal + beta) * (pReal + beta) + pImag * pImag;
      if (den == 0) {
        throw new IllegalArgumentException(String.format(Locale.ROOT,
            "p = %g + %g i is the pole of lag root %g", pReal, pImag, beta));
      }
      double fr = (pReal * pReal + beta * pReal + pImag * pImag) / den;
      double fi = beta * pImag / den;
      double[][] a = coefficients[l + 3];
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          int idx = 2 * (i * n + j);
          d[idx] += fr * a[i][j];
          d[idx + 1] += fi * a[i][j];
        }
      }
    }
  }

  @Override
  public String description() {
    return String.format(Locale.ROOT,
        "rational fit (%s, %d lag roots, k up to %.3g, worst element error %.2g %%) of %s",
        form, lagRoots.length, maxReducedFrequency(), 100 * error.worstRelativeError(), sourceDescription);
  }
}
