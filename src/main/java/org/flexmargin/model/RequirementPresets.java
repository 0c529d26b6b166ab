package org.flexmargin.model;

import java.util.List;

/**
 * Requirement tables recalled from published specifications, offered for convenience and meant to
 * be overridden. The edition and criteria that apply to a programme are set by its contract, its
 * certification basis and licensed engineering judgement.
 */
public final class RequirementPresets {
  private RequirementPresets() {}

  /** Source text of {@link #recalledMilitaryAndTransport}. */
  public static final String RECALLED_MILITARY_AND_TRANSPORT_SOURCE =
      "Recalled from memory from MIL-F-9490D (flight control system stability margins by mode "
          + "frequency and airspeed), MIL-A-8870C (no flutter up to 1.15 V_L on equivalent "
          + "airspeed, damping g >= 0.03 up to V_L) and 14 CFR/CS 25.629 (envelope enlarged by "
          + "15 % in equivalent airspeed at constant Mach number and constant altitude); to be "
          + "verified against the edition that applies to the programme; every value is "
          + "overridable. Structural peak limit -6 dB, phase-stabilisation margin 60 deg and "
          + "frequency uncertainty +-10 % are common practice.";

  /**
   * The table recalled from MIL-F-9490D (from memory, moderate confidence; the 6 dB / 45 deg
   * headline is published), with the flutter margins of MIL-A-8870C and 14 CFR/CS 25.629:
   *
   * <pre>
   *   band \ regime                 normal envelope   up to V_L      up to 1.15 V_L
   *   f &lt; 0.06 Hz                   4.5 dB, 30 deg    3.0 dB, 20 deg 0 dB, 0 deg
   *   0.06 Hz &lt;= f &lt; 1st aeroel.   6.0 dB, 45 deg    4.5 dB, 30 deg 0 dB, 0 deg
   *   f &gt;= 1st aeroelastic mode    8.0 dB, 60 deg    6.0 dB, 45 deg 0 dB, 0 deg
   * </pre>
   *
   * "0 dB, 0 deg" means stable at nominal gain and phase. The column "below V0min" of the
   * recalled table (6 dB, no phase requirement) is not modelled. Flutter: free of flutter up to
   * 1.15 V_L on EAS, damping g &gt;= 0.03 up to V_L. Structural modes: peak &lt;= -6 dB over
   * f (1 +- 0.10), else phase at least 60 deg from -180 deg where above -6 dB (common practice).
   *
   * @param maxOperatingSpeedEasMps V0max, m/s EAS
   * @param limitSpeedEasMps V_L, m/s EAS (&gt;= V0max)
   * @return the preset, flagged as recalled, with its source text
   */
  public static ClearanceRequirements recalledMilitaryAndTransport(double maxOperatingSpeedEasMps,
      double limitSpeedEasMps) {
    FrequencyBand lo = FrequencyBand.LOW_FREQUENCY;
    FrequencyBand rb = FrequencyBand.RIGID_BODY;
    FrequencyBand ae = FrequencyBand.AEROELASTIC;
    SpeedRegime n = SpeedRegime.NORMAL_ENVELOPE;
    SpeedRegime l = SpeedRegime.UP_TO_LIMIT_SPEED;
    SpeedRegime x = SpeedRegime.UP_TO_115_LIMIT_SPEED;
    List<MarginCell> cells = List.of(
        new MarginCell(lo, n, 4.5, 30), new MarginCell(rb, n, 6.0, 45),
        new MarginCell(ae, n, 8.0, 60),
        new MarginCell(lo, l, 3.0, 20), new MarginCell(rb, l, 4.5, 30),
        new MarginCell(ae, l, 6.0, 45),
        new MarginCell(lo, x, 0, 0), new MarginCell(rb, x, 0, 0), new MarginCell(ae, x, 0, 0));
    return new ClearanceRequirements(maxOperatingSpeedEasMps, limitSpeedEasMps,
        ClearanceRequirements.DEFAULT_EXTENDED_SPEED_FACTOR, cells,
        ClearanceRequirements.DEFAULT_STRUCTURAL_PEAK_LIMIT_DB,
        ClearanceRequirements.DEFAULT_PHASE_STABILISATION_MARGIN_DEG,
        ClearanceRequirements.DEFAULT_FREQUENCY_UNCERTAINTY,
        ClearanceRequirements.DEFAULT_FLUTTER_SPEED_FACTOR,
        ClearanceRequirements.DEFAULT_MINIMUM_DAMPING_G,
        RECALLED_MILITARY_AND_TRANSPORT_SOURCE, true);
  }
}
