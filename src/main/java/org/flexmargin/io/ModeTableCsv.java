package org.flexmargin.io;

import java.nio.CharBuffer;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.PlausibleRange;
import org.flexmargin.model.ShapeValue;

/**
 * Reads a mode table in the CSV layout for spreadsheet users: one row per (mode, station).
 *
 * <pre>
 * # format=1
 * # name=ridgeline-mc7-empty
 * # description=Invented demo data
 * mode,frequency_hz,damping_ratio,generalized_mass_kg,station,displacement_m,rotation_rad
 * wing_bending_1,4.0,0.015,41.0,wing_01,0.004,0.0
 * wing_bending_1,,,,wing_02,0.021,-0.001
 * </pre>
 *
 * <p>Lines starting with {@code #} before the header are comments; those of the form
 * {@code # key=value} with key {@code format} (required, 1), {@code name} or {@code description}
 * set the table's metadata, and any other {@code # word=value} is an error. The header names the
 * columns in any order: {@code mode}, {@code station}, {@code displacement_m},
 * {@code rotation_rad}, {@code frequency_hz}, {@code generalized_mass_kg} and at least one of
 * {@code damping_ratio} / {@code structural_damping_g}. A mode's frequency, damping (exactly one of
 * the two damping columns) and mass are given on its first row; on its later rows they are left
 * empty or repeat the same value. Rows whose cells are all empty are skipped; fields may be quoted
 * with double quotes. UTF-8, with or without a byte-order mark.
 */
final class ModeTableCsv {
  private ModeTableCsv() {}

  private static final Pattern META = Pattern.compile("#\\s*([A-Za-z_]+)\\s*=(.*)");
  private static final List<String> META_KEYS = List.of("format", "name", "description");
  private static final List<String> COLUMNS = List.of("mode", "frequency_hz", "damping_ratio",
      "structural_damping_g", "generalized_mass_kg", "station", "displacement_m", "rotation_rad");
  private static final List<String> MODE_COLUMNS =
      List.of("frequency_hz", "damping_ratio", "structural_damping_g", "generalized_mass_kg");

  /** Rows of one mode while reading. */
  private static final class Draft {
    final String name;
    final int firstLine;
    final Map<String, String> modeValues = new HashMap<>();
    final Map<String, ShapeValue> shapes = new LinkedHashMap<>();

    Draft(String name, int firstLine) {
      this.name = name;
      this.firstLine = firstLine;
    }
  }

