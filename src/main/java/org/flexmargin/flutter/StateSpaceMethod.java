package org.flexmargin.flutter;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.LagRealisation;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RationalFits;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.FlutterWorkspace.Root;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;
import org.flexmargin.numerics.ComplexEigen;
import org.flexmargin.numerics.ComplexEigenResult;

/**
 * Flutter from the eigenvalues of a first-order state-space model of the aeroelastic equations,
 * with the aerodynamics replaced by a rational function approximation held in Roger's form (K. L.
 * Roger, AGARD-CP-228, 1977; Tiffany &amp; Adams, NASA TP-2776, 1988; see {@link
 * RogerApproximation}), fitted as the analysis options' rational-fit settings ask ({@link
 * RationalFits}: Roger's form, or Karpel's minimum-state form, whose rank-one lag matrices need
 * one lag state per lag root instead of n; see {@link #stateMatrix}). Unlike the p-k method this model is exact for every complex s, not only
 * on the imaginary axis, so its damping is consistent away from g = 0 and a divergence shows as a
 * real root crossing zero; the price is the fit error of the aerodynamics.
 *
 * <h2>Derivation</h2>
 *
 * The equations of motion are {@code M xi'' + C xi' + K xi = q Q(p) xi} with q = rho V^2 / 2, the
 * generalized aerodynamic force on the right-hand side (sign convention of {@link AeroSource}), and
 * p = s b / V the non-dimensional Laplace variable (b the reference semichord of the fit). With
 *
 * <pre>  Q(p) = A0 + A1 p + A2 p^2 + sum_l A_{l+2} p / (p + beta_l)  </pre>
 *
 * p xi corresponds to (b/V) xi' and p^2 xi to (b/V)^2 xi''. Each lag term defines a vector of lag
 * states r_l = [p / (p + beta_l)] xi = [s / (s + (V/b) beta_l)] xi, that is
 *
 * <pre>  r_l' = xi' - (V/b) beta_l r_l. </pre>
 *
 * Moving the terms proportional to xi, xi' and xi'' to the left-hand side:
 *
 * <pre>
 *   Mbar xi'' + Cbar xi' + Kbar xi = q sum_l A_{l+2} r_l,
 *   Mbar = M - q (b/V)^2 A2 = M - (rho b^2 / 2) A2,
 *   Cbar = C - q (b/V) A1   = C - (rho V b / 2) A1,
 *   Kbar = K - q A0.
 * </pre>
 *
 * With the state x = [xi; xi'; r_1; ...; r_nL] (length n (2 + nL)) this is x' = A x with the real
 * matrix
 *
 * <pre>
 *   [ 0               I               0                 ...  0                  ]
 *   [ -Mbar^-1 Kbar   -Mbar^-1 Cbar   q Mbar^-1 A_3     ...  q Mbar^-1 A_{nL+2} ]
 *   [ 0               I               -(V/b) beta_1 I   ...  0                  ]
 *   [ ...                                                                       ]
 *   [ 0               I               0                 ...  -(V/b) beta_nL I   ]
 * </pre>
 *
 * ({@link #stateMatrix}). Checks: at q = 0 the matrix is block triangular and its eigenvalues are
 * the in-vacuo roots of M s^2 + C s + K and the lag roots -(V/b) beta_l, each n times; at s = 0,
 * det(s I - A) is proportional to det(K - q A0) with A0 = Re Q(0), so a real root crosses zero
 * exactly at the divergence pressure of the data (formulation note, section 4).
 *
 * <h2>Roots, tracking, crossings</h2>
 *
 * <ul>
 *   <li>At every speed all eigenvalues and eigenvectors of A are computed ({@link ComplexEigen}
 *       on the real matrix); the eigenvector's first n entries are the xi-partition (mode shape).
 *   <li><b>Structural roots</b> are tracked, one branch per coordinate, with Im(s) &ge; 0. At the
 *       first point, branch j takes the root (not dominated by lag states) with the largest
 *       participation of coordinate j in its xi-partition, discounted by its distance from the
 *       in-vacuo root i omega_j; conflicts are settled greedily by score.
 *   <li>Continuation: the roots at the next point are matched to the branches greedily by the
 *       cost |s - s_prev| / scale + (1 - MAC) (MAC of the xi-partitions, {@link
 *       FlutterWorkspace#mac}); a step is clean when every branch keeps MAC &ge; 0.8 and moves by
 *       less than a quarter of scale = max(|s_prev|, |s|, 0.1 omega_j); otherwise it is halved (up
 *       to 8 times). When a complex pair reaches the real axis and splits, the branch follows the
 *       larger real root (the less stable one, which decides stability; e.g. the divergence root).
 *   <li><b>Aerodynamic lag roots</b> (real, near -(V/b) beta_l) and other untracked roots are not
 *       reported as branches; if one is unstable at a grid point, the solution warns. A root in
 *       the right half-plane is never dominated by lag states: its eigenvector has lag states
 *       z_l = s / (s + (V/b) beta_l) E_l xi, with |s| &lt; |s + (V/b) beta_l| for Re s &gt; 0
 *       and ||E_l|| &le; 1 in both realisations (the identity, or a unit row e_l^T), so
 *       ||z_l|| &lt; ||xi||: a root grown out of a lag root is reported like any other untracked
 *       root once it is unstable.
 *   <li><b>Crossings</b>: sign changes of 2 Re(s) - g_level |Im(s)| (g_level = 0 and minus the
 *       damping limit) on the grid are refined by Brent's method on the path parameter,
 *       re-solving the eigenproblem and matching from the left grid point's roots. A tracked
 *       branch whose real root crosses zero gives an onset at zero frequency.
 *   <li><b>Static divergence</b>: usually the real root that crosses zero at the divergence
 *       pressure is not a tracked branch (it grows out of the aerodynamic lag roots while the
 *       structural pairs stay oscillating). Every sign change of det A between grid points that
 *       no branch accounts for is refined by Brent's method on the continuous function
 *       (-1)^(number of negative real roots) &times; (distance of the nearest real root from 0)
 *       and reported in the warnings with its speed and dynamic pressure (the result types have
 *       no crossing kind for it yet). A step in which a tracked branch already reports a crossing
 *       at zero frequency (its real root crossing zero) gets no such note: that crossing accounts
 *       for the sign change, and the other real roots crossed zero an even number of times
 *       there, which det A cannot show.
 * </ul>
 *
 * <p>Diagnostics: {@code fullEigenSolves} counts eigen-decompositions, {@code iterations} their QR
 * sweeps, {@code rootSolves} the tracked roots accepted, {@code maxRelativeResidual} the worst
 * eigen residual ||A v - s v|| / max|A_ij|, {@code minMac} the lowest step MAC.
 *
 * <p>Immutable and thread-safe; every call builds its own workspace.
 */
