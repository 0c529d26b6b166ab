package org.flexmargin.sweep;

import java.util.Locale;
import org.flexmargin.model.InvalidInputException;

/**
 * The lowest airspeed at which one configuration is unstable in one way, open or closed loop.
 *
 * @param kind what becomes unstable
 * @param mode branch (mode) name, closed-loop root label, or "-" for divergence
 * @param speedEasMps onset equivalent airspeed, m/s EAS (finite, &gt; 0); for an instability
 *     already present at the first sweep point, that point's speed (the onset is at or below it)
 * @param frequencyHz frequency at the onset, Hz; 0 for divergence
 * @param atSweepStart true when the instability is already present at the first sweep point
 */
public record Instability(Kind kind, String mode, double speedEasMps, double frequencyHz, boolean atSweepStart) {

  /** What becomes unstable. */
  public enum Kind {
    /** Open-loop (controls fixed) flutter. */
    OPEN_LOOP_FLUTTER,
    /** Closed-loop (flight control loop closed) instability of an oscillatory root. */
    CLOSED_LOOP_FLUTTER,
    /** Closed-loop instability of a non-oscillatory root (e.g. the rigid-body loop diverging). */
    CLOSED_LOOP_DIVERGENT_ROOT,
    /** Static divergence, rigid body restrained. */
    DIVERGENCE;

    /** @return plain words, e.g. "closed-loop flutter" */
    public String words() {
      return switch (this) {
        case OPEN_LOOP_FLUTTER -> "open-loop flutter";
        case CLOSED_LOOP_FLUTTER -> "closed-loop flutter";
        case CLOSED_LOOP_DIVERGENT_ROOT -> "closed-loop instability (real root)";
        case DIVERGENCE -> "divergence";
      };
    }

    /** @return the lower_snake_case name used in result files */
    public String key() {
      return name().toLowerCase(Locale.ROOT);
    }
  }

  /** Validates. */
  public Instability {
    if (kind == null || mode == null) {
      throw new InvalidInputException("instability", "a kind and a mode", "nothing");
    }
    if (!(speedEasMps > 0) || !Double.isFinite(speedEasMps)) {
      throw new InvalidInputException("instability.speed_eas_mps", "a finite value > 0",
          String.valueOf(speedEasMps));
    }
  }

  /** @return true for the closed-loop kinds */
  public boolean closedLoop() {
    return kind == Kind.CLOSED_LOOP_FLUTTER || kind == Kind.CLOSED_LOOP_DIVERGENT_ROOT;
  }

  /** @return e.g. "closed-loop flutter of fuselage_bending_2 from 61.89 m/s EAS at 18.48 Hz" */
  public String describe() {
    String from = atSweepStart ? "at or below " : kind == Kind.DIVERGENCE ? "at " : "from ";
    String what = kind == Kind.DIVERGENCE ? kind.words() : kind.words() + " of " + mode;
    String freq = kind == Kind.DIVERGENCE || frequencyHz == 0 ? ""
        : String.format(Locale.ROOT, " at %.3f Hz", frequencyHz);
    return String.format(Locale.ROOT, "%s %s%.2f m/s EAS%s", what, from, speedEasMps, freq);
  }
}
