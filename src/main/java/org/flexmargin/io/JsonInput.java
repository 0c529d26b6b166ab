package org.flexmargin.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.core.JsonStreamContext;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A parsed JSON input file: Jackson's tree plus the line on which every value starts, keyed by
 * field path ({@code configurations[0].aero.strip_theory.strips[3].width_m}). The tree is built
 * token by token from Jackson's streaming parser so that each node's location is known; duplicate
 * keys are rejected. Non-numeric numbers ({@code NaN}, {@code Infinity}) are read so that the
 * range checks can name them.
 */
final class JsonInput {
  /** Deepest nesting of objects and lists accepted (the deepest format needs 6). */
  static final int MAX_NESTING_DEPTH = 64;
  /** Longest text value accepted (characters). */
  static final int MAX_STRING_LENGTH = 1_000_000;
  /** Longest number accepted (characters). */
  static final int MAX_NUMBER_LENGTH = 400;

  private static final JsonFactory FACTORY = JsonFactory.builder()
      .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
      .streamReadConstraints(StreamReadConstraints.builder()
          .maxNestingDepth(MAX_NESTING_DEPTH)
          .maxStringLength(MAX_STRING_LENGTH)
          .maxNumberLength(MAX_NUMBER_LENGTH)
          .build())
      .build();

  private final SourceFile source;
  private final JsonNode root;
  private final Map<String, Integer> lines;
  private final ReadLog log;

  private JsonInput(SourceFile source, JsonNode root, Map<String, Integer> lines, ReadLog log) {
    this.source = source;
    this.root = root;
    this.lines = lines;
    this.log = log;
  }

  /** As {@link #parse(SourceFile, ReadLog)} with a log of its own. */
  static JsonInput parse(SourceFile source) {
    return parse(source, new ReadLog());
  }

  /**
   * Parses a JSON file.
   *
   * @param source the file
   * @param log where range warnings of this file's values go
   * @return the tree with locations
   * @throws InputFileException on malformed JSON (Jackson's line and column), duplicate keys or an
   *     empty file
   */
  static JsonInput parse(SourceFile source, ReadLog log) {
    Map<String, Integer> lines = new HashMap<>();
    JsonParser p = null;
    try {
      p = FACTORY.createParser(source.bytes());
      if (p.nextToken() == null) {
        throw new InputFileException(source.display(), 1, "", "a JSON object", "an empty file");
      }
      JsonNode root = readValue(p, "", lines, source);
      JsonToken extra = p.nextToken();
      if (extra != null) {
        throw new InputFileException(source.display(), p.currentTokenLocation().getLineNr(), "",
            "the end of the file after the top-level value", "more content (" + extra.asString() + ")");
      }
      return new JsonInput(source, root, lines, log);
    } catch (StreamConstraintsException e) {
      throw limit(source, p, e);
    } catch (StreamReadException e) {
      JsonLocation loc = e.getLocation();
      int line = loc == null ? 0 : loc.getLineNr();
      String column = loc == null ? "" : " at column " + loc.getColumnNr();
      String where = p == null ? "" : contextPath(p.getParsingContext());
      throw new InputFileException(
          source.display(), line, where, "well-formed JSON", e.getOriginalMessage() + column, e);
    } catch (IOException e) {
      throw new InputFileException(
          source.display(), 0, "", "a readable JSON file", e.getClass().getSimpleName() + " " + e.getMessage(), e);
    } finally {
      if (p != null) {
        try {
          p.close();
        } catch (IOException ignored) {
          // the bytes are in memory: closing cannot fail in a way that matters
        }
      }
    }
  }

  /**
   * @return the field path of the value the parser was reading ({@code configurations[0].aero}),
   *     empty at the top level; names the field where a file is cut short or malformed
   */
  static String contextPath(JsonStreamContext ctx) {
    List<String> parts = new ArrayList<>();
    for (JsonStreamContext c = ctx; c != null && !c.inRoot(); c = c.getParent()) {
      if (c.inArray()) {
        parts.add("[" + Math.max(0, c.getCurrentIndex()) + "]");
      } else if (c.getCurrentName() != null) {
        parts.add("." + c.getCurrentName());
      }
    }
    StringBuilder sb = new StringBuilder();
    for (int i = parts.size() - 1; i >= 0; i--) {
      sb.append(parts.get(i));
    }
    return sb.length() > 0 && sb.charAt(0) == '.' ? sb.substring(1) : sb.toString();
  }

  /** Translates a parser limit into our own words, at the line where the parser stopped. */
  private static InputFileException limit(SourceFile source, JsonParser p, StreamConstraintsException e) {
    int line = p == null ? 0 : Math.max(p.currentLocation().getLineNr(), p.currentTokenLocation().getLineNr());
    String msg = String.valueOf(e.getOriginalMessage());
    String expected;
    String found;
    if (msg.contains("nesting depth")) {
      expected = "objects and lists nested at most " + MAX_NESTING_DEPTH + " levels deep";
      found = "deeper nesting";
    } else if (msg.contains("String value length")) {
      expected = "a text value of at most " + MAX_STRING_LENGTH + " characters";
      found = "a longer text value";
    } else if (msg.contains("Number value length") || msg.contains("Number length")) {
      expected = "a number of at most " + MAX_NUMBER_LENGTH + " characters";
      found = "a longer number";
    } else {
      expected = "JSON within the reader's limits (nesting " + MAX_NESTING_DEPTH + " levels, text "
          + MAX_STRING_LENGTH + " characters, numbers " + MAX_NUMBER_LENGTH + " characters)";
      found = "content beyond them";
    }
    String where = p == null ? "" : contextPath(p.getParsingContext());
    return new InputFileException(source.display(), line, where, expected, found, e);
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

  /** @return the log of the read this file belongs to */
  ReadLog log() {
    return log;
  }

  /** @return the tree (read only) */
  JsonNode tree() {
    return root;
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
