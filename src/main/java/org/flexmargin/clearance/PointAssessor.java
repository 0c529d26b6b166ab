package org.flexmargin.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.MarginDirection;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.Checks;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.SpeedRegime;

/**
 * Checks the margins of one broken loop at one airspeed against a {@link ClearanceRequirements}
 * table.
 *
 * <p>Checks produced, when the speed is within factor x V_L (none beyond):
 *
 * <ul>
 *   <li>every phase crossover: gain margin against the required dB of its band and regime. A
 *       gain-increase margin (positive dB) must be at least +GM; a gain-reduction margin
 *       (negative dB, the loop may lose gain before reaching -1) must be at most -GM. Both
 *       directions are required ("+-" in the table).
 *   <li>every gain crossover: |phase margin| (the smaller of the phase lead or lag that puts the
 *       crossover on -1) at least the required deg.
 *   <li>each structural mode, in the normal envelope and up to V_L only (the 1.15 V_L column asks
 *       for nominal stability, not for a margin): gain-stabilised, phase-stabilised or failed, see
 *       {@link StructuralPeakSearch}. The check reports the peak against the limit (dB) when
 *       gain-stabilised, otherwise the least phase distance against the phase-stabilisation margin
 *       (deg). Its normalised excess is max((limit - peak)/max(|limit|, 1 dB), (distance -
 *       margin)/max(margin, 5 deg)): positive exactly when the mode passes either way, and
 *       continuous where the peak crosses the limit, so it can be followed by a root-finder.
 *   <li>nominal closed-loop stability when known (+1 stable, -1 unstable, against 0).
 * </ul>
 *
 * <p>The classical margins bound the tolerated gain and phase only when the nominal closed loop
 * is stable; an unstable loop fails its stability check whatever its margins.
 */
public final class PointAssessor {
  private PointAssessor() {}

  /**
   * Assesses one point, taking the closed-loop stability from the margin result.
   *
   * @param requirements the table
   * @param speedEasMps equivalent airspeed, m/s
   * @param firstAeroelasticFrequencyHz lowest elastic mode frequency at this speed, Hz (&gt; 0)
   * @param margins margins of the broken loop at this speed
   * @param modes structural modes and their current frequencies (may be empty)
   * @param loop the broken-loop response L(j w) at this speed (may be null if {@code modes} is
   *     empty)
   * @return the assessment
   */
  public static PointAssessment assess(ClearanceRequirements requirements, double speedEasMps,
      double firstAeroelasticFrequencyHz, LoopMarginResult margins, List<ModeFrequency> modes,
      SisoFrequencyFunction loop) {
    return assess(requirements, speedEasMps, firstAeroelasticFrequencyHz, margins,
        margins == null ? null : margins.closedLoopStability(), modes, loop);
  }

