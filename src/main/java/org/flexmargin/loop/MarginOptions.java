package org.flexmargin.loop;

/**
 * Settings of the adaptive frequency grid of {@link LoopMargins}.
 *
 * @param pointsPerDecade points per decade of the initial logarithmic grid (&gt;= 4)
 * @param maxPhaseStepDeg an interval is bisected while the phase of L changes by more than this
 *     between its ends, deg (0 &lt; value &lt;= 45); keeps phase unwrapping unambiguous and catches
 *     the 180 deg swing of a narrow resonance that falls between grid points
 * @param maxGainStepDb an interval is bisected while |L| changes by more than this, dB (&gt; 0)
 * @param maxPoints cap on grid points after refinement (&gt;= 2 x initial points is sensible)
 * @param maxRefinementDepth maximum number of bisections of an initial interval (1..52)
 * @param seedDampingRatio poles with damping ratio below this (and non-zero imaginary part) seed
 *     extra grid points around their damped frequency (0 disables seeding)
 * @param seedPointsPerPole grid points added on each side of a seeding pole (&gt;= 0), spaced by
 *     the pole's |real part| (its half-power half-bandwidth)
 * @param refineExtrema whether the peak gain and the disk margin are refined between grid points
 *     by Brent's method (true) or taken at the grid's largest sample (false: within the grid's
 *     gain step of the refined value, for runs that report neither, such as campaign samples;
 *     crossovers and margins are refined either way)
 */
public record MarginOptions(int pointsPerDecade, double maxPhaseStepDeg, double maxGainStepDb,
    int maxPoints, int maxRefinementDepth, double seedDampingRatio, int seedPointsPerPole,
    boolean refineExtrema) {

  /** Validates. */
  public MarginOptions {
    StateSpace.require(pointsPerDecade >= 4, "margin_options.points_per_decade", ">= 4",
        String.valueOf(pointsPerDecade));
    StateSpace.require(maxPhaseStepDeg > 0 && maxPhaseStepDeg <= 45,
        "margin_options.max_phase_step_deg", "a value in (0, 45]",
        String.valueOf(maxPhaseStepDeg));
    StateSpace.require(maxGainStepDb > 0 && Double.isFinite(maxGainStepDb),
        "margin_options.max_gain_step_db", "a finite value > 0", String.valueOf(maxGainStepDb));
    StateSpace.require(maxPoints >= 16, "margin_options.max_points", ">= 16",
        String.valueOf(maxPoints));
    StateSpace.require(maxRefinementDepth >= 1 && maxRefinementDepth <= 52,
        "margin_options.max_refinement_depth", "1..52", String.valueOf(maxRefinementDepth));
    StateSpace.require(seedDampingRatio >= 0 && seedDampingRatio <= 1,
        "margin_options.seed_damping_ratio", "a value in [0, 1]",
        String.valueOf(seedDampingRatio));
    StateSpace.require(seedPointsPerPole >= 0, "margin_options.seed_points_per_pole", ">= 0",
        String.valueOf(seedPointsPerPole));
  }

  /** The settings with the peak gain and disk margin refined. */
  public MarginOptions(int pointsPerDecade, double maxPhaseStepDeg, double maxGainStepDb, int maxPoints,
      int maxRefinementDepth, double seedDampingRatio, int seedPointsPerPole) {
    this(pointsPerDecade, maxPhaseStepDeg, maxGainStepDb, maxPoints, maxRefinementDepth, seedDampingRatio,
        seedPointsPerPole, true);
  }

  /** @return these settings with the peak gain and the disk margin taken at the grid's samples */
  public MarginOptions withoutExtremaRefinement() {
    return new MarginOptions(pointsPerDecade, maxPhaseStepDeg, maxGainStepDb, maxPoints, maxRefinementDepth,
        seedDampingRatio, seedPointsPerPole, false);
  }

  /**
   * @return 40 points per decade, 10 deg / 1.5 dB steps, at most 200 000 points, depth 30,
   *     seeding poles with damping below 0.3 with 8 points per side
   */
  public static MarginOptions defaults() {
    return new MarginOptions(40, 10.0, 1.5, 200_000, 30, 0.3, 8);
  }
}
