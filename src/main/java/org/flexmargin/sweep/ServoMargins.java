package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.aero.StripCoupling;
import org.flexmargin.ase.AircraftPlant;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.LoopMargins;
import org.flexmargin.loop.MarginOptions;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.Configuration;
import org.flexmargin.ase.FlightControlLaw;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.NotchFilterSpec;

/**
 * Broken-loop margins of a configuration at flight conditions along the sweep path, from the
 * exact frequency-domain loop ({@link ServoLoop#brokenLoop()}). The frequency grid is seeded, so
 * that no lightly damped peak is stepped over, at every structural mode's current frequency (the
 * open-loop p-k root; for a mode whose branch was lost at this point, its frequency at the nearest
 * point where it converged), and at every lightly damped closed-loop root at the point when the
 * closed-loop eigenvalues are known. The loop's pure delay keeps the grid fine enough to follow
 * every phase turn ({@link org.flexmargin.loop.LoopMargins}). At a point the loop and the loops
 * broken at each path are evaluated through one {@link ServoLoop.Responses} workspace: their grids
 * share the initial and seed frequencies, and each frequency costs one solve of the aircraft's
 * equations however many of the searches ask for it. Stateless and thread-safe.
 */
public final class ServoMargins {
  private final LoopMargins margins;
  /** Whether {@link #along} computes the margins of the loop broken at each feedback path. */
  private final boolean pathMargins;

  /** @param options margin search options */
  public ServoMargins(MarginOptions options) {
    this(options, true);
  }

  /**
   * @param options margin search options
   * @param pathMargins whether {@link #along} also computes the loop-at-a-time margins (else
   *     every point's {@link ServoPoint#pathMargins()} is empty)
   */
  public ServoMargins(MarginOptions options, boolean pathMargins) {
    this.margins = new LoopMargins(options);
    this.pathMargins = pathMargins;
  }

  /** @return margin search with default options */
  public static ServoMargins withDefaults() {
    return new ServoMargins(MarginOptions.defaults());
  }

  /**
   * The loop at one flight condition.
   *
   * @param model configuration model
   * @param configuration configuration (rigid body)
   * @param loop loop specification
   * @param condition flight condition
   * @return the servo loop
   */
  public static ServoLoop loopAt(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      FlightCondition condition) {
    AircraftPlant plant = new AircraftPlant(model.modes(), model.system().structure(), model.loopAero().source(),
        StripCoupling.resolve(configuration.rigidBody(), configuration.aero(), model.modes()), loop.sensors(),
        condition);
    return new ServoLoop(plant, FlightControlLaw.of(loop, condition.dynamicPressurePa()));
  }

  /**
   * Margins at one point.
   *
   * @param servo the loop at the point
   * @param seeds poles used to place grid points (structural roots)
   * @param maxFrequencyHz top of the analysed band (Hz)
   * @return the margins
   */
  public org.flexmargin.loop.LoopMarginResult at(ServoLoop servo, Eigenvalues seeds, double maxFrequencyHz) {
    return inBand(servo.brokenLoop(), seeds, maxFrequencyHz);
  }

  private LoopMarginResult inBand(SisoFrequencyFunction loop, Eigenvalues seeds, double maxFrequencyHz) {
    return margins.analyse(loop, 2 * Math.PI * MIN_FREQUENCY_HZ, 2 * Math.PI * maxFrequencyHz, seeds);
  }

  /** Damping ratio given to the seed of a mode whose branch was lost (spacing of its grid points). */
  static final double LOST_MODE_SEED_DAMPING = 0.02;

  /** @return the converged point of the branch nearest p (p itself if converged), or -1 if none */
  private static int nearestConverged(BranchCurve b, int p) {
    boolean[] ok = b.converged();
    for (int d = 0; d < ok.length; d++) {
      if (p - d >= 0 && p - d < ok.length && ok[p - d]) {
        return p - d;
      }
      if (p + d < ok.length && ok[p + d]) {
        return p + d;
      }
    }
    return -1;
  }

  /** Oscillatory closed-loop roots at a point (upper half plane) as seed poles. */
  static Eigenvalues closedLoopSeeds(ClosedLoopPoint point) {
    List<ClosedLoopRoot> roots = point.roots().stream().filter(r -> r.imagRadPerS() > 0).toList();
    double[] re = new double[roots.size()];
    double[] im = new double[roots.size()];
    for (int i = 0; i < roots.size(); i++) {
      re[i] = roots.get(i).realPerS();
      im[i] = roots.get(i).imagRadPerS();
    }
    return new Eigenvalues(re, im);
  }

  /** Lowest analysed frequency (Hz). */
  public static final double MIN_FREQUENCY_HZ = 0.01;

  /**
   * Margins at every grid point.
   *
   * @param model configuration model
   * @param configuration configuration
   * @param loop loop
   * @param path sweep path
   * @param openLoop open-loop p-k solution along the same path (for grid seeds)
   * @return one point per grid point
   */
  public List<ServoPoint> along(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      PlannedPath path, FlutterSolution openLoop) {
    return along(model, configuration, loop, path, openLoop, null);
  }

