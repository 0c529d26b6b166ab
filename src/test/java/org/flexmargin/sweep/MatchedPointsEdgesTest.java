package org.flexmargin.sweep;

import static org.flexmargin.sweep.MatchedPointsTest.INCOMPRESSIBLE;
import static org.flexmargin.sweep.MatchedPointsTest.STRUCTURE;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.model.GafTable;
import org.junit.jupiter.api.Test;

/**
 * Matched points that are not found or do not settle, the order of the boundary, and the warnings
 * of {@link MatchedPoints#of} for forces that do not depend on the Mach number, checked against the
 * closed-form divergence pressures of the typical section (q_D = 6400 pi Pa, {@link CaseSweepTest})
 * and of the one-mode pitch table ({@link MachTablesSweepTest}).
 */
class MatchedPointsEdgesTest {
  /** Sea-level speed of sound 340.294 m/s (US Standard Atmosphere 1976, from memory). */
  static final double A0 = 340.294;
  /** Sea level, a single line at 20 to 320 m/s TAS on 16 points (cheap, and enough for an onset). */
  static final EnvelopeSpec SEA_LEVEL = new EnvelopeSpec(new double[] {0}, new double[0], 20, 320, 16, 150,
      Double.NaN);

  static DoubleFunction<AeroSource> scaled(double scale) {
    return m -> new FunctionForces(INCOMPRESSIBLE.size(), INCOMPRESSIBLE.referenceSemichordM(),
        INCOMPRESSIBLE.minReducedFrequency(), INCOMPRESSIBLE.maxReducedFrequency(), (k, out) -> {
          INCOMPRESSIBLE.forces(k, out);
          CommonOps_ZDRM.elementMultiply(out, scale, 0, out);
        }, "scaled strip theory");
  }

  static final AeroSource NO_FORCES = new FunctionForces(2, 0.5, 0, Double.POSITIVE_INFINITY, FunctionForces.NONE,
      "no forces");

  /** Forces that alternate between strip theory and twice strip theory at every call: no fixed point. */
  static final class Alternating implements DoubleFunction<AeroSource> {
    private final AeroSource one = scaled(1).apply(0);
    private final AeroSource two = scaled(2).apply(0);
    int calls;

    @Override
    public AeroSource apply(double mach) {
      return calls++ % 2 == 0 ? one : two;
    }
  }

  @Test
  void pointsThatAreNotFound() {
    // 20 to 40 m/s: far below the section's flutter and divergence speeds
    EnvelopeSpec slow = new EnvelopeSpec(new double[] {0}, new double[0], 20, 40, 3, 150, Double.NaN);
    MatchedPoints.Point f = MatchedPoints.flutterAtAltitude(STRUCTURE, m -> INCOMPRESSIBLE, 0, slow,
        AnalysisOptions.defaults(), 0.3);
    assertFalse(f.found());
    assertTrue(f.converged());
    assertNull(f.condition());
    assertEquals(1, f.iterations());
    assertEquals(0.3, f.forcesMach(), 0.0);
    assertTrue(Double.isNaN(f.frequencyHz()));
    assertEquals("no flutter onset up to 40.0 m/s TAS at 0 m (forces at Mach 0.300)", f.note());
    MatchedPoints.Point d = MatchedPoints.divergenceAtAltitude(STRUCTURE, m -> NO_FORCES, 0, 0.3);
    assertFalse(d.found());
    assertTrue(d.converged());
    assertEquals(1, d.iterations());
    assertEquals("no divergence (forces at Mach 0.300)", d.note());
    MatchedPoints.Point dm = MatchedPoints.divergenceAtMach(STRUCTURE, NO_FORCES, 0.5);
    assertFalse(dm.found());
    assertEquals("no divergence at Mach 0.500", dm.note());
    assertEquals(MatchedPoints.Kind.DIVERGENCE_AT_MACH, dm.kind());
    // Mach 0.1 at 0 to 6000 m is at most 34 m/s TAS: no flutter on that line
    MatchedPoints.Point fm = MatchedPoints.flutterAtMach(STRUCTURE, INCOMPRESSIBLE, 0.1, 6000, 0,
        MatchedPointsTest.SPEC, AnalysisOptions.defaults());
    assertFalse(fm.found());
    assertEquals(1, fm.iterations());
    assertEquals("no flutter onset at Mach 0.100 between 6000 and 0 m", fm.note());
  }

  /** The number in "... needs a static pressure of N Pa, ..." of a divergence-at-Mach note. */
  static double pressureOf(MatchedPoints.Point p) {
    String[] words = p.note().split(" ");
    for (int i = 0; i < words.length; i++) {
      if (words[i].equals("Pa,")) {
        return Double.parseDouble(words[i - 1]);
      }
    }
    throw new AssertionError(p.note());
  }

