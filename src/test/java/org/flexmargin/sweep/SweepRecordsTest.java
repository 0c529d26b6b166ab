package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/**
 * The sweep's result records and their derived values, from their definitions: root damping and
 * frequency, the lowest instability and its wording, onset refinements, findings names and the
 * aerodynamic-range warnings.
 */
class SweepRecordsTest {

  /** Sea level, US Standard Atmosphere 1976 (rho0 = 1.225 kg/m^3 makes EAS = TAS exactly). */
  private static FlightCondition seaLevel(double tas) {
    return new FlightCondition(0, 1.225, 101325, 288.15, 340.294, tas);
  }

  /** Closed-loop roots at the sweep start (none needed by the checks that use it). */
  private static final List<ClosedLoopPoint> START = List.of(new ClosedLoopPoint(0, seaLevel(50), List.of(), 4));

  private static FlutterCrossing onset(double tas, double hz) {
    return new FlutterCrossing(0, "wing_bending", CrossingKind.FLUTTER_ONSET, 3.2, seaLevel(tas), hz, 0, 7,
        1e-6);
  }

  /** s = -0.5 + 6 pi j: 3 Hz, zeta = 0.5/|s|, V-g g = 2 Re/Im = -1/(6 pi). */
  @Test
  void closedLoopRootDampingAndFrequency() {
    ClosedLoopRoot r = new ClosedLoopRoot(-0.5, 6 * Math.PI, "wing_bending");
    assertEquals(3, r.frequencyHz(), 1e-15);
    assertEquals(0.5 / Math.hypot(0.5, 6 * Math.PI), r.dampingRatio(), 1e-15);
    assertEquals(-1 / (6 * Math.PI), r.dampingG(), 1e-15);
    // a root at the origin is not growing: g = -infinity
    assertEquals(Double.NEGATIVE_INFINITY, new ClosedLoopRoot(0, 0, "x").dampingG());
    assertEquals(Double.POSITIVE_INFINITY, new ClosedLoopRoot(0.5, 0, "x").dampingG());
    assertEquals(Double.NEGATIVE_INFINITY, new ClosedLoopRoot(-0.5, 0, "x").dampingG());
    assertEquals(1.0, new ClosedLoopRoot(-0.5, 0, "x").dampingRatio(), 0.0);
    assertEquals(0.0, new ClosedLoopRoot(0, 0, "x").dampingRatio(), 0.0);
  }

  @Test
  void closedLoopPointReportsItsLargestRealPart() {
    ClosedLoopPoint p = new ClosedLoopPoint(0, seaLevel(50), List.of(new ClosedLoopRoot(-1, 3, "a"),
        new ClosedLoopRoot(0.25, 9, "b"), new ClosedLoopRoot(-3, 0, "c")), 6);
    assertEquals(0.25, p.maxRealPart(), 0.0);
    assertEquals(Double.NEGATIVE_INFINITY, new ClosedLoopPoint(0, seaLevel(50), List.of(), 0).maxRealPart());
  }

  @Test
  void instabilityIsValidatedAndWorded() {
    assertThrows(InvalidInputException.class,
        () -> new Instability(null, "m", 50, 3, false, true));
    assertThrows(InvalidInputException.class,
        () -> new Instability(Instability.Kind.DIVERGENCE, null, 50, 0, false, true));
    assertThrows(InvalidInputException.class,
        () -> new Instability(Instability.Kind.DIVERGENCE, "-", 0, 0, false, true));
    assertThrows(InvalidInputException.class,
        () -> new Instability(Instability.Kind.DIVERGENCE, "-", Double.NaN, 0, false, true));
    assertThrows(InvalidInputException.class,
        () -> new Instability(Instability.Kind.DIVERGENCE, "-", Double.POSITIVE_INFINITY, 0, false, true));
    Instability cl = new Instability(Instability.Kind.CLOSED_LOOP_FLUTTER, "fuselage_bending_2", 61.885,
        18.4812, false, true);
    assertTrue(cl.closedLoop());
    assertEquals("closed-loop flutter of fuselage_bending_2 from 61.89 m/s EAS at 18.481 Hz", cl.describe());
    Instability real = new Instability(Instability.Kind.CLOSED_LOOP_DIVERGENT_ROOT, "rigid body + loop", 40,
        0, true, true);
    assertTrue(real.closedLoop());
    assertEquals("closed-loop instability (real root) of rigid body + loop at or below 40.00 m/s EAS",
        real.describe());
    Instability open = new Instability(Instability.Kind.OPEN_LOOP_FLUTTER, "torsion", 120, 7.5, false, false);
    assertFalse(open.closedLoop());
    assertEquals("open-loop flutter of torsion from 120.00 m/s EAS at 7.500 Hz "
        + "(UNRELIABLE: mode tracking in doubt)", open.describe());
    Instability div = new Instability(Instability.Kind.DIVERGENCE, "-", 180, 0, false, true);
    assertFalse(div.closedLoop());
    assertEquals("divergence at 180.00 m/s EAS", div.describe());
    assertEquals("closed_loop_divergent_root", Instability.Kind.CLOSED_LOOP_DIVERGENT_ROOT.key());
  }

