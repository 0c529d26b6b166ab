package org.flexmargin.campaign;

import java.util.List;

/**
 * Statistics of a group of samples (one matrix cell, or the whole campaign).
 *
 * @param label the group in words
 * @param samples samples in the group
 * @param passed samples that passed (cleared)
 * @param failed samples that violated a requirement
 * @param unreliable samples not judged because mode tracking stayed in doubt
 * @param notJudged samples without requirements
 * @param errors samples that could not be computed (counted as not cleared)
 * @param probabilityOfClearance passed / samples
 * @param clearanceInterval 95 % Clopper-Pearson interval of the probability of clearance
 * @param spreads divergence, open-loop flutter, closed-loop onset, margin onset and first problem
 * @param gainMarginBand gain margin bands along the sweep (dB); empty without a loop or when the
 *     group spans several cells
 * @param phaseMarginBand phase margin bands along the sweep (deg)
 */
public record GroupSummary(String label, int samples, int passed, int failed, int unreliable, int notJudged,
    int errors, double probabilityOfClearance, ClopperPearson.Interval clearanceInterval, List<Spread> spreads,
    MarginBand gainMarginBand, MarginBand phaseMarginBand) {
  /** Confidence level of the clearance interval. */
  public static final double CONFIDENCE = 0.95;

  /** Copies. */
  public GroupSummary {
    spreads = List.copyOf(spreads);
  }

  /** @return the summary of {@code outcomes} (bands only when {@code bands}) */
  static GroupSummary of(String label, List<SampleOutcome> outcomes, boolean bands) {
    int[] count = new int[SampleStatus.values().length];
    for (SampleOutcome o : outcomes) {
      count[o.status().ordinal()]++;
    }
    int n = outcomes.size();
    int pass = count[SampleStatus.PASS.ordinal()];
    List<Spread> spreads = List.of(
        Spread.of("divergence", outcomes, SampleOutcome::divergenceEasMps),
        Spread.of("open-loop flutter onset", outcomes, SampleOutcome::openLoopFlutterEasMps),
        Spread.of("closed-loop instability onset", outcomes, SampleOutcome::closedLoopOnsetEasMps),
        Spread.of("loop margin requirement first lost", outcomes, SampleOutcome::marginOnsetEasMps),
        Spread.of("first problem (lowest of the above and of any failed requirement)", outcomes, SampleOutcome::criticalEasMps));
    MarginBand empty = MarginBand.of(List.of(), MarginCurve::gainMarginDb);
    return new GroupSummary(label, n, pass, count[SampleStatus.FAIL.ordinal()],
        count[SampleStatus.UNRELIABLE.ordinal()], count[SampleStatus.NOT_JUDGED.ordinal()],
        count[SampleStatus.ERROR.ordinal()], n == 0 ? Double.NaN : (double) pass / n,
        n == 0 ? new ClopperPearson.Interval(0, 1) : ClopperPearson.interval(pass, n, CONFIDENCE), spreads,
        bands ? MarginBand.of(outcomes, MarginCurve::gainMarginDb) : empty,
        bands ? MarginBand.of(outcomes, MarginCurve::phaseMarginDeg) : empty);
  }
}
