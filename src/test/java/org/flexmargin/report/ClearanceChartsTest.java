package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.RequirementLookup;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SpeedRegime;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.MarginOnset;
import org.flexmargin.sweep.SweepResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The loop and clearance charts of the invented demo (two configurations, fly-by-wire loop with one
 * notch, recalled requirements preset with V0max 100 and V_L 115 m/s EAS): every chart has its
 * series, markers sit at the clearance's and the findings' refined speeds, requirement lines carry
 * the table's values in each speed regime, and the Nichols exclusion region has the required
 * margins as corners. One sweep is shared by all tests ({@link SharedResults}).
 */
class ClearanceChartsTest {
  static SweepResult demo;
  static List<Finding> findings;
  static ClearanceRequirements req;
  static final SpeedAxisUnit MPS = SpeedAxisUnit.METRES_PER_SECOND;
  static final Map<String, List<ReportChart>> MARGINS = new HashMap<>();
  static final Map<String, List<ReportChart>> CLOSED = new HashMap<>();
  static final Map<String, List<ReportChart>> RESPONSE = new HashMap<>();

  @BeforeAll
  static void draw() {
    System.setProperty("java.awt.headless", "true");
    demo = SharedResults.demo().result();
    findings = SharedResults.demo().findings();
    req = demo.analysisCase().requirements();
    assertNotNull(req, "the demo case has a requirements table");
    for (ConfigurationResult c : demo.configurations()) {
      MARGINS.put(c.configuration(), MarginCharts.of(demo, c, MPS));
      CLOSED.put(c.configuration(), ClosedLoopCharts.of(demo, c, MPS));
      RESPONSE.put(c.configuration(), LoopResponseCharts.of(demo, c, MPS));
    }
  }

  private static Map<String, XYSeries> series(List<ReportChart> charts, String stemPrefix, ConfigurationResult c) {
    String stem = stemPrefix + ResultFiles.fileSafe(c.configuration());
    return charts.stream().filter(r -> r.fileStem().equals(stem)).findFirst()
        .orElseThrow(() -> new AssertionError("no chart " + stem)).chart().getSeriesMap();
  }

