package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.ControlSurfaceForces;
import org.flexmargin.model.ControlSurface;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.MachForceTable;
import org.flexmargin.model.ModeTable;
import org.junit.jupiter.api.Test;

/**
 * The elevator column of the lattice forces (a hinged box group over the whole span of a
 * rectangular half wing of full aspect ratio 40, chord 1 m, rigid heave and pitch about mid-chord
 * as modes) against thin-aerofoil theory, and the Mach number it is taken at.
 */
class ElevatorColumnTest {
  static final double CHORD = MachForcesTest.CHORD, AREA = MachForcesTest.CHORD * MachForcesTest.SPAN;

  /**
   * Glauert's flap effectiveness in the form tau = 1 - (theta_f - sin theta_f) / pi, cos theta_f
   * = 2 E - 1, E the flap chord over the chord (H. Glauert, The Elements of Aerofoil and Airscrew
   * Theory, 1926, ch. VII; also Abbott and von Doenhoff, Theory of Wing Sections, sec. 8.3, from
   * memory).
   */
  static double tau(double flapChordFraction) {
    double th = Math.acos(2 * flapChordFraction - 1);
    return 1 - (th - Math.sin(th)) / Math.PI;
  }

  /**
   * Thin-aerofoil pitching moment about the quarter chord per radian of flap, cm_c/4 = -(1/2) sin
   * theta_f (1 - cos theta_f) (Glauert, as above): nose down for a flap deflected trailing edge
   * down.
   */
  static double cmQuarterChord(double flapChordFraction) {
    double th = Math.acos(2 * flapChordFraction - 1);
    return -0.5 * Math.sin(th) * (1 - Math.cos(th));
  }

  /**
   * {CL_delta / CL_alpha, cm_c/4 per rad} of a 25 % and a 50 % flap (rows) from the steady forces
   * through the modes; both flaps are columns of one lattice (one influence matrix).
   */
  static double[][] flaps(int chordwiseBoxes) {
    ModeTable modes = MachForcesTest.rigidModes(10);
    LatticeSpec wing = MachForcesTest.wing(new double[] {0}, new double[] {0, 0.1}, chordwiseBoxes, 20, 10);
    LatticeSpec spec = new LatticeSpec(wing.referenceSemichordM(), 0, wing.symmetry(), wing.surfaces(),
        wing.splines(), wing.reducedFrequencies(), wing.machNumbers(), List.of(
            new ControlSurface("flap25", "wing", 0.75, 0, 1), new ControlSurface("flap50", "wing", 0.5, 0, 1)),
        null, null, null);
    MachForceTable f = LatticeForces.compute(spec, modes).forces();
    // heave row: lift per unit dynamic pressure; column "pitch" is CL_alpha S, a flap's column
    // CL_delta S. Pitch row: moment nose up about mid-chord (the pitch axis of the modes), so about
    // the quarter chord M_c/4 = M_mid - (c / 4) L
    double[][] out = new double[2][];
    for (int i = 0; i < 2; i++) {
      double lift = f.realAt(0, 0, 0, 2 + i);
      double momentQuarter = f.realAt(0, 0, 1, 2 + i) - 0.25 * CHORD * lift;
      out[i] = new double[] {lift / f.realAt(0, 0, 0, 1), momentQuarter / (AREA * CHORD)};
    }
    return out;
  }

  @Test
  void glauertsTwoFormsOfTheEffectivenessAgree() {
    // 1 - (theta - sin theta) / pi = (2 (pi - theta) + 2 sin theta) / (2 pi) identically; E = 0.25:
    // theta_f = 120 deg, tau = 1 - (2.0944 - 0.8660) / pi = 0.6090; E = 0.5: 1/2 + 1/pi = 0.8183
    // (derived); cm_c/4 at E = 0.25: -(1/2)(0.8660)(1.5) = -0.6495 per rad (derived)
    assertEquals(0.6090, tau(0.25), 5e-5);
    assertEquals(0.5 + 1 / Math.PI, tau(0.5), 1e-15);
    assertEquals(ControlSurfaceTest.glauertEffectiveness(0.75), tau(0.25), 1e-15);
    assertEquals(-0.6495, cmQuarterChord(0.25), 5e-5);
  }

