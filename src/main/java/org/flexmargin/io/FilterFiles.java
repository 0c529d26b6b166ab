package org.flexmargin.io;

import java.util.List;
import java.util.function.Function;

/**
 * The {@code filters} of a feedback path, given in place (a list) or as a file reference (a text
 * value: a JSON file, path relative to the case file). The file is either
 *
 * <ul>
 *   <li>a filters file: {@code {"format": 1, "description": "...", "filters": [ ... ]}}; or
 *   <li>the filter fragment that {@code notch-design} writes ({@code notch-filters.json}:
 *       {@code "paths": [{"path_index": 0, "sensor": "...", "filters": [...]}, ...]}), from which the
 *       entry with this path's index is taken (its sensor must be this path's sensor).
 * </ul>
 */
final class FilterFiles {
  private FilterFiles() {}

  private static final List<String> FILE_KEYS =
      List.of("format", "description", "case", "feasible", "filters", "paths");
  private static final List<String> ENTRY_KEYS = List.of("path_index", "sensor", "filters");

  /**
   * @param filters the path's {@code filters} value
   * @param pathIndex index of the path in the loop's {@code paths}
   * @param sensor the path's sensor
   * @param reader reads and parses the file a text value names, returning its top level
   * @return the filter entries, each still to be read as a filter
   */
  static List<JsonField> filterList(JsonField filters, int pathIndex, String sensor,
      Function<JsonField, JsonField> reader) {
    if (!filters.node().isTextual()) {
      return filters.list("a list of filters, or the name of a filters file");
    }
    JsonField root = reader.apply(filters).object("a filters file");
    root.allowOnly(FILE_KEYS);
    JsonField format = root.required("format", "\"format\": " + CaseReader.FORMAT);
    if (format.integer() != CaseReader.FORMAT) {
      throw format.fail("format " + CaseReader.FORMAT + " (the version this program reads)", format.describe());
    }
    String kind = root.exactlyOne("the filters", "filters", "paths");
    if (kind.equals("filters")) {
      return root.optional("filters").list("a list of filters");
    }
    JsonField paths = root.optional("paths");
    for (JsonField e : paths.list("a list of paths with their filters")) {
      e.object("a path entry with path_index, sensor and filters");
      e.allowOnly(ENTRY_KEYS);
      JsonField index = e.required("path_index", "the index of the path in the case's loop.paths");
      if (index.integer() != pathIndex) {
        continue;
      }
      JsonField s = e.required("sensor", "the sensor of the path");
      if (!s.text().equals(sensor)) {
        throw s.fail("\"" + sensor + "\", the sensor of loop.paths[" + pathIndex + "] that names this file",
            s.describe());
      }
      return e.required("filters", "the path's filters").list("a list of filters");
    }
    throw paths.fail("an entry with path_index " + pathIndex + " (the path that names this file)", "none");
  }
}
