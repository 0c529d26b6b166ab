package org.flexmargin.sweep;

import java.util.List;
import java.util.Map;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.CouplingOrigin;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SpeedSweep;

/**
 * A small invented aircraft for the loop drivers: a statically stable rigid short period, one
 * elastic mode "bend" and a pitch-rate loop through a first-order actuator.
 *
 * <p>The mode (6 Hz, zeta 0.02, generalized mass 10 kg) carries a force table Q(ik) = i c k with
 * c = 0.8 m^2 (reference semichord b = 0.5 m): the force q c (b / V) xi' is a negative damping,
 * so the mode's total damping 2 zeta w M - rho V c b / 2 vanishes at V_F = 4 zeta w M / (rho c b)
 * (derived), 61.55 m/s at sea level. The table is linear in ik, so the rational approximation
 * holds it exactly and the closed-loop eigenvalues see the same mode as the exact loop.
 */
final class LoopTestSection {
  static final double FREQUENCY_HZ = 6.0;
  static final double ZETA = 0.02;
  static final double MASS_KG = 10.0;
  static final double SEMICHORD_M = 0.5;
  static final double DAMPING_SLOPE_M2 = 0.8;
  /** Sea-level density of the U.S. Standard Atmosphere 1976 (kg/m^3). */
  static final double RHO = 1.225;

  private LoopTestSection() {}

  /** Second mode of {@link #twoModes()}: "twist", 9 Hz, zeta 0.02, 10 kg. */
  static final double TWIST_HZ = 9.0;
  /** Its damping slope (m^2): V_F = 4 x 0.02 x 2 pi 9 x 10 / (1.225 x 0.9848 x 0.5) = 75.0 m/s. */
  static final double TWIST_SLOPE_M2 = 0.9848;

  /** @return V_F = 4 zeta w M / (rho c b) of "bend", m/s (TAS = EAS at sea level) */
  static double flutterSpeedMps() {
    return flutterSpeedMps(FREQUENCY_HZ, DAMPING_SLOPE_M2);
  }

  /** @return V_F = 4 zeta w M / (rho c b) of a mode with zeta 0.02 and 10 kg, m/s */
  static double flutterSpeedMps(double frequencyHz, double slopeM2) {
    return 4 * ZETA * 2 * Math.PI * frequencyHz * MASS_KG / (RHO * slopeM2 * SEMICHORD_M);
  }

  /** @return the root of "bend" at a speed ({@link #modeRoot(double, double, double)}) */
  static double[] modeRoot(double speedMps) {
    return modeRoot(FREQUENCY_HZ, DAMPING_SLOPE_M2, speedMps);
  }

  /**
   * A mode's root s = sigma + j w_d at a speed, from M s^2 + (2 zeta w M - rho V c b / 2) s + w^2 M = 0
   * (zeta 0.02, M = 10 kg).
   *
   * @return {sigma, w_d}
   */
  static double[] modeRoot(double frequencyHz, double slopeM2, double speedMps) {
    double w = 2 * Math.PI * frequencyHz;
    double damping = 2 * ZETA * w * MASS_KG - 0.5 * RHO * speedMps * slopeM2 * SEMICHORD_M;
    double sigma = -damping / (2 * MASS_KG);
    return new double[] {sigma, Math.sqrt(w * w - sigma * sigma)};
  }

  /** @return a speed where the mode's g = 2 sigma / w_d is -0.03 (Commons Math's Brent solver, 10 to 40 m/s) */
  static double dampingLimitSpeedMps(double frequencyHz, double slopeM2) {
    return new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-10).solve(100, v -> {
      double[] s = modeRoot(frequencyHz, slopeM2, v);
      return 2 * s[0] + 0.03 * s[1];
    }, 1, 40);
  }

  /**
   * "bend" and a second mode "twist" with its own damping force (the table diagonal), both
   * uncoupled from the loop.
   */
  static Configuration twoModes() {
    ModeTable modes = new ModeTable("section", List.of(
        new ElasticMode("bend", FREQUENCY_HZ, ZETA, MASS_KG, Map.of("gyro", new ShapeValue(0.0, 0.05))),
        new ElasticMode("twist", TWIST_HZ, ZETA, MASS_KG, Map.of("gyro", new ShapeValue(0.0, 0.02)))));
    double[] ks = {0, 0.5, 1, 2, 4};
    double[][][] re = new double[ks.length][2][2];
    double[][][] im = new double[ks.length][2][2];
    for (int i = 0; i < ks.length; i++) {
      im[i][0][0] = DAMPING_SLOPE_M2 * ks[i];
      im[i][1][1] = TWIST_SLOPE_M2 * ks[i];
    }
    GafTable forces = new GafTable(SEMICHORD_M, 0.0, List.of("bend", "twist"), ks, re, im);
    return new Configuration("section", modes, forces, configuration(0).rigidBody());
  }

  static ModeTable modes() {
    return new ModeTable("section", List.of(new ElasticMode("bend", FREQUENCY_HZ, ZETA, MASS_KG,
        Map.of("gyro", new ShapeValue(0.0, 0.05)))));
  }

  static GafTable forces() {
    double[] ks = {0, 0.5, 1, 2, 4};
    double[][][] re = new double[ks.length][1][1];
    double[][][] im = new double[ks.length][1][1];
    for (int i = 0; i < ks.length; i++) {
      im[i][0][0] = DAMPING_SLOPE_M2 * ks[i];
    }
    return new GafTable(SEMICHORD_M, 0.0, List.of("bend"), ks, re, im);
  }

  /**
   * Invented short-period data (a light aircraft, statically stable), the elevator driving the
   * mode with the given generalized force per unit dynamic pressure and radian (m^2; 0 uncouples
   * the mode from the loop).
   */
  static Configuration configuration(double elevatorForceM2) {
    Map<String, ModeCoupling> coupling = elevatorForceM2 == 0 ? Map.of()
        : Map.of("bend", new ModeCoupling(0, 0, 0, elevatorForceM2, 0, CouplingOrigin.SUPPLIED));
    RigidBody rb = new RigidBody(1200, 4000, 16, 1.7, 4.4, -0.7, -12, -4, 0.35, -0.9, coupling);
    return new Configuration("section", modes(), forces(), rb);
  }

  /** Pitch-rate gyro at the station "gyro", gain kp (rad per rad/s), 10 Hz first-order actuator. */
  static LoopSpec loop(double kp) {
    return loop(kp, 0.0);
  }

  /** The same with a computational delay (s), Pade order 2 in the state space. */
  static LoopSpec loop(double kp, double delayS) {
    return new LoopSpec(new ActuatorSpec(ActuatorOrder.FIRST, 10, 0.7, 1.0, 0.35),
        List.of(new org.flexmargin.model.SensorSpec("gyro", SensorKind.PITCH_RATE_GYRO, "gyro", 0, 0)),
        List.of(new FeedbackPath("gyro", kp, 0, List.of(), null)), delayS, 0, 2);
  }

  /** @return sea level, 10 to 90 m/s EAS in 10 m/s steps */
  static PlannedPath path() {
    return new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 10, 90, 9));
  }
}