  /**
   * @param src the CSV file
   * @param log where warnings about unusual values go
   * @return the validated table
   * @throws InputFileException on malformed or invalid content
   */
  static ModeTable parse(SourceFile src, ReadLog log) {
    String file = src.display();
    String text = decodeUtf8(src);
    if (text.startsWith("\uFEFF")) {
      text = text.substring(1);
    }
    String[] lines = text.split("\r\n|\n|\r", -1);
    Map<String, String> meta = new HashMap<>();
    Map<String, Integer> metaLine = new HashMap<>();
    int i = 0;
    List<String> header = null;
    int headerLine = 0;
    for (; i < lines.length; i++) {
      String line = lines[i].strip();
      if (line.isEmpty()) {
        continue;
      }
      if (line.startsWith("#")) {
        Matcher m = META.matcher(line);
        if (m.matches()) {
          String key = m.group(1);
          if (!META_KEYS.contains(key)) {
            throw new InputFileException(file, i + 1, key,
                "one of the settings " + String.join(", ", META_KEYS) + " in a '# key=value' line",
                "unknown setting \"" + key + "\"");
          }
          if (meta.put(key, m.group(2).strip()) != null) {
            throw new InputFileException(file, i + 1, key, "each setting once", "a second \"" + key + "\"");
          }
          metaLine.put(key, i + 1);
        }
        continue;
      }
      header = split(lines[i], file, i + 1);
      headerLine = i + 1;
      i++;
      break;
    }
    String format = meta.get("format");
    if (format == null) {
      throw new InputFileException(file, 1, "format", "a '# format=1' line before the header",
          "no format line");
    }
    if (!format.equals("1")) {
      throw new InputFileException(file, metaLine.get("format"), "format",
          "format 1 (the version this program reads)", "\"" + format + "\"");
    }
    if (header == null) {
      throw new InputFileException(file, lines.length, "", "a header row naming the columns", "none");
    }
    Map<String, Integer> col = new HashMap<>();
    for (int c = 0; c < header.size(); c++) {
      String h = header.get(c).strip();
      if (!COLUMNS.contains(h)) {
        throw new InputFileException(file, headerLine, "column " + (c + 1),
            "one of the columns " + String.join(", ", COLUMNS)
                + (header.size() == 1 && h.contains(";") ? " separated by commas" : ""),
            "\"" + h + "\"");
      }
      if (col.put(h, c) != null) {
        throw new InputFileException(file, headerLine, h, "each column once", "a second \"" + h + "\"");
      }
    }
    for (String required : List.of("mode", "station", "displacement_m", "rotation_rad",
        "frequency_hz", "generalized_mass_kg")) {
      if (!col.containsKey(required)) {
        throw new InputFileException(file, headerLine, required, "a column \"" + required + "\"",
            "a header without it");
      }
    }
    if (!col.containsKey("damping_ratio") && !col.containsKey("structural_damping_g")) {
      throw new InputFileException(file, headerLine, "damping_ratio",
          "a column damping_ratio or structural_damping_g", "neither");
    }

    Map<String, Draft> drafts = new LinkedHashMap<>();
    for (; i < lines.length; i++) {
      int lineNo = i + 1;
      if (lines[i].strip().isEmpty() || lines[i].strip().startsWith("#")) {
        continue;
      }
      List<String> cells = split(lines[i], file, lineNo);
      boolean allEmpty = cells.stream().allMatch(s -> s.strip().isEmpty());
      if (allEmpty) {
        continue;
      }
      for (int c = header.size(); c < cells.size(); c++) {
        if (!cells.get(c).strip().isEmpty()) {
          throw new InputFileException(file, lineNo, "column " + (c + 1),
              "at most " + header.size() + " cells (one per header column)", "\"" + cells.get(c) + "\"");
        }
      }
      String mode = cell(cells, col, "mode");
      String station = cell(cells, col, "station");
      if (mode.isEmpty()) {
        throw new InputFileException(file, lineNo, "mode", "a mode name", "an empty cell");
      }
      if (station.isEmpty()) {
        throw new InputFileException(file, lineNo, "station", "a station name", "an empty cell");
      }
      Draft d = drafts.get(mode);
      boolean first = d == null;
      if (first) {
        d = new Draft(mode, lineNo);
        drafts.put(mode, d);
      }
      String prefix = mode + "." ;
      for (String mc : MODE_COLUMNS) {
        if (!col.containsKey(mc)) {
          continue;
        }
        String v = cell(cells, col, mc);
        if (first) {
          if (!v.isEmpty()) {
            d.modeValues.put(mc, v);
          }
        } else if (!v.isEmpty()) {
          String before = d.modeValues.get(mc);
          if (before == null || number(v, file, lineNo, prefix + mc) != number(before, file, d.firstLine, prefix + mc)) {
            throw new InputFileException(file, lineNo, prefix + mc,
                "an empty cell or the value on the mode's first row (line " + d.firstLine + ")",
                "\"" + v + "\" where line " + d.firstLine + " has " + (before == null ? "nothing" : "\"" + before + "\""));
          }
        }
      }
      if (d.shapes.containsKey(station)) {
        throw new InputFileException(file, lineNo, prefix + "shapes." + station,
            "each station once per mode", "a second row for station \"" + station + "\"");
      }
      String path = prefix + "shapes." + station;
      double disp = log.check(PlausibleRange.MODE_SHAPE_DISPLACEMENT,
          number(cell(cells, col, "displacement_m"), file, lineNo, path + ".displacement_m"),
          cell(cells, col, "displacement_m") + " m", file, lineNo, path + ".displacement_m");
      double rot = log.check(PlausibleRange.MODE_SHAPE_ROTATION,
          number(cell(cells, col, "rotation_rad"), file, lineNo, path + ".rotation_rad"),
          cell(cells, col, "rotation_rad") + " rad", file, lineNo, path + ".rotation_rad");
      try {
        d.shapes.put(station, new ShapeValue(disp, rot));
      } catch (InvalidInputException e) {
        throw located(e, file, lineNo, path);
      }
    }
    if (drafts.isEmpty()) {
      throw new InputFileException(file, lines.length, "", "at least one data row after the header", "none");
    }

    List<ElasticMode> modes = new ArrayList<>();
    Draft firstDraft = null;
    for (Draft d : drafts.values()) {
      String p = d.name + ".";
      for (String req : List.of("frequency_hz", "generalized_mass_kg")) {
        if (!d.modeValues.containsKey(req)) {
          throw new InputFileException(file, d.firstLine, p + req,
              "a value on the mode's first row", "an empty cell");
        }
      }
      boolean hasZeta = d.modeValues.containsKey("damping_ratio");
      boolean hasG = d.modeValues.containsKey("structural_damping_g");
      if (hasZeta == hasG) {
        throw new InputFileException(file, d.firstLine, p + "damping_ratio",
            "exactly one of damping_ratio or structural_damping_g on the mode's first row",
            hasZeta ? "both" : "neither");
      }
      double f = log.check(PlausibleRange.MODE_FREQUENCY,
          number(d.modeValues.get("frequency_hz"), file, d.firstLine, p + "frequency_hz"),
          d.modeValues.get("frequency_hz") + " Hz", file, d.firstLine, p + "frequency_hz");
      double m = log.check(PlausibleRange.MODE_GENERALIZED_MASS,
          number(d.modeValues.get("generalized_mass_kg"), file, d.firstLine, p + "generalized_mass_kg"),
          d.modeValues.get("generalized_mass_kg") + " kg", file, d.firstLine, p + "generalized_mass_kg");
      double zeta;
      if (hasZeta) {
        zeta = number(d.modeValues.get("damping_ratio"), file, d.firstLine, p + "damping_ratio");
      } else {
        double g = number(d.modeValues.get("structural_damping_g"), file, d.firstLine, p + "structural_damping_g");
        if (!(g >= 0 && g < 2)) {
          throw new InputFileException(file, d.firstLine, p + "structural_damping_g",
              "a structural damping g in [0, 2) (g = 2 zeta)", String.valueOf(g));
        }
        zeta = g / 2;
      }
      if (zeta >= 0 && zeta < 1) {
        log.check(PlausibleRange.MODE_DAMPING_RATIO, zeta, "a damping ratio of " + zeta, file, d.firstLine,
            p + (hasZeta ? "damping_ratio" : "structural_damping_g"));
      }
      if (firstDraft != null) {
        String mismatch = CaseReader.stationMismatch(firstDraft.shapes.keySet(), d.shapes.keySet());
        if (mismatch != null) {
          throw new InputFileException(file, d.firstLine, d.name + ".shapes",
              "the same stations as the first mode (\"" + firstDraft.name + "\")", mismatch);
        }
      } else {
        firstDraft = d;
      }
      try {
        modes.add(new ElasticMode(d.name, f, zeta, m, d.shapes));
      } catch (InvalidInputException e) {
        throw located(e, file, d.firstLine, d.name);
      }
    }
    String name = meta.getOrDefault("name", CaseReader.stem(src));
    try {
      return new ModeTable(name, modes);
    } catch (InvalidInputException e) {
      throw located(e, file, headerLine, "");
    }
  }

