package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.SpeedRegime;
import org.junit.jupiter.api.Test;

/** Settings of a notch design: validation at each bound, copies, regime lookup, path resolution. */
class NotchDesignSpecTest {

  private static NotchDesignSpec spec(List<Integer> paths, int maxNotches, double limit, double u, double pm,
      double gm, double rigid, ExistingNotches ex, int stride, double maxEas, double margin, double band) {
    return new NotchDesignSpec(paths, maxNotches, limit, u, pm, gm, rigid, ex, stride, maxEas, margin, band, null);
  }

  private static NotchDesignSpec valid() {
    return spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, ExistingNotches.REPLACE, 1, 100, 0.5, 0.1);
  }

  private static void rejects(String field, Runnable r) {
    InvalidInputException e = assertThrows(InvalidInputException.class, r::run);
    assertEquals(field, e.fieldPath());
  }

  private static final ExistingNotches R = ExistingNotches.REPLACE;

  @Test
  void everyBoundIsInclusiveOrExclusiveAsDocumented() {
    // accepted at the closed ends of every documented interval
    spec(List.of(0, 2), 1, 0, 0, 0, 0, 1, R, 1, 1e-3, 0, 0.6);
    spec(null, 6, -59.999, 0.499, 89.99, 39.99, 1e-6, ExistingNotches.KEEP, 7, 1, 5.99, 1e-6);
    // rejected just outside each one
    rejects("notch_paths[1]", () -> spec(List.of(0, -1), 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("max_notches", () -> spec(List.of(), 0, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("max_notches", () -> spec(List.of(), 7, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("peak_limit_db", () -> spec(List.of(), 3, 1e-9, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("peak_limit_db", () -> spec(List.of(), 3, -60, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("peak_limit_db", () -> spec(List.of(), 3, Double.NaN, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("frequency_uncertainty", () -> spec(List.of(), 3, -6, -1e-9, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("frequency_uncertainty", () -> spec(List.of(), 3, -6, 0.5, 45, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("required_phase_margin_deg", () -> spec(List.of(), 3, -6, 0.1, -1e-9, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("required_phase_margin_deg", () -> spec(List.of(), 3, -6, 0.1, 90, 6, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("required_gain_margin_db", () -> spec(List.of(), 3, -6, 0.1, 45, -1e-9, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("required_gain_margin_db", () -> spec(List.of(), 3, -6, 0.1, 45, 40, 0.5, R, 1, 100, 0.5, 0.1));
    rejects("rigid_band_fraction", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0, R, 1, 100, 0.5, 0.1));
    rejects("rigid_band_fraction", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 1.000001, R, 1, 100, 0.5, 0.1));
    rejects("existing_notches", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, null, 1, 100, 0.5, 0.1));
    rejects("point_stride", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, R, 0, 100, 0.5, 0.1));
    rejects("max_speed_eas_mps", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, R, 1, 0, 0.5, 0.1));
    rejects("design_margin_db", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, -1e-9, 0.1));
    rejects("design_margin_db", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, 6, 0.1));
    rejects("mode_band_fraction", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0));
    rejects("mode_band_fraction", () -> spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.600001));
  }

  @Test
  void pathListIsCopiedAndNullMeansDefault() {
    List<Integer> paths = new ArrayList<>(List.of(1));
    NotchDesignSpec s = spec(paths, 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1);
    paths.add(2);
    assertEquals(List.of(1), s.notchPaths());
    assertEquals(List.of(), spec(null, 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1).notchPaths());
  }

  @Test
  void defaultsAreTheDocumentedCommonPracticeValues() {
    NotchDesignSpec d = NotchDesignSpec.defaults();
    assertEquals(List.of(), d.notchPaths());
    assertEquals(3, d.maxNotches());
    assertEquals(-6.0, d.peakLimitDb());
    assertEquals(0.10, d.frequencyUncertainty());
    assertEquals(45.0, d.requiredPhaseMarginDeg());
    assertEquals(6.0, d.requiredGainMarginDb());
    assertEquals(0.5, d.rigidBandFraction());
    assertEquals(ExistingNotches.REPLACE, d.existingNotches());
    assertEquals(1, d.pointStride());
    assertEquals(Double.POSITIVE_INFINITY, d.maxSpeedEasMps());
    assertEquals(0.5, d.designMarginDb());
    assertEquals(0.1, d.modeBandFraction());
    assertNull(d.marginTable());
    assertSame(null, NotchDesignSpec.forRequirements(null).marginTable());
    assertEquals(d, NotchDesignSpec.forRequirements(null));
  }

  @Test
  void eachWitherChangesItsFieldOnly() {
    NotchDesignSpec v = valid();
    assertEquals(spec(List.of(2), 3, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1), v.withNotchPaths(List.of(2)));
    assertEquals(spec(List.of(), 5, -6, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1), v.withMaxNotches(5));
    assertEquals(spec(List.of(), 3, -9, 0.1, 45, 6, 0.5, R, 1, 100, 0.5, 0.1), v.withPeakLimitDb(-9));
    assertEquals(spec(List.of(), 3, -6, 0.2, 45, 6, 0.5, R, 1, 100, 0.5, 0.1), v.withFrequencyUncertainty(0.2));
    assertEquals(spec(List.of(), 3, -6, 0.1, 30, 4.5, 0.5, R, 1, 100, 0.5, 0.1), v.withRequiredMargins(30, 4.5));
    assertEquals(spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, ExistingNotches.KEEP, 1, 100, 0.5, 0.1),
        v.withExistingNotches(ExistingNotches.KEEP));
    assertEquals(spec(List.of(), 3, -6, 0.1, 45, 6, 0.5, R, 4, 70, 0.5, 0.1), v.withPoints(4, 70));
    ClearanceRequirements t = table();
    NotchDesignSpec w = v.withMarginTable(t);
    assertSame(t, w.marginTable());
    assertEquals(v, new NotchDesignSpec(w.notchPaths(), w.maxNotches(), w.peakLimitDb(), w.frequencyUncertainty(),
        w.requiredPhaseMarginDeg(), w.requiredGainMarginDb(), w.rigidBandFraction(), w.existingNotches(),
        w.pointStride(), w.maxSpeedEasMps(), w.designMarginDb(), w.modeBandFraction(), null));
    // the table carries through the other withers
    assertSame(t, w.withNotchPaths(List.of(1)).marginTable());
    assertSame(t, w.withMaxNotches(2).marginTable());
    assertSame(t, w.withPeakLimitDb(-8).marginTable());
    assertSame(t, w.withFrequencyUncertainty(0).marginTable());
    assertSame(t, w.withRequiredMargins(40, 5).marginTable());
    assertSame(t, w.withExistingNotches(ExistingNotches.KEEP).marginTable());
    assertSame(t, w.withPoints(2, 50).marginTable());
  }

  @Test
  void shiftFactorsAreOneMinusUOneAndOnePlusU() {
    assertArrayEquals(new double[] {0.9, 1.0, 1.1}, valid().shiftFactors(), 1e-15);
    assertArrayEquals(new double[] {0.75, 1.0, 1.25}, valid().withFrequencyUncertainty(0.25).shiftFactors(), 0);
    assertArrayEquals(new double[] {1.0}, valid().withFrequencyUncertainty(0).shiftFactors(), 0);
  }

  /**
   * An invented table: V0max 100, V_L 120, extended factor 1.25 (top 150 m/s); rigid-body cells
   * 6 dB / 45 deg, 5 dB / 35 deg, 4 dB / 25 deg, other bands distinct values never used here.
   */
  static ClearanceRequirements table() {
    List<MarginCell> cells = new ArrayList<>();
    double[][] rigid = {{6, 45}, {5, 35}, {4, 25}};
    SpeedRegime[] regimes = {SpeedRegime.NORMAL_ENVELOPE, SpeedRegime.UP_TO_LIMIT_SPEED,
        SpeedRegime.UP_TO_115_LIMIT_SPEED};
    for (int r = 0; r < 3; r++) {
      cells.add(new MarginCell(FrequencyBand.RIGID_BODY, regimes[r], rigid[r][0], rigid[r][1]));
      cells.add(new MarginCell(FrequencyBand.LOW_FREQUENCY, regimes[r], 9, 70));
      cells.add(new MarginCell(FrequencyBand.AEROELASTIC, regimes[r], 8, 60));
    }
    return new ClearanceRequirements(100, 120, 1.25, cells, -7, 60, 0.15, 1.15, 0.03, "invented table", false);
  }

  @Test
  void withATableTheRigidMarginsFollowTheSpeedRegimeAndVanishBeyondIt() {
    NotchDesignSpec s = valid().withRequiredMargins(10, 1).withMarginTable(table());
    // regimes: <= 100 normal, <= 120 up to V_L, <= 150 extended, beyond: none required
    assertEquals(45, s.requiredPhaseMarginDeg(100));
    assertEquals(6, s.requiredGainMarginDb(100));
    assertEquals(35, s.requiredPhaseMarginDeg(100.5));
    assertEquals(5, s.requiredGainMarginDb(120));
    assertEquals(25, s.requiredPhaseMarginDeg(150));
    assertEquals(4, s.requiredGainMarginDb(121));
    assertEquals(0, s.requiredPhaseMarginDeg(150.5));
    assertEquals(0, s.requiredGainMarginDb(151));
    // without a table the fixed values hold at every speed
    NotchDesignSpec f = valid().withRequiredMargins(10, 1);
    assertEquals(10, f.requiredPhaseMarginDeg(500));
    assertEquals(1, f.requiredGainMarginDb(20));
  }

  @Test
  void forRequirementsTakesLimitUncertaintyLimitSpeedAndTable() {
    ClearanceRequirements t = table();
    NotchDesignSpec s = NotchDesignSpec.forRequirements(t);
    assertEquals(-7, s.peakLimitDb());
    assertEquals(0.15, s.frequencyUncertainty());
    assertEquals(120, s.maxSpeedEasMps());
    assertEquals(1, s.pointStride());
    assertSame(t, s.marginTable());
    assertEquals(3, s.maxNotches());
  }

  private static LoopSpec twoPathLoop() {
    List<SensorSpec> sensors = List.of(new SensorSpec("q", SensorKind.PITCH_RATE_GYRO, "s1", 0, 0),
        new SensorSpec("nz", SensorKind.NORMAL_ACCELEROMETER, "s2", 0, 0));
    List<FeedbackPath> paths = List.of(new FeedbackPath("q", 1, 0, List.of(), null),
        new FeedbackPath("nz", 1, 0, List.of(), null));
    return new LoopSpec(new ActuatorSpec(ActuatorOrder.FIRST, 10, 0.7), sensors, paths, 0, 0, 2);
  }

  @Test
  void pathIndexResolvesSensorNamesAndIndicesAndRejectsTheRest() {
    LoopSpec loop = twoPathLoop();
    assertEquals(0, NotchDesignSpec.pathIndex(loop, "q"));
    assertEquals(1, NotchDesignSpec.pathIndex(loop, "nz"));
    assertEquals(1, NotchDesignSpec.pathIndex(loop, " 1 "));
    assertEquals(0, NotchDesignSpec.pathIndex(loop, "0"));
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> NotchDesignSpec.pathIndex(loop, "2"));
    assertEquals("notch_path", e.fieldPath());
    assertEquals(true, e.getMessage().contains("0..1"), e.getMessage());
    assertThrows(InvalidInputException.class, () -> NotchDesignSpec.pathIndex(loop, "-1"));
    assertThrows(InvalidInputException.class, () -> NotchDesignSpec.pathIndex(loop, "alpha"));
  }
}
