package org.flexmargin.aero;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.InvalidInputException;

/**
 * Karpel's minimum-state rational approximation of generalized aerodynamic forces (M. Karpel,
 * "Design for active flutter suppression and gust alleviation using state-space aeroelastic
 * modeling", J. Aircraft 19(3), 1982; survey in Tiffany &amp; Adams, NASA TP-2776, 1988):
 *
 * <pre>
 *   Q(p) ~ A_0 + A_1 p + A_2 p^2 + D (p I - R)^-1 E p,   R = diag(-beta_1 .. -beta_nL),  p = i k on the data
 * </pre>
 *
 * with D n x nL and E nL x n real. The lag term is the sum over l of the rank-one matrix D[:, l]
 * E[l, :] times p / (p + beta_l), so the fit is held as a {@link RationalFit} in Roger's form with
 * lag matrices of rank one (form {@link RationalFit#MINIMUM_STATE}) and evaluates like any other
 * fit; a state-space model of it needs only nL aerodynamic states instead of Roger's nL n.
 *
 * <p>Fit: A<sub>0</sub> = Re Q(0) imposed (exact steady forces, as in {@link RogerApproximation});
 * then alternating least squares (Karpel; Tiffany &amp; Adams): with D fixed the problem is linear in
 * (A<sub>1</sub>, A<sub>2</sub>, E) and splits by column; with E fixed it is linear in
 * (A<sub>1</sub>, A<sub>2</sub>, D) and splits by row. By default ({@link FitWeighting#ELEMENT})
 * each equation of element (i, j) is weighted by 1 / max<sub>k</sub> |Q<sub>ij</sub>| (at least
 * 1e-3 of the largest element), so that small elements are fitted to the same relative accuracy as
 * large ones; the weighted fit offers the others. D starts from the dominant singular
 * pairs of a Roger fit with the same lag roots (one unit entry per lag root where that fit is
 * ill-posed). A<sub>1</sub> and A<sub>2</sub> are eliminated per element once, so that each
 * half-step solves only nL x nL normal equations per column or row ({@link MinimumStateSteps}).
 *
 * <p>The plain least-squares problem need not have a minimum. With many close lag roots (the
 * automatic 2 n roots lie within a factor 7.5 of each other) neighbouring lag terms can grow
 * without bound while cancelling each other, approaching a double pole p / (p + beta)<sup>2</sup>
 * that the form cannot hold: on the demo's strip-theory forces (n = 8, 16 lag roots) alternating
 * least squares lowers S by 30 % over 36 000 iterations while its lag coefficients grow from 40
 * to 900 times the largest entry of A<sub>0..2</sub>, with alternating signs, and no stop rule on S
 * alone is met in 400 iterations (the same degeneracy is known for other bilinear fits: P. Paatero,
 * "Construction and analysis of degenerate PARAFAC models", J. Chemometrics 14, 2000, from memory).
 * So the fit minimises the penalised residual F = S + &mu; (|D|<sup>2</sup> + |E|<sup>2</sup>) (a
 * ridge, or Tikhonov, term; |.| the Frobenius norm), which has a minimum. At that minimum each lag
 * term's size is shared equally between D and E, so the penalty is 2 &mu; times the sum of the
 * Frobenius norms of the lag matrices: with &mu; = {@value #RIDGE} S / s<sub>Q</sub> (S at the
 * time, s<sub>Q</sub> the RMS over k of the Frobenius norm of Q - A0) lag matrices as large as the
 * data cost 2 % of S, while cancelling pairs a hundred times larger cost twice S. &mu; is set at
 * the start and again whenever S has fallen below {@value #RIDGE_STAGE} of its value at the last
 * setting, so that it vanishes with S: data of the form itself are still fitted to round-off.
 *
 * <p>Iteration: one alternating least-squares sweep (each half-step with the ridge), then one
 * damped Newton step on D and E together ({@link MinimumStateLevenbergMarquardt}), taken only if it
 * lowers F. The sweep alone zigzags across valleys that run obliquely to D and E and converges
 * linearly at a rate near 1; the Newton step converges quadratically near the minimum.
 *
 * <p>Stop rule: with &mu; fixed each half-step and each step taken lowers F, so F falls
 * monotonically; the iterations stop when one iteration has lowered F by no more than {@value
 * #STOP_RELATIVE_DECREASE} of itself (near the minimum the Newton steps shrink quadratically, so
 * the rest of the decrease is smaller still), or when S is round-off (1e-28 of that of Q - A0, an
 * RMS error of 1e-14), or after {@value #MAX_ITERATIONS} iterations. Reaching the limit is said in
 * the fit's warnings, with the weighted error and the last decrease; {@link #fitWithConvergence}
 * also gives the iterations, the weighted error and the last decrease of a fit that converged.
 */
