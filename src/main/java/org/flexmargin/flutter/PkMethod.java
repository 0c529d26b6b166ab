package org.flexmargin.flutter;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.FlutterWorkspace.Root;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.numerics.ComplexEigenResult;

/**
 * The p-k method (Hassig, "An approximate true damping solution of the flutter equation by
 * determinant iteration", J. Aircraft 8(11), 1971) with root tracking by continuation.
 *
 * <p>At every flight condition each root s of {@code [M s^2 + C s + K - q_dyn Q(ik)] v = 0} is
 * found with the aerodynamics evaluated at its own reduced frequency k = Im(s) b_ref / V.
 *
 * <ul>
 *   <li><b>Start-up</b> (first grid point): two classical p-k updates on the full 2m x 2m
 *       first-order eigenproblem, one mode at a time, picking the root whose vector has the
 *       largest participation of that mode, then converged by Newton (below).
 *   <li><b>Continuation</b> (every further point): each root is converged from its value at the
 *       previous point by nonlinear inverse iteration on the m x m complex flutter matrix (see
 *       {@link FlutterWorkspace}). A step is accepted only if it converged, moved the root by less
 *       than a quarter of its modulus and kept the vector's modal assurance criterion (MAC) with the
 *       previous vector above 0.8; otherwise it is halved (up to 12 times). Two branches landing
 *       on the same root are re-solved with finer steps and reported if they still coincide.
 *   <li><b>Crossings</b>: every sign change on the grid of the crossing function
 *       2 Re(s) - g_level |Im(s)| (g_level = 0 and minus the damping limit) is refined by Brent's
 *       method on the path parameter, re-solving the root at intermediate conditions by
 *       continuation from the left grid point. Hump modes give an onset and a recovery.
 * </ul>
 *
 * <p>Stateless and thread-safe: every call builds its own workspace.
 */
public final class PkMethod implements FlutterMethod {

  private static final int MAX_HALVINGS = 12;
  private static final int START_UP_FROZEN_ITERATIONS = 2;
  private static final double MIN_STEP_MAC = 0.8;
  private static final double MAX_RELATIVE_STEP = 0.25;
  private static final double COLLISION_TOLERANCE = 1e-6;
  private static final int BRENT_MAX_EVALUATIONS = 100;

  @Override
  public FlutterSolution solve(AeroelasticSystem system, FlightPath path, AnalysisOptions options) {
    SolveCounters counters = new SolveCounters();
    FlutterWorkspace ws = new FlutterWorkspace(system, counters);
    int n = system.size();
    int np = path.gridPoints();
    List<String> warnings = new ArrayList<>();
    List<String> names = system.coordinateNames();
    Root[][] roots = new Root[np][];
    roots[0] = startUp(ws, system, path.at(0), options, warnings);
    Root[] lastGood = roots[0].clone();
    double[] lastGoodT = new double[n];
    Root[] previousGood = new Root[n];
    double[] previousGoodT = new double[n];
    for (int p = 1; p < np; p++) {
      roots[p] = new Root[n];
      for (int j = 0; j < n; j++) {
        // linear predictor from the last two accepted roots of this branch
        double predR = lastGood[j].sr();
        double predI = lastGood[j].si();
        if (previousGood[j] != null) {
          double f = (p - lastGoodT[j]) / (lastGoodT[j] - previousGoodT[j]);
          predR += f * (lastGood[j].sr() - previousGood[j].sr());
          predI += f * (lastGood[j].si() - previousGood[j].si());
        }
        Root r = track(ws, path, lastGoodT[j], lastGood[j], p, predR, predI, options, 0);
        roots[p][j] = r;
        if (r.converged()) {
          previousGood[j] = lastGood[j];
          previousGoodT[j] = lastGoodT[j];
          lastGood[j] = r;
          lastGoodT[j] = p;
        } else {
          counters.unconverged++;
          counters.trouble(p);
          warnings.add(String.format(Locale.ROOT,
              "root of %s did not converge at grid point %d (%.2f m/s EAS); its curve has a gap there",
              names.get(j), p, path.at(p).speedEasMps()));
        }
      }
      if (separateCollisions(ws, path, roots, p, options, names, warnings)) {
        counters.trouble(p);
      }
    }
    List<BranchCurve> curves = new ArrayList<>();
    for (int j = 0; j < n; j++) {
      curves.add(BranchCurve.of(names.get(j), path, roots, j, system.aero().referenceSemichordM()));
    }
    List<FlutterCrossing> crossings = CrossingScan.scan(roots, options,
        (j, p, fa, level) -> refine(ws, path, j, names.get(j), p, roots[p][j], fa, level, options));
    addRangeWarning(system, counters, warnings);
    return new FlutterSolution(FlutterMethodKind.PK, curves, crossings, counters.toDiagnostics(), warnings);
  }

