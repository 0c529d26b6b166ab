package org.flexmargin.simulate;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.loop.StateSpace;

/**
 * Time response of a linear system by its exact discretisation ({@link ExactDiscretization}): on
 * each step the input is held at its value at the middle of the step (second-order accurate for
 * smooth inputs, exact for inputs that change only on the sample grid); the state transition
 * itself has no truncation error, so stiff systems need no small steps. Optionally driven by
 * discrete process noise x[k+1] += F n[k], n standard normal. Stateless.
 */
public final class LinearSimulation {
  private LinearSimulation() {}

  /**
   * @param system the continuous system
   * @param stepS sample period T (s)
   * @param steps number of steps (the history has steps + 1 samples, t = 0 .. steps T)
   * @param inputs one input history per input of the system (null entries are zero)
   * @param initialState x(0), or null for zero
   * @param noise optional process noise (null for none)
   * @return the outputs of the system, named as its outputs
   */
  public static TimeHistory run(StateSpace system, double stepS, int steps, List<DoubleUnaryOperator> inputs,
      double[] initialState, ProcessNoise noise) {
    ExactDiscretization disc = ExactDiscretization.of(system, stepS);
    return run(system, disc, steps, inputs, initialState, noise);
  }

  /**
   * As {@link #run(StateSpace, double, int, List, double[], ProcessNoise)} with a discretisation
   * computed beforehand (shared between runs of the same system).
   *
   * @param system the continuous system
   * @param disc its exact discretisation
   * @param steps number of steps
   * @param inputs one input history per input (null entries are zero)
   * @param initialState x(0), or null for zero
   * @param noise optional process noise (null for none)
   * @return the outputs
   */
  public static TimeHistory run(StateSpace system, ExactDiscretization disc, int steps,
      List<DoubleUnaryOperator> inputs, double[] initialState, ProcessNoise noise) {
    int n = system.stateCount();
    int m = system.inputCount();
    int p = system.outputCount();
    if (inputs.size() != m) {
      throw new IllegalArgumentException(inputs.size() + " input histories for " + m + " inputs");
    }
    if (steps < 1) {
      throw new IllegalArgumentException("at least one step, found " + steps);
    }
    double t = disc.periodS();
    double[] ad = disc.stateTransition().data;
    double[] bd = disc.inputMatrix().data;
    double[] c = system.c().data;
    double[] d = system.d().data;
    double[] x = initialState == null ? new double[n] : initialState.clone();
    if (x.length != n) {
      throw new IllegalArgumentException("initial state of length " + x.length + " for " + n + " states");
    }
    double[] next = new double[n];
    double[] u = new double[m];
    double[] times = new double[steps + 1];
    double[][] y = new double[p][steps + 1];
    for (int k = 0; k <= steps; k++) {
      double tk = k * t;
      times[k] = tk;
      sample(inputs, tk, u);
      outputs(c, d, x, u, y, k);
      if (k == steps) {
        break;
      }
      sample(inputs, tk + 0.5 * t, u);
      for (int i = 0; i < n; i++) {
        double s = 0;
        for (int j = 0; j < n; j++) {
          s += ad[i * n + j] * x[j];
        }
        for (int j = 0; j < m; j++) {
          s += bd[i * m + j] * u[j];
        }
        next[i] = s;
      }
      if (noise != null) {
        noise.addTo(next);
      }
      double[] swap = x;
      x = next;
      next = swap;
    }
    return new TimeHistory(times, system.outputNames(), y);
  }

  /** y[i][k] = (C x + D u)_i for every output i; C and D row-major (p x n, p x m). */
  static void outputs(double[] c, double[] d, double[] x, double[] u, double[][] y, int k) {
    int n = x.length;
    int m = u.length;
    for (int i = 0; i < y.length; i++) {
      double s = 0;
      for (int j = 0; j < n; j++) {
        s += c[i * n + j] * x[j];
      }
      for (int j = 0; j < m; j++) {
        s += d[i * m + j] * u[j];
      }
      y[i][k] = s;
    }
  }

  /** u[j] = inputs[j](t), null inputs zero. */
  static void sample(List<DoubleUnaryOperator> inputs, double timeS, double[] u) {
    for (int j = 0; j < u.length; j++) {
      DoubleUnaryOperator f = inputs.get(j);
      u[j] = f == null ? 0.0 : f.applyAsDouble(timeS);
    }
  }

  /** Discrete process noise added to the state on every step; stateful (owns its generator). */
  public interface ProcessNoise {
    /**
     * Adds one draw to the state.
     *
     * @param state the state after the deterministic update. Modified.
     */
    void addTo(double[] state);
  }
}
