package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/** Notch attenuation and phase cost per point, against the notch's closed form. */
class NotchCheckTest {
  @Test
  void attenuationAndPhaseLossFollowTheNotchFormula() {
    AnalysisCase demo = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    Configuration cfg = demo.configurations().get(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 60, 70, 2));
    FlutterSolution ol = new PkMethod().solve(m.system(), path, demo.options());
    List<ServoPoint> pts = ServoMargins.withDefaults().along(m, cfg, demo.loop(), path, ol);
    NotchCheck n = pts.get(0).notches().get(0);
    // demo notch: 8.6 Hz, zeta_z 0.05, zeta_p 0.5 -> depth 20 log10(0.1) = -20 dB (closed form)
    assertEquals(-20.0, n.depthDb(), 1e-12);
    for (NotchCheck.ModeAttenuation a : n.modes()) {
      // |N(j w)| = |w0^2 - w^2 + 2 j zz w0 w| / |w0^2 - w^2 + 2 j zp w0 w| (closed form)
      double w0 = 2 * Math.PI * 8.6;
      double w = 2 * Math.PI * a.frequencyHz();
      double num = Math.hypot(w0 * w0 - w * w, 2 * 0.05 * w0 * w);
      double den = Math.hypot(w0 * w0 - w * w, 2 * 0.5 * w0 * w);
      assertEquals(20 * Math.log10(num / den), a.attenuationDb(), 1e-9);
    }
    assertTrue(Double.isFinite(n.crossoverHz()));
    double w0 = 2 * Math.PI * 8.6;
    double w = 2 * Math.PI * n.crossoverHz();
    double phase = Math.atan2(2 * 0.05 * w0 * w, w0 * w0 - w * w) - Math.atan2(2 * 0.5 * w0 * w, w0 * w0 - w * w);
    assertEquals(-Math.toDegrees(phase), n.phaseLossDeg(), 1e-9);
    assertTrue(n.phaseLossDeg() > 0, "a notch lags below its centre");
  }
}
