package org.flexmargin.io;

/**
 * An input file could not be read or does not satisfy the format: names the file, the line where
 * known, the field path inside the file, what was expected and what was found, e.g.
 * {@code mode-tables/demo/full-payload.json:42: modes[2].frequency_hz: expected a finite value > 0,
 * found -3.0}.
 *
 * <p>Validation failures of the model records ({@link org.flexmargin.model.InvalidInputException})
 * are wrapped into this exception with the file and line of the offending value added; the
 * original is kept as the cause.
 */
public class InputFileException extends RuntimeException {
  private static final long serialVersionUID = 1L;
  private final String file;
  private final int line;
  private final String fieldPath;
  private final String expected;
  private final String found;

  /**
   * @param file the file as the user named it (relative to the case file's folder where relative)
   * @param line 1-based line number, or 0 if unknown
   * @param fieldPath dotted path inside the file, e.g. {@code modes[2].frequency_hz}; empty for the
   *     file as a whole
   * @param expected what was expected, in words
   * @param found what was found, in words
   */
  public InputFileException(String file, int line, String fieldPath, String expected, String found) {
    this(file, line, fieldPath, expected, found, null);
  }

  /**
   * @param file the file as the user named it
   * @param line 1-based line number, or 0 if unknown
   * @param fieldPath dotted path inside the file; empty for the file as a whole
   * @param expected what was expected, in words
   * @param found what was found, in words
   * @param cause the underlying exception, or {@code null}
   */
  public InputFileException(
      String file, int line, String fieldPath, String expected, String found, Throwable cause) {
    super(format(file, line, fieldPath, expected, found), cause);
    this.file = file;
    this.line = Math.max(0, line);
    this.fieldPath = fieldPath == null ? "" : fieldPath;
    this.expected = expected;
    this.found = found;
  }

  private static String format(String file, int line, String path, String expected, String found) {
    StringBuilder sb = new StringBuilder(file);
    if (line > 0) {
      sb.append(':').append(line);
    }
    sb.append(": ");
    if (path != null && !path.isEmpty()) {
      sb.append(path).append(": ");
    }
    return sb.append("expected ").append(expected).append(", found ").append(found).toString();
  }

  /** @return the file as the user named it */
  public String file() {
    return file;
  }

  /** @return 1-based line number, 0 if unknown */
  public int line() {
    return line;
  }

  /** @return dotted field path inside the file; empty for the file as a whole */
  public String fieldPath() {
    return fieldPath;
  }

  /** @return what was expected, in words */
  public String expected() {
    return expected;
  }

  /** @return what was found, in words */
  public String found() {
    return found;
  }
}
