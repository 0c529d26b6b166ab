package org.flexmargin.aero;

import java.util.function.DoubleUnaryOperator;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.model.InvalidInputException;

/**
 * The lag terms of a rational approximation as aerodynamic states. Each lag matrix is factored as
 * A<sub>l+3</sub> = D<sub>l</sub> E<sub>l</sub>, so that
 *
 * <pre>
 *   sum_l A_{l+3} p / (p + beta_l) = sum_l D_l (p I + beta_l I)^-1 E_l p,   p = s b / V,
 * </pre>
 *
 * and lag l has r<sub>l</sub> states z<sub>l</sub> = [p / (p + beta<sub>l</sub>)] E<sub>l</sub> xi,
 * that is, in time,
 *
 * <pre>  z_l' = E_l xi' - (V/b) beta_l z_l,   force contribution q_dyn D_l z_l. </pre>
 *
 * <p>Roger's form ({@link #roger}): E<sub>l</sub> = I and D<sub>l</sub> = A<sub>l+3</sub>, n
 * states per lag root. Karpel's minimum-state form ({@link #rankOne}): E<sub>l</sub> = e<sub>l</sub>
 * <sup>T</sup> and D<sub>l</sub> = d<sub>l</sub>, one state per lag root (the l-th row of E and
 * column of D of Q(p) = A0 + A1 p + A2 p^2 + D (p I - R)^-1 E p).
 *
 * <p>States are numbered lag by lag: those of lag l start at {@link #firstState(int)}. Immutable:
 * arrays are copied in and out; the element accessors and the writers read the fields directly.
 *
 * @param size number of generalized coordinates n, &ge; 1
 * @param lagRoots &beta;<sub>l</sub>, positive, finite and distinct (dimensionless)
 * @param inputs E<sub>l</sub> per lag root, r<sub>l</sub> x n with r<sub>l</sub> &ge; 1
 *     (dimensionless)
 * @param outputs D<sub>l</sub> per lag root, n x r<sub>l</sub> (units of Q: m<sup>2</sup> per unit
 *     coordinate for strip theory)
 */
public record LagRealisation(int size, double[] lagRoots, double[][][] inputs, double[][][] outputs) {

  /** Validates and copies. */
  public LagRealisation {
    if (size < 1) {
      throw new InvalidInputException("lag_realisation.size", "at least one coordinate", String.valueOf(size));
    }
    lagRoots = RationalFit.checkedLagRoots("lag_realisation.lag_roots", lagRoots);
    int nl = lagRoots.length;
    if (inputs == null || outputs == null || inputs.length != nl || outputs.length != nl) {
      throw new InvalidInputException("lag_realisation", nl + " input and " + nl + " output blocks (one per lag root)",
          (inputs == null ? "no" : String.valueOf(inputs.length)) + " input and "
              + (outputs == null ? "no" : String.valueOf(outputs.length)) + " output blocks");
    }
    double[][][] in = new double[nl][][];
    double[][][] out = new double[nl][][];
    for (int l = 0; l < nl; l++) {
      int r = inputs[l] == null ? 0 : inputs[l].length;
      if (r < 1) {
        throw new InvalidInputException("lag_realisation.inputs[" + l + "]", "at least one row", "none");
      }
      in[l] = checkedBlock("lag_realisation.inputs[" + l + "]", inputs[l], r, size);
      out[l] = checkedBlock("lag_realisation.outputs[" + l + "]", outputs[l], size, r);
    }
    inputs = in;
    outputs = out;
  }

  private static double[][] checkedBlock(String path, double[][] block, int rows, int cols) {
    if (block == null || block.length != rows) {
      throw new InvalidInputException(path, rows + " x " + cols + " matrix",
          block == null ? "none" : block.length + " rows");
    }
    double[][] copy = new double[rows][];
    for (int i = 0; i < rows; i++) {
      if (block[i] == null || block[i].length != cols) {
        throw new InvalidInputException(path + "[" + i + "]", cols + " entries",
            block[i] == null ? "none" : String.valueOf(block[i].length));
      }
      for (int j = 0; j < cols; j++) {
        if (!Double.isFinite(block[i][j])) {
          throw new InvalidInputException(path + "[" + i + "][" + j + "]", "a finite value",
              String.valueOf(block[i][j]));
        }
      }
      copy[i] = block[i].clone();
    }
    return copy;
  }

  /**
   * Roger's realisation: E<sub>l</sub> = I, D<sub>l</sub> = A<sub>l+3</sub>.
   *
   * @param lagRoots &beta;<sub>l</sub>
   * @param lagMatrices A<sub>l+3</sub> per lag root, n x n (units of Q)
   * @param size n
   * @return n states per lag root
   */
  public static LagRealisation roger(int size, double[] lagRoots, double[][][] lagMatrices) {
    int nl = lagMatrices == null ? 0 : lagMatrices.length;
    double[][][] identity = new double[nl][size][size];
    for (int l = 0; l < nl; l++) {
      for (int i = 0; i < size; i++) {
        identity[l][i][i] = 1.0;
      }
    }
    return new LagRealisation(size, lagRoots, identity, lagMatrices);
  }