  /**
   * Assesses one point with the closed-loop stability supplied by the caller (e.g. from the
   * closed-loop eigenvalues when the margins were computed from a frequency function).
   *
   * @param requirements the table
   * @param speedEasMps equivalent airspeed, m/s
   * @param firstAeroelasticFrequencyHz lowest elastic mode frequency at this speed, Hz (&gt; 0)
   * @param margins margins of the broken loop at this speed
   * @param stability nominal closed-loop stability ({@link ClosedLoopStability#NOT_CHECKED}: no
   *     stability check)
   * @param modes structural modes and their current frequencies (may be empty)
   * @param loop the broken-loop response L(j w) (may be null if {@code modes} is empty)
   * @return the assessment
   */
  public static PointAssessment assess(ClearanceRequirements requirements, double speedEasMps,
      double firstAeroelasticFrequencyHz, LoopMarginResult margins, ClosedLoopStability stability,
      List<ModeFrequency> modes, SisoFrequencyFunction loop) {
    if (requirements == null || margins == null || stability == null || modes == null) {
      throw new InvalidInputException("assessment",
          "requirements, margins, a stability and a mode list", "nothing");
    }
    checkModeInputs(firstAeroelasticFrequencyHz, modes, loop);
    SpeedRegime regime = RequirementLookup.regime(requirements, speedEasMps);
    List<ClearanceCheck> checks = new ArrayList<>();
    List<StructuralModeAssessment> structural = new ArrayList<>();
    if (regime == SpeedRegime.BEYOND) {
      return new PointAssessment(speedEasMps, regime, firstAeroelasticFrequencyHz, stability,
          checks, structural);
    }
    String where = ", " + regime.key().replace('_', ' ');
    for (PhaseCrossover pc : margins.phaseCrossovers()) {
      FrequencyBand band = RequirementLookup.band(pc.frequencyHz(), firstAeroelasticFrequencyHz);
      MarginCell cell = requirements.cell(band, regime);
      boolean increase = pc.direction() == MarginDirection.GAIN_INCREASE;
      String text = String.format(Locale.ROOT, "gain margin (gain %s) at %.4g Hz, %s band%s",
          increase ? "increase" : "reduction", pc.frequencyHz(), bandWords(band), where);
      checks.add(ClearanceCheck.of(
          increase ? CheckKind.GAIN_INCREASE_MARGIN : CheckKind.GAIN_REDUCTION_MARGIN,
          band.key(), text, increase ? cell.gainMarginDb() : -cell.gainMarginDb(),
          pc.gainMarginDb(), CheckUnit.DECIBEL,
          increase ? RequiredSense.AT_LEAST : RequiredSense.AT_MOST, pc.frequencyHz()));
    }
    for (GainCrossover gc : margins.gainCrossovers()) {
      FrequencyBand band = RequirementLookup.band(gc.frequencyHz(), firstAeroelasticFrequencyHz);
      MarginCell cell = requirements.cell(band, regime);
      String text = String.format(Locale.ROOT,
          "phase margin (either direction) at %.4g Hz, %s band%s", gc.frequencyHz(),
          bandWords(band), where);
      checks.add(ClearanceCheck.of(CheckKind.PHASE_MARGIN, band.key(), text,
          cell.phaseMarginDeg(), Math.abs(gc.phaseMarginDeg()), CheckUnit.DEGREE,
          RequiredSense.AT_LEAST, gc.frequencyHz()));
    }
    addStructural(requirements, regime, where, modes, loop, checks, structural);
    if (stability != ClosedLoopStability.NOT_CHECKED) {
      checks.add(ClearanceCheck.of(CheckKind.CLOSED_LOOP_STABILITY, "",
          "nominal closed-loop stability" + where, 0,
          stability == ClosedLoopStability.STABLE ? 1 : -1, CheckUnit.STABILITY,
          RequiredSense.AT_LEAST, Double.NaN));
    }
    return new PointAssessment(speedEasMps, regime, firstAeroelasticFrequencyHz, stability,
        checks, structural);
  }

  /** The first aeroelastic frequency must be positive, and structural modes need the loop. */
  private static void checkModeInputs(double firstAeroelasticFrequencyHz, List<ModeFrequency> modes,
      SisoFrequencyFunction loop) {
    Checks.positive("first_aeroelastic_frequency_hz", firstAeroelasticFrequencyHz);
    if (!modes.isEmpty() && loop == null) {
      throw new InvalidInputException("loop", "the loop response to assess structural modes",
          "nothing");
    }
  }

