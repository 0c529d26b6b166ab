package org.flexmargin.model;

import java.util.List;

/**
 * A table of generalized aerodynamic forces Q(ik) from the user's own panel-method runs, at listed
 * reduced frequencies, for one Mach number. Generalized force = q_dyn * Q(ik) * xi, so Q has units
 * of force (or moment) per unit generalized coordinate per pascal (m^2 per unit coordinate).
 *
 * <p>Rows and columns are both ordered as {@code modeNames}; they must match the mode table.
 * Arrays are indexed {@code [kIndex][row][column]}; they are copied in and out.
 *
 * @param referenceSemichordM reference semichord b_ref (m) used for k = omega b_ref / V
 * @param machNumber Mach number the table was computed at (dimensionless)
 * @param modeNames row/column coordinate names, in order
 * @param reducedFrequencies k values, strictly increasing, &gt;= 0
 * @param real real parts, [k][row][col]
 * @param imag imaginary parts, [k][row][col]
 */
public record GafTable(
    double referenceSemichordM,
    double machNumber,
    List<String> modeNames,
    double[] reducedFrequencies,
    double[][][] real,
    double[][][] imag)
    implements AeroSpec {
  /** Validates and copies. */
  public GafTable {
    Checks.positive("reference_semichord_m", referenceSemichordM);
    Checks.inRange("mach", machNumber, 0.0, 5.0);
    modeNames = Checks.nonEmpty("modes", modeNames);
    if (reducedFrequencies == null || reducedFrequencies.length < 2) {
      throw new InvalidInputException(
          "reduced_frequencies",
          "at least two reduced frequencies",
          reducedFrequencies == null ? "none" : String.valueOf(reducedFrequencies.length));
    }
    for (int i = 0; i < reducedFrequencies.length; i++) {
      Checks.nonNegative("reduced_frequencies[" + i + "]", reducedFrequencies[i]);
      if (i > 0 && reducedFrequencies[i] <= reducedFrequencies[i - 1]) {
        throw new InvalidInputException(
            "reduced_frequencies[" + i + "]",
            "strictly increasing values (no duplicates)",
            reducedFrequencies[i] + " after " + reducedFrequencies[i - 1]);
      }
    }
    int n = modeNames.size();
    real = copy3("real", real, reducedFrequencies.length, n);
    imag = copy3("imag", imag, reducedFrequencies.length, n);
    reducedFrequencies = reducedFrequencies.clone();
  }

  private static double[][][] copy3(String what, double[][][] a, int nk, int n) {
    if (a == null || a.length != nk) {
      throw new InvalidInputException(
          what, nk + " matrices (one per reduced frequency)", a == null ? "none" : a.length + "");
    }
    double[][][] c = new double[nk][n][];
    for (int k = 0; k < nk; k++) {
      if (a[k] == null || a[k].length != n) {
        throw new InvalidInputException(
            what + "[" + k + "]", n + " rows", a[k] == null ? "none" : a[k].length + " rows");
      }
      for (int r = 0; r < n; r++) {
        if (a[k][r] == null || a[k][r].length != n) {
          throw new InvalidInputException(
              what + "[" + k + "][" + r + "]",
              n + " columns",
              a[k][r] == null ? "none" : a[k][r].length + " columns");
        }
        for (int col = 0; col < n; col++) {
          Checks.finite(what + "[" + k + "][" + r + "][" + col + "]", a[k][r][col]);
        }
        c[k][r] = a[k][r].clone();
      }
    }
    return c;
  }

  /** @return a copy of the reduced frequencies */
  @Override
  public double[] reducedFrequencies() {
    return reducedFrequencies.clone();
  }

  /** @return the real part at table index {@code kIndex}, row {@code r}, column {@code c} */
  public double realAt(int kIndex, int r, int c) {
    return real[kIndex][r][c];
  }

  /** @return the imaginary part at table index {@code kIndex}, row {@code r}, column {@code c} */
  public double imagAt(int kIndex, int r, int c) {
    return imag[kIndex][r][c];
  }

  /** @return a deep copy of the real parts */
  @Override
  public double[][][] real() {
    return deepCopy(real);
  }

  /** @return a deep copy of the imaginary parts */
  @Override
  public double[][][] imag() {
    return deepCopy(imag);
  }

  /** @return number of tabulated reduced frequencies */
  public int count() {
    return reducedFrequencies.length;
  }

  /** @return the tabulated reduced frequency at {@code i} */
  public double reducedFrequencyAt(int i) {
    return reducedFrequencies[i];
  }

  private static double[][][] deepCopy(double[][][] a) {
    double[][][] c = new double[a.length][][];
    for (int k = 0; k < a.length; k++) {
      c[k] = new double[a[k].length][];
      for (int r = 0; r < a[k].length; r++) {
        c[k][r] = a[k][r].clone();
      }
    }
    return c;
  }
}
