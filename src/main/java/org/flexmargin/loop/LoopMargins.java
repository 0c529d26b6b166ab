package org.flexmargin.loop;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleBinaryOperator;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

/**
 * Gain, phase, delay and symmetric disk margins of a SISO broken loop L(j w) with the
 * negative-feedback convention (closed loop 1/(1 + L)).
 *
 * <p>Method:
 *
 * <ol>
 *   <li>L is sampled on a logarithmic grid over [w_min, w_max], plus points around the damped
 *       frequency of every lightly damped pole supplied by the caller (seeds) or known to L
 *       itself ({@link SisoFrequencyFunction#knownPoles()}; for a {@link LinearBlock} the
 *       eigenvalues of its state space), spaced by the pole's |real part|. Where L contains a
 *       pure delay tau ({@link SisoFrequencyFunction#pureDelayS()}) points are added until the
 *       delay turns the phase by at most {@value #MAX_DELAY_TURN_RAD} rad (below pi) per interval.
 *   <li>Every interval whose phase changes by more than {@link MarginOptions#maxPhaseStepDeg()}
 *       or whose gain changes by more than {@link MarginOptions#maxGainStepDb()} is bisected (in
 *       log w) until both hold or the depth/point cap is reached. A narrow resonance falling
 *       between grid points swings the phase by about 180 deg and is thereby resolved; the phase
 *       is unwrapped on the refined grid. The step test and the unwrapping use the phase of
 *       L e^{j w tau}, the delay's exact -w tau being added back, so no turn of a long delay is
 *       lost (a wrapped phase difference cannot tell a turn of 2 pi from none).
 *   <li>Gain crossovers (ln|L| = 0) and phase crossovers (unwrapped phase = -180 deg + k 360
 *       deg) are bracketed by sign changes between grid points and solved by Brent's method
 *       (Brent, <i>Algorithms for Minimization without Derivatives</i>, 1973; Commons Math).
 *   <li>Phase margin 180 deg + phase, wrapped into (-180, 180]; gain margin -20 log10|L| at each
 *       phase crossover (positive = increase, negative = reduction margin); delay margin per
 *       crossover (PM in rad, wrapped into [0, 2 pi))/w_c, minimum over crossovers.
 *   <li>Symmetric disk margin alpha = 1/max|(1 - L)/(2(1 + L))| (Seiler, Packard &amp;
 *       Gahinet, IEEE Control Systems Magazine 40(5), 2020), and the peak of |L|, each maximised
 *       by Brent's method around the largest sampled local maxima.
 * </ol>
 *
 * <p>Instances are immutable; the frequency function is called from the calling thread only.
 */
public final class LoopMargins {
  /** Local maxima refined for the disk margin and the gain peak. */
  private static final int MAXIMA_REFINED = 8;

  /** Largest phase turn w tau of the loop's pure delay over one initial grid interval, rad. */
  static final double MAX_DELAY_TURN_RAD = 1.5;

  private final MarginOptions options;

  /** Uses {@link MarginOptions#defaults()}. */
  public LoopMargins() {
    this(MarginOptions.defaults());
  }

  /** @param options grid settings */
  public LoopMargins(MarginOptions options) {
    StateSpace.require(options != null, "margin_options", "options", "null");
    this.options = options;
  }

  /**
   * Margins of a block loop; its state-space eigenvalues seed the grid and its unity
   * negative-feedback closure gives {@link ClosedLoopStability} (delays enter that check through
   * their Padé approximation, the margins through the exact response).
   *
   * @param loop broken-loop transfer function L
   * @param omegaMinRadPerS low end, rad/s (&gt; 0)
   * @param omegaMaxRadPerS high end, rad/s (&gt; low end)
   * @return the margins
   */
  public LoopMarginResult analyse(LinearBlock loop, double omegaMinRadPerS,
      double omegaMaxRadPerS) {
    StateSpace ss = loop.stateSpace();
    Eigenvalues poles = ss.eigenvalues();
    Eigenvalues closed = ss.feedback(StateSpace.staticGain(1.0), FeedbackSign.NEGATIVE)
        .eigenvalues();
    ClosedLoopStability stability = closed.maxRealPart() < 0 ? ClosedLoopStability.STABLE
        : ClosedLoopStability.UNSTABLE;
    return analyse(loop, omegaMinRadPerS, omegaMaxRadPerS, poles, stability);
  }

