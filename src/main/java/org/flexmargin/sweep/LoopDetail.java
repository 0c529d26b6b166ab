package org.flexmargin.sweep;

import java.util.Objects;
import org.flexmargin.loop.MarginOptions;

/**
 * How much of the loop analysis a configuration's sweep computes beyond its verdict: the loop
 * margins' search settings and whether the loop-at-a-time margins (the loop broken at each
 * feedback path, the others closed) are computed. The verdict, the margin onsets, the closed-loop
 * results and the margins of the loop broken at the actuator command do not depend on the
 * loop-at-a-time margins, which only the result files report; a run that reports none of them
 * (a campaign sample) leaves them out.
 *
 * @param marginOptions the loop margins' search settings (never null)
 * @param pathMargins whether the margins broken at each feedback path are computed
 */
public record LoopDetail(MarginOptions marginOptions, boolean pathMargins) {
  /** Validates. */
  public LoopDetail {
    Objects.requireNonNull(marginOptions, "margin options");
  }

  /** @return everything, with the default margin search settings */
  public static LoopDetail full() {
    return new LoopDetail(MarginOptions.defaults(), true);
  }
}
