package org.flexmargin.clearance;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Comparator;
import org.flexmargin.model.InvalidInputException;

/**
 * One requirement checked at one point: what, the required and the achieved value in one unit,
 * pass or fail, and how much room is left.
 *
 * <p>The excess is the room left in the check's own unit, positive when the check passes and zero
 * on its boundary: achieved - required for {@link RequiredSense#AT_LEAST}, required - achieved for
 * {@link RequiredSense#AT_MOST}. Followed along airspeed, it is the scalar whose zero a
 * root-finder brackets to locate a margin onset. The normalised excess puts checks of different
 * units on one scale (excess / max(|required|, {@link CheckUnit#leastScale()}) for most checks;
 * the structural-mode check combines its gain and phase terms, see {@link PointAssessor}); it has
 * the sign of the excess, and the check with the smallest one governs.
 *
 * @param kind what is checked
 * @param subject band key, mode name or label (see {@link CheckKey})
 * @param description the check in plain words, e.g. "gain margin (gain increase) at 0.2251 Hz,
 *     rigid-body band, normal envelope"
 * @param requiredValue required value, in {@code unit}
 * @param achievedValue achieved value, in {@code unit}
 * @param unit unit of both values
 * @param sense which side passes
 * @param frequencyHz frequency concerned, Hz, or NaN if none (flutter, stability)
 * @param normalisedExcess dimensionless excess, same sign as the excess
 */
public record ClearanceCheck(CheckKind kind, String subject, String description,
    double requiredValue, double achievedValue, CheckUnit unit, RequiredSense sense,
    double frequencyHz, double normalisedExcess) {

  private static final MathContext RANKING_DIGITS = new MathContext(9);

  /**
   * Orders checks by normalised excess (tightest first); checks equal to within {@link
   * #rankingKey(double)}'s rounding by subject, then kind.
   */
  public static final Comparator<ClearanceCheck> TIGHTEST_FIRST = Comparator
      .comparingDouble((ClearanceCheck c) -> rankingKey(c.normalisedExcess()))
      .thenComparing(ClearanceCheck::subject)
      .thenComparing(ClearanceCheck::kind);

  /**
   * A value rounded to nine significant digits for ranking: findings that differ only in
   * round-off (relative differences of order 1e-12 from the order of operations) rank as equal
   * and fall to the next key. Nine digits sit well above round-off and well below any difference
   * that matters (speeds are refined to about 1e-4 relative, margins reported to 3 digits).
   *
   * @param x a finite value
   * @return x rounded to nine significant digits
   */
  public static double rankingKey(double x) {
    if (x == 0 || !Double.isFinite(x)) {
      return x;
    }
    return new BigDecimal(x).round(RANKING_DIGITS).doubleValue();
  }

  /** Validates. */
  public ClearanceCheck {
    if (kind == null || unit == null || sense == null) {
      throw new InvalidInputException("check", "a kind, a unit and a sense", "nothing");
    }
    if (subject == null || description == null || description.isBlank()) {
      throw new InvalidInputException("check.description", "a subject and a description",
          "nothing");
    }
    if (!Double.isFinite(requiredValue) || !Double.isFinite(achievedValue)) {
      throw new InvalidInputException("check.values", "finite required and achieved values",
          requiredValue + " and " + achievedValue);
    }
    if (!(Double.isNaN(frequencyHz) || frequencyHz >= 0 && Double.isFinite(frequencyHz))) {
      throw new InvalidInputException("check.frequency_hz", "a finite value >= 0 or NaN",
          String.valueOf(frequencyHz));
    }
    double e = sense == RequiredSense.AT_LEAST ? achievedValue - requiredValue
        : requiredValue - achievedValue;
    if (!Double.isFinite(normalisedExcess) || (normalisedExcess >= 0) != (e >= 0)) {
      throw new InvalidInputException("check.normalised_excess",
          "a finite value with the sign of the excess " + e, String.valueOf(normalisedExcess));
    }
  }

  /**
   * A check whose normalised excess is excess / max(|required|, least scale of the unit).
   *
   * @param kind what is checked
   * @param subject band key, mode name or label
   * @param description in plain words
   * @param requiredValue required value
   * @param achievedValue achieved value
   * @param unit unit of both
   * @param sense which side passes
   * @param frequencyHz frequency concerned, Hz, or NaN
   * @return the check
   */
  public static ClearanceCheck of(CheckKind kind, String subject, String description,
      double requiredValue, double achievedValue, CheckUnit unit, RequiredSense sense,
      double frequencyHz) {
    double e = sense == RequiredSense.AT_LEAST ? achievedValue - requiredValue
        : requiredValue - achievedValue;
    double scale = Math.max(Math.abs(requiredValue), unit.leastScale());
    return new ClearanceCheck(kind, subject, description, requiredValue, achievedValue, unit,
        sense, frequencyHz, e / scale);
  }

  /** @return the room left in {@code unit}, positive when passing, zero on the boundary */
  public double excess() {
    return sense == RequiredSense.AT_LEAST ? achievedValue - requiredValue
        : requiredValue - achievedValue;
  }

  /** @return whether the requirement is met (excess &gt;= 0) */
  public boolean passed() {
    return excess() >= 0;
  }

  /** @return the key that follows this check along a sweep */
  public CheckKey key() {
    return new CheckKey(kind, subject);
  }
}
