package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/** Closed-loop eigenvalues and onsets on the invented demo aircraft. */
class ClosedLoopSweepTest {

  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void closedLoopEigenvaluesAgreeWithAnIndependentSolver() {
    // Independent library: Commons Math's EigenDecomposition against the balanced double-shift QR
    // solver that StateSpace uses.
    Configuration cfg = DEMO.configurations().get(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = new PlannedPath(DEMO.sweep());
    ServoLoop servo = ServoMargins.loopAt(m, cfg, DEMO.loop(), path.at(30));
    StateSpace cl = servo.closedLoop(RationalAerodynamics.of(RogerApproximation.fit(m.system().aero(), 3.0, 4)));
    Eigenvalues e = cl.eigenvalues();
    DMatrixRMaj a = cl.a();
    double[][] arr = new double[a.numRows][a.numCols];
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        arr[i][j] = a.get(i, j);
      }
    }
    EigenDecomposition cm = new EigenDecomposition(new Array2DRowRealMatrix(arr));
    double[] re = cm.getRealEigenvalues();
    double[] im = cm.getImagEigenvalues();
    for (int i = 0; i < re.length; i++) {
      double best = Double.MAX_VALUE;
      for (int j = 0; j < e.real().length; j++) {
        best = Math.min(best, Math.hypot(re[i] - e.real()[j], im[i] - e.imag()[j]));
      }
      // 1e-6 relative to the root's size: two backward-stable solvers on a ~80-state matrix
      assertTrue(best < 1e-6 * Math.max(1, Math.hypot(re[i], im[i])), "root " + re[i] + "," + im[i]);
    }
  }

  @Test
  void onsetsAreRootsOfTheClosedLoopAndIndependentOfTheGrid() {
    Configuration cfg = DEMO.configurations().get(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath coarse = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 40, 110, 8));
    PlannedPath fine = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 40, 110, 36));
    double a = onset(m, cfg, coarse);
    double b = onset(m, cfg, fine);
    // both refined to 0.01 m/s; different grids and continuation paths: agree to 0.05 m/s
    assertEquals(b, a, 0.05);
    // at the refined speed the closed loop has a root on the imaginary axis (consistency)
    PlannedPath at = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, a, a + 1e-9, 2));
    ServoLoop servo = ServoMargins.loopAt(m, cfg, DEMO.loop(), at.at(0));
    Eigenvalues e = servo.closedLoop(RationalAerodynamics.of(
        RogerApproximation.fit(m.system().aero(), fitRange(m, coarse), ClosedLoopSweep.LAG_COUNT))).eigenvalues();
    double nearest = Double.MAX_VALUE;
    for (double r : e.real()) {
      nearest = Math.min(nearest, Math.abs(r));
    }
    // a 0.01 m/s speed error moves the root by ~1e-3 1/s (d(Re s)/dV ~ 0.1 1/s per m/s here)
    assertTrue(nearest < 5e-3, "no root on the imaginary axis at the onset: " + nearest);
  }

  @Test
  void openLoopUnstableAirframeIsStabilisedByTheLoopAtLowSpeed() {
    Configuration cfg = DEMO.configurations().get(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 40, 60, 3));
    ServoLoop servo = ServoMargins.loopAt(m, cfg, DEMO.loop(), path.at(1));
    assertTrue(servo.plant().shortPeriodRoots()[0] > 0, "the demo airframe must be unstable on its own");
    FlutterSolution ol = new PkMethod().solve(m.system(), path, DEMO.options());
    ClosedLoopResult r = new ClosedLoopSweep().analyse(m, cfg, DEMO.loop(), path, ol, DEMO.options());
    for (ClosedLoopPoint p : r.points()) {
      assertTrue(p.maxRealPart() < 0, "closed loop unstable at " + p.condition().speedEasMps());
    }
    assertFalse(r.assumptions().isEmpty());
  }

  static double fitRange(ConfigurationModel m, PlannedPath path) {
    double fmax = m.modes().modes().stream().mapToDouble(x -> x.frequencyHz()).max().orElseThrow();
    double vmin = path.at(0).speedTasMps();
    return Math.min(m.system().aero().maxReducedFrequency(),
        Math.max(0.5, 1.5 * 2 * Math.PI * fmax * m.system().aero().referenceSemichordM() / vmin));
  }

  private static double onset(ConfigurationModel m, Configuration cfg, PlannedPath path) {
    FlutterSolution ol = new PkMethod().solve(m.system(), path, DEMO.options());
    // the rational-model onset (the eigenvalue route), before its refinement on the exact loop
    List<FlutterCrossing> x = new ClosedLoopSweep().analyse(m, cfg, DEMO.loop(), path, ol, DEMO.options())
        .refinements().stream().map(OnsetRefinement::rational).toList();
    return x.stream().filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET).findFirst().orElseThrow()
        .condition().speedEasMps();
  }
}
