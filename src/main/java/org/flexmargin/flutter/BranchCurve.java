package org.flexmargin.flutter;

/**
 * One tracked root (p-k) or eigenvalue branch (k method) along the analysis, as arrays over the
 * solution points. Damping is given both ways: {@code dampingG} in the V-g convention
 * g = 2 Re(s)/Im(s) (negative stable; for the k method the artificial structural damping needed
 * for harmonic motion, meaningful only at g = 0), and {@code dampingRatio} zeta = -Re(s)/|s|
 * (positive stable). For a non-oscillating root g is +/- infinity.
 *
 * @param name mode the branch starts from
 * @param pathParameter p-k: path parameter t of each point; k method: reduced frequency k
 * @param speedEasMps equivalent airspeed (m/s)
 * @param speedTasMps true airspeed (m/s)
 * @param frequencyHz root frequency Im(s)/2 pi (Hz)
 * @param dampingG g, V-g convention (dimensionless)
 * @param dampingRatio zeta (dimensionless)
 * @param reducedFrequency k = omega b_ref / V at the root
 * @param converged whether the root converged at each point
 */
public record BranchCurve(
    String name,
    double[] pathParameter,
    double[] speedEasMps,
    double[] speedTasMps,
    double[] frequencyHz,
    double[] dampingG,
    double[] dampingRatio,
    double[] reducedFrequency,
    boolean[] converged) {
  /** Copies the arrays and checks their lengths agree. */
  public BranchCurve {
    int n = pathParameter.length;
    if (speedEasMps.length != n || speedTasMps.length != n || frequencyHz.length != n
        || dampingG.length != n || dampingRatio.length != n || reducedFrequency.length != n
        || converged.length != n) {
      throw new IllegalArgumentException("branch arrays must have equal lengths");
    }
    pathParameter = pathParameter.clone();
    speedEasMps = speedEasMps.clone();
    speedTasMps = speedTasMps.clone();
    frequencyHz = frequencyHz.clone();
    dampingG = dampingG.clone();
    dampingRatio = dampingRatio.clone();
    reducedFrequency = reducedFrequency.clone();
    converged = converged.clone();
  }

  /** @return number of points */
  public int size() {
    return pathParameter.length;
  }

  @Override
  public double[] pathParameter() {
    return pathParameter.clone();
  }

  @Override
  public double[] speedEasMps() {
    return speedEasMps.clone();
  }

  @Override
  public double[] speedTasMps() {
    return speedTasMps.clone();
  }

  @Override
  public double[] frequencyHz() {
    return frequencyHz.clone();
  }

  @Override
  public double[] dampingG() {
    return dampingG.clone();
  }

  @Override
  public double[] dampingRatio() {
    return dampingRatio.clone();
  }

  @Override
  public double[] reducedFrequency() {
    return reducedFrequency.clone();
  }

  @Override
  public boolean[] converged() {
    return converged.clone();
  }
}
