package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.FlightPath;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplineKind;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.model.SurfacePoint;
import org.flexmargin.structure.AgardWeakenedWing;
import org.flexmargin.structure.PlatePlanform;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.structure.TrapezoidalPlateRitz;
import org.junit.jupiter.api.Test;

/**
 * The AGARD 445.6 weakened wing (Ritz plate, doublet lattice, p-k) against the flutter measured
 * in the wind tunnel (docs/validation.md 21.3).
 */
class AgardWingFlutterTest {
  /**
   * Measured flutter (Yates, AGARD Report 765, 1987; from memory): Mach, mass ratio mu, flutter
   * speed index V / (b_s omega_alpha sqrt(mu)), frequency ratio omega_f / omega_alpha.
   */
  static final double[][] MEASURED = {
    {0.499, 33.465, 0.4459, 0.6276},
    {0.678, 68.753, 0.4174, 0.5799},
    {0.901, 143.920, 0.3700, 0.5256},
  };
  static final double[] KS = {0, 0.02, 0.05, 0.1, 0.15, 0.2, 0.3, 0.4, 0.5, 0.7, 1.0, 1.5, 2.0};
  static final double ROOT_SEMICHORD_M = AgardWeakenedWing.ROOT_CHORD_M / 2;

  /**
   * Speeds at one air density (the forces carry their own Mach number; the speed of sound of the
   * path is not used by the p-k method).
   */
  record DensityPath(double densityKgPerM3, double fromMps, double toMps, int points) implements FlightPath {
    @Override
    public int gridPoints() {
      return points;
    }

    @Override
    public FlightCondition at(double t) {
      return new FlightCondition(0, densityKgPerM3, 101_325, 288.15, 340.294,
          fromMps + t * (toMps - fromMps) / (points - 1));
    }
  }

  /** Flutter speed index and frequency ratio computed at a measured point. */
  record Computed(double speedIndex, double frequencyRatio) {}

  /**
   * Flutter of the plate's four lowest modes with nc x ns boxes at the Mach number and mass ratio
   * of a measured point; the density is m / (mu V_frustum) with m the plate's own mass, and
   * omega_alpha is the plate's own second (first torsion) mode.
   */
  static Computed flutter(TrapezoidalPlateRitz plate, double[] point, int nc, int ns) {
    List<SplinePoint> points = plate.gridPoints(6, 9, "g");
    ModeTable modes = plate.modeTable("agard-445.6", 4, points, 0.0);
    PlatePlanform p = plate.planform();
    LiftingSurface wing = new LiftingSurface("wing", new SurfacePoint(0, 0, 0), p.rootChordM(),
        new SurfacePoint(p.tipLeadingEdgeXM(), p.semispanM(), 0), p.tipChordM(), nc, ns);
    // wall-mounted: the wall is a plane of symmetry
    LatticeSpec spec = new LatticeSpec(ROOT_SEMICHORD_M, point[0], FlowSymmetry.SYMMETRIC, List.of(wing),
        List.of(new SplineGroup(SplineKind.SURFACE, List.of("wing"), points)), KS);
    double mu = point[1];
    double rho = plate.massKg() / (mu * AgardWeakenedWing.frustumVolumeM3());
    double omegaAlpha = modes.modes().get(1).omegaRadPerS();
    double scale = ROOT_SEMICHORD_M * omegaAlpha * Math.sqrt(mu);
    AeroelasticSystem system = new AeroelasticSystem(StructuralModel.fromModeTable(modes),
        AeroSourceFactory.of(spec, modes));
    FlutterCrossing onset = new PkMethod()
        .solve(system, new DensityPath(rho, 0.2 * scale, 0.8 * scale, 31), AnalysisOptions.defaults())
        .firstOnset().orElseThrow();
    return new Computed(onset.condition().speedTasMps() / scale,
        2 * Math.PI * onset.frequencyHz() / omegaAlpha);
  }

  @Test
  void flutterSpeedIndexFollowsTheMeasuredFallWithMachAndLiesAboveIt() {
    // Computed (8 x 10 boxes, 4 modes): FSI +7.5 %, +8.8 %, +4.9 %; frequency ratio -4.0 %,
    // -5.3 %, -16 %. Bands, stated before the comparison and justified by what the model leaves
    // out: linear subsonic lattice (no thickness, no shock), a plate with an assumed thickness law
    // and wood constants (first frequency 2.6 % low), eight chordwise boxes:
    //  - FSI within 15 % at every point, and falling from 0.499 to 0.678 to 0.901 as measured;
    //  - at 0.901 the measured value sits in the transonic dip, which linear theory does not
    //    have, so the computed index must lie above it;
    //  - frequency ratio within 10 % at 0.499 and 0.678; at 0.901 within 20 % (the coupling of
    //    bending and torsion shifts with the transonic loading, which the lattice lacks).
    TrapezoidalPlateRitz plate = AgardWeakenedWing.plate(6, 8);
    Computed[] c = new Computed[MEASURED.length];
    for (int i = 0; i < MEASURED.length; i++) {
      c[i] = flutter(plate, MEASURED[i], 8, 10);
      assertEquals(MEASURED[i][2], c[i].speedIndex(), 0.15 * MEASURED[i][2], "FSI at M " + MEASURED[i][0]);
      double band = i < 2 ? 0.10 : 0.20;
      assertEquals(MEASURED[i][3], c[i].frequencyRatio(), band * MEASURED[i][3], "frequency ratio at M "
          + MEASURED[i][0]);
    }
    assertTrue(c[0].speedIndex() > c[1].speedIndex() && c[1].speedIndex() > c[2].speedIndex(),
        "FSI falls with Mach: " + c[0] + " " + c[1] + " " + c[2]);
    assertTrue(c[2].speedIndex() > MEASURED[2][2], "linear theory above the transonic dip: " + c[2]);
  }

  @Test
  void finerLatticeChangesTheSpeedIndexByLessThanTwoPerCent() {
    // 10 x 14 boxes against 8 x 10 at M = 0.678 (measured +0.8 %): the 8 x 10 lattice resolves
    // the flutter mode (reduced frequency 0.15 to 0.22 on the root semichord; 12 boxes per
    // wavelength, common practice, allow k up to about 2 with 8 chordwise boxes)
    TrapezoidalPlateRitz plate = AgardWeakenedWing.plate(6, 8);
    Computed coarse = flutter(plate, MEASURED[1], 8, 10);
    Computed fine = flutter(plate, MEASURED[1], 10, 14);
    assertEquals(coarse.speedIndex(), fine.speedIndex(), 0.02 * coarse.speedIndex());
    assertEquals(coarse.frequencyRatio(), fine.frequencyRatio(), 0.02 * coarse.frequencyRatio());
  }
}
