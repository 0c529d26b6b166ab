package org.flexmargin.flutter;

/**
 * Numerical diagnostics of one flutter solution.
 *
 * @param rootSolves converged root solutions (each a Newton or p-k iteration to convergence)
 * @param iterations total inner iterations (Newton steps or p-k frequency updates)
 * @param fullEigenSolves full complex eigen-decompositions (start-up, k method)
 * @param stepHalvings continuation steps that were halved because tracking was not clean
 * @param maxRelativeResidual worst ||F(s) v|| / (max|F| ||v||) over accepted roots
 * @param minMac lowest modal assurance criterion between a root's vectors at consecutive
 *     accepted steps (1 = same shape)
 * @param unconvergedRoots roots that did not converge within the budget (reported, never hidden)
 * @param firstTroublePathParameter path parameter t of the first grid point where tracking was in
 *     doubt (a root that did not converge or was lost, two branches on the same root, an unstable
 *     root no branch follows); NaN when tracking was clean throughout. Findings at and beyond the
 *     grid point before it cannot be trusted without a finer re-solve.
 */
public record SolverDiagnostics(
    long rootSolves,
    long iterations,
    long fullEigenSolves,
    int stepHalvings,
    double maxRelativeResidual,
    double minMac,
    int unconvergedRoots,
    double firstTroublePathParameter) {

  /** Diagnostics of a solution whose tracking was clean throughout. */
  public SolverDiagnostics(long rootSolves, long iterations, long fullEigenSolves, int stepHalvings,
      double maxRelativeResidual, double minMac, int unconvergedRoots) {
    this(rootSolves, iterations, fullEigenSolves, stepHalvings, maxRelativeResidual, minMac, unconvergedRoots,
        Double.NaN);
  }

  /** @return whether tracking was in doubt anywhere */
  public boolean trackingTroubled() {
    return !Double.isNaN(firstTroublePathParameter);
  }
}
