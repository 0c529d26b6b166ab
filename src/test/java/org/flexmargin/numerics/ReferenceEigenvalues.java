package org.flexmargin.numerics;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.ejml.data.DMatrixRMaj;

/** Eigenvalues of a real matrix by Commons Math, an eigen-solver independent of the program's. */
public final class ReferenceEigenvalues {
  private ReferenceEigenvalues() {}

  /**
   * @param a a square real matrix
   * @return its eigenvalues in Commons Math's order
   */
  public static List<Complex> of(DMatrixRMaj a) {
    double[][] rows = new double[a.numRows][a.numCols];
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        rows[i][j] = a.get(i, j);
      }
    }
    EigenDecomposition e = new EigenDecomposition(MatrixUtils.createRealMatrix(rows));
    List<Complex> out = new ArrayList<>();
    for (int i = 0; i < a.numRows; i++) {
      out.add(new Complex(e.getRealEigenvalue(i), e.getImagEigenvalue(i)));
    }
    return out;
  }
}
