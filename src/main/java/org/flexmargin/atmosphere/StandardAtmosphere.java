package org.flexmargin.atmosphere;

import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.Altitudes;
import org.flexmargin.model.Checks;
import org.flexmargin.model.InvalidInputException;

/**
 * The U.S. Standard Atmosphere 1976 (identical to the ISO 2533 standard atmosphere in the range
 * they share) from {@link Altitudes#MIN_M} = -5 km to {@link Altitudes#MAX_M} = 86 km geometric
 * altitude.
 *
 * <p>Model (U.S. Standard Atmosphere 1976, NOAA/NASA/USAF, Part 1, sections 1.2-1.3): seven layers
 * of linear molecular-scale temperature in geopotential altitude h = r0 Z / (r0 + Z), with
 * r0 = 6 356 766 m and Z the geometric altitude. Base geopotential altitudes 0, 11, 20, 32, 47, 51,
 * 71 km, lapse rates -6.5, 0, +1.0, +2.8, 0, -2.8, -2.0 K/km, base temperature 288.15 K at sea
 * level. Pressure follows from the hydrostatic equation integrated layer by layer (power law in a
 * layer with a lapse rate, exponential in an isothermal layer), starting from 101 325 Pa; the layer
 * base pressures are computed, not tabulated. Density rho = p M0 / (R* T_M) and speed of sound
 * a = sqrt(gamma R* T_M / M0) use the molecular-scale temperature T_M, as the standard defines
 * them. Constants are those of the standard: g0 = 9.80665 m/s^2, R* = 8.31432 J/(mol K),
 * M0 = 28.9644 kg/kmol, gamma = 1.4.
 *
 * <p>Below 80 km the kinetic temperature equals T_M. Between 80 and 86 km the standard's mean
 * molecular weight decreases slightly and the kinetic temperature is T = T_M (M / M0); the ratio
 * M / M0 is interpolated linearly in the standard's table 8 (values recalled from memory; they
 * change T by less than 0.05 % and leave p, rho and a unaffected).
 *
 * <p>Equivalent airspeed uses {@link FlightCondition#SEA_LEVEL_DENSITY_KG_PER_M3}:
 * V_EAS = V_TAS sqrt(rho / rho0). Example at 5 000 m (rho = 0.7364 kg/m^3): 100 m/s EAS is
 * 129.0 m/s TAS.
 *
 * <p>All methods are static and thread-safe. Altitudes outside the model range and negative
 * speeds throw {@link InvalidInputException}.
 */
public final class StandardAtmosphere {
  private StandardAtmosphere() {}

  /** Effective Earth radius r0 for geopotential altitude (m), US Standard Atmosphere 1976. */
  public static final double EARTH_RADIUS_M = 6_356_766.0;
  /** Standard acceleration of gravity g0 (m/s^2). */
  public static final double G0_MPS2 = 9.80665;
  /** Universal gas constant R* as used by US Standard Atmosphere 1976 (J/(kmol K)). */
  public static final double GAS_CONSTANT_J_PER_KMOL_K = 8314.32;
  /** Sea-level mean molecular weight M0 (kg/kmol). */
  public static final double MOLAR_MASS_KG_PER_KMOL = 28.9644;
  /** Specific gas constant of air R = R* / M0 (J/(kg K)), about 287.053. */
  public static final double SPECIFIC_GAS_CONSTANT_J_PER_KG_K =
      GAS_CONSTANT_J_PER_KMOL_K / MOLAR_MASS_KG_PER_KMOL;
  /** Ratio of specific heats of air (dimensionless). */
  public static final double GAMMA = 1.4;
  /** Sea-level standard pressure (Pa). */
  public static final double SEA_LEVEL_PRESSURE_PA = 101_325.0;
  /** Sea-level standard temperature (K). */
  public static final double SEA_LEVEL_TEMPERATURE_K = 288.15;

  /** Base geopotential altitudes of the seven layers (m'), plus the top at 84 852 m'. */
  private static final double[] BASE_H = {0, 11_000, 20_000, 32_000, 47_000, 51_000, 71_000};
  /** Molecular-scale temperature gradients of the layers (K/m'). */
  private static final double[] LAPSE = {-0.0065, 0.0, 0.0010, 0.0028, 0.0, -0.0028, -0.0020};
  /** Base molecular-scale temperatures (K), computed from the gradients. */
  private static final double[] BASE_T = new double[BASE_H.length];
  /** Base pressures (Pa), computed by integrating the hydrostatic equation. */
  private static final double[] BASE_P = new double[BASE_H.length];
  /** g0 M0 / R* (K/m'). */
  private static final double GMR = G0_MPS2 * MOLAR_MASS_KG_PER_KMOL / GAS_CONSTANT_J_PER_KMOL_K;

