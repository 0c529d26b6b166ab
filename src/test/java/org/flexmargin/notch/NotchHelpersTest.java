package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.sweep.ConfigurationModel;
import org.junit.jupiter.api.Test;

/** Worst peaks and phase costs over samples, spread of table speeds, mode bands, design points, records. */
class NotchHelpersTest {
  private static final double NAN = Double.NaN;

  private static LoopSamples samples(String[] configurations, String... modes) {
    LoopSamples.Builder b = LoopSamples.builder();
    int[] grids = new int[modes.length];
    for (int i = 0; i < modes.length; i++) {
      grids[i] = b.modeGrid(10, 0.05, 0.1);
    }
    int r = b.rigidGrid(0.01, 1);
    for (int i = 0; i < configurations.length; i++) {
      b.add(new SampleLabel(configurations[i], i, 40 + i, 0, 1), ClosedForm.constant(0, 0),
          ClosedForm.constant(0, 0), List.of(modes), grids, r);
    }
    return b.build();
  }

  private static SampleEvaluation evaluation(double[][] db, double[][] hz, double[] loss, double[] lossHz) {
    double[] z = new double[loss.length];
    return new SampleEvaluation(db, hz, loss, lossHz, z, z, z);
  }

  @Test
  void worstPeakPerModeIsTheLargestNonNanValueFirstOnTies() {
    LoopSamples s = samples(new String[] {"x", "y", "x"}, "a", "b", "c");
    double[][] db = {{-3, NAN, -2}, {NAN, NAN, -2}, {-1, NAN, -5}};
    double[][] hz = {{10, NAN, 20}, {NAN, NAN, 21}, {11, NAN, 22}};
    List<ModePeak> p = NotchDesigner.worstPeaks(s, evaluation(db, hz, new double[3], new double[3]));
    assertEquals(3, p.size());
    assertEquals(new ModePeak("a", -1, 11, s.label(2)), p.get(0));
    assertEquals("b", p.get(1).mode());
    assertTrue(Double.isNaN(p.get(1).peakDb()) && Double.isNaN(p.get(1).frequencyHz()));
    assertNull(p.get(1).where());
    assertEquals(new ModePeak("c", -2, 20, s.label(0)), p.get(2));
  }

  @Test
  void phaseCostIsTheWorstLossOverSamplesWithACrossoverPerConfiguration() {
    LoopSamples s = samples(new String[] {"x", "y", "x", "z", "z"}, "a");
    double[][] none = {{0}, {0}, {0}, {0}, {0}};
    // y has no crossover (NaN); z's losses are leads (negative) and tie: the first is kept
    SampleEvaluation e = evaluation(none, none, new double[] {5, 9, 7, -3, -3},
        new double[] {1, NAN, 2, 0.5, 0.6});
    assertEquals(new PhaseCost("all", 7, 2, s.label(2)), NotchDesigner.phaseCost(s, e, null));
    assertEquals(new PhaseCost("x", 7, 2, s.label(2)), NotchDesigner.phaseCost(s, e, "x"));
    PhaseCost y = NotchDesigner.phaseCost(s, e, "y");
    assertEquals("y", y.configuration());
    assertEquals(0.0, y.worstLossDeg());
    assertTrue(Double.isNaN(y.crossoverHz()));
    assertNull(y.where());
    assertEquals(new PhaseCost("z", -3, 0.5, s.label(3)), NotchDesigner.phaseCost(s, e, "z"));
    assertEquals(0.0, NotchDesigner.phaseCost(s, e, "absent").worstLossDeg());
    // the first sample the worst
    SampleEvaluation first = evaluation(none, none, new double[] {4, 1, 2, 3, 0}, new double[] {1, 1, 1, 1, 1});
    assertEquals(new PhaseCost("all", 4, 1, s.label(0)), NotchDesigner.phaseCost(s, first, null));
  }

