package org.flexmargin.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InertiaAxis;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StructureSpec;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.model.UniformCantileverWing;
import org.junit.jupiter.api.Test;

class TypicalSectionModesTest {

  private static TypicalSection section(double xAlpha, double r2, double fh, double fa) {
    return new TypicalSection(0.5, 40.0, -0.5, xAlpha, r2, fh, fa, 2 * Math.PI, 1.5, 0.03);
  }

  @Test
  void uncoupledSectionKeepsTheSpringFrequencies() {
    // closed form: with x_alpha = 0, M and K are diagonal and the natural frequencies are the
    // uncoupled omega_h and omega_alpha (Hodges & Pierce, Introduction to Structural Dynamics and
    // Aeroelasticity, typical section). 1e-12 relative: only rounding.
    TypicalSection s = section(0.0, 0.25, 2.0, 5.0);
    ModeTable table = BuiltInStructures.build(s).modes();
    assertEquals(2.0, table.modes().get(0).frequencyHz(), 1e-12 * 2.0);
    assertEquals(5.0, table.modes().get(1).frequencyHz(), 1e-12 * 5.0);
    // pure heave, scaled to h = 1 m: generalized mass = span * m (closed form)
    ShapeValue heave = table.modes().get(0).shapes().get("section");
    assertEquals(1.0, heave.displacementM(), 1e-15);
    assertEquals(0.0, heave.rotationRad(), 1e-15);
    assertEquals(1.5 * 40.0, table.modes().get(0).generalizedMassKg(), 1e-12 * 60);
    // pure pitch, scaled to b alpha = 1 m: generalized mass = span m r^2 b^2 / b^2 = span m r^2
    ShapeValue pitch = table.modes().get(1).shapes().get("section");
    assertEquals(0.0, pitch.displacementM(), 1e-15);
    assertEquals(1.0 / 0.5, pitch.rotationRad(), 1e-14);
    assertEquals(1.5 * 40.0 * 0.25, table.modes().get(1).generalizedMassKg(), 1e-12 * 15);
  }

  @Test
  void coupledSectionSolvesTheCharacteristicQuadratic() {
    // closed form: det(K - lambda M) = 0 with, per unit span and dividing row 1 by m and row 2
    // by m b^2 (b cancels in the coupling),
    //   | omega_h^2 - lambda        lambda x_a          |
    //   | lambda x_a                r^2 (omega_a^2 - lambda) | = 0
    // => lambda^2 (r^2 - x_a^2) - lambda r^2 (omega_h^2 + omega_a^2) + r^2 omega_h^2 omega_a^2 = 0.
    // Parameters of the Lee, Price & Wong case (Prog. Aerosp. Sci. 35, 1999; docs/validation.md section 5.1): x_a = 0.25,
    // r^2 = 0.25, omega_h/omega_a = 0.2. Tolerance 1e-10 relative: rounding of the quadratic.
    double xa = 0.25;
    double r2 = 0.25;
    double fa = 10.0;
    double fh = 2.0;
    TypicalSection s = section(xa, r2, fh, fa);
    double wh2 = Math.pow(2 * Math.PI * fh, 2);
    double wa2 = Math.pow(2 * Math.PI * fa, 2);
    double qa = r2 - xa * xa;
    double qb = -r2 * (wh2 + wa2);
    double qc = r2 * wh2 * wa2;
    double disc = Math.sqrt(qb * qb - 4 * qa * qc);
    double lambda1 = (-qb - disc) / (2 * qa);
    double lambda2 = (-qb + disc) / (2 * qa);
    List<ElasticMode> modes = BuiltInStructures.build(s).modes().modes();
    assertEquals(Math.sqrt(lambda1), modes.get(0).omegaRadPerS(), 1e-10 * Math.sqrt(lambda1));
    assertEquals(Math.sqrt(lambda2), modes.get(1).omegaRadPerS(), 1e-10 * Math.sqrt(lambda2));
    // coupling lowers the first and raises the second frequency (interlacing of eigenvalues)
    assertTrue(modes.get(0).frequencyHz() < fh && modes.get(1).frequencyHz() > fa);
  }

