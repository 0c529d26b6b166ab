package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripPlacement;
import org.flexmargin.model.StripTheorySpec;
import org.junit.jupiter.api.Test;

/** The rigid body's derivatives summed over placed strips, against the closed forms of the class Javadoc. */
class StripRigidDerivativesTest {

  /**
   * The hand-worked strip of StripCouplingTest: b = 0.5 m, w = 2 m (A = 2 m^2), a = -0.2, lift slope
   * 5 (a_s A = 10 m^2), elastic axis 3 m behind the centre of mass, elevator 25 % of the chord,
   * downwash gradient 0.4; S = 10 m^2, c = 1.2 m (S c = 12 m^3). Derived by hand:
   *
   * <pre>
   *   x_1/4 = 3 - 0.5 (0.3) = 2.85 m,  x_3/4 = 3 + 0.5 (0.7) = 3.35 m
   *   CL_alpha = 10 (1 - 0.4) / 10 = 0.6
   *   Cm_alpha = -6 x 2.85 / 12 = -1.425
   *   Cm_q     = -10 x (2 x 3.35 / 1.2) x 2.85 / 12 = -13.26041(6)
   *   theta_h = 120 deg: c_l,delta = 2 pi / 3 + sqrt 3, c_m,delta = -(3/8) sqrt 3 (Glauert)
   *   elevator lift  L_d = (5 / 2 pi) x 2 x c_l,delta;   CL_delta = L_d / 10
   *   elevator moment M_d = (5 / 2 pi) x 2 x (2 x 0.5) x c_m,delta;  Cm_delta = (-L_d x 2.85 + M_d) / 12
   * </pre>
   *
   * Tolerance 1e-12: a few floating-point operations on numbers of order 10.
   */
  @Test
  void oneStripGivesTheHandValues() {
    Strip strip = new Strip("t", 2.0, 0.5, -0.2, 5.0, new StripPlacement(3.0, 0.25, 0.4));
    StripDerivatives d = StripCoupling.rigidDerivatives(new StripTheorySpec(0.5, List.of(strip)), 10.0, 1.2);
    double clDelta = 2 * Math.PI / 3 + Math.sqrt(3);
    double cmDelta = -0.375 * Math.sqrt(3);
    double liftD = 5 / Math.PI * clDelta;
    double momentD = 5 / Math.PI * cmDelta;
    assertEquals(0.6, d.liftSlopePerRad(), 1e-12);
    assertEquals(-1.425, d.pitchMomentSlopePerRad(), 1e-12);
    assertEquals(-10 * (2 * 3.35 / 1.2) * 2.85 / 12, d.pitchDampingCmq(), 1e-12);
    assertEquals(-13.260416666666, d.pitchDampingCmq(), 1e-9);
    assertEquals(liftD / 10, d.liftPerElevatorPerRad(), 1e-12);
    assertEquals((-liftD * 2.85 + momentD) / 12, d.pitchMomentPerElevatorPerRad(), 1e-12);
  }

  /**
   * Two strips sum: a wing strip ahead of the centre of mass without a flap and the tail strip
   * above. The wing strip (b = 1 m, w = 1 m, a = 0, lift slope 2 pi, elastic axis 0.5 m ahead, no
   * downwash) adds 4 pi m^2 of lift at x_1/4 = -0.5 - 0.5 = -1 m and x_3/4 = -0.5 + 0.5 = 0 m; its
   * pitch-damping term vanishes (x_3/4 = 0) and it has no elevator terms.
   */
  @Test
  void stripsAddUp() {
    Strip tail = new Strip("t", 2.0, 0.5, -0.2, 5.0, new StripPlacement(3.0, 0.25, 0.4));
    Strip wing = new Strip("w", 1.0, 1.0, 0.0, 2 * Math.PI, new StripPlacement(-0.5, 0, 0));
    StripDerivatives one = StripCoupling.rigidDerivatives(new StripTheorySpec(0.5, List.of(tail)), 10.0, 1.2);
    StripDerivatives two = StripCoupling.rigidDerivatives(new StripTheorySpec(0.5, List.of(wing, tail)), 10.0, 1.2);
    double wingLift = 2 * Math.PI * 2.0;
    assertEquals(one.liftSlopePerRad() + wingLift / 10, two.liftSlopePerRad(), 1e-12);
    assertEquals(one.pitchMomentSlopePerRad() - wingLift * (-1.0) / 12, two.pitchMomentSlopePerRad(), 1e-12);
    assertEquals(one.pitchDampingCmq(), two.pitchDampingCmq(), 1e-12);
    assertEquals(one.liftPerElevatorPerRad(), two.liftPerElevatorPerRad(), 1e-12);
    assertEquals(one.pitchMomentPerElevatorPerRad(), two.pitchMomentPerElevatorPerRad(), 1e-12);
  }

  @Test
  void missingPlacementOrShapeIsNamed() {
    StripTheorySpec bare = new StripTheorySpec(0.4, List.of(new Strip("s0", 1, 0.4, -0.1, 5.5)));
    ElasticMode m = new ElasticMode("m", 5.0, 0.02, 3.0, Map.of("s0", new ShapeValue(0.3, 0.1)));
    assertEquals("aero.strips[0].elastic_axis_aft_of_cg_m",
        assertThrows(InvalidInputException.class, () -> StripCoupling.of(bare, m, 10, 1)).fieldPath());
    assertEquals("aero.strips[0].elastic_axis_aft_of_cg_m",
        assertThrows(InvalidInputException.class, () -> StripCoupling.rigidDerivatives(bare, 10, 1)).fieldPath());
    StripTheorySpec placed = new StripTheorySpec(0.4, List.of(
        new Strip("s0", 1, 0.4, -0.1, 5.5, new StripPlacement(0.2, 0, 0)),
        new Strip("s1", 1, 0.4, -0.1, 5.5, new StripPlacement(0.4, 0, 0))));
    assertEquals("aero.strips[1].station",
        assertThrows(InvalidInputException.class, () -> StripCoupling.of(placed, m, 10, 1)).fieldPath());
  }
}