public final class StateSpaceMethod implements FlutterMethod {

  /** Default number of lag roots of the fit made when none is given. */
  public static final int DEFAULT_LAG_COUNT = 4;

  /**
   * Default upper end of the fitted reduced-frequency range: covers the reduced frequencies of
   * flutter and of the first elastic modes (docs/validation.md section 6).
   */
  public static final double DEFAULT_MAX_REDUCED_FREQUENCY = 1.5;

  private static final int MAX_HALVINGS = 8;
  private static final double MIN_STEP_MAC = 0.8;
  private static final double MAX_RELATIVE_STEP = 0.25;
  private static final double FREQUENCY_FLOOR_FRACTION = 0.1;
  /** Lag states larger than this multiple of the xi-partition mark a root as aerodynamic. */
  private static final double LAG_DOMINANCE = 3.0;
  /** |Im s| below this fraction of the spectral radius counts as a real root. */
  private static final double REAL_TOLERANCE = 1e-7;
  private static final int BRENT_MAX_EVALUATIONS = 100;

  private final RationalFit fit;
  /** Fit settings of this method, or null to take those of the options given to {@link #solve}. */
  private final RationalFitSettings settings;

  /**
   * Uses the system's aerodynamics as they are if they are a {@link RationalFit}, else fits them
   * as the options given to {@link #solve} ask ({@link AnalysisOptions#rationalFit()}), over k in
   * [0, {@value #DEFAULT_MAX_REDUCED_FREQUENCY}] unless they give the range; with the default
   * settings, {@value #DEFAULT_LAG_COUNT} default lag roots in Roger's form.
   */
  public StateSpaceMethod() {
    this.fit = null;
    this.settings = null;
  }

  /**
   * Uses the system's aerodynamics as they are if they are a {@link RationalFit}, else fits them
   * by {@link RogerApproximation#fit(AeroSource, double, int)}, whatever the options say.
   *
   * @param lagCount number of lag roots nL, 0 to {@value RationalFitSettings#MAX_LAG_COUNT}
   * @param maxReducedFrequency upper end of the fitted range, &gt; 0
   * @throws InvalidInputException {@code rfa.lag_count} or {@code rfa.max_reduced_frequency}
   */
  public StateSpaceMethod(int lagCount, double maxReducedFrequency) {
    RogerApproximation.defaultLagRoots(maxReducedFrequency, lagCount); // validates both
    this.fit = null;
    this.settings = new RationalFitSettings(RationalFitForm.ROGER, lagCount, null, 0.0, maxReducedFrequency,
        RationalFitSettings.DEFAULT_POINTS, FitWeighting.UNIFORM);
  }

  /**
   * Uses the system's aerodynamics as they are if they are a {@link RationalFit}, else fits them
   * with the given settings, whatever the options say.
   *
   * @param settings how to fit; an automatic range ends at {@value #DEFAULT_MAX_REDUCED_FREQUENCY}
   */
  public StateSpaceMethod(RationalFitSettings settings) {
    if (settings == null) {
      throw new InvalidInputException("rational_fit", "rational-fit settings", "none");
    }
    this.fit = null;
    this.settings = settings;
  }

