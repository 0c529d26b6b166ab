package org.flexmargin.flutter;

import org.flexmargin.atmosphere.FlightCondition;

/**
 * A one-parameter path of flight conditions: grid points at integer parameter values
 * 0 .. gridPoints()-1 and a continuous interpolation between them, so that onsets can be refined
 * between grid points by root finding on the parameter.
 *
 * <p>Implementations are immutable and thread-safe.
 */
public interface FlightPath {
  /** @return number of grid points (&gt;= 2) */
  int gridPoints();

  /**
   * @param t path parameter in [0, gridPoints()-1]; integer values are the grid points
   * @return the flight condition at t
   */
  FlightCondition at(double t);

  /** @return true when every point of the path has the same air density */
  default boolean constantDensity() {
    double rho0 = at(0).densityKgPerM3();
    for (int i = 1; i < gridPoints(); i++) {
      if (Math.abs(at(i).densityKgPerM3() - rho0) > 1e-12 * rho0) {
        return false;
      }
    }
    return true;
  }
}
