package org.flexmargin.structure;

/**
 * Legendre polynomials shifted to [0, 1], P_n(2 u - 1), with their first and second derivatives
 * in u, by Bonnet's recurrence (n + 1) P_{n+1}(z) = (2n + 1) z P_n - n P_{n-1} and its
 * z-derivatives (2n + 1)(P_n + z P_n') and (2n + 1)(2 P_n' + z P_n''); d/du = 2 d/dz.
 */
final class ShiftedLegendre {
  private ShiftedLegendre() {}

  /**
   * @param u argument in [0, 1]
   * @param count polynomials P_0 .. P_{count-1}, count &gt;= 1
   * @return {values, first derivatives, second derivatives} in u, each of length count
   */
  static double[][] evaluate(double u, int count) {
    double z = 2 * u - 1;
    double[] p = new double[count], d1 = new double[count], d2 = new double[count];
    p[0] = 1;
    if (count > 1) {
      p[1] = z;
      d1[1] = 1;
    }
    for (int n = 1; n + 1 < count; n++) {
      p[n + 1] = ((2 * n + 1) * z * p[n] - n * p[n - 1]) / (n + 1);
      d1[n + 1] = ((2 * n + 1) * (p[n] + z * d1[n]) - n * d1[n - 1]) / (n + 1);
      d2[n + 1] = ((2 * n + 1) * (2 * d1[n] + z * d2[n]) - n * d2[n - 1]) / (n + 1);
    }
    for (int n = 0; n < count; n++) {
      d1[n] *= 2;
      d2[n] *= 4;
    }
    return new double[][] {p, d1, d2};
  }
}
