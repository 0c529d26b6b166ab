package org.flexmargin.aero;

import java.util.List;
import org.flexmargin.model.AeroSpec;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.MachGafTable;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.StripTheorySpec;

/** Builds the {@link AeroSource} that an {@link AeroSpec} describes. */
public final class AeroSources {
  private AeroSources() {}

  /**
   * Returns the aerodynamic source for a configuration.
   *
   * <ul>
   *   <li>{@link StripTheorySpec} gives a {@link StripTheoryAero} whose coordinates are the modes
   *       of {@code modes}, in order.
   *   <li>{@link GafTable} gives a {@link TabulatedAero}; the table's row and column names must
   *       equal the mode table's names in the same order.
   *   <li>{@link MachGafTable} gives a {@link TabulatedAero} of the tables interpolated to their
   *       sweep Mach number; the same rule for the names.
   * </ul>
   *
   * @param spec the aerodynamic data of the configuration
   * @param modes the configuration's mode table
   * @return a new immutable source
   * @throws InvalidInputException {@code aero.modes} if a table's names do not match the modes;
   *     {@code aero.strips[i].station} if a strip's station is missing from a mode; {@code aero} or
   *     {@code modes} if an argument is missing
   */
  public static AeroSource of(AeroSpec spec, ModeTable modes) {
    if (spec == null) {
      throw new InvalidInputException("aero", "aerodynamic data (strips or a force table)", "none");
    }
    if (modes == null) {
      throw new InvalidInputException("modes", "a mode table", "none");
    }
    if (spec instanceof StripTheorySpec strips) {
      return new StripTheoryAero(strips, modes);
    }
    if (spec instanceof GafTable table) {
      checkNames(table.modeNames(), modes);
      return new TabulatedAero(table);
    }
    if (spec instanceof MachGafTable tables) {
      checkNames(tables.modeNames(), modes);
      return new TabulatedAero(tables);
    }
    throw new InvalidInputException(
        "aero", "strip theory or a force table", spec.getClass().getSimpleName());
  }

  private static void checkNames(List<String> names, ModeTable modes) {
    List<String> expected = modes.modeNames();
    if (!names.equals(expected)) {
      throw new InvalidInputException(
          "aero.modes", "the mode table's names in the same order " + expected, names.toString());
    }
  }
}
