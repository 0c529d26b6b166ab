package org.flexmargin.model;

/**
 * One sample of a campaign as changes to its base case: one configuration, its flight
 * conditions, loop changes and a perturbed mode table. Written as a plain case file by {@code io}
 * so that {@code sweep} reads exactly the sample's case.
 *
 * @param name case name of the sample
 * @param description the sample's provenance (campaign, cell, sample index, drawn values)
 * @param configuration name of the base configuration kept (the others are dropped)
 * @param modeTable the configuration's mode table with perturbed values
 * @param altitudeM new altitude of a speed sweep (m), NaN to keep
 * @param machNumber new Mach number of a Mach sweep, NaN to keep
 * @param sweepPoints new number of grid points, 0 to keep
 * @param pathLost sensor name whose feedback path is removed, {@code null} for none
 * @param actuatorBandwidthFactor factor on the actuator bandwidth (dimensionless)
 * @param addedDelayS seconds added to the computation delay (s)
 * @param gainFactor factor on every path's proportional and integral gains (dimensionless)
 * @param aeroScale factor on every strip's lift-curve slope (dimensionless)
 */
public record CaseVariant(String name, String description, String configuration, ModeTable modeTable,
    double altitudeM, double machNumber, int sweepPoints, String pathLost, double actuatorBandwidthFactor,
    double addedDelayS, double gainFactor, double aeroScale) {
  /** Validates. */
  public CaseVariant {
    Checks.name("name", name);
    Checks.name("configuration", configuration);
    if (modeTable == null) {
      throw new InvalidInputException("mode_table", "a mode table", "nothing");
    }
    Checks.positive("actuator_bandwidth_factor", actuatorBandwidthFactor);
    Checks.finite("added_delay_s", addedDelayS);
    Checks.positive("gain_factor", gainFactor);
    Checks.positive("aero_scale", aeroScale);
  }
}
