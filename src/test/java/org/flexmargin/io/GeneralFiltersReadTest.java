package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FilterSpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The general and digital filters of a path read from a case file (docs/case-files.md, "Filters"). */
class GeneralFiltersReadTest {
  private static final Path DEMO = Path.of("mode-tables/demo");

  private static Path caseWith(Path dir, String filters) throws Exception {
    for (Path p : Files.list(DEMO).toList()) {
      Files.copy(p, dir.resolve(p.getFileName()));
    }
    Path c = dir.resolve("demo-case.json");
    String text = Files.readString(c).replaceFirst("\"filters\": \\[", "\"filters\": [" + filters + ",");
    Files.writeString(c, text);
    return c;
  }

  @Test
  void everyFilterKindIsReadInOrder(@TempDir Path dir) throws Exception {
    AnalysisCase c = CaseReader.read(caseWith(dir, "{\"lead_lag\": {\"zero_hz\": 2, \"pole_hz\": 8}}, "
        + "{\"washout\": {\"time_constant_s\": 1.5}}, {\"second_order\": {\"numerator_frequency_hz\": 20, "
        + "\"numerator_damping_ratio\": 0.1, \"denominator_frequency_hz\": 21, \"denominator_damping_ratio\": 0.6}}, "
        + "{\"transfer_function\": {\"numerator\": [1], \"denominator\": [0.01, 1]}}, "
        + "{\"discrete\": {\"numerator\": [0.5, 0.5], \"denominator\": [1]}}"));
    List<FilterSpec> f = c.loop().paths().get(0).filters();
    assertEquals(new FilterSpec.LeadLag(2, 8), f.get(0));
    assertEquals(new FilterSpec.Washout(1.5), f.get(1));
    assertEquals(new FilterSpec.SecondOrder(20, 0.1, 21, 0.6), f.get(2));
    assertArrayEquals(new double[] {0.01, 1}, ((FilterSpec.TransferFunction) f.get(3)).coefficients().denominator());
    assertInstanceOf(FilterSpec.Discrete.class, f.get(4));
  }

  @Test
  void badFiltersNameFileLineAndField(@TempDir Path dir) throws Exception {
    Path c = caseWith(dir, "{\"lead_lag\": {\"zero_hz\": 2, \"pole\": 8}}");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertTrue(e.getMessage().contains("filters[0].lead_lag"), e.getMessage());
    assertTrue(e.line() > 300, e.getMessage());
    Path d = dir.resolve("two");
    Files.createDirectories(d);
    Path c2 = caseWith(d, "{\"transfer_function\": {\"numerator\": [1, 2, 3], \"denominator\": [1, 1]}}");
    InputFileException e2 = assertThrows(InputFileException.class, () -> CaseReader.read(c2));
    assertTrue(e2.getMessage().contains("transfer_function.numerator"), e2.getMessage());
  }
}
