package org.flexmargin.aero;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RationalFitSettings;

/**
 * Least-squares rational function approximation of generalized aerodynamic forces in Roger's form
 * (K. L. Roger, "Airplane math modeling methods for active control design", AGARD-CP-228, 1977,
 * title from memory;
 * the least-squares formulation and the usual constraints are surveyed by Tiffany &amp; Adams,
 * "Nonlinear programming extensions to rational function approximation methods for unsteady
 * aerodynamic forces", NASA TP-2776, 1988):
 *
 * <pre>
 *   Q(p) ~ A_0 + A_1 p + A_2 p^2 + sum_{l=1..nL} A_{l+2} p / (p + beta_l),   p = i k on the data
 * </pre>
 *
 * <h2>Fit</h2>
 *
 * On the imaginary axis, with p = ik,
 *
 * <pre>
 *   Re Q(ik) = A_0 - k^2 A_2 + sum_l A_{l+2} k^2 / (k^2 + beta_l^2)
 *   Im Q(ik) =        k A_1  + sum_l A_{l+2} k beta_l / (k^2 + beta_l^2)
 * </pre>
 *
 * <ol>
 *   <li>Steady value imposed (a constraint, not fitted): A<sub>0</sub> = Re Q(0), so the fit is
 *       exact at k = 0 and the static aeroelastic stiffness, hence divergence, is that of the
 *       data. (The other terms vanish at p = 0.)
 *   <li>The remaining nL + 2 real unknowns of each element (i, j) minimise the sum over the
 *       fitted k of |Q<sub>fit,ij</sub>(ik) - Q<sub>ij</sub>(ik)|<sup>2</sup>: the real and the
 *       imaginary parts give two rows per reduced frequency of one real linear least-squares
 *       problem, unweighted. The design matrix depends only on k and the lag roots, so it is
 *       factored once (Householder QR, EJML) and solved for all n<sup>2</sup> elements at once.
 * </ol>
 *
 * <h2>Defaults (common practice)</h2>
 *
 * Lag roots are chosen by the user, or spread over the fitted range ({@link #defaultLagRoots}:
 * geometric between 0.02 and 0.15 k<sub>max</sub>). Reduced
 * frequencies are the user's, or {@link #defaultReducedFrequencies}, dense near k = 0 where
 * Q(ik) of unsteady theory behaves like k ln k. The fit quality is reported per element ({@link
 * FitError}) and flagged above a threshold (default {@value #DEFAULT_ERROR_THRESHOLD}, i.e. 5 %).
 *
 * <p>Stateless and thread-safe.
 */
public final class RogerApproximation {

  /** Worst relative element error above which a fit is flagged (dimensionless): 5 %. */
  public static final double DEFAULT_ERROR_THRESHOLD = 0.05;

  /** Number of reduced frequencies of the default grid. */
  public static final int DEFAULT_POINTS = 31;

  /** Reciprocal condition estimate below which the least-squares problem is refused. */
  private static final double MIN_QUALITY = 1e-13;

  private RogerApproximation() {}

  /**
   * Fits with the default reduced-frequency grid and the default lag roots.
   *
   * @param source the data to fit
   * @param maxReducedFrequency k<sub>max</sub> of the fitted range [0, k<sub>max</sub>], &gt; 0
   * @param lagCount nL &ge; 0
   * @return the fit
   * @throws InvalidInputException {@code rfa.max_reduced_frequency} or {@code rfa.lag_count}
   */
  public static RationalFit fit(AeroSource source, double maxReducedFrequency, int lagCount) {
    return fit(source, defaultReducedFrequencies(maxReducedFrequency, DEFAULT_POINTS),
        defaultLagRoots(maxReducedFrequency, lagCount), DEFAULT_ERROR_THRESHOLD);
  }

  /**
   * Fits at given reduced frequencies with given lag roots, flagging errors above 5 %.
   *
   * @see #fit(AeroSource, double[], double[], double)
   */
  public static RationalFit fit(AeroSource source, double[] reducedFrequencies, double[] lagRoots) {
    return fit(source, reducedFrequencies, lagRoots, DEFAULT_ERROR_THRESHOLD);
  }

