package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.FitError;
import org.flexmargin.aero.LagRealisation;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.CouplingOrigin;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.numerics.ReferenceEigenvalues;
import org.junit.jupiter.api.Test;

/**
 * The aircraft plant and its closed loop with Karpel's minimum-state aerodynamics: one lag state per
 * lag root, the same transfer function as the exact equations with the fit's forces, and the same
 * roots as the realisation of the same matrices in Roger's form, whose extra lag states are
 * unobservable modes at the lag poles.
 */
class MinimumStatePlantTest {

  private static final int M = 3;
  private static final double[] BETA = {0.15, 0.5, 1.2};
  private static final double B = 0.6;

  /**
   * Q(p) = A0 + A1 p + A2 p^2 + sum_l d_l e_l^T p / (p + beta_l), 3 modes (invented, of the size of
   * strip-theory forces in m^2: stiffness-like A0 &lt; 0 on the diagonal, aerodynamic damping A1 &lt; 0).
   */
  private static RationalFit fit(String form) {
    double[][] a0 = {{-0.5, 0.2, 0.05}, {0.1, -0.8, 0.15}, {-0.04, 0.1, -0.3}};
    double[][] a1 = {{-0.3, 0.05, 0.02}, {0.02, -0.4, 0.03}, {0.01, -0.02, -0.25}};
    double[][] a2 = {{-0.05, 0.0, 0.01}, {0.0, -0.02, 0.0}, {0.005, 0.0, -0.03}};
    double[][] d = {{0.4, -0.1, 0.2}, {0.1, 0.3, -0.2}, {-0.2, 0.15, 0.25}};
    double[][] e = {{0.8, 0.3, -0.5}, {-0.2, 0.9, 0.4}, {0.5, -0.6, 0.7}};
    double[][][] c = new double[3 + BETA.length][][];
    c[0] = a0;
    c[1] = a1;
    c[2] = a2;
    for (int l = 0; l < BETA.length; l++) {
      c[3 + l] = new double[M][M];
      for (int i = 0; i < M; i++) {
        for (int j = 0; j < M; j++) {
          c[3 + l][i][j] = d[l][i] * e[l][j];
        }
      }
    }
    return new RationalFit(B, BETA, c, new double[] {0, 1, 2}, new FitError(new double[M][M], new double[M][M], 0, 0, 0), 0.05,
        List.of(), "three invented modes", form);
  }

  private static final List<SensorSpec> SENSORS = List.of(AircraftPlantTest.SENSORS.get(0),
      AircraftPlantTest.SENSORS.get(1), new SensorSpec("vane", SensorKind.ANGLE_OF_ATTACK_VANE, "gyro", -3.0, 0.0));

  private static AircraftPlant plant(RationalFit aero) {
    ModeTable modes = new ModeTable("three", List.of(
        new ElasticMode("m1", 4.0, 0.02, 30.0,
            Map.of("gyro", new ShapeValue(0.1, 0.05), "accel", new ShapeValue(0.3, 0.02))),
        new ElasticMode("m2", 9.0, 0.015, 12.0,
            Map.of("gyro", new ShapeValue(-0.2, 0.12), "accel", new ShapeValue(0.1, -0.04))),
        new ElasticMode("m3", 15.0, 0.02, 8.0,
            Map.of("gyro", new ShapeValue(0.05, -0.2), "accel", new ShapeValue(-0.15, 0.03)))));
    Map<String, ModeCoupling> coupling = Map.of(
        "m1", new ModeCoupling(0.02, -0.01, 0.5, 0.3, 0.7, CouplingOrigin.STRIPS),
        "m2", new ModeCoupling(-0.01, 0.03, -0.2, 0.6, -0.4, CouplingOrigin.SUPPLIED),
        "m3", new ModeCoupling(0.005, 0.01, 0.1, -0.2, 0.3, CouplingOrigin.SUPPLIED));
    FlightCondition fc = StandardAtmosphere.at(0.0, 176 * AircraftPlantTest.FT);
    return new AircraftPlant(modes, StructuralModel.fromModeTable(modes), aero,
        AircraftPlantTest.navion(0.1, coupling), SENSORS, fc);
  }

