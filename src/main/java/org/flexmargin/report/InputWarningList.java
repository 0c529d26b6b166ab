package org.flexmargin.report;

import java.util.List;
import org.flexmargin.model.InputWarning;

/**
 * The input warnings of a case (values read although outside their usual range, or beyond their
 * plausible range under an override) as a visible list on the report's first screen.
 */
final class InputWarningList {
  /** Element id of the list. */
  static final String ID = "input-warnings";

  private InputWarningList() {}

  /**
   * Writes nothing when there are no warnings.
   *
   * @param w the page
   * @param warnings the case's input warnings
   */
  static void write(XhtmlWriter w, List<InputWarning> warnings) {
    if (warnings.isEmpty()) {
      return;
    }
    w.open("div", "id", ID, "class", "verdict fail");
    w.element("p", "Input warnings (" + warnings.size() + "): values read although unusual. Check each value and "
        + "its unit before relying on the results.");
    w.open("ul");
    for (InputWarning iw : warnings) {
      w.element("li", iw.message(), "class", "warn");
    }
    w.close("ul");
    w.close("div");
  }
}
