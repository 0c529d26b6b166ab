package org.flexmargin.model;

/**
 * A matched-point flutter and divergence envelope: flutter and divergence points whose speed, Mach
 * number and air density agree with each other and with the Mach number of the aerodynamics.
 *
 * <p>Two kinds of lines make the boundary: at each listed altitude the speed is swept (true
 * airspeed from {@code fromTasMps} to {@code toTasMps}) and the Mach number of the forces is
 * iterated until it equals the Mach number of the flutter (or divergence) point; along each listed
 * Mach number the altitude is swept from the highest to the lowest listed altitude with the forces
 * at that Mach number, which is matched by construction. Example: altitudes 0, 3000 and 6000 m
 * and Mach numbers 0.4 and 0.6 give three constant-altitude points and two constant-Mach points
 * of the flutter boundary.
 *
 * @param altitudesM altitudes of the constant-altitude lines (m), increasing, at least one
 * @param machNumbers Mach numbers of the constant-Mach lines, increasing, in (0, 0.95]; may be empty
 * @param fromTasMps lowest true airspeed of a constant-altitude line (m/s), &gt; 0
 * @param toTasMps highest true airspeed of a constant-altitude line (m/s)
 * @param points grid points of each line, 2 to 2000
 * @param diveSpeedEasMps design dive speed V_D as equivalent airspeed (m/s), drawn on the chart
 * @param diveMach design dive Mach number M_D, or NaN for none
 */
public record EnvelopeSpec(
    double[] altitudesM,
    double[] machNumbers,
    double fromTasMps,
    double toTasMps,
    int points,
    double diveSpeedEasMps,
    double diveMach) {
  /** Validates and copies. */
  public EnvelopeSpec {
    altitudesM = increasing("altitudes_m", altitudesM);
    if (altitudesM.length == 0) {
      throw new InvalidInputException("altitudes_m", "at least one altitude", "an empty list");
    }
    for (int i = 0; i < altitudesM.length; i++) {
      Altitudes.check("altitudes_m[" + i + "]", altitudesM[i]);
    }
    machNumbers = increasing("mach_numbers", machNumbers == null ? new double[0] : machNumbers);
    for (int i = 0; i < machNumbers.length; i++) {
      Checks.inRange("mach_numbers[" + i + "]", machNumbers[i], 1e-3, 0.95);
    }
    if (machNumbers.length > 0 && altitudesM.length < 2) {
      throw new InvalidInputException("altitudes_m", "two altitudes or more (the constant-Mach lines run between "
          + "the lowest and the highest)", altitudesM.length + " altitude");
    }
    Checks.positive("from_tas_mps", fromTasMps);
    Checks.positive("to_tas_mps", toTasMps);
    if (toTasMps <= fromTasMps) {
      throw new InvalidInputException("to_tas_mps", "a speed above from_tas_mps = " + fromTasMps + " m/s",
          toTasMps + " m/s");
    }
    Checks.inRange("points", points, 2, 2000);
    Checks.positive("dive_speed_eas_mps", diveSpeedEasMps);
    if (!Double.isNaN(diveMach)) {
      Checks.inRange("dive_mach", diveMach, 1e-3, 5);
    }
  }

  private static double[] increasing(String path, double[] v) {
    if (v == null) {
      throw new InvalidInputException(path, "a list of numbers", "none");
    }
    for (int i = 0; i < v.length; i++) {
      Checks.finite(path + "[" + i + "]", v[i]);
      if (i > 0 && v[i] <= v[i - 1]) {
        throw new InvalidInputException(path + "[" + i + "]", "increasing values", v[i] + " after " + v[i - 1]);
      }
    }
    return v.clone();
  }

  /** @return a copy of the altitudes (m) */
  @Override
  public double[] altitudesM() {
    return altitudesM.clone();
  }

  /** @return a copy of the Mach numbers */
  @Override
  public double[] machNumbers() {
    return machNumbers.clone();
  }
}
