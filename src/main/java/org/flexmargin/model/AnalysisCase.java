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
 * @param configurations at least one configuration, names unique. With a sweep at one Mach number
 *     ({@link MachSweep}) every configuration's forces are taken at that Mach number ({@link
 *     Configuration#atMach}): lifting surfaces and tables at several Mach numbers are interpolated
 *     to it, so every consumer of the case (sweep, loop, notch design, report) uses the same forces
 * @param sweep flight points to analyse
 * @param options numerical options
 * @param inputs provenance of every file read (case file first)
 * @param loop the flight-control loop; {@code null} for an open-loop analysis. When present, every
 *     configuration needs rigid-body data and every sensor station must exist in its mode table.
 * @param requirements clearance requirements table; {@code null} when none is given (results are
 *     then reported without pass/fail)
 * @param warnings values read although unusual (outside their usual range, or beyond their
 *     plausible range under a {@code plausibility_overrides} entry), in reading order; to be shown
 *     with the results
 */
public record AnalysisCase(
    int format,
    String name,
    String description,
    List<Configuration> configurations,
    SweepPlan sweep,
    AnalysisOptions options,
    List<InputFile> inputs,
    LoopSpec loop,
    ClearanceRequirements requirements,
    List<InputWarning> warnings) {
  /** Validates and copies. */
  public AnalysisCase {
    Checks.atLeast("format", format, 1);
    Checks.name("name", name);
    description = description == null ? "" : description;
    configurations = Checks.nonEmpty("configurations", configurations);
    if (sweep instanceof MachSweep m) {
      configurations = configurations.stream().map(c -> c.atMach(m.machNumber())).toList();
    }
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
    warnings = warnings == null ? List.of() : List.copyOf(warnings);
    if (loop != null) {
      for (int i = 0; i < configurations.size(); i++) {
        Configuration c = configurations.get(i);
        if (c.rigidBody() == null) {
          throw new InvalidInputException("configurations[" + i + "].rigid_body",
              "rigid-body data (the case has a loop)", "none");
        }
        if (c.structure() instanceof ModeTable mt) {
          for (SensorSpec s : loop.sensors()) {
            if (!mt.modes().get(0).shapes().containsKey(s.station())) {
              throw new InvalidInputException("loop.sensors." + s.name() + ".station",
                  "a station of mode table \"" + mt.name() + "\"", "\"" + s.station() + "\"");
            }
          }
        }
      }
    }
  }

  /** Case without input warnings. */
  public AnalysisCase(int format, String name, String description, List<Configuration> configurations,
      SweepPlan sweep, AnalysisOptions options, List<InputFile> inputs, LoopSpec loop,
      ClearanceRequirements requirements) {
    this(format, name, description, configurations, sweep, options, inputs, loop, requirements, null);
  }

  /** Open-loop case without a flight-control loop. */
  public AnalysisCase(int format, String name, String description, List<Configuration> configurations,
      SweepPlan sweep, AnalysisOptions options, List<InputFile> inputs) {
    this(format, name, description, configurations, sweep, options, inputs, null, null, null);
  }

  /** Case with a loop but no requirements table. */
  public AnalysisCase(int format, String name, String description, List<Configuration> configurations,
      SweepPlan sweep, AnalysisOptions options, List<InputFile> inputs, LoopSpec loop) {
    this(format, name, description, configurations, sweep, options, inputs, loop, null, null);
  }
}
