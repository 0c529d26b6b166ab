package org.flexmargin.lattice;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.model.SurfacePoint;
import org.flexmargin.structure.CantileverWingModes;

/** Wings and loads shared by the lattice tests. */
final class LatticeFixtures {
  private LatticeFixtures() {}

  /** Half wing (y >= 0) of full aspect ratio ar, root chord 1 m, taper, quarter-chord sweep. */
  static BoxLattice halfWing(
      double ar, double taper, double quarterChordSweepDeg, int nc, int ns, FlowSymmetry sym) {
    double cr = 1.0, ct = taper;
    double semispan = ar * (cr + ct) / 2 / 2;
    double tan = Math.tan(Math.toRadians(quarterChordSweepDeg));
    double xle = 0.25 * cr + semispan * tan - 0.25 * ct;
    LiftingSurface s = new LiftingSurface(
        "wing", new SurfacePoint(0, 0, 0), cr, new SurfacePoint(xle, semispan, 0), ct, nc, ns);
    return new BoxLattice(List.of(s), sym);
  }

  /** Steady lift-curve slope (1/rad) of a symmetric half-wing lattice, reference = its own area. */
  static double liftSlope(BoxLattice l, double mach) {
    int n = l.size();
    PressureSolver ps = new PressureSolver(l);
    ps.factorise(0, mach);
    ZMatrixRMaj w = new ZMatrixRMaj(n, 1);
    for (int i = 0; i < n; i++) {
      w.set(i, 0, -1.0, 0); // unit angle of attack: w/U = dh/dx = -alpha
    }
    ZMatrixRMaj cp = new ZMatrixRMaj(n, 1);
    ps.solve(w, cp);
    return liftCoefficient(l, cp, 0).getReal();
  }

  /** Whole-surface lift coefficient of one column of lifting pressures, reference = the lattice's own area. */
  static Complex liftCoefficient(BoxLattice l, ZMatrixRMaj cp, int column) {
    double re = 0, im = 0, area = 0;
    for (int i = 0; i < l.size(); i++) {
      re += cp.getReal(i, column) * l.areaM2(i) * l.normalZ(i);
      im += cp.getImag(i, column) * l.areaM2(i) * l.normalZ(i);
      area += l.areaM2(i);
    }
    return new Complex(re / area, im / area);
  }

  /**
   * The modes of a straight uniform beam of the given length, swept about its root by sweepDeg
   * (negative forward) at fixed length: station i at distance s = (i + 0.5) L / stations along the
   * axis, y = s cos(sweep), x = x_axis,root + s sin(sweep); its streamwise pitch is theta cos(sweep)
   * - w'(s) sin(sweep) (Diederich and Budiansky, NACA TN 1680, 1948). w' by a central difference
   * of step 1e-6 L (truncation ~1e-12 relative).
   */
  static ModeTable sweptBeamModes(
      CantileverWingModes beam, double length, double sweepDeg, int stations, String prefix, String name) {
    double sw = Math.toRadians(sweepDeg);
    double cs = Math.cos(sw), sn = Math.sin(sw);
    double h = 1e-6 * length;
    ModeTable base = beam.modeTable();
    List<ElasticMode> modes = new ArrayList<>();
    for (int m = 0; m < base.size(); m++) {
      Map<String, ShapeValue> shapes = new HashMap<>();
      for (int i = 0; i < stations; i++) {
        double s = (i + 0.5) * length / stations;
        double slope = (beam.displacementM(m, s + h) - beam.displacementM(m, s - h)) / (2 * h);
        double pitch = beam.rotationRad(m, s) * cs - slope * sn;
        shapes.put(prefix + i, new ShapeValue(beam.displacementM(m, s), pitch));
      }
      ElasticMode e = base.modes().get(m);
      modes.add(new ElasticMode(e.name(), e.frequencyHz(), e.dampingRatio(), e.generalizedMassKg(), shapes));
    }
    return new ModeTable(name, modes);
  }

  /** Spline points on the swept axis at the stations of {@link #sweptBeamModes} (x_axis at the root given). */
  static List<SplinePoint> sweptAxis(
      double length, double sweepDeg, int stations, String prefix, double rootAxisXM) {
    double sw = Math.toRadians(sweepDeg);
    List<SplinePoint> pts = new ArrayList<>();
    for (int i = 0; i < stations; i++) {
      double s = (i + 0.5) * length / stations;
      pts.add(new SplinePoint(prefix + i, rootAxisXM + s * Math.sin(sw), s * Math.cos(sw)));
    }
    return pts;
  }
}
