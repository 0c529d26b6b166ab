package org.flexmargin.model;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The clearance requirements an analysis is judged against: loop stability margins by frequency
 * band and speed regime, the structural-mode gain and phase stabilisation rules, and the flutter
 * speed and damping margins. All speeds are equivalent airspeeds (EAS).
 *
 * <p>The table holds exactly one {@link MarginCell} for every {@link FrequencyBand} and every
 * {@link SpeedRegime} except {@link SpeedRegime#BEYOND}, nine cells in all.
 *
 * <p>Requirement presets ({@link RequirementPresets}) are recalled from published
 * specifications for convenience; the edition and criteria that apply to a programme are set by
 * its contract, its certification basis and licensed engineering judgement.
 *
 * @param maxOperatingSpeedEasMps V0max, top of the normal envelope, m/s EAS (&gt; 0)
 * @param limitSpeedEasMps V_L, limit speed, m/s EAS (&gt;= V0max)
 * @param extendedSpeedFactor top of the third margin regime as a multiple of V_L (in [1, 2];
 *     1.15 in the recalled preset)
 * @param margins the nine margin cells, in any order
 * @param structuralPeakLimitDb gain-stabilisation limit on the broken-loop peak near each
 *     structural mode, dB (in [-60, 0]; -6 dB common practice)
 * @param phaseStabilisationMarginDeg least distance of the loop phase from -180 deg (mod 360)
 *     wherever the loop gain exceeds the peak limit near a mode, deg (in (0, 180); 60 deg common
 *     practice)
 * @param frequencyUncertainty relative uncertainty u of modal frequencies; the structural peak is
 *     sought over f (1 +- u) (dimensionless, in [0, 0.5]; 0.10 common practice)
 * @param flutterSpeedFactor required flutter-free speed as a multiple of V_L on EAS (in [1, 2];
 *     1.15 recalled from MIL-A-8870C and 14 CFR/CS 25.629)
 * @param minimumDampingG minimum total damping of every mode up to V_L, as a structural damping
 *     coefficient g &gt;= 0 (g ~ 2 zeta); in the V-g sign convention a root must satisfy
 *     g &lt;= -minimumDampingG (in [0, 1]; 0.03 recalled from MIL-A-8870C)
 * @param source where the numbers come from, in words (non-blank)
 * @param recalledPreset whether the table started from a preset recalled from published
 *     specifications (rather than being given in full by the user)
 */
public record ClearanceRequirements(
    double maxOperatingSpeedEasMps,
    double limitSpeedEasMps,
    double extendedSpeedFactor,
    List<MarginCell> margins,
    double structuralPeakLimitDb,
    double phaseStabilisationMarginDeg,
    double frequencyUncertainty,
    double flutterSpeedFactor,
    double minimumDampingG,
    String source,
    boolean recalledPreset) {

  /** Default extended speed factor, 1.15 (the 1.15 V_L column of MIL-F-9490D, from memory). */
  public static final double DEFAULT_EXTENDED_SPEED_FACTOR = 1.15;
  /** Default gain-stabilisation limit, -6 dB (common practice, references 1.2). */
  public static final double DEFAULT_STRUCTURAL_PEAK_LIMIT_DB = -6.0;
  /** Default phase-stabilisation margin, 60 deg (common practice, references 1.2). */
  public static final double DEFAULT_PHASE_STABILISATION_MARGIN_DEG = 60.0;
  /** Default modal frequency uncertainty, 0.10 (common practice, references 5). */
  public static final double DEFAULT_FREQUENCY_UNCERTAINTY = 0.10;
  /** Default flutter speed factor on EAS, 1.15 (MIL-A-8870C, 14 CFR/CS 25.629; memory). */
  public static final double DEFAULT_FLUTTER_SPEED_FACTOR = 1.15;
  /** Default minimum damping g, 0.03 (MIL-A-8870C, from memory). */
  public static final double DEFAULT_MINIMUM_DAMPING_G = 0.03;

  /** Validates and copies; every (band, regime) cell exactly once. */
  public ClearanceRequirements {
    Checks.positive("max_operating_speed_eas_mps", maxOperatingSpeedEasMps);
    Checks.positive("limit_speed_eas_mps", limitSpeedEasMps);
    if (limitSpeedEasMps < maxOperatingSpeedEasMps) {
      throw new InvalidInputException("limit_speed_eas_mps",
          "a limit speed >= max_operating_speed_eas_mps = " + maxOperatingSpeedEasMps,
          String.valueOf(limitSpeedEasMps));
    }
    Checks.inRange("extended_speed_factor", extendedSpeedFactor, 1.0, 2.0);
    if (margins == null) {
      throw new InvalidInputException("margins", "the nine margin cells", "nothing");
    }
    Map<FrequencyBand, Map<SpeedRegime, MarginCell>> seen = new EnumMap<>(FrequencyBand.class);
    for (int i = 0; i < margins.size(); i++) {
      MarginCell c = margins.get(i);
      if (c == null) {
        throw new InvalidInputException("margins[" + i + "]", "a margin cell", "nothing");
      }
      MarginCell before = seen.computeIfAbsent(c.band(), b -> new EnumMap<>(SpeedRegime.class))
          .put(c.regime(), c);
      if (before != null) {
        throw new InvalidInputException("margins[" + i + "]",
            "one cell per band and regime", "a second cell for band " + c.band().key()
                + " and regime " + c.regime().key());
      }
    }
    for (FrequencyBand b : FrequencyBand.values()) {
      for (SpeedRegime r : SpeedRegime.values()) {
        if (r != SpeedRegime.BEYOND && !seen.getOrDefault(b, Map.of()).containsKey(r)) {
          throw new InvalidInputException("margins",
              "a cell for every band and regime", "no cell for band " + b.key() + " and regime "
                  + r.key());
        }
      }
    }
    margins = List.copyOf(margins);
    Checks.inRange("structural_peak_limit_db", structuralPeakLimitDb, -60.0, 0.0);
    if (!(phaseStabilisationMarginDeg > 0 && phaseStabilisationMarginDeg < 180)) {
      throw new InvalidInputException("phase_stabilisation_margin_deg", "a value in (0, 180)",
          String.valueOf(phaseStabilisationMarginDeg));
    }
    Checks.inRange("frequency_uncertainty", frequencyUncertainty, 0.0, 0.5);
    Checks.inRange("flutter_speed_factor", flutterSpeedFactor, 1.0, 2.0);
    Checks.positiveDamping("minimum_damping_g", minimumDampingG);
    Checks.name("source", source);
  }

  /**
   * @param band frequency band
   * @param regime speed regime, not {@link SpeedRegime#BEYOND}
   * @return the cell for that band and regime
   */
  public MarginCell cell(FrequencyBand band, SpeedRegime regime) {
    for (MarginCell c : margins) {
      if (c.band() == band && c.regime() == regime) {
        return c;
      }
    }
    throw new InvalidInputException("regime",
        "normal_envelope, up_to_limit_speed or up_to_115_limit_speed",
        regime == null ? "nothing" : regime.key());
  }

  /** @return the top speed of the third regime, extendedSpeedFactor x V_L, m/s EAS */
  public double extendedSpeedEasMps() {
    return extendedSpeedFactor * limitSpeedEasMps;
  }

  /** @return the required flutter-free speed, flutterSpeedFactor x V_L, m/s EAS */
  public double requiredFlutterSpeedEasMps() {
    return flutterSpeedFactor * limitSpeedEasMps;
  }

  /**
   * @param cell a replacement cell
   * @return a copy with that cell replaced (same band and regime)
   */
  public ClearanceRequirements withCell(MarginCell cell) {
    List<MarginCell> out = new ArrayList<>(margins.size());
    for (MarginCell c : margins) {
      out.add(c.band() == cell.band() && c.regime() == cell.regime() ? cell : c);
    }
    return new ClearanceRequirements(maxOperatingSpeedEasMps, limitSpeedEasMps,
        extendedSpeedFactor, out, structuralPeakLimitDb, phaseStabilisationMarginDeg,
        frequencyUncertainty, flutterSpeedFactor, minimumDampingG, source, recalledPreset);
  }

  /**
   * @param newSource the new source text
   * @return a copy with another source text
   */
  public ClearanceRequirements withSource(String newSource) {
    return new ClearanceRequirements(maxOperatingSpeedEasMps, limitSpeedEasMps,
        extendedSpeedFactor, margins, structuralPeakLimitDb, phaseStabilisationMarginDeg,
        frequencyUncertainty, flutterSpeedFactor, minimumDampingG, newSource, recalledPreset);
  }
}
