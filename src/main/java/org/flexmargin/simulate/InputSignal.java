package org.flexmargin.simulate;

import java.util.Locale;
import org.flexmargin.model.InvalidInputException;

/**
 * A deterministic input history u(t), zero before its start. Pilot inputs are in the unit of the
 * channel they drive (the elevator command in rad for the aircraft); gusts are vertical gust
 * velocities in m/s, positive up. Implementations are immutable records validated on
 * construction.
 */
public sealed interface InputSignal {
  /**
   * @param timeS time (s)
   * @return the input at that time
   */
  double value(double timeS);

  /** @return the time after which the input stays at its final value (s) */
  double endS();

  /** @return a one-line description with units, for results */
  String describe();

  /** @return a short identifier for file and column names */
  String id();

  /**
   * Step of the given amplitude from the start time on.
   *
   * @param amplitude height of the step (unit of the channel)
   * @param startS start (s), &gt;= 0
   */
  record Step(double amplitude, double startS) implements InputSignal {
    /** Validates. */
    public Step {
      finite("step.amplitude", amplitude);
      nonNegative("step.start_s", startS);
    }

    @Override
    public double value(double timeS) {
      return timeS >= startS ? amplitude : 0.0;
    }

    @Override
    public double endS() {
      return startS;
    }

    @Override
    public String describe() {
      return String.format(Locale.ROOT, "step of %.4g from %.3g s", amplitude, startS);
    }

    @Override
    public String id() {
      return "step";
    }
  }

  /**
   * Doublet: +amplitude for one pulse width, then -amplitude for one pulse width, then zero.
   *
   * @param amplitude pulse height (unit of the channel)
   * @param startS start (s), &gt;= 0
   * @param pulseWidthS width of each of the two pulses (s), &gt; 0
   */
  record Doublet(double amplitude, double startS, double pulseWidthS) implements InputSignal {
    /** Validates. */
    public Doublet {
      finite("doublet.amplitude", amplitude);
      nonNegative("doublet.start_s", startS);
      positive("doublet.pulse_width_s", pulseWidthS);
    }

    @Override
    public double value(double timeS) {
      return pulses(timeS - startS, pulseWidthS, amplitude, 1, -1);
    }

    @Override
    public double endS() {
      return startS + 2 * pulseWidthS;
    }

    @Override
    public String describe() {
      return String.format(Locale.ROOT, "doublet of %.4g, pulses of %.3g s from %.3g s", amplitude, pulseWidthS,
          startS);
    }

    @Override
    public String id() {
      return "doublet";
    }
  }

  /**
   * The 3-2-1-1 multistep: +amplitude for 3 units, -amplitude for 2, +amplitude for 1,
   * -amplitude for 1, then zero (Koehler, DFVLR-Mitt. 77-03, 1977; common in flight-test
   * parameter identification).
   *
   * @param amplitude step height (unit of the channel)
   * @param startS start (s), &gt;= 0
   * @param unitS time unit (s), &gt; 0
   */
  record Multistep3211(double amplitude, double startS, double unitS) implements InputSignal {
    /** Validates. */
    public Multistep3211 {
      finite("multistep_3211.amplitude", amplitude);
      nonNegative("multistep_3211.start_s", startS);
      positive("multistep_3211.unit_s", unitS);
    }

    @Override
    public double value(double timeS) {
      return pulses(timeS - startS, unitS, amplitude, 1, 1, 1, -1, -1, 1, -1);
    }

    @Override
    public double endS() {
      return startS + 7 * unitS;
    }

    @Override
    public String describe() {
      return String.format(Locale.ROOT, "3-2-1-1 of %.4g, unit %.3g s from %.3g s", amplitude, unitS, startS);
    }

    @Override
    public String id() {
      return "3211";
    }
  }