  /**
   * Karpel's minimum-state realisation: E<sub>l</sub> = e<sub>l</sub><sup>T</sup>, D<sub>l</sub>
   * = d<sub>l</sub>.
   *
   * @param lagRoots &beta;<sub>l</sub>
   * @param d d<sub>l</sub> per lag root, length n (units of Q): the columns of D
   * @param e e<sub>l</sub> per lag root, length n (dimensionless): the rows of E
   * @return one state per lag root
   */
  public static LagRealisation rankOne(double[] lagRoots, double[][] d, double[][] e) {
    if (d == null || e == null || d.length == 0 || d.length != e.length || e[0] == null) {
      throw new InvalidInputException("lag_realisation", "one d and one e per lag root, at least one",
          (d == null ? 0 : d.length) + " d and " + (e == null ? 0 : e.length) + " e");
    }
    double[][][] in = new double[d.length][][];
    double[][][] out = new double[d.length][][];
    for (int l = 0; l < d.length; l++) {
      in[l] = new double[][] {e[l]};
      out[l] = column(d[l]);
    }
    return new LagRealisation(e[0].length, lagRoots, in, out);
  }

  /** @return v as an n x 1 matrix, or null for null */
  private static double[][] column(double[] v) {
    if (v == null) {
      return null;
    }
    double[][] c = new double[v.length][1];
    for (int i = 0; i < v.length; i++) {
      c[i][0] = v[i];
    }
    return c;
  }

  /** @return number of lag roots */
  public int lagCount() {
    return lagRoots.length;
  }

  /**
   * @param l lag index, 0-based
   * @return &beta;<sub>l</sub> (dimensionless)
   */
  public double lagRoot(int l) {
    return lagRoots[l];
  }

  /**
   * @param l lag index, 0-based
   * @return r<sub>l</sub>, the number of states of lag l
   */
  public int states(int l) {
    return inputs[l].length;
  }

  /** @return the number of lag states, the sum of r<sub>l</sub> */
  public int stateCount() {
    int total = 0;
    for (double[][] e : inputs) {
      total += e.length;
    }
    return total;
  }

  /**
   * @param l lag index, 0-based
   * @return index of lag l's first state among the lag states
   */
  public int firstState(int l) {
    int first = 0;
    for (int k = 0; k < l; k++) {
      first += inputs[k].length;
    }
    return first;
  }

  /**
   * @return true when every E<sub>l</sub> is the identity (Roger's realisation): lag state k of
   *     lag l then belongs to coordinate k
   */
  public boolean perCoordinate() {
    for (double[][] e : inputs) {
      if (e.length != size) {
        return false;
      }
      for (int i = 0; i < size; i++) {
        for (int j = 0; j < size; j++) {
          if (e[i][j] != (i == j ? 1.0 : 0.0)) {
            return false;
          }
        }
      }
    }
    return true;
  }

  /**
   * @param l lag index
   * @param k state of the lag, 0-based
   * @param j coordinate
   * @return E<sub>l</sub>[k][j] (dimensionless)
   */
  public double input(int l, int k, int j) {
    return inputs[l][k][j];
  }

  /**
   * @param l lag index
   * @param i coordinate
   * @param k state of the lag, 0-based
   * @return D<sub>l</sub>[i][k] (units of Q)
   */
  public double output(int l, int i, int k) {
    return outputs[l][i][k];
  }

  @Override
  public double[] lagRoots() {
    return lagRoots.clone();
  }

  @Override
  public double[][][] inputs() {
    return deepCopy(inputs);
  }

  @Override
  public double[][][] outputs() {
    return deepCopy(outputs);
  }

  private static double[][][] deepCopy(double[][][] blocks) {
    double[][][] c = new double[blocks.length][][];
    for (int l = 0; l < blocks.length; l++) {
      c[l] = new double[blocks[l].length][];
      for (int i = 0; i < blocks[l].length; i++) {
        c[l][i] = blocks[l][i].clone();
      }
    }
    return c;
  }

  /**
   * Writes the force of the lag states, {@code scale} D<sub>l</sub>, into rows {@code firstRow ..
   * firstRow + n - 1} of {@code target}: entry (firstRow + i, firstColumn + {@link #firstState}(l) +
   * k) becomes scale D<sub>l</sub>[i][k].
   *
   * @param target the matrix to write into. Modified.
   * @param firstRow row of coordinate 0
   * @param firstColumn column of the first lag state
   * @param scale factor, e.g. the dynamic pressure (Pa)
   */
  public void setForceColumns(DMatrixRMaj target, int firstRow, int firstColumn, double scale) {
    int column = firstColumn;
    for (int l = 0; l < outputs.length; l++) {
      double[][] d = outputs[l];
      for (int i = 0; i < size; i++) {
        for (int k = 0; k < d[i].length; k++) {
          target.set(firstRow + i, column + k, scale * d[i][k]);
        }
      }
      column += inputs[l].length;
    }
  }

  /**
   * Writes the lag-state equations z<sub>l</sub>' = E<sub>l</sub> xi' + pole(&beta;<sub>l</sub>)
   * z<sub>l</sub> into a state matrix: entry (firstRow + s, rateColumn + j) becomes E<sub>l</sub>
   * [k][j] and the diagonal entry of lag state s = {@link #firstState}(l) + k becomes
   * pole(&beta;<sub>l</sub>).
   *
   * @param a the state matrix. Modified.
   * @param firstRow row (and column) of the first lag state
   * @param rateColumn column of the first coordinate rate xi'
   * @param pole the lag pole (1/s) of a lag root, -(V/b) &beta;
   */
  public void setLagRows(DMatrixRMaj a, int firstRow, int rateColumn, DoubleUnaryOperator pole) {
    int row = firstRow;
    for (int l = 0; l < inputs.length; l++) {
      double p = pole.applyAsDouble(lagRoots[l]);
      for (double[] e : inputs[l]) {
        for (int j = 0; j < size; j++) {
          a.set(row, rateColumn + j, e[j]);
        }
        a.set(row, row, p);
        row++;
      }
    }
  }
}
