package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.ase.AircraftPlant;
import org.flexmargin.ase.FlightControlLaw;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/**
 * A rigid aircraft in pure heave (no pitching moments but pitch damping, so q stays zero) crossing a
 * 1-cosine gust, with quasi-steady lift: alpha' = -a (alpha + w/V), a = q S CL_a / (m V), load
 * factor dn = V a (alpha + w/V) / g. Against its closed-form solution and the sharp-edged-gust
 * formula.
 */
class RigidHeaveGustTest {
  static final double MASS = 2000;
  static final double AREA = 20;
  static final double CLA = 5.0;
  static final double CHORD = 1.5;
  static final FlightCondition FC = StandardAtmosphere.at(1000, 80);

  @Test
  void heaveResponseMatchesTheClosedForm() {
    AircraftSimulationModel model = heaveModel();
    double v = FC.speedTasMps();
    double a = FC.dynamicPressurePa() * AREA * CLA / (MASS * v);
    double u = 10;
    double h = 30;
    InputSignal gust = new InputSignal.OneMinusCosineGust(u, h, v, 0.0);
    double dt = 0.0005;
    int steps = 2000;
    TimeHistory hist = LinearSimulation.run(model.system(), dt, steps, List.of(t -> 0.0, gust::value), null, null);
    double[] n = hist.channel("sensor_accel_g");
    double om = Math.PI * v / h;
    double end = 2 * h / v;
    for (int k = 0; k <= steps; k++) {
      double t = k * dt;
      if (t > end) {
        break;
      }
      double alpha = alphaClosedForm(t, u, om, v, a);
      double dn = v * a * (alpha + gust.value(t) / v) / AircraftPlant.STANDARD_GRAVITY_MPS2;
      // tolerance: the mid-step hold of the smooth gust, O((om dt)^2) of the peak
      assertEquals(dn, n[k], 2e-4 * u, "t = " + t);
    }
  }

  @Test
  void sharpEdgedGustGivesTheClassicalLoadFactorAndDecays() {
    // Sharp-edged gust formula dn = rho V CL_a U S / (2 m g) (Pratt, NACA TN 2964, 1953, eq. 1
    // with the gust factor K = 1; from memory): the quasi-steady load factor the instant the
    // aircraft enters a step gust, which then decays as e^{-a t} as the aircraft heaves with it
    // (derived). Tolerance 1e-9 relative: exact discretisation of a step.
    AircraftSimulationModel model = heaveModel();
    double v = FC.speedTasMps();
    double a = FC.dynamicPressurePa() * AREA * CLA / (MASS * v);
    double u = 5;
    InputSignal gust = new InputSignal.Step(u, 0.0);
    double dt = 0.01;
    TimeHistory hist = LinearSimulation.run(model.system(), dt, 300, List.of(t -> 0.0, gust::value), null, null);
    double[] n = hist.channel("sensor_accel_g");
    double sharpEdged = FC.densityKgPerM3() * v * CLA * u * AREA / (2 * MASS * AircraftPlant.STANDARD_GRAVITY_MPS2);
    for (int k = 0; k <= 300; k += 50) {
      assertEquals(sharpEdged * Math.exp(-a * k * dt), n[k], 1e-9 * sharpEdged, "t = " + k * dt);
    }
  }

  /**
   * Angle of attack of the heaving aircraft in a 1-cosine gust of peak u and om = pi V / H, while
   * in the gust (0 &lt;= t &lt;= 2 H / V); 0 before it (derived: linear first-order ODE
   * alpha' = -a (alpha + w / V) with the constant and cosine parts of the gust).
   */
  static double alphaClosedForm(double t, double u, double om, double v, double a) {
    if (t <= 0) {
      return 0;
    }
    return -u / (2 * v) * (1 - Math.exp(-a * t))
        + a * u / (2 * v) * (a * Math.cos(om * t) + om * Math.sin(om * t) - a * Math.exp(-a * t)) / (a * a + om * om);
  }

  private static AircraftSimulationModel heaveModel() {
    return heaveModel(MASS, 0, null);
  }

  /**
   * The heaving aircraft; with {@code liftPerElevator} and gust penetration the tailplane carries
   * that share of the lift slope (pitching moments all zero, so q stays zero).
   */
  static AircraftSimulationModel heaveModel(double mass, double liftPerElevator, GustPenetration penetration) {
    return heaveModel(mass, liftPerElevator, penetration, LiftGrowth.QUASI_STEADY);
  }

  /** As above, with a choice of lift growth (reduced time on half the reference chord, 0.75 m). */
  static AircraftSimulationModel heaveModel(double mass, double liftPerElevator, GustPenetration penetration,
      LiftGrowth growth) {
    SensorSpec accel = new SensorSpec("accel", SensorKind.NORMAL_ACCELEROMETER, "cg", 0.0, 0.0);
    SensorSpec vane = new SensorSpec("vane", SensorKind.ANGLE_OF_ATTACK_VANE, "cg", 0.0, 0.0);
    ModeTable modes = new ModeTable("heave", List.of(new ElasticMode("far", 80.0, 0.02, 10.0,
        Map.of("cg", new ShapeValue(0, 0)))));
    RigidBody rb = new RigidBody(mass, 5000, AREA, CHORD, CLA, 0, -10, 0, liftPerElevator, 0, Map.of());
    ZeroAero aero = new ZeroAero();
    AircraftPlant plant = new AircraftPlant(modes, StructuralModel.fromModeTable(modes), aero, rb, List.of(accel, vane), FC);
    LoopSpec loop = new LoopSpec(new ActuatorSpec(ActuatorOrder.FIRST, 10, 0.7), List.of(accel),
        List.of(new FeedbackPath("accel", 0.1, 0, List.of(), null)), 0, 0, 2);
    ServoLoop servo = new ServoLoop(plant, FlightControlLaw.of(loop, FC.dynamicPressurePa()));
    return AircraftSimulationModel.of(servo, aero, LoopClosure.OPEN, penetration, growth, CHORD / 2);
  }

  /** No elastic aerodynamic forces (one mode, one lag root, all coefficients zero). */
  static final class ZeroAero implements AeroSource, RationalAerodynamics {
    @Override
    public int size() {
      return 1;
    }

    @Override
    public double referenceSemichordM() {
      return 0.75;
    }

    @Override
    public double minReducedFrequency() {
      return 0;
    }

    @Override
    public double maxReducedFrequency() {
      return 2;
    }

    @Override
    public void forces(double reducedFrequency, ZMatrixRMaj out) {
      out.zero();
    }

    @Override
    public String description() {
      return "none";
    }

    @Override
    public int lagCount() {
      return 1;
    }

    @Override
    public double lagRoot(int l) {
      return 0.3;
    }

    @Override
    public DMatrixRMaj coefficient(int index) {
      return new DMatrixRMaj(1, 1);
    }
  }
}
