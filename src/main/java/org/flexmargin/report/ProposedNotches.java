package org.flexmargin.report;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.NotchFilterSpec;

/**
 * A notch design to show in the report beside the case's own loop: the loop with the proposed
 * notches in place. The report marks the proposed notches on the notch chart and draws a "with
 * proposed notches" curve on the Bode and Nichols charts.
 *
 * @param loop the case's loop with the proposed notches in their paths
 * @param feasible whether the design meets every structural and rigid-body requirement it was
 *     designed for
 * @param source one line on how the design was made, e.g. "notch design over both configurations
 *     up to V_L, frequency uncertainty +-10 %"
 */
public record ProposedNotches(LoopSpec loop, boolean feasible, String source) {
  /** Validates. */
  public ProposedNotches {
    if (loop == null) {
      throw new IllegalArgumentException("the proposed loop is required");
    }
    source = source == null ? "" : source;
  }

  /** @return the distinct notches of the proposed loop, in path order */
  public List<NotchFilterSpec> notches() {
    Set<NotchFilterSpec> out = new LinkedHashSet<>();
    for (FeedbackPath p : loop.paths()) {
      for (FilterSpec f : p.filters()) {
        if (f instanceof NotchFilterSpec n) {
          out.add(n);
        }
      }
    }
    return new ArrayList<>(out);
  }

  /** @return e.g. "7.40 Hz (-17.2 dB), 18.59 Hz (-12.9 dB) in pitch_rate, accel_cg" */
  public String summary() {
    List<String> parts = new ArrayList<>();
    for (NotchFilterSpec n : notches()) {
      parts.add(String.format(Locale.ROOT, "%.2f Hz (%.1f dB)", n.centreHz(), n.depthDb()));
    }
    List<String> paths = new ArrayList<>();
    for (FeedbackPath p : loop.paths()) {
      if (p.filters().stream().anyMatch(f -> f instanceof NotchFilterSpec)) {
        paths.add(p.sensor());
      }
    }
    return parts.isEmpty() ? "no notch" : String.join(", ", parts) + " in " + String.join(", ", paths);
  }
}
