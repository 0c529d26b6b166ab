package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.model.CouplingOrigin;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripPlacement;
import org.flexmargin.model.StripTheorySpec;
import org.junit.jupiter.api.Test;

/**
 * Quasi-steady coupling from placed strips against closed forms (virtual work of rigid motions,
 * Glauert's flap formulas checked by an independent discrete-vortex solution) and a one-strip hand
 * computation. Sources and derivations in docs/validation.md, "Coupling from strips".
 */
class StripCouplingTest {

  /** A uniform, unswept wing of n strips with its elastic axis at x_ea behind the centre of mass. */
  private static StripTheorySpec uniformWing(int n, double b, double w, double a, double slope, double xEa) {
    List<Strip> strips = new ArrayList<>();
    for (int s = 0; s < n; s++) {
      strips.add(new Strip("s" + s, w, b, a, slope, new StripPlacement(xEa, 0, 0)));
    }
    return new StripTheorySpec(b, strips);
  }

  private static ElasticMode mode(String name, StripTheorySpec spec, double heave, double pitch, double xEa) {
    Map<String, ShapeValue> shapes = new HashMap<>();
    for (Strip s : spec.strips()) {
      shapes.put(s.station(), new ShapeValue(heave - xEa * pitch, pitch));
    }
    return new ElasticMode(name, 3.0, 0.02, 10.0, shapes);
  }

  @Test
  void rigidHeaveAndPitchModesGiveTheWingsLiftAndMomentSlopes() {
    // Virtual work: the generalized force of a rigid heave "mode" (h = 1, theta = 0) is the total
    // lift, so Q_alpha = C_L_alpha S = a S_w for a uniform wing of lift slope a and area S_w; the
    // rigid pitch "mode" about the centre of mass (h = -x theta, theta = 1) is an angle of attack,
    // so its C_L,eta is C_L_alpha = a S_w / S and its C_m,eta and Q_alpha are the static-margin
    // closed form C_m_alpha = -C_L_alpha (x_ac - x_cg) / c with the aerodynamic centre at the
    // quarter chord (thin-aerofoil theory; Etkin & Reid, Dynamics of Flight, ch. 2).
    double b = 0.5;
    double w = 0.75;
    double a = -0.2;
    double slope = 5.2;
    double xEa = 0.4;
    int n = 8;
    StripTheorySpec wing = uniformWing(n, b, w, a, slope, xEa);
    double area = 2 * b * w * n; // 6 m^2
    double sRef = 7.0;
    double cRef = 1.1;
    double xAc = xEa - b * (a + 0.5); // quarter chord behind the centre of mass
    double cla = slope * area / sRef;
    double cma = -cla * xAc / cRef;
    ModeCoupling heave = StripCoupling.of(wing, mode("heave", wing, 1, 0, xEa), sRef, cRef);
    ModeCoupling pitch = StripCoupling.of(wing, mode("pitch", wing, 0, 1, xEa), sRef, cRef);
    // 1e-12: the same sums in another order
    assertEquals(slope * area, heave.generalizedForcePerAlphaM2(), 1e-12 * slope * area);
    assertEquals(0.0, heave.liftCoefficientPerUnitCoordinate(), 0.0);
    assertEquals(0.0, heave.generalizedForcePerElevatorM2(), 0.0);
    assertEquals(cla, pitch.liftCoefficientPerUnitCoordinate(), 1e-12 * cla);
    assertEquals(cma, pitch.pitchMomentCoefficientPerUnitCoordinate(), 1e-12 * Math.abs(cma));
    assertEquals(cma * sRef * cRef, pitch.generalizedForcePerAlphaM2(), 1e-12 * Math.abs(cma * sRef * cRef));
    // the pitch-rate angle is that of the three-quarter chord: Q_q of the heave mode is the lift per
    // unit q c / 2V, a S_w 2 x_3/4 / c
    double x34 = xEa + b * (0.5 - a);
    assertEquals(slope * area * 2 * x34 / cRef, heave.generalizedForcePerPitchRateM2(), 1e-12 * slope * area);
    StripDerivatives d = StripCoupling.rigidDerivatives(wing, sRef, cRef);
    assertEquals(cla, d.liftSlopePerRad(), 1e-12 * cla);
    assertEquals(cma, d.pitchMomentSlopePerRad(), 1e-12 * Math.abs(cma));
    assertEquals(pitch.generalizedForcePerPitchRateM2() / (sRef * cRef), d.pitchDampingCmq(), 1e-12);
    assertSame(CouplingOrigin.STRIPS, heave.origin());
  }

