package org.flexmargin.flutter;

import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.InertiaAxis;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.model.UniformCantileverWing;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;

/** Published validation structures used by the flutter and divergence tests. */
final class ValidationCases {
  private ValidationCases() {}

  static final double RHO_SEA_LEVEL = 1.225;

  /** omega_alpha of the Lee, Price &amp; Wong section as built here (rad/s): 10 Hz. */
  static final double LPW_OMEGA_ALPHA = 2 * Math.PI * 10.0;

  /**
   * Typical section of Lee, Price &amp; Wong, Prog. Aerosp. Sci. 35 (1999): a = -0.5,
   * x_alpha = 0.25, r_alpha^2 = 0.25, mu = m / (pi rho b^2) = 100, omega_h/omega_alpha = 0.2, no
   * damping. Dimensional choice (ours): b = 1 m, omega_alpha = 2 pi 10 rad/s, sea-level density.
   */
  static TypicalSection lpwSection() {
    double mass = 100 * Math.PI * RHO_SEA_LEVEL * 1.0;
    return new TypicalSection(1.0, mass, -0.5, 0.25, 0.25, 2.0, 10.0, 2 * Math.PI, 1.0, 0.0);
  }

  static AeroelasticSystem system(org.flexmargin.model.StructureSpec spec) {
    return ConfigurationModel.of(new Configuration("validation", spec, null)).system();
  }

  /** Sea-level TAS sweep covering U* = U/(b omega_alpha) from uFrom to uTo. */
  static PlannedPath lpwPath(double uFrom, double uTo, int points) {
    return new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE,
        uFrom * LPW_OMEGA_ALPHA, uTo * LPW_OMEGA_ALPHA, points));
  }

  /**
   * Goland wing (Goland, J. Appl. Mech. 12(4), 1945; data as republished, see docs/validation.md §3.3,
   * from memory): semi-span 6.096 m, chord 1.8288 m, elastic axis 33 % chord, centre of mass 43 %,
   * 35.71 kg/m, pitch inertia 8.64 kg m taken about the elastic axis, EI 9.77e6 N m^2,
   * GJ 0.987e6 N m^2, thin-aerofoil lift slope 2 pi.
   */
  static UniformCantileverWing goland(int bending, int torsion, int strips) {
    return new UniformCantileverWing(6.096, 1.8288, 0.33, 0.43, 35.71, 8.64, InertiaAxis.ELASTIC_AXIS,
        9.77e6, 0.987e6, 2 * Math.PI, bending, torsion, strips, 0.0);
  }
}
