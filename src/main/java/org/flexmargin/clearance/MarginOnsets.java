package org.flexmargin.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.flexmargin.model.InvalidInputException;

/**
 * Helpers for locating margin onsets, the airspeeds at which a requirement is first violated:
 * brackets from a sweep of point assessments, and the scalar excess whose zero a root-finder
 * refines. The refinement itself belongs to the sweep.
 */
public final class MarginOnsets {
  private MarginOnsets() {}

  /**
   * A speed interval over which one requirement goes from met to violated.
   *
   * @param key the requirement
   * @param passingSpeedEasMps speed where it is met (excess &gt;= 0), m/s EAS
   * @param failingSpeedEasMps next speed where it is violated (excess &lt; 0), m/s EAS
   * @param passingExcess excess at the passing speed, in the check's unit
   * @param failingExcess excess at the failing speed
   */
  public record Bracket(CheckKey key, double passingSpeedEasMps, double failingSpeedEasMps,
      double passingExcess, double failingExcess) {}

  /**
   * Finds, for every key, each pair of consecutive points (in the given order, normally rising
   * airspeed) where the key is present at both and its worst excess changes from &gt;= 0 to
   * &lt; 0.
   *
   * @param sweep assessments in sweep order
   * @return the brackets, in sweep order
   */
  public static List<Bracket> brackets(List<PointAssessment> sweep) {
    if (sweep == null) {
      throw new InvalidInputException("sweep", "a list of point assessments", "nothing");
    }
    List<Bracket> out = new ArrayList<>();
    for (int i = 0; i + 1 < sweep.size(); i++) {
      PointAssessment a = sweep.get(i);
      PointAssessment b = sweep.get(i + 1);
      for (CheckKey k : a.keys()) {
        OptionalDouble ea = a.worstExcess(k);
        OptionalDouble eb = b.worstExcess(k);
        if (ea.isPresent() && eb.isPresent() && ea.getAsDouble() >= 0 && eb.getAsDouble() < 0) {
          out.add(new Bracket(k, a.speedEasMps(), b.speedEasMps(), ea.getAsDouble(),
              eb.getAsDouble()));
        }
      }
    }
    return out;
  }

  /**
   * The excess of one requirement as a function of airspeed, for a root-finder.
   *
   * @param assessAt assesses the loop at an airspeed (m/s EAS)
   * @param key the requirement
   * @return V -&gt; worst excess of {@code key} at V, in the check's unit; NaN where no check has
   *     that key (the crossing disappeared), which the caller must treat as leaving the bracket
   */
  public static DoubleUnaryOperator excessAlongSpeed(DoubleFunction<PointAssessment> assessAt,
      CheckKey key) {
    if (assessAt == null || key == null) {
      throw new InvalidInputException("excess", "an assessment function and a key", "nothing");
    }
    return v -> assessAt.apply(v).worstExcess(key).orElse(Double.NaN);
  }
}
