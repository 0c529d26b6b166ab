package org.flexmargin.notch;

import java.util.List;
import org.flexmargin.model.LoopSpec;

/**
 * Everything a notch design produced.
 *
 * @param caseName the case
 * @param spec the settings used
 * @param notchPaths paths carrying the notches
 * @param feasible true only if the optimiser's samples and the independent re-run both meet every
 *     requirement
 * @param notches the designed set
 * @param peaks worst structural peak per mode before (case's own filters) and after, over all
 *     samples (configurations, points, shifts)
 * @param phaseCost worst phase loss over all samples, then per configuration
 * @param originalPhaseCost phase lag of the case's own notches (those of the first carrying path
 *     that has any; zero when they are kept) at the rigid-body crossovers, worst over all samples,
 *     for comparison
 * @param diagnostics optimiser statistics
 * @param violations requirements still missed (empty when feasible)
 * @param reasons why no feasible set was found (empty when feasible)
 * @param margins rigid-body margins before/after at a few speeds per configuration (nominal
 *     frequencies), recomputed independently
 * @param checkedPeaks structural peaks with the designed notches at those speeds, recomputed
 *     independently
 * @param designedLoop the case's loop with the designed notches in the carrying paths
 */
public record NotchDesignResult(String caseName, NotchDesignSpec spec, List<Integer> notchPaths, boolean feasible,
    List<DesignedNotch> notches, List<ModePeakChange> peaks, List<PhaseCost> phaseCost, PhaseCost originalPhaseCost,
    OptimiserDiagnostics diagnostics, List<ConstraintViolation> violations, List<String> reasons,
    List<MarginComparison> margins, List<CheckedPeak> checkedPeaks, LoopSpec designedLoop) {
  /** Copies. */
  public NotchDesignResult {
    notchPaths = List.copyOf(notchPaths);
    notches = List.copyOf(notches);
    peaks = List.copyOf(peaks);
    phaseCost = List.copyOf(phaseCost);
    violations = List.copyOf(violations);
    reasons = List.copyOf(reasons);
    margins = List.copyOf(margins);
    checkedPeaks = List.copyOf(checkedPeaks);
  }
}
