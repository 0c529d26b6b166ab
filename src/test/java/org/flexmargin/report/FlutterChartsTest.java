package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.SweepResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The chart objects: one line per mode, markers at exactly the findings' speeds, reference lines,
 * gaps where a root is missing, and the g-axis limit stated in a note.
 */
class FlutterChartsTest {
  static SweepResult demo;
  static List<Finding> demoFindings;
  static SweepResult lpw;
  static List<Finding> lpwFindings;

  @BeforeAll
  static void solve() {
    demo = SharedResults.demo().result();
    demoFindings = SharedResults.demo().findings();
    lpw = SharedResults.lpw().result();
    lpwFindings = SharedResults.lpw().findings();
  }

  @Test
  void oneLinePerModeAndMarkersAtTheFindingsSpeeds() {
    for (SweepResult r : List.of(demo, lpw)) {
      List<Finding> findings = r == demo ? demoFindings : lpwFindings;
      double limit = r.analysisCase().options().dampingLimitG();
      for (ConfigurationResult c : r.configurations()) {
        for (boolean damping : new boolean[] {true, false}) {
          XYChart chart = (damping ? FlutterCharts.dampingChart(r, c, SpeedAxisUnit.METRES_PER_SECOND)
              : FlutterCharts.frequencyChart(r, c, SpeedAxisUnit.METRES_PER_SECOND)).chart();
          Map<String, XYSeries> series = chart.getSeriesMap();
          for (BranchCurve b : c.flutter().branches()) {
            assertNotNull(series.get(b.name()), "line of mode " + b.name());
            assertEquals(b.size(), series.get(b.name()).getXData().length);
          }
          int markerSeries = 0;
          for (CrossingKind k : CrossingKind.values()) {
            double[] expected = findings.stream()
                .filter(f -> f.configuration().equals(c.configuration()) && f.what().equals(Findings.label(k)))
                .mapToDouble(Finding::speedEasMps).sorted().toArray();
            XYSeries m = series.get(FlutterCharts.markerSeries(k));
            if (expected.length == 0) {
              assertTrue(m == null, "no marker series without crossings of kind " + k);
              continue;
            }
            markerSeries++;
            assertNotNull(m, "marker series " + k);
            double[] x = m.getXData().clone();
            Arrays.sort(x);
            // the same double: both come from FlutterCrossing.condition().speedEasMps()
            assertTrue(Arrays.equals(expected, x), k + " markers at " + Arrays.toString(x) + ", findings "
                + Arrays.toString(expected));
            for (double y : m.getYData()) {
              if (damping) {
                double threshold = k.isStabilityChange() ? 0.0 : -limit;
                assertEquals(threshold, y, 0.0, "marker sits on the crossed g level");
              } else {
                assertTrue(y > 0, "marker at the root's frequency");
              }
            }
          }
          int references = damping ? (limit > 0 ? 2 : 1) : 0;
          if (damping) {
            assertNotNull(series.get(FlutterCharts.ZERO_LINE_SERIES));
            assertNotNull(series.get(FlutterCharts.limitLineSeries(limit)));
          }
          long divergence = series.keySet().stream().filter(s -> s.startsWith(FlutterCharts.DIVERGENCE_SERIES_PREFIX))
              .count();
          // with a requirements table: the V0max, V_L and extended-speed lines
          long regime = series.keySet().stream().filter(s -> s.startsWith(ChartSeries.V0MAX_PREFIX)
              || s.contains(ChartSeries.VL_PREFIX + " =")).count();
          assertEquals(c.flutter().branches().size() + markerSeries + references + divergence + regime, series.size(),
              "modes, markers and reference lines, nothing else");
        }
      }
    }
    // the cases are chosen so that the marker checks above are not vacuous
    assertTrue(demoFindings.stream().anyMatch(f -> f.what().equals("flutter onset")));
    assertTrue(demoFindings.stream().anyMatch(f -> f.what().equals("damping below limit")));
    assertTrue(lpwFindings.stream().anyMatch(f -> f.what().equals("flutter onset")));
  }

  @Test
  void knotAxisMarkersAreTheFindingsKnots() {
    ConfigurationResult c = demo.configurations().get(0);
    XYChart chart = FlutterCharts.dampingChart(demo, c, SpeedAxisUnit.KNOTS).chart();
    assertEquals("equivalent airspeed (kt)", chart.getXAxisTitle());
    double[] x = chart.getSeriesMap().get(FlutterCharts.markerSeries(CrossingKind.FLUTTER_ONSET)).getXData();
    double[] expected = demoFindings.stream()
        .filter(f -> f.configuration().equals(c.configuration()) && f.what().equals("flutter onset"))
        .mapToDouble(Finding::speedEasKnots).toArray();
    assertEquals(expected.length, x.length);
    for (int i = 0; i < x.length; i++) {
      // same product speedEasMps * 3600/1852; 1e-12 relative allows a different rounding order
      assertEquals(expected[i], x[i], 1e-12 * expected[i]);
    }
    // the axis spans the sweep: 35 to 170 m/s EAS (demo-case.json) in knots, 1 kt = 1852/3600 m/s
    assertEquals(35.0 * 3600 / 1852, chart.getStyler().getXAxisMin(), 1e-9);
    assertEquals(170.0 * 3600 / 1852, chart.getStyler().getXAxisMax(), 1e-9);
  }