  @Test
  void everyChartHasItsSeries() {
    String[] regime = ChartSeries.regimeLineNames(req, MPS);
    for (ConfigurationResult c : demo.configurations()) {
      Map<String, XYSeries> gain = series(MARGINS.get(c.configuration()), "margins-gain-", c);
      for (String s : List.of(MarginCharts.gainSeries(true, FrequencyBand.RIGID_BODY),
          MarginCharts.gainSeries(false, FrequencyBand.RIGID_BODY),
          MarginCharts.requiredGainSeries(FrequencyBand.RIGID_BODY), regime[0], regime[1], regime[2])) {
        assertNotNull(gain.get(s), "gain chart has " + s);
      }
      Map<String, XYSeries> phase = series(MARGINS.get(c.configuration()), "margins-phase-", c);
      assertNotNull(phase.get(MarginCharts.phaseSeries(FrequencyBand.RIGID_BODY)));
      assertNotNull(phase.get(MarginCharts.requiredPhaseSeries(FrequencyBand.RIGID_BODY)));
      Map<String, XYSeries> delay = series(MARGINS.get(c.configuration()), "margins-delay-", c);
      assertNotNull(delay.get(MarginCharts.delaySeries(FrequencyBand.RIGID_BODY)));
      Map<String, XYSeries> peak = series(MARGINS.get(c.configuration()), "margins-structural-", c);
      assertNotNull(peak.get(MarginCharts.PEAK_LIMIT_SERIES));
      for (String mode : c.modeNames()) {
        XYSeries s = peak.get(mode);
        assertNotNull(s, "structural peak line of " + mode);
        assertEquals(c.servo().points().size(), s.getXData().length, "one value per grid point");
      }
      Map<String, XYSeries> locus = series(CLOSED.get(c.configuration()), "root-locus-", c);
      long bins = locus.keySet().stream().filter(k -> k.startsWith("EAS ")).count();
      assertEquals(ClosedLoopCharts.SPEED_BINS, bins, "one colour bin series per airspeed bin");
      assertNotNull(locus.get(ClosedLoopCharts.ZETA_ZERO_SERIES));
      assertNotNull(locus.get(ClosedLoopCharts.zetaLimitSeries(demo.analysisCase().options().dampingLimitG())));
      for (String p : List.of("cl-vg-", "cl-vf-")) {
        Map<String, XYSeries> vg = series(CLOSED.get(c.configuration()), p, c);
        assertTrue(c.modeNames().stream().anyMatch(vg::containsKey), "closed-loop lines labelled by mode");
      }
      List<LoopResponseCharts.ChosenSpeed> speeds = LoopResponseCharts.chosenSpeeds(demo, c);
      assertTrue(speeds.stream().anyMatch(s -> s.label().startsWith("V0max")
          && s.speedEasMps() == req.maxOperatingSpeedEasMps()), "V0max is drawn");
      assertTrue(speeds.stream().anyMatch(s -> s.label().contains("V_L")
          && s.speedEasMps() == req.limitSpeedEasMps()), "V_L is drawn");
      assertTrue(speeds.stream().anyMatch(s -> s.label().contains("worst loop check")), "the worst point is drawn");
      for (String p : List.of("bode-gain-", "bode-phase-", "nichols-")) {
        Map<String, XYSeries> m = series(RESPONSE.get(c.configuration()), p, c);
        for (LoopResponseCharts.ChosenSpeed s : speeds) {
          assertNotNull(m.get(LoopResponseCharts.responseSeries(s, true, MPS)), p + " with notches at " + s);
          assertNotNull(m.get(LoopResponseCharts.responseSeries(s, false, MPS)), p + " without notches at " + s);
        }
      }
      Map<String, XYSeries> notch = series(RESPONSE.get(c.configuration()), "notches-", c);
      NotchFilterSpec n = (NotchFilterSpec) demo.analysisCase().loop().paths().get(0).filters().get(0);
      assertNotNull(notch.get(LoopResponseCharts.notchSeries(n, 0, "pitch_rate")));
      double[] f = c.modeFrequenciesHz();
      for (int m = 0; m < f.length; m++) {
        XYSeries band = notch.get(LoopResponseCharts.bandSeries(c.modeNames().get(m), 0.9 * f[m], 1.1 * f[m]));
        assertNotNull(band, "band of " + c.modeNames().get(m));
        // in-vacuo frequency +- the requirement's uncertainty, 10 % in the recalled preset (common practice)
        assertEquals(f[m] * (1 - req.frequencyUncertainty()), band.getXData()[0], 1e-12 * f[m]);
        assertEquals(f[m] * (1 + req.frequencyUncertainty()), band.getXData()[1], 1e-12 * f[m]);
      }
    }
  }

  @Test
  void marginOnsetMarkersAreTheClearanceOnsets() {
    int marked = 0;
    for (ConfigurationResult c : demo.configurations()) {
      List<MarginOnset> onsets = c.clearance().marginOnsets();
      Map<String, Set<CheckKind>> charts = Map.of(
          "margins-gain-", EnumSet.of(CheckKind.GAIN_INCREASE_MARGIN, CheckKind.GAIN_REDUCTION_MARGIN),
          "margins-phase-", EnumSet.of(CheckKind.PHASE_MARGIN),
          "margins-structural-", EnumSet.of(CheckKind.STRUCTURAL_MODE));
      for (Map.Entry<String, Set<CheckKind>> e : charts.entrySet()) {
        List<MarginOnset> expected = onsets.stream().filter(m -> e.getValue().contains(m.key().kind())).toList();
        XYSeries s = series(MARGINS.get(c.configuration()), e.getKey(), c).get(MarginCharts.ONSET_SERIES);
        if (expected.isEmpty()) {
          assertNull(s, "no onset markers without onsets on " + e.getKey());
          continue;
        }
        assertNotNull(s, "onset markers on " + e.getKey());
        double[] x = s.getXData();
        double[] y = s.getYData();
        assertEquals(expected.size(), x.length);
        for (int i = 0; i < x.length; i++) {
          // the same double: both are MarginOnset.condition().speedEasMps() (m/s axis, factor 1)
          assertEquals(expected.get(i).condition().speedEasMps(), x[i], 0.0);
          // and the same speed as the findings table's requirement-onset line
          double speed = x[i];
          assertTrue(findings.stream().anyMatch(f -> f.configuration().equals(c.configuration())
              && Findings.isRequirementOnset(f) && f.speedEasMps() == speed), "finding at " + speed);
          if (!e.getKey().equals("margins-structural-")) {
            // the excess is zero at a refined onset, so the achieved margin equals the required one there
            assertEquals(expected.get(i).requiredValue(), y[i], 0.0);
          }
          marked++;
        }
      }
    }
    assertTrue(marked >= 4, "the demo has structural, gain and phase margin onsets: " + marked);
  }