  static void addRangeWarning(AeroelasticSystem system, SolveCounters counters, List<String> warnings) {
    double lo = system.aero().minReducedFrequency();
    double hi = system.aero().maxReducedFrequency();
    if (counters.minReducedFrequency < lo || counters.maxReducedFrequency > hi) {
      warnings.add(String.format(Locale.ROOT,
          "aerodynamic data used outside their reduced-frequency range [%.4g, %.4g]: k from %.4g to %.4g "
              + "was needed; values there are held at the table ends",
          lo, hi, counters.minReducedFrequency, counters.maxReducedFrequency));
    }
  }

  /** Classical p-k at the first point, one mode at a time, then a Newton polish. */
  private static Root[] startUp(
      FlutterWorkspace ws, AeroelasticSystem sys, FlightCondition fc, AnalysisOptions options,
      List<String> warnings) {
    int n = sys.size();
    Root[] roots = new Root[n];
    double b = sys.aero().referenceSemichordM();
    for (int j = 0; j < n; j++) {
      double omega = sys.inVacuoOmegaRadPerS(j);
      ComplexEigenResult eig = null;
      int pick = -1;
      // two classical p-k updates pick the root and bring k close; Newton then converges it
      for (int it = 0; it < START_UP_FROZEN_ITERATIONS; it++) {
        double k = omega * b / fc.speedTasMps();
        eig = ws.frozenRoots(k, fc);
        pick = mostParticipating(eig, j, n);
        double newOmega = Math.abs(eig.imagAt(pick));
        boolean done = Math.abs(newOmega - omega) <= options.convergenceTolerance() * Math.max(omega, 1e-12);
        omega = newOmega;
        if (done) {
          break;
        }
      }
      double[] v = new double[2 * n];
      for (int i = 0; i < n; i++) {
        v[2 * i] = eig.vectors().getReal(i, pick);
        v[2 * i + 1] = eig.vectors().getImag(i, pick);
      }
      FlutterWorkspace.normalise(v);
      double si = Math.abs(eig.imagAt(pick));
      roots[j] = ws.newton(eig.realAt(pick), si, v, fc, options.maxIterations(), options.convergenceTolerance());
      if (!roots[j].converged()) {
        ws.counters.unconverged++;
        warnings.add("start-up root of " + sys.coordinateNames().get(j) + " did not converge");
      }
    }
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        if (same(roots[i], roots[j])) {
          warnings.add("at the first sweep point the roots of " + sys.coordinateNames().get(i) + " and "
              + sys.coordinateNames().get(j) + " coincide; start the sweep at a lower speed");
        }
      }
    }
    return roots;
  }

  /** Index of the eigenvalue with Im >= 0 whose vector has the largest share in coordinate j. */
  private static int mostParticipating(ComplexEigenResult eig, int j, int n) {
    int best = -1;
    double bestShare = -1;
    var vec = eig.vectors();
    for (int c = 0; c < eig.size(); c++) {
      if (eig.imagAt(c) < 0) {
        continue;
      }
      double total = 0;
      for (int i = 0; i < n; i++) {
        total += vec.getReal(i, c) * vec.getReal(i, c) + vec.getImag(i, c) * vec.getImag(i, c);
      }
      double own = vec.getReal(j, c) * vec.getReal(j, c) + vec.getImag(j, c) * vec.getImag(j, c);
      double share = total > 0 ? own / total : 0;
      if (share > bestShare) {
        bestShare = share;
        best = c;
      }
    }
    return best;
  }

  /** Continues a root from (t0, r0) to t1, halving the step while tracking is not clean. */
  static Root track(
      FlutterWorkspace ws, FlightPath path, double t0, Root r0, double t1, AnalysisOptions options, int depth) {
    return track(ws, path, t0, r0, t1, r0.sr(), r0.si(), options, depth);
  }

  /** As {@link #track(FlutterWorkspace, FlightPath, double, Root, double, AnalysisOptions, int)}
   * with a predicted start value for the first attempt. */
  static Root track(
      FlutterWorkspace ws, FlightPath path, double t0, Root r0, double t1, double startR, double startI,
      AnalysisOptions options, int depth) {
    Root r = ws.newton(startR, startI, r0.v(), path.at(t1), options.maxIterations(),
        options.convergenceTolerance());
    double mac = r.converged() ? FlutterWorkspace.mac(r0.v(), r.v()) : 0;
    double scale = Math.max(Math.hypot(r0.sr(), r0.si()), Math.hypot(r.sr(), r.si()));
    boolean clean = r.converged()
        && r.si() >= -1e-9 * scale
        && mac >= MIN_STEP_MAC
        && Math.hypot(r.sr() - r0.sr(), r.si() - r0.si()) <= MAX_RELATIVE_STEP * scale;
    if (clean || depth >= MAX_HALVINGS) {
      if (r.converged()) {
        ws.counters.minMac = Math.min(ws.counters.minMac, mac);
      }
      return r;
    }
    ws.counters.stepHalvings++;
    double mid = 0.5 * (t0 + t1);
    Root rm = track(ws, path, t0, r0, mid, options, depth + 1);
    if (!rm.converged()) {
      return rm;
    }
    return track(ws, path, mid, rm, t1, options, depth + 1);
  }

  private static boolean same(Root a, Root b) {
    double scale = Math.max(Math.hypot(a.sr(), a.si()), 1e-12);
    return a.converged() && b.converged()
        && Math.hypot(a.sr() - b.sr(), a.si() - b.si()) <= COLLISION_TOLERANCE * scale;
  }

  /**
   * Re-solves branches that landed on the same root with four sub-steps; warns if they still do.
   *
   * @return whether two branches still share a root
   */
  private static boolean separateCollisions(
      FlutterWorkspace ws, FlightPath path, Root[][] roots, int p, AnalysisOptions options,
      List<String> names, List<String> warnings) {
    int n = roots[p].length;
    boolean ambiguous = false;
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        if (!same(roots[p][i], roots[p][j])) {
          continue;
        }
        for (int b : new int[] {i, j}) {
          Root r = roots[p - 1][b];
          double t = p - 1;
          for (int sub = 1; sub <= 4 && r.converged(); sub++) {
            double t1 = p - 1 + sub / 4.0;
            r = track(ws, path, t, r, t1, options, 2);
            t = t1;
          }
          if (r.converged()) {
            roots[p][b] = r;
          }
        }
        if (same(roots[p][i], roots[p][j])) {
          ambiguous = true;
          warnings.add(String.format(Locale.ROOT,
              "ambiguous mode tracking at grid point %d (%.2f m/s EAS): branches %s and %s reach the same root",
              p, path.at(p).speedEasMps(), names.get(i), names.get(j)));
        }
      }
    }
    return ambiguous;
  }

  private static FlutterCrossing refine(
      FlutterWorkspace ws, FlightPath path, int branch, String name, int p, Root left, double fLeft,
      double level, AnalysisOptions options) {
    double dv = Math.abs(path.at(p + 1).speedEasMps() - path.at(p).speedEasMps());
    double absAccuracy = Math.min(0.25, options.onsetSpeedToleranceMps() / Math.max(dv, 1e-9));
    BrentSolver solver = new BrentSolver(1e-14, absAccuracy);
    Root[] last = new Root[1];
    double t;
    int evaluations;
    try {
      t = solver.solve(BRENT_MAX_EVALUATIONS, tt -> {
        if (tt <= p) {
          return fLeft;
        }
        Root r = track(ws, path, p, left, tt, options, 0);
        last[0] = r;
        return r.crossingFunction(level);
      }, p, p + 1);
      evaluations = solver.getEvaluations();
    } catch (TooManyEvaluationsException e) {
      t = p + 0.5;
      evaluations = BRENT_MAX_EVALUATIONS;
    }
    Root at = track(ws, path, p, left, t, options, 0);
    boolean rising = fLeft < 0;
    CrossingKind kind = CrossingKind.of(level, rising);
    return new FlutterCrossing(branch, name, kind, t, path.at(t), at.frequencyHz(), level, evaluations,
        absAccuracy);
  }
}
