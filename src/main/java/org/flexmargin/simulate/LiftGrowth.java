package org.flexmargin.simulate;

import java.util.Locale;
import org.flexmargin.model.InvalidInputException;

/**
 * How the rigid-body angle-of-attack lift builds up in the time domain.
 */
public enum LiftGrowth {
  /** Forces follow the angle of attack and the gust angle w/V at once (no lift growth). */
  QUASI_STEADY("quasi_steady"),
  /**
   * The gust angle passes through Küssner's function and the angle of attack through Wagner's
   * ({@link IndicialLift}), in the reduced time of half the reference chord.
   */
  UNSTEADY("unsteady");

  private final String word;

  LiftGrowth(String word) {
    this.word = word;
  }

  /** @return the word of case files and the command line */
  public String word() {
    return word;
  }

  /**
   * @param field where the word was given (for the error)
   * @param word {@code quasi_steady} or {@code unsteady}, any case, '-' for '_'
   * @return the lift growth
   * @throws InvalidInputException for any other word
   */
  public static LiftGrowth of(String field, String word) {
    String w = word == null ? "" : word.strip().toLowerCase(Locale.ROOT).replace('-', '_');
    for (LiftGrowth g : values()) {
      if (g.word.equals(w)) {
        return g;
      }
    }
    throw new InvalidInputException(field, "quasi_steady or unsteady", String.valueOf(word));
  }
}
