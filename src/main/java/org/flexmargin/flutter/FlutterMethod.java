package org.flexmargin.flutter;

import org.flexmargin.model.AnalysisOptions;

/**
 * An open-loop flutter solution method. Implementations are stateless and thread-safe; every
 * method returns the same result type so that methods can be compared in tests.
 */
public interface FlutterMethod {
  /**
   * @param system the aeroelastic equations
   * @param path flight conditions to analyse
   * @param options tolerances, budgets and the damping limit
   * @return curves, refined crossings and diagnostics
   */
  FlutterSolution solve(AeroelasticSystem system, FlightPath path, AnalysisOptions options);
}
