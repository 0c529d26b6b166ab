package org.flexmargin.model;

import java.util.List;

/** Validation helpers shared by the input records; each throws {@link InvalidInputException}. */
public final class Checks {
  private Checks() {}

  /** @return {@code value} if finite and strictly positive */
  public static double positive(String path, double value) {
    if (!Double.isFinite(value) || value <= 0) {
      throw new InvalidInputException(path, "a finite value > 0", String.valueOf(value));
    }
    return value;
  }

  /** @return {@code value} if finite and not negative */
  public static double nonNegative(String path, double value) {
    if (!Double.isFinite(value) || value < 0) {
      throw new InvalidInputException(path, "a finite value >= 0", String.valueOf(value));
    }
    return value;
  }

  /** @return {@code value} if finite */
  public static double finite(String path, double value) {
    if (!Double.isFinite(value)) {
      throw new InvalidInputException(path, "a finite number", String.valueOf(value));
    }
    return value;
  }

  /** @return {@code value} if within [lo, hi] */
  public static double inRange(String path, double value, double lo, double hi) {
    if (!Double.isFinite(value) || value < lo || value > hi) {
      throw new InvalidInputException(
          path, "a value in [" + lo + ", " + hi + "]", String.valueOf(value));
    }
    return value;
  }

  /**
   * A damping stated the way requirements state it: a positive g in [0, 1] (0.03 means every root
   * damped at least g = 0.03, zeta = 0.015; V-g charts draw the same limit at g = -0.03).
   *
   * @return {@code value} if in [0, 1]
   */
  public static double positiveDamping(String path, double value) {
    if (!Double.isFinite(value) || value < 0 || value > 1) {
      throw new InvalidInputException(path, "a damping as a positive g in [0, 1] (e.g. 0.03: every root damped at "
          + "least g = 0.03, zeta = 0.015; the V-g charts draw it at g = -0.03)", String.valueOf(value));
    }
    return value;
  }

  /** @return {@code s} if non-null and not blank */
  public static String name(String path, String s) {
    if (s == null || s.isBlank()) {
      throw new InvalidInputException(path, "a non-empty name", s == null ? "nothing" : "\"\"");
    }
    return s;
  }

  /** @return an immutable copy of a non-empty list */
  public static <T> List<T> nonEmpty(String path, List<T> list) {
    if (list == null || list.isEmpty()) {
      throw new InvalidInputException(path, "at least one entry", "none");
    }
    return List.copyOf(list);
  }

  /** @return {@code n} if at least {@code min} */
  public static int atLeast(String path, int n, int min) {
    if (n < min) {
      throw new InvalidInputException(path, "an integer >= " + min, String.valueOf(n));
    }
    return n;
  }
}
