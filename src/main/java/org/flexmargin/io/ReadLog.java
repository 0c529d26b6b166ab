package org.flexmargin.io;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.flexmargin.model.InputWarning;
import org.flexmargin.model.PlausibleRange;

/**
 * What reading one case collects besides the records: the warnings about unusual values, and the
 * plausible ranges the case file lifts ({@code plausibility_overrides}). One per read; not shared
 * between threads.
 */
final class ReadLog {
  private final List<InputWarning> warnings = new ArrayList<>();
  private final Set<PlausibleRange> overrides = EnumSet.noneOf(PlausibleRange.class);
  private final List<Map.Entry<Schemas.Kind, JsonInput>> pending = new ArrayList<>();

  /** Notes a parsed file for validation against its schema once the reader is done with it. */
  void validateLater(Schemas.Kind kind, JsonInput doc) {
    pending.add(Map.entry(kind, doc));
  }

  /**
   * Validates every noted file against its schema, in reading order.
   *
   * @throws InputFileException at the first violation
   */
  void validatePending() {
    for (Map.Entry<Schemas.Kind, JsonInput> e : pending) {
      Schemas.check(e.getKey(), e.getValue());
    }
    pending.clear();
  }

  void warn(String file, int line, String fieldPath, String text) {
    warnings.add(new InputWarning(file, line, fieldPath, text));
  }

  void override(PlausibleRange r) {
    overrides.add(r);
  }

  boolean overridden(PlausibleRange r) {
    return overrides.contains(r);
  }

  /** @return the warnings so far, in reading order */
  List<InputWarning> warnings() {
    return List.copyOf(warnings);
  }

  /**
   * Checks a value against its plausible and usual ranges: refuses it, warns, or accepts it.
   *
   * @param r the quantity's ranges
   * @param valueSi the value in the range's unit
   * @param shown the value as the user wrote it (with its unit if not SI)
   * @param file file for messages
   * @param line line for messages
   * @param path field path for messages
   * @return {@code valueSi}
   * @throws InputFileException if the value is implausible and not overridden
   */
  double check(PlausibleRange r, double valueSi, String shown, String file, int line, String path) {
    if (!Double.isFinite(valueSi) || valueSi < r.plausibleMin() && valueSi <= 0 && r.plausibleMin() >= 0) {
      return valueSi; // not finite, or zero or negative where only positive values make sense: the
      // model records say so in their words, and no override lifts it
    }
    switch (r.fit(valueSi)) {
      case IMPLAUSIBLE:
        if (r.overridable() && overridden(r)) {
          warn(file, line, path, shown + " is outside the plausible range " + r.plausibleText() + " of "
              + r.id() + "; accepted because plausibility_overrides lists it");
          return valueSi;
        }
        throw new InputFileException(file, line, path, "a value in the plausible range " + r.plausibleText()
            + " (" + r.note() + ")" + (r.overridable() ? "; if the value is intended, list \"" + r.id()
            + "\" in the case file's plausibility_overrides" : ""), shown);
      case UNUSUAL:
        warn(file, line, path, shown + " is outside the usual range " + r.usualText() + " of " + r.id()
            + " (" + r.note() + "); check the value and its unit");
        return valueSi;
      default:
        return valueSi;
    }
  }
}
