package org.flexmargin.notch;

/**
 * What happens to the notches already in a path that is to carry the designed notches. Low-pass
 * filters are always kept.
 *
 * <p>Example: the demo's pitch-rate path has a notch at 8.6 Hz and a 25 Hz low-pass; with {@code
 * REPLACE} the design starts from the path with only the low-pass, with {@code KEEP} the 8.6 Hz
 * notch stays and the new notches are added to it.
 */
public enum ExistingNotches {
  /** Remove the path's notches; the designed set replaces them. */
  REPLACE,
  /** Keep the path's notches; the designed notches are added. */
  KEEP
}
