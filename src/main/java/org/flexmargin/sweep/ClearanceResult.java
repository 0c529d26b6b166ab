package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.FlutterClearance;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.Severity;

/**
 * Pass/fail of one configuration against the requirements table.
 *
 * @param points assessment of the loop at every grid point (empty without a loop)
 * @param marginOnsets speeds at which each loop requirement is first violated, refined
 * @param flutter flutter speed margin, divergence and minimum damping verdict
 * @param requirementsSource where the requirement values come from (preset caution included)
 * @param ranked one entry per requirement (check kind and subject), sorted by
 *     {@link RankedFinding#ORDER}: failed ones first by severity and lowest speed, then met ones
 *     closest to their limit first; the first is the governing finding ({@link Severity#RULE})
 */
public record ClearanceResult(
    List<PointAssessment> points, List<MarginOnset> marginOnsets, FlutterClearance flutter,
    String requirementsSource, List<RankedFinding> ranked) {
  /** Copies; sorts the ranked requirements. */
  public ClearanceResult {
    points = List.copyOf(points);
    marginOnsets = List.copyOf(marginOnsets);
    List<RankedFinding> sorted = new ArrayList<>(ranked);
    sorted.sort(RankedFinding.ORDER);
    ranked = List.copyOf(sorted);
  }

  /** @return true when every point and the flutter rule pass */
  public boolean passed() {
    return flutter.passed() && points.stream().allMatch(PointAssessment::passed);
  }

  /**
   * @return the governing finding: the most severe failed requirement at its lowest failing speed,
   *     or, when all pass, the requirement closest to its limit
   */
  public Optional<RankedFinding> governingFinding() {
    return ranked.isEmpty() ? Optional.empty() : Optional.of(ranked.get(0));
  }

  /** @return the check of the governing finding ({@link #governingFinding()}) */
  public Optional<ClearanceCheck> governing() {
    return governingFinding().map(RankedFinding::check);
  }

  /** @return the failed requirements, most severe first (see {@link Severity#RULE}) */
  public List<RankedFinding> failures() {
    return ranked.stream().filter(r -> !r.check().passed()).toList();
  }

  /** @return the ranking rule in words, for result files */
  public String rankingRule() {
    return Severity.RULE;
  }
}
