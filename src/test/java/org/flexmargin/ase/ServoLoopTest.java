package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.FrequencyResponse;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.ShapeValue;
import org.junit.jupiter.api.Test;

/** The loop closed around the aircraft. */
class ServoLoopTest {

  @Test
  void closedLoopPolesOfPitchRateFeedbackMatchTheHandDerivedCubic() {
    // Short period (no elastic coupling) + first-order actuator w_a/(s + w_a) + delta_cmd = K q.
    // Plant: alpha' = a11 alpha + q + b1 delta; q' = a21 alpha + a22 q + b2 delta (alpha' substituted).
    // det(sI - A_cl) with A_cl = [[a11, 1, b1], [a21, a22, b2], [0, w_a K, -w_a]] expanded by hand:
    // s^3 + c2 s^2 + c1 s + c0 with
    //   c2 = w_a - a11 - a22
    //   c1 = a11 a22 - a21 - w_a (a11 + a22) - w_a K b2
    //   c0 = w_a (a11 a22 - a21) + w_a K (a11 b2 - a21 b1)
    // Roots by Commons Math's Laguerre solver (independent of the eigen-solver).
    RigidBody rb = AircraftPlantTest.navion(0.5, Map.of());
    AircraftPlant plant = AircraftPlantTest.plant(rb, AircraftPlantTest.oneMode(30, new ShapeValue(0, 0)),
        AircraftPlantTest.zeroAero(1), List.of(AircraftPlantTest.SENSORS.get(0)));
    double wa = 2 * Math.PI * 8;
    double gain = 0.4;
    LoopSpec loop = new LoopSpec(new ActuatorSpec(ActuatorOrder.FIRST, 8, 0.7),
        List.of(AircraftPlantTest.SENSORS.get(0)),
        List.of(new FeedbackPath("gyro", gain, 0, List.of(), null)), 0, 0, 2);
    ServoLoop servo = new ServoLoop(plant, FlightControlLaw.of(loop, plant.condition().dynamicPressurePa()));
    StateSpace cl = servo.closedLoop(AircraftPlantTest.zeroAero(1));
    FlightCondition fc = plant.condition();
    double v = fc.speedTasMps();
    double qd = fc.dynamicPressurePa();
    double lf = qd * rb.referenceAreaM2() / (rb.massKg() * v);
    double mf = qd * rb.referenceAreaM2() * rb.referenceChordM() / rb.pitchInertiaKgM2();
    double rf = rb.referenceChordM() / (2 * v);
    double a11 = -lf * rb.liftSlopePerRad();
    double b1 = -lf * rb.liftPerElevatorPerRad();
    double mad = mf * rb.alphaDotDampingCmAlphaDot() * rf;
    double a21 = mf * rb.pitchMomentSlopePerRad() + mad * a11;
    double a22 = mf * rb.pitchDampingCmq() * rf + mad;
    double b2 = mf * rb.pitchMomentPerElevatorPerRad() + mad * b1;
    double c2 = wa - a11 - a22;
    double c1 = a11 * a22 - a21 - wa * (a11 + a22) - wa * gain * b2;
    double c0 = wa * (a11 * a22 - a21) + wa * gain * (a11 * b2 - a21 * b1);
    Complex[] roots = new LaguerreSolver().solveAllComplex(new double[] {c0, c1, c2, 1.0}, 0.0);
    Eigenvalues e = cl.eigenvalues();
    for (Complex r : roots) {
      double best = Double.MAX_VALUE;
      for (int i = 0; i < e.real().length; i++) {
        best = Math.min(best, Math.hypot(e.real()[i] - r.getReal(), e.imag()[i] - r.getImaginary()));
      }
      // 1e-8 absolute on roots of magnitude ~1..50: both computations are exact to rounding
      assertTrue(best < 1e-8, "closed-loop root " + r + " missing; nearest at " + best);
    }
    // the pitch-rate loop stabilises the statically unstable airframe
    assertTrue(AircraftPlantTest.plant(rb, AircraftPlantTest.oneMode(30, new ShapeValue(0, 0)),
        AircraftPlantTest.zeroAero(1), List.of()).stateSpace(AircraftPlantTest.zeroAero(1)).eigenvalues().maxRealPart() > 0);
    double maxRigid = Double.NEGATIVE_INFINITY;
    for (Complex r : roots) {
      maxRigid = Math.max(maxRigid, r.getReal());
    }
    assertTrue(maxRigid < 0, "loop should stabilise the airframe: " + maxRigid);
  }

  @Test
  void brokenLoopFromTheFrequencyDomainEqualsTheStateSpaceChain() {
    // Without delays and with aerodynamics exactly rational, L(jw) computed from the modal
    // equations must equal -G(jw) of the state-space chain (sign convention of ServoLoop).
    RigidBody rb = AircraftPlantTest.navion(0.3, Map.of("bend", new org.flexmargin.model.ModeCoupling(0.01, -0.02, 0.4, 0.5)));
    TestRational aero = new TestRational(0.6, new double[] {0.3},
        new org.ejml.data.DMatrixRMaj(new double[][] {{-0.4}}), new org.ejml.data.DMatrixRMaj(new double[][] {{-0.2}}),
        new org.ejml.data.DMatrixRMaj(new double[][] {{-0.01}}), new org.ejml.data.DMatrixRMaj(new double[][] {{0.1}}));
    AircraftPlant plant = AircraftPlantTest.plant(rb, AircraftPlantTest.oneMode(7.5, new ShapeValue(0.3, 0.15)), aero,
        AircraftPlantTest.SENSORS);
    LoopSpec loop = new LoopSpec(new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7), AircraftPlantTest.SENSORS,
        List.of(new FeedbackPath("gyro", 0.3, 0.6, List.of(new NotchFilterSpec(8.6, 0.05, 0.5)), null),
            new FeedbackPath("accel", 0.05, 0, List.of(), null)), 0, 0, 2);
    ServoLoop servo = new ServoLoop(plant, FlightControlLaw.of(loop, plant.condition().dynamicPressurePa()));
    SisoFrequencyFunction l = servo.brokenLoop();
    double[] w = {0.3, 2.0, 10.0, 47.1, 53.0, 120.0};
    FrequencyResponse g = servo.openChain(aero).frequencyResponse(w);
    double[] v = new double[2];
    for (int k = 0; k < w.length; k++) {
      l.response(w[k], v);
      double re = -g.real(k, 0, 0);
      double im = -g.imag(k, 0, 0);
      double scale = Math.max(1e-9, Math.hypot(re, im));
      // 1e-9 relative: the same transfer function computed two exact ways
      assertEquals(re, v[0], 1e-9 * scale, "re at " + w[k]);
      assertEquals(im, v[1], 1e-9 * scale, "im at " + w[k]);
    }
  }
}
