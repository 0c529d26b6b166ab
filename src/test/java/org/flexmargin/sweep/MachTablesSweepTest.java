package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.model.MachForceTable;
import org.flexmargin.model.MachGafTable;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.SweepPlan;
import org.junit.jupiter.api.Test;

/**
 * Sweeps with user force tables at several Mach numbers: a constant-Mach plan takes the forces at
 * its own Mach number, other plans at the tables' sweep Mach number, checked on forces that follow
 * the Prandtl-Glauert rule.
 */
class MachTablesSweepTest {
  /** One pitch mode (invented): 5 Hz, generalized mass 2 kg, so K = 2 (10 pi)^2 N m per unit. */
  static final double MASS = 2, OMEGA = 2 * Math.PI * 5;
  /** Incompressible aerodynamic stiffness Q0 (m^2), destabilising (moment grows with the pitch). */
  static final double Q0 = 0.8;
  /** q_D0 = K / Q0 (derived: K xi = q Q0 xi is singular there) = 2467.4 Pa. */
  static final double QD0 = MASS * OMEGA * OMEGA / Q0;

  static ModeTable pitchMode() {
    return new ModeTable("pitch only", List.of(new ElasticMode("pitch", 5, 0.02, MASS,
        Map.of("root", new ShapeValue(0, 1)))));
  }

  /**
   * Tables at the given Mach numbers that follow Prandtl-Glauert: Q(M, k) = (Q0 - 0.3 i k) /
   * sqrt(1 - M^2), the imaginary part an aerodynamic damping (force against the pitch rate).
   */
  static MachGafTable prandtlGlauertTables(double sweepMach, double... machs) {
    double[] ks = {0, 0.2, 0.5, 1.0};
    double[][][][] re = new double[machs.length][ks.length][1][1];
    double[][][][] im = new double[machs.length][ks.length][1][1];
    for (int m = 0; m < machs.length; m++) {
      double beta = Math.sqrt(1 - machs[m] * machs[m]);
      for (int k = 0; k < ks.length; k++) {
        re[m][k][0][0] = Q0 / beta;
        im[m][k][0][0] = -0.3 * ks[k] / beta;
      }
    }
    List<String> names = List.of("pitch");
    return new MachGafTable(sweepMach, new MachForceTable(0.5, machs, ks, names, names, re, im));
  }

  static ConfigurationResult sweep(MachGafTable tables, SweepPlan plan) {
    AnalysisCase c = new AnalysisCase(1, "mach-tables", "", List.of(new Configuration("clean", pitchMode(), tables)),
        plan, AnalysisOptions.defaults(), List.of());
    return CaseSweep.analyse(c.configurations().get(0), new PlannedPath(c.sweep()), c);
  }

  @Test
  void constantMachPlanDivergesAtThePrandtlGlauertPressureOfItsMach() {
    // closed form: Q(M) = Q0 / beta gives q_D(M) = K beta / Q0 = q_D0 sqrt(1 - M^2) (derived). The
    // tables at Mach 0.3 and 0.7 are interpolated in beta Q, which is exact for such data, so the
    // plans at 0.4, 0.5 and 0.6 reproduce it to rounding (1e-12 relative; the static eigenvalue
    // of a 1 x 1 problem is one division); at 0.3 and 0.7 the tables are used as they are
    MachGafTable tables = prandtlGlauertTables(0.3, 0.3, 0.7);
    for (double mach : new double[] {0.3, 0.4, 0.5, 0.6, 0.7}) {
      ConfigurationResult r = sweep(tables, new MachSweep(mach, 9000, 0, 5));
      double exact = QD0 * Math.sqrt(1 - mach * mach);
      assertTrue(r.divergence().found(), "M " + mach);
      assertEquals(exact, r.divergence().dynamicPressurePa(), 1e-12 * exact, "M " + mach);
      assertTrue(r.flutter().warnings().stream().noneMatch(w -> w.contains("outside their range")),
          "M " + mach + ": " + r.flutter().warnings());
    }
    // Mach 0.5, written out: 2467.40 Pa x sqrt(0.75) = 2136.84 Pa (derived)
    double at05 = sweep(tables, new MachSweep(0.5, 9000, 0, 5)).divergence().dynamicPressurePa();
    assertEquals(2136.84, at05, 0.01);
    // the ratio between two Mach numbers is the ratio of the betas, whatever q_D0 is
    double at06 = sweep(tables, new MachSweep(0.6, 9000, 0, 5)).divergence().dynamicPressurePa();
    assertEquals(Math.sqrt(1 - 0.36) / Math.sqrt(0.75), at06 / at05, 1e-12);
  }

  @Test
  void otherPlansUseTheTablesSweepMachAndWarnWhenTheyLeaveIt() {
    // a speed sweep is not at one Mach number: the forces are those at the tables' own sweep Mach
    // number (0.5, interpolated: q_D = q_D0 sqrt(0.75) as above), whatever Mach the points reach
    MachGafTable tables = prandtlGlauertTables(0.5, 0.3, 0.7);
    ConfigurationResult r = sweep(tables, new SpeedSweep(0, AirspeedKind.EQUIVALENT, 20, 150, 14));
    assertEquals(QD0 * Math.sqrt(0.75), r.divergence().dynamicPressurePa(), 1e-12 * QD0);
    // sea level, 20 to 150 m/s: Mach 0.059 to 0.441, which leaves 0.5 +- 0.05 (the tolerance of
    // the tables' Mach number, as for a table at one Mach number)
    // (Mach = EAS / 340.29 m/s at sea level, U.S. Standard Atmosphere 1976: 0.0588 and 0.4408)
    assertTrue(r.flutter().warnings().stream().anyMatch(w -> w.startsWith("aerodynamics outside their range: the "
        + "force tables are interpolated to Mach 0.500 (accepted within +-0.05), but the sweep runs from Mach 0.059 "
        + "to 0.441 (first outside at 20.00 m/s EAS)")), r.flutter().warnings().toString());
    assertTrue(r.aeroDescription().contains("Mach 0.500 (tables at Mach 0.300 to 0.700"), r.aeroDescription());
  }

