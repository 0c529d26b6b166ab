package org.flexmargin.clearance;

import java.util.Locale;

/**
 * How serious a failed requirement is, most serious first. The ranking rule (documented in
 * {@code docs/verdict.md} and written into results.json beside the governing finding): a failed
 * requirement's severity ranks first, its airspeed second (lowest first).
 *
 * <p>Worked example: with V_L = 115 m/s EAS, a closed loop unstable from 62 m/s, a structural
 * peak of -2 dB against -6 dB from 36 m/s and a highest g of +0.02 against the required -0.03 up
 * to V_L: the governing finding is the closed-loop instability at 62 m/s, although the structural
 * failure starts at a lower speed and the damping check is further from its limit.
 */
public enum Severity {
  /** Closed loop unstable at or below V_L, i.e. inside the flight envelope. */
  CLOSED_LOOP_INSTABILITY,
  /**
   * Open-loop flutter or divergence below its required margin speed (flutter speed factor x
   * V_L), or closed-loop instability between V_L and that speed.
   */
  AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED,
  /** A structural mode neither gain- nor phase-stabilised over its frequency band. */
  STRUCTURAL_COUPLING,
  /** A loop gain or phase margin below its requirement. */
  LOOP_MARGIN,
  /** A damping limit (least damping up to V_L) not met. */
  DAMPING_LIMIT;

  /** The ranking rule in one sentence, as written into result files. */
  public static final String RULE = "Failed requirements are ranked by severity first and by lowest "
      + "airspeed second: (1) closed-loop instability inside the envelope (at or below V_L), "
      + "(2) open-loop flutter or divergence below its required margin speed (flutter speed factor x "
      + "V_L; closed-loop instability between V_L and that speed), (3) failed structural-coupling "
      + "stabilisation, (4) loop margins below requirement, (5) damping limits. The first is the "
      + "governing finding. When every requirement is met, the governing check is the one closest to "
      + "its limit (smallest normalised excess).";

  /** @return 1 for the most serious, 5 for the least */
  public int rank() {
    return ordinal() + 1;
  }

  /** @return the lower_snake_case name used in result files */
  public String key() {
    return name().toLowerCase(Locale.ROOT);
  }

  /** @return plain words, e.g. "closed-loop instability inside the envelope" */
  public String words() {
    return switch (this) {
      case CLOSED_LOOP_INSTABILITY -> "closed-loop instability inside the envelope";
      case AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED -> "flutter or divergence below the required margin speed";
      case STRUCTURAL_COUPLING -> "structural-coupling stabilisation not met";
      case LOOP_MARGIN -> "loop margin below requirement";
      case DAMPING_LIMIT -> "damping limit not met";
    };
  }
}
