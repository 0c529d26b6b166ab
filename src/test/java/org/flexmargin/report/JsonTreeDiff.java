package org.flexmargin.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Differences between two JSON trees of results: numbers to a relative tolerance with an absolute
 * floor in the field's own unit, everything else exactly. Keys that hold run times, dates, the
 * version and (when a tolerance is given) solver residuals are skipped: they legitimately differ
 * between two runs of the same computation.
 */
final class JsonTreeDiff {
  private static final Set<String> RUN_KEYS = Set.of("generated_utc", "elapsed_s", "tool_version");
  private static final int LIMIT = 40;

  private final double relative;
  private final double absolute;
  private final List<String> found = new ArrayList<>();

  private JsonTreeDiff(double relative, double absolute) {
    this.relative = relative;
    this.absolute = absolute;
  }

  /**
   * @param a first tree
   * @param b second tree
   * @param relative relative tolerance on numbers (0: exact)
   * @param absolute absolute floor on numbers, in each field's own unit (0: none)
   * @return the differences as "path: a vs b", at most 41 of them
   */
  static List<String> between(JsonNode a, JsonNode b, double relative, double absolute) {
    JsonTreeDiff d = new JsonTreeDiff(relative, absolute);
    d.compare(a, b, "");
    return d.found;
  }

  private void compare(JsonNode a, JsonNode b, String at) {
    if (found.size() > LIMIT) {
      return;
    }
    if (a.isObject()) {
      Iterator<Map.Entry<String, JsonNode>> it = a.fields();
      while (it.hasNext()) {
        Map.Entry<String, JsonNode> e = it.next();
        String key = e.getKey();
        if (!RUN_KEYS.contains(key) && !(relative > 0 && key.contains("residual"))) {
          compare(e.getValue(), b.path(key), at + "/" + key);
        }
      }
      if (a.size() != b.size()) {
        found.add(at + ": " + a.size() + " vs " + b.size() + " keys");
      }
    } else if (a.isArray()) {
      if (a.size() != b.size()) {
        found.add(at + ": " + a.size() + " vs " + b.size() + " elements");
        return;
      }
      for (int i = 0; i < a.size(); i++) {
        compare(a.get(i), b.get(i), at + "[" + i + "]");
      }
    } else if (a.isNumber() && b.isNumber()) {
      double x = a.asDouble();
      double y = b.asDouble();
      if (Math.abs(x - y) > Math.max(absolute, relative * Math.max(Math.abs(x), Math.abs(y)))) {
        found.add(at + ": " + x + " vs " + y);
      }
    } else if (!a.equals(b)) {
      found.add(at + ": " + a + " vs " + b);
    }
  }
}