  @Test
  void constantMachPlanOutsideTheTablesUsesTheNearestTableWithAWarning() {
    // Mach 0.74 is within 0.05 of the last table (0.7): its forces, no warning. Mach 0.8 is 0.1
    // beyond it: the same forces, q_D = q_D0 sqrt(1 - 0.49) (the 0.7 table), and a warning
    MachGafTable tables = prandtlGlauertTables(0.3, 0.3, 0.7);
    double at07 = QD0 * Math.sqrt(1 - 0.49);
    ConfigurationResult near = sweep(tables, new MachSweep(0.74, 9000, 0, 5));
    assertEquals(at07, near.divergence().dynamicPressurePa(), 1e-12 * at07);
    assertTrue(near.flutter().warnings().stream().noneMatch(w -> w.contains("outside their range")),
        near.flutter().warnings().toString());
    ConfigurationResult far = sweep(tables, new MachSweep(0.8, 9000, 0, 5));
    assertEquals(at07, far.divergence().dynamicPressurePa(), 1e-12 * at07);
    assertTrue(far.flutter().warnings().stream().anyMatch(w -> w.startsWith("aerodynamics outside their range: the "
        + "force tables are interpolated to Mach 0.700") && w.contains("Mach 0.800 to 0.800")),
        far.flutter().warnings().toString());
    // and below the first table the same on the other side
    ConfigurationResult below = sweep(tables, new MachSweep(0.2, 9000, 0, 5));
    double at03 = QD0 * Math.sqrt(1 - 0.09);
    assertEquals(at03, below.divergence().dynamicPressurePa(), 1e-12 * at03);
    assertTrue(below.flutter().warnings().stream().anyMatch(w -> w.contains("outside their range")));
  }

  @Test
  void envelopeLinesUseTheTablesAtEveryMachNumber() {
    // along Mach 0.5 the matched divergence point lies where gamma p M^2 / 2 = q_D0 sqrt(1 - M^2)
    // (derived), solved for the standard-atmosphere pressure (1e-6 relative: the altitude is
    // found by the atmosphere's inverse and the point rebuilt from it)
    MachGafTable tables = prandtlGlauertTables(0.3, 0.3, 0.7);
    EnvelopeSpec spec = new EnvelopeSpec(new double[] {0, 3000}, new double[] {0.5}, 20, 300, 21, 150, Double.NaN);
    MatchedPoints.Envelope e = MatchedPoints.of(new Configuration("clean", pitchMode(), tables), spec,
        AnalysisOptions.defaults());
    MatchedPoints.Point dm = e.points().stream().filter(p -> p.kind() == MatchedPoints.Kind.DIVERGENCE_AT_MACH)
        .findFirst().orElseThrow();
    double p = 2 * QD0 * Math.sqrt(0.75) / (1.4 * 0.25);
    assertTrue(dm.found(), dm.note());
    assertEquals(p, StandardAtmosphere.pressurePa(dm.condition().altitudeM()), 1e-6 * p);
    assertTrue(e.warnings().stream().noneMatch(w -> w.contains("do not depend on the Mach number")), e.warnings()
        .toString());
    // at sea level the matched divergence lies below the tables (Mach 0.18 for PG forces), so the
    // forces are those of the 0.3 table: rho a^2 M^2 / 2 = q_D0 sqrt(1 - 0.09), M = sqrt(2 q_D0
    // sqrt(0.91) / (rho a^2)) = 0.1822 (derived); the iteration takes the constant forces and
    // settles at its second step, so only rounding remains (1e-9). The point is warned about
    MatchedPoints.Point d0 = e.points().stream().filter(q -> q.kind() == MatchedPoints.Kind.DIVERGENCE_AT_ALTITUDE)
        .findFirst().orElseThrow();
    double rho = StandardAtmosphere.densityKgPerM3(0), a = StandardAtmosphere.speedOfSoundMps(0);
    double exact = Math.sqrt(2 * QD0 * Math.sqrt(0.91) / (rho * a * a));
    assertTrue(d0.found() && d0.converged(), d0.note());
    assertEquals(exact, d0.condition().mach(), 1e-9);
    assertEquals(0.1822, exact, 1e-4);
    // the forces used there are the 0.3 table's, and the point says so; along Mach 0.5 the forces
    // are those of Mach 0.5 itself
    assertEquals(0.3, d0.forcesMach(), 0.0);
    assertEquals(0.5, dm.forcesMach(), 0.0);
    assertTrue(e.warnings().stream().anyMatch(w -> w.startsWith("aerodynamics outside their range: divergence at "
        + "altitude at 0 m, Mach 0.182") && w.contains("Mach range 0.300 to 0.700")), e.warnings().toString());
    // so is the one at 3000 m (Mach sqrt(2 q_D0 sqrt(0.91) / (rho a^2)) = 0.22 there, derived), and
    // no other point: the points along Mach 0.5 lie inside the tables
    assertEquals(2, e.warnings().stream().filter(w -> w.contains("outside their range")).count(), e.warnings()
        .toString());
    assertTrue(e.warnings().stream().anyMatch(w -> w.contains("divergence at altitude at 3000 m, Mach 0.2")),
        e.warnings().toString());
  }
}
