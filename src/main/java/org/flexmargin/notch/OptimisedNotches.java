package org.flexmargin.notch;

import java.util.List;
import org.flexmargin.loop.NotchFilter;

/**
 * Result of a notch optimisation on loop samples.
 *
 * @param feasible true only if every structural peak meets the limit and every rigid-body margin
 *     that met the requirement before still meets it, at every sample
 * @param notches the notch set (empty if no peak needed one)
 * @param before the loop without designed notches
 * @param after the loop with the notch set
 * @param constrained per sample: whether its rigid-body margins met the requirement before (only
 *     those are held)
 * @param violations requirements still missed with the set (empty when feasible)
 * @param reasons plain-language explanation when not feasible (empty when feasible)
 * @param diagnostics optimiser statistics
 */
public record OptimisedNotches(boolean feasible, List<NotchFilter> notches, SampleEvaluation before,
    SampleEvaluation after, boolean[] constrained, List<ConstraintViolation> violations, List<String> reasons,
    OptimiserDiagnostics diagnostics) {
  /** Copies. */
  public OptimisedNotches {
    notches = List.copyOf(notches);
    constrained = constrained.clone();
    violations = List.copyOf(violations);
    reasons = List.copyOf(reasons);
  }

  @Override
  public boolean[] constrained() {
    return constrained.clone();
  }
}
