package org.flexmargin.campaign;

/**
 * Loop margins of one sample along its sweep, from the exact broken loop at every grid point.
 *
 * @param speedEasMps grid speeds (m/s EAS)
 * @param gainMarginDb smallest gain-increase margin at each speed (dB); NaN where the loop has no
 *     phase crossover with |L| &lt; 1
 * @param phaseMarginDeg smallest |phase margin| at each speed (deg); NaN where there is no gain
 *     crossover
 */
public record MarginCurve(double[] speedEasMps, double[] gainMarginDb, double[] phaseMarginDeg) {
  /** No curve. */
  public static final MarginCurve EMPTY = new MarginCurve(new double[0], new double[0], new double[0]);

  /** Validates equal lengths and copies. */
  public MarginCurve {
    if (gainMarginDb.length != speedEasMps.length || phaseMarginDeg.length != speedEasMps.length) {
      throw new IllegalArgumentException("margin curve arrays of different lengths");
    }
    speedEasMps = speedEasMps.clone();
    gainMarginDb = gainMarginDb.clone();
    phaseMarginDeg = phaseMarginDeg.clone();
  }

  /** @return number of grid points */
  public int size() {
    return speedEasMps.length;
  }

  @Override
  public double[] speedEasMps() {
    return speedEasMps.clone();
  }

  @Override
  public double[] gainMarginDb() {
    return gainMarginDb.clone();
  }

  @Override
  public double[] phaseMarginDeg() {
    return phaseMarginDeg.clone();
  }
}
