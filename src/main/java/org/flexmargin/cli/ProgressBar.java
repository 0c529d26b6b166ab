package org.flexmargin.cli;

import java.io.PrintWriter;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.flexmargin.sweep.SweepProgress;

/**
 * A one-line progress bar with an estimate of the time left, redrawn in place on standard error.
 * Stages are weighted by their estimated cost ({@link CostEstimate}), not counted as equals: on the
 * demo the loop margins take ten times as long as the flutter sweep, and a bar counting stages
 * would run ahead of the work and promise too little time left. The time left is the elapsed time
 * scaled by the estimated work still to do. Only drawn on a terminal; silent otherwise (and with
 * --quiet). Thread-safe.
 */
final class ProgressBar implements SweepProgress {
  private static final int WIDTH = 28;
  private final PrintWriter err;
  private final Map<String, CostEstimate.Stages> byConfiguration = new HashMap<>();
  private final double total;
  private final boolean enabled;
  private final long start = System.nanoTime();
  private double done;
  private int lastLength;

  ProgressBar(PrintWriter err, CostEstimate cost, boolean enabled) {
    this.err = err;
    for (CostEstimate.Stages s : cost.configurations()) {
      byConfiguration.put(s.configuration(), s);
    }
    this.total = cost.cpuSeconds();
    this.enabled = enabled;
  }

  /** @return the fraction of the estimated work done, 0 to 1 */
  synchronized double fractionDone() {
    return total > 0 && done < total * (1 - 1e-9) ? done / total : 1.0;
  }

  @Override
  public synchronized void stageDone(String configuration, String stage) {
    CostEstimate.Stages s = byConfiguration.get(configuration);
    done += s == null ? 0 : s.stageS(stage);
    if (!enabled) {
      return;
    }
    double fraction = fractionDone();
    double elapsed = (System.nanoTime() - start) * 1e-9;
    double eta = fraction > 0 && fraction < 1 ? elapsed / fraction * (1 - fraction) : 0;
    int filled = (int) Math.round(WIDTH * fraction);
    String line = String.format(Locale.ROOT, "[%s%s] %3d%%  %s: %s done  %.1f s elapsed, about %.0f s left",
        "#".repeat(filled), "-".repeat(WIDTH - filled), (int) Math.floor(100 * fraction), configuration, stage,
        elapsed, eta);
    String pad = line.length() < lastLength ? " ".repeat(lastLength - line.length()) : "";
    lastLength = line.length();
    err.print("\r" + line + pad);
    if (fraction >= 1) {
      err.println();
    }
    err.flush();
  }
}
