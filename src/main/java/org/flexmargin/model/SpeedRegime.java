package org.flexmargin.model;

/**
 * Airspeed regime of a margin requirement, by equivalent airspeed (EAS) V against the top of the
 * normal envelope V0max ({@link ClearanceRequirements#maxOperatingSpeedEasMps()}), the limit
 * speed V_L ({@link ClearanceRequirements#limitSpeedEasMps()}) and the extended speed factor
 * ({@link ClearanceRequirements#extendedSpeedFactor()}, default 1.15). An edge speed belongs to
 * the lower regime.
 *
 * <p>Worked example (invented numbers): V0max = 120 m/s EAS, V_L = 150 m/s EAS, factor 1.15 (so
 * 1.15 V_L = 172.5 m/s). Then 100 m/s and 120 m/s are {@code NORMAL_ENVELOPE}; 120.1 m/s and
 * 150 m/s are {@code UP_TO_LIMIT_SPEED}; 150.1 m/s and 172.5 m/s are
 * {@code UP_TO_115_LIMIT_SPEED}; 172.6 m/s is {@code BEYOND}.
 */
public enum SpeedRegime {
  /** V &lt;= V0max: the normal (operational) envelope, full margins. */
  NORMAL_ENVELOPE,
  /** V0max &lt; V &lt;= V_L: up to the limit speed, reduced margins. */
  UP_TO_LIMIT_SPEED,
  /** V_L &lt; V &lt;= factor x V_L (factor default 1.15): stability only in the recalled preset. */
  UP_TO_115_LIMIT_SPEED,
  /** V &gt; factor x V_L: no margin requirement. */
  BEYOND;

  /** @return the lower_snake_case name used in input and result files */
  public String key() {
    return name().toLowerCase(java.util.Locale.ROOT);
  }
}
