package org.flexmargin.report;

import java.util.List;
import java.util.Locale;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.sweep.MatchedPoints;
import org.flexmargin.sweep.MatchedPoints.Envelope;
import org.flexmargin.sweep.MatchedPoints.Point;

/**
 * The report's matched-point envelope: the chart of altitude against equivalent airspeed with the
 * boundaries, the design dive line and the margin line, a table of the matched points with their
 * distance from the dive line, the warnings and the envelope's own caution.
 */
final class EnvelopeSection implements ReportSection {
  /** The envelope's caution, shown with it in the report. */
  static final String CAUTION = "Caution: linear subsonic aerodynamics and a linear structure (no transonic "
      + "effects); only the open-loop flutter and divergence points are matched, not the closed loop or the loop "
      + "margins. The margin over the dive line that applies is set by the programme's certification basis.";

  private final EnvelopeReport.Data data;
  private final SpeedAxisUnit unit;
  private final EmbeddedChart chart;

  EnvelopeSection(EnvelopeReport.Data data, SpeedAxisUnit unit, EmbeddedChart chart) {
    this.data = data;
    this.unit = unit;
    this.chart = chart;
  }

  @Override
  public String id() {
    return "envelope";
  }

  @Override
  public String heading() {
    return "Matched-point flutter and divergence envelope";
  }

  @Override
  public void writeBody(XhtmlWriter w) {
    EnvelopeSpec spec = data.spec();
    w.element("p", String.format(Locale.ROOT, "A point is matched when its speed, air density and Mach number "
        + "belong to one point of the standard atmosphere and the forces are those at that Mach number. At each "
        + "listed altitude the Mach number of the forces is iterated to the onset's (within %.0e, at most %d "
        + "times); along each listed Mach number the altitude is swept. Dive line: V_D %s EAS%s; margin line "
        + "%.2f x the dive line (common practice).", MatchedPoints.MACH_TOLERANCE, MatchedPoints.MAX_ITERATIONS,
        speed(spec.diveSpeedEasMps()), Double.isNaN(spec.diveMach()) ? ""
            : String.format(Locale.ROOT, " and M_D %.3f, whichever is lower", spec.diveMach()),
        EnvelopeReport.MARGIN_FACTOR));
    w.element("p", CAUTION, "class", "pointer");
    chart.writeFigure(w);
    w.open("table", "class", "compact");
    w.open("thead").open("tr");
    for (String h : List.of("configuration", "point", "altitude (m)", "Mach", "EAS (" + unit.symbol() + ")",
        "TAS (" + unit.symbol() + ")", "EAS over dive line", "frequency (Hz)", "mode", "note")) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    for (Envelope e : data.envelopes()) {
      for (Point p : e.points()) {
        row(w, e.configuration(), p, spec);
      }
    }
    w.close("tbody").close("table");
    for (Envelope e : data.envelopes()) {
      w.element("p", e.configuration() + ": " + e.aero());
      if (!e.warnings().isEmpty()) {
        w.open("ul", "class", "notes");
        e.warnings().forEach(x -> w.element("li", x));
        w.close("ul");
      }
    }
  }

  private void row(XhtmlWriter w, String configuration, Point p, EnvelopeSpec spec) {
    FlightCondition c = p.condition();
    double ratio = p.found() ? c.speedEasMps() / EnvelopeReport.diveEasMps(spec, c.altitudeM()) : Double.NaN;
    boolean inside = ratio < EnvelopeReport.MARGIN_FACTOR;
    if (inside || !p.found()) {
      w.open("tr", "class", inside ? "fail" : "static");
    } else {
      w.open("tr");
    }
    w.element("td", configuration);
    w.element("td", p.kind().name().toLowerCase(Locale.ROOT).replace('_', ' '));
    w.element("td", p.found() ? OpenLoopSections.fmt(c.altitudeM(), 0) : OpenLoopSections.MISSING, "class", "num");
    w.element("td", p.found() ? OpenLoopSections.fmt(c.mach(), 3) : OpenLoopSections.MISSING, "class", "num");
    w.element("td", p.found() ? OpenLoopSections.fmt(unit.fromMps(c.speedEasMps()), 1) : OpenLoopSections.MISSING,
        "class", "num");
    w.element("td", p.found() ? OpenLoopSections.fmt(unit.fromMps(c.speedTasMps()), 1) : OpenLoopSections.MISSING,
        "class", "num");
    w.element("td", p.found() ? String.format(Locale.ROOT, "%+.1f %%", 100 * (ratio - 1)) : OpenLoopSections.MISSING,
        "class", inside ? "num warn" : "num");
    w.element("td", p.frequencyHz() > 0 ? OpenLoopSections.fmt(p.frequencyHz(), 2) : OpenLoopSections.MISSING,
        "class", "num");
    w.element("td", p.mode().isEmpty() ? OpenLoopSections.MISSING : p.mode());
    w.element("td", !p.found() ? p.note() : ratio < 1 ? "below the dive line" : inside
        ? String.format(Locale.ROOT, "within %.2f x the dive line", EnvelopeReport.MARGIN_FACTOR) : "");
    w.close("tr");
  }

  private String speed(double mps) {
    return String.format(Locale.ROOT, "%.1f %s", unit.fromMps(mps), unit.symbol());
  }
}
