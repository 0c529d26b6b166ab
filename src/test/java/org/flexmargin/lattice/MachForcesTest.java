package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.ControlSurfaceForces;
import org.flexmargin.model.ControlSurface;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.MachForceTable;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplineKind;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.model.SurfacePoint;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The lattice's forces over several Mach numbers with a control-surface column, computed once for
 * all checks: a rectangular half wing of full aspect ratio 40 (chord 1 m), rigid heave and pitch
 * about mid-chord as modes, a 25 % trailing-edge flap over the whole span as the elevator.
 */
class MachForcesTest {
  static final double SPAN = 20, CHORD = 1;
  static final double[] MACHS = {0, 0.5, 0.7};
  static final double[] KS = {0, 0.2};
  static ModeTable modes;
  static LatticeSpec spec;
  static LatticeForces.Result result;

  static ModeTable rigidModes(int stations) {
    Map<String, ShapeValue> heave = new HashMap<>();
    Map<String, ShapeValue> pitch = new HashMap<>();
    for (int i = 0; i < stations; i++) {
      heave.put("s" + i, new ShapeValue(1, 0));
      pitch.put("s" + i, new ShapeValue(0, 1));
    }
    return new ModeTable("rigid", List.of(new ElasticMode("heave", 1, 0, 1, heave),
        new ElasticMode("pitch", 2, 0, 1, pitch)));
  }

  static LatticeSpec wing(double[] machs, double[] ks, int nc, int ns, int stations) {
    List<SplinePoint> pts = new ArrayList<>();
    for (int i = 0; i < stations; i++) {
      pts.add(new SplinePoint("s" + i, 0.5 * CHORD, (i + 0.5) * SPAN / stations));
    }
    LiftingSurface w = new LiftingSurface("wing", new SurfacePoint(0, 0, 0), CHORD,
        new SurfacePoint(0, SPAN, 0), CHORD, nc, ns);
    return new LatticeSpec(CHORD / 2, machs[0], FlowSymmetry.SYMMETRIC, List.of(w),
        List.of(new SplineGroup(SplineKind.BEAM, List.of("wing"), pts)), ks, machs,
        List.of(new ControlSurface("elevator", "wing", 0.75, 0, 1)), "elevator", null, null);
  }

  @BeforeAll
  static void compute() {
    modes = rigidModes(10);
    spec = wing(MACHS, KS, 16, 20, 10);
    result = LatticeForces.compute(spec, modes);
  }

  @Test
  void elevatorColumnThroughTheModesMatchesThinAerofoilTheory() {
    // the heave row: lift per unit dynamic pressure. Column "pitch" is CL_alpha S, column
    // "elevator" CL_delta S; their ratio is Glauert's flap effectiveness (ControlSurfaceTest:
    // 0.6090), which 16 chordwise boxes reach within 2.5 % (1/nc convergence at the hinge,
    // measured there); tolerance 3.5 %
    MachForceTable f = result.forces();
    assertEquals(List.of("heave", "pitch", "elevator"), f.columnNames());
    double ratio = f.realAt(0, 0, 0, 2) / f.realAt(0, 0, 0, 1);
    double tau = ControlSurfaceTest.glauertEffectiveness(0.75);
    assertEquals(tau, ratio, 0.035 * tau);
    assertTrue(ratio < tau, "the discrete flap loading converges from below");
    // centre of pressure of the flap's lift (pitch row: moment nose up about mid-chord per unit
    // dynamic pressure, heave row: lift). Thin-aerofoil theory (Glauert, as above):
    // cm_c/4 = -(1/2) sin theta_h (1 - cos theta_h) = -0.6495 per rad, so x_cp / c = 0.25 +
    // 0.6495 / 3.8264 = 0.4197 (derived); for the angle of attack x_cp / c = 0.25 (tolerance 0.01 c).
    // For the flap the tolerance is 0.02 c: measured 0.435 c with 16 chordwise boxes, the slow
    // 1/nc convergence of the loading at the hinge, as for the lift
    double th = Math.acos(1 - 2 * 0.75);
    double clDelta = 2 * (Math.PI - th) + 2 * Math.sin(th);
    double xcpFlap = 0.25 + 0.5 * Math.sin(th) * (1 - Math.cos(th)) / clDelta;
    assertEquals(0.4197, xcpFlap, 1e-4);
    assertEquals(xcpFlap, 0.5 - f.realAt(0, 0, 1, 2) / f.realAt(0, 0, 0, 2), 0.02);
    assertEquals(0.25, 0.5 - f.realAt(0, 0, 1, 1) / f.realAt(0, 0, 0, 1), 0.01);
    // the source hands the steady column to the aircraft plant
    AeroSource src = AeroSourceFactory.atMach(spec, modes, new AeroSourceFactory.LatticeTable(f, "test"), 0);
    double[] col = ((ControlSurfaceForces) src).elevatorForcesM2PerRad().orElseThrow();
    assertEquals(f.realAt(0, 0, 0, 2), col[0], 0.0);
    assertEquals(f.realAt(0, 0, 1, 2), col[1], 0.0);
  }