  /** Geometric altitudes (m) of the molecular-weight ratio table, 80 to 86 km in 0.5 km steps. */
  private static final double MW_TABLE_START_M = 80_000.0;
  /** Step of the molecular-weight ratio table (m). */
  private static final double MW_TABLE_STEP_M = 500.0;
  /** M / M0 at 80.0, 80.5, ..., 86.0 km geometric (US Standard Atmosphere 1976 table 8). */
  private static final double[] MW_RATIO = {
    1.000000, 0.999996, 0.999989, 0.999971, 0.999941, 0.999909, 0.999870,
    0.999829, 0.999786, 0.999741, 0.999694, 0.999641, 0.999579
  };

  static {
    BASE_T[0] = SEA_LEVEL_TEMPERATURE_K;
    BASE_P[0] = SEA_LEVEL_PRESSURE_PA;
    for (int i = 1; i < BASE_H.length; i++) {
      BASE_T[i] = BASE_T[i - 1] + LAPSE[i - 1] * (BASE_H[i] - BASE_H[i - 1]);
      BASE_P[i] = layerPressure(i - 1, BASE_H[i]);
    }
  }

  /**
   * @param altitudeM geometric altitude Z (m)
   * @return geopotential altitude h = r0 Z / (r0 + Z) (m')
   */
  public static double geopotentialAltitudeM(double altitudeM) {
    return EARTH_RADIUS_M * altitudeM / (EARTH_RADIUS_M + altitudeM);
  }

  /**
   * @param geopotentialM geopotential altitude h (m')
   * @return geometric altitude Z = r0 h / (r0 - h) (m)
   */
  public static double geometricAltitudeM(double geopotentialM) {
    return EARTH_RADIUS_M * geopotentialM / (EARTH_RADIUS_M - geopotentialM);
  }

  /**
   * @param altitudeM geometric altitude (m), within the model range
   * @return static pressure (Pa)
   */
  public static double pressurePa(double altitudeM) {
    double h = geopotentialAltitudeM(Altitudes.check("altitude_m", altitudeM));
    return layerPressure(layerOf(h), h);
  }

  /**
   * @param altitudeM geometric altitude (m), within the model range
   * @return kinetic temperature (K)
   */
  public static double temperatureK(double altitudeM) {
    double h = geopotentialAltitudeM(Altitudes.check("altitude_m", altitudeM));
    return molecularTemperature(h) * molecularWeightRatio(altitudeM);
  }

  /**
   * @param altitudeM geometric altitude (m), within the model range
   * @return density (kg/m^3)
   */
  public static double densityKgPerM3(double altitudeM) {
    double h = geopotentialAltitudeM(Altitudes.check("altitude_m", altitudeM));
    return layerPressure(layerOf(h), h) / (SPECIFIC_GAS_CONSTANT_J_PER_KG_K * molecularTemperature(h));
  }

  /**
   * @param altitudeM geometric altitude (m), within the model range
   * @return speed of sound (m/s)
   */
  public static double speedOfSoundMps(double altitudeM) {
    double h = geopotentialAltitudeM(Altitudes.check("altitude_m", altitudeM));
    return Math.sqrt(GAMMA * SPECIFIC_GAS_CONSTANT_J_PER_KG_K * molecularTemperature(h));
  }

  /**
   * Inverse of {@link #pressurePa}: the geometric altitude at which the standard pressure is
   * {@code pressurePa}. Used for constant-Mach envelope work, where equivalent airspeed at a fixed
   * Mach number is proportional to sqrt(p) (V_EAS = M sqrt(gamma p / rho0)).
   *
   * @param pressurePa static pressure (Pa), between the pressures at 86 km and at -5 km
   * @return geometric altitude (m)
   */
  public static double altitudeAtPressureM(double pressurePa) {
    double pMax = pressurePa(Altitudes.MIN_M);
    double pMin = pressurePa(Altitudes.MAX_M);
    if (!(pressurePa >= pMin && pressurePa <= pMax)) {
      throw new InvalidInputException(
          "pressure_pa", "a pressure in [" + pMin + ", " + pMax + "] Pa (the model range)",
          String.valueOf(pressurePa));
    }
    int i = BASE_H.length - 1;
    while (i > 0 && pressurePa > BASE_P[i]) {
      i--;
    }
    double h;
    if (LAPSE[i] == 0.0) {
      h = BASE_H[i] - BASE_T[i] / GMR * Math.log(pressurePa / BASE_P[i]);
    } else {
      double ratio = Math.pow(pressurePa / BASE_P[i], -LAPSE[i] / GMR);
      h = BASE_H[i] + BASE_T[i] * (ratio - 1.0) / LAPSE[i];
    }
    double z = geometricAltitudeM(h);
    return Math.max(Altitudes.MIN_M, Math.min(Altitudes.MAX_M, z));
  }