  @Test
  void spreadPicksEvenlySpacedPointsWithBothEnds() {
    List<Integer> ten = List.of(0, 1, 2, 3, 4, 5, 6, 7, 8, 9);
    // indices round(i * 9 / 4): 0, 2.25, 4.5, 6.75, 9 -> 0, 2, 5, 7, 9 (half rounds up)
    assertEquals(List.of(0, 2, 5, 7, 9), IndependentCheck.spread(ten, 5));
    assertEquals(List.of(0, 9), IndependentCheck.spread(ten, 2));
    assertEquals(List.of(0), IndependentCheck.spread(ten, 1));
    assertEquals(List.of(), IndependentCheck.spread(ten, 0));
    // fewer points than asked: all of them, once each
    assertEquals(List.of(3, 6, 8), IndependentCheck.spread(List.of(3, 6, 8), 5));
    assertEquals(List.of(4, 7), IndependentCheck.spread(List.of(4, 4, 7), 3));
    assertEquals(List.of(12), IndependentCheck.spread(List.of(12), 5));
  }

  private static ElasticMode mode(String n, double f) {
    return new ElasticMode(n, f, 0.02, 1, Map.of());
  }

  @Test
  void modeBandsAreCutAtTheGeometricMeanWithNeighbours() {
    List<ElasticMode> m = List.of(mode("a", 10), mode("b", 12), mode("c", 30), mode("d", 10), mode("e", 5));
    // a: 7..13 cut above by sqrt(10*12) and by the equal-frequency d (later in the list) at 10,
    // below by sqrt(10*5) = 7.07
    assertArrayEquals(new double[] {Math.sqrt(50), 10}, CaseLoopSampler.band(m, 0, 0.3), 1e-12);
    // d: equal to a and after it: the band starts at 10; above, sqrt(120)
    assertArrayEquals(new double[] {10, Math.sqrt(120)}, CaseLoopSampler.band(m, 3, 0.3), 1e-12);
    // c: 21..39 cut below at sqrt(360) = 18.97 < 21: the fraction governs
    assertArrayEquals(new double[] {21, 39}, CaseLoopSampler.band(m, 2, 0.3), 1e-12);
    // e alone at the bottom: 4.5..5.5, the neighbour at sqrt(50) = 7.07 too far to cut
    assertArrayEquals(new double[] {4.5, 5.5}, CaseLoopSampler.band(m, 4, 0.1), 1e-12);
    // three equal frequencies: the middle one's band collapses and is given a 0.1 % width
    List<ElasticMode> same = List.of(mode("p", 10), mode("q", 10), mode("r", 10));
    assertArrayEquals(new double[] {10, 10.01}, CaseLoopSampler.band(same, 1, 0.2), 1e-12);
    // a single mode: just the fraction
    assertArrayEquals(new double[] {8, 12}, CaseLoopSampler.band(List.of(mode("s", 10)), 0, 0.2), 1e-12);
  }

  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void designPointsTakeEveryStrideThePointAtTheLimitAndTheLastPoint() {
    // demo sweep: 55 points from 35 to 170 m/s EAS, 2.5 m/s apart (35 + 2.5 p)
    NotchDesignSpec d = NotchDesignSpec.defaults();
    assertEquals(55, CaseLoopSampler.points(DEMO, d).size());
    assertEquals(List.of(0, 10, 20, 30, 40, 50, 54), CaseLoopSampler.points(DEMO, d.withPoints(10, 1e9)));
    // up to 70 m/s: p <= 14, every 6th
    assertEquals(List.of(0, 6, 12), CaseLoopSampler.points(DEMO, d.withPoints(6, 70)));
    // the point exactly at the limit speed is kept (p = 14 at 70 m/s), the next one is not
    List<Integer> all70 = CaseLoopSampler.points(DEMO, d.withPoints(1, 70));
    assertEquals(15, all70.size());
    assertEquals(14, all70.get(14));
    assertEquals(List.of(0), CaseLoopSampler.points(DEMO, d.withPoints(1, 35)));
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> CaseLoopSampler.points(DEMO, d.withPoints(1, 34.9)));
    assertEquals("max_speed_eas_mps", e.fieldPath());
  }

  @Test
  void shiftedModelScalesEveryElasticFrequencyOnly() {
    ConfigurationModel m = ConfigurationModel.of(DEMO.configurations().get(0));
    assertSame(m, CaseLoopSampler.shifted(m, 1.0));
    ConfigurationModel s = CaseLoopSampler.shifted(m, 1.1);
    assertEquals(m.modes().name(), s.modes().name());
    assertEquals(m.modes().modes().size(), s.modes().modes().size());
    for (int k = 0; k < m.modes().modes().size(); k++) {
      ElasticMode a = m.modes().modes().get(k);
      ElasticMode b = s.modes().modes().get(k);
      assertEquals(a.name(), b.name());
      assertEquals(1.1 * a.frequencyHz(), b.frequencyHz(), 1e-12);
      assertEquals(a.dampingRatio(), b.dampingRatio());
      assertEquals(a.generalizedMassKg(), b.generalizedMassKg());
      assertEquals(a.shapes(), b.shapes());
    }
    assertSame(m.system().aero(), s.system().aero());
  }

  @Test
  void designedNotchRecordCarriesTheClosedFormDepthAndWidths() {
    DesignedNotch d = DesignedNotch.of(new NotchFilter(10, 0.05, 0.5));
    assertEquals(10, d.centreHz());
    assertEquals(0.05, d.numeratorDampingRatio());
    assertEquals(0.5, d.denominatorDampingRatio());
    // depth -20 log10(0.05/0.5) = 20 dB
    assertEquals(20, d.depthDb(), 1e-12);
    // -3 dB width 2 f sqrt(zp^2 - 2 zz^2) = 20 sqrt(0.245); half-depth width 2 f sqrt(zz zp) = 20 sqrt(0.025)
    assertEquals(20 * Math.sqrt(0.245), d.minus3DbWidthHz(), 1e-12);
    assertEquals(20 * Math.sqrt(0.025), d.halfDepthWidthHz(), 1e-12);
    assertEquals(new NotchFilter(10, 0.05, 0.5), d.filter());
  }

  @Test
  void sampleLabelsNeedAConfigurationAndAPositiveShift() {
    assertThrows(InvalidInputException.class, () -> new SampleLabel(null, 0, 1, 1, 1));
    assertThrows(InvalidInputException.class, () -> new SampleLabel(" ", 0, 1, 1, 1));
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> new SampleLabel("c", 0, 1, 1, 0));
    assertEquals("sample.shift_factor", e.fieldPath());
    assertThrows(InvalidInputException.class, () -> new SampleLabel("c", 0, 1, 1, NAN));
    assertEquals(1e-9, new SampleLabel("c", 0, 1, 1, 1e-9).shiftFactor());
  }

  @Test
  void sampleEvaluationCopiesInAndOut() {
    double[][] p = {{1, 2}};
    double[] a = {3};
    SampleEvaluation e = new SampleEvaluation(p, p, a, a, a, a, a);
    p[0][0] = 9;
    a[0] = 9;
    assertEquals(1, e.peakDb()[0][0]);
    assertEquals(1, e.peakHz()[0][0]);
    e.peakDb()[0][1] = 9;
    e.peakHz()[0][1] = 9;
    assertEquals(2, e.peakDb()[0][1]);
    assertEquals(2, e.peakHz()[0][1]);
    for (double[] x : List.of(e.phaseLossDeg(), e.phaseLossCrossoverHz(), e.phaseMarginDeg(),
        e.gainIncreaseMarginDb(), e.gainReductionMarginDb())) {
      assertEquals(3, x[0]);
      x[0] = 7;
    }
    assertEquals(3, e.phaseLossDeg()[0]);
    assertEquals(3, e.phaseLossCrossoverHz()[0]);
    assertEquals(3, e.phaseMarginDeg()[0]);
    assertEquals(3, e.gainIncreaseMarginDb()[0]);
    assertEquals(3, e.gainReductionMarginDb()[0]);
    assertEquals(3, e.worstPhaseLossDeg());
    double[] l = {-2, 4, 1};
    assertEquals(4, new SampleEvaluation(new double[3][0], new double[3][0], l, l, l, l, l).worstPhaseLossDeg());
  }
}
