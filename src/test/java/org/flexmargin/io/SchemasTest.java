package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.flexmargin.model.PlausibleRange;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The JSON Schemas describe the formats: every bundled and documented example conforms, the
 * schemas' bounds are the plausible ranges, and a file the schema refuses is reported with file,
 * line and field path.
 */
class SchemasTest {
  private static final ObjectMapper JSON = new ObjectMapper();

  private static JsonNode tree(Path p) throws IOException {
    return JSON.readTree(p.toFile());
  }

  private static Schemas.Kind kindOf(JsonNode n) {
    if (n.has("configurations")) {
      return Schemas.Kind.CASE_FILE;
    }
    if (n.has("reduced_frequencies")) {
      return Schemas.Kind.FORCE_TABLE;
    }
    if (n.has("modes")) {
      return Schemas.Kind.MODE_TABLE;
    }
    if (n.has("preset")) {
      return Schemas.Kind.REQUIREMENTS;
    }
    if (n.has("filters") || n.has("paths")) {
      return Schemas.Kind.FILTERS;
    }
    if (n.has("base_case")) {
      return Schemas.Kind.CAMPAIGN;
    }
    if (n.has("name") && n.has("format")) {
      return Schemas.Kind.LOOP_FILE;
    }
    if (n.has("gain_db")) {
      return Schemas.Kind.MEASURED_RESPONSE;
    }
    throw new AssertionError("no schema for " + n);
  }

  @Test
  void everyBundledAndTestInputFileConformsToItsSchema() throws IOException {
    List<Path> files = new ArrayList<>();
    try (Stream<Path> s = Files.walk(Path.of("mode-tables"))) {
      s.filter(p -> p.toString().endsWith(".json")).forEach(files::add);
    }
    try (Stream<Path> s = Files.list(Path.of("src/test/resources/io"))) {
      s.filter(p -> p.getFileName().toString().startsWith("good-") && p.toString().endsWith(".json"))
          .forEach(files::add);
    }
    try (Stream<Path> s = Files.list(Path.of("src/test/resources/io/requirements"))) {
      s.filter(p -> p.getFileName().toString().startsWith("good-")).forEach(files::add);
    }
    assertTrue(files.size() >= 10, "test set-up: " + files);
    for (Path f : files) {
      JsonNode n = tree(f);
      List<ValidationMessage> v = Schemas.violations(kindOf(n), n);
      assertTrue(v.isEmpty(), f + ": " + v);
    }
  }

  /** Fragments of the documentation ({@code "sweep": {...}}) are checked against the schema part of that key. */
  private static final Map<String, String> FRAGMENT_SCHEMA = Map.of(
      "sweep", "#/definitions/sweep", "uniform_wing", "#/definitions/uniform_wing",
      "typical_section", "#/definitions/typical_section", "rigid_body", "#/definitions/rigid_body",
      "loop", "#/definitions/loop", "plausibility_overrides", "#/properties/plausibility_overrides",
      "gusts", "#/definitions/gusts", "rational_fit", "#/definitions/rational_fit");

  @Test
  void everyExampleInTheDocumentationConformsToItsSchema() throws IOException {
    Pattern block = Pattern.compile("```jsonc?\\n(.*?)```", Pattern.DOTALL);
    JsonSchemaFactory factory = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V7);
    int documents = 0;
    int fragments = 0;
    for (String doc : List.of("docs/case-files.md", "docs/requirements.md")) {
      Matcher m = block.matcher(Files.readString(Path.of(doc)));
      while (m.find()) {
        String text = m.group(1).replaceAll("(?m)\\s*//.*$", "");
        JsonNode n;
        if (text.strip().startsWith("{")) {
          n = JSON.readTree(text);
          List<ValidationMessage> v = Schemas.violations(kindOf(n), n);
          assertTrue(v.isEmpty(), doc + " example " + text + ": " + v);
          documents++;
        } else {
          n = JSON.readTree("{" + text + "}");
          Iterator<Map.Entry<String, JsonNode>> it = n.fields();
          Map.Entry<String, JsonNode> e = it.next();
          assertFalse(it.hasNext(), doc + ": one key per fragment: " + text);
          String pointer = FRAGMENT_SCHEMA.get(e.getKey());
          assertTrue(pointer != null, doc + ": no schema part for fragment " + e.getKey());
          JsonSchema s = factory.getSchema(SchemaLocation.of("classpath:schema/case-file.schema.json" + pointer));
          Set<ValidationMessage> v = s.validate(e.getValue());
          assertTrue(v.isEmpty(), doc + " fragment " + text + ": " + v);
          fragments++;
        }
      }
    }
    // case-files.md: case, mode table, force table, force table at several Mach numbers, filters
    // file; requirements.md: the annotated table
    assertEquals(6, documents);
    assertTrue(fragments >= 7, "fragments checked: " + fragments);
  }

  @Test
  void theSchemasBoundsAreThePlausibleRanges() throws IOException {
    JsonNode defs;
    try (InputStream in = Schemas.class.getResourceAsStream("/schema/ranges.schema.json")) {
      defs = JSON.readTree(in).get("definitions");
    }
    assertEquals(PlausibleRange.values().length, defs.size());
    for (PlausibleRange r : PlausibleRange.values()) {
      JsonNode d = defs.get(r.id());
      assertTrue(d != null, "ranges.schema.json lacks " + r.id());
      assertEquals(r.plausibleMin(), d.get("minimum").asDouble(), 0.0, r.id());
      assertEquals(r.plausibleMax(), d.get("maximum").asDouble(), 0.0, r.id());
    }
  }

  @Test
  void aViolationTheReaderDoesNotSeeIsReportedWithFileLineAndPath(@TempDir Path dir) throws IOException {
    // The schema's name pattern is the reader's: a violation of a schema-only rule needs a rule the
    // reader does not check itself; the filters file's "case" must be text.
    Path io = Path.of("src/test/resources/io");
    for (String f : List.of("good-loop-case.json", "good-modes.json", "good-forces.json")) {
      Files.copy(io.resolve(f), dir.resolve(f));
    }
    Files.writeString(dir.resolve("f.json"), "{\"format\": 1,\n \"case\": 12,\n \"filters\": []}\n");
    Path c = dir.resolve("good-loop-case.json");
    String text = Files.readString(c);
    int start = text.indexOf("\"filters\": [");
    int end = text.indexOf("],", start) + 1;
    Files.writeString(c, text.substring(0, start) + "\"filters\": \"f.json\"" + text.substring(end));
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertEquals("f.json", Path.of(e.file()).getFileName().toString());
    assertEquals(2, e.line());
    assertEquals("case", e.fieldPath());
    assertTrue(e.expected().contains("filters.schema.json"), e.expected());
    assertEquals("12", e.found());
  }
}
