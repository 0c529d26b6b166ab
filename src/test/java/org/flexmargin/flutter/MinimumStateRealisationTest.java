package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.MinimumStateApproximation;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.numerics.ReferenceEigenvalues;
import org.junit.jupiter.api.Test;

/**
 * The state-space realisation of a minimum-state fit with one lag state per lag root: the same
 * roots as the n-states-per-root realisation of the same matrices, whose extra roots lie exactly on
 * the lag poles.
 */
class MinimumStateRealisationTest {

  /** Goland wing, 2 + 2 Ritz modes, 10 strips: n = 4, minimum state with 3 lag roots. */
  private static AeroelasticSystem system() {
    return ValidationCases.system(ValidationCases.goland(2, 2, 10));
  }

  private static RationalFit asRogerForm(RationalFit f) {
    return new RationalFit(f.referenceSemichordM(), f.lagRoots(), f.coefficients(), f.reducedFrequencies(), f.error(),
        f.errorThreshold(), f.warnings(), f.sourceDescription(), RationalFit.ROGER);
  }


  @Test
  void oneLagStatePerRootGivesTheRootsOfTheFullRealisation() {
    // Closed form: with A_{l+2} = d_l e_l^T the n lag states r_l enter the forces only through
    // e_l^T r_l, so the realisation with z_l = e_l^T r_l has the same transfer function; the full one
    // adds n - 1 unobservable states per lag root, exactly at its pole -(V/b) beta_l. Eigenvalues by
    // Commons Math (an independent solver); 1e-7 of the spectral radius: two backward-stable
    // eigen-solutions (rounding ~1e-15 of the radius times the roots' condition numbers); the
    // repeated lag poles are semisimple, so rounding does not split them by its square root.
    AeroelasticSystem sys = system();
    int n = sys.size();
    RationalFit ms = MinimumStateApproximation.fit(sys.aero(), 1.5, 3);
    double rho = 1.225;
    double v = 120;
    DMatrixRMaj small = StateSpaceMethod.stateMatrix(sys, ms, rho, v);
    DMatrixRMaj full = StateSpaceMethod.stateMatrix(sys, asRogerForm(ms), rho, v);
    assertEquals(2 * n + 3, small.numRows);
    assertEquals(n * (2 + 3), full.numRows);
    List<Complex> fewer = ReferenceEigenvalues.of(small);
    List<Complex> all = ReferenceEigenvalues.of(full);
    double radius = all.stream().mapToDouble(Complex::abs).max().orElseThrow();
    for (Complex s : fewer) {
      double nearest = all.stream().mapToDouble(t -> t.subtract(s).abs()).min().orElseThrow();
      assertTrue(nearest < 1e-7 * radius, "root " + s + " of the minimum-state realisation not in the full one");
    }
    // the full realisation's other roots are the lag poles, n - 1 times each
    List<Complex> rest = new ArrayList<>(all);
    for (Complex s : fewer) {
      rest.remove(rest.stream().min((x, y) -> Double.compare(x.subtract(s).abs(), y.subtract(s).abs())).orElseThrow());
    }
    assertEquals(3 * (n - 1), rest.size());
    for (Complex s : rest) {
      double pole = Double.POSITIVE_INFINITY;
      for (double beta : ms.lagRoots()) {
        pole = Math.min(pole, s.subtract(new Complex(-v / ms.referenceSemichordM() * beta, 0)).abs());
      }
      assertTrue(pole < 1e-7 * radius, "extra root " + s + " is not a lag pole");
    }
  }

  @Test
  void theFactorsRebuildTheLagMatrices() {
    RationalFit ms = MinimumStateApproximation.fit(system().aero(), 1.5, 3);
    for (int l = 0; l < ms.lagCount(); l++) {
      double[][] f = ms.rankOneLag(l);
      double[][] m = ms.matrix(l + 3);
      double norm = 0;
      for (double x : f[1]) {
        norm += x * x;
      }
      assertEquals(1.0, norm, 1e-14, "unit e");
      double big = 0;
      for (double[] row : m) {
        for (double x : row) {
          big = Math.max(big, Math.abs(x));
        }
      }
      for (int i = 0; i < m.length; i++) {
        double[] rebuilt = new double[m.length];
        for (int j = 0; j < m.length; j++) {
          rebuilt[j] = f[0][i] * f[1][j];
        }
        // rank one to rounding: 1e-12 of the largest entry
        assertArrayEquals(m[i], rebuilt, 1e-12 * big, "lag " + l + " row " + i);
      }
    }
  }

  @Test
  void flutterOnsetIsTheSameWithEitherRealisation() {
    // Same transfer function, so the same onset; both refined to 0.01 m/s along the path.
    AeroelasticSystem sys = system();
    RationalFit ms = MinimumStateApproximation.fit(sys.aero(), 1.5, 3);
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 60, 240, 37));
    FlutterSolution small = new StateSpaceMethod(ms).solve(sys, path, AnalysisOptions.defaults());
    FlutterSolution full = new StateSpaceMethod(asRogerForm(ms)).solve(sys, path, AnalysisOptions.defaults());
    double a = small.firstOnset().orElseThrow().condition().speedTasMps();
    double b = full.firstOnset().orElseThrow().condition().speedTasMps();
    assertEquals(b, a, 0.02);
  }
}
