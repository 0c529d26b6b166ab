package org.flexmargin.report;

import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.sweep.ClosedLoopPoint;
import org.flexmargin.sweep.ClosedLoopRoot;
import org.flexmargin.sweep.ConfigurationResult;

/**
 * The lowest speeds at which a configuration is unstable, open and closed loop, as the verdict
 * strip states them.
 */
final class VerdictFacts {
  private VerdictFacts() {}

  /**
   * An instability onset.
   *
   * @param what "open-loop flutter", "closed-loop instability" or "divergence"
   * @param mode branch or root label
   * @param speedEasMps onset EAS, m/s (the first sweep point when already unstable there)
   * @param frequencyHz frequency at the onset, Hz (0 for divergence or a real root)
   * @param atStart unstable already at the first sweep point
   */
  record Onset(String what, String mode, double speedEasMps, double frequencyHz, boolean atStart) {}

  /** @return the lowest open-loop flutter onset (or a branch unstable at the start), or null */
  static Onset openLoop(ConfigurationResult c) {
    Onset best = null;
    for (BranchCurve b : c.flutter().branches()) {
      if (b.size() > 0 && b.converged()[0] && b.dampingG()[0] > 0) {
        best = lower(best, new Onset("open-loop flutter", b.name(), b.speedEasMps()[0], b.frequencyHz()[0], true));
      }
    }
    for (FlutterCrossing x : c.flutter().crossings()) {
      if (x.kind() == CrossingKind.FLUTTER_ONSET) {
        best = lower(best, new Onset("open-loop flutter", x.branchName(), x.condition().speedEasMps(),
            x.frequencyHz(), false));
      }
    }
    return best;
  }

  /** @return the lowest closed-loop onset (or a root unstable at the start), or null */
  static Onset closedLoop(ConfigurationResult c) {
    if (c.servo() == null) {
      return null;
    }
    Onset best = null;
    if (!c.servo().closedLoop().points().isEmpty()) {
      ClosedLoopPoint first = c.servo().closedLoop().points().get(0);
      for (ClosedLoopRoot r : first.roots()) {
        if (r.realPerS() > 0) {
          best = lower(best, new Onset("closed-loop instability", r.label(), first.condition().speedEasMps(),
              r.frequencyHz(), true));
        }
      }
    }
    for (FlutterCrossing x : c.servo().closedLoop().crossings()) {
      if (x.kind() == CrossingKind.FLUTTER_ONSET) {
        best = lower(best, new Onset("closed-loop instability", x.branchName(), x.condition().speedEasMps(),
            x.frequencyHz(), false));
      }
    }
    return best;
  }

  /** @return the lowest of open-loop flutter, closed-loop instability and divergence, or null */
  static Onset lowest(ConfigurationResult c) {
    Onset best = lower(openLoop(c), closedLoop(c));
    if (c.divergence().found()) {
      best = lower(best, new Onset("divergence", "-", c.divergence().speedEasMps(), 0, false));
    }
    return best;
  }

  private static Onset lower(Onset a, Onset b) {
    if (a == null) {
      return b;
    }
    return b == null || a.speedEasMps() <= b.speedEasMps() ? a : b;
  }
}
