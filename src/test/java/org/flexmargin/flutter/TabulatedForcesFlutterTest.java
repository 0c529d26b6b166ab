package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.AeroSources;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.ModeTable;
import org.flexmargin.structure.BuiltInStructures;
import org.flexmargin.structure.BuiltStructure;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * The tabulated-forces route gives the same flutter point as strip theory when the table is
 * sampled from strip theory, and flags use outside the table's reduced-frequency range.
 */
class TabulatedForcesFlutterTest {

  private static GafTable sample(AeroelasticSystem strip, ModeTable modes, double kMin, double kMax, int count) {
    int n = strip.size();
    double[] ks = new double[count];
    double[][][] re = new double[count][n][n];
    double[][][] im = new double[count][n][n];
    ZMatrixRMaj q = new ZMatrixRMaj(n, n);
    for (int i = 0; i < count; i++) {
      ks[i] = kMin + (kMax - kMin) * i / (count - 1);
      strip.aero().forces(ks[i], q);
      for (int r = 0; r < n; r++) {
        for (int c = 0; c < n; c++) {
          re[i][r][c] = q.getReal(r, c);
          im[i][r][c] = q.getImag(r, c);
        }
      }
    }
    return new GafTable(strip.aero().referenceSemichordM(), 0.0, modes.modeNames(), ks, re, im);
  }

  @Test
  void tableSampledFromStripTheoryReproducesTheFlutterSpeed() {
    BuiltStructure built = BuiltInStructures.build(ValidationCases.lpwSection());
    AeroelasticSystem strip = ValidationCases.system(ValidationCases.lpwSection());
    GafTable table = sample(strip, built.modes(), 0.0, 1.5, 61);
    AeroelasticSystem tab = new AeroelasticSystem(StructuralModel.fromModeTable(built.modes()),
        AeroSources.of(table, built.modes()));
    PlannedPath path = ValidationCases.lpwPath(2.0, 8.0, 31);
    double uStrip = new PkMethod().solve(strip, path, AnalysisOptions.defaults()).firstOnset().orElseThrow()
        .condition().speedTasMps();
    FlutterSolution tabSol = new PkMethod().solve(tab, path, AnalysisOptions.defaults());
    double uTab = tabSol.firstOnset().orElseThrow().condition().speedTasMps();
    // spline interpolation error ~1e-5 of Q at dk = 0.025 (TabulatedAeroTest) moves flutter by far
    // less than 1e-3 relative
    assertEquals(uStrip, uTab, 1e-3 * uStrip);
  }

  @Test
  void useOutsideTheTableIsReported() {
    BuiltStructure built = BuiltInStructures.build(ValidationCases.lpwSection());
    AeroelasticSystem strip = ValidationCases.system(ValidationCases.lpwSection());
    // table from k = 0.3: the low-speed end of the sweep needs higher k, flutter needs lower k
    GafTable table = sample(strip, built.modes(), 0.3, 0.5, 9);
    AeroelasticSystem tab = new AeroelasticSystem(StructuralModel.fromModeTable(built.modes()),
        AeroSources.of(table, built.modes()));
    FlutterSolution sol = new PkMethod().solve(tab, ValidationCases.lpwPath(2.0, 8.0, 31), AnalysisOptions.defaults());
    List<String> w = new ArrayList<>(sol.warnings());
    assertTrue(w.stream().anyMatch(s -> s.contains("outside their reduced-frequency range")), w.toString());
  }
}
