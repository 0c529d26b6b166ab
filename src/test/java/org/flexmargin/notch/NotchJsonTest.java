package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.CheckUnit;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.FlutterClearance;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.RequiredSense;
import org.flexmargin.clearance.Severity;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.DiscreteFilter;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.sweep.ClearanceResult;
import org.junit.jupiter.api.Test;

/** Notch design, filter and check files written by hand, read back with Jackson field by field. */
class NotchJsonTest {
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
  private static final String AWKWARD = "say \"hi\"\\ back\nnext\ttab\rret\u0001end";

  private static SampleLabel label(String c, double eas, double shift) {
    return new SampleLabel(c, 7, eas, 3000, shift);
  }

  /** A hand-made design with values exact in six significant digits. */
  private static NotchDesignResult design(int violations) {
    return design(violations, 321, 1234);
  }

  private static NotchDesignResult design(int violations, int evaluations, int storedValues) {
    NotchDesignSpec spec = NotchDesignSpec.defaults().withNotchPaths(List.of(0)).withPoints(2, 70.5);
    SampleLabel a = label("heavy", 52.5, 1.1);
    SampleLabel b = new SampleLabel("constructed", 0, Double.NaN, Double.NaN, 0.9);
    List<ConstraintViolation> v = new ArrayList<>();
    for (int i = 0; i < violations; i++) {
      v.add(new ConstraintViolation(ConstraintKind.RIGID_PHASE_MARGIN, "rigid body", a, 40 + i, 45, 5 - 0.0625 * i,
          0.75));
    }
    List<NotchFilter> n = List.of(new NotchFilter(12.5, 0.05, 0.5));
    LoopSpec designed = PathFilters.withNotches(DEMO.loop(), List.of(0), ExistingNotches.REPLACE, n);
    return new NotchDesignResult(AWKWARD, spec, List.of(0), false, n.stream().map(DesignedNotch::of).toList(),
        List.of(new ModePeakChange("wing", new ModePeak("wing", -2.5, 12.25, a), new ModePeak("wing", -6.75, 12.5,
            b))),
        List.of(new PhaseCost("all", 3.25, 0.75, a), new PhaseCost("empty", 0, Double.NaN, null)),
        new PhaseCost("all", 1.5, 0.5, a),
        new OptimiserDiagnostics("method words", evaluations, 4, 1e-7, 1000, -0.5, violations, 6, storedValues),
        v, List.of("first reason", "second\treason"),
        List.of(new MarginComparison(new RigidMargins("heavy", 7, 52.5, 50.5, 0.75, 12, Double.NEGATIVE_INFINITY, true),
            new RigidMargins("heavy", 7, 52.5, 47.25, 0.8125, 11.5, -8.5, false))),
        List.of(new CheckedPeak("wing", a, -6.5, 12.75)), designed);
  }

  private static void label(JsonNode n, String configuration, double eas, double alt, double shift) {
    assertEquals(configuration, n.get("configuration").asText());
    assertEquals(7, n.get("grid_point").asInt());
    assertEquals(eas, n.get("speed_eas_mps").asDouble());
    assertEquals(alt, n.get("altitude_m").asDouble());
    assertEquals(shift, n.get("frequency_shift_factor").asDouble());
  }

