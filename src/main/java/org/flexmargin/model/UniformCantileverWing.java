package org.flexmargin.model;

/**
 * A built-in validation structure: a straight uniform cantilever wing (Euler-Bernoulli bending,
 * St-Venant torsion) clamped at the root, discretised by Ritz with the cantilever bending modes and
 * the sinusoidal torsion modes, and carrying strip-theory aerodynamics on equal-width strips.
 *
 * <p>Chordwise positions are fractions of the chord from the leading edge. The aerodynamic centre
 * is at the quarter chord (thin-aerofoil theory), so the offset e used in the closed-form
 * divergence pressure q_D = pi^2 GJ / (4 L^2 c e a) is {@code (elasticAxisChordFraction - 0.25) *
 * chordM}.
 *
 * @param semiSpanM cantilever length L (m)
 * @param chordM chord c (m)
 * @param elasticAxisChordFraction elastic axis position (fraction of chord from the leading edge)
 * @param massAxisChordFraction section centre of mass position (fraction of chord from the LE)
 * @param massPerLengthKgPerM mass per unit span (kg/m)
 * @param pitchInertiaKgM section pitch inertia per unit span (kg m^2/m = kg m)
 * @param inertiaAxis axis {@code pitchInertiaKgM} is quoted about
 * @param bendingStiffnessNm2 EI (N m^2)
 * @param torsionStiffnessNm2 GJ (N m^2)
 * @param liftSlopePerRad section lift-curve slope (1/rad), 2 pi for thin-aerofoil theory
 * @param bendingModes number of Ritz bending functions, &gt;= 1
 * @param torsionModes number of Ritz torsion functions, &gt;= 1
 * @param strips number of equal aerodynamic strips, &gt;= 1
 * @param dampingRatio viscous damping ratio applied to every normal mode (dimensionless)
 */
public record UniformCantileverWing(
    double semiSpanM,
    double chordM,
    double elasticAxisChordFraction,
    double massAxisChordFraction,
    double massPerLengthKgPerM,
    double pitchInertiaKgM,
    InertiaAxis inertiaAxis,
    double bendingStiffnessNm2,
    double torsionStiffnessNm2,
    double liftSlopePerRad,
    int bendingModes,
    int torsionModes,
    int strips,
    double dampingRatio)
    implements StructureSpec {
  /** Validates. */
  public UniformCantileverWing {
    Checks.positive("semi_span_m", semiSpanM);
    Checks.positive("chord_m", chordM);
    Checks.inRange("elastic_axis_chord_fraction", elasticAxisChordFraction, 0.0, 1.0);
    Checks.inRange("mass_axis_chord_fraction", massAxisChordFraction, 0.0, 1.0);
    Checks.positive("mass_per_length_kg_per_m", massPerLengthKgPerM);
    Checks.positive("pitch_inertia_kg_m", pitchInertiaKgM);
    if (inertiaAxis == null) {
      throw new InvalidInputException("inertia_axis", "elastic_axis or centre_of_mass", "nothing");
    }
    Checks.positive("bending_stiffness_n_m2", bendingStiffnessNm2);
    Checks.positive("torsion_stiffness_n_m2", torsionStiffnessNm2);
    Checks.positive("lift_slope_per_rad", liftSlopePerRad);
    Checks.atLeast("bending_modes", bendingModes, 1);
    Checks.atLeast("torsion_modes", torsionModes, 1);
    Checks.atLeast("strips", strips, 1);
    Checks.inRange("damping_ratio", dampingRatio, 0.0, 0.999);
    if (inertiaAxis == InertiaAxis.ELASTIC_AXIS) {
      double d = (massAxisChordFraction - elasticAxisChordFraction) * chordM;
      double parallelAxis = massPerLengthKgPerM * d * d;
      if (!(pitchInertiaKgM > parallelAxis)) {
        throw new InvalidInputException("pitch_inertia_kg_m",
            "a pitch inertia about the elastic axis above m d^2 = " + parallelAxis + " kg m, with m = "
                + "mass_per_length_kg_per_m and d = (mass_axis_chord_fraction - elastic_axis_chord_fraction) "
                + "x chord_m (otherwise the section's inertia about its own centre of mass would be zero or "
                + "negative and the mass matrix not positive definite)",
            pitchInertiaKgM + " kg m");
      }
    }
  }

  /** @return pitch inertia per unit span about the elastic axis (kg m) */
  public double pitchInertiaAboutElasticAxisKgM() {
    if (inertiaAxis == InertiaAxis.ELASTIC_AXIS) {
      return pitchInertiaKgM;
    }
    double d = (massAxisChordFraction - elasticAxisChordFraction) * chordM;
    return pitchInertiaKgM + massPerLengthKgPerM * d * d;
  }
}