  @Test
  void closedLoopMarkersAreTheClosedLoopCrossingsAndTheFindings() {
    for (ConfigurationResult c : demo.configurations()) {
      Map<String, XYSeries> vg = series(CLOSED.get(c.configuration()), "cl-vg-", c);
      for (CrossingKind k : CrossingKind.values()) {
        double[] expected = c.servo().closedLoop().crossings().stream().filter(x -> x.kind() == k)
            .mapToDouble(x -> x.condition().speedEasMps()).sorted().toArray();
        double[] fromFindings = findings.stream().filter(f -> f.configuration().equals(c.configuration())
            && f.what().equals("closed-loop " + FlutterCharts.markerSeries(k)))
            .mapToDouble(Finding::speedEasMps).sorted().toArray();
        assertArrayEquals(expected, fromFindings, 0.0, "findings and crossings agree, " + k);
        XYSeries s = vg.get(ClosedLoopCharts.markerSeries(k));
        if (expected.length == 0) {
          assertNull(s);
          continue;
        }
        double[] x = s.getXData().clone();
        Arrays.sort(x);
        assertArrayEquals(expected, x, 0.0, k.toString());
        for (double y : s.getYData()) {
          double limit = demo.analysisCase().options().dampingLimitG();
          assertTrue(y == 0.0 || y == -limit, "markers on g = 0 or the limit line: " + y);
        }
      }
      XYSeries onsetsOnLocus = series(CLOSED.get(c.configuration()), "root-locus-", c)
          .get(ClosedLoopCharts.markerSeries(CrossingKind.FLUTTER_ONSET));
      List<FlutterCrossing> onsets = c.servo().closedLoop().crossings().stream()
          .filter(x -> x.kind() == CrossingKind.FLUTTER_ONSET).toList();
      assertEquals(onsets.size(), onsetsOnLocus.getXData().length);
      for (int i = 0; i < onsets.size(); i++) {
        assertEquals(0.0, onsetsOnLocus.getXData()[i], 0.0, "an onset root lies on the imaginary axis");
        // the locus is drawn in Hz like every other chart
        assertEquals(onsets.get(i).frequencyHz(), onsetsOnLocus.getYData()[i], 1e-12);
      }
    }
  }

  /**
   * Walks a step line: every horizontal segment must carry the table's value of the regime of its
   * midpoint; the segment ends must be the regime edges V0max, V_L and factor x V_L or the ends of
   * the sweep; nothing is drawn beyond factor x V_L.
   */
  private static int checkSteps(XYSeries s, java.util.function.ToDoubleFunction<SpeedRegime> expected,
      double lastEdge) {
    return checkSteps(s.getXData(), s.getYData(), expected, lastEdge);
  }

