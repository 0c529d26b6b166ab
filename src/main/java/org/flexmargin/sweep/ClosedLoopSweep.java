package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RationalFits;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.StateSpaceMethod;
import org.flexmargin.loop.CriticalPointSolver;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.NearestEigenvalue;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.numerics.GreedyAssignment;

/**
 * Closed-loop (aeroservoelastic) eigenvalues along the sweep, and the speeds at which a
 * closed-loop root crosses g = 0 or the damping limit, refined as roots.
 *
 * <p>The elastic aerodynamics are approximated once per configuration as the case's rational-fit
 * settings ask ({@link RationalFits}; by default Roger's form with four lag roots over the
 * reduced-frequency range the sweep needs; the fit error is reported, and a warning names every
 * g = 0 onset where it exceeds 1 % at the onset's reduced frequency); delays
 * are Pade approximations of the loop's order. At each grid point all closed-loop eigenvalues are
 * computed; roots are followed from point to point by nearest-neighbour matching, and a sign
 * change of 2 Re(s) - g_level |Im(s)| on a followed root is refined by Brent's method on the path
 * parameter, taking at intermediate conditions the root nearest the linear interpolation of the
 * bracket: that one root is tracked on its own by shifted inverse iteration
 * ({@link NearestEigenvalue}: one complex LU instead of a full eigen-solve), with a full
 * eigen-solve only where another root is about as near and the iteration does not settle. Roots are labelled with the open-loop root (p-k structural roots,
 * rigid short period) nearest them, else "rigid body + loop" below half the first elastic
 * frequency and "control loop" above.
 *
 * <p>Every g = 0 crossing is then refined on the exact frequency-domain loop (exact
 * aerodynamics, delays and hold): the speed and frequency where the broken loop L(j w) passes
 * through -1, by Newton's method ({@link CriticalPointSolver}) started at the rational onset. The
 * exact onset replaces the rational one in {@link ClosedLoopResult#crossings()}; both and their
 * difference are kept in {@link ClosedLoopResult#refinements()}. Stateless and thread-safe.
 */
public final class ClosedLoopSweep {
  /** Lag roots of the rational approximation with the default settings. */
  public static final int LAG_COUNT = 4;

  private static final int BRENT_MAX_EVALUATIONS = 60;
  private static final double LABEL_DISTANCE = 0.3;
  /** Grid intervals on each side of a rational onset's bracket searched for the exact onset. */
  private static final int EXACT_SEARCH_INTERVALS = 2;
  /** Newton tolerance on the path parameter of an exact onset (about 1e-7 m/s on the demo grid). */
  private static final double EXACT_PARAMETER_TOLERANCE = 1e-7;
  private static final int EXACT_MAX_ITERATIONS = 40;
  /** Largest relative frequency difference between a rational onset and its exact refinement. */
  private static final double EXACT_FREQUENCY_WINDOW = 0.2;

