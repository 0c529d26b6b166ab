package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.junit.jupiter.api.Test;

/** Tests of {@link AeroSources#of}. */
class AeroSourcesTest {
  private final ModeTable modes = StripTheoryAeroTest.bendingTorsion(); // modes "bend", "torsion"

  @Test
  void buildsStripTheoryFromStrips() {
    StripTheorySpec spec =
        new StripTheorySpec(0.5, List.of(new Strip("inner", 1.0, 0.5, -0.2, 6.0)));
    assertInstanceOf(StripTheoryAero.class, AeroSources.of(spec, modes));
  }

  @Test
  void buildsTableWhenNamesMatchInOrder() {
    GafTable table = TabulatedAeroTest.table(new double[] {0.0, 1.0, 2.0}, k -> k);
    AeroSource source = AeroSources.of(table, modes);
    assertInstanceOf(TabulatedAero.class, source);
    assertEquals(2, source.size());
  }

  @Test
  void rejectsTableWhoseNamesDifferFromTheModes() {
    double[] ks = {0.0, 1.0};
    double[][][] zeros = new double[2][2][2];
    GafTable swapped = new GafTable(0.5, 0.0, List.of("torsion", "bend"), ks, zeros, zeros);
    InvalidInputException e =
        assertThrows(InvalidInputException.class, () -> AeroSources.of(swapped, modes));
    assertEquals("aero.modes", e.fieldPath());
  }

  @Test
  void rejectsMissingArguments() {
    assertThrows(InvalidInputException.class, () -> AeroSources.of(null, modes));
    StripTheorySpec spec =
        new StripTheorySpec(0.5, List.of(new Strip("inner", 1.0, 0.5, -0.2, 6.0)));
    assertThrows(InvalidInputException.class, () -> AeroSources.of(spec, null));
  }
}
