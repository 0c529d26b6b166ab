package org.flexmargin.model;

/**
 * Quasi-steady aerodynamic coupling between one elastic mode and the rigid-body short period and
 * the elevator: supplied by the user (e.g. from their own panel-method runs at low reduced
 * frequency), or computed from placed strips by quasi-steady strip theory. Coefficients not
 * supplied are zero, and the analysis states that assumption.
 *
 * <p>Normalisation: coefficients are per unit generalized coordinate eta of the mode (same shape
 * normalisation as the mode table) and per radian; forces are per unit dynamic pressure.
 *
 * @param liftCoefficientPerUnitCoordinate change of the aircraft lift coefficient C_L per unit eta
 * @param pitchMomentCoefficientPerUnitCoordinate change of the aircraft pitching-moment coefficient
 *     C_m (about the centre of mass, nose up positive) per unit eta
 * @param generalizedForcePerAlphaM2 generalized force on the mode per unit dynamic pressure per
 *     radian of angle of attack (m^2 per rad, for displacement-normalised shapes)
 * @param generalizedForcePerElevatorM2 generalized force on the mode per unit dynamic pressure per
 *     radian of elevator, trailing edge down positive (m^2 per rad)
 * @param generalizedForcePerPitchRateM2 generalized force on the mode per unit dynamic pressure per
 *     unit non-dimensional pitch rate q c / (2 V) (m^2, for displacement-normalised shapes)
 * @param origin where the coefficients come from
 */
public record ModeCoupling(
    double liftCoefficientPerUnitCoordinate,
    double pitchMomentCoefficientPerUnitCoordinate,
    double generalizedForcePerAlphaM2,
    double generalizedForcePerElevatorM2,
    double generalizedForcePerPitchRateM2,
    CouplingOrigin origin) {
  /** Validates that every value is finite. */
  public ModeCoupling {
    Checks.finite("lift_coefficient_per_unit_coordinate", liftCoefficientPerUnitCoordinate);
    Checks.finite("pitch_moment_coefficient_per_unit_coordinate", pitchMomentCoefficientPerUnitCoordinate);
    Checks.finite("generalized_force_per_alpha_m2", generalizedForcePerAlphaM2);
    Checks.finite("generalized_force_per_elevator_m2", generalizedForcePerElevatorM2);
    Checks.finite("generalized_force_per_pitch_rate_m2", generalizedForcePerPitchRateM2);
    if (origin == null) {
      throw new InvalidInputException("mode_coupling.origin", "supplied, strips or none", "nothing");
    }
  }

  /** User-supplied coupling without a pitch-rate term. */
  public ModeCoupling(double liftCoefficientPerUnitCoordinate, double pitchMomentCoefficientPerUnitCoordinate,
      double generalizedForcePerAlphaM2, double generalizedForcePerElevatorM2) {
    this(liftCoefficientPerUnitCoordinate, pitchMomentCoefficientPerUnitCoordinate, generalizedForcePerAlphaM2,
        generalizedForcePerElevatorM2, 0.0, CouplingOrigin.SUPPLIED);
  }

  /** No coupling. */
  public static final ModeCoupling NONE = new ModeCoupling(0, 0, 0, 0, 0, CouplingOrigin.NONE);
}