  private static int checkSteps(double[] x, double[] y, java.util.function.ToDoubleFunction<SpeedRegime> expected,
      double lastEdge) {
    double[] range = FlutterCharts.easRange(demo);
    Set<Double> edges = Set.of(range[0], range[1], req.maxOperatingSpeedEasMps(), req.limitSpeedEasMps(),
        req.extendedSpeedEasMps());
    int segments = 0;
    for (int i = 0; i + 1 < x.length; i++) {
      if (Double.isNaN(y[i]) || Double.isNaN(y[i + 1]) || x[i + 1] == x[i]) {
        continue;
      }
      assertEquals(y[i], y[i + 1], 0.0, "horizontal segments only");
      SpeedRegime r = RequirementLookup.regime(req, 0.5 * (x[i] + x[i + 1]));
      assertEquals(expected.applyAsDouble(r), y[i], 0.0, "value of regime " + r);
      assertTrue(edges.contains(x[i]) && edges.contains(x[i + 1]), "segment ends on regime edges");
      assertTrue(x[i + 1] <= lastEdge, "nothing beyond " + lastEdge);
      segments++;
    }
    return segments;
  }

  @Test
  void requirementLinesCarryTheTablesValues() {
    ConfigurationResult c = demo.configurations().get(0);
    Map<String, XYSeries> gain = series(MARGINS.get(c.configuration()), "margins-gain-", c);
    Map<String, XYSeries> phase = series(MARGINS.get(c.configuration()), "margins-phase-", c);
    for (FrequencyBand b : FrequencyBand.values()) {
      XYSeries g = gain.get(MarginCharts.requiredGainSeries(b));
      if (g == null) {
        continue;
      }
      // +GM first, then -GM after a gap: the sign tells which half a segment belongs to
      int n = checkSteps(positive(g.getXData(), g.getYData(), true), positiveY(g.getYData(), true),
          r -> req.cell(b, r).gainMarginDb(), req.extendedSpeedEasMps());
      n += checkSteps(positive(g.getXData(), g.getYData(), false), positiveY(g.getYData(), false),
          r -> -req.cell(b, r).gainMarginDb(), req.extendedSpeedEasMps());
      // the sweep (35 to 170 m/s) covers all three regimes, two halves each; a zero requirement
      // (1.15 V_L column) is counted in both halves
      assertTrue(n >= 5, b + ": segments " + n);
    }
    XYSeries pm = phase.get(MarginCharts.requiredPhaseSeries(FrequencyBand.RIGID_BODY));
    assertEquals(3, checkSteps(pm, r -> req.cell(FrequencyBand.RIGID_BODY, r).phaseMarginDeg(),
        req.extendedSpeedEasMps()));
    XYSeries limit = series(MARGINS.get(c.configuration()), "margins-structural-", c).get(MarginCharts.PEAK_LIMIT_SERIES);
    // the structural peak rule applies in the normal envelope and up to V_L only
    assertEquals(2, checkSteps(limit, r -> req.structuralPeakLimitDb(), req.limitSpeedEasMps()));
    // the recalled preset (requirements format doc, from memory): rigid-body band 6 dB / 45 deg in the
    // normal envelope; the demo overrides only V0max and V_L
    MarginCell normal = req.cell(FrequencyBand.RIGID_BODY, SpeedRegime.NORMAL_ENVELOPE);
    assertTrue(Arrays.stream(gain.get(MarginCharts.requiredGainSeries(FrequencyBand.RIGID_BODY)).getYData())
        .anyMatch(v -> v == normal.gainMarginDb()));
    assertEquals(-6.0, req.structuralPeakLimitDb(), 0.0, "common practice default");
  }

  private static double[] positive(double[] x, double[] y, boolean up) {
    List<Double> out = new ArrayList<>();
    boolean first = true;
    for (int i = 0; i < x.length; i++) {
      if (Double.isNaN(y[i])) {
        first = false;
        continue;
      }
      if (first == up) {
        out.add(x[i]);
      }
    }
    return out.stream().mapToDouble(Double::doubleValue).toArray();
  }

  private static double[] positiveY(double[] y, boolean up) {
    List<Double> out = new ArrayList<>();
    boolean first = true;
    for (double v : y) {
      if (Double.isNaN(v)) {
        first = false;
        continue;
      }
      if (first == up) {
        out.add(v);
      }
    }
    return out.stream().mapToDouble(Double::doubleValue).toArray();
  }