public final class MinimumStateApproximation {

  /** Most iterations (each an alternating least-squares sweep and a damped Newton step). */
  static final int MAX_ITERATIONS = 400;
  /** Relative decrease of the penalised residual over one iteration that stops (dimensionless). */
  static final double STOP_RELATIVE_DECREASE = 1e-10;
  /**
   * Ridge weight &eta;: &mu; = &eta; S / s<sub>Q</sub>, S the weighted residual sum of squares when
   * &mu; is set and s<sub>Q</sub> the size of the data (dimensionless).
   */
  static final double RIDGE = 1e-2;
  /** &mu; is set again when S has fallen below this fraction of its value at the last setting. */
  static final double RIDGE_STAGE = 0.25;
  /** Lag matrices whose largest entry is below this fraction of the data's size are set to zero. */
  private static final double NEGLIGIBLE_LAG = 1e-15;
  /** Weighted residual sum of squares, relative to that of Q - A0, that is round-off: stops. */
  private static final double ROUND_OFF_SQUARES = 1e-28;
  /** Elements smaller than this fraction of the largest are weighted as that size. */
  private static final double WEIGHT_FLOOR = 1e-3;

  private MinimumStateApproximation() {}

  /**
   * Fits with the default reduced frequencies and lag roots of {@link RogerApproximation}.
   *
   * @param source the data
   * @param maxReducedFrequency k<sub>max</sub> &gt; 0
   * @param lagCount nL from 1 to 24
   * @return the fit
   */
  public static RationalFit fit(AeroSource source, double maxReducedFrequency, int lagCount) {
    return fit(source, RogerApproximation.defaultReducedFrequencies(maxReducedFrequency, RogerApproximation.DEFAULT_POINTS),
        RogerApproximation.defaultLagRoots(maxReducedFrequency, lagCount), RogerApproximation.DEFAULT_ERROR_THRESHOLD);
  }

  /**
   * Fits the minimum-state form to {@code source} sampled at {@code reducedFrequencies}.
   *
   * @param source the data to fit
   * @param reducedFrequencies k values, &ge; 0, finite, strictly increasing, enough non-zero ones for
   *     the unknowns of one column: ceil((2 n + nL) / 2) + 1 for n coordinates
   * @param lagRoots &beta;<sub>l</sub> &gt; 0, distinct, at least one
   * @param errorThreshold relative element error above which the fit is flagged
   * @return the fit, its errors and warnings
   * @throws InvalidInputException {@code rfa.reduced_frequencies}, {@code rfa.lag_roots}, {@code
   *     rfa.error_threshold}
   */
  public static RationalFit fit(AeroSource source, double[] reducedFrequencies, double[] lagRoots,
      double errorThreshold) {
    return fit(source, reducedFrequencies, lagRoots, errorThreshold, FitWeighting.ELEMENT);
  }

  /**
   * Fits the minimum-state form with a weighting of its equations: {@link FitWeighting#ELEMENT}
   * (the element weights of the class description; this is {@link #fit(AeroSource, double[],
   * double[], double)}), {@link FitWeighting#UNIFORM} (every weight 1: the absolute error, which
   * favours the large elements) or {@link FitWeighting#INVERSE_MAGNITUDE} (the element weight times
   * the frequency weight of {@link RogerApproximation#frequencyWeights}, 1 to 20, larger where the
   * element is small).
   *
   * @param source the data to fit
   * @param reducedFrequencies k values as for the unweighted fit
   * @param lagRoots &beta;<sub>l</sub> as for the unweighted fit
   * @param errorThreshold relative element error above which the fit is flagged
   * @param weighting how the frequencies are weighted
   * @return the fit, its errors and warnings
   */
  public static RationalFit fit(AeroSource source, double[] reducedFrequencies, double[] lagRoots,
      double errorThreshold, FitWeighting weighting) {
    return fitWithConvergence(source, reducedFrequencies, lagRoots, errorThreshold, weighting).fit();
  }

