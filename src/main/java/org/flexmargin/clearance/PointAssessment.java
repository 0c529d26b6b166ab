package org.flexmargin.clearance;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.model.SpeedRegime;

/**
 * The requirements checked on one broken loop at one airspeed.
 *
 * @param speedEasMps equivalent airspeed, m/s
 * @param regime speed regime of that airspeed
 * @param firstAeroelasticFrequencyHz band edge used (lowest elastic mode frequency), Hz
 * @param closedLoopStability nominal closed-loop stability as known to the assessment
 * @param checks every check, in the order: gain margins (ascending frequency), phase margins
 *     (ascending frequency), structural modes (input order), closed-loop stability; empty in
 *     the regime {@link SpeedRegime#BEYOND}
 * @param structuralModes detail of each structural mode assessed (empty beyond V_L)
 */
public record PointAssessment(double speedEasMps, SpeedRegime regime,
    double firstAeroelasticFrequencyHz, ClosedLoopStability closedLoopStability,
    List<ClearanceCheck> checks, List<StructuralModeAssessment> structuralModes) {

  /** Copies the lists. */
  public PointAssessment {
    checks = List.copyOf(checks);
    structuralModes = List.copyOf(structuralModes);
  }

  /** @return whether every check passes (true when there is none) */
  public boolean passed() {
    return checks.stream().allMatch(ClearanceCheck::passed);
  }

  /** @return the failing checks */
  public List<ClearanceCheck> failures() {
    return checks.stream().filter(c -> !c.passed()).toList();
  }

  /** @return the check with the smallest normalised excess, if any */
  public Optional<ClearanceCheck> governing() {
    return checks.stream().min(ClearanceCheck.TIGHTEST_FIRST);
  }

  /** @return the smallest normalised excess (negative if any check fails), if any check */
  public OptionalDouble worstNormalisedExcess() {
    return checks.stream().mapToDouble(ClearanceCheck::normalisedExcess).min();
  }

  /** @return the keys of the checks present, in check order */
  public Set<CheckKey> keys() {
    Set<CheckKey> out = new LinkedHashSet<>();
    for (ClearanceCheck c : checks) {
      out.add(c.key());
    }
    return out;
  }

  /**
   * The scalar a root-finder follows along airspeed for one requirement: the smallest excess (in
   * the check's unit) over the checks with this key, e.g. the worst gain-increase margin in the
   * rigid-body band.
   *
   * @param key kind and subject
   * @return the smallest excess, empty if no check has that key at this speed
   */
  public OptionalDouble worstExcess(CheckKey key) {
    return checks.stream().filter(c -> c.key().equals(key)).mapToDouble(ClearanceCheck::excess)
        .min();
  }
}
