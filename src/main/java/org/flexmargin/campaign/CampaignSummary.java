package org.flexmargin.campaign;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Statistics of a finished campaign: the whole campaign, each matrix cell, and the worst samples.
 *
 * @param overall all samples
 * @param cells one summary per matrix cell, in cell order (with margin bands)
 * @param worst the worst computed samples, first problem lowest first (ties by task), at most
 *     the campaign's {@code worst_samples}
 * @param errors the samples that could not be computed, in task order
 */
public record CampaignSummary(GroupSummary overall, List<GroupSummary> cells, List<SampleOutcome> worst,
    List<SampleOutcome> errors) {
  /** Copies. */
  public CampaignSummary {
    cells = List.copyOf(cells);
    worst = List.copyOf(worst);
    errors = List.copyOf(errors);
  }

  /** Orders samples by their first problem, lowest speed first; none found last; then by task. */
  public static final Comparator<SampleOutcome> WORST_FIRST = Comparator
      .comparingDouble((SampleOutcome o) -> Double.isNaN(o.criticalEasMps()) ? Double.POSITIVE_INFINITY
          : o.criticalEasMps())
      .thenComparing(o -> o.status() == SampleStatus.PASS)
      .thenComparingInt(SampleOutcome::task);

  /**
   * @param plan the campaign
   * @param outcomes every outcome
   * @return the statistics
   */
  public static CampaignSummary of(CampaignPlan plan, List<SampleOutcome> outcomes) {
    List<List<SampleOutcome>> byCell = new ArrayList<>();
    for (int i = 0; i < plan.cells().size(); i++) {
      byCell.add(new ArrayList<>());
    }
    for (SampleOutcome o : outcomes) {
      byCell.get(o.cell()).add(o);
    }
    List<GroupSummary> cells = new ArrayList<>();
    for (Cell c : plan.cells()) {
      cells.add(GroupSummary.of(c.label(), byCell.get(c.index()), true));
    }
    List<SampleOutcome> worst = outcomes.stream().filter(o -> o.status() != SampleStatus.ERROR)
        .sorted(WORST_FIRST).limit(plan.spec().worstSamples()).toList();
    List<SampleOutcome> errors = outcomes.stream().filter(o -> o.status() == SampleStatus.ERROR)
        .sorted(Comparator.comparingInt(SampleOutcome::task)).toList();
    return new CampaignSummary(GroupSummary.of("all samples", outcomes, false), cells, worst, errors);
  }
}
