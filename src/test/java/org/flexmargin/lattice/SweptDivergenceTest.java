package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.DivergenceSolver;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplineKind;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.model.SurfacePoint;
import org.flexmargin.model.UniformCantileverWing;
import org.flexmargin.structure.CantileverWingModes;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/**
 * Divergence of a uniform swept cantilever (the Goland beam swept by -30 to +30 degrees): forward
 * sweep lowers the divergence speed and aft sweep raises it, because upward bending of a swept
 * beam changes the streamwise incidence by -w' sin(sweep) (Diederich and Budiansky, NACA TN 1680,
 * 1948; Bisplinghoff, Ashley and Halfman, Aeroelasticity, 1955, ch. 8; the trend from memory).
 *
 * <p>The beam keeps its modes; only their streamwise view changes: a station at distance s along
 * the axis sits at y = s cos(sweep), x = x_root + s sin(sweep), and its streamwise pitch is
 * theta cos(sweep) - w'(s) sin(sweep).
 */
class SweptDivergenceTest {
  private static final double L0 = 6.096, C0 = 1.8288, EA = 0.33;
  private static final int STATIONS = 40;

  /** Aerodynamics of a divergence run. */
  private enum Aero {
    /** streamwise strips, section lift slope 2 pi. */
    STRIPS,
    /** streamwise strips, section lift slope 2 pi cos(sweep) (simple sweep theory). */
    STRIPS_COS,
    /** doublet lattice, 6 x 20 boxes. */
    LATTICE
  }

  private static double divergence(CantileverWingModes beam, double sweepDeg, boolean lattice) {
    return divergence(beam, sweepDeg, lattice ? Aero.LATTICE : Aero.STRIPS, L0, C0);
  }

  /**
   * The Goland beam sheared so that its streamwise planform (semispan L0, streamwise chord C0)
   * stays that of the unswept wing: beam length L0 / cos(sweep), chord normal to the beam
   * C0 cos(sweep), same stiffness and mass per length.
   */
  private static double shearedDivergence(double sweepDeg, Aero aero) {
    double cs = Math.cos(Math.toRadians(sweepDeg));
    UniformCantileverWing g = LatticeFlutterTest.goland();
    UniformCantileverWing sheared = new UniformCantileverWing(L0 / cs, C0 * cs,
        g.elasticAxisChordFraction(), g.massAxisChordFraction(), g.massPerLengthKgPerM(),
        g.pitchInertiaKgM(), g.inertiaAxis(), g.bendingStiffnessNm2(), g.torsionStiffnessNm2(),
        g.liftSlopePerRad(), g.bendingModes(), g.torsionModes(), g.strips(), g.dampingRatio());
    return divergence(CantileverWingModes.solve(sheared), sweepDeg, aero, L0 / cs, C0 * cs);
  }

  private static double divergence(CantileverWingModes beam, double sweepDeg, Aero aero, double L, double C) {
    boolean lattice = aero == Aero.LATTICE;
    double sw = Math.toRadians(sweepDeg);
    double cs = Math.cos(sw), sn = Math.sin(sw);
    double streamChord = C / cs;
    double sectionSlope = 2 * Math.PI * (aero == Aero.STRIPS_COS ? cs : 1);
    List<SplinePoint> pts = LatticeFixtures.sweptAxis(L, sweepDeg, STATIONS, "s", EA * streamChord);
    List<Strip> strips = new ArrayList<>();
    for (int i = 0; i < STATIONS; i++) {
      strips.add(new Strip("s" + i, L * cs / STATIONS, streamChord / 2, (EA - 0.5) / 0.5, sectionSlope));
    }
    ModeTable table = LatticeFixtures.sweptBeamModes(beam, L, sweepDeg, STATIONS, "s", "swept");
    org.flexmargin.model.AeroSpec spec;
    if (lattice) {
      LiftingSurface wing = new LiftingSurface("wing", new SurfacePoint(0, 0, 0), streamChord,
          new SurfacePoint(L * sn, L * cs, 0), streamChord, 6, 20);
      spec = new LatticeSpec(C / 2, 0, FlowSymmetry.SYMMETRIC, List.of(wing),
          List.of(new SplineGroup(SplineKind.BEAM, List.of("wing"), pts)), new double[] {0, 0.1});
    } else {
      spec = new StripTheorySpec(C / 2, strips);
    }
    AeroelasticSystem sys = new AeroelasticSystem(
        StructuralModel.fromModeTable(table), AeroSourceFactory.of(spec, table));
    DivergenceResult r = new DivergenceSolver().solve(sys);
    return r.found() ? r.speedTasMps(1.225) : Double.POSITIVE_INFINITY;
  }

