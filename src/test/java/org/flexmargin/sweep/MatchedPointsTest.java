package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleFunction;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.DivergenceSolver;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/** Matched-point flutter and divergence against closed forms and the constant-altitude sweep. */
class MatchedPointsTest {
  /**
   * Typical section (invented): b = 0.5 m, elastic axis at mid-chord (a = 0), x_alpha = 0.1,
   * r_alpha^2 = 0.25, 50 kg/m, heave 3 Hz, pitch 16 Hz, lift slope 2 pi, unit span.
   */
  static final TypicalSection SECTION = new TypicalSection(0.5, 50, 0, 0.1, 0.25, 3, 16, 2 * Math.PI, 1, 0);
  static final ConfigurationModel MODEL = ConfigurationModel.of(new Configuration("section", SECTION, null));
  static final StructuralModel STRUCTURE = MODEL.system().structure();
  static final AeroSource INCOMPRESSIBLE = MODEL.system().aero();
  static final EnvelopeSpec SPEC = new EnvelopeSpec(new double[] {0, 6000}, new double[] {0.5}, 20, 320, 61, 150,
      Double.NaN);

  /** The incompressible forces times the Prandtl-Glauert factor 1 / sqrt(1 - M^2). */
  static DoubleFunction<AeroSource> prandtlGlauert() {
    return mach -> {
      double scale = 1 / Math.sqrt(1 - mach * mach);
      return new FunctionForces(INCOMPRESSIBLE.size(), INCOMPRESSIBLE.referenceSemichordM(),
          INCOMPRESSIBLE.minReducedFrequency(), INCOMPRESSIBLE.maxReducedFrequency(), (k, out) -> {
            INCOMPRESSIBLE.forces(k, out);
            CommonOps_ZDRM.elementMultiply(out, scale, 0, out);
          }, "Prandtl-Glauert-scaled strip theory");
    };
  }

  @Test
  void machIndependentForcesGiveTheConstantAltitudeOnset() {
    // the matched point of forces that do not depend on Mach is the onset of the ordinary sweep at
    // that altitude: the same solve, so the same number; the second iteration confirms the Mach
    double h = 3000;
    MatchedPoints.Point p = MatchedPoints.flutterAtAltitude(STRUCTURE, m -> INCOMPRESSIBLE, h, SPEC,
        AnalysisOptions.defaults(), 0.3);
    var sweep = new PkMethod().solve(MODEL.system(), new PlannedPath(new SpeedSweep(h, AirspeedKind.TRUE, 20, 320, 61)),
        AnalysisOptions.defaults()).firstOnset().orElseThrow();
    assertTrue(p.found() && p.converged());
    assertEquals(sweep.condition().speedTasMps(), p.condition().speedTasMps(), 0.0);
    assertEquals(2, p.iterations());
    MatchedPoints.Point d = MatchedPoints.divergenceAtAltitude(STRUCTURE, m -> INCOMPRESSIBLE, h, 0.3);
    double vd = new DivergenceSolver().solve(MODEL.system()).speedTasMps(StandardAtmosphere.densityKgPerM3(h));
    assertEquals(vd, d.condition().speedTasMps(), 1e-9 * vd);
  }

  @Test
  void incompressibleForcesAreReportedAtMachZeroWhateverTheMatchedMach() {
    // a typical section's forces are strip theory with Theodorsen's function: incompressible, the
    // same at every Mach number. The points are matched to the atmosphere all the same (their own
    // Mach numbers are those of the onsets), but the forces' Mach number stays 0, with the warning
    MatchedPoints.Envelope e = MatchedPoints.of(new Configuration("section", SECTION, null), SPEC,
        AnalysisOptions.defaults());
    assertTrue(e.warnings().stream().anyMatch(w -> w.contains("do not depend on the Mach number")), e.warnings()
        .toString());
    long found = 0;
    for (MatchedPoints.Point p : e.points()) {
      assertEquals(0.0, p.forcesMach(), 0.0, p.kind().toString());
      if (p.found()) {
        found++;
        assertTrue(p.condition().mach() > 0.05, p.kind() + " at Mach " + p.condition().mach());
      }
    }
    assertTrue(found >= 4, "flutter and divergence at both altitudes: " + found);
  }