  @Test
  void steadyForcesFollowPrandtlGlauertAtHighAspectRatio() {
    // 2-D Prandtl-Glauert rule: steady lift scales with 1 / beta. At A = 40 the 3-D lift slope
    // grows a little less (LiftSlopeTest: ratio between 0.9 / beta and 1 / beta); here the
    // heave-by-pitch entry at M = 0.7 over M = 0 lies within 3 % below 1 / beta = 1.400
    MachForceTable f = result.forces();
    double ratio = f.realAt(2, 0, 0, 1) / f.realAt(0, 0, 0, 1);
    double pg = 1 / Math.sqrt(1 - 0.49);
    assertTrue(ratio < pg && ratio > 0.97 * pg, "ratio " + ratio + " vs " + pg);
  }

  @Test
  void interpolationInMachAgreesWithADirectComputation() {
    // the beta-weighted interpolation between M = 0.5 and 0.7 against the lattice run at 0.6
    // itself: steady within 0.5 % of the largest entry (beta Q varies by a few per cent between
    // the two Mach numbers at this aspect ratio; linear interpolation leaves a fraction of it), at
    // k = 0.2 within 2 % (the unsteady part does not follow Prandtl-Glauert; measured 1.4 % on the
    // heave damping). A Mach step of 0.2 is coarse: tables for flutter near M = 0.7 want 0.05 to 0.1
    LatticeSpec at06 = wing(new double[] {0.6}, KS, 16, 20, 10);
    GafTable direct = LatticeForces.compute(at06, modes).table(0.6);
    GafTable interp = result.table(0.6);
    for (int k = 0; k < KS.length; k++) {
      double scale = 0;
      for (int r = 0; r < 2; r++) {
        for (int c = 0; c < 2; c++) {
          scale = Math.max(scale, Math.hypot(direct.realAt(k, r, c), direct.imagAt(k, r, c)));
        }
      }
      for (int r = 0; r < 2; r++) {
        for (int c = 0; c < 2; c++) {
          double tol = (k == 0 ? 0.005 : 0.02) * scale;
          assertEquals(direct.realAt(k, r, c), interp.realAt(k, r, c), tol, "re k " + k + " " + r + c);
          assertEquals(direct.imagAt(k, r, c), interp.imagAt(k, r, c), tol, "im k " + k + " " + r + c);
        }
      }
    }
    // and plain linear interpolation in Q is worse at this Mach number (the reason for beta Q)
    MachForceTable f = result.forces();
    double linear = 0.5 * (f.realAt(1, 0, 0, 1) + f.realAt(2, 0, 0, 1));
    assertTrue(Math.abs(linear - direct.realAt(0, 0, 1)) > Math.abs(interp.realAt(0, 0, 1) - direct.realAt(0, 0, 1)));
  }

  @Test
  void fingerprintChangesWithEveryInputOfTheForces() {
    String base = LatticeForces.fingerprint(spec, modes);
    assertEquals(64, base.length());
    assertEquals(base, LatticeForces.fingerprint(wing(MACHS, KS, 16, 20, 10), rigidModes(10)));
    assertNotEquals(base, LatticeForces.fingerprint(wing(new double[] {0, 0.5, 0.75}, KS, 16, 20, 10), modes));
    assertNotEquals(base, LatticeForces.fingerprint(wing(MACHS, new double[] {0, 0.3}, 16, 20, 10), modes));
    assertNotEquals(base, LatticeForces.fingerprint(wing(MACHS, KS, 16, 21, 10), modes));
    ModeTable changed = rigidModes(10);
    Map<String, ShapeValue> bent = new HashMap<>(changed.modes().get(0).shapes());
    bent.put("s9", new ShapeValue(1.001, 0));
    ModeTable other = new ModeTable("rigid", List.of(new ElasticMode("heave", 1, 0, 1, bent),
        changed.modes().get(1)));
    assertNotEquals(base, LatticeForces.fingerprint(spec, other));
  }
}
