package org.flexmargin.lattice;

import java.util.List;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.SurfacePoint;

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
    double lift = 0, area = 0;
    for (int i = 0; i < n; i++) {
      lift += cp.getReal(i, 0) * l.areaM2(i) * l.normalZ(i);
      area += l.areaM2(i);
    }
    return lift / area;
  }
}
