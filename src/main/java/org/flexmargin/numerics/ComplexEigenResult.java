package org.flexmargin.numerics;

import org.ejml.data.ZMatrixRMaj;

/**
 * Eigenvalues and unit eigenvectors of a complex matrix, with diagnostics.
 *
 * @param real real parts of the eigenvalues (in Schur order, not sorted)
 * @param imag imaginary parts of the eigenvalues
 * @param vectors unit-norm eigenvectors as columns (column k belongs to eigenvalue k)
 * @param iterations number of QR sweeps used
 * @param relativeResidual max_k ||A v_k - lambda_k v_k|| / max|A_ij|
 */
public record ComplexEigenResult(
    double[] real, double[] imag, ZMatrixRMaj vectors, int iterations, double relativeResidual) {
  /** Copies the arrays. */
  public ComplexEigenResult {
    real = real.clone();
    imag = imag.clone();
    vectors = vectors.copy();
  }

  /** @return number of eigenvalues */
  public int size() {
    return real.length;
  }

  /** @return real part of eigenvalue k */
  public double realAt(int k) {
    return real[k];
  }

  /** @return imaginary part of eigenvalue k */
  public double imagAt(int k) {
    return imag[k];
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
  public ZMatrixRMaj vectors() {
    return vectors.copy();
  }
}
