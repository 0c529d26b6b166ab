package org.flexmargin.notch;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.LoopMargins;
import org.flexmargin.loop.MarginDirection;
import org.flexmargin.loop.MarginOptions;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.ServoMargins;

/**
 * Re-runs the project's margin code on the full loop of a case with a given loop specification,
 * independently of the sampled model the optimiser used: rigid-body margins from {@link
 * ServoMargins#at} (adaptive grid, Brent-refined crossings) and the structural peak of each mode
 * from {@link LoopMargins} over the mode's band. The in-vacuo modes seed the frequency grid.
 * Stateless.
 */
public final class IndependentCheck {
  private IndependentCheck() {}

  /**
   * @param analysisCase the case
   * @param loop the loop to check (for example with the designed notches)
   * @param spec requirements, band fractions
   * @param configuration the configuration
   * @param factor frequency shift factor of every elastic mode
   * @param gridPoint sweep grid point
   * @param peaksOut receives one checked peak per mode (may be null)
   * @return the rigid-body margins
   */
  public static RigidMargins at(AnalysisCase analysisCase, LoopSpec loop, NotchDesignSpec spec,
      Configuration configuration, double factor, int gridPoint, List<CheckedPeak> peaksOut) {
    ConfigurationModel model = CaseLoopSampler.shifted(ConfigurationModel.of(configuration), factor);
    PlannedPath path = new PlannedPath(analysisCase.sweep());
    FlightCondition fc = path.at(gridPoint);
    ServoLoop servo = ServoMargins.loopAt(model, configuration, loop, fc);
    List<ElasticMode> modes = model.modes().modes();
    double[] re = new double[modes.size()];
    double[] im = new double[modes.size()];
    double lowest = Double.MAX_VALUE;
    for (int k = 0; k < modes.size(); k++) {
      ElasticMode m = modes.get(k);
      double w = m.omegaRadPerS();
      re[k] = -m.dampingRatio() * w;
      im[k] = w * Math.sqrt(1 - m.dampingRatio() * m.dampingRatio());
      lowest = Math.min(lowest, m.frequencyHz());
    }
    Eigenvalues seeds = new Eigenvalues(re, im);
    double rigidTopHz = spec.rigidBandFraction() * lowest;
    LoopMarginResult r = ServoMargins.withDefaults().at(servo, seeds, ServoMargins.bandTopHz(model));
    double pm = Double.POSITIVE_INFINITY;
    double wc = Double.NaN;
    for (GainCrossover g : r.gainCrossovers()) {
      if (g.frequencyHz() < rigidTopHz && g.phaseMarginDeg() < pm) {
        pm = g.phaseMarginDeg();
        wc = g.frequencyHz();
      }
    }
    double gi = Double.POSITIVE_INFINITY;
    double gr = Double.NEGATIVE_INFINITY;
    for (PhaseCrossover p : r.phaseCrossovers()) {
      if (p.frequencyHz() >= rigidTopHz) {
        continue;
      }
      if (p.direction() == MarginDirection.GAIN_INCREASE) {
        gi = Math.min(gi, p.gainMarginDb());
      } else {
        gr = Math.max(gr, p.gainMarginDb());
      }
    }
    if (peaksOut != null) {
      LoopMargins lm = new LoopMargins(MarginOptions.defaults());
      SampleLabel label = new SampleLabel(configuration.name(), gridPoint, fc.speedEasMps(), fc.altitudeM(), factor);
      for (int k = 0; k < modes.size(); k++) {
        double[] band = CaseLoopSampler.band(modes, k, spec.modeBandFraction());
        LoopMarginResult b = lm.analyse(servo.brokenLoop(), 2 * Math.PI * band[0], 2 * Math.PI * band[1], seeds);
        peaksOut.add(new CheckedPeak(modes.get(k).name(), label, b.peakGain().magnitudeDb(),
            b.peakGain().frequencyHz()));
      }
    }
    double eas = fc.speedEasMps();
    boolean meets = pm >= spec.requiredPhaseMarginDeg(eas) && gi >= spec.requiredGainMarginDb(eas)
        && gr <= -spec.requiredGainMarginDb(eas);
    return new RigidMargins(configuration.name(), gridPoint, fc.speedEasMps(), pm, wc, gi, gr, meets);
  }

  /**
   * @param points design points
   * @param count how many to pick
   * @return about count points spread evenly over the list (first and last included)
   */
  public static List<Integer> spread(List<Integer> points, int count) {
    List<Integer> out = new ArrayList<>();
    int n = points.size();
    for (int i = 0; i < Math.min(count, n); i++) {
      int idx = count <= 1 ? 0 : (int) Math.round((double) i * (n - 1) / (Math.min(count, n) - 1));
      int p = points.get(Math.min(n - 1, idx));
      if (!out.contains(p)) {
        out.add(p);
      }
    }
    return out;
  }
}
