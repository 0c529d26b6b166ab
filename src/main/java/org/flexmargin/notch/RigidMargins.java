package org.flexmargin.notch;

/**
 * Rigid-body margins of the full loop at one flight point, computed by the project's margin code
 * ({@link org.flexmargin.sweep.ServoMargins}, {@link org.flexmargin.loop.LoopMargins}) on the exact
 * broken loop; crossings below the rigid-band top count.
 *
 * @param configuration configuration name
 * @param gridPoint sweep grid point
 * @param speedEasMps equivalent airspeed, m/s
 * @param phaseMarginDeg smallest phase margin over the rigid gain crossovers, deg (+infinity if none)
 * @param crossoverHz frequency of that crossover, Hz (NaN if none)
 * @param gainIncreaseMarginDb smallest gain-increase margin, dB (+infinity if none)
 * @param gainReductionMarginDb gain-reduction margin nearest 0 dB, dB (-infinity if none)
 * @param meetsRequirement true if PM, GM+ and -GM- all reach the required margins
 */
public record RigidMargins(String configuration, int gridPoint, double speedEasMps, double phaseMarginDeg,
    double crossoverHz, double gainIncreaseMarginDb, double gainReductionMarginDb, boolean meetsRequirement) {}
