package org.flexmargin.notch;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.loop.DiscreteFilter;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.loop.NotchFilters;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.NotchFilterSpec;

/**
 * The designed notches as the flight computer runs them: for each continuous notch, its
 * discrete-time second-order section at the loop's sample period by the bilinear transform
 * pre-warped at the notch centre ({@link NotchFilters#discrete}), with coefficients normalised so
 * that a0 = 1, and the check of the whole discrete set against the requirements table, by the
 * same rules as {@code sweep} ({@link NotchDesigner#check}) on the case's loop with every designed
 * notch replaced by its discrete section.
 *
 * @param samplePeriodS the loop's sample period T, s (0 for a continuous loop: no sections)
 * @param sections one section per designed notch, in design order
 * @param designedLoop the designed loop with the discrete sections in place of the designed notches
 * @param check the requirements check of that loop, or null (continuous loop, no table, no design)
 * @param note why there is no section or no check; empty when both are there
 */
public record DiscreteNotchSet(double samplePeriodS, List<Section> sections, LoopSpec designedLoop,
    RobustnessCheckResult check, String note) {

  /** Copies. */
  public DiscreteNotchSet {
    sections = List.copyOf(sections);
    note = note == null ? "" : note;
  }

  /**
   * One discrete notch section: H(z) = (b0 + b1 z^-1 + b2 z^-2)/(1 + a1 z^-1 + a2 z^-2).
   *
   * @param notch the continuous notch
   * @param filter the discrete section (numerator b0..b2, denominator 1, a1, a2)
   * @param centreGainDb gain of the discrete section at the notch centre, dB (equals the continuous
   *     centre depth by the pre-warping)
   * @param continuousCentreGainDb 20 log10(zeta_z/zeta_p), dB
   */
  public record Section(NotchFilter notch, DiscreteFilter filter, double centreGainDb, double continuousCentreGainDb) {}

  /**
   * @param analysisCase the case designed for
   * @param design the design
   * @param designer the designer (for its requirements check)
   * @return the discrete set and its check
   */
  public static DiscreteNotchSet of(AnalysisCase analysisCase, NotchDesignResult design, NotchDesigner designer) {
    LoopSpec loop = design.designedLoop();
    double t = loop.samplePeriodS();
    if (!(t > 0)) {
      return new DiscreteNotchSet(0, List.of(), loop, null,
          "the loop is continuous (sample_period_s 0): no discrete-time sections");
    }
    List<Section> sections = new ArrayList<>();
    List<NotchFilterSpec> designed = new ArrayList<>();
    for (DesignedNotch dn : design.notches()) {
      NotchFilter n = dn.filter();
      if (n.centreFrequencyHz() >= 0.5 / t) {
        return new DiscreteNotchSet(t, sections, loop, null, String.format(java.util.Locale.ROOT,
            "the notch at %.4g Hz lies at or above the Nyquist frequency %.4g Hz of the loop: no discrete section",
            n.centreFrequencyHz(), 0.5 / t));
      }
      DiscreteFilter d = NotchFilters.discrete(n, t);
      double[] v = new double[2];
      d.response(2 * Math.PI * n.centreFrequencyHz(), v);
      sections.add(new Section(n, d, 20 * Math.log10(Math.hypot(v[0], v[1])), n.centreGainDb()));
      designed.add(new NotchFilterSpec(n.centreFrequencyHz(), n.zeroDampingRatio(), n.poleDampingRatio()));
    }
    LoopSpec discreteLoop = withSections(loop, designed, sections);
    if (design.notches().isEmpty()) {
      return new DiscreteNotchSet(t, sections, discreteLoop, null, "no notch was designed");
    }
    if (analysisCase.requirements() == null) {
      return new DiscreteNotchSet(t, sections, discreteLoop, null,
          "no requirements table: the discrete set is not checked");
    }
    AnalysisCase c = new AnalysisCase(analysisCase.format(), analysisCase.name(), analysisCase.description(),
        analysisCase.configurations(), analysisCase.sweep(), analysisCase.options(), analysisCase.inputs(),
        discreteLoop, analysisCase.requirements());
    return new DiscreteNotchSet(t, sections, discreteLoop, designer.check(c, design.spec()), "");
  }

  /** @return the loop with every designed notch replaced by its discrete section */
  static LoopSpec withSections(LoopSpec loop, List<NotchFilterSpec> designed, List<Section> sections) {
    List<FeedbackPath> paths = new ArrayList<>();
    for (FeedbackPath p : loop.paths()) {
      List<FilterSpec> filters = new ArrayList<>();
      for (FilterSpec f : p.filters()) {
        int k = f instanceof NotchFilterSpec n ? designed.indexOf(n) : -1;
        filters.add(k < 0 ? f : new FilterSpec.Discrete(new Coefficients(sections.get(k).filter().numerator(),
            sections.get(k).filter().denominator())));
      }
      paths.add(new FeedbackPath(p.sensor(), p.proportionalGain(), p.integralGainPerS(), filters, p.schedule()));
    }
    return new LoopSpec(loop.actuator(), loop.sensors(), paths, loop.computationDelayS(), loop.samplePeriodS(),
        loop.padeOrder());
  }
}
