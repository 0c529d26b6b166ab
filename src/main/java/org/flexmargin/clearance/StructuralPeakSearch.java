package org.flexmargin.clearance;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.Checks;
import org.flexmargin.model.InvalidInputException;

/**
 * Gain or phase stabilisation of one structural mode (references 1.2, common practice): over the
 * uncertainty band f (1 +- u) of the mode's current frequency f, the peak of 20 log10 |L(j w)| is
 * compared with the limit (gain-stabilised if at or below it); otherwise the phase must stay at
 * least the phase-stabilisation margin away from -180 deg (mod 360) wherever |L| is at or above
 * the limit (phase-stabilised); otherwise the mode fails.
 *
 * <p>The nominal L is evaluated over the band; a shift of the mode itself within the band is not
 * modelled here (re-run with scaled modal frequencies for that).
 *
 * <p>Method: L is sampled on a grid uniform in ln w over the band (65 points plus the mode
 * frequency); every interval whose phase changes by more than 5 deg or whose gain changes by more
 * than 0.5 dB is bisected until neither holds (up to 30 levels, 20 000 points), so a narrow
 * resonance between grid points is resolved. The largest sample is refined by Brent's
 * maximisation on its two neighbouring intervals and added to the samples; the edges of the region |L| &gt;= limit are
 * solved by Brent's root finder; local minima of the phase distance inside that region are refined
 * by Brent's minimisation (Brent, <i>Algorithms for Minimization without Derivatives</i>, 1973;
 * Commons Math). Instances hold no state; the frequency function is called from the calling thread.
 */
public final class StructuralPeakSearch {
  private static final int INITIAL_POINTS = 65;
  private static final double MAX_PHASE_STEP_DEG = 5.0;
  private static final double MAX_GAIN_STEP_DB = 0.5;
  private static final int MAX_DEPTH = 30;
  private static final int MAX_POINTS = 20_000;
  private static final double X_TOLERANCE = 1e-13;

  private StructuralPeakSearch() {}

  /**
   * @param mode the mode and its current frequency
   * @param loop broken-loop response L(j w), negative-feedback convention
   * @param peakLimitDb gain-stabilisation limit, dB (e.g. -6)
   * @param phaseMarginDeg phase-stabilisation margin, deg (e.g. 60)
   * @param frequencyUncertainty relative half-width u of the band, in [0, 0.5]
   * @return the assessment
   */
  public static StructuralModeAssessment assess(ModeFrequency mode, SisoFrequencyFunction loop,
      double peakLimitDb, double phaseMarginDeg, double frequencyUncertainty) {
    if (mode == null || loop == null) {
      throw new InvalidInputException("structural_mode", "a mode and a loop response", "nothing");
    }
    Checks.finite("structural_peak_limit_db", peakLimitDb);
    Checks.inRange("phase_stabilisation_margin_deg", phaseMarginDeg, 0.0, 180.0);
    Checks.inRange("frequency_uncertainty", frequencyUncertainty, 0.0, 0.5);
    double f = mode.frequencyHz();
    double fLo = f * (1 - frequencyUncertainty);
    double fHi = f * (1 + frequencyUncertainty);
    Sampler s = new Sampler(loop);
    Grid g = grid(s, Math.log(2 * Math.PI * fLo), Math.log(2 * Math.PI * fHi),
        Math.log(2 * Math.PI * f));

    // peak
    int ip = 0;
    for (int i = 1; i < g.n; i++) {
      if (g.db[i] > g.db[ip]) {
        ip = i;
      }
    }
    double xPeak = g.x[ip];
    double peakDb = g.db[ip];
    double lo = g.x[Math.max(ip - 1, 0)];
    double hi = g.x[Math.min(ip + 1, g.n - 1)];
    if (hi > lo) {
      UnivariatePointValuePair p = optimise(s::db, GoalType.MAXIMIZE, lo, hi, xPeak);
      if (p.getValue() > peakDb) {
        xPeak = p.getPoint();
        peakDb = p.getValue();
      }
    }

    // the refined peak becomes a sample, so that a region above the limit narrower than the
    // grid spacing is bracketed on both sides of it
    g.insert(xPeak, s);

    // least phase distance over {|L| >= limit} plus the peak
    double bestX = xPeak;
    double bestD = s.distance(xPeak);
    for (int i = 0; i < g.n; i++) {
      if (g.db[i] >= peakLimitDb && g.d[i] < bestD) {
        bestD = g.d[i];
        bestX = g.x[i];
      }
    }
    BrentSolver solver = new BrentSolver(X_TOLERANCE);
    for (int i = 0; i + 1 < g.n; i++) {
      double a = g.db[i] - peakLimitDb;
      double b = g.db[i + 1] - peakLimitDb;
      if (a < 0 != b < 0) {
        double xr = solver.solve(200, x -> s.db(x) - peakLimitDb, g.x[i], g.x[i + 1]);
        double d = s.distance(xr);
        if (d < bestD) {
          bestD = d;
          bestX = xr;
        }
      }
    }
    for (int i = 1; i + 1 < g.n; i++) {
      if (g.db[i - 1] >= peakLimitDb && g.db[i] >= peakLimitDb && g.db[i + 1] >= peakLimitDb
          && g.d[i] <= g.d[i - 1] && g.d[i] <= g.d[i + 1]) {
        UnivariatePointValuePair p =
            optimise(s::distance, GoalType.MINIMIZE, g.x[i - 1], g.x[i + 1], g.x[i]);
        if (p.getValue() < bestD && s.db(p.getPoint()) >= peakLimitDb) {
          bestD = p.getValue();
          bestX = p.getPoint();
        }
      }
    }
    StructuralStabilisation status = peakDb <= peakLimitDb ? StructuralStabilisation.GAIN_STABILISED
        : bestD >= phaseMarginDeg ? StructuralStabilisation.PHASE_STABILISED
        : StructuralStabilisation.FAILED;
    return new StructuralModeAssessment(mode.name(), f, fLo, fHi, peakDb, hz(xPeak), bestD,
        hz(bestX), peakLimitDb, phaseMarginDeg, status, s.count);
  }

