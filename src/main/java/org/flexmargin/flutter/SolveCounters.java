package org.flexmargin.flutter;

/** Mutable counters of one solve (confined to the solving thread), turned into diagnostics. */
final class SolveCounters {
  long rootSolves;
  long iterations;
  long fullEigenSolves;
  int stepHalvings;
  double maxResidual;
  double minMac = 1.0;
  int unconverged;
  double minReducedFrequency = Double.POSITIVE_INFINITY;
  double maxReducedFrequency = 0;
  double firstTroubleT = Double.NaN;

  /** Notes that tracking was in doubt at grid point (path parameter) t. */
  void trouble(double t) {
    if (Double.isNaN(firstTroubleT) || t < firstTroubleT) {
      firstTroubleT = t;
    }
  }

  void noteReducedFrequency(double k) {
    if (k < minReducedFrequency) {
      minReducedFrequency = k;
    }
    if (k > maxReducedFrequency) {
      maxReducedFrequency = k;
    }
  }

  SolverDiagnostics toDiagnostics() {
    return new SolverDiagnostics(
        rootSolves, iterations, fullEigenSolves, stepHalvings, maxResidual, minMac, unconverged,
        firstTroubleT);
  }
}
