package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Exact stability boundaries of loop families with closed-form critical points
 * (docs/validation.md sec. 13.3).
 */
class CriticalPointSolverTest {

  @Test
  void delayedIntegratorReachesMinusOneAtTheClosedFormGain() {
    // L(s; t) = t e^{-s tau} / s: |L| = t / w = 1 and -pi/2 - w tau = -pi give
    // w* = t* = pi / (2 tau) (derived), 31.4159 for tau = 0.05 s
    double tau = 0.05;
    CriticalPointSolver.Solution s = CriticalPointSolver.solve(
        t -> new Integrator(t).then(new PureDelay(tau, PadeOrder.ORDER_2)), 25, 20, 1, 60, 1e-10,
        40);
    assertTrue(s.converged(), s.remark());
    // Newton converged to |1 + L| < 1e-9 on a simple root: t and w to ~1e-9 relative
    assertEquals(Math.PI / (2 * tau), s.parameter(), 1e-7);
    assertEquals(Math.PI / (2 * tau), s.omegaRadPerS(), 1e-7);
    assertTrue(s.residual() < CriticalPointSolver.RESIDUAL_TOLERANCE);
  }

  @Test
  void thirdOrderLoopHasTheRouthHurwitzCriticalGain() {
    // L(s; t) = t / (s (s + 1) (s + 2)): by Routh-Hurwitz the closed loop is marginally stable at
    // t = 6 with poles at +-j sqrt(2) (derived; the classic textbook case, e.g. Ogata, Modern
    // Control Engineering, Routh examples, from memory)
    CriticalPointSolver.Solution s = CriticalPointSolver.solve(
        t -> new TransferFunctionBlock(new double[] {t}, new double[] {1, 3, 2, 0}), 4, 1.0, 0.5,
        20, 1e-10, 40);
    assertTrue(s.converged(), s.remark());
    assertEquals(6.0, s.parameter(), 1e-8);
    assertEquals(Math.sqrt(2), s.omegaRadPerS(), 1e-8);
  }

  @Test
  void aLoopThatNeverReachesMinusOneIsReportedNotGuessed() {
    // L = t / (s + 1) has phase above -90 deg: 1 + L has no imaginary-axis zero for t > 0
    CriticalPointSolver.Solution s = CriticalPointSolver.solve(
        t -> new TransferFunctionBlock(new double[] {t}, new double[] {1, 1}), 2, 1.0, 0.5, 10,
        1e-10, 30);
    assertFalse(s.converged());
    assertFalse(s.remark().isEmpty());
  }
}