  /**
   * As {@link #fit(AeroSource, double[], double[], double, FitWeighting)}, with how the iterations
   * ended: the fit's diagnostics (iterations, weighted error, last relative decrease).
   *
   * @param source the data to fit
   * @param reducedFrequencies k values as for {@link #fit(AeroSource, double[], double[], double)}
   * @param lagRoots &beta;<sub>l</sub> as for {@link #fit(AeroSource, double[], double[], double)}
   * @param errorThreshold relative element error above which the fit is flagged
   * @param weighting how the equations are weighted
   * @return the fit and its diagnostics
   */
  public static Result fitWithConvergence(AeroSource source, double[] reducedFrequencies, double[] lagRoots,
      double errorThreshold, FitWeighting weighting) {
    return fitWithConvergence(source, reducedFrequencies, lagRoots, errorThreshold, weighting, MAX_ITERATIONS);
  }

  /**
   * As {@link #fitWithConvergence(AeroSource, double[], double[], double, FitWeighting)} with at
   * most {@code limit} iterations (&ge; 1).
   */
  static Result fitWithConvergence(AeroSource source, double[] reducedFrequencies, double[] lagRoots,
      double errorThreshold, FitWeighting weighting, int limit) {
    if (source == null) {
      throw new InvalidInputException("rfa.source", "aerodynamic data", "none");
    }
    double[] ks = RogerApproximation.checkedFrequencies(reducedFrequencies);
    double[] lags = RationalFit.checkedLagRoots("rfa.lag_roots", lagRoots);
    if (lags.length == 0) {
      throw new InvalidInputException("rfa.lag_roots", "at least one lag root for a minimum-state fit", "none");
    }
    if (!(errorThreshold > 0) || Double.isInfinite(errorThreshold)) {
      throw new InvalidInputException("rfa.error_threshold", "a finite value > 0", String.valueOf(errorThreshold));
    }
    int n = source.size();
    int nl = lags.length;
    int positive = 0;
    for (double k : ks) {
      positive += k > 0 ? 1 : 0;
    }
    int needed = (2 * n + nl + 1) / 2 + 1;
    if (positive < needed) {
      throw new InvalidInputException("rfa.reduced_frequencies",
          "at least " + needed + " values above 0 for " + n + " coordinates and " + nl + " lag roots",
          positive + " values above 0");
    }
    List<String> warnings = RogerApproximation.rangeWarnings(source, ks);
    double[][] a0 = RogerApproximation.steadyForces(source);
    double[][] data = RogerApproximation.sampled(source, ks);
    Problem pr = new Problem(n, ks, lags, a0, data, weighting == FitWeighting.UNIFORM,
        RogerApproximation.frequencyWeights(data, a0, weighting));
    double[][] d = pr.initialD(source, errorThreshold, lags);
    double[][] e = new double[nl][n];
    Convergence convergence = iterate(pr.steps(), d, e, limit);
    if (!convergence.converged()) {
      warnings.add(String.format(Locale.ROOT,
          "minimum-state fit stopped at the iteration limit %d: weighted fit error %.3g still falling by %.3g "
              + "relative in the last iteration",
          convergence.iterations(), convergence.weightedError(), convergence.lastDecrease()));
    }
    double[][] a1 = new double[n][n];
    double[][] a2 = new double[n][n];
    pr.steps().velocityAndAcceleration(d, e, a1, a2, new double[nl]);
    double[][][] coefficients = new double[nl + 3][][];
    coefficients[0] = a0;
    coefficients[1] = a1;
    coefficients[2] = a2;
    for (int l = 0; l < nl; l++) {
      double[][] m = new double[n][n];
      double largest = 0;
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          m[i][j] = d[i][l] * e[l][j];
          largest = Math.max(largest, Math.abs(m[i][j]));
        }
      }
      // a lag term the ridge has shrunk towards zero would reach the subnormal range, where the
      // products d_i e_j are no longer of rank one to round-off: below 1e-15 of the data it is 0
      coefficients[l + 3] = largest > NEGLIGIBLE_LAG * pr.steps().targetScale() ? m : new double[n][n];
    }
    RationalFit fit = RogerApproximation.measured(source, lags, coefficients, ks, data, errorThreshold, warnings,
        RationalFit.MINIMUM_STATE);
    return new Result(fit, convergence);
  }

  /**
   * Iterations of the class description (sweep and Newton step) from D until the stop rule or
   * {@code limit} iterations.
   *
   * @param steps the half-steps
   * @param d D, the start; overwritten with the last
   * @param e E, overwritten with the last
   * @param limit most iterations
   * @return how it stopped
   */
  static Convergence iterate(MinimumStateSteps steps, double[][] d, double[][] e, int limit) {
    double[] work = new double[e.length];
    double[] history = new double[limit];
    double total = steps.targetSquares();
    double scale = steps.targetScale();
    MinimumStateLevenbergMarquardt newton = new MinimumStateLevenbergMarquardt(steps);
    double s = steps.residual(d, e, work);
    double stage = Double.POSITIVE_INFINITY;
    double mu = 0;
    int it = 0;
    boolean converged = false;
    double decrease = Double.NaN;
    while (it < limit && !converged) {
      if (s < RIDGE_STAGE * stage) {
        stage = s;
        mu = scale > 0 ? RIDGE * s / scale : 0.0;
        steps.ridge(mu);
      }
      double before = s + mu * MinimumStateLevenbergMarquardt.squares(d, e);
      steps.solveColumns(d, e);
      steps.solveRows(e, d, work);
      double swept = steps.residual(d, e, work) + mu * MinimumStateLevenbergMarquardt.squares(d, e);
      double f = newton.improve(d, e, swept, mu);
      s = steps.residual(d, e, work);
      history[it] = s;
      decrease = (before - f) / before;
      converged = decrease <= STOP_RELATIVE_DECREASE || s <= ROUND_OFF_SQUARES * total;
      it++;
    }
    return new Convergence(it, converged, total > 0 ? Math.sqrt(s / total) : 0.0, decrease,
        Arrays.copyOf(history, it));
  }

  /**
   * How the iterations of a minimum-state fit ended: its diagnostics.
   *
   * @param iterations iterations done, 1 to the limit (count)
   * @param converged whether the stop rule (rather than the limit) ended them
   * @param weightedError weighted fit error, relative: sqrt(weighted residual sum of squares / that
   *     of Q - A0), dimensionless
   * @param lastDecrease relative decrease of the penalised residual F in the last iteration
   *     (dimensionless; NaN when Q = A0 and F is 0)
   * @param history weighted residual sum of squares after each iteration (squared force coefficient
   *     units times the squared weights)
   */
  public record Convergence(int iterations, boolean converged, double weightedError, double lastDecrease,
      double[] history) {
    public Convergence {
      if (iterations < 1 || history == null || history.length != iterations || !(weightedError >= 0)) {
        throw new IllegalArgumentException("iterations " + iterations + ", weighted error " + weightedError);
      }
      history = history.clone();
    }

    @Override
    public double[] history() {
      return history.clone();
    }
  }

  /**
   * A fit and how its iterations ended.
   *
   * @param fit the fit
   * @param convergence the iterations
   */
  public record Result(RationalFit fit, Convergence convergence) {
    public Result {
      if (fit == null || convergence == null) {
        throw new IllegalArgumentException("fit and convergence are required");
      }
    }
  }

  /** The weighted least-squares data: Q(ik) - A0 and the lag functions p / (p + beta). */
  private static final class Problem {
    private final int n;
    private final int nk;
    private final int nl;
    private final double[] ks;
    /** lag function l at k r: re, im of ik / (ik + beta_l). */
    private final double[][] lagRe;
    private final double[][] lagIm;
    /** target (Q - A0) at k r for element (i, j): re, im. */
    private final double[][][] targetRe;
    private final double[][][] targetIm;
    private final double[][] weight;
    /** frequency weight at k r of element (i, j), or null when every one is 1. */
    private final double[][][] frequencyWeight;
    private MinimumStateSteps steps;

    Problem(int n, double[] ks, double[] lags, double[][] a0, double[][] data, boolean uniform,
        double[][][] frequencyWeight) {
      this.frequencyWeight = frequencyWeight;
      this.n = n;
      this.nk = ks.length;
      this.nl = lags.length;
      this.ks = ks;
      lagRe = new double[nk][nl];
      lagIm = new double[nk][nl];
      for (int r = 0; r < nk; r++) {
        double k = ks[r];
        for (int l = 0; l < nl; l++) {
          double den = k * k + lags[l] * lags[l];
          lagRe[r][l] = k * k / den;
          lagIm[r][l] = k * lags[l] / den;
        }
      }
      targetRe = new double[nk][n][n];
      targetIm = new double[nk][n][n];
      weight = new double[n][n];
      for (int r = 0; r < nk; r++) {
        for (int i = 0; i < n; i++) {
          for (int j = 0; j < n; j++) {
            int idx = 2 * (i * n + j);
            targetRe[r][i][j] = data[r][idx] - a0[i][j];
            targetIm[r][i][j] = data[r][idx + 1];
            weight[i][j] = Math.max(weight[i][j], Math.hypot(data[r][idx], data[r][idx + 1]));
          }
        }
      }
      double largest = 0;
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          weight[i][j] = Math.max(weight[i][j], Math.abs(a0[i][j]));
          largest = Math.max(largest, weight[i][j]);
        }
      }
      // elements below 1e-3 of the largest are weighted as if they were that size: a relative fit
      // of an element that is round-off would spoil the others
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          double size = Math.max(weight[i][j], WEIGHT_FLOOR * largest);
          weight[i][j] = size > 0 && !uniform ? 1 / size : 1.0;
        }
      }
    }

    /** @return the weight of the equations of element (i, j) at k r */
    private double weight(int r, int i, int j) {
      return frequencyWeight == null ? weight[i][j] : weight[i][j] * frequencyWeight[r][i][j];
    }

    /**
     * Start: D[:, l] = sigma u of the dominant singular pair of lag matrix l of a Roger fit with the
     * same lag roots; where that fit is ill-posed (many close lag roots), the usual unit pattern
     * D[i, l] = 1 for i = l mod n (Tiffany &amp; Adams).
     */
    double[][] initialD(AeroSource source, double errorThreshold, double[] lags) {
      double[][] d = new double[n][nl];
      RationalFit roger;
      try {
        roger = RogerApproximation.fit(source, ks, lags, errorThreshold);
      } catch (InvalidInputException e) {
        for (int l = 0; l < nl; l++) {
          d[l % n][l] = 1;
        }
        return d;
      }
      SingularValueDecomposition_F64<DMatrixRMaj> svd = DecompositionFactory_DDRM.svd(n, n, true, false, false);
      for (int l = 0; l < nl; l++) {
        if (!svd.decompose(new DMatrixRMaj(roger.matrix(l + 3)))) {
          throw new ArithmeticException("singular value decomposition failed");
        }
        DMatrixRMaj u = svd.getU(null, false);
        double[] sv = svd.getSingularValues();
        int best = 0;
        for (int s = 1; s < svd.numberOfSingularValues(); s++) {
          best = sv[s] > sv[best] ? s : best;
        }
        for (int i = 0; i < n; i++) {
          d[i][l] = sv[best] > 0 ? sv[best] * u.get(i, best) : (i == l % n ? 1 : 0);
        }
      }
      return d;
    }

    /** @return the reduced half-steps of these data (built on first use) */
    MinimumStateSteps steps() {
      if (steps == null) {
        double[][][] w = new double[nk][n][n];
        for (int r = 0; r < nk; r++) {
          for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
              w[r][i][j] = weight(r, i, j);
            }
          }
        }
        steps = new MinimumStateSteps(ks, lagRe, lagIm, targetRe, targetIm, w);
      }
      return steps;
    }
  }
}
