package org.flexmargin.flutter;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.flexmargin.flutter.FlutterWorkspace.Root;
import org.flexmargin.model.AnalysisOptions;

/**
 * Finds, on tracked roots at the grid points, every sign change of the crossing function
 * 2 Re(s) - g_level |Im(s)| for g_level = 0 and minus the damping limit, and hands each bracket to a
 * method-specific refiner. Shared by the p-k and state-space methods.
 */
final class CrossingScan {
  private CrossingScan() {}

  /** Refines one bracketed crossing. */
  @FunctionalInterface
  interface Refiner {
    /**
     * @param branch branch index
     * @param p left grid point of the bracket
     * @param fLeft crossing function at the left point
     * @param level the g level crossed
     * @return the refined crossing
     */
    FlutterCrossing refine(int branch, int p, double fLeft, double level);
  }

  /**
   * @param roots roots[p][j] at the grid points
   * @param options damping limit
   * @param refiner refines each bracket
   * @return crossings ordered along the path
   */
  static List<FlutterCrossing> scan(Root[][] roots, AnalysisOptions options, Refiner refiner) {
    List<FlutterCrossing> crossings = new ArrayList<>();
    double[] levels = options.dampingLimitG() > 0
        ? new double[] {0.0, -options.dampingLimitG()} : new double[] {0.0};
    int np = roots.length;
    int n = roots[0].length;
    for (int j = 0; j < n; j++) {
      for (int p = 0; p + 1 < np; p++) {
        Root a = roots[p][j];
        Root b = roots[p + 1][j];
        if (!a.converged() || !b.converged()) {
          continue;
        }
        for (double level : levels) {
          double fa = a.crossingFunction(level);
          double fb = b.crossingFunction(level);
          if ((fa < 0 && fb >= 0) || (fa > 0 && fb <= 0)) {
            crossings.add(refiner.refine(j, p, fa, level));
          }
        }
      }
    }
    crossings.sort(Comparator.comparingDouble(FlutterCrossing::pathParameter));
    return crossings;
  }
}
