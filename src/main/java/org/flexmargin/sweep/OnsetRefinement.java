package org.flexmargin.sweep;

import java.util.Optional;
import org.flexmargin.flutter.FlutterCrossing;

/**
 * A closed-loop stability onset (g = 0 crossing of a closed-loop root) found on the rational
 * state-space model and refined on the exact frequency-domain loop: where the exact broken loop
 * L(j w) passes through -1 (Newton on speed and frequency). The difference between the two says
 * how far the rational model (Roger aerodynamics, Padé delays, rational hold) is from the exact
 * loop at this onset.
 *
 * @param rational the onset of the closed-loop eigenvalues (rational model)
 * @param exact the onset on the exact loop; empty when the exact loop could not be brought to -1
 *     near the rational onset (then {@link #remark()} says why and the rational onset stands)
 * @param residual |1 + L(j w)| at the exact onset (or at the last iterate)
 * @param iterations Newton iterations
 * @param remark why the refinement failed; empty when it succeeded
 */
public record OnsetRefinement(FlutterCrossing rational, Optional<FlutterCrossing> exact,
    double residual, int iterations, String remark) {

  /** Validates. */
  public OnsetRefinement {
    if (rational == null || exact == null || remark == null) {
      throw new IllegalArgumentException("onset refinement: rational onset, exact option and remark required");
    }
  }

  /** @return true when the exact loop confirmed the onset */
  public boolean confirmed() {
    return exact.isPresent();
  }

  /** @return the onset to use: the exact one when confirmed, else the rational one */
  public FlutterCrossing onset() {
    return exact.orElse(rational);
  }

  /** @return exact minus rational onset speed, m/s EAS (NaN when not confirmed) */
  public double speedDifferenceEasMps() {
    return exact.map(e -> e.condition().speedEasMps() - rational.condition().speedEasMps()).orElse(Double.NaN);
  }

  /** @return exact minus rational onset frequency, Hz (NaN when not confirmed) */
  public double frequencyDifferenceHz() {
    return exact.map(e -> e.frequencyHz() - rational.frequencyHz()).orElse(Double.NaN);
  }
}
