package org.flexmargin.aero;

import org.ejml.data.ZMatrixRMaj;

/**
 * An {@link AeroSource} that tabulates another source's Q(ik) once and interpolates it, for the
 * many evaluations of the frequency-domain loop (margins, structural peaks, Bode and Nichols
 * charts, onset refinement), where the exact source would be rebuilt at every (speed, frequency)
 * pair although Q depends only on k.
 *
 * <h2>Method and accuracy</h2>
 *
 * Nodes are uniform in u = ln k with spacing h from {@code kLow} to {@code kHigh} (plus one node
 * beyond each end); between nodes every entry is interpolated by the cubic Lagrange polynomial
 * through the four surrounding nodes (uniform spacing in u). Working in ln k keeps the relative
 * spacing constant, which suits Theodorsen's function with its k ln k behaviour near k = 0 and
 * the k<sup>2</sup> growth of the apparent-mass terms. The interpolation error of the cubic through
 * four equally spaced nodes is h<sup>4</sup> (t+1) t (t-1) (t-2) f''''(u) / 24 (Abramowitz and
 * Stegun, <i>Handbook of Mathematical Functions</i>, eq. 25.2.13 with its remainder 25.2.14 for
 * n = 3), largest in the central interval at t = 1/2, where |(t+1) t (t-1) (t-2)| = 9/16. The
 * constructor therefore compares the interpolant with the exact source at the midpoint of every
 * interval; an interval whose error there exceeds {@code tolerance} times the largest |Q<sub>ij</sub>|
 * at that midpoint is marked, and k in a marked interval is evaluated exactly. Below
 * {@code kLow}, above {@code kHigh} and at k = 0 the exact source is used. The achieved worst
 * midpoint error and the number of exact intervals are available for reports.
 *
 * <p>Cost: building takes about 2 ln(kHigh/kLow)/h exact evaluations; each interpolated
 * evaluation is one logarithm and 4 x 2 n<sup>2</sup> multiply-adds, independent of the number of
 * strips. Memory: 2 n<sup>2</sup> doubles per node. Immutable and thread-safe.
 */
public final class ReducedFrequencyInterpolant implements AeroSource {
  private final AeroSource exact;
  private final int n;
  private final double logLow;
  private final double step;
  private final double kLow;
  private final double kHigh;
  /** Node values, [node][2 n^2] interleaved re/im as in {@link ZMatrixRMaj#data}. */
  private final double[][] nodes;
  /** Intervals [node i, node i+1] evaluated exactly because the midpoint check failed. */
  private final boolean[] exactInterval;
  private final double worstRelativeError;
  private final int exactIntervals;