  @Test
  void designFileCarriesEveryFieldOfTheDesign() throws Exception {
    NotchDesignResult r = design(3);
    String text = NotchJson.design(r, List.of("caution one", "caution \"two\""));
    JsonNode j = JSON.readTree(text);
    assertEquals(1, j.get("format").asInt());
    assertEquals("notch_design", j.get("kind").asText());
    assertEquals(AWKWARD, j.get("case").asText());
    assertFalse(j.get("feasible").asBoolean());
    JsonNode s = j.get("settings");
    assertEquals(3, s.get("max_notches").asInt());
    assertEquals(-6, s.get("peak_limit_db").asDouble());
    assertEquals(0.1, s.get("frequency_uncertainty").asDouble());
    assertEquals(45, s.get("required_phase_margin_deg").asDouble());
    assertEquals(6, s.get("required_gain_margin_db").asDouble());
    assertEquals(0.5, s.get("rigid_band_fraction").asDouble());
    assertEquals("replace", s.get("existing_notches").asText());
    assertEquals(2, s.get("point_stride").asInt());
    assertEquals(70.5, s.get("max_speed_eas_mps").asDouble());
    assertEquals(0.5, s.get("design_margin_db").asDouble());
    assertEquals(0.1, s.get("mode_band_fraction").asDouble());
    assertEquals(1, j.get("notch_paths").size());
    assertEquals(0, j.get("notch_paths").get(0).asInt());
    JsonNode n = j.get("notches").get(0);
    assertEquals(12.5, n.get("centre_hz").asDouble());
    assertEquals(0.05, n.get("numerator_damping_ratio").asDouble());
    assertEquals(0.5, n.get("denominator_damping_ratio").asDouble());
    // 20 dB deep; widths 2 f sqrt(zp^2 - 2 zz^2) and 2 f sqrt(zz zp), written to 6 significant digits
    assertEquals(20, n.get("depth_db").asDouble(), 1e-12);
    assertEquals(25 * Math.sqrt(0.245), n.get("width_3db_hz").asDouble(), 5e-6 * 25 * Math.sqrt(0.245));
    assertEquals(25 * Math.sqrt(0.025), n.get("half_depth_width_hz").asDouble(), 5e-6 * 25 * Math.sqrt(0.025));
    JsonNode p = j.get("structural_peaks").get(0);
    assertEquals("wing", p.get("mode").asText());
    assertEquals(-2.5, p.get("before").get("peak_db").asDouble());
    assertEquals(12.25, p.get("before").get("frequency_hz").asDouble());
    label(p.get("before").get("where"), "heavy", 52.5, 3000, 1.1);
    assertEquals(-6.75, p.get("after").get("peak_db").asDouble());
    assertEquals(12.5, p.get("after").get("frequency_hz").asDouble());
    JsonNode bw = p.get("after").get("where");
    assertEquals("constructed", bw.get("configuration").asText());
    assertTrue(bw.get("speed_eas_mps").isNull());
    assertTrue(bw.get("altitude_m").isNull());
    assertEquals(0.9, bw.get("frequency_shift_factor").asDouble());
    JsonNode pc = j.get("phase_cost");
    assertEquals(2, pc.size());
    assertEquals("all", pc.get(0).get("configuration").asText());
    assertEquals(3.25, pc.get(0).get("worst_loss_deg").asDouble());
    assertEquals(0.75, pc.get(0).get("crossover_hz").asDouble());
    label(pc.get(0).get("where"), "heavy", 52.5, 3000, 1.1);
    assertEquals("empty", pc.get(1).get("configuration").asText());
    assertEquals(0, pc.get(1).get("worst_loss_deg").asDouble());
    assertTrue(pc.get(1).get("crossover_hz").isNull());
    assertTrue(pc.get(1).get("where").isNull());
    assertEquals(1.5, j.get("original_notches_phase_loss_deg").asDouble());
    JsonNode o = j.get("optimiser");
    assertEquals("method words", o.get("method").asText());
    assertEquals(321, o.get("evaluations").asInt());
    assertEquals(4, o.get("runs").asInt());
    assertEquals(1e-7, o.get("final_objective").asDouble());
    assertEquals(1000, o.get("penalty_weight").asDouble());
    assertEquals(-0.5, o.get("worst_peak_excess_db").asDouble());
    assertEquals(3, o.get("violations").asInt());
    assertEquals(6, o.get("samples").asInt());
    assertEquals(1234, o.get("stored_values").asInt());
    JsonNode v = j.get("violations");
    assertEquals(3, v.size());
    JsonNode v1 = v.get(1);
    assertEquals("rigid_phase_margin", v1.get("kind").asText());
    assertEquals("rigid body", v1.get("mode").asText());
    assertEquals(41, v1.get("value").asDouble());
    assertEquals(45, v1.get("limit").asDouble());
    assertEquals(4.9375, v1.get("excess").asDouble());
    assertEquals(0.75, v1.get("frequency_hz").asDouble());
    label(v1.get("where"), "heavy", 52.5, 3000, 1.1);
    assertEquals(List.of("first reason", "second\treason"), strings(j.get("reasons")));
    JsonNode m = j.get("independent_margins").get(0);
    assertEquals("heavy", m.get("configuration").asText());
    assertEquals(7, m.get("grid_point").asInt());
    assertEquals(52.5, m.get("speed_eas_mps").asDouble());
    JsonNode mb = m.get("before");
    assertEquals(50.5, mb.get("phase_margin_deg").asDouble());
    assertEquals(0.75, mb.get("crossover_hz").asDouble());
    assertEquals(12, mb.get("gain_increase_margin_db").asDouble());
    assertTrue(mb.get("gain_reduction_margin_db").isNull());
    assertTrue(mb.get("meets_requirement").asBoolean());
    JsonNode ma = m.get("after");
    assertEquals(47.25, ma.get("phase_margin_deg").asDouble());
    assertEquals(0.8125, ma.get("crossover_hz").asDouble());
    assertEquals(11.5, ma.get("gain_increase_margin_db").asDouble());
    assertEquals(-8.5, ma.get("gain_reduction_margin_db").asDouble());
    assertFalse(ma.get("meets_requirement").asBoolean());
    JsonNode cp = j.get("independent_peaks_after").get(0);
    assertEquals("wing", cp.get("mode").asText());
    assertEquals("heavy", cp.get("configuration").asText());
    assertEquals(52.5, cp.get("speed_eas_mps").asDouble());
    assertEquals(-6.5, cp.get("peak_db").asDouble());
    assertEquals(12.75, cp.get("frequency_hz").asDouble());
    assertFalse(j.has("discrete_sections"));
    assertEquals(List.of("caution one", "caution \"two\""), strings(j.get("cautions")));
    // the same as the two-argument form
    assertEquals(text, NotchJson.design(r, null, List.of("caution one", "caution \"two\"")));
  }

