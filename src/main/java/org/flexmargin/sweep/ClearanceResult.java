package org.flexmargin.sweep;

import java.util.List;
import java.util.Optional;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.FlutterClearance;
import org.flexmargin.clearance.PointAssessment;

/**
 * Pass/fail of one configuration against the requirements table.
 *
 * @param points assessment of the loop at every grid point (empty without a loop)
 * @param marginOnsets speeds at which each loop requirement is first violated, refined
 * @param flutter flutter speed margin and minimum damping verdict
 * @param requirementsSource where the requirement values come from (preset caution included)
 */
public record ClearanceResult(
    List<PointAssessment> points, List<MarginOnset> marginOnsets, FlutterClearance flutter,
    String requirementsSource) {
  /** Copies. */
  public ClearanceResult {
    points = List.copyOf(points);
    marginOnsets = List.copyOf(marginOnsets);
  }

  /** @return true when every point and the flutter rule pass */
  public boolean passed() {
    return flutter.passed() && points.stream().allMatch(PointAssessment::passed);
  }

  /** @return the failing check with the worst normalised excess over all points and the flutter rule */
  public Optional<ClearanceCheck> governing() {
    Optional<ClearanceCheck> worst = flutter.governing();
    for (PointAssessment p : points) {
      Optional<ClearanceCheck> g = p.governing();
      if (g.isPresent() && (worst.isEmpty() || g.get().normalisedExcess() < worst.get().normalisedExcess())) {
        worst = g;
      }
    }
    return worst;
  }
}
