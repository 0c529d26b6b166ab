package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.MachGafTable;

/**
 * Warnings when a sweep leaves the range in which the chosen aerodynamics hold (docs/verdict.md):
 *
 * <ul>
 *   <li>strip theory with Theodorsen's function is incompressible; we take it as valid up to
 *       Mach {@value #STRIP_THEORY_MAX_MACH}, where the Prandtl-Glauert factor 1/sqrt(1 - M^2) =
 *       1.048 (derived) says compressibility raises the lift slope by about 5 %;
 *   <li>a force table holds at its own Mach number; we accept sweep points within
 *       +-{@value #TABLE_MACH_TOLERANCE} of it (our choice: the Prandtl-Glauert factor changes by
 *       under 1 % over that span below Mach 0.3, and by about 4 % at Mach 0.6). Lifting surfaces
 *       and tables at several Mach numbers are used at their sweep Mach number (a constant-Mach
 *       sweep's own, clamped into the tabulated range, {@link
 *       org.flexmargin.model.AnalysisCase}), with the same tolerance.
 * </ul>
 *
 * The reduced-frequency range of a table is checked by the flutter solvers themselves.
 */
final class AeroValidity {
  private AeroValidity() {}

  /** Highest Mach number at which incompressible strip theory is taken as valid. */
  static final double STRIP_THEORY_MAX_MACH = 0.3;
  /** Largest Mach difference between a sweep point and a force table's Mach number. */
  static final double TABLE_MACH_TOLERANCE = 0.05;

  /**
   * @param c the configuration (strip theory, built-in strips or a force table)
   * @param path the sweep path
   * @return the warnings, empty when every point is within range
   */
  static List<String> warnings(Configuration c, PlannedPath path) {
    if (c.aero() instanceof LatticeSpec l) {
      return warnings(l.mach(), path, "the lifting-surface forces are used at the lattice's Mach number");
    }
    if (c.aero() instanceof MachGafTable t) {
      return warnings(t.machNumber(), path, "the force tables are interpolated to Mach");
    }
    return warnings(c.aero() instanceof GafTable t ? t.machNumber() : Double.NaN, path);
  }

  static List<String> warnings(double tableMach, PlannedPath path) {
    return warnings(tableMach, path, "the force table holds at Mach");
  }

  /**
   * @param tableMach the force table's Mach number, or NaN for strip theory
   * @param path the sweep path
   * @param what the words before the Mach number in the warning
   * @return the warnings, empty when every point is within range
   */
  static List<String> warnings(double tableMach, PlannedPath path, String what) {
    List<String> out = new ArrayList<>();
    FlightCondition first = null;
    FlightCondition highest = null;
    FlightCondition lowest = null;
    for (int p = 0; p < path.gridPoints(); p++) {
      FlightCondition fc = path.at(p);
      boolean outside = Double.isNaN(tableMach) ? fc.mach() > STRIP_THEORY_MAX_MACH
          : Math.abs(fc.mach() - tableMach) > TABLE_MACH_TOLERANCE;
      if (outside && first == null) {
        first = fc;
      }
      highest = highest == null || fc.mach() > highest.mach() ? fc : highest;
      lowest = lowest == null || fc.mach() < lowest.mach() ? fc : lowest;
    }
    if (first == null) {
      return out;
    }
    if (Double.isNaN(tableMach)) {
      double m = highest.mach();
      out.add(String.format(Locale.ROOT, "aerodynamics outside their range: strip theory with Theodorsen's function is "
          + "incompressible (taken as valid to Mach %.2f), but the sweep reaches Mach %.3f at %.2f m/s EAS and is "
          + "beyond Mach %.2f from the grid point at %.2f m/s EAS; %s", STRIP_THEORY_MAX_MACH, m, highest.speedEasMps(), STRIP_THEORY_MAX_MACH,
          first.speedEasMps(), m < 1 ? String.format(Locale.ROOT, "compressibility would raise the lift slope by "
              + "about %.0f %% there (Prandtl-Glauert)", 100 * (1 / Math.sqrt(1 - m * m) - 1))
              : "the flow is supersonic there and the results have no physical meaning in dimensional terms"));
    } else {
      out.add(String.format(Locale.ROOT, "aerodynamics outside their range: %s %.3f "
          + "(accepted within +-%.2f), but the sweep runs from Mach %.3f to %.3f (first outside at %.2f m/s EAS)",
          what, tableMach, TABLE_MACH_TOLERANCE, lowest.mach(), highest.mach(), first.speedEasMps()));
    }
    return out;
  }
}