  private static List<String> strings(JsonNode a) {
    List<String> out = new ArrayList<>();
    a.forEach(x -> out.add(x.asText()));
    return out;
  }

  @Test
  void atMostFiftyViolationsAreWrittenTheWorstFirst() throws Exception {
    JsonNode v = JSON.readTree(NotchJson.design(design(52), List.of())).get("violations");
    assertEquals(50, v.size());
    assertEquals(40, v.get(0).get("value").asDouble());
    assertEquals(89, v.get(49).get("value").asDouble());
    assertEquals(50, JSON.readTree(NotchJson.design(design(50), List.of())).get("violations").size());
    assertEquals(0, JSON.readTree(NotchJson.design(design(0), List.of())).get("violations").size());
  }

  @Test
  void countsAreWrittenWithEveryDigit() {
    // a count above a million would lose digits if written like a measured value (6 significant digits)
    String text = NotchJson.design(design(0, 12_345_678, 1_234_567), List.of());
    assertTrue(text.contains("\"evaluations\": 12345678,"), text);
    assertTrue(text.contains("\"stored_values\": 1234567\n"), text);
    assertTrue(text.contains("\"format\": 1,"), text);
  }

  @Test
  void numbersAreWrittenToSixSignificantDigitsWithoutTrailingZeros() {
    String text = NotchJson.design(design(0), List.of());
    assertTrue(text.contains("\"final_objective\": 1e-07"), text);
    assertTrue(text.contains("\"penalty_weight\": 1000,"), text);
    assertTrue(text.contains("\"peak_limit_db\": -6,"), text);
    assertTrue(text.contains("\"centre_hz\": 12.5,"), text);
    assertTrue(text.contains("\"speed_eas_mps\": null"), text);
    assertTrue(text.startsWith("{\n  \"format\": 1,\n  \"kind\": \"notch_design\","), text);
    assertTrue(text.endsWith("\n}\n"), text);
  }