  /** Exact onset 3.5 m/s and 0.25 Hz above the rational one. */
  @Test
  void onsetRefinementDifferencesAndRoute() {
    FlutterCrossing rational = onset(100, 5.0);
    FlutterCrossing exact = onset(103.5, 5.25);
    OnsetRefinement ok = new OnsetRefinement(rational, Optional.of(exact), 1e-12, 4, "");
    assertTrue(ok.confirmed());
    assertSame(exact, ok.onset());
    assertEquals(3.5, ok.speedDifferenceEasMps(), 1e-12);
    assertEquals(0.25, ok.frequencyDifferenceHz(), 1e-12);
    OnsetRefinement failed = new OnsetRefinement(rational, Optional.empty(), 0.3, 50, "no convergence");
    assertFalse(failed.confirmed());
    assertSame(rational, failed.onset());
    assertTrue(Double.isNaN(failed.speedDifferenceEasMps()));
    assertTrue(Double.isNaN(failed.frequencyDifferenceHz()));
    assertThrows(IllegalArgumentException.class, () -> new OnsetRefinement(null, Optional.empty(), 0, 0, ""));
    assertThrows(IllegalArgumentException.class, () -> new OnsetRefinement(rational, null, 0, 0, ""));
    assertThrows(IllegalArgumentException.class, () -> new OnsetRefinement(rational, Optional.empty(), 0, 0, null));
    ClosedLoopResult r = new ClosedLoopResult(START, List.of(exact), "fit", 3, List.of(), List.of(),
        List.of(ok));
    assertEquals("exact frequency-domain loop; rational model 100.00 m/s EAS, difference +3.50 m/s",
        r.routeOf(exact));
    assertEquals("closed-loop state space", r.routeOf(onset(90, 4)));
    assertEquals("closed-loop state space", new ClosedLoopResult(START, List.of(), "fit", 0, List.of(),
        List.of(), List.of(failed)).routeOf(rational));
  }

  /** 1 kt = 1852/3600 m/s exactly (international nautical mile). */
  @Test
  void findingSpeedInKnots() {
    Finding f = new Finding("clean", "divergence", "-", 1852.0 / 3600.0 * 250, Double.NaN, Double.NaN, 0, 0, "");
    assertEquals(250, f.speedEasKnots(), 1e-12);
  }

  @Test
  void findingNamesOfRequirementsAndClosedLoopInstabilities() {
    for (CheckKind k : CheckKind.values()) {
      Finding f = new Finding("c", Findings.requirementOnset(k), "-", 1, 1, 0, 0, 0, "");
      assertTrue(Findings.isRequirementOnset(f), k.name());
      assertFalse(Findings.isClosedLoopInstability(f), k.name());
    }
    assertEquals("phase margin too small", Findings.requirementOnset(CheckKind.PHASE_MARGIN));
    Finding onset = new Finding("c", "closed-loop flutter onset", "m", 1, 1, 0, 0, 3, "");
    assertTrue(Findings.isClosedLoopInstability(onset));
    assertFalse(Findings.isRequirementOnset(onset));
    assertTrue(Findings.isClosedLoopInstability(new Finding("c", Findings.CLOSED_LOOP_UNSTABLE_AT_START, "m", 1, 1,
        0, 0, 3, "")));
    assertFalse(Findings.isClosedLoopInstability(new Finding("c", "flutter onset", "m", 1, 1, 0, 0, 3, "")));
    assertEquals("damping back above limit", Findings.label(CrossingKind.DAMPING_ABOVE_LIMIT));
    assertEquals("flutter recovery", Findings.label(CrossingKind.FLUTTER_RECOVERY));
  }

  /**
   * Sea-level sweep 50, 100, 150 m/s (EAS = TAS): Mach V/a with a = 340.294 m/s (US Standard
   * Atmosphere 1976, sea level, from memory) is 0.147, 0.294, 0.441. Strip theory is taken as
   * valid to Mach 0.3 (class comment), so 150 m/s is outside; the Prandtl-Glauert factor there is
   * 1/sqrt(1 - 0.441^2) = 1.114, i.e. about 11 %.
   */
  @Test
  void aerodynamicRangeWarnings() {
    PlannedPath path = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 150, 3));
    List<String> strip = AeroValidity.warnings(Double.NaN, path);
    assertEquals(1, strip.size());
    assertTrue(strip.get(0).contains("reaches Mach 0.441 at 150.00 m/s EAS"), strip.get(0));
    assertTrue(strip.get(0).contains("from the grid point at 150.00 m/s EAS"), strip.get(0));
    assertTrue(strip.get(0).contains("about 11 %"), strip.get(0));
    // a table at Mach 0.3 accepts 0.25..0.35: only 100 m/s (0.294) is inside
    List<String> table = AeroValidity.warnings(0.3, path);
    assertEquals(1, table.size());
    assertTrue(table.get(0).contains("runs from Mach 0.147 to 0.441 (first outside at 50.00 m/s EAS)"),
        table.get(0));
    // a table at Mach 0.147 +- 0.05 holds at 50 m/s only; a path within both limits has no warning
    PlannedPath slow = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 40, 60, 3));
    assertTrue(AeroValidity.warnings(Double.NaN, slow).isEmpty());
    assertTrue(AeroValidity.warnings(0.15, slow).isEmpty());
    // beyond Mach 1 the strip-theory warning says so instead of quoting Prandtl-Glauert
    PlannedPath fast = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 300, 400, 2));
    assertTrue(AeroValidity.warnings(Double.NaN, fast).get(0).contains("supersonic"));
  }
}
