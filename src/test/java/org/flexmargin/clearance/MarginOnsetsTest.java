package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.loop.FirstOrderLag;
import org.flexmargin.loop.Gain;
import org.flexmargin.loop.Integrator;
import org.flexmargin.loop.LoopMargins;
import org.flexmargin.loop.SeriesBlock;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.RequirementPresets;
import org.junit.jupiter.api.Test;

/**
 * Onset brackets and the excess function on a loop whose gain grows with speed, K = V / 50 (per
 * m/s) in K/(s(s+1)(s+2)), so that both onsets are known in closed form. Requirements: the
 * recalled preset (MIL-F-9490D from memory) with V0max = 200 m/s so the whole sweep is in the
 * normal envelope (rigid-body band: 6 dB, 45 deg).
 */
class MarginOnsetsTest {
  private static final ClearanceRequirements REQ =
      RequirementPresets.recalledMilitaryAndTransport(200, 220);
  private static final LoopMargins MARGINS = new LoopMargins();

  private static PointAssessment at(double v) {
    double k = v / 50;
    var loop = SeriesBlock.of(new Gain(k / 2), new Integrator(1), new FirstOrderLag(1),
        new FirstOrderLag(0.5));
    return PointAssessor.assess(REQ, v, 3.0, MARGINS.analyse(loop, 0.01, 100), List.of(), null);
  }

  @Test
  void bracketsAndRefinedOnsetsMatchTheClosedForms() {
    // GM = 20 log10(6/K) = 6 dB at K = 6 x 10^(-6/20): V = 300 x 10^(-0.3) = 150.36 m/s.
    double vGm = 300 * Math.pow(10, -6.0 / 20);
    // PM = 45 deg where atan w + atan(w/2) = 45 deg: 1.5 w = 1 - w^2/2, w = (sqrt 17 - 3)/2, and
    // |L(jw)| = 1 gives K = w sqrt(w^2+1) sqrt(w^2+4) (derived by hand): V = 66.9 m/s.
    double w = (Math.sqrt(17) - 3) / 2;
    double vPm = 50 * w * Math.sqrt(w * w + 1) * Math.sqrt(w * w + 4);
    List<PointAssessment> sweep = new ArrayList<>();
    for (double v = 50; v <= 200; v += 25) {
      sweep.add(at(v));
    }
    List<MarginOnsets.Bracket> br = MarginOnsets.brackets(sweep);
    assertEquals(2, br.size(), br.toString());
    MarginOnsets.Bracket pm = br.get(0);
    assertEquals(new CheckKey(CheckKind.PHASE_MARGIN, "rigid_body"), pm.key());
    assertTrue(pm.passingSpeedEasMps() <= vPm && vPm <= pm.failingSpeedEasMps());
    MarginOnsets.Bracket gm = br.get(1);
    assertEquals(new CheckKey(CheckKind.GAIN_INCREASE_MARGIN, "rigid_body"), gm.key());
    assertTrue(gm.passingSpeedEasMps() <= vGm && vGm <= gm.failingSpeedEasMps());

    // refine with Commons Math's Brent solver on the excess. Margins are solved to ~1e-13 in
    // ln w, i.e. ~1e-8 dB / deg; dV/dGM = V ln10/20 ~ 17 m/s per dB and dV/dPM ~ 2 m/s per deg,
    // so 1e-5 m/s bounds the error with a wide margin.
    DoubleFunction<PointAssessment> f = MarginOnsetsTest::at;
    for (MarginOnsets.Bracket b : br) {
      DoubleUnaryOperator e = MarginOnsets.excessAlongSpeed(f, b.key());
      double v = new BrentSolver(1e-9).solve(100, e::applyAsDouble, b.passingSpeedEasMps(),
          b.failingSpeedEasMps());
      assertEquals(b == pm ? vPm : vGm, v, 1e-5);
    }
  }
}
