package org.flexmargin.campaign;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * The 5, 50 and 95 % points of a loop margin at each grid speed over the samples of one cell
 * (samples in which the margin does not exist at that speed are left out at that speed).
 *
 * @param speedEasMps grid speeds (m/s EAS)
 * @param p5 5 % points (margin unit: dB or deg)
 * @param p50 medians
 * @param p95 95 % points
 * @param counts samples with the margin at each speed
 */
public record MarginBand(double[] speedEasMps, double[] p5, double[] p50, double[] p95, int[] counts) {
  /** Copies. */
  public MarginBand {
    speedEasMps = speedEasMps.clone();
    p5 = p5.clone();
    p50 = p50.clone();
    p95 = p95.clone();
    counts = counts.clone();
  }

  /**
   * @param outcomes samples of one cell (all with the same grid; others are skipped)
   * @param margin which margin of the curve
   * @return the band, empty when no sample has a curve
   */
  static MarginBand of(List<SampleOutcome> outcomes, Function<MarginCurve, double[]> margin) {
    double[] grid = null;
    List<double[]> curves = new ArrayList<>();
    for (SampleOutcome o : outcomes) {
      if (o.margins().size() == 0) {
        continue;
      }
      if (grid == null) {
        grid = o.margins().speedEasMps();
      }
      if (o.margins().size() == grid.length) {
        curves.add(margin.apply(o.margins()));
      }
    }
    if (grid == null) {
      return new MarginBand(new double[0], new double[0], new double[0], new double[0], new int[0]);
    }
    int n = grid.length;
    double[] a = new double[n];
    double[] b = new double[n];
    double[] c = new double[n];
    int[] k = new int[n];
    for (int i = 0; i < n; i++) {
      int at = i;
      double[] v = curves.stream().mapToDouble(x -> x[at]).filter(x -> !Double.isNaN(x)).toArray();
      k[i] = v.length;
      a[i] = Percentiles.of(v, 0.05);
      b[i] = Percentiles.of(v, 0.5);
      c[i] = Percentiles.of(v, 0.95);
    }
    return new MarginBand(grid, a, b, c, k);
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
}
