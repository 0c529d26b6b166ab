package org.flexmargin.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.flexmargin.sweep.SweepProgress;

/**
 * A one-line progress bar with an estimate of the time left, redrawn in place on standard error.
 * Only drawn on a terminal; silent otherwise (and with --quiet). Thread-safe.
 */
final class ProgressBar implements SweepProgress {
  private static final int WIDTH = 28;
  private final PrintWriter err;
  private final int total;
  private final boolean enabled;
  private final long start = System.nanoTime();
  private int done;
  private int lastLength;

  ProgressBar(PrintWriter err, int total, boolean enabled) {
    this.err = err;
    this.total = Math.max(1, total);
    this.enabled = enabled;
  }

  @Override
  public synchronized void stageDone(String configuration, String stage) {
    done++;
    if (!enabled) {
      return;
    }
    double elapsed = (System.nanoTime() - start) * 1e-9;
    double eta = done < total ? elapsed / done * (total - done) : 0;
    int filled = (int) Math.round(WIDTH * (double) done / total);
    String line = String.format(Locale.ROOT, "[%s%s] %3d%%  %s: %s done  %.1f s elapsed, about %.1f s left",
        "#".repeat(filled), "-".repeat(WIDTH - filled), 100 * done / total, configuration, stage, elapsed, eta);
    String pad = line.length() < lastLength ? " ".repeat(lastLength - line.length()) : "";
    lastLength = line.length();
    err.print("\r" + line + pad);
    if (done == total) {
      err.println();
    }
    err.flush();
  }
}
