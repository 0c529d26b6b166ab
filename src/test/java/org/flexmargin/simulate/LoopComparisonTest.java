package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.LoopSpec;
import org.junit.jupiter.api.Test;

/**
 * The report's time-domain check: where it flies, what it says about its inputs, and that a
 * proposed loop runs the same scenario (a proposed loop equal to the case's gives the same
 * histories).
 */
class LoopComparisonTest {
  static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void flownAtV0maxAtTheSweepAltitudeAndDescribed() {
    SharedModels models = new SharedModels();
    LoopComparison check = LoopComparison.of(DEMO, models, DEMO.loop(), "same loop");
    assertEquals("full_payload", check.configurationName());
    // demo case file: V0max 100 m/s EAS, sweep altitude 3000 m. ISA density at 3000 m 0.90925 kg/m^3
    // against 1.225 at sea level (ICAO standard atmosphere, Doc 7488, from memory): sigma = 0.74225,
    // TAS = EAS / sqrt(sigma) = 100 / 0.86154 = 116.07 m/s
    assertEquals(100.0, check.condition().speedEasMps(), 1e-9);
    assertEquals(3000.0, check.condition().altitudeM(), 1e-9);
    assertEquals(116.07, check.condition().speedTasMps(), 0.05, "table density to 5 digits");
    String d = check.description();
    assertTrue(d.startsWith("full_payload at V0max = 100.0 m/s EAS (116.1 m/s TAS, 3000 m): 1 deg doublet "
        + "(0.5 s pulses) at the elevator command; 1-cosine gusts of 10 m/s over H = [9, 31, 107] m"), d);
    // the case file's actuator: 60 deg/s rate limit, 20 deg position limit
    assertTrue(d.endsWith("actuator rate limit 60 deg/s, position limit 20 deg; loop closed"), d);
    assertEquals(2, check.variants().size());
    assertEquals("case loop", check.variants().get(0).label());
    assertEquals("same loop", check.variants().get(1).label());
    SimulationResult a = check.variants().get(0).result();
    SimulationResult b = check.variants().get(1).result();
    assertArrayEquals(a.pilot().timesS(), b.pilot().timesS());
    for (int i = 0; i < a.pilot().names().size(); i++) {
      assertArrayEquals(a.pilot().values()[i], b.pilot().values()[i], 0.0, a.pilot().names().get(i));
    }
    assertEquals(1, models.size(), "both loops on the one model of the first configuration");
  }

  @Test
  void withoutALoopOrRequirementsThereIsNoCheck() {
    AnalysisCase noLoop = new AnalysisCase(DEMO.format(), DEMO.name(), DEMO.description(), DEMO.configurations(),
        DEMO.sweep(), DEMO.options(), DEMO.inputs(), null, DEMO.requirements());
    AnalysisCase noTable = new AnalysisCase(DEMO.format(), DEMO.name(), DEMO.description(), DEMO.configurations(),
        DEMO.sweep(), DEMO.options(), DEMO.inputs(), DEMO.loop(), null);
    assertThrows(IllegalArgumentException.class, () -> LoopComparison.of(noLoop, null, "x"));
    assertThrows(IllegalArgumentException.class, () -> LoopComparison.of(noTable, null, "x"));
  }

  @Test
  void anActuatorWithoutLimitsIsSaidToHaveNone() {
    LoopSpec l = DEMO.loop();
    ActuatorSpec free = new ActuatorSpec(l.actuator().order(), l.actuator().bandwidthHz(), l.actuator().dampingRatio());
    AnalysisCase c = new AnalysisCase(DEMO.format(), DEMO.name(), DEMO.description(), DEMO.configurations(),
        DEMO.sweep(), DEMO.options(), DEMO.inputs(), new LoopSpec(free, l.sensors(), l.paths(), l.computationDelayS(),
            l.samplePeriodS(), l.padeOrder()), DEMO.requirements());
    LoopComparison check = LoopComparison.of(c, null, "x");
    assertEquals(1, check.variants().size(), "no proposed loop, one run");
    assertTrue(check.description().endsWith("actuator rate limit none, position limit none; loop closed"),
        check.description());
  }
}
