package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.FlutterClearance;
import org.flexmargin.clearance.FlutterClearanceRule;
import org.flexmargin.clearance.OnsetSearch;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/**
 * Onsets that can be trusted: a typical section swept with three points over 10 to 5000 m/s TAS
 * (sea level) loses its roots between grid points. The first release reported no flutter and
 * exited 0 although the section flutters at 393.1 m/s. Now the sweep is re-solved with finer steps;
 * whatever is still in doubt is marked unreliable, no flutter-free speed is claimed beyond it, and
 * the result never states a confident wrong onset. Aerodynamics used outside their range are
 * named.
 */
class TrustedOnsetTest {
  private static final AnalysisCase LPW = CaseReader.read(Path.of("mode-tables/validation/typical-section-lpw.json"));

  /** Lee, Price &amp; Wong typical section (parameters from memory, see the case file): U* = 6.2566, b omega_alpha
   * = 62.832 m/s, so U_F = 393.1 m/s TAS (derived, exact Theodorsen; docs/validation.md). */
  private static final double FLUTTER_TAS_MPS = 6.2566 * 2 * Math.PI * 10.0;

  private static AnalysisCase with(SpeedSweep sweep) {
    return new AnalysisCase(1, "lpw-coarse", "", LPW.configurations(), sweep, LPW.options(), List.of());
  }

  @Test
  void aCoarseWideSweepNeverGivesAConfidentWrongOnset() {
    AnalysisCase c = with(new SpeedSweep(0, AirspeedKind.TRUE, 10, 5000, 3));
    PlannedPath path = new PlannedPath(c.sweep());
    ConfigurationResult r = CaseSweep.analyse(c.configurations().get(0), path, c);
    assertTrue(r.flutter().warnings().stream().anyMatch(w -> w.contains("re-solved with every interval split")),
        r.flutter().warnings().toString());
    Instability onset = r.lowestOpenLoopFlutter().orElse(null);
    double trusted = r.trackingTrustedUpToEasMps().orElse(Double.POSITIVE_INFINITY);
    if (onset != null && onset.reliable()) {
      // 0.5 %: the refined onset with the default 0.05 m/s tolerance is far closer; EAS = TAS at sea level
      assertEquals(FLUTTER_TAS_MPS, onset.speedEasMps(), 0.005 * FLUTTER_TAS_MPS, onset.describe());
    } else {
      assertTrue(trusted < FLUTTER_TAS_MPS, "flutter missed inside the trusted range");
    }
    List<Finding> findings = Findings.of(new SweepResult(c, path.describe(), List.of(r)), path.at(0));
    for (Finding f : findings) {
      boolean crossing = f.what().startsWith("flutter") || f.what().startsWith("damping");
      if (crossing && f.speedEasMps() > trusted) {
        assertTrue(f.what().endsWith(Findings.UNRELIABLE), "unmarked finding beyond the trusted range: " + f);
      }
    }
    if (Double.isFinite(trusted)) {
      assertTrue(findings.stream().anyMatch(f -> f.what().equals(Findings.TRACKING_IN_DOUBT)));
    }
  }

  @Test
  void noFlutterFreeSpeedIsClaimedBeyondTheTrustedRange() {
    // invented V0max 120, V_L 150 m/s EAS: 1.15 V_L = 172.5 m/s
    var req = RequirementPresets.recalledMilitaryAndTransport(120, 150);
    FlutterClearance doubt = FlutterClearanceRule.assess(req,
        List.of(OnsetSearch.trustedUpTo(OnsetSearch.OPEN_LOOP, OptionalDouble.of(160.0), 100.0)), -0.05);
    ClearanceCheck speed = doubt.checks().stream().filter(x -> x.kind() == CheckKind.FLUTTER_SPEED).findFirst()
        .orElseThrow();
    assertFalse(speed.passed(), "an onset beyond the trusted range is not a flutter-free speed");
    assertEquals(100.0, speed.achievedValue(), 0.0);
    assertTrue(speed.description().contains("UNRELIABLE"), speed.description());
    FlutterClearance trustedFar = FlutterClearanceRule.assess(req,
        List.of(OnsetSearch.trustedUpTo(OnsetSearch.OPEN_LOOP, OptionalDouble.empty(), 200.0)), -0.05);
    assertTrue(trustedFar.passed(), "doubt only beyond the required speed does not fail the rule");
  }

  @Test
  void aerodynamicsOutsideTheirRangeAreNamed() {
    Configuration strips = LPW.configurations().get(0);
    // 10 to 5000 m/s at sea level reaches Mach 14.7 (a = 340.29 m/s, US Standard Atmosphere 1976)
    List<String> w = AeroValidity.warnings(strips, new PlannedPath(new SpeedSweep(0, AirspeedKind.TRUE, 10, 5000, 3)));
    assertEquals(1, w.size());
    assertTrue(w.get(0).contains("supersonic") && w.get(0).contains("Mach 14.69"), w.get(0));
    // up to 100 m/s TAS at sea level: Mach 0.294, inside the documented Mach 0.3
    assertTrue(AeroValidity.warnings(strips, new PlannedPath(new SpeedSweep(0, AirspeedKind.TRUE, 10, 100, 5)))
        .isEmpty());
    // a force table at Mach 0.5 swept at Mach 0.03 to 0.29 (sea level, 10 to 100 m/s TAS)
    List<String> t = AeroValidity.warnings(0.5, new PlannedPath(new SpeedSweep(0, AirspeedKind.TRUE, 10, 100, 5)));
    assertEquals(1, t.size());
    assertTrue(t.get(0).contains("force table holds at Mach 0.500"), t.get(0));
    // the same table swept at Mach 0.47 to 0.53 (160 to 180 m/s TAS): within +-0.05
    assertTrue(AeroValidity.warnings(0.5, new PlannedPath(new SpeedSweep(0, AirspeedKind.TRUE, 160, 180, 3)))
        .isEmpty());
  }
}
