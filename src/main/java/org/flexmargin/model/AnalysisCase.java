package org.flexmargin.model;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A complete, validated analysis case.
 *
 * @param format case-file format version
 * @param name case name; also the default report folder name
 * @param description free text
 * @param configurations at least one configuration, names unique
 * @param sweep flight points to analyse
 * @param options numerical options
 * @param inputs provenance of every file read (case file first)
 */
public record AnalysisCase(
    int format,
    String name,
    String description,
    List<Configuration> configurations,
    SweepPlan sweep,
    AnalysisOptions options,
    List<InputFile> inputs) {
  /** Validates and copies. */
  public AnalysisCase {
    Checks.atLeast("format", format, 1);
    Checks.name("name", name);
    description = description == null ? "" : description;
    configurations = Checks.nonEmpty("configurations", configurations);
    Set<String> seen = new HashSet<>();
    for (int i = 0; i < configurations.size(); i++) {
      if (!seen.add(configurations.get(i).name())) {
        throw new InvalidInputException(
            "configurations[" + i + "].name",
            "a unique configuration name",
            "duplicate \"" + configurations.get(i).name() + "\"");
      }
    }
    if (sweep == null) {
      throw new InvalidInputException("sweep", "a sweep section", "nothing");
    }
    if (options == null) {
      throw new InvalidInputException("options", "analysis options", "nothing");
    }
    inputs = inputs == null ? List.of() : List.copyOf(inputs);
  }
}
