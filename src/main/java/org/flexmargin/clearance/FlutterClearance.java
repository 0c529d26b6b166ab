package org.flexmargin.clearance;

import java.util.List;
import java.util.Optional;

/**
 * The flutter clearance verdict: one speed check per onset search and the damping check.
 *
 * @param limitSpeedEasMps V_L, m/s EAS
 * @param requiredFlutterSpeedEasMps flutter speed factor x V_L, m/s EAS
 * @param checks the checks
 */
public record FlutterClearance(double limitSpeedEasMps, double requiredFlutterSpeedEasMps,
    List<ClearanceCheck> checks) {
  /** Copies the list. */
  public FlutterClearance {
    checks = List.copyOf(checks);
  }

  /** @return whether every check passes */
  public boolean passed() {
    return checks.stream().allMatch(ClearanceCheck::passed);
  }

  /** @return the check with the smallest normalised excess, if any */
  public Optional<ClearanceCheck> governing() {
    return checks.stream().min(ClearanceCheck.TIGHTEST_FIRST);
  }
}
