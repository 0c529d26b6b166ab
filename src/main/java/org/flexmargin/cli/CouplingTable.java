package org.flexmargin.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.Map;
import org.flexmargin.aero.StripCoupling;
import org.flexmargin.aero.StripDerivatives;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.sweep.ModeCouplings;

/** Prints the coupling of each mode with the short period and the elevator, and where it comes from. */
final class CouplingTable {

  private CouplingTable() {}

  /**
   * @param out terminal
   * @param configuration a configuration with rigid-body data
   */
  static void print(PrintWriter out, Configuration configuration) {
    RigidBody rigid = configuration.rigidBody();
    out.printf(Locale.ROOT, "    %-24s %-21s %10s %10s %10s %10s %10s%n", "mode coupling", "origin",
        "CL/eta", "Cm/eta", "Q/alpha m2", "Q/q^ m2", "Q/elev m2");
    for (Map.Entry<String, ModeCoupling> e : ModeCouplings.of(configuration).entrySet()) {
      ModeCoupling c = e.getValue();
      out.printf(Locale.ROOT, "    %-24s %-21s %10.4g %10.4g %10.4g %10.4g %10.4g%n", e.getKey(), c.origin().label(),
          c.liftCoefficientPerUnitCoordinate(), c.pitchMomentCoefficientPerUnitCoordinate(),
          c.generalizedForcePerAlphaM2(), c.generalizedForcePerPitchRateM2(), c.generalizedForcePerElevatorM2());
    }
    if (configuration.aero() instanceof StripTheorySpec strips && strips.placed()) {
      StripDerivatives d = StripCoupling.rigidDerivatives(strips, rigid.referenceAreaM2(), rigid.referenceChordM());
      out.printf(Locale.ROOT, "    strips give CL_alpha %.3f (supplied %.3f), Cm_alpha %.3f (%.3f), Cm_q %.2f (%.2f), "
              + "CL_delta %.3f (%.3f), Cm_delta %.3f (%.3f); the supplied values are used%n",
          d.liftSlopePerRad(), rigid.liftSlopePerRad(), d.pitchMomentSlopePerRad(), rigid.pitchMomentSlopePerRad(),
          d.pitchDampingCmq(), rigid.pitchDampingCmq(), d.liftPerElevatorPerRad(), rigid.liftPerElevatorPerRad(),
          d.pitchMomentPerElevatorPerRad(), rigid.pitchMomentPerElevatorPerRad());
    }
  }
}