  /**
   * Margins of a frequency function (e.g. L computed directly in the frequency domain).
   *
   * @param loop broken-loop frequency function L(j w)
   * @param omegaMinRadPerS low end, rad/s (&gt; 0)
   * @param omegaMaxRadPerS high end, rad/s (&gt; low end)
   * @param seedPoles poles of L known to the caller (e.g. structural modes), used only to place
   *     grid points; {@link Eigenvalues#none()} if unknown
   * @return the margins, with {@link ClosedLoopStability#NOT_CHECKED}
   */
  public LoopMarginResult analyse(SisoFrequencyFunction loop, double omegaMinRadPerS,
      double omegaMaxRadPerS, Eigenvalues seedPoles) {
    StateSpace.require(loop != null, "loop", "a frequency function", "null");
    StateSpace.require(seedPoles != null, "seed_poles", "eigenvalues (possibly none)", "null");
    return analyse(loop, omegaMinRadPerS, omegaMaxRadPerS, seedPoles.concat(loop.knownPoles()),
        ClosedLoopStability.NOT_CHECKED);
  }

  private LoopMarginResult analyse(SisoFrequencyFunction loop, double wMin, double wMax,
      Eigenvalues seeds, ClosedLoopStability stability) {
    StateSpace.require(loop != null, "loop", "a frequency function", "null");
    StateSpace.require(Double.isFinite(wMin) && wMin > 0, "omega_min_rad_per_s",
        "a finite value > 0", String.valueOf(wMin));
    StateSpace.require(Double.isFinite(wMax) && wMax > wMin, "omega_max_rad_per_s",
        "a finite value > omega_min " + wMin, String.valueOf(wMax));
    StateSpace.require(seeds != null, "seed_poles", "eigenvalues (possibly none)", "null");
    double tau = loop.pureDelayS();
    StateSpace.require(Double.isFinite(tau) && tau >= 0, "loop.pure_delay_s", "a finite value >= 0",
        String.valueOf(tau));
    Counted f = new Counted(loop, tau);
    double x0 = Math.log(wMin);
    double x1 = Math.log(wMax);
    int initial = Math.max(2, (int) Math.ceil((x1 - x0) / Math.log(10) * options.pointsPerDecade())
        + 1);
    Grid g = seededGrid(f, x0, x1, initial, seedPoints(seeds, wMin, wMax), tau);
    int afterSeeds = g.size;
    double minWidth = (x1 - x0) / (initial - 1) / Math.pow(2, options.maxRefinementDepth());
    double maxPhase = Math.toRadians(options.maxPhaseStepDeg());
    double maxLogMag = options.maxGainStepDb() * Math.log(10) / 20;
    g = bisected(g, f, maxPhase, maxLogMag, tau, minWidth);
    int[] unresolved = {0};
    for (int i = 0; i + 1 < g.size; i++) {
      if (g.needsRefinement(i, maxPhase, maxLogMag, tau)) {
        unresolved[0]++;
      }
    }
    double[] remainder = unwrappedRemainder(g, tau);
    double[] phase = new double[g.size];
    for (int i = 0; i < g.size; i++) {
      phase[i] = remainder[i] - Math.exp(g.x[i]) * tau;
    }
    BrentSolver solver = new BrentSolver(1e-14, 1e-13, 1e-15);
    double[] v = new double[2];
    List<GainCrossover> gains = gainCrossovers(g, f, remainder, solver, v);
    List<PhaseCrossover> phases = phaseCrossovers(g, f, remainder, phase, solver, v, unresolved);

    // step 6: the peak gain and the disk margin
    DoubleBinaryOperator gain = Math::hypot;
    DoubleBinaryOperator diskInverse = (re, im) -> Math.hypot(1 - re, im) / (2 * Math.hypot(1 + re, im));
    int refined = options.refineExtrema() ? MAXIMA_REFINED : 0;
    double[] peak = maximise(g, gain, f, v, refined);
    double[] disk = maximise(g, diskInverse, f, v, refined);
    double wPeak = Math.exp(peak[0]);
    PeakGain peakGain = new PeakGain(wPeak, wPeak / (2 * Math.PI), peak[1],
        20 * Math.log10(peak[1]));
    double alpha = disk[1] == 0 ? Double.POSITIVE_INFINITY : 1 / disk[1];
    DiskMargin dm = DiskMargin.ofAlpha(Double.isNaN(alpha) ? 0.0 : alpha, Math.exp(disk[0]));

    MarginDiagnostics diag = new MarginDiagnostics(initial, afterSeeds - Math.min(afterSeeds,
        initial), g.size - afterSeeds, g.size, unresolved[0], f.count);
    return new LoopMarginResult(wMin, wMax, gains, phases, dm, peakGain, stability, diag);
  }

