package org.flexmargin.clearance;

import org.flexmargin.model.InvalidInputException;

/**
 * Identifies a check across speeds so that its excess can be followed along a sweep: the kind
 * and a subject, which is the frequency band key for margin checks ({@code "rigid_body"}), the
 * mode name for structural checks, {@code "open_loop"} / {@code "closed_loop"} (or the caller's
 * label) for flutter speed checks and the empty text for the others.
 *
 * @param kind what is checked
 * @param subject band key, mode name or label (never null)
 */
public record CheckKey(CheckKind kind, String subject) {
  /** Validates. */
  public CheckKey {
    if (kind == null) {
      throw new InvalidInputException("kind", "a check kind", "nothing");
    }
    if (subject == null) {
      throw new InvalidInputException("subject", "a subject (possibly empty)", "nothing");
    }
  }
}
