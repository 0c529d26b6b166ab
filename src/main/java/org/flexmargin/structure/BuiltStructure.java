package org.flexmargin.structure;

import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.StripTheorySpec;

/**
 * A built-in validation structure turned into what the rest of the tool consumes: its normal
 * modes with shapes at named stations, and the strip-theory aerodynamics whose strips reference
 * those stations.
 *
 * @param modes mass-orthogonal normal modes, shapes at every strip station
 * @param aero strip-theory specification; every strip's station is a station of every mode
 */
public record BuiltStructure(ModeTable modes, StripTheorySpec aero) {
  /** Validates that both are present and that every strip station has a shape in every mode. */
  public BuiltStructure {
    if (modes == null) {
      throw new InvalidInputException("modes", "a mode table", "nothing");
    }
    if (aero == null) {
      throw new InvalidInputException("aero", "a strip-theory specification", "nothing");
    }
    for (int s = 0; s < aero.strips().size(); s++) {
      String station = aero.strips().get(s).station();
      for (int m = 0; m < modes.size(); m++) {
        if (!modes.modes().get(m).shapes().containsKey(station)) {
          throw new InvalidInputException(
              "aero.strips[" + s + "].station",
              "a station of mode \"" + modes.modes().get(m).name() + "\"",
              "\"" + station + "\"");
        }
      }
    }
  }
}
