package org.flexmargin.report;

import org.flexmargin.sweep.Finding;

/** Display unit of the equivalent-airspeed axis of the report charts. Data stay in SI. */
public enum SpeedAxisUnit {
  /** Metres per second (the SI unit of the results). */
  METRES_PER_SECOND(1.0, "m/s"),
  /** Knots (1 kt = 1852/3600 m/s exactly). */
  KNOTS(Finding.KNOTS_PER_MPS, "kt");

  private final double perMps;
  private final String symbol;

  SpeedAxisUnit(double perMps, String symbol) {
    this.perMps = perMps;
    this.symbol = symbol;
  }

  /**
   * @param speedMps speed (m/s)
   * @return the same speed in this unit
   */
  public double fromMps(double speedMps) {
    return speedMps * perMps;
  }

  /** @return unit symbol, e.g. "m/s" */
  public String symbol() {
    return symbol;
  }

  /** @return axis title, e.g. "equivalent airspeed (m/s)" */
  public String axisTitle() {
    return "equivalent airspeed (" + symbol + ")";
  }
}
