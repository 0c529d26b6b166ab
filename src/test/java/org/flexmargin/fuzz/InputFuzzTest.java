package org.flexmargin.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.lifecycle.AfterContainer;
import org.flexmargin.cli.CliRun;
import org.flexmargin.cli.FlexMargin;

/**
 * Fuzzing the readers through the command line, in process ({@link FlexMargin#execute}): valid
 * case files, mode tables (JSON and CSV), force tables and requirements files are mutated (a value
 * replaced by an edge of the double range, a wrong type or a word in another case; a key removed or
 * added; the file truncated, given bytes that are not UTF-8, re-encoded as UTF-16 or emptied) and
 * every run must
 *
 * <ul>
 *   <li>end with exit 0, 2 or 3 (never 1, an internal error), and print no stack trace;
 *   <li>on exit 2, name one of the input files and, for a mutated value or key, a field path, in the
 *       form {@code file[:line]: path: expected ..., found ...};
 *   <li>write nothing outside the output folder;
 *   <li>finish within {@link #BOUND}.
 * </ul>
 *
 * <p>Every case runs {@code check}; one in {@link #SWEEP_EVERY} also runs {@code sweep} (4 speeds,
 * PNG charts only) when the case is small. In CI: {@link #TRIES} per property with fixed seeds; for
 * a longer local run pass {@code -Dflexmargin.fuzz.repeat=N} (N mutations per try, see
 * DEVELOPERS.md). A summary of outcome classes is printed at the end.
 */
class InputFuzzTest {
  private static final Path IO = Path.of("src/test/resources/io");
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final Duration BOUND = Duration.ofSeconds(30);
  private static final int SWEEP_EVERY = 100;
  private static final Pattern BAD_INPUT =
      Pattern.compile("flexmargin: bad input: ([^:]+)(?::(\\d+))?: (?:(.+?): )?expected (.+), found (.*)");
  private static final Map<String, AtomicInteger> OUTCOMES = new ConcurrentHashMap<>();
  private static final AtomicInteger CASES = new AtomicInteger();

  /** The files of the fuzzed input set and the case that reads them. */
  private static final List<String> FILES = List.of("loop-case.json", "strip-case.json", "modes.json",
      "modes.csv", "forces.json", "requirements.json");

  /** What is done to which file. */
  record Mutation(String file, String kind, int where, String value) {
    boolean fileLevel() {
      return kind.equals("truncate") || kind.equals("bytes") || kind.equals("utf16") || kind.equals("empty")
          || kind.equals("csv-line");
    }
  }

  private static final List<String> EDGE_VALUES = List.of("0", "-0.0", "-1", "1e-300", "4.9e-324", "1e308",
      "-1e308", "1.7976931348623157e308", "1e999", "123456789012345678901234567890", "NaN", "Infinity",
      "-Infinity", "\"text\"", "\"\"", "null", "true", "[]", "{}", "[1e308]", "\"EAS\"", "\"Pk\"", "0.5",
      "2147483648", "-2147483649", "1e6", "3");

  @Provide
  Arbitrary<Mutation> mutations() {
    Arbitrary<String> file = Arbitraries.of(FILES);
    Arbitrary<String> kind = Arbitraries.of("value", "value", "value", "value", "remove", "add", "truncate",
        "bytes", "utf16", "empty", "csv-line");
    Arbitrary<Integer> where = Arbitraries.integers().between(0, 1_000_000);
    Arbitrary<String> value = Arbitraries.of(EDGE_VALUES);
    return Combinators.combine(file, kind, where, value).as(Mutation::new);
  }

  /** Mutations per try: 1 in CI; {@code -Dflexmargin.fuzz.repeat=N} for a longer local run. */
  private static final int REPEAT = Integer.getInteger("flexmargin.fuzz.repeat", 1);

  @Property(tries = TRIES, seed = "20261202")
  void caseFilesSurviveMutation(@ForAll("mutations") Mutation m) throws IOException {
    repeat(m, "loop-case.json");
  }

  @Property(tries = TRIES, seed = "20261203")
  void tablesSurviveMutationInAStripTheoryCase(@ForAll("mutations") Mutation m) throws IOException {
    repeat(m, "strip-case.json");
  }

  @Property(tries = TRIES, seed = "20261204")
  void eachFileSurvivesMutationAlone(@ForAll("mutations") Mutation m) throws IOException {
    repeat(m, m.file().equals("strip-case.json") ? "strip-case.json" : "loop-case.json");
  }

  /** Tries per property in CI (3 properties: 2 100 cases, about 40 s on two cores). */
  static final int TRIES = 700;

  /** The mutation, then {@link #REPEAT} - 1 more derived from it (other places, other values). */
  private static void repeat(Mutation m, String caseFile) throws IOException {
    for (int k = 0; k < REPEAT; k++) {
      Mutation mk = k == 0 ? m : new Mutation(FILES.get((FILES.indexOf(m.file()) + k) % FILES.size()), m.kind(),
          (int) ((m.where() + 7919L * k) % 1_000_000), EDGE_VALUES.get((EDGE_VALUES.indexOf(m.value()) + k)
          % EDGE_VALUES.size()));
      fuzz(mk, caseFile);
    }
  }

