package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.NotchFilterSpec;
import org.junit.jupiter.api.Test;

/** Discrete sections of designed notches against the hand-derived pre-warped bilinear notch. */
class DiscreteNotchSetTest {
  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
  private static final double T = 0.0125;

  /** The demo case without its requirements table and with the given sample period. */
  private static AnalysisCase demo(double samplePeriodS) {
    LoopSpec l = DEMO.loop();
    LoopSpec loop = new LoopSpec(l.actuator(), l.sensors(), l.paths(), l.computationDelayS(), samplePeriodS,
        l.padeOrder());
    return new AnalysisCase(DEMO.format(), DEMO.name(), DEMO.description(), DEMO.configurations(), DEMO.sweep(),
        DEMO.options(), DEMO.inputs(), loop, null);
  }

  /** A hand-made design carrying the given notches in path 0 (the case's own 8.6 Hz notch kept). */
  private static NotchDesignResult design(AnalysisCase c, List<NotchFilter> notches) {
    NotchDesignSpec spec = NotchDesignSpec.defaults().withExistingNotches(ExistingNotches.KEEP);
    LoopSpec designed = PathFilters.withNotches(c.loop(), List.of(0), ExistingNotches.KEEP, notches);
    PhaseCost none = new PhaseCost("all", 0, Double.NaN, null);
    return new NotchDesignResult(c.name(), spec, List.of(0), true,
        notches.stream().map(DesignedNotch::of).toList(), List.of(), List.of(none), none,
        new OptimiserDiagnostics("hand-made", 0, 0, 0, 0, 0, 0, 0, 0), List.of(), List.of(), List.of(), List.of(),
        designed);
  }

  /**
   * Pre-warped bilinear notch, derived by hand: s = K (1 - z^-1)/(1 + z^-1) with K = w / tan(w T/2)
   * in s^2 + 2 zeta w s + w^2, times (1 + z^-1)^2, gives K^2 + 2 zeta w K + w^2, 2 (w^2 - K^2),
   * K^2 - 2 zeta w K + w^2 in ascending powers of z^-1; divided by the denominator's first.
   */
  private static double[][] section(double hz, double zz, double zp) {
    double w = 2 * Math.PI * hz;
    double k = w / Math.tan(w * T / 2);
    double a0 = k * k + 2 * zp * w * k + w * w;
    return new double[][] {
        {(k * k + 2 * zz * w * k + w * w) / a0, 2 * (w * w - k * k) / a0, (k * k - 2 * zz * w * k + w * w) / a0},
        {1, 2 * (w * w - k * k) / a0, (k * k - 2 * zp * w * k + w * w) / a0}};
  }

  @Test
  void sectionsArePreWarpedBilinearNotchesWithTheContinuousCentreDepth() {
    AnalysisCase c = demo(T);
    List<NotchFilter> n = List.of(new NotchFilter(7.5, 0.05, 0.5), new NotchFilter(19, 0.1, 0.4));
    DiscreteNotchSet d = DiscreteNotchSet.of(c, design(c, n), new NotchDesigner());
    assertEquals(T, d.samplePeriodS());
    assertEquals(2, d.sections().size());
    assertNull(d.check());
    assertEquals("no requirements table: the discrete set is not checked", d.note());
    for (int i = 0; i < 2; i++) {
      NotchFilter x = n.get(i);
      DiscreteNotchSet.Section s = d.sections().get(i);
      assertEquals(x, s.notch());
      double[][] ba = section(x.centreFrequencyHz(), x.zeroDampingRatio(), x.poleDampingRatio());
      // the same algebra in another order: rounding only
      assertArrayEquals(ba[0], s.filter().numerator(), 1e-12);
      assertArrayEquals(ba[1], s.filter().denominator(), 1e-12);
      assertEquals(T, s.filter().samplePeriodS());
      // pre-warping maps the centre exactly: the discrete gain there is zeta_z/zeta_p
      double depth = 20 * Math.log10(x.zeroDampingRatio() / x.poleDampingRatio());
      assertEquals(depth, s.centreGainDb(), 1e-9);
      assertEquals(depth, s.continuousCentreGainDb(), 1e-12);
    }
    // the loop: designed notches replaced by their sections, the kept 8.6 Hz notch and the
    // low-pass unchanged, the other path untouched
    List<FilterSpec> f = d.designedLoop().paths().get(0).filters();
    assertEquals(4, f.size());
    for (int i = 0; i < 2; i++) {
      FilterSpec.Discrete x = (FilterSpec.Discrete) f.get(i);
      assertArrayEquals(d.sections().get(i).filter().numerator(), x.coefficients().numerator(), 0);
      assertArrayEquals(d.sections().get(i).filter().denominator(), x.coefficients().denominator(), 0);
    }
    assertEquals(new NotchFilterSpec(8.6, 0.05, 0.5), f.get(2));
    assertEquals(new LowPassFilterSpec(25, 0.7071), f.get(3));
    assertEquals(c.loop().paths().get(1), d.designedLoop().paths().get(1));
    assertEquals(T, d.designedLoop().samplePeriodS());
    assertEquals(c.loop().computationDelayS(), d.designedLoop().computationDelayS());
    FeedbackPath p0 = d.designedLoop().paths().get(0);
    assertEquals(c.loop().paths().get(0).proportionalGain(), p0.proportionalGain());
    assertEquals(c.loop().paths().get(0).integralGainPerS(), p0.integralGainPerS());
  }

  @Test
  void aContinuousLoopHasNoSections() {
    AnalysisCase c = demo(0);
    NotchDesignResult r = design(c, List.of(new NotchFilter(7.5, 0.05, 0.5)));
    DiscreteNotchSet d = DiscreteNotchSet.of(c, r, new NotchDesigner());
    assertEquals(0, d.samplePeriodS());
    assertEquals(List.of(), d.sections());
    assertSame(r.designedLoop(), d.designedLoop());
    assertNull(d.check());
    assertEquals("the loop is continuous (sample_period_s 0): no discrete-time sections", d.note());
  }

  @Test
  void aNotchAtOrAboveNyquistStopsTheSections() {
    AnalysisCase c = demo(T);
    // Nyquist 0.5 / 0.0125 = 40 Hz: the 40 Hz notch is at it
    NotchDesignResult r = design(c, List.of(new NotchFilter(7.5, 0.05, 0.5), new NotchFilter(40, 0.1, 0.4)));
    DiscreteNotchSet d = DiscreteNotchSet.of(c, r, new NotchDesigner());
    assertEquals(1, d.sections().size());
    assertSame(r.designedLoop(), d.designedLoop());
    assertNull(d.check());
    assertEquals("the notch at 40.00 Hz lies at or above the Nyquist frequency 40.00 Hz of the loop: no discrete "
        + "section", d.note());
    // just below it a section is made
    DiscreteNotchSet below = DiscreteNotchSet.of(c, design(c, List.of(new NotchFilter(39.9, 0.1, 0.4))),
        new NotchDesigner());
    assertEquals(1, below.sections().size());
  }

  @Test
  void noDesignedNotchMeansNothingToCheck() {
    AnalysisCase c = demo(T);
    NotchDesignResult r = design(c, List.of());
    DiscreteNotchSet d = DiscreteNotchSet.of(c, r, new NotchDesigner());
    assertEquals(List.of(), d.sections());
    assertEquals("no notch was designed", d.note());
    assertEquals(r.designedLoop(), d.designedLoop());
    // a null note reads as empty
    assertEquals("", new DiscreteNotchSet(T, List.of(), r.designedLoop(), null, null).note());
  }
}