  @Test
  void prandtlGlauertDivergenceMatchesTheClosedForm() {
    // q_D(M) = q_D0 sqrt(1 - M^2) for forces scaled by 1 / beta (derived: K_alpha fixed, lift
    // slope times 1 / beta). Matched at altitude h: rho a^2 M^2 / 2 = q_D0 sqrt(1 - M^2), i.e. with
    // c = rho a^2 / (2 q_D0): c^2 M^4 + M^2 - 1 = 0, M^2 = (sqrt(1 + 4 c^2) - 1) / (2 c^2) (derived).
    // q_D0 itself is the divergence solver's (the closed form m r^2 omega^2 / (2 CL_a (a + 1/2))
    // = 20.2 kPa, checked to 1e-6). Tolerance 1e-3 in Mach: the iteration stops when two
    // successive Mach numbers differ by less than 1e-4 and contracts by a factor of about 0.7 here
    double qd0 = new DivergenceSolver().solve(MODEL.system()).dynamicPressurePa();
    double omega = 2 * Math.PI * 16;
    assertEquals(50 * 0.25 * omega * omega / (2 * 2 * Math.PI * 0.5), qd0, 1e-6 * qd0);
    for (double h : new double[] {0, 6000}) {
      double rho = StandardAtmosphere.densityKgPerM3(h), a = StandardAtmosphere.speedOfSoundMps(h);
      double c = rho * a * a / (2 * qd0);
      double exact = Math.sqrt((Math.sqrt(1 + 4 * c * c) - 1) / (2 * c * c));
      MatchedPoints.Point d = MatchedPoints.divergenceAtAltitude(STRUCTURE, prandtlGlauert(), h, 0.3);
      assertTrue(d.found() && d.converged(), d.note());
      assertEquals(exact, d.condition().mach(), 1e-3, "h " + h);
      // compressibility lowers q_D: the matched point lies below the incompressible divergence
      assertTrue(d.condition().mach() < Math.sqrt(2 * qd0 / rho) / a, "h " + h);
    }
    // along Mach 0.5: the static pressure where gamma p M^2 / 2 = q_D0 sqrt(1 - M^2) (derived)
    MatchedPoints.Point dm = MatchedPoints.divergenceAtMach(STRUCTURE, prandtlGlauert().apply(0.5), 0.5);
    double p = 2 * qd0 * Math.sqrt(0.75) / (1.4 * 0.25);
    assertEquals(p, StandardAtmosphere.pressurePa(dm.condition().altitudeM()), 1e-6 * p);
    assertEquals(0.5, dm.condition().mach(), 1e-12);
  }

  @Test
  void constantAltitudeAndConstantMachLinesMeetAtTheSamePoint() {
    // the two ways to a matched flutter point must agree: the constant-altitude iteration at 3000 m
    // gives Mach M*; the constant-Mach line at M* crosses 3000 m at its onset. Tolerance 30 m in
    // altitude: both onsets are refined to the p-k onset tolerance in speed (default 0.05 m/s),
    // about 10 m of altitude at this Mach number, plus the 1e-4 Mach tolerance (about 10 m)
    MatchedPoints.Point p = MatchedPoints.flutterAtAltitude(STRUCTURE, prandtlGlauert(), 3000, SPEC,
        AnalysisOptions.defaults(), 0.3);
    assertTrue(p.found() && p.converged(), p.note());
    MatchedPoints.Point q = MatchedPoints.flutterAtMach(STRUCTURE, prandtlGlauert().apply(p.forcesMach()),
        p.forcesMach(), 6000, 0, SPEC, AnalysisOptions.defaults());
    assertTrue(q.found(), q.note());
    assertEquals(3000, q.condition().altitudeM(), 30);
    assertEquals(p.frequencyHz(), q.frequencyHz(), 0.01 * p.frequencyHz());
  }
}
