package org.flexmargin.aero;

import java.util.Locale;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;

/**
 * Makes the rational fit that a case's {@link RationalFitSettings} ask for: the one place where
 * state-space flutter, the closed-loop eigenvalues and the time-domain simulation get their
 * approximation, so that all three use the same one.
 *
 * <p>Fitted reduced frequencies: {@link RogerApproximation#reducedFrequencies} over the settings'
 * range (the analysis's own upper end where the settings leave it automatic). Lag roots: the
 * settings' own, else {@link RogerApproximation#defaultLagRoots} for the settings' lag count
 * ({@link RationalFitSettings#lagCountFor}). With {@link RationalFitSettings#defaults()} the fit is
 * exactly {@link RogerApproximation#fit(AeroSource, double, int)} with 4 lag roots.
 *
 * <p>Stateless and thread-safe.
 */
public final class RationalFits {
  private RationalFits() {}

  /**
   * @param source the data to fit
   * @param settings how to fit
   * @param analysisMaxReducedFrequency the analysis's own upper end of the fitted range
   *     (dimensionless, &gt; 0), used where the settings leave it automatic
   * @return the fit, its errors and warnings
   * @throws InvalidInputException {@code rfa.*} when the settings do not give a well-posed fit of
   *     these data (for instance more lag roots than the fitted frequencies can determine)
   */
  public static RationalFit fit(AeroSource source, RationalFitSettings settings, double analysisMaxReducedFrequency) {
    if (source == null || settings == null) {
      throw new InvalidInputException("rfa", "aerodynamic data and fit settings", "none");
    }
    double kMax = settings.maxReducedFrequencyOr(analysisMaxReducedFrequency);
    double[] ks = RogerApproximation.reducedFrequencies(settings.minReducedFrequency(), kMax, settings.points());
    double[] lags = settings.lagRoots() != null ? settings.lagRoots()
        : RogerApproximation.defaultLagRoots(kMax, settings.lagCountFor(source.size()));
    return settings.form() == RationalFitForm.ROGER
        ? RogerApproximation.fit(source, ks, lags, RogerApproximation.DEFAULT_ERROR_THRESHOLD, settings.weighting())
        : MinimumStateApproximation.fit(source, ks, lags, RogerApproximation.DEFAULT_ERROR_THRESHOLD,
            settings.weighting());
  }

  /**
   * @param fit a fit
   * @return one line naming its form, lag roots, fitted range and worst element error, e.g. {@code
   *     Roger approximation, 4 lag roots, k from 0 to 1.500, worst element error 0.61 %}
   */
  public static String summary(RationalFit fit) {
    double[] ks = fit.reducedFrequencies();
    return String.format(Locale.ROOT, "%s approximation, %d lag roots, k from %s to %.3f, worst element error %.2f %%",
        RationalFit.ROGER.equals(fit.form()) ? "Roger" : "minimum-state (Karpel)", fit.lagCount(),
        ks[0] == 0 ? "0" : String.format(Locale.ROOT, "%.3f", ks[0]), ks[ks.length - 1],
        100 * fit.error().worstRelativeError());
  }
}
