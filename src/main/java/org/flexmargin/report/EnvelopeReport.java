package org.flexmargin.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.sweep.MatchedPoints;
import org.flexmargin.sweep.MatchedPoints.Envelope;
import org.flexmargin.sweep.MatchedPoints.Kind;
import org.flexmargin.sweep.MatchedPoints.Point;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The files of a matched-point envelope: {@code envelope.csv} (one row per matched point),
 * {@code envelope.png} (altitude against equivalent airspeed: the flutter and divergence
 * boundaries with the design dive line V_D / M_D and the line 15 % beyond it) and
 * {@code envelope.txt} (what was computed, warnings and the cautions).
 */
public final class EnvelopeReport {
  /** Equivalent-airspeed margin beyond V_D drawn on the chart (common practice: 15 %). */
  public static final double MARGIN_FACTOR = 1.15;

  private EnvelopeReport() {}

  /**
   * A computed envelope to show in the HTML report.
   *
   * @param spec the envelope's lines and dive speed
   * @param envelopes one per configuration, in case order
   */
  public record Data(EnvelopeSpec spec, List<Envelope> envelopes) {
    /** Validates and copies. */
    public Data {
      if (spec == null || envelopes == null || envelopes.isEmpty()) {
        throw new IllegalArgumentException("an envelope needs its section and at least one configuration");
      }
      envelopes = List.copyOf(envelopes);
    }
  }

  /**
   * Writes the three files.
   *
   * @param folder an existing folder
   * @param caseName the case's name
   * @param spec the envelope's lines
   * @param envelopes one per configuration
   * @throws IOException on failure
   */
  public static void write(Path folder, String caseName, EnvelopeSpec spec, List<Envelope> envelopes)
      throws IOException {
    Files.writeString(folder.resolve("envelope.csv"), csv(envelopes), StandardCharsets.UTF_8);
    ReportChart chart = chart(caseName, spec, envelopes, SpeedAxisUnit.METRES_PER_SECOND);
    chart.writeTo(folder, chart.png(), false);
    Files.writeString(folder.resolve("envelope.txt"), text(caseName, spec, envelopes), StandardCharsets.UTF_8);
  }

  /** @return the CSV text: a header and one row per point */
  static String csv(List<Envelope> envelopes) {
    StringBuilder b = new StringBuilder("configuration,kind,found,altitude_m,mach,speed_tas_mps,speed_eas_mps,"
        + "frequency_hz,mode,forces_mach,iterations,converged,note\n");
    for (Envelope e : envelopes) {
      for (Point p : e.points()) {
        FlightCondition c = p.condition();
        b.append(String.join(",", e.configuration(), p.kind().name().toLowerCase(Locale.ROOT),
            String.valueOf(p.found()), num(c == null ? Double.NaN : c.altitudeM()),
            num(c == null ? Double.NaN : c.mach()), num(c == null ? Double.NaN : c.speedTasMps()),
            num(c == null ? Double.NaN : c.speedEasMps()), num(p.frequencyHz()), p.mode(), num(p.forcesMach()),
            String.valueOf(p.iterations()), String.valueOf(p.converged()), "\"" + p.note().replace("\"", "'") + "\""))
            .append('\n');
      }
    }
    return b.toString();
  }

  private static String num(double v) {
    return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.6g", v);
  }

  /**
   * The design dive line at an altitude: V_D, or with M_D the lower of V_D and the EAS of M_D.
   *
   * @param spec the envelope's dive speed and Mach number
   * @param altitudeM geometric altitude (m)
   * @return the dive line's equivalent airspeed (m/s)
   */
  static double diveEasMps(EnvelopeSpec spec, double altitudeM) {
    double v = spec.diveSpeedEasMps();
    return Double.isNaN(spec.diveMach()) ? v
        : Math.min(v, StandardAtmosphere.atMach(altitudeM, spec.diveMach()).speedEasMps());
  }

