package org.flexmargin.model;

import java.util.Arrays;

/**
 * A filter in a feedback path: second-order notch, second-order low-pass, lead-lag, washout,
 * general second-order section, arbitrary transfer function, or a digital filter given by its
 * discrete-time coefficients at the loop's sample period. Frequencies in Hz, time constants in s;
 * continuous filters have unit gain at zero frequency except the washout (zero) and the arbitrary
 * transfer function (as given).
 */
public sealed interface FilterSpec permits NotchFilterSpec, LowPassFilterSpec, FilterSpec.LeadLag,
    FilterSpec.Washout, FilterSpec.SecondOrder, FilterSpec.TransferFunction, FilterSpec.Discrete {

  /**
   * Lead-lag (s/w_z + 1)/(s/w_p + 1), w = 2 pi f: phase lead when the zero is below the pole
   * (e.g. zero 2 Hz, pole 8 Hz: +36.9 deg at 4 Hz, the geometric mean, and +12 dB at high
   * frequency).
   *
   * @param zeroHz zero frequency f_z, Hz (&gt; 0)
   * @param poleHz pole frequency f_p, Hz (&gt; 0)
   */
  record LeadLag(double zeroHz, double poleHz) implements FilterSpec {
    /** Validates. */
    public LeadLag {
      Checks.positive("zero_hz", zeroHz);
      Checks.positive("pole_hz", poleHz);
    }
  }

  /**
   * Washout (high-pass) tau s/(tau s + 1): zero gain at zero frequency, -3 dB at 1/(2 pi tau).
   *
   * @param timeConstantS tau, s (&gt; 0)
   */
  record Washout(double timeConstantS) implements FilterSpec {
    /** Validates. */
    public Washout {
      Checks.positive("time_constant_s", timeConstantS);
    }
  }

  /**
   * General second-order section (s^2/w_n^2 + 2 zeta_n s/w_n + 1)/(s^2/w_d^2 + 2 zeta_d s/w_d + 1),
   * w = 2 pi f: a notch, a skewed notch or a resonance compensator, unit gain at zero frequency.
   *
   * @param numeratorFrequencyHz f_n, Hz (&gt; 0)
   * @param numeratorDampingRatio zeta_n (in [0, 10])
   * @param denominatorFrequencyHz f_d, Hz (&gt; 0)
   * @param denominatorDampingRatio zeta_d (in (0, 10])
   */
  record SecondOrder(double numeratorFrequencyHz, double numeratorDampingRatio, double denominatorFrequencyHz,
      double denominatorDampingRatio) implements FilterSpec {
    /** Validates. */
    public SecondOrder {
      Checks.positive("numerator_frequency_hz", numeratorFrequencyHz);
      Checks.inRange("numerator_damping_ratio", numeratorDampingRatio, 0.0, 10.0);
      Checks.positive("denominator_frequency_hz", denominatorFrequencyHz);
      Checks.inRange("denominator_damping_ratio", denominatorDampingRatio, 1e-6, 10.0);
    }
  }

  /**
   * Arbitrary proper transfer function N(s)/D(s), coefficients in descending powers of s
   * ({@code [1, 3, 3]} is s^2 + 3 s + 3).
   *
   * @param numerator numerator coefficients (finite; no more than the denominator's)
   * @param denominator denominator coefficients (finite; leading one non-zero)
   */
  record TransferFunction(double[] numerator, double[] denominator) implements FilterSpec {
    /** Validates and copies. */
    public TransferFunction {
      numerator = coefficients("numerator", numerator);
      denominator = coefficients("denominator", denominator);
      if (denominator[0] == 0) {
        throw new InvalidInputException("denominator[0]", "a non-zero leading coefficient", "0");
      }
      if (numerator.length > denominator.length) {
        throw new InvalidInputException("numerator", "a proper transfer function: at most " + denominator.length
            + " coefficients", numerator.length + " coefficients");
      }
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
    public boolean equals(Object o) {
      return o instanceof TransferFunction t && Arrays.equals(numerator, t.numerator)
          && Arrays.equals(denominator, t.denominator);
    }

    @Override
    public int hashCode() {
      return 31 * Arrays.hashCode(numerator) + Arrays.hashCode(denominator);
    }

    @Override
    public String toString() {
      return "TransferFunction[" + Arrays.toString(numerator) + " / " + Arrays.toString(denominator) + "]";
    }
  }

  /**
   * Digital filter (b0 + b1 z^-1 + ...)/(a0 + a1 z^-1 + ...) running at the loop's sample period
   * (the loop's {@code sample_period_s} must be &gt; 0); evaluated exactly at z = e^{j w T}.
   *
   * @param numerator b0, b1, ... (finite, at least one)
   * @param denominator a0, a1, ... (finite, a0 != 0)
   */
  record Discrete(double[] numerator, double[] denominator) implements FilterSpec {
    /** Validates and copies. */
    public Discrete {
      numerator = coefficients("numerator", numerator);
      denominator = coefficients("denominator", denominator);
      if (denominator[0] == 0) {
        throw new InvalidInputException("denominator[0]", "a non-zero a0", "0");
      }
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
    public boolean equals(Object o) {
      return o instanceof Discrete t && Arrays.equals(numerator, t.numerator)
          && Arrays.equals(denominator, t.denominator);
    }

    @Override
    public int hashCode() {
      return 31 * Arrays.hashCode(numerator) + Arrays.hashCode(denominator);
    }

    @Override
    public String toString() {
      return "Discrete[" + Arrays.toString(numerator) + " / " + Arrays.toString(denominator) + "]";
    }
  }

  private static double[] coefficients(String path, double[] v) {
    if (v == null || v.length == 0) {
      throw new InvalidInputException(path, "at least one coefficient", v == null ? "nothing" : "an empty list");
    }
    for (int i = 0; i < v.length; i++) {
      Checks.finite(path + "[" + i + "]", v[i]);
    }
    return v.clone();
  }
}
