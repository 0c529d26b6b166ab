package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.special.Gamma;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.loop.FrequencyResponse;
import org.flexmargin.loop.StateSpace;
import org.junit.jupiter.api.Test;

/**
 * Turbulence spectra and shaping filters against MIL-F-8785C / MIL-HDBK-1797 spectra, Commons
 * Math quadrature and closed forms; simulated RMS against its exact value.
 */
class TurbulenceTest {
  private static final double V = 120.0;
  private static final double SIGMA = 2.0;
  /** MIL-F-8785C scale length above 2000 ft: 1750 ft (from memory). */
  private static final double L = 1750 * 0.3048;

  /**
   * int_0^inf f(Omega) dOmega by Commons Math's 40-point Gauss-Legendre rule on Omega = e^u / scale, u from -30 to
   * 40 in unit pieces (the neglected ends are below 1e-9 of the total for tails as slow as
   * Omega^-5/3).
   */
  private static double integrate(java.util.function.DoubleUnaryOperator f, double scale) {
    GaussIntegratorFactory factory = new GaussIntegratorFactory();
    double sum = 0;
    for (int u = -30; u < 40; u++) {
      sum += factory.legendre(40, u, u + 1).integrate(x -> {
        double om = Math.exp(x) / scale;
        return f.applyAsDouble(om) * om;
      });
    }
    return sum;
  }

  @Test
  void bothSpectraIntegrateToTheStatedVariance() {
    // MIL-F-8785C, sec. 3.7.2.1: the one-sided spectra integrate to sigma^2 over 0 <= Omega < inf.
    // Quadrature by Commons Math. Dryden: exactly. Von Karman: with a = 1.339 (a rounded
    // constant) the closed form is (1/(pi a)) [sqrt(pi) G(4/3) / (2 G(11/6)) + (4/3) G(3/2) G(1/3)
    // / G(11/6)] = 0.99993 (derived from the beta integrals); tolerance 1e-8 for the quadrature.
    for (TurbulenceSpectrum s : TurbulenceSpectrum.values()) {
      double var = integrate(om -> s.spatialDensity(om, SIGMA, L), 1 / L);
      double expected = SIGMA * SIGMA;
      if (s == TurbulenceSpectrum.VON_KARMAN) {
        double a = 1.339;
        double g116 = Math.exp(Gamma.logGamma(11.0 / 6.0));
        double closed = (Math.sqrt(Math.PI) * Math.exp(Gamma.logGamma(4.0 / 3.0)) / (2 * g116)
            + 4.0 / 3.0 * Math.exp(Gamma.logGamma(1.5)) * Math.exp(Gamma.logGamma(1.0 / 3.0)) / g116) / (Math.PI * a);
        assertEquals(1.0, closed, 2e-4);
        expected *= closed;
      }
      assertEquals(expected, var, 1e-8 * expected, s.name());
    }
  }

  @Test
  void drydenFilterReproducesTheSpectrumAndItsVarianceExactly() {
    Turbulence t = new Turbulence(TurbulenceSpectrum.DRYDEN, SIGMA, L);
    StateSpace h = t.shapingFilter(V);
    double[] w = {0.001, 0.05, V / L, 1, 10, 100};
    FrequencyResponse r = h.frequencyResponse(w);
    for (int k = 0; k < w.length; k++) {
      double mag2 = r.real(k, 0, 0) * r.real(k, 0, 0) + r.imag(k, 0, 0) * r.imag(k, 0, 0);
      // |H|^2 = pi Phi(omega) for unit-intensity noise: exact for the rational Dryden form
      assertEquals(Math.PI * t.temporalDensity(w[k], V), mag2, 1e-12 * mag2, "omega " + w[k]);
    }
    // Lyapunov variance of the filter output = sigma^2 (closed form: the spectrum's integral)
    assertEquals(SIGMA * SIGMA, outputVariance(h), 1e-9);
  }

