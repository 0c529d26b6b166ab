package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.clearance.StructuralStabilisation;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.sweep.ClosedLoopPoint;
import org.flexmargin.sweep.ClosedLoopRoot;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.SweepResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The charts read as a reviewer needs them: closed-loop lines keep their root from speed to speed
 * and the legends stay short, the open-loop diagrams carry the speed-regime lines, the root locus is
 * in Hz, delay margins in milliseconds, phase-stabilised stretches differ from failures, and a
 * chart's notes never deny a failure the tables show. Demo sweep shared ({@link SharedResults}).
 */
class ChartReadabilityTest {
  static SweepResult demo;
  static final SpeedAxisUnit MPS = SpeedAxisUnit.METRES_PER_SECOND;
  /** Most legend entries a chart may have to stay readable beside the plot (about a dozen). */
  static final int MAX_LEGEND = 12;

  @BeforeAll
  static void solve() {
    System.setProperty("java.awt.headless", "true");
    demo = SharedResults.demo().result();
  }

  private static List<String> legend(XYChart chart) {
    List<String> out = new ArrayList<>();
    for (XYSeries s : chart.getSeriesMap().values()) {
      if (s.isShowInLegend()) {
        out.add(s.getName());
      }
    }
    return out;
  }

  private static ReportChart chart(List<ReportChart> charts, String prefix) {
    return charts.stream().filter(r -> r.fileStem().startsWith(prefix)).findFirst()
        .orElseThrow(() -> new AssertionError("no chart " + prefix));
  }

  @Test
  void closedLoopLegendsAreShortWithOneEntryPerMode() {
    for (ConfigurationResult c : demo.configurations()) {
      for (ReportChart rc : ClosedLoopCharts.of(demo, c, MPS).subList(1, 3)) {
        List<String> names = legend(rc.chart());
        assertTrue(names.size() <= MAX_LEGEND, rc.fileStem() + " legend " + names.size() + ": " + names);
        Set<String> distinct = new HashSet<>(names);
        assertEquals(names.size(), distinct.size(), "no duplicate entries");
        for (String n : names) {
          assertFalse(n.contains("#") || n.matches(".*\\(\\d+\\)$"), "no numbered duplicates: " + n);
        }
        assertTrue(names.contains(ClosedLoopCharts.LOOP_ROOTS_SERIES), "loop roots grouped under one entry");
      }
      // the margin charts too: the regime lines are named on the plot, not in the legend
      for (ReportChart rc : MarginCharts.of(demo, c, MPS)) {
        assertTrue(legend(rc.chart()).size() <= MAX_LEGEND, rc.fileStem() + ": " + legend(rc.chart()));
      }
    }
  }

  @Test
  void closedLoopLinesFollowOneRootWithoutJumps() {
    // each drawn line is one root: between neighbouring grid points it moves by at most the tracking
    // step (relative to its modulus), so no line jumps where two roots swap their nearest labels
    for (ConfigurationResult c : demo.configurations()) {
      List<RootTracks.Track> tracks = RootTracks.of(c.servo().closedLoop().points(), c.modeNames(),
          c.modeFrequenciesHz());
      for (RootTracks.Track t : tracks) {
        double[] re = t.realPerS();
        double[] im = t.imagRadPerS();
        for (int i = 1; i < re.length; i++) {
          if (Double.isNaN(re[i]) || Double.isNaN(re[i - 1])) {
            continue;
          }
          double step = Math.hypot(re[i] - re[i - 1], im[i] - im[i - 1]) / Math.max(Math.hypot(re[i - 1], im[i - 1]), 1);
          assertTrue(step <= RootTracks.MAX_RELATIVE_STEP, t.name() + " jumps at point " + i + ": " + step);
        }
      }
      // and every structural mode has its line
      for (String m : c.modeNames()) {
        assertTrue(tracks.stream().anyMatch(t -> t.structural() && t.name().equals(m)), "line for " + m);
      }
    }
  }

  @Test
  void tracksKeepIdentityWhereLabelsSwap() {
    // two roots cross in frequency (one rising from 10 to 14 rad/s, one falling from 14 to 10) and
    // their nearest-open-loop labels swap half-way, as labels by nearest root do; the tracks must
    // follow the motion (closed form: straight lines), not the labels
    List<ClosedLoopPoint> pts = new ArrayList<>();
    int n = 9;
    for (int i = 0; i < n; i++) {
      double up = 10 + 4.0 * i / (n - 1);
      double down = 14 - 4.0 * i / (n - 1);
      boolean swapped = i > n / 2;
      // sea-level standard day (ISA: 1.225 kg/m^3, 101325 Pa, 288.15 K, 340.29 m/s)
      FlightCondition fc = new FlightCondition(0.0, 1.225, 101325.0, 288.15, 340.29, 40 + 5 * i);
      pts.add(new ClosedLoopPoint(i, fc, List.of(
          new ClosedLoopRoot(-0.5, up, swapped ? "b" : "a"),
          new ClosedLoopRoot(-0.3 - 0.2 * i / (n - 1.0), down + 0.3, swapped ? "a" : "b")), 4));
    }
    List<RootTracks.Track> t = RootTracks.of(pts, List.of("a", "b"), new double[] {10 / (2 * Math.PI),
        14.3 / (2 * Math.PI)});
    assertEquals(2, t.size());
    for (int i = 0; i < n; i++) {
      assertEquals(10 + 4.0 * i / (n - 1), t.get(0).imagRadPerS()[i], 1e-12, "a follows the rising root");
      assertEquals(14.3 - 4.0 * i / (n - 1), t.get(1).imagRadPerS()[i], 1e-12, "b follows the falling root");
    }
  }

