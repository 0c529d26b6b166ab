package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeTable;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * The independent re-run on the invented demo: what it reports per mode, which crossings count as
 * rigid-body ones, and agreement with the sampled estimate the optimiser uses (two methods: an
 * adaptive grid with Brent-refined crossings against linear interpolation on 60 points per decade).
 */
class IndependentCheckTest {
  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void oneCheckedPeakPerModeInItsBandAtTheShiftedFrequencies() {
    NotchDesignSpec spec = NotchDesignSpec.defaults();
    Configuration cfg = DEMO.configurations().get(0);
    List<CheckedPeak> peaks = new ArrayList<>();
    RigidMargins m = IndependentCheck.at(DEMO, DEMO.loop(), spec, cfg, 1.1, 4, peaks);
    List<ElasticMode> nominal = ((ModeTable) cfg.structure()).modes();
    List<ElasticMode> shifted = new ArrayList<>();
    for (ElasticMode e : nominal) {
      shifted.add(new ElasticMode(e.name(), 1.1 * e.frequencyHz(), e.dampingRatio(), e.generalizedMassKg(), null));
    }
    FlightCondition fc = new PlannedPath(DEMO.sweep()).at(4);
    assertEquals(nominal.size(), peaks.size());
    for (int k = 0; k < peaks.size(); k++) {
      CheckedPeak p = peaks.get(k);
      assertEquals(nominal.get(k).name(), p.mode());
      assertEquals(new SampleLabel(cfg.name(), 4, fc.speedEasMps(), fc.altitudeM(), 1.1), p.where());
      double[] band = CaseLoopSampler.band(shifted, k, spec.modeBandFraction());
      assertTrue(p.frequencyHz() >= band[0] * (1 - 1e-9) && p.frequencyHz() <= band[1] * (1 + 1e-9),
          p + " outside " + band[0] + ".." + band[1]);
      assertTrue(Double.isFinite(p.peakDb()));
    }
    assertEquals(cfg.name(), m.configuration());
    assertEquals(4, m.gridPoint());
    assertEquals(fc.speedEasMps(), m.speedEasMps());
    // the verdict is the documented comparison with 45 deg / 6 dB
    assertEquals(m.phaseMarginDeg() >= 45 && m.gainIncreaseMarginDb() >= 6 && m.gainReductionMarginDb() <= -6,
        m.meetsRequirement());
  }

  @Test
  void crossingsAboveTheRigidBandDoNotCount() {
    // a rigid band ending at a millionth of the lowest mode holds no crossing at all
    NotchDesignSpec spec = new NotchDesignSpec(List.of(), 3, -6, 0.1, 45, 6, 1e-6, ExistingNotches.REPLACE, 1,
        Double.POSITIVE_INFINITY, 0.5, 0.1, null);
    RigidMargins m = IndependentCheck.at(DEMO, DEMO.loop(), spec, DEMO.configurations().get(1), 1.0, 10, null);
    assertEquals(Double.POSITIVE_INFINITY, m.phaseMarginDeg());
    assertTrue(Double.isNaN(m.crossoverHz()));
    assertEquals(Double.POSITIVE_INFINITY, m.gainIncreaseMarginDb());
    assertEquals(Double.NEGATIVE_INFINITY, m.gainReductionMarginDb());
    assertTrue(m.meetsRequirement());
  }

  @Test
  void rigidMarginsAgreeWithTheSampledEstimate() {
    // first two sweep points, nominal frequencies, both configurations, the case's own loop
    NotchDesignSpec spec = NotchDesignSpec.defaults().withFrequencyUncertainty(0).withPoints(1, 37.5);
    List<Integer> paths = PathFilters.defaultNotchPaths(DEMO);
    LoopSamples s = CaseLoopSampler.sample(DEMO, DEMO.loop(), paths, spec);
    SampleEvaluation e = new NotchEvaluator(s).evaluate(List.of());
    assertEquals(4, s.size());
    for (int i = 0; i < s.size(); i++) {
      SampleLabel l = s.label(i);
      Configuration cfg = DEMO.configurations().stream().filter(c -> c.name().equals(l.configuration()))
          .findFirst().orElseThrow();
      RigidMargins m = IndependentCheck.at(DEMO, DEMO.loop(), spec, cfg, 1.0, l.gridPoint(), null);
      // the demo loop has a rigid-body gain crossover and phase crossings in its rigid band
      assertTrue(Double.isFinite(m.phaseMarginDeg()), m.toString());
      // linear interpolation between grid points 0.038 apart in ln w against Brent-refined
      // crossings: within 0.5 deg and 0.2 dB
      assertEquals(m.phaseMarginDeg(), e.phaseMarginDeg()[i], 0.5, m.toString());
      if (Double.isFinite(m.gainIncreaseMarginDb())) {
        assertEquals(m.gainIncreaseMarginDb(), e.gainIncreaseMarginDb()[i], 0.2, m.toString());
      }
      if (Double.isFinite(m.gainReductionMarginDb())) {
        assertEquals(m.gainReductionMarginDb(), e.gainReductionMarginDb()[i], 0.2, m.toString());
      }
      // the reported crossover is one of the sampled loop's crossovers
      double best = Double.POSITIVE_INFINITY;
      for (double w : s.crossoversRadPerS(i)) {
        best = Math.min(best, Math.abs(w / (2 * Math.PI) - m.crossoverHz()));
      }
      assertTrue(best < 1e-3 * m.crossoverHz(), m + " vs " + java.util.Arrays.toString(s.crossoversRadPerS(i)));
    }
  }
}
