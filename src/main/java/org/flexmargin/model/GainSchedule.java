package org.flexmargin.model;

/**
 * A gain factor scheduled on dynamic pressure: linear interpolation between the listed points,
 * held constant beyond the ends.
 *
 * @param dynamicPressurePa breakpoints (Pa), strictly increasing, &gt;= 0
 * @param factor gain factors at the breakpoints (dimensionless), finite
 */
public record GainSchedule(double[] dynamicPressurePa, double[] factor) {
  /** Validates and copies. */
  public GainSchedule {
    if (dynamicPressurePa == null || factor == null || dynamicPressurePa.length == 0
        || dynamicPressurePa.length != factor.length) {
      throw new InvalidInputException("schedule", "equal, non-empty lists of dynamic pressures and factors",
          (dynamicPressurePa == null ? 0 : dynamicPressurePa.length) + " and " + (factor == null ? 0 : factor.length));
    }
    for (int i = 0; i < dynamicPressurePa.length; i++) {
      Checks.nonNegative("dynamic_pressure_pa[" + i + "]", dynamicPressurePa[i]);
      Checks.finite("factor[" + i + "]", factor[i]);
      if (i > 0 && dynamicPressurePa[i] <= dynamicPressurePa[i - 1]) {
        throw new InvalidInputException("dynamic_pressure_pa[" + i + "]", "strictly increasing values",
            dynamicPressurePa[i] + " after " + dynamicPressurePa[i - 1]);
      }
    }
    dynamicPressurePa = dynamicPressurePa.clone();
    factor = factor.clone();
  }

  /** A constant factor of one. */
  public static final GainSchedule CONSTANT = new GainSchedule(new double[] {0.0}, new double[] {1.0});

  /** @return the factor at dynamic pressure q (Pa) */
  public double at(double qPa) {
    int n = dynamicPressurePa.length;
    if (qPa <= dynamicPressurePa[0]) {
      return factor[0];
    }
    if (qPa >= dynamicPressurePa[n - 1]) {
      return factor[n - 1];
    }
    int i = 1;
    while (dynamicPressurePa[i] < qPa) {
      i++;
    }
    double w = (qPa - dynamicPressurePa[i - 1]) / (dynamicPressurePa[i] - dynamicPressurePa[i - 1]);
    return factor[i - 1] + w * (factor[i] - factor[i - 1]);
  }

  @Override
  public double[] dynamicPressurePa() {
    return dynamicPressurePa.clone();
  }

  @Override
  public double[] factor() {
    return factor.clone();
  }
}
