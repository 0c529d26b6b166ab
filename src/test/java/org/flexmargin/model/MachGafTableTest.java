package org.flexmargin.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** User tables at several Mach numbers and the sweep Mach number of the forces of a case. */
class MachGafTableTest {
  /** Q = 4 / beta at k = 0 and 0.5 (one mode): Prandtl-Glauert data. */
  static MachForceTable tables(double... machs) {
    double[][][][] re = new double[machs.length][2][1][1];
    double[][][][] im = new double[machs.length][2][1][1];
    for (int m = 0; m < machs.length; m++) {
      double beta = Math.sqrt(1 - machs[m] * machs[m]);
      re[m][0][0][0] = 4 / beta;
      re[m][1][0][0] = 4 / beta;
      im[m][1][0][0] = -1 / beta;
    }
    return new MachForceTable(0.5, machs, new double[] {0, 0.5}, List.of("a"), List.of("a"), re, im);
  }

  static ModeTable oneMode() {
    return new ModeTable("one", List.of(new ElasticMode("a", 4, 0.01, 1, Map.of("s", new ShapeValue(0, 1)))));
  }

  @Test
  void theSweepMachNumberSelectsTheInterpolatedTable() {
    // beta Q is interpolated linearly, exact for Q = 4 / beta (derived): 4 / sqrt(0.75) at 0.5
    MachGafTable t = new MachGafTable(0.5, tables(0.3, 0.7));
    assertEquals(4 / Math.sqrt(0.75), t.table().realAt(0, 0, 0), 1e-12);
    assertEquals(0.5, t.table().machNumber(), 0.0);
    assertEquals(List.of("a"), t.modeNames());
    // moved to another Mach number, clamped into the tables
    assertEquals(0.6, t.atMach(0.6).machNumber(), 0.0);
    assertEquals(0.7, t.atMach(0.9).machNumber(), 0.0);
    assertEquals(0.3, t.atMach(0.1).machNumber(), 0.0);
    assertEquals(4 / Math.sqrt(1 - 0.36), t.atMach(0.6).table().realAt(1, 0, 0), 1e-12);
    // the range's own ends are accepted
    assertEquals(0.3, new MachGafTable(0.3, tables(0.3, 0.7)).machNumber(), 0.0);
    assertEquals(0.7, new MachGafTable(0.7, tables(0.3, 0.7)).machNumber(), 0.0);
  }

  @Test
  void refusesAMachNumberOutsideTheTablesAndControlColumns() {
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> new MachGafTable(0.71, tables(0.3, 0.7)));
    assertEquals("mach", e.fieldPath());
    assertThrows(InvalidInputException.class, () -> new MachGafTable(0.29, tables(0.3, 0.7)));
    assertThrows(InvalidInputException.class, () -> new MachGafTable(Double.NaN, tables(0.3, 0.7)));
    assertEquals("mach_numbers", assertThrows(InvalidInputException.class, () -> new MachGafTable(0.5, null))
        .fieldPath());
    MachForceTable withFlap = new MachForceTable(0.5, new double[] {0.3}, new double[] {0, 1}, List.of("a"),
        List.of("a", "flap"), new double[1][2][1][2], new double[1][2][1][2]);
    assertEquals("modes", assertThrows(InvalidInputException.class, () -> new MachGafTable(0.3, withFlap))
        .fieldPath());
  }

  @Test
  void aConstantMachCaseTakesEveryConfigurationsForcesAtItsMach() {
    MachGafTable t = new MachGafTable(0.3, tables(0.3, 0.7));
    Configuration c = new Configuration("c", oneMode(), t);
    AnalysisCase atMach = new AnalysisCase(1, "m", "", List.of(c), new MachSweep(0.55, 9000, 0, 3),
        AnalysisOptions.defaults(), List.of());
    assertEquals(0.55, ((MachGafTable) atMach.configurations().get(0).aero()).machNumber(), 0.0);
    // a speed sweep leaves the configuration as it is
    AnalysisCase atSpeed = new AnalysisCase(1, "s", "", List.of(c), new SpeedSweep(0, AirspeedKind.TRUE, 10, 100, 3),
        AnalysisOptions.defaults(), List.of());
    assertSame(c, atSpeed.configurations().get(0));
    // data that do not depend on the Mach number are unchanged by it
    GafTable one = t.table();
    assertSame(one, one.atMach(0.6));
    Configuration built = new Configuration("b", new TypicalSection(0.5, 50, 0, 0.1, 0.25, 3, 16, 2 * Math.PI, 1, 0),
        null);
    assertSame(built, built.atMach(0.6));
  }
}
