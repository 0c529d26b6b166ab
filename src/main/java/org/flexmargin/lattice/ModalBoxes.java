package org.flexmargin.lattice;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplineKind;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.spline.BeamSpline;
import org.flexmargin.spline.SplineMatrix;
import org.flexmargin.spline.SurfaceSpline;

/**
 * The mode shapes carried to the boxes by the case's splines: for each box and mode the vertical
 * displacement and streamwise slope at the control point and the displacement at the load point,
 * plus the spline quality (largest error of rigid heave and pitch through the same splines).
 *
 * @param hControl [box][mode] vertical displacement at the control point (m per unit coordinate)
 * @param slopeControl [box][mode] streamwise slope dh/dx at the control point (rad per unit)
 * @param hLoad [box][mode] vertical displacement at the load point (m per unit coordinate)
 * @param rigidHeaveErrorM largest error of a unit rigid heave (m) at any box point
 * @param rigidPitchErrorM largest error of a unit rigid pitch about x = 0 (m per rad) at any point
 */
record ModalBoxes(
    double[][] hControl,
    double[][] slopeControl,
    double[][] hLoad,
    double rigidHeaveErrorM,
    double rigidPitchErrorM) {

  static ModalBoxes of(LatticeSpec spec, BoxLattice lattice, ModeTable modes) {
    int n = lattice.size();
    int m = modes.size();
    double[][] hc = new double[n][m], sc = new double[n][m], hl = new double[n][m];
    Map<String, Integer> surfaceIndex = new HashMap<>();
    for (int s = 0; s < spec.surfaces().size(); s++) {
      surfaceIndex.put(spec.surfaces().get(s).name(), s);
    }
    double heaveErr = 0, pitchErr = 0;
    for (int g = 0; g < spec.splines().size(); g++) {
      SplineGroup group = spec.splines().get(g);
      List<Integer> boxes = new ArrayList<>();
      for (String name : group.surfaces()) {
        int s = surfaceIndex.get(name);
        for (int b = 0; b < n; b++) {
          if (lattice.surfaceOf(b) == s) {
            boxes.add(b);
          }
        }
      }
      int nb = boxes.size();
      double[] cxs = new double[nb], cys = new double[nb], lxs = new double[nb], lys = new double[nb];
      for (int t = 0; t < nb; t++) {
        int b = boxes.get(t);
        cxs[t] = lattice.cx[b]; cys[t] = lattice.cy[b];
        lxs[t] = lattice.lx[b]; lys[t] = lattice.ly[b];
      }
      List<SplinePoint> pts = group.points();
      int np = pts.size();
      double[] px = new double[np], py = new double[np];
      for (int p = 0; p < np; p++) {
        px[p] = pts.get(p).xM();
        py[p] = pts.get(p).yM();
      }
      String path = "aero.lifting_surfaces.splines[" + g + "]";
      SplineMatrix wc, dc, wl;
      boolean beam = group.kind() == SplineKind.BEAM;
      try {
        if (beam) {
          BeamSpline bs = new BeamSpline(px, py);
          wc = bs.to(cxs, cys, false); dc = bs.to(cxs, cys, true); wl = bs.to(lxs, lys, false);
        } else {
          SurfaceSpline ss = new SurfaceSpline(px, py);
          wc = ss.to(cxs, cys, false); dc = ss.to(cxs, cys, true); wl = ss.to(lxs, lys, false);
        }
      } catch (IllegalArgumentException e) {
        throw new InvalidInputException(path + ".points", "points that define a spline", e.getMessage());
      }
      for (int j = 0; j < m; j++) {
        double[] src = source(modes.modes().get(j), pts, beam, path);
        scatter(wc.apply(src), boxes, hc, j);
        scatter(dc.apply(src), boxes, sc, j);
        scatter(wl.apply(src), boxes, hl, j);
      }
      // spline quality: unit heave, and unit pitch about x = 0 (h = -x, theta = 1)
      double[] heave = new double[beam ? 2 * np : np];
      double[] pitch = new double[beam ? 2 * np : np];
      for (int p = 0; p < np; p++) {
        heave[p] = 1;
        pitch[p] = -px[p];
        if (beam) {
          pitch[np + p] = 1;
        }
      }
      heaveErr = Math.max(heaveErr, worst(wc.apply(heave), null, 1));
      heaveErr = Math.max(heaveErr, worst(wl.apply(heave), null, 1));
      heaveErr = Math.max(heaveErr, worst(dc.apply(heave), null, 0));
      pitchErr = Math.max(pitchErr, worst(wc.apply(pitch), cxs, 0));
      pitchErr = Math.max(pitchErr, worst(wl.apply(pitch), lxs, 0));
      pitchErr = Math.max(pitchErr, worst(dc.apply(pitch), null, -1));
    }
    return new ModalBoxes(hc, sc, hl, heaveErr, pitchErr);
  }

  /** Largest |v - expected|, expected = -x where x is given, else the constant. */
  private static double worst(double[] v, double[] x, double constant) {
    double w = 0;
    for (int i = 0; i < v.length; i++) {
      double expected = x == null ? constant : -x[i];
      w = Math.max(w, Math.abs(v[i] - expected));
    }
    return w;
  }

  private static void scatter(double[] v, List<Integer> boxes, double[][] into, int mode) {
    for (int t = 0; t < v.length; t++) {
      into[boxes.get(t)][mode] = v[t];
    }
  }

  private static double[] source(ElasticMode mode, List<SplinePoint> pts, boolean beam, String path) {
    int np = pts.size();
    double[] src = new double[beam ? 2 * np : np];
    for (int p = 0; p < np; p++) {
      ShapeValue v = mode.shapes().get(pts.get(p).station());
      if (v == null) {
        throw new InvalidInputException(
            path + ".points[" + p + "].station",
            "a station of mode \"" + mode.name() + "\"",
            "\"" + pts.get(p).station() + "\"");
      }
      src[p] = v.displacementM();
      if (beam) {
        src[np + p] = v.rotationRad();
      }
    }
    return src;
  }
}
