package org.flexmargin.loop;

import java.util.Arrays;
import org.flexmargin.model.MeasuredTable;

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
 * <p>Immutable; validation of the table is {@link MeasuredTable}'s.
 */
public final class MeasuredResponse implements SisoFrequencyFunction {
  private final double[] frequencyHz;
  private final double[] gainDb;
  private final double[] phaseDeg;

  /** @param table the measured table (phase unwrapped here) */
  public MeasuredResponse(MeasuredTable table) {
    StateSpace.require(table != null, "measured_response", "a measured table", "nothing");
    frequencyHz = table.frequencyHz();
    gainDb = table.gainDb();
    double[] given = table.phaseDeg();
    phaseDeg = given.clone();
    for (int i = 1; i < phaseDeg.length; i++) {
      double step = given[i] - given[i - 1];
      phaseDeg[i] = phaseDeg[i - 1] + step - 360 * Math.rint(step / 360);
    }
  }

  /** @return the frequencies, Hz */
  public double[] frequencyHz() {
    return frequencyHz.clone();
  }

  /** @return the gains, dB */
  public double[] gainDb() {
    return gainDb.clone();
  }

  /** @return the unwrapped phase, deg */
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
    return new MeasuredResponse(new MeasuredTable("sampled", frequencyHz, db, ph));
  }

  @Override
  public String toString() {
    return "MeasuredResponse[" + frequencyHz.length + " points, " + minFrequencyHz() + " to "
        + maxFrequencyHz() + " Hz]";
  }
}