  private static void fuzz(Mutation m, String caseFile) throws IOException {
    Path dir = Files.createTempDirectory("flexmargin-fuzz");
    try {
      writeInputs(dir);
      mutate(dir.resolve(m.file()), m);
      Set<String> before = listing(dir);
      Set<String> cwdBefore = listing(Path.of(""));
      Path out = dir.resolve("out");
      int n = CASES.incrementAndGet();
      String[] check = {"check", dir.resolve(caseFile).toString()};
      CliRun r = assertTimeoutPreemptively(BOUND, () -> CliRun.of(check), () -> "check ran longer than " + BOUND + ": " + m);
      judge(r, m, "check");
      if (r.code() != 2 && n % SWEEP_EVERY == 0 && small(m)) {
        String[] sweep = {"sweep", dir.resolve(caseFile).toString(), "--out", out.toString(), "--quiet",
            "--no-svg", "--threads", "1"};
        CliRun s = assertTimeoutPreemptively(BOUND, () -> CliRun.of(sweep), () -> "sweep ran longer than " + BOUND + ": " + m);
        judge(s, m, "sweep");
      }
      Set<String> after = listing(dir);
      after.removeIf(p -> p.equals("out") || p.startsWith("out/") || p.startsWith("out" + java.io.File.separator));
      assertEquals(before, after, "files written beside the inputs: " + m);
      assertEquals(cwdBefore, listing(Path.of("")), "files written in the working folder: " + m);
    } finally {
      delete(dir);
    }
  }

  /** Exit code, message form and file named; counts the outcome class. */
  private static void judge(CliRun r, Mutation m, String command) {
    assertTrue(Set.of(0, 2, 3).contains(r.code()), command + " exit " + r.code() + " for " + m + ": " + r.err());
    assertFalse(r.err().contains("\tat "), "stack trace for " + m + ": " + r.err());
    String outcome = command + " exit " + r.code();
    if (r.code() == 2) {
      String first = r.err().lines().filter(l -> l.startsWith("flexmargin: bad input: ")).findFirst().orElse("");
      Matcher x = BAD_INPUT.matcher(first);
      assertTrue(x.matches(), "exit 2 without a located message for " + m + ": " + r.err());
      String file = Path.of(x.group(1)).getFileName().toString();
      assertTrue(FILES.contains(file), "exit 2 names no input file for " + m + ": " + first);
      if (!m.fileLevel() && file.equals(m.file())) {
        assertTrue(x.group(3) != null && !x.group(3).isEmpty(), "exit 2 names no field for " + m + ": " + first);
      }
      outcome += x.group(3) == null ? " (whole file)" : " (field)";
    }
    OUTCOMES.computeIfAbsent(outcome, k -> new AtomicInteger()).incrementAndGet();
  }

  /**
   * A case is swept only when its mutated value cannot ask for much work (a grid of 1e6 points is
   * the cost estimate's business, tested with the command line); the base cases sweep 4 speeds.
   */
  private static boolean small(Mutation m) {
    try {
      return Math.abs(Double.parseDouble(m.value())) <= 1e3;
    } catch (NumberFormatException e) {
      return !m.value().startsWith("[");
    }
  }

  @AfterContainer
  static void summary() {
    Map<String, Integer> sorted = new TreeMap<>();
    OUTCOMES.forEach((k, v) -> sorted.put(k, v.get()));
    System.out.println("input fuzz: " + CASES.get() + " cases; outcomes " + sorted);
  }

  // ----------------------------------------------------------------------------------------------


  /** The valid input set: the test cases with small sweeps, a CSV table and a requirements file. */
  private static void writeInputs(Path dir) throws IOException {
    String loop = Files.readString(IO.resolve("good-loop-case.json"))
        .replace("\"good-modes.json\"", "\"modes.json\"").replace("\"good-forces.json\"", "\"forces.json\"")
        .replace("\"points\": 16", "\"points\": 4")
        .replaceFirst("\"loop\":", "\"requirements\": \"requirements.json\",\n  \"loop\":");
    Files.writeString(dir.resolve("loop-case.json"), loop);
    String strips = Files.readString(IO.resolve("good-case.json"))
        .replaceFirst("\"good-modes.json\"", "\"modes.csv\"").replace("\"good-modes.json\"", "\"modes.json\"")
        .replace("\"good-forces.json\"", "\"forces.json\"").replace("\"points\": 21", "\"points\": 4")
        .replace("\"k_method_points\": 50", "\"k_method_points\": 20");
    Files.writeString(dir.resolve("strip-case.json"), strips);
    Files.copy(IO.resolve("good-modes.json"), dir.resolve("modes.json"));
    Files.copy(IO.resolve("good-modes.csv"), dir.resolve("modes.csv"));
    Files.copy(IO.resolve("good-forces.json"), dir.resolve("forces.json"));
    Files.copy(IO.resolve("requirements/good-preset.json"), dir.resolve("requirements.json"));
  }