  @Test
  void nicholsExclusionRegionCornersAreTheRequiredMargins() {
    // one region per frequency band, each with the corners of its own band's cell (the band of the
    // part of the curve it judges), centred on a critical point -180 + k 360 deg
    String[] words = {"rigid-body band", "aeroelastic band"};
    FrequencyBand[] bands = {FrequencyBand.RIGID_BODY, FrequencyBand.AEROELASTIC};
    for (ConfigurationResult c : demo.configurations()) {
      Map<String, XYSeries> m = series(RESPONSE.get(c.configuration()), "nichols-", c);
      for (int b = 0; b < 2; b++) {
        MarginCell cell = req.cell(bands[b], SpeedRegime.NORMAL_ENVELOPE);
        XYSeries d = m.get(LoopResponseCharts.exclusionSeries(cell.gainMarginDb(), cell.phaseMarginDeg()) + ", "
            + words[b]);
        assertNotNull(d, "exclusion region series of the " + words[b]);
        double centre = d.getXData()[1];
        assertEquals(0.0, Math.IEEEremainder(centre + 180, 360), 1e-9, "centred on a critical point");
        // corners: (c - PM, 0), (c, +GM), (c + PM, 0), (c, -GM), closed back to the first
        assertArrayEquals(new double[] {centre - cell.phaseMarginDeg(), centre, centre + cell.phaseMarginDeg(), centre,
            centre - cell.phaseMarginDeg()}, d.getXData(), 0.0);
        assertArrayEquals(new double[] {0, cell.gainMarginDb(), 0, -cell.gainMarginDb(), 0}, d.getYData(), 0.0);
      }
      assertNotNull(m.get(LoopResponseCharts.CRITICAL_POINT_SERIES));
    }
    // without a table the common-practice 6 dB and 45 deg
    assertArrayEquals(new double[] {6.0, 45.0}, LoopResponseCharts.exclusionHalfSizes(SharedResults.lpw().result()),
        0.0);
  }

  @Test
  void notchCurveIsTheClosedFormNotch() {
    ConfigurationResult c = demo.configurations().get(0);
    NotchFilterSpec n = (NotchFilterSpec) demo.analysisCase().loop().paths().get(0).filters().get(0);
    XYSeries s = series(RESPONSE.get(c.configuration()), "notches-", c).get(
        LoopResponseCharts.notchSeries(n, 0, "pitch_rate"));
    double[] f = s.getXData();
    double[] db = s.getYData();
    double min = Double.POSITIVE_INFINITY;
    for (int i = 0; i < f.length; i++) {
      // closed form of the second-order notch (NotchFilterSpec Javadoc, common practice):
      // |N|^2 = (u^2 + zeta_z^2) / (u^2 + zeta_p^2), u = (w_n^2 - w^2) / (2 w_n w)
      double wn = 2 * Math.PI * n.centreHz();
      double w = 2 * Math.PI * f[i];
      double u = (wn * wn - w * w) / (2 * wn * w);
      double zz = n.numeratorDampingRatio();
      double zp = n.denominatorDampingRatio();
      double expected = 10 * Math.log10((u * u + zz * zz) / (u * u + zp * zp));
      // double rounding of two different but exact expressions: 1e-9 dB is far above it
      assertEquals(expected, db[i], 1e-9, "at " + f[i] + " Hz");
      min = Math.min(min, db[i]);
    }
    // depth at the centre 20 log10(zeta_z / zeta_p) = -20 dB for 0.05/0.5; the log grid of 1200 points
    // over 0.5 to 2 x 36 Hz has a step of 0.42 %, where the notch has risen by less than 0.5 dB
    assertEquals(n.depthDb(), min, 0.5);
  }