  /** Decodes UTF-8, reporting the line and column of the first byte that is not UTF-8. */
  static String decodeUtf8(SourceFile src) {
    byte[] bytes = src.bytes();
    ByteBuffer in = ByteBuffer.wrap(bytes);
    CharBuffer out = CharBuffer.allocate(bytes.length + 1);
    CoderResult r = StandardCharsets.UTF_8.newDecoder()
        .onMalformedInput(CodingErrorAction.REPORT)
        .onUnmappableCharacter(CodingErrorAction.REPORT)
        .decode(in, out, true);
    if (r.isError()) {
      int at = in.position();
      int line = 1;
      int lineStart = 0;
      for (int k = 0; k < at; k++) {
        if (bytes[k] == '\n') {
          line++;
          lineStart = k + 1;
        }
      }
      throw new InputFileException(src.display(), line, "", "UTF-8 text",
          String.format(Locale.ROOT, "the byte 0x%02X at column %d, which is not UTF-8 (save the file as UTF-8)",
              bytes[at] & 0xff, at - lineStart + 1));
    }
    out.flip();
    return out.toString();
  }

  static InputFileException located(InvalidInputException e, String file, int line, String prefix) {
    String rel = e.fieldPath();
    String full = prefix.isEmpty() ? rel : prefix + "." + rel;
    String msg = e.getMessage();
    String rest = msg.startsWith(rel + ": expected ") ? msg.substring(rel.length() + 11) : msg;
    int cut = rest.lastIndexOf(", found ");
    String expected = cut < 0 ? "valid input" : rest.substring(0, cut);
    String found = cut < 0 ? rest : rest.substring(cut + 8);
    return new InputFileException(file, line, full, expected, found, e);
  }

  private static String cell(List<String> cells, Map<String, Integer> col, String name) {
    int c = col.get(name);
    return c < cells.size() ? cells.get(c).strip() : "";
  }

  static double number(String s, String file, int line, String path) {
    if (s.isEmpty()) {
      throw new InputFileException(file, line, path, "a number", "an empty cell");
    }
    try {
      return Double.parseDouble(s);
    } catch (NumberFormatException e) {
      throw new InputFileException(file, line, path,
          "a number with a decimal point (e.g. 3.8 or 1.2e-3)", "\"" + s + "\"");
    }
  }

  /** Splits one CSV line (RFC 4180 quoting, no line breaks inside quotes). */
  static List<String> split(String line, String file, int lineNo) {
    return CsvLine.split(line, file, lineNo);
  }
}
