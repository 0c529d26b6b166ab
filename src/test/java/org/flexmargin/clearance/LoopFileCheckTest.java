package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MeasuredTable;
import org.flexmargin.model.OpenLoopData;
import org.flexmargin.model.RequirementPresets;
import org.junit.jupiter.api.Test;

/**
 * The check of a loop given on its own, on K/(s(s+1)(s+2)) whose margins are known in closed
 * form (Ogata, Modern Control Engineering, the K/(s(s+1)(s+2)) example: phase crossover at
 * w = sqrt 2 rad/s, GM = 20 log10(6/K)), given as a transfer function or as a table sampled here
 * from the same closed form.
 */
class LoopFileCheckTest {
  /** Invented: V0max 120 m/s, V_L 150 m/s EAS; the recalled preset (MIL-F-9490D, from memory). */
  private static final ClearanceRequirements PRESET =
      RequirementPresets.recalledMilitaryAndTransport(120, 150);
  /** Phase crossover of K/(s(s+1)(s+2)), Hz: w = sqrt 2 rad/s (closed form above). */
  private static final double F_PC_HZ = Math.sqrt(2) / (2 * Math.PI);

  private static OpenLoopData thirdOrder(double k) {
    return new OpenLoopData.TransferFunction(new Coefficients(new double[] {k},
        new double[] {1, 3, 2, 0}));
  }

  private static LoopFile file(OpenLoopData loop, double delayS, double samplePeriodS, double loHz,
      double hiHz, List<LoopFile.Mode> modes, double bandEdgeHz, ClearanceRequirements req) {
    return new LoopFile("pitch", "", loop, delayS, samplePeriodS, loHz, hiHz, modes, bandEdgeHz, 100, req,
        null, null);
  }

  private static LoopFile model(double k, double loHz, double hiHz, ClearanceRequirements req) {
    return file(thirdOrder(k), 0, 0, loHz, hiHz, List.of(), 3.0, req);
  }

  /** The closed form sampled every 0.5 % in frequency from loHz to hiHz (last row exactly hiHz). */
  private static MeasuredTable table(double k, double loHz, double hiHz) {
    int n = (int) Math.ceil(Math.log(hiHz / loHz) / Math.log(1.005)) + 1;
    double[] f = new double[n];
    double[] g = new double[n];
    double[] p = new double[n];
    for (int i = 0; i < n; i++) {
      f[i] = i == n - 1 ? hiHz : loHz * Math.pow(1.005, i);
      double w = 2 * Math.PI * f[i];
      g[i] = 20 * Math.log10(k / (w * Math.sqrt(w * w + 1) * Math.sqrt(w * w + 4)));
      p[i] = -90 - Math.toDegrees(Math.atan(w) + Math.atan(w / 2));
    }
    return new MeasuredTable("closed form", f, g, p);
  }

  private static void rejects(String field, org.junit.jupiter.api.function.Executable e) {
    assertEquals(field, assertThrows(InvalidInputException.class, e).fieldPath());
  }

  @Test
  void modelWithoutRequirementsGivesMarginsOverItsRangeAndNoVerdict() {
    // range 0.2..0.3 Hz (1.257..1.885 rad/s) holds the phase crossover at sqrt 2 rad/s but not
    // the gain crossover (|L| = 0.42 at 1.257 rad/s for K = 2, derived by hand)
    LoopFileCheck.Result r = LoopFileCheck.analyse(model(2, 0.2, 0.3, null));
    assertEquals("model", r.label());
    assertEquals(0.2, r.minFrequencyHz(), 0.0);
    assertEquals(0.3, r.maxFrequencyHz(), 0.0);
    // the range handed to the margins is 2 pi f exactly (one multiplication, round-off only)
    assertEquals(2 * Math.PI * 0.2, r.margins().omegaMinRadPerS(), 1e-15);
    assertEquals(2 * Math.PI * 0.3, r.margins().omegaMaxRadPerS(), 1e-15);
    PhaseCrossover pc = r.margins().phaseCrossovers().get(0);
    assertEquals(1, r.margins().phaseCrossovers().size());
    // margins are solved to ~1e-13 in ln w (loop package): 1e-9 covers the propagated error
    assertEquals(F_PC_HZ, pc.frequencyHz(), 1e-9);
    assertEquals(20 * Math.log10(3), pc.gainMarginDb(), 1e-7);
    assertTrue(r.margins().gainCrossovers().isEmpty());
    assertNull(r.assessment());
    assertTrue(r.passed(), "no table, no verdict");
    assertTrue(r.structuralModes().isEmpty());
    assertEquals(1, r.notes().size(), r.notes().toString());
    assertTrue(r.notes().get(0).startsWith("No requirements table"), r.notes().toString());
    assertNotNull(r.loop());
  }

