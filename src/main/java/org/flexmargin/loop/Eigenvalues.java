package org.flexmargin.loop;

import java.util.Arrays;
import org.flexmargin.model.InvalidInputException;

/**
 * A list of complex eigenvalues (poles), stored as parallel arrays of real and imaginary parts in
 * rad/s. Complex eigenvalues of real matrices come in conjugate pairs.
 *
 * @param real real parts, rad/s (negative = decaying)
 * @param imag imaginary parts, rad/s (damped natural frequency, signed)
 */
public record Eigenvalues(double[] real, double[] imag) {
  /** Copies and validates the arrays (same length). */
  public Eigenvalues {
    if (real == null || imag == null || real.length != imag.length) {
      throw new InvalidInputException("eigenvalues", "real and imaginary arrays of equal length",
          (real == null ? "null" : real.length) + " and " + (imag == null ? "null" : imag.length));
    }
    real = real.clone();
    imag = imag.clone();
  }

  /** @return an empty list */
  public static Eigenvalues none() {
    return new Eigenvalues(new double[0], new double[0]);
  }

  /**
   * @param other more eigenvalues
   * @return these followed by the other's
   */
  public Eigenvalues concat(Eigenvalues other) {
    double[] re = Arrays.copyOf(real, real.length + other.real.length);
    double[] im = Arrays.copyOf(imag, imag.length + other.imag.length);
    System.arraycopy(other.real, 0, re, real.length, other.real.length);
    System.arraycopy(other.imag, 0, im, imag.length, other.imag.length);
    return new Eigenvalues(re, im);
  }

  /** @return number of eigenvalues */
  public int size() {
    return real.length;
  }

  /** @return real part of eigenvalue k, rad/s */
  public double realAt(int k) {
    return real[k];
  }

  /** @return imaginary part of eigenvalue k, rad/s */
  public double imagAt(int k) {
    return imag[k];
  }

  /** @return modulus (undamped natural frequency) of eigenvalue k, rad/s */
  public double naturalFrequencyRadPerS(int k) {
    return Math.hypot(real[k], imag[k]);
  }

  /**
   * @return damping ratio -Re/|lambda| of eigenvalue k (1 for a stable real pole, negative when
   *     unstable, NaN for a pole at the origin)
   */
  public double dampingRatio(int k) {
    double m = naturalFrequencyRadPerS(k);
    return m == 0 ? Double.NaN : -real[k] / m;
  }

  /** @return the largest real part, rad/s (negative infinity when empty) */
  public double maxRealPart() {
    double m = Double.NEGATIVE_INFINITY;
    for (double r : real) {
      m = Math.max(m, r);
    }
    return m;
  }

  @Override
  public double[] real() {
    return real.clone();
  }

  @Override
  public double[] imag() {
    return imag.clone();
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Eigenvalues e && Arrays.equals(real, e.real) && Arrays.equals(imag, e.imag);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(real) + Arrays.hashCode(imag);
  }

  @Override
  public String toString() {
    StringBuilder s = new StringBuilder("Eigenvalues[");
    for (int k = 0; k < real.length; k++) {
      s.append(k == 0 ? "" : ", ").append(real[k]).append(imag[k] < 0 ? "-" : "+")
          .append(Math.abs(imag[k])).append('j');
    }
    return s.append(']').toString();
  }
}
