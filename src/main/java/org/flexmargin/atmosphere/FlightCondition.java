package org.flexmargin.atmosphere;

/**
 * A flight point: standard-atmosphere state at an altitude and a true airspeed. Derived values
 * (Mach, dynamic pressure, equivalent airspeed) are computed, not stored.
 *
 * @param altitudeM geometric altitude (m)
 * @param densityKgPerM3 air density rho (kg/m^3)
 * @param pressurePa static pressure (Pa)
 * @param temperatureK static temperature (K)
 * @param speedOfSoundMps speed of sound a (m/s)
 * @param speedTasMps true airspeed V (m/s)
 */
public record FlightCondition(
    double altitudeM,
    double densityKgPerM3,
    double pressurePa,
    double temperatureK,
    double speedOfSoundMps,
    double speedTasMps) {

  /** Sea-level standard density rho0 (kg/m^3), US Standard Atmosphere 1976. */
  public static final double SEA_LEVEL_DENSITY_KG_PER_M3 = 1.225;

  /** Validates that every value is finite and positive (speed may be zero). */
  public FlightCondition {
    if (!(densityKgPerM3 > 0) || !(pressurePa > 0) || !(temperatureK > 0) || !(speedOfSoundMps > 0)
        || !(speedTasMps >= 0) || !Double.isFinite(altitudeM) || !Double.isFinite(speedTasMps)) {
      throw new IllegalArgumentException(
          "flight condition needs positive finite density, pressure, temperature, speed of sound "
              + "and a non-negative speed; got rho=" + densityKgPerM3 + " kg/m^3, p=" + pressurePa
              + " Pa, T=" + temperatureK + " K, a=" + speedOfSoundMps + " m/s, V=" + speedTasMps + " m/s");
    }
  }

  /** @return Mach number V / a */
  public double mach() {
    return speedTasMps / speedOfSoundMps;
  }

  /** @return dynamic pressure q = rho V^2 / 2 (Pa) */
  public double dynamicPressurePa() {
    return 0.5 * densityKgPerM3 * speedTasMps * speedTasMps;
  }

  /** @return equivalent airspeed V sqrt(rho / rho0) (m/s) */
  public double speedEasMps() {
    return speedTasMps * Math.sqrt(densityKgPerM3 / SEA_LEVEL_DENSITY_KG_PER_M3);
  }

  /** @return the same atmosphere state at another true airspeed */
  public FlightCondition withSpeedTasMps(double v) {
    return new FlightCondition(altitudeM, densityKgPerM3, pressurePa, temperatureK, speedOfSoundMps, v);
  }
}
