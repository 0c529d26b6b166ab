package org.flexmargin.notch;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.InvalidInputException;

/**
 * The broken loop sampled once for notch design: at every sample (configuration, sweep point,
 * frequency shift) the two parts L_rest and L_path of L = L_rest + L_path prod N_i on frequency
 * grids that are dense around each structural mode and logarithmic over the rigid-body band, and
 * the rigid-body gain crossovers of the loop without the designed notches.
 *
 * <p>Grids are shared between samples (all sweep points of one configuration and shift use the same
 * grids), so a candidate notch set is evaluated once per grid. Immutable once built.
 */
public final class LoopSamples {
  /** Rigid-band grid density, points per decade. */
  static final int RIGID_POINTS_PER_DECADE = 60;

  private final List<double[]> grids;
  private final List<Sample> samples;
  private final List<String> modeNames;

  private LoopSamples(List<double[]> grids, List<Sample> samples, List<String> modeNames) {
    this.grids = List.copyOf(grids);
    this.samples = List.copyOf(samples);
    this.modeNames = List.copyOf(modeNames);
  }

  /** @return number of samples */
  public int size() {
    return samples.size();
  }

  /** @return the label of sample i */
  public SampleLabel label(int i) {
    return samples.get(i).label;
  }

  /** @return the structural mode names, union over samples, in first-seen order */
  public List<String> modeNames() {
    return modeNames;
  }

  /** @return the rigid-body gain crossovers of sample i without the designed notches, rad/s */
  public double[] crossoversRadPerS(int i) {
    return samples.get(i).crossovers.clone();
  }

  /** @return total complex loop values stored (for diagnostics) */
  public int storedValues() {
    int n = 0;
    for (Sample s : samples) {
      for (int g : s.modeGrid) {
        n += grids.get(g).length;
      }
      n += grids.get(s.rigidGrid).length;
    }
    return n;
  }

  List<double[]> grids() {
    return grids;
  }

  List<Sample> samples() {
    return samples;
  }

  /** One sample: both loop parts on the grids of its modes and its rigid band. */
  static final class Sample {
    final SampleLabel label;
    final int[] modeIndex;
    final int[] modeGrid;
    final double[][] restRe;
    final double[][] restIm;
    final double[][] pathRe;
    final double[][] pathIm;
    final int rigidGrid;
    final double[] rigidRestRe;
    final double[] rigidRestIm;
    final double[] rigidPathRe;
    final double[] rigidPathIm;
    final double[] crossovers;

    private Sample(SampleLabel label, int[] modeIndex, int[] modeGrid, double[][] restRe, double[][] restIm,
        double[][] pathRe, double[][] pathIm, int rigidGrid, double[] rr, double[] ri, double[] pr, double[] pi,
        double[] crossovers) {
      this.label = label;
      this.modeIndex = modeIndex;
      this.modeGrid = modeGrid;
      this.restRe = restRe;
      this.restIm = restIm;
      this.pathRe = pathRe;
      this.pathIm = pathIm;
      this.rigidGrid = rigidGrid;
      this.rigidRestRe = rr;
      this.rigidRestIm = ri;
      this.rigidPathRe = pr;
      this.rigidPathIm = pi;
      this.crossovers = crossovers;
    }
  }

  /** @return an empty builder */
  public static Builder builder() {
    return new Builder();
  }

  /** Collects grids and samples. Not thread-safe. */
  public static final class Builder {
    private final List<double[]> grids = new ArrayList<>();
    private final List<Sample> samples = new ArrayList<>();
    private final List<String> modeNames = new ArrayList<>();

    private Builder() {}

    /**
     * A grid dense around a structural mode: logarithmic over [f (1 - b), f (1 + b)] with a ratio
     * step of zeta / 2 between points (clamped to [0.002, 0.01]), so the half-power width 2 zeta f
     * holds at least four points and a sampled peak is within about 0.3 dB of the true one.
     *
     * @param frequencyHz mode frequency, Hz (&gt; 0)
     * @param dampingRatio mode damping ratio
     * @param bandFraction half-width b of the band as a fraction of f, in (0, 0.9)
     * @return the grid id
     */
    public int modeGrid(double frequencyHz, double dampingRatio, double bandFraction) {
      return modeGrid(frequencyHz, dampingRatio, frequencyHz * (1 - bandFraction), frequencyHz * (1 + bandFraction));
    }

    /**
     * A grid dense around a structural mode over [fromHz, toHz] (see {@link #modeGrid(double,
     * double, double)} for the spacing).
     *
     * @param frequencyHz mode frequency, Hz (&gt; 0)
     * @param dampingRatio mode damping ratio
     * @param fromHz low end of the band, Hz (&gt; 0)
     * @param toHz top of the band, Hz (&gt; fromHz)
     * @return the grid id
     */
    public int modeGrid(double frequencyHz, double dampingRatio, double fromHz, double toHz) {
      if (!(frequencyHz > 0) || !(fromHz > 0 && toHz > fromHz)) {
        throw new InvalidInputException("mode_grid", "frequency > 0 and a band 0 < from < to",
            frequencyHz + ", " + fromHz + ", " + toHz);
      }
      double step = Math.min(0.01, Math.max(0.002, dampingRatio / 2));
      double x0 = Math.log(2 * Math.PI * fromHz);
      double x1 = Math.log(2 * Math.PI * toHz);
      return addGrid(x0, x1, (int) Math.ceil((x1 - x0) / step) + 1);
    }

