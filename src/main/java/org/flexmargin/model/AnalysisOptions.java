package org.flexmargin.model;

/**
 * Numerical and reporting options of an open-loop analysis.
 *
 * @param method flutter solution method
 * @param dampingLimitG minimum total damping, as structural damping g (dimensionless, g ~ 2 zeta);
 *     its crossings are reported beside the zero-damping flutter onsets. 0.03 is the common
 *     requirement recalled from MIL-A-8870C.
 * @param convergenceTolerance relative tolerance on roots and on the reduced-frequency match
 * @param maxIterations iteration budget per root and speed
 * @param onsetSpeedToleranceMps absolute tolerance on refined onset speeds (m/s, along the path)
 * @param kMethodMinReducedFrequency lowest reduced frequency of the k-method grid
 * @param kMethodMaxReducedFrequency highest reduced frequency of the k-method grid
 * @param kMethodPoints number of k-method grid points (log-spaced)
 * @param rationalFit how the aerodynamic forces are approximated wherever a state-space model needs
 *     them (the case file's {@code rational_fit} section; {@link RationalFitSettings#defaults()}
 *     without one)
 */
public record AnalysisOptions(
    FlutterMethodKind method,
    double dampingLimitG,
    double convergenceTolerance,
    int maxIterations,
    double onsetSpeedToleranceMps,
    double kMethodMinReducedFrequency,
    double kMethodMaxReducedFrequency,
    int kMethodPoints,
    RationalFitSettings rationalFit) {
  /** Validates. */
  public AnalysisOptions {
    if (method == null) {
      throw new InvalidInputException("method", "pk, k or state_space", "nothing");
    }
    Checks.positiveDamping("damping_limit_g", dampingLimitG);
    Checks.inRange("convergence_tolerance", convergenceTolerance, 1e-14, 1e-3);
    Checks.atLeast("max_iterations", maxIterations, 5);
    Checks.positive("onset_speed_tolerance_mps", onsetSpeedToleranceMps);
    Checks.positive("k_method_min_reduced_frequency", kMethodMinReducedFrequency);
    if (!(kMethodMaxReducedFrequency > kMethodMinReducedFrequency)) {
      throw new InvalidInputException(
          "k_method_max_reduced_frequency",
          "a value above k_method_min_reduced_frequency = " + kMethodMinReducedFrequency,
          String.valueOf(kMethodMaxReducedFrequency));
    }
    Checks.atLeast("k_method_points", kMethodPoints, 10);
    if (rationalFit == null) {
      throw new InvalidInputException("rational_fit", "rational-fit settings", "nothing");
    }
  }

  /** Options with the default rational-fit settings. */
  public AnalysisOptions(FlutterMethodKind method, double dampingLimitG, double convergenceTolerance,
      int maxIterations, double onsetSpeedToleranceMps, double kMethodMinReducedFrequency,
      double kMethodMaxReducedFrequency, int kMethodPoints) {
    this(method, dampingLimitG, convergenceTolerance, maxIterations, onsetSpeedToleranceMps,
        kMethodMinReducedFrequency, kMethodMaxReducedFrequency, kMethodPoints, RationalFitSettings.defaults());
  }

  /** @return the defaults: p-k, g limit 0.03, tolerance 1e-9, 60 iterations, 0.01 m/s */
  public static AnalysisOptions defaults() {
    return new AnalysisOptions(FlutterMethodKind.PK, 0.03, 1e-9, 60, 0.01, 0.005, 5.0, 400);
  }

  /** @return a copy with another method */
  public AnalysisOptions withMethod(FlutterMethodKind m) {
    return new AnalysisOptions(
        m, dampingLimitG, convergenceTolerance, maxIterations, onsetSpeedToleranceMps,
        kMethodMinReducedFrequency, kMethodMaxReducedFrequency, kMethodPoints, rationalFit);
  }

  /** @return a copy with other rational-fit settings */
  public AnalysisOptions withRationalFit(RationalFitSettings settings) {
    return new AnalysisOptions(
        method, dampingLimitG, convergenceTolerance, maxIterations, onsetSpeedToleranceMps,
        kMethodMinReducedFrequency, kMethodMaxReducedFrequency, kMethodPoints, settings);
  }
}
