package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RationalFits;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.ServoMargins;
import org.junit.jupiter.api.Test;

/**
 * The demo drone simulated with Karpel's minimum-state aerodynamics (one lag state per lag root)
 * and with the same fit realised in Roger's form (one lag state per mode and lag root): the extra
 * states are unobservable, so every output history is the same.
 */
class MinimumStateSimulationTest {

  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void minimumStateSimulationMatchesTheRogerRealisationOfTheSameFit() {
    Configuration c = DEMO.configurations().get(0);
    ConfigurationModel model = ConfigurationModel.of(c);
    FlightCondition fc = StandardAtmosphere.atEquivalentSpeed(3000.0, 100.0);
    RationalFitSettings settings = new RationalFitSettings(RationalFitForm.MINIMUM_STATE, 6, null, 0.0, Double.NaN,
        RationalFitSettings.DEFAULT_POINTS, FitWeighting.UNIFORM);
    RationalFit ms = RationalFits.fit(model.system().aero(), settings, 1.5);
    RationalFit roger = new RationalFit(ms.referenceSemichordM(), ms.lagRoots(), ms.coefficients(),
        ms.reducedFrequencies(), ms.error(), ms.errorThreshold(), ms.warnings(), ms.sourceDescription(),
        RationalFit.ROGER);
    var servo = ServoMargins.loopAt(model, c, DEMO.loop(), fc);
    AircraftSimulationModel small = AircraftSimulationModel.of(servo, RationalAerodynamics.of(ms), LoopClosure.CLOSED);
    AircraftSimulationModel full = AircraftSimulationModel.of(servo, RationalAerodynamics.of(roger), LoopClosure.CLOSED);
    int m = model.system().size();
    int nl = ms.lagCount();
    // six lag roots, one state each, against m each
    assertEquals(6, nl);
    StateSpace a = small.system();
    StateSpace b = full.system();
    assertEquals(b.stateCount() - nl * (m - 1), a.stateCount());
    assertEquals(b.outputNames(), a.outputNames());
    assertTrue(a.stateNames().contains("aero_lag" + nl), a.stateNames().toString());

    // A pilot step of 0.02 rad at 0.1 s and a 1 - cos gust of 3 m/s over 0.4 s from 0.3 s, 2 s at
    // 2 ms. Both runs are exact discretisations (matrix exponential) of systems with the same
    // input-output map; 1e-8 of each channel's peak allows for the rounding of two matrix
    // exponentials of different order propagated over 1000 steps of a stable system.
    DoubleUnaryOperator pilot = t -> t >= 0.1 ? 0.02 : 0.0;
    DoubleUnaryOperator gust = t -> t >= 0.3 && t <= 0.7 ? 1.5 * (1 - Math.cos(2 * Math.PI * (t - 0.3) / 0.4)) : 0.0;
    TimeHistory ha = LinearSimulation.run(a, 0.002, 1000, List.of(pilot, gust), null, null);
    TimeHistory hb = LinearSimulation.run(b, 0.002, 1000, List.of(pilot, gust), null, null);
    for (String name : a.outputNames()) {
      double[] x = ha.channel(name);
      double[] y = hb.channel(name);
      double peak = 0;
      for (double v : y) {
        peak = Math.max(peak, Math.abs(v));
      }
      assertTrue(peak > 0, name);
      for (int k = 0; k < x.length; k++) {
        assertEquals(y[k], x[k], 1e-8 * peak, name + " at sample " + k);
      }
    }
  }
}
