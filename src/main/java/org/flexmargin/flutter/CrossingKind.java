package org.flexmargin.flutter;

/**
 * What a refined damping crossing means. Damping here is g = 2 Re(s) / Im(s) in the V-g sign
 * convention (negative = stable, g ~ -2 zeta for a lightly damped root).
 *
 * <p>Example: a root whose g rises through 0 at 131.2 m/s EAS is a {@code FLUTTER_ONSET}; if it
 * falls back through 0 at 150.0 m/s (a hump mode) that is a {@code FLUTTER_RECOVERY}. With a
 * damping limit of 0.03, the same root rising through g = -0.03 at 120.4 m/s is a
 * {@code DAMPING_BELOW_LIMIT}.
 */
public enum CrossingKind {
  /** g rises through zero: the root becomes unstable. */
  FLUTTER_ONSET,
  /** g falls through zero: an unstable (hump) root becomes stable again. */
  FLUTTER_RECOVERY,
  /** g rises through minus the damping limit: the damping falls below the required minimum. */
  DAMPING_BELOW_LIMIT,
  /** g falls through minus the damping limit: the damping is back above the required minimum. */
  DAMPING_ABOVE_LIMIT;

  /**
   * @param levelG the g level crossed: 0, or minus the damping limit
   * @param rising whether g rises through the level with speed
   * @return the kind of that crossing
   */
  public static CrossingKind of(double levelG, boolean rising) {
    if (levelG == 0) {
      return rising ? FLUTTER_ONSET : FLUTTER_RECOVERY;
    }
    return rising ? DAMPING_BELOW_LIMIT : DAMPING_ABOVE_LIMIT;
  }

  /** @return true for the two zero-damping kinds */
  public boolean isStabilityChange() {
    return this == FLUTTER_ONSET || this == FLUTTER_RECOVERY;
  }
}