  /**
   * Fits Roger's form to {@code source} sampled at {@code reducedFrequencies}.
   *
   * @param source the data to fit; evaluated at k = 0 for A<sub>0</sub> (a source whose range
   *     starts above 0 gives its own value there, e.g. a table's held end value, and the fit says so
   *     in its warnings)
   * @param reducedFrequencies k values, &ge; 0, finite, strictly increasing; at least enough
   *     non-zero values for 2 (nL + 2) equations: ceil((nL + 2) / 2) + 1 of them
   * @param lagRoots &beta;<sub>l</sub> &gt; 0, finite, distinct (dimensionless; may be empty)
   * @param errorThreshold relative element error above which the fit is flagged, &gt; 0
   * @return the fit, its errors and warnings
   * @throws InvalidInputException {@code rfa.reduced_frequencies[i]}, {@code rfa.lag_roots[l]},
   *     {@code rfa.error_threshold}, or {@code rfa.lag_roots} when the least-squares problem is
   *     rank-deficient (lag roots too close together for the fitted frequencies)
   */
  public static RationalFit fit(
      AeroSource source, double[] reducedFrequencies, double[] lagRoots, double errorThreshold) {
    return fit(source, reducedFrequencies, lagRoots, errorThreshold, FitWeighting.UNIFORM);
  }

  /**
   * Fits Roger's form with a weighting of the fitted frequencies. With {@link FitWeighting#UNIFORM}
   * or {@link FitWeighting#ELEMENT} (the same here: each element is a problem of its own) this is
   * {@link #fit(AeroSource, double[], double[], double)}; with {@link
   * FitWeighting#INVERSE_MAGNITUDE} the two equations of element (i, j) at k are divided by
   * max(|Q<sub>ij</sub>(ik)|, 5 % of its largest modulus) ({@link #frequencyWeights}), and each
   * element is solved on its own.
   *
   * @param source the data to fit
   * @param reducedFrequencies k values as for the unweighted fit
   * @param lagRoots &beta;<sub>l</sub> as for the unweighted fit
   * @param errorThreshold relative element error above which the fit is flagged, &gt; 0
   * @param weighting how the frequencies are weighted
   * @return the fit, its errors and warnings
   * @throws InvalidInputException as the unweighted fit
   */
  public static RationalFit fit(AeroSource source, double[] reducedFrequencies, double[] lagRoots,
      double errorThreshold, FitWeighting weighting) {
    if (source == null) {
      throw new InvalidInputException("rfa.source", "aerodynamic data", "none");
    }
    double[] ks = checkedFrequencies(reducedFrequencies);
    double[] lags = RationalFit.checkedLagRoots("rfa.lag_roots", lagRoots);
    if (!(errorThreshold > 0) || Double.isInfinite(errorThreshold)) {
      throw new InvalidInputException("rfa.error_threshold", "a finite value > 0", String.valueOf(errorThreshold));
    }
    int nl = lags.length;
    int unknowns = nl + 2;
    int positive = 0;
    for (double k : ks) {
      if (k > 0) {
        positive++;
      }
    }
    int needed = (unknowns + 1) / 2 + 1;
    if (positive < needed) {
      throw new InvalidInputException("rfa.reduced_frequencies",
          "at least " + needed + " values above 0 for " + nl + " lag roots", positive + " values above 0");
    }
    int n = source.size();
    int nn = n * n;
    List<String> warnings = rangeWarnings(source, ks);
    double[][][] coefficients = new double[nl + 3][n][n];
    coefficients[0] = steadyForces(source);
    int nk = ks.length;
    double[][] data = sampled(source, ks);

    // design matrix: row 2r real part, row 2r+1 imaginary part; columns A1, A2, A3..
    DMatrixRMaj design = new DMatrixRMaj(2 * nk, unknowns);
    DMatrixRMaj rhs = new DMatrixRMaj(2 * nk, nn);
    for (int r = 0; r < nk; r++) {
      double k = ks[r];
      design.set(2 * r, 1, -k * k);
      design.set(2 * r + 1, 0, k);
      for (int l = 0; l < nl; l++) {
        double b = lags[l];
        double den = k * k + b * b;
        design.set(2 * r, 2 + l, k * k / den);
        design.set(2 * r + 1, 2 + l, k * b / den);
      }
      for (int e = 0; e < nn; e++) {
        rhs.set(2 * r, e, data[r][2 * e] - coefficients[0][e / n][e % n]);
        rhs.set(2 * r + 1, e, data[r][2 * e + 1]);
      }
    }
    DMatrixRMaj x = new DMatrixRMaj(unknowns, nn);
    double[][][] w = frequencyWeights(data, coefficients[0], weighting);
    if (w == null) {
      solveWellPosed(design, rhs, x);
    } else {
      DMatrixRMaj a = new DMatrixRMaj(2 * nk, unknowns);
      DMatrixRMaj b = new DMatrixRMaj(2 * nk, 1);
      DMatrixRMaj xe = new DMatrixRMaj(unknowns, 1);
      for (int e = 0; e < nn; e++) {
        for (int row = 0; row < 2 * nk; row++) {
          double we = w[row / 2][e / n][e % n];
          for (int u = 0; u < unknowns; u++) {
            a.set(row, u, we * design.get(row, u));
          }
          b.set(row, 0, we * rhs.get(row, e));
        }
        solveWellPosed(a, b, xe);
        for (int u = 0; u < unknowns; u++) {
          x.set(u, e, xe.get(u));
        }
      }
    }
    for (int u = 0; u < unknowns; u++) {
      for (int e = 0; e < nn; e++) {
        coefficients[u + 1][e / n][e % n] = x.get(u, e);
      }
    }

    return measured(source, lags, coefficients, ks, data, errorThreshold, warnings, RationalFit.ROGER);
  }

