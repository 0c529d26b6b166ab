package org.flexmargin.flutter;

import java.util.List;
import org.flexmargin.model.FlutterMethodKind;

/**
 * Result of an open-loop flutter analysis by one method.
 *
 * @param method method used
 * @param branches one curve per tracked root, in mode order
 * @param crossings every refined damping crossing, ordered by speed along the path
 * @param diagnostics numerical diagnostics
 * @param warnings numerical trouble in words (tracking ambiguities, data used outside its range)
 */
public record FlutterSolution(
    FlutterMethodKind method,
    List<BranchCurve> branches,
    List<FlutterCrossing> crossings,
    SolverDiagnostics diagnostics,
    List<String> warnings) {
  /** Copies the lists. */
  public FlutterSolution {
    branches = List.copyOf(branches);
    crossings = List.copyOf(crossings);
    warnings = List.copyOf(warnings);
  }

  /** @return the lowest-speed flutter onset (EAS), or empty */
  public java.util.Optional<FlutterCrossing> firstOnset() {
    return crossings.stream()
        .filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET)
        .min(java.util.Comparator.comparingDouble(c -> c.condition().speedEasMps()));
  }
}
