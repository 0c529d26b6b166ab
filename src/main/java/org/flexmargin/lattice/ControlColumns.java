package org.flexmargin.lattice;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.model.ControlSurface;
import org.flexmargin.model.LiftingSurface;

/**
 * The motion of hinged box groups (control surfaces) per radian of deflection, trailing edge down.
 *
 * <p>A box aft of the hinge line moves normal to its surface by h = -delta d, with d = (x -
 * x_h(y)) cos(Lambda_h) its distance from the hinge line in the surface plane, x_h(y) the hinge at
 * the box's span station and Lambda_h the sweep of the hinge line in the plane. The streamwise
 * slope is dh/dx = -delta cos(Lambda_h): a trailing-edge-down flap has the slope of a nose-up pitch,
 * so it adds lift. Rotation about an unswept hinge gives d = x - x_h and slope -delta.
 *
 * @param names control-surface names, one column each
 * @param hControl [box][control] normal displacement at the control point (m per rad)
 * @param slopeControl [box][control] streamwise slope at the control point (per rad)
 */
record ControlColumns(List<String> names, double[][] hControl, double[][] slopeControl) {

  /**
   * @param lattice the boxes
   * @param surfaces the surfaces the lattice was built from, in the same order
   * @param controls the control surfaces (entries sharing a name deflect together)
   * @return the columns, in order of first appearance of each name
   */
  static ControlColumns of(BoxLattice lattice, List<LiftingSurface> surfaces, List<ControlSurface> controls) {
    List<String> names = new ArrayList<>();
    for (ControlSurface c : controls) {
      if (!names.contains(c.name())) {
        names.add(c.name());
      }
    }
    int n = lattice.size();
    double[][] h = new double[n][names.size()];
    double[][] slope = new double[n][names.size()];
    for (ControlSurface c : controls) {
      int col = names.indexOf(c.name());
      int s = lattice.surfaceNames().indexOf(c.surface());
      LiftingSurface sf = surfaces.get(s);
      double hf = c.hingeChordFraction();
      double dxHinge = (sf.tipLeadingEdge().xM() + hf * sf.tipChordM())
          - (sf.rootLeadingEdge().xM() + hf * sf.rootChordM());
      double cosHinge = sf.spanM() / Math.hypot(sf.spanM(), dxHinge);
      for (int b = 0; b < n; b++) {
        boolean inside = lattice.surfaceOf(b) == s
            && lattice.chordFrom[b] >= hf - 1e-9
            && lattice.spanFraction[b] > c.fromSpanFraction()
            && lattice.spanFraction[b] < c.toSpanFraction();
        if (inside) {
          double xHinge = lattice.stripLeadingEdgeX[b] + hf * lattice.stripChord[b];
          h[b][col] = -(lattice.cx[b] - xHinge) * cosHinge;
          slope[b][col] = -cosHinge;
        }
      }
    }
    return new ControlColumns(List.copyOf(names), h, slope);
  }

  /** @return number of control surfaces */
  int size() {
    return names.size();
  }
}