  @Test
  void discreteSectionsAndTheirCheckAreWritten() throws Exception {
    NotchDesignResult r = design(0);
    NotchFilter n = new NotchFilter(12.5, 0.05, 0.5);
    DiscreteFilter f = new DiscreteFilter(new double[] {0.9, -1.7, 0.8}, new double[] {1, -1.7, 0.7}, 0.0125);
    DiscreteNotchSet.Section sec = new DiscreteNotchSet.Section(n, f, -19.75, -20);
    ClearanceCheck failing = ClearanceCheck.of(CheckKind.PHASE_MARGIN, "rigid_body", "phase margin at 52.5 m/s",
        45, 40.5, CheckUnit.DEGREE, RequiredSense.AT_LEAST, 0.75);
    ClearanceCheck passing = ClearanceCheck.of(CheckKind.GAIN_INCREASE_MARGIN, "rigid_body", "gain margin",
        6, 9, CheckUnit.DECIBEL, RequiredSense.AT_LEAST, 1.5);
    ClearanceResult cr = new ClearanceResult(List.of(), List.of(), new FlutterClearance(100, 115, List.of(failing)),
        "src", List.of(new RankedFinding(passing, Severity.LOOP_MARGIN, 60),
            new RankedFinding(failing, Severity.LOOP_MARGIN, 52.5)));
    RobustnessCheckResult check = new RobustnessCheckResult("c", r.spec(), false,
        List.of(new RobustnessCheckResult.ConfigurationVerdict("heavy", cr)), "src");
    DiscreteNotchSet d = new DiscreteNotchSet(0.0125, List.of(sec), r.designedLoop(), check, "a note");
    JsonNode j = JSON.readTree(NotchJson.design(r, d, List.of())).get("discrete_sections");
    assertEquals(0.0125, j.get("sample_period_s").asDouble());
    assertTrue(j.get("method").asText().startsWith("bilinear transform pre-warped"));
    JsonNode s = j.get("sections").get(0);
    assertEquals(12.5, s.get("centre_hz").asDouble());
    assertEquals(-19.75, s.get("centre_gain_db").asDouble());
    assertEquals(-20, s.get("continuous_centre_gain_db").asDouble());
    assertEquals(List.of(0.9, -1.7, 0.8), doubles(s.get("numerator")));
    assertEquals(List.of(1.0, -1.7, 0.7), doubles(s.get("denominator")));
    assertFalse(j.get("check_passes").asBoolean());
    assertTrue(j.get("check").asText().contains("same rules as sweep"));
    JsonNode fails = j.get("check_failures");
    assertEquals(1, fails.size());
    JsonNode x = fails.get(0);
    assertEquals("heavy", x.get("configuration").asText());
    assertEquals("phase margin at 52.5 m/s", x.get("description").asText());
    assertEquals(45, x.get("required").asDouble());
    assertEquals(40.5, x.get("achieved").asDouble());
    assertEquals("deg", x.get("unit").asText());
    assertEquals("a note", j.get("note").asText());
    // without a check: no verdict keys
    DiscreteNotchSet unchecked = new DiscreteNotchSet(0.0125, List.of(sec), r.designedLoop(), null, "");
    JsonNode u = JSON.readTree(NotchJson.design(r, unchecked, List.of())).get("discrete_sections");
    assertFalse(u.has("check_passes"));
    assertFalse(u.has("check_failures"));
    assertEquals("", u.get("note").asText());
  }

  private static List<Double> doubles(JsonNode a) {
    List<Double> out = new ArrayList<>();
    a.forEach(x -> out.add(x.asDouble()));
    return out;
  }