  @Test
  void glauertsFlapFormulasHoldTheirClosedFormsAndEnds() {
    // E = 1: the whole plate turns, c_l,delta = 2 pi and no moment about the quarter chord; E = 0:
    // nothing; E = 1/2: theta_h = pi/2, tau = 1/2 + 1/pi, c_m,delta = -1/2 (Glauert; Abbott & von
    // Doenhoff, Theory of Wing Sections, sec. 8.2; from memory). 1e-14: closed forms evaluated once.
    assertEquals(2 * Math.PI, StripCoupling.flapLiftPerRad(1), 1e-14);
    assertEquals(0.0, StripCoupling.flapQuarterChordMomentPerRad(1), 1e-14);
    assertEquals(0.0, StripCoupling.flapLiftPerRad(0), 1e-14);
    assertEquals(0.5 + 1 / Math.PI, StripCoupling.flapEffectiveness(0.5), 1e-14);
    assertEquals(-0.5, StripCoupling.flapQuarterChordMomentPerRad(0.5), 1e-14);
    // tau for a 30 % flap, 0.661 (thin-aerofoil theory curve of flap effectiveness against chord
    // ratio, Abbott & von Doenhoff sec. 8.2; from memory, three digits: tolerance half a unit of the third)
    assertEquals(0.661, StripCoupling.flapEffectiveness(0.3), 5e-4);
    assertThrows(IllegalArgumentException.class, () -> StripCoupling.flapLiftPerRad(1.2));
  }

  /**
   * Lumped-vortex thin-aerofoil solution (Katz &amp; Plotkin, Low-Speed Aerodynamics, sec. 11.1):
   * n panels, a vortex at each panel's quarter point, flow tangency at its three-quarter point.
   *
   * @return {c_l, c_m about the quarter chord} per radian of flap of chord fraction e
   */
  private static double[] lumpedVortexFlap(int n, double e) {
    double dx = 1.0 / n;
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    DMatrixRMaj rhs = new DMatrixRMaj(n, 1);
    DMatrixRMaj g = new DMatrixRMaj(n, 1);
    for (int i = 0; i < n; i++) {
      double xc = (i + 0.75) * dx;
      for (int j = 0; j < n; j++) {
        a.set(i, j, 1 / (2 * Math.PI * (xc - (j + 0.25) * dx)));
      }
      // camber slope dz/dx = -delta on the flap (trailing edge down): tangency V (alpha - dz/dx)
      rhs.set(i, 0, (i + 0.5) * dx > 1 - e ? 1.0 : 0.0);
    }
    assertTrue(CommonOps_DDRM.solve(a, rhs, g));
    double lift = 0;
    double moment = 0;
    for (int j = 0; j < n; j++) {
      lift += g.get(j);
      moment -= g.get(j) * ((j + 0.25) * dx - 0.25);
    }
    return new double[] {2 * lift, 2 * moment};
  }

  @Test
  void glauertsFlapFormulasAgreeWithADiscreteVortexSolution() {
    // Independent method: the lumped-vortex solution converges to thin-aerofoil theory with error
    // O(1/n) (slope step at the hinge); Richardson's extrapolation 2 f(2n) - f(n) from 200 and 400
    // panels leaves an O(1/n^2) remainder, observed below 2e-5: tolerance 1e-4 relative.
    for (double e : new double[] {0.1, 0.25, 0.3, 0.5}) {
      double[] coarse = lumpedVortexFlap(200, e);
      double[] fine = lumpedVortexFlap(400, e);
      double cl = 2 * fine[0] - coarse[0];
      double cm = 2 * fine[1] - coarse[1];
      assertEquals(cl, StripCoupling.flapLiftPerRad(e), 1e-4 * cl, "c_l,delta at E = " + e);
      assertEquals(cm, StripCoupling.flapQuarterChordMomentPerRad(e), 1e-4 * Math.abs(cm), "c_m,delta at E = " + e);
    }
    // sanity of the method: a flat plate at 1 rad gives 2 pi for any n (Katz & Plotkin)
    assertEquals(2 * Math.PI, lumpedVortexFlap(50, 1.0)[0], 1e-9);
  }

