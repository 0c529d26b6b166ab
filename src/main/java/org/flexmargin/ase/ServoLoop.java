package org.flexmargin.ase;

import org.ejml.data.DMatrixRMaj;
import org.flexmargin.loop.FeedbackSign;
import org.flexmargin.loop.FrequencyMemo;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.loop.StateSpace;

/**
 * The pitch loop closed around the flexible aircraft at one flight condition, broken at the
 * actuator command.
 *
 * <p>With u the signal injected at the actuator command, the law returns
 * {@code G(s) u = sum_p C_p(s) P_p(s) F(s) u}, where F is the forward block (hold, delay,
 * actuator), P_p the aircraft response from elevator to path p's sensor and C_p the path block.
 * The loop closes with u = G u. In the negative-feedback convention used for margins the broken
 * loop is therefore {@code L = -G}: the closed loop is stable when 1 + L has no zeros in the right
 * half plane, and classical gain and phase margins of L apply directly.
 *
 * <p>Immutable; {@link #brokenLoop()} returns a function backed by a per-thread workspace,
 * {@link #responses()} a workspace shared by the loop and the loops broken at each path.
 */
public final class ServoLoop {
  private final AircraftPlant plant;
  private final FlightControlLaw law;

  /**
   * @param plant aircraft at the flight condition
   * @param law control law at the same dynamic pressure
   */
  public ServoLoop(AircraftPlant plant, FlightControlLaw law) {
    this.plant = plant;
    this.law = law;
  }

  /** @return the aircraft */
  public AircraftPlant plant() {
    return plant;
  }

  /** @return the control law */
  public FlightControlLaw law() {
    return law;
  }

  /**
   * Broken-loop response L(j w) = -F(j w) sum_p C_p(j w) P_p(j w) with the exact aerodynamics and
   * exact delays; it declares the forward block's pure delay so that margin grids follow its phase
   * turn. Not thread-safe (one per thread).
   *
   * @return L as a frequency function
   */
  public SisoFrequencyFunction brokenLoop() {
    return responses().brokenLoop();
  }

  /**
   * Loop-at-a-time at one feedback path, the other paths closed: broken at the output of path p,
   * {@code L_p = -C_p P_p F / (1 - sum_{q != p} C_q P_q F)} (negative-feedback convention, exact
   * aerodynamics and delays). Not thread-safe (one per thread).
   *
   * @param path index of the path to break
   * @return L_p as a frequency function
   */
  public SisoFrequencyFunction brokenAtPath(int path) {
    return responses().brokenAtPath(path);
  }

  /**
   * @return a workspace whose broken-loop functions share one aircraft solve per frequency (not
   *     thread-safe: one per thread)
   */
  public Responses responses() {
    return new Responses();
  }

  /**
   * The broken loop and the loops broken at each path, sharing one workspace: the path
   * contributions C_p P_p F are computed once per frequency (one solve of the aircraft's
   * equations) and kept in a {@link FrequencyMemo}, so that every function of this workspace asked
   * for a frequency already seen takes the same contributions from the memo. Not thread-safe.
   */
  public final class Responses {
    /** Frequencies held by the memo before it is emptied (a few times a margin search's grid). */
    private static final int MEMO_CAPACITY = 1 << 15;

    private final PathTerms terms = new PathTerms();
    private final double[] g = new double[2 * terms.count()];
    private final FrequencyMemo memo = new FrequencyMemo(g.length, MEMO_CAPACITY, terms::evaluate);

    private Responses() {}

    /**
     * @return L = -F sum_p C_p P_p, declaring the forward block's pure delay (see
     *     {@link ServoLoop#brokenLoop()})
     */
    public SisoFrequencyFunction brokenLoop() {
      double delay = law.forward().pureDelayS();
      return new SisoFrequencyFunction() {
        @Override
        public void response(double w, double[] reIm) {
          memo.valuesAt(w, g);
          double sumR = 0;
          double sumI = 0;
          for (int p = 0; p < terms.count(); p++) {
            sumR += g[2 * p];
            sumI += g[2 * p + 1];
          }
          reIm[0] = -sumR;
          reIm[1] = -sumI;
        }

        /** @return the forward block's delays (hold and computation), s: every path sees them */
        @Override
        public double pureDelayS() {
          return delay;
        }
      };
    }