  /**
   * Tabulates {@code exact} and checks every interval.
   *
   * @param exact the source to tabulate (must be immutable and smooth in k on the range)
   * @param kLow lowest interpolated reduced frequency, &gt; 0 and at least the source's minimum
   * @param kHigh highest interpolated reduced frequency, &gt; kLow and at most the source's maximum
   * @param stepLn node spacing h in ln k, in (0, 0.5]
   * @param tolerance accepted midpoint error relative to the largest |Q_ij| there, &gt; 0
   */
  public ReducedFrequencyInterpolant(AeroSource exact, double kLow, double kHigh, double stepLn, double tolerance) {
    if (!(kLow > 0) || !(kHigh > kLow) || Double.isInfinite(kHigh)) {
      throw new IllegalArgumentException("need 0 < kLow < kHigh < infinity, found " + kLow + ", " + kHigh);
    }
    if (kLow < exact.minReducedFrequency() || kHigh > exact.maxReducedFrequency()) {
      throw new IllegalArgumentException("range [" + kLow + ", " + kHigh + "] outside the source's ["
          + exact.minReducedFrequency() + ", " + exact.maxReducedFrequency() + "]");
    }
    if (!(stepLn > 0 && stepLn <= 0.5) || !(tolerance > 0)) {
      throw new IllegalArgumentException("step in ln k must be in (0, 0.5] and tolerance > 0, found "
          + stepLn + ", " + tolerance);
    }
    this.exact = exact;
    this.n = exact.size();
    this.kLow = kLow;
    this.kHigh = kHigh;
    this.step = stepLn;
    int intervals = (int) Math.ceil(Math.log(kHigh / kLow) / stepLn);
    // one node below kLow and one above kHigh, so every interval inside has four nodes around it
    this.logLow = Math.log(kLow) - stepLn;
    int count = intervals + 3;
    this.nodes = new double[count][];
    ZMatrixRMaj q = new ZMatrixRMaj(n, n);
    for (int i = 0; i < count; i++) {
      double k = Math.exp(logLow + i * stepLn);
      exact.forces(Math.max(exact.minReducedFrequency(), Math.min(exact.maxReducedFrequency(), k)), q);
      nodes[i] = q.data.clone();
    }
    this.exactInterval = new boolean[count - 1];
    double[] interpolated = new double[2 * n * n];
    double worst = 0;
    int fallback = 0;
    for (int i = 1; i <= intervals; i++) {
      double k = Math.exp(logLow + (i + 0.5) * stepLn);
      exact.forces(k, q);
      interpolate(i, 0.5, interpolated);
      double scale = 0;
      double err = 0;
      for (int e = 0; e < 2 * n * n; e += 2) {
        scale = Math.max(scale, Math.hypot(q.data[e], q.data[e + 1]));
        err = Math.max(err, Math.hypot(q.data[e] - interpolated[e], q.data[e + 1] - interpolated[e + 1]));
      }
      double rel = scale > 0 ? err / scale : err;
      if (rel > tolerance) {
        exactInterval[i] = true;
        fallback++;
      } else {
        worst = Math.max(worst, rel);
      }
    }
    this.worstRelativeError = worst;
    this.exactIntervals = fallback;
  }

  /** Cubic Lagrange interpolation in interval i (nodes i-1..i+2) at fraction t of it. */
  private void interpolate(int i, double t, double[] out) {
    double w0 = -t * (t - 1) * (t - 2) / 6;
    double w1 = (t + 1) * (t - 1) * (t - 2) / 2;
    double w2 = -(t + 1) * t * (t - 2) / 2;
    double w3 = (t + 1) * t * (t - 1) / 6;
    double[] a = nodes[i - 1];
    double[] b = nodes[i];
    double[] c = nodes[i + 1];
    double[] d = nodes[i + 2];
    for (int e = 0; e < a.length; e++) {
      out[e] = w0 * a[e] + w1 * b[e] + w2 * c[e] + w3 * d[e];
    }
  }

  @Override
  public int size() {
    return n;
  }

  @Override
  public double referenceSemichordM() {
    return exact.referenceSemichordM();
  }

  @Override
  public double minReducedFrequency() {
    return exact.minReducedFrequency();
  }

  @Override
  public double maxReducedFrequency() {
    return exact.maxReducedFrequency();
  }

  /**
   * Interpolated Q(ik) on [kLow, kHigh] outside the intervals that failed the check; the exact
   * source elsewhere.
   */
  @Override
  public void forces(double reducedFrequency, ZMatrixRMaj out) {
    if (!(reducedFrequency >= kLow && reducedFrequency <= kHigh)) {
      exact.forces(reducedFrequency, out);
      return;
    }
    double x = (Math.log(reducedFrequency) - logLow) / step;
    int i = Math.max(1, Math.min(nodes.length - 3, (int) Math.floor(x)));
    if (exactInterval[i]) {
      exact.forces(reducedFrequency, out);
      return;
    }
    out.reshape(n, n);
    interpolate(i, x - i, out.data);
  }

  /** @return the largest midpoint error found, relative to the largest |Q_ij| (intervals kept) */
  public double worstRelativeError() {
    return worstRelativeError;
  }

  /** @return the number of intervals evaluated exactly because they failed the check */
  public int exactIntervals() {
    return exactIntervals;
  }

  /** @return the interpolated range [kLow, kHigh] */
  public double[] range() {
    return new double[] {kLow, kHigh};
  }

  @Override
  public String description() {
    return exact.description();
  }
}