  @Test
  void delayOrHoldAddsThePadeNote() {
    for (double[] dt : new double[][] {{0.01, 0}, {0, 0.01}, {0.01, 0.02}}) {
      LoopFileCheck.Result r = LoopFileCheck.analyse(file(thirdOrder(1), dt[0], dt[1], 0.01, 10, List.of(), 3.0,
          null));
      assertEquals(2, r.notes().size(), r.notes().toString());
      assertTrue(r.notes().get(0).contains("order-" + LoopFileCheck.PADE_ORDER + " Pade"), r.notes().toString());
    }
  }

  @Test
  void requirementsGiveAVerdictWithTheClosedLoopStability() {
    // K = 2: PM 32.6 deg < 45 deg (PointAssessorTest): fails. K = 1: GM 15.6 dB, PM 53.4 deg:
    // passes (closed forms there). Normal envelope at 100 m/s, rigid-body band (edge 3 Hz).
    LoopFileCheck.Result fails = LoopFileCheck.analyse(model(2, 0.01, 10, PRESET));
    assertNotNull(fails.assessment());
    assertFalse(fails.passed());
    assertEquals(100.0, fails.assessment().speedEasMps(), 0.0);
    assertEquals(3.0, fails.assessment().firstAeroelasticFrequencyHz(), 0.0);
    assertTrue(fails.assessment().checks().stream().anyMatch(c -> c.kind() == CheckKind.CLOSED_LOOP_STABILITY));
    assertTrue(fails.notes().isEmpty(), fails.notes().toString());
    LoopFileCheck.Result passes = LoopFileCheck.analyse(model(1, 0.01, 10, PRESET));
    assertTrue(passes.passed());
    assertTrue(passes.assessment().passed());
  }

  @Test
  void structuralModesUseTheTableOrTheCommonPracticeLimits() {
    List<LoopFile.Mode> modes = List.of(new LoopFile.Mode("fin bending", 5.0));
    LoopFileCheck.Result none = LoopFileCheck.analyse(file(thirdOrder(1), 0, 0, 0.01, 10, modes, Double.NaN,
        null));
    StructuralModeAssessment d = none.structuralModes().get(0);
    // common practice -6 dB, 60 deg, +-10 % (docs/validation.md 10.2)
    assertEquals(-6.0, d.peakLimitDb(), 0.0);
    assertEquals(60.0, d.phaseMarginDeg(), 0.0);
    assertEquals(4.5, d.bandLowHz(), 1e-12);
    // |L| falls monotonically over the band: the peak is its low edge (closed form)
    double w = 2 * Math.PI * 4.5;
    assertEquals(-20 * Math.log10(w * Math.sqrt(w * w + 1) * Math.sqrt(w * w + 4)), d.peakDb(), 1e-9);
    // an invented table with other structural limits: -8 dB, 45 deg, +-5 %
    ClearanceRequirements own = new ClearanceRequirements(120, 150, 1.15, PRESET.margins(), -8, 45, 0.05, 1.15,
        0.03, "invented", false);
    LoopFileCheck.Result r = LoopFileCheck.analyse(file(thirdOrder(1), 0, 0, 0.01, 10, modes, Double.NaN, own));
    StructuralModeAssessment a = r.structuralModes().get(0);
    assertEquals(-8.0, a.peakLimitDb(), 0.0);
    assertEquals(45.0, a.phaseMarginDeg(), 0.0);
    assertEquals(4.75, a.bandLowHz(), 1e-12);
    assertEquals(5.25, a.bandHighHz(), 1e-12);
    assertEquals(1, r.assessment().structuralModes().size());
    // the band edge is taken from the lowest mode when not given: 5 Hz
    assertEquals(5.0, r.assessment().firstAeroelasticFrequencyHz(), 0.0);
  }

