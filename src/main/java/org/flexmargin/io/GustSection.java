package org.flexmargin.io;

import java.util.List;
import org.flexmargin.model.InputWarning;
import org.flexmargin.model.InvalidInputException;

/**
 * The optional {@code gusts} section of a case file: how the {@code simulate} command models gusts.
 * Each value may be overridden by the command's options. Immutable; validated on construction.
 *
 * @param wingToTailM distance from the wing's to the tailplane's aerodynamic centre (m), &gt;= 0, or
 *     NaN when the section gives no penetration
 * @param downwashGradient d epsilon / d alpha at the tailplane (-), in [0, 1), or NaN with no penetration
 * @param elevatorEffectiveness tau_e = d alpha_tail / d delta (-), in (0, 1.5], or NaN with no penetration
 * @param liftGrowth {@code "quasi_steady"} or {@code "unsteady"}, or null when not given
 * @param warnings unusual values read (outside their usual range)
 */
public record GustSection(double wingToTailM, double downwashGradient, double elevatorEffectiveness,
    String liftGrowth, List<InputWarning> warnings) {
  /** The words of {@link #liftGrowth()}. */
  public static final List<String> LIFT_GROWTH_WORDS = List.of("quasi_steady", "unsteady");

  /** A case without the section. */
  public static final GustSection NONE = new GustSection(Double.NaN, Double.NaN, Double.NaN, null, List.of());

  /** Validates and copies. */
  public GustSection {
    boolean given = !Double.isNaN(wingToTailM);
    if (given != !Double.isNaN(downwashGradient) || given != !Double.isNaN(elevatorEffectiveness)) {
      throw new InvalidInputException("", "wing_to_tail_m, downwash_gradient and elevator_effectiveness together "
          + "(gust penetration) or none of them", "only some of them");
    }
    if (given && !(wingToTailM >= 0 && Double.isFinite(wingToTailM))) {
      throw new InvalidInputException("wing_to_tail_m", "a finite distance >= 0 m", String.valueOf(wingToTailM));
    }
    if (given && !(downwashGradient >= 0 && downwashGradient < 1)) {
      throw new InvalidInputException("downwash_gradient", "a value in [0, 1)", String.valueOf(downwashGradient));
    }
    if (given && !(elevatorEffectiveness > 0 && elevatorEffectiveness <= 1.5)) {
      throw new InvalidInputException("elevator_effectiveness", "a value in (0, 1.5]",
          String.valueOf(elevatorEffectiveness));
    }
    if (liftGrowth != null && !LIFT_GROWTH_WORDS.contains(liftGrowth)) {
      throw new InvalidInputException("lift_growth", "\"quasi_steady\" or \"unsteady\"", liftGrowth);
    }
    warnings = List.copyOf(warnings);
  }

  /** @return whether the section gives gust penetration */
  public boolean hasPenetration() {
    return !Double.isNaN(wingToTailM);
  }
}