  @Test
  void loopWithoutNotchesKeepsEverythingElse() {
    LoopSpec loop = demo.analysisCase().loop();
    LoopSpec bare = LoopResponseCharts.withoutNotches(loop);
    for (int p = 0; p < loop.paths().size(); p++) {
      List<FilterSpec> kept = loop.paths().get(p).filters().stream()
          .filter(f -> !(f instanceof NotchFilterSpec)).toList();
      assertEquals(kept, bare.paths().get(p).filters());
      assertEquals(loop.paths().get(p).proportionalGain(), bare.paths().get(p).proportionalGain(), 0.0);
      assertEquals(loop.paths().get(p).schedule(), bare.paths().get(p).schedule());
    }
    assertEquals(loop.actuator(), bare.actuator());
    assertFalse(LoopResponseCharts.hasNotches(bare));
    // far below the 8.6 Hz notch (0.01 Hz: |N - 1| ~ 2 zeta_p f/f_c ~ 1e-3) the two responses agree
    ConfigurationResult c = demo.configurations().get(0);
    List<LoopResponseCharts.Response> rs = LoopResponseCharts.responses(demo, c);
    LoopResponseCharts.Response with = rs.get(0);
    LoopResponseCharts.Response without = rs.get(1);
    assertTrue(with.notches() && !without.notches());
    assertEquals(with.gainDb()[0], without.gainDb()[0], 0.05);
  }

  @Test
  void bodeAndNicholsPhaseIsContinuous() {
    // a pure delay e^{-s tau} turns the phase by -360 f tau deg (closed form): sampled so that each
    // step turns it by less than 180 deg, the unwrapped phase must follow the straight line exactly,
    // with no 360 deg jump anywhere, where a wrapped phase would jump at every -180 deg
    double tau = 0.05;
    double[] f = new double[400];
    for (int i = 0; i < f.length; i++) {
      f[i] = 0.1 + 0.1 * i;
    }
    LoopResponseCharts.Response r = LoopResponseCharts.sample(new LoopResponseCharts.ChosenSpeed("test", 50), true,
        (w, out) -> {
          out[0] = Math.cos(-w * tau);
          out[1] = Math.sin(-w * tau);
        }, f);
    for (int i = 0; i < f.length; i++) {
      assertEquals(-360 * f[i] * tau, r.phaseDeg()[i], 1e-9, "continuous phase at " + f[i] + " Hz");
    }
    // the charts draw that phase as it is: the demo's Bode phase and Nichols series have no jump
    // larger than a step of the frequency grid can turn (here: no gap and no 360 deg jump)
    ConfigurationResult c = demo.configurations().get(0);
    for (ReportChart rc : LoopResponseCharts.of(demo, c, SpeedAxisUnit.METRES_PER_SECOND)) {
      boolean bode = rc.fileStem().startsWith("bode-phase-");
      boolean nichols = rc.fileStem().startsWith("nichols-");
      if (!bode && !nichols) {
        continue;
      }
      for (XYSeries s : rc.chart().getSeriesMap().values()) {
        if (!s.getName().contains("notches")) {
          continue;
        }
        double[] p = bode ? s.getYData() : s.getXData();
        for (int i = 1; i < p.length; i++) {
          assertFalse(Double.isNaN(p[i]), "no gap in " + s.getName());
          assertTrue(Math.abs(p[i] - p[i - 1]) < 180, s.getName() + " jumps by " + (p[i] - p[i - 1]));
        }
      }
    }
  }

  @Test
  void knotsAxisShowsTheSameOnsets() {
    ConfigurationResult c = demo.configurations().get(0);
    List<ReportChart> kt = MarginCharts.of(demo, c, SpeedAxisUnit.KNOTS);
    XYChart chart = kt.stream().filter(r -> r.fileStem().startsWith("margins-structural-")).findFirst()
        .orElseThrow().chart();
    XYSeries s = chart.getSeriesMap().get(MarginCharts.ONSET_SERIES);
    List<MarginOnset> onsets = c.clearance().marginOnsets().stream()
        .filter(m -> m.key().kind() == CheckKind.STRUCTURAL_MODE).toList();
    for (int i = 0; i < onsets.size(); i++) {
      // 1 kt = 1852/3600 m/s exactly (international knot)
      assertEquals(onsets.get(i).condition().speedEasMps() * 3600.0 / 1852.0, s.getXData()[i], 1e-9);
    }
    assertTrue(chart.getXAxisTitle().contains("kt"));
  }
}
