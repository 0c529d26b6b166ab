package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.CouplingOrigin;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/** The flexible aircraft plant: rigid short period, coupling, sensors, both faces. */
class AircraftPlantTest {

  static final double FT = 0.3048;

  /**
   * Navion short-period derivatives (Nelson, Flight Stability and Automatic Control, ch. 4; from
   * memory, docs/validation.md §9): Z_alpha = -355.35 ft/s^2, M_alpha = -8.80 1/s^2,
   * M_alphadot = -0.90 1/s, M_q = -2.05 1/s, u0 = 176 ft/s. Converted to our non-dimensional inputs
   * with an arbitrary mass, inertia, area and chord at sea level (the dimensional values are what
   * matter).
   */
  static RigidBody navion(double cmAlphaOverride, Map<String, ModeCoupling> coupling) {
    double v = 176 * FT;
    double qd = 0.5 * 1.225 * v * v;
    double mass = 1247.0;
    double inertia = 4067.0;
    double s = 16.7;
    double c = 1.74;
    double zAlpha = -355.35 * FT;
    double clAlpha = -zAlpha * mass / (qd * s);
    double mf = qd * s * c / inertia;
    double rf = c / (2 * v);
    double cmAlpha = Double.isNaN(cmAlphaOverride) ? -8.80 / mf : cmAlphaOverride;
    return new RigidBody(mass, inertia, s, c, clAlpha, cmAlpha, -2.05 / (mf * rf), -0.90 / (mf * rf),
        0.4, -1.0, coupling);
  }

  static ModeTable oneMode(double frequencyHz, ShapeValue atSensor) {
    return new ModeTable("m", List.of(new ElasticMode("bend", frequencyHz, 0.02, 10.0,
        Map.of("gyro", atSensor, "accel", atSensor))));
  }

  static AircraftPlant plant(RigidBody rb, ModeTable modes, TestRational aero, List<SensorSpec> sensors) {
    FlightCondition fc = StandardAtmosphere.at(0.0, 176 * FT);
    return new AircraftPlant(modes, StructuralModel.fromModeTable(modes), aero, rb, sensors, fc);
  }

  static TestRational zeroAero(int n) {
    return new TestRational(1.0, new double[] {0.3}, new DMatrixRMaj(n, n), new DMatrixRMaj(n, n),
        new DMatrixRMaj(n, n), new DMatrixRMaj(n, n));
  }

  static final List<SensorSpec> SENSORS = List.of(
      new SensorSpec("gyro", SensorKind.PITCH_RATE_GYRO, "gyro", 0.0, 0.0),
      new SensorSpec("accel", SensorKind.NORMAL_ACCELEROMETER, "accel", 1.2, 0.0));

  @Test
  void shortPeriodMatchesTheTextbookApproximation() {
    // Nelson ch. 4: omega_sp = sqrt(Z_a M_q / u0 - M_a) = 3.597 rad/s,
    // zeta_sp = -(M_q + M_adot + Z_a/u0) / (2 omega_sp) = 0.691 (derived from the memory values)
    // The uncoupled 30 Hz mode does not disturb the rigid roots.
    AircraftPlant p = plant(navion(Double.NaN, Map.of()), oneMode(30, new ShapeValue(0, 0)), zeroAero(1), SENSORS);
    Eigenvalues e = p.stateSpace(zeroAero(1)).eigenvalues();
    int sp = lowestFrequencyComplex(e);
    // 1e-3 relative: the reference values are quoted to 4 digits
    assertEquals(3.597, e.naturalFrequencyRadPerS(sp), 3.597e-3);
    assertEquals(0.691, e.dampingRatio(sp), 0.691e-3);
  }

  @Test
  void weakElasticCouplingBarelyMovesTheShortPeriod() {
    Map<String, ModeCoupling> weak = Map.of("bend", new ModeCoupling(0.001, -0.001, 0.01, 0.01));
    AircraftPlant p = plant(navion(Double.NaN, weak), oneMode(30, new ShapeValue(0.01, 0.01)), zeroAero(1), SENSORS);
    Eigenvalues e = p.stateSpace(zeroAero(1)).eigenvalues();
    int sp = lowestFrequencyComplex(e);
    // weak coupling: within 1 % of the textbook short period
    assertEquals(3.597, e.naturalFrequencyRadPerS(sp), 0.01 * 3.597);
    assertEquals(0.691, e.dampingRatio(sp), 0.01 * 0.691);
  }

