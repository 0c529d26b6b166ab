package org.flexmargin.model;

import java.util.Arrays;

/**
 * Numerator and denominator coefficients of a rational transfer function, in the order its user
 * states (descending powers of s for a continuous one, ascending powers of z^-1 for a digital one).
 * Example: {@code [1], [1, 3, 2, 0]} is 1/(s^3 + 3 s^2 + 2 s) in powers of s.
 *
 * @param numerator numerator coefficients (finite, at least one)
 * @param denominator denominator coefficients (finite, the first non-zero)
 */
public record Coefficients(double[] numerator, double[] denominator) {
  /** Validates and copies. */
  public Coefficients {
    numerator = finite("numerator", numerator);
    denominator = finite("denominator", denominator);
    if (denominator[0] == 0) {
      throw new InvalidInputException("denominator[0]", "a non-zero first coefficient", "0");
    }
  }

  /**
   * Checks that a continuous transfer function is proper.
   *
   * @return this
   */
  public Coefficients proper() {
    if (numerator.length > denominator.length) {
      throw new InvalidInputException("numerator", "a proper transfer function: at most " + denominator.length
          + " coefficients (the denominator's degree " + (denominator.length - 1) + ")",
          numerator.length + " coefficients");
    }
    return this;
  }

  private static double[] finite(String path, double[] v) {
    if (v == null || v.length == 0) {
      throw new InvalidInputException(path, "at least one coefficient", v == null ? "nothing" : "an empty list");
    }
    for (int i = 0; i < v.length; i++) {
      Checks.finite(path + "[" + i + "]", v[i]);
    }
    return v.clone();
  }

  @Override
  public double[] numerator() {
    return numerator.clone();
  }

  @Override
  public double[] denominator() {
    return denominator.clone();
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Coefficients c && Arrays.equals(numerator, c.numerator)
        && Arrays.equals(denominator, c.denominator);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(numerator) + Arrays.hashCode(denominator);
  }

  @Override
  public String toString() {
    return Arrays.toString(numerator) + " / " + Arrays.toString(denominator);
  }
}
