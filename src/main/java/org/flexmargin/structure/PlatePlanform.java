package org.flexmargin.structure;

/**
 * A flat swept, tapered plate planform (a trapezoid with streamwise root and tip chords), clamped
 * along its root chord, and its map from the unit square.
 *
 * <p>Axes as for lifting surfaces: x aft, y outboard, both in metres; the root chord lies on y = 0.
 * A point (xi, eta) of the unit square (xi chordwise from the leading edge, eta spanwise from the
 * root) maps to
 *
 * <pre>
 *   y = s eta,   x = x_le(eta) + xi c(eta),
 *   x_le(eta) = x_le,root + eta (x_le,tip - x_le,root),   c(eta) = c_root + eta (c_tip - c_root).
 * </pre>
 *
 * The inverse derivatives used for curvatures follow from eta = y / s and
 * xi = (x - x_le(y / s)) / c(y / s), with x_le' and c' the (constant) eta-derivatives:
 *
 * <pre>
 *   xi_x = 1 / c,   xi_y = -(x_le' + xi c') / (s c),   eta_y = 1 / s,   eta_x = 0,
 *   xi_xx = 0,      xi_xy = -c' / (s c^2),             xi_yy = -2 c' xi_y / (s c).
 * </pre>
 *
 * (xi_yy: d/dy of -(x_le' + xi c') / (s c) is -c' xi_y / (s c) + (x_le' + xi c') c' / (s^2 c^2),
 * and the second term equals -c' xi_y / (s c) again.) The area element is dx dy = c s dxi deta.
 *
 * @param rootLeadingEdgeXM x of the root leading edge (m)
 * @param rootChordM streamwise root chord (m), &gt; 0
 * @param tipLeadingEdgeXM x of the tip leading edge (m)
 * @param tipChordM streamwise tip chord (m), &gt; 0
 * @param semispanM distance from root to tip along y (m), &gt; 0
 */
public record PlatePlanform(
    double rootLeadingEdgeXM, double rootChordM, double tipLeadingEdgeXM, double tipChordM, double semispanM) {

  /** Validates: finite leading edges, positive chords and semispan. */
  public PlatePlanform {
    if (!Double.isFinite(rootLeadingEdgeXM) || !Double.isFinite(tipLeadingEdgeXM)) {
      throw new IllegalArgumentException("plate leading edges must be finite (m)");
    }
    PositiveFinite.require("plate root chord (m)", rootChordM);
    PositiveFinite.require("plate tip chord (m)", tipChordM);
    PositiveFinite.require("plate semispan (m)", semispanM);
  }

  /**
   * The planform whose quarter-chord line is swept by the given angle, root leading edge at x = 0.
   *
   * @param rootChordM root chord (m)
   * @param tipChordM tip chord (m)
   * @param semispanM semispan (m)
   * @param quarterChordSweepRad sweep of the quarter-chord line (rad), positive aft
   * @return the planform
   */
  public static PlatePlanform fromQuarterChordSweep(
      double rootChordM, double tipChordM, double semispanM, double quarterChordSweepRad) {
    double tipLe = 0.25 * rootChordM + semispanM * Math.tan(quarterChordSweepRad) - 0.25 * tipChordM;
    return new PlatePlanform(0, rootChordM, tipLe, tipChordM, semispanM);
  }

  /** @param eta spanwise coordinate (0 root, 1 tip) @return local chord c(eta) (m) */
  public double chordM(double eta) {
    return rootChordM + eta * (tipChordM - rootChordM);
  }

  /** @param eta spanwise coordinate @return x of the leading edge there (m) */
  public double leadingEdgeXM(double eta) {
    return rootLeadingEdgeXM + eta * (tipLeadingEdgeXM - rootLeadingEdgeXM);
  }

  /** @return x (m) of the point (xi, eta) */
  public double xM(double xi, double eta) {
    return leadingEdgeXM(eta) + xi * chordM(eta);
  }

  /** @return y (m) of the point (xi, eta) */
  public double yM(double eta) {
    return semispanM * eta;
  }

  /** @return planform area (m^2) */
  public double areaM2() {
    return semispanM * (rootChordM + tipChordM) / 2;
  }

  /**
   * Sweep of the line through the same chord fraction of every section.
   *
   * @param chordFraction 0 leading edge, 0.5 mid chord, 1 trailing edge
   * @return its sweep angle (rad), positive aft
   */
  public double sweepRad(double chordFraction) {
    double dx = xM(chordFraction, 1) - xM(chordFraction, 0);
    return Math.atan2(dx, semispanM);
  }

  /**
   * Derivatives of the inverse map at (xi, eta): {xi_x, xi_y, eta_y, xi_xy, xi_yy} (1/m and
   * 1/m^2; xi_xx and eta_x vanish), as derived in the class comment.
   *
   * @param xi chordwise coordinate
   * @param eta spanwise coordinate
   * @return the five derivatives
   */
  double[] inverseDerivatives(double xi, double eta) {
    double c = chordM(eta);
    double dc = tipChordM - rootChordM;
    double dle = tipLeadingEdgeXM - rootLeadingEdgeXM;
    double s = semispanM;
    double xiY = -(dle + xi * dc) / (s * c);
    return new double[] {1 / c, xiY, 1 / s, -dc / (s * c * c), -2 * dc * xiY / (s * c)};
  }
}
