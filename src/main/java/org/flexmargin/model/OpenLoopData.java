package org.flexmargin.model;

import java.util.Arrays;

/**
 * The broken loop L of a loop file, negative-feedback convention (closed loop 1/(1 + L)), in one
 * of four forms. Delay and sample-and-hold are not part of it ({@link LoopFile}).
 */
public sealed interface OpenLoopData {

  /** @return the form's key in the loop file, e.g. "transfer_function" */
  String key();

  /**
   * L(s) = N(s)/D(s), descending powers of s ({@code [1, 3, 3]} is s^2 + 3 s + 3).
   *
   * @param coefficients numerator and denominator (proper)
   */
  record TransferFunction(Coefficients coefficients) implements OpenLoopData {
    /** Validates. */
    public TransferFunction {
      if (coefficients == null) {
        throw new InvalidInputException("transfer_function", "numerator and denominator", "nothing");
      }
      coefficients.proper();
    }

    @Override
    public String key() {
      return "transfer_function";
    }
  }

  /**
   * L(s) = k prod(s - z_i) / prod(s - p_j), roots in rad/s. A complex root is given once, with
   * its imaginary part &gt; 0, and stands for the conjugate pair re +- j im (so that L is real).
   * The degree counts a pair twice.
   *
   * @param zerosReal real parts of the zeros, rad/s
   * @param zerosImag imaginary parts of the zeros, rad/s
   * @param polesReal real parts of the poles, rad/s
   * @param polesImag imaginary parts of the poles, rad/s (at least as many poles as zeros)
   * @param gain k (finite, non-zero)
   */
  record ZerosPolesGain(double[] zerosReal, double[] zerosImag, double[] polesReal, double[] polesImag,
      double gain) implements OpenLoopData {
    /** Validates and copies. */
    public ZerosPolesGain {
      zerosReal = finite("zeros", zerosReal);
      zerosImag = finite("zeros", zerosImag);
      polesReal = finite("poles", polesReal);
      polesImag = finite("poles", polesImag);
      if (zerosReal.length != zerosImag.length || polesReal.length != polesImag.length) {
        throw new InvalidInputException("zeros_poles_gain", "a real and an imaginary part for every root",
            "parts of different lengths");
      }
      int nz = degree("zeros", zerosImag);
      int np = degree("poles", polesImag);
      if (nz > np) {
        throw new InvalidInputException("zeros", "at most as many zeros as poles (" + np + ", a pair counting "
            + "twice)", nz + " zeros");
      }
      Checks.finite("gain", gain);
      if (gain == 0) {
        throw new InvalidInputException("gain", "a non-zero gain", "0");
      }
    }

    @Override
    public double[] zerosReal() {
      return zerosReal.clone();
    }

    @Override
    public double[] zerosImag() {
      return zerosImag.clone();
    }

    @Override
    public double[] polesReal() {
      return polesReal.clone();
    }

    @Override
    public double[] polesImag() {
      return polesImag.clone();
    }

    @Override
    public String key() {
      return "zeros_poles_gain";
    }

    @Override
    public boolean equals(Object o) {
      return o instanceof ZerosPolesGain z && Arrays.equals(zerosReal, z.zerosReal)
          && Arrays.equals(zerosImag, z.zerosImag) && Arrays.equals(polesReal, z.polesReal)
          && Arrays.equals(polesImag, z.polesImag) && gain == z.gain;
    }

    @Override
    public int hashCode() {
      return Arrays.hashCode(polesReal) + 31 * Double.hashCode(gain);
    }

    @Override
    public String toString() {
      return "ZerosPolesGain[" + zerosReal.length + " zeros, " + polesReal.length + " poles, k = " + gain + "]";
    }
  }

  /**
   * L(s) = C (s I - A)^-1 B + D, one input and one output.
   *
   * @param a n x n state matrix (rows), 1/s (n &gt;= 1)
   * @param b n x 1 input matrix
   * @param c 1 x n output matrix
   * @param d feed-through
   */
  record StateSpaceModel(double[][] a, double[] b, double[] c, double d) implements OpenLoopData {
    /** Validates and copies. */
    public StateSpaceModel {
      if (a == null || a.length == 0) {
        throw new InvalidInputException("a", "a square state matrix with at least one row", "nothing");
      }
      int n = a.length;
      double[][] copy = new double[n][];
      for (int i = 0; i < n; i++) {
        if (a[i] == null || a[i].length != n) {
          throw new InvalidInputException("a[" + i + "]", n + " entries (a square matrix)",
              a[i] == null ? "nothing" : a[i].length + " entries");
        }
        copy[i] = finite("a[" + i + "]", a[i]);
      }
      a = copy;
      b = finite("b", b);
      c = finite("c", c);
      if (b.length != n) {
        throw new InvalidInputException("b", n + " entries (one per state)", b.length + " entries");
      }
      if (c.length != n) {
        throw new InvalidInputException("c", n + " entries (one per state)", c.length + " entries");
      }
      Checks.finite("d", d);
    }

    @Override
    public double[][] a() {
      double[][] out = new double[a.length][];
      for (int i = 0; i < a.length; i++) {
        out[i] = a[i].clone();
      }
      return out;
    }

    @Override
    public double[] b() {
      return b.clone();
    }

    @Override
    public double[] c() {
      return c.clone();
    }

    @Override
    public String key() {
      return "state_space";
    }

    @Override
    public boolean equals(Object o) {
      return o instanceof StateSpaceModel s && Arrays.deepEquals(a, s.a) && Arrays.equals(b, s.b)
          && Arrays.equals(c, s.c) && d == s.d;
    }

    @Override
    public int hashCode() {
      return Arrays.deepHashCode(a) + 31 * Arrays.hashCode(b);
    }

    @Override
    public String toString() {
      return "StateSpaceModel[" + a.length + " states]";
    }
  }

  /**
   * A measured frequency response.
   *
   * @param table the table
   */
  record Measured(MeasuredTable table) implements OpenLoopData {
    /** Validates. */
    public Measured {
      if (table == null) {
        throw new InvalidInputException("measured_response", "a measured response table", "nothing");
      }
    }

    @Override
    public String key() {
      return "measured_response";
    }
  }

  private static int degree(String path, double[] imag) {
    int n = 0;
    for (int i = 0; i < imag.length; i++) {
      if (imag[i] < 0) {
        throw new InvalidInputException(path + "[" + i + "]", "a root with imaginary part >= 0 (a complex pair "
            + "re +- j im is given once, as [re, im] with im > 0)", "imaginary part " + imag[i]);
      }
      n += imag[i] == 0 ? 1 : 2;
    }
    return n;
  }

  private static double[] finite(String path, double[] v) {
    if (v == null) {
      throw new InvalidInputException(path, "a list of numbers", "nothing");
    }
    for (int i = 0; i < v.length; i++) {
      Checks.finite(path + "[" + i + "]", v[i]);
    }
    return v.clone();
  }
}