  @Test
  void axesAreLabelledWithUnits() {
    ConfigurationResult c = lpw.configurations().get(0);
    XYChart vg = FlutterCharts.dampingChart(lpw, c, SpeedAxisUnit.METRES_PER_SECOND).chart();
    XYChart vf = FlutterCharts.frequencyChart(lpw, c, SpeedAxisUnit.METRES_PER_SECOND).chart();
    assertEquals("equivalent airspeed (m/s)", vg.getXAxisTitle());
    assertEquals("damping g (V-g convention, negative = stable)", vg.getYAxisTitle());
    assertEquals("frequency (Hz)", vf.getYAxisTitle());
    assertTrue(vg.getTitle().contains(c.configuration()) && vg.getTitle().contains("p-k method"));
  }

  @Test
  void missingRootsAreGapsAndClippingIsSaid() {
    ConfigurationResult c = lpw.configurations().get(0);
    BranchCurve b = c.flutter().branches().get(0);
    int n = b.size();
    double[] g = b.dampingG();
    boolean[] ok = b.converged();
    ok[3] = false; // an unconverged point
    g[5] = Double.POSITIVE_INFINITY; // a non-oscillating root
    g[7] = -3.0; // a heavily damped point, far below the axis floor
    BranchCurve edited = new BranchCurve(b.name(), b.pathParameter(), b.speedEasMps(), b.speedTasMps(),
        b.frequencyHz(), g, b.dampingRatio(), b.reducedFrequency(), ok);
    List<BranchCurve> branches = new ArrayList<>(c.flutter().branches());
    branches.set(0, edited);
    FlutterSolution s = c.flutter();
    ConfigurationResult changed = new ConfigurationResult(c.configuration(), c.modeNames(), c.modeFrequenciesHz(),
        c.aeroDescription(), c.divergence(), c.divergenceConfirmedPa(), c.divergenceTasAtSweepStartMps(),
        new FlutterSolution(s.method(), branches, s.crossings(), s.diagnostics(), s.warnings()), c.elapsedSeconds());
    SweepResult r = new SweepResult(lpw.analysisCase(), lpw.pathDescription(), List.of(changed));

    ReportChart vg = FlutterCharts.dampingChart(r, changed, SpeedAxisUnit.METRES_PER_SECOND);
    double[] y = vg.chart().getSeriesMap().get(b.name()).getYData();
    assertEquals(n, y.length);
    assertTrue(Double.isNaN(y[3]), "unconverged point is a gap");
    assertTrue(Double.isNaN(y[5]), "non-oscillating root is a gap");
    assertEquals(-3.0, y[7], 0.0, "a finite value is kept and runs off the plot");
    assertEquals(FlutterCharts.G_AXIS_FLOOR, vg.chart().getStyler().getYAxisMin(), 1e-12,
        "the g axis stops at its floor");
    String notes = String.join(" ", vg.notes());
    assertTrue(notes.contains("did not converge"), notes);
    assertTrue(notes.contains("non-oscillating"), notes);
    assertTrue(notes.contains("below g = -0.60"), notes);

    ReportChart vf = FlutterCharts.frequencyChart(r, changed, SpeedAxisUnit.METRES_PER_SECOND);
    double[] f = vf.chart().getSeriesMap().get(b.name()).getYData();
    assertTrue(Double.isNaN(f[3]), "unconverged frequency is a gap");
    assertFalse(Double.isNaN(f[5]), "a non-oscillating root still has a frequency");
  }

  @Test
  void gAxisAlwaysShowsZeroAndTheLimit() {
    for (ConfigurationResult c : demo.configurations()) {
      XYChart chart = FlutterCharts.dampingChart(demo, c, SpeedAxisUnit.METRES_PER_SECOND).chart();
      double limit = demo.analysisCase().options().dampingLimitG();
      assertTrue(chart.getStyler().getYAxisMin() < -limit);
      assertTrue(chart.getStyler().getYAxisMax() > 0);
      assertTrue(chart.getStyler().getYAxisMin() >= FlutterCharts.G_AXIS_FLOOR - 1e-12);
      assertTrue(chart.getStyler().getYAxisMax() <= FlutterCharts.G_AXIS_CEILING + 1e-12);
    }
  }

  @Test
  void kMethodChartsDrawAndSayWhatGMeans() throws Exception {
    AnalysisCase l = lpw.analysisCase();
    AnalysisCase k = new AnalysisCase(l.format(), l.name(), l.description(), l.configurations(), l.sweep(),
        l.options().withMethod(org.flexmargin.model.FlutterMethodKind.K), l.inputs());
    SweepResult r = new CaseSweep(1).run(k, n -> { });
    for (ReportChart chart : FlutterCharts.of(r, r.configurations().get(0), SpeedAxisUnit.METRES_PER_SECOND)) {
      byte[] png = chart.png();
      assertTrue(png.length > 1000, "drawn");
      assertTrue(chart.chart().getTitle().contains("k method"));
      assertTrue(String.join(" ", chart.notes()).contains("artificial structural damping"));
    }
  }
}