  /**
   * Step 1 of the method: ln w of the grid points around each lightly damped seed pole (its
   * damped frequency +- {@link MarginOptions#seedPointsPerPole()} steps of its |real part|, and its
   * natural frequency), inside (w_min, w_max).
   */
  private List<Double> seedPoints(Eigenvalues seeds, double wMin, double wMax) {
    List<Double> seedX = new ArrayList<>();
    for (int k = 0; k < seeds.size(); k++) {
      double re = seeds.realAt(k);
      double im = Math.abs(seeds.imagAt(k));
      double zeta = Math.abs(seeds.dampingRatio(k));
      if (im == 0 || !(zeta < options.seedDampingRatio())) {
        continue;
      }
      double spacing = Math.max(Math.abs(re), 1e-9 * im);
      for (int j = -options.seedPointsPerPole(); j <= options.seedPointsPerPole(); j++) {
        double w = im + j * spacing;
        if (w > wMin && w < wMax) {
          seedX.add(Math.log(w));
        }
      }
      double wn = seeds.naturalFrequencyRadPerS(k);
      if (wn > wMin && wn < wMax) {
        seedX.add(Math.log(wn));
      }
    }
    return seedX;
  }

  /**
   * Step 1: the initial grid of {@code initial} points evenly spaced in x = ln w over [x0, x1],
   * merged with the seed points (repeats dropped) and the delay's intermediate points, sampled.
   */
  private static Grid seededGrid(Counted f, double x0, double x1, int initial, List<Double> seedX,
      double tau) {
    double[] merged = new double[initial + seedX.size()];
    for (int i = 0; i < initial; i++) {
      merged[i] = i == initial - 1 ? x1 : x0 + (x1 - x0) * i / (initial - 1);
    }
    for (int i = 0; i < seedX.size(); i++) {
      merged[initial + i] = seedX.get(i);
    }
    Arrays.sort(merged);
    Grid g = new Grid(merged.length + 64);
    for (double x : merged) {
      if (g.size == 0 || x > g.x[g.size - 1]) {
        addWithDelaySteps(g, x, f, tau);
      }
    }
    return g;
  }

  /**
   * Step 2: bisects (in ln w) every interval whose phase of L e^{j w tau} or whose gain changes
   * by more than the limits, level by level, until none does, the point cap is reached or an
   * interval is narrower than twice {@code minWidth}.
   */
  private Grid bisected(Grid g, Counted f, double maxPhase, double maxLogMag, double tau,
      double minWidth) {
    boolean changed = true;
    while (changed && g.size < options.maxPoints()) {
      changed = false;
      Grid next = new Grid(2 * g.size);
      for (int i = 0; i < g.size; i++) {
        next.copyFrom(g, i);
        if (i + 1 < g.size && next.size < options.maxPoints()
            && g.needsRefinement(i, maxPhase, maxLogMag, tau)
            && g.x[i + 1] - g.x[i] > 2 * minWidth) {
          next.add(0.5 * (g.x[i] + g.x[i + 1]), f);
          changed = true;
        }
      }
      g = next;
    }
    return g;
  }

  /** Step 3: the phase of L e^{j w tau} at the grid points, unwrapped along the grid, rad. */
  private static double[] unwrappedRemainder(Grid g, double tau) {
    double[] remainder = new double[g.size];
    remainder[0] = g.remainderPhase(0, tau);
    for (int i = 1; i < g.size; i++) {
      remainder[i] = remainder[i - 1] + wrap(g.remainderPhase(i, tau) - remainder[i - 1]);
    }
    return remainder;
  }

