package org.flexmargin.model;

/**
 * A built-in validation structure: the two-degree-of-freedom typical section (heave h, pitch
 * alpha) on springs, of span {@code spanM}, with Theodorsen aerodynamics on one strip.
 *
 * <p>Notation of Bisplinghoff, Ashley &amp; Halfman and of Hodges &amp; Pierce: b semichord, a
 * elastic-axis position aft of mid-chord in semichords, x_alpha centre of mass aft of the elastic
 * axis in semichords, r_alpha^2 = I_alpha / (m b^2) about the elastic axis. The generalized
 * coordinates are h (m, positive up) and alpha (rad, nose up); they are not normal modes, so
 * the mass matrix has the coupling term m x_alpha b.
 *
 * @param semichordM b (m)
 * @param massPerSpanKgPerM m, section mass per unit span (kg/m)
 * @param elasticAxisA a, elastic axis aft of mid-chord (semichords), in (-1, 1)
 * @param massOffsetXAlpha x_alpha, centre of mass aft of the elastic axis (semichords)
 * @param radiusOfGyrationSquared r_alpha^2 about the elastic axis (semichords^2), &gt; x_alpha^2
 * @param heaveFrequencyHz uncoupled heave frequency omega_h / 2 pi (Hz)
 * @param pitchFrequencyHz uncoupled pitch frequency omega_alpha / 2 pi (Hz)
 * @param liftSlopePerRad lift-curve slope (1/rad), 2 pi for Theodorsen's flat plate
 * @param spanM span the section represents (m)
 * @param dampingRatio viscous damping ratio of both uncoupled springs (dimensionless)
 */
public record TypicalSection(
    double semichordM,
    double massPerSpanKgPerM,
    double elasticAxisA,
    double massOffsetXAlpha,
    double radiusOfGyrationSquared,
    double heaveFrequencyHz,
    double pitchFrequencyHz,
    double liftSlopePerRad,
    double spanM,
    double dampingRatio)
    implements StructureSpec {
  /** Validates. */
  public TypicalSection {
    Checks.positive("semichord_m", semichordM);
    Checks.positive("mass_per_span_kg_per_m", massPerSpanKgPerM);
    Checks.inRange("elastic_axis_a", elasticAxisA, -0.999, 0.999);
    Checks.finite("mass_offset_x_alpha", massOffsetXAlpha);
    Checks.positive("radius_of_gyration_squared", radiusOfGyrationSquared);
    if (radiusOfGyrationSquared <= massOffsetXAlpha * massOffsetXAlpha) {
      throw new InvalidInputException(
          "radius_of_gyration_squared",
          "r_alpha^2 > x_alpha^2 (positive-definite mass matrix)",
          radiusOfGyrationSquared + " <= " + massOffsetXAlpha * massOffsetXAlpha);
    }
    Checks.positive("heave_frequency_hz", heaveFrequencyHz);
    Checks.positive("pitch_frequency_hz", pitchFrequencyHz);
    Checks.positive("lift_slope_per_rad", liftSlopePerRad);
    Checks.positive("span_m", spanM);
    Checks.inRange("damping_ratio", dampingRatio, 0.0, 0.999);
  }
}