  /**
   * Exponential frequency sweep u = A sin(phi(t)), the instantaneous frequency rising from f0 to
   * f1 over the duration: f(t) = f0 (f1/f0)^(t/D), phi(t) = 2 pi f0 D (e^{t ln(f1/f0)/D} - 1) /
   * ln(f1/f0).
   *
   * @param amplitude sine amplitude (unit of the channel)
   * @param startS start (s), &gt;= 0
   * @param durationS D (s), &gt; 0
   * @param startHz f0 (Hz), &gt; 0
   * @param endHz f1 (Hz), &gt; f0
   */
  record FrequencySweep(double amplitude, double startS, double durationS, double startHz, double endHz)
      implements InputSignal {
    /** Validates. */
    public FrequencySweep {
      finite("frequency_sweep.amplitude", amplitude);
      nonNegative("frequency_sweep.start_s", startS);
      positive("frequency_sweep.duration_s", durationS);
      positive("frequency_sweep.start_hz", startHz);
      if (!(endHz > startHz) || !Double.isFinite(endHz)) {
        throw new InvalidInputException("frequency_sweep.end_hz", "a finite value > start_hz (" + startHz + ")",
            String.valueOf(endHz));
      }
    }

    @Override
    public double value(double timeS) {
      double t = timeS - startS;
      if (t < 0 || t > durationS) {
        return 0.0;
      }
      double rate = Math.log(endHz / startHz) / durationS;
      return amplitude * Math.sin(2 * Math.PI * startHz * Math.expm1(rate * t) / rate);
    }

    @Override
    public double endS() {
      return startS + durationS;
    }

    @Override
    public String describe() {
      return String.format(Locale.ROOT, "frequency sweep of %.4g from %.3g to %.3g Hz over %.3g s from %.3g s",
          amplitude, startHz, endHz, durationS, startS);
    }

    @Override
    public String id() {
      return "sweep";
    }
  }

  /**
   * Discrete "1-cosine" vertical gust: w = (U/2) (1 - cos(pi x / H)) for 0 &lt;= x &lt;= 2 H,
   * x = V (t - t0) the distance flown into the gust, H the gradient length (distance to the peak);
   * e.g. CS-25.341(a) and Hoblit, <i>Gust Loads on Aircraft</i> (AIAA 1988), ch. 2.
   *
   * @param peakVelocityMps U, peak gust velocity (m/s, positive up), finite
   * @param gradientLengthM H (m), &gt; 0
   * @param speedTasMps V, true airspeed at which the gust is crossed (m/s), &gt; 0
   * @param startS t0, time the aircraft enters the gust (s), &gt;= 0
   */
  record OneMinusCosineGust(double peakVelocityMps, double gradientLengthM, double speedTasMps, double startS)
      implements InputSignal {
    /** Validates. */
    public OneMinusCosineGust {
      finite("gust.peak_velocity_mps", peakVelocityMps);
      positive("gust.gradient_length_m", gradientLengthM);
      positive("gust.speed_tas_mps", speedTasMps);
      nonNegative("gust.start_s", startS);
    }

    @Override
    public double value(double timeS) {
      double x = speedTasMps * (timeS - startS);
      if (x <= 0 || x >= 2 * gradientLengthM) {
        return 0.0;
      }
      return 0.5 * peakVelocityMps * (1 - Math.cos(Math.PI * x / gradientLengthM));
    }

    @Override
    public double endS() {
      return startS + 2 * gradientLengthM / speedTasMps;
    }

    @Override
    public String describe() {
      return String.format(Locale.ROOT, "1-cosine gust of %.3g m/s, gradient length %.4g m, from %.3g s",
          peakVelocityMps, gradientLengthM, startS);
    }

    @Override
    public String id() {
      return String.format(Locale.ROOT, "gust_h%.0fm", gradientLengthM);
    }
  }

  /** Piecewise-constant pulses of the given width and signs, starting at t = 0. */
  private static double pulses(double t, double width, double amplitude, int... signs) {
    if (t < 0) {
      return 0.0;
    }
    int k = (int) Math.floor(t / width);
    return k < signs.length ? amplitude * signs[k] : 0.0;
  }

  private static void finite(String field, double v) {
    if (!Double.isFinite(v)) {
      throw new InvalidInputException(field, "a finite value", String.valueOf(v));
    }
  }

  private static void positive(String field, double v) {
    if (!(v > 0) || !Double.isFinite(v)) {
      throw new InvalidInputException(field, "a finite value > 0", String.valueOf(v));
    }
  }

  private static void nonNegative(String field, double v) {
    if (!(v >= 0) || !Double.isFinite(v)) {
      throw new InvalidInputException(field, "a finite value >= 0", String.valueOf(v));
    }
  }
}
