package org.flexmargin.model;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A bending-mode table: the elastic modes of one configuration with their shapes at named
 * stations. The rigid body is restrained for the open-loop aeroelastic analysis.
 *
 * @param name table name (file stem or user label)
 * @param modes the elastic modes, at least one, names unique
 */
public record ModeTable(String name, List<ElasticMode> modes) implements StructureSpec {
  /** Validates and copies. */
  public ModeTable {
    Checks.name("name", name);
    modes = Checks.nonEmpty("modes", modes);
    Set<String> seen = new HashSet<>();
    for (int i = 0; i < modes.size(); i++) {
      if (!seen.add(modes.get(i).name())) {
        throw new InvalidInputException(
            "modes[" + i + "].name", "a unique mode name", "duplicate \"" + modes.get(i).name() + "\"");
      }
    }
  }

  /** @return number of modes */
  public int size() {
    return modes.size();
  }

  /** @return the mode names in order */
  public List<String> modeNames() {
    return modes.stream().map(ElasticMode::name).toList();
  }
}
