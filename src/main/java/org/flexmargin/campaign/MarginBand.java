package org.flexmargin.campaign;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Function;

/**
 * The 5, 50 and 95 % points of a loop margin at each grid speed over the samples of one cell.
 * A sample whose closed loop is unstable at a speed (its closed-loop onset at or below that speed)
 * has lost the margin there: it counts as minus infinity, so a percentile that reaches the unstable
 * samples is minus infinity (drawn as the end of that band line) instead of jumping to the margins
 * of the samples that are still stable. Samples in which the margin does not exist at a speed (no
 * crossover there) are left out at that speed.
 *
 * @param speedEasMps grid speeds (m/s EAS)
 * @param p5 5 % points (margin unit: dB or deg; minus infinity where lost)
 * @param p50 medians
 * @param p95 95 % points
 * @param counts samples with the margin at each speed, the unstable ones included
 * @param unstable samples whose closed loop is unstable at each speed
 */
public record MarginBand(double[] speedEasMps, double[] p5, double[] p50, double[] p95, int[] counts,
    int[] unstable) {
  /** Validates equal lengths and copies. */
  public MarginBand {
    int n = speedEasMps.length;
    if (p5.length != n || p50.length != n || p95.length != n || counts.length != n || unstable.length != n) {
      throw new IllegalArgumentException("margin band arrays of different lengths");
    }
    speedEasMps = speedEasMps.clone();
    p5 = p5.clone();
    p50 = p50.clone();
    p95 = p95.clone();
    counts = counts.clone();
    unstable = unstable.clone();
  }

  /**
   * @param outcomes samples of one cell (all with the same grid; others are skipped)
   * @param margin which margin of the curve
   * @return the band, empty when no sample has a curve
   */
  static MarginBand of(List<SampleOutcome> outcomes, Function<MarginCurve, double[]> margin) {
    double[] grid = null;
    List<SampleOutcome> used = new ArrayList<>();
    List<double[]> curves = new ArrayList<>();
    for (SampleOutcome o : outcomes) {
      if (o.margins().size() == 0) {
        continue;
      }
      if (grid == null) {
        grid = o.margins().speedEasMps();
      }
      if (o.margins().size() == grid.length) {
        used.add(o);
        curves.add(margin.apply(o.margins()));
      }
    }
    if (grid == null) {
      return new MarginBand(new double[0], new double[0], new double[0], new double[0], new int[0], new int[0]);
    }
    int n = grid.length;
    double[] a = new double[n];
    double[] b = new double[n];
    double[] c = new double[n];
    int[] k = new int[n];
    int[] lost = new int[n];
    double[] v = new double[curves.size()];
    for (int i = 0; i < n; i++) {
      int m = 0;
      for (int s = 0; s < curves.size(); s++) {
        double x = curves.get(s)[i];
        if (used.get(s).closedLoopOnsetEasMps() <= grid[i]) { // false for NaN: no closed-loop onset in the sweep
          v[m++] = Double.NEGATIVE_INFINITY;
          lost[i]++;
        } else if (!Double.isNaN(x)) {
          v[m++] = x;
        }
      }
      double[] here = Arrays.copyOf(v, m);
      k[i] = m;
      a[i] = Percentiles.of(here, 0.05);
      b[i] = Percentiles.of(here, 0.5);
      c[i] = Percentiles.of(here, 0.95);
    }
    return new MarginBand(grid, a, b, c, k, lost);
  }

  @Override
  public double[] speedEasMps() {
    return speedEasMps.clone();
  }

  @Override
  public double[] p5() {
    return p5.clone();
  }

  @Override
  public double[] p50() {
    return p50.clone();
  }

  @Override
  public double[] p95() {
    return p95.clone();
  }

  @Override
  public int[] counts() {
    return counts.clone();
  }

  @Override
  public int[] unstable() {
    return unstable.clone();
  }
}
