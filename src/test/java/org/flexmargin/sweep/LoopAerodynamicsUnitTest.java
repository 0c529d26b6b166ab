package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.ReducedFrequencyInterpolant;
import org.flexmargin.aero.StripTheoryAero;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.junit.jupiter.api.Test;

/** Which forces the frequency-domain loop uses: interpolated strip theory, anything else as it is. */
class LoopAerodynamicsUnitTest {

  private static AeroSource strips() {
    AnalysisCase lpw = CaseReader.read(Path.of("mode-tables/validation/typical-section-lpw.json"));
    return ConfigurationModel.of(lpw.configurations().get(0)).system().aero();
  }

  @Test
  void stripTheoryIsInterpolatedOnceAndCloseToTheExactForces() throws Exception {
    AeroSource exact = strips();
    assertInstanceOf(StripTheoryAero.class, exact);
    LoopAerodynamics loop = LoopAerodynamics.of(exact);
    assertTrue(loop.interpolated());
    // built on the first call, from any thread, and the same object afterwards
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      Future<AeroSource> a = pool.submit(loop::source);
      Future<AeroSource> b = pool.submit(loop::source);
      assertSame(a.get(), b.get());
    } finally {
      pool.shutdown();
    }
    AeroSource s = loop.source();
    assertInstanceOf(ReducedFrequencyInterpolant.class, s);
    assertSame(s, loop.source());
    // between nodes the interpolant stays within its accepted midpoint error (1e-8 of the largest
    // |Q_ij|); ten times that bounds the error anywhere in an interval of a smooth function
    int n = exact.size();
    ZMatrixRMaj qe = new ZMatrixRMaj(n, n);
    ZMatrixRMaj qi = new ZMatrixRMaj(n, n);
    for (double k : new double[] {0.0123, 0.37, 1.91}) {
      exact.forces(k, qe);
      s.forces(k, qi);
      double largest = 0;
      for (int i = 0; i < qe.data.length; i += 2) {
        largest = Math.max(largest, Math.hypot(qe.data[i], qe.data[i + 1]));
      }
      for (int i = 0; i < qe.data.length; i++) {
        assertEquals(qe.data[i], qi.data[i], 10 * LoopAerodynamics.TOLERANCE * largest, "k " + k);
      }
    }
  }

  @Test
  void theExactRouteAndOtherSourcesAreUsedAsTheyAre() {
    AeroSource exact = strips();
    LoopAerodynamics direct = LoopAerodynamics.exact(exact);
    assertFalse(direct.interpolated());
    assertSame(exact, direct.source());
    AeroSource table = ConfigurationModel.of(LoopTestSection.configuration(0)).system().aero();
    LoopAerodynamics tabulated = LoopAerodynamics.of(table);
    assertFalse(tabulated.interpolated());
    assertSame(table, tabulated.source());
    assertSame(table, tabulated.source());
  }
}