  @Test
  void forwardSweepDivergesEarlierAndAftSweepLater() {
    CantileverWingModes beam = CantileverWingModes.solve(LatticeFlutterTest.goland());
    double[] sweeps = {-30, -15, 0, 15, 30};
    double[] strip = new double[sweeps.length];
    double[] surface = new double[sweeps.length];
    for (int i = 0; i < sweeps.length; i++) {
      strip[i] = divergence(beam, sweeps[i], false);
      surface[i] = divergence(beam, sweeps[i], true);
    }
    String all = "strips " + java.util.Arrays.toString(strip) + " lattice " + java.util.Arrays.toString(surface);
    // unswept strip theory: the closed form q_D = pi^2 GJ / (4 L^2 c e 2 pi) gives 252.3 m/s at
    // sea level (flutter package's Goland test); 0.5 % for the 40 strips' midpoint sums
    assertEquals(252.3, strip[2], 0.005 * 252.3, all);
    // strip theory: strictly increasing from -30 to +30 deg (measured 191.7, 212.5, 252.3, 351.9 m/s
    // and no divergence at +30 deg)
    for (int i = 1; i < sweeps.length; i++) {
      assertTrue(strip[i] > strip[i - 1], all);
    }
    // lifting surface: aft sweep raises and -15 deg lowers the divergence speed (measured 273.8,
    // 299.8, 376.2, 2054 m/s at -15, 0, 15, 30 deg). At -30 deg it gives 277.3 m/s, 1.3 % above
    // the -15 deg value: with the beam length fixed the planform shrinks as the wing sweeps (see
    // planformOfFixedBeamShrinksWithSweep); asserted only as within 3 % of the -15 deg value
    assertTrue(surface[1] < surface[2] && surface[2] < surface[3] && surface[3] < surface[4], all);
    assertTrue(surface[0] < surface[2], all);
    assertEquals(surface[1], surface[0], 0.03 * surface[1], all);
    // three-dimensional tip loss: the lattice diverges later than strip theory at every sweep
    for (int i = 0; i < sweeps.length - 1; i++) {
      assertTrue(surface[i] > strip[i], all);
    }
  }

  @Test
  void forwardSweepLowersDivergenceAtFixedPlanform() {
    // the beam sheared under a fixed streamwise planform (aspect ratio 6.67 at every sweep): the
    // lattice divergence speed falls monotonically with forward sweep, as Diederich and Budiansky
    // (NACA TN 1680, 1948) find for forward-swept wings (trend from memory). Measured 247.4,
    // 268.7, 299.8 m/s at -30, -15, 0 deg (strip theory 178.1, 210.2, 252.3)
    double[] sweeps = {-30, -15, 0};
    double[] v = new double[sweeps.length];
    for (int i = 0; i < sweeps.length; i++) {
      v[i] = shearedDivergence(sweeps[i], Aero.LATTICE);
    }
    String all = java.util.Arrays.toString(v);
    assertTrue(v[0] < v[1] && v[1] < v[2], all);
    // unsheared at 0 deg: the same wing as the first test (299.8 m/s); 0.5 m/s covers the rounding
    assertEquals(299.8, v[2], 0.5, all);
  }

  @Test
  void planformOfFixedBeamShrinksWithSweep() {
    // with the beam length fixed, the streamwise semispan falls as cos(sweep) and the aspect ratio
    // as cos^2(sweep) (6.67 at 0, 5.0 at -30, 3.3 at -45 deg), and simple sweep theory lowers the
    // section lift slope to 2 pi cos(sweep). Strip theory with that slope (the normal-section form
    // of Diederich and Budiansky, NACA TN 1680, 1948) then has its lowest divergence speed in
    // forward sweep near -30 deg and rises beyond (measured 216.3, 206.0, 214.5 m/s at -15, -30,
    // -45 deg), like the lattice (273.8, 277.3, 311.0 m/s): the -30 deg lattice value above the
    // -15 deg one is a property of this family of wings, not of the lattice
    CantileverWingModes beam = CantileverWingModes.solve(LatticeFlutterTest.goland());
    double s15 = divergence(beam, -15, Aero.STRIPS_COS, L0, C0);
    double s30 = divergence(beam, -30, Aero.STRIPS_COS, L0, C0);
    double s45 = divergence(beam, -45, Aero.STRIPS_COS, L0, C0);
    String all = s15 + " " + s30 + " " + s45;
    assertTrue(s30 < s15 && s30 < s45, all);
    // strip forces are proportional to the section slope, so q_D scales as 1 / cos(sweep) exactly:
    // 191.7 m/s (2 pi strips at -30 deg) / sqrt(cos 30 deg) = 206.0 m/s; 0.3 % for the rounding of 191.7
    assertEquals(191.7 / Math.sqrt(Math.cos(Math.toRadians(30))), s30, 0.003 * s30, all);
  }
}
