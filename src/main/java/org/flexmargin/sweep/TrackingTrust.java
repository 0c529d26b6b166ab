package org.flexmargin.sweep;

import java.util.OptionalDouble;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.FlutterSolution;

/**
 * How far an open-loop solution can be trusted: up to the last grid point before the first point
 * where mode tracking was in doubt (see
 * {@link org.flexmargin.flutter.SolverDiagnostics#firstTroublePathParameter()}), after any re-solve
 * with finer steps. Onsets above that speed are reported as unreliable, and no flutter-free speed is
 * claimed beyond it.
 */
final class TrackingTrust {
  private TrackingTrust() {}

  /**
   * @param f an open-loop solution
   * @return the EAS of the last grid point before tracking was first in doubt (m/s); empty when
   *     tracking was clean throughout
   */
  static OptionalDouble trustedUpToEasMps(FlutterSolution f) {
    if (!f.diagnostics().trackingTroubled() || f.branches().isEmpty()) {
      return OptionalDouble.empty();
    }
    BranchCurve b = f.branches().get(0);
    int p = (int) Math.floor(f.diagnostics().firstTroublePathParameter() + 1e-9);
    int last = Math.min(Math.max(p - 1, 0), b.size() - 1);
    return OptionalDouble.of(b.speedEasMps()[last]);
  }

  /**
   * @param f an open-loop solution
   * @param speedEasMps a finding's speed, m/s EAS
   * @return whether a finding at that speed rests on tracking in doubt
   */
  static boolean unreliableAt(FlutterSolution f, double speedEasMps) {
    OptionalDouble t = trustedUpToEasMps(f);
    return t.isPresent() && speedEasMps > t.getAsDouble();
  }
}
