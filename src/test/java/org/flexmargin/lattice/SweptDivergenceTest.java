package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.DivergenceSolver;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplineKind;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.model.SurfacePoint;
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
  private static final double L = 6.096, C = 1.8288, EA = 0.33;
  private static final int STATIONS = 40;

  private static double divergence(CantileverWingModes beam, double sweepDeg, boolean lattice) {
    double sw = Math.toRadians(sweepDeg);
    double cs = Math.cos(sw), sn = Math.sin(sw);
    double streamChord = C / cs;
    List<ElasticMode> modes = new ArrayList<>();
    ModeTable base = beam.modeTable();
    List<SplinePoint> pts = new ArrayList<>();
    List<Strip> strips = new ArrayList<>();
    double h = 1e-6 * L;
    for (int m = 0; m < base.size(); m++) {
      Map<String, ShapeValue> shapes = new HashMap<>();
      for (int i = 0; i < STATIONS; i++) {
        double s = (i + 0.5) * L / STATIONS;
        // w'(s) by a central difference: truncation ~h^2 w''' ~ 1e-12 relative
        double slope = (beam.displacementM(m, s + h) - beam.displacementM(m, s - h)) / (2 * h);
        double pitch = beam.rotationRad(m, s) * cs - slope * sn;
        shapes.put("s" + i, new ShapeValue(beam.displacementM(m, s), pitch));
      }
      ElasticMode e = base.modes().get(m);
      modes.add(new ElasticMode(e.name(), e.frequencyHz(), e.dampingRatio(), e.generalizedMassKg(), shapes));
    }
    for (int i = 0; i < STATIONS; i++) {
      double s = (i + 0.5) * L / STATIONS;
      pts.add(new SplinePoint("s" + i, EA * streamChord + s * sn, s * cs));
      strips.add(new Strip("s" + i, L * cs / STATIONS, streamChord / 2, (EA - 0.5) / 0.5, 2 * Math.PI));
    }
    ModeTable table = new ModeTable("swept", modes);
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
    // 299.8, 376.2, 2054 m/s at -15, 0, 15, 30 deg). At -30 deg it gives 277.3 m/s, above the
    // -15 deg value (docs/lifting-surfaces.md discusses it); that point is not asserted
    assertTrue(surface[1] < surface[2] && surface[2] < surface[3] && surface[3] < surface[4], all);
    assertTrue(surface[0] < surface[2], all);
    // three-dimensional tip loss: the lattice diverges later than strip theory at every sweep
    for (int i = 0; i < sweeps.length - 1; i++) {
      assertTrue(surface[i] > strip[i], all);
    }
  }
}
