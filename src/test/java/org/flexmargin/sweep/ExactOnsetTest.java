package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Comparator;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * One loop, one stability boundary: the closed-loop onsets of the invented demo aircraft are
 * where the exact broken loop passes through -1, and the eigenvalue route agrees with them
 * (docs/validation.md sec. 13.3).
 */
class ExactOnsetTest {
  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
  private static Configuration cfg;
  private static ConfigurationModel model;
  private static PlannedPath path;
  private static ClosedLoopResult result;

  @BeforeAll
  static void sweep() {
    cfg = DEMO.configurations().get(0);
    model = ConfigurationModel.of(cfg);
    // the demo's altitude and EAS range, 5 m/s steps: every closed-loop onset of full_payload
    path = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 35, 170, 28));
    FlutterSolution open = new PkMethod().solve(model.system(), path, DEMO.options());
    result = new ClosedLoopSweep().analyse(model, cfg, DEMO.loop(), path, open, DEMO.options());
  }

  @Test
  void atEveryClosedLoopOnsetTheGainMarginIsZero() {
    assertFalse(result.refinements().isEmpty(), "the demo has closed-loop onsets");
    for (OnsetRefinement r : result.refinements()) {
      assertTrue(r.confirmed(), r.rational().branchName() + ": " + r.remark());
      FlutterCrossing x = r.onset();
      assertTrue(result.crossings().contains(x), "the exact onset is the reported crossing");
      ServoLoop servo = ServoMargins.loopAt(model, cfg, DEMO.loop(), x.condition());
      LoopMarginResult m = ServoMargins.withDefaults().at(servo, Eigenvalues.none(),
          ServoMargins.bandTopHz(model));
      PhaseCrossover pc = m.phaseCrossovers().stream()
          .min(Comparator.comparingDouble(p -> Math.abs(p.frequencyHz() - x.frequencyHz()))).orElseThrow();
      // Newton stops at |1 + L| < 1e-9, i.e. |L| = 1 within 1e-9 (9e-9 dB); the margin search
      // locates its phase crossover by Brent to 1e-13 in ln w: 1e-6 dB leaves a wide margin
      assertEquals(0.0, pc.gainMarginDb(), 1e-6, x.branchName() + " at " + x.condition().speedEasMps());
      assertEquals(x.frequencyHz(), pc.frequencyHz(), 1e-6 * x.frequencyHz());
    }
  }

  @Test
  void eigenvalueAndFrequencyDomainRoutesAgreeOnTheFuselageBendingOnset() {
    // With the hold modelled alike in both routes the remaining difference is the Roger fit of the
    // strip-theory forces and the order-2 Pade delay and hold: measured -0.71 m/s here (77.67
    // rational, 76.96 exact, with the coupling of the tailplane and higher wing modes computed from
    // the strips); the first release, whose state space dropped the hold's droop, put the rational
    // onset about 4 m/s below the exact one. 1 m/s is less than half the demo's 2.5 m/s grid step.
    OnsetRefinement fb2 = result.refinements().stream()
        .filter(r -> r.rational().branchName().equals("fuselage_bending_2")
            && r.rational().kind() == CrossingKind.FLUTTER_ONSET)
        .min(Comparator.comparingDouble(r -> r.rational().pathParameter())).orElseThrow();
    assertEquals(0.0, fb2.speedDifferenceEasMps(), 1.0, fb2.rational().condition().speedEasMps() + " rational, exact "
        + fb2.exact().map(e -> e.condition().speedEasMps()).orElse(Double.NaN));
  }
}
