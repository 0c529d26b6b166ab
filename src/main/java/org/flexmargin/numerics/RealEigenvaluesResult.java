package org.flexmargin.numerics;

/**
 * Eigenvalues of a real square matrix with the iteration diagnostics. Complex eigenvalues come
 * in conjugate pairs, the one with positive imaginary part first. When the iteration did not
 * converge, the eigenvalues it did not reach are NaN and {@code converged} is false.
 *
 * @param real real parts, in the units of the matrix entries (in order along the diagonal of the
 *     final quasi-triangular matrix; not sorted)
 * @param imag imaginary parts, same units
 * @param iterations number of double-shift QR sweeps used (dimensionless count, &ge; 0)
 * @param converged true if every eigenvalue was found within the iteration limit
 */
public record RealEigenvaluesResult(double[] real, double[] imag, int iterations, boolean converged) {
  /** Copies the arrays and checks their lengths and the iteration count. */
  public RealEigenvaluesResult {
    if (real == null || imag == null || real.length != imag.length) {
      throw new IllegalArgumentException("real and imaginary parts must be arrays of equal length");
    }
    if (iterations < 0) {
      throw new IllegalArgumentException("iterations must be >= 0, got " + iterations);
    }
    real = real.clone();
    imag = imag.clone();
  }

  /** @return number of eigenvalues (the order of the matrix) */
  public int size() {
    return real.length;
  }

  @Override
  public double[] real() {
    return real.clone();
  }

  @Override
  public double[] imag() {
    return imag.clone();
  }
}
