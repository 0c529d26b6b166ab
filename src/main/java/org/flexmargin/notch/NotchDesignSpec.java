package org.flexmargin.notch;

import java.util.List;
import org.flexmargin.clearance.RequirementLookup;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.SpeedRegime;
import org.flexmargin.model.LoopSpec;

/**
 * What a notch design must achieve and what it may change.
 *
 * @param notchPaths indices into the loop's paths that carry the designed notches (the same notch
 *     set in each); empty for the default: every path whose sensor sees the structure
 * @param maxNotches maximum number of notches (1..6)
 * @param peakLimitDb gain-stabilisation limit: every structural peak of |L| must stay at or below
 *     this, dB (common practice -6 dB)
 * @param frequencyUncertainty relative modal frequency uncertainty u: every elastic mode is
 *     shifted by the factors 1 - u, 1, 1 + u (common practice 0.10), in [0, 0.5)
 * @param requiredPhaseMarginDeg rigid-body phase margin to keep, deg (common practice 45)
 * @param requiredGainMarginDb rigid-body gain margin to keep in both directions, dB (common
 *     practice 6)
 * @param rigidBandFraction gain and phase crossings below this fraction of the lowest elastic mode
 *     frequency count as rigid-body crossings (0.5), in (0, 1]
 * @param existingNotches what to do with notches already in the carrying paths
 * @param pointStride use every n-th sweep grid point (1 = all; the last point is always used)
 * @param maxSpeedEasMps only sweep points at or below this equivalent airspeed are designed for
 *     and checked, m/s (infinity = all)
 * @param designMarginDb the optimiser aims this far below the limit to absorb sampling of the
 *     peaks, dB (&gt;= 0); feasibility is judged against the limit itself
 * @param modeBandFraction structural peaks of a mode are searched within +-this fraction of its
 *     (shifted) in-vacuo frequency (0.3), in (0, 0.6]
 * @param marginTable when not null, the rigid-body margins to keep at each speed are the table's
 *     rigid-body cell for that speed's regime (e.g. 45 deg / 6 dB in the normal envelope, 30 deg /
 *     4.5 dB up to the limit speed); {@code requiredPhaseMarginDeg}/{@code requiredGainMarginDb}
 *     apply only without a table
 */
