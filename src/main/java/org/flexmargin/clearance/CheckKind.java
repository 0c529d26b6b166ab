package org.flexmargin.clearance;

/** What a {@link ClearanceCheck} checks. */
public enum CheckKind {
  /** Gain margin at a phase crossover where |L| &lt; 1 (positive dB, gain may rise). */
  GAIN_INCREASE_MARGIN,
  /** Gain margin at a phase crossover where |L| &gt; 1 (negative dB, gain may fall). */
  GAIN_REDUCTION_MARGIN,
  /** Phase margin at a gain crossover (either direction). */
  PHASE_MARGIN,
  /** Gain or phase stabilisation of one structural mode. */
  STRUCTURAL_MODE,
  /** Nominal closed-loop stability. */
  CLOSED_LOOP_STABILITY,
  /** Flutter-free speed against the flutter speed factor times V_L. */
  FLUTTER_SPEED,
  /** Divergence speed (rigid body restrained) against the flutter speed factor times V_L. */
  DIVERGENCE_SPEED,
  /** Least damping of any mode up to V_L against the minimum damping. */
  MINIMUM_DAMPING;

  /** @return the lower_snake_case name used in result files */
  public String key() {
    return name().toLowerCase(java.util.Locale.ROOT);
  }
}
