package org.flexmargin.model;

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
   * @param coefficients numerator and denominator (proper)
   */
  record TransferFunction(Coefficients coefficients) implements FilterSpec {
    /** Validates. */
    public TransferFunction {
      if (coefficients == null) {
        throw new InvalidInputException("transfer_function", "numerator and denominator", "nothing");
      }
      coefficients.proper();
    }
  }

  /**
   * Digital filter (b0 + b1 z^-1 + ...)/(a0 + a1 z^-1 + ...) running at the loop's sample period
   * (the loop's {@code sample_period_s} must be &gt; 0); evaluated exactly at z = e^{j w T}.
   *
   * @param coefficients b0, b1, ... over a0, a1, ... (a0 != 0)
   */
  record Discrete(Coefficients coefficients) implements FilterSpec {
    /** Validates. */
    public Discrete {
      if (coefficients == null) {
        throw new InvalidInputException("discrete", "numerator and denominator", "nothing");
      }
    }
  }
}
