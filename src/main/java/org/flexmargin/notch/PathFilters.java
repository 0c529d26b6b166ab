package org.flexmargin.notch;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.loop.NotchFilter;

/**
 * Edits of a loop's path filters for notch design: which paths carry notches by default, the loop
 * with the carrying paths' notches removed, and the loop with a designed set inserted.
 */
public final class PathFilters {
  private PathFilters() {}

  /**
   * Default carrying paths: every path whose sensor sees an elastic mode at its station (a gyro a
   * non-zero modal rotation, an accelerometer a non-zero displacement, a vane either) in some
   * configuration with a mode table; if none is found, every pitch-rate path.
   *
   * @param analysisCase case with a loop
   * @return path indices
   */
  public static List<Integer> defaultNotchPaths(AnalysisCase analysisCase) {
    LoopSpec loop = requireLoop(analysisCase);
    List<Integer> out = new ArrayList<>();
    for (int p = 0; p < loop.paths().size(); p++) {
      SensorSpec sensor = loop.sensor(loop.paths().get(p).sensor());
      boolean sees = false;
      for (Configuration c : analysisCase.configurations()) {
        if (c.structure() instanceof ModeTable mt) {
          for (ElasticMode m : mt.modes()) {
            ShapeValue v = m.shapes().get(sensor.station());
            if (v != null && sees(sensor.kind(), v)) {
              sees = true;
            }
          }
        }
      }
      if (sees) {
        out.add(p);
      }
    }
    if (out.isEmpty()) {
      for (int p = 0; p < loop.paths().size(); p++) {
        if (loop.sensor(loop.paths().get(p).sensor()).kind() == SensorKind.PITCH_RATE_GYRO) {
          out.add(p);
        }
      }
    }
    if (out.isEmpty()) {
      out.add(0);
    }
    return List.copyOf(out);
  }

  private static boolean sees(SensorKind kind, ShapeValue v) {
    return switch (kind) {
      case PITCH_RATE_GYRO -> v.rotationRad() != 0;
      case NORMAL_ACCELEROMETER -> v.displacementM() != 0;
      case ANGLE_OF_ATTACK_VANE -> v.rotationRad() != 0 || v.displacementM() != 0;
    };
  }

  /**
   * @param analysisCase case
   * @return its loop
   */
  static LoopSpec requireLoop(AnalysisCase analysisCase) {
    if (analysisCase.loop() == null) {
      throw new InvalidInputException("loop", "a flight-control loop (notch design needs one)", "none");
    }
    return analysisCase.loop();
  }

  /**
   * @param loop the loop
   * @param paths carrying paths
   * @param treatment what to do with their notches
   * @return the loop with the carrying paths' notches removed ({@link ExistingNotches#REPLACE}) or
   *     unchanged ({@link ExistingNotches#KEEP})
   */
  public static LoopSpec baseLoop(LoopSpec loop, List<Integer> paths, ExistingNotches treatment) {
    return withNotches(loop, paths, treatment, List.of());
  }

  /**
   * @param loop the loop
   * @param paths carrying paths
   * @param treatment what to do with their existing notches
   * @param notches notches to insert at the head of each carrying path's filters
   * @return the new loop
   */
  public static LoopSpec withNotches(LoopSpec loop, List<Integer> paths, ExistingNotches treatment,
      List<NotchFilter> notches) {
    List<FeedbackPath> out = new ArrayList<>();
    for (int p = 0; p < loop.paths().size(); p++) {
      FeedbackPath fp = loop.paths().get(p);
      if (!paths.contains(p)) {
        out.add(fp);
        continue;
      }
      out.add(new FeedbackPath(fp.sensor(), fp.proportionalGain(), fp.integralGainPerS(),
          filters(fp, treatment, notches), fp.schedule()));
    }
    for (int p : paths) {
      if (p >= loop.paths().size()) {
        throw new InvalidInputException("notch_paths", "path indices below " + loop.paths().size(), String.valueOf(p));
      }
    }
    return new LoopSpec(loop.actuator(), loop.sensors(), out, loop.computationDelayS(), loop.samplePeriodS(),
        loop.padeOrder());
  }

  /**
   * @param path a carrying path
   * @param treatment what to do with its existing notches
   * @param notches designed notches
   * @return the path's new filter list: designed notches first, then the kept filters in order
   */
  public static List<FilterSpec> filters(FeedbackPath path, ExistingNotches treatment, List<NotchFilter> notches) {
    List<FilterSpec> f = new ArrayList<>();
    for (NotchFilter n : notches) {
      f.add(new NotchFilterSpec(n.centreFrequencyHz(), n.zeroDampingRatio(), n.poleDampingRatio()));
    }
    for (FilterSpec old : path.filters()) {
      if (!(old instanceof NotchFilterSpec) || treatment == ExistingNotches.KEEP) {
        f.add(old);
      }
    }
    return f;
  }

  /**
   * @param loop the loop
   * @param paths paths
   * @return the notches currently in those paths (each distinct notch once, in path order)
   */
  public static List<NotchFilter> existingNotches(LoopSpec loop, List<Integer> paths) {
    List<NotchFilter> out = new ArrayList<>();
    for (int p : paths) {
      for (FilterSpec f : loop.paths().get(p).filters()) {
        if (f instanceof NotchFilterSpec n) {
          NotchFilter nf = new NotchFilter(n.centreHz(), n.numeratorDampingRatio(), n.denominatorDampingRatio());
          if (!out.contains(nf)) {
            out.add(nf);
          }
        }
      }
    }
    return out;
  }
}
