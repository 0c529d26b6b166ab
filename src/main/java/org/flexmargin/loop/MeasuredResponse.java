package org.flexmargin.loop;

import java.util.Arrays;

/**
 * A measured open-loop frequency response (for example from a structural-coupling ground test):
 * gain and phase at a list of frequencies, used as a {@link SisoFrequencyFunction} for margins.
 *
 * <p>Between table points the gain in dB and the phase in degrees are interpolated linearly in
 * log f (the straight-line segments of a Bode plot). The interpolation error of a smooth response
 * is at most h^2/8 max|d^2 y/d(ln f)^2| for a table spacing h in ln f (docs/validation.md, "Loops
 * from a file"): a table should be dense where the response turns quickly (resonances, crossovers).
 * Outside the table the response is not known: {@link #response} returns NaN there, and margins
 * must be sought over the table's range only ({@link #minFrequencyHz()}, {@link #maxFrequencyHz()}).
 *
 * <p>The phase is unwrapped on construction: a step of more than 180 deg between neighbouring
 * points is taken as a wrap of 360 deg (a table must therefore be dense enough that the true
 * phase moves by less than 180 deg between points); the first value is kept as given.
 *
 * @param frequencyHz strictly ascending frequencies, Hz (&gt; 0, at least 2)
 * @param gainDb 20 log10 |L|, dB (finite)
 * @param phaseDeg arg L, deg (finite; unwrapped on construction)
 */
public record MeasuredResponse(double[] frequencyHz, double[] gainDb, double[] phaseDeg)
    implements SisoFrequencyFunction {

  /** Validates, copies and unwraps the phase. */
  public MeasuredResponse {
    StateSpace.require(frequencyHz != null && gainDb != null && phaseDeg != null
        && frequencyHz.length == gainDb.length && frequencyHz.length == phaseDeg.length,
        "measured_response", "frequency, gain and phase columns of equal length",
        frequencyHz == null || gainDb == null || phaseDeg == null ? "a missing column"
            : frequencyHz.length + ", " + gainDb.length + " and " + phaseDeg.length + " values");
    StateSpace.require(frequencyHz.length >= 2, "measured_response.frequency_hz",
        "at least two frequencies", frequencyHz.length + "");
    for (int i = 0; i < frequencyHz.length; i++) {
      StateSpace.require(Double.isFinite(frequencyHz[i]) && frequencyHz[i] > 0,
          "measured_response.frequency_hz[" + i + "]", "a finite frequency > 0", String.valueOf(frequencyHz[i]));
      StateSpace.require(i == 0 || frequencyHz[i] > frequencyHz[i - 1],
          "measured_response.frequency_hz[" + i + "]", "frequencies in strictly ascending order",
          frequencyHz[i] + " after " + (i == 0 ? "" : frequencyHz[i - 1]));
      StateSpace.require(Double.isFinite(gainDb[i]), "measured_response.gain_db[" + i + "]",
          "a finite gain in dB", String.valueOf(gainDb[i]));
      StateSpace.require(Double.isFinite(phaseDeg[i]), "measured_response.phase_deg[" + i + "]",
          "a finite phase in deg", String.valueOf(phaseDeg[i]));
    }
    frequencyHz = frequencyHz.clone();
    gainDb = gainDb.clone();
    double[] unwrapped = phaseDeg.clone();
    for (int i = 1; i < unwrapped.length; i++) {
      double step = phaseDeg[i] - phaseDeg[i - 1];
      unwrapped[i] = unwrapped[i - 1] + step - 360 * Math.rint(step / 360);
    }
    phaseDeg = unwrapped;
  }

  @Override
  public double[] frequencyHz() {
    return frequencyHz.clone();
  }

  @Override
  public double[] gainDb() {
    return gainDb.clone();
  }

  /** @return the unwrapped phase, deg */
  @Override
  public double[] phaseDeg() {
    return phaseDeg.clone();
  }

  /** @return the lowest tabulated frequency, Hz */
  public double minFrequencyHz() {
    return frequencyHz[0];
  }

  /** @return the highest tabulated frequency, Hz */
  public double maxFrequencyHz() {
    return frequencyHz[frequencyHz.length - 1];
  }

  /** @return the number of table rows */
  public int size() {
    return frequencyHz.length;
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double f = omegaRadPerS / (2 * Math.PI);
    int n = frequencyHz.length;
    // grid end points reach here through exp(ln w): accept a few ulps outside the table
    double lo = frequencyHz[0];
    double hi = frequencyHz[n - 1];
    if (f < lo * (1 - 1e-12) || f > hi * (1 + 1e-12) || Double.isNaN(f)) {
      reIm[0] = Double.NaN;
      reIm[1] = Double.NaN;
      return;
    }
    f = Math.min(Math.max(f, lo), hi);
    int i = Arrays.binarySearch(frequencyHz, f);
    double db;
    double ph;
    if (i >= 0) {
      db = gainDb[i];
      ph = phaseDeg[i];
    } else {
      int k = -i - 2;
      double t = Math.log(f / frequencyHz[k]) / Math.log(frequencyHz[k + 1] / frequencyHz[k]);
      db = gainDb[k] + t * (gainDb[k + 1] - gainDb[k]);
      ph = phaseDeg[k] + t * (phaseDeg[k + 1] - phaseDeg[k]);
    }
    double mag = Math.pow(10, db / 20);
    double rad = Math.toRadians(ph);
    reIm[0] = mag * Math.cos(rad);
    reIm[1] = mag * Math.sin(rad);
  }

  /**
   * Samples a frequency function on the given frequencies (e.g. to compare a model with a test,
   * or to make a table from a known transfer function).
   *
   * @param fn the function
   * @param frequencyHz strictly ascending frequencies, Hz
   * @return the table
   */
  public static MeasuredResponse sample(SisoFrequencyFunction fn, double[] frequencyHz) {
    double[] db = new double[frequencyHz.length];
    double[] ph = new double[frequencyHz.length];
    double[] v = new double[2];
    for (int i = 0; i < frequencyHz.length; i++) {
      fn.response(2 * Math.PI * frequencyHz[i], v);
      db[i] = 20 * Math.log10(Math.hypot(v[0], v[1]));
      ph[i] = Math.toDegrees(Math.atan2(v[1], v[0]));
    }
    return new MeasuredResponse(frequencyHz, db, ph);
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof MeasuredResponse m && Arrays.equals(frequencyHz, m.frequencyHz)
        && Arrays.equals(gainDb, m.gainDb) && Arrays.equals(phaseDeg, m.phaseDeg);
  }

  @Override
  public int hashCode() {
    return 31 * (31 * Arrays.hashCode(frequencyHz) + Arrays.hashCode(gainDb)) + Arrays.hashCode(phaseDeg);
  }

  @Override
  public String toString() {
    return "MeasuredResponse[" + frequencyHz.length + " points, " + minFrequencyHz() + " to "
        + maxFrequencyHz() + " Hz]";
  }
}
