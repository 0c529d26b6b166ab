package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/** Crossings are roots between grid points, not grid values, on every kind of sweep path. */
class OnsetRefinementTest {

  @Test
  void everyCrossingIsIndependentOfTheGrid() {
    // Property: refining the grid tenfold must reproduce every crossing (same branch, same kind)
    // to the refinement tolerance (0.01 m/s default, here checked at 0.05 m/s).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.goland(4, 4, 40));
    List<FlutterCrossing> coarse = new PkMethod().solve(sys,
        new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 60, 240, 19)), AnalysisOptions.defaults()).crossings();
    List<FlutterCrossing> fine = new PkMethod().solve(sys,
        new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 60, 240, 181)), AnalysisOptions.defaults()).crossings();
    assertTrue(coarse.size() >= 3, "onset, limit crossing and a recovering limit crossing expected: " + coarse);
    assertEquals(fine.size(), coarse.size());
    boolean sawFalling = false;
    for (FlutterCrossing c : coarse) {
      FlutterCrossing match = fine.stream()
          .filter(f -> f.branch() == c.branch() && f.kind() == c.kind())
          .filter(f -> Math.abs(f.condition().speedTasMps() - c.condition().speedTasMps()) < 0.05)
          .findFirst().orElse(null);
      assertTrue(match != null, "no fine-grid match for " + c);
      sawFalling |= c.kind() == CrossingKind.DAMPING_ABOVE_LIMIT || c.kind() == CrossingKind.FLUTTER_RECOVERY;
    }
    assertTrue(sawFalling, "a falling (recovery-type) crossing must be classified too");
  }

  @Test
  void machSweepOnsetAgreesWithASpeedSweepAtTheOnsetAltitude() {
    // Consistency: at constant Mach the onset is at some altitude h*; a speed sweep at h* must find
    // the same root crossing at TAS = M a(h*).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.goland(3, 3, 30));
    double mach = 0.45;
    FlutterSolution m = new PkMethod().solve(sys, new PlannedPath(new MachSweep(mach, 12000, 0, 25)),
        AnalysisOptions.defaults());
    FlutterCrossing onset = m.firstOnset().orElseThrow();
    FlightCondition at = onset.condition();
    assertEquals(mach, at.mach(), 1e-12);
    FlutterSolution s = new PkMethod().solve(sys,
        new PlannedPath(new SpeedSweep(at.altitudeM(), AirspeedKind.TRUE, 0.5 * at.speedTasMps(),
            1.5 * at.speedTasMps(), 21)), AnalysisOptions.defaults());
    double v = s.crossings().stream().filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET
            && c.branch() == onset.branch()).findFirst().orElseThrow().condition().speedTasMps();
    // both refined to ~0.01 m/s along different paths through the same point
    assertEquals(at.speedTasMps(), v, 0.05);
  }
}