  @Test
  void openLoopDiagramsCarryTheRegimeLinesAndUnitLabels() {
    String[] regime = ChartSeries.regimeLineNames(demo.analysisCase().requirements(), MPS);
    for (ConfigurationResult c : demo.configurations()) {
      for (ReportChart rc : FlutterCharts.of(demo, c, MPS)) {
        for (String r : regime) {
          assertNotNull(rc.chart().getSeriesMap().get(r), rc.fileStem() + " has " + r);
        }
        assertTrue(legend(rc.chart()).size() <= MAX_LEGEND, rc.fileStem());
      }
    }
  }

  @Test
  void rootLocusIsInHertz() {
    ConfigurationResult c = demo.configurations().get(0);
    ReportChart rl = ClosedLoopCharts.of(demo, c, MPS).get(0);
    assertTrue(rl.chart().getYAxisTitle().contains("Hz"), rl.chart().getYAxisTitle());
    XYSeries onsets = rl.chart().getSeriesMap().get(ClosedLoopCharts.markerSeries(CrossingKind.FLUTTER_ONSET));
    List<FlutterCrossing> xs = c.servo().closedLoop().crossings().stream()
        .filter(x -> x.kind() == CrossingKind.FLUTTER_ONSET).toList();
    for (int i = 0; i < xs.size(); i++) {
      assertEquals(xs.get(i).frequencyHz(), onsets.getYData()[i], 1e-12, "onset at its frequency in Hz");
    }
  }

  @Test
  void delayMarginIsInMilliseconds() {
    ConfigurationResult c = demo.configurations().get(0);
    ReportChart dc = chart(MarginCharts.of(demo, c, MPS), "margins-delay-");
    assertTrue(dc.chart().getYAxisTitle().contains("ms"));
    XYSeries rigid = dc.chart().getSeriesMap().get(MarginCharts.delaySeries(org.flexmargin.model.FrequencyBand.RIGID_BODY));
    double[] y = rigid.getYData();
    // point 0: the smallest delay margin of the rigid-body crossovers, in s, times 1000
    double f1 = MarginCharts.firstAeroelasticHz(c, 0);
    double best = Double.NaN;
    for (GainCrossover g : c.servo().points().get(0).margins().gainCrossovers()) {
      if (org.flexmargin.clearance.RequirementLookup.band(g.frequencyHz(), f1)
          == org.flexmargin.model.FrequencyBand.RIGID_BODY) {
        best = Double.isNaN(best) ? g.delayMarginS() : Math.min(best, g.delayMarginS());
      }
    }
    assertEquals(1000 * best, y[0], 1e-9 * Math.abs(y[0]));
  }

  @Test
  void marginChartNotesNeverDenyAFailure() {
    for (ConfigurationResult c : demo.configurations()) {
      List<ReportChart> charts = MarginCharts.of(demo, c, MPS);
      for (String prefix : List.of("margins-gain-", "margins-phase-", "margins-structural-")) {
        ReportChart rc = chart(charts, prefix);
        Set<CheckKind> kinds = switch (prefix) {
          case "margins-gain-" -> Set.of(CheckKind.GAIN_INCREASE_MARGIN, CheckKind.GAIN_REDUCTION_MARGIN);
          case "margins-phase-" -> Set.of(CheckKind.PHASE_MARGIN);
          default -> Set.of(CheckKind.STRUCTURAL_MODE);
        };
        boolean fails = false;
        for (PointAssessment p : c.clearance().points()) {
          for (ClearanceCheck k : p.checks()) {
            fails |= kinds.contains(k.kind()) && !k.passed();
          }
        }
        String notes = String.join(" ", rc.notes());
        if (fails) {
          assertFalse(notes.contains("met at every") || notes.contains("No margin onset"), rc.fileStem() + ": " + notes);
          assertTrue(notes.contains("Margin onsets:") || notes.contains("Failing without a refined onset"),
              rc.fileStem() + " names the failure: " + notes);
        }
      }
    }
  }

  @Test
  void phaseStabilisedStretchesDifferFromFailures() {
    for (ConfigurationResult c : demo.configurations()) {
      XYChart chart = chart(MarginCharts.of(demo, c, MPS), "margins-structural-").chart();
      int phase = 0;
      int failed = 0;
      for (PointAssessment p : c.clearance().points()) {
        for (StructuralModeAssessment s : p.structuralModes()) {
          phase += s.status() == StructuralStabilisation.PHASE_STABILISED ? 1 : 0;
          failed += s.status() == StructuralStabilisation.FAILED ? 1 : 0;
        }
      }
      int drawnPhase = 0;
      for (XYSeries s : chart.getSeriesMap().values()) {
        if (s.getName().startsWith(MarginCharts.PHASE_STABILISED_SERIES + " ")) {
          for (double v : s.getYData()) {
            drawnPhase += Double.isNaN(v) ? 0 : 1;
          }
        }
      }
      assertEquals(phase, drawnPhase, "every phase-stabilised mode-point is on the pale band");
      XYSeries x = chart.getSeriesMap().get(MarginCharts.STRUCTURAL_FAILED_SERIES);
      assertEquals(failed, x == null ? 0 : x.getXData().length, "every failing mode-point is crossed");
      assertTrue(phase + failed > 0, "the demo has both kinds of stretch to show");
    }
  }
}
