package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.MarginOptions;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.SweepProgress;
import org.junit.jupiter.api.Test;

/**
 * A campaign sample leaves out the refinement of the peak gain and the disk margin and the
 * loop-at-a-time margins, which it does not report: its outcome (onsets, verdict, governing finding, margin curve) is exactly that of
 * the full sweep, on the notched demo with its loop and requirements.
 */
class SampleRunnerMarginsTest {
  @Test
  void theSampleOutcomeDoesNotDependOnTheExtremaRefinementOrThePathMargins() {
    assertFalse(SampleRunner.SAMPLE_MARGINS.refineExtrema());
    assertEquals(SampleRunner.SAMPLE_MARGINS, SampleRunner.SAMPLE_DETAIL.marginOptions());
    assertFalse(SampleRunner.SAMPLE_DETAIL.pathMargins());
    AnalysisCase c = CaseReader.read(Path.of("mode-tables/demo/demo-case-notched.json"));
    SpeedSweep s = (SpeedSweep) c.sweep();
    PlannedPath path = new PlannedPath(new SpeedSweep(s.altitudeM(), s.kind(), s.fromMps(), s.toMps(), 14));
    Configuration cfg = c.configurations().get(0);
    ConfigurationModel model = ConfigurationModel.of(cfg);
    ConfigurationResult full = CaseSweep.analyse(model, cfg, path, c, SweepProgress.NONE, MarginOptions.defaults());
    ConfigurationResult sample = CaseSweep.analyse(model, cfg, path, c, SweepProgress.NONE,
        SampleRunner.SAMPLE_DETAIL);
    // the full sweep has the loop-at-a-time margins of both feedback paths, the sample none
    assertEquals(2, full.servo().points().get(0).pathMargins().size());
    assertTrue(sample.servo().points().stream().allMatch(p -> p.pathMargins().isEmpty()));
    assertNotNull(full.clearance(), "the notched demo has requirements");
    double[] draws = {1.0};
    SampleOutcome a = SampleRunner.outcome(0, 0, 0, draws, full);
    SampleOutcome b = SampleRunner.outcome(0, 0, 0, draws, sample);
    assertEquals(a.status(), b.status());
    assertEquals(a.divergenceEasMps(), b.divergenceEasMps(), 0.0);
    assertEquals(a.openLoopFlutterEasMps(), b.openLoopFlutterEasMps(), 0.0);
    assertEquals(a.closedLoopOnsetEasMps(), b.closedLoopOnsetEasMps(), 0.0);
    assertEquals(a.marginOnsetEasMps(), b.marginOnsetEasMps(), 0.0);
    assertEquals(a.criticalEasMps(), b.criticalEasMps(), 0.0);
    assertEquals(a.governing(), b.governing());
    assertArrayEquals(a.margins().speedEasMps(), b.margins().speedEasMps(), 0.0);
    assertArrayEquals(a.margins().gainMarginDb(), b.margins().gainMarginDb(), 0.0);
    assertArrayEquals(a.margins().phaseMarginDeg(), b.margins().phaseMarginDeg(), 0.0);
    // and the clearance's findings themselves
    assertEquals(full.clearance().passed(), sample.clearance().passed());
    assertEquals(full.clearance().failures(), sample.clearance().failures());
    assertEquals(full.clearance().marginOnsets().size(), sample.clearance().marginOnsets().size());
  }
}
