package org.flexmargin.model;

/**
 * Where a strip sits on the aircraft and what control it carries: the data that turn strip theory
 * into the quasi-steady coupling of the elastic modes with the short period and the elevator
 * ({@link ModeCoupling}). Optional on a strip; the coupling is computed only when every strip of
 * the configuration has one.
 *
 * <p>Example: a tailplane strip whose elastic axis is 6.0 m behind the centre of mass, with an
 * elevator of 30 % of the chord and a downwash gradient d epsilon / d alpha of 0.4 at the tail:
 * {@code new StripPlacement(6.0, 0.3, 0.4)}; a wing strip 0.15 m behind the centre of mass
 * without a flap: {@code new StripPlacement(0.15, 0, 0)}.
 *
 * @param elasticAxisAftOfCgM position of the strip's elastic axis behind the aircraft's centre of
 *     mass along the body axis (m; negative ahead of it)
 * @param elevatorChordFraction chord of the elevator (trailing-edge flap driven by the elevator
 *     command) as a fraction of the strip's chord, 0 (no elevator on this strip) up to 0.9
 *     (dimensionless)
 * @param downwashGradient d epsilon / d alpha at the strip (dimensionless, 0 on the wing, about 0.3
 *     to 0.5 at a conventional tail): the rigid-body angle of attack is seen there multiplied by
 *     (1 - d epsilon / d alpha)
 */
public record StripPlacement(double elasticAxisAftOfCgM, double elevatorChordFraction, double downwashGradient) {
  /** Largest accepted elevator chord fraction (thin-aerofoil flap theory beyond it is meaningless). */
  public static final double MAX_ELEVATOR_CHORD_FRACTION = 0.9;

  /** Validates. */
  public StripPlacement {
    Checks.finite("elastic_axis_aft_of_cg_m", elasticAxisAftOfCgM);
    Checks.inRange("elevator_chord_fraction", elevatorChordFraction, 0, MAX_ELEVATOR_CHORD_FRACTION);
    Checks.inRange("downwash_gradient", downwashGradient, 0, 0.99);
  }

  /** @return true when an elevator acts on this strip */
  public boolean hasElevator() {
    return elevatorChordFraction > 0;
  }
}