  /** @return the chart: altitude (m) against EAS in {@code unit} */
  static ReportChart chart(String caseName, EnvelopeSpec spec, List<Envelope> envelopes, SpeedAxisUnit unit) {
    XYChart chart = ChartSeries.chart(caseName + ": matched-point flutter and divergence boundary",
        unit.axisTitle(), "altitude (m)");
    Set<String> used = new HashSet<>();
    List<String> notes = new ArrayList<>();
    int index = 0;
    for (Envelope e : envelopes) {
      String suffix = envelopes.size() > 1 ? " (" + e.configuration() + ")" : "";
      series(chart, used, e, Kind.FLUTTER_AT_ALTITUDE, Kind.FLUTTER_AT_MACH, "flutter" + suffix,
          ReportStyle.seriesColor(index), true, unit);
      series(chart, used, e, Kind.DIVERGENCE_AT_ALTITUDE, Kind.DIVERGENCE_AT_MACH, "divergence" + suffix,
          ReportStyle.seriesColor(index), false, unit);
      index++;
    }
    double[] alts = spec.altitudesM();
    int n = 60;
    double[] h = new double[n];
    double[] vd = new double[n];
    double[] margin = new double[n];
    for (int i = 0; i < n; i++) {
      h[i] = alts[0] + (alts[alts.length - 1] - alts[0]) * i / (n - 1.0);
      double v = diveEasMps(spec, h[i]);
      vd[i] = unit.fromMps(v);
      margin[i] = unit.fromMps(MARGIN_FACTOR * v);
    }
    String dive = Double.isNaN(spec.diveMach()) ? "V_D" : "V_D / M_D";
    ChartSeries.line(chart, used, dive, vd, h, ReportStyle.ZERO_LINE,
        ReportStyle.referenceStroke(2.2f, new float[] {12f, 4f, 3f, 4f}));
    ChartSeries.line(chart, used, String.format(Locale.ROOT, "%.2f x %s (margin, common practice)", MARGIN_FACTOR, dive),
        margin, h, ReportStyle.REQUIREMENT, ReportStyle.referenceStroke(1.5f, new float[] {6f, 4f}));
    // every point and line inside the frame, markers not cut by it: 10 % below the lowest speed,
    // 5 % above the highest, 4 % of the altitude span (at least 1000 m) beyond the extreme points
    double lo = Double.POSITIVE_INFINITY, hi = 0, bottom = alts[0], top = alts[alts.length - 1];
    for (double v : vd) {
      lo = Math.min(lo, v);
    }
    for (double v : margin) {
      hi = Math.max(hi, v);
    }
    for (Envelope e : envelopes) {
      for (Point p : e.points()) {
        if (p.found()) {
          lo = Math.min(lo, unit.fromMps(p.condition().speedEasMps()));
          hi = Math.max(hi, unit.fromMps(p.condition().speedEasMps()));
          bottom = Math.min(bottom, p.condition().altitudeM());
          top = Math.max(top, p.condition().altitudeM());
        }
      }
    }
    double pad = 0.04 * Math.max(top - bottom, 1000);
    chart.getStyler().setXAxisMin(0.9 * lo).setXAxisMax(1.05 * hi).setYAxisMin(bottom - pad).setYAxisMax(top + pad);
    notes.add("Lines: points matched at each listed altitude (Mach number of the forces iterated to the point's); "
        + "markers: points along each listed Mach number. Missing points had no onset in the swept range.");
    return new ReportChart("envelope", "Matched-point flutter and divergence boundary against the design dive line.",
        chart, notes);
  }

  private static void series(XYChart chart, Set<String> used, Envelope e, Kind atAltitude, Kind atMach, String name,
      java.awt.Color color, boolean flutter, SpeedAxisUnit unit) {
    List<double[]> line = new ArrayList<>();
    List<double[]> marks = new ArrayList<>();
    for (Point p : e.points()) {
      if (p.found() && p.kind() == atAltitude) {
        line.add(new double[] {unit.fromMps(p.condition().speedEasMps()), p.condition().altitudeM()});
      } else if (p.found() && p.kind() == atMach) {
        marks.add(new double[] {unit.fromMps(p.condition().speedEasMps()), p.condition().altitudeM()});
      }
    }
    if (!line.isEmpty()) {
      ChartSeries.line(chart, used, name + ", matched at altitude", column(line, 0), column(line, 1), color,
          flutter ? ReportStyle.seriesStroke(0) : ReportStyle.referenceStroke(2f, new float[] {2f, 3f}));
      ChartSeries.markers(chart, used, name + " points", column(line, 0), column(line, 1), color,
          flutter ? SeriesMarkers.CIRCLE : SeriesMarkers.SQUARE);
    }
    if (!marks.isEmpty()) {
      ChartSeries.markers(chart, used, name + ", along constant Mach", column(marks, 0), column(marks, 1), color,
          flutter ? SeriesMarkers.DIAMOND : SeriesMarkers.TRIANGLE_UP);
    }
  }

  private static double[] column(List<double[]> rows, int c) {
    return rows.stream().mapToDouble(r -> r[c]).toArray();
  }

  /**
   * @param caseName the case's name
   * @param spec the envelope's lines
   * @param envelopes one per configuration
   * @return the text of {@code envelope.txt}: points, warnings and the cautions
   */
  public static String text(String caseName, EnvelopeSpec spec, List<Envelope> envelopes) {
    StringBuilder b = new StringBuilder();
    b.append("Matched-point envelope of case ").append(caseName).append('\n');
    b.append(String.format(Locale.ROOT, "Design dive speed %.1f m/s EAS%s; margin line %.2f x.%n",
        spec.diveSpeedEasMps(), Double.isNaN(spec.diveMach()) ? "" : String.format(Locale.ROOT, ", M_D %.3f",
            spec.diveMach()), MARGIN_FACTOR));
    b.append(String.format(Locale.ROOT, "Matched when the Mach numbers of forces and point agree within %.0e "
        + "(at most %d iterations).%n%n", MatchedPoints.MACH_TOLERANCE, MatchedPoints.MAX_ITERATIONS));
    for (Envelope e : envelopes) {
      b.append("Configuration ").append(e.configuration()).append(": ").append(e.aero()).append('\n');
      for (Point p : e.points()) {
        String what = p.kind().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        if (p.found()) {
          FlightCondition c = p.condition();
          b.append(String.format(Locale.ROOT, "  %-24s %7.0f m  Mach %.3f  %7.1f m/s EAS  %7.1f m/s TAS%s%n", what,
              c.altitudeM(), c.mach(), c.speedEasMps(), c.speedTasMps(),
              p.frequencyHz() > 0 ? String.format(Locale.ROOT, "  %.2f Hz (%s)", p.frequencyHz(), p.mode()) : ""));
        } else {
          b.append(String.format(Locale.ROOT, "  %-24s %s%n", what, p.note()));
        }
      }
      for (String w : e.warnings()) {
        b.append("  warning: ").append(w).append('\n');
      }
      b.append('\n');
    }
    b.append("Cautions\n");
    b.append("Linear subsonic aerodynamics and a linear structure: no transonic effects.\n");
    Cautions.TEXT.forEach(t -> b.append(t).append('\n'));
    return b.toString();
  }
}
