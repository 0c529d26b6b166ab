package org.flexmargin.io;

import java.util.List;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.PlausibleRange;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;

/**
 * Reads the optional {@code rational_fit} section of a case file (docs/case-files.md, "Rational
 * fit"): {@code method}, {@code lag_count} or {@code lag_roots}, {@code reduced_frequency_range},
 * {@code points} and {@code weighting}, every key optional. Without the section the settings are
 * {@link RationalFitSettings#defaults()}.
 */
final class RationalFitSectionReader {
  private static final List<String> KEYS =
      List.of("method", "lag_count", "lag_roots", "reduced_frequency_range", "points", "weighting");
  private static final List<String> METHODS = List.of("roger", "minimum_state");
  private static final List<String> WEIGHTINGS = List.of("uniform", "element", "inverse_magnitude");

  private RationalFitSectionReader() {}

  /**
   * @param root the case file's root object (its {@code rational_fit} key is read)
   * @return the settings
   * @throws InputFileException on an invalid section (file, line, field path, expected, found)
   */
  static RationalFitSettings read(JsonField root) {
    JsonField f = root.optional("rational_fit");
    if (f == null) {
      return RationalFitSettings.defaults();
    }
    f.object("a rational_fit section");
    f.allowOnly(KEYS);
    RationalFitSettings d = RationalFitSettings.defaults();
    RationalFitForm form = f.has("method") && f.optional("method").choice(METHODS).equals("minimum_state")
        ? RationalFitForm.MINIMUM_STATE : d.form();
    f.atMostOne("the lag roots", "lag_count", "lag_roots");
    int lagCount = f.has("lag_count") ? f.optional("lag_count").integer() : d.lagCount();
    double[] lagRoots = f.has("lag_roots")
        ? f.optional("lag_roots").quantities("a list of lag roots", PlausibleRange.RATIONAL_FIT_REDUCED_FREQUENCY)
        : null;
    double kMin = d.minReducedFrequency();
    double kMax = d.maxReducedFrequency();
    JsonField range = f.optional("reduced_frequency_range");
    if (range != null) {
      double[] k = range.quantities("a list [lowest, highest] of reduced frequencies",
          PlausibleRange.RATIONAL_FIT_REDUCED_FREQUENCY);
      if (k.length != 2) {
        throw range.fail("two reduced frequencies [lowest, highest]", k.length + " values");
      }
      kMin = k[0];
      kMax = k[1];
    }
    int points = f.has("points") ? f.optional("points").integer() : d.points();
    FitWeighting weighting = d.weighting();
    if (f.has("weighting")) {
      String w = f.optional("weighting").choice(WEIGHTINGS);
      for (FitWeighting candidate : FitWeighting.values()) {
        weighting = candidate.word().equals(w) ? candidate : weighting;
      }
    }
    FitWeighting chosen = weighting;
    double lo = kMin;
    double hi = kMax;
    return root.build(() -> new RationalFitSettings(form, lagCount, lagRoots, lo, hi, points, chosen));
  }
}
