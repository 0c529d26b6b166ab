package org.flexmargin.model;

import java.util.Arrays;

/**
 * How the generalized aerodynamic forces are approximated by a rational function wherever a
 * state-space model needs them (state-space flutter, the closed-loop eigenvalues, time-domain
 * simulation): the case file's optional {@code rational_fit} section.
 *
 * <p>Every setting may be left automatic; {@link #defaults()} (all automatic) is what a case
 * without the section uses and reproduces the fits made before the section existed: Roger's form,
 * 4 lag roots placed by the default rule, each analysis's own reduced-frequency range from 0,
 * 31 reduced frequencies, every frequency weighted alike.
 *
 * <p>Example: {@code new RationalFitSettings(RationalFitForm.MINIMUM_STATE, AUTOMATIC, null, 0.0,
 * 2.0, 31, FitWeighting.UNIFORM)} is a minimum-state fit with the automatic lag count (twice the
 * number of coordinates) over k in [0, 2].
 *
 * @param form the rational form
 * @param lagCount number of lag roots (0 to {@value #MAX_LAG_COUNT}; at least 1 for the
 *     minimum-state form), or {@link #AUTOMATIC}: 4 for Roger's form, twice the number of
 *     coordinates for the minimum-state form. Ignored when {@code lagRoots} are given.
 * @param lagRoots explicit lag roots &beta;<sub>l</sub> (dimensionless, in reduced-frequency
 *     units), positive and distinct, or {@code null} to place {@code lagCount} roots by the default
 *     rule over the fitted range
 * @param minReducedFrequency lowest fitted reduced frequency (dimensionless, &ge; 0)
 * @param maxReducedFrequency highest fitted reduced frequency (dimensionless, above the lowest), or
 *     {@link Double#NaN} for the analysis's own choice (1.5 for state-space flutter; from the
 *     highest mode frequency and the lowest speed for the loop)
 * @param points number of fitted reduced frequencies (3 to 400), quadratically clustered toward
 *     the lowest
 * @param weighting how the fitted frequencies are weighted
 */