  /** Step 4: every sign change of ln|L| between grid points, solved by Brent's method. */
  private static List<GainCrossover> gainCrossovers(Grid g, Counted f, double[] remainder,
      BrentSolver solver, double[] v) {
    List<GainCrossover> gains = new ArrayList<>();
    for (int i = 0; i + 1 < g.size; i++) {
      double a = g.logMag(i);
      double b = g.logMag(i + 1);
      if ((a <= 0) == (b <= 0) || Double.isNaN(a) || Double.isNaN(b)) {
        continue;
      }
      double xr = a == 0 ? g.x[i] : solver.solve(200, x -> {
        f.at(Math.exp(x), v);
        return Math.log(Math.hypot(v[0], v[1]));
      }, g.x[i], g.x[i + 1]);
      double w = Math.exp(xr);
      double ph = f.unwrappedPhase(w, remainder[i], v);
      double pmRad = wrap(Math.PI + ph);
      double delay = (pmRad < 0 ? pmRad + 2 * Math.PI : pmRad) / w;
      if (gains.isEmpty() || w > gains.get(gains.size() - 1).omegaRadPerS() * (1 + 1e-12)) {
        gains.add(new GainCrossover(w, w / (2 * Math.PI), Math.toDegrees(ph),
            Math.toDegrees(pmRad), delay));
      }
    }
    return gains;
  }

  /**
   * Step 5: every crossing of the unwrapped phase through -180 deg + k 360 deg between grid
   * points, solved by Brent's method; a branch the phase inside an interval does not bracket
   * after all adds one to {@code unresolved[0]}.
   */
  private static List<PhaseCrossover> phaseCrossovers(Grid g, Counted f, double[] remainder,
      double[] phase, BrentSolver solver, double[] v, int[] unresolved) {
    List<PhaseCrossover> phases = new ArrayList<>();
    for (int i = 0; i + 1 < g.size; i++) {
      long ka = (long) Math.floor((phase[i] + Math.PI) / (2 * Math.PI));
      long kb = (long) Math.floor((phase[i + 1] + Math.PI) / (2 * Math.PI));
      if (ka == kb) {
        continue;
      }
      final int base = i;
      for (long k = Math.min(ka, kb) + 1; k <= Math.max(ka, kb); k++) {
        double target = -Math.PI + 2 * Math.PI * k;
        DoubleUnaryOperator h = x -> f.unwrappedPhase(Math.exp(x), remainder[base], v) - target;
        double ha = phase[i] - target;
        double xr;
        if (ha == 0) {
          xr = g.x[i];
        } else {
          try {
            xr = solver.solve(200, h::applyAsDouble, g.x[i], g.x[i + 1]);
          } catch (RuntimeException e) {
            // the phase inside an unresolved interval did not bracket this branch
            unresolved[0]++;
            continue;
          }
        }
        double w = Math.exp(xr);
        f.at(w, v);
        double mag = Math.hypot(v[0], v[1]);
        if (!phases.isEmpty()
            && w <= phases.get(phases.size() - 1).omegaRadPerS() * (1 + 1e-12)) {
          continue;
        }
        phases.add(new PhaseCrossover(w, w / (2 * Math.PI), mag, -20 * Math.log10(mag),
            mag < 1 ? MarginDirection.GAIN_INCREASE : MarginDirection.GAIN_REDUCTION));
      }
    }
    return phases;
  }

  /**
   * Maximises q(L(j w)) over the grid: takes q at every grid point from the L already sampled
   * there (the same value a new evaluation would give), refines the largest local maxima by
   * Brent's method on their neighbouring intervals (the {@code refined} largest; none leaves the
   * grid's largest sample), returns {x, q}.
   */
  private static double[] maximise(Grid g, DoubleBinaryOperator ofL, Counted f, double[] v, int refined) {
    DoubleUnaryOperator q = x -> {
      f.at(Math.exp(x), v);
      return ofL.applyAsDouble(v[0], v[1]);
    };
    double[] values = new double[g.size];
    for (int i = 0; i < g.size; i++) {
      values[i] = ofL.applyAsDouble(g.re[i], g.im[i]);
      if (Double.isNaN(values[i])) {
        values[i] = Double.POSITIVE_INFINITY;
      }
    }
    List<Integer> maxima = new ArrayList<>();
    for (int i = 0; i < g.size; i++) {
      boolean left = i == 0 || values[i] >= values[i - 1];
      boolean right = i == g.size - 1 || values[i] >= values[i + 1];
      if (left && right) {
        maxima.add(i);
      }
    }
    maxima.sort((p, r) -> Double.compare(values[r], values[p]));
    double bestX = g.x[maxima.get(0)];
    double best = values[maxima.get(0)];
    if (Double.isInfinite(best)) {
      return new double[] {bestX, best};
    }
    BrentOptimizer opt = new BrentOptimizer(1e-12, 1e-14);
    for (int m = 0; m < Math.min(refined, maxima.size()); m++) {
      int i = maxima.get(m);
      double lo = g.x[Math.max(0, i - 1)];
      double hi = g.x[Math.min(g.size - 1, i + 1)];
      if (hi <= lo) {
        continue;
      }
      UnivariatePointValuePair p = opt.optimize(new MaxEval(500),
          new UnivariateObjectiveFunction(q::applyAsDouble), GoalType.MAXIMIZE,
          new SearchInterval(lo, hi, g.x[i]));
      if (p.getValue() > best) {
        best = p.getValue();
        bestX = p.getPoint();
      }
    }
    return new double[] {bestX, best};
  }

