package org.flexmargin.model;

import java.util.List;

/**
 * Generalized aerodynamic forces Q(ik, M) on a grid of Mach numbers and reduced frequencies, with
 * rows for the modes and columns for the modes followed by any control surfaces (F = q_dyn Q x,
 * x the modal coordinates and the control deflections in rad, trailing edge down).
 *
 * <p><b>Interpolation in Mach</b> ({@link #atMach}): between neighbouring tabulated Mach numbers
 * M0 &lt; M &lt; M1 the product beta Q, beta = sqrt(1 - M^2), is interpolated linearly in M and
 * divided by beta(M). For forces that follow the Prandtl-Glauert rule (Q proportional to 1 / beta,
 * as the steady forces of a high-aspect-ratio wing do) this is exact; for others it is a linear
 * interpolation of the smoothly varying beta Q. Outside the tabulated Mach range the nearest
 * table is used unchanged (clamping) and the caller warns ({@link #covers}). Supersonic Mach
 * numbers (beta undefined) are interpolated linearly in Q.
 *
 * <p>Arrays are indexed [mach][k][row][column]; copied in and out.
 *
 * @param referenceSemichordM reference semichord b_ref (m) defining k = omega b_ref / V
 * @param machNumbers tabulated Mach numbers, strictly increasing, in [0, 5]
 * @param reducedFrequencies tabulated k values, strictly increasing, &gt;= 0, at least two
 * @param rowNames the modes (rows), in mode-table order
 * @param columnNames the modes followed by the control surfaces (columns)
 * @param real real parts [mach][k][row][column]
 * @param imag imaginary parts [mach][k][row][column]
 */
