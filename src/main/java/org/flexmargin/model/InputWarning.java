package org.flexmargin.model;

/**
 * A value that was read but deserves a second look (outside its usual range, or beyond its
 * plausible range under a {@code plausibility_overrides} entry), located like an input error.
 *
 * @param file the file as the user named it
 * @param line 1-based line, 0 if unknown
 * @param fieldPath dotted path inside the file, e.g. {@code configurations[0].aero.strip_theory.strips[2].width_m}
 * @param text what is unusual, with the value, the range and its unit
 */
public record InputWarning(String file, int line, String fieldPath, String text) {
  /** Validates. */
  public InputWarning {
    Checks.name("file", file);
    Checks.atLeast("line", line, 0);
    fieldPath = fieldPath == null ? "" : fieldPath;
    Checks.name("text", text);
  }

  /** @return {@code file:line: path: text}, the form of input error messages */
  public String message() {
    return file + (line > 0 ? ":" + line : "") + ": " + (fieldPath.isEmpty() ? "" : fieldPath + ": ") + text;
  }
}
