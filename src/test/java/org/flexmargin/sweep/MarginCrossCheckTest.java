package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.ase.AircraftPlant;
import org.flexmargin.ase.FlightControlLaw;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.FrequencyResponse;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.LoopMargins;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;
import org.junit.jupiter.api.Test;

/**
 * Margin figures from the direct modal loop against an independent dense evaluation: a complex
 * LU solve of (j w I - A) x = B on the full state of the state-space chain at each frequency.
 * Both see the same rational aerodynamics and no delays, so they describe the same loop exactly.
 */
class MarginCrossCheckTest {

  @Test
  void directAndDenseStateSpaceMarginsAgree() {
    AnalysisCase demo = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    Configuration cfg = demo.configurations().get(0);
    ConfigurationModel model = ConfigurationModel.of(cfg);
    LoopSpec spec = demo.loop();
    LoopSpec noDelay = new LoopSpec(spec.actuator(), spec.sensors(), spec.paths(), 0.0, 0.0, spec.padeOrder());
    RationalFit fit = RogerApproximation.fit(model.system().aero(), 3.0, 4);
    FlightCondition fc = new PlannedPath(demo.sweep()).at(25);
    AircraftPlant plant = new AircraftPlant(model.modes(), model.system().structure(), fit, cfg.rigidBody(),
        noDelay.sensors(), fc);
    ServoLoop servo = new ServoLoop(plant, FlightControlLaw.of(noDelay, fc.dynamicPressurePa()));
    StateSpace chain = servo.openChain(RationalAerodynamics.of(fit));
    LoopMargins margins = new LoopMargins();
    double wMin = 2 * Math.PI * 0.01;
    double wMax = 2 * Math.PI * 60;
    LoopMarginResult direct = margins.analyse(servo.brokenLoop(), wMin, wMax, Eigenvalues.none());
    LoopMarginResult dense = margins.analyse((w, reIm) -> {
      FrequencyResponse r = chain.frequencyResponseDenseLu(new double[] {w});
      reIm[0] = -r.real(0, 0, 0);
      reIm[1] = -r.imag(0, 0, 0);
    }, wMin, wMax, Eigenvalues.none());
    assertFalse(direct.gainCrossovers().isEmpty());
    assertEquals(direct.gainCrossovers().size(), dense.gainCrossovers().size());
    assertEquals(direct.phaseCrossovers().size(), dense.phaseCrossovers().size());
    for (int i = 0; i < direct.gainCrossovers().size(); i++) {
      GainCrossover a = direct.gainCrossovers().get(i);
      GainCrossover b = dense.gainCrossovers().get(i);
      // crossings refined by Brent to ~1e-10 relative on functions equal to ~1e-10: 1e-6 slack
      assertEquals(a.frequencyHz(), b.frequencyHz(), 1e-6 * a.frequencyHz());
      assertEquals(a.phaseMarginDeg(), b.phaseMarginDeg(), 1e-4);
    }
    for (int i = 0; i < direct.phaseCrossovers().size(); i++) {
      PhaseCrossover a = direct.phaseCrossovers().get(i);
      PhaseCrossover b = dense.phaseCrossovers().get(i);
      assertEquals(a.frequencyHz(), b.frequencyHz(), 1e-6 * a.frequencyHz());
      assertEquals(a.gainMarginDb(), b.gainMarginDb(), 1e-4);
    }
    assertEquals(direct.diskMargin().alpha(), dense.diskMargin().alpha(), 1e-6);
    List<String> states = chain.stateNames();
    assertFalse(states.isEmpty());
  }
}