  private static void mutate(Path file, Mutation m) throws IOException {
    byte[] bytes = Files.readAllBytes(file);
    switch (m.kind()) {
      case "truncate" -> Files.write(file, Arrays.copyOf(bytes, m.where() % Math.max(1, bytes.length)));
      case "bytes" -> {
        int at = m.where() % Math.max(1, bytes.length);
        byte[] b = new byte[bytes.length + 2];
        System.arraycopy(bytes, 0, b, 0, at);
        b[at] = (byte) 0xC3;
        b[at + 1] = (byte) 0x28; // an invalid two-byte sequence
        System.arraycopy(bytes, at, b, at + 2, bytes.length - at);
        Files.write(file, b);
      }
      case "utf16" -> Files.write(file, new String(bytes, StandardCharsets.UTF_8).getBytes(StandardCharsets.UTF_16));
      case "empty" -> Files.write(file, new byte[0]);
      case "csv-line" -> {
        List<String> lines = new ArrayList<>(Arrays.asList(new String(bytes, StandardCharsets.UTF_8).split("\n", -1)));
        int at = m.where() % lines.size();
        if (m.where() % 2 == 0) {
          lines.remove(at);
        } else {
          lines.add(at, lines.get(at));
        }
        Files.writeString(file, String.join("\n", lines));
      }
      default -> {
        if (file.toString().endsWith(".csv")) {
          mutateCsvCell(file, m);
        } else {
          mutateJson(file, m);
        }
      }
    }
  }

  private static void mutateCsvCell(Path file, Mutation m) throws IOException {
    String[] lines = Files.readString(file).split("\n", -1);
    int row = m.where() % lines.length;
    String[] cells = lines[row].split(",", -1);
    int c = (m.where() / 7) % cells.length;
    switch (m.kind()) {
      case "remove" -> cells[c] = "";
      case "add" -> cells[c] = cells[c] + ",extra";
      default -> cells[c] = m.value().replace("\"", "");
    }
    lines[row] = String.join(",", cells);
    Files.writeString(file, String.join("\n", lines));
  }

  private static void mutateJson(Path file, Mutation m) throws IOException {
    JsonNode root = JSON.readTree(file.toFile());
    List<JsonNode[]> slots = new ArrayList<>(); // {parent, child} pairs in document order
    collect(root, slots);
    if (slots.isEmpty()) {
      return;
    }
    JsonNode[] slot = slots.get(m.where() % slots.size());
    JsonNode parent = slot[0];
    String marker = "\"__FUZZ__\"";
    switch (m.kind()) {
      case "remove" -> {
        if (parent instanceof ObjectNode o) {
          o.remove(nameOf(o, slot[1]));
        } else if (parent instanceof ArrayNode a) {
          a.remove(indexOf(a, slot[1]));
        }
      }
      case "add" -> {
        ObjectNode target = parent instanceof ObjectNode o ? o : slot[1] instanceof ObjectNode c ? c : null;
        if (target != null) {
          String near = target.fieldNames().hasNext() ? target.fieldNames().next() : "key";
          String key = m.where() % 3 == 0 ? "extra_key" : m.where() % 3 == 1 ? near.substring(0, near.length() - 1)
              : near.toUpperCase();
          target.put(key, 1);
        }
      }
      default -> {
        JsonNode value = slot[1].isTextual() && m.where() % 4 == 0
            ? TextNode.valueOf(slot[1].textValue().toUpperCase()) : TextNode.valueOf("__FUZZ__");
        if (parent instanceof ObjectNode o) {
          o.set(nameOf(o, slot[1]), value);
        } else if (parent instanceof ArrayNode a) {
          a.set(indexOf(a, slot[1]), value);
        }
      }
    }
    String text = JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root).replace(marker, m.value());
    Files.writeString(file, text);
  }

  private static void collect(JsonNode n, List<JsonNode[]> slots) {
    if (n.isObject()) {
      n.fields().forEachRemaining(e -> {
        slots.add(new JsonNode[] {n, e.getValue()});
        collect(e.getValue(), slots);
      });
    } else if (n.isArray()) {
      for (JsonNode c : n) {
        slots.add(new JsonNode[] {n, c});
        collect(c, slots);
      }
    }
  }

  private static String nameOf(ObjectNode o, JsonNode child) {
    var it = o.fields();
    while (it.hasNext()) {
      var e = it.next();
      if (e.getValue() == child) {
        return e.getKey();
      }
    }
    throw new IllegalStateException();
  }

  private static int indexOf(ArrayNode a, JsonNode child) {
    for (int i = 0; i < a.size(); i++) {
      if (a.get(i) == child) {
        return i;
      }
    }
    throw new IllegalStateException();
  }

  private static Set<String> listing(Path dir) {
    try (Stream<Path> s = Files.walk(dir, dir.toString().isEmpty() ? 1 : 8)) {
      Set<String> out = new TreeSet<>();
      s.forEach(p -> out.add(dir.relativize(p).toString()));
      return out;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static void delete(Path dir) throws IOException {
    try (Stream<Path> s = Files.walk(dir)) {
      for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
