package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.MachGafTable;
import org.junit.jupiter.api.Test;

/** Force-table files with several Mach numbers ({@code mach_numbers}), alone and in a case. */
class MachForceTableReadTest {
  private static final Path DIR = Path.of("src/test/resources/io");

  private static void assertHas(String message, String... parts) {
    for (String p : parts) {
      assertTrue(message.contains(p), () -> "message <" + message + "> lacks <" + p + ">");
    }
  }

  @Test
  void readsTablesAtTwoMachNumbersAndInterpolatesThemLikePrandtlGlauert() {
    MachGafTable t = assertInstanceOf(MachGafTable.class,
        CaseReader.readForceTable(DIR.resolve("good-forces-mach.json")));
    assertArrayEquals(new double[] {0.3, 0.7}, t.forces().machNumbers(), 0.0);
    assertEquals(0.3, t.machNumber(), 0.0);
    assertEquals(List.of("bending", "torsion"), t.modeNames());
    assertEquals(2.6716, t.forces().realAt(1, 2, 1, 1), 0.0);
    // the 0.7 table is the 0.3 table times beta(0.3) / beta(0.7), rounded to 5 digits in the file:
    // at Mach 0.5 the interpolation gives the 0.3 entries times beta(0.3) / beta(0.5) =
    // sqrt(0.91 / 0.75) = 1.101514 (derived); tolerance 2e-5, the file's rounding (a relative
    // 3.7e-5 on the 0.7 entries, half of it weighted at Mach 0.5, times beta(0.7) / beta(0.5))
    GafTable at05 = t.forces().atMach(0.5);
    double factor = Math.sqrt(0.91 / 0.75);
    assertEquals(1.101514, factor, 1e-6);
    assertEquals(factor, at05.realAt(0, 0, 1), 2e-5);
    assertEquals(2 * factor, at05.realAt(2, 1, 1), 4e-5);
    assertEquals(0.6 * factor, at05.imagAt(2, 0, 0), 1.2e-5);
    assertEquals(0.5, at05.machNumber(), 0.0);
  }

  @Test
  void aCaseSweptAtOneMachNumberTakesTheTablesThere() {
    // the case's sweep is at Mach 0.5: the configuration's forces are the tables at 0.5
    AnalysisCase c = CaseReader.read(DIR.resolve("good-mach-case.json"));
    MachGafTable t = assertInstanceOf(MachGafTable.class, c.configurations().get(0).aero());
    assertEquals(0.5, t.machNumber(), 0.0);
    assertEquals("good-forces-mach.json", c.inputs().get(2).path());
  }

  @Test
  void theSweepMachNumberMustLieWithinTheTables() {
    InputFileException e = assertThrows(InputFileException.class,
        () -> CaseReader.readForceTable(DIR.resolve("bad-forces-mach-outside.json")));
    assertHas(e.getMessage(), "bad-forces-mach-outside.json", "mach: expected a Mach number within the tabulated "
        + "mach_numbers 0.3 to 0.7", "found 0.8");
  }

  @Test
  void oneTablePerMachNumber() {
    InputFileException e = assertThrows(InputFileException.class,
        () -> CaseReader.readForceTable(DIR.resolve("bad-forces-mach-count.json")));
    assertEquals("real", e.fieldPath());
    assertHas(e.getMessage(), "expected 3 Mach numbers", "found 2");
  }
}