  /**
   * Assesses the structural modes of one point only (no margin or stability checks): the same
   * structural checks as {@link #assess}, for a caller that follows one mode's check alone.
   *
   * @param requirements the table
   * @param speedEasMps equivalent airspeed, m/s
   * @param firstAeroelasticFrequencyHz lowest elastic mode frequency at this speed, Hz (&gt; 0)
   * @param modes structural modes and their current frequencies (may be empty)
   * @param loop the broken-loop response L(j w) (may be null if {@code modes} is empty)
   * @return the assessment, with {@link ClosedLoopStability#NOT_CHECKED}
   */
  public static PointAssessment assessStructuralModes(ClearanceRequirements requirements,
      double speedEasMps, double firstAeroelasticFrequencyHz, List<ModeFrequency> modes,
      SisoFrequencyFunction loop) {
    if (requirements == null || modes == null) {
      throw new InvalidInputException("assessment", "requirements and a mode list", "nothing");
    }
    checkModeInputs(firstAeroelasticFrequencyHz, modes, loop);
    SpeedRegime regime = RequirementLookup.regime(requirements, speedEasMps);
    List<ClearanceCheck> checks = new ArrayList<>();
    List<StructuralModeAssessment> structural = new ArrayList<>();
    if (regime != SpeedRegime.BEYOND) {
      addStructural(requirements, regime, ", " + regime.key().replace('_', ' '), modes, loop,
          checks, structural);
    }
    return new PointAssessment(speedEasMps, regime, firstAeroelasticFrequencyHz,
        ClosedLoopStability.NOT_CHECKED, checks, structural);
  }

  /** Adds each mode's structural check, in the normal envelope only. */
  private static void addStructural(ClearanceRequirements requirements, SpeedRegime regime,
      String where, List<ModeFrequency> modes, SisoFrequencyFunction loop,
      List<ClearanceCheck> checks, List<StructuralModeAssessment> structural) {
    if (regime == SpeedRegime.UP_TO_115_LIMIT_SPEED) {
      return;
    }
    for (ModeFrequency m : modes) {
      StructuralModeAssessment a = StructuralPeakSearch.assess(m, loop,
          requirements.structuralPeakLimitDb(), requirements.phaseStabilisationMarginDeg(),
          requirements.frequencyUncertainty());
      structural.add(a);
      checks.add(structuralCheck(a, requirements.frequencyUncertainty(), where));
    }
  }

  /**
   * The check of one structural mode (see the class description for its excess).
   *
   * @param a the mode's assessment
   * @param frequencyUncertainty relative half-width of the band, for the description
   * @param where regime words appended to the description
   * @return the check
   */
  static ClearanceCheck structuralCheck(StructuralModeAssessment a, double frequencyUncertainty,
      String where) {
    double gainTerm = (a.peakLimitDb() - a.peakDb()) / Math.max(Math.abs(a.peakLimitDb()),
        CheckUnit.DECIBEL.leastScale());
    double phaseTerm = (a.phaseDistanceDeg() - a.phaseMarginDeg())
        / Math.max(a.phaseMarginDeg(), CheckUnit.DEGREE.leastScale());
    double normalised = Math.max(gainTerm, phaseTerm);
    String mode = String.format(Locale.ROOT, "structural mode \"%s\" at %.4g Hz +- %.3g %%",
        a.modeName(), a.modeFrequencyHz(), 100 * frequencyUncertainty);
    if (a.status() == StructuralStabilisation.GAIN_STABILISED) {
      return new ClearanceCheck(CheckKind.STRUCTURAL_MODE, a.modeName(),
          mode + ": gain stabilisation (peak loop gain)" + where, a.peakLimitDb(), a.peakDb(),
          CheckUnit.DECIBEL, RequiredSense.AT_MOST, a.peakFrequencyHz(), normalised);
    }
    return new ClearanceCheck(CheckKind.STRUCTURAL_MODE, a.modeName(),
        mode + ": phase stabilisation (phase distance from -180 deg where the loop gain is above "
            + a.peakLimitDb() + " dB; peak " + String.format(Locale.ROOT, "%.2f", a.peakDb())
            + " dB)" + where,
        a.phaseMarginDeg(), a.phaseDistanceDeg(), CheckUnit.DEGREE, RequiredSense.AT_LEAST,
        a.phaseDistanceFrequencyHz(), normalised);
  }

  private static String bandWords(FrequencyBand band) {
    return switch (band) {
      case LOW_FREQUENCY -> "low-frequency";
      case RIGID_BODY -> "rigid-body";
      case AEROELASTIC -> "aeroelastic";
    };
  }
}