  @Test
  void negativeStaticMarginGivesAnUnstableRealRootWithTheClosedFormDoublingTime() {
    // Cm_alpha = 0.5 (M_alpha = 6.3 1/s^2 > Z_a M_q / V = 4.1 1/s^2): the characteristic polynomial s^2 - (M_q + M_adot + Z_a/V) s + (Z_a M_q/V - M_a)
    // has a positive real root; time to double = ln 2 / sigma (closed form).
    RigidBody rb = navion(0.5, Map.of());
    AircraftPlant p = plant(rb, oneMode(30, new ShapeValue(0, 0)), zeroAero(1), SENSORS);
    // sigma = -b1 / 2 + sqrt(b1^2 / 4 - c0), the quadratic written out in ShortPeriodRootsTest
    double[] q = ShortPeriodRootsTest.quadratic(p, rb);
    double sigma = q[0] + Math.sqrt(q[1]);
    assertTrue(sigma > 0);
    Eigenvalues e = p.stateSpace(zeroAero(1)).eigenvalues();
    assertEquals(sigma, e.maxRealPart(), 1e-9 * sigma);
    double doubling = Math.log(2) / e.maxRealPart();
    assertEquals(Math.log(2) / sigma, doubling, 1e-9);
  }

  @Test
  void exactAndStateSpaceFrequencyResponsesAgree() {
    // Consistency that cannot be faked: with aerodynamics exactly of Roger form, the direct
    // (2 + m) complex solve and the state-space realisation (all signs, lag states, the
    // accelerometer's feed-through) must give the same sensor responses.
    int n = 2;
    DMatrixRMaj a0 = new DMatrixRMaj(new double[][] {{-0.5, 0.2}, {0.1, -0.8}});
    DMatrixRMaj a1 = new DMatrixRMaj(new double[][] {{-0.3, 0.05}, {0.02, -0.4}});
    DMatrixRMaj a2 = new DMatrixRMaj(new double[][] {{-0.05, 0.0}, {0.0, -0.02}});
    DMatrixRMaj l1 = new DMatrixRMaj(new double[][] {{0.2, -0.1}, {0.05, 0.3}});
    DMatrixRMaj l2 = new DMatrixRMaj(new double[][] {{-0.1, 0.04}, {0.02, 0.1}});
    TestRational aero = new TestRational(0.6, new double[] {0.2, 0.7}, a0, a1, a2, l1, l2);
    ModeTable modes = new ModeTable("two", List.of(
        new ElasticMode("m1", 4.0, 0.02, 30.0, Map.of("gyro", new ShapeValue(0.1, 0.05), "accel", new ShapeValue(0.3, 0.02))),
        new ElasticMode("m2", 9.0, 0.015, 12.0, Map.of("gyro", new ShapeValue(-0.2, 0.12), "accel", new ShapeValue(0.1, -0.04)))));
    Map<String, ModeCoupling> coupling = Map.of(
        "m1", new ModeCoupling(0.02, -0.01, 0.5, 0.3, 0.7, CouplingOrigin.STRIPS),
        "m2", new ModeCoupling(-0.01, 0.03, -0.2, 0.6, -0.4, CouplingOrigin.SUPPLIED));
    List<SensorSpec> sensors = List.of(SENSORS.get(0), SENSORS.get(1),
        new SensorSpec("vane", SensorKind.ANGLE_OF_ATTACK_VANE, "gyro", -3.0, 0.0));
    AircraftPlant p = plant(navion(0.1, coupling), modes, aero, sensors);
    StateSpace ss = p.stateSpace(aero);
    double[] w = {0.05, 0.7, 3.0, 12.0, 25.1, 56.0, 200.0};
    PlantResponseCheck.stateSpaceEqualsEvaluator(p, ss, w, sensors.size());
  }

  static int lowestFrequencyComplex(Eigenvalues e) {
    int best = -1;
    for (int i = 0; i < e.real().length; i++) {
      if (e.imag()[i] > 1e-9 && (best < 0 || e.imag()[i] < e.imag()[best])) {
        best = i;
      }
    }
    return best;
  }
}