    /**
     * @param path index of the path to break
     * @return L_p, the other paths closed (see {@link ServoLoop#brokenAtPath(int)})
     */
    public SisoFrequencyFunction brokenAtPath(int path) {
      if (path < 0 || path >= terms.count()) {
        throw new IllegalArgumentException("path " + path + " of " + terms.count());
      }
      return (w, reIm) -> {
        memo.valuesAt(w, g);
        double restR = 0;
        double restI = 0;
        for (int p = 0; p < terms.count(); p++) {
          if (p != path) {
            restR += g[2 * p];
            restI += g[2 * p + 1];
          }
        }
        double ownR = g[2 * path];
        double ownI = g[2 * path + 1];
        // -own / (1 - rest)
        double dr = 1 - restR;
        double di = -restI;
        double d2 = dr * dr + di * di;
        reIm[0] = -(ownR * dr + ownI * di) / d2;
        reIm[1] = -(ownI * dr - ownR * di) / d2;
      };
    }

    /** @return solves of the aircraft's equations so far (frequencies taken from the memo not counted) */
    public long aircraftSolves() {
      return memo.evaluations();
    }
  }

  /**
   * Workspace evaluating each path's contribution C_p(jw) P_p(jw) F(jw) to the chain from the
   * actuator command back to the law's output. Not thread-safe.
   */
  private final class PathTerms {
    private final AircraftPlant.FrequencyEvaluator eval = plant.frequencyEvaluator();
    private final double[] sensorResponse = new double[2 * plant.sensors().size()];
    private final double[] block = new double[2];
    private final double[] fwd = new double[2];
    private final int[] index = law.pathSensorIndex();

    int count() {
      return index.length;
    }

    /** Writes C_p P_p F at w (rad/s) into g[2p], g[2p+1]. */
    void evaluate(double w, double[] g) {
      eval.response(w, sensorResponse);
      law.forward().response(w, fwd);
      for (int p = 0; p < index.length; p++) {
        law.paths().get(p).response(w, block);
        double pr = sensorResponse[2 * index[p]];
        double pi = sensorResponse[2 * index[p] + 1];
        double cr = block[0] * pr - block[1] * pi;
        double ci = block[0] * pi + block[1] * pr;
        g[2 * p] = cr * fwd[0] - ci * fwd[1];
        g[2 * p + 1] = cr * fwd[1] + ci * fwd[0];
      }
    }
  }

  /**
   * The open chain G (actuator command to law output) as a state space, with the aerodynamics in
   * rational form and delays by Pade.
   *
   * @param rational elastic aerodynamics in rational form
   * @return G, one input and one output
   */
  public StateSpace openChain(RationalAerodynamics rational) {
    StateSpace aircraft = plant.stateSpace(rational);
    int ns = plant.sensors().size();
    int[] index = law.pathSensorIndex();
    StateSpace controller = null;
    for (int p = 0; p < index.length; p++) {
      DMatrixRMaj select = new DMatrixRMaj(1, ns);
      select.set(0, index[p], 1.0);
      StateSpace selector = StateSpace.of(new DMatrixRMaj(0, 0), new DMatrixRMaj(0, ns), new DMatrixRMaj(1, 0), select);
      StateSpace path = selector.series(law.paths().get(p).stateSpace());
      controller = controller == null ? path : controller.parallel(path);
    }
    return law.forward().stateSpace().series(aircraft).series(controller);
  }

  /**
   * The closed loop u = G u as a state space (input: a disturbance added at the actuator command).
   * Its aircraft states are those of {@link AircraftPlant#stateSpace}: with a minimum-state fit one
   * lag state per lag root, the law's, filters' and actuator's states unchanged.
   *
   * @param rational elastic aerodynamics in rational form
   * @return the closed-loop system
   */
  public StateSpace closedLoop(RationalAerodynamics rational) {
    return openChain(rational).feedback(StateSpace.staticGain(1.0), FeedbackSign.POSITIVE);
  }

  /** @return the forward block (for reports: hold, delay, actuator) */
  public LinearBlock forward() {
    return law.forward();
  }
}
