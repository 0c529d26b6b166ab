package org.flexmargin.flutter;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.ejml.dense.row.MatrixFeatures_ZDRM;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.numerics.ComplexEigen;
import org.flexmargin.numerics.ComplexEigenResult;
import org.flexmargin.numerics.GreedyAssignment;

/**
 * The k method (V-g method; Smilg &amp; Wasserman, USAF ACTR-4798, 1942; Bisplinghoff, Ashley
 * &amp; Halfman, <i>Aeroelasticity</i>, §9.6). Harmonic motion at reduced frequency k is made
 * possible by an artificial structural damping g multiplying the stiffness:
 *
 * <pre>  [ -omega^2 M + (1 + i g) K_c - (rho b^2 omega^2 / (2 k^2)) Q(ik) ] xi = 0 </pre>
 *
 * <p>so Lambda = (1 + i g)/omega^2 is an eigenvalue of K_c^-1 (M + rho b^2 Q(ik) / (2 k^2)),
 * giving omega = 1/sqrt(Re Lambda), g = Im Lambda / Re Lambda and V = omega b / k. The user's
 * viscous damping C enters as hysteretic damping K_c = K + i D with D_ij = C_ij sqrt(K_jj/M_jj),
 * exact for modal damping (D_ii = 2 zeta_i K_ii = g_s K_ii). The damping g is meaningful only
 * where it crosses zero: only those crossings are reported (as {@link CrossingKind#FLUTTER_ONSET}
 * or {@link CrossingKind#FLUTTER_RECOVERY}), refined by Brent's method on k.
 *
 * <p>Needs one air density: a sweep at one altitude. Branches are tracked from high to low k by
 * greedy eigenvector correlation (MAC). In the returned curves {@code pathParameter} is the
 * reduced frequency and {@code dampingRatio} is g/2 (artificial, for display only). Stateless and
 * thread-safe.
 */
public final class KMethod implements FlutterMethod {

  private static final int BRENT_MAX_EVALUATIONS = 100;

  @Override
  public FlutterSolution solve(AeroelasticSystem system, FlightPath path, AnalysisOptions options) {
    if (!path.constantDensity()) {
      throw new InvalidInputException(
          "options.method", "pk for a sweep whose altitude changes (the k method needs one density)", "k");
    }
    SolveCounters counters = new SolveCounters();
    FlightCondition base = path.at(0);
    int n = system.size();
    int nk = options.kMethodPoints();
    double kHi = options.kMethodMaxReducedFrequency();
    double kLo = options.kMethodMinReducedFrequency();
    double[] ks = new double[nk];
    for (int i = 0; i < nk; i++) {
      ks[i] = kHi * Math.pow(kLo / kHi, i / (double) (nk - 1));
    }
    Solver solver = new Solver(system, base.densityKgPerM3(), counters);
    double[][] lr = new double[nk][n];
    double[][] li = new double[nk][n];
    double[][][] vec = new double[nk][n][];
    ComplexEigenResult first = solver.eigen(ks[0]);
    int[] order = initialOrder(first, n);
    for (int j = 0; j < n; j++) {
      store(first, order[j], lr[0], li[0], vec[0], j, n);
    }
    for (int i = 1; i < nk; i++) {
      ComplexEigenResult e = solver.eigen(ks[i]);
      int[] match = matchByMac(e, vec[i - 1], n, counters);
      for (int j = 0; j < n; j++) {
        store(e, match[j], lr[i], li[i], vec[i], j, n);
      }
    }
    List<String> names = system.coordinateNames();
    double b = system.aero().referenceSemichordM();
    List<BranchCurve> curves = new ArrayList<>();
    List<FlutterCrossing> crossings = new ArrayList<>();
    List<String> warnings = new ArrayList<>();
    warnings.add("k method: damping g is the artificial structural damping needed for harmonic motion; "
        + "it is a true damping only where it crosses zero");
    for (int j = 0; j < n; j++) {
      double[] eas = new double[nk];
      double[] tas = new double[nk];
      double[] f = new double[nk];
      double[] g = new double[nk];
      double[] z = new double[nk];
      boolean[] ok = new boolean[nk];
      for (int i = 0; i < nk; i++) {
        ok[i] = lr[i][j] > 0;
        double omega = ok[i] ? 1 / Math.sqrt(lr[i][j]) : Double.NaN;
        tas[i] = omega * b / ks[i];
        eas[i] = ok[i] ? base.withSpeedTasMps(tas[i]).speedEasMps() : Double.NaN;
        f[i] = omega / (2 * Math.PI);
        g[i] = ok[i] ? li[i][j] / lr[i][j] : Double.NaN;
        z[i] = g[i] / 2;
      }
      curves.add(new BranchCurve(names.get(j), ks, eas, tas, f, g, z, ks, ok));
      for (int i = 0; i + 1 < nk; i++) {
        if (!ok[i] || !ok[i + 1]) {
          continue;
        }
        if ((g[i] < 0 && g[i + 1] >= 0) || (g[i] > 0 && g[i + 1] <= 0)) {
          crossings.add(refine(solver, ks[i], ks[i + 1], vec[i][j], g[i] < 0, j, names.get(j), base, b, n));
        }
      }
    }
    crossings.sort(Comparator.comparingDouble(c -> c.condition().speedTasMps()));
    PkMethod.addRangeWarning(system, counters, warnings);
    return new FlutterSolution(FlutterMethodKind.K, curves, crossings, counters.toDiagnostics(), warnings);
  }

