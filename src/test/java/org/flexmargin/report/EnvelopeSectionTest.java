package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.sweep.MatchedPoints.Envelope;
import org.flexmargin.sweep.MatchedPoints.Kind;
import org.flexmargin.sweep.MatchedPoints.Point;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;

/** The matched-point envelope in the HTML report: table, dive-line distances, chart frame, page. */
class EnvelopeSectionTest {
  static final EnvelopeSpec SPEC = new EnvelopeSpec(new double[] {0, 9000}, new double[] {0.5}, 20, 300, 21, 110,
      0.45);

  /**
   * EAS of Mach M at 9000 m geometric altitude in the troposphere of the standard atmosphere,
   * written out (U.S. Standard Atmosphere, 1976, constants from memory): geopotential altitude H
   * = r0 h / (r0 + h) with r0 = 6 356 766 m, T = 288.15 - 0.0065 H, a = sqrt(1.4 x 287.053 T),
   * sigma = (T / 288.15)^4.25588, EAS = M a sqrt(sigma).
   */
  static double easOfMachAt9000(double mach) {
    double geopotential = 6356766.0 * 9000 / (6356766.0 + 9000);
    double t = 288.15 - 0.0065 * geopotential;
    double a = Math.sqrt(1.4 * 287.053 * t);
    double sigma = Math.pow(t / 288.15, 4.25588);
    return mach * a * Math.sqrt(sigma);
  }

  static Point flutter(double altitudeM, double easMps) {
    return new Point(Kind.FLUTTER_AT_ALTITUDE, true, StandardAtmosphere.of(altitudeM, easMps, AirspeedKind.EQUIVALENT),
        0.3, 12.5, "torsion", 2, true, "");
  }

  static EnvelopeReport.Data data() {
    Point missing = new Point(Kind.DIVERGENCE_AT_MACH, false, null, 0.5, Double.NaN, "", 1, true,
        "no divergence at Mach 0.500");
    return new EnvelopeReport.Data(SPEC, List.of(new Envelope("clean", "tabulated forces",
        List.of(flutter(0, 100), flutter(9000, 1.2 * easOfMachAt9000(0.45)), missing),
        List.of("aerodynamics outside their range: a test warning"))));
  }

  @Test
  void theDiveLineIsTheLowerOfVdAndTheEasOfMd() {
    // sea level: M_D 0.45 is 153 m/s EAS, above V_D = 110, so V_D governs; at 9000 m the EAS of
    // M_D is 0.45 x 303.8 x sqrt(0.3813) = 84.4 m/s (derived above), below V_D. Tolerance 1e-4
    // relative: the constants' digits
    assertEquals(110, EnvelopeReport.diveEasMps(SPEC, 0), 0.0);
    double md = easOfMachAt9000(0.45);
    assertEquals(84.4, md, 0.1);
    assertEquals(md, EnvelopeReport.diveEasMps(SPEC, 9000), 1e-4 * md);
    EnvelopeSpec noMd = new EnvelopeSpec(new double[] {0, 9000}, new double[0], 20, 300, 21, 110, Double.NaN);
    assertEquals(110, EnvelopeReport.diveEasMps(noMd, 9000), 0.0);
  }

  @Test
  void theTableGivesEveryPointsDistanceFromTheDiveLine() {
    String html = body(data(), SpeedAxisUnit.METRES_PER_SECOND);
    // 100 / 110 - 1 = -9.1 % (derived): below the dive line, marked
    assertTrue(html.contains("<tr class=\"fail\"><td>clean</td><td>flutter at altitude</td><td class=\"num\">0</td>"),
        html);
    assertTrue(html.contains("<td class=\"num warn\">-9.1 %</td>") && html.contains("below the dive line"), html);
    // 1.2 x the dive line at 9000 m: +20.0 %, beyond the 1.15 margin, not marked
    assertTrue(html.contains("<tr><td>clean</td><td>flutter at altitude</td><td class=\"num\">9000</td>"), html);
    assertTrue(html.contains("<td class=\"num\">+20.0 %</td>"), html);
    // a missing point says why; the warnings and the caution are there
    assertTrue(html.contains("<tr class=\"static\"><td>clean</td><td>divergence at mach</td>"), html);
    assertTrue(html.contains("no divergence at Mach 0.500"));
    assertTrue(html.contains("a test warning"));
    assertTrue(html.contains(EnvelopeSection.CAUTION.replace("'", "&#39;")), html);
    assertTrue(html.contains("V_D 110.0 m/s EAS and M_D 0.450, whichever is lower"));
    // in knots: 100 m/s = 194.4 kt (1 kt = 1852 / 3600 m/s, exact by definition)
    String kt = body(data(), SpeedAxisUnit.KNOTS);
    assertTrue(kt.contains("<th>EAS (kt)</th>") && kt.contains("<td class=\"num\">194.4</td>"), kt);
    assertTrue(kt.contains("V_D 213.8 kt EAS"), kt);
  }

  private static String body(EnvelopeReport.Data d, SpeedAxisUnit unit) {
    ReportChart chart = EnvelopeReport.chart("case", d.spec(), d.envelopes(), unit);
    XhtmlWriter w = new XhtmlWriter();
    new EnvelopeSection(d, unit, new EmbeddedChart(chart, new byte[] {1}, List.of())).writeBody(w);
    return w.finish();
  }

  @Test
  void theChartFrameHoldsEveryPointAndLine() {
    XYChart c = EnvelopeReport.chart("case", SPEC, data().envelopes(), SpeedAxisUnit.METRES_PER_SECOND).chart();
    double md = easOfMachAt9000(0.45);
    // lowest speed drawn: the dive line at 9000 m (84.4 m/s); highest: 1.15 x V_D = 126.5 m/s
    assertEquals(0.9 * md, c.getStyler().getXAxisMin(), 1e-3);
    assertEquals(1.05 * 1.15 * 110, c.getStyler().getXAxisMax(), 1e-9);
    // altitudes 0 to 9000 m with 4 % of the span either side
    assertEquals(-360, c.getStyler().getYAxisMin(), 1e-9);
    assertEquals(9360, c.getStyler().getYAxisMax(), 1e-9);
    assertTrue(c.getSeriesMap().containsKey("V_D / M_D"));
    assertTrue(c.getSeriesMap().containsKey("1.15 x V_D / M_D (margin, common practice)"));
  }

  @Test
  void theReportShowsTheEnvelopeOnlyWhenGiven(@TempDir Path tmp) throws IOException {
    SharedResults.Solved lpw = SharedResults.lpw();
    Path with = Files.createDirectories(tmp.resolve("with"));
    ReportWriter.write(with, lpw.result(), lpw.findings(), "test", ReportOptions.defaults().withEnvelope(data()));
    String page = Files.readString(with.resolve(ReportWriter.REPORT_FILE), StandardCharsets.UTF_8);
    assertTrue(page.contains("<section id=\"envelope\"><h2>Matched-point flutter and divergence envelope</h2>"));
    assertTrue(page.contains("href=\"#envelope\""), "in the table of contents");
    assertTrue(Files.size(with.resolve("charts/envelope.png")) > 1000);
    // before the diagnostics and the provenance
    assertTrue(page.indexOf("id=\"envelope\"") < page.indexOf("id=\"diagnostics\""));
    Path without = Files.createDirectories(tmp.resolve("without"));
    ReportWriter.write(without, lpw.result(), lpw.findings(), "test", ReportOptions.defaults());
    assertFalse(Files.readString(without.resolve(ReportWriter.REPORT_FILE)).contains("id=\"envelope\""));
    assertFalse(Files.exists(without.resolve("charts/envelope.png")));
  }
}