public record RationalFitSettings(
    RationalFitForm form,
    int lagCount,
    double[] lagRoots,
    double minReducedFrequency,
    double maxReducedFrequency,
    int points,
    FitWeighting weighting) {

  /** {@link #lagCount()} chosen by the form (4 for Roger's form, 2 n for the minimum-state form). */
  public static final int AUTOMATIC = -1;
  /** Most lag roots of a fit. */
  public static final int MAX_LAG_COUNT = 24;
  /** Lag roots of an automatic Roger fit. */
  public static final int ROGER_LAG_COUNT = 4;
  /** Default number of fitted reduced frequencies. */
  public static final int DEFAULT_POINTS = 31;
  /** Most fitted reduced frequencies. */
  public static final int MAX_POINTS = 400;

  /** Validates and copies. */
  public RationalFitSettings {
    if (form == null) {
      throw new InvalidInputException("rational_fit.method", "\"roger\" or \"minimum_state\"", "nothing");
    }
    if (weighting == null) {
      throw new InvalidInputException("rational_fit.weighting", "\"uniform\", \"element\" or \"inverse_magnitude\"",
          "nothing");
    }
    int least = form == RationalFitForm.MINIMUM_STATE ? 1 : 0;
    if (lagCount != AUTOMATIC && (lagCount < least || lagCount > MAX_LAG_COUNT)) {
      throw new InvalidInputException("rational_fit.lag_count",
          "an integer from " + least + " to " + MAX_LAG_COUNT + " for the " + form.word() + " form",
          String.valueOf(lagCount));
    }
    if (lagRoots != null) {
      lagRoots = lagRoots.clone();
      if (lagRoots.length < least || lagRoots.length > MAX_LAG_COUNT) {
        throw new InvalidInputException("rational_fit.lag_roots",
            "from " + least + " to " + MAX_LAG_COUNT + " lag roots for the " + form.word() + " form",
            lagRoots.length + " lag roots");
      }
      for (int l = 0; l < lagRoots.length; l++) {
        Checks.positive("rational_fit.lag_roots[" + l + "]", lagRoots[l]);
        for (int m = 0; m < l; m++) {
          if (Math.abs(lagRoots[m] - lagRoots[l]) <= 1e-6 * Math.max(lagRoots[m], lagRoots[l])) {
            throw new InvalidInputException("rational_fit.lag_roots[" + l + "]",
                "a value distinct from lag_roots[" + m + "] = " + lagRoots[m], String.valueOf(lagRoots[l]));
          }
        }
      }
    }
    Checks.nonNegative("rational_fit.reduced_frequency_range[0]", minReducedFrequency);
    if (!Double.isNaN(maxReducedFrequency)
        && (!(maxReducedFrequency > minReducedFrequency) || Double.isInfinite(maxReducedFrequency))) {
      throw new InvalidInputException("rational_fit.reduced_frequency_range[1]",
          "a finite value above the lowest reduced frequency " + minReducedFrequency,
          String.valueOf(maxReducedFrequency));
    }
    if (points < 3 || points > MAX_POINTS) {
      throw new InvalidInputException("rational_fit.points", "an integer from 3 to " + MAX_POINTS,
          String.valueOf(points));
    }
  }

  /** @return the settings of a case without a {@code rational_fit} section: all automatic */
  public static RationalFitSettings defaults() {
    return new RationalFitSettings(RationalFitForm.ROGER, AUTOMATIC, null, 0.0, Double.NaN, DEFAULT_POINTS,
        FitWeighting.UNIFORM);
  }

  /** @return a copy of the explicit lag roots, or {@code null} when they are placed automatically */
  @Override
  public double[] lagRoots() {
    return lagRoots == null ? null : lagRoots.clone();
  }

  /** @return whether the analysis chooses the upper end of the fitted range */
  public boolean automaticRange() {
    return Double.isNaN(maxReducedFrequency);
  }

  /**
   * @param coordinates number of coordinates n of the fitted forces, &ge; 1
   * @return the number of lag roots of the fit: the explicit roots' count, the given count, or the
   *     form's automatic count (Roger: 4; minimum state: 2 n, at most {@value #MAX_LAG_COUNT})
   */
  public int lagCountFor(int coordinates) {
    if (lagRoots != null) {
      return lagRoots.length;
    }
    if (lagCount != AUTOMATIC) {
      return lagCount;
    }
    return form == RationalFitForm.ROGER ? ROGER_LAG_COUNT : Math.min(MAX_LAG_COUNT, 2 * coordinates);
  }

  /**
   * @param analysisMax the analysis's own upper end of the range (dimensionless, &gt; 0)
   * @return the upper end of the fitted range: the given one, else {@code analysisMax}
   */
  public double maxReducedFrequencyOr(double analysisMax) {
    return automaticRange() ? analysisMax : maxReducedFrequency;
  }

  /**
   * @return the settings in words for a report, e.g. "Roger form, 4 lag roots (automatic), k from
   *     0 to the analysis's choice, 31 points, uniform weighting"
   */
  public String words() {
    String lags;
    if (lagRoots != null) {
      StringBuilder b = new StringBuilder(lagRoots.length + " lag roots (");
      for (int l = 0; l < lagRoots.length; l++) {
        b.append(l == 0 ? "" : ", ").append(lagRoots[l]);
      }
      lags = b.append(')').toString();
    } else if (lagCount == AUTOMATIC) {
      lags = form == RationalFitForm.ROGER ? ROGER_LAG_COUNT + " lag roots (automatic)"
          : "2 lag roots per coordinate (automatic)";
    } else {
      lags = lagCount + " lag roots";
    }
    String top = automaticRange() ? "the analysis's choice" : String.valueOf(maxReducedFrequency);
    return (form == RationalFitForm.ROGER ? "Roger" : "minimum-state (Karpel)") + " form, " + lags + ", k from " + minReducedFrequency + " to " + top + ", "
        + points + " points, " + weighting.word().replace('_', ' ') + " weighting";
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof RationalFitSettings s && form == s.form && lagCount == s.lagCount
        && Arrays.equals(lagRoots, s.lagRoots)
        && Double.compare(minReducedFrequency, s.minReducedFrequency) == 0
        && Double.compare(maxReducedFrequency, s.maxReducedFrequency) == 0 && points == s.points
        && weighting == s.weighting;
  }

  @Override
  public int hashCode() {
    return 31 * java.util.Objects.hash(form, lagCount, minReducedFrequency, maxReducedFrequency, points, weighting)
        + Arrays.hashCode(lagRoots);
  }

  @Override
  public String toString() {
    return "RationalFitSettings[form=" + form + ", lagCount=" + lagCount + ", lagRoots="
        + Arrays.toString(lagRoots) + ", range=[" + minReducedFrequency + ", " + maxReducedFrequency
        + "], points=" + points + ", weighting=" + weighting + "]";
  }
}