  /**
   * Uses a given fit of the system's aerodynamics.
   *
   * @param fit the fit, in the system's coordinates and reference semichord
   */
  public StateSpaceMethod(RationalFit fit) {
    if (fit == null) {
      throw new InvalidInputException("rfa", "a rational fit", "none");
    }
    this.fit = fit;
    this.settings = null;
  }

  /**
   * The fit this method uses for a system with the default options.
   *
   * @param system the aeroelastic system
   * @return the rational fit
   * @see #fitFor(AeroelasticSystem, AnalysisOptions)
   */
  public RationalFit fitFor(AeroelasticSystem system) {
    return fitFor(system, AnalysisOptions.defaults());
  }

  /**
   * The fit this method uses for a system: the one given to the constructor, else the system's
   * own aerodynamics if they are a fit, else a new fit of them with this method's settings or, if
   * it has none, the options' ({@link RationalFits}).
   *
   * @param system the aeroelastic system
   * @param options the analysis options (their rational-fit settings)
   * @return the rational fit
   * @throws IllegalArgumentException if a given fit does not match the system's size or reference
   *     semichord
   */
  public RationalFit fitFor(AeroelasticSystem system, AnalysisOptions options) {
    AeroSource aero = system.aero();
    RationalFit f;
    if (fit != null) {
      f = fit;
    } else if (aero instanceof RationalFit own) {
      f = own;
    } else {
      f = RationalFits.fit(aero, settings != null ? settings : options.rationalFit(), DEFAULT_MAX_REDUCED_FREQUENCY);
    }
    if (f.size() != system.size()) {
      throw new IllegalArgumentException(
          "rational fit has " + f.size() + " coordinates but the system has " + system.size());
    }
    double b = aero.referenceSemichordM();
    if (Math.abs(f.referenceSemichordM() - b) > 1e-12 * b) {
      throw new IllegalArgumentException("rational fit reference semichord " + f.referenceSemichordM()
          + " m differs from the system's " + b + " m");
    }
    return f;
  }

  /**
   * The real state matrix A of x' = A x, x = [xi; xi'; r_1; ...; r_nL] (see the class Javadoc).
   *
   * @param system structural matrices M, C, K
   * @param fit the rational fit of the aerodynamics (same size)
   * @param densityKgPerM3 air density rho &ge; 0 (kg/m^3); 0 gives the in-vacuo structure plus
   *     the uncoupled lag roots
   * @param speedTasMps true airspeed V &ge; 0 (m/s)
   * @return the square state matrix (units 1/s and 1/s^2 by block): n (2 + nL) for Roger's form,
   *     2 n + nL for the minimum-state form, whose lag state z_l = e_l^T r_l follows z_l' = e_l^T
   *     xi' - (V/b) beta_l z_l with A_{l+2} = d_l e_l^T (the fit's {@link
   *     RationalFit#lagRealisation() realisation})
   * @throws IllegalArgumentException for negative or non-finite density or speed, or sizes that
   *     differ
   * @throws ArithmeticException if Mbar = M - (rho b^2 / 2) A2 is singular
   */
  public static DMatrixRMaj stateMatrix(
      AeroelasticSystem system, RationalFit fit, double densityKgPerM3, double speedTasMps) {
    return stateMatrix(system, fit, fit.lagRealisation(), densityKgPerM3, speedTasMps);
  }