  @Test
  void filterFragmentListsEveryFilterOfTheCarryingPathsInCaseFileKeys() throws Exception {
    // coefficients with 17 significant digits must survive exactly
    double third = 1.0 / 3;
    List<FilterSpec> f = List.of(new NotchFilterSpec(12.5, 0.05, 0.5), new LowPassFilterSpec(25, 0.75),
        new FilterSpec.LeadLag(1.5, 6), new FilterSpec.Washout(2.5), new FilterSpec.SecondOrder(3, 0.25, 4, 0.5),
        new FilterSpec.TransferFunction(new Coefficients(new double[] {third, 1}, new double[] {1, 2, 0.125})),
        new FilterSpec.Discrete(new Coefficients(new double[] {0.5, -0.25}, new double[] {1, -Math.PI / 4})));
    LoopSpec l = DEMO.loop();
    LoopSpec loop = new LoopSpec(l.actuator(), l.sensors(),
        List.of(l.paths().get(0), new FeedbackPath("normal_accel", 0.05, 0, f, null)), 0, 0.0125, 2);
    NotchDesignResult base = design(0);
    NotchDesignResult r = new NotchDesignResult("frag", base.spec(), List.of(1), true, base.notches(), base.peaks(),
        base.phaseCost(), base.originalPhaseCost(), base.diagnostics(), base.violations(), base.reasons(),
        base.margins(), base.checkedPeaks(), loop);
    JsonNode j = JSON.readTree(NotchJson.filters(r));
    assertEquals(1, j.get("format").asInt());
    assertEquals("frag", j.get("case").asText());
    assertTrue(j.get("feasible").asBoolean());
    assertEquals(1, j.get("paths").size());
    JsonNode p = j.get("paths").get(0);
    assertEquals(1, p.get("path_index").asInt());
    assertEquals("normal_accel", p.get("sensor").asText());
    JsonNode fs = p.get("filters");
    assertEquals(7, fs.size());
    JsonNode notch = fs.get(0).get("notch");
    assertEquals(12.5, notch.get("centre_hz").asDouble());
    assertEquals(0.05, notch.get("numerator_damping_ratio").asDouble());
    assertEquals(0.5, notch.get("denominator_damping_ratio").asDouble());
    assertEquals(25, fs.get(1).get("low_pass").get("corner_hz").asDouble());
    assertEquals(0.75, fs.get(1).get("low_pass").get("damping_ratio").asDouble());
    assertEquals(1.5, fs.get(2).get("lead_lag").get("zero_hz").asDouble());
    assertEquals(6, fs.get(2).get("lead_lag").get("pole_hz").asDouble());
    assertEquals(2.5, fs.get(3).get("washout").get("time_constant_s").asDouble());
    JsonNode so = fs.get(4).get("second_order");
    assertEquals(3, so.get("numerator_frequency_hz").asDouble());
    assertEquals(0.25, so.get("numerator_damping_ratio").asDouble());
    assertEquals(4, so.get("denominator_frequency_hz").asDouble());
    assertEquals(0.5, so.get("denominator_damping_ratio").asDouble());
    JsonNode tf = fs.get(5).get("transfer_function");
    assertEquals(List.of(third, 1.0), doubles(tf.get("numerator")));
    assertEquals(List.of(1.0, 2.0, 0.125), doubles(tf.get("denominator")));
    JsonNode dz = fs.get(6).get("discrete");
    assertEquals(List.of(0.5, -0.25), doubles(dz.get("numerator")));
    assertEquals(List.of(1.0, -Math.PI / 4), doubles(dz.get("denominator")));
    // the fragment of a design's own loop: the designed notch first, then the kept low-pass
    JsonNode own = JSON.readTree(NotchJson.filters(design(0))).get("paths").get(0);
    assertEquals("pitch_rate", own.get("sensor").asText());
    assertEquals(2, own.get("filters").size());
    assertEquals(12.5, own.get("filters").get(0).get("notch").get("centre_hz").asDouble());
    assertEquals(25, own.get("filters").get(1).get("low_pass").get("corner_hz").asDouble());
  }