  /**
   * @param altitudeM geometric altitude (m)
   * @param speedTasMps true airspeed (m/s), &gt;= 0
   * @return the flight condition
   */
  public static FlightCondition at(double altitudeM, double speedTasMps) {
    Checks.nonNegative("speed_tas_mps", speedTasMps);
    double h = geopotentialAltitudeM(Altitudes.check("altitude_m", altitudeM));
    double tm = molecularTemperature(h);
    double p = layerPressure(layerOf(h), h);
    double rho = p / (SPECIFIC_GAS_CONSTANT_J_PER_KG_K * tm);
    double a = Math.sqrt(GAMMA * SPECIFIC_GAS_CONSTANT_J_PER_KG_K * tm);
    return new FlightCondition(
        altitudeM, rho, p, tm * molecularWeightRatio(altitudeM), a, speedTasMps);
  }

  /**
   * @param altitudeM geometric altitude (m)
   * @param speedEasMps equivalent airspeed (m/s), &gt;= 0
   * @return the flight condition, with true airspeed V_EAS sqrt(rho0 / rho)
   */
  public static FlightCondition atEquivalentSpeed(double altitudeM, double speedEasMps) {
    Checks.nonNegative("speed_eas_mps", speedEasMps);
    FlightCondition still = at(altitudeM, 0.0);
    double tas =
        speedEasMps * Math.sqrt(FlightCondition.SEA_LEVEL_DENSITY_KG_PER_M3 / still.densityKgPerM3());
    return still.withSpeedTasMps(tas);
  }

  /**
   * @param altitudeM geometric altitude (m)
   * @param speedMps airspeed (m/s) of kind {@code kind}, &gt;= 0
   * @param kind whether {@code speedMps} is equivalent or true airspeed
   * @return the flight condition
   */
  public static FlightCondition of(double altitudeM, double speedMps, AirspeedKind kind) {
    if (kind == null) {
      throw new InvalidInputException("speed_kind", "eas or tas", "nothing");
    }
    return kind == AirspeedKind.EQUIVALENT
        ? atEquivalentSpeed(altitudeM, speedMps)
        : at(altitudeM, speedMps);
  }

  /**
   * @param altitudeM geometric altitude (m)
   * @param mach Mach number (dimensionless), &gt;= 0
   * @return the flight condition, with true airspeed M a
   */
  public static FlightCondition atMach(double altitudeM, double mach) {
    Checks.nonNegative("mach", mach);
    FlightCondition still = at(altitudeM, 0.0);
    return still.withSpeedTasMps(mach * still.speedOfSoundMps());
  }

  /** @return index of the layer containing geopotential altitude {@code h} */
  private static int layerOf(double h) {
    int i = BASE_H.length - 1;
    while (i > 0 && h < BASE_H[i]) {
      i--;
    }
    return i;
  }

  /** @return molecular-scale temperature (K) at geopotential altitude {@code h} */
  private static double molecularTemperature(double h) {
    int i = layerOf(h);
    return BASE_T[i] + LAPSE[i] * (h - BASE_H[i]);
  }

  /** @return pressure (Pa) at geopotential {@code h} from the base of layer {@code i} */
  private static double layerPressure(int i, double h) {
    double dh = h - BASE_H[i];
    if (LAPSE[i] == 0.0) {
      return BASE_P[i] * Math.exp(-GMR * dh / BASE_T[i]);
    }
    return BASE_P[i] * Math.pow(BASE_T[i] / (BASE_T[i] + LAPSE[i] * dh), GMR / LAPSE[i]);
  }

  /** @return M / M0 at geometric altitude {@code z} (1 below 80 km) */
  private static double molecularWeightRatio(double z) {
    if (z <= MW_TABLE_START_M) {
      return 1.0;
    }
    double s = (z - MW_TABLE_START_M) / MW_TABLE_STEP_M;
    int j = Math.min((int) Math.floor(s), MW_RATIO.length - 2);
    double f = s - j;
    return MW_RATIO[j] + f * (MW_RATIO[j + 1] - MW_RATIO[j]);
  }
}
