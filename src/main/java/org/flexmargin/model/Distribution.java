package org.flexmargin.model;

/**
 * Probability distribution of one uncertain campaign parameter. Values are in the unit of the
 * parameter ({@link UncertainQuantity}): a dimensionless factor, or seconds for an added delay.
 *
 * <p>Example: a modal frequency known to +-3 % (one standard deviation) is a factor
 * {@code new Normal(1.0, 0.03)}; a delay that may grow by 0 to 4 ms is
 * {@code new Uniform(0.0, 0.004)}.
 */
public sealed interface Distribution {

  /** Normal distribution. @param mean mean @param standardDeviation standard deviation, &gt; 0 */
  record Normal(double mean, double standardDeviation) implements Distribution {
    /** Validates. */
    public Normal {
      Checks.finite("mean", mean);
      Checks.positive("standard_deviation", standardDeviation);
    }
  }

  /** Uniform distribution on [low, high]. @param low lower bound @param high upper bound, &gt; low */
  record Uniform(double low, double high) implements Distribution {
    /** Validates. */
    public Uniform {
      Checks.finite("low", low);
      Checks.finite("high", high);
      if (!(high > low)) {
        throw new InvalidInputException("high", "a value above low = " + low, String.valueOf(high));
      }
    }
  }

  /**
   * Normal distribution truncated to [low, high] (renormalised, not clipped).
   *
   * @param mean mean of the parent normal
   * @param standardDeviation standard deviation of the parent normal, &gt; 0
   * @param low lower bound
   * @param high upper bound, &gt; low
   */
  record TruncatedNormal(double mean, double standardDeviation, double low, double high) implements Distribution {
    /** Validates; the interval must hold a usable probability of the parent normal. */
    public TruncatedNormal {
      Checks.finite("mean", mean);
      Checks.positive("standard_deviation", standardDeviation);
      Checks.finite("low", low);
      Checks.finite("high", high);
      if (!(high > low)) {
        throw new InvalidInputException("high", "a value above low = " + low, String.valueOf(high));
      }
      if (high < mean - 8 * standardDeviation || low > mean + 8 * standardDeviation) {
        throw new InvalidInputException("low", "an interval within 8 standard deviations of the mean",
            "[" + low + ", " + high + "] for mean " + mean + " and standard deviation " + standardDeviation);
      }
    }
  }

  /**
   * Log-normal distribution: ln X is normal with mean ln(median) and standard deviation logStd.
   *
   * @param median median of X, &gt; 0
   * @param logStandardDeviation standard deviation of ln X, &gt; 0
   */
  record LogNormal(double median, double logStandardDeviation) implements Distribution {
    /** Validates. */
    public LogNormal {
      Checks.positive("median", median);
      Checks.positive("log_standard_deviation", logStandardDeviation);
    }
  }
}