  private static double hz(double x) {
    return Math.exp(x) / (2 * Math.PI);
  }

  private static UnivariatePointValuePair optimise(DoubleUnaryOperator fn, GoalType goal,
      double lo, double hi, double start) {
    BrentOptimizer opt = new BrentOptimizer(1e-12, X_TOLERANCE);
    return opt.optimize(new MaxEval(500), new UnivariateObjectiveFunction(fn::applyAsDouble),
        goal, new SearchInterval(lo, hi, Math.min(Math.max(start, lo), hi)));
  }

  /** Wraps an angle in degrees into (-180, 180]. */
  static double wrapDeg(double deg) {
    double w = deg % 360.0;
    if (w > 180) {
      w -= 360;
    } else if (w <= -180) {
      w += 360;
    }
    return w;
  }

  /** Evaluates L in x = ln w; counts calls. */
  private static final class Sampler {
    final SisoFrequencyFunction loop;
    final double[] v = new double[2];
    int count;

    Sampler(SisoFrequencyFunction loop) {
      this.loop = loop;
    }

    private void eval(double x) {
      loop.response(Math.exp(x), v);
      count++;
      if (!Double.isFinite(v[0]) || !Double.isFinite(v[1])) {
        throw new InvalidInputException("loop_response", "a finite response",
            v[0] + " + " + v[1] + " j at " + hz(x) + " Hz");
      }
    }

    double db(double x) {
      eval(x);
      return gainDb(v[0], v[1]);
    }

    double distance(double x) {
      eval(x);
      return distanceDeg(Math.toDegrees(Math.atan2(v[1], v[0])));
    }
  }

  /** 20 log10 |re + j im|, floored at the smallest normal number so that a zero stays finite. */
  private static double gainDb(double re, double im) {
    return 10 * Math.log10(Math.max(re * re + im * im, Double.MIN_NORMAL));
  }

  /** |arg L + 180 deg|, wrapped, in [0, 180]: the distance of a phase from -180 deg (mod 360). */
  private static double distanceDeg(double phaseDeg) {
    return Math.abs(wrapDeg(phaseDeg + 180));
  }

  /**
   * Refined samples: x = ln w, gain dB, phase deg, phase distance deg. A grid is created with the
   * capacity it will need (a refinement level adds fewer samples than it holds; one more for the
   * inserted peak). The phase serves the refinement only and is not kept by {@link #insert}.
   */
  private static final class Grid {
    double[] x;
    double[] db;
    double[] ph;
    double[] d;
    int n;

    Grid(int capacity) {
      x = new double[capacity];
      db = new double[capacity];
      ph = new double[capacity];
      d = new double[capacity];
    }

    void add(double xv, Sampler s) {
      s.eval(xv);
      x[n] = xv;
      db[n] = gainDb(s.v[0], s.v[1]);
      ph[n] = Math.toDegrees(Math.atan2(s.v[1], s.v[0]));
      d[n] = distanceDeg(ph[n]);
      n++;
    }

    /** Inserts a sample at {@code xv} in order, unless one is already there. */
    void insert(double xv, Sampler s) {
      int i = Arrays.binarySearch(x, 0, n, xv);
      if (i >= 0) {
        return;
      }
      int at = -i - 1;
      add(xv, s);
      double dbv = db[n - 1];
      double dv = d[n - 1];
      System.arraycopy(x, at, x, at + 1, n - 1 - at);
      System.arraycopy(db, at, db, at + 1, n - 1 - at);
      System.arraycopy(d, at, d, at + 1, n - 1 - at);
      x[at] = xv;
      db[at] = dbv;
      d[at] = dv;
    }

    boolean coarse(int i) {
      return Math.abs(wrapDeg(ph[i + 1] - ph[i])) > MAX_PHASE_STEP_DEG
          || Math.abs(db[i + 1] - db[i]) > MAX_GAIN_STEP_DB;
    }
  }

  private static Grid grid(Sampler s, double x0, double x1, double xc) {
    Grid g = new Grid(4 * INITIAL_POINTS);
    if (!(x1 > x0)) {
      g.add(xc, s);
      return g;
    }
    boolean centreAdded = false;
    for (int i = 0; i < INITIAL_POINTS; i++) {
      double xv = i == INITIAL_POINTS - 1 ? x1 : x0 + (x1 - x0) * i / (INITIAL_POINTS - 1);
      if (!centreAdded && xc <= xv) {
        if (xc < xv && xc > x0) {
          g.add(xc, s);
        }
        centreAdded = true;
      }
      g.add(xv, s);
    }
    double minWidth = (x1 - x0) / (INITIAL_POINTS - 1) / Math.pow(2, MAX_DEPTH);
    for (int depth = 0; depth < MAX_DEPTH; depth++) {
      Grid next = new Grid(g.n * 2);
      boolean split = false;
      for (int i = 0; i < g.n; i++) {
        next.x[next.n] = g.x[i];
        next.db[next.n] = g.db[i];
        next.ph[next.n] = g.ph[i];
        next.d[next.n] = g.d[i];
        next.n++;
        if (i + 1 < g.n && g.coarse(i) && g.x[i + 1] - g.x[i] > minWidth
            && g.n + (next.n - i) < MAX_POINTS) {
          next.add(0.5 * (g.x[i] + g.x[i + 1]), s);
          split = true;
        }
      }
      g = next;
      if (!split) {
        break;
      }
    }
    return g;
  }
}
