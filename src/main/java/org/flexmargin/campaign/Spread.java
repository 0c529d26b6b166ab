package org.flexmargin.campaign;

import java.util.function.ToDoubleFunction;

/**
 * The 5, 50 and 95 % points of one speed over the computed samples of a group, onsets not found
 * in the sweep counted as beyond it (+infinity).
 *
 * @param quantity what the speed is, in words
 * @param computed samples computed (errors excluded)
 * @param found samples in which the onset lies inside the sweep (or, for divergence, was found)
 * @param p5EasMps 5 % point (m/s EAS), +infinity when beyond the sweep, NaN without samples
 * @param p50EasMps median (m/s EAS)
 * @param p95EasMps 95 % point (m/s EAS)
 * @param minEasMps lowest value found (m/s EAS), NaN when none
 */
public record Spread(String quantity, int computed, int found, double p5EasMps, double p50EasMps, double p95EasMps,
    double minEasMps) {

  /** @return the spread of {@code speed} over the computed outcomes */
  static Spread of(String quantity, Iterable<SampleOutcome> outcomes, ToDoubleFunction<SampleOutcome> speed) {
    int n = 0;
    for (SampleOutcome o : outcomes) {
      if (o.status() != SampleStatus.ERROR) {
        n++;
      }
    }
    double[] v = new double[n];
    int i = 0;
    int found = 0;
    double min = Double.NaN;
    for (SampleOutcome o : outcomes) {
      if (o.status() == SampleStatus.ERROR) {
        continue;
      }
      double s = speed.applyAsDouble(o);
      if (Double.isNaN(s)) {
        v[i++] = Double.POSITIVE_INFINITY;
      } else {
        v[i++] = s;
        found++;
        min = Double.isNaN(min) ? s : Math.min(min, s);
      }
    }
    return new Spread(quantity, n, found, Percentiles.of(v, 0.05), Percentiles.of(v, 0.5), Percentiles.of(v, 0.95),
        min);
  }
}
