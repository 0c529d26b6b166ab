package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.ShapeValue;
import org.junit.jupiter.api.Test;

/**
 * The rigid short period alone ({@link AircraftPlant#shortPeriodRoots()}) against the roots of its
 * characteristic quadratic s^2 + b1 s + c0 = 0, with b1 = -(M_q + M_alphadot + Z_alpha / V) and
 * c0 = Z_alpha M_q / V - M_alpha (Nelson, Flight Stability and Automatic Control, ch. 4, the
 * short-period approximation), written out here from the dimensional derivatives.
 */
class ShortPeriodRootsTest {

  /** {-b1 / 2, discriminant b1^2 / 4 - c0} of the quadratic, from the derivatives by hand. */
  static double[] quadratic(AircraftPlant p, RigidBody rb) {
    FlightCondition fc = p.condition();
    double v = fc.speedTasMps();
    double qd = fc.dynamicPressurePa();
    double za = -qd * rb.referenceAreaM2() * rb.liftSlopePerRad() / rb.massKg();
    double mf = qd * rb.referenceAreaM2() * rb.referenceChordM() / rb.pitchInertiaKgM2();
    double rf = rb.referenceChordM() / (2 * v);
    double ma = mf * rb.pitchMomentSlopePerRad();
    double mq = mf * rb.pitchDampingCmq() * rf;
    double mad = mf * rb.alphaDotDampingCmAlphaDot() * rf;
    double b1 = -(mq + mad + za / v);
    double c0 = za * mq / v - ma;
    return new double[] {-b1 / 2, b1 * b1 / 4 - c0};
  }

  private static AircraftPlant plant(RigidBody rb) {
    return AircraftPlantTest.plant(rb, AircraftPlantTest.oneMode(30, new ShapeValue(0, 0)),
        AircraftPlantTest.zeroAero(1), AircraftPlantTest.SENSORS);
  }

  @Test
  void stableAirframeHasTheComplexPairOfItsQuadratic() {
    RigidBody rb = AircraftPlantTest.navion(Double.NaN, Map.of());
    AircraftPlant p = plant(rb);
    double[] q = quadratic(p, rb);
    double[] r = p.shortPeriodRoots();
    double im = Math.sqrt(-q[1]);
    // round-off only: the same quadratic solved in a different order of operations
    assertEquals(q[0], r[0], 1e-12 * Math.abs(q[0]));
    assertEquals(im, r[1], 1e-12 * im);
    assertEquals(q[0], r[2], 1e-12 * Math.abs(q[0]));
    assertEquals(-im, r[3], 1e-12 * im);
    // the textbook figures (from memory): omega_sp 3.597 rad/s, zeta_sp 0.691, to their 4 digits
    double omega = Math.hypot(r[0], r[1]);
    assertEquals(3.597, omega, 3.597e-3);
    assertEquals(0.691, -r[0] / omega, 0.691e-3);
    // the pair is also what the full plant's eigenvalues give for an uncoupled elastic mode
    var e = p.stateSpace(AircraftPlantTest.zeroAero(1)).eigenvalues();
    assertEquals(omega, e.naturalFrequencyRadPerS(AircraftPlantTest.lowestFrequencyComplex(e)), 1e-9 * omega);
  }

  @Test
  void unstableAirframeHasTwoRealRootsOfOppositeSign() {
    RigidBody rb = AircraftPlantTest.navion(0.5, Map.of());
    AircraftPlant p = plant(rb);
    double[] q = quadratic(p, rb);
    double[] r = p.shortPeriodRoots();
    double root = Math.sqrt(q[1]);
    double up = q[0] + root;
    double down = q[0] - root;
    assertEquals(up, r[0], 1e-12 * Math.abs(up));
    assertEquals(0.0, r[1], 0.0);
    assertEquals(down, r[2], 1e-12 * Math.abs(down));
    assertEquals(0.0, r[3], 0.0);
    // product and sum of the roots: c0 and -b1 (Vieta)
    assertEquals(q[0] * q[0] - q[1], r[0] * r[2], 1e-12 * Math.abs(r[0] * r[2]));
    assertEquals(2 * q[0], r[0] + r[2], 1e-12 * Math.abs(r[0] - r[2]));
  }
}