  @Test
  void shapesSatisfyTheUpPositiveEquationsAndAreOrthogonal() {
    // Sign derived for h up, alpha nose up: the centre of mass x_a b aft of the elastic axis
    // moves h - x_a b alpha, so T = 1/2 s [m h'^2 - 2 m x_a b h' alpha' + I_a alpha'^2] and
    // M12 = -s m x_a b. Each shape v must satisfy (K - omega^2 M) v = 0 with that M, M-orthogonality
    // v1^T M v2 = 0 and v^T M v = the reported generalized mass. 1e-10 relative: rounding only.
    double xa = 0.2;
    double r2 = 0.3;
    TypicalSection s = section(xa, r2, 3.0, 6.0);
    double span = 1.5;
    double m = 40.0;
    double b = 0.5;
    double[][] mass = {{span * m, -span * m * xa * b}, {-span * m * xa * b, span * m * r2 * b * b}};
    double wh = 2 * Math.PI * 3.0;
    double wa = 2 * Math.PI * 6.0;
    double[][] stiff = {{span * m * wh * wh, 0}, {0, span * m * r2 * b * b * wa * wa}};
    List<ElasticMode> modes = BuiltInStructures.build(s).modes().modes();
    double[][] v = new double[2][];
    for (int i = 0; i < 2; i++) {
      ShapeValue sv = modes.get(i).shapes().get("section");
      v[i] = new double[] {sv.displacementM(), sv.rotationRad()};
      double w2 = Math.pow(modes.get(i).omegaRadPerS(), 2);
      for (int r = 0; r < 2; r++) {
        double residual = 0;
        double size = 0;
        for (int c = 0; c < 2; c++) {
          residual += (stiff[r][c] - w2 * mass[r][c]) * v[i][c];
          size += Math.abs(stiff[r][c] * v[i][c]) + Math.abs(w2 * mass[r][c] * v[i][c]);
        }
        assertEquals(0.0, residual, 1e-10 * size, "row " + r + " of mode " + (i + 1));
      }
      assertEquals(modes.get(i).generalizedMassKg(), quad(v[i], mass, v[i]), 1e-10 * quad(v[i], mass, v[i]));
      // scaling: the larger of |h|, b|alpha| is +1 m
      double big = Math.abs(v[i][0]) >= b * Math.abs(v[i][1]) ? v[i][0] : b * v[i][1];
      assertEquals(1.0, big, 1e-14);
    }
    double scale = Math.sqrt(quad(v[0], mass, v[0]) * quad(v[1], mass, v[1]));
    assertEquals(0.0, quad(v[0], mass, v[1]), 1e-10 * scale);
    // in the heave-dominated first mode, below the pitch frequency, row 2 gives
    // alpha / h = -omega^2 m x_a b / (k_a - omega^2 I_a) < 0: nose down while heaving up
    assertTrue(v[0][1] / v[0][0] < 0);
  }

  @Test
  void stripAndStationDescribeTheSection() {
    TypicalSection s = section(0.25, 0.25, 2.0, 10.0);
    BuiltStructure built = BuiltInStructures.build((StructureSpec) s);
    assertEquals("typical_section", built.modes().name());
    assertEquals(0.5, built.aero().referenceSemichordM());
    Strip strip = built.aero().strips().get(0);
    assertEquals(1, built.aero().strips().size());
    assertEquals("section", strip.station());
    assertEquals(1.5, strip.widthM());
    assertEquals(0.5, strip.semichordM());
    assertEquals(-0.5, strip.elasticAxisA());
    assertEquals(2 * Math.PI, strip.liftSlopePerRad());
    for (ElasticMode mode : built.modes().modes()) {
      assertEquals(0.03, mode.dampingRatio());
      assertEquals(1, mode.shapes().size());
    }
  }

  @Test
  void dispatchBuildsTheWingAndRejectsAModeTable() {
    UniformCantileverWing wing =
        new UniformCantileverWing(
            6.096, 1.8288, 0.33, 0.43, 35.71, 8.64, InertiaAxis.ELASTIC_AXIS, 9.77e6, 0.987e6,
            2 * Math.PI, 2, 2, 6, 0.01);
    BuiltStructure built = BuiltInStructures.build((StructureSpec) wing);
    assertEquals(4, built.modes().size());
    assertEquals(6, built.aero().strips().size());
    ModeTable table = built.modes();
    InvalidInputException e =
        assertThrows(InvalidInputException.class, () -> BuiltInStructures.build((StructureSpec) table));
    assertEquals("structure", e.fieldPath());
  }

  private static double quad(double[] x, double[][] a, double[] y) {
    double s = 0;
    for (int r = 0; r < 2; r++) {
      for (int c = 0; c < 2; c++) {
        s += x[r] * a[r][c] * y[c];
      }
    }
    return s;
  }
}