  @Test
  void oneStripGivesTheHandValues() {
    // b = 0.5 m, w = 2 m (A = 2 m^2), a = -0.2, lift slope 5 (a_s A = 10 m^2), elastic axis 3 m
    // behind the centre of mass, elevator 25 % of the chord, downwash gradient 0.4; mode h = 0.3 m,
    // theta = 0.1 rad; S = 10 m^2, c = 1.2 m. Derived by hand (docs/validation.md):
    // d = h + b (a + 1/2) theta = 0.315; x_1/4 = 3 - 0.15 = 2.85; x_3/4 = 3 + 0.35 = 3.35;
    // theta_h = 120 deg: c_l,delta = 2 pi/3 + sqrt 3 = 3.826446, c_m,delta = -(3/8) sqrt 3 = -0.649519.
    Strip strip = new Strip("t", 2.0, 0.5, -0.2, 5.0, new StripPlacement(3.0, 0.25, 0.4));
    StripTheorySpec spec = new StripTheorySpec(0.5, List.of(strip));
    ElasticMode m = new ElasticMode("m", 5.0, 0.02, 3.0, Map.of("t", new ShapeValue(0.3, 0.1)));
    ModeCoupling c = StripCoupling.of(spec, m, 10.0, 1.2);
    double clDelta = 2 * Math.PI / 3 + Math.sqrt(3);
    double cmDelta = -0.375 * Math.sqrt(3);
    // 1e-12: a few floating-point operations
    assertEquals(0.1, c.liftCoefficientPerUnitCoordinate(), 1e-12); // 10 x 0.1 / 10
    assertEquals(-0.2375, c.pitchMomentCoefficientPerUnitCoordinate(), 1e-12); // -10 x 0.1 x 2.85 / 12
    assertEquals(1.89, c.generalizedForcePerAlphaM2(), 1e-12); // 10 x 0.6 x 0.315
    assertEquals(17.5875, c.generalizedForcePerPitchRateM2(), 1e-12); // 10 x (6.7 / 1.2) x 0.315
    // (5 / 2 pi) x 2 x (c_l,delta x 0.315 + 2 x 0.5 x c_m,delta x 0.1) = 1.814969
    assertEquals(5 / Math.PI * (clDelta * 0.315 + cmDelta * 0.1), c.generalizedForcePerElevatorM2(), 1e-12);
    assertEquals(1.814969, c.generalizedForcePerElevatorM2(), 5e-7);
  }

  @Test
  void trailingEdgeDownElevatorPushesAnUpwardTailModeUp() {
    // Sign: a mode that moves the tail up (h > 0, no twist) receives positive work from a trailing
    // edge down elevator (more tail lift); a pure nose-up twist of the tail about an elastic axis
    // at the elevator's centre of pressure sees the flap's nose-down moment only.
    Strip tail = new Strip("t", 1.0, 0.3, -0.2, 4.5, new StripPlacement(6.0, 0.3, 0.4));
    StripTheorySpec spec = new StripTheorySpec(0.3, List.of(tail));
    ModeCoupling up = StripCoupling.of(spec, new ElasticMode("up", 9.0, 0.02, 2.0,
        Map.of("t", new ShapeValue(1.0, 0.0))), 8.0, 0.9);
    assertTrue(up.generalizedForcePerElevatorM2() > 0, "elevator on a tail-up mode: " + up);
    ModeCoupling down = StripCoupling.of(spec, new ElasticMode("down", 9.0, 0.02, 2.0,
        Map.of("t", new ShapeValue(-1.0, 0.0))), 8.0, 0.9);
    assertEquals(-up.generalizedForcePerElevatorM2(), down.generalizedForcePerElevatorM2(), 1e-15);
    // the tail behind the centre of mass: nose-up pitch rate raises its angle of attack
    assertTrue(up.generalizedForcePerPitchRateM2() > 0);
  }

  @Test
  void resolveKeepsSuppliedCouplingAndComputesTheRest() {
    StripTheorySpec wing = uniformWing(3, 0.4, 1.0, -0.1, 5.5, 0.2);
    ModeTable table = new ModeTable("t", List.of(mode("a", wing, 0.5, 0.01, 0.2), mode("b", wing, 0.1, 0.05, 0.2)));
    ModeCoupling given = new ModeCoupling(0.1, -0.2, 3.0, 0.4);
    RigidBody rigid = new RigidBody(1000, 4000, 5, 0.8, 5, -0.3, -12, -4, 0.4, -1.2, Map.of("a", given));
    RigidBody resolved = StripCoupling.resolve(rigid, wing, table);
    assertSame(given, resolved.couplingOf("a"));
    assertSame(CouplingOrigin.STRIPS, resolved.couplingOf("b").origin());
    assertEquals(StripCoupling.of(wing, table.modes().get(1), 5, 0.8), resolved.couplingOf("b"));
    // unplaced strips: nothing to compute, the rigid body comes back as it was
    StripTheorySpec bare = new StripTheorySpec(0.4, List.of(new Strip("s0", 1, 0.4, -0.1, 5.5),
        new Strip("s1", 1, 0.4, -0.1, 5.5), new Strip("s2", 1, 0.4, -0.1, 5.5)));
    assertSame(rigid, StripCoupling.resolve(rigid, bare, table));
    assertSame(CouplingOrigin.NONE, StripCoupling.resolve(rigid, bare, table).couplingOf("b").origin());
  }

  @Test
  void placementOnSomeStripsOnlyIsRefused() {
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> new StripTheorySpec(0.4, List.of(
        new Strip("s0", 1, 0.4, -0.1, 5.5, new StripPlacement(0.2, 0, 0)), new Strip("s1", 1, 0.4, -0.1, 5.5))));
    assertEquals("strips[1].elastic_axis_aft_of_cg_m", e.fieldPath());
    assertThrows(InvalidInputException.class, () -> new StripPlacement(0.2, 0.95, 0));
    assertThrows(InvalidInputException.class, () -> new StripPlacement(Double.NaN, 0.2, 0));
  }
}
