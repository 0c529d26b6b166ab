package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.PointAssessor;
import org.flexmargin.clearance.ModeFrequency;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/** Margin onsets are roots of the requirement's excess; verdicts follow the checks. */
class ClearanceSweepTest {

  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void refinedMarginOnsetsAreRootsOfTheExcess() {
    Configuration cfg = DEMO.configurations().get(0);
    AnalysisCase small = new AnalysisCase(1, "demo-part", "", List.of(cfg),
        new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 30, 60, 7), DEMO.options(), List.of(), DEMO.loop(),
        DEMO.requirements());
    PlannedPath path = new PlannedPath(small.sweep());
    ConfigurationResult r = CaseSweep.analyse(cfg, path, small);
    ClearanceResult c = r.clearance();
    assertFalse(c.passed(), "the demo's starting loop is meant to fail");
    assertFalse(c.marginOnsets().isEmpty());
    ConfigurationModel m = ConfigurationModel.of(cfg);
    int checked = 0;
    for (MarginOnset o : c.marginOnsets()) {
      if (!o.refined() || o.key().kind() == CheckKind.CLOSED_LOOP_STABILITY) {
        continue;
      }
      ServoLoop sl = ServoMargins.loopAt(m, cfg, DEMO.loop(), o.condition());
      LoopMarginResult lm = ServoMargins.withDefaults().at(sl, ServoMargins.seeds(r.flutter(), 0),
          ServoMargins.bandTopHz(m));
      List<ModeFrequency> modes = m.modes().modes().stream()
          .map(e -> new ModeFrequency(e.name(), e.frequencyHz())).toList();
      // independent re-assessment at the refined onset: the excess of that requirement is ~0
      double f1 = r.flutter().branches().stream().mapToDouble(b -> b.frequencyHz()[0]).min().orElseThrow();
      PointAssessment pa = PointAssessor.assess(DEMO.requirements(), o.condition().speedEasMps(), f1, lm,
          ClosedLoopStability.NOT_CHECKED, modes, sl.brokenLoop());
      if (pa.worstExcess(o.key()).isPresent()) {
        double e = pa.worstExcess(o.key()).getAsDouble();
        // 0.05 m/s speed tolerance times the excess slope (a few dB or deg per m/s at most here);
        // the mode frequencies used here are in-vacuo, the sweep's are p-k: allow 0.5 unit
        assertEquals(0.0, e, 0.5, o.description());
        checked++;
      }
    }
    assertTrue(checked > 0, "no refined onset could be re-assessed");
  }

  @Test
  void casesWithoutRequirementsHaveNoVerdict() {
    Configuration cfg = DEMO.configurations().get(0);
    AnalysisCase noReq = new AnalysisCase(1, "demo-part", "", List.of(cfg),
        new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 30, 40, 3), DEMO.options(), List.of(), DEMO.loop());
    ConfigurationResult r = CaseSweep.analyse(cfg, new PlannedPath(noReq.sweep()), noReq);
    assertEquals(null, r.clearance());
    assertTrue(r.servo() != null);
  }
}
