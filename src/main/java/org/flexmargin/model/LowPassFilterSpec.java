package org.flexmargin.model;

/**
 * Second-order low-pass w^2 / (s^2 + 2 zeta w s + w^2), w = 2 pi cornerHz (a structural or
 * anti-aliasing filter); zeta = 0.7071 is the Butterworth choice.
 *
 * @param cornerHz corner frequency (Hz)
 * @param dampingRatio zeta (dimensionless)
 */
public record LowPassFilterSpec(double cornerHz, double dampingRatio) implements FilterSpec {
  /** Validates. */
  public LowPassFilterSpec {
    Checks.positive("corner_hz", cornerHz);
    Checks.inRange("damping_ratio", dampingRatio, 1e-3, 10.0);
  }
}
