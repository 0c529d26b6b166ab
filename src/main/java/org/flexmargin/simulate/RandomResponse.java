package org.flexmargin.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.loop.StateSpace;

/**
 * Response of a stable linear system to unit-intensity white noise at one input: the exact RMS of
 * every output from the stationary covariance (Lyapunov equation), and a simulated record from a
 * seeded generator with the exact sampled noise (Van Loan), started from a draw of the stationary
 * distribution so that there is no start-up transient. The simulated mean square of each output
 * comes with its standard error computed from the exact autocovariance R(k) = C Ad^k P C^T of the
 * sampled process: Var(mean of y^2) = (2/N) sum_{|k| &lt; N} (1 - |k|/N) R(k)^2 for a zero-mean
 * Gaussian process (Bendat &amp; Piersol, <i>Random Data</i>, 4th ed., sec. 8.2). Stateless.
 */
public final class RandomResponse {
  private RandomResponse() {}

  /**
   * @param system the system; input {@code noiseInput} is driven by the noise, the others are zero;
   *     no feed-through from the noise input
   * @param noiseInput index of the noise input
   * @param stepS sample period (s)
   * @param steps number of steps of the record
   * @param seed seed of the generator
   * @return exact and simulated RMS of every output, and the record
   */
  public static Result run(StateSpace system, int noiseInput, double stepS, int steps, long seed) {
    return run(system, new int[] {noiseInput}, stepS, steps, seed);
  }

  /**
   * As {@link #run(StateSpace, int, double, int, long)} with several independent unit-intensity
   * white-noise inputs (intensity matrix the identity).
   *
   * @param system the system; no feed-through from the noise inputs
   * @param noiseInputs indices of the noise inputs
   * @param stepS sample period (s)
   * @param steps number of steps of the record
   * @param seed seed of the generator
   * @return exact and simulated RMS of every output, and the record
   */
  public static Result run(StateSpace system, int[] noiseInputs, double stepS, int steps, long seed) {
    int n = system.stateCount();
    DMatrixRMaj gwg = new DMatrixRMaj(n, n);
    for (int noiseInput : noiseInputs) {
      for (int o = 0; o < system.outputCount(); o++) {
        if (system.d().get(o, noiseInput) != 0) {
          throw new IllegalArgumentException("output " + system.outputNames().get(o)
              + " has a direct feed-through of white noise: infinite variance");
        }
      }
      DMatrixRMaj g = CommonOps_DDRM.extract(system.b(), 0, n, noiseInput, noiseInput + 1);
      DMatrixRMaj ggT = new DMatrixRMaj(n, n);
      CommonOps_DDRM.multTransB(g, g, ggT);
      CommonOps_DDRM.addEquals(gwg, ggT);
    }
    StationaryCovariance cov = StationaryCovariance.of(system.a(), gwg, stepS);
    DMatrixRMaj p = cov.covariance();
    DMatrixRMaj c = system.c();
    DMatrixRMaj f = StationaryCovariance.squareRoot(cov.stepCovariance());
    DMatrixRMaj f0 = StationaryCovariance.squareRoot(p);
    SplittableRandom random = new SplittableRandom(seed);
    double[] x0 = draw(f0, random);
    double[] draw = new double[n];
    LinearSimulation.ProcessNoise noise = state -> {
      for (int i = 0; i < n; i++) {
        draw[i] = random.nextGaussian();
      }
      for (int i = 0; i < n; i++) {
        double s = 0;
        for (int j = 0; j < n; j++) {
          s += f.get(i, j) * draw[j];
        }
        state[i] += s;
      }
    };
    List<java.util.function.DoubleUnaryOperator> none = new ArrayList<>();
    for (int i = 0; i < system.inputCount(); i++) {
      none.add(null);
    }
    TimeHistory history = LinearSimulation.run(system, new ExactDiscretization(stepS, cov.stateTransition(),
        new DMatrixRMaj(n, system.inputCount())), steps, none, x0, noise);
    int outputs = system.outputCount();
    double[] exact = new double[outputs];
    double[] simulated = new double[outputs];
    double[] standardError = new double[outputs];
    List<DMatrixRMaj> powers = StationaryCovariance.powersOf(cov.stateTransition());
    DMatrixRMaj pct = new DMatrixRMaj(n, outputs);
    CommonOps_DDRM.multTransB(p, c, pct);
    int samples = history.sampleCount();
    for (int o = 0; o < outputs; o++) {
      double r0 = 0;
      for (int j = 0; j < n; j++) {
        r0 += c.get(o, j) * pct.get(j, o);
      }
      exact[o] = Math.sqrt(Math.max(0, r0));
      simulated[o] = history.rms(history.names().get(o), 0.0);
      standardError[o] = meanSquareStandardError(c, o, powers, pct, r0, samples);
    }
    return new Result(system.outputNames(), exact, simulated, standardError, history);
  }

