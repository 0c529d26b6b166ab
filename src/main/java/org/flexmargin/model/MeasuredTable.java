package org.flexmargin.model;

import java.util.Arrays;

/**
 * A measured open-loop frequency response as read from a file (for example a structural-coupling
 * ground test): frequency, gain and phase per row, in the negative-feedback convention of the
 * loop (closed loop 1/(1 + L); the critical point is 0 dB, -180 deg).
 *
 * @param source where the table comes from (file name and description), non-blank
 * @param frequencyHz strictly ascending frequencies, Hz (&gt; 0; at least 2 rows)
 * @param gainDb 20 log10 |L|, dB (finite)
 * @param phaseDeg arg L, deg (finite; wrapped or unwrapped, the loop layer unwraps it)
 */
public record MeasuredTable(String source, double[] frequencyHz, double[] gainDb, double[] phaseDeg) {
  /** Validates and copies. */
  public MeasuredTable {
    Checks.name("source", source);
    if (frequencyHz == null || gainDb == null || phaseDeg == null) {
      throw new InvalidInputException("measured_response", "frequency_hz, gain_db and phase_deg", "a missing column");
    }
    if (gainDb.length != frequencyHz.length || phaseDeg.length != frequencyHz.length) {
      throw new InvalidInputException("measured_response", "columns of equal length",
          frequencyHz.length + " frequencies, " + gainDb.length + " gains and " + phaseDeg.length + " phases");
    }
    if (frequencyHz.length < 2) {
      throw new InvalidInputException("measured_response.frequency_hz", "at least two rows",
          frequencyHz.length + " row" + (frequencyHz.length == 1 ? "" : "s"));
    }
    for (int i = 0; i < frequencyHz.length; i++) {
      Checks.positive("frequency_hz[" + i + "]", frequencyHz[i]);
      if (i > 0 && !(frequencyHz[i] > frequencyHz[i - 1])) {
        throw new InvalidInputException("frequency_hz[" + i + "]",
            "frequencies in strictly ascending order (above " + frequencyHz[i - 1] + " Hz)", frequencyHz[i] + " Hz");
      }
      Checks.finite("gain_db[" + i + "]", gainDb[i]);
      Checks.finite("phase_deg[" + i + "]", phaseDeg[i]);
    }
    frequencyHz = frequencyHz.clone();
    gainDb = gainDb.clone();
    phaseDeg = phaseDeg.clone();
  }

  @Override
  public double[] frequencyHz() {
    return frequencyHz.clone();
  }

  @Override
  public double[] gainDb() {
    return gainDb.clone();
  }

  @Override
  public double[] phaseDeg() {
    return phaseDeg.clone();
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof MeasuredTable m && source.equals(m.source) && Arrays.equals(frequencyHz, m.frequencyHz)
        && Arrays.equals(gainDb, m.gainDb) && Arrays.equals(phaseDeg, m.phaseDeg);
  }

  @Override
  public int hashCode() {
    return source.hashCode() + 31 * Arrays.hashCode(frequencyHz);
  }

  @Override
  public String toString() {
    return "MeasuredTable[" + source + ", " + frequencyHz.length + " rows]";
  }
}
