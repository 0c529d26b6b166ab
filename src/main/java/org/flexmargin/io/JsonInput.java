package org.flexmargin.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.HashMap;
import java.util.Map;

/**
 * A parsed JSON input file: Jackson's tree plus the line on which every value starts, keyed by
 * field path ({@code configurations[0].aero.strip_theory.strips[3].width_m}). The tree is built
 * token by token from Jackson's streaming parser so that each node's location is known; duplicate
 * keys are rejected. Non-numeric numbers ({@code NaN}, {@code Infinity}) are read so that the
 * range checks can name them.
 */
final class JsonInput {
  private static final JsonFactory FACTORY =
      JsonFactory.builder().enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS).build();

  private final SourceFile source;
  private final JsonNode root;
  private final Map<String, Integer> lines;

  private JsonInput(SourceFile source, JsonNode root, Map<String, Integer> lines) {
    this.source = source;
    this.root = root;
    this.lines = lines;
  }

  /**
   * Parses a JSON file.
   *
   * @param source the file
   * @return the tree with locations
   * @throws InputFileException on malformed JSON (Jackson's line and column), duplicate keys or an
   *     empty file
   */
  static JsonInput parse(SourceFile source) {
    Map<String, Integer> lines = new HashMap<>();
    try (JsonParser p = FACTORY.createParser(source.bytes())) {
      if (p.nextToken() == null) {
        throw new InputFileException(source.display(), 1, "", "a JSON object", "an empty file");
      }
      JsonNode root = readValue(p, "", lines, source);
      JsonToken extra = p.nextToken();
      if (extra != null) {
        throw new InputFileException(source.display(), p.currentTokenLocation().getLineNr(), "",
            "the end of the file after the top-level value", "more content (" + extra.asString() + ")");
      }
      return new JsonInput(source, root, lines);
    } catch (StreamReadException e) {
      JsonLocation loc = e.getLocation();
      int line = loc == null ? 0 : loc.getLineNr();
      String column = loc == null ? "" : " at column " + loc.getColumnNr();
      throw new InputFileException(
          source.display(), line, "", "well-formed JSON", e.getOriginalMessage() + column, e);
    } catch (IOException e) {
      throw new InputFileException(
          source.display(), 0, "", "a readable JSON file", e.getClass().getSimpleName() + " " + e.getMessage(), e);
    }
  }

  private static JsonNode readValue(JsonParser p, String path, Map<String, Integer> lines, SourceFile src)
      throws IOException {
    int line = p.currentTokenLocation().getLineNr();
    lines.put(path, line);
    JsonNodeFactory f = JsonNodeFactory.instance;
    JsonToken t = p.currentToken();
    switch (t) {
      case START_OBJECT: {
        ObjectNode o = f.objectNode();
        while (p.nextToken() == JsonToken.FIELD_NAME) {
          String name = p.currentName();
          int keyLine = p.currentTokenLocation().getLineNr();
          String child = JsonField.childPath(path, name);
          if (o.has(name)) {
            throw new InputFileException(src.display(), keyLine, child,
                "each key at most once in an object", "a second \"" + name + "\"");
          }
          p.nextToken();
          o.set(name, readValue(p, child, lines, src));
        }
        return o;
      }
      case START_ARRAY: {
        ArrayNode a = f.arrayNode();
        int i = 0;
        while (p.nextToken() != JsonToken.END_ARRAY) {
          a.add(readValue(p, path + "[" + i + "]", lines, src));
          i++;
        }
        return a;
      }
      case VALUE_STRING:
        return f.textNode(p.getText());
      case VALUE_NUMBER_INT:
        return p.getNumberType() == JsonParser.NumberType.BIG_INTEGER
            ? f.numberNode(p.getBigIntegerValue())
            : f.numberNode(p.getLongValue());
      case VALUE_NUMBER_FLOAT:
        return f.numberNode(p.getDoubleValue());
      case VALUE_TRUE:
        return f.booleanNode(true);
      case VALUE_FALSE:
        return f.booleanNode(false);
      case VALUE_NULL:
        return f.nullNode();
      default:
        throw new InputFileException(src.display(), line, path, "a JSON value", String.valueOf(t));
    }
  }

  /** @return the file */
  SourceFile source() {
    return source;
  }

  /** @return the top-level value as a field with an empty path */
  JsonField root() {
    return new JsonField(this, root, "");
  }

  /**
   * @param path field path
   * @return the line of the value at {@code path}, or of its nearest enclosing value; 0 if none
   */
  int lineOf(String path) {
    String p = path;
    while (true) {
      Integer line = lines.get(p);
      if (line != null) {
        return line;
      }
      if (p.isEmpty()) {
        return 0;
      }
      p = parentPath(p);
    }
  }

  private static String parentPath(String p) {
    if (p.endsWith("]")) {
      return p.substring(0, p.lastIndexOf('['));
    }
    int dot = p.lastIndexOf('.');
    return dot < 0 ? "" : p.substring(0, dot);
  }
}
