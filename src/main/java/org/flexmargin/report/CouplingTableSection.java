package org.flexmargin.report;

import java.util.Locale;
import java.util.Map;
import org.flexmargin.model.ModeCoupling;

/** The table of each mode's quasi-steady coupling with the short period and the elevator, with its origin. */
final class CouplingTableSection {
  private CouplingTableSection() {}

  /**
   * @param w the page
   * @param couplings per mode name, in mode-table order (nothing is written when empty)
   */
  static void write(XhtmlWriter w, Map<String, ModeCoupling> couplings) {
    if (couplings.isEmpty()) {
      return;
    }
    w.element("p", "Quasi-steady coupling of each elastic mode with the short period and the elevator, per unit "
        + "modal coordinate: supplied in the case, computed from the placed strips (quasi-steady strip theory, "
        + "Glauert's flap formulas), or zero (assumed). Generalized forces per unit dynamic pressure; Q/q per unit "
        + "q c / 2V.");
    w.open("table", "class", "mode-coupling");
    w.open("thead").open("tr");
    for (String h : new String[] {"mode", "origin", "C_L per eta", "C_m per eta", "Q per alpha (m^2)",
        "Q per q (m^2)", "Q per elevator (m^2)"}) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    for (Map.Entry<String, ModeCoupling> e : couplings.entrySet()) {
      ModeCoupling m = e.getValue();
      w.open("tr", "data-origin", m.origin().name().toLowerCase(Locale.ROOT));
      w.element("td", e.getKey());
      w.element("td", m.origin().label());
      for (double v : new double[] {m.liftCoefficientPerUnitCoordinate(), m.pitchMomentCoefficientPerUnitCoordinate(),
          m.generalizedForcePerAlphaM2(), m.generalizedForcePerPitchRateM2(), m.generalizedForcePerElevatorM2()}) {
        w.element("td", String.format(Locale.ROOT, "%.4g", v), "class", "num");
      }
      w.close("tr");
    }
    w.close("tbody").close("table");
  }
}