  /**
   * Margins at every grid point, the grid also seeded at the closed-loop roots.
   *
   * @param model configuration model
   * @param configuration configuration
   * @param loop loop
   * @param path sweep path
   * @param openLoop open-loop p-k solution along the same path (for grid seeds)
   * @param closedLoop closed-loop eigenvalues on the same path (grid seeds), or null
   * @return one point per grid point (with the loop-at-a-time margins if this instance computes them)
   */
  public List<ServoPoint> along(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      PlannedPath path, FlutterSolution openLoop, ClosedLoopResult closedLoop) {
    double maxHz = bandTopHz(model);
    return SweepParallel.map(path.gridPoints(), p -> {
      FlightCondition fc = path.at(p);
      ServoLoop servo = loopAt(model, configuration, loop, fc);
      Eigenvalues seeds = closedLoop == null ? seeds(openLoop, p)
          : seeds(openLoop, p).concat(closedLoopSeeds(closedLoop.points().get(p)));
      // one workspace: the loop and the loops broken at each path share the aircraft solves at
      // the frequencies their grids have in common
      ServoLoop.Responses responses = servo.responses();
      LoopMarginResult main = inBand(responses.brokenLoop(), seeds, maxHz);
      List<LoopMarginResult> perPath = new ArrayList<>();
      for (int k = 0; pathMargins && k < loop.paths().size(); k++) {
        perPath.add(inBand(responses.brokenAtPath(k), seeds, maxHz));
      }
      return new ServoPoint(p, fc, main, perPath, notchChecks(loop, openLoop, p, main));
    });
  }

  /** Attenuation of each notch at the modes' current frequencies and its phase cost at crossover. */
  static List<NotchCheck> notchChecks(LoopSpec loop, FlutterSolution openLoop, int p, LoopMarginResult margins) {
    double firstMode = Double.MAX_VALUE;
    for (BranchCurve b : openLoop.branches()) {
      if (b.converged()[p]) {
        firstMode = Math.min(firstMode, b.frequencyHz()[p]);
      }
    }
    double limit = 0.5 * firstMode;
    double crossover = margins.gainCrossovers().stream().mapToDouble(g -> g.frequencyHz())
        .filter(f -> f < limit).max().orElse(Double.NaN);
    List<NotchCheck> out = new ArrayList<>();
    double[] v = new double[2];
    for (int k = 0; k < loop.paths().size(); k++) {
      FeedbackPath path = loop.paths().get(k);
      for (FilterSpec f : path.filters()) {
        if (!(f instanceof NotchFilterSpec n)) {
          continue;
        }
        LinearBlock block = FlightControlLaw.filter(n);
        List<NotchCheck.ModeAttenuation> modes = new ArrayList<>();
        for (BranchCurve b : openLoop.branches()) {
          if (b.converged()[p]) {
            double hz = b.frequencyHz()[p];
            block.response(2 * Math.PI * hz, v);
            modes.add(new NotchCheck.ModeAttenuation(b.name(), hz, 20 * Math.log10(Math.hypot(v[0], v[1]))));
          }
        }
        double loss = Double.NaN;
        if (Double.isFinite(crossover)) {
          block.response(2 * Math.PI * crossover, v);
          loss = -Math.toDegrees(Math.atan2(v[1], v[0]));
        }
        out.add(new NotchCheck(k, path.sensor(), n.centreHz(), n.depthDb(), modes, crossover, loss));
      }
    }
    return out;
  }

  /** @return 1.5 x the highest in-vacuo mode frequency, at least 50 Hz */
  public static double bandTopHz(ConfigurationModel model) {
    double fmax = 0;
    for (var m : model.modes().modes()) {
      fmax = Math.max(fmax, m.frequencyHz());
    }
    return Math.max(50.0, 1.5 * fmax);
  }

  /**
   * Open-loop p-k roots at grid point p as seed poles (s = -zeta w + i w sqrt(1 - zeta^2)); a mode
   * whose branch did not converge at p is seeded at its frequency at the nearest converged point,
   * with damping ratio {@value #LOST_MODE_SEED_DAMPING} (grid points spread over +-16 % around it).
   */
  static Eigenvalues seeds(FlutterSolution openLoop, int p) {
    List<double[]> roots = new ArrayList<>();
    for (BranchCurve b : openLoop.branches()) {
      int at = nearestConverged(b, p);
      if (at < 0) {
        continue;
      }
      double w = 2 * Math.PI * b.frequencyHz()[at];
      double z = at == p ? Math.max(-0.99, Math.min(0.99, b.dampingRatio()[p])) : LOST_MODE_SEED_DAMPING;
      roots.add(new double[] {-z * w, w * Math.sqrt(1 - z * z)});
    }
    double[] re = new double[roots.size()];
    double[] im = new double[roots.size()];
    for (int i = 0; i < roots.size(); i++) {
      re[i] = roots.get(i)[0];
      im[i] = roots.get(i)[1];
    }
    return new Eigenvalues(re, im);
  }
}