  @Test
  void divergenceAlongAMachNumberOutsideTheStandardAtmosphere() {
    // gamma p M^2 / 2 = q_D gives p = 2 q_D / (1.4 M^2) (derived). At Mach 0.1: 2.87 MPa, above the
    // pressure at -5 km (about 177 kPa); the note rounds p to 1 Pa
    double qd = CaseSweepTest.Q_D;
    MatchedPoints.Point low = MatchedPoints.divergenceAtMach(STRUCTURE, INCOMPRESSIBLE, 0.1);
    assertFalse(low.found());
    assertTrue(low.converged());
    assertTrue(low.note().startsWith("divergence at Mach 0.100 needs a static pressure of "), low.note());
    assertTrue(low.note().endsWith(" Pa, outside the standard atmosphere"), low.note());
    assertEquals(2 * qd / (1.4 * 0.01), pressureOf(low), 1 + 1e-6 * 2.9e6);
    // forces a million times larger: q_D = 0.02 Pa, p = 0.115 Pa at Mach 0.5, below the pressure
    // at 86 km (about 0.37 Pa, US Standard Atmosphere 1976, from memory)
    MatchedPoints.Point high = MatchedPoints.divergenceAtMach(STRUCTURE, scaled(1e6).apply(0.5), 0.5);
    assertFalse(high.found());
    assertEquals(0, pressureOf(high), 0.5);
    // Mach 0.6: p = 80.2 kPa, inside: found at Mach 0.6
    MatchedPoints.Point in = MatchedPoints.divergenceAtMach(STRUCTURE, INCOMPRESSIBLE, 0.6);
    assertTrue(in.found());
    assertEquals(0.6, in.condition().mach(), 1e-12);
    assertEquals(0, in.frequencyHz(), 0.0);
    assertEquals(1, in.iterations());
  }

  @Test
  void forcesThatKeepChangingDoNotSettle() {
    Alternating forces = new Alternating();
    MatchedPoints.Point f = MatchedPoints.flutterAtAltitude(STRUCTURE, forces, 0, SEA_LEVEL,
        AnalysisOptions.defaults(), 0.3);
    // one solve per iteration, all of them used
    assertEquals(MatchedPoints.MAX_ITERATIONS, forces.calls);
    assertFalse(f.converged());
    assertFalse(f.found());
    assertNull(f.condition());
    assertEquals(MatchedPoints.MAX_ITERATIONS, f.iterations());
    assertTrue(f.note().startsWith("Mach number of the forces did not settle at 0 m after 20 iterations (last "),
        f.note());
    MatchedPoints.Point d = MatchedPoints.divergenceAtAltitude(STRUCTURE, new Alternating(), 0, 0.3);
    assertFalse(d.converged());
    assertEquals(MatchedPoints.Kind.DIVERGENCE_AT_ALTITUDE, d.kind());
    assertEquals(20, d.iterations());
    // the last Mach number tried is that of twice the forces: q_D / 2, V = sqrt(q_D / rho0)
    // (the 20th call gets the doubled forces; that point's Mach number is the last one kept)
    double v = Math.sqrt(CaseSweepTest.Q_D / 1.225);
    assertTrue(d.note().contains(String.format(Locale.ROOT, "(last %.4f)", v / A0)), d.note());
  }

  @Test
  void theBoundaryListsEachAltitudeThenEachMachNumber() {
    EnvelopeSpec spec = new EnvelopeSpec(new double[] {0, 6000}, new double[] {0.3, 0.6}, 20, 320, 16, 150,
        Double.NaN);
    List<MatchedPoints.Point> b = MatchedPoints.boundary(STRUCTURE, m -> INCOMPRESSIBLE, spec,
        AnalysisOptions.defaults(), 0.3);
    assertEquals(List.of(MatchedPoints.Kind.FLUTTER_AT_ALTITUDE, MatchedPoints.Kind.DIVERGENCE_AT_ALTITUDE,
        MatchedPoints.Kind.FLUTTER_AT_ALTITUDE, MatchedPoints.Kind.DIVERGENCE_AT_ALTITUDE,
        MatchedPoints.Kind.FLUTTER_AT_MACH, MatchedPoints.Kind.DIVERGENCE_AT_MACH,
        MatchedPoints.Kind.FLUTTER_AT_MACH, MatchedPoints.Kind.DIVERGENCE_AT_MACH),
        b.stream().map(MatchedPoints.Point::kind).toList());
    // divergence at 0 and 6000 m: V = sqrt(2 q_D / rho(h)); rho(6000 m) = 0.6601 kg/m^3 (US Standard
    // Atmosphere 1976 table, from memory, four digits)
    assertEquals(0, b.get(1).condition().altitudeM(), 0.0);
    assertEquals(Math.sqrt(2 * CaseSweepTest.Q_D / 1.225), b.get(1).condition().speedTasMps(), 1e-6 * 181);
    assertEquals(6000, b.get(3).condition().altitudeM(), 0.0);
    assertEquals(Math.sqrt(2 * CaseSweepTest.Q_D / 0.6601), b.get(3).condition().speedTasMps(), 1e-4 * 247);
    // the constant-Mach lines carry their own Mach numbers
    assertEquals(0.3, b.get(5).forcesMach(), 0.0);
    assertEquals(0.6, b.get(7).condition().mach(), 1e-12);
    // the flutter onsets at each altitude: same branch, the same frequency as the ordinary sweep
    assertTrue(b.get(0).found() && b.get(2).found());
    assertEquals(0, b.get(0).condition().altitudeM(), 0.0);
    assertEquals(6000, b.get(2).condition().altitudeM(), 0.0);
    assertFalse(b.get(0).mode().isEmpty());
    assertTrue(b.get(0).frequencyHz() > 0);
  }

