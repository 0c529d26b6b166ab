package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.ServoMargins;
import org.junit.jupiter.api.Test;

/** The split of the demo's broken loop by carrying path, and the layout of its samples. */
class CaseLoopSamplerTest {
  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
  private static final double[] HZ = {0.3, 1.2, 3.9, 7.4, 12.0, 18.7};

  private static double[] at(SisoFrequencyFunction f, double w) {
    double[] v = new double[2];
    f.response(w, v);
    return v;
  }

  @Test
  void restAndPathAddUpToTheBrokenLoopForEveryChoiceOfCarryingPaths() {
    Configuration cfg = DEMO.configurations().get(1);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    ServoLoop servo = ServoMargins.loopAt(m, cfg, DEMO.loop(), new PlannedPath(DEMO.sweep()).at(20));
    SisoFrequencyFunction full = servo.brokenLoop();
    CaseLoopSampler.SplitLoop none = new CaseLoopSampler.SplitLoop(servo, List.of());
    CaseLoopSampler.SplitLoop both = new CaseLoopSampler.SplitLoop(servo, List.of(0, 1));
    CaseLoopSampler.SplitLoop gyro = new CaseLoopSampler.SplitLoop(servo, List.of(0));
    CaseLoopSampler.SplitLoop accel = new CaseLoopSampler.SplitLoop(servo, List.of(1));
    for (double hz : HZ) {
      double w = 2 * Math.PI * hz;
      double[] f = at(full, w);
      double tol = 1e-10 * Math.hypot(f[0], f[1]) + 1e-14;
      // the same aircraft solve and blocks summed in another order: rounding only
      double[] r = at(none.rest(), w);
      double[] p = at(none.path(), w);
      assertEquals(0, Math.hypot(p[0], p[1]));
      assertEquals(0, Math.hypot(r[0] - f[0], r[1] - f[1]), tol);
      r = at(both.rest(), w);
      p = at(both.path(), w);
      assertEquals(0, Math.hypot(r[0], r[1]));
      assertEquals(0, Math.hypot(p[0] - f[0], p[1] - f[1]), tol);
      double[] g = at(gyro.path(), w);
      double[] gr = at(gyro.rest(), w);
      double[] a = at(accel.path(), w);
      double[] ar = at(accel.rest(), w);
      assertTrue(Math.hypot(g[0], g[1]) > 0 && Math.hypot(a[0], a[1]) > 0);
      // each path's part is the other split's rest
      assertEquals(0, Math.hypot(g[0] - ar[0], g[1] - ar[1]), tol);
      assertEquals(0, Math.hypot(a[0] - gr[0], a[1] - gr[1]), tol);
      assertEquals(0, Math.hypot(g[0] + a[0] - f[0], g[1] + a[1] - f[1]), tol);
      // asking twice at one frequency gives the same
      double[] again = at(gyro.path(), w);
      assertEquals(g[0], again[0]);
      assertEquals(g[1], again[1]);
    }
  }

  @Test
  void samplesRunOverConfigurationsThenShiftsThenPointsOnTheShiftedModeBands() {
    NotchDesignSpec spec = NotchDesignSpec.defaults().withPoints(6, 50);
    List<Integer> paths = List.of(0);
    LoopSamples s = CaseLoopSampler.sample(DEMO, DEMO.loop(), paths, spec);
    List<Integer> points = CaseLoopSampler.points(DEMO, spec);
    assertEquals(List.of(0, 6), points);
    double[] shifts = spec.shiftFactors();
    assertEquals(DEMO.configurations().size() * shifts.length * points.size(), s.size());
    PlannedPath path = new PlannedPath(DEMO.sweep());
    int i = 0;
    for (Configuration c : DEMO.configurations()) {
      ConfigurationModel nominal = ConfigurationModel.of(c);
      for (double f : shifts) {
        List<ElasticMode> modes = CaseLoopSampler.shifted(nominal, f).modes().modes();
        double lowest = modes.stream().mapToDouble(ElasticMode::frequencyHz).min().orElseThrow();
        for (int p : points) {
          FlightCondition fc = path.at(p);
          assertEquals(new SampleLabel(c.name(), p, fc.speedEasMps(), fc.altitudeM(), f), s.label(i));
          LoopSamples.Sample smp = s.samples().get(i);
          assertEquals(modes.size(), smp.modeGrid.length);
          for (int k = 0; k < modes.size(); k++) {
            double[] band = CaseLoopSampler.band(modes, k, spec.modeBandFraction());
            double[] w = s.grids().get(smp.modeGrid[k]);
            assertEquals(2 * Math.PI * band[0], w[0], 1e-9 * w[0]);
            assertEquals(2 * Math.PI * band[1], w[w.length - 1], 1e-9 * w[w.length - 1]);
            assertEquals(modes.get(k).name(), s.modeNames().get(smp.modeIndex[k]));
          }
          double[] rigid = s.grids().get(smp.rigidGrid);
          assertEquals(2 * Math.PI * CaseLoopSampler.RIGID_GRID_FROM_HZ, rigid[0], 1e-12);
          assertEquals(2 * Math.PI * spec.rigidBandFraction() * lowest, rigid[rigid.length - 1], 1e-9);
          // the stored parts are those of the split loop at that point
          ServoLoop servo = ServoMargins.loopAt(CaseLoopSampler.shifted(nominal, f), c, DEMO.loop(), fc);
          CaseLoopSampler.SplitLoop split = new CaseLoopSampler.SplitLoop(servo, paths);
          double[] w0 = s.grids().get(smp.modeGrid[0]);
          double[] r = at(split.rest(), w0[3]);
          double[] pp = at(split.path(), w0[3]);
          assertEquals(r[0], smp.restRe[0][3]);
          assertEquals(r[1], smp.restIm[0][3]);
          assertEquals(pp[0], smp.pathRe[0][3]);
          assertEquals(pp[1], smp.pathIm[0][3]);
          i++;
        }
      }
    }
  }
}