public record MachForceTable(
    double referenceSemichordM,
    double[] machNumbers,
    double[] reducedFrequencies,
    List<String> rowNames,
    List<String> columnNames,
    double[][][][] real,
    double[][][][] imag) {
  /** Validates and copies. */
  public MachForceTable {
    Checks.positive("reference_semichord_m", referenceSemichordM);
    machNumbers = increasing("mach_numbers", machNumbers, 1);
    for (int i = 0; i < machNumbers.length; i++) {
      Checks.inRange("mach_numbers[" + i + "]", machNumbers[i], 0, 5);
    }
    reducedFrequencies = increasing("reduced_frequencies", reducedFrequencies, 2);
    for (int i = 0; i < reducedFrequencies.length; i++) {
      Checks.nonNegative("reduced_frequencies[" + i + "]", reducedFrequencies[i]);
    }
    rowNames = Checks.nonEmpty("modes", rowNames);
    columnNames = Checks.nonEmpty("columns", columnNames);
    if (columnNames.size() < rowNames.size() || !columnNames.subList(0, rowNames.size()).equals(rowNames)) {
      throw new InvalidInputException("columns", "the modes " + rowNames + " first, then any control surfaces",
          columnNames.toString());
    }
    real = copy("real", real, machNumbers.length, reducedFrequencies.length, rowNames.size(), columnNames.size());
    imag = copy("imag", imag, machNumbers.length, reducedFrequencies.length, rowNames.size(), columnNames.size());
  }

  private static double[] increasing(String path, double[] v, int min) {
    if (v == null || v.length < min) {
      throw new InvalidInputException(path, "at least " + min + " values", v == null ? "none" : v.length + "");
    }
    for (int i = 0; i < v.length; i++) {
      Checks.finite(path + "[" + i + "]", v[i]);
      if (i > 0 && v[i] <= v[i - 1]) {
        throw new InvalidInputException(path + "[" + i + "]", "strictly increasing values", v[i] + " after " + v[i - 1]);
      }
    }
    return v.clone();
  }

  private static double[][][][] copy(String what, double[][][][] a, int nm, int nk, int rows, int cols) {
    if (a == null || a.length != nm) {
      throw new InvalidInputException(what, nm + " Mach numbers", a == null ? "none" : a.length + "");
    }
    double[][][][] c = new double[nm][nk][rows][];
    for (int m = 0; m < nm; m++) {
      if (a[m] == null || a[m].length != nk) {
        throw new InvalidInputException(what + "[" + m + "]", nk + " reduced frequencies", a[m] == null ? "none" : a[m].length + "");
      }
      for (int k = 0; k < nk; k++) {
        if (a[m][k] == null || a[m][k].length != rows) {
          throw new InvalidInputException(what + "[" + m + "][" + k + "]", rows + " rows", a[m][k] == null ? "none" : a[m][k].length + "");
        }
        for (int r = 0; r < rows; r++) {
          if (a[m][k][r] == null || a[m][k][r].length != cols) {
            throw new InvalidInputException(what + "[" + m + "][" + k + "][" + r + "]", cols + " columns",
                a[m][k][r] == null ? "none" : a[m][k][r].length + "");
          }
          for (int col = 0; col < cols; col++) {
            Checks.finite(what + "[" + m + "][" + k + "][" + r + "][" + col + "]", a[m][k][r][col]);
          }
          c[m][k][r] = a[m][k][r].clone();
        }
      }
    }
    return c;
  }

  /** @return a copy of the Mach numbers */
  @Override
  public double[] machNumbers() {
    return machNumbers.clone();
  }

  /** @return a copy of the reduced frequencies */
  @Override
  public double[] reducedFrequencies() {
    return reducedFrequencies.clone();
  }

  /** @return a deep copy of the real parts */
  @Override
  public double[][][][] real() {
    return copy("real", real, machNumbers.length, reducedFrequencies.length, rowNames.size(), columnNames.size());
  }

  /** @return a deep copy of the imaginary parts */
  @Override
  public double[][][][] imag() {
    return copy("imag", imag, machNumbers.length, reducedFrequencies.length, rowNames.size(), columnNames.size());
  }

  /** @return the real part at Mach index {@code m}, k index {@code k}, row {@code r}, column {@code c} */
  public double realAt(int m, int k, int r, int c) {
    return real[m][k][r][c];
  }

  /** @return the imaginary part at Mach index {@code m}, k index {@code k}, row {@code r}, column {@code c} */
  public double imagAt(int m, int k, int r, int c) {
    return imag[m][k][r][c];
  }

  /** @return the lowest tabulated Mach number */
  public double lowestMach() {
    return machNumbers[0];
  }

  /** @return the highest tabulated Mach number */
  public double highestMach() {
    return machNumbers[machNumbers.length - 1];
  }

  /**
   * @param mach a Mach number
   * @param tolerance accepted distance outside the tabulated range (a single Mach number covers
   *     its own +-tolerance)
   * @return whether {@code mach} lies within the tabulated range widened by {@code tolerance}
   */
  public boolean covers(double mach, double tolerance) {
    return mach >= lowestMach() - tolerance && mach <= highestMach() + tolerance;
  }

  /**
   * The mode-by-mode forces at one Mach number, interpolated as the class comment says.
   *
   * @param mach Mach number; outside the table the nearest table is used unchanged
   * @return a force table over the tabulated reduced frequencies
   */
  public GafTable atMach(double mach) {
    int n = rowNames.size();
    int nk = reducedFrequencies.length;
    double[][][] re = new double[nk][n][n];
    double[][][] im = new double[nk][n][n];
    double[] w = weights(mach);
    for (int m = 0; m < machNumbers.length; m++) {
      if (w[m] == 0) {
        continue;
      }
      for (int k = 0; k < nk; k++) {
        for (int r = 0; r < n; r++) {
          for (int c = 0; c < n; c++) {
            re[k][r][c] += w[m] * real[m][k][r][c];
            im[k][r][c] += w[m] * imag[m][k][r][c];
          }
        }
      }
    }
    double clamped = Math.min(Math.max(mach, lowestMach()), highestMach());
    return new GafTable(referenceSemichordM, clamped, rowNames, reducedFrequencies, re, im);
  }

  /**
   * The real part of one column (a control surface's forces on every mode) at one Mach number and
   * tabulated reduced frequency, interpolated like {@link #atMach}.
   *
   * @param column column index (a control surface: index &gt;= number of modes)
   * @param mach Mach number
   * @param kIndex index of the tabulated reduced frequency
   * @return the real parts, one per mode
   */
  public double[] realColumn(int column, double mach, int kIndex) {
    double[] w = weights(mach);
    double[] out = new double[rowNames.size()];
    for (int m = 0; m < machNumbers.length; m++) {
      for (int r = 0; r < out.length; r++) {
        out[r] += w[m] * real[m][kIndex][r][column];
      }
    }
    return out;
  }

  /**
   * Weights of the tabulated Mach numbers for {@code mach}: beta_i / beta(M) times the linear
   * interpolation weights (subsonic), the plain linear weights when either Mach number is 1 or
   * above, the end table alone outside the range.
   */
  double[] weights(double mach) {
    double[] w = new double[machNumbers.length];
    int last = machNumbers.length - 1;
    if (Double.isNaN(mach)) {
      throw new IllegalArgumentException("Mach number is NaN");
    }
    if (mach <= machNumbers[0]) {
      w[0] = 1;
      return w;
    }
    if (mach >= machNumbers[last]) {
      w[last] = 1;
      return w;
    }
    int i = 0;
    while (machNumbers[i + 1] < mach) {
      i++;
    }
    double m0 = machNumbers[i], m1 = machNumbers[i + 1];
    double t = (mach - m0) / (m1 - m0);
    if (m1 < 1) {
      double beta = Math.sqrt(1 - mach * mach);
      w[i] = (1 - t) * Math.sqrt(1 - m0 * m0) / beta;
      w[i + 1] = t * Math.sqrt(1 - m1 * m1) / beta;
    } else {
      w[i] = 1 - t;
      w[i + 1] = t;
    }
    return w;
  }
}
