package org.flexmargin.notch;

/**
 * Which requirement a sample fails. Example: a 7.5 Hz fuselage mode peaking at -2 dB against a
 * -6 dB limit is a {@code STRUCTURAL_PEAK} violation of 4 dB.
 */
public enum ConstraintKind {
  /** A structural loop-gain peak above the gain-stabilisation limit (dB). */
  STRUCTURAL_PEAK,
  /** A rigid-body phase margin below the requirement (deg). */
  RIGID_PHASE_MARGIN,
  /** A rigid-body gain-increase margin below the requirement (dB). */
  RIGID_GAIN_INCREASE_MARGIN,
  /** A rigid-body gain-reduction margin closer to 0 dB than the requirement (dB). */
  RIGID_GAIN_REDUCTION_MARGIN
}
