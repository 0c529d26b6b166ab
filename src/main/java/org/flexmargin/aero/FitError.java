package org.flexmargin.aero;

/**
 * Accuracy of a rational function approximation of the generalized aerodynamic forces, measured on
 * the reduced frequencies it was fitted at.
 *
 * <p>For element (i, j): the absolute error is max over the fitted k of |Q<sub>fit,ij</sub>(ik) -
 * Q<sub>ij</sub>(ik)| (same units as Q); the relative error is that maximum divided by the
 * largest |Q<sub>ij</sub>| over the fitted k and k = 0. An element that is zero at every fitted k is
 * judged against the largest |Q| of all elements instead: Roger's form fits it exactly by zero
 * (relative error 0); the rank-one lag terms of the minimum-state form need not.
 *
 * <p>Example: a relative error of 0.004 on element (1, 0) means the fit of Q<sub>10</sub> is
 * nowhere further from the data than 0.4 % of the largest modulus of Q<sub>10</sub> over the fitted
 * range.
 *
 * @param relativeError per element, dimensionless, n x n
 * @param absoluteError per element, in the units of Q (m<sup>2</sup> per unit coordinate for
 *     strip theory), n x n
 * @param worstRelativeError the largest relative error over all elements (dimensionless)
 * @param worstRow row of the element with the largest relative error
 * @param worstColumn column of the element with the largest relative error
 */
public record FitError(
    double[][] relativeError,
    double[][] absoluteError,
    double worstRelativeError,
    int worstRow,
    int worstColumn) {

  /** Validates shapes and copies the arrays. */
  public FitError {
    relativeError = copySquare("relative_error", relativeError);
    absoluteError = copySquare("absolute_error", absoluteError);
    if (absoluteError.length != relativeError.length) {
      throw new IllegalArgumentException("error matrices must have the same size");
    }
    if (!(worstRelativeError >= 0)) {
      throw new IllegalArgumentException("worst relative error must be >= 0, found " + worstRelativeError);
    }
    int n = relativeError.length;
    if (worstRow < 0 || worstRow >= n || worstColumn < 0 || worstColumn >= n) {
      throw new IllegalArgumentException("worst element (" + worstRow + ", " + worstColumn + ") outside " + n + " x " + n);
    }
  }

  /**
   * Measures a fit against its data.
   *
   * @param relative relative errors per element (see the class Javadoc). Copied.
   * @param absolute absolute errors per element. Copied.
   * @return the error record with the worst element located
   */
  static FitError of(double[][] relative, double[][] absolute) {
    int wi = 0;
    int wj = 0;
    for (int i = 0; i < relative.length; i++) {
      for (int j = 0; j < relative.length; j++) {
        if (relative[i][j] > relative[wi][wj]) {
          wi = i;
          wj = j;
        }
      }
    }
    return new FitError(relative, absolute, relative[wi][wj], wi, wj);
  }

  private static double[][] copySquare(String name, double[][] a) {
    if (a == null || a.length == 0) {
      throw new IllegalArgumentException(name + " must be a non-empty square matrix");
    }
    double[][] c = new double[a.length][];
    for (int i = 0; i < a.length; i++) {
      if (a[i] == null || a[i].length != a.length) {
        throw new IllegalArgumentException(name + " must be square");
      }
      c[i] = a[i].clone();
    }
    return c;
  }

  /** @return a copy of the relative errors (dimensionless) */
  @Override
  public double[][] relativeError() {
    return copySquare("relative_error", relativeError);
  }

  /** @return a copy of the absolute errors (units of Q) */
  @Override
  public double[][] absoluteError() {
    return copySquare("absolute_error", absoluteError);
  }

  /**
   * @param i row
   * @param j column
   * @return relative error of element (i, j) (dimensionless)
   */
  public double relativeAt(int i, int j) {
    return relativeError[i][j];
  }
}
