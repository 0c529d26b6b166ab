package org.flexmargin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.MeasuredTable;

/**
 * Reads a measured open-loop frequency response table (docs/loop-files.md, "Measured
 * responses"), CSV or JSON by file extension:
 *
 * <ul>
 *   <li>CSV: lines starting with {@code #} are comments ({@code # description = text} sets the
 *       description); the first other line is the header naming the columns {@code frequency_hz},
 *       {@code gain_db} and {@code phase_deg} (in any order, no others); then one row per
 *       frequency;
 *   <li>JSON: {@code {"format": 1, "description": "...", "frequency_hz": [...], "gain_db": [...],
 *       "phase_deg": [...]}}, or the same object without {@code format} inside a loop file.
 * </ul>
 *
 * Every failure is an {@link InputFileException} with file, line, field, expected and found.
 * Stateless.
 */
public final class MeasuredTableReader {
  private MeasuredTableReader() {}

  /** The columns of a table. */
  static final List<String> COLUMNS = List.of("frequency_hz", "gain_db", "phase_deg");
  private static final List<String> FILE_KEYS = List.of("format", "description", "frequency_hz", "gain_db", "phase_deg");

  /**
   * Reads a table file on its own (for example the {@code --measured} file of {@code margins}).
   *
   * @param file a {@code .csv} or {@code .json} table
   * @return the table
   */
  public static MeasuredTable read(Path file) {
    return read(SourceFile.read(file, file.toString()), null);
  }

  /** Reads a table file already loaded; {@code from} is the referring field, or null. */
  static MeasuredTable read(SourceFile src, JsonField from) {
    String name = src.display().toLowerCase(Locale.ROOT);
    if (name.endsWith(".csv")) {
      return csv(src);
    }
    if (!name.endsWith(".json")) {
      String expected = "a measured response table ending in .csv or .json";
      if (from != null) {
        throw from.fail(expected, "\"" + src.display() + "\"");
      }
      throw new InputFileException(src.display(), 0, "", expected, "a file named " + src.display());
    }
    JsonInput doc = JsonInput.parse(src);
    JsonField root = doc.root().object("a measured response table");
    root.allowOnly(FILE_KEYS);
    JsonField f = root.required("format", "\"format\": " + CaseReader.FORMAT);
    if (f.integer() != CaseReader.FORMAT) {
      throw f.fail("format " + CaseReader.FORMAT + " (the version this program reads)", f.describe());
    }
    MeasuredTable t = inPlace(root, src.display());
    Schemas.check(Schemas.Kind.MEASURED_RESPONSE, doc);
    return t;
  }

  /**
   * Reads the columns of a JSON table object (a file's top level or a loop file's section).
   *
   * @param o the object
   * @param source the source words for the table (file name)
   * @return the table
   */
  static MeasuredTable inPlace(JsonField o, String source) {
    JsonField d = o.optional("description");
    String description = d == null ? "" : d.text();
    double[][] cols = new double[3][];
    for (int c = 0; c < 3; c++) {
      cols[c] = o.required(COLUMNS.get(c), "a list of numbers").numbers("a list of numbers");
    }
    String src = description.isBlank() ? source : source + ": " + description;
    return o.build(() -> new MeasuredTable(src, cols[0], cols[1], cols[2]));
  }

  private static MeasuredTable csv(SourceFile src) {
    String file = src.display();
    String[] lines = ModeTableCsv.decodeUtf8(src).split("\r?\n|\r", -1);
    String description = "";
    Map<String, Integer> col = null;
    List<double[]> rows = new ArrayList<>();
    List<Integer> rowLines = new ArrayList<>();
    for (int i = 0; i < lines.length; i++) {
      String line = lines[i].strip();
      int lineNo = i + 1;
      if (line.isEmpty()) {
        continue;
      }
      if (line.startsWith("#")) {
        String body = line.substring(1).strip();
        if (body.toLowerCase(Locale.ROOT).startsWith("description") && body.contains("=")) {
          description = body.substring(body.indexOf('=') + 1).strip();
        }
        continue;
      }
      List<String> cells = ModeTableCsv.split(line, file, lineNo);
      if (col == null) {
        col = header(cells, file, lineNo);
        continue;
      }
      if (cells.size() != COLUMNS.size()) {
        throw new InputFileException(file, lineNo, "", COLUMNS.size() + " cells (" + String.join(", ", COLUMNS) + ")",
            cells.size() + " cells");
      }
      double[] row = new double[3];
      for (int c = 0; c < 3; c++) {
        String name = COLUMNS.get(c);
        row[c] = ModeTableCsv.number(cells.get(col.get(name)).strip(), file, lineNo, name);
      }
      rows.add(row);
      rowLines.add(lineNo);
    }
    if (col == null) {
      throw new InputFileException(file, lines.length, "", "a header line naming " + String.join(", ", COLUMNS),
          "no header (the file has no line that is not a comment)");
    }
    double[][] cols = new double[3][rows.size()];
    for (int r = 0; r < rows.size(); r++) {
      for (int c = 0; c < 3; c++) {
        cols[c][r] = rows.get(r)[c];
      }
    }
    String source = description.isBlank() ? file : file + ": " + description;
    try {
      return new MeasuredTable(source, cols[0], cols[1], cols[2]);
    } catch (InvalidInputException e) {
      int line = lines.length;
      String path = e.fieldPath();
      int open = path.indexOf('[');
      if (open >= 0 && path.endsWith("]")) {
        line = rowLines.get(Integer.parseInt(path.substring(open + 1, path.length() - 1)));
      }
      throw ModeTableCsv.located(e, file, line, "");
    }
  }

  private static Map<String, Integer> header(List<String> cells, String file, int lineNo) {
    Map<String, Integer> col = new HashMap<>();
    for (int c = 0; c < cells.size(); c++) {
      String name = cells.get(c).strip().toLowerCase(Locale.ROOT);
      if (!COLUMNS.contains(name)) {
        throw new InputFileException(file, lineNo, "header", "the columns " + String.join(", ", COLUMNS),
            "\"" + cells.get(c).strip() + "\"" + Suggest.hint(name, COLUMNS));
      }
      if (col.put(name, c) != null) {
        throw new InputFileException(file, lineNo, "header", "each column once", "\"" + name + "\" twice");
      }
    }
    for (String name : COLUMNS) {
      if (!col.containsKey(name)) {
        throw new InputFileException(file, lineNo, "header", "a column " + name, "no such column");
      }
    }
    return col;
  }
}