  private static ServoLoop servo(AircraftPlant plant) {
    LoopSpec loop = new LoopSpec(new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7), SENSORS.subList(0, 2),
        List.of(new FeedbackPath("gyro", 0.3, 0.6, List.of(new NotchFilterSpec(8.6, 0.05, 0.5)), null),
            new FeedbackPath("accel", 0.05, 0, List.of(), null)), 0, 0, 2);
    return new ServoLoop(plant, FlightControlLaw.of(loop, plant.condition().dynamicPressurePa()));
  }


  @Test
  void oneLagStatePerLagRoot() {
    RationalFit ms = fit(RationalFit.MINIMUM_STATE);
    AircraftPlant plant = plant(ms);
    StateSpace small = plant.stateSpace(RationalAerodynamics.of(ms));
    StateSpace full = plant.stateSpace(RationalAerodynamics.of(fit(RationalFit.ROGER)));
    // 2 rigid + 2 m elastic + one per lag root, against m per lag root
    assertEquals(2 + 2 * M + BETA.length, small.stateCount());
    assertEquals(2 + 2 * M + BETA.length * M, full.stateCount());
    assertEquals(List.of("alpha", "q", "m1", "m2", "m3", "m1_rate", "m2_rate", "m3_rate", "aero_lag1", "aero_lag2",
        "aero_lag3"), small.stateNames());
    assertEquals("m1_lag1", full.stateNames().get(8));
    assertEquals("m3_lag3", full.stateNames().get(16));
    // the loop adds the same states to either
    ServoLoop servo = servo(plant);
    int loopStates = servo.closedLoop(RationalAerodynamics.of(fit(RationalFit.ROGER))).stateCount() - full.stateCount();
    assertTrue(loopStates > 0);
    assertEquals(small.stateCount() + loopStates, servo.closedLoop(RationalAerodynamics.of(ms)).stateCount());
  }

  @Test
  void stateSpaceEqualsTheExactEquationsWithTheFitsForces() {
    // With the fit itself as the plant's exact source, the direct (2 + m) complex solve at Q(ik) and
    // the one-state-per-root realisation must give the same sensor responses (every sign, the
    // rank-one lag states, the accelerometer's feed-through). 1e-9 relative: two exact computations
    // of one transfer function, each losing at most the condition number of its solve to rounding.
    RationalFit ms = fit(RationalFit.MINIMUM_STATE);
    AircraftPlant p = plant(ms);
    StateSpace ss = p.stateSpace(RationalAerodynamics.of(ms));
    double[] w = {0.05, 0.7, 3.0, 12.0, 25.1, 56.0, 94.0, 200.0};
    PlantResponseCheck.stateSpaceEqualsEvaluator(p, ss, w, SENSORS.size());
  }

  /**
   * The full realisation's roots are the minimum-state ones plus m - 1 roots at each lag pole
   * -(V/b) beta_l: r_l in the (m - 1)-dimensional space orthogonal to e_l with everything else at
   * rest stays there (its force d_l e_l^T r_l is zero), and it decays at the lag pole; no sensor and
   * so no loop sees it. Eigenvalues by Commons Math (independent of the EJML solver of {@link
   * StateSpace#eigenvalues()}); 1e-9 of the spectral radius: two backward-stable solutions (rounding
   * ~1e-15 of the radius times the roots' condition numbers, below 1e5 here); the repeated lag poles
   * are semisimple, so rounding does not split them by its square root. Measured worst: 1.6e-14
   * (open loop), 1.7e-11 (closed loop, the notch's lightly damped pair).
   */
  private static void assertSameRootsPlusLagPoles(DMatrixRMaj small, DMatrixRMaj full, double speed) {
    List<Complex> fewer = ReferenceEigenvalues.of(small);
    List<Complex> rest = new ArrayList<>(ReferenceEigenvalues.of(full));
    double radius = rest.stream().mapToDouble(Complex::abs).max().orElseThrow();
    for (Complex s : fewer) {
      Complex nearest = rest.stream().min((x, y) -> Double.compare(x.subtract(s).abs(), y.subtract(s).abs()))
          .orElseThrow();
      assertTrue(nearest.subtract(s).abs() < 1e-9 * radius, "root " + s + " missing; nearest " + nearest);
      rest.remove(nearest);
    }
    assertEquals(BETA.length * (M - 1), rest.size());
    for (double beta : BETA) {
      Complex pole = new Complex(-speed / B * beta, 0);
      long at = rest.stream().filter(s -> s.subtract(pole).abs() < 1e-9 * radius).count();
      assertEquals(M - 1, at, "extra roots at the lag pole " + pole + ": " + rest);
    }
  }

  @Test
  void openAndClosedLoopRootsAreThoseOfTheRogerRealisationBesideItsLagPoles() {
    RationalFit ms = fit(RationalFit.MINIMUM_STATE);
    RationalFit roger = fit(RationalFit.ROGER);
    AircraftPlant plant = plant(ms);
    double v = plant.condition().speedTasMps();
    assertSameRootsPlusLagPoles(plant.stateSpace(RationalAerodynamics.of(ms)).a(),
        plant.stateSpace(RationalAerodynamics.of(roger)).a(), v);
    ServoLoop servo = servo(plant);
    assertSameRootsPlusLagPoles(servo.closedLoop(RationalAerodynamics.of(ms)).a(),
        servo.closedLoop(RationalAerodynamics.of(roger)).a(), v);
  }

  @Test
  void aRealisationOfAnotherSizeIsRefused() {
    AircraftPlant plant = plant(fit(RationalFit.MINIMUM_STATE));
    RationalAerodynamics two = AircraftPlantTest.zeroAero(2);
    assertThrows(IllegalArgumentException.class, () -> plant.stateSpace(two));
    LagRealisation wrongSize = LagRealisation.roger(2, new double[] {0.3}, new double[1][2][2]);
    RationalAerodynamics mismatched = withRealisation(M, wrongSize);
    assertThrows(IllegalArgumentException.class, () -> plant.stateSpace(mismatched));
    // a realisation of the plant's size under aerodynamics that claim another
    LagRealisation right = LagRealisation.roger(M, new double[] {0.3}, new double[1][M][M]);
    assertThrows(IllegalArgumentException.class, () -> plant.stateSpace(withRealisation(2, right)));
  }

  @Test
  void lagStatesOfAMultiRowBlockAreNumberedWithinTheirLagRoot() {
    // two states for the single lag root, E not the identity: named by lag root and state
    LagRealisation two = new LagRealisation(M, new double[] {0.3}, new double[][][] {{{1, 0, 0}, {0, 1, 1}}},
        new double[][][] {{{0.1, 0}, {0, 0.1}, {0, 0}}});
    StateSpace ss = plant(fit(RationalFit.MINIMUM_STATE)).stateSpace(withRealisation(M, two));
    assertEquals(2 + 2 * M + 2, ss.stateCount());
    assertEquals(List.of("aero_lag1_1", "aero_lag1_2"), ss.stateNames().subList(2 + 2 * M, 2 + 2 * M + 2));
    // the fit seen as rational aerodynamics keeps its lag roots
    RationalAerodynamics of = RationalAerodynamics.of(fit(RationalFit.MINIMUM_STATE));
    assertEquals(BETA.length, of.lagCount());
    assertEquals(BETA[1], of.lagRoot(1), 0.0);
  }

  /** Zero aerodynamics of {@code size} coordinates (as they claim) with the given lag realisation. */
  private static RationalAerodynamics withRealisation(int size, LagRealisation lags) {
    return new RationalAerodynamics() {
      @Override
      public int size() {
        return size;
      }

      @Override
      public double referenceSemichordM() {
        return B;
      }

      @Override
      public int lagCount() {
        return lags.lagCount();
      }

      @Override
      public double lagRoot(int l) {
        return lags.lagRoot(l);
      }

      @Override
      public DMatrixRMaj coefficient(int index) {
        return new DMatrixRMaj(M, M);
      }

      @Override
      public LagRealisation lagRealisation() {
        return lags;
      }
    };
  }
}