  @Test
  void vonKarmanFilterFollowsTheSpectrumWithinItsStatedAccuracy() {
    Turbulence t = new Turbulence(TurbulenceSpectrum.VON_KARMAN, SIGMA, L);
    StateSpace h = t.shapingFilter(V);
    double tau = L / V;
    double worstDb = 0;
    for (double wt = 0.01; wt <= 10; wt *= 1.2) {
      FrequencyResponse r = h.frequencyResponse(new double[] {wt / tau});
      double mag2 = r.real(0, 0, 0) * r.real(0, 0, 0) + r.imag(0, 0, 0) * r.imag(0, 0, 0);
      worstDb = Math.max(worstDb, Math.abs(10 * Math.log10(mag2 / (Math.PI * t.temporalDensity(wt / tau, V)))));
    }
    // stated accuracy of the third-order approximation: 0.2 dB up to omega tau = 10 (measured 0.11)
    assertTrue(worstDb < 0.2, "worst deviation " + worstDb + " dB");
    // its variance: Lyapunov against Commons Math quadrature of |H|^2 / pi (independent routes)
    double lyap = outputVariance(h);
    double quad = integrate(om -> {
      FrequencyResponse r = h.frequencyResponse(new double[] {om});
      return (r.real(0, 0, 0) * r.real(0, 0, 0) + r.imag(0, 0, 0) * r.imag(0, 0, 0)) / Math.PI;
    }, tau);
    assertEquals(quad, lyap, 1e-7 * quad);
    // the filter misses the -5/3 tail: 96.2 % of sigma^2 (derived by the same quadrature)
    assertEquals(0.962, lyap / (SIGMA * SIGMA), 0.002);
  }

  @Test
  void lyapunovMatchesTheClosedFormOfAFirstOrderLag() {
    // a / (s + a) driven by unit-intensity white noise: variance a / 2 (closed form,
    // (1/2pi) int a^2 / (w^2 + a^2) dw)
    double a = 37.0;
    StateSpace g = StateSpace.fromTransferFunction(new double[] {a}, new double[] {1, a});
    assertEquals(a / 2, outputVariance(g), 1e-10 * a);
  }

  @Test
  void simulatedRmsLiesInItsConfidenceInterval() {
    // The simulated RMS is a statistic; it must fall within 3 standard errors of the exact value
    // (99.7 % for a normal estimate: the seed is fixed, so the test is deterministic, and a
    // wrong noise scaling (e.g. a factor sqrt(2) or sqrt(pi)) would put it 30-80 errors off).
    Turbulence t = new Turbulence(TurbulenceSpectrum.DRYDEN, SIGMA, L);
    StateSpace h = t.shapingFilter(V);
    RandomResponse.Result r = RandomResponse.run(h, 0, 0.02, 40_000, 20261202L);
    double se = r.meanSquareStandardError()[0];
    double exactMs = r.exactRms()[0] * r.exactRms()[0];
    double simMs = r.simulatedRms()[0] * r.simulatedRms()[0];
    assertEquals(SIGMA, r.exactRms()[0], 1e-6);
    assertTrue(Math.abs(simMs - exactMs) < 3 * se, "mean square " + simMs + " vs " + exactMs + ", se " + se);
    assertTrue(se < 0.1 * exactMs, "record long enough for a useful interval: se " + se);
  }

  private static double outputVariance(StateSpace h) {
    DMatrixRMaj b = h.b();
    DMatrixRMaj bbt = new DMatrixRMaj(b.numRows, b.numRows);
    CommonOps_DDRM.multTransB(b, b, bbt);
    DMatrixRMaj p = StationaryCovariance.of(h.a(), bbt, 0.05).covariance();
    DMatrixRMaj cp = new DMatrixRMaj(1, p.numCols);
    CommonOps_DDRM.mult(h.c(), p, cp);
    DMatrixRMaj v = new DMatrixRMaj(1, 1);
    CommonOps_DDRM.multTransB(cp, h.c(), v);
    return v.get(0, 0);
  }
}
