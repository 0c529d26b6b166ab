package org.flexmargin.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;

/**
 * A rough estimate of the computing time of a sweep, per configuration and stage, from the number
 * of grid points N, elastic modes m and closed-loop states n. The per-point costs are fitted to
 * this project's measurements on one core (the {@code bench} figures in README.md and the demo's
 * stage times): p-k 4 ms + 1.8e-6 m^2 + 2.5e-9 m^4 s (root solves grow as m^3 per root); loop
 * margins 12 ms + 6.5e-6 (2 + m)^3 s (about 5 000 complex (2 + m) solves per point; the constant,
 * mostly force assembly, refitted when the forces were interpolated in k and the demo's sweep
 * fell from about 12 s to 3.6 s of computing); closed loop
 * 5 ms + 7e-9 n^3 s with n = 6 m + 12 (four aerodynamic lags; two real eigen-decompositions per
 * point with the onset refinement); clearance 30 % of the loop margins (margin onsets re-solve the
 * loop). It is good to a factor of about 3, enough to tell seconds from hours.
 *
 * <p>Runs whose single-core estimate exceeds {@link #LIMIT_CPU_SECONDS} are refused unless
 * {@code --force} is given.
 *
 * @param configurations one estimate per configuration, in case order
 */
record CostEstimate(List<Stages> configurations) {
  /** Refusal limit: one hour of single-core computing. */
  static final double LIMIT_CPU_SECONDS = 3600;
  /** The limit in words, for help texts. */
  static final String LIMIT_TEXT = "one hour of computing on one core";
  /** Aerodynamic lag terms of the closed-loop state space. */
  private static final int LAGS = 4;

  /**
   * Estimated single-core seconds of one configuration, by stage (0 for a stage that does not run).
   *
   * @param configuration configuration name
   * @param modes elastic modes m
   * @param points sweep grid points N
   * @param flutterS divergence and open-loop flutter, s
   * @param loopMarginsS loop margins, s
   * @param closedLoopS closed-loop eigenvalues and onsets, s
   * @param clearanceS clearance and margin onsets, s
   */
  record Stages(String configuration, int modes, int points, double flutterS, double loopMarginsS,
      double closedLoopS, double clearanceS) {
    /** @return the configuration's total, s */
    double totalS() {
      return flutterS + loopMarginsS + closedLoopS + clearanceS;
    }

    /**
     * @param stage a stage name as reported by the sweep
     * @return that stage's estimate, s (the mean of the running stages for an unknown name)
     */
    double stageS(String stage) {
      return switch (stage) {
        case "divergence and flutter" -> flutterS;
        case "loop margins" -> loopMarginsS;
        case "closed loop" -> closedLoopS;
        case "clearance" -> clearanceS;
        default -> totalS() / 4;
      };
    }
  }

  /**
   * @param analysisCase a validated case
   * @return its estimate
   */
  static CostEstimate of(AnalysisCase analysisCase) {
    int points = new PlannedPath(analysisCase.sweep()).gridPoints();
    boolean loop = analysisCase.loop() != null;
    boolean requirements = analysisCase.requirements() != null;
    List<Stages> list = new ArrayList<>();
    for (Configuration c : analysisCase.configurations()) {
      int m = ConfigurationModel.of(c).modes().size();
      list.add(stages(c.name(), m, points, loop, requirements));
    }
    return new CostEstimate(List.copyOf(list));
  }

  /**
   * @param name configuration name
   * @param m elastic modes
   * @param points grid points
   * @param loop whether the case has a loop
   * @param requirements whether it has a requirements table
   * @return the estimate of one configuration (see the class comment for the formulas)
   */
  static Stages stages(String name, int m, int points, boolean loop, boolean requirements) {
    double dm = m;
    double flutter = points * (4e-3 + 1.8e-6 * dm * dm + 2.5e-9 * dm * dm * dm * dm);
    double margins = 0;
    double closed = 0;
    double clearance = 0;
    if (loop) {
      double k = 2 + dm;
      margins = points * (0.012 + 6.5e-6 * k * k * k);
      double n = (2 + LAGS) * dm + 12;
      closed = points * (5e-3 + 7e-9 * n * n * n);
      if (requirements) {
        clearance = 0.3 * margins;
      }
    }
    return new Stages(name, m, points, flutter, margins, closed, clearance);
  }

  /** @return total single-core seconds */
  double cpuSeconds() {
    return configurations.stream().mapToDouble(Stages::totalS).sum();
  }

  /**
   * @param threads worker threads (configurations and the grid points of the loop stages run in
   *     parallel; each configuration's flutter continuation is sequential)
   * @return the elapsed time with that many threads: the total shared among the threads, but at
   *     least the longest sequential flutter stage, s
   */
  double wallSeconds(int threads) {
    double sequential = configurations.stream().mapToDouble(Stages::flutterS).max().orElse(0);
    return Math.max(cpuSeconds() / Math.max(1, threads), sequential);
  }

  /** @return true if the run is above the refusal limit */
  boolean overLimit() {
    return cpuSeconds() > LIMIT_CPU_SECONDS;
  }

  /**
   * @param threads worker threads
   * @return one line for the terminal
   */
  String describe(int threads) {
    int points = configurations.isEmpty() ? 0 : configurations.get(0).points();
    return String.format(Locale.ROOT,
        "estimated cost: %d configuration(s) x %d grid points, up to %d modes: about %s of computing "
            + "(about %s elapsed on %d thread(s); rough, within a factor of about 3); limit %s",
        configurations.size(), points, configurations.stream().mapToInt(Stages::modes).max().orElse(0),
        duration(cpuSeconds()), duration(wallSeconds(threads)), threads, LIMIT_TEXT);
  }

  /**
   * @param seconds a duration, s
   * @return it in words, e.g. "40 s", "12 min", "3.5 h"
   */
  static String duration(double seconds) {
    if (seconds < 90) {
      return String.format(Locale.ROOT, "%.0f s", Math.max(1, seconds));
    }
    if (seconds < 5400) {
      return String.format(Locale.ROOT, "%.0f min", seconds / 60);
    }
    if (seconds < 172800) {
      return String.format(Locale.ROOT, "%.1f h", seconds / 3600);
    }
    return String.format(Locale.ROOT, "%.0f days", seconds / 86400);
  }
}
