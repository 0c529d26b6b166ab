package org.flexmargin.model;

import java.util.Map;

/**
 * Rigid-body pitch data for the short-period motion, as non-dimensional stability derivatives in
 * body axes (Etkin &amp; Reid, <i>Dynamics of Flight</i>; Nelson, <i>Flight Stability and Automatic
 * Control</i>, ch. 4). Rates are non-dimensionalised with c / (2 V). The elevator is positive
 * trailing edge down, so a conventional aircraft has C_L_delta &gt; 0 and C_m_delta &lt; 0.
 *
 * <p>An airframe with a negative static margin has C_m_alpha &gt; 0 and is unstable on its own;
 * the loop must stabilise it.
 *
 * @param massKg aircraft mass m (kg); for a half model, the mass of the half
 * @param pitchInertiaKgM2 pitch moment of inertia I_yy about the centre of mass (kg m^2)
 * @param referenceAreaM2 reference wing area S (m^2), matching the mass (half for a half model)
 * @param referenceChordM mean aerodynamic chord c (m)
 * @param liftSlopePerRad C_L_alpha (1/rad), &gt; 0
 * @param pitchMomentSlopePerRad C_m_alpha (1/rad); positive = statically unstable
 * @param pitchDampingCmq C_m_q (per unit q c / 2V), normally negative
 * @param alphaDotDampingCmAlphaDot C_m_alphadot (per unit alphadot c / 2V), normally negative
 * @param liftPerElevatorPerRad C_L_delta (1/rad)
 * @param pitchMomentPerElevatorPerRad C_m_delta (1/rad), normally negative
 * @param modeCoupling quasi-steady coupling per elastic mode name; modes not listed are uncoupled
 *     (stated as an assumption in the results)
 */
public record RigidBody(
    double massKg,
    double pitchInertiaKgM2,
    double referenceAreaM2,
    double referenceChordM,
    double liftSlopePerRad,
    double pitchMomentSlopePerRad,
    double pitchDampingCmq,
    double alphaDotDampingCmAlphaDot,
    double liftPerElevatorPerRad,
    double pitchMomentPerElevatorPerRad,
    Map<String, ModeCoupling> modeCoupling) {
  /** Validates and copies. */
  public RigidBody {
    Checks.positive("mass_kg", massKg);
    Checks.positive("pitch_inertia_kg_m2", pitchInertiaKgM2);
    Checks.positive("reference_area_m2", referenceAreaM2);
    Checks.positive("reference_chord_m", referenceChordM);
    Checks.positive("lift_slope_per_rad", liftSlopePerRad);
    Checks.finite("pitch_moment_slope_per_rad", pitchMomentSlopePerRad);
    Checks.finite("pitch_damping_cmq", pitchDampingCmq);
    Checks.finite("alpha_dot_damping_cm_alpha_dot", alphaDotDampingCmAlphaDot);
    Checks.finite("lift_per_elevator_per_rad", liftPerElevatorPerRad);
    Checks.finite("pitch_moment_per_elevator_per_rad", pitchMomentPerElevatorPerRad);
    modeCoupling = modeCoupling == null ? Map.of() : Map.copyOf(modeCoupling);
  }

  /**
   * @param coupling the new coupling per mode name
   * @return this rigid body with another coupling map
   */
  public RigidBody withCoupling(Map<String, ModeCoupling> coupling) {
    return new RigidBody(massKg, pitchInertiaKgM2, referenceAreaM2, referenceChordM, liftSlopePerRad,
        pitchMomentSlopePerRad, pitchDampingCmq, alphaDotDampingCmAlphaDot, liftPerElevatorPerRad,
        pitchMomentPerElevatorPerRad, coupling);
  }

  /** @return the coupling of a mode, or {@link ModeCoupling#NONE} */
  public ModeCoupling couplingOf(String mode) {
    return modeCoupling.getOrDefault(mode, ModeCoupling.NONE);
  }
}
