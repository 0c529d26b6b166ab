package org.flexmargin.sweep;

import static org.flexmargin.sweep.InstabilityFindingsTest.NO_DIVERGENCE;
import static org.flexmargin.sweep.InstabilityFindingsTest.crossing;
import static org.flexmargin.sweep.InstabilityFindingsTest.seaLevel;
import static org.flexmargin.sweep.InstabilityFindingsTest.solution;
import static org.flexmargin.sweep.InstabilityFindingsTest.sweep;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.clearance.CheckKey;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.model.FlutterMethodKind;
import org.junit.jupiter.api.Test;

/**
 * The findings table with requirement onsets from a clearance, at a sweep start above sea level,
 * and for several configurations, from hand-made results as in {@link InstabilityFindingsTest}.
 */
class FindingsClearanceTest {

  static ConfigurationResult result(String name, DivergenceResult d, FlutterSolution f, ClearanceResult c) {
    return new ConfigurationResult(name, List.of("bending", "torsion"), new double[] {3, 9}, "strips", d,
        OptionalDouble.empty(), Double.NaN, f, 0.1, null, c);
  }

  static final FlutterSolution QUIET = solution(FlutterMethodKind.PK, List.of(), List.of(), Double.NaN);

  @Test
  void requirementOnsetsAreNamedByRequirementAndSubject() {
    List<MarginOnset> onsets = List.of(
        new MarginOnset(new CheckKey(CheckKind.GAIN_INCREASE_MARGIN, "rigid_body"), "gain margin, rigid-body band",
            seaLevel(120), 6, "dB", 7, true),
        new MarginOnset(new CheckKey(CheckKind.STRUCTURAL_MODE, "wing_bending"), "structural mode wing_bending",
            seaLevel(90), 0, "dB", 4, false),
        new MarginOnset(new CheckKey(CheckKind.CLOSED_LOOP_STABILITY, ""), "closed-loop stability", seaLevel(110), 0,
            "", 0, true));
    ClearanceResult c = new ClearanceResult(List.of(), onsets, ClearanceRankingTest.flutterRule(-0.05), "table",
        List.of());
    List<Finding> all = Findings.of(sweep(result("clean", NO_DIVERGENCE, QUIET, c)), seaLevel(50));
    assertEquals(List.of("no divergence", "structural mode not stabilised", "closed loop unstable",
        "gain-increase margin too small"), all.stream().map(Finding::what).toList());
    Finding mode = all.get(1);
    assertEquals("wing bending", mode.mode());
    assertEquals(90, mode.speedEasMps(), 0.0);
    assertEquals(0, mode.frequencyHz(), 0.0);
    assertEquals("structural mode wing_bending (not refined: the check vanished between grid points)",
        mode.remark());
    assertEquals("closed loop", all.get(2).mode());
    assertEquals("closed-loop stability", all.get(2).remark());
    Finding gain = all.get(3);
    assertEquals("rigid body band", gain.mode());
    assertEquals(120, gain.speedTasMps(), 0.0);
    assertEquals(120 / 340.294, gain.mach(), 1e-15);
    assertEquals("gain margin, rigid-body band", gain.remark());
    assertTrue(all.stream().filter(Findings::isRequirementOnset).count() == 3);
  }

  @Test
  void aRootNotConvergedAtTheFirstPointHasNoStartStatus() {
    // g_Vg = 0.5 at the first point would be unstable, but the root did not converge there
    var lost = InstabilityFindingsTest.branch("torsion", new double[] {0.5, -0.1, -0.1, -0.1},
        new boolean[] {false, true, true, true});
    var start = InstabilityFindingsTest.branch("bending", new double[] {0.5, -0.1, -0.1, -0.1},
        InstabilityFindingsTest.ALL);
    List<Finding> all = Findings.of(sweep(result("clean", NO_DIVERGENCE, solution(FlutterMethodKind.PK,
        List.of(lost, start), List.of(), Double.NaN), null)), seaLevel(50));
    assertEquals(List.of("no divergence", Findings.OPEN_LOOP_UNSTABLE_AT_START), all.stream().map(Finding::what)
        .toList());
    assertEquals("bending", all.get(1).mode());
  }

  @Test
  void divergenceAtTheSweepStartAltitudeAndFindingsPerConfiguration() {
    // a start at 3000 m (rho 0.9093 kg/m^3, a 328.58 m/s, US Standard Atmosphere 1976, from
    // memory; the findings only use what the condition says): divergence at q = 12 250 Pa has TAS
    // sqrt(2 q / rho) there
    FlightCondition start = new FlightCondition(3000, 0.9093, 70121, 268.65, 328.58, 60);
    DivergenceResult d = new DivergenceResult(true, 12250, 141.42, new double[] {1, 0}, 1e-12, 0, "");
    FlutterSolution late = solution(FlutterMethodKind.K, List.of(), List.of(
        crossing("torsion", CrossingKind.FLUTTER_ONSET, 190, 4, 0)), Double.NaN);
    FlutterSolution early = solution(FlutterMethodKind.K, List.of(), List.of(
        crossing("bending", CrossingKind.FLUTTER_ONSET, 60, 3, 0),
        crossing("bending", CrossingKind.FLUTTER_RECOVERY, 55, 3, 0)), Double.NaN);
    List<Finding> all = Findings.of(sweep(result("first", d, late, null), result("second", NO_DIVERGENCE, early,
        null)), start);
    // each configuration's findings in order of airspeed, configurations in case order
    assertEquals(List.of("first: divergence", "first: flutter onset", "second: no divergence",
        "second: flutter recovery", "second: flutter onset"),
        all.stream().map(f -> f.configuration() + ": " + f.what()).toList());
    Finding div = all.get(0);
    double tas = Math.sqrt(2 * 12250 / 0.9093);
    assertEquals(tas, div.speedTasMps(), 1e-12 * tas);
    assertEquals(tas / 328.58, div.mach(), 1e-12);
    assertEquals(3000, div.altitudeM(), 0.0);
    assertEquals(141.42, div.speedEasMps(), 0.0);
    assertEquals("rigid body restrained; beyond the sweep", div.remark());
    assertEquals(3000, all.get(2).altitudeM(), 0.0);
    assertEquals("damping g = 0 reached (k method)", all.get(1).remark());
  }
}