  /** Solves the least-squares problem a x = b, refusing a rank-deficient a. */
  private static void solveWellPosed(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj x) {
    LinearSolverDense<DMatrixRMaj> solver = LinearSolverFactory_DDRM.leastSquares(a.numRows, a.numCols);
    if (!solver.setA(a.copy()) || !(solver.quality() > MIN_QUALITY)) {
      throw new InvalidInputException("rfa.lag_roots",
          "lag roots far enough apart for the fitted reduced frequencies (well-posed least squares)",
          String.format(Locale.ROOT, "a rank-deficient problem (quality %.3g)", solver.quality()));
    }
    solver.solve(b, x);
  }

  /** Smallest modulus an equation is divided by, as a fraction of its element's largest modulus. */
  static final double MAGNITUDE_WEIGHT_FLOOR = 0.05;

  /**
   * Frequency weights of the fitted equations, relative to their element's size: for {@link
   * FitWeighting#INVERSE_MAGNITUDE}, w<sub>ij</sub>(k) = s<sub>ij</sub> / max(|Q<sub>ij</sub>(ik)|,
   * 0.05 s<sub>ij</sub>) with s<sub>ij</sub> the largest of |Q<sub>ij</sub>| over the fitted k
   * and |A0<sub>ij</sub>| (so 1 &le; w &le; 20; 1 for an element that is zero everywhere).
   *
   * @param data Q(ik) at each fitted k, interleaved
   * @param a0 steady forces
   * @param weighting the weighting
   * @return w[r][i][j], or {@code null} for the other weightings (every weight 1)
   */
  static double[][][] frequencyWeights(double[][] data, double[][] a0, FitWeighting weighting) {
    if (weighting != FitWeighting.INVERSE_MAGNITUDE) {
      return null;
    }
    int n = a0.length;
    double[][] scale = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        scale[i][j] = Math.abs(a0[i][j]);
        for (double[] q : data) {
          scale[i][j] = Math.max(scale[i][j], Math.hypot(q[2 * (i * n + j)], q[2 * (i * n + j) + 1]));
        }
      }
    }
    double[][][] w = new double[data.length][n][n];
    for (int r = 0; r < data.length; r++) {
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          int idx = 2 * (i * n + j);
          double m = Math.max(Math.hypot(data[r][idx], data[r][idx + 1]), MAGNITUDE_WEIGHT_FLOOR * scale[i][j]);
          w[r][i][j] = m > 0 ? scale[i][j] / m : 1.0;
        }
      }
    }
    return w;
  }

  /** @return remarks on the data's range against the fitted frequencies */
  static List<String> rangeWarnings(AeroSource source, double[] ks) {
    List<String> warnings = new ArrayList<>();
    if (source.minReducedFrequency() > 0) {
      warnings.add(String.format(Locale.ROOT,
          "steady forces A0 taken from the source at k = 0, below its range (lowest k %.4g)",
          source.minReducedFrequency()));
    }
    if (ks[ks.length - 1] > source.maxReducedFrequency() || ks[0] < source.minReducedFrequency()) {
      warnings.add(String.format(Locale.ROOT,
          "fitted reduced frequencies %.4g .. %.4g extend beyond the data range %.4g .. %.4g",
          ks[0], ks[ks.length - 1], source.minReducedFrequency(), source.maxReducedFrequency()));
    }
    return warnings;
  }

  /** @return A<sub>0</sub> = Re Q(0) of the source */
  static double[][] steadyForces(AeroSource source) {
    int n = source.size();
    ZMatrixRMaj q = new ZMatrixRMaj(n, n);
    source.forces(0.0, q);
    double[][] a0 = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a0[i][j] = q.getReal(i, j);
      }
    }
    return a0;
  }

  /** @return Q(ik) at each k, interleaved as in {@link ZMatrixRMaj#data} */
  static double[][] sampled(AeroSource source, double[] ks) {
    ZMatrixRMaj q = new ZMatrixRMaj(source.size(), source.size());
    double[][] data = new double[ks.length][];
    for (int r = 0; r < ks.length; r++) {
      source.forces(ks[r], q);
      data[r] = q.data.clone();
    }
    return data;
  }

  /**
   * The fit with its errors on the fitted frequencies and, above the threshold, a warning.
   *
   * @param source the fitted data (for its reference semichord and description)
   * @param lags lag roots
   * @param coefficients A<sub>0</sub> .. A<sub>nL+2</sub>
   * @param ks fitted reduced frequencies
   * @param data Q(ik) at each fitted k, interleaved as in {@link ZMatrixRMaj#data}
   * @param errorThreshold relative error above which the fit is flagged
   * @param warnings remarks so far (added to)
   * @param form {@link RationalFit#form()}
   * @return the fit
   */
  static RationalFit measured(AeroSource source, double[] lags, double[][][] coefficients, double[] ks,
      double[][] data, double errorThreshold, List<String> warnings, String form) {
    int n = coefficients[0].length;
    int nn = n * n;
    int nk = ks.length;
    ZMatrixRMaj q = new ZMatrixRMaj(n, n);
    RationalFit provisional = new RationalFit(source.referenceSemichordM(), lags, coefficients, ks,
        FitError.of(new double[n][n], new double[n][n]), errorThreshold, List.of(), source.description(), form);
    double[][] absolute = new double[n][n];
    double[][] largest = new double[n][n];
    for (int r = 0; r < nk; r++) {
      provisional.evaluate(ks[r], q);
      for (int e = 0; e < nn; e++) {
        double dr = q.data[2 * e] - data[r][2 * e];
        double di = q.data[2 * e + 1] - data[r][2 * e + 1];
        absolute[e / n][e % n] = Math.max(absolute[e / n][e % n], Math.hypot(dr, di));
        largest[e / n][e % n] = Math.max(largest[e / n][e % n], Math.hypot(data[r][2 * e], data[r][2 * e + 1]));
      }
    }
    double[][] relative = new double[n][n];
    double overall = 0;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        overall = Math.max(overall, Math.max(largest[i][j], Math.abs(coefficients[0][i][j])));
      }
    }
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double big = Math.max(largest[i][j], Math.abs(coefficients[0][i][j]));
        // an element that is zero in the data is judged against the largest element of all
        // (Roger's form fits it exactly by zero; the rank-one lag terms of the minimum-state form
        // need not)
        double scale = big > 0 ? big : overall;
        relative[i][j] = scale > 0 ? absolute[i][j] / scale : (absolute[i][j] == 0 ? 0.0 : Double.POSITIVE_INFINITY);
      }
    }
    FitError error = FitError.of(relative, absolute);
    if (error.worstRelativeError() > errorThreshold) {
      warnings.add(String.format(Locale.ROOT,
          "rational fit error %.3g %% on element (%d, %d) exceeds %.3g %%: add lag roots or narrow the "
              + "fitted range",
          100 * error.worstRelativeError(), error.worstRow(), error.worstColumn(), 100 * errorThreshold));
    }
    return new RationalFit(source.referenceSemichordM(), lags, coefficients, ks, error, errorThreshold,
        warnings, source.description(), form);
  }

  /**
   * Default reduced frequencies: {@code count} values k<sub>i</sub> = k<sub>max</sub> (i /
   * (count - 1))<sup>2</sup>, i = 0 .. count - 1, from 0 to k<sub>max</sub>, quadratically
   * clustered near k = 0 where unsteady forces change fastest (k ln k behaviour).
   *
   * @param maxReducedFrequency k<sub>max</sub> &gt; 0, finite
   * @param count number of values, &ge; 3
   * @return the grid, increasing
   * @throws InvalidInputException {@code rfa.max_reduced_frequency} or {@code rfa.points}
   */
  public static double[] defaultReducedFrequencies(double maxReducedFrequency, int count) {
    return reducedFrequencies(0.0, maxReducedFrequency, count);
  }

  /**
   * Reduced frequencies from k<sub>min</sub> to k<sub>max</sub>: k<sub>i</sub> = k<sub>min</sub>
   * + (k<sub>max</sub> - k<sub>min</sub>) (i / (count - 1))<sup>2</sup>, clustered toward
   * k<sub>min</sub> ({@link #defaultReducedFrequencies} for k<sub>min</sub> = 0).
   *
   * @param minReducedFrequency k<sub>min</sub> &ge; 0, finite
   * @param maxReducedFrequency k<sub>max</sub> &gt; k<sub>min</sub>, finite
   * @param count number of values, &ge; 3
   * @return the grid, increasing
   * @throws InvalidInputException {@code rfa.min_reduced_frequency}, {@code
   *     rfa.max_reduced_frequency} or {@code rfa.points}
   */
  public static double[] reducedFrequencies(double minReducedFrequency, double maxReducedFrequency, int count) {
    checkMaxK(maxReducedFrequency);
    if (!(minReducedFrequency >= 0) || !(minReducedFrequency < maxReducedFrequency)) {
      throw new InvalidInputException("rfa.min_reduced_frequency",
          "a value >= 0 below k_max = " + maxReducedFrequency, String.valueOf(minReducedFrequency));
    }
    if (count < 3) {
      throw new InvalidInputException("rfa.points", "at least 3", String.valueOf(count));
    }
    double[] k = new double[count];
    for (int i = 0; i < count; i++) {
      double u = (double) i / (count - 1);
      k[i] = minReducedFrequency + (maxReducedFrequency - minReducedFrequency) * u * u;
    }
    k[count - 1] = maxReducedFrequency;
    return k;
  }

  /**
   * Default lag roots. Spreading the lag roots over the fitted range is common practice (Tiffany
   * &amp; Adams, NASA TP-2776, 1988, place them within the range of fitted reduced frequencies);
   * the particular spread here is ours: geometric between 0.02 k<sub>max</sub> and 0.15
   * k<sub>max</sub>,
   *
   * <pre>  beta_l = 0.02 k_max 7.5^((l - 1)/(nL - 1)),  l = 1 .. nL  (nL &ge; 2);   0.05 k_max for nL = 1 </pre>
   *
   * i.e. in the low part of the range, where forces of unsteady theory change fastest (their k ln k
   * behaviour near k = 0). Chosen from fits of Theodorsen strip-theory forces over k in [0, 1.5]:
   * with it the worst element error is below 1 % for every nL from 2 to 6 (see the tests), against
   * several per cent for lag roots spread evenly up to k<sub>max</sub>. For data with strong
   * high-frequency content (e.g. compressible panel-method tables) the user's own lag roots may do
   * better; the fit error says so.
   *
   * @param maxReducedFrequency k<sub>max</sub> &gt; 0, finite
   * @param lagCount nL from 0 to {@value RationalFitSettings#MAX_LAG_COUNT}
   * @return nL lag roots, increasing (dimensionless)
   * @throws InvalidInputException {@code rfa.max_reduced_frequency} or {@code rfa.lag_count}
   */
  public static double[] defaultLagRoots(double maxReducedFrequency, int lagCount) {
    checkMaxK(maxReducedFrequency);
    if (lagCount < 0 || lagCount > RationalFitSettings.MAX_LAG_COUNT) {
      throw new InvalidInputException("rfa.lag_count", "0 to " + RationalFitSettings.MAX_LAG_COUNT,
          String.valueOf(lagCount));
    }
    double[] b = new double[lagCount];
    if (lagCount == 1) {
      b[0] = SINGLE_LAG_FRACTION * maxReducedFrequency;
    }
    for (int l = 0; l < lagCount && lagCount > 1; l++) {
      b[l] = LOW_LAG_FRACTION * maxReducedFrequency
          * Math.pow(HIGH_LAG_FRACTION / LOW_LAG_FRACTION, (double) l / (lagCount - 1));
    }
    return b;
  }

  /** Lowest default lag root as a fraction of k<sub>max</sub>. */
  private static final double LOW_LAG_FRACTION = 0.02;
  /** Highest default lag root as a fraction of k<sub>max</sub>. */
  private static final double HIGH_LAG_FRACTION = 0.15;
  /** The single default lag root as a fraction of k<sub>max</sub>. */
  private static final double SINGLE_LAG_FRACTION = 0.05;

  private static void checkMaxK(double maxReducedFrequency) {
    if (!(maxReducedFrequency > 0) || Double.isInfinite(maxReducedFrequency)) {
      throw new InvalidInputException("rfa.max_reduced_frequency", "a finite value > 0",
          String.valueOf(maxReducedFrequency));
    }
  }

  static double[] checkedFrequencies(double[] ks) {
    if (ks == null || ks.length == 0) {
      throw new InvalidInputException("rfa.reduced_frequencies", "a list of reduced frequencies", "none");
    }
    double[] c = ks.clone();
    for (int i = 0; i < c.length; i++) {
      if (!(c[i] >= 0) || Double.isInfinite(c[i]) || (i > 0 && !(c[i] > c[i - 1]))) {
        throw new InvalidInputException("rfa.reduced_frequencies[" + i + "]",
            "a finite value >= 0 above the previous one", String.valueOf(c[i]));
      }
    }
    return c;
  }
}