public record NotchDesignSpec(
    List<Integer> notchPaths,
    int maxNotches,
    double peakLimitDb,
    double frequencyUncertainty,
    double requiredPhaseMarginDeg,
    double requiredGainMarginDb,
    double rigidBandFraction,
    ExistingNotches existingNotches,
    int pointStride,
    double maxSpeedEasMps,
    double designMarginDb,
    double modeBandFraction,
    ClearanceRequirements marginTable) {

  /**
   * @param speedEasMps equivalent airspeed (m/s)
   * @return rigid-body phase margin to keep there (deg)
   */
  public double requiredPhaseMarginDeg(double speedEasMps) {
    return marginTable == null ? requiredPhaseMarginDeg : rigidCell(speedEasMps).phaseMarginDeg();
  }

  /**
   * @param speedEasMps equivalent airspeed (m/s)
   * @return rigid-body gain margin to keep there, both directions (dB)
   */
  public double requiredGainMarginDb(double speedEasMps) {
    return marginTable == null ? requiredGainMarginDb : rigidCell(speedEasMps).gainMarginDb();
  }

  private MarginCell rigidCell(double speedEasMps) {
    SpeedRegime regime = RequirementLookup.regime(marginTable, speedEasMps);
    return regime == SpeedRegime.BEYOND ? new MarginCell(FrequencyBand.RIGID_BODY,
        SpeedRegime.UP_TO_115_LIMIT_SPEED, 0.0, 0.0) : marginTable.cell(FrequencyBand.RIGID_BODY, regime);
  }

  /** @return a copy taking the rigid-body margins from a requirements table, speed by speed */
  public NotchDesignSpec withMarginTable(ClearanceRequirements table) {
    return new NotchDesignSpec(notchPaths, maxNotches, peakLimitDb, frequencyUncertainty, requiredPhaseMarginDeg,
        requiredGainMarginDb, rigidBandFraction, existingNotches, pointStride, maxSpeedEasMps, designMarginDb,
        modeBandFraction, table);
  }

  /** Validates and copies. */
  public NotchDesignSpec {
    notchPaths = notchPaths == null ? List.of() : List.copyOf(notchPaths);
    for (int i = 0; i < notchPaths.size(); i++) {
      if (notchPaths.get(i) < 0) {
        throw new InvalidInputException("notch_paths[" + i + "]", "a path index >= 0",
            String.valueOf(notchPaths.get(i)));
      }
    }
    if (maxNotches < 1 || maxNotches > 6) {
      throw new InvalidInputException("max_notches", "an integer from 1 to 6", String.valueOf(maxNotches));
    }
    if (!(peakLimitDb <= 0 && peakLimitDb > -60)) {
      throw new InvalidInputException("peak_limit_db", "a value in (-60, 0] dB", String.valueOf(peakLimitDb));
    }
    if (!(frequencyUncertainty >= 0 && frequencyUncertainty < 0.5)) {
      throw new InvalidInputException("frequency_uncertainty", "a fraction in [0, 0.5)",
          String.valueOf(frequencyUncertainty));
    }
    if (!(requiredPhaseMarginDeg >= 0 && requiredPhaseMarginDeg < 90)) {
      throw new InvalidInputException("required_phase_margin_deg", "a value in [0, 90) deg",
          String.valueOf(requiredPhaseMarginDeg));
    }
    if (!(requiredGainMarginDb >= 0 && requiredGainMarginDb < 40)) {
      throw new InvalidInputException("required_gain_margin_db", "a value in [0, 40) dB",
          String.valueOf(requiredGainMarginDb));
    }
    if (!(rigidBandFraction > 0 && rigidBandFraction <= 1)) {
      throw new InvalidInputException("rigid_band_fraction", "a fraction in (0, 1]",
          String.valueOf(rigidBandFraction));
    }
    if (existingNotches == null) {
      throw new InvalidInputException("existing_notches", "replace or keep", "nothing");
    }
    if (pointStride < 1) {
      throw new InvalidInputException("point_stride", "an integer >= 1", String.valueOf(pointStride));
    }
    if (!(maxSpeedEasMps > 0)) {
      throw new InvalidInputException("max_speed_eas_mps", "a speed > 0 m/s", String.valueOf(maxSpeedEasMps));
    }
    if (!(designMarginDb >= 0 && designMarginDb < 6)) {
      throw new InvalidInputException("design_margin_db", "a value in [0, 6) dB", String.valueOf(designMarginDb));
    }
    if (!(modeBandFraction > 0 && modeBandFraction <= 0.6)) {
      throw new InvalidInputException("mode_band_fraction", "a fraction in (0, 0.6]",
          String.valueOf(modeBandFraction));
    }
  }

  /**
   * @return the common-practice defaults: default paths, up to 3 notches, -6 dB, +-10 %, 45 deg /
   *     6 dB, rigid band below half the lowest elastic frequency, existing notches replaced, every
   *     grid point, all speeds, 0.5 dB design margin, +-10 % mode bands (the gain-stabilisation
   *     check over [0.9 f_n, 1.1 f_n] of references section 1.2, common practice)
   */
  public static NotchDesignSpec defaults() {
    return new NotchDesignSpec(List.of(), 3, -6.0, 0.10, 45.0, 6.0, 0.5, ExistingNotches.REPLACE, 1,
        Double.POSITIVE_INFINITY, 0.5, 0.1, null);
  }

  /**
   * The defaults, with the limit, uncertainty, design envelope (up to the limit speed, where
   * structural checks stop) and rigid-body margins by speed regime taken from the case's
   * requirements table when it has one.
   *
   * @param requirements the case's table, or null
   * @return the specification
   */
  public static NotchDesignSpec forRequirements(ClearanceRequirements requirements) {
    NotchDesignSpec d = defaults();
    if (requirements == null) {
      return d;
    }
    return d.withPeakLimitDb(requirements.structuralPeakLimitDb())
        .withFrequencyUncertainty(requirements.frequencyUncertainty())
        .withPoints(d.pointStride(), requirements.limitSpeedEasMps())
        .withMarginTable(requirements);
  }

  /** @return a copy carrying the notches in the given paths */
  public NotchDesignSpec withNotchPaths(List<Integer> paths) {
    return new NotchDesignSpec(paths, maxNotches, peakLimitDb, frequencyUncertainty, requiredPhaseMarginDeg,
        requiredGainMarginDb, rigidBandFraction, existingNotches, pointStride, maxSpeedEasMps, designMarginDb,
        modeBandFraction, marginTable);
  }

  /** @return a copy with another maximum number of notches */
  public NotchDesignSpec withMaxNotches(int n) {
    return new NotchDesignSpec(notchPaths, n, peakLimitDb, frequencyUncertainty, requiredPhaseMarginDeg,
        requiredGainMarginDb, rigidBandFraction, existingNotches, pointStride, maxSpeedEasMps, designMarginDb,
        modeBandFraction, marginTable);
  }

  /** @return a copy with another gain-stabilisation limit (dB) */
  public NotchDesignSpec withPeakLimitDb(double limitDb) {
    return new NotchDesignSpec(notchPaths, maxNotches, limitDb, frequencyUncertainty, requiredPhaseMarginDeg,
        requiredGainMarginDb, rigidBandFraction, existingNotches, pointStride, maxSpeedEasMps, designMarginDb,
        modeBandFraction, marginTable);
  }

  /** @return a copy with another relative frequency uncertainty */
  public NotchDesignSpec withFrequencyUncertainty(double u) {
    return new NotchDesignSpec(notchPaths, maxNotches, peakLimitDb, u, requiredPhaseMarginDeg,
        requiredGainMarginDb, rigidBandFraction, existingNotches, pointStride, maxSpeedEasMps, designMarginDb,
        modeBandFraction, marginTable);
  }

  /** @return a copy with other required rigid-body margins (deg, dB) */
  public NotchDesignSpec withRequiredMargins(double phaseDeg, double gainDb) {
    return new NotchDesignSpec(notchPaths, maxNotches, peakLimitDb, frequencyUncertainty, phaseDeg, gainDb,
        rigidBandFraction, existingNotches, pointStride, maxSpeedEasMps, designMarginDb, modeBandFraction, marginTable);
  }

  /** @return a copy with another treatment of existing notches */
  public NotchDesignSpec withExistingNotches(ExistingNotches treatment) {
    return new NotchDesignSpec(notchPaths, maxNotches, peakLimitDb, frequencyUncertainty, requiredPhaseMarginDeg,
        requiredGainMarginDb, rigidBandFraction, treatment, pointStride, maxSpeedEasMps, designMarginDb,
        modeBandFraction, marginTable);
  }

  /** @return a copy using every n-th grid point up to the given EAS (m/s) */
  public NotchDesignSpec withPoints(int stride, double maxEasMps) {
    return new NotchDesignSpec(notchPaths, maxNotches, peakLimitDb, frequencyUncertainty, requiredPhaseMarginDeg,
        requiredGainMarginDb, rigidBandFraction, existingNotches, stride, maxEasMps, designMarginDb,
        modeBandFraction, marginTable);
  }

  /** @return the frequency shift factors {1 - u, 1, 1 + u} (just {1} for u = 0) */
  public double[] shiftFactors() {
    return frequencyUncertainty == 0 ? new double[] {1.0}
        : new double[] {1 - frequencyUncertainty, 1.0, 1 + frequencyUncertainty};
  }

  /**
   * Resolves a path given by index or by sensor name.
   *
   * @param loop the loop
   * @param indexOrSensor a path index ("0") or the name of a path's sensor ("pitch_rate")
   * @return the path index
   */
  public static int pathIndex(LoopSpec loop, String indexOrSensor) {
    for (int p = 0; p < loop.paths().size(); p++) {
      if (loop.paths().get(p).sensor().equals(indexOrSensor)) {
        return p;
      }
    }
    try {
      int p = Integer.parseInt(indexOrSensor.trim());
      if (p >= 0 && p < loop.paths().size()) {
        return p;
      }
    } catch (NumberFormatException e) {
      // not an index: reported below
    }
    throw new InvalidInputException("notch_path", "a path index 0.." + (loop.paths().size() - 1)
        + " or a path sensor name", "\"" + indexOrSensor + "\"");
  }
}
