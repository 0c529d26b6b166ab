package org.flexmargin.lattice;

import java.util.List;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.SurfacePoint;

/**
 * The boxes of a doublet lattice as flat arrays (aircraft axes: x aft, y starboard, z up; m).
 *
 * <p>Each trapezoidal surface is divided into equal chordwise fractions and equal spanwise widths.
 * A box carries its doublet line on its quarter chord, from the inboard point A to the outboard
 * point B (in the surface's own lateral direction), and its receiving (control) point on its
 * centre line at three quarters of its chord (Albano and Rodden, 1969). Loads act at the midpoint
 * of the doublet line.
 *
 * <p>Immutable; the arrays are never handed out.
 */
public final class BoxLattice {
  private final int n;
  private final FlowSymmetry symmetry;
  /** doublet line end points A and B. */
  final double[] ax, ay, az, bx, by, bz;
  /** box chord at its centre line (m), area (m^2), dihedral cos and sin. */
  final double[] chord, area, cosG, sinG;
  /** control point (3/4 chord, centre line) and load point (1/4 chord, centre line). */
  final double[] cx, cy, cz, lx, ly, lz;
  /** box position on its surface: start and end chord fractions, span fraction of its centre
   * measured from the surface's root chord as given (0) to its tip chord (1). */
  final double[] chordFrom, chordTo, spanFraction;
  /** leading-edge x (m) and chord (m) of the box's strip at the box's span centre. */
  final double[] stripLeadingEdgeX, stripChord;
  private final int[] surfaceOf;
  private final List<String> surfaceNames;

  /**
   * Divides the surfaces into boxes.
   *
   * @param surfaces at least one surface
   * @param symmetry image about y = 0; with an image every surface must lie in y &gt;= 0
   * @throws InvalidInputException {@code surfaces[i].root_leading_edge_m} if a surface crosses y = 0
   *     while an image is requested
   */
  public BoxLattice(List<LiftingSurface> surfaces, FlowSymmetry symmetry) {
    if (surfaces == null || surfaces.isEmpty()) {
      throw new InvalidInputException("surfaces", "at least one lifting surface", "none");
    }
    this.symmetry = symmetry == null ? FlowSymmetry.NONE : symmetry;
    int total = 0;
    for (LiftingSurface s : surfaces) {
      total += s.chordwiseBoxes() * s.spanwiseBoxes();
    }
    n = total;
    ax = new double[n]; ay = new double[n]; az = new double[n];
    bx = new double[n]; by = new double[n]; bz = new double[n];
    chord = new double[n]; area = new double[n]; cosG = new double[n]; sinG = new double[n];
    cx = new double[n]; cy = new double[n]; cz = new double[n];
    lx = new double[n]; ly = new double[n]; lz = new double[n];
    chordFrom = new double[n]; chordTo = new double[n]; spanFraction = new double[n];
    stripLeadingEdgeX = new double[n]; stripChord = new double[n];
    surfaceOf = new int[n];
    surfaceNames = surfaces.stream().map(LiftingSurface::name).toList();
    int k = 0;
    for (int s = 0; s < surfaces.size(); s++) {
      LiftingSurface sf = surfaces.get(s);
      if (this.symmetry != FlowSymmetry.NONE
          && Math.min(sf.rootLeadingEdge().yM(), sf.tipLeadingEdge().yM()) < -1e-9 * sf.spanM()) {
        throw new InvalidInputException(
            "surfaces[" + s + "]",
            "a surface at y >= 0 (the mirror half is added by the flow symmetry)",
            "a surface reaching y < 0");
      }
      k = divide(sf, s, k);
    }
  }

  private int divide(LiftingSurface sf, int s, int k) {
    SurfacePoint p = sf.rootLeadingEdge(), q = sf.tipLeadingEdge();
    double cp = sf.rootChordM(), cq = sf.tipChordM();
    // orient inboard -> outboard so that the normal (0, -sin g, cos g) has a z component >= 0
    double dy = q.yM() - p.yM(), dz = q.zM() - p.zM();
    boolean reversed = dy < 0 || (dy == 0 && dz < 0);
    if (reversed) {
      SurfacePoint t = p; p = q; q = t;
      double tc = cp; cp = cq; cq = tc;
      dy = -dy; dz = -dz;
    }
    double span = Math.hypot(dy, dz);
    double cg = dy / span, sg = dz / span;
    int nc = sf.chordwiseBoxes(), ns = sf.spanwiseBoxes();
    for (int j = 0; j < ns; j++) {
      double f0 = (double) j / ns, f1 = (double) (j + 1) / ns, fm = 0.5 * (f0 + f1);
      double x0 = lerp(p.xM(), q.xM(), f0), y0 = lerp(p.yM(), q.yM(), f0), z0 = lerp(p.zM(), q.zM(), f0);
      double x1 = lerp(p.xM(), q.xM(), f1), y1 = lerp(p.yM(), q.yM(), f1), z1 = lerp(p.zM(), q.zM(), f1);
      double c0 = lerp(cp, cq, f0), c1 = lerp(cp, cq, f1), cm = lerp(cp, cq, fm);
      double xm = lerp(p.xM(), q.xM(), fm), ym = lerp(p.yM(), q.yM(), fm), zm = lerp(p.zM(), q.zM(), fm);
      double width = span / ns;
      for (int i = 0; i < nc; i++) {
        double g0 = (double) i / nc, g1 = (double) (i + 1) / nc;
        double qa = g0 + 0.25 * (g1 - g0), ca = g0 + 0.75 * (g1 - g0);
        ax[k] = x0 + qa * c0; ay[k] = y0; az[k] = z0;
        bx[k] = x1 + qa * c1; by[k] = y1; bz[k] = z1;
        chord[k] = (g1 - g0) * cm;
        area[k] = chord[k] * width;
        cosG[k] = cg; sinG[k] = sg;
        cx[k] = xm + ca * cm; cy[k] = ym; cz[k] = zm;
        lx[k] = xm + qa * cm; ly[k] = ym; lz[k] = zm;
        chordFrom[k] = g0; chordTo[k] = g1;
        spanFraction[k] = reversed ? 1 - fm : fm;
        stripLeadingEdgeX[k] = xm; stripChord[k] = cm;
        surfaceOf[k] = s;
        k++;
      }
    }
    return k;
  }

  private static double lerp(double a, double b, double f) {
    return a + f * (b - a);
  }

  /** @return number of boxes (without the mirror image) */
  public int size() {
    return n;
  }

  /** @return the flow symmetry about y = 0 */
  public FlowSymmetry symmetry() {
    return symmetry;
  }

  /** @return box area (m^2) */
  public double areaM2(int box) {
    return area[box];
  }

  /** @return box chord on its centre line (m) */
  public double chordM(int box) {
    return chord[box];
  }

  /** @return control point of a box (3/4 of its chord, on its centre line) (m) */
  public SurfacePoint controlPoint(int box) {
    return new SurfacePoint(cx[box], cy[box], cz[box]);
  }

  /** @return load point of a box (midpoint of its doublet line) (m) */
  public SurfacePoint loadPoint(int box) {
    return new SurfacePoint(lx[box], ly[box], lz[box]);
  }

  /** @return z component of the box's unit normal, cos(dihedral) */
  public double normalZ(int box) {
    return cosG[box];
  }

  /** @return index of the surface the box belongs to */
  public int surfaceOf(int box) {
    return surfaceOf[box];
  }

  /** @return the surface names in order */
  public List<String> surfaceNames() {
    return surfaceNames;
  }
}
