package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.InertiaAxis;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.model.UniformCantileverWing;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/** Divergence against closed forms and a textbook worked example. */
class DivergenceValidationTest {

  @Test
  void typicalSectionMatchesClosedForm() {
    // Closed form (Hodges & Pierce, Introduction to Structural Dynamics and Aeroelasticity, ch. 5,
    // typical-section divergence): q_D = K_alpha / (S a0 e), S = 2 b s, e = b (a + 1/2).
    double b = 0.5;
    double a = -0.2;
    double mass = 20.0;
    double r2 = 0.3;
    double fAlpha = 6.0;
    double span = 2.0;
    double a0 = 5.8;
    TypicalSection ts = new TypicalSection(b, mass, a, 0.1, r2, 2.0, fAlpha, a0, span, 0.0);
    double kAlpha = span * mass * r2 * b * b * Math.pow(2 * Math.PI * fAlpha, 2);
    double qD = kAlpha / (2 * b * span * a0 * b * (a + 0.5));
    DivergenceResult r = new DivergenceSolver().solve(ValidationCases.system(ts));
    assertTrue(r.found());
    // 1e-10 relative: the modal transformation is exact; only rounding remains
    assertEquals(qD, r.dynamicPressurePa(), 1e-10 * qD);
    // p = 0 is an exact root of the flutter determinant at q_D: K - q_D Q(0) is singular
    assertTrue(r.relativeResidual() < 1e-10, "residual " + r.relativeResidual());
  }

  @Test
  void elasticAxisAtQuarterChordNeverDiverges() {
    // Closed form: e = 0 gives no aerodynamic pitching moment about the elastic axis.
    DivergenceResult r = new DivergenceSolver().solve(ValidationCases.system(ValidationCases.lpwSection()));
    assertFalse(r.found());
  }

  @Test
  void megsonWingExample() {
    // Megson, Aircraft Structures for Engineering Students, wing divergence example (Eq. 29.11 in
    // recent editions): GJ = 12e6 N m^2, semi-span 8 m, chord 2.8 m, dCl/dalpha = 3.1,
    // aerodynamic centre 1.2 m ahead of the flexural axis: V_d = 269.2 m/s at sea level [seen].
    // Megson's sea-level density 1.226 gives 269.18 m/s; ours (1.225) gives 269.29 m/s; the closed
    // form q_D = pi^2 GJ / (4 L^2 c e a) = 44 416 Pa is density-free.
    double chord = 2.8;
    double eaFraction = (0.25 * chord + 1.2) / chord;
    double qClosed = Math.PI * Math.PI * 12e6 / (4 * 64 * chord * 1.2 * 3.1);
    // The exact divergence shape of a uniform cantilever is sin(pi y / 2L), the first torsion Ritz
    // function, and the midpoint rule integrates sin^2 over equal strips exactly; so the result
    // must equal the closed form for any strip count and any number of Ritz functions (>= 1).
    for (int torsion = 1; torsion <= 4; torsion++) {
      for (int strips : new int[] {8, 40}) {
        UniformCantileverWing w = new UniformCantileverWing(8.0, chord, eaFraction, eaFraction, 200.0, 150.0,
            InertiaAxis.ELASTIC_AXIS, 5e7, 12e6, 3.1, 2, torsion, strips, 0.0);
        DivergenceResult r = new DivergenceSolver().solve(ValidationCases.system(w));
        // 1e-9 relative: exact up to rounding and eigen-solver accuracy
        assertEquals(qClosed, r.dynamicPressurePa(), 1e-9 * qClosed, torsion + " torsion, " + strips + " strips");
        double vMegson = Math.sqrt(2 * r.dynamicPressurePa() / 1.226);
        // 0.1 %: the published figure has 4 significant digits
        assertEquals(269.2, vMegson, 0.001 * 269.2);
      }
    }
  }

  @Test
  void sweepConfirmationAgreesWithDirectSolution() {
    // Independent check: determinant sign change over the sweep, by LU only.
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.goland(3, 3, 30));
    DivergenceResult direct = new DivergenceSolver().solve(sys);
    OptionalDouble confirmed = new DivergenceSolver().confirmOnPath(sys,
        new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 100, 300, 41)));
    assertTrue(confirmed.isPresent());
    assertEquals(direct.dynamicPressurePa(), confirmed.getAsDouble(), 1e-7 * direct.dynamicPressurePa());
  }
}