  @Test
  void checkFileCarriesEachRequirementOfEachConfiguration() throws Exception {
    ClearanceCheck failing = ClearanceCheck.of(CheckKind.PHASE_MARGIN, "rigid_body", "phase margin",
        45, 40.5, CheckUnit.DEGREE, RequiredSense.AT_LEAST, 0.75);
    ClearanceCheck passing = ClearanceCheck.of(CheckKind.STRUCTURAL_MODE, "wing", "peak of the wing mode",
        -6, -8.5, CheckUnit.DECIBEL, RequiredSense.AT_MOST, 12.5);
    ClearanceResult bad = new ClearanceResult(List.of(), List.of(), new FlutterClearance(100, 115, List.of(failing)),
        "src", List.of(new RankedFinding(failing, Severity.LOOP_MARGIN, 52.5)));
    ClearanceResult good = new ClearanceResult(List.of(), List.of(), new FlutterClearance(100, 115, List.of()),
        "src", List.of(new RankedFinding(passing, Severity.STRUCTURAL_COUPLING, 60)));
    RobustnessCheckResult r = new RobustnessCheckResult(AWKWARD, NotchDesignSpec.defaults(), false,
        List.of(new RobustnessCheckResult.ConfigurationVerdict("heavy", bad),
            new RobustnessCheckResult.ConfigurationVerdict("light", good)), "invented source");
    JsonNode j = JSON.readTree(NotchJson.check(r, List.of("only one")));
    assertEquals(2, j.get("format").asInt());
    assertEquals("filter_check", j.get("kind").asText());
    assertEquals(AWKWARD, j.get("case").asText());
    assertFalse(j.get("passes").asBoolean());
    assertEquals(-6, j.get("settings").get("peak_limit_db").asDouble());
    assertEquals("invented source", j.get("requirements_source").asText());
    assertEquals(Severity.RULE, j.get("ranking_rule").asText());
    JsonNode c0 = j.get("configurations").get(0);
    assertEquals("heavy", c0.get("name").asText());
    assertFalse(c0.get("passed").asBoolean());
    JsonNode q = c0.get("requirements").get(0);
    assertEquals(CheckKind.PHASE_MARGIN.key(), q.get("requirement").asText());
    assertEquals("rigid_body", q.get("subject").asText());
    assertEquals("phase margin", q.get("description").asText());
    assertEquals(45, q.get("required").asDouble());
    assertEquals(40.5, q.get("achieved").asDouble());
    assertEquals("deg", q.get("unit").asText());
    assertEquals("at_least", q.get("sense").asText());
    assertFalse(q.get("passed").asBoolean());
    assertEquals(Severity.LOOP_MARGIN.key(), q.get("severity").asText());
    assertEquals(Severity.LOOP_MARGIN.rank(), q.get("severity_rank").asInt());
    assertEquals(52.5, q.get("speed_eas_mps").asDouble());
    JsonNode c1 = j.get("configurations").get(1);
    assertEquals("light", c1.get("name").asText());
    assertTrue(c1.get("passed").asBoolean());
    JsonNode w = c1.get("requirements").get(0);
    assertEquals("at_most", w.get("sense").asText());
    assertTrue(w.get("passed").asBoolean());
    assertEquals("dB", w.get("unit").asText());
    assertEquals(List.of("only one"), strings(j.get("cautions")));
  }

  @Test
  void quotingEscapesEveryControlCharacter() throws Exception {
    assertEquals("\"a\\\"b\\\\c\\nd\\te\\rf\\u0001g\\u001fh\"", NotchJson.quote("a\"b\\c\nd\te\rf\u0001g\u001fh"));
    assertEquals("\" ~\u00e9\"", NotchJson.quote(" ~\u00e9"));
    assertEquals(AWKWARD, JSON.readTree(NotchJson.quote(AWKWARD)).asText());
  }
}
