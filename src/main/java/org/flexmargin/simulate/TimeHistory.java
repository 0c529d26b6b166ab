package org.flexmargin.simulate;

import java.util.List;

/**
 * Sampled time histories of named channels on one time grid. Immutable: arrays are copied in and
 * out.
 *
 * @param timesS sample times (s), increasing
 * @param names channel names, with the unit in the name (e.g. {@code pitch_rate_rad_per_s})
 * @param values values[channel][sample], in the unit of the channel's name
 */
public record TimeHistory(double[] timesS, List<String> names, double[][] values) {
  /** Validates and copies. */
  public TimeHistory {
    timesS = timesS.clone();
    names = List.copyOf(names);
    if (values.length != names.size()) {
      throw new IllegalArgumentException(values.length + " channels for " + names.size() + " names");
    }
    double[][] copy = new double[values.length][];
    for (int c = 0; c < values.length; c++) {
      if (values[c].length != timesS.length) {
        throw new IllegalArgumentException("channel " + names.get(c) + " has " + values[c].length + " samples, "
            + timesS.length + " times");
      }
      copy[c] = values[c].clone();
    }
    values = copy;
    for (int k = 1; k < timesS.length; k++) {
      if (!(timesS[k] > timesS[k - 1])) {
        throw new IllegalArgumentException("times must increase; sample " + k + " is " + timesS[k]);
      }
    }
  }

  @Override
  public double[] timesS() {
    return timesS.clone();
  }

  @Override
  public double[][] values() {
    double[][] copy = new double[values.length][];
    for (int c = 0; c < values.length; c++) {
      copy[c] = values[c].clone();
    }
    return copy;
  }

  /** @return number of samples */
  public int sampleCount() {
    return timesS.length;
  }

  /**
   * @param name channel name
   * @return a copy of the channel's samples
   * @throws IllegalArgumentException if there is no such channel
   */
  public double[] channel(String name) {
    return values[index(name)].clone();
  }

  /**
   * @param name channel name
   * @return its index
   * @throws IllegalArgumentException if there is no such channel
   */
  public int index(String name) {
    int i = names.indexOf(name);
    if (i < 0) {
      throw new IllegalArgumentException("no channel " + name + " in " + names);
    }
    return i;
  }

  /**
   * @param name channel name
   * @return index of the sample of largest magnitude
   */
  public int peakIndex(String name) {
    double[] v = values[index(name)];
    int best = 0;
    for (int k = 1; k < v.length; k++) {
      if (Math.abs(v[k]) > Math.abs(v[best])) {
        best = k;
      }
    }
    return best;
  }

  /**
   * @param name channel name
   * @param fromS start of the window (s)
   * @return root mean square of the samples at or after fromS (unit of the channel)
   */
  public double rms(String name, double fromS) {
    double[] v = values[index(name)];
    double sum = 0;
    int count = 0;
    for (int k = 0; k < v.length; k++) {
      if (timesS[k] >= fromS) {
        sum += v[k] * v[k];
        count++;
      }
    }
    return count == 0 ? Double.NaN : Math.sqrt(sum / count);
  }
}