  /**
   * Adds the point x = ln w to the grid, preceded by as many points evenly spaced in w as keep
   * the delay's turn tau (w_{i+1} - w_i) at most {@link #MAX_DELAY_TURN_RAD} per interval.
   */
  private static void addWithDelaySteps(Grid g, double x, Counted f, double tau) {
    if (g.size > 0 && tau > 0) {
      double w0 = Math.exp(g.x[g.size - 1]);
      double w1 = Math.exp(x);
      int steps = (int) Math.ceil(tau * (w1 - w0) / MAX_DELAY_TURN_RAD);
      for (int j = 1; j < steps; j++) {
        double xj = Math.log(w0 + (w1 - w0) * j / steps);
        if (xj > g.x[g.size - 1] && xj < x) {
          g.add(xj, f);
        }
      }
    }
    g.add(x, f);
  }

  /** Wraps an angle into (-pi, pi]. */
  static double wrap(double a) {
    double r = Math.IEEEremainder(a, 2 * Math.PI);
    return r <= -Math.PI ? r + 2 * Math.PI : r;
  }

  /** The frequency function with an evaluation counter. */
  private static final class Counted {
    private final SisoFrequencyFunction fn;
    private final double tau;
    /** Workspace for a value of L that is used at once. */
    private final double[] scratch = new double[2];
    private int count;

    Counted(SisoFrequencyFunction fn, double tau) {
      this.fn = fn;
      this.tau = tau;
    }

    void at(double w, double[] v) {
      count++;
      fn.response(w, v);
    }

    /**
     * Unwrapped arg L(j w), rad, continuing the unwrapped phase of L e^{j w tau} from the grid
     * point on the left of w.
     */
    double unwrappedPhase(double w, double leftRemainder, double[] v) {
      at(w, v);
      double rem = Math.atan2(v[1], v[0]) + w * tau;
      return leftRemainder + wrap(rem - leftRemainder) - w * tau;
    }
  }

  /** Growable sampled grid in x = ln w with Re L and Im L. */
  private static final class Grid {
    double[] x;
    double[] re;
    double[] im;
    int size;

    Grid(int capacity) {
      x = new double[Math.max(capacity, 4)];
      re = new double[x.length];
      im = new double[x.length];
    }

    private void ensure() {
      if (size == x.length) {
        x = Arrays.copyOf(x, 2 * size);
        re = Arrays.copyOf(re, 2 * size);
        im = Arrays.copyOf(im, 2 * size);
      }
    }

    void add(double xv, Counted f) {
      ensure();
      double[] v = f.scratch;
      f.at(Math.exp(xv), v);
      x[size] = xv;
      re[size] = v[0];
      im[size] = v[1];
      size++;
    }

    void copyFrom(Grid g, int i) {
      ensure();
      x[size] = g.x[i];
      re[size] = g.re[i];
      im[size] = g.im[i];
      size++;
    }

    double logMag(int i) {
      return Math.log(Math.hypot(re[i], im[i]));
    }

    /** @return arg(L e^{j w tau}) at point i, rad (not unwrapped) */
    double remainderPhase(int i, double tau) {
      return Math.atan2(im[i], re[i]) + Math.exp(x[i]) * tau;
    }

    boolean needsRefinement(int i, double maxPhase, double maxLogMag, double tau) {
      double dPhase = wrap(remainderPhase(i + 1, tau) - remainderPhase(i, tau));
      double dMag = logMag(i + 1) - logMag(i);
      return Math.abs(dPhase) > maxPhase || !(Math.abs(dMag) <= maxLogMag);
    }
  }
}
