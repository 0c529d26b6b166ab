package org.flexmargin.model;

/**
 * One flight-condition set of a campaign matrix: the base case's sweep moved to another altitude
 * (a speed sweep) or another Mach number (a Mach sweep).
 *
 * @param name unique name, e.g. {@code h3000}
 * @param altitudeM altitude of a speed sweep (m), or NaN to keep the base case's
 * @param machNumber Mach number of a Mach sweep (dimensionless), or NaN to keep the base case's
 */
public record CampaignCondition(String name, double altitudeM, double machNumber) {
  /** Validates. */
  public CampaignCondition {
    Checks.name("name", name);
    if (!Double.isNaN(altitudeM)) {
      Altitudes.check("altitude_m", altitudeM);
    }
    if (!Double.isNaN(machNumber)) {
      Checks.positive("mach", machNumber);
    }
  }

  /** The base case's own flight conditions. */
  public static CampaignCondition base() {
    return new CampaignCondition("base", Double.NaN, Double.NaN);
  }
}