  @Test
  void stripTheoryIsMachIndependentAndItsPointsBeyondMach03AreFlagged() {
    // divergence at sea level: V = sqrt(2 q_D / rho0) = 181.2 m/s, Mach 181.2 / 340.294 = 0.533,
    // beyond strip theory's Mach 0.3
    Configuration c = new Configuration("section", MatchedPointsTest.SECTION, null);
    MatchedPoints.Envelope e = MatchedPoints.of(c, SEA_LEVEL, AnalysisOptions.defaults());
    assertEquals("section", e.configuration());
    assertEquals(MatchedPointsTest.MODEL.system().aero().description(), e.aero());
    assertEquals(2, e.points().size());
    List<String> w = e.warnings();
    assertTrue(w.get(0).startsWith("the forces do not depend on the Mach number (incompressible strip theory)"),
        w.get(0));
    double mach = Math.sqrt(2 * CaseSweepTest.Q_D / 1.225) / A0;
    assertTrue(w.stream().anyMatch(x -> x.equals(String.format(Locale.ROOT, "aerodynamics outside their range: "
        + "divergence at altitude at 0 m, Mach %.3f, lies outside the forces' Mach range 0.000 to 0.300 (the "
        + "nearest forces were used)", mach))), w.toString());
  }

  /** One pitch mode with the table's forces Q = Q0 - 0.3 i k at one Mach number (MachTablesSweepTest). */
  static Configuration pitchAt(double mach) {
    double[] ks = {0, 0.2, 0.5, 1.0};
    double[][][] re = new double[ks.length][1][1];
    double[][][] im = new double[ks.length][1][1];
    for (int k = 0; k < ks.length; k++) {
      re[k][0][0] = MachTablesSweepTest.Q0;
      im[k][0][0] = -0.3 * ks[k];
    }
    return new Configuration("pitch", MachTablesSweepTest.pitchMode(), new GafTable(0.5, mach, List.of("pitch"),
        ks, re, im));
  }

  @Test
  void aTableAtOneMachNumberHoldsAtThatMachNumberOnly() {
    // q_D0 = K / Q0 = 2467.4 Pa (MachTablesSweepTest): at sea level V = sqrt(2 q_D0 / rho0) =
    // 63.47 m/s, Mach 0.187, outside 0.30 +- 0.05; at 10 000 m (rho 0.4135 kg/m^3, a 299.5 m/s, US
    // Standard Atmosphere 1976 table, from memory) 109.2 m/s, Mach 0.365, also outside
    EnvelopeSpec spec = new EnvelopeSpec(new double[] {0, 10000}, new double[0], 10, 50, 5, 150, Double.NaN);
    MatchedPoints.Envelope e = MatchedPoints.of(pitchAt(0.3), spec, AnalysisOptions.defaults());
    List<String> w = e.warnings();
    assertTrue(w.get(0).startsWith("the forces do not depend on the Mach number (a force table at one Mach "
        + "number)"), w.get(0));
    double v0 = Math.sqrt(2 * MachTablesSweepTest.QD0 / 1.225);
    // 1e-6 relative: the static eigen-solve's accuracy (the strip case agrees with its closed form
    // to 1e-6, MatchedPointsTest)
    assertEquals(v0, e.points().get(1).condition().speedTasMps(), 1e-6 * v0);
    assertTrue(w.contains(String.format(Locale.ROOT, "aerodynamics outside their range: divergence at altitude at "
        + "0 m, Mach %.3f, lies outside the forces' Mach range 0.300 to 0.300 (the nearest forces were used)",
        v0 / A0)), w.toString());
    assertEquals(3, w.size());
    // the same table at Mach 0.365 holds at 10 000 m (within 0.05) but not at sea level
    MatchedPoints.Envelope near = MatchedPoints.of(pitchAt(0.365), spec, AnalysisOptions.defaults());
    assertEquals(2, near.warnings().size());
    assertTrue(near.warnings().get(1).contains("at 0 m"), near.warnings().toString());
  }
}