  /**
   * Standard error of the sample mean square of output o. With R(k) = c Ad^k h, h = P c^T,
   * sum_k R(k)^2 = c X c^T where X = Ad X Ad^T + h h^T (a discrete Lyapunov equation, solved by
   * the same doubling). The weights (1 - |k|/N) are taken as 1, which slightly overstates the
   * error (conservative) and is exact as N grows past the correlation time.
   */
  private static double meanSquareStandardError(DMatrixRMaj c, int o, List<DMatrixRMaj> powers, DMatrixRMaj pct,
      double r0, int samples) {
    int n = pct.numRows;
    DMatrixRMaj h = CommonOps_DDRM.extract(pct, 0, n, o, o + 1);
    DMatrixRMaj hh = new DMatrixRMaj(n, n);
    CommonOps_DDRM.multTransB(h, h, hh);
    DMatrixRMaj x = StationaryCovariance.sum(powers, hh);
    double oneSided = 0;
    for (int i = 0; i < n; i++) {
      double ci = c.get(o, i);
      if (ci == 0) {
        continue;
      }
      for (int j = 0; j < n; j++) {
        oneSided += ci * x.get(i, j) * c.get(o, j);
      }
    }
    double twoSided = Math.max(r0 * r0, 2 * oneSided - r0 * r0);
    return Math.sqrt(2 * twoSided / samples);
  }

  private static double[] draw(DMatrixRMaj f, SplittableRandom random) {
    int n = f.numRows;
    double[] z = new double[n];
    for (int i = 0; i < n; i++) {
      z[i] = random.nextGaussian();
    }
    double[] x = new double[n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        x[i] += f.get(i, j) * z[j];
      }
    }
    return x;
  }

  /**
   * Exact and simulated RMS per output.
   *
   * @param names output names
   * @param exactRms RMS from the stationary covariance (unit of each output)
   * @param simulatedRms RMS of the simulated record
   * @param meanSquareStandardError standard error of the simulated mean square (unit squared)
   * @param history the simulated record
   */
  public record Result(List<String> names, double[] exactRms, double[] simulatedRms,
      double[] meanSquareStandardError, TimeHistory history) {
    /** Copies. */
    public Result {
      names = List.copyOf(names);
      exactRms = exactRms.clone();
      simulatedRms = simulatedRms.clone();
      meanSquareStandardError = meanSquareStandardError.clone();
    }

    /**
     * Half-width of the approximate 95 % confidence interval of the simulated RMS (delta method:
     * 1.96 se / (2 rms)).
     *
     * @param output output index
     * @return half-width (unit of the output)
     */
    public double rmsHalfWidth95(int output) {
      return 1.96 * meanSquareStandardError[output] / (2 * Math.max(simulatedRms[output], 1e-300));
    }

    /** @return copy */
    @Override
    public double[] exactRms() {
      return exactRms.clone();
    }

    /** @return copy */
    @Override
    public double[] simulatedRms() {
      return simulatedRms.clone();
    }

    /** @return copy */
    @Override
    public double[] meanSquareStandardError() {
      return meanSquareStandardError.clone();
    }
  }
}
