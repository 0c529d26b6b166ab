package org.flexmargin.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonNodePath;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The JSON Schemas of the input formats, shipped in the jar under {@code schema/} and linked from
 * {@code docs/case-files.md}: one per JSON format ({@link Kind}), sharing {@code ranges.schema.json}
 * for the plausible ranges. Each file is validated against its schema (networknt
 * json-schema-validator, JSON Schema draft 7) after the reader has read it, so that the schema is
 * enforced as the description of the format; a violation the reader let pass is reported like any
 * input error, with file, line, field path, expected and found.
 *
 * <p>Range keywords ({@code minimum}, {@code maximum}) are left to the reader, which applies them
 * with the case's {@code plausibility_overrides} and warns outside the usual range: the schemas are
 * compiled with those keywords removed, so that a value the case lifts on purpose cannot fail a
 * {@code oneOf} branch of the schema. Thread-safe:
 * the compiled schemas are immutable and shared.
 */
final class Schemas {
  private Schemas() {}

  static {
    // The schema library logs through SLF4J; without a logging back-end SLF4J would print a notice
    // on standard error of every command. Keep it quiet unless the user asked otherwise.
    if (System.getProperty("slf4j.internal.verbosity") == null) {
      System.setProperty("slf4j.internal.verbosity", "ERROR");
    }
  }

  /** The JSON input formats and their schema files. */
  enum Kind {
    CASE_FILE("case-file.schema.json"),
    MODE_TABLE("mode-table.schema.json"),
    FORCE_TABLE("force-table.schema.json"),
    REQUIREMENTS("requirements.schema.json"),
    FILTERS("filters.schema.json"),
    LOOP_FILE("loop-file.schema.json"),
    MEASURED_RESPONSE("measured-response.schema.json"),
    CAMPAIGN("campaign.schema.json");

    private final String file;

    Kind(String file) {
      this.file = file;
    }

    /** @return the schema's file name in {@code schema/} of the jar and of the source tree */
    String file() {
      return file;
    }
  }

  private static final Set<String> LEFT_TO_READER =
      Set.of("minimum", "maximum", "exclusiveMinimum", "exclusiveMaximum");

  private static final Map<Kind, JsonSchema> SCHEMAS = load();

  private static Map<Kind, JsonSchema> load() {
    JsonSchemaFactory factory = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V7,
        b -> b.schemaLoaders(l -> l.schemas(Schemas::withoutRangeKeywords)));
    Map<Kind, JsonSchema> m = new EnumMap<>(Kind.class);
    for (Kind k : Kind.values()) {
      JsonSchema s = factory.getSchema(SchemaLocation.of("classpath:schema/" + k.file()));
      s.initializeValidators();
      m.put(k, s);
    }
    return m;
  }

  /**
   * The text of one of our schema files with the range keywords removed at every level.
   *
   * @param iri the schema's location, {@code classpath:schema/NAME}
   * @return the text, or null for any other location (left to the library's own loaders)
   */
  private static String withoutRangeKeywords(String iri) {
    String prefix = "classpath:schema/";
    if (!iri.startsWith(prefix)) {
      return null;
    }
    String resource = "schema/" + iri.substring(prefix.length());
    try (InputStream in = Schemas.class.getClassLoader().getResourceAsStream(resource)) {
      if (in == null) {
        return null;
      }
      ObjectMapper mapper = new ObjectMapper();
      JsonNode tree = mapper.readTree(in);
      strip(tree);
      return mapper.writeValueAsString(tree);
    } catch (IOException e) {
      throw new UncheckedIOException("schema " + iri + " in the jar cannot be read", e);
    }
  }

  private static void strip(JsonNode node) {
    if (node instanceof ObjectNode o) {
      o.remove(LEFT_TO_READER);
    }
    for (JsonNode child : node) {
      strip(child);
    }
  }

  /**
   * All schema violations of a tree other than range keywords, in document order.
   *
   * @param kind the format
   * @param tree the parsed file
   * @return the messages, empty if it conforms
   */
  static List<ValidationMessage> violations(Kind kind, JsonNode tree) {
    List<ValidationMessage> out = new ArrayList<>();
    // range keywords were removed when the schemas were compiled (withoutRangeKeywords)
    out.addAll(SCHEMAS.get(kind).validate(tree));
    out.sort(Comparator.comparing(m -> path(m.getInstanceLocation())));
    return out;
  }

  /**
   * Validates a parsed file against its schema.
   *
   * @param kind the format
   * @param doc the parsed file
   * @throws InputFileException at the first violation, with file, line and field path
   */
  static void check(Kind kind, JsonInput doc) {
    List<ValidationMessage> v = violations(kind, doc.tree());
    if (v.isEmpty()) {
      return;
    }
    ValidationMessage m = v.get(0);
    String path = path(m.getInstanceLocation());
    String expected;
    String found;
    switch (m.getType()) {
      case "required" -> {
        path = JsonField.childPath(path, String.valueOf(m.getProperty()));
        expected = "the key " + m.getProperty() + " (" + kind.file() + ")";
        found = "nothing (required key missing)";
      }
      case "additionalProperties", "propertyNames" -> {
        path = JsonField.childPath(path, String.valueOf(m.getProperty()));
        expected = "only the keys of " + kind.file();
        found = "unknown key \"" + m.getProperty() + "\"";
      }
      default -> {
        expected = "what " + kind.file() + " describes (" + m.getType() + ": "
            + m.getMessage().replaceFirst("^\\$[^:]*: ", "") + ")";
        found = JsonField.describe(m.getInstanceNode());
      }
    }
    throw new InputFileException(doc.source().display(), doc.lineOf(path), path, expected, found);
  }

  /** @return a schema library location as our field path: {@code configurations[0].aero} */
  static String path(JsonNodePath p) {
    StringBuilder sb = new StringBuilder();
    for (int i = 0; i < p.getNameCount(); i++) {
      Object e = p.getElement(i);
      if (e instanceof Integer idx) {
        sb.append('[').append(idx).append(']');
      } else {
        if (sb.length() > 0) {
          sb.append('.');
        }
        sb.append(e);
      }
    }
    return sb.toString();
  }
}
