package org.flexmargin.clearance;

import java.util.Comparator;
import java.util.Locale;
import org.flexmargin.model.InvalidInputException;

/**
 * One requirement of a clearance with its severity and the airspeed that ranks it: for a failed
 * requirement the lowest airspeed at which it fails (the refined onset where one exists, else the
 * first failing grid point or the onset speed of a flutter check); for a met requirement the
 * airspeed at which it comes closest to its limit.
 *
 * <p>{@link #ORDER} sorts failed requirements first, by {@link Severity} and then by airspeed
 * (lowest first), then met requirements by normalised excess (closest to the limit first). The
 * first entry of a sorted list is the governing finding ({@link Severity#RULE}).
 *
 * @param check the check (at the first failing point, or where it is tightest)
 * @param severity how serious a failure of this check is
 * @param speedEasMps ranking airspeed, m/s EAS (finite, &gt;= 0)
 */
public record RankedFinding(ClearanceCheck check, Severity severity, double speedEasMps) {

  /**
   * Failed first, by severity, then lowest speed; then met, closest to the limit first. Speeds and
   * normalised excesses are compared after rounding ({@link ClearanceCheck#rankingKey(double)}), so
   * that two findings equal but for round-off (two modes whose checks fail by the same amount, say)
   * are ordered by subject and kind instead of by their last digits: the governing finding does not
   * change with the order of floating-point operations or the number of threads.
   */
  public static final Comparator<RankedFinding> ORDER = Comparator
      .comparing((RankedFinding r) -> r.check().passed())
      .thenComparingInt(r -> r.check().passed() ? 0 : r.severity().rank())
      .thenComparingDouble(r -> ClearanceCheck.rankingKey(r.check().passed() ? r.check().normalisedExcess()
          : r.speedEasMps()))
      .thenComparingDouble(r -> ClearanceCheck.rankingKey(r.check().normalisedExcess()))
      .thenComparing(r -> r.check().subject())
      .thenComparing(r -> r.check().kind());

  /** Validates. */
  public RankedFinding {
    if (check == null || severity == null) {
      throw new InvalidInputException("ranked_finding", "a check and a severity", "nothing");
    }
    if (!(speedEasMps >= 0) || !Double.isFinite(speedEasMps)) {
      throw new InvalidInputException("ranked_finding.speed_eas_mps", "a finite value >= 0",
          String.valueOf(speedEasMps));
    }
  }

  /**
   * @return one sentence, e.g. "FAILED, severity 1 of 5 (closed-loop instability inside the
   *     envelope) from 61.89 m/s EAS: nominal closed-loop stability, normal envelope (required
   *     stable, found unstable)"
   */
  public String describe() {
    String values = check.unit() == CheckUnit.STABILITY
        ? "required stable, found " + (check.passed() ? "stable" : "unstable")
        : String.format(Locale.ROOT, "required %s %s, achieved %s",
            check.sense() == RequiredSense.AT_LEAST ? "at least" : "at most", value(check.requiredValue()),
            value(check.achievedValue()));
    if (check.passed()) {
      return String.format(Locale.ROOT, "met; closest to its limit at %.2f m/s EAS: %s (%s)", speedEasMps,
          check.description(), values);
    }
    return String.format(Locale.ROOT, "severity %d of %d (%s) from %.2f m/s EAS: %s (%s)", severity.rank(),
        Severity.values().length, severity.words(), speedEasMps, check.description(), values);
  }

  /** Value and unit symbol; only units with a symbol reach here (stability is written in words). */
  private String value(double v) {
    return String.format(Locale.ROOT, "%.4g %s", v, check.unit().symbol());
  }

  /**
   * Ranks a check by its kind and, for instabilities, by whether its speed is inside the envelope.
   *
   * @param check the check
   * @param speedEasMps ranking airspeed, m/s EAS
   * @param limitSpeedEasMps V_L, m/s EAS: a closed-loop instability at or below it is inside the
   *     envelope
   * @return the ranked check
   */
  public static RankedFinding of(ClearanceCheck check, double speedEasMps, double limitSpeedEasMps) {
    return new RankedFinding(check, severityOf(check, speedEasMps, limitSpeedEasMps), speedEasMps);
  }

  /**
   * @param check the check
   * @param speedEasMps ranking airspeed, m/s EAS
   * @param limitSpeedEasMps V_L, m/s EAS
   * @return the severity a failure of the check has at that speed
   */
  public static Severity severityOf(ClearanceCheck check, double speedEasMps, double limitSpeedEasMps) {
    boolean insideEnvelope = speedEasMps <= limitSpeedEasMps;
    return switch (check.kind()) {
      case CLOSED_LOOP_STABILITY -> insideEnvelope ? Severity.CLOSED_LOOP_INSTABILITY
          : Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED;
      case FLUTTER_SPEED -> insideEnvelope && OnsetSearch.CLOSED_LOOP.equals(check.subject())
          ? Severity.CLOSED_LOOP_INSTABILITY : Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED;
      case DIVERGENCE_SPEED -> Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED;
      case STRUCTURAL_MODE -> Severity.STRUCTURAL_COUPLING;
      case GAIN_INCREASE_MARGIN, GAIN_REDUCTION_MARGIN, PHASE_MARGIN -> Severity.LOOP_MARGIN;
      case MINIMUM_DAMPING -> Severity.DAMPING_LIMIT;
    };
  }
}
