package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
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

  @Test
  void loopAtATimeSatisfiesTheReturnDifferenceIdentity() {
    // Algebraic identity (no approximation): with G = sum_q C_q P_q F and G_rest = G - C_p P_p F,
    // 1 + L_p = (1 - G) / (1 - G_rest) and 1 + L = 1 - G, so (1 + L_p)(1 - G_rest) = 1 + L.
    RigidBody rb = AircraftPlantTest.navion(0.3, Map.of("bend", new org.flexmargin.model.ModeCoupling(0.01, -0.02, 0.4, 0.5)));
    AircraftPlant plant = AircraftPlantTest.plant(rb, AircraftPlantTest.oneMode(7.5, new ShapeValue(0.3, 0.15)),
        AircraftPlantTest.zeroAero(1), AircraftPlantTest.SENSORS);
    LoopSpec loop = new LoopSpec(new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7), AircraftPlantTest.SENSORS,
        List.of(new FeedbackPath("gyro", 0.3, 0.6, List.of(new NotchFilterSpec(8.6, 0.05, 0.5)), null),
            new FeedbackPath("accel", 0.05, 0, List.of(), null)), 0.01, 0.0125, 2);
    ServoLoop servo = new ServoLoop(plant, FlightControlLaw.of(loop, plant.condition().dynamicPressurePa()));
    SisoFrequencyFunction l = servo.brokenLoop();
    SisoFrequencyFunction l0 = servo.brokenAtPath(0);
    SisoFrequencyFunction l1 = servo.brokenAtPath(1);
    double[] a = new double[2];
    double[] b = new double[2];
    double[] c = new double[2];
    for (double w : new double[] {0.2, 1.5, 9.0, 47.0, 120.0}) {
      l.response(w, a);
      l0.response(w, b);
      l1.response(w, c);
      // L = -(G_0 + G_1) and L_0 = -G_0/(1 - G_1), L_1 = -G_1/(1 - G_0): recover G_0, G_1 from L_0, L_1
      // via G_0 = -L_0 (1 - G_1) and check G_0 + G_1 = -L with the solution of the 2x2 linear system
      // g0 + L0 (1 - g1) = 0, g1 + L1 (1 - g0) = 0  =>  g0 = -L0 (1 + L1) / (1 - L0 L1)
      org.apache.commons.math3.complex.Complex L0 = new org.apache.commons.math3.complex.Complex(b[0], b[1]);
      org.apache.commons.math3.complex.Complex L1 = new org.apache.commons.math3.complex.Complex(c[0], c[1]);
      org.apache.commons.math3.complex.Complex one = org.apache.commons.math3.complex.Complex.ONE;
      org.apache.commons.math3.complex.Complex den = one.subtract(L0.multiply(L1));
      org.apache.commons.math3.complex.Complex g0 = L0.negate().multiply(one.add(L1)).divide(den);
      org.apache.commons.math3.complex.Complex g1 = L1.negate().multiply(one.add(L0)).divide(den);
      org.apache.commons.math3.complex.Complex sum = g0.add(g1);
      double scale = Math.max(1e-9, Math.hypot(a[0], a[1]));
      // 1e-9 relative: exact algebra in double precision
      assertEquals(-a[0], sum.getReal(), 1e-9 * scale, "at " + w);
      assertEquals(-a[1], sum.getImaginary(), 1e-9 * scale, "at " + w);
    }
  }

  /** The two-path loop of {@link #brokenLoopFromTheFrequencyDomainEqualsTheStateSpaceChain()}. */
  private static ServoLoop twoPathLoop(TestRational aero) {
    RigidBody rb = AircraftPlantTest.navion(0.3, Map.of("bend", new org.flexmargin.model.ModeCoupling(0.01, -0.02, 0.4, 0.5)));
    AircraftPlant plant = AircraftPlantTest.plant(rb, AircraftPlantTest.oneMode(7.5, new ShapeValue(0.3, 0.15)), aero,
        AircraftPlantTest.SENSORS);
    LoopSpec loop = new LoopSpec(new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7), AircraftPlantTest.SENSORS,
        List.of(new FeedbackPath("gyro", 0.3, 0.6, List.of(new NotchFilterSpec(8.6, 0.05, 0.5)), null),
            new FeedbackPath("accel", 0.05, 0, List.of(), null)), 0, 0, 2);
    return new ServoLoop(plant, FlightControlLaw.of(loop, plant.condition().dynamicPressurePa()));
  }

  private static TestRational rationalAero() {
    return new TestRational(0.6, new double[] {0.3},
        new org.ejml.data.DMatrixRMaj(new double[][] {{-0.4}}), new org.ejml.data.DMatrixRMaj(new double[][] {{-0.2}}),
        new org.ejml.data.DMatrixRMaj(new double[][] {{-0.01}}), new org.ejml.data.DMatrixRMaj(new double[][] {{0.1}}));
  }

  @Test
  void sharedResponsesSolveTheAircraftOncePerFrequencyAndMatchTheStateSpaceChain() {
    TestRational aero = rationalAero();
    ServoLoop servo = twoPathLoop(aero);
    ServoLoop.Responses shared = servo.responses();
    SisoFrequencyFunction l = shared.brokenLoop();
    SisoFrequencyFunction l0 = shared.brokenAtPath(0);
    SisoFrequencyFunction l1 = shared.brokenAtPath(1);
    double[] w = {0.3, 2.0, 10.0, 47.1, 53.0, 120.0};
    FrequencyResponse g = servo.openChain(aero).frequencyResponse(w);
    double[] v = new double[2];
    double[] fresh = new double[2];
    for (int pass = 0; pass < 2; pass++) {
      for (int k = 0; k < w.length; k++) {
        l.response(w[k], v);
        double re = -g.real(k, 0, 0);
        double im = -g.imag(k, 0, 0);
        double scale = Math.max(1e-9, Math.hypot(re, im));
        // 1e-9 relative: the same transfer function computed two exact ways (second pass: from
        // the memo)
        assertEquals(re, v[0], 1e-9 * scale, "re at " + w[k] + ", pass " + pass);
        assertEquals(im, v[1], 1e-9 * scale, "im at " + w[k] + ", pass " + pass);
        for (int p = 0; p < 2; p++) {
          (p == 0 ? l0 : l1).response(w[k], v);
          servo.brokenAtPath(p).response(w[k], fresh);
          // a value shared with the other loops is the very value of a separate evaluation
          assertEquals(fresh[0], v[0], 0.0, "path " + p + " re at " + w[k]);
          assertEquals(fresh[1], v[1], 0.0, "path " + p + " im at " + w[k]);
        }
      }
    }
    assertEquals(w.length, shared.aircraftSolves(), "one aircraft solve per distinct frequency");
  }

  @Test
  void marginsThroughTheSharedResponsesEqualSeparateOnesWithFewerAircraftSolves() {
    ServoLoop servo = twoPathLoop(rationalAero());
    ServoLoop.Responses shared = servo.responses();
    org.flexmargin.loop.LoopMargins margins = new org.flexmargin.loop.LoopMargins();
    Eigenvalues seeds = new Eigenvalues(new double[] {-0.5}, new double[] {47.0});
    int separateEvaluations = 0;
    for (int p = -1; p < 2; p++) {
      SisoFrequencyFunction separate = p < 0 ? servo.brokenLoop() : servo.brokenAtPath(p);
      SisoFrequencyFunction viaShared = p < 0 ? shared.brokenLoop() : shared.brokenAtPath(p);
      org.flexmargin.loop.LoopMarginResult a = margins.analyse(separate, 0.05, 400, seeds);
      org.flexmargin.loop.LoopMarginResult b = margins.analyse(viaShared, 0.05, 400, seeds);
      // the same values of L at the same frequencies: the same margins to the last bit
      assertEquals(a, b, "loop " + p);
      separateEvaluations += a.diagnostics().functionEvaluations();
    }
    // the three grids share their initial and seed points, the root brackets and maximisation
    // starts are grid points: every one of them costs one solve only
    assertTrue(shared.aircraftSolves() < 0.75 * separateEvaluations,
        shared.aircraftSolves() + " solves for " + separateEvaluations + " separate evaluations");
  }

  @Test
  void sharedResponsesDeclareTheForwardDelayAndKnowTheirPaths() {
    RigidBody rb = AircraftPlantTest.navion(0.3, Map.of());
    AircraftPlant plant = AircraftPlantTest.plant(rb, AircraftPlantTest.oneMode(7.5, new ShapeValue(0.3, 0.15)),
        AircraftPlantTest.zeroAero(1), AircraftPlantTest.SENSORS);
    LoopSpec loop = new LoopSpec(new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7), AircraftPlantTest.SENSORS,
        List.of(new FeedbackPath("gyro", 0.3, 0.6, List.of(), null),
            new FeedbackPath("accel", 0.05, 0, List.of(), null)), 0.01, 0.0125, 2);
    ServoLoop servo = new ServoLoop(plant, FlightControlLaw.of(loop, plant.condition().dynamicPressurePa()));
    ServoLoop.Responses shared = servo.responses();
    // computation delay plus half the sample period: the zero-order hold
    // (1 - e^{-j w T})/(j w T) = sinc(w T/2) e^{-j w T/2} delays by T/2
    assertEquals(0.01 + 0.0125 / 2, shared.brokenLoop().pureDelayS(), 1e-15);
    assertThrows(IllegalArgumentException.class, () -> shared.brokenAtPath(2));
    assertThrows(IllegalArgumentException.class, () -> shared.brokenAtPath(-1));
    assertEquals(0, shared.aircraftSolves());
  }
}