  private static FlutterCrossing refine(
      Solver solver, double kA, double kB, double[] vA, boolean rising, int branch, String name,
      FlightCondition base, double b, int n) {
    BrentSolver brent = new BrentSolver(1e-14, 1e-10 * kA);
    double[] lambda = new double[2];
    double k;
    int evaluations;
    try {
      k = brent.solve(BRENT_MAX_EVALUATIONS, kk -> {
        closest(solver.eigen(kk), vA, n, lambda);
        return lambda[1] / lambda[0];
      }, kB, kA);
      evaluations = brent.getEvaluations();
    } catch (TooManyEvaluationsException e) {
      k = 0.5 * (kA + kB);
      evaluations = BRENT_MAX_EVALUATIONS;
    }
    closest(solver.eigen(k), vA, n, lambda);
    double omega = 1 / Math.sqrt(lambda[0]);
    double v = omega * b / k;
    return new FlutterCrossing(branch, name,
        CrossingKind.of(0.0, rising),
        k, base.withSpeedTasMps(v), omega / (2 * Math.PI), 0.0, evaluations, 1e-10 * kA);
  }

  private static void closest(ComplexEigenResult e, double[] ref, int n, double[] out) {
    double best = -1;
    for (int c = 0; c < n; c++) {
      double mac = FlutterWorkspace.mac(ref, column(e, c, n));
      if (mac > best) {
        best = mac;
        out[0] = e.realAt(c);
        out[1] = e.imagAt(c);
      }
    }
  }

  private static int[] initialOrder(ComplexEigenResult e, int n) {
    // branch j = eigenvector with the largest share in coordinate j (greedy, distinct)
    int[] order = new int[n];
    boolean[] used = new boolean[n];
    for (int j = 0; j < n; j++) {
      double best = -1;
      for (int c = 0; c < n; c++) {
        if (used[c]) {
          continue;
        }
        double[] v = column(e, c, n);
        double share = v[2 * j] * v[2 * j] + v[2 * j + 1] * v[2 * j + 1];
        if (share > best) {
          best = share;
          order[j] = c;
        }
      }
      used[order[j]] = true;
    }
    return order;
  }

  private static int[] matchByMac(ComplexEigenResult e, double[][] prev, int n, SolveCounters counters) {
    double[][] mac = new double[n][n];
    double[][] cols = new double[n][];
    for (int c = 0; c < n; c++) {
      cols[c] = column(e, c, n);
    }
    for (int j = 0; j < n; j++) {
      for (int c = 0; c < n; c++) {
        mac[j][c] = FlutterWorkspace.mac(prev[j], cols[c]);
      }
    }
    double[][] cost = new double[n][n];
    for (int j = 0; j < n; j++) {
      for (int c = 0; c < n; c++) {
        cost[j][c] = -mac[j][c];
      }
    }
    int[] match = GreedyAssignment.minimumCost(cost);
    for (int j = 0; j < n; j++) {
      counters.minMac = Math.min(counters.minMac, mac[j][match[j]]);
    }
    return match;
  }

  private static void store(
      ComplexEigenResult e, int c, double[] lr, double[] li, double[][] vec, int j, int n) {
    lr[j] = e.realAt(c);
    li[j] = e.imagAt(c);
    vec[j] = column(e, c, n);
  }

  private static double[] column(ComplexEigenResult e, int c, int n) {
    double[] v = new double[2 * n];
    ZMatrixRMaj m = e.vectors();
    for (int i = 0; i < n; i++) {
      v[2 * i] = m.getReal(i, c);
      v[2 * i + 1] = m.getImag(i, c);
    }
    return v;
  }

  /** K_c^-1 (M + rho b^2 Q / (2 k^2)) and its eigen-decomposition. */
  private static final class Solver {
    private final AeroelasticSystem sys;
    private final double rho;
    private final SolveCounters counters;
    private final ZMatrixRMaj kcInverse;
    private final ComplexEigen eigen = new ComplexEigen();

    Solver(AeroelasticSystem sys, double rho, SolveCounters counters) {
      this.sys = sys;
      this.rho = rho;
      this.counters = counters;
      int n = sys.size();
      ZMatrixRMaj kc = new ZMatrixRMaj(n, n);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          double omegaJ = Math.sqrt(Math.max(sys.stiffness(j, j), 0) / sys.mass(j, j));
          kc.set(i, j, sys.stiffness(i, j), sys.damping(i, j) * omegaJ);
        }
      }
      kcInverse = new ZMatrixRMaj(n, n);
      if (!CommonOps_ZDRM.invert(kc.copy(), kcInverse) || MatrixFeatures_ZDRM.hasUncountable(kcInverse)) {
        throw new IllegalArgumentException("stiffness matrix is singular (k method needs elastic modes only)");
      }
    }

    ComplexEigenResult eigen(double k) {
      int n = sys.size();
      ZMatrixRMaj q = new ZMatrixRMaj(n, n);
      sys.aero().forces(k, q);
      counters.noteReducedFrequency(k);
      double b = sys.aero().referenceSemichordM();
      double factor = rho * b * b / (2 * k * k);
      ZMatrixRMaj a = new ZMatrixRMaj(n, n);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          a.set(i, j, sys.mass(i, j) + factor * q.getReal(i, j), factor * q.getImag(i, j));
        }
      }
      ZMatrixRMaj prod = new ZMatrixRMaj(n, n);
      CommonOps_ZDRM.mult(kcInverse, a, prod);
      counters.fullEigenSolves++;
      return eigen.decompose(prod);
    }
  }
}
