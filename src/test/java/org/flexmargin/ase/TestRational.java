package org.flexmargin.ase;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.AeroSource;

/**
 * Aerodynamics that are exactly of Roger's form: usable both as the exact source (frequency
 * domain) and as the rational model (state space), so the two faces of the plant must agree.
 */
final class TestRational implements RationalAerodynamics, AeroSource {
  private final double b;
  private final double[] betas;
  private final DMatrixRMaj[] terms;

  TestRational(double b, double[] betas, DMatrixRMaj... terms) {
    this.b = b;
    this.betas = betas.clone();
    this.terms = terms.clone();
  }

  @Override
  public int size() {
    return terms[0].numRows;
  }

  @Override
  public double referenceSemichordM() {
    return b;
  }

  @Override
  public int lagCount() {
    return betas.length;
  }

  @Override
  public double lagRoot(int l) {
    return betas[l];
  }

  @Override
  public DMatrixRMaj coefficient(int index) {
    return terms[index].copy();
  }

  @Override
  public double minReducedFrequency() {
    return 0;
  }

  @Override
  public double maxReducedFrequency() {
    return Double.POSITIVE_INFINITY;
  }

  @Override
  public void forces(double k, ZMatrixRMaj out) {
    int n = size();
    out.reshape(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        // A0 + A1 ik - A2 k^2 + sum A_l ik/(ik + beta)
        double re = terms[0].get(i, j) - terms[2].get(i, j) * k * k;
        double im = terms[1].get(i, j) * k;
        for (int l = 0; l < betas.length; l++) {
          double beta = betas[l];
          double den = k * k + beta * beta;
          // ik/(ik+beta) = ik (beta - ik)/den = (k^2 + i k beta)/den
          re += terms[3 + l].get(i, j) * k * k / den;
          im += terms[3 + l].get(i, j) * k * beta / den;
        }
        out.set(i, j, re, im);
      }
    }
  }

  @Override
  public String description() {
    return "test rational forces";
  }
}
