package org.flexmargin.model;

import java.util.Map;

/**
 * One elastic (normal) mode of the free or restrained structure.
 *
 * <p>Modes are mass-orthogonal: generalized mass and stiffness matrices are diagonal, with
 * stiffness {@code (2 pi frequencyHz)^2 * generalizedMassKg}. Structural damping is given as a
 * viscous damping ratio zeta ({@code dampingRatio}); a structural damping coefficient g converts as
 * g = 2 zeta (Fung, <i>An Introduction to the Theory of Aeroelasticity</i>), done at input.
 *
 * @param name unique mode name
 * @param frequencyHz in-vacuo natural frequency (Hz), &gt; 0
 * @param dampingRatio viscous damping ratio zeta (dimensionless), in [0, 1)
 * @param generalizedMassKg generalized mass (kg, or kg m^2 per the shape normalisation), &gt; 0
 * @param shapes mode-shape values by station name
 */
public record ElasticMode(
    String name,
    double frequencyHz,
    double dampingRatio,
    double generalizedMassKg,
    Map<String, ShapeValue> shapes) {
  /** Validates and copies. */
  public ElasticMode {
    Checks.name("name", name);
    Checks.positive("frequency_hz", frequencyHz);
    Checks.inRange("damping_ratio", dampingRatio, 0.0, 0.999);
    Checks.positive("generalized_mass_kg", generalizedMassKg);
    shapes = shapes == null ? Map.of() : Map.copyOf(shapes);
  }

  /** @return the in-vacuo circular frequency (rad/s) */
  public double omegaRadPerS() {
    return 2 * Math.PI * frequencyHz;
  }

  /** @return the generalized stiffness (N/m per unit coordinate squared), omega^2 * mass */
  public double generalizedStiffness() {
    double w = omegaRadPerS();
    return w * w * generalizedMassKg;
  }
}
