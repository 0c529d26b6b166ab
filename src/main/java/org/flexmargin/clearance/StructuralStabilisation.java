package org.flexmargin.clearance;

/**
 * How a structural mode meets (or fails) the structural-coupling rule over its frequency
 * uncertainty band (references 1.2: gain stabilisation, else phase stabilisation; common
 * practice).
 */
public enum StructuralStabilisation {
  /** The loop-gain peak over the band is at or below the limit (e.g. -6 dB). */
  GAIN_STABILISED,
  /**
   * The peak exceeds the limit, but wherever |L| is at or above the limit in the band the phase
   * stays at least the phase-stabilisation margin away from -180 deg (mod 360).
   */
  PHASE_STABILISED,
  /** Neither. */
  FAILED
}
