package org.flexmargin.structure;

/**
 * The AGARD 445.6 wing, weakened model, as a Ritz plate: the data of the tests that use it, kept
 * once (docs/validation.md 21.2). Geometry and measured data: E. C. Yates, "AGARD Standard
 * Aeroelastic Configurations for Dynamic Response I: Wing 445.6", AGARD Report 765 (1987), from
 * memory; laminate constants as used in later finite-element studies of the wing, from memory.
 */
public final class AgardWeakenedWing {
  private AgardWeakenedWing() {}

  /** Root chord (m), 21.96 in. */
  public static final double ROOT_CHORD_M = 0.5578;
  /** Tip chord (m), 14.496 in. */
  public static final double TIP_CHORD_M = 0.3682;
  /** Semispan (m), 30 in. */
  public static final double SEMISPAN_M = 0.762;
  /** Quarter-chord sweep (rad), 45 deg. */
  public static final double QUARTER_CHORD_SWEEP_RAD = Math.toRadians(45);
  /** Largest thickness over chord of the NACA 65A004 section (dimensionless). */
  public static final double THICKNESS_RATIO = 0.04;
  /** Measured in-vacuo frequencies of the five lowest modes (Hz). */
  public static final double[] MEASURED_HZ = {9.5992, 38.1650, 48.3482, 91.5448, 118.1132};

  /** @return the planform, root leading edge at the origin */
  public static PlatePlanform planform() {
    return PlatePlanform.fromQuarterChordSweep(ROOT_CHORD_M, TIP_CHORD_M, SEMISPAN_M, QUARTER_CHORD_SWEEP_RAD);
  }

  /**
   * Laminated mahogany: E1 = 3.1511 GPa along the mid-chord line, E2 = 0.4162 GPa,
   * G12 = 0.4392 GPa, nu12 = 0.31, 381.98 kg/m^3.
   *
   * @return the material
   */
  public static OrthotropicLamina material() {
    return new OrthotropicLamina(3.1511e9, 0.4162e9, 0.4392e9, 0.31, 381.98, planform().sweepRad(0.5));
  }

  /**
   * @param chordwiseTerms Ritz terms along the chord
   * @param spanwiseTerms Ritz terms along the span
   * @return the plate model with the four-digit thickness law at 4 %
   */
  public static TrapezoidalPlateRitz plate(int chordwiseTerms, int spanwiseTerms) {
    return new TrapezoidalPlateRitz(planform(), material(), new PlateThickness.FourDigitSection(THICKNESS_RATIO),
        chordwiseTerms, spanwiseTerms);
  }

  /**
   * Volume of the conical frustum with the root and tip chords as diameters and the semispan as
   * height, pi s (cr^2 + cr ct + ct^2) / 12 (m^3): the reference volume of the mass ratio.
   *
   * @return the volume (m^3)
   */
  public static double frustumVolumeM3() {
    return Math.PI * SEMISPAN_M * (ROOT_CHORD_M * ROOT_CHORD_M + ROOT_CHORD_M * TIP_CHORD_M
        + TIP_CHORD_M * TIP_CHORD_M) / 12;
  }
}
