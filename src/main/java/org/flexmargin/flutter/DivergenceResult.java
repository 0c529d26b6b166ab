package org.flexmargin.flutter;

/**
 * Static divergence of the elastic structure (rigid body restrained), from the static
 * eigenproblem (K - q Q(0)) phi = 0.
 *
 * @param found whether a positive real divergence pressure exists
 * @param dynamicPressurePa divergence dynamic pressure q_D (Pa); NaN when not found
 * @param speedEasMps divergence equivalent airspeed sqrt(2 q_D / rho0) (m/s); NaN when not found
 * @param shape divergence shape in generalized coordinates, unit 2-norm, largest entry positive
 * @param relativeResidual smallest singular value of (K - q_D Q(0)) over the largest: near zero
 *     when q_D is a true root of the static stability determinant
 * @param reducedFrequencyUsed reduced frequency at which Q was taken (0, or the lowest tabulated)
 * @param note plain-language assumptions and remarks
 */
public record DivergenceResult(
    boolean found,
    double dynamicPressurePa,
    double speedEasMps,
    double[] shape,
    double relativeResidual,
    double reducedFrequencyUsed,
    String note) {
  /** Copies the shape. */
  public DivergenceResult {
    shape = shape.clone();
  }

  @Override
  public double[] shape() {
    return shape.clone();
  }

  /** @return true airspeed at divergence (m/s) for air density rho (kg/m^3); NaN if not found */
  public double speedTasMps(double densityKgPerM3) {
    return found ? Math.sqrt(2 * dynamicPressurePa / densityKgPerM3) : Double.NaN;
  }
}
