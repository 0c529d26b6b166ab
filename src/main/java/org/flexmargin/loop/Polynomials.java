package org.flexmargin.loop;

import java.util.Arrays;

/**
 * Real polynomials as coefficient arrays: products, powers of binomials, polynomials from their
 * roots (zeros and poles given as complex-conjugate pairs). Coefficient order is stated by each
 * method. Stateless.
 */
public final class Polynomials {
  private Polynomials() {}

  /**
   * @param p coefficients (either order, the same for both factors)
   * @param q coefficients
   * @return the product, in the same order
   */
  public static double[] multiply(double[] p, double[] q) {
    double[] r = new double[p.length + q.length - 1];
    for (int i = 0; i < p.length; i++) {
      for (int j = 0; j < q.length; j++) {
        r[i + j] += p[i] * q[j];
      }
    }
    return r;
  }

  /**
   * @param a constant term
   * @param b coefficient of x
   * @param n power (&gt;= 0)
   * @return (a + b x)^n in ascending powers of x
   */
  static double[] binomialPower(double a, double b, int n) {
    double[] r = {1.0};
    for (int i = 0; i < n; i++) {
      r = multiply(r, new double[] {a, b});
    }
    return r;
  }

  /**
   * The monic real polynomial with the given roots, in descending powers (s^n first). A real root
   * (im = 0) contributes s - re; a complex root stands for the conjugate pair re +- j im and
   * contributes s^2 - 2 re s + re^2 + im^2 (so each pair is given once).
   *
   * @param re real parts
   * @param im imaginary parts (same length)
   * @param field field path used in errors
   * @return the coefficients, leading 1
   */
  public static double[] fromRoots(double[] re, double[] im, String field) {
    StateSpace.require(re != null && im != null && re.length == im.length, field,
        "real and imaginary parts of equal length", re == null || im == null ? "nothing"
            : re.length + " and " + im.length + " values");
    double[] p = {1.0};
    for (int i = 0; i < re.length; i++) {
      StateSpace.require(Double.isFinite(re[i]) && Double.isFinite(im[i]), field + "[" + i + "]",
          "a finite root", re[i] + " + " + im[i] + "j");
      p = im[i] == 0 ? multiply(p, new double[] {1.0, -re[i]})
          : multiply(p, new double[] {1.0, -2 * re[i], re[i] * re[i] + im[i] * im[i]});
    }
    return p;
  }

  /**
   * Removes leading coefficients that are zero to within {@code relTol} of the largest one.
   *
   * @param p coefficients, highest power first
   * @param relTol relative tolerance (&gt;= 0)
   * @return the trimmed copy (at least one coefficient)
   */
  static double[] trimLeading(double[] p, double relTol) {
    double max = 0;
    for (double v : p) {
      max = Math.max(max, Math.abs(v));
    }
    int k = 0;
    while (k < p.length - 1 && Math.abs(p[k]) <= relTol * max) {
      k++;
    }
    return Arrays.copyOfRange(p, k, p.length);
  }

  /** @return the coefficients in reverse order (ascending to descending and back) */
  static double[] reversed(double[] p) {
    double[] r = new double[p.length];
    for (int i = 0; i < p.length; i++) {
      r[i] = p[p.length - 1 - i];
    }
    return r;
  }
}
