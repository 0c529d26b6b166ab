package org.flexmargin.clearance;

import java.util.OptionalDouble;
import org.flexmargin.model.Checks;
import org.flexmargin.model.InvalidInputException;

/**
 * The outcome of one search for flutter along airspeed: the lowest flutter onset found (EAS),
 * or none up to the highest speed analysed.
 *
 * @param label what was searched, e.g. {@code "open_loop"} (controls fixed) or
 *     {@code "closed_loop"} (with the flight control loop)
 * @param onsetEasMps lowest speed at which a root becomes unstable (g rises through 0, V-g
 *     convention), m/s EAS; empty if none was found in the analysed range
 * @param highestAnalysedEasMps top of the analysed range, m/s EAS (&gt;= the onset)
 */
public record OnsetSearch(String label, OptionalDouble onsetEasMps,
    double highestAnalysedEasMps) {
  /** Label of the open-loop (controls fixed) search. */
  public static final String OPEN_LOOP = "open_loop";
  /** Label of the closed-loop (flight control loop closed) search. */
  public static final String CLOSED_LOOP = "closed_loop";

  /** Validates. */
  public OnsetSearch {
    Checks.name("label", label);
    if (onsetEasMps == null) {
      throw new InvalidInputException("onset_eas_mps", "an onset or none", "nothing");
    }
    Checks.positive("highest_analysed_eas_mps", highestAnalysedEasMps);
    if (onsetEasMps.isPresent()) {
      double v = Checks.positive("onset_eas_mps", onsetEasMps.getAsDouble());
      if (v > highestAnalysedEasMps) {
        throw new InvalidInputException("onset_eas_mps",
            "an onset within the analysed range (<= " + highestAnalysedEasMps + " m/s)",
            String.valueOf(v));
      }
    }
  }

  /**
   * @param onsetEasMps lowest open-loop onset, m/s EAS, or empty
   * @param highestAnalysedEasMps top of the range, m/s EAS
   * @return a search labelled {@code "open_loop"}
   */
  public static OnsetSearch openLoop(OptionalDouble onsetEasMps, double highestAnalysedEasMps) {
    return new OnsetSearch(OPEN_LOOP, onsetEasMps, highestAnalysedEasMps);
  }

  /**
   * @param onsetEasMps lowest closed-loop onset, m/s EAS, or empty
   * @param highestAnalysedEasMps top of the range, m/s EAS
   * @return a search labelled {@code "closed_loop"}
   */
  public static OnsetSearch closedLoop(OptionalDouble onsetEasMps, double highestAnalysedEasMps) {
    return new OnsetSearch(CLOSED_LOOP, onsetEasMps, highestAnalysedEasMps);
  }
}
