package org.flexmargin.notch;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.ase.AircraftPlant;
import org.flexmargin.ase.FlightControlLaw;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.ModeTable;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.ServoMargins;

/**
 * Samples a case's loop for notch design: for every configuration, every frequency shift factor
 * and the selected sweep points, L_rest and L_path of the loop broken at the actuator command
 * (exact frequency-domain aircraft response, {@link ServoLoop} convention L = -F sum_p C_p P_p).
 * Stateless.
 */
public final class CaseLoopSampler {
  /** Lowest frequency of the rigid-band grid, Hz. */
  public static final double RIGID_GRID_FROM_HZ = 0.01;

  private CaseLoopSampler() {}

  /**
   * @param model configuration model
   * @param factor frequency factor for every elastic mode
   * @return the model with every elastic frequency multiplied by factor (same masses, damping
   *     ratios and shapes, so the aerodynamic source built on the shapes still applies)
   */
  public static ConfigurationModel shifted(ConfigurationModel model, double factor) {
    if (factor == 1.0) {
      return model;
    }
    List<ElasticMode> modes = new ArrayList<>();
    for (ElasticMode m : model.modes().modes()) {
      modes.add(new ElasticMode(m.name(), m.frequencyHz() * factor, m.dampingRatio(), m.generalizedMassKg(),
          m.shapes()));
    }
    ModeTable table = new ModeTable(model.modes().name(), modes);
    return new ConfigurationModel(table,
        new AeroelasticSystem(StructuralModel.fromModeTable(table), model.system().aero()));
  }

  /**
   * @param analysisCase case with a loop
   * @param spec design settings (stride, speed limit)
   * @return the sweep grid points used
   */
  public static List<Integer> points(AnalysisCase analysisCase, NotchDesignSpec spec) {
    PlannedPath path = new PlannedPath(analysisCase.sweep());
    List<Integer> out = new ArrayList<>();
    int n = path.gridPoints();
    for (int p = 0; p < n; p++) {
      boolean take = p % spec.pointStride() == 0 || p == n - 1;
      if (take && path.at(p).speedEasMps() <= spec.maxSpeedEasMps() + 1e-9) {
        out.add(p);
      }
    }
    if (out.isEmpty()) {
      throw new org.flexmargin.model.InvalidInputException("max_speed_eas_mps",
          "a speed at or above the first sweep point " + path.at(0).speedEasMps() + " m/s",
          String.valueOf(spec.maxSpeedEasMps()));
    }
    return out;
  }

  /**
   * The band in which mode k's structural peak is sought: +-fraction of its frequency, cut at the
   * geometric mean with the nearest lower and higher mode, so that each frequency belongs to one
   * mode only.
   *
   * @param modes the modes
   * @param k mode index
   * @param fraction half-width as a fraction of the frequency
   * @return {from, to}, Hz
   */
  public static double[] band(List<ElasticMode> modes, int k, double fraction) {
    double f = modes.get(k).frequencyHz();
    double lo = f * (1 - fraction);
    double hi = f * (1 + fraction);
    for (int j = 0; j < modes.size(); j++) {
      double g = modes.get(j).frequencyHz();
      if (j == k) {
        continue;
      }
      double mid = Math.sqrt(f * g);
      if (g < f || (g == f && j < k)) {
        lo = Math.max(lo, mid);
      } else {
        hi = Math.min(hi, mid);
      }
    }
    if (!(hi > lo)) {
      hi = lo * (1 + 1e-3);
    }
    return new double[] {lo, hi};
  }

  /**
   * @param analysisCase the case
   * @param baseLoop the loop without the designed notches (see {@link PathFilters#baseLoop})
   * @param notchPaths carrying paths
   * @param spec design settings
   * @return the samples
   */
  public static LoopSamples sample(AnalysisCase analysisCase, LoopSpec baseLoop, List<Integer> notchPaths,
      NotchDesignSpec spec) {
    PlannedPath path = new PlannedPath(analysisCase.sweep());
    List<Integer> points = points(analysisCase, spec);
    LoopSamples.Builder b = LoopSamples.builder();
    for (Configuration c : analysisCase.configurations()) {
      ConfigurationModel nominal = ConfigurationModel.of(c);
      for (double factor : spec.shiftFactors()) {
        ConfigurationModel model = shifted(nominal, factor);
        List<String> names = model.modes().modeNames();
        int[] grids = new int[names.size()];
        double lowest = Double.MAX_VALUE;
        List<ElasticMode> modes = model.modes().modes();
        for (int k = 0; k < grids.length; k++) {
          double[] band = band(modes, k, spec.modeBandFraction());
          grids[k] = b.modeGrid(modes.get(k).frequencyHz(), modes.get(k).dampingRatio(), band[0], band[1]);
          lowest = Math.min(lowest, modes.get(k).frequencyHz());
        }
        int rigid = b.rigidGrid(RIGID_GRID_FROM_HZ, spec.rigidBandFraction() * lowest);
        for (int p : points) {
          FlightCondition fc = path.at(p);
          ServoLoop servo = ServoMargins.loopAt(model, c, baseLoop, fc);
          SplitLoop split = new SplitLoop(servo, notchPaths);
          b.add(new SampleLabel(c.name(), p, fc.speedEasMps(), fc.altitudeM(), factor), split.rest(), split.path(),
              names, grids, rigid);
        }
      }
    }
    return b.build();
  }

  /**
   * The broken loop split into the part through the carrying paths and the rest; the aircraft is
   * solved once per frequency for both. Not thread-safe.
   */
  static final class SplitLoop {
    private final AircraftPlant.FrequencyEvaluator eval;
    private final FlightControlLaw law;
    private final int[] sensorIndex;
    private final boolean[] carries;
    private final double[] sensors;
    private final double[] block = new double[2];
    private double lastOmega = Double.NaN;
    private final double[] rest = new double[2];
    private final double[] path = new double[2];

    SplitLoop(ServoLoop servo, List<Integer> notchPaths) {
      this.eval = servo.plant().frequencyEvaluator();
      this.law = servo.law();
      this.sensorIndex = law.pathSensorIndex();
      this.carries = new boolean[sensorIndex.length];
      for (int p : notchPaths) {
        carries[p] = true;
      }
      this.sensors = new double[2 * servo.plant().sensors().size()];
    }

    private void at(double w) {
      if (w == lastOmega) {
        return;
      }
      eval.response(w, sensors);
      double[] sum = {0, 0, 0, 0};
      for (int p = 0; p < sensorIndex.length; p++) {
        law.paths().get(p).response(w, block);
        double pr = sensors[2 * sensorIndex[p]];
        double pi = sensors[2 * sensorIndex[p] + 1];
        int o = carries[p] ? 2 : 0;
        sum[o] += block[0] * pr - block[1] * pi;
        sum[o + 1] += block[0] * pi + block[1] * pr;
      }
      law.forward().response(w, block);
      rest[0] = -(block[0] * sum[0] - block[1] * sum[1]);
      rest[1] = -(block[0] * sum[1] + block[1] * sum[0]);
      path[0] = -(block[0] * sum[2] - block[1] * sum[3]);
      path[1] = -(block[0] * sum[3] + block[1] * sum[2]);
      lastOmega = w;
    }

    SisoFrequencyFunction rest() {
      return (w, out) -> {
        at(w);
        out[0] = rest[0];
        out[1] = rest[1];
      };
    }

    SisoFrequencyFunction path() {
      return (w, out) -> {
        at(w);
        out[0] = path[0];
        out[1] = path[1];
      };
    }
  }
}
