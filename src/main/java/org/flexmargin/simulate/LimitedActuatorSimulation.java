package org.flexmargin.simulate;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.ejml.dense.row.CommonOps_DDRM;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.apache.commons.math3.ode.sampling.StepNormalizerMode;

/**
 * Simulation of a linear system whose actuator has rate and position limits, with Commons Math's
 * adaptive Dormand-Prince 5(4) integrator (Dormand &amp; Prince, J. Comput. Appl. Math. 6(1),
 * 1980): the step size is controlled by the embedded error estimate and reported
 * ({@link IntegrationDiagnostics}); outputs are interpolated onto a fixed output grid.
 *
 * <p>Actuator model: the command is clipped to the position limit; first order: delta' =
 * clip(w (u - delta), +/-R); second order: the rate state obeys delta'' = w^2 (u - delta) - 2 zeta
 * w delta' but is held at +/-R while the acceleration pushes it further, and the position moves at
 * the clipped rate; the position stops at +/-P (an integrated position a step past the stop is
 * seen as at the stop). With no finite limit this is the linear system.
 * Stateless.
 */
public final class LimitedActuatorSimulation {
  /** Relative tolerance per step. */
  public static final double RELATIVE_TOLERANCE = 1e-7;
  /** Absolute tolerance per step (unit of each state). */
  public static final double ABSOLUTE_TOLERANCE = 1e-9;

  private LimitedActuatorSimulation() {}

  /**
   * @param spec the system and its actuator
   * @param limits the limits
   * @param outputStepS output sample period (s); also the largest integration step
   * @param steps number of output steps (the history has steps + 1 samples)
   * @param inputs one input history per input of the system (null entries are zero)
   * @param initialState x(0), or null for zero
   * @return outputs (the rate output replaced by the limited rate) and integration diagnostics
   */
  public static Result run(LimitedActuatorSystem spec, ActuatorLimits limits, double outputStepS, int steps,
      List<DoubleUnaryOperator> inputs, double[] initialState) {
    var system = spec.system();
    int n = system.stateCount();
    int p = system.outputCount();
    LimitedDynamics ode = new LimitedDynamics(spec, limits, inputs);
    double[] times = new double[steps + 1];
    double[][] y = new double[p][steps + 1];
    int[] count = {0};
    double[] c = system.c().data;
    double[] d = system.d().data;
    double[] sampleWork = new double[n];
    double[] u = new double[system.inputCount()];
    StepHandler sampler = new StepNormalizer(outputStepS, new FixedStepHandler() {
      @Override
      public void init(double t0, double[] y0, double t) {}

      @Override
      public void handleStep(double t, double[] state, double[] xDot, boolean isLast) {
        double[] x = atStop(state, ode.pos, ode.posLimit, sampleWork);
        int k = count[0];
        if (k > steps) {
          return;
        }
        times[k] = k * outputStepS;
        LinearSimulation.sample(inputs, t, u);
        double rate = ode.actuator(x, u, null);
        LinearSimulation.outputs(c, d, x, u, y, k);
        if (spec.rateOutput() >= 0) {
          y[spec.rateOutput()][k] = rate;
        }
        count[0]++;
      }
    }, StepNormalizerMode.MULTIPLES, StepNormalizerBounds.BOTH);
    StepStatistics stats = new StepStatistics();
    DormandPrince54Integrator integrator = new DormandPrince54Integrator(1e-10, outputStepS, ABSOLUTE_TOLERANCE,
        RELATIVE_TOLERANCE);
    integrator.addStepHandler(sampler);
    integrator.addStepHandler(stats);
    double[] x = initialState == null ? new double[n] : initialState.clone();
    integrator.integrate(ode, 0.0, x, steps * outputStepS, x);
    if (count[0] != steps + 1) {
      throw new IllegalStateException("output grid: " + count[0] + " samples for " + (steps + 1));
    }
    IntegrationDiagnostics diag = new IntegrationDiagnostics(stats.accepted, integrator.getEvaluations(),
        stats.smallest, stats.largest, stats.accepted == 0 ? 0 : steps * outputStepS / stats.accepted,
        RELATIVE_TOLERANCE, ABSOLUTE_TOLERANCE);
    return new Result(new TimeHistory(times, system.outputNames(), y), diag);
  }

