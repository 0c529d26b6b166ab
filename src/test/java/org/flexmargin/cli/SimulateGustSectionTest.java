package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code simulate} takes gust penetration and lift growth from a case's {@code gusts} section (a
 * copy of the demo with tailplane 5.85 m behind the wing, downwash gradient 0.4, elevator
 * effectiveness 0.5, lift growth not given), each command-line option overriding its value.
 */
class SimulateGustSectionTest {
  @TempDir static Path demo;

  @BeforeAll
  static void copyTheDemoWithAGustsSection() throws IOException {
    try (Stream<Path> files = Files.list(Path.of("mode-tables/demo"))) {
      for (Path f : files.filter(Files::isRegularFile).toList()) {
        Files.copy(f, demo.resolve(f.getFileName()));
      }
    }
    Path c = demo.resolve("demo-case.json");
    String text = Files.readString(c);
    Files.writeString(c, text.replace("\n  \"requirements\": {", "\n  \"gusts\": {\"wing_to_tail_m\": 5.85, "
        + "\"downwash_gradient\": 0.4, \"elevator_effectiveness\": 0.5},\n  \"requirements\": {"));
  }

  private static String gustLine(Path out, String... extra) {
    List<String> args = new ArrayList<>(List.of("simulate", demo.resolve("demo-case.json").toString(), "--speed-eas", "60",
        "--input", "none", "--gust-mps", "5", "--gradient-m", "30", "--duration-s", "0.5", "--step-s", "0.005",
        "--no-limits", "--out", out.toString()));
    args.addAll(List.of(extra));
    StringWriter o = new StringWriter();
    StringWriter e = new StringWriter();
    int code = FlexMargin.execute(args.toArray(String[]::new), new PrintWriter(o), new PrintWriter(e));
    assertEquals(0, code, o + "\n" + e);
    return o.toString().lines().filter(l -> l.startsWith("1-cosine gusts")).findFirst().orElseThrow();
  }

  @Test
  void theCaseGivesTheDefaults(@TempDir Path tmp) {
    String line = gustLine(tmp.resolve("a"));
    assertTrue(line.contains("(quasi_steady lift growth; tailplane 5.85 m behind the wing, downwash gradient 0.40, "
        + "elevator effectiveness 0.50)"), line);
  }

  @Test
  void eachOptionOverridesItsCaseValue(@TempDir Path tmp) {
    String line = gustLine(tmp.resolve("b"), "--penetration-m", "3", "--elevator-effectiveness", "0.7",
        "--lift-growth", "unsteady");
    assertTrue(line.contains("(unsteady lift growth; tailplane 3.00 m behind the wing, downwash gradient 0.40, "
        + "elevator effectiveness 0.70)"), line);
    line = gustLine(tmp.resolve("c"), "--downwash-gradient", "0.2");
    assertTrue(line.contains("tailplane 5.85 m behind the wing, downwash gradient 0.20, elevator effectiveness 0.50"),
        line);
  }
}
