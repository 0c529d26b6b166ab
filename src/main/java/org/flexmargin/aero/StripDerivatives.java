package org.flexmargin.aero;

/**
 * Rigid-body stability derivatives summed over placed strips by quasi-steady strip theory (see
 * {@link StripCoupling}), for comparison with the derivatives the user supplied. Rates are
 * non-dimensionalised with c / (2 V); the elevator is positive trailing edge down.
 *
 * @param liftSlopePerRad C_L_alpha (1/rad), with the downwash at each strip
 * @param pitchMomentSlopePerRad C_m_alpha about the centre of mass (1/rad)
 * @param pitchDampingCmq C_m_q (per unit q c / 2V), from the pitch rate's angle of attack at each
 *     strip's three-quarter chord
 * @param liftPerElevatorPerRad C_L_delta (1/rad)
 * @param pitchMomentPerElevatorPerRad C_m_delta about the centre of mass (1/rad)
 */
public record StripDerivatives(double liftSlopePerRad, double pitchMomentSlopePerRad, double pitchDampingCmq,
    double liftPerElevatorPerRad, double pitchMomentPerElevatorPerRad) {}
