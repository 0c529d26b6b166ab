package org.flexmargin.campaign;

/**
 * The result of one campaign sample. Speeds are equivalent airspeeds (m/s EAS); NaN means not
 * found (below the sweep's end for onsets; not computed for an {@link SampleStatus#ERROR}).
 *
 * @param task task index
 * @param cell matrix cell index
 * @param sample Monte Carlo sample index
 * @param status verdict
 * @param divergenceEasMps static divergence speed (m/s EAS), wherever it lies
 * @param openLoopFlutterEasMps lowest open-loop flutter onset (m/s EAS)
 * @param closedLoopOnsetEasMps lowest closed-loop instability (m/s EAS)
 * @param marginOnsetEasMps lowest speed at which a loop requirement is first lost (m/s EAS)
 * @param criticalEasMps lowest of the instabilities, the margin onset and the lowest speed at which
 *     any requirement fails (a damping requirement, say): the sample's first problem (m/s EAS)
 * @param governing the governing finding (or the error message), in words
 * @param draws the drawn parameter values, in parameter order
 * @param margins margin curve along the sweep (empty without a loop or on error)
 */
public record SampleOutcome(int task, int cell, int sample, SampleStatus status, double divergenceEasMps,
    double openLoopFlutterEasMps, double closedLoopOnsetEasMps, double marginOnsetEasMps, double criticalEasMps,
    String governing, double[] draws, MarginCurve margins) {
  /** Copies. */
  public SampleOutcome {
    governing = governing == null ? "" : governing;
    draws = draws.clone();
    margins = margins == null ? MarginCurve.EMPTY : margins;
  }

  @Override
  public double[] draws() {
    return draws.clone();
  }
}