  @Test
  void elevatorColumnReachesTheTwoDimensionalLimitAndPitchesNoseDown() {
    // A = 40, full-span flap: lifting-line theory gives CL_delta / CL_alpha = tau at large aspect
    // ratio (the flap shifts the zero-lift angle uniformly along the span). The discrete loading
    // converges as 1/nc at the hinge (ControlSurfaceTest: error halves per doubling), so the check
    // is on the Richardson value 2 R(32) - R(16): tolerance 1 % (the rest of the 3-D effect and the
    // higher-order error; measured +0.26 % and +0.15 %)
    double[][] f16 = flaps(16), f32 = flaps(32);
    double[] fractions = {0.25, 0.5};
    for (int i = 0; i < 2; i++) {
      double flap = fractions[i];
      double[] e16 = f16[i], e32 = f32[i];
      double t = tau(flap);
      assertEquals(t, 2 * e32[0] - e16[0], 0.01 * t, "flap " + flap);
      // moment about the quarter chord: nose down (negative) for trailing edge down, as
      // thin-aerofoil theory says, at both box counts. Its size: the 2-D value is the A -> infinity
      // limit, from which the loading at A = 40 departs by at most the lifting-line factor
      // 2 / (A + 2) = 5 % (lift slope 2 pi A / (A + 2), from memory): tolerance 5 % on the
      // Richardson value (measured -0.6 % and -1.0 %)
      double cm = cmQuarterChord(flap);
      assertTrue(e16[1] < 0 && e32[1] < 0, "nose down, flap " + flap + ": " + e16[1] + ", " + e32[1]);
      assertEquals(cm, 2 * e32[1] - e16[1], 0.05 * Math.abs(cm), "flap " + flap);
    }
  }

  @Test
  void aSweepMachNumberMovesTheElevatorColumnWithTheForces() {
    // the lattice taken at Mach 0.6 (as a constant-Mach sweep does) hands the aircraft plant the
    // steady elevator column interpolated to 0.6 in the Mach table {0, 0.5, 0.7}, not the one at
    // the lattice's own Mach number 0; interpolation as MachForceTable (checked there)
    ModeTable modes = MachForcesTest.rigidModes(4);
    LatticeSpec spec = MachForcesTest.wing(new double[] {0, 0.5, 0.7}, new double[] {0, 0.2}, 4, 4, 4);
    MachForceTable f = LatticeForces.compute(spec, modes).forces();
    LatticeSpec at06 = spec.withPrecomputed(f).atMach(0.6);
    assertEquals(0.6, at06.mach(), 0.0);
    AeroSource src = AeroSourceFactory.of(at06, modes);
    double[] col = ((ControlSurfaceForces) src).elevatorForcesM2PerRad().orElseThrow();
    double[] expected = f.realColumn(2, 0.6, 0);
    assertEquals(expected[0], col[0], 1e-12 * Math.abs(expected[0]));
    assertEquals(expected[1], col[1], 1e-12 * Math.abs(expected[1]));
    assertTrue(Math.abs(col[0] - f.realAt(0, 0, 0, 2)) > 0.1 * Math.abs(col[0]), "differs from Mach 0");
    assertTrue(src.description().contains("Mach 0.600 (table 0.00 to 0.700)"), src.description());
    // beyond the table the lattice is clamped to its last Mach number, and the envelope's forces
    // over Mach are the same function
    assertEquals(0.7, spec.atMach(0.9).mach(), 0.0);
    assertEquals(0.0, spec.atMach(-0.05).mach(), 0.0);
    AeroSourceFactory.MachForces over = AeroSourceFactory.overMach(spec.withPrecomputed(f), modes).orElseThrow();
    assertEquals(0.0, over.lowestMach(), 0.0);
    assertEquals(0.7, over.highestMach(), 0.0);
    double[] viaEnvelope = ((ControlSurfaceForces) over.atMach().apply(0.6)).elevatorForcesM2PerRad().orElseThrow();
    assertEquals(col[0], viaEnvelope[0], 0.0);
  }
}
