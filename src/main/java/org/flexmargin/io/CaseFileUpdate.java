package org.flexmargin.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Locale;
import java.util.Map;

/**
 * An updated copy of a case file with new {@code filters} lists in some feedback paths (the
 * command line's {@code notch-design --write-case}). Everything else is kept, key order included;
 * relative references to other files ({@code .json} and {@code .csv} values that name an existing
 * file beside the case) are rewritten relative to the new file's folder so that the copy reads the
 * same tables. The text is re-indented.
 */
public final class CaseFileUpdate {
  private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private CaseFileUpdate() {}

  /**
   * @param caseFile a case file that reads without error
   * @param target where the updated case will be written
   * @param filtersFragment the filters fragment of a notch design: {@code {"paths": [{"path_index":
   *     i, "filters": [...]}, ...]}}, each list in the case-file format
   * @return the text of the updated case
   * @throws InputFileException if the case file cannot be read
   */
  public static String withFilters(Path caseFile, Path target, String filtersFragment) {
    SourceFile src = SourceFile.read(caseFile, caseFile.toString());
    try {
      JsonNode root = MAPPER.readTree(src.bytes());
      JsonNode fragment = MAPPER.readTree(filtersFragment);
      ArrayNode paths = (ArrayNode) root.path("loop").path("paths");
      for (JsonNode p : fragment.path("paths")) {
        int index = p.path("path_index").asInt(-1);
        if (index < 0 || index >= paths.size()) {
          throw new IllegalArgumentException("the case has no loop path " + index);
        }
        ((ObjectNode) paths.get(index)).set("filters", p.path("filters").deepCopy());
      }
      Path from = caseFile.toAbsolutePath().normalize().getParent();
      Path to = target.toAbsolutePath().normalize().getParent();
      if (!from.equals(to)) {
        rebase(root, from, to);
      }
      return MAPPER.writeValueAsString(root) + "\n";
    } catch (IOException e) {
      throw new UncheckedIOException("could not rewrite " + caseFile + ": " + e.getMessage(), e);
    }
  }

  static void rebase(JsonNode node, Path from, Path to) {
    if (node instanceof ObjectNode o) {
      for (Iterator<Map.Entry<String, JsonNode>> it = o.fields(); it.hasNext(); ) {
        Map.Entry<String, JsonNode> e = it.next();
        if (e.getValue().isTextual()) {
          String moved = moved(e.getValue().asText(), from, to);
          if (moved != null) {
            e.setValue(TextNode.valueOf(moved));
          }
        } else {
          rebase(e.getValue(), from, to);
        }
      }
    } else if (node instanceof ArrayNode a) {
      for (int i = 0; i < a.size(); i++) {
        if (a.get(i).isTextual()) {
          String moved = moved(a.get(i).asText(), from, to);
          if (moved != null) {
            a.set(i, TextNode.valueOf(moved));
          }
        } else {
          rebase(a.get(i), from, to);
        }
      }
    }
  }

  /** @return the reference rewritten for the new folder, or null if the value is no relative file reference */
  private static String moved(String value, Path from, Path to) {
    String lower = value.toLowerCase(Locale.ROOT);
    if (!(lower.endsWith(".json") || lower.endsWith(".csv"))) {
      return null;
    }
    Path given;
    try {
      given = Path.of(value);
    } catch (java.nio.file.InvalidPathException e) {
      return null;
    }
    if (given.isAbsolute()) {
      return null;
    }
    Path file = from.resolve(given).normalize();
    if (!Files.isRegularFile(file)) {
      return null;
    }
    return to.getRoot() != null && to.getRoot().equals(file.getRoot())
        ? to.relativize(file).toString().replace('\\', '/') : file.toString();
  }
}