    /**
     * A logarithmic grid over the rigid-body band, 60 points per decade.
     *
     * @param fromHz low end, Hz (&gt; 0)
     * @param toHz top, Hz (&gt; fromHz)
     * @return the grid id
     */
    public int rigidGrid(double fromHz, double toHz) {
      if (!(fromHz > 0 && toHz > fromHz)) {
        throw new InvalidInputException("rigid_grid", "0 < from < to", fromHz + ", " + toHz);
      }
      double x0 = Math.log(2 * Math.PI * fromHz);
      double x1 = Math.log(2 * Math.PI * toHz);
      return addGrid(x0, x1, (int) Math.ceil((x1 - x0) / Math.log(10) * RIGID_POINTS_PER_DECADE) + 1);
    }

    private int addGrid(double x0, double x1, int n) {
      double[] w = new double[Math.max(n, 2)];
      for (int i = 0; i < w.length; i++) {
        w[i] = Math.exp(x0 + (x1 - x0) * i / (w.length - 1));
      }
      grids.add(w);
      return grids.size() - 1;
    }

    /**
     * Samples both loop parts of one sample.
     *
     * @param label where the sample was taken
     * @param rest L_rest(j w): the loop through the paths without designed notches (may be zero)
     * @param path L_path(j w): the loop through the carrying paths, without the designed notches
     * @param modes mode names, one per mode grid
     * @param modeGrids ids from {@link #modeGrid}
     * @param rigidGrid id from {@link #rigidGrid}
     * @return this builder
     */
    public Builder add(SampleLabel label, SisoFrequencyFunction rest, SisoFrequencyFunction path,
        List<String> modes, int[] modeGrids, int rigidGrid) {
      if (modes.size() != modeGrids.length) {
        throw new InvalidInputException("sample.modes", modeGrids.length + " mode names", String.valueOf(modes.size()));
      }
      int m = modes.size();
      int[] modeIndex = new int[m];
      double[][] rr = new double[m][];
      double[][] ri = new double[m][];
      double[][] pr = new double[m][];
      double[][] pi = new double[m][];
      double[] v = new double[2];
      for (int k = 0; k < m; k++) {
        int idx = modeNames.indexOf(modes.get(k));
        if (idx < 0) {
          modeNames.add(modes.get(k));
          idx = modeNames.size() - 1;
        }
        modeIndex[k] = idx;
        double[] w = grids.get(modeGrids[k]);
        rr[k] = new double[w.length];
        ri[k] = new double[w.length];
        pr[k] = new double[w.length];
        pi[k] = new double[w.length];
        for (int i = 0; i < w.length; i++) {
          rest.response(w[i], v);
          rr[k][i] = v[0];
          ri[k][i] = v[1];
          path.response(w[i], v);
          pr[k][i] = v[0];
          pi[k][i] = v[1];
        }
      }
      double[] w = grids.get(rigidGrid);
      double[] a = new double[w.length];
      double[] b = new double[w.length];
      double[] c = new double[w.length];
      double[] d = new double[w.length];
      for (int i = 0; i < w.length; i++) {
        rest.response(w[i], v);
        a[i] = v[0];
        b[i] = v[1];
        path.response(w[i], v);
        c[i] = v[0];
        d[i] = v[1];
      }
      double[] crossings = crossovers(w, a, b, c, d, rest, path);
      samples.add(new Sample(label, modeIndex, modeGrids.clone(), rr, ri, pr, pi, rigidGrid, a, b, c, d, crossings));
      return this;
    }

    /** Gain crossovers of rest + path on the rigid grid, refined by Brent's method in ln w. */
    private static double[] crossovers(double[] w, double[] a, double[] b, double[] c, double[] d,
        SisoFrequencyFunction rest, SisoFrequencyFunction path) {
      List<Double> out = new ArrayList<>();
      double[] v = new double[2];
      double[] u = new double[2];
      BrentSolver solver = new BrentSolver(1e-12, 1e-10);
      for (int i = 0; i + 1 < w.length; i++) {
        double g0 = Math.log(Math.hypot(a[i] + c[i], b[i] + d[i]));
        double g1 = Math.log(Math.hypot(a[i + 1] + c[i + 1], b[i + 1] + d[i + 1]));
        if ((g0 <= 0) == (g1 <= 0) || Double.isNaN(g0) || Double.isNaN(g1)) {
          continue;
        }
        double x = g0 == 0 ? Math.log(w[i]) : solver.solve(200, xx -> {
          double om = Math.exp(xx);
          rest.response(om, v);
          path.response(om, u);
          return Math.log(Math.hypot(v[0] + u[0], v[1] + u[1]));
        }, Math.log(w[i]), Math.log(w[i + 1]));
        out.add(Math.exp(x));
      }
      return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** @return the samples */
    public LoopSamples build() {
      if (samples.isEmpty()) {
        throw new InvalidInputException("samples", "at least one loop sample", "none");
      }
      return new LoopSamples(grids, samples, modeNames);
    }
  }
}
