package org.flexmargin.simulate;

/**
 * Spectral form of continuous vertical turbulence, as published in MIL-F-8785C (1980), sec.
 * 3.7.2, and MIL-HDBK-1797 (1997), with Omega the spatial frequency (rad/m), sigma the RMS gust
 * velocity and L the scale length; one-sided spectra whose integral over 0 &lt;= Omega &lt;
 * infinity is sigma^2.
 *
 * <p>Example: at V = 100 m/s, L = 533 m, sigma = 1 m/s, both spectra start at sigma^2 L / pi =
 * 170 m^3/s^2 per rad; the Dryden spectrum falls as Omega^-2 and the von Karman spectrum as
 * Omega^-5/3 above about 1/L.
 */
public enum TurbulenceSpectrum {
  /**
   * Dryden: Phi_w(Omega) = sigma^2 (L / pi) (1 + 3 (L Omega)^2) / (1 + (L Omega)^2)^2. Rational,
   * so its shaping filter is exact: H(s) = sigma sqrt(L / V) (1 + sqrt(3) tau s) / (1 + tau s)^2,
   * tau = L / V, for unit-intensity white noise.
   */
  DRYDEN,
  /**
   * von Karman: Phi_w(Omega) = sigma^2 (L / pi) (1 + (8/3) (1.339 L Omega)^2) / (1 + (1.339 L
   * Omega)^2)^(11/6). Irrational; realised by the third-order filter H(s) = sigma sqrt(L / V) (1 +
   * 2.7478 tau s + 0.3398 (tau s)^2) / (1 + 2.9958 tau s + 1.9754 (tau s)^2 + 0.1539 (tau s)^3),
   * tau = L / V (coefficients from memory of the flight-simulation literature; checked against the
   * spectrum in the tests: within 0.2 dB up to omega tau = 10, 96 % of the variance).
   */
  VON_KARMAN;

  /** von Karman constant a = 1.339 (MIL-F-8785C). */
  static final double VON_KARMAN_A = 1.339;

  /**
   * @param spatialFrequencyRadPerM Omega (rad/m), &gt;= 0
   * @param sigmaMps RMS gust velocity sigma (m/s)
   * @param scaleLengthM L (m)
   * @return one-sided spatial power spectral density ((m/s)^2 per rad/m)
   */
  public double spatialDensity(double spatialFrequencyRadPerM, double sigmaMps, double scaleLengthM) {
    double lo = scaleLengthM * spatialFrequencyRadPerM;
    double base = sigmaMps * sigmaMps * scaleLengthM / Math.PI;
    if (this == DRYDEN) {
      double d = 1 + lo * lo;
      return base * (1 + 3 * lo * lo) / (d * d);
    }
    double x = VON_KARMAN_A * lo;
    return base * (1 + 8.0 / 3.0 * x * x) / Math.pow(1 + x * x, 11.0 / 6.0);
  }

  /** @return numerator coefficients of the filter in powers of (tau s), ascending */
  double[] filterNumerator() {
    return this == DRYDEN ? new double[] {1, Math.sqrt(3)} : new double[] {1, 2.7478, 0.3398};
  }

  /** @return denominator coefficients of the filter in powers of (tau s), ascending */
  double[] filterDenominator() {
    return this == DRYDEN ? new double[] {1, 2, 1} : new double[] {1, 2.9958, 1.9754, 0.1539};
  }
}