  /**
   * The state with the position held at the stop: the integrated position may step a little past
   * it before the stop takes effect; nothing downstream sees that.
   */
  private static double[] atStop(double[] x, int pos, double limit, double[] work) {
    if (Math.abs(x[pos]) <= limit) {
      return x;
    }
    System.arraycopy(x, 0, work, 0, x.length);
    work[pos] = clip(x[pos], limit);
    return work;
  }

  static double clip(double v, double limit) {
    return v > limit ? limit : (v < -limit ? -limit : v);
  }

  /**
   * The right-hand side: the linear rows through their nonzero entries ({@link SparseRows}), no
   * allocation per call, then the actuator's rows with their limits.
   */
  private static final class LimitedDynamics implements FirstOrderDifferentialEquations {
    private final int n;
    private final SparseRows a;
    private final SparseRows b;
    private final SparseRows command;
    private final SparseRows commandFeedthrough;
    private final List<DoubleUnaryOperator> inputs;
    private final double[] u;
    private final double[] work;
    private final double rateLimit;
    private final double posLimit;
    private final int pos;
    private final int rateState;
    private final double w;
    private final double zeta;

    LimitedDynamics(LimitedActuatorSystem spec, ActuatorLimits limits, List<DoubleUnaryOperator> inputs) {
      var system = spec.system();
      this.n = system.stateCount();
      this.a = SparseRows.of(system.a());
      this.b = SparseRows.of(system.b());
      int cmd = spec.commandOutput();
      this.command = SparseRows.of(CommonOps_DDRM.extractRow(system.c(), cmd, null));
      this.commandFeedthrough = SparseRows.of(CommonOps_DDRM.extractRow(system.d(), cmd, null));
      this.inputs = inputs;
      this.u = new double[system.inputCount()];
      this.work = new double[n];
      this.rateLimit = limits.rateLimitRadPerS();
      this.posLimit = limits.positionLimitRad();
      this.pos = spec.positionState();
      this.rateState = spec.rateState();
      this.w = spec.omegaRadPerS();
      this.zeta = spec.dampingRatio();
    }

    @Override
    public int getDimension() {
      return n;
    }

    @Override
    public void computeDerivatives(double t, double[] state, double[] dx) {
      double[] x = atStop(state, pos, posLimit, work);
      LinearSimulation.sample(inputs, t, u);
      for (int i = 0; i < n; i++) {
        dx[i] = b.rowTimes(i, u, a.rowTimes(i, x, 0));
      }
      dx[pos] = actuator(x, u, dx);
    }

    /**
     * The actuator with its limits: the command clipped to the position limit, the rate (first
     * order) or the rate state's derivative (second order, written to dx) held at the rate limit,
     * no motion into a stop.
     *
     * @param x the state, position at most at its stop
     * @param inputs the inputs at the same time
     * @param dx the derivative, for a second-order actuator's rate state; null to skip it
     * @return the achieved rate delta' (rad/s)
     */
    double actuator(double[] x, double[] inputs, double[] dx) {
      double cmd = clip(commandFeedthrough.rowTimes(0, inputs, command.rowTimes(0, x, 0)), posLimit);
      double delta = x[pos];
      double rate;
      if (rateState < 0) {
        rate = clip(w * (cmd - delta), rateLimit);
      } else {
        double r = x[rateState];
        double acc = w * w * (cmd - delta) - 2 * zeta * w * r;
        if ((r >= rateLimit && acc > 0) || (r <= -rateLimit && acc < 0)) {
          acc = 0;
        }
        if (dx != null) {
          dx[rateState] = acc;
        }
        rate = clip(r, rateLimit);
      }
      if ((delta >= posLimit && rate > 0) || (delta <= -posLimit && rate < 0)) {
        rate = 0;
      }
      return rate;
    }
  }

  /** Accepted-step statistics. */
  private static final class StepStatistics implements StepHandler {
    int accepted;
    double smallest = Double.MAX_VALUE;
    double largest;

    @Override
    public void init(double t0, double[] y0, double t) {}

    @Override
    public void handleStep(StepInterpolator interpolator, boolean isLast) {
      double h = Math.abs(interpolator.getCurrentTime() - interpolator.getPreviousTime());
      accepted++;
      if (!isLast || accepted == 1) {
        smallest = Math.min(smallest, h);
      }
      largest = Math.max(largest, h);
    }
  }

  /**
   * @param history the outputs on the output grid
   * @param diagnostics how the integration went
   */
  public record Result(TimeHistory history, IntegrationDiagnostics diagnostics) {}
}
