package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/** Stage counts of cases with a loop, and the mode couplings a loop analysis uses (demo case inputs). */
class SweepRecordsStagesTest {

  @Test
  void aLoopAddsTheClosedLoopAndTheMargins() {
    AnalysisCase demo = ClearanceLoopTest.DEMO;
    SpeedSweep sweep = new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 200, 4);
    // divergence and flutter, closed loop, loop margins, and the clearance
    assertEquals(4, SweepProgress.stagesPerConfiguration(new AnalysisCase(1, "a", "", demo.configurations(), sweep,
        AnalysisOptions.defaults(), List.of(), demo.loop(), demo.requirements())));
    assertEquals(3, SweepProgress.stagesPerConfiguration(new AnalysisCase(1, "a", "", demo.configurations(), sweep,
        AnalysisOptions.defaults(), List.of(), demo.loop())));
  }

  @Test
  void couplingsOfEveryModeInTableOrderWhereRigidBodyDataExist() {
    Configuration c = ClearanceLoopTest.CFG;
    Map<String, ModeCoupling> m = ModeCouplings.of(c);
    ModeTable table = (ModeTable) c.structure();
    assertEquals(table.modes().stream().map(ElasticMode::name).toList(), List.copyOf(m.keySet()));
    // the couplings the case lists are used as given
    assertTrue(!c.rigidBody().modeCoupling().isEmpty());
    c.rigidBody().modeCoupling().forEach((mode, given) -> assertEquals(given, m.get(mode), mode));
    // a built-in structure has no mode table to couple, even with rigid-body data
    assertTrue(ModeCouplings.of(new Configuration("section", MatchedPointsTest.SECTION, null, c.rigidBody()))
        .isEmpty());
  }
}
