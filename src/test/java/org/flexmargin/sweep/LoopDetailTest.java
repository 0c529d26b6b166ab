package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.loop.MarginOptions;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/**
 * Leaving out the loop-at-a-time margins leaves every point's margins of the loop broken at the
 * actuator command, its notch checks and its condition as they are, on the small section with
 * its single-path loop.
 */
class LoopDetailTest {
  @Test
  void withoutPathMarginsThePointsAreTheSameButForThePathMargins() {
    Configuration cfg = LoopTestSection.configuration(0.02);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 30, 60, 3));
    LoopSpec loop = LoopTestSection.loop(1.0);
    FlutterSolution ol = new PkMethod().solve(m.system(), path, AnalysisOptions.defaults());
    List<ServoPoint> full = new ServoMargins(MarginOptions.defaults()).along(m, cfg, loop, path, ol);
    List<ServoPoint> lean = new ServoMargins(MarginOptions.defaults(), false).along(m, cfg, loop, path, ol);
    List<ServoPoint> withPaths = new ServoMargins(MarginOptions.defaults(), true).along(m, cfg, loop, path, ol);
    assertEquals(3, lean.size());
    for (int p = 0; p < 3; p++) {
      assertEquals(1, full.get(p).pathMargins().size(), "one feedback path");
      assertEquals(full.get(p).pathMargins(), withPaths.get(p).pathMargins());
      assertTrue(lean.get(p).pathMargins().isEmpty());
      assertEquals(full.get(p).margins(), lean.get(p).margins());
      assertEquals(full.get(p).notches(), lean.get(p).notches());
      assertEquals(full.get(p).condition(), lean.get(p).condition());
    }
  }

  @Test
  void fullDetailIsTheDefaultSearchWithThePathMargins() {
    assertEquals(MarginOptions.defaults(), LoopDetail.full().marginOptions());
    assertTrue(LoopDetail.full().pathMargins());
    MarginOptions lean = MarginOptions.defaults().withoutExtremaRefinement();
    assertFalse(new LoopDetail(lean, false).pathMargins());
    assertEquals(lean, new LoopDetail(lean, false).marginOptions());
    assertThrows(NullPointerException.class, () -> new LoopDetail(null, true));
  }
}
