package org.flexmargin.campaign;

import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.CholeskyDecomposition_F64;
import org.flexmargin.model.Distribution;
import org.flexmargin.model.UncertainParameter;

/**
 * Draws the uncertain parameters of one Monte Carlo sample. Correlation acts on the normal
 * scores (a Gaussian copula): independent standard normals z are correlated as y = L z with
 * {@code L L^T} the correlation matrix (Cholesky), and each y_i is mapped to its distribution
 * through the standard normal CDF Phi and the distribution's quantile function. For normal
 * parameters this is exactly a multivariate normal with that correlation.
 *
 * <p>Sample {@code s} uses its own generator, seeded by a SplitMix64 hash of (seed, s), so every
 * sample is reproducible alone, in any order, on any engine and any number of workers.
 * Instances are immutable and thread-safe.
 */
public final class Sampler {
  private static final NormalDistribution STANDARD = new NormalDistribution(null, 0.0, 1.0,
      NormalDistribution.DEFAULT_INVERSE_ABSOLUTE_ACCURACY);
  private final List<UncertainParameter> parameters;
  private final double[] lower;
  private final long seed;

  /**
   * @param parameters the parameters, in order
   * @param correlation their correlation matrix (n x n, positive definite)
   * @param seed campaign seed
   */
  public Sampler(List<UncertainParameter> parameters, double[][] correlation, long seed) {
    this.parameters = List.copyOf(parameters);
    this.seed = seed;
    int n = parameters.size();
    this.lower = new double[n * n];
    if (n > 0) {
      CholeskyDecomposition_F64<DMatrixRMaj> chol = DecompositionFactory_DDRM.chol(n, true);
      if (!chol.decompose(new DMatrixRMaj(correlation))) {
        throw new IllegalArgumentException("correlation matrix is not positive definite");
      }
      DMatrixRMaj l = chol.getT(null);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j <= i; j++) {
          lower[i * n + j] = l.get(i, j);
        }
      }
    }
  }

  /** @return the 64-bit seed of sample {@code sample}'s generator (SplitMix64 finaliser of both) */
  static long sampleSeed(long seed, long sample) {
    long z = seed + 0x9E3779B97F4A7C15L * (sample + 1);
    z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
    z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
    return z ^ (z >>> 31);
  }

  /**
   * @param sample Monte Carlo sample index, &gt;= 0
   * @return the parameters' values for that sample, in parameter order (factor or seconds)
   */
  public double[] draw(long sample) {
    int n = parameters.size();
    SplittableRandom rng = new SplittableRandom(sampleSeed(seed, sample));
    double[] z = new double[n];
    for (int i = 0; i < n; i++) {
      // an open-interval uniform (never 0 or 1), then its normal score
      double u = ((rng.nextLong() >>> 11) + 0.5) * 0x1.0p-53;
      z[i] = STANDARD.inverseCumulativeProbability(u);
    }
    double[] out = new double[n];
    for (int i = 0; i < n; i++) {
      double y = 0;
      for (int j = 0; j <= i; j++) {
        y += lower[i * n + j] * z[j];
      }
      out[i] = value(parameters.get(i).distribution(), y);
    }
    return out;
  }

  /** @return the value of {@code d} whose normal score is {@code y} (quantile at Phi(y)) */
  static double value(Distribution d, double y) {
    if (d instanceof Distribution.Normal n) {
      return n.mean() + n.standardDeviation() * y;
    }
    if (d instanceof Distribution.Uniform u) {
      return u.low() + (u.high() - u.low()) * STANDARD.cumulativeProbability(y);
    }
    if (d instanceof Distribution.TruncatedNormal t) {
      double a = STANDARD.cumulativeProbability((t.low() - t.mean()) / t.standardDeviation());
      double b = STANDARD.cumulativeProbability((t.high() - t.mean()) / t.standardDeviation());
      double p = a + (b - a) * STANDARD.cumulativeProbability(y);
      double x = t.mean() + t.standardDeviation() * STANDARD.inverseCumulativeProbability(p);
      return Math.min(t.high(), Math.max(t.low(), x));
    }
    Distribution.LogNormal l = (Distribution.LogNormal) d;
    return l.median() * Math.exp(l.logStandardDeviation() * y);
  }
}
