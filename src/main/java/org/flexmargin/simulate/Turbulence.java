package org.flexmargin.simulate;

import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.InvalidInputException;

/**
 * Continuous vertical turbulence of a given spectrum, intensity and scale length, seen by an
 * aircraft flying through it at a true airspeed (frozen field: omega = V Omega). Immutable.
 *
 * @param spectrum spectral form
 * @param sigmaMps RMS vertical gust velocity sigma (m/s), &gt; 0
 * @param scaleLengthM scale length L (m), &gt; 0 (MIL-F-8785C: 1750 ft = 533.4 m above 2000 ft)
 */
public record Turbulence(TurbulenceSpectrum spectrum, double sigmaMps, double scaleLengthM) {
  /** Validates. */
  public Turbulence {
    if (spectrum == null) {
      throw new InvalidInputException("turbulence.spectrum", "dryden or von_karman", "nothing");
    }
    if (!(sigmaMps > 0) || !Double.isFinite(sigmaMps)) {
      throw new InvalidInputException("turbulence.sigma_mps", "a finite value > 0", String.valueOf(sigmaMps));
    }
    if (!(scaleLengthM > 0) || !Double.isFinite(scaleLengthM)) {
      throw new InvalidInputException("turbulence.scale_length_m", "a finite value > 0",
          String.valueOf(scaleLengthM));
    }
  }

  /**
   * @param omegaRadPerS temporal frequency omega (rad/s)
   * @param speedTasMps V (m/s)
   * @return one-sided temporal density Phi(omega / V) / V ((m/s)^2 per rad/s)
   */
  public double temporalDensity(double omegaRadPerS, double speedTasMps) {
    return spectrum.spatialDensity(omegaRadPerS / speedTasMps, sigmaMps, scaleLengthM) / speedTasMps;
  }

  /**
   * The shaping filter from unit-intensity white noise n (E[n(t) n(t + s)] = delta(s)) to the
   * gust velocity: |H(j omega)|^2 = pi Phi(omega), so that (1/pi) int_0^inf |H|^2 d omega is the
   * variance.
   *
   * @param speedTasMps V (m/s), &gt; 0
   * @return the filter, input {@code white_noise}, output {@code gust_velocity_mps}
   */
  public StateSpace shapingFilter(double speedTasMps) {
    double tau = scaleLengthM / speedTasMps;
    double gain = sigmaMps * Math.sqrt(tau);
    double[] num = spectrum.filterNumerator();
    double[] den = spectrum.filterDenominator();
    // descending powers of s for fromTransferFunction
    double[] n = new double[num.length];
    double[] d = new double[den.length];
    for (int i = 0; i < num.length; i++) {
      n[num.length - 1 - i] = gain * num[i] * Math.pow(tau, i);
    }
    for (int i = 0; i < den.length; i++) {
      d[den.length - 1 - i] = den[i] * Math.pow(tau, i);
    }
    StateSpace raw = StateSpace.fromTransferFunction(n, d);
    return new StateSpace(raw.a(), raw.b(), raw.c(), raw.d(), java.util.List.of("white_noise"),
        java.util.List.of(AircraftSimulationModel.GUST_INPUT), raw.stateNames());
  }
}
