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

  /**
   * Curve of branch j from tracked roots at the grid points of a path.
   *
   * @param name branch name
   * @param path the path (grid point p is parameter p)
   * @param roots roots[p][j]
   * @param j branch index
   * @param semichordM reference semichord for the reduced frequency (m)
   * @return the curve; unconverged points are NaN
   */
  static BranchCurve of(String name, FlightPath path, FlutterWorkspace.Root[][] roots, int j, double semichordM) {
    int np = roots.length;
    double[] t = new double[np];
    double[] eas = new double[np];
    double[] tas = new double[np];
    double[] f = new double[np];
    double[] g = new double[np];
    double[] z = new double[np];
    double[] k = new double[np];
    boolean[] ok = new boolean[np];
    for (int p = 0; p < np; p++) {
      org.flexmargin.atmosphere.FlightCondition fc = path.at(p);
      FlutterWorkspace.Root r = roots[p][j];
      t[p] = p;
      eas[p] = fc.speedEasMps();
      tas[p] = fc.speedTasMps();
      ok[p] = r.converged();
      f[p] = ok[p] ? r.frequencyHz() : Double.NaN;
      g[p] = ok[p] ? r.dampingG() : Double.NaN;
      z[p] = ok[p] ? r.dampingRatio() : Double.NaN;
      k[p] = ok[p] && fc.speedTasMps() > 0 ? Math.abs(r.si()) * semichordM / fc.speedTasMps() : Double.NaN;
    }
    return new BranchCurve(name, t, eas, tas, f, g, z, k, ok);
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
