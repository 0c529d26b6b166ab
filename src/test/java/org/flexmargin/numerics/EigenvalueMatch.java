package org.flexmargin.numerics;

/**
 * Test helper: pairs two lists of complex eigenvalues one to one, greedily by nearest distance
 * (each step takes the closest remaining pair), and reports the largest pair distance. Solvers
 * return eigenvalues in different orders, so lists are compared as sets this way.
 */
final class EigenvalueMatch {
  private EigenvalueMatch() {}

  /**
   * @param re1 real parts of the first list
   * @param im1 imaginary parts of the first list
   * @param re2 real parts of the second list (same length)
   * @param im2 imaginary parts of the second list
   * @return the largest |lambda1 - lambda2| over the greedy pairing
   */
  static double maxDistance(double[] re1, double[] im1, double[] re2, double[] im2) {
    int n = re1.length;
    if (re2.length != n) {
      throw new AssertionError("lists differ in length: " + n + " and " + re2.length);
    }
    boolean[] used1 = new boolean[n];
    boolean[] used2 = new boolean[n];
    double worst = 0;
    for (int step = 0; step < n; step++) {
      double best = Double.POSITIVE_INFINITY;
      int bi = -1;
      int bj = -1;
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n && !used1[i]; j++) {
          double d = Math.hypot(re1[i] - re2[j], im1[i] - im2[j]);
          if (!used2[j] && (bi < 0 || d < best)) {
            best = d;
            bi = i;
            bj = j;
          }
        }
      }
      used1[bi] = true;
      used2[bj] = true;
      worst = Math.max(worst, best);
    }
    return worst;
  }

  /**
   * @param r our result
   * @param re expected real parts
   * @param im expected imaginary parts
   * @return the largest distance between our eigenvalues and the expected ones
   */
  static double maxDistance(RealEigenvaluesResult r, double[] re, double[] im) {
    return maxDistance(r.real(), r.imag(), re, im);
  }
}
