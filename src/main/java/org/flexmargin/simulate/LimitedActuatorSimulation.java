package org.flexmargin.simulate;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.loop.Eigenvalues;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.apache.commons.math3.ode.sampling.StepNormalizerMode;

/**
 * Simulation of a linear system whose actuator has rate and position limits. The system is linear
 * wherever the actuator is clear of its limits, so each output step on which it stays clear is
 * taken exactly: the state transition through the matrix exponential, the input as the quadratic
 * through its values at the step's Gauss points ({@link QuadraticInputDiscretization}), the
 * actuator's limited quantities bounded over the step by {@link ActuatorGuard}. The other steps
 * (a limit near or active, an input jump inside the step) are integrated with Commons Math's
 * adaptive Dormand-Prince 5(4) integrator (Dormand &amp; Prince, J. Comput. Appl. Math. 6(1),
 * 1980), the step size controlled by the embedded error estimate and reported
 * ({@link IntegrationDiagnostics}), largest step the output step, through a right-hand side that
 * touches only the nonzero entries of the matrices ({@link SparseRows}).
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
   * Runs the system: each output step whose actuator stays clear of its limits
   * ({@link ActuatorGuard}) and whose input is smooth over the step is taken exactly
   * ({@link QuadraticInputDiscretization}); every other step (a limit near or active, an input
   * jump inside the step) is integrated by Dormand-Prince. If the output step is too long for the
   * guard to bound the actuator between samples, the whole run is integrated.
   *
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
    return run(prepare(spec, limits, outputStepS), steps, inputs, initialState);
  }

  /**
   * @param spec the system and its actuator
   * @param limits the limits
   * @param outputStepS output sample period (s); also the largest integration step
   * @return what every run of this system at this step shares (the exact step's matrices)
   */
  public static Prepared prepare(LimitedActuatorSystem spec, ActuatorLimits limits, double outputStepS) {
    return prepare(spec, limits, outputStepS, spec.system().eigenvalues());
  }

  /**
   * As {@link #prepare(LimitedActuatorSystem, ActuatorLimits, double)} with the system's
   * eigenvalues known.
   */
  static Prepared prepare(LimitedActuatorSystem spec, ActuatorLimits limits, double outputStepS,
      Eigenvalues eigenvalues) {
    boolean exact = ActuatorGuard.resolves(spectralRadius(eigenvalues), outputStepS);
    return new Prepared(spec, limits, outputStepS, ActuatorGuard.of(spec, limits),
        exact ? QuadraticInputDiscretization.of(spec.system().a(), spec.system().b(), outputStepS) : null);
  }

  /**
   * As {@link #run(LimitedActuatorSystem, ActuatorLimits, double, int, List, double[])} with the
   * shared part computed beforehand.
   *
   * @param prepared the system, limits and output step, prepared
   * @param steps number of output steps (the history has steps + 1 samples)
   * @param inputs one input history per input of the system (null entries are zero)
   * @param initialState x(0), or null for zero
   * @return outputs (the rate output replaced by the limited rate) and integration diagnostics
   */
  public static Result run(Prepared prepared, int steps, List<DoubleUnaryOperator> inputs, double[] initialState) {
    if (prepared.disc == null) {
      return integrated(prepared.spec, prepared.limits, prepared.dt, steps, inputs, initialState);
    }
    return new SteppedRun(prepared, inputs).run(steps, initialState);
  }

  /** A system with limits at one output step, ready for runs. Immutable. */
  public static final class Prepared {
    private final LimitedActuatorSystem spec;
    private final ActuatorLimits limits;
    private final double dt;
    private final ActuatorGuard guard;
    private final QuadraticInputDiscretization disc;
    private final SparseRows c;
    private final SparseRows d;

    private Prepared(LimitedActuatorSystem spec, ActuatorLimits limits, double dt, ActuatorGuard guard,
        QuadraticInputDiscretization disc) {
      this.spec = spec;
      this.limits = limits;
      this.dt = dt;
      this.guard = guard;
      this.disc = disc;
      this.c = SparseRows.of(spec.system().c());
      this.d = SparseRows.of(spec.system().d());
    }

    /** @return true if runs take exact steps where the actuator is clear of its limits */
    public boolean exactSteps() {
      return disc != null;
    }
  }

  private static double spectralRadius(Eigenvalues e) {
    double max = 0;
    for (int k = 0; k < e.real().length; k++) {
      max = Math.max(max, Math.hypot(e.realAt(k), e.imagAt(k)));
    }
    return max;
  }

  /**
   * The whole run by Dormand-Prince alone, outputs interpolated onto the output grid (the
   * reference for {@link #run}).
   *
   * @param spec the system and its actuator
   * @param limits the limits
   * @param outputStepS output sample period (s); also the largest integration step
   * @param steps number of output steps (the history has steps + 1 samples)
   * @param inputs one input history per input of the system (null entries are zero)
   * @param initialState x(0), or null for zero
   * @return outputs (the rate output replaced by the limited rate) and integration diagnostics
   */
  static Result integrated(LimitedActuatorSystem spec, ActuatorLimits limits, double outputStepS, int steps,
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
    DormandPrince54Integrator integrator = integrator(outputStepS);
    integrator.addStepHandler(sampler);
    integrator.addStepHandler(stats);
    double[] x = initialState == null ? new double[n] : initialState.clone();
    integrator.integrate(ode, 0.0, x, steps * outputStepS, x);
    if (count[0] != steps + 1) {
      throw new IllegalStateException("output grid: " + count[0] + " samples for " + (steps + 1));
    }
    IntegrationDiagnostics diag = stats.diagnostics(integrator.getEvaluations(), 0);
    return new Result(new TimeHistory(times, system.outputNames(), y), diag);
  }

  private static DormandPrince54Integrator integrator(double maxStepS) {
    return new DormandPrince54Integrator(1e-10, maxStepS, ABSOLUTE_TOLERANCE, RELATIVE_TOLERANCE);
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

  /** Accepted-step statistics over one or more integrations. */
  private static final class StepStatistics implements StepHandler {
    int accepted;
    int acceptedThisCall;
    double integratedS;
    double smallest = Double.NaN;
    double largest = Double.NaN;

    @Override
    public void init(double t0, double[] y0, double t) {
      acceptedThisCall = 0;
    }

    @Override
    public void handleStep(StepInterpolator interpolator, boolean isLast) {
      double h = Math.abs(interpolator.getCurrentTime() - interpolator.getPreviousTime());
      accepted++;
      acceptedThisCall++;
      integratedS += h;
      if (!isLast || acceptedThisCall == 1) {
        smallest = Double.isNaN(smallest) ? h : Math.min(smallest, h);
      }
      largest = Double.isNaN(largest) ? h : Math.max(largest, h);
    }

    IntegrationDiagnostics diagnostics(int evaluations, int exactSteps) {
      return new IntegrationDiagnostics(accepted, evaluations, smallest, largest,
          accepted == 0 ? Double.NaN : integratedS / accepted, RELATIVE_TOLERANCE, ABSOLUTE_TOLERANCE, exactSteps);
    }
  }

  /** One run by exact steps where the actuator is linear, Dormand-Prince elsewhere. */
  private static final class SteppedRun {
    /** Largest misfit of the quadratic input at the step ends, relative to the input's size there (-). */
    private static final double INPUT_FIT = 1e-3;

    private final Prepared prepared;
    private final LimitedDynamics ode;
    private final double dt;
    private final List<DoubleUnaryOperator> inputs;
    private final DormandPrince54Integrator integrator;
    private final StepStatistics stats = new StepStatistics();
    private final double[] uNode;
    private final double[] node;
    private final double[] uStart;
    private final double[] uEnd;
    private final double[] duStart;
    private final double[] duEnd;
    private final double[] column = new double[3];

    SteppedRun(Prepared prepared, List<DoubleUnaryOperator> inputs) {
      int m = prepared.spec.system().inputCount();
      if (inputs.size() != m) {
        throw new IllegalArgumentException(inputs.size() + " input histories for " + m + " inputs");
      }
      this.prepared = prepared;
      this.ode = new LimitedDynamics(prepared.spec, prepared.limits, inputs);
      this.dt = prepared.dt;
      this.inputs = inputs;
      this.integrator = integrator(dt);
      integrator.addStepHandler(stats);
      this.uNode = new double[3 * m];
      this.node = new double[m];
      this.uStart = new double[m];
      this.uEnd = new double[m];
      this.duStart = new double[m];
      this.duEnd = new double[m];
    }

    Result run(int steps, double[] initialState) {
      var system = prepared.spec.system();
      int n = system.stateCount();
      double[] times = new double[steps + 1];
      double[][] y = new double[system.outputCount()][steps + 1];
      double[] x = initialState == null ? new double[n] : initialState.clone();
      double[] next = new double[n];
      double[] work = new double[n];
      int evaluations = 0;
      int exact = 0;
      for (int k = 0; k <= steps; k++) {
        double t = k * dt;
        times[k] = t;
        LinearSimulation.sample(inputs, t, uStart);
        double[] xs = atStop(x, ode.pos, ode.posLimit, work);
        double rate = ode.actuator(xs, uStart, null);
        for (int i = 0; i < y.length; i++) {
          y[i][k] = prepared.d.rowTimes(i, uStart, prepared.c.rowTimes(i, xs, 0));
        }
        if (prepared.spec.rateOutput() >= 0) {
          y[prepared.spec.rateOutput()][k] = rate;
        }
        if (k == steps) {
          break;
        }
        if (exactStep(x, t, next)) {
          exact++;
        } else {
          integrator.integrate(ode, t, x, t + dt, next);
          evaluations += integrator.getEvaluations();
        }
        double[] swap = x;
        x = next;
        next = swap;
      }
      return new Result(new TimeHistory(times, system.outputNames(), y), stats.diagnostics(evaluations, exact));
    }

    /**
     * @return true if the step from t was taken exactly into next: the actuator clear of its
     *     limits at the start and, by the guard's cubic, over the whole step, and each input
     *     within {@link #INPUT_FIT} of its quadratic fit at both ends
     */
    private boolean exactStep(double[] x, double t, double[] next) {
      if (!prepared.guard.inside(x, uStart)) {
        return false;
      }
      int m = uStart.length;
      for (int q = 0; q < 3; q++) {
        LinearSimulation.sample(inputs, t + QuadraticInputDiscretization.NODES[q] * dt, node);
        System.arraycopy(node, 0, uNode, q * m, m);
      }
      LinearSimulation.sample(inputs, t + dt, uEnd);
      for (int j = 0; j < m; j++) {
        double size = Math.max(Math.abs(uStart[j]), Math.abs(uEnd[j]));
        for (int q = 0; q < 3; q++) {
          column[q] = uNode[q * m + j];
          size = Math.max(size, Math.abs(column[q]));
        }
        double tolerance = INPUT_FIT * size;
        if (!(Math.abs(QuadraticInputDiscretization.fitted(column, 0) - uStart[j]) <= tolerance)
            || !(Math.abs(QuadraticInputDiscretization.fitted(column, 1) - uEnd[j]) <= tolerance)) {
          return false;
        }
        duStart[j] = QuadraticInputDiscretization.fittedSlope(column, 0) / dt;
        duEnd[j] = QuadraticInputDiscretization.fittedSlope(column, 1) / dt;
      }
      prepared.disc.step(x, uNode, next);
      return prepared.guard.insideOver(x, uStart, duStart, next, uEnd, duEnd, dt);
    }
  }

  /**
   * @param history the outputs on the output grid
   * @param diagnostics how the integration went
   */
  public record Result(TimeHistory history, IntegrationDiagnostics diagnostics) {}
}