  /**
   * @param model configuration model
   * @param configuration configuration (rigid body)
   * @param loop loop
   * @param path sweep path
   * @param openLoop open-loop p-k solution on the same path (labels)
   * @param options damping limit and tolerances
   * @return closed-loop roots and crossings
   */
  public ClosedLoopResult analyse(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      PlannedPath path, FlutterSolution openLoop, AnalysisOptions options) {
    double fmax = model.modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).max().orElse(1);
    double vmin = Double.MAX_VALUE;
    for (int p = 0; p < path.gridPoints(); p++) {
      vmin = Math.min(vmin, path.at(p).speedTasMps());
    }
    double b = model.system().aero().referenceSemichordM();
    double kMax = Math.min(model.system().aero().maxReducedFrequency(),
        Math.max(0.5, 1.5 * 2 * Math.PI * fmax * b / vmin));
    RationalFit fit = RationalFits.fit(model.system().aero(), options.rationalFit(), kMax);
    RationalAerodynamics rational = RationalAerodynamics.of(fit);
    List<String> warnings = new ArrayList<>(fit.warnings());
    int np = path.gridPoints();
    double[][] re = new double[np][];
    double[][] im = new double[np][];
    double[][] shortPeriod = new double[np][];
    int[] solves = {np};
    List<Eigenvalues> eigen = SweepParallel.map(np, p -> {
      ServoLoop servo = ServoMargins.loopAt(model, configuration, loop, path.at(p));
      shortPeriod[p] = servo.plant().shortPeriodRoots();
      return servo.closedLoop(rational).eigenvalues();
    });
    for (int p = 0; p < np; p++) {
      re[p] = eigen.get(p).real();
      im[p] = eigen.get(p).imag();
    }
    int n = re[0].length;
    int[][] order = branchOrder(re, im);
    List<ClosedLoopPoint> points = points(path, openLoop, re, im, shortPeriod);
    List<FlutterCrossing> crossings = new ArrayList<>();
    double[] levels = options.dampingLimitG() > 0 ? new double[] {0.0, -options.dampingLimitG()} : new double[] {0.0};
    for (int j = 0; j < n; j++) {
      for (int p = 0; p + 1 < np; p++) {
        int ia = order[p][j];
        int ib = order[p + 1][j];
        if (im[p][ia] < 0) {
          continue;
        }
        for (double level : levels) {
          double fa = crossing(re[p][ia], im[p][ia], level);
          double fb = crossing(re[p + 1][ib], im[p + 1][ib], level);
          if ((fa < 0 && fb >= 0) || (fa > 0 && fb <= 0)) {
            String name = label(re[p][ia], im[p][ia], openLoop, p, shortPeriod[p]);
            crossings.add(refine(model, configuration, loop, path, rational, p, re[p][ia], im[p][ia],
                re[p + 1][ib], im[p + 1][ib], fa < 0, level, j, name, options, solves));
          }
        }
      }
    }
    crossings.sort(Comparator.comparingDouble(FlutterCrossing::pathParameter));
    List<OnsetRefinement> refinements = new ArrayList<>();
    List<FlutterCrossing> onsets = new ArrayList<>();
    for (FlutterCrossing x : crossings) {
      if (x.thresholdG() != 0.0) {
        onsets.add(x);
        continue;
      }
      flagFitError(model, fit, x, warnings);
      OnsetRefinement r = onExactLoop(model, configuration, loop, path, x);
      refinements.add(r);
      onsets.add(r.onset());
      if (!r.confirmed()) {
        warnings.add(String.format(Locale.ROOT, "closed-loop %s of %s at %.2f m/s EAS (rational model) not "
            + "confirmed on the exact loop: %s", x.kind().name().toLowerCase(Locale.ROOT).replace('_', ' '),
            x.branchName(), x.condition().speedEasMps(), r.remark()));
      }
    }
    onsets.sort(Comparator.comparingDouble(FlutterCrossing::pathParameter));
    String fitText = RationalFits.summary(fit);
    ServoLoop first = ServoMargins.loopAt(model, configuration, loop, path.at(0));
    List<String> assumptions = new ArrayList<>(first.plant().assumptions());
    assumptions.add("closed-loop eigenvalues use the rational approximation of the elastic forces, the Pade "
        + "approximation (order " + loop.padeOrder() + ") of the delay and the rational zero-order hold of the "
        + "same order (keeping its sinc droop); each g = 0 onset is then refined on the exact frequency-domain "
        + "loop (where L(jw) passes through -1) and reported beside the rational one");
    return new ClosedLoopResult(points, onsets, fitText, solves[0], warnings, assumptions, refinements);
  }

  /**
   * @return order[p][j]: the index at point p of the root on branch j, continued from the first
   *     point by nearest-neighbour matching
   */
  private static int[][] branchOrder(double[][] re, double[][] im) {
    int np = re.length;
    int n = re[0].length;
    int[][] order = new int[np][n];
    for (int j = 0; j < n; j++) {
      order[0][j] = j;
    }
    for (int p = 1; p < np; p++) {
      order[p] = match(re[p - 1], im[p - 1], order[p - 1], re[p], im[p]);
    }
    return order;
  }

  /** @return the roots of each point (upper half-plane and real), labelled, by frequency then real part */
  private static List<ClosedLoopPoint> points(PlannedPath path, FlutterSolution openLoop, double[][] re,
      double[][] im, double[][] shortPeriod) {
    int n = re[0].length;
    List<ClosedLoopPoint> points = new ArrayList<>();
    for (int p = 0; p < re.length; p++) {
      FlightCondition fc = path.at(p);
      double[] sp = shortPeriod[p];
      List<ClosedLoopRoot> roots = new ArrayList<>();
      for (int i = 0; i < n; i++) {
        if (im[p][i] >= 0) {
          roots.add(new ClosedLoopRoot(re[p][i], im[p][i], label(re[p][i], im[p][i], openLoop, p, sp)));
        }
      }
      // by frequency, then real part: the listing does not depend on the order the solver found
      // the roots in (real roots share the frequency 0)
      roots.sort(Comparator.comparingDouble(ClosedLoopRoot::imagRadPerS).thenComparingDouble(ClosedLoopRoot::realPerS));
      points.add(new ClosedLoopPoint(p, fc, roots, n));
    }
    return points;
  }

  /** Adds a warning when the fit's error at the reduced frequency of a rational g = 0 crossing is large. */
  private static void flagFitError(ConfigurationModel model, RationalFit fit, FlutterCrossing x, List<String> warnings) {
    if (!(x.frequencyHz() > 0)) {
      return;
    }
    StateSpaceMethod.fitErrorWarning(model.system().aero(), fit, x,
        "the closed-loop " + x.kind().name().toLowerCase(Locale.ROOT).replace('_', ' ') + " of " + x.branchName(),
        "the rational onset may be off (the exact-loop refinement is not); add lag roots or refit around it")
        .ifPresent(warnings::add);
  }

  /**
   * Refines a g = 0 crossing of the rational model on the exact loop: Newton on the path parameter
   * and the frequency for 1 + L(j w) = 0, started at the rational onset and kept within two grid
   * intervals of it. Not confirmed (with the reason) for a real root, when Newton does not
   * converge, when the crossing it finds is more than 20 % away in frequency, or when the
   * aircraft's own response is singular there (an open-loop root on the axis that the loop does
   * not move, such as a mode the elevator does not drive).
   */
  static OnsetRefinement onExactLoop(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      PlannedPath path, FlutterCrossing x) {
    double w0 = 2 * Math.PI * x.frequencyHz();
    if (x.frequencyHz() < ServoMargins.MIN_FREQUENCY_HZ) {
      return new OnsetRefinement(x, Optional.empty(), Double.NaN, 0,
          "a real closed-loop root (no oscillation): the frequency-domain loop has no crossing of -1 to refine");
    }
    double t0 = x.pathParameter();
    int base = (int) Math.floor(t0);
    double lo = Math.max(0, base - EXACT_SEARCH_INTERVALS);
    double hi = Math.min(path.gridPoints() - 1, base + 1 + EXACT_SEARCH_INTERVALS);
    CriticalPointSolver.Solution s;
    try {
      s = CriticalPointSolver.solve(
          t -> ServoMargins.loopAt(model, configuration, loop, path.at(t)).brokenLoop(), t0, w0, lo, hi,
          EXACT_PARAMETER_TOLERANCE, EXACT_MAX_ITERATIONS);
    } catch (ArithmeticException e) {
      // the aircraft's own response is singular there: an open-loop root on the axis that the loop
      // does not move (a mode the elevator does not drive), so the loop has no crossing of -1 to find
      return new OnsetRefinement(x, Optional.empty(), Double.NaN, 0, "the exact loop cannot be evaluated at the "
          + "onset (" + e.getMessage() + "): an open-loop root the loop does not move");
    }
    if (!s.converged()) {
      return new OnsetRefinement(x, Optional.empty(), s.residual(), s.iterations(), s.remark());
    }
    if (Math.abs(s.omegaRadPerS() - w0) > EXACT_FREQUENCY_WINDOW * w0) {
      return new OnsetRefinement(x, Optional.empty(), s.residual(), s.iterations(), String.format(Locale.ROOT,
          "the nearest crossing of -1 by the exact loop is at %.3f Hz, not near the root's %.3f Hz",
          s.omegaRadPerS() / (2 * Math.PI), x.frequencyHz()));
    }
    FlutterCrossing exact = new FlutterCrossing(x.branch(), x.branchName(), x.kind(), s.parameter(),
        path.at(s.parameter()), s.omegaRadPerS() / (2 * Math.PI), 0.0, x.evaluations(), EXACT_PARAMETER_TOLERANCE);
    return new OnsetRefinement(x, Optional.of(exact), s.residual(), s.iterations(), "");
  }

  /**
   * The closed-loop root at fc nearest the linear interpolation of the bracket at fraction w, into
   * out: tracked on its own by shifted inverse iteration ({@link NearestEigenvalue}), or, where
   * that does not converge (another root about as near), picked from a full eigen-solve (counted
   * in solves). Both give the same root: the one nearest the interpolated point.
   */
  static void rootNear(ConfigurationModel model, Configuration configuration, LoopSpec loop, FlightCondition fc,
      RationalAerodynamics rational, double reA, double imA, double reB, double imB, double w, double[] out,
      int[] solves) {
    double pr = reA + w * (reB - reA);
    double pi = imA + w * (imB - imA);
    StateSpace closed = ServoMargins.loopAt(model, configuration, loop, fc).closedLoop(rational);
    NearestEigenvalue.Estimate e = NearestEigenvalue.near(closed.a(), pr, pi);
    if (e.converged()) {
      out[0] = e.real();
      out[1] = e.imag();
      return;
    }
    solves[0]++;
    nearest(closed.eigenvalues(), pr, pi, out);
  }

  private static double crossing(double re, double im, double level) {
    return 2 * re - level * Math.abs(im);
  }

  /** Greedy nearest-neighbour assignment of the new eigenvalues to the branches. */
  private static int[] match(double[] reA, double[] imA, int[] orderA, double[] reB, double[] imB) {
    int n = orderA.length;
    double[][] d = new double[n][n];
    for (int j = 0; j < n; j++) {
      int a = orderA[j];
      double scale = 1 + Math.hypot(reA[a], imA[a]);
      for (int c = 0; c < n; c++) {
        d[j][c] = Math.hypot(reB[c] - reA[a], imB[c] - imA[a]) / scale;
      }
    }
    return GreedyAssignment.minimumCost(d);
  }

  /** Nearest open-loop root: p-k structural root at grid point p, or the rigid short period. */
  static String label(double re, double im, FlutterSolution openLoop, int p, double[] shortPeriod) {
    double lowestStructural = Double.MAX_VALUE;
    for (BranchCurve b : openLoop.branches()) {
      if (p < b.size() && b.converged()[p]) {
        lowestStructural = Math.min(lowestStructural, 2 * Math.PI * b.frequencyHz()[p]);
      }
    }
    // no open-loop root near: a rigid-body root moved by the loop if well below the first elastic
    // mode, else a root of the loop's own dynamics (actuator, filters, aerodynamic lags)
    String best = Math.hypot(re, im) < 0.5 * lowestStructural ? "rigid body + loop" : "control loop";
    double bestDistance = Double.MAX_VALUE;
    for (BranchCurve b : openLoop.branches()) {
      if (p >= b.size() || !b.converged()[p]) {
        continue;
      }
      double w = 2 * Math.PI * b.frequencyHz()[p];
      double z = Math.max(-0.99, Math.min(0.99, b.dampingRatio()[p]));
      double sr = -z * w;
      double si = w * Math.sqrt(1 - z * z);
      double dist = Math.hypot(re - sr, im - si) / Math.max(Math.hypot(sr, si), 1e-9);
      if (dist < LABEL_DISTANCE && dist < bestDistance) {
        bestDistance = dist;
        best = b.name();
      }
    }
    for (int k = 0; k < 2; k++) {
      double sr = shortPeriod[2 * k];
      double si = Math.abs(shortPeriod[2 * k + 1]);
      double dist = Math.hypot(re - sr, im - si) / Math.max(Math.hypot(sr, si), 1e-9);
      if (dist < LABEL_DISTANCE && dist < bestDistance) {
        bestDistance = dist;
        best = "short period";
      }
    }
    return best;
  }

  private static FlutterCrossing refine(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      PlannedPath path, RationalAerodynamics rational, int p, double reA, double imA, double reB, double imB,
      boolean rising, double level, int branch, String name, AnalysisOptions options, int[] solves) {
    double dv = Math.abs(path.at(p + 1).speedEasMps() - path.at(p).speedEasMps());
    double abs = Math.min(0.25, options.onsetSpeedToleranceMps() / Math.max(dv, 1e-9));
    double[] at = new double[2];
    // every root Brent's method asks for, by path parameter: its answer is one of them, so the
    // root there is taken from here rather than solved for again
    Map<Double, double[]> roots = new HashMap<>();
    BrentSolver solver = new BrentSolver(1e-14, abs);
    double t;
    int evaluations;
    try {
      t = solver.solve(BRENT_MAX_EVALUATIONS, tt -> {
        rootNear(model, configuration, loop, path.at(tt), rational, reA, imA, reB, imB, tt - p, at, solves);
        roots.put(tt, at.clone());
        return crossing(at[0], at[1], level);
      }, p, p + 1);
      evaluations = solver.getEvaluations();
    } catch (TooManyEvaluationsException e) {
      t = p + 0.5;
      evaluations = BRENT_MAX_EVALUATIONS;
    }
    // Brent's method answers with a point it evaluated (the bracket's midpoint, an end, or its
    // last iterate; the midpoint, its first evaluation, when it runs out of evaluations)
    double[] root = Objects.requireNonNull(roots.get(t), "the root at Brent's answer");
    CrossingKind kind = CrossingKind.of(level, rising);
    return new FlutterCrossing(branch, name, kind, t, path.at(t), Math.abs(root[1]) / (2 * Math.PI), level,
        evaluations, abs);
  }

  /** The eigenvalue nearest (pr, pi). */
  static void nearest(Eigenvalues e, double pr, double pi, double[] out) {
    double best = Double.MAX_VALUE;
    for (int i = 0; i < e.real().length; i++) {
      double d = Math.hypot(e.real()[i] - pr, e.imag()[i] - pi);
      if (d < best) {
        best = d;
        out[0] = e.real()[i];
        out[1] = e.imag()[i];
      }
    }
  }
}