  @Test
  void aModeBandMustLieInsideTheRange() {
    double u = ClearanceRequirements.DEFAULT_FREQUENCY_UNCERTAINTY;
    double f = 5.0;
    double lo = f * (1 - u);
    double hi = f * (1 + u);
    List<LoopFile.Mode> modes = List.of(new LoopFile.Mode("fin bending", f));
    LoopFileCheck.Result edge = LoopFileCheck.analyse(file(thirdOrder(1), 0, 0, lo, hi, modes, Double.NaN, null));
    assertEquals(lo, edge.structuralModes().get(0).bandLowHz(), 0.0);
    rejects("structural_modes[0].frequency_hz", () -> LoopFileCheck.analyse(file(thirdOrder(1), 0, 0,
        Math.nextUp(lo), hi, modes, Double.NaN, null)));
    rejects("structural_modes[0].frequency_hz", () -> LoopFileCheck.analyse(file(thirdOrder(1), 0, 0, lo,
        Math.nextDown(hi), modes, Double.NaN, null)));
  }

  @Test
  void measuredResponseIsAnalysedWhereItsTableHasData() {
    // table 0.2..0.3 Hz inside the file's 0.01..10 Hz: the analysis covers the table only
    MeasuredTable t = table(2, 0.2, 0.3);
    LoopFile f = file(new OpenLoopData.Measured(t), 0, 0, 0.01, 10, List.of(), 3.0, PRESET);
    LoopFileCheck.Result r = LoopFileCheck.analyse(f);
    assertEquals("measured", r.label());
    assertEquals(0.2, r.minFrequencyHz(), 0.0);
    assertEquals(0.3, r.maxFrequencyHz(), 0.0);
    assertEquals(2 * Math.PI * 0.2, r.margins().omegaMinRadPerS(), 1e-15);
    assertEquals(2 * Math.PI * 0.3, r.margins().omegaMaxRadPerS(), 1e-15);
    // rows every 0.5 % in f: linear interpolation in ln f errs by h^2/8 max|y''| with h = 0.005,
    // about 3e-6 of the curvature (a few dB or deg per unit ln f squared here): 1e-3 is generous
    PhaseCrossover pc = r.margins().phaseCrossovers().get(0);
    assertEquals(F_PC_HZ, pc.frequencyHz(), 1e-3 * F_PC_HZ);
    assertEquals(20 * Math.log10(3), pc.gainMarginDb(), 1e-3);
    // stability is not known from a response: no stability check, and a note says so
    assertTrue(r.assessment().checks().stream().noneMatch(c -> c.kind() == CheckKind.CLOSED_LOOP_STABILITY));
    assertEquals(2, r.notes().size(), r.notes().toString());
    assertTrue(r.notes().get(0).contains("from 0.2000 to 0.3000 Hz"), r.notes().get(0));
    // the same table beside a model file: the file's range is kept where the table is wider
    LoopFileCheck.Result beside = LoopFileCheck.analyseMeasured(model(2, 0.22, 0.25, null), table(2, 0.2, 0.3));
    assertEquals("measured", beside.label());
    assertEquals(0.22, beside.minFrequencyHz(), 0.0);
    assertEquals(0.25, beside.maxFrequencyHz(), 0.0);
    assertEquals(3, beside.notes().size(), beside.notes().toString());
    assertTrue(beside.passed());
  }

  @Test
  void aTableOutsideTheRangeIsRefused() {
    // table 0.05..1 Hz against a file range 1..10 Hz: they meet in one point only
    rejects("measured_response.frequency_hz",
        () -> LoopFileCheck.analyseMeasured(model(2, 1, 10, null), table(2, 0.05, 1)));
    rejects("measured_response.frequency_hz",
        () -> LoopFileCheck.analyseMeasured(model(2, 2, 10, null), table(2, 0.05, 1)));
  }
}
