package org.flexmargin.model;

/**
 * A precondition on user input failed. The message names the field path, what was expected and
 * what was found, e.g. {@code configurations[0].modes[2].frequency_hz: expected a finite value
 * > 0, found -3.0}. File and line are added by the reader where known.
 */
public class InvalidInputException extends IllegalArgumentException {
  private static final long serialVersionUID = 1L;
  private final String fieldPath;

  /**
   * @param fieldPath dotted path of the offending field, e.g. {@code modes[2].frequency_hz}
   * @param expected what was expected, in words
   * @param found what was found, in words
   */
  public InvalidInputException(String fieldPath, String expected, String found) {
    super(fieldPath + ": expected " + expected + ", found " + found);
    this.fieldPath = fieldPath;
  }

  /** @return the dotted field path that failed validation */
  public String fieldPath() {
    return fieldPath;
  }
}
