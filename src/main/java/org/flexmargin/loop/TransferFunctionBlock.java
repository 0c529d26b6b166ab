package org.flexmargin.loop;

import java.util.Arrays;
import org.flexmargin.model.InvalidInputException;

/**
 * A proper rational SISO transfer function N(s)/D(s), polynomials in descending powers of s
 * ({@code {1, 3, 3}} is s^2 + 3 s + 3). The response is evaluated directly from the polynomials
 * by complex Horner evaluation, independently of the state-space realisation (controllable
 * canonical form, {@link StateSpace#fromTransferFunction}).
 *
 * @param numerator numerator coefficients, descending powers, degree &lt;= denominator degree
 * @param denominator denominator coefficients, descending powers, leading coefficient != 0
 */
public record TransferFunctionBlock(double[] numerator, double[] denominator)
    implements LinearBlock {

  /** Validates and copies. */
  public TransferFunctionBlock {
    if (numerator == null || denominator == null || denominator.length == 0
        || numerator.length == 0 || numerator.length > denominator.length
        || denominator[0] == 0) {
      throw new InvalidInputException("transfer_function", "a proper rational function with a "
          + "non-zero leading denominator coefficient", "numerator "
          + Arrays.toString(numerator) + ", denominator " + Arrays.toString(denominator));
    }
    for (double v : numerator) {
      StateSpace.require(Double.isFinite(v), "transfer_function.numerator", "finite",
          String.valueOf(v));
    }
    for (double v : denominator) {
      StateSpace.require(Double.isFinite(v), "transfer_function.denominator", "finite",
          String.valueOf(v));
    }
    numerator = numerator.clone();
    denominator = denominator.clone();
  }

  @Override
  public double[] numerator() {
    return numerator.clone();
  }

  @Override
  public double[] denominator() {
    return denominator.clone();
  }

  @Override
  public StateSpace stateSpace() {
    return StateSpace.fromTransferFunction(numerator, denominator);
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double nr = 0;
    double ni = 0;
    for (double c : numerator) {
      // (nr + j ni) * (j w) + c
      double t = -ni * omegaRadPerS + c;
      ni = nr * omegaRadPerS;
      nr = t;
    }
    double dr = 0;
    double di = 0;
    for (double c : denominator) {
      double t = -di * omegaRadPerS + c;
      di = dr * omegaRadPerS;
      dr = t;
    }
    double den = dr * dr + di * di;
    reIm[0] = (nr * dr + ni * di) / den;
    reIm[1] = (ni * dr - nr * di) / den;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof TransferFunctionBlock t && Arrays.equals(numerator, t.numerator)
        && Arrays.equals(denominator, t.denominator);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(numerator) + Arrays.hashCode(denominator);
  }

  @Override
  public String toString() {
    return "TransferFunctionBlock[" + Arrays.toString(numerator) + " / "
        + Arrays.toString(denominator) + "]";
  }
}