  /**
   * {@link #stateMatrix(AeroelasticSystem, RationalFit, double, double)} with the fit's lag
   * realisation made once by the caller; x = [xi; xi'; z], the lag states z as the realisation
   * numbers them.
   */
  static DMatrixRMaj stateMatrix(AeroelasticSystem system, RationalFit fit, LagRealisation lags,
      double densityKgPerM3, double speedTasMps) {
    if (!(densityKgPerM3 >= 0) || !(speedTasMps >= 0) || Double.isInfinite(densityKgPerM3)
        || Double.isInfinite(speedTasMps)) {
      throw new IllegalArgumentException("density and speed must be finite and >= 0, found rho = "
          + densityKgPerM3 + " kg/m^3, V = " + speedTasMps + " m/s");
    }
    int n = system.size();
    if (fit.size() != n) {
      throw new IllegalArgumentException("rational fit has " + fit.size() + " coordinates, system " + n);
    }
    int size = 2 * n + lags.stateCount();
    double b = fit.referenceSemichordM();
    double q = 0.5 * densityKgPerM3 * speedTasMps * speedTasMps;
    double qbv = 0.5 * densityKgPerM3 * speedTasMps * b; // q b / V
    double qbv2 = 0.5 * densityKgPerM3 * b * b; // q (b / V)^2
    double[] mm = system.massFlat();
    double[] cc = system.dampingFlat();
    double[] kk = system.stiffnessFlat();
    DMatrixRMaj mbar = new DMatrixRMaj(n, n);
    DMatrixRMaj rhs = new DMatrixRMaj(n, size);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        mbar.set(i, j, mm[i * n + j] - qbv2 * fit.coefficient(2, i, j));
        rhs.set(i, j, -(kk[i * n + j] - q * fit.coefficient(0, i, j)));
        rhs.set(i, n + j, -(cc[i * n + j] - qbv * fit.coefficient(1, i, j)));
      }
    }
    lags.setForceColumns(rhs, 0, 2 * n, q);
    DMatrixRMaj x = new DMatrixRMaj(n, size);
    if (!CommonOps_DDRM.solve(mbar, rhs, x) || !finite(x)) {
      throw new ArithmeticException(String.format(Locale.ROOT,
          "mass matrix with aerodynamic apparent mass M - (rho b^2/2) A2 is singular at rho = %g kg/m^3",
          densityKgPerM3));
    }
    DMatrixRMaj a = new DMatrixRMaj(size, size);
    for (int i = 0; i < n; i++) {
      a.set(i, n + i, 1.0);
      for (int c = 0; c < size; c++) {
        a.set(n + i, c, x.get(i, c));
      }
    }
    lags.setLagRows(a, 2 * n, n, beta -> -speedTasMps / b * beta);
    return a;
  }

  /** Fit error at a flutter onset's reduced frequency above which the results say so (1 %). */
  public static final double ONSET_FIT_ERROR_LIMIT = 0.01;

  /**
   * The fit's error at the reduced frequency of a flutter onset: max over elements of |Q_fit(ik) -
   * Q(ik)| divided by the largest |Q_ij(ik)| (dimensionless; 0 when the source is the fit itself).
   *
   * @param source the fitted data
   * @param fit the fit
   * @param reducedFrequency k &ge; 0
   * @return the relative error
   */
  public static double fitErrorAt(AeroSource source, RationalFit fit, double reducedFrequency) {
    if (source == fit) {
      return 0.0;
    }
    int n = fit.size();
    ZMatrixRMaj exact = new ZMatrixRMaj(n, n);
    ZMatrixRMaj approx = new ZMatrixRMaj(n, n);
    source.forces(reducedFrequency, exact);
    fit.evaluate(reducedFrequency, approx);
    double diff = 0;
    double size = 0;
    for (int e = 0; e < n * n; e++) {
      diff = Math.max(diff, Math.hypot(approx.data[2 * e] - exact.data[2 * e],
          approx.data[2 * e + 1] - exact.data[2 * e + 1]));
      size = Math.max(size, Math.hypot(exact.data[2 * e], exact.data[2 * e + 1]));
    }
    return size > 0 ? diff / size : (diff == 0 ? 0.0 : Double.POSITIVE_INFINITY);
  }

  private static void flagFitErrorAtOnsets(AeroSource source, RationalFit fit, List<FlutterCrossing> crossings,
      List<String> warnings) {
    for (FlutterCrossing x : crossings) {
      if (x.kind() == CrossingKind.FLUTTER_ONSET) {
        fitErrorWarning(source, fit, x, "the " + x.branchName() + " onset",
            "the state-space onset may be off; compare with p-k, add lag roots or refit around it")
            .ifPresent(warnings::add);
      }
    }
  }

  /**
   * The warning for a crossing whose reduced frequency sees a fit error above {@link
   * #ONSET_FIT_ERROR_LIMIT}, shared by the open-loop and the closed-loop state-space models.
   *
   * @param source the fitted data
   * @param fit the fit
   * @param x the crossing
   * @param what the crossing in words, e.g. "the wing_bending_2 onset"
   * @param advice what the reader should make of it
   * @return the warning, or empty when the fit is close enough there
   */
  public static Optional<String> fitErrorWarning(AeroSource source, RationalFit fit, FlutterCrossing x, String what,
      String advice) {
    double k = 2 * Math.PI * x.frequencyHz() * fit.referenceSemichordM() / x.condition().speedTasMps();
    double error = fitErrorAt(source, fit, k);
    if (!(error > ONSET_FIT_ERROR_LIMIT)) {
      return Optional.empty();
    }
    return Optional.of(String.format(Locale.ROOT,
        "rational fit error %.3g %% at the reduced frequency k = %.4g of %s at %.2f m/s EAS exceeds %.3g %%: %s",
        100 * error, k, what, x.condition().speedEasMps(), 100 * ONSET_FIT_ERROR_LIMIT, advice));
  }

  private static boolean finite(DMatrixRMaj x) {
    for (double d : x.data) {
      if (!Double.isFinite(d)) {
        return false;
      }
    }
    return true;
  }

  @Override
  public FlutterSolution solve(AeroelasticSystem system, FlightPath path, AnalysisOptions options) {
    RationalFit f = fitFor(system, options);
    Tracker tr = new Tracker(system, f, path);
    List<String> warnings = tr.warnings;
    warnings.add(String.format(Locale.ROOT,
        "method: state-space eigenvalues with a rational fit (%s, %d lag roots, k fitted up to %.3g, "
            + "worst element error %.3g %%)", f.form(), f.lagCount(), f.maxReducedFrequency(),
        100 * f.error().worstRelativeError()));
    for (String w : f.warnings()) {
      warnings.add("rational fit: " + w);
    }
    int n = system.size();
    int np = path.gridPoints();
    Root[][] roots = new Root[np][];
    Spectrum[] spectra = new Spectrum[np];
    Match first = tr.startUp();
    roots[0] = first.roots();
    spectra[0] = first.spectrum();
    tr.inspect(0, first);
    Root[] lastGood = roots[0].clone();
    for (int p = 1; p < np; p++) {
      Match m = tr.step(p - 1, lastGood, p, 0);
      roots[p] = m.roots();
      spectra[p] = m.spectrum();
      tr.inspect(p, m);
      for (int j = 0; j < n; j++) {
        if (roots[p][j].converged()) {
          lastGood[j] = roots[p][j];
        } else {
          tr.counters.unconverged++;
          tr.counters.trouble(p);
          warnings.add(String.format(Locale.ROOT,
              "root of %s lost at grid point %d (%.2f m/s EAS); its curve has a gap there",
              tr.names.get(j), p, path.at(p).speedEasMps()));
        }
      }
    }
    List<BranchCurve> curves = new ArrayList<>();
    for (int j = 0; j < n; j++) {
      curves.add(BranchCurve.of(tr.names.get(j), path, roots, j, f.referenceSemichordM()));
    }
    List<FlutterCrossing> crossings = CrossingScan.scan(roots, options,
        (j, p, fa, level) -> tr.refine(j, p, roots[p], fa, level, options));
    tr.staticCrossings(spectra);
    tr.finishWarnings();
    flagFitErrorAtOnsets(system.aero(), f, crossings, warnings);
    return new FlutterSolution(FlutterMethodKind.STATE_SPACE, curves, crossings, tr.counters.toDiagnostics(),
        warnings);
  }

  /**
   * All eigenvalues of the state matrix at one condition, with the unit xi-partition of each
   * eigenvector (interleaved complex) and its lag-state ratio max_l ||r_l|| / ||xi||.
   */
  private record Spectrum(double[] re, double[] im, double[][] xi, double[] lagRatio, double radius) {
    int size() {
      return re.length;
    }

    /** Whether eigenvalue c is a tracking candidate (upper half plane or real). */
    boolean candidate(int c) {
      return im[c] >= -REAL_TOLERANCE * radius;
    }

    /**
     * (-1)^(number of negative real eigenvalues) times the distance of the nearest real eigenvalue
     * from zero: it has the sign of det A and changes sign only where a real root crosses zero,
     * continuously there (complex pairs do not change the sign of det A).
     */
    double staticFunction() {
      int negative = 0;
      double nearest = radius > 0 ? radius : 1.0;
      for (int c = 0; c < re.length; c++) {
        if (isReal(c)) {
          if (re[c] < 0) {
            negative++;
          }
          nearest = Math.min(nearest, Math.abs(re[c]));
        }
      }
      return (negative % 2 == 0 ? 1.0 : -1.0) * nearest;
    }

    /** @return the number of real eigenvalues with a positive real part (static instabilities) */
    int unstableReal() {
      int count = 0;
      for (int c = 0; c < re.length; c++) {
        if (isReal(c) && re[c] > 0) {
          count++;
        }
      }
      return count;
    }

    /** |Im| of eigenvalue c, zero for a real root. */
    double upperImag(int c) {
      return isReal(c) ? 0.0 : Math.abs(im[c]);
    }

    /** Whether eigenvalue c is real to the spectrum's tolerance. */
    boolean isReal(int c) {
      return Math.abs(im[c]) <= REAL_TOLERANCE * radius;
    }
  }

  /** Roots matched at one condition, the eigenvalue index of each, and whether the step was clean. */
  private record Match(Root[] roots, int[] assigned, Spectrum spectrum, double worstMac, boolean clean) {}

  /**
   * Whether a static crossing begins or ends a divergence, from the number of real roots with a
   * positive real part on either side (the sign of det A alone tells only that one root crossed,
   * not which way: it depends on how many real roots are negative, which the lag roots change).
   */
  static String direction(int unstableBefore, int unstableAfter) {
    if (unstableAfter > unstableBefore) {
      return "begins (the root becomes unstable)";
    }
    if (unstableAfter < unstableBefore) {
      return "ends (the root becomes stable again)";
    }
    return "begins or ends (as many real roots are unstable after the step as before: several cross zero "
        + "within it)";
  }

  /** The per-call workspace: system, fit, path, counters and warnings. Not thread-safe. */
  private static final class Tracker {
    final AeroelasticSystem sys;
    final RationalFit fit;
    final FlightPath path;
    final int n;
    /** The fit's lag states: n per lag root (Roger's form) or 1 (minimum state). */
    final LagRealisation lags;
    final List<String> names;
    final double[] omegaFloor;
    final double[] inVacuo;
    final SolveCounters counters = new SolveCounters();
    final List<String> warnings = new ArrayList<>();
    final ComplexEigen eigen = new ComplexEigen();
    double maxTrackedK;
    String unstableUntracked;
    boolean unstableUntrackedReal;
    final List<String> staticNotes = new ArrayList<>();
    /** Left grid points of the steps in which a tracked branch crosses at zero frequency. */
    final BitSet zeroFrequencyCrossings = new BitSet();

    Tracker(AeroelasticSystem sys, RationalFit fit, FlightPath path) {
      this.sys = sys;
      this.fit = fit;
      this.path = path;
      this.n = sys.size();
      this.lags = fit.lagRealisation();
      this.names = sys.coordinateNames();
      this.inVacuo = new double[n];
      double minPositive = Double.POSITIVE_INFINITY;
      for (int j = 0; j < n; j++) {
        inVacuo[j] = sys.inVacuoOmegaRadPerS(j);
        if (inVacuo[j] > 0) {
          minPositive = Math.min(minPositive, inVacuo[j]);
        }
      }
      if (minPositive == Double.POSITIVE_INFINITY) {
        minPositive = 1.0;
      }
      this.omegaFloor = new double[n];
      for (int j = 0; j < n; j++) {
        omegaFloor[j] = FREQUENCY_FLOOR_FRACTION * Math.max(inVacuo[j], minPositive);
      }
    }

    Spectrum spectrum(double t) {
      FlightCondition fc = path.at(t);
      DMatrixRMaj a = stateMatrix(sys, fit, lags, fc.densityKgPerM3(), fc.speedTasMps());
      int size = a.numRows;
      ZMatrixRMaj z = new ZMatrixRMaj(size, size);
      for (int i = 0; i < size * size; i++) {
        z.data[2 * i] = a.data[i];
      }
      ComplexEigenResult e = eigen.decompose(z);
      counters.fullEigenSolves++;
      counters.iterations += e.iterations();
      counters.maxResidual = Math.max(counters.maxResidual, e.relativeResidual());
      ZMatrixRMaj vec = e.vectors();
      double[][] xi = new double[size][];
      double[] lag = new double[size];
      double radius = 0;
      for (int c = 0; c < size; c++) {
        radius = Math.max(radius, Math.hypot(e.realAt(c), e.imagAt(c)));
        double[] v = new double[2 * n];
        double xn = 0;
        for (int i = 0; i < n; i++) {
          v[2 * i] = vec.getReal(i, c);
          v[2 * i + 1] = vec.getImag(i, c);
          xn += v[2 * i] * v[2 * i] + v[2 * i + 1] * v[2 * i + 1];
        }
        double worstLag = 0;
        for (int l = 0; l < lags.lagCount(); l++) {
          double rn = 0;
          for (int i = 0; i < lags.states(l); i++) {
            int row = 2 * n + lags.firstState(l) + i;
            rn += vec.getReal(row, c) * vec.getReal(row, c) + vec.getImag(row, c) * vec.getImag(row, c);
          }
          worstLag = Math.max(worstLag, rn);
        }
        lag[c] = xn > 0 ? Math.sqrt(worstLag / xn) : Double.POSITIVE_INFINITY;
        FlutterWorkspace.normalise(v);
        xi[c] = v;
      }
      return new Spectrum(e.real(), e.imag(), xi, lag, radius);
    }

    private Root root(Spectrum sp, int c) {
      return new Root(sp.re()[c], sp.upperImag(c), sp.xi()[c], 0, Double.NaN, true);
    }

    private static Root lost() {
      return new Root(Double.NaN, Double.NaN, new double[0], 0, Double.NaN, false);
    }

    /** First point: largest participation of each coordinate, discounted by distance from i omega_j. */
    Match startUp() {
      Spectrum sp;
      try {
        sp = spectrum(0);
      } catch (ArithmeticException e) {
        return failed(e);
      }
      List<double[]> pairs = new ArrayList<>();
      for (int j = 0; j < n; j++) {
        for (int c = 0; c < sp.size(); c++) {
          if (!sp.candidate(c) || sp.lagRatio()[c] > LAG_DOMINANCE) {
            continue;
          }
          double[] v = sp.xi()[c];
          double share = v[2 * j] * v[2 * j] + v[2 * j + 1] * v[2 * j + 1];
          double distance = Math.hypot(sp.re()[c], sp.upperImag(c) - inVacuo[j])
              / Math.max(inVacuo[j], omegaFloor[j]);
          pairs.add(new double[] {-share / (1 + distance), j, c});
        }
      }
      boolean[] taken = new boolean[sp.size()];
      int[] assigned = assignCheapestFirst(pairs, n, taken);
      Root[] roots = new Root[n];
      for (int j = 0; j < n; j++) {
        if (assigned[j] < 0) {
          roots[j] = lost();
        } else {
          roots[j] = root(sp, assigned[j]);
          counters.rootSolves++;
        }
      }
      return new Match(roots, assigned, sp, 1.0, true);
    }

    /**
     * Sorts candidate (cost, branch, root) triples and assigns each branch its cheapest free root.
     *
     * @param pairs candidates {cost, branch, root index}. Modified (sorted).
     * @param n number of branches
     * @param taken roots already taken. Modified.
     * @return root index per branch, -1 where none was left
     */
    private static int[] assignCheapestFirst(List<double[]> pairs, int n, boolean[] taken) {
      pairs.sort(Comparator.comparingDouble(x -> x[0]));
      int[] assigned = new int[n];
      Arrays.fill(assigned, -1);
      for (double[] pr : pairs) {
        int j = (int) pr[1];
        int c = (int) pr[2];
        if (assigned[j] < 0 && !taken[c]) {
          assigned[j] = c;
          taken[c] = true;
        }
      }
      return assigned;
    }

    private Match failed(ArithmeticException e) {
      Root[] roots = new Root[n];
      Arrays.fill(roots, lost());
      int[] assigned = new int[n];
      Arrays.fill(assigned, -1);
      warnings.add("state-space eigen-solution failed: " + e.getMessage());
      return new Match(roots, assigned, null, 0.0, false);
    }

    /** Matches the roots at t1 to the branches at t0, halving the step while tracking is unclean. */
    Match step(double t0, Root[] prev, double t1, int depth) {
      Spectrum sp;
      try {
        sp = spectrum(t1);
      } catch (ArithmeticException e) {
        return failed(e);
      }
      Match m = match(prev, sp);
      if (m.clean() || depth >= MAX_HALVINGS) {
        for (Root r : m.roots()) {
          if (r.converged()) {
            counters.rootSolves++;
          }
        }
        counters.minMac = Math.min(counters.minMac, m.worstMac());
        return m;
      }
      counters.stepHalvings++;
      double mid = 0.5 * (t0 + t1);
      Match half = step(t0, prev, mid, depth + 1);
      Root[] from = prev.clone();
      for (int j = 0; j < n; j++) {
        if (half.roots()[j].converged()) {
          from[j] = half.roots()[j];
        }
      }
      return step(mid, from, t1, depth + 1);
    }

    private double scale(Root a, double sr, double si, int j) {
      return Math.max(Math.max(Math.hypot(a.sr(), a.si()), Math.hypot(sr, si)), omegaFloor[j]);
    }

    /** Greedy matching by proximity and MAC, then the split rule on the real axis. */
    private Match match(Root[] prev, Spectrum sp) {
      List<double[]> pairs = new ArrayList<>();
      for (int j = 0; j < n; j++) {
        if (!prev[j].converged()) {
          continue;
        }
        for (int c = 0; c < sp.size(); c++) {
          if (!sp.candidate(c)) {
            continue;
          }
          double sr = sp.re()[c];
          double si = sp.upperImag(c);
          double d = Math.hypot(sr - prev[j].sr(), si - prev[j].si()) / scale(prev[j], sr, si, j);
          double mac = FlutterWorkspace.mac(prev[j].v(), sp.xi()[c]);
          pairs.add(new double[] {d + (1 - mac), j, c});
        }
      }
      boolean[] taken = new boolean[sp.size()];
      int[] assigned = assignCheapestFirst(pairs, n, taken);
      // split rule: a pair that has just reached the real axis is followed along its larger root
      for (int j = 0; j < n; j++) {
        int c = assigned[j];
        if (c < 0 || !(prev[j].si() > 0) || sp.upperImag(c) != 0) {
          continue;
        }
        int best = c;
        for (int c2 = 0; c2 < sp.size(); c2++) {
          if (!taken[c2] && sp.candidate(c2) && sp.upperImag(c2) == 0 && sp.re()[c2] > sp.re()[best]
              && FlutterWorkspace.mac(prev[j].v(), sp.xi()[c2]) >= MIN_STEP_MAC) {
            best = c2;
          }
        }
        if (best != c) {
          taken[c] = false;
          taken[best] = true;
          assigned[j] = best;
        }
      }
      Root[] roots = new Root[n];
      boolean clean = true;
      double worstMac = 1.0;
      for (int j = 0; j < n; j++) {
        int c = assigned[j];
        if (c < 0) {
          roots[j] = prev[j].converged() ? lost() : prev[j];
          clean &= !prev[j].converged();
          continue;
        }
        roots[j] = root(sp, c);
        double mac = FlutterWorkspace.mac(prev[j].v(), roots[j].v());
        worstMac = Math.min(worstMac, mac);
        double jump = Math.hypot(roots[j].sr() - prev[j].sr(), roots[j].si() - prev[j].si());
        clean &= mac >= MIN_STEP_MAC
            && jump <= MAX_RELATIVE_STEP * scale(prev[j], roots[j].sr(), roots[j].si(), j);
      }
      return new Match(roots, assigned, sp, worstMac, clean);
    }

    /** Notes the reduced frequencies reached and any unstable root that is not tracked. */
    void inspect(int p, Match m) {
      Spectrum sp = m.spectrum();
      if (sp == null) {
        return;
      }
      FlightCondition fc = path.at(p);
      for (Root r : m.roots()) {
        if (r.converged() && fc.speedTasMps() > 0) {
          maxTrackedK = Math.max(maxTrackedK, r.si() * fit.referenceSemichordM() / fc.speedTasMps());
        }
      }
      boolean[] tracked = new boolean[sp.size()];
      for (int c : m.assigned()) {
        if (c >= 0) {
          tracked[c] = true;
        }
      }
      for (int c = 0; c < sp.size(); c++) {
        if (tracked[c] || !sp.candidate(c) || !(sp.re()[c] > REAL_TOLERANCE * sp.radius())) {
          continue;
        }
        if (sp.upperImag(c) != 0) {
          counters.trouble(p); // an oscillatory root no branch follows is unstable: onsets in doubt
        }
        if (unstableUntracked == null) {
          unstableUntracked = String.format(Locale.ROOT, "%.2f m/s EAS (s = %.4g %+.4g i 1/s)",
              fc.speedEasMps(), sp.re()[c], sp.upperImag(c));
          unstableUntrackedReal = sp.upperImag(c) == 0;
        }
      }
    }

    /**
     * Real roots crossing zero between grid points that no branch accounts for (static divergence
     * of the state-space model): bracketed by a sign change of det A, refined by Brent's method on
     * the path parameter, reported as warnings. A step with a crossing of a tracked branch at zero
     * frequency ({@link #zeroFrequencyCrossings}, filled by {@link #refine}) is skipped: that
     * crossing already reports the real root crossing zero, whether the branch was real at both
     * grid points or a pair split into real roots within the step.
     */
    void staticCrossings(Spectrum[] spectra) {
      for (int p = 0; p + 1 < spectra.length; p++) {
        if (spectra[p] == null || spectra[p + 1] == null || zeroFrequencyCrossings.get(p)) {
          continue;
        }
        double fa = spectra[p].staticFunction();
        double fb = spectra[p + 1].staticFunction();
        if ((fa > 0) == (fb > 0)) {
          continue;
        }
        int at = p;
        double t;
        try {
          t = new BrentSolver(1e-14, 1e-10).solve(BRENT_MAX_EVALUATIONS, tt -> {
            if (tt <= at) {
              return fa;
            }
            if (tt >= at + 1) {
              return fb;
            }
            try {
              return spectrum(tt).staticFunction();
            } catch (ArithmeticException e) {
              return fa;
            }
          }, p, p + 1);
        } catch (TooManyEvaluationsException e) {
          t = p + 0.5;
        }
        FlightCondition fc = path.at(t);
        staticNotes.add(String.format(Locale.ROOT,
            "a real root of the state-space model crosses zero at %.2f m/s EAS (%.2f m/s TAS, q = %.6g Pa): "
                + "static divergence %s", fc.speedEasMps(), fc.speedTasMps(), fc.dynamicPressurePa(),
            direction(spectra[p].unstableReal(), spectra[p + 1].unstableReal())));
      }
    }

    void finishWarnings() {
      warnings.addAll(staticNotes);
      if (unstableUntracked != null && (!unstableUntrackedReal || staticNotes.isEmpty())) {
        warnings.add("a root not followed by any branch is unstable from " + unstableUntracked
            + "; check the eigenvalues at that speed");
      }
      if (maxTrackedK > fit.maxReducedFrequency()) {
        warnings.add(String.format(Locale.ROOT,
            "tracked roots reach reduced frequency %.4g, above the fitted range (k <= %.4g): the rational "
                + "fit extrapolates there", maxTrackedK, fit.maxReducedFrequency()));
      }
    }

    FlutterCrossing refine(int branch, int p, Root[] left, double fLeft, double level, AnalysisOptions options) {
      double dv = Math.abs(path.at(p + 1).speedEasMps() - path.at(p).speedEasMps());
      double absAccuracy = Math.min(0.25, options.onsetSpeedToleranceMps() / Math.max(dv, 1e-9));
      BrentSolver solver = new BrentSolver(1e-14, absAccuracy);
      double t;
      int evaluations;
      try {
        t = solver.solve(BRENT_MAX_EVALUATIONS, tt -> {
          if (tt <= p) {
            return fLeft;
          }
          Root r = step(p, left, tt, 0).roots()[branch];
          return r.converged() ? r.crossingFunction(level) : fLeft;
        }, p, p + 1);
        evaluations = solver.getEvaluations();
      } catch (TooManyEvaluationsException e) {
        t = p + 0.5;
        evaluations = BRENT_MAX_EVALUATIONS;
      }
      Root at = step(p, left, t, 0).roots()[branch];
      boolean rising = fLeft < 0;
      CrossingKind kind = CrossingKind.of(level, rising);
      FlutterCrossing x = new FlutterCrossing(branch, names.get(branch), kind, t, path.at(t),
          at.converged() ? at.frequencyHz() : Double.NaN, level, evaluations, absAccuracy);
      if (x.frequencyHz() == 0) {
        zeroFrequencyCrossings.set(p); // a real root: its crossing function 2 Re(s) is zero there
      }
      return x;
    }
  }
}
